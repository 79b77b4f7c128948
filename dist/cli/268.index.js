export const id = 268;
export const ids = [268];
export const modules = {

/***/ 6783:
/***/ ((__unused_webpack_module, __webpack_exports__, __webpack_require__) => {

/* harmony export */ __webpack_require__.d(__webpack_exports__, {
/* harmony export */   Z: () => (/* binding */ loadConfig)
/* harmony export */ });
/* unused harmony export LOOKED_UP_CONFIGS */
/* harmony import */ var _config_locate_js__WEBPACK_IMPORTED_MODULE_0__ = __webpack_require__(5562);

/** Where a config is looked for without --config (src/config/locate.ts). */
const LOOKED_UP_CONFIGS = (/* unused pure expression or super */ null && (DEFAULT_CONFIG_PATHS));
/**
 * The config for this invocation: `--config FILE` must exist (InputError naming it otherwise);
 * without it, `.github/bellgate.yml` (or `.yaml`) in the working folder is used when present, else
 * the defaults. The path goes in as the user wrote it, resolved against our cwd by readConfigFile,
 * so its "file:line:col" messages point where the user looks.
 * @throws InputError for a missing explicit file or an invalid config (with file:line:col).
 * @example await loadConfig(ctx, undefined) // the defaults in a folder without .github/bellgate.yml
 */
async function loadConfig(ctx, path) {
    return (0,_config_locate_js__WEBPACK_IMPORTED_MODULE_0__/* .loadConfigLazily */ .yH)(path, ctx.io.cwd);
}


/***/ }),

/***/ 5881:
/***/ ((__unused_webpack_module, __webpack_exports__, __webpack_require__) => {

/* harmony export */ __webpack_require__.d(__webpack_exports__, {
/* harmony export */   v: () => (/* binding */ recordRun)
/* harmony export */ });
/* harmony import */ var _history_merge_js__WEBPACK_IMPORTED_MODULE_0__ = __webpack_require__(7822);

/**
 * Appends one run to the history (a run with the same id is replaced), trims to the newest `keep`
 * runs — the only deletion — and saves through the store, which refuses to lose runs otherwise.
 * @returns the history as saved.
 * @throws StoreError when the store cannot write.
 */
async function recordRun(store, history, info, run, keep) {
    const next = (0,_history_merge_js__WEBPACK_IMPORTED_MODULE_0__/* .trimHistory */ .lj)((0,_history_merge_js__WEBPACK_IMPORTED_MODULE_0__/* .appendRun */ .ah)(history, info, run), keep);
    await store.save(next, history.runs.length);
    return next;
}


/***/ }),

/***/ 5795:
/***/ ((__unused_webpack_module, __webpack_exports__, __webpack_require__) => {

/* harmony export */ __webpack_require__.d(__webpack_exports__, {
/* harmony export */   g: () => (/* binding */ runInfoFrom)
/* harmony export */ });
/* harmony import */ var _model_input_error_js__WEBPACK_IMPORTED_MODULE_0__ = __webpack_require__(8250);

/** ISO-8601 date-time with a zone, e.g. 2026-05-04T10:20:30Z or 2026-05-04T10:20:30.5+02:00. */
const ISO_TIME = /^\d{4}-\d{2}-\d{2}T\d{2}:\d{2}(:\d{2}(\.\d+)?)?(Z|[+-]\d{2}:\d{2})$/;
/**
 * Describes the run being recorded. Flags win; in GitHub Actions the standard variables fill the
 * gaps (id = GITHUB_RUN_ID-GITHUB_RUN_ATTEMPT, so a re-run replaces rather than doubles); else the
 * id is "local-" plus the time, and the time is now.
 * @throws InputError when --time is not an ISO-8601 date-time with a zone, or --id is empty.
 * @example runInfoFrom(ctx, { id: '77-1', time: '2026-05-04T10:20:30Z' }) // { id: '77-1', time: '2026-05-04T10:20:30.000Z', ... }
 */
function runInfoFrom(ctx, options) {
    const env = ctx.io.env;
    let time;
    if (options.time !== undefined) {
        const ms = Date.parse(options.time);
        if (!ISO_TIME.test(options.time) || !Number.isFinite(ms)) {
            throw new _model_input_error_js__WEBPACK_IMPORTED_MODULE_0__/* .InputError */ .d(`--time "${options.time}" is not an ISO-8601 date-time`, {
                where: '--time',
                fix: 'write it like 2026-05-04T10:20:30Z (a zone, Z or +hh:mm, is required)',
            });
        }
        time = new Date(ms).toISOString();
    }
    else {
        time = ctx.now().toISOString();
    }
    const ciId = env.GITHUB_RUN_ID ? `${env.GITHUB_RUN_ID}-${env.GITHUB_RUN_ATTEMPT || '1'}` : undefined;
    const id = options.id ?? ciId ?? `local-${time}`;
    if (id.trim() === '') {
        throw new _model_input_error_js__WEBPACK_IMPORTED_MODULE_0__/* .InputError */ .d('--id is empty', { where: '--id', fix: 'give a run id such as "1234-1", or leave the flag out' });
    }
    const info = { id, time };
    const sha = options.sha ?? (env.GITHUB_SHA || undefined);
    const ref = options.ref ?? (env.GITHUB_REF || undefined);
    const event = env.GITHUB_EVENT_NAME || undefined;
    if (sha !== undefined)
        info.sha = sha;
    if (ref !== undefined)
        info.ref = ref;
    if (event !== undefined)
        info.event = event;
    return info;
}


/***/ }),

/***/ 5779:
/***/ ((__unused_webpack_module, __webpack_exports__, __webpack_require__) => {

__webpack_require__.r(__webpack_exports__);
/* harmony export */ __webpack_require__.d(__webpack_exports__, {
/* harmony export */   runRecord: () => (/* binding */ runRecord)
/* harmony export */ });
/* harmony import */ var _load_config_js__WEBPACK_IMPORTED_MODULE_0__ = __webpack_require__(6783);
/* harmony import */ var _load_run_js__WEBPACK_IMPORTED_MODULE_1__ = __webpack_require__(5946);
/* harmony import */ var _open_history_js__WEBPACK_IMPORTED_MODULE_2__ = __webpack_require__(6952);
/* harmony import */ var _record_run_js__WEBPACK_IMPORTED_MODULE_3__ = __webpack_require__(5881);
/* harmony import */ var _run_info_js__WEBPACK_IMPORTED_MODULE_4__ = __webpack_require__(5795);





/**
 * The work of `bellgate record` (loaded only when that command runs): appends the run to the
 * history file and says how many runs are kept.
 * @throws InputError (bad files, flags), StoreError (history unreadable or unwritable).
 * @example await runRecord(ctx, { metrics: ['bench.json'], history: 'h.json', series: 'default' })
 */
async function runRecord(ctx, options) {
    const config = await (0,_load_config_js__WEBPACK_IMPORTED_MODULE_0__/* .loadConfig */ .Z)(ctx, options.config);
    const run = await (0,_load_run_js__WEBPACK_IMPORTED_MODULE_1__/* .loadRun */ .S)(ctx, config, options);
    const { history, store } = await (0,_open_history_js__WEBPACK_IMPORTED_MODULE_2__/* .openHistory */ .j)(ctx, options.history, options.series);
    const info = (0,_run_info_js__WEBPACK_IMPORTED_MODULE_4__/* .runInfoFrom */ .g)(ctx, options);
    // openHistory always returns a store when a path is given; the guard keeps the types honest.
    if (!store)
        return;
    const saved = await (0,_record_run_js__WEBPACK_IMPORTED_MODULE_3__/* .recordRun */ .v)(store, history, info, run, config.keep);
    const replaced = history.runs.some((r) => r.id === info.id) ? ' (replacing the earlier run with this id)' : '';
    ctx.io.stdout(`recorded run ${info.id} with ${run.metrics.size} metrics in ${store.describe()}${replaced}; ${saved.runs.length} runs kept\n`);
}


/***/ }),

/***/ 1954:
/***/ ((__unused_webpack_module, __webpack_exports__, __webpack_require__) => {

/* harmony export */ __webpack_require__.d(__webpack_exports__, {
/* harmony export */   sb: () => (/* binding */ defaultConfig)
/* harmony export */ });
/* unused harmony exports DEFAULT_SETTINGS, DEFAULT_LIMITS, DEFAULT_KEEP */
/**
 * Settings of a metric that no rule touches (DESIGN.md, "Config file"). A 1% tolerance keeps a
 * metric with a tiny spread from failing on a change nobody would act on.
 */
const DEFAULT_SETTINGS = Object.freeze({
    cutoff: 0.01,
    worse: 'higher',
    tolerance: Object.freeze({ kind: 'percent', amount: 0.01 }),
    resolution: 0,
    window: 60,
    minRuns: 8,
    transform: 'none',
    fit: 'mle',
    uncertainty: 'predictive',
    ignore: false,
    aggregate: 'median',
    changePoints: true,
});
/** Limits that fit ordinary CI output: 64 MiB files, 1 MiB lines, 100,000 metrics a run. */
const DEFAULT_LIMITS = Object.freeze({
    maxFileBytes: 64 * 1024 * 1024,
    maxLineLength: 1024 * 1024,
    maxMetrics: 100_000,
});
/** Newest runs kept in a history document. */
const DEFAULT_KEEP = 500;
/**
 * The configuration used when there is no file (or it is empty): a fresh, mutable copy each call.
 * @example defaultConfig().defaults.cutoff // 0.01
 */
function defaultConfig() {
    return {
        defaults: { ...DEFAULT_SETTINGS, tolerance: { ...DEFAULT_SETTINGS.tolerance } },
        rules: [],
        groups: [],
        family: 'none',
        keep: DEFAULT_KEEP,
        limits: { ...DEFAULT_LIMITS },
        source: '<defaults>',
    };
}


/***/ }),

/***/ 5562:
/***/ ((__unused_webpack_module, __webpack_exports__, __webpack_require__) => {

/* harmony export */ __webpack_require__.d(__webpack_exports__, {
/* harmony export */   _X: () => (/* binding */ DEFAULT_CONFIG_PATHS),
/* harmony export */   yH: () => (/* binding */ loadConfigLazily)
/* harmony export */ });
/* unused harmony export anyConfigPresent */
/* harmony import */ var node_fs_promises__WEBPACK_IMPORTED_MODULE_0__ = __webpack_require__(1455);
/* harmony import */ var node_fs_promises__WEBPACK_IMPORTED_MODULE_0___default = /*#__PURE__*/__webpack_require__.n(node_fs_promises__WEBPACK_IMPORTED_MODULE_0__);
/* harmony import */ var node_path__WEBPACK_IMPORTED_MODULE_1__ = __webpack_require__(6760);
/* harmony import */ var node_path__WEBPACK_IMPORTED_MODULE_1___default = /*#__PURE__*/__webpack_require__.n(node_path__WEBPACK_IMPORTED_MODULE_1__);
/* harmony import */ var _defaults_js__WEBPACK_IMPORTED_MODULE_2__ = __webpack_require__(1954);



/** Where a config is looked for when none is named, relative to the working folder. */
const DEFAULT_CONFIG_PATHS = ['.github/bellgate.yml', '.github/bellgate.yaml'];
/**
 * Whether any of the paths might hold a config: true unless every one is plainly absent (ENOENT,
 * ENOTDIR), so a folder or an unreadable file still reaches readConfigFile and its clear refusal.
 */
async function anyConfigPresent(cwd, paths = DEFAULT_CONFIG_PATHS) {
    for (const p of paths) {
        try {
            await (0,node_fs_promises__WEBPACK_IMPORTED_MODULE_0__.stat)((0,node_path__WEBPACK_IMPORTED_MODULE_1__.resolve)(cwd, p));
            return true;
        }
        catch (error) {
            const code = error.code;
            if (code !== 'ENOENT' && code !== 'ENOTDIR')
                return true;
        }
    }
    return false;
}
/**
 * The config for a run: a named file must exist (unless `required` is false); without a name,
 * `.github/bellgate.yml` (or `.yaml`) is read when present, else the defaults are used. The reader
 * (the YAML library, ~290 KB, and the generated schema validator) is imported only when there is
 * a file to read, picomatch only when its rules hold real globs; this module itself loads none.
 * @throws InputError for a missing named file or an invalid config (with file:line:col).
 * @example await loadConfigLazily(undefined, '/repo') // the defaults in a folder without a config file
 */
async function loadConfigLazily(path, cwd, required = path !== undefined) {
    if (path === undefined && !(await anyConfigPresent(cwd)))
        return (0,_defaults_js__WEBPACK_IMPORTED_MODULE_2__/* .defaultConfig */ .sb)();
    const { readConfigFile } = await Promise.all(/* import() */[__webpack_require__.e(815), __webpack_require__.e(964), __webpack_require__.e(115)]).then(__webpack_require__.bind(__webpack_require__, 1115));
    return readConfigFile(path, { cwd, required });
}


/***/ }),

/***/ 6471:
/***/ ((__unused_webpack_module, __webpack_exports__, __webpack_require__) => {

/* harmony export */ __webpack_require__.d(__webpack_exports__, {
/* harmony export */   Bz: () => (/* binding */ useFallbackCompiler),
/* harmony export */   Cp: () => (/* binding */ exactNameCompiler),
/* harmony export */   Gh: () => (/* binding */ exactMatcher),
/* harmony export */   at: () => (/* binding */ knownMatcher),
/* harmony export */   gV: () => (/* binding */ rememberMatcher),
/* harmony export */   sp: () => (/* binding */ matcherFor)
/* harmony export */ });
/* unused harmony export isPlainGlob */
// Characters that picomatch (dot: true, windows: false) reads as themselves, checked against it by
// test/config/name-matchers.test.ts. Left out: its specials (* ? [ ] { } ( ) ! + @ |), the escape
// '\', '"' and '$' (it treats them specially), and anything outside ASCII. A leading "./" is
// stripped by picomatch, so such a glob is not plain either.
const PLAIN = /^(?!\.\/)[A-Za-z0-9 _.,:;=#%&~<>'`^/-]+$/;
/**
 * True when the glob can only match the one name written, so a string comparison decides it and
 * no glob library is needed: letters, digits and the punctuation listed in PLAIN, not "./" first.
 * @example isPlainGlob('latency/calibrate') // true
 * @example isPlainGlob('latency/*') // false
 */
function isPlainGlob(glob) {
    return PLAIN.test(glob);
}
/**
 * The matcher of globs that are all plain names, each maybe with a leading '!' (exclude), with the
 * same meaning as compileGlobs: a name matches when it is one of the plain names (or there are
 * none) and none of the excluded ones. undefined when any glob needs the glob library.
 * @example exactMatcher(['a/b', 'a/c'])?.('a/c') // true
 */
function exactMatcher(globs) {
    const include = new Set();
    const exclude = new Set();
    for (const glob of globs) {
        const negated = glob.startsWith('!');
        const body = negated ? glob.slice(1) : glob;
        if (!isPlainGlob(body))
            return undefined;
        (negated ? exclude : include).add(body);
    }
    if (include.size === 1 && exclude.size === 0) {
        const only = [...include][0];
        return (name) => name === only;
    }
    return (name) => (include.size === 0 || include.has(name)) && !exclude.has(name);
}
// Matchers by globs array (the `match` array of a rule or group), filled when a config is read,
// so settingsFor and groupFor stay pure and synchronous however the glob library was loaded.
const compiled = new WeakMap();
let fallback;
/** Files the matcher of a globs array for matcherFor; returns it. */
function rememberMatcher(globs, matcher) {
    compiled.set(globs, matcher);
    return matcher;
}
/** The matcher filed for this globs array, if any. */
function knownMatcher(globs) {
    return compiled.get(globs);
}
/** Sets the compiler for globs that were never filed (glob-matcher.ts registers picomatch's). */
function useFallbackCompiler(compile) {
    fallback = compile;
}
/**
 * The matcher for a rule's globs: the one filed when the config was read, else plain names
 * compared as strings, else the fallback compiler (present once glob-matcher.ts is loaded).
 * @throws Error when the globs need the glob library and it was never loaded: a Config built by
 *   hand with globs must be read through parseConfig/readConfigFile or compiled with compileGlobs.
 * @example matcherFor(['latency/render'])('latency/render') // true
 */
function matcherFor(globs) {
    const known = compiled.get(globs);
    if (known)
        return known;
    const made = exactMatcher(globs) ?? fallback?.(globs);
    if (!made)
        throw new Error(`the globs ${JSON.stringify(globs)} were never compiled; read the config with readConfigFile or parseConfig`);
    return rememberMatcher(globs, made);
}
/** Compiles rules of plain names only, without any glob library. */
const exactNameCompiler = {
    compile(globs) {
        const matcher = knownMatcher(globs) ?? exactMatcher(globs);
        if (!matcher)
            throw new Error(`exactNameCompiler got globs that need the glob library: ${JSON.stringify(globs)}`);
        return rememberMatcher(globs, matcher);
    },
    isLiteral: isPlainGlob,
};


/***/ }),

/***/ 5413:
/***/ ((__unused_webpack_module, __webpack_exports__, __webpack_require__) => {

/* harmony export */ __webpack_require__.d(__webpack_exports__, {
/* harmony export */   R: () => (/* binding */ groupFor),
/* harmony export */   z: () => (/* binding */ settingsFor)
/* harmony export */ });
/* harmony import */ var _name_matchers_js__WEBPACK_IMPORTED_MODULE_0__ = __webpack_require__(6471);

/**
 * The settings that decide one metric: the defaults, then every `metrics:` rule whose globs match
 * the name, in file order, so a later match overrides an earlier one key by key. Pure.
 * Globs are picomatch globs over the whole name; `*` does not cross '/', `**` does; a glob starting
 * with '!' excludes (see compileGlobs). A metric is never relative to itself: when the resolved
 * `relative-to` names the metric (the calibration benchmark matched by its own rule), it is dropped.
 * The matchers were compiled when the config was read (name-matchers.ts), so no glob library is
 * loaded here.
 * @example settingsFor(config, 'throughput/home').worse // 'lower' with the rule { match: 'throughput/*', worse: lower }
 */
function settingsFor(config, metric) {
    const settings = { ...config.defaults };
    for (const rule of config.rules) {
        if ((0,_name_matchers_js__WEBPACK_IMPORTED_MODULE_0__/* .matcherFor */ .sp)(rule.match)(metric))
            Object.assign(settings, rule.settings);
    }
    if (settings.relativeTo === metric)
        delete settings.relativeTo;
    return settings;
}
/**
 * The group a metric belongs to: the first `groups:` entry whose globs match, or undefined.
 * @example groupFor(config, 'latency/render')?.name // 'latency' with the group { name: latency, match: 'latency/*' }
 */
function groupFor(config, metric) {
    return config.groups.find((group) => (0,_name_matchers_js__WEBPACK_IMPORTED_MODULE_0__/* .matcherFor */ .sp)(group.match)(metric));
}


/***/ }),

/***/ 71:
/***/ ((__unused_webpack_module, __webpack_exports__, __webpack_require__) => {

/* harmony export */ __webpack_require__.d(__webpack_exports__, {
/* harmony export */   JZ: () => (/* binding */ median),
/* harmony export */   Te: () => (/* binding */ medianInPlace),
/* harmony export */   hK: () => (/* binding */ medianAbsoluteDeviation)
/* harmony export */ });
/* harmony import */ var _input_error_js__WEBPACK_IMPORTED_MODULE_0__ = __webpack_require__(8250);

/** Rejects what has no median: an empty set or a non-finite value (1-based position in the message). */
function checkFinite(values) {
    if (values.length === 0)
        throw new _input_error_js__WEBPACK_IMPORTED_MODULE_0__/* .InputError */ .d('cannot take the median of an empty set of values');
    for (let i = 0; i < values.length; i++) {
        const x = values[i];
        if (!Number.isFinite(x))
            throw new _input_error_js__WEBPACK_IMPORTED_MODULE_0__/* .InputError */ .d(`value ${x} at position ${i + 1} is not a finite number`);
    }
}
/**
 * Moves the k-th smallest of buffer[0..length) to index k, smaller-or-equal values before it and
 * larger-or-equal after (Hoare's FIND / quickselect, Hoare 1961, "Algorithm 65: Find"), with a
 * median-of-three pivot so sorted and reversed inputs stay linear. O(length) expected.
 * The values must be finite (no NaN: comparisons with NaN would not order).
 */
function selectInPlace(buffer, length, k) {
    let lo = 0;
    let hi = length - 1;
    while (hi > lo) {
        const mid = (lo + hi) >> 1;
        // Median of three: order buffer[lo] <= buffer[mid] <= buffer[hi], pivot on the middle one.
        if (buffer[mid] < buffer[lo])
            swap(buffer, mid, lo);
        if (buffer[hi] < buffer[lo])
            swap(buffer, hi, lo);
        if (buffer[hi] < buffer[mid])
            swap(buffer, hi, mid);
        const pivot = buffer[mid];
        let i = lo;
        let j = hi;
        while (i <= j) {
            while (buffer[i] < pivot)
                i++;
            while (buffer[j] > pivot)
                j--;
            if (i <= j) {
                swap(buffer, i, j);
                i++;
                j--;
            }
        }
        // Now [lo, j] <= pivot <= [i, hi], and any index strictly between j and i holds the pivot.
        if (k <= j)
            hi = j;
        else if (k >= i)
            lo = i;
        else
            break;
    }
    return buffer[k];
}
function swap(buffer, a, b) {
    const t = buffer[a];
    buffer[a] = buffer[b];
    buffer[b] = t;
}
/**
 * Median of buffer[0..length), reordering that part of the buffer (no copy). For the change-point
 * detector, which reuses one scratch buffer per call. The values must be finite and length >= 1.
 * O(length) expected (selection, not a sort): the same value a sort would give.
 * @example medianInPlace(Float64Array.of(3, 1, 2, 10), 4) // 2.5
 */
function medianInPlace(buffer, length) {
    const half = length >> 1;
    const upper = selectInPlace(buffer, length, half);
    if (length % 2 === 1)
        return upper;
    // Everything before `half` is <= the upper middle value; the lower middle is their largest.
    let lower = buffer[0];
    for (let i = 1; i < half; i++)
        if (buffer[i] > lower)
            lower = buffer[i];
    return (lower + upper) / 2;
}
/**
 * Median of the values. O(n) expected, by selection on a copy (the input is not reordered).
 * Throws InputError on an empty input or a non-finite value.
 * @example median([3, 1, 2, 10]) // 2.5
 */
function median(values) {
    checkFinite(values);
    return medianInPlace(Float64Array.from(values), values.length);
}
/**
 * Median absolute deviation from the median (unscaled). Multiply by 1.4826 for a consistent
 * estimate of sigma under a Gaussian (Rousseeuw & Croux 1993; 1.4826 = 1 / Phi^-1(3/4)).
 * Throws InputError on an empty input or a non-finite value.
 * @example medianAbsoluteDeviation([1, 2, 3, 4, 100]) // 1
 */
function medianAbsoluteDeviation(values) {
    checkFinite(values);
    const n = values.length;
    const scratch = Float64Array.from(values);
    const centre = medianInPlace(scratch, n);
    // The median of |x - centre| does not depend on the order, so the reordered copy serves.
    for (let i = 0; i < n; i++)
        scratch[i] = Math.abs(scratch[i] - centre);
    return medianInPlace(scratch, n);
}


/***/ }),

/***/ 8884:
/***/ ((__unused_webpack_module, __webpack_exports__, __webpack_require__) => {

/* harmony export */ __webpack_require__.d(__webpack_exports__, {
/* harmony export */   R7: () => (/* binding */ meanAndSquares),
/* harmony export */   i2: () => (/* binding */ mean)
/* harmony export */ });
/* unused harmony export variance */
/* harmony import */ var _input_error_js__WEBPACK_IMPORTED_MODULE_0__ = __webpack_require__(8250);

/**
 * Mean and sum of squared deviations by the corrected two-pass algorithm (Chan, Golub & LeVeque,
 * "Algorithms for computing the sample variance", 1983): the second pass subtracts the mean first,
 * and the small correction term removes the rounding left in the mean. Large offsets (values like
 * 1e13 + small noise, NIST NumAcc4) keep their precision, which a one-pass sum of squares loses.
 * O(n) time, O(1) space. Throws InputError on an empty input or a non-finite value.
 *
 * @example meanAndSquares([1, 2, 3]) // { n: 3, mean: 2, squares: 2 }
 */
function meanAndSquares(values) {
    const n = values.length;
    if (n === 0)
        throw new _input_error_js__WEBPACK_IMPORTED_MODULE_0__/* .InputError */ .d('cannot fit an empty set of values');
    let sum = 0;
    for (let i = 0; i < n; i++) {
        const x = values[i];
        if (!Number.isFinite(x))
            throw new _input_error_js__WEBPACK_IMPORTED_MODULE_0__/* .InputError */ .d(`value ${x} at position ${i + 1} is not a finite number`);
        sum += x;
    }
    const first = sum / n;
    let squares = 0;
    let drift = 0;
    for (let i = 0; i < n; i++) {
        const d = values[i] - first;
        squares += d * d;
        drift += d;
    }
    squares -= (drift * drift) / n;
    return { n, mean: first + drift / n, squares: Math.max(0, squares) };
}
/** Arithmetic mean (two-pass, see meanAndSquares). @example mean([2, 4]) // 3 */
function mean(values) {
    return meanAndSquares(values).mean;
}
/**
 * Variance dividing by n ("mle", the maximum-likelihood estimate) or by n - 1 ("unbiased").
 * @example variance([1, 2, 3, 4], 'mle') // 1.25
 */
function variance(values, divisor) {
    const { n, squares } = meanAndSquares(values);
    if (divisor === 'unbiased') {
        if (n < 2)
            throw new InputError('the unbiased variance needs at least 2 values');
        return squares / (n - 1);
    }
    return squares / n;
}


/***/ })

};
