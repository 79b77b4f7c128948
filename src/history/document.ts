import { InputError } from '../model/input-error.js';
import { decodeV1 } from './decode-v1.js';
import { decodeV2, RUN_FIELDS } from './decode-v2.js';
import type { History } from './history.js';
import { parseJsonText } from './json-text.js';
import { isObject, throwingSink, typeName, type ProblemSink } from './problems.js';

/**
 * The history document, one per series. Version 2 is written; version 1 is still read.
 *
 * Version 2 ("bellgate.history/2") is columnar: run descriptions are columns of a runs table,
 * metric names and units are stored once, and each metric's values are one array aligned with
 * the runs (oldest first). A run without the metric holds null. Numbers are plain JSON numbers,
 * so they read back exactly. One metric per line keeps diffs of a data branch readable:
 *
 *     {"schema":"bellgate.history/2","series":"linux-x64",
 *     "runs":{"id":["81-1","82-1"],"sha":["4f1c…","9a0b…"],"ref":["refs/heads/main",…],
 *             "event":["push","push"],"time":["2026-03-01T10:00:00.000Z",…]},
 *     "metrics":{"names":["bundle/app.js.gz","build/compile"],"units":["B",null],"values":[
 *     [40211,40213],
 *     [12.5,null]]}}
 *
 * sha, ref, event and time columns may be absent (all missing); units may be absent (none).
 * Reading needs one JSON.parse and one pass over the values — see decodeV2.
 */
export const HISTORY_SCHEMA = 'bellgate.history/2';
export const HISTORY_SCHEMA_V1 = 'bellgate.history/1';
const CURRENT_VERSION = 2;

/**
 * Decodes an already parsed document of any known version, reporting problems to `report`.
 * Shared by parseHistory (stops at the first problem) and verifyHistory (lists them all).
 */
export function decodeHistoryDocument(root: unknown, report: ProblemSink): History | undefined {
  if (!isObject(root)) {
    report('', `a history document must be a JSON object, found ${typeName(root)}`);
    return undefined;
  }
  const schema = root.schema;
  const version = typeof schema === 'string' ? /^bellgate\.history\/(\d{1,9})$/.exec(schema)?.[1] : undefined;
  if (version === undefined) {
    report('schema', `not a Bellgate history document: "schema" is ${typeName(schema) === 'a string' ? JSON.stringify(schema) : typeName(schema)}, expected "${HISTORY_SCHEMA}"`,
      'point the history option at a file that Bellgate wrote');
    return undefined;
  }
  const n = Number(version);
  if (n > CURRENT_VERSION) {
    report('schema', `the history was written by a newer Bellgate (document version ${n}; this one reads up to ${CURRENT_VERSION})`,
      'upgrade Bellgate to the version that wrote this history');
    return undefined;
  }
  if (n === 1) return decodeV1(root, report);
  if (n === 2) return decodeV2(root, report);
  report('schema', `unknown history document version ${n}`, 'point the history option at a file that Bellgate wrote');
  return undefined;
}

/**
 * Reads a history document of any version (1 or 2) into a History.
 * Cost: one JSON.parse plus one pass over the values (no object per value).
 * Throws InputError naming the source and the place: "source:line:col" for malformed JSON,
 * "source at metrics.values[3][17]" for a bad entry; a newer version asks to upgrade Bellgate.
 *
 * @example parseHistory('{"schema":"bellgate.history/2","series":"s","runs":{"id":[]},"metrics":{"names":[],"values":[]}}', 'h.json')
 * // { series: 's', runs: [], columns: Map {} }
 */
export function parseHistory(text: string, source: string): History {
  const history = decodeHistoryDocument(parseJsonText(text, source), throwingSink(source));
  // The throwing sink stops at the first problem, so undefined cannot come back; keep TS honest.
  if (!history) throw new InputError('unreadable history document', { where: source });
  return history;
}

/**
 * Writes a History as a version-2 document (layout above). NaN is written as null (missing).
 * Throws InputError when the History is inconsistent (a column not aligned with the runs, an
 * infinite value, a duplicated run id), so a broken History is never stored.
 *
 * @example serializeHistory(emptyHistory('s'))
 * // '{"schema":"bellgate.history/2","series":"s",\n"runs":{"id":[],...},\n"metrics":{...,"values":[\n]}}\n'
 */
export function serializeHistory(h: History): string {
  checkConsistent(h);
  const runs: Record<string, unknown[]> = { id: h.runs.map((r) => r.id) };
  for (const field of RUN_FIELDS) runs[field] = h.runs.map((r) => r[field] ?? null);
  const names = [...h.columns.keys()];
  const units = [...h.columns.values()].map((c) => c.unit ?? null);
  // JSON.stringify writes NaN as null, which is exactly the "missing" marker.
  const lines = [...h.columns.values()].map((c) => JSON.stringify(c.values));
  return (
    `{"schema":${JSON.stringify(HISTORY_SCHEMA)},"series":${JSON.stringify(h.series)},\n` +
    `"runs":${JSON.stringify(runs)},\n` +
    `"metrics":{"names":${JSON.stringify(names)},"units":${JSON.stringify(units)},"values":[\n` +
    `${lines.join(',\n')}]}}\n`
  );
}

function checkConsistent(h: History): void {
  const where = `history of series ${JSON.stringify(h.series)}`;
  const fix = 'this is a bug in the code that built the history; please report it';
  const ids = new Set<string>();
  for (const run of h.runs) {
    if (typeof run.id !== 'string' || run.id === '') throw new InputError('a run without an id cannot be stored', { where, fix });
    if (ids.has(run.id)) throw new InputError(`run id ${JSON.stringify(run.id)} appears twice`, { where, fix });
    ids.add(run.id);
  }
  for (const [name, column] of h.columns) {
    if (column.values.length !== h.runs.length) {
      throw new InputError(`metric ${JSON.stringify(name)} has ${column.values.length} values for ${h.runs.length} runs`, { where, fix });
    }
    for (const v of column.values) {
      if (v === Infinity || v === -Infinity || typeof v !== 'number') {
        throw new InputError(`metric ${JSON.stringify(name)} holds ${String(v)}, which cannot be stored`, { where, fix });
      }
    }
  }
}
