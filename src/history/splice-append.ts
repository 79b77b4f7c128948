import { checkRuns, checkStorable, HISTORY_TAIL, historyHead, type ValueRows } from './document.js';
import type { History, RunInfo } from './history.js';
import { scanHistoryBytes } from './values-scan.js';

/**
 * A document as read: its bytes, where its values rows lie, and what was decoded from them — the
 * run ids and each metric's row number and value array (taken at load, so a later change to the
 * History's Map cannot misplace a row; the entries they held at load are never changed, though an
 * append may extend them in place: see appendRun's extendInPlace).
 */
export interface WrittenHistory {
  bytes: Uint8Array;
  /** Undefined when the document was parsed whole (JSON.parse): spliceHistory then scans the bytes for them. */
  rows: ValueRows | undefined;
  runIds: readonly string[];
  columns: ReadonlyMap<string, { index: number; values: readonly number[] }>;
}

/**
 * What spliceHistory needs to know of a document parseHistoryBytes read (bytes, rows) into `history`.
 * Without `rows` (a small document parsed whole) they are found by a scan if a splice is asked for.
 *
 * @example const { history, rows } = parseHistoryBytes(bytes, path); written = writtenHistory(bytes, rows, history);
 */
export function writtenHistory(bytes: Uint8Array, rows: ValueRows | undefined, history: History): WrittenHistory {
  const columns = new Map<string, { index: number; values: readonly number[] }>();
  for (const [name, column] of history.columns) columns.set(name, { index: columns.size, values: column.values });
  return { bytes, rows, runIds: history.runs.map((r) => r.id), columns };
}

/** Where the rows of a document lie, by the byte reader; undefined when it declines the bytes. */
function scannedRows(bytes: Uint8Array): ValueRows | undefined {
  const scanned = scanHistoryBytes(bytes);
  return scanned === undefined ? undefined : { valuesStart: scanned.valuesStart, rowEnds: scanned.rowEnds };
}

const COMMA = 0x2c;
const OPEN_SQUARE = 0x5b;

/** One values row of the output: copied bytes [from, to) of the old document, then `tail`; or fresh text. */
type Row = { from: number; to: number; tail: string } | string;

/**
 * serializeHistory(h) for the usual record — `h` is the history decoded from `written` with runs
 * appended at the end and possibly the oldest runs dropped (trimHistory) — without writing a
 * million numbers again: each values row whose kept values are exactly the old row's (same
 * doubles, NaN for NaN) is the old row's bytes, less the dropped leading entries, plus the new
 * values; the small head (runs, names, units) is written fresh. A row that differs in any way
 * (a new metric, a replaced run, a -0 the generic writer would print as 0) is written fresh.
 * The result parses to exactly what serializeHistory(h) parses to (test/history/splice-append.test.ts).
 * Returns undefined when the runs do not line up that way (reordered, merged, all dropped);
 * the caller then uses serializeHistory. Cost: one comparison per kept value and a copy of the bytes.
 * Throws InputError as serializeHistory does for a History that cannot be stored.
 *
 * @example spliceHistory(appendRun(history, info, run), writtenHistory(bytes, rows, history)) ?? serializeHistory(next)
 */
export function spliceHistory(h: History, written: WrittenHistory): Buffer | undefined {
  checkRuns(h);
  const { bytes, runIds, columns: baseRows } = written;
  const where = written.rows ?? scannedRows(bytes);
  if (where === undefined) return undefined;
  const drop = h.runs.length === 0 ? -1 : runIds.indexOf((h.runs[0] as RunInfo).id);
  const kept = runIds.length - drop;
  if (drop < 0 || kept > h.runs.length || baseRows.size !== where.rowEnds.length) return undefined;
  for (let i = 0; i < kept; i++) if ((h.runs[i] as RunInfo).id !== runIds[drop + i]) return undefined;

  const rows: Row[] = [];
  for (const [name, column] of h.columns) {
    const values = column.values;
    const old = baseRows.get(name);
    const from =
      old !== undefined && keepsOld(values, old.values, drop, kept)
        ? rowBody(bytes, where, old.index, drop)
        : undefined;
    if (from === undefined) {
      checkStorable(h, name, values);
      rows.push(JSON.stringify(values));
      continue;
    }
    checkStorable(h, name, values, kept);
    let tail = '';
    for (let i = kept; i < values.length; i++) tail += values[i] === values[i] ? `,${values[i]}` : ',null';
    rows.push({ from, to: where.rowEnds[(old as { index: number }).index] as number, tail: `${tail}]` });
  }
  return assemble(historyHead(h), rows, bytes);
}

/**
 * True when values[0, kept) are old[drop, drop + kept) exactly, none of them -0 (the bytes might
 * say "-0" where serializeHistory writes 0), and values holds no fewer entries than that.
 */
function keepsOld(values: readonly number[], old: readonly number[], drop: number, kept: number): boolean {
  if (values.length < kept) return false;
  for (let i = 0; i < kept; i++) {
    const x = values[i];
    const y = old[drop + i] as number;
    if (x === y) {
      if (y === 0 && 1 / y < 0) return false;
    } else if (x === x || y === y) return false;
  }
  return true;
}

/**
 * The offset where row `index`'s kept entries begin, just after its `[` when nothing is dropped,
 * else just after the drop-th comma (a row holds only numbers and null, so every comma separates
 * entries). A leading "[" is written by assemble. Undefined when the row has too few entries.
 */
function rowBody(bytes: Uint8Array, where: ValueRows, index: number, drop: number): number | undefined {
  const end = where.rowEnds[index] as number;
  let at = byteAfter(
    bytes,
    OPEN_SQUARE,
    index === 0 ? where.valuesStart + 1 : (where.rowEnds[index - 1] as number) + 1,
    end,
  );
  for (let d = 0; d < drop && at > 0; d++) at = byteAfter(bytes, COMMA, at, end);
  return at > 0 ? at : undefined;
}

/**
 * The offset just past the first `byte` in bytes[from, end), or 0 when there is none. A plain loop:
 * the byte is a few steps away, where a Buffer indexOf call per row costs more than the search.
 */
function byteAfter(bytes: Uint8Array, byte: number, from: number, end: number): number {
  for (let i = from; i < end; i++) if (bytes[i] === byte) return i + 1;
  return 0;
}

/** head + "[" row "]" joined by ",\n" + HISTORY_TAIL, into one buffer. Rows are ASCII; the head may not be. */
function assemble(head: string, rows: Row[], bytes: Uint8Array): Buffer {
  let size = Buffer.byteLength(head) + HISTORY_TAIL.length + Math.max(0, rows.length - 1) * 2;
  for (const row of rows) size += typeof row === 'string' ? row.length : 1 + row.to - row.from + row.tail.length;
  const out = Buffer.allocUnsafe(size);
  let at = out.write(head, 0, 'utf8');
  // Byte by byte for the short pieces: a Buffer.write or a subarray per row costs more than it copies.
  const ascii = (text: string): void => {
    for (let j = 0; j < text.length; j++) out[at++] = text.charCodeAt(j);
  };
  const source = new Uint8Array(bytes.buffer, bytes.byteOffset, bytes.byteLength);
  for (let i = 0; i < rows.length; i++) {
    const row = rows[i] as Row;
    if (i > 0) ascii(',\n');
    if (typeof row === 'string') at += out.write(row, at, 'latin1');
    else {
      out[at++] = OPEN_SQUARE;
      out.set(source.subarray(row.from, row.to), at);
      at += row.to - row.from;
      ascii(row.tail);
    }
  }
  ascii(HISTORY_TAIL);
  return at === size ? out : out.subarray(0, at);
}
