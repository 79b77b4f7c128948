export const id = 614;
export const ids = [614];
export const modules = {

/***/ 5450:
/***/ ((__unused_webpack_module, __webpack_exports__, __webpack_require__) => {

/* harmony export */ __webpack_require__.d(__webpack_exports__, {
/* harmony export */   o: () => (/* binding */ resolvePath)
/* harmony export */ });
/* harmony import */ var node_path__WEBPACK_IMPORTED_MODULE_0__ = __webpack_require__(6760);
/* harmony import */ var node_path__WEBPACK_IMPORTED_MODULE_0___default = /*#__PURE__*/__webpack_require__.n(node_path__WEBPACK_IMPORTED_MODULE_0__);

/**
 * A user-given path, resolved against the CLI's working folder (not the process's, so in-process
 * callers and tests can point the CLI anywhere).
 * @example resolvePath(ctx, 'out/report.json') // '/repo/out/report.json' when ctx.io.cwd is '/repo'
 */
function resolvePath(ctx, path) {
    return (0,node_path__WEBPACK_IMPORTED_MODULE_0__.isAbsolute)(path) ? path : (0,node_path__WEBPACK_IMPORTED_MODULE_0__.resolve)(ctx.io.cwd, path);
}


/***/ }),

/***/ 3557:
/***/ ((__unused_webpack_module, __webpack_exports__, __webpack_require__) => {


// EXPORTS
__webpack_require__.d(__webpack_exports__, {
  Z_: () => (/* binding */ HISTORY_SCHEMA_V1),
  Y_: () => (/* binding */ HISTORY_TAIL),
  l4: () => (/* binding */ checkRuns),
  zz: () => (/* binding */ checkStorable),
  q0: () => (/* binding */ decodeHistoryDocument),
  Td: () => (/* binding */ historyHead),
  i6: () => (/* binding */ parseHistory),
  pL: () => (/* binding */ parseHistoryBytes),
  ph: () => (/* binding */ serializeHistory)
});

// UNUSED EXPORTS: HISTORY_SCHEMA

// EXTERNAL MODULE: ./src/model/input-error.ts
var input_error = __webpack_require__(8250);
// EXTERNAL MODULE: ./src/history/problems.ts
var problems = __webpack_require__(7326);
;// CONCATENATED MODULE: ./src/history/decode-v2.ts

/** The optional text columns of the runs table, in the order they are written. */
const RUN_FIELDS = ['sha', 'ref', 'event', 'time'];
/**
 * Decodes a parsed version-2 document (see document.ts for the layout) into a History.
 * Fast on purpose: the value columns JSON.parse made are reused as the History's columns, and
 * one pass per column checks each entry and turns null (missing) into NaN — no object per value.
 * Every problem goes to `report` with its JSON path; when `report` returns (verify mode), the bad
 * entry becomes NaN and decoding carries on. Returns undefined when the shape is beyond use.
 *
 * @example decodeV2(JSON.parse(text), throwingSink('h.json')) // { series, runs, columns }
 */
function decodeV2(root, report) {
    const series = typeof root.series === 'string' ? root.series : '';
    if (typeof root.series !== 'string')
        report('series', `series must be a string, found ${(0,problems/* typeName */.go)(root.series)}`);
    const runs = decodeRuns(root.runs, report);
    if (!runs)
        return undefined;
    const columns = decodeMetrics(root.metrics, runs.length, report);
    if (!columns)
        return undefined;
    return { series, runs, columns };
}
function decodeRuns(table, report) {
    if (!(0,problems/* isObject */.Gv)(table)) {
        report('runs', `runs must be an object of columns {id, ${RUN_FIELDS.join(', ')}}, found ${(0,problems/* typeName */.go)(table)}`);
        return undefined;
    }
    const ids = table.id;
    if (!Array.isArray(ids)) {
        report('runs.id', `runs.id must be an array of run ids, found ${(0,problems/* typeName */.go)(ids)}`);
        return undefined;
    }
    const first = new Map();
    const runs = ids.map((id, i) => {
        if (typeof id !== 'string' || id === '') {
            report((0,problems.at)('runs.id', i), `a run id must be a non-empty string, found ${(0,problems/* typeName */.go)(id)}`);
            return { id: `#${i}` };
        }
        const earlier = first.get(id);
        if (earlier !== undefined) {
            report((0,problems.at)('runs.id', i), `run id ${JSON.stringify(id)} appears twice (also runs.id[${earlier}])`, 'keep one copy of the run; each run id may appear once per series');
        }
        else
            first.set(id, i);
        return { id };
    });
    for (const field of RUN_FIELDS) {
        const column = table[field];
        if (column === undefined)
            continue;
        const path = `runs.${field}`;
        if (!Array.isArray(column) || column.length !== runs.length) {
            report(path, `${path} must be an array as long as runs.id (${runs.length}), found ${lengthOrType(column)}`);
            continue;
        }
        column.forEach((text, i) => {
            if (typeof text === 'string')
                runs[i][field] = text;
            else if (text !== null)
                report((0,problems.at)(path, i), `${field} must be a string or null, found ${(0,problems/* typeName */.go)(text)}`);
        });
    }
    return runs;
}
function decodeMetrics(table, runCount, report) {
    if (!(0,problems/* isObject */.Gv)(table)) {
        report('metrics', `metrics must be an object {names, units, values}, found ${(0,problems/* typeName */.go)(table)}`);
        return undefined;
    }
    const { names, units, values } = table;
    if (!Array.isArray(names)) {
        report('metrics.names', `metrics.names must be an array of metric names, found ${(0,problems/* typeName */.go)(names)}`);
        return undefined;
    }
    if (!Array.isArray(values) || values.length !== names.length) {
        report('metrics.values', `metrics.values must hold one column per name (${names.length}), found ${lengthOrType(values)}`);
        return undefined;
    }
    const unitsOk = units === undefined || (Array.isArray(units) && units.length === names.length);
    if (!unitsOk)
        report('metrics.units', `metrics.units must be as long as metrics.names (${names.length}), found ${lengthOrType(units)}`);
    const columns = new Map();
    for (let m = 0; m < names.length; m++) {
        const name = names[m];
        if (typeof name !== 'string') {
            report((0,problems.at)('metrics.names', m), `a metric name must be a string, found ${(0,problems/* typeName */.go)(name)}`);
            continue;
        }
        if (columns.has(name)) {
            report((0,problems.at)('metrics.names', m), `metric ${JSON.stringify(name)} appears twice in metrics.names`, 'merge the two columns into one');
            continue;
        }
        const column = checkColumn(values[m], m, runCount, report);
        if (!column)
            continue;
        const unit = unitsOk && units !== undefined ? units[m] : null;
        if (typeof unit === 'string')
            columns.set(name, { unit, values: column });
        else {
            if (unit !== null)
                report((0,problems.at)('metrics.units', m), `a unit must be a string or null, found ${(0,problems/* typeName */.go)(unit)}`);
            columns.set(name, { values: column });
        }
    }
    return columns;
}
/**
 * Checks one value column in place, in one tight pass: numbers stay, null becomes NaN, anything
 * else is reported. NaN is already "missing": scanHistoryBytes reads null as NaN (JSON.parse never
 * makes one). Rows the scan read are arrays of doubles, so the usual pass only compares numbers.
 */
function checkColumn(column, m, runCount, report) {
    if (!Array.isArray(column) || column.length !== runCount) {
        report((0,problems.at)('metrics.values', m), `each value column must hold one entry per run (${runCount}), found ${lengthOrType(column)}`, 'the columns are ragged: a column was cut or extended by hand; restore the document from a backup');
        return undefined;
    }
    const cells = column;
    for (let r = 0; r < runCount; r++) {
        const v = cells[r];
        // v - v is 0 for every finite number, NaN for NaN and the infinities.
        if (typeof v === 'number') {
            if (v - v !== 0 && v === v)
                badCell(cells, m, r, `value ${v} is not finite (an overflowing number such as 1e999?)`, report);
        }
        else if (v === null)
            cells[r] = NaN;
        else
            badCell(cells, m, r, `a value must be a number or null (missing), found ${(0,problems/* typeName */.go)(v)}`, report);
    }
    return cells;
}
/** Reports a bad entry (JSON.parse turns an overflowing literal such as 1e999 into Infinity) and makes it missing. */
function badCell(cells, m, r, problem, report) {
    report((0,problems.at)((0,problems.at)('metrics.values', m), r), problem);
    cells[r] = NaN;
}
function lengthOrType(value) {
    return Array.isArray(value) ? `${value.length} entries` : (0,problems/* typeName */.go)(value);
}

;// CONCATENATED MODULE: ./src/history/decode-v1.ts


/**
 * Decodes a parsed version-1 document — the earlier, per-run form, read for migration and never
 * written: `{"schema": "bellgate.history/1", "series": "...", "runs": [{"id", "sha", "ref", "event",
 * "time", "values": {"name": number | null}, "units": {"name": "unit"}}]}`.
 * Metric columns appear in the order their names are first met; a run without a name is NaN there.
 * Names are read with Object.keys (JSON.parse makes "__proto__" an own key) into a Map.
 * Problems go to `report` with JSON paths; returns undefined when the shape is beyond use.
 *
 * @example decodeV1({ schema: 'bellgate.history/1', series: 's', runs: [] }, sink) // empty History
 */
function decodeV1(root, report) {
    const series = typeof root.series === 'string' ? root.series : '';
    if (typeof root.series !== 'string')
        report('series', `series must be a string, found ${(0,problems/* typeName */.go)(root.series)}`);
    const list = root.runs;
    if (!Array.isArray(list)) {
        report('runs', `runs must be an array of run objects, found ${(0,problems/* typeName */.go)(list)}`);
        return undefined;
    }
    const runs = [];
    const columns = new Map();
    const first = new Map();
    list.forEach((entry, r) => {
        const path = (0,problems.at)('runs', r);
        const info = { id: `#${r}` };
        runs.push(info);
        if (!(0,problems/* isObject */.Gv)(entry)) {
            report(path, `a run must be an object, found ${(0,problems/* typeName */.go)(entry)}`);
            return;
        }
        if (typeof entry.id !== 'string' || entry.id === '') {
            report(`${path}.id`, `a run id must be a non-empty string, found ${(0,problems/* typeName */.go)(entry.id)}`);
        }
        else {
            info.id = entry.id;
            const earlier = first.get(entry.id);
            if (earlier === undefined)
                first.set(entry.id, r);
            else
                report(`${path}.id`, `run id ${JSON.stringify(entry.id)} appears twice (also runs[${earlier}])`, 'keep one copy of the run; each run id may appear once per series');
        }
        for (const field of RUN_FIELDS) {
            const text = entry[field];
            if (typeof text === 'string')
                info[field] = text;
            else if (text !== undefined && text !== null)
                report(`${path}.${field}`, `${field} must be a string, found ${(0,problems/* typeName */.go)(text)}`);
        }
        readValues(entry, path, r, list.length, columns, report);
    });
    return { series, runs, columns };
}
function readValues(entry, path, r, runCount, columns, report) {
    const { values, units } = entry;
    if (units !== undefined && !(0,problems/* isObject */.Gv)(units))
        report(`${path}.units`, `units must be an object of name -> unit, found ${(0,problems/* typeName */.go)(units)}`);
    if (!(0,problems/* isObject */.Gv)(values)) {
        report(`${path}.values`, `values must be an object of name -> number, found ${(0,problems/* typeName */.go)(values)}`);
        return;
    }
    for (const name of Object.keys(values)) {
        const v = values[name];
        let column = columns.get(name);
        if (!column) {
            column = { values: new Array(runCount).fill(NaN) };
            columns.set(name, column);
        }
        if (typeof v === 'number' && Number.isFinite(v))
            column.values[r] = v;
        else if (v !== null)
            report((0,problems/* key */.Eb)(`${path}.values`, name), `a value must be a finite number or null, found ${(0,problems/* typeName */.go)(v)}`);
        const unit = (0,problems/* isObject */.Gv)(units) && Object.hasOwn(units, name) ? units[name] : undefined;
        if (typeof unit === 'string')
            column.unit = unit;
        else if (unit !== undefined && unit !== null)
            report((0,problems/* key */.Eb)(`${path}.units`, name), `a unit must be a string, found ${(0,problems/* typeName */.go)(unit)}`);
    }
}

// EXTERNAL MODULE: ./src/history/json-text.ts
var json_text = __webpack_require__(7670);
;// CONCATENATED MODULE: ./src/history/values-scan.ts
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
const SPACE = 0x20, TAB = 0x09, LF = 0x0a, CR = 0x0d;
const QUOTE = 0x22, BACKSLASH = 0x5c, COMMA = 0x2c, COLON = 0x3a;
const OPEN_SQUARE = 0x5b, CLOSE_SQUARE = 0x5d, OPEN_CURLY = 0x7b, CLOSE_CURLY = 0x7d;
const MINUS = 0x2d, PLUS = 0x2b, DOT = 0x2e, ZERO = 0x30, NINE = 0x39, LOWER_E = 0x65, UPPER_E = 0x45;
/** Exact powers of ten: every 10^k with k <= 22 is a double without rounding. */
const EXACT_POWERS = Array.from({ length: 23 }, (_, k) => Number(`1e${k}`));
/** A checked JSON number is ASCII, so any single-byte decoder reads it. */
const ASCII = new TextDecoder('latin1');
const isSpace = (c) => c === SPACE || c === LF || c === CR || c === TAB;
/** Fails the scan; the caller falls back to JSON.parse, which explains the problem. */
class NotPlain extends Error {
}
/**
 * Reads a history document's bytes; undefined when they are not plain JSON of the version-2
 * shape (then parse the text with JSON.parse instead). Work: one pass over the bytes, no object
 * per value.
 * @example scanHistoryBytes(Buffer.from('{"schema":"bellgate.history/2","metrics":{"names":["a"],"values":[[1,null]]}}'))?.root
 * // { schema: 'bellgate.history/2', metrics: { names: ['a'], values: [[1, NaN]] } }
 */
function scanHistoryBytes(bytes) {
    try {
        return scan(bytes);
    }
    catch (error) {
        if (error instanceof NotPlain)
            return undefined;
        throw error;
    }
}
function scan(bytes) {
    const reader = new ByteReader(bytes);
    // A UTF-8 byte-order mark, which parseJsonText also skips.
    if (bytes[0] === 0xef && bytes[1] === 0xbb && bytes[2] === 0xbf)
        reader.at = 3;
    const bodyStart = reader.at;
    let found;
    reader.members((topKey) => {
        if (topKey !== 'metrics' || reader.peek() !== OPEN_CURLY)
            return reader.skipValue();
        if (found !== undefined)
            throw new NotPlain();
        reader.members((key) => {
            if (key !== 'values')
                return reader.skipValue();
            if (found !== undefined)
                throw new NotPlain();
            const start = reader.at;
            const { rows, rowEnds } = reader.rows();
            found = { start, end: reader.at, rows, rowEnds };
        });
    });
    reader.skipSpace();
    if (reader.at !== bytes.length || found === undefined)
        return undefined;
    const { start, end, rows, rowEnds } = found;
    const decoder = new TextDecoder();
    const rest = decoder.decode(bytes.subarray(bodyStart, start)) + '[]' + decoder.decode(bytes.subarray(end));
    let root;
    try {
        root = JSON.parse(rest);
    }
    catch {
        return undefined;
    }
    const metrics = root.metrics;
    if (metrics === undefined || !Array.isArray(metrics.values) || metrics.values.length !== 0)
        return undefined;
    metrics.values = rows;
    return { root, rowEnds, valuesStart: start, valuesEnd: end };
}
/** A cursor over the bytes, with just the steps the scan needs. Every step throws NotPlain on surprise. */
class ByteReader {
    bytes;
    at = 0;
    constructor(bytes) {
        this.bytes = bytes;
    }
    peek() {
        this.skipSpace();
        return this.bytes[this.at] ?? -1;
    }
    skipSpace() {
        const b = this.bytes;
        let i = this.at;
        while (i < b.length && isSpace(b[i]))
            i++;
        this.at = i;
    }
    expect(c) {
        if (this.peek() !== c)
            throw new NotPlain();
        this.at++;
    }
    /** Walks an object's members, calling `onMember(key)` with the cursor on each value (which it must consume). */
    members(onMember) {
        this.expect(OPEN_CURLY);
        if (this.peek() === CLOSE_CURLY) {
            this.at++;
            return;
        }
        for (;;) {
            onMember(this.key());
            const c = this.peek();
            this.at++;
            if (c === CLOSE_CURLY)
                return;
            if (c !== COMMA)
                throw new NotPlain();
        }
    }
    /** A member's key and its colon. Keys with escapes are refused: they could spell "values" another way. */
    key() {
        this.expect(QUOTE);
        const b = this.bytes;
        const start = this.at;
        let i = start;
        while (i < b.length && b[i] !== QUOTE) {
            if (b[i] === BACKSLASH)
                throw new NotPlain();
            i++;
        }
        if (i >= b.length)
            throw new NotPlain();
        this.at = i + 1;
        this.expect(COLON);
        this.skipSpace();
        return new TextDecoder().decode(b.subarray(start, i));
    }
    /** Moves past any value; its content is checked later by JSON.parse of the rest. */
    skipValue() {
        const b = this.bytes;
        this.skipSpace();
        let depth = 0;
        let i = this.at;
        for (;;) {
            if (i >= b.length)
                throw new NotPlain();
            const c = b[i];
            if (c === QUOTE) {
                // A string ends at the first quote no backslash escapes (\uXXXX holds neither).
                i = stringEnd(b, i + 1);
                if (depth === 0)
                    break;
            }
            else if (c === OPEN_SQUARE || c === OPEN_CURLY) {
                depth++;
                i++;
            }
            else if (c === CLOSE_SQUARE || c === CLOSE_CURLY) {
                if (depth === 0)
                    break;
                depth--;
                i++;
                if (depth === 0)
                    break;
            }
            else if (depth === 0 && (c === COMMA || isSpace(c)))
                break;
            else
                i++;
        }
        this.at = i;
    }
    /** The values array: rows of numbers or null, each row read into an array of doubles. */
    rows() {
        const rows = [];
        const rowEnds = [];
        this.expect(OPEN_SQUARE);
        if (this.peek() === CLOSE_SQUARE) {
            this.at++;
            return { rows, rowEnds };
        }
        // Rows are as long as the runs table, so the first row's length sizes the others' arrays.
        let sizeHint = 0;
        for (;;) {
            this.expect(OPEN_SQUARE);
            // A copy of the previous row is an array of doubles of the right size: filling it stores
            // in place, where a new Array(n) would first hold tagged holes and be converted on the first double.
            let row = rows.length > 0 ? rows[rows.length - 1].slice() : [];
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
            if (c === CLOSE_SQUARE)
                return { rows, rowEnds };
            if (c !== COMMA)
                throw new NotPlain();
        }
    }
}
/**
 * The offset just past the closing quote of a string whose content starts at `from`. A quote
 * closes it unless an odd run of backslashes precedes it (\\uXXXX holds neither); indexOf keeps
 * the long id and name lists of the header from costing a step per byte.
 */
function stringEnd(b, from) {
    for (let i = b.indexOf(QUOTE, from); i >= 0; i = b.indexOf(QUOTE, i + 1)) {
        let slashes = 0;
        while (b[i - 1 - slashes] === BACKSLASH)
            slashes++;
        if (slashes % 2 === 0)
            return i + 1;
    }
    throw new NotPlain();
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
function plainRow(b, start, row) {
    let i = start;
    let k = 0;
    let c = b[i];
    if (c === CLOSE_SQUARE) {
        row.length = 0;
        return i;
    }
    for (;;) {
        if (c === 0x6e) {
            if (b[i + 1] !== 0x75 || b[i + 2] !== 0x6c || b[i + 3] !== 0x6c)
                return -1;
            row[k++] = NaN;
            i += 4;
        }
        else {
            let negative = false;
            if (c === MINUS) {
                negative = true;
                c = b[++i];
            }
            let mantissa = 0;
            let digits = 0;
            let scale = 0;
            // Past the end of the bytes c is undefined, which every comparison below refuses.
            if (c === ZERO)
                c = b[++i];
            else if (c !== undefined && c > ZERO && c <= NINE) {
                do {
                    mantissa = mantissa * 10 + (c - ZERO);
                    digits++;
                    c = b[++i];
                } while (c !== undefined && c >= ZERO && c <= NINE);
            }
            else
                return -1;
            if (c === DOT) {
                c = b[++i];
                if (c === undefined || c < ZERO || c > NINE)
                    return -1;
                do {
                    mantissa = mantissa * 10 + (c - ZERO);
                    digits++;
                    scale++;
                    c = b[++i];
                } while (c !== undefined && c >= ZERO && c <= NINE);
            }
            if (digits > 15 || c === LOWER_E || c === UPPER_E)
                return -1;
            const magnitude = scale === 0 ? mantissa : mantissa / EXACT_POWERS[scale];
            row[k++] = negative ? -magnitude : magnitude;
        }
        c = b[i];
        if (c === COMMA) {
            c = b[++i];
            continue;
        }
        if (c !== CLOSE_SQUARE)
            return -1;
        if (k !== row.length)
            row.length = k;
        return i;
    }
}
/** Where readRow found its row's `]` (a module variable, so the hot loop returns no object). */
let rowEnd = 0;
/**
 * One row from just after its `[`: numbers and nulls (as NaN) into an array of doubles, stored by
 * index into an array sized by `sizeHint` (stores into a pre-sized array beat push). Sets rowEnd.
 */
function readRow(b, start, sizeHint) {
    const row = new Array(sizeHint);
    let k = 0;
    let i = start;
    const end = b.length;
    let c = i < end ? b[i] : -1;
    while (c === SPACE || c === LF || c === CR || c === TAB)
        c = ++i < end ? b[i] : -1;
    if (c === CLOSE_SQUARE) {
        rowEnd = i;
        row.length = 0;
        return row;
    }
    for (;;) {
        if (c === 0x6e) {
            // null
            if (b[i + 1] !== 0x75 || b[i + 2] !== 0x6c || b[i + 3] !== 0x6c)
                throw new NotPlain();
            row[k++] = NaN;
            i += 4;
        }
        else {
            // A JSON number. Up to 15 significant digits and no exponent, the value is digits / 10^scale:
            // both are exact doubles, so the one division rounds correctly (Clinger 1990, "How to read
            // floating point numbers accurately", the fast path). Anything else goes to Number(), which
            // rounds correctly too.
            const first = i;
            const negative = c === MINUS;
            if (negative)
                c = ++i < end ? b[i] : -1;
            let digits = 0;
            let mantissa = 0;
            let scale = 0;
            if (c === ZERO)
                c = ++i < end ? b[i] : -1;
            else if (c > ZERO && c <= NINE) {
                do {
                    mantissa = mantissa * 10 + (c - ZERO);
                    digits++;
                    c = ++i < end ? b[i] : -1;
                } while (c >= ZERO && c <= NINE);
            }
            else
                throw new NotPlain();
            if (c === DOT) {
                c = ++i < end ? b[i] : -1;
                if (!(c >= ZERO && c <= NINE))
                    throw new NotPlain();
                do {
                    mantissa = mantissa * 10 + (c - ZERO);
                    digits++;
                    scale++;
                    c = ++i < end ? b[i] : -1;
                } while (c >= ZERO && c <= NINE);
            }
            let exact = digits <= 15 && scale <= 22;
            if (c === LOWER_E || c === UPPER_E) {
                exact = false;
                c = ++i < end ? b[i] : -1;
                if (c === PLUS || c === MINUS)
                    c = ++i < end ? b[i] : -1;
                if (!(c >= ZERO && c <= NINE))
                    throw new NotPlain();
                do
                    c = ++i < end ? b[i] : -1;
                while (c >= ZERO && c <= NINE);
            }
            if (exact) {
                const magnitude = scale === 0 ? mantissa : mantissa / EXACT_POWERS[scale];
                row[k++] = negative ? -magnitude : magnitude;
            }
            else {
                row[k++] = Number(ASCII.decode(b.subarray(first, i)));
            }
        }
        c = i < end ? b[i] : -1;
        while (c === SPACE || c === LF || c === CR || c === TAB)
            c = ++i < end ? b[i] : -1;
        if (c === CLOSE_SQUARE)
            break;
        if (c !== COMMA)
            throw new NotPlain();
        c = ++i < end ? b[i] : -1;
        while (c === SPACE || c === LF || c === CR || c === TAB)
            c = ++i < end ? b[i] : -1;
    }
    rowEnd = i;
    if (k !== row.length)
        row.length = k;
    return row;
}

;// CONCATENATED MODULE: ./src/history/document.ts






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
const HISTORY_SCHEMA = 'bellgate.history/2';
const HISTORY_SCHEMA_V1 = 'bellgate.history/1';
const CURRENT_VERSION = 2;
/**
 * Decodes an already parsed document of any known version, reporting problems to `report`.
 * Shared by parseHistory (stops at the first problem) and verifyHistory (lists them all).
 */
function decodeHistoryDocument(root, report) {
    if (!(0,problems/* isObject */.Gv)(root)) {
        report('', `a history document must be a JSON object, found ${(0,problems/* typeName */.go)(root)}`);
        return undefined;
    }
    const schema = root.schema;
    const version = typeof schema === 'string' ? /^bellgate\.history\/(\d{1,9})$/.exec(schema)?.[1] : undefined;
    if (version === undefined) {
        report('schema', `not a Bellgate history document: "schema" is ${(0,problems/* typeName */.go)(schema) === 'a string' ? JSON.stringify(schema) : (0,problems/* typeName */.go)(schema)}, expected "${HISTORY_SCHEMA}"`, 'point the history option at a file that Bellgate wrote');
        return undefined;
    }
    const n = Number(version);
    if (n > CURRENT_VERSION) {
        report('schema', `the history was written by a newer Bellgate (document version ${n}; this one reads up to ${CURRENT_VERSION})`, 'upgrade Bellgate to the version that wrote this history');
        return undefined;
    }
    if (n === 1)
        return decodeV1(root, report);
    if (n === 2)
        return decodeV2(root, report);
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
function parseHistory(text, source) {
    const history = decodeHistoryDocument((0,json_text/* parseJsonText */.lk)(text, source), (0,problems/* throwingSink */.sC)(source));
    // The throwing sink stops at the first problem, so undefined cannot come back; keep TS honest.
    if (!history)
        throw new input_error/* InputError */.d('unreadable history document', { where: source });
    return history;
}
/**
 * parseHistory for the file's bytes, taking the fast road when it can: scanHistoryBytes reads the
 * values rows straight into doubles (no JSON.parse object per number) and JSON.parse reads only
 * the small rest. Any document the scan declines (another version, odd but valid JSON, or broken
 * JSON) is decoded from its UTF-8 text by parseHistory, so the result and every error are the same.
 * `rows` says where each values row lies in `bytes` (present only after a scan), which lets a
 * store write an append by splicing the old rows (splice-append.ts).
 * Throws InputError exactly as parseHistory.
 *
 * @example parseHistoryBytes(readFileSync('h.json'), 'h.json').history.runs.length // 120
 */
function parseHistoryBytes(bytes, source) {
    const scanned = scanHistoryBytes(bytes);
    if (scanned === undefined)
        return { history: parseHistory(Buffer.from(bytes.buffer, bytes.byteOffset, bytes.byteLength).toString('utf8'), source) };
    const history = decodeHistoryDocument(scanned.root, (0,problems/* throwingSink */.sC)(source));
    if (!history)
        throw new input_error/* InputError */.d('unreadable history document', { where: source });
    return { history, rows: { valuesStart: scanned.valuesStart, rowEnds: scanned.rowEnds } };
}
/**
 * Writes a History as a version-2 document (layout above). NaN is written as null (missing).
 * Throws InputError when the History is inconsistent (a column not aligned with the runs, an
 * infinite value, a duplicated run id), so a broken History is never stored.
 *
 * @example serializeHistory(emptyHistory('s'))
 * // '{"schema":"bellgate.history/2","series":"s",\n"runs":{"id":[],...},\n"metrics":{...,"values":[\n]}}\n'
 */
function serializeHistory(h) {
    checkRuns(h);
    for (const [name, column] of h.columns)
        checkStorable(h, name, column.values);
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
function historyHead(h) {
    const runs = { id: h.runs.map((r) => r.id) };
    for (const field of RUN_FIELDS)
        runs[field] = h.runs.map((r) => r[field] ?? null);
    const names = [...h.columns.keys()];
    const units = [...h.columns.values()].map((c) => c.unit ?? null);
    return (`{"schema":${JSON.stringify(HISTORY_SCHEMA)},"series":${JSON.stringify(h.series)},\n` +
        `"runs":${JSON.stringify(runs)},\n` +
        `"metrics":{"names":${JSON.stringify(names)},"units":${JSON.stringify(units)},"values":[\n`);
}
/** What closes a version-2 document after its last values row. */
const HISTORY_TAIL = ']}}\n';
const NOT_STORABLE_FIX = 'this is a bug in the code that built the history; please report it';
const storeWhere = (h) => `history of series ${JSON.stringify(h.series)}`;
/**
 * The runs half of the check before storing: every run has an id and no id appears twice.
 * Throws InputError, so a broken History is never stored.
 */
function checkRuns(h) {
    const where = storeWhere(h);
    const ids = new Set();
    for (const run of h.runs) {
        if (typeof run.id !== 'string' || run.id === '')
            throw new input_error/* InputError */.d('a run without an id cannot be stored', { where, fix: NOT_STORABLE_FIX });
        if (ids.has(run.id))
            throw new input_error/* InputError */.d(`run id ${JSON.stringify(run.id)} appears twice`, { where, fix: NOT_STORABLE_FIX });
        ids.add(run.id);
    }
}
/**
 * The column half: one value per run, each a finite number or NaN (missing). `from` skips values
 * already known to be storable (an append checks only what it adds). Throws InputError.
 */
function checkStorable(h, name, values, from = 0) {
    if (values.length !== h.runs.length) {
        throw new input_error/* InputError */.d(`metric ${JSON.stringify(name)} has ${values.length} values for ${h.runs.length} runs`, { where: storeWhere(h), fix: NOT_STORABLE_FIX });
    }
    for (let i = from; i < values.length; i++) {
        const v = values[i];
        if (v === Infinity || v === -Infinity || typeof v !== 'number') {
            throw new input_error/* InputError */.d(`metric ${JSON.stringify(name)} holds ${String(v)}, which cannot be stored`, { where: storeWhere(h), fix: NOT_STORABLE_FIX });
        }
    }
}


/***/ }),

/***/ 7670:
/***/ ((__unused_webpack_module, __webpack_exports__, __webpack_require__) => {

/* harmony export */ __webpack_require__.d(__webpack_exports__, {
/* harmony export */   lk: () => (/* binding */ parseJsonText)
/* harmony export */ });
/* unused harmony exports syntaxErrorOffset, lineColumn */
/* harmony import */ var _model_input_error_js__WEBPACK_IMPORTED_MODULE_0__ = __webpack_require__(8250);

/**
 * Parses JSON text, turning a syntax error into an InputError that points at "source:line:col".
 * V8 states the offset for most errors ("... in JSON at position 17"); for an unexpected token it
 * quotes about ten characters either side instead, so the quote is searched for in the text.
 * A leading byte-order mark is ignored.
 * Throws InputError (where = "source:line:col") on malformed JSON.
 *
 * @example parseJsonText('{"a": 1}', 'h.json') // { a: 1 }
 */
function parseJsonText(text, source) {
    const body = text.charCodeAt(0) === 0xfeff ? text.slice(1) : text;
    try {
        return JSON.parse(body);
    }
    catch (error) {
        const message = error instanceof Error ? error.message : String(error);
        const offset = syntaxErrorOffset(body, message);
        const { line, column } = lineColumn(body, offset);
        throw new _model_input_error_js__WEBPACK_IMPORTED_MODULE_0__/* .InputError */ .d(`not valid JSON (${message.replace(/, ".*" is not valid JSON$/s, '')})`, {
            where: `${source}:${line}:${column}`,
            fix: body.trim() === '' ? 'the file is empty; remove it or write a complete document' : 'repair the JSON at that spot (a truncated or hand-edited file?)',
            cause: error,
        });
    }
}
/** Best estimate of where V8's JSON parser stopped, as an offset into `text`. */
function syntaxErrorOffset(text, message) {
    const stated = /at position (\d+)/.exec(message);
    if (stated)
        return Number(stated[1]);
    if (/end of JSON input/.test(message))
        return text.length;
    // 'Unexpected token 'x', ..."context"... is not valid JSON': the token sits ten characters
    // into the quote when the quote is cut on the left, else at its first place in the quote.
    const quoted = /^Unexpected token '(.)', (\.\.\.)?"(.*?)"(\.\.\.)? is not valid JSON$/s.exec(message);
    if (quoted) {
        const [, token = '', cutLeft, context = ''] = quoted;
        const at = text.indexOf(context);
        if (at >= 0)
            return at + (cutLeft ? 10 : Math.max(0, context.indexOf(token)));
    }
    return 0;
}
/** 1-based line and column of an offset (UTF-16 units; columns count characters of that line). */
function lineColumn(text, offset) {
    const end = Math.min(Math.max(offset, 0), text.length);
    let line = 1;
    let lineStart = 0;
    for (let i = text.indexOf('\n'); i >= 0 && i < end; i = text.indexOf('\n', i + 1)) {
        line += 1;
        lineStart = i + 1;
    }
    return { line, column: end - lineStart + 1 };
}


/***/ }),

/***/ 7326:
/***/ ((__unused_webpack_module, __webpack_exports__, __webpack_require__) => {

/* harmony export */ __webpack_require__.d(__webpack_exports__, {
/* harmony export */   Eb: () => (/* binding */ key),
/* harmony export */   Gv: () => (/* binding */ isObject),
/* harmony export */   at: () => (/* binding */ at),
/* harmony export */   go: () => (/* binding */ typeName),
/* harmony export */   sC: () => (/* binding */ throwingSink),
/* harmony export */   wN: () => (/* binding */ collectingSink)
/* harmony export */ });
/* harmony import */ var _model_input_error_js__WEBPACK_IMPORTED_MODULE_0__ = __webpack_require__(8250);

/**
 * A sink that throws InputError at the first problem, located as "source at path".
 *
 * @example throwingSink('h.json')('runs.id[2]', 'run id "7-1" appears twice') // throws InputError
 */
function throwingSink(source) {
    return (path, problem, fix) => {
        throw new _model_input_error_js__WEBPACK_IMPORTED_MODULE_0__/* .InputError */ .d(problem, {
            where: path === '' ? source : `${source} at ${path}`,
            fix: fix ?? 'repair the document (run `bellgate verify` to list every problem) or restore it from a backup',
        });
    };
}
/**
 * A sink that collects problems into `into`, keeping at most `limit` of them and then one line
 * saying how many more there were — a document with a million bad values stays readable.
 */
function collectingSink(into, limit = 200) {
    let extra = 0;
    return {
        sink: (path, problem) => {
            if (into.length < limit)
                into.push({ where: path, problem });
            else
                extra += 1;
        },
        finish: () => {
            if (extra > 0)
                into.push({ where: '', problem: `${extra} more problems not listed` });
        },
    };
}
/** `metrics.values[3]`-style path step for an array index. */
const at = (path, index) => `${path}[${index}]`;
/** Path step for an object key; quoted because metric names hold dots, slashes and brackets. */
const key = (path, name) => `${path}[${JSON.stringify(name)}]`;
/** A JSON object (not null, not an array). */
function isObject(value) {
    return typeof value === 'object' && value !== null && !Array.isArray(value);
}
/** Short description of a JSON value's type for messages ("a string", "null"). */
function typeName(value) {
    if (value === null)
        return 'null';
    if (Array.isArray(value))
        return 'an array';
    if (typeof value === 'object')
        return 'an object';
    if (typeof value === 'number' && !Number.isFinite(value))
        return `the non-finite number ${value}`;
    return `a ${typeof value}`;
}


/***/ })

};
