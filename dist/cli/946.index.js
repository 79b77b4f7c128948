export const id = 946;
export const ids = [946];
export const modules = {

/***/ 5946:
/***/ ((__unused_webpack_module, __webpack_exports__, __webpack_require__) => {


// EXPORTS
__webpack_require__.d(__webpack_exports__, {
  S: () => (/* binding */ loadRun)
});

// UNUSED EXPORTS: parsePrefixes

// EXTERNAL MODULE: external "node:fs/promises"
var promises_ = __webpack_require__(1455);
// EXTERNAL MODULE: external "node:path"
var external_node_path_ = __webpack_require__(6760);
var external_node_path_default = /*#__PURE__*/__webpack_require__.n(external_node_path_);
// EXTERNAL MODULE: ./src/model/input-error.ts
var input_error = __webpack_require__(8250);
// EXTERNAL MODULE: ./src/model/moments.ts
var moments = __webpack_require__(8884);
// EXTERNAL MODULE: ./src/model/median.ts
var median = __webpack_require__(71);
;// CONCATENATED MODULE: ./src/inputs/aggregate.ts


/**
 * Folds the samples of one metric in one run into one value: median (the default: robust to one
 * slow sample), mean (corrected two-pass, src/model/moments.ts), min (the usual choice for
 * timings, whose noise only adds) or max.
 * @throws Error for an empty list (collectRun never passes one).
 * @example aggregateSamples([3, 1, 2, 10], 'median') // 2.5
 */
function aggregateSamples(values, kind) {
    if (values.length === 0)
        throw new Error('aggregateSamples needs at least one value');
    switch (kind) {
        case 'mean':
            return (0,moments/* mean */.i2)(values);
        case 'min':
            return values.reduce((a, b) => Math.min(a, b));
        case 'max':
            return values.reduce((a, b) => Math.max(a, b));
        default:
            return (0,median/* median */.JZ)(values);
    }
}

;// CONCATENATED MODULE: ./src/inputs/units.ts
const NS = 1;
const TIME = {
    ns: NS, nanosecond: NS, nanoseconds: NS,
    us: 1e3, 'µs': 1e3, 'μs': 1e3, microsecond: 1e3, microseconds: 1e3,
    ms: 1e6, millisecond: 1e6, milliseconds: 1e6,
    s: 1e9, sec: 1e9, second: 1e9, seconds: 1e9,
    min: 6e10, minute: 6e10, minutes: 6e10,
    h: 3.6e12, hour: 3.6e12, hours: 3.6e12,
};
const SIZE = {
    B: 1, byte: 1, bytes: 1,
    kB: 1e3, KB: 1e3, KiB: 1024,
    MB: 1e6, MiB: 1024 ** 2,
    GB: 1e9, GiB: 1024 ** 3,
};
function simpleScale(unit) {
    if (Object.hasOwn(TIME, unit))
        return { dimension: 'time', factor: TIME[unit] };
    if (Object.hasOwn(SIZE, unit))
        return { dimension: 'size', factor: SIZE[unit] };
    return undefined;
}
/**
 * The dimension and exact factor(s) of a unit: a simple unit, or `numerator/denominator` where the
 * denominator is "op" or a time unit. Undefined for units outside the tables.
 * @example unitScale('MiB') // [{ dimension: 'size', factor: 1048576 }]
 */
function unitScale(unit) {
    const simple = simpleScale(unit);
    if (simple)
        return [simple];
    const slash = unit.indexOf('/');
    if (slash <= 0)
        return undefined;
    const top = simpleScale(unit.slice(0, slash));
    const bottomText = unit.slice(slash + 1);
    const bottom = bottomText === 'op' ? { dimension: 'op', factor: 1 } : simpleScale(bottomText);
    return top && bottom && bottom.dimension !== 'size' ? [top, bottom] : undefined;
}
/**
 * Converts a value from one unit to another of the same dimension; undefined when they are not
 * convertible (different dimensions, or a unit outside the tables and not equal as text).
 * @example convertUnit(412, 'ms', 's') // 0.412
 * @example convertUnit(1, 'ms', 'B') // undefined
 */
function convertUnit(value, from, to) {
    if (from === to)
        return value;
    const a = unitScale(from);
    const b = unitScale(to);
    if (!a || !b || a.length !== b.length)
        return undefined;
    if (a.some((part, i) => part.dimension !== b[i].dimension))
        return undefined;
    // Numerator scales up, denominator scales down; each step by an exact integer ratio.
    let out = rescale(value, a[0].factor, b[0].factor);
    if (a[1] && b[1])
        out = rescale(out, b[1].factor, a[1].factor);
    return out;
}
function rescale(value, from, to) {
    return from >= to ? value * (from / to) : value / (to / from);
}

;// CONCATENATED MODULE: ./src/inputs/collect.ts



/**
 * Folds the readings of several files into one Run. All samples of a name (repeated lines, several
 * files) are aggregated by `aggregateFor(name)` (median | mean | min | max); `count` is how many.
 * Units: the first-seen unit of a metric is kept and later samples are converted to it when both
 * are known units of the same dimension (units.ts: 1500 ms joins 2 s as 1.5 s). Meta: the first
 * value of a key wins. notFitted: the union, first reason kept.
 * @throws InputError naming both sources when a metric comes in incompatible units, or with a unit
 *   in one place and none in another.
 * @example collectRun([{ readings: [{ name: 'a', value: 1 }, { name: 'a', value: 3 }], notFitted: new Map(), meta: new Map() }], () => 'mean').metrics.get('a') // { value: 2, count: 2 }
 */
function collectRun(results, aggregateFor) {
    const byName = new Map();
    const meta = new Map();
    const notFitted = new Map();
    for (const result of results) {
        for (const reading of result.readings) {
            const seen = byName.get(reading.name);
            if (!seen) {
                byName.set(reading.name, { unit: reading.unit, where: reading.where, values: [reading.value] });
                continue;
            }
            seen.values.push(converted(reading.name, reading.value, reading.unit, reading.where, seen));
        }
        for (const [key, value] of result.meta)
            if (!meta.has(key))
                meta.set(key, value);
        for (const [name, reason] of result.notFitted)
            if (!notFitted.has(name))
                notFitted.set(name, reason);
    }
    const metrics = new Map();
    for (const [name, { unit, values, where }] of byName) {
        const value = aggregateSamples(values, aggregateFor(name));
        if (!Number.isFinite(value)) {
            throw new input_error/* InputError */.d(`the ${aggregateFor(name)} of the ${values.length} samples of ${JSON.stringify(name)} overflows`, {
                where,
                fix: 'check the values of this metric, or change its unit so the numbers are smaller',
            });
        }
        metrics.set(name, unit === undefined ? { value, count: values.length } : { value, unit, count: values.length });
    }
    return notFitted.size > 0 ? { metrics, meta, notFitted } : { metrics, meta };
}
function converted(name, value, unit, where, seen) {
    if (unit === seen.unit)
        return value;
    const out = unit !== undefined && seen.unit !== undefined ? convertUnit(value, unit, seen.unit) : undefined;
    if (out !== undefined && Number.isFinite(out))
        return out;
    const show = (u) => (u === undefined ? 'no unit' : `unit ${JSON.stringify(u)}`);
    throw new input_error/* InputError */.d(`metric ${JSON.stringify(name)} has ${show(seen.unit)} at ${seen.where ?? 'its first source'} but ${show(unit)} at ${where ?? 'another source'}, which cannot be converted`, { where, fix: 'write the metric in one unit everywhere, or in convertible units (ms and s, kB and MiB)' });
}

// EXTERNAL MODULE: ./src/inputs/limits.ts
var inputs_limits = __webpack_require__(6497);
// EXTERNAL MODULE: ./src/inputs/formats.ts
var formats = __webpack_require__(7713);
;// CONCATENATED MODULE: ./src/inputs/detect.ts


const HEAD_LINES = 64;
const GO_RESULT = /^Benchmark(?:$|[^\p{Ll}\s])\S*\s+\d+\s+\S+\s+\S+/u;
const OM_COMMENT = /^#\s+(?:TYPE|HELP|UNIT)\s+\S|^#\s*EOF\s*$/;
// Label sets are matched quote-aware and without backtracking between alternatives.
const OM_SAMPLE = /^[a-zA-Z_:][a-zA-Z0-9_:]*(?:\{(?:[^"}]|"(?:[^"\\]|\\.)*")*\})?[ \t]+[+-]?(?:\.?\d\S*|inf|nan)(?:[ \t]+\S+)?(?:[ \t]+#.*)?$/i;
const EXTENSIONS = new Map([
    ['json', 'json'], ['jsonl', 'jsonl'], ['ndjson', 'jsonl'], ['csv', 'csv'],
    ['prom', 'openmetrics'], ['om', 'openmetrics'], ['metrics', 'openmetrics'], ['xml', 'junit'],
]);
/**
 * Guesses a metric file's format from its content (the first 64 non-blank lines):
 * `<` + `<testsuite` -> junit; `{` -> json, or jsonl when the first line alone is a JSON object
 * with a "name"; a `BenchmarkX  N  v unit` line -> gobench; `# TYPE/HELP/UNIT/EOF` lines or only
 * `name{labels} value` lines -> openmetrics; a comma in the first line -> csv. When several
 * formats fit, the file extension (.json .jsonl .csv .prom .xml) decides if it names one of them.
 * @throws InputError when nothing fits, or several fit and the extension does not decide; the
 *   message lists the candidates and says to pass `--input-format`.
 * @example detectFormat('BenchmarkA-8 10 5 ns/op\n', 'out.txt') // 'gobench'
 */
function detectFormat(text, file) {
    const head = headLines(text);
    const first = head[0];
    if (first === undefined) {
        throw new input_error/* InputError */.d('the metric file is empty', { where: file, fix: 'check the step that writes this file' });
    }
    const candidates = new Set();
    if (first.startsWith('<')) {
        if (/<testsuites?[\s>/]/.test(text.slice(0, 65536)))
            candidates.add('junit');
    }
    else if (first.startsWith('{') || first.startsWith('[')) {
        candidates.add(looksLikeJsonLine(first, head.length) ? 'jsonl' : 'json');
    }
    else {
        if (head.some((line) => GO_RESULT.test(line)))
            candidates.add('gobench');
        const samples = head.filter((line) => !line.startsWith('#'));
        if (head.some((line) => OM_COMMENT.test(line)) || (samples.length > 0 && samples.every((line) => OM_SAMPLE.test(line)))) {
            candidates.add('openmetrics');
        }
        if (first.includes(',') && !first.startsWith('#'))
            candidates.add('csv');
    }
    if (candidates.size === 1)
        return [...candidates][0];
    const byExtension = EXTENSIONS.get(/\.([^./\\]+)$/.exec(file)?.[1]?.toLowerCase() ?? '');
    if (byExtension && (candidates.size === 0 ? false : candidates.has(byExtension)))
        return byExtension;
    const listed = candidates.size > 0 ? [...candidates] : [...formats/* METRIC_FORMATS */.Y];
    throw new input_error/* InputError */.d(candidates.size > 0
        ? `cannot tell the format of the metric file: it could be ${listed.join(' or ')}`
        : `the metric file is in no format Bellgate recognises (it reads ${listed.join(', ')})`, { where: file, fix: `pass --input-format (${listed.join(' | ')}) to say which` });
}
function headLines(text) {
    const out = [];
    let start = text.charCodeAt(0) === 0xfeff ? 1 : 0;
    while (start < text.length && out.length < HEAD_LINES) {
        let end = text.indexOf('\n', start);
        if (end < 0)
            end = text.length;
        // Cap each line looked at: detection must stay cheap on a huge single-line file.
        const line = text.slice(start, Math.min(end, start + 4096)).trim();
        if (line !== '')
            out.push(line);
        start = end + 1;
    }
    return out;
}
/** A first line that is a whole JSON object with a string "name" starts JSON Lines. */
function looksLikeJsonLine(first, lineCount) {
    if (!first.startsWith('{') || !first.endsWith('}'))
        return false;
    try {
        const value = JSON.parse(first);
        return typeof value === 'object' && value !== null && typeof value.name === 'string' && (lineCount > 1 || !('metrics' in value));
    }
    catch {
        return false;
    }
}

;// CONCATENATED MODULE: ./src/inputs/parse-core.ts



/** Drops a byte-order mark and settles the format (given, or detected from the content). */
function chooseFormat(text, file, format) {
    const body = text.charCodeAt(0) === 0xfeff ? text.slice(1) : text;
    const chosen = format === undefined || format === '' ? detectFormat(body, file) : (0,formats/* metricFormat */.A)(format);
    return { body, chosen };
}
/**
 * Runs a reader so that only InputError comes out, and refuses a file that yields no metric at all
 * (almost always a step that failed to write it).
 */
function runReader(reader, chosen, body, file, limits) {
    let result;
    try {
        result = reader(body, file, limits);
    }
    catch (error) {
        if (error instanceof input_error/* InputError */.d)
            throw error;
        // A library failing in a way it does not document must still reach the user as bad input.
        throw new input_error/* InputError */.d(`cannot read the file as ${chosen}: ${error instanceof Error ? error.message : String(error)}`, {
            where: file,
            fix: 'check the file, or choose another format with --input-format',
            cause: error,
        });
    }
    if (result.readings.length === 0 && result.notFitted.size === 0) {
        throw new input_error/* InputError */.d(`no metrics found in the file (read as ${chosen})`, {
            where: file,
            fix: 'check the step that writes this file, or choose another format with --input-format',
        });
    }
    return result;
}

;// CONCATENATED MODULE: ./src/inputs/parse-lazy.ts


// Each reader (and its parser library: csv-parse, fast-xml-parser) loads only when a file of that
// format turns up, which keeps them out of the start-up of a run that reads plain JSON.
const LOADERS = {
    json: async () => (await __webpack_require__.e(/* import() */ 51).then(__webpack_require__.bind(__webpack_require__, 3051))).readJsonMetrics,
    jsonl: async () => (await __webpack_require__.e(/* import() */ 243).then(__webpack_require__.bind(__webpack_require__, 243))).readJsonLines,
    csv: async () => (await Promise.all(/* import() */[__webpack_require__.e(712), __webpack_require__.e(881)]).then(__webpack_require__.bind(__webpack_require__, 3881))).readCsvMetrics,
    openmetrics: async () => (await __webpack_require__.e(/* import() */ 532).then(__webpack_require__.bind(__webpack_require__, 6532))).readOpenMetrics,
    gobench: async () => (await __webpack_require__.e(/* import() */ 469).then(__webpack_require__.bind(__webpack_require__, 1469))).readGoBench,
    junit: async () => (await Promise.all(/* import() */[__webpack_require__.e(893), __webpack_require__.e(241)]).then(__webpack_require__.bind(__webpack_require__, 3241))).readJunit,
};
/**
 * parseMetricText (parse.ts), loading only the reader the format needs.
 * @throws InputError as parseMetricText.
 * @example (await parseMetricTextLazily('{"a": 1}', 'm.json')).readings.length // 1
 */
async function parseMetricTextLazily(text, file, format, limits = inputs_limits/* DEFAULT_LIMITS */.dR) {
    const { body, chosen } = chooseFormat(text, file, format);
    return runReader(await LOADERS[chosen](), chosen, body, file, limits);
}

// EXTERNAL MODULE: ./src/inputs/names.ts
var names = __webpack_require__(5585);
;// CONCATENATED MODULE: ./src/inputs/pattern.ts


/**
 * Splits `path-or-glob => prefix`: every metric read from the files the pattern matches is named
 * `<prefix>/<name>` (`bench/*.txt => server` turns `BenchmarkRoute/ns/op` into
 * `server/BenchmarkRoute/ns/op`). Slashes around the prefix are dropped; without `=>` there is
 * no prefix. The prefix follows the metric name rule (names.ts).
 * @throws InputError for an empty pattern or prefix.
 * @example splitPattern('out/*.json => api') // { pattern: 'out/*.json', prefix: 'api' }
 */
function splitPattern(text) {
    const arrow = text.indexOf('=>');
    const pattern = (arrow < 0 ? text : text.slice(0, arrow)).trim();
    if (pattern === '') {
        throw new input_error/* InputError */.d(`empty metric file pattern in ${JSON.stringify(text)}`, { fix: 'write a path or glob, optionally followed by "=> prefix"' });
    }
    if (arrow < 0)
        return { pattern };
    return { pattern, prefix: normalizePrefix(text.slice(arrow + 2), text) };
}
/**
 * A prefix as metric names will carry it: trimmed, without slashes at either end, following the
 * metric name rule. Shared by `pattern => prefix` and the `prefixes` option of readMetricFiles.
 * @throws InputError for an empty prefix or one the name rule refuses.
 * @example normalizePrefix(' /api/ ', 'x') // 'api'
 */
function normalizePrefix(text, where) {
    const prefix = trimSlashes(text.trim());
    if (prefix === '') {
        throw new input_error/* InputError */.d(`empty prefix in ${JSON.stringify(where)}`, { fix: 'write "path => prefix", or leave out the prefix' });
    }
    return (0,names/* checkMetricName */.WO)(prefix, where);
}
/** `<prefix>/<name>`, or the name itself without a prefix; the result is checked again (length). */
function prefixed(prefix, name, where) {
    return prefix === undefined ? name : (0,names/* checkMetricName */.WO)(`${prefix}/${name}`, where);
}
function trimSlashes(text) {
    let start = 0;
    let end = text.length;
    while (start < end && text[start] === '/')
        start++;
    while (end > start && text[end - 1] === '/')
        end--;
    return text.slice(start, end);
}

;// CONCATENATED MODULE: ./src/inputs/read-files.ts







/**
 * Reads every metric file the patterns name and folds them into one Run (collectRun).
 * - A pattern is a path or a glob (tinyglobby: `**`, `*`, `{a,b}`), optionally `pattern => prefix`
 *   (pattern.ts). An existing file path is taken literally even if it holds glob characters.
 *   A pattern that matches no file is an error: a silent empty run would pass every gate.
 * - Each file's size is checked against `limits.maxFileBytes` before it is read; line length and
 *   the number of metrics are checked while parsing, and the total number of metrics after.
 * - A file matched by two patterns with the same prefix is read once.
 * @throws InputError for no match, a limit passed (naming `limits.max-file-bytes` etc.), a file
 *   that is not UTF-8 text, or any problem in a file.
 * @example await readMetricFiles(['bench/*.txt'], { limits: DEFAULT_LIMITS, aggregateFor: () => 'median' })
 */
async function readMetricFiles(patterns, options) {
    const limits = { ...inputs_limits/* DEFAULT_LIMITS */.dR, ...options.limits };
    const cwd = external_node_path_default().resolve(options.cwd ?? process.cwd());
    if (patterns.length === 0) {
        throw new input_error/* InputError */.d('no metric files given', { fix: 'name at least one metric file or glob' });
    }
    const done = new Set();
    const results = [];
    for (const text of patterns) {
        const { pattern, prefix: arrowPrefix } = splitPattern(text);
        const given = options.prefixes?.get(pattern) ?? options.prefixes?.get(text);
        const prefix = arrowPrefix ?? (given === undefined ? undefined : normalizePrefix(given, `prefix for ${pattern}`));
        for (const file of await expand(pattern, cwd)) {
            const key = `${prefix ?? ''}\u0000${file}`;
            if (done.has(key))
                continue;
            done.add(key);
            const shown = external_node_path_default().relative(cwd, file).startsWith('..') ? file : external_node_path_default().relative(cwd, file);
            const result = await readOne(file, shown, options.format, limits);
            results.push(prefix === undefined ? result : withPrefix(result, prefix));
        }
    }
    const run = collectRun(results, options.aggregateFor);
    if (run.metrics.size > limits.maxMetrics) {
        throw (0,inputs_limits/* limitError */.yT)('maxMetrics', limits.maxMetrics, patterns.join(', '), `the metric files hold ${run.metrics.size} metrics`);
    }
    return run;
}
async function expand(pattern, cwd) {
    const literal = external_node_path_default().resolve(cwd, pattern);
    const info = await (0,promises_.stat)(literal).catch(() => undefined);
    if (info?.isFile())
        return [literal];
    if (info?.isDirectory()) {
        throw new input_error/* InputError */.d(`${pattern} is a directory`, { fix: `name files in it, such as ${external_node_path_default().join(pattern, '*.json')}` });
    }
    // The glob library (tinyglobby, with picomatch) loads only for a pattern that is not a file.
    const { glob } = await Promise.all(/* import() */[__webpack_require__.e(6), __webpack_require__.e(382)]).then(__webpack_require__.bind(__webpack_require__, 3382));
    const files = await glob([pattern], { cwd, absolute: true, onlyFiles: true, dot: true, expandDirectories: false });
    if (files.length === 0) {
        throw new input_error/* InputError */.d(`no metric file matches ${JSON.stringify(pattern)} (looked in ${cwd})`, {
            fix: 'check the path (relative to the working directory) and that the step writing the metrics ran',
        });
    }
    return files.sort();
}
async function readOne(file, shown, format, limits) {
    const info = await (0,promises_.stat)(file);
    if (info.size > limits.maxFileBytes) {
        throw (0,inputs_limits/* limitError */.yT)('maxFileBytes', limits.maxFileBytes, shown, `the file is ${info.size} bytes`);
    }
    let text;
    try {
        text = new TextDecoder('utf-8', { fatal: true }).decode(await (0,promises_.readFile)(file));
    }
    catch (error) {
        if (error instanceof TypeError) {
            throw new input_error/* InputError */.d('the file is not UTF-8 text', { where: shown, fix: 'write metric files as UTF-8', cause: error });
        }
        throw new input_error/* InputError */.d(`cannot read the file: ${error.message}`, { where: shown, cause: error });
    }
    return parseMetricTextLazily(text, shown, format, limits);
}
function withPrefix(result, prefix) {
    return {
        readings: result.readings.map((r) => ({ ...r, name: prefixed(prefix, r.name, r.where) })),
        notFitted: new Map([...result.notFitted].map(([name, reason]) => [prefixed(prefix, name), reason])),
        meta: result.meta,
    };
}

// EXTERNAL MODULE: ./src/config/rules.ts
var rules = __webpack_require__(5413);
;// CONCATENATED MODULE: ./src/cli/load-run.ts



/**
 * Reads this run's metric files (globs allowed) into one Run, aggregating repeated samples of a
 * metric by the aggregate its config rule names. `--input-format` beats the config's `input-format`.
 * @throws InputError for unreadable or malformed files, a pattern matching nothing, or a bad --prefix.
 */
async function loadRun(ctx, config, options) {
    const format = options.inputFormat ?? config.inputFormat;
    return readMetricFiles(options.metrics, {
        ...(format === undefined ? {} : { format }),
        limits: config.limits,
        aggregateFor: (name) => (0,rules/* settingsFor */.z)(config, name).aggregate,
        prefixes: parsePrefixes(options.prefix ?? []),
        cwd: ctx.io.cwd,
    });
}
/**
 * `--prefix PATTERN=PREFIX` pairs into the map readMetricFiles takes: the metrics read from files
 * matched by PATTERN get `PREFIX/` in front of their names. Split at the last '=' (globs rarely
 * hold one; prefixes never should).
 * @example parsePrefixes(['bench/*.json=api']) // Map { 'bench/*.json' => 'api' }
 * @throws InputError when a value has no '=' or an empty side.
 */
function parsePrefixes(values) {
    const prefixes = new Map();
    for (const value of values) {
        const at = value.lastIndexOf('=');
        const pattern = at > 0 ? value.slice(0, at) : '';
        const prefix = at > 0 ? value.slice(at + 1) : '';
        if (pattern === '' || prefix === '') {
            throw new input_error/* InputError */.d(`--prefix "${value}" is not PATTERN=PREFIX`, {
                where: '--prefix',
                fix: 'write it as --prefix "bench/*.json=api" (the files the pattern matches get "api/" before each metric name)',
            });
        }
        prefixes.set(pattern, prefix);
    }
    return prefixes;
}


/***/ }),

/***/ 6497:
/***/ ((__unused_webpack_module, __webpack_exports__, __webpack_require__) => {

/* harmony export */ __webpack_require__.d(__webpack_exports__, {
/* harmony export */   Ak: () => (/* binding */ checkLineLengths),
/* harmony export */   dR: () => (/* binding */ DEFAULT_LIMITS),
/* harmony export */   yT: () => (/* binding */ limitError)
/* harmony export */ });
/* unused harmony export LIMIT_KEYS */
/* harmony import */ var _model_input_error_js__WEBPACK_IMPORTED_MODULE_0__ = __webpack_require__(8250);

/** Limits used when the config gives none: 64 MiB per file, 1 MiB per line, 100000 metrics. */
const DEFAULT_LIMITS = Object.freeze({
    maxFileBytes: 64 * 1024 * 1024,
    maxLineLength: 1024 * 1024,
    maxMetrics: 100_000,
});
/** The config key that raises each limit, for refusal messages. */
const LIMIT_KEYS = Object.freeze({
    maxFileBytes: 'limits.max-file-bytes',
    maxLineLength: 'limits.max-line-length',
    maxMetrics: 'limits.max-metrics',
});
/**
 * The refusal for a limit that was passed: names the limit, its value and the key that raises it.
 * @example limitError('maxMetrics', 100000, 'run.json', 'more than 100000 metrics')
 */
function limitError(limit, value, where, what) {
    return new _model_input_error_js__WEBPACK_IMPORTED_MODULE_0__/* .InputError */ .d(`${what} (limit ${LIMIT_KEYS[limit]} = ${value})`, {
        where,
        fix: `raise ${LIMIT_KEYS[limit]} in the config file if this input is expected`,
    });
}
/**
 * Refuses text with a line longer than `limits.maxLineLength` characters. O(n), no copies.
 * Applied by the line-oriented readers (JSON Lines, CSV, OpenMetrics, Go benchmark format), whose
 * work is per line; whole-document formats (own JSON, JUnit XML) are often written on one line and
 * are bounded by `limits.max-file-bytes` instead.
 * @throws InputError naming the line and `limits.max-line-length`.
 */
function checkLineLengths(text, file, limits) {
    const max = limits.maxLineLength;
    if (text.length <= max)
        return;
    let start = 0;
    let line = 1;
    while (start <= text.length) {
        let end = text.indexOf('\n', start);
        if (end < 0)
            end = text.length;
        if (end - start > max) {
            throw limitError('maxLineLength', max, `${file}:${line}`, `line ${line} is ${end - start} characters long`);
        }
        start = end + 1;
        line++;
    }
}


/***/ })

};
