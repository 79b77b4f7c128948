import { jsonErrorOffset, lineColumn } from '../errors/json-text.js';
import { InputError } from '../errors/input-error.js';
import {
  attemptOf,
  replacementKey,
  type History,
  type LevelMark,
  type MetricColumn,
  type RunInfo,
  type Tombstone,
} from './history.js';
import { textLines, type LineSource, type RawLine } from './lines.js';
import { isObject, throwingSink, typeName, type ProblemSink } from './problems.js';
import { timeKey } from './run-order.js';

/**
 * The history document of one series, "bellgate.history/3": JSON Lines, one JSON object a line,
 * every line ended by "\n". Line 1 is the header (format version, series, metric names and units,
 * in the order the values are written); then the tombstones of dropped runs; then one line per run,
 * oldest first; mark lines may follow, appended by `bellgate mark`:
 *
 *     {"schema":"bellgate.history/3","series":"linux-x64","metrics":[{"name":"bundle/app.js.gz","unit":"B"},{"name":"build/compile"}]}
 *     {"drop":"80-1","time":"2026-03-02T09:00:00.000Z","reason":"noisy runner"}
 *     {"id":"81-1","time":"2026-03-01T10:00:00.000Z","sha":"4f1c…","ref":"refs/heads/main","event":"push","values":[40211,12.5],"n":1}
 *     {"id":"82-1","time":"2026-03-02T10:00:00.000Z","pr":17,"runner":"Linux X64 | …","values":[40213],"marks":[{"reason":"accepted","pr":17}],"n":2}
 *     {"mark":"82-1","metrics":["build/*"],"reason":"manual","note":"new compiler"}
 *
 * A run's `values` are aligned with the header's metrics, null where the run lacks one; a shorter
 * array leaves the later metrics missing (so a metric added later costs older lines nothing).
 * `n` is a hint, not data: the runs the writer counted with this one, so an append knows when
 * `keep` calls for a trim without reading every line. Meaning does not depend on line order:
 * a run id seen twice is the later line's; a higher attempt of a CI run ("8123-2") replaces a
 * lower one; a tombstone removes its run wherever it is; a mark line adds to its run's marks.
 * A last line without its newline is a write that was cut short: read when it is a complete JSON
 * value, else ignored with a warning (the next locked write of the file store cuts it off).
 * Reading needs one JSON.parse a line; a check parses only the lines it uses (`newest`).
 */
export const HISTORY_SCHEMA = 'bellgate.history/3';
const CURRENT_VERSION = 3;

/** A metric as the header lists it. */
export interface HeaderMetric {
  name: string;
  unit?: string;
}

/** The header line, decoded. */
export interface Header {
  series: string;
  metrics: HeaderMetric[];
}

export interface DecodeOptions {
  /** Read only the lines of the newest this-many runs (from the end); all when absent. */
  newest?: number;
  /** Told about a torn last line that was ignored, and on which line ("12"). */
  warn?: (problem: string, where: string) => void;
}

/** What a decode found besides the History: the header as stored, and where run lines begin. */
export interface Decoded {
  history: History;
  header: Header;
  /** Largest `n` hint of the lines read (the run count the last writer saw); 0 when none. */
  countHint: number;
}

const MAX_ID = 256;
const MAX_TEXT = 4096;

/**
 * Reads a history document into a History (oldest first; dropped runs removed; a column per
 * metric that holds a value). Throws InputError at the first problem, located "source:LINE[:COL]"
 * with a fix; a newer format asks to upgrade Bellgate.
 *
 * @example parseHistory('{"schema":"bellgate.history/3","series":"s","metrics":[]}\n', 'h.jsonl').runs // []
 */
export function parseHistory(text: string, source: string, options: DecodeOptions = {}): History {
  const decoded = decodeHistory(textLines(text), throwingSink(source), options);
  // The throwing sink stops at the first problem, so undefined cannot come back; keep TS honest.
  if (!decoded) throw new InputError('unreadable history document', { where: source });
  return decoded.history;
}

/**
 * Decodes the lines of a document, reporting each problem to `report` (a throwing sink stops at
 * the first; a collecting one gets all). With `newest`, reads the header and the tombstones after
 * it, then lines from the end until that many runs are found. Returns undefined when the header
 * cannot be read.
 */
export function decodeHistory(src: LineSource, report: ProblemSink, options: DecodeOptions = {}): Decoded | undefined {
  // Line numbers are counted only for a message: reading from the end, counting means reading
  // the file before the line.
  const number = (line: RawLine): number => line.number ?? src.lineNumber(line.offset);
  const at = (line: RawLine, column?: number): string =>
    column === undefined ? String(number(line)) : `${number(line)}:${column}`;
  const forward = src.forward()[Symbol.iterator]();
  const first = forward.next();
  if (first.done) {
    report('', 'the file is empty, not a history document', 'remove it, or restore it from a backup');
    return undefined;
  }
  const headerValue = parseLine(first.value, at, report, options.warn);
  const header = headerValue === undefined ? undefined : decodeHeader(headerValue, report);
  if (header === undefined) return undefined;
  const entries: Entry[] = [];
  const take = (line: RawLine): Entry | undefined => {
    const value = parseLine(line, at, report, options.warn);
    if (value === undefined) return undefined;
    const entry = decodeEntry(value, header.metrics.length, () => at(line), report);
    if (entry !== undefined) entries.push(entry);
    return entry;
  };
  const newest = options.newest;
  if (newest === undefined) {
    for (let next = forward.next(); !next.done; next = forward.next()) take(next.value);
  } else {
    // The tombstones a writer keeps up front, then runs from the end until `newest` are found.
    let stop = Infinity;
    for (let next = forward.next(); !next.done; next = forward.next()) {
      if (!/^\s*\{\s*"drop"/.test(next.value.text)) {
        stop = next.value.offset;
        break;
      }
      take(next.value);
    }
    const dropped = new Set(entries.flatMap((e) => (e.kind === 'drop' ? [e.tombstone.id] : [])));
    const tail: Entry[] = [];
    const seen = new Set<string>();
    if (stop !== Infinity && newest > 0) {
      const front = entries.length;
      for (const line of src.backward(stop)) {
        const entry = take(line);
        if (entry === undefined) continue;
        tail.push(entries.pop() as Entry);
        if (entry.kind === 'drop') dropped.add(entry.tombstone.id);
        if (entry.kind !== 'run' || dropped.has(entry.info.id)) continue;
        seen.add(replacementKey(entry.info.id));
        if (seen.size >= newest) break;
      }
      entries.length = front;
      entries.push(...tail.reverse());
    }
  }
  return fold(header, entries, newest);
}

/** Parses one line as JSON; a torn last line is ignored with a warning, blank lines skipped. */
function parseLine(
  line: RawLine,
  at: (line: RawLine, column?: number) => string,
  report: ProblemSink,
  warn: DecodeOptions['warn'],
): unknown {
  if (line.text.trim() === '') return undefined;
  try {
    return JSON.parse(line.text) as unknown;
  } catch (error) {
    if (!line.complete) {
      warn?.(
        `ignored the last line, which a write that was cut short left incomplete (${line.text.length} characters); the next record removes it`,
        at(line),
      );
      return undefined;
    }
    const message = error instanceof Error ? error.message : String(error);
    const { column } = lineColumn(line.text, jsonErrorOffset(line.text, message));
    report(at(line, column), `not valid JSON (${message.replace(/, ".*" is not valid JSON$/s, '')})`);
    return undefined;
  }
}

function decodeHeader(value: unknown, report: ProblemSink): Header | undefined {
  if (!isObject(value)) {
    report('1', `the first line must be the header object, found ${typeName(value)}`, NOT_OURS);
    return undefined;
  }
  const schema = value.schema;
  const version = typeof schema === 'string' ? /^bellgate\.history\/([1-9]\d{0,8})$/.exec(schema)?.[1] : undefined;
  if (version === undefined) {
    report(
      '1',
      `not a Bellgate history document: "schema" is ${typeof schema === 'string' ? JSON.stringify(schema) : typeName(schema)}, expected "${HISTORY_SCHEMA}"`,
      NOT_OURS,
    );
    return undefined;
  }
  if (Number(version) > CURRENT_VERSION) {
    report(
      '1',
      `the history was written by a newer Bellgate (format version ${Number(version)}; this one reads version ${CURRENT_VERSION})`,
      'upgrade Bellgate to the version that wrote this history',
    );
    return undefined;
  }
  if (Number(version) !== CURRENT_VERSION) {
    report(
      '1',
      `format version ${Number(version)} is not read by this Bellgate (it reads version ${CURRENT_VERSION} only)`,
      'start a new history (`bellgate import` takes past runs as JSON Lines or CSV)',
    );
    return undefined;
  }
  if (typeof value.series !== 'string') {
    report('1', `"series" must be a string, found ${typeName(value.series)}`);
    return undefined;
  }
  if (!Array.isArray(value.metrics)) {
    report('1', `"metrics" must be an array, found ${typeName(value.metrics)}`);
    return undefined;
  }
  const metrics: HeaderMetric[] = [];
  const names = new Set<string>();
  for (const [i, m] of value.metrics.entries()) {
    if (!isObject(m) || typeof m.name !== 'string' || m.name === '') {
      report('1', `metrics[${i}] must be an object with a non-empty "name"`);
      return undefined;
    }
    if (m.unit !== undefined && typeof m.unit !== 'string') {
      report('1', `metrics[${i}] (${JSON.stringify(m.name)}): "unit" must be a string, found ${typeName(m.unit)}`);
      return undefined;
    }
    if (names.has(m.name)) {
      report('1', `metric ${JSON.stringify(m.name)} is listed twice (metrics[${i}])`);
      return undefined;
    }
    names.add(m.name);
    metrics.push(m.unit === undefined ? { name: m.name } : { name: m.name, unit: m.unit });
  }
  return { series: value.series, metrics };
}

const NOT_OURS = 'point the history option at a file that Bellgate wrote';

type Entry =
  | { kind: 'run'; info: RunInfo; values: readonly unknown[]; n?: number }
  | { kind: 'drop'; tombstone: Tombstone }
  | { kind: 'mark'; id: string; mark: LevelMark };

/** One line after the header: a run, a tombstone or a mark; undefined (reported) when unusable. */
function decodeEntry(value: unknown, metricCount: number, where: () => string, report: ProblemSink): Entry | undefined {
  // The line's place is worked out only when there is a problem to report.
  const at = where;
  if (!isObject(value)) {
    report(at(), `a line must be a JSON object, found ${typeName(value)}`);
    return undefined;
  }
  if ('drop' in value) {
    const id = idOf(value.drop, '"drop"', at, report);
    if (id === undefined) return undefined;
    const tombstone: Tombstone = { id };
    if (!optionalText(value, 'time', tombstone, at, report) || !optionalText(value, 'reason', tombstone, at, report))
      return undefined;
    return { kind: 'drop', tombstone };
  }
  if ('mark' in value) {
    const id = idOf(value.mark, '"mark"', at, report);
    const mark = decodeMark(value, at, report);
    return id === undefined || mark === undefined ? undefined : { kind: 'mark', id, mark };
  }
  if (!('id' in value)) {
    report(at(), 'a line must be a run (with "id"), a tombstone ("drop") or a mark ("mark")');
    return undefined;
  }
  const id = idOf(value.id, '"id"', at, report);
  if (id === undefined) return undefined;
  const info: RunInfo = { id };
  const named = `run ${JSON.stringify(id)}`;
  for (const field of ['time', 'sha', 'ref', 'event', 'runner'] as const) {
    if (!optionalText(value, field, info, at, report, named)) return undefined;
  }
  if (value.pr !== undefined) {
    if (!isPullNumber(value.pr)) {
      report(at(), `${named}: "pr" must be a pull request number, found ${typeName(value.pr)}`);
      return undefined;
    }
    info.pr = value.pr;
  }
  const values = value.values ?? [];
  if (!Array.isArray(values)) {
    report(at(), `${named}: "values" must be an array, found ${typeName(values)}`);
    return undefined;
  }
  if (values.length > metricCount) {
    report(at(), `${named} has ${values.length} values, but the header lists ${metricCount} metrics`);
    return undefined;
  }
  for (let i = 0; i < values.length; i++) {
    const v: unknown = values[i];
    if (v !== null && !(typeof v === 'number' && Number.isFinite(v))) {
      report(at(), `${named}: values[${i}] is ${typeName(v)}, not a finite number or null`);
      return undefined;
    }
  }
  if (value.marks !== undefined) {
    if (!Array.isArray(value.marks)) {
      report(at(), `${named}: "marks" must be an array, found ${typeName(value.marks)}`);
      return undefined;
    }
    const marks: LevelMark[] = [];
    for (const raw of value.marks) {
      const mark = decodeMark(raw, at, report, named);
      if (mark === undefined) return undefined;
      marks.push(mark);
    }
    if (marks.length > 0) info.marks = marks;
  }
  const n = typeof value.n === 'number' && Number.isSafeInteger(value.n) && value.n >= 0 ? value.n : undefined;
  return n === undefined ? { kind: 'run', info, values } : { kind: 'run', info, values, n };
}

function idOf(raw: unknown, field: string, at: () => string, report: ProblemSink): string | undefined {
  if (typeof raw !== 'string' || raw === '' || raw.length > MAX_ID) {
    report(
      at(),
      `${field} must be a run id (a non-empty string of at most ${MAX_ID} characters), found ${typeName(raw)}`,
    );
    return undefined;
  }
  return raw;
}

function optionalText<K extends string>(
  value: Record<string, unknown>,
  field: K,
  into: Partial<Record<K, string>>,
  at: () => string,
  report: ProblemSink,
  named = 'the line',
): boolean {
  const raw = value[field];
  if (raw === undefined || raw === null) return true;
  if (typeof raw !== 'string' || raw.length > MAX_TEXT) {
    report(at(), `${named}: "${field}" must be a string of at most ${MAX_TEXT} characters, found ${typeName(raw)}`);
    return false;
  }
  into[field] = raw;
  return true;
}

function isPullNumber(v: unknown): v is number {
  return typeof v === 'number' && Number.isSafeInteger(v) && v > 0;
}

/** A level mark as a run line or mark line holds it. */
function decodeMark(raw: unknown, at: () => string, report: ProblemSink, named = 'the mark'): LevelMark | undefined {
  if (!isObject(raw)) {
    report(at(), `${named}: a mark must be an object, found ${typeName(raw)}`);
    return undefined;
  }
  if (raw.reason !== 'accepted' && raw.reason !== 'manual') {
    report(
      at(),
      `${named}: a mark's "reason" must be "accepted" or "manual", found ${JSON.stringify(raw.reason) ?? 'nothing'}`,
    );
    return undefined;
  }
  const mark: LevelMark = { reason: raw.reason };
  if (raw.metrics !== undefined) {
    if (!Array.isArray(raw.metrics) || !raw.metrics.every((g) => typeof g === 'string' && g !== '')) {
      report(at(), `${named}: a mark's "metrics" must be a list of metric name patterns`);
      return undefined;
    }
    mark.metrics = raw.metrics as string[];
  }
  if (raw.pr !== undefined) {
    if (!isPullNumber(raw.pr)) {
      report(at(), `${named}: a mark's "pr" must be a pull request number, found ${typeName(raw.pr)}`);
      return undefined;
    }
    mark.pr = raw.pr;
  }
  if (raw.note !== undefined) {
    if (typeof raw.note !== 'string' || raw.note.length > MAX_TEXT) {
      report(at(), `${named}: a mark's "note" must be a string of at most ${MAX_TEXT} characters`);
      return undefined;
    }
    mark.note = raw.note;
  }
  return mark;
}

/** The History the entries mean (see the rules at HISTORY_SCHEMA), newest `newest` runs only. */
function fold(header: Header, entries: Entry[], newest: number | undefined): Decoded {
  const byKey = new Map<string, Extract<Entry, { kind: 'run' }>>();
  const dropped = new Map<string, Tombstone>();
  const marks = new Map<string, LevelMark[]>();
  let countHint = 0;
  for (const e of entries) {
    if (e.kind === 'drop') dropped.set(e.tombstone.id, e.tombstone);
    else if (e.kind === 'mark') {
      const key = replacementKey(e.id);
      marks.set(key, mergeMarks(marks.get(key) ?? [], [e.mark]));
    } else {
      countHint = Math.max(countHint, e.n ?? 0);
      const key = replacementKey(e.info.id);
      // A level change stays at its CI run when a later attempt replaces the run that carried it.
      if (e.info.marks !== undefined) marks.set(key, mergeMarks(marks.get(key) ?? [], e.info.marks));
      const previous = byKey.get(key);
      if (previous === undefined || replaces(e.info.id, previous.info.id)) byKey.set(key, e);
    }
  }
  let kept = [...byKey.values()].filter((e) => !dropped.has(e.info.id));
  const keys = new Map(kept.map((e) => [e, timeKey(e.info)]));
  kept.sort((a, b) => compareKeyed(keys.get(a) as number, a.info, keys.get(b) as number, b.info));
  if (newest !== undefined) kept = kept.slice(Math.max(0, kept.length - newest));
  const runs = kept.map((e) => {
    const folded = marks.get(replacementKey(e.info.id));
    return folded === undefined ? e.info : { ...e.info, marks: folded };
  });
  const columns = new Map<string, MetricColumn>();
  header.metrics.forEach((metric, i) => {
    const values = new Array<number>(kept.length);
    let any = false;
    for (let r = 0; r < kept.length; r++) {
      const v = (kept[r] as { values: readonly unknown[] }).values[i];
      if (typeof v === 'number') {
        values[r] = v;
        any = true;
      } else values[r] = NaN;
    }
    if (any) columns.set(metric.name, metric.unit === undefined ? { values } : { unit: metric.unit, values });
  });
  return { history: { series: header.series, runs, columns, dropped }, header, countHint };
}

/** True when a run line with id `next` replaces one with id `previous` of the same key. */
export function replaces(next: string, previous: string): boolean {
  const a = attemptOf(next);
  const b = attemptOf(previous);
  // Same id: the later line. Attempts of one CI run: the higher attempt, whichever line came last.
  return a === undefined || b === undefined || a.attempt >= b.attempt;
}

// Numeric collation puts run "999-1" before "1000-1", as CI run ids grow. Made on first use.
let collator: Intl.Collator | undefined;
function compareKeyed(ta: number, a: RunInfo, tb: number, b: RunInfo): number {
  if (ta !== tb) return ta < tb ? -1 : 1;
  collator ??= new Intl.Collator('en', { numeric: true });
  return collator.compare(a.id, b.id);
}

/** The union of two lists of marks, each mark once (by its fields). */
export function mergeMarks(a: readonly LevelMark[], b: readonly LevelMark[]): LevelMark[] {
  const out = new Map<string, LevelMark>();
  for (const m of [...a, ...b]) out.set(markKey(m), m);
  return [...out.values()];
}

function markKey(m: LevelMark): string {
  return JSON.stringify([m.reason, m.metrics ?? null, m.pr ?? null, m.note ?? null]);
}

/** The header line (no newline). Metric order is value order; new metrics go at the end. */
export function headerLine(series: string, metrics: readonly HeaderMetric[]): string {
  return JSON.stringify({
    schema: HISTORY_SCHEMA,
    series,
    metrics: metrics.map((m) => (m.unit === undefined ? { name: m.name } : { name: m.name, unit: m.unit })),
  });
}

/**
 * One run's line (no newline): its fields in a fixed order, then `values` aligned with the header
 * (NaN written as null, trailing missing values left out), its marks, and the count hint `n`.
 */
export function runLine(info: RunInfo, values: readonly number[], n?: number): string {
  let last = values.length;
  while (last > 0 && Number.isNaN(values[last - 1])) last -= 1;
  const line: Record<string, unknown> = { id: info.id };
  for (const field of ['time', 'sha', 'ref', 'event', 'pr', 'runner'] as const) {
    if (info[field] !== undefined) line[field] = info[field];
  }
  // JSON.stringify writes NaN as null, which is exactly the "missing" marker.
  line.values = last === values.length ? values : values.slice(0, last);
  if (info.marks !== undefined && info.marks.length > 0) line.marks = info.marks.map(markFields);
  if (n !== undefined) line.n = n;
  return JSON.stringify(line);
}

/** A tombstone's line (no newline). */
export function dropLine(t: Tombstone): string {
  return JSON.stringify({
    drop: t.id,
    ...(t.time === undefined ? {} : { time: t.time }),
    ...(t.reason === undefined ? {} : { reason: t.reason }),
  });
}

/** A mark line (no newline): adds `mark` to the run `id`. */
export function markLine(id: string, mark: LevelMark): string {
  return JSON.stringify({ mark: id, ...markFields(mark) });
}

function markFields(m: LevelMark): Record<string, unknown> {
  const out: Record<string, unknown> = {};
  if (m.metrics !== undefined) out.metrics = m.metrics;
  out.reason = m.reason;
  if (m.pr !== undefined) out.pr = m.pr;
  if (m.note !== undefined) out.note = m.note;
  return out;
}

/**
 * Writes a History as a document (layout above): the header in column order, every tombstone,
 * then the runs oldest first with marks folded into their lines and count hints 1, 2, 3 ...
 * Throws InputError when the History is inconsistent (a column not aligned with the runs, an
 * infinite value, a duplicated run id), so a broken History is never stored.
 *
 * @example serializeHistory(emptyHistory('s')) // '{"schema":"bellgate.history/3","series":"s","metrics":[]}\n'
 */
export function serializeHistory(h: History): string {
  checkRuns(h);
  const columns = [...h.columns.entries()];
  for (const [name, column] of columns) checkStorable(h, name, column.values);
  const out: string[] = [
    headerLine(
      h.series,
      columns.map(([name, c]) => (c.unit === undefined ? { name } : { name, unit: c.unit })),
    ),
  ];
  for (const t of h.dropped?.values() ?? []) out.push(dropLine(t));
  const row = new Array<number>(columns.length);
  h.runs.forEach((run, r) => {
    for (let m = 0; m < columns.length; m++) row[m] = (columns[m] as [string, MetricColumn])[1].values[r] as number;
    out.push(runLine(run, row, r + 1));
  });
  return `${out.join('\n')}\n`;
}

const NOT_STORABLE_FIX = 'this is a bug in the code that built the history; please report it';
const storeWhere = (h: History): string => `history of series ${JSON.stringify(h.series)}`;

/**
 * The runs half of the check before storing: every run has an id and no id appears twice, and no
 * dropped run is among them. Throws InputError, so a broken History is never stored.
 */
export function checkRuns(h: History): void {
  const where = storeWhere(h);
  const ids = new Set<string>();
  for (const run of h.runs) {
    if (typeof run.id !== 'string' || run.id === '' || run.id.length > MAX_ID)
      throw new InputError(`a run needs an id of 1 to ${MAX_ID} characters to be stored`, {
        where,
        fix: NOT_STORABLE_FIX,
      });
    if (ids.has(run.id))
      throw new InputError(`run id ${JSON.stringify(run.id)} appears twice`, { where, fix: NOT_STORABLE_FIX });
    if (h.dropped?.has(run.id))
      throw new InputError(`run ${JSON.stringify(run.id)} was dropped and cannot be stored again`, {
        where,
        fix: NOT_STORABLE_FIX,
      });
    ids.add(run.id);
  }
}

/** The column half: one value per run, each a finite number or NaN (missing). Throws InputError. */
export function checkStorable(h: History, name: string, values: readonly number[]): void {
  if (values.length !== h.runs.length) {
    throw new InputError(`metric ${JSON.stringify(name)} has ${values.length} values for ${h.runs.length} runs`, {
      where: storeWhere(h),
      fix: NOT_STORABLE_FIX,
    });
  }
  for (const v of values) {
    if (v === Infinity || v === -Infinity || typeof v !== 'number') {
      throw new InputError(`metric ${JSON.stringify(name)} holds ${String(v)}, which cannot be stored`, {
        where: storeWhere(h),
        fix: NOT_STORABLE_FIX,
      });
    }
  }
}
