/**
 * The fast reader of a version-2 history document's bytes (document.ts has the layout).
 *
 * JSON.parse makes a heap object of every number in `metrics.values`, and collecting those objects
 * costs about as much again as parsing them; at 1,000 runs x 1,000 metrics that was most of a
 * check. This reader walks the bytes once: it finds `metrics.values`, reads its rows straight into
 * arrays of unboxed doubles (missing = NaN), and hands only the small rest of the document
 * (schema, series, runs, names, units) to JSON.parse with `"values":[]` in the rows' place.
 *
 * It is all or nothing: whenever the bytes stray from plain JSON of the expected shape (a syntax
 * error, a string or object inside a row, an escaped or repeated "metrics"/"values" key) it
 * returns undefined and the caller parses the whole text the ordinary way, which reports the
 * problem with its line and column. So it never changes what a document means, only how fast a
 * well-formed one is read.
 */

/** What scanHistoryBytes found: the parsed document (values already in place) and where the rows lie. */
export interface ScannedHistory {
  /** JSON.parse's result for the document, with `metrics.values` holding the scanned rows. */
  root: unknown;
  /** Byte offset of each row's closing `]`, aligned with the rows (lets an append splice text). */
  rowEnds: number[];
  /** Byte offsets of the values array: its `[` and one past its `]`. */
  valuesStart: number;
  valuesEnd: number;
  /**
   * True: every row is an array of doubles, each finite or NaN (a null), so a decoder has only
   * the rows' lengths left to check. False when some number overflowed (1e999 reads as Infinity).
   */
  finite: boolean;
}

const SPACE = 0x20,
  TAB = 0x09,
  LF = 0x0a,
  CR = 0x0d;
const QUOTE = 0x22,
  BACKSLASH = 0x5c,
  COMMA = 0x2c,
  COLON = 0x3a;
const OPEN_SQUARE = 0x5b,
  CLOSE_SQUARE = 0x5d,
  OPEN_CURLY = 0x7b,
  CLOSE_CURLY = 0x7d;
const MINUS = 0x2d,
  PLUS = 0x2b,
  DOT = 0x2e,
  ZERO = 0x30,
  NINE = 0x39,
  LOWER_E = 0x65,
  UPPER_E = 0x45;

/** Exact powers of ten: every 10^k with k <= 22 is a double without rounding. */
const EXACT_POWERS = Array.from({ length: 23 }, (_, k) => Number(`1e${k}`));

/** A checked JSON number is ASCII, so any single-byte decoder reads it. */
const ASCII = new TextDecoder('latin1');

const isSpace = (c: number): boolean => c === SPACE || c === LF || c === CR || c === TAB;

/** Fails the scan; the caller falls back to JSON.parse, which explains the problem. */
class NotPlain extends Error {}

/**
 * Reads a history document's bytes; undefined when they are not plain JSON of the version-2
 * shape (then parse the text with JSON.parse instead). Work: one pass over the bytes, no object
 * per value.
 * @example scanHistoryBytes(Buffer.from('{"schema":"bellgate.history/2","metrics":{"names":["a"],"values":[[1,null]]}}'))?.root
 * // { schema: 'bellgate.history/2', metrics: { names: ['a'], values: [[1, NaN]] } }
 */
export function scanHistoryBytes(bytes: Uint8Array): ScannedHistory | undefined {
  try {
    return scan(bytes);
  } catch (error) {
    if (error instanceof NotPlain) return undefined;
    throw error;
  }
}

function scan(bytes: Uint8Array): ScannedHistory | undefined {
  overflowed = false;
  const reader = new ByteReader(bytes);
  // A UTF-8 byte-order mark, which parseJsonText also skips.
  if (bytes[0] === 0xef && bytes[1] === 0xbb && bytes[2] === 0xbf) reader.at = 3;
  const bodyStart = reader.at;
  let found: { start: number; end: number; rows: number[][]; rowEnds: number[] } | undefined;
  reader.members((topKey) => {
    if (topKey !== 'metrics' || reader.peek() !== OPEN_CURLY) return reader.skipValue();
    if (found !== undefined) throw new NotPlain();
    reader.members((key) => {
      if (key !== 'values') return reader.skipValue();
      if (found !== undefined) throw new NotPlain();
      const start = reader.at;
      const { rows, rowEnds } = reader.rows();
      found = { start, end: reader.at, rows, rowEnds };
    });
  });
  reader.skipSpace();
  if (reader.at !== bytes.length || found === undefined) return undefined;
  const { start, end, rows, rowEnds } = found;
  const decoder = new TextDecoder();
  const rest = decoder.decode(bytes.subarray(bodyStart, start)) + '[]' + decoder.decode(bytes.subarray(end));
  let root: unknown;
  try {
    root = JSON.parse(rest);
  } catch {
    return undefined;
  }
  const metrics = (root as { metrics?: { values?: unknown } }).metrics;
  if (metrics === undefined || !Array.isArray(metrics.values) || metrics.values.length !== 0) return undefined;
  metrics.values = rows;
  return { root, rowEnds, valuesStart: start, valuesEnd: end, finite: !overflowed };
}

/** A cursor over the bytes, with just the steps the scan needs. Every step throws NotPlain on surprise. */
class ByteReader {
  at = 0;
  constructor(private readonly bytes: Uint8Array) {}

  peek(): number {
    this.skipSpace();
    return this.bytes[this.at] ?? -1;
  }

  skipSpace(): void {
    const b = this.bytes;
    let i = this.at;
    while (i < b.length && isSpace(b[i]!)) i++;
    this.at = i;
  }

  expect(c: number): void {
    if (this.peek() !== c) throw new NotPlain();
    this.at++;
  }

  /** Walks an object's members, calling `onMember(key)` with the cursor on each value (which it must consume). */
  members(onMember: (key: string) => void): void {
    this.expect(OPEN_CURLY);
    if (this.peek() === CLOSE_CURLY) {
      this.at++;
      return;
    }
    for (;;) {
      onMember(this.key());
      const c = this.peek();
      this.at++;
      if (c === CLOSE_CURLY) return;
      if (c !== COMMA) throw new NotPlain();
    }
  }

  /** A member's key and its colon. Keys with escapes are refused: they could spell "values" another way. */
  private key(): string {
    this.expect(QUOTE);
    const b = this.bytes;
    const start = this.at;
    let i = start;
    while (i < b.length && b[i] !== QUOTE) {
      if (b[i] === BACKSLASH) throw new NotPlain();
      i++;
    }
    if (i >= b.length) throw new NotPlain();
    this.at = i + 1;
    this.expect(COLON);
    this.skipSpace();
    return new TextDecoder().decode(b.subarray(start, i));
  }

  /** Moves past any value; its content is checked later by JSON.parse of the rest. */
  skipValue(): void {
    const b = this.bytes;
    this.skipSpace();
    let depth = 0;
    let i = this.at;
    for (;;) {
      if (i >= b.length) throw new NotPlain();
      const c = b[i]!;
      if (c === QUOTE) {
        // A string ends at the first quote no backslash escapes (\uXXXX holds neither). Read
        // here byte by byte: the header's strings are short (run ids, times, names), and a call
        // per string (indexOf) cost more than the steps it saved.
        i++;
        for (;;) {
          const s = b[i];
          if (s === undefined) throw new NotPlain();
          i++;
          if (s === QUOTE) break;
          if (s === BACKSLASH) i++;
        }
        if (depth === 0) break;
      } else if (c === OPEN_SQUARE || c === OPEN_CURLY) {
        depth++;
        i++;
      } else if (c === CLOSE_SQUARE || c === CLOSE_CURLY) {
        if (depth === 0) break;
        depth--;
        i++;
        if (depth === 0) break;
      } else if (depth === 0 && (c === COMMA || isSpace(c))) break;
      else i++;
    }
    this.at = i;
  }

  /** The values array: rows of numbers or null, each row read into an array of doubles. */
  rows(): { rows: number[][]; rowEnds: number[] } {
    const rows: number[][] = [];
    const rowEnds: number[] = [];
    this.expect(OPEN_SQUARE);
    if (this.peek() === CLOSE_SQUARE) {
      this.at++;
      return { rows, rowEnds };
    }
    // A small document is read before priming would pay for itself (600 calls of plainRow).
    if (this.bytes.length >= SCAN_FROM) primeScan();
    // Rows are as long as the runs table, so the first row's length sizes the others' arrays.
    let sizeHint = 0;
    for (;;) {
      this.expect(OPEN_SQUARE);
      // A copy of the previous row is an array of doubles of the right size: filling it stores
      // in place, where a new Array(n) would first hold tagged holes and be converted on the first double.
      // concat: one spare slot, so that a record appends its value to the row without a copy.
      let row = rows.length > 0 ? (rows[rows.length - 1] as number[]).concat(NaN) : noDoubles();
      let end = plainRow(this.bytes, this.at, row);
      if (end < 0) {
        row = readRow(this.bytes, this.at, sizeHint);
        end = rowEnd;
      }
      sizeHint = row.length;
      this.at = end + 1;
      rows.push(row);
      rowEnds.push(end);
      const c = this.peek();
      this.at++;
      if (c === CLOSE_SQUARE) return { rows, rowEnds };
      if (c !== COMMA) throw new NotPlain();
    }
  }
}

/**
 * Rows that take every path of plainRow: null, a minus, a leading zero, a whole number, a
 * fraction, a mantissa past 2^31 (double arithmetic from the start), an empty row, rows longer
 * and shorter than their array. In a Buffer, as a history
 * file's bytes are (V8 specializes the code to the kind of byte array it reads).
 */
const PRIMER_TEXT = '[1,-0.5,null,0,12.25,-3] [4,5.5] [6,-7,null,0.125,98765432101.5] []';
const PRIMER_ROWS = [1, 26, 34, 66];
/** V8 (Node 20) marks plainRow for optimizing after about 450 calls on these rows. */
const PRIMER_CALLS = 600;
/**
 * From this size on (about 70,000 values) a store reads a document with this reader, primed while
 * the file is read. A smaller one (a PR check's 100 x 50 history is 40 KB) is read faster by
 * JSON.parse than by this code before V8 has optimized it: 1.5 instead of 4 ms at 40 KB.
 */
export const SCAN_FROM = 512 * 1024;
let primed = false;

/**
 * Runs plainRow on a few rows of every form (PRIMER_TEXT), enough times for V8 to record what
 * each of its paths does and to start optimizing it; later calls do nothing. Why: the optimized
 * code is otherwise made while the first real rows are read, slowly (interpreted), and a path that
 * had not run by then (the first negative value, say) has no feedback, so that code is dropped
 * and made again (up to four compiles were seen). A store calls it while the file is being read,
 * so the priming (~1 ms) and the background compile overlap the read. scanHistoryBytes calls it
 * too. Measured on a cold 1,000 x 1,000 load (main-thread CPU, median of 8): 64 -> 51 ms.
 *
 * @example const reading = readFile(path); primeScan(); scanHistoryBytes(await reading);
 */
export function primeScan(): void {
  if (primed) return;
  primed = true;
  const bytes = Buffer.from(PRIMER_TEXT, 'latin1');
  for (let k = 0; k < PRIMER_CALLS; k++) {
    plainRow(bytes, PRIMER_ROWS[k % PRIMER_ROWS.length] as number, k % 2 === 0 ? [0.5] : noDoubles());
  }
}

/** An empty array that holds doubles (stores append to it without changing its kind). */
function noDoubles(): number[] {
  const row = [0.5];
  row.length = 0;
  return row;
}

/**
 * The common row, as Bellgate writes it: no spaces, numbers of at most 15 significant digits
 * without an exponent, and null. Reads it from just after its `[` into `row` (pre-sized; cut to
 * the count read) and returns the offset of its `]`, or -1 at the first byte outside that form —
 * the caller then reads the row again with readRow, which knows all of JSON's row syntax. Kept
 * apart and small because V8 compiles it in a few milliseconds: one cold run of the whole reader
 * at 1,000 x 1,000 went from ~100 to ~55 ms CPU. Values as readRow's fast path (Clinger 1990):
 * digits / 10^scale, both exact, one correctly rounded division.
 */
function plainRow(b: Uint8Array, start: number, row: number[]): number {
  const powers = EXACT_POWERS;
  let i = start;
  let k = 0;
  let c = b[i] as number;
  if (c === CLOSE_SQUARE) {
    row.length = 0;
    return i;
  }
  for (;;) {
    if (c === 0x6e) {
      if (b[i + 1] !== 0x75 || b[i + 2] !== 0x6c || b[i + 3] !== 0x6c) return -1;
      row[k++] = NaN;
      i += 4;
    } else {
      // The sign by arithmetic (i moves past a minus), so a first negative value finds no code
      // that has never run. Past the end of the bytes c is undefined, which every test refuses.
      const minus = c === MINUS ? 1 : 0;
      i += minus;
      c = b[i] as number;
      const lead = c;
      const whole = i;
      let mantissa = 0;
      while (c >= ZERO && c <= NINE) {
        mantissa = mantissa * 10 + (c - ZERO);
        c = b[++i] as number;
      }
      // Digits are counted by position, not by a counter per digit.
      let digits = i - whole;
      // JSON allows one leading zero only ("0", "0.5"; not "01"), and needs a digit.
      if (digits === 0 || (lead === ZERO && digits > 1)) return -1;
      let scale = 0;
      if (c === DOT) {
        const fraction = ++i;
        c = b[i] as number;
        while (c >= ZERO && c <= NINE) {
          mantissa = mantissa * 10 + (c - ZERO);
          c = b[++i] as number;
        }
        scale = i - fraction;
        if (scale === 0) return -1;
        digits += scale;
      }
      if (digits > 15 || c === LOWER_E || c === UPPER_E) return -1;
      // powers[0] is 1, so a whole number takes the same (exact) division.
      row[k++] = (1 - 2 * minus) * (mantissa / (powers[scale] as number));
    }
    c = b[i] as number;
    if (c === COMMA) {
      c = b[++i] as number;
      continue;
    }
    if (c !== CLOSE_SQUARE) return -1;
    if (k !== row.length) row.length = k;
    return i;
  }
}

/** Set when readRow read a number too large for a double (Infinity); reset by each scan. */
let overflowed = false;

/** Where readRow found its row's `]` (a module variable, so the hot loop returns no object). */
let rowEnd = 0;

/**
 * One row from just after its `[`: numbers and nulls (as NaN) into an array of doubles, stored by
 * index into an array sized by `sizeHint` (stores into a pre-sized array beat push). Sets rowEnd.
 */
function readRow(b: Uint8Array, start: number, sizeHint: number): number[] {
  const row: number[] = new Array<number>(sizeHint);
  let k = 0;
  let i = start;
  const end = b.length;
  let c = i < end ? b[i]! : -1;
  while (c === SPACE || c === LF || c === CR || c === TAB) c = ++i < end ? b[i]! : -1;
  if (c === CLOSE_SQUARE) {
    rowEnd = i;
    row.length = 0;
    return row;
  }
  for (;;) {
    if (c === 0x6e) {
      // null
      if (b[i + 1] !== 0x75 || b[i + 2] !== 0x6c || b[i + 3] !== 0x6c) throw new NotPlain();
      row[k++] = NaN;
      i += 4;
    } else {
      // A JSON number. Up to 15 significant digits and no exponent, the value is digits / 10^scale:
      // both are exact doubles, so the one division rounds correctly (Clinger 1990, "How to read
      // floating point numbers accurately", the fast path). Anything else goes to Number(), which
      // rounds correctly too.
      const first = i;
      const negative = c === MINUS;
      if (negative) c = ++i < end ? b[i]! : -1;
      let digits = 0;
      let mantissa = 0;
      let scale = 0;
      if (c === ZERO) c = ++i < end ? b[i]! : -1;
      else if (c > ZERO && c <= NINE) {
        do {
          mantissa = mantissa * 10 + (c - ZERO);
          digits++;
          c = ++i < end ? b[i]! : -1;
        } while (c >= ZERO && c <= NINE);
      } else throw new NotPlain();
      if (c === DOT) {
        c = ++i < end ? b[i]! : -1;
        if (!(c >= ZERO && c <= NINE)) throw new NotPlain();
        do {
          mantissa = mantissa * 10 + (c - ZERO);
          digits++;
          scale++;
          c = ++i < end ? b[i]! : -1;
        } while (c >= ZERO && c <= NINE);
      }
      let exact = digits <= 15 && scale <= 22;
      if (c === LOWER_E || c === UPPER_E) {
        exact = false;
        c = ++i < end ? b[i]! : -1;
        if (c === PLUS || c === MINUS) c = ++i < end ? b[i]! : -1;
        if (!(c >= ZERO && c <= NINE)) throw new NotPlain();
        do c = ++i < end ? b[i]! : -1;
        while (c >= ZERO && c <= NINE);
      }
      if (exact) {
        const magnitude = scale === 0 ? mantissa : mantissa / EXACT_POWERS[scale]!;
        row[k++] = negative ? -magnitude : magnitude;
      } else {
        const value = Number(ASCII.decode(b.subarray(first, i)));
        if (value - value !== 0) overflowed = true;
        row[k++] = value;
      }
    }
    c = i < end ? b[i]! : -1;
    while (c === SPACE || c === LF || c === CR || c === TAB) c = ++i < end ? b[i]! : -1;
    if (c === CLOSE_SQUARE) break;
    if (c !== COMMA) throw new NotPlain();
    c = ++i < end ? b[i]! : -1;
    while (c === SPACE || c === LF || c === CR || c === TAB) c = ++i < end ? b[i]! : -1;
  }
  rowEnd = i;
  if (k !== row.length) row.length = k;
  return row;
}
