export const id = 532;
export const ids = [532];
export const modules = {

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

/***/ 6532:
/***/ ((__unused_webpack_module, __webpack_exports__, __webpack_require__) => {

// ESM COMPAT FLAG
__webpack_require__.r(__webpack_exports__);

// EXPORTS
__webpack_require__.d(__webpack_exports__, {
  readOpenMetrics: () => (/* binding */ readOpenMetrics)
});

// EXTERNAL MODULE: ./src/model/input-error.ts
var input_error = __webpack_require__(8250);
// EXTERNAL MODULE: ./src/inputs/limits.ts
var inputs_limits = __webpack_require__(6497);
// EXTERNAL MODULE: ./src/inputs/numbers.ts
var numbers = __webpack_require__(2671);
;// CONCATENATED MODULE: ./src/inputs/openmetrics-labels.ts
// Characters in label values that would make a folded name ambiguous or unsafe to show: the escape
// itself, the pair separator, controls and bidirectional formatting characters.
const ESCAPED = /[%,\u0000-\u001f\u007f-\u009f\u202a-\u202e\u2066-\u2069]/gu;
/**
 * Folds a metric name and its labels into one Bellgate metric name, stably:
 * `name{b="2",a="1"}` -> `name/a=1,b=2`. Labels are sorted by key (code unit order); a sample
 * without labels keeps its bare name. In label values, `%`, `,`, control characters and
 * bidirectional formatting characters are percent-encoded as UTF-8 (`,` -> `%2C`, newline ->
 * `%0A`); everything else, `/` and `=` included, is kept, so the fold can be undone: the part
 * before the first `/` is the metric name (which cannot contain `/`), pairs split at `,`, and
 * each pair at its first `=` (label keys cannot contain `=`).
 * @example foldLabels('http_requests_total', [['path', '/api'], ['code', '200']]) // 'http_requests_total/code=200,path=/api'
 */
function foldLabels(name, labels) {
    if (labels.length === 0)
        return name;
    const sorted = [...labels].sort(([a], [b]) => (a < b ? -1 : a > b ? 1 : 0));
    return `${name}/${sorted.map(([key, value]) => `${key}=${escapeLabelValue(value)}`).join(',')}`;
}
/** Percent-encodes the characters listed in foldLabels. */
function escapeLabelValue(value) {
    return value.replace(ESCAPED, (c) => encodeURIComponent(c));
}

;// CONCATENATED MODULE: ./src/inputs/openmetrics-line.ts


const NAME = /[a-zA-Z_:][a-zA-Z0-9_:]*/y;
const LABEL_NAME = /[a-zA-Z_][a-zA-Z0-9_]*/y;
/**
 * Splits `name{label="value",...} value [timestamp] [# exemplar]` (OpenMetrics 1.0 "ABNF";
 * Prometheus text format 0.0.4). Label values may hold the escapes `\\`, `\"` and `\n`.
 * @throws InputError naming the line and what was expected where.
 * @example parseSampleLine('a{x="1"} 2 1700000000', 'f:1') // { name: 'a', labels: [['x', '1']], value: '2' }
 */
function parseSampleLine(line, where) {
    const fail = (what) => {
        throw new input_error/* InputError */.d(`expected ${what} in sample line ${JSON.stringify((0,numbers/* truncate */.xv)(line))}`, {
            where,
            fix: 'write samples as name{label="value"} 1.5 (see the OpenMetrics text format)',
        });
    };
    NAME.lastIndex = 0;
    const name = NAME.exec(line)?.[0] ?? fail('a metric name at the start');
    let at = name.length;
    const labels = [];
    if (line[at] === '{') {
        at++;
        const keys = new Set();
        for (;;) {
            at = skipSpaces(line, at);
            if (line[at] === '}')
                break;
            LABEL_NAME.lastIndex = at;
            const key = LABEL_NAME.exec(line)?.[0] ?? fail(`a label name at column ${at + 1}`);
            at = skipSpaces(line, at + key.length);
            if (line[at] !== '=')
                fail(`"=" after label ${key}`);
            at = skipSpaces(line, at + 1);
            if (line[at] !== '"')
                fail(`a quoted value for label ${key}`);
            const [value, end] = readQuoted(line, at + 1) ?? fail(`a closing quote for label ${key}`);
            if (keys.has(key))
                fail(`label ${key} only once`);
            keys.add(key);
            labels.push([key, value]);
            at = skipSpaces(line, end);
            if (line[at] === ',')
                at++;
            else if (line[at] !== '}')
                fail(`"," or "}" after label ${key}`);
        }
        at++;
    }
    if (line[at] !== ' ' && line[at] !== '\t')
        fail('a space and a value after the name');
    const exemplar = line.indexOf(' #', at);
    const fields = (exemplar < 0 ? line.slice(at) : line.slice(at, exemplar)).trim().split(/[ \t]+/);
    if (fields[0] === '' || fields.length > 2)
        fail('a value and at most a timestamp');
    return { name, labels, value: fields[0] };
}
function skipSpaces(line, at) {
    while (line[at] === ' ' || line[at] === '\t')
        at++;
    return at;
}
/** Reads an escaped label value starting after its opening quote; returns it and the index after the closing quote. */
function readQuoted(line, start) {
    let out = '';
    for (let i = start; i < line.length; i++) {
        const c = line[i];
        if (c === '"')
            return [out, i + 1];
        if (c === '\\') {
            const next = line[++i];
            if (next === 'n')
                out += '\n';
            else if (next === '\\' || next === '"')
                out += next;
            else if (next === undefined)
                return undefined;
            else
                out += `\\${next}`; // Prometheus keeps unknown escapes as written
        }
        else {
            out += c;
        }
    }
    return undefined;
}

// EXTERNAL MODULE: ./src/inputs/reading-sink.ts
var reading_sink = __webpack_require__(7829);
;// CONCATENATED MODULE: ./src/inputs/openmetrics.ts






// Sample-name suffixes of each family type (OpenMetrics 1.0, "Metric types").
const SUFFIXES = ['_total', '_created', '_bucket', '_count', '_sum', '_gcount', '_gsum', '_info'];
// Suffixes whose values are counts, not amounts in the family's unit.
const COUNT_SUFFIXES = new Set(['_bucket', '_count', '_gcount']);
const STATE_TYPES = new Set(['info', 'stateset']);
const NON_FINITE = /^[+-]?(?:inf|infinity|nan)$/i;
/**
 * Reads the OpenMetrics text format and the Prometheus text exposition format.
 * - `# TYPE`, `# UNIT`, `# HELP` are honoured (HELP is only checked); other comments are skipped.
 * - gauge, counter and untyped/unknown samples are read as they are; histogram and summary
 *   families as their series: `_bucket{le=...}`, `{quantile=...}`, `_sum`, `_count` (gauge
 *   histograms: `_gsum`, `_gcount`). Labels fold into the name (openmetrics-labels.ts).
 * - The family's UNIT is given to amounts (gauge, counter, `_sum`, quantiles), not to counts
 *   (`_bucket`, `_count`).
 * - `_created` samples (creation timestamps) are skipped; info and stateset samples, and samples
 *   whose value is NaN or infinite, go to `notFitted` with the reason.
 * - Timestamps and exemplars are ignored; `# EOF` ends the input, and only blank lines may follow.
 * @throws InputError naming file:line for a line that is neither a comment nor a valid sample.
 * @example readOpenMetrics('# TYPE q gauge\nq{b="2",a="1"} 3\n# EOF\n', 'm.prom').readings[0].name // 'q/a=1,b=2'
 */
function readOpenMetrics(text, file, limits = inputs_limits/* DEFAULT_LIMITS */.dR) {
    (0,inputs_limits/* checkLineLengths */.Ak)(text, file, limits);
    const sink = new reading_sink/* ReadingSink */.I(file, limits);
    const types = new Map();
    const units = new Map();
    let ended = false;
    text.split('\n').forEach((raw, i) => {
        const line = raw.replace(/\r$/, '');
        const where = `${file}:${i + 1}`;
        if (line.trim() === '')
            return;
        if (ended) {
            throw new input_error/* InputError */.d('text after "# EOF"', { where, fix: 'end the exposition with "# EOF" as its last line' });
        }
        if (line.startsWith('#')) {
            ended = readComment(line, where, types, units);
            return;
        }
        const sample = parseSampleLine(line, where);
        const family = familyOf(sample.name, types);
        const type = types.get(family.name) ?? 'unknown';
        if (family.suffix === '_created')
            return;
        const name = foldLabels(sample.name, sample.labels);
        if (STATE_TYPES.has(type)) {
            sink.skip(name, `${type} metric: a state, not a measurement`, where);
            return;
        }
        if (NON_FINITE.test(sample.value)) {
            sink.skip(name, `value is ${sample.value}`, where);
            return;
        }
        const value = (0,numbers/* parseDecimal */.$Q)(sample.value, where, `value of ${(0,numbers/* truncate */.xv)(name)}`);
        const unit = COUNT_SUFFIXES.has(family.suffix) ? undefined : units.get(family.name);
        sink.add(name, value, unit, where);
    });
    return sink.result;
}
/** Reads a `#` line into the type and unit maps; returns true for `# EOF`. */
function readComment(line, where, types, units) {
    if (/^#\s*EOF\s*$/.test(line))
        return true;
    const m = /^#\s+(TYPE|UNIT|HELP)\s+(\S+)(?:\s+(.*))?$/.exec(line);
    if (!m)
        return false; // a free comment (Prometheus allows them)
    const [, keyword, family, rest = ''] = m;
    if (keyword === 'TYPE') {
        const type = rest.trim().toLowerCase();
        if (!/^(counter|gauge|histogram|gaugehistogram|summary|info|stateset|unknown|untyped)$/.test(type)) {
            throw new input_error/* InputError */.d(`unknown metric type ${JSON.stringify((0,numbers/* truncate */.xv)(rest.trim()))} for ${family}`, {
                where,
                fix: 'use one of counter, gauge, histogram, gaugehistogram, summary, info, stateset, unknown',
            });
        }
        types.set(family, type);
    }
    else if (keyword === 'UNIT' && rest.trim() !== '') {
        units.set(family, rest.trim());
    }
    return false;
}
/** The family a sample belongs to: its own name if declared, else its name minus a type suffix. */
function familyOf(name, types) {
    if (types.has(name))
        return { name, suffix: '' };
    for (const suffix of SUFFIXES) {
        if (name.endsWith(suffix)) {
            const base = name.slice(0, -suffix.length);
            if (types.has(base))
                return { name: base, suffix };
        }
    }
    return { name, suffix: '' };
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
