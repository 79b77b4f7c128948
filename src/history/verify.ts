import { InputError } from '../errors/input-error.js';
import { decodeHistoryDocument, HISTORY_SCHEMA_V1 } from './document.js';
import { parseJsonText } from './json-text.js';
import { collectingSink, isObject, type HistoryProblem } from './problems.js';
import { parseIsoTime } from './iso-time.js';
import { nameProblem } from './import-run.js';

/**
 * Checks the integrity of a history document without throwing, for `bellgate verify` (exit 0
 * when the list is empty, 2 otherwise). Finds: malformed JSON ("line:col"), a missing, unknown or
 * newer version, wrong types, duplicated run ids, duplicated metric names, non-finite values,
 * ragged columns, unreadable times, runs out of time order and metric names every metric reader
 * would refuse (control or bidirectional-override characters, over 512 characters) — each located by a JSON path in
 * the document's own layout ("metrics.values[3][17]", "runs[4].values[\"build/compile\"]").
 * At most 200 problems are listed, then a count of the rest.
 *
 * @example verifyHistory('{"schema":"bellgate.history/9"}', 'h.json')
 * // [{ where: 'schema', problem: 'the history was written by a newer Bellgate (...)' }]
 */
export function verifyHistory(text: string, source: string): HistoryProblem[] {
  const problems: HistoryProblem[] = [];
  let root: unknown;
  try {
    root = parseJsonText(text, source);
  } catch (error) {
    if (!(error instanceof InputError)) throw error;
    const where = error.where?.startsWith(`${source}:`) ? error.where.slice(source.length + 1) : (error.where ?? '');
    return [{ where, problem: error.message }];
  }
  const { sink, finish } = collectingSink(problems);
  const history = decodeHistoryDocument(root, sink);
  if (history) {
    const v1 = isObject(root) && root.schema === HISTORY_SCHEMA_V1;
    const timePath = (i: number): string => (v1 ? `runs[${i}].time` : `runs.time[${i}]`);
    let previous = -Infinity;
    let previousIndex = -1;
    history.runs.forEach((run, i) => {
      if (run.time === undefined) return;
      const ms = parseIsoTime(run.time);
      if (ms === undefined) {
        sink(timePath(i), `time ${JSON.stringify(run.time)} is not an ISO-8601 date-time`);
        return;
      }
      if (ms < previous) {
        sink(
          timePath(i),
          `run ${JSON.stringify(run.id)} (${run.time}) is older than the run before it (runs are stored oldest first; see ${timePath(previousIndex)})`,
        );
      } else {
        previous = ms;
        previousIndex = i;
      }
    });
    // A hand-edited or imported history may hold names no reader lets in; the renderers clean
    // them, but the document should be mended.
    [...history.columns.keys()].forEach((name, i) => {
      const problem = nameProblem(name);
      if (problem) sink(v1 ? 'runs[].values' : `metrics.names[${i}]`, problem);
    });
  }
  finish();
  return problems;
}
