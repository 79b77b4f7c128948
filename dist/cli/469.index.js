export const id = 469;
export const ids = [469];
export const modules = {

/***/ 1469:
/***/ ((__unused_webpack_module, __webpack_exports__, __webpack_require__) => {

__webpack_require__.r(__webpack_exports__);
/* harmony export */ __webpack_require__.d(__webpack_exports__, {
/* harmony export */   readGoBench: () => (/* binding */ readGoBench)
/* harmony export */ });
/* harmony import */ var _limits_js__WEBPACK_IMPORTED_MODULE_0__ = __webpack_require__(6497);
/* harmony import */ var _numbers_js__WEBPACK_IMPORTED_MODULE_1__ = __webpack_require__(2671);
/* harmony import */ var _reading_sink_js__WEBPACK_IMPORTED_MODULE_2__ = __webpack_require__(7829);



// Go proposal 14313 ("Go benchmark data format"): a configuration line is `key: value` where key
// begins with a lower-case letter and holds no space and no upper-case letter.
const CONFIG_LINE = /^(\p{Ll}[^\s\p{Lu}:]*):(?:[ \t]+(.*))?$/su;
// A result line's first field is "Benchmark" followed by the end of the field or a character
// that is not lower case (BenchmarkDecode, Benchmark/sub, but not Benchmarking).
const BENCH_NAME = /^Benchmark(?:$|[^\p{Ll}])/u;
const PROCS_SUFFIX = /-(\d+)$/;
/**
 * Reads the Go benchmark data format (Go proposal 14313), as `go test -bench` prints it.
 * - A result line `BenchmarkName-8  N  v1 unit1  v2 unit2 ...` gives one sample of each
 *   `value unit` pair, as metric `<BenchmarkName>/<unit>` with its unit kept as written
 *   (`BenchmarkDecode-8 100 412 ns/op 64 B/op` -> `BenchmarkDecode/ns/op` = 412 "ns/op",
 *   `BenchmarkDecode/B/op` = 64 "B/op"). The iteration count N is not a metric.
 * - The `-N` GOMAXPROCS suffix is stripped and recorded as meta `gomaxprocs`, when every line of
 *   the file has the same N; with several (`-cpu 1,4`) the suffixes stay in the names, so that
 *   different processor counts never mix, and `gomaxprocs` lists them.
 * - Repeated lines (`-count 5`) are samples of the same metrics.
 * - Configuration lines `key: value` (goos, goarch, pkg, cpu, ...) become run meta; a key that
 *   changes within the file keeps all its values, joined by ", ".
 * - Every other line (PASS, ok, log output) is ignored, as the proposal says.
 * @throws InputError naming file:line for a value that is not a number.
 * @example readGoBench('BenchmarkA-8 10 5 ns/op\n', 'b.txt').readings[0] // { name: 'BenchmarkA/ns/op', value: 5, unit: 'ns/op', where: 'b.txt:1' }
 */
function readGoBench(text, file, limits = _limits_js__WEBPACK_IMPORTED_MODULE_0__/* .DEFAULT_LIMITS */ .dR) {
    (0,_limits_js__WEBPACK_IMPORTED_MODULE_0__/* .checkLineLengths */ .Ak)(text, file, limits);
    const sink = new _reading_sink_js__WEBPACK_IMPORTED_MODULE_2__/* .ReadingSink */ .I(file, limits);
    const config = new Map();
    const results = [];
    text.split('\n').forEach((line, i) => {
        const where = `${file}:${i + 1}`;
        const setting = CONFIG_LINE.exec(line);
        if (setting) {
            const values = config.get(setting[1]) ?? [];
            const value = (setting[2] ?? '').trim();
            if (!values.includes(value))
                values.push(value);
            config.set(setting[1], values);
            return;
        }
        const result = parseResultLine(line, where);
        if (result)
            results.push(result);
    });
    const procs = [...new Set(results.map((r) => r.procs).filter((p) => p !== undefined))];
    for (const { name, procs: n, pairs, where } of results) {
        const base = procs.length > 1 && n !== undefined ? `${name}-${n}` : name;
        for (const [value, unit] of pairs)
            sink.add(`${base}/${unit}`, value, unit, where);
    }
    for (const [key, values] of config)
        sink.meta(key, values.join(', '));
    if (procs.length > 0)
        sink.meta('gomaxprocs', procs.join(','));
    return sink.result;
}
/** A result line split into name, GOMAXPROCS and value/unit pairs; undefined for any other line. */
function parseResultLine(line, where) {
    const fields = line.trim().split(/\s+/u);
    const [first, iterations] = fields;
    if (first === undefined || !BENCH_NAME.test(first))
        return undefined;
    if (fields.length < 4 || fields.length % 2 !== 0 || !/^\d+$/.test(iterations ?? ''))
        return undefined;
    const procs = PROCS_SUFFIX.exec(first);
    const name = procs ? first.slice(0, -procs[0].length) : first;
    const pairs = [];
    for (let i = 2; i < fields.length; i += 2) {
        const unit = fields[i + 1];
        pairs.push([(0,_numbers_js__WEBPACK_IMPORTED_MODULE_1__/* .parseDecimal */ .$Q)(fields[i], where, `value in ${unit} of ${name}`), unit]);
    }
    return { name, procs: procs?.[1], pairs, where };
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
