import { decodeHistory } from './document.js';
import { nameProblem } from './import-run.js';
import { parseIsoTime } from './iso-time.js';
import { textLines } from './lines.js';
import { unitMixups } from './unit-mixups.js';
import { collectingSink, isObject, type HistoryProblem } from './problems.js';

const FIELDS = {
  run: new Set(['id', 'time', 'sha', 'ref', 'event', 'pr', 'runner', 'values', 'marks', 'n']),
  drop: new Set(['drop', 'time', 'reason']),
  mark: new Set(['mark', 'metrics', 'reason', 'pr', 'note']),
};

/**
 * Checks a history document without throwing, for `bellgate verify` (exit 0 when the list is
 * empty, 2 otherwise). Each problem names its line ("12", or "12:5" for a JSON syntax error):
 * a missing, unknown or newer format; a header that is not one; a line that is not JSON, not an
 * object, or not a run, tombstone or mark; wrong types; more values than metrics; non-finite
 * values; a field this format does not have; a time that is not ISO-8601; a mark for a run the
 * document does not hold; metric names every metric reader would refuse (control or
 * bidirectional-override characters, over 512 characters); a torn last line; mixed units (a value
 * off its column's median by about a unit ratio, unit-mixups.ts). At most 200 problems
 * are listed, then a count of the rest.
 *
 * @example verifyHistory('{"schema":"bellgate.history/9"}\n')
 * // [{ where: '1', problem: 'the history was written by a newer Bellgate (...)' }]
 */
export function verifyHistory(text: string): HistoryProblem[] {
  const problems: HistoryProblem[] = [];
  const { sink, finish } = collectingSink(problems);
  const lines = textLines(text);
  const decoded = decodeHistory(lines, sink, { warn: (problem, where) => sink(where, problem) });
  if (decoded) {
    decoded.header.metrics.forEach((m, i) => {
      const problem = nameProblem(m.name);
      if (problem) sink('1', `metrics[${i}]: ${problem}`);
    });
    const runIds = new Set(decoded.history.runs.map((r) => r.id));
    const lineOf = new Map<string, number>();
    let number = 0;
    for (const line of lines.forward()) {
      number += 1;
      if (number === 1) continue;
      let value: unknown;
      try {
        value = JSON.parse(line.text);
      } catch {
        continue; // reported by the decode
      }
      if (!isObject(value)) continue;
      const kind = 'drop' in value ? 'drop' : 'mark' in value ? 'mark' : 'id' in value ? 'run' : undefined;
      if (kind === undefined) continue;
      if (kind === 'run' && typeof value.id === 'string') lineOf.set(value.id, number);
      for (const field of Object.keys(value)) {
        if (!FIELDS[kind].has(field))
          sink(String(number), `field ${JSON.stringify(field)} is not part of a ${kind} line`);
      }
      if (typeof value.time === 'string' && parseIsoTime(value.time) === undefined)
        sink(String(number), `time ${JSON.stringify(value.time)} is not an ISO-8601 date-time`);
      if (kind === 'mark' && typeof value.mark === 'string' && !runIds.has(value.mark))
        sink(String(number), `the mark is for run ${JSON.stringify(value.mark)}, which the history does not hold`);
    }
    for (const m of unitMixups(decoded.history)) sink(String(lineOf.get(m.run) ?? ''), m.problem);
  }
  finish();
  return problems;
}
