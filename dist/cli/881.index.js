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
/* harmony import */ var _errors_input_error_js__WEBPACK_IMPORTED_MODULE_1__ = __webpack_require__(3712);
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
 * Whitespace around unquoted cells is ignored; quoted cells are kept as written. Rows are handed
 * to the sink as they are parsed, so a file past `limits.max-samples` stops there.
 * @throws InputError naming file:line and the column for malformed CSV, non-numbers, empty names.
 * @example readCsvMetrics('name,value,unit\na,1,ms\n', 'm.csv').readings[0] // { name: 'a', value: 1, unit: 'ms', where: 'm.csv:2' }
 */
function readCsvMetrics(text, file, limits = _limits_js__WEBPACK_IMPORTED_MODULE_2__/* .DEFAULT_LIMITS */ .dR) {
    (0,_limits_js__WEBPACK_IMPORTED_MODULE_2__/* .checkLineLengths */ .Ak)(text, file, limits);
    const sink = new _reading_sink_js__WEBPACK_IMPORTED_MODULE_4__/* .ReadingSink */ .I(file, limits);
    let layout;
    let rows = 0;
    eachRow(text, file, (record, line) => {
        if (layout === undefined)
            layout = layoutOf(record, file, sink);
        else
            layout.row(record, line);
        rows++;
    });
    if (layout === undefined)
        throw new _errors_input_error_js__WEBPACK_IMPORTED_MODULE_1__/* .InputError */ .dz('the CSV file has no header row', {
            where: file,
            fix: 'start the file with a header such as name,value,unit',
        });
    if (rows === 1)
        layout.noRows();
    return sink.result;
}
function layoutOf(header, file, sink) {
    const columns = header.map((cell) => cell.toLowerCase());
    const isLong = columns.includes('name') &&
        columns.includes('value') &&
        columns.every((c) => c === 'name' || c === 'value' || c === 'unit');
    return isLong ? longLayout(columns, file, sink) : wideLayout(header, file, sink);
}
function longLayout(columns, file, sink) {
    if (new Set(columns).size !== columns.length) {
        throw new _errors_input_error_js__WEBPACK_IMPORTED_MODULE_1__/* .InputError */ .dz(`the CSV header repeats a column: ${columns.join(',')}`, {
            where: `${file}:1`,
            fix: 'name each column once',
        });
    }
    const nameAt = columns.indexOf('name');
    const valueAt = columns.indexOf('value');
    const unitAt = columns.indexOf('unit');
    return {
        row(record, line) {
            const where = `${file}:${line}`;
            const name = record[nameAt] ?? '';
            const value = (0,_numbers_js__WEBPACK_IMPORTED_MODULE_3__/* .parseDecimal */ .$Q)(record[valueAt] ?? '', where, `value of ${JSON.stringify(name)}`);
            sink.add(name, value, unitAt < 0 ? undefined : record[unitAt], where);
        },
        noRows() { },
    };
}
function wideLayout(header, file, sink) {
    const headerWhere = `${file}:1`;
    const metrics = header.map(splitUnit);
    const seen = new Set();
    for (const [i, { name }] of metrics.entries()) {
        if (seen.has(name)) {
            throw new _errors_input_error_js__WEBPACK_IMPORTED_MODULE_1__/* .InputError */ .dz(`the CSV header names metric ${JSON.stringify(name)} twice (column ${i + 1})`, {
                where: headerWhere,
                fix: 'give each metric one column; put repeated measurements in more rows',
            });
        }
        seen.add(name);
    }
    return {
        row(record, line) {
            const where = `${file}:${line}`;
            record.forEach((cell, i) => {
                if (cell === '')
                    return;
                const { name, unit } = metrics[i];
                const value = (0,_numbers_js__WEBPACK_IMPORTED_MODULE_3__/* .parseDecimal */ .$Q)(cell, `${where}:${i + 1}`, `value of ${JSON.stringify(name)} (column ${i + 1})`);
                sink.add(name, value, unit, where);
            });
        },
        // A header with no data rows still names metrics; check them so a bad name is not accepted silently.
        noRows() {
            metrics.forEach(({ name }) => sink.skip(name, 'no samples in the CSV file', headerWhere));
        },
    };
}
/** Parses the rows one at a time (none is kept), handing each with its line number to `each`. */
function eachRow(text, file, each) {
    try {
        (0,csv_parse_sync__WEBPACK_IMPORTED_MODULE_0__/* .parse */ .q)(text, {
            trim: true,
            skip_empty_lines: true,
            bom: true,
            on_record: (record, context) => {
                each(record, context.lines);
                return null;
            },
        });
    }
    catch (error) {
        if (error instanceof _errors_input_error_js__WEBPACK_IMPORTED_MODULE_1__/* .InputError */ .dz)
            throw error;
        const e = error;
        throw new _errors_input_error_js__WEBPACK_IMPORTED_MODULE_1__/* .InputError */ .dz(`malformed CSV: ${e.message ?? String(error)}`, {
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


/***/ })

};
