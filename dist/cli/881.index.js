export const id = 881;
export const ids = [881];
export const modules = {

/***/ 3881:
/***/ ((__unused_webpack_module, __webpack_exports__, __webpack_require__) => {

__webpack_require__.r(__webpack_exports__);
/* harmony export */ __webpack_require__.d(__webpack_exports__, {
/* harmony export */   readCsvMetrics: () => (/* binding */ readCsvMetrics)
/* harmony export */ });
/* harmony import */ var csv_parse_sync__WEBPACK_IMPORTED_MODULE_0__ = __webpack_require__(712);
/* harmony import */ var _model_input_error_js__WEBPACK_IMPORTED_MODULE_1__ = __webpack_require__(8250);
/* harmony import */ var _limits_js__WEBPACK_IMPORTED_MODULE_2__ = __webpack_require__(6497);
/* harmony import */ var _numbers_js__WEBPACK_IMPORTED_MODULE_3__ = __webpack_require__(2671);
/* harmony import */ var _reading_sink_js__WEBPACK_IMPORTED_MODULE_4__ = __webpack_require__(7829);





/**
 * Reads CSV (RFC 4180 quoting, comma-separated, first row a header) in one of two layouts:
 * - long form: the header is `name,value` or `name,value,unit` (any order, case-insensitive);
 *   each row is one sample; a name on several rows is several samples;
 * - wide form: any other header; each column is one metric and each row one sample of every
 *   metric. A unit may follow a column name in square brackets: `build time [s]` is metric
 *   "build time" in unit "s". An empty cell is a sample not taken.
 * Whitespace around unquoted cells is ignored; quoted cells are kept as written.
 * @throws InputError naming file:line and the column for malformed CSV, non-numbers, empty names.
 * @example readCsvMetrics('name,value,unit\na,1,ms\n', 'm.csv').readings[0] // { name: 'a', value: 1, unit: 'ms', where: 'm.csv:2' }
 */
function readCsvMetrics(text, file, limits = _limits_js__WEBPACK_IMPORTED_MODULE_2__/* .DEFAULT_LIMITS */ .dR) {
    (0,_limits_js__WEBPACK_IMPORTED_MODULE_2__/* .checkLineLengths */ .Ak)(text, file, limits);
    const rows = parseRows(text, file);
    const header = rows[0];
    if (!header)
        throw new _model_input_error_js__WEBPACK_IMPORTED_MODULE_1__/* .InputError */ .d('the CSV file has no header row', { where: file, fix: 'start the file with a header such as name,value,unit' });
    const sink = new _reading_sink_js__WEBPACK_IMPORTED_MODULE_4__/* .ReadingSink */ .I(file, limits);
    const columns = header.record.map((cell) => cell.toLowerCase());
    const isLong = columns.includes('name') && columns.includes('value') && columns.every((c) => c === 'name' || c === 'value' || c === 'unit');
    if (isLong)
        readLong(rows, columns, file, sink);
    else
        readWide(rows, file, sink);
    return sink.result;
}
function readLong(rows, columns, file, sink) {
    if (new Set(columns).size !== columns.length) {
        throw new _model_input_error_js__WEBPACK_IMPORTED_MODULE_1__/* .InputError */ .d(`the CSV header repeats a column: ${columns.join(',')}`, { where: `${file}:1`, fix: 'name each column once' });
    }
    const nameAt = columns.indexOf('name');
    const valueAt = columns.indexOf('value');
    const unitAt = columns.indexOf('unit');
    for (const { record, info } of rows.slice(1)) {
        const where = `${file}:${info.lines}`;
        const name = record[nameAt] ?? '';
        const value = (0,_numbers_js__WEBPACK_IMPORTED_MODULE_3__/* .parseDecimal */ .$Q)(record[valueAt] ?? '', where, `value of ${JSON.stringify(name)}`);
        sink.add(name, value, unitAt < 0 ? undefined : record[unitAt], where);
    }
}
function readWide(rows, file, sink) {
    const headerWhere = `${file}:1`;
    const metrics = rows[0].record.map(splitUnit);
    const seen = new Set();
    for (const [i, { name }] of metrics.entries()) {
        if (seen.has(name)) {
            throw new _model_input_error_js__WEBPACK_IMPORTED_MODULE_1__/* .InputError */ .d(`the CSV header names metric ${JSON.stringify(name)} twice (column ${i + 1})`, {
                where: headerWhere,
                fix: 'give each metric one column; put repeated measurements in more rows',
            });
        }
        seen.add(name);
    }
    for (const { record, info } of rows.slice(1)) {
        const where = `${file}:${info.lines}`;
        record.forEach((cell, i) => {
            if (cell === '')
                return;
            const { name, unit } = metrics[i];
            sink.add(name, (0,_numbers_js__WEBPACK_IMPORTED_MODULE_3__/* .parseDecimal */ .$Q)(cell, `${where}:${i + 1}`, `value of ${JSON.stringify(name)} (column ${i + 1})`), unit, where);
        });
    }
    // A header with no data rows still names metrics; check them so a bad name is not accepted silently.
    if (rows.length === 1)
        metrics.forEach(({ name }) => sink.skip(name, 'no samples in the CSV file', headerWhere));
}
function parseRows(text, file) {
    try {
        return (0,csv_parse_sync__WEBPACK_IMPORTED_MODULE_0__/* .parse */ .q)(text, { trim: true, skip_empty_lines: true, info: true, bom: true });
    }
    catch (error) {
        const e = error;
        throw new _model_input_error_js__WEBPACK_IMPORTED_MODULE_1__/* .InputError */ .d(`malformed CSV: ${e.message ?? String(error)}`, {
            where: typeof e.lines === 'number' ? `${file}:${e.lines}` : file,
            fix: 'give every row as many cells as the header and close every quoted cell',
            cause: error,
        });
    }
}
/** `build time [s]` -> name "build time", unit "s"; a cell without a final `[...]` is all name. */
function splitUnit(cell) {
    // Index arithmetic, not a regular expression: a header cell may be a megabyte long.
    const open = cell.lastIndexOf('[');
    if (!cell.endsWith(']') || open < 0)
        return { name: cell, unit: undefined };
    const unit = cell.slice(open + 1, -1);
    if (unit.includes(']'))
        return { name: cell, unit: undefined };
    return { name: cell.slice(0, open).trimEnd(), unit: unit.trim() };
}


/***/ }),

/***/ 2671:
/***/ ((__unused_webpack_module, __webpack_exports__, __webpack_require__) => {

/* harmony export */ __webpack_require__.d(__webpack_exports__, {
/* harmony export */   $Q: () => (/* binding */ parseDecimal),
/* harmony export */   xv: () => (/* binding */ truncate)
/* harmony export */ });
/* unused harmony export nonFinite */
/* harmony import */ var _model_input_error_js__WEBPACK_IMPORTED_MODULE_0__ = __webpack_require__(8250);

// A plain decimal number: optional sign, digits with an optional fraction, optional exponent.
// Stricter than Number(): no hex, no "", no surrounding spaces, no "Infinity".
const DECIMAL = /^[+-]?(?:\d+(?:\.\d*)?|\.\d+)(?:[eE][+-]?\d+)?$/;
const NON_FINITE = /^[+-]?(?:inf|infinity|nan)$/i;
/**
 * Parses a metric value written as text. Returns the number, or throws a clear InputError.
 * Readers of text formats share it so that "1,5", "0x10" or "NaN" are refused the same way everywhere.
 * @throws InputError for text that is not a decimal number and for NaN/Inf.
 * @example parseDecimal('4.125e2', 'bench.csv:3', 'value') // 412.5
 */
function parseDecimal(text, where, what) {
    const trimmed = text.trim();
    if (DECIMAL.test(trimmed)) {
        const value = Number(trimmed);
        if (Number.isFinite(value))
            return value;
        throw nonFinite(trimmed, where, what);
    }
    if (NON_FINITE.test(trimmed))
        throw nonFinite(trimmed, where, what);
    throw new _model_input_error_js__WEBPACK_IMPORTED_MODULE_0__/* .InputError */ .d(`${what} ${JSON.stringify(truncate(trimmed))} is not a number`, {
        where,
        fix: 'write the value as a plain decimal number such as 412.5 or 1.2e-3',
    });
}
/** The error for NaN, infinities and overflowing numbers, shared by all readers. */
function nonFinite(text, where, what) {
    return new _model_input_error_js__WEBPACK_IMPORTED_MODULE_0__/* .InputError */ .d(`${what} ${truncate(text)} is not a finite number`, {
        where,
        fix: 'leave out metrics that were not measured instead of writing NaN or Infinity',
    });
}
/** Shortens untrusted text for a message. */
function truncate(text, max = 60) {
    return text.length > max ? `${text.slice(0, max)}...` : text;
}


/***/ }),

/***/ 7829:
/***/ ((__unused_webpack_module, __webpack_exports__, __webpack_require__) => {

/* harmony export */ __webpack_require__.d(__webpack_exports__, {
/* harmony export */   I: () => (/* binding */ ReadingSink)
/* harmony export */ });
/* harmony import */ var _model_input_error_js__WEBPACK_IMPORTED_MODULE_0__ = __webpack_require__(8250);
/* harmony import */ var _limits_js__WEBPACK_IMPORTED_MODULE_1__ = __webpack_require__(6497);
/* harmony import */ var _names_js__WEBPACK_IMPORTED_MODULE_2__ = __webpack_require__(5585);



/**
 * Where every reader puts what it finds, so that the checks every format needs live in one place:
 * the metric name rule (names.ts), finite values, and the `limits.max-metrics` cap on distinct names,
 * enforced while parsing so a huge file is refused before it fills memory.
 */
class ReadingSink {
    file;
    limits;
    result = { readings: [], notFitted: new Map(), meta: new Map() };
    names = new Set();
    constructor(file, limits) {
        this.file = file;
        this.limits = limits;
    }
    /** Adds one sample. @throws InputError for a bad name or unit, a non-finite value or too many metrics. */
    add(name, value, unit, where) {
        (0,_names_js__WEBPACK_IMPORTED_MODULE_2__/* .checkMetricName */ .WO)(name, where);
        if (!Number.isFinite(value)) {
            throw new _model_input_error_js__WEBPACK_IMPORTED_MODULE_0__/* .InputError */ .d(`value of ${JSON.stringify(name)} is ${value}, not a finite number`, {
                where,
                fix: 'leave out metrics that were not measured instead of writing NaN or Infinity',
            });
        }
        if (unit !== undefined)
            (0,_names_js__WEBPACK_IMPORTED_MODULE_2__/* .checkUnit */ .lg)(unit, where);
        this.count(name, where);
        const reading = unit === undefined || unit === '' ? { name, value, where } : { name, value, unit, where };
        this.result.readings.push(reading);
    }
    /** Records a name that is kept but never fitted (a skipped test), with the reason. */
    skip(name, reason, where) {
        (0,_names_js__WEBPACK_IMPORTED_MODULE_2__/* .checkMetricName */ .WO)(name, where);
        this.count(name, where);
        this.result.notFitted.set(name, reason);
    }
    /** Run metadata; the first value of a key wins. */
    meta(key, value) {
        if (!this.result.meta.has(key))
            this.result.meta.set(key, value);
    }
    count(name, where) {
        if (this.names.has(name))
            return;
        if (this.names.size >= this.limits.maxMetrics) {
            throw (0,_limits_js__WEBPACK_IMPORTED_MODULE_1__/* .limitError */ .yT)('maxMetrics', this.limits.maxMetrics, where, `${this.file} has more than ${this.limits.maxMetrics} metrics`);
        }
        this.names.add(name);
    }
}


/***/ })

};
