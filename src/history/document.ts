import { InputError } from '../errors/input-error.js';
import { decodeV1 } from './decode-v1.js';
import { decodeV2, RUN_FIELDS } from './decode-v2.js';
import type { History } from './history.js';
import { parseJsonText } from './json-text.js';
import { isObject, throwingSink, typeName, type ProblemSink } from './problems.js';
import { scanHistoryBytes } from './values-scan.js';

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

/** How decodeHistoryDocument may trust what it is given. */
export interface DecodeOptions {
  /**
   * metrics.values holds only arrays of doubles, each finite or NaN (scanHistoryBytes' rows when
   * it says `finite`): the value columns' lengths are checked, not each entry again.
   */
  finiteRows?: boolean;
}

/**
 * Decodes an already parsed document of any known version, reporting problems to `report`.
 * Shared by parseHistory (stops at the first problem) and verifyHistory (lists them all).
 */
export function decodeHistoryDocument(
  root: unknown,
  report: ProblemSink,
  options: DecodeOptions = {},
): History | undefined {
  if (!isObject(root)) {
    report('', `a history document must be a JSON object, found ${typeName(root)}`);
    return undefined;
  }
  const schema = root.schema;
  const version = typeof schema === 'string' ? /^bellgate\.history\/(\d{1,9})$/.exec(schema)?.[1] : undefined;
  if (version === undefined) {
    report(
      'schema',
      `not a Bellgate history document: "schema" is ${typeName(schema) === 'a string' ? JSON.stringify(schema) : typeName(schema)}, expected "${HISTORY_SCHEMA}"`,
      'point the history option at a file that Bellgate wrote',
    );
    return undefined;
  }
  const n = Number(version);
  if (n > CURRENT_VERSION) {
    report(
      'schema',
      `the history was written by a newer Bellgate (document version ${n}; this one reads up to ${CURRENT_VERSION})`,
      'upgrade Bellgate to the version that wrote this history',
    );
    return undefined;
  }
  if (n === 1) return decodeV1(root, report);
  if (n === 2) return decodeV2(root, report, options.finiteRows === true);
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
 * parseHistory for the file's bytes, taking the fast road when it can: scanHistoryBytes reads the
 * values rows straight into doubles (no JSON.parse object per number) and JSON.parse reads only
 * the small rest. Any document the scan declines (another version, odd but valid JSON, or broken
 * JSON) is decoded from its UTF-8 text by parseHistory, so the result and every error are the same.
 * `rows` says where each values row lies in `bytes` (present only after a scan), which lets a
 * store write an append by splicing the old rows (splice-append.ts). `scan: false` skips the scan
 * (a small document is parsed faster whole).
 * Throws InputError exactly as parseHistory.
 *
 * @example parseHistoryBytes(readFileSync('h.json'), 'h.json').history.runs.length // 120
 */
export function parseHistoryBytes(
  bytes: Uint8Array,
  source: string,
  scan = true,
): { history: History; rows?: ValueRows } {
  const scanned = scan ? scanHistoryBytes(bytes) : undefined;
  if (scanned === undefined)
    return {
      history: parseHistory(Buffer.from(bytes.buffer, bytes.byteOffset, bytes.byteLength).toString('utf8'), source),
    };
  const history = decodeHistoryDocument(scanned.root, throwingSink(source), { finiteRows: scanned.finite });
  if (!history) throw new InputError('unreadable history document', { where: source });
  return { history, rows: { valuesStart: scanned.valuesStart, rowEnds: scanned.rowEnds } };
}

/**
 * Where the values rows lie in the bytes a document was read from: the `[` that opens
 * metrics.values and each row's closing `]`, in row order (only space and commas between rows).
 */
export interface ValueRows {
  valuesStart: number;
  rowEnds: number[];
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
  checkRuns(h);
  for (const [name, column] of h.columns) checkStorable(h, name, column.values);
  // JSON.stringify writes NaN as null, which is exactly the "missing" marker.
  const lines = [...h.columns.values()].map((c) => JSON.stringify(c.values));
  return `${historyHead(h)}${lines.join(',\n')}${HISTORY_TAIL}`;
}

/**
 * Everything of the version-2 layout before the first values row: schema, series, the runs table,
 * names and units, up to `"values":[` and its newline. The rows follow, joined by ",\n", then
 * HISTORY_TAIL. Shared by serializeHistory and the text splice of an append (splice-append.ts).
 *
 * @example historyHead(emptyHistory('s')).endsWith('"values":[\n') // true
 */
export function historyHead(h: History): string {
  const runs: Record<string, unknown[]> = { id: h.runs.map((r) => r.id) };
  for (const field of RUN_FIELDS) runs[field] = h.runs.map((r) => r[field] ?? null);
  const names = [...h.columns.keys()];
  const units = [...h.columns.values()].map((c) => c.unit ?? null);
  return (
    `{"schema":${JSON.stringify(HISTORY_SCHEMA)},"series":${JSON.stringify(h.series)},\n` +
    `"runs":${JSON.stringify(runs)},\n` +
    `"metrics":{"names":${JSON.stringify(names)},"units":${JSON.stringify(units)},"values":[\n`
  );
}

/** What closes a version-2 document after its last values row. */
export const HISTORY_TAIL = ']}}\n';

const NOT_STORABLE_FIX = 'this is a bug in the code that built the history; please report it';
const storeWhere = (h: History): string => `history of series ${JSON.stringify(h.series)}`;

/**
 * The runs half of the check before storing: every run has an id and no id appears twice.
 * Throws InputError, so a broken History is never stored.
 */
export function checkRuns(h: History): void {
  const where = storeWhere(h);
  const ids = new Set<string>();
  for (const run of h.runs) {
    if (typeof run.id !== 'string' || run.id === '')
      throw new InputError('a run without an id cannot be stored', { where, fix: NOT_STORABLE_FIX });
    if (ids.has(run.id))
      throw new InputError(`run id ${JSON.stringify(run.id)} appears twice`, { where, fix: NOT_STORABLE_FIX });
    ids.add(run.id);
  }
}

/**
 * The column half: one value per run, each a finite number or NaN (missing). `from` skips values
 * already known to be storable (an append checks only what it adds). Throws InputError.
 */
export function checkStorable(h: History, name: string, values: readonly number[], from = 0): void {
  if (values.length !== h.runs.length) {
    throw new InputError(`metric ${JSON.stringify(name)} has ${values.length} values for ${h.runs.length} runs`, {
      where: storeWhere(h),
      fix: NOT_STORABLE_FIX,
    });
  }
  for (let i = from; i < values.length; i++) {
    const v = values[i];
    if (v === Infinity || v === -Infinity || typeof v !== 'number') {
      throw new InputError(`metric ${JSON.stringify(name)} holds ${String(v)}, which cannot be stored`, {
        where: storeWhere(h),
        fix: NOT_STORABLE_FIX,
      });
    }
  }
}
