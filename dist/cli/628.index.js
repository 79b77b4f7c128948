export const id = 628;
export const ids = [628];
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

/***/ 4614:
/***/ ((__unused_webpack_module, __webpack_exports__, __webpack_require__) => {


// EXPORTS
__webpack_require__.d(__webpack_exports__, {
  w: () => (/* binding */ selectBaseline)
});

// EXTERNAL MODULE: ./src/model/input-error.ts
var input_error = __webpack_require__(8250);
// EXTERNAL MODULE: ./src/model/fit.ts
var fit = __webpack_require__(5046);
// EXTERNAL MODULE: ./src/model/median.ts
var median = __webpack_require__(71);
;// CONCATENATED MODULE: ./src/model/change-points.ts



/**
 * Scratch buffers shared by every call (the gate runs this once per metric; fresh typed arrays per
 * call were most of its cost). Grown on demand, never shrunk; safe because a call never yields
 * and nothing it calls re-enters detectChangePoints.
 */
let scratchSize = 0;
let work = new Float64Array(0);
let centred = new Float64Array(0);
let sum = new Float64Array(0);
let sumSq = new Float64Array(0);
let best = new Float64Array(0);
let totals = new Float64Array(0);
let previous = new Int32Array(0);
let candidates = new Int32Array(0);
let dropAt = new Int32Array(0);
function ensureScratch(n) {
    if (n + 1 <= scratchSize)
        return;
    scratchSize = Math.max(n + 1, 2 * scratchSize);
    work = new Float64Array(scratchSize);
    centred = new Float64Array(scratchSize);
    sum = new Float64Array(scratchSize);
    sumSq = new Float64Array(scratchSize);
    best = new Float64Array(scratchSize);
    totals = new Float64Array(scratchSize);
    previous = new Int32Array(scratchSize);
    candidates = new Int32Array(scratchSize);
    dropAt = new Int32Array(scratchSize);
}
/**
 * The noise sigma of centred[0..n), estimated from successive differences so level shifts barely
 * bias it: x_{t+1} - x_t has variance 2 sigma^2 within a segment, and a step touches one
 * difference only. Robust (1.4826 MAD / sqrt 2), falling back to the plain RMS of differences for
 * quantised data. The MAD is taken by selection in the `work` buffer (no sort, no copy).
 */
function noiseSigma(n) {
    const m = n - 1;
    const w = work;
    const c = centred;
    for (let i = 1; i < n; i++)
        w[i - 1] = finite(c[i] - c[i - 1], i);
    const centre = (0,median/* medianInPlace */.Te)(w, m);
    // Refilled in series order (not from the reordered buffer) so an overflow names its position.
    for (let i = 1; i < n; i++)
        w[i - 1] = finite(Math.abs(c[i] - c[i - 1] - centre), i);
    const robust = (fit/* MAD_TO_SIGMA */.tF * (0,median/* medianInPlace */.Te)(w, m)) / Math.SQRT2;
    if (robust > 0)
        return robust;
    // Summed in series order, as the differences come.
    let squares = 0;
    for (let i = 1; i < n; i++) {
        const d = c[i] - c[i - 1];
        squares += d * d;
    }
    return Math.sqrt(squares / (2 * m));
}
/** x, or InputError when a difference overflowed (values near the largest double). */
function finite(x, position) {
    if (!Number.isFinite(x))
        throw new input_error/* InputError */.d(`value ${x} at position ${position} is not a finite number`);
    return x;
}
/**
 * Where the level of a series changes, by PELT (Killick, Fearnhead & Eckley 2012, "Optimal
 * detection of changepoints with a linear computational cost"): the exact minimiser of
 *   sum over segments of C(segment) + penalty x (number of changes),
 * with C the Gaussian cost of a change in mean, C = sum (x - segment mean)^2 / sigma^2, sigma the
 * noise level estimated once from successive differences. Only the mean is modelled: CI timings
 * change spread briefly and often, and the gate refits the spread anyway; a level shift is what
 * makes an old baseline wrong. The default penalty 3 ln(n) is 1.5 x the BIC charge of 2 ln(n)
 * for a change's two parameters (where and the new mean), so pure noise rarely splits.
 * Returns the indices where new segments start, ascending; empty when none (also for a
 * constant series or fewer than 2 x minSegment values). Segment sums come from prefix sums of
 * the median-centred values, so large offsets do not lose precision. Work: O(n) expected with
 * pruning, O(n^2) worst case. Throws InputError on non-finite values or bad options.
 *
 * @example detectChangePoints([...Array(40).fill(100), ...Array(30).fill(110)].map((x, i) => x + (i % 2) * 0.5)) // [40]
 */
function detectChangePoints(values, options = {}) {
    const n = values.length;
    const minSegment = options.minSegment ?? 5;
    if (!Number.isInteger(minSegment) || minSegment < 1) {
        throw new input_error/* InputError */.d(`minSegment must be a whole number, 1 or more, got ${minSegment}`);
    }
    const penalty = options.penalty ?? 3 * Math.log(Math.max(n, 2));
    if (!(penalty >= 0) || !Number.isFinite(penalty)) {
        throw new input_error/* InputError */.d(`penalty must be a finite number, 0 or more, got ${penalty}`);
    }
    if (n < 2 * minSegment) {
        values.forEach((x, i) => {
            if (!Number.isFinite(x))
                throw new input_error/* InputError */.d(`value ${x} at position ${i + 1} is not a finite number`);
        });
        return [];
    }
    ensureScratch(n);
    const sigma = centreAndScale(values, n);
    if (!(sigma > 0))
        return [];
    prefixSums(n, sigma);
    optimalPartition(n, penalty, minSegment);
    return segmentStarts(n);
}
// The steps below are separate small functions on purpose: V8 optimises each on its own, where one
// long function compiled while its first loop ran lacked type feedback for the rest and kept
// being thrown away (a cost paid on every cold start of the gate).
/** Copies the values to the scratch, centres them on their median and returns the noise sigma. */
function centreAndScale(values, n) {
    const w = work;
    for (let i = 0; i < n; i++) {
        const x = values[i];
        if (!Number.isFinite(x))
            throw new input_error/* InputError */.d(`value ${x} at position ${i + 1} is not a finite number`);
        w[i] = x;
    }
    const centre = (0,median/* medianInPlace */.Te)(w, n);
    const c = centred;
    for (let i = 0; i < n; i++)
        c[i] = values[i] - centre;
    return noiseSigma(n);
}
/** sum[i] and sumSq[i]: the sums of z and z^2 over the first i values, z = centred / sigma. */
function prefixSums(n, sigma) {
    const c = centred;
    const s1 = sum;
    const s2 = sumSq;
    s1[0] = 0;
    s2[0] = 0;
    for (let i = 0; i < n; i++) {
        const z = c[i] / sigma;
        s1[i + 1] = s1[i] + z;
        s2[i + 1] = s2[i] + z * z;
    }
}
/**
 * The PELT recursion: best[end] = min over kept starts of best[start] + C(start, end) + penalty,
 * previous[end] the minimising start (the first one on ties).
 * Pruning with a shortest segment m: a start s with best[s] + C(s, t) > best[t] is beaten by t
 * for every later end u, since C(s, u) >= C(s, t) + C(t, u), but t may only start a segment
 * ending at u >= t + m. So s is dropped at end t + m (when t has joined), not at once; dropping
 * it at t (plain PELT) could lose the optimum for the ends in between. With m = 1 that is the
 * next end, as in plain PELT. Candidates are compacted in place.
 */
function optimalPartition(n, penalty, minSegment) {
    const s1 = sum;
    const s2 = sumSq;
    const f = best;
    const from = previous;
    const kept = candidates;
    const t = totals;
    const until = dropAt;
    f[0] = -penalty;
    let count = 0;
    for (let end = minSegment; end <= n; end++) {
        // The start that just became far enough back joins the candidates, if it can end a segment.
        const fresh = end - minSegment;
        if (fresh === 0 || fresh >= minSegment) {
            kept[count++] = fresh;
            until[fresh] = n + 1;
        }
        const sumEnd = s1[end];
        const sumSqEnd = s2[end];
        let bestValue = Infinity;
        let bestStart = 0;
        for (let k = 0; k < count; k++) {
            const start = kept[k];
            // Segment cost C = sum z^2 - (sum z)^2 / length, never below 0 (rounding).
            const s = sumEnd - s1[start];
            const cost = Math.max(0, sumSqEnd - s2[start] - (s * s) / (end - start));
            const total = f[start] + cost + penalty;
            t[k] = total;
            if (total < bestValue) {
                bestValue = total;
                bestStart = start;
            }
        }
        f[end] = bestValue;
        from[end] = bestStart;
        // A start already worse by the penalty is beaten by `end` once `end` can start a segment.
        const beatenFrom = end + minSegment;
        let left = 0;
        for (let k = 0; k < count; k++) {
            const start = kept[k];
            if (t[k] - penalty > bestValue && beatenFrom < until[start])
                until[start] = beatenFrom;
            if (until[start] > end + 1)
                kept[left++] = start;
        }
        count = left;
    }
}
/** The segment starts after 0, ascending, read back from previous[]. */
function segmentStarts(n) {
    const from = previous;
    const starts = [];
    for (let at = from[n]; at > 0; at = from[at])
        starts.push(at);
    return starts.reverse();
}

// EXTERNAL MODULE: ./src/model/transform.ts
var transform = __webpack_require__(8077);
;// CONCATENATED MODULE: ./src/gate/baseline.ts



/**
 * Selects a metric's baseline from the history (DESIGN.md "Statistics"):
 * 1. the runs that hold the metric (with `relative-to`: that also hold a non-zero reference, and
 *    the value becomes metric / reference of the same run, cancelling a runner's common speed);
 * 2. the newest `window` of them, moved to the fit scale (`transform`);
 * 3. with `change-points` on, PELT-style segmentation of that window (detectChangePoints); when the
 *    last segment already spans `min-runs` runs, only it is kept, so a merged level change stops
 *    counting as a regression once the new level has enough history.
 * O(window) on the plain scale (older runs are counted only when `available` is read), O(runs)
 * with a transform or ratio, plus the change-point search. Throws InputError when a value cannot
 * take the transform.
 * @example selectBaseline(history, 'build/time', settings).values // [412.5, 409.9, ...]
 */
function selectBaseline(history, name, settings) {
    const column = history.columns.get(name);
    const plain = settings.transform === 'none' && settings.relativeTo === undefined;
    const selected = column === undefined
        ? { values: [], runIds: [], available: 0 }
        : plain
            ? newestWindow(history, column.values, settings.window)
            : checkedWindow(history, name, column.values, settings);
    if (settings.relativeTo !== undefined)
        selected.relativeTo = settings.relativeTo;
    return settings.changePoints ? sinceLastChange(selected, settings.minRuns) : selected;
}
/**
 * The plain scale (no transform, no ratio), where no value can be refused: walks back from the
 * newest run only until `window` values are found, and just counts the older ones.
 */
function newestWindow(history, column, window) {
    const count = Math.min(column.length, history.runs.length);
    const values = [];
    const runIds = [];
    let i = count - 1;
    for (; i >= 0 && values.length < window; i--) {
        const x = column[i];
        if (!Number.isFinite(x))
            continue;
        values.push(x);
        runIds.push(history.runs[i].id);
    }
    const newer = values.length;
    const older = i;
    return {
        values: values.reverse(),
        runIds: runIds.reverse(),
        // Counted only when read (the `missing` wording): walking the older runs of every metric was
        // most of the selection's cost on a long history.
        get available() {
            let available = newer;
            for (let k = older; k >= 0; k--)
                if (Number.isFinite(column[k]))
                    available++;
            return available;
        },
    };
}
/**
 * Any other scale: every value of the history is checked, since the transform or ratio can refuse
 * it. One forward pass checks and counts (in run order, so an error names the oldest bad run), then
 * a walk back from the newest run builds just the `window` kept values.
 */
function checkedWindow(history, name, column, settings) {
    const reference = settings.relativeTo === undefined ? undefined : history.columns.get(settings.relativeTo);
    const ratio = settings.relativeTo !== undefined;
    const count = Math.min(column.length, history.runs.length);
    let available = 0;
    for (let i = 0; i < count; i++) {
        const x = pairedValue(column, reference?.values, ratio, i);
        if (Number.isFinite(column[i]))
            available++;
        if (x !== undefined)
            toHistoryFitScale(x, settings, name, history.runs[i].id);
    }
    const values = [];
    const runIds = [];
    for (let i = count - 1; i >= 0 && values.length < settings.window; i--) {
        const x = pairedValue(column, reference?.values, ratio, i);
        if (x === undefined)
            continue;
        const id = history.runs[i].id;
        values.push(toHistoryFitScale(x, settings, name, id));
        runIds.push(id);
    }
    return { values: values.reverse(), runIds: runIds.reverse(), available };
}
/** Run i's value, divided by the reference of the same run for a ratio; undefined when it lacks either. */
function pairedValue(column, reference, ratio, i) {
    const x = column[i];
    if (!Number.isFinite(x))
        return undefined;
    if (!ratio)
        return x;
    const r = reference?.[i];
    if (r === undefined || !Number.isFinite(r) || r === 0)
        return undefined;
    return x / r;
}
/** Keeps only the runs after the last level change, once they are at least `minRuns`. */
function sinceLastChange(baseline, minRuns) {
    if (baseline.values.length <= minRuns)
        return baseline;
    // The detector's own shortest segment (5 runs), not min-runs: forcing longer segments would
    // place a fresh change too early and mix the old level into the new baseline.
    const starts = detectChangePoints(baseline.values);
    const last = starts.filter((s) => s > 0 && s < baseline.values.length).at(-1);
    if (last === undefined || baseline.values.length - last < minRuns)
        return baseline;
    return {
        ...baseline,
        values: baseline.values.slice(last),
        runIds: baseline.runIds.slice(last),
        since: baseline.runIds[last],
        window: { values: baseline.values, runIds: baseline.runIds },
    };
}
function toHistoryFitScale(x, settings, name, runId) {
    try {
        return (0,transform/* toFitScale */.P)(x, settings.transform, name);
    }
    catch (error) {
        if (!(error instanceof input_error/* InputError */.d))
            throw error;
        throw new input_error/* InputError */.d(`history run ${runId} has value ${x} for ${name}, which cannot be log-transformed`, {
            where: name,
            fix: 'use `transform: none` for this metric, or remove the bad run from the history',
            cause: error,
        });
    }
}


/***/ }),

/***/ 8176:
/***/ ((__unused_webpack_module, __webpack_exports__, __webpack_require__) => {

/* harmony export */ __webpack_require__.d(__webpack_exports__, {
/* harmony export */   hB: () => (/* binding */ plainTest),
/* harmony export */   nR: () => (/* binding */ decideMetric),
/* harmony export */   xR: () => (/* binding */ decision)
/* harmony export */ });
/* harmony import */ var _format_number_js__WEBPACK_IMPORTED_MODULE_0__ = __webpack_require__(9616);
/* harmony import */ var _tolerance_js__WEBPACK_IMPORTED_MODULE_1__ = __webpack_require__(592);


/**
 * The plain per-metric test: relative density below the cutoff.
 * @example plainTest({ relativeDensity: 0.002, cutoff: 0.01 }).phrase // 'relative density 2e-3 < cutoff 0.01'
 */
function plainTest(result) {
    const r = result.relativeDensity ?? 1;
    const significant = r < result.cutoff;
    return {
        significant,
        phrase: `relative density ${(0,_format_number_js__WEBPACK_IMPORTED_MODULE_0__/* .formatNumber */ .Z)(r)} ${significant ? '<' : '≥'} cutoff ${(0,_format_number_js__WEBPACK_IMPORTED_MODULE_0__/* .formatNumber */ .Z)(result.cutoff)}`,
    };
}
/**
 * Status and reason of a scored metric from the outcome of its test (plain, family-adjusted or
 * its group's): regressed when significant on the worse side beyond the tolerance, improved when
 * significant on the better side beyond it, ok otherwise. Returns a new result.
 * @example decideMetric(score, plainTest(score.result)).status // 'regressed'
 */
function decideMetric(score, test) {
    return { ...score.result, ...decision(score, test) };
}
/** decideMetric's status and reason alone, for a caller that owns the result and sets them in place. */
function decision(score, test) {
    const { result } = score;
    const where = position(result);
    let status = 'ok';
    let reason = `${where}; ${test.phrase}`;
    if (test.significant && score.direction !== 'none') {
        if (!score.beyondTolerance) {
            const move = result.change === undefined ? '' : ` ${(0,_format_number_js__WEBPACK_IMPORTED_MODULE_0__/* .formatPercent */ .l)(Math.abs(result.change))}`;
            reason += `, but the change${move} is within the tolerance ${(0,_tolerance_js__WEBPACK_IMPORTED_MODULE_1__/* .describeTolerance */ .Nn)(score.settings.tolerance)}`;
        }
        else if (score.direction === 'worse') {
            status = 'regressed';
        }
        else {
            status = 'improved';
            reason = `${where} (the better side); ${test.phrase}`;
        }
    }
    return { status, reason };
}
/** "4.1 sd above the baseline mean", or the constant-baseline wording when there is no z. */
function position(result) {
    const z = result.z;
    if (z === undefined) {
        const centre = result.baseline?.mean ?? NaN;
        const same = result.relativeDensity === 1;
        const scale = result.baseline?.scale === 'log' ? ' (log scale)' : '';
        return same
            ? `equal to the constant baseline ${(0,_format_number_js__WEBPACK_IMPORTED_MODULE_0__/* .formatNumber */ .Z)(centre)}${scale}`
            : `off the constant baseline ${(0,_format_number_js__WEBPACK_IMPORTED_MODULE_0__/* .formatNumber */ .Z)(centre)}${scale} (sd 0; set \`resolution\` to the smallest meaningful step)`;
    }
    if (z === 0)
        return 'at the baseline mean';
    return `${(0,_format_number_js__WEBPACK_IMPORTED_MODULE_0__/* .formatNumber */ .Z)(Math.abs(z))} sd ${z > 0 ? 'above' : 'below'} the baseline mean`;
}


/***/ }),

/***/ 9616:
/***/ ((__unused_webpack_module, __webpack_exports__, __webpack_require__) => {

/* harmony export */ __webpack_require__.d(__webpack_exports__, {
/* harmony export */   Z: () => (/* binding */ formatNumber),
/* harmony export */   l: () => (/* binding */ formatPercent)
/* harmony export */ });
/**
 * Short numbers for reason sentences: 3 significant digits, exponent form below 1e-3.
 * @example formatNumber(0.000321) // '3.21e-4'
 */
function formatNumber(x) {
    if (x === 0 || !Number.isFinite(x))
        return String(x);
    const a = Math.abs(x);
    if (a < 1e-3 || a >= 1e6)
        return x.toExponential(2).replace(/\.?0+e/, 'e').replace('e+', 'e');
    return String(Number(x.toPrecision(3)));
}
/** A share as a percent with one decimal. @example formatPercent(0.0512) // '5.1%' */
function formatPercent(share) {
    return `${Number((share * 100).toFixed(1))}%`;
}


/***/ }),

/***/ 1177:
/***/ ((__unused_webpack_module, __webpack_exports__, __webpack_require__) => {

/* harmony export */ __webpack_require__.d(__webpack_exports__, {
/* harmony export */   zN: () => (/* binding */ scoreMetric)
/* harmony export */ });
/* unused harmony exports RECENT_VALUES, judgeMetric */
/* harmony import */ var _model_density_js__WEBPACK_IMPORTED_MODULE_0__ = __webpack_require__(913);
/* harmony import */ var _model_fit_js__WEBPACK_IMPORTED_MODULE_1__ = __webpack_require__(5046);
/* harmony import */ var _model_input_error_js__WEBPACK_IMPORTED_MODULE_2__ = __webpack_require__(8250);
/* harmony import */ var _model_tails_js__WEBPACK_IMPORTED_MODULE_3__ = __webpack_require__(7963);
/* harmony import */ var _model_transform_js__WEBPACK_IMPORTED_MODULE_4__ = __webpack_require__(8077);
/* harmony import */ var _resolution_floor_js__WEBPACK_IMPORTED_MODULE_8__ = __webpack_require__(1198);
/* harmony import */ var _sides_js__WEBPACK_IMPORTED_MODULE_5__ = __webpack_require__(3979);
/* harmony import */ var _tolerance_js__WEBPACK_IMPORTED_MODULE_6__ = __webpack_require__(592);
/* harmony import */ var _decide_metric_js__WEBPACK_IMPORTED_MODULE_7__ = __webpack_require__(8176);









/** Newest baseline values kept in a result for sparklines. */
const RECENT_VALUES = 30;
/**
 * Judges one metric alone (DESIGN.md "Statistics"). Pure, so the cutoff-tuning replay reuses it.
 * - fit the baseline (fit scale) by `fit`, sigma floored at `resolution` (see fitScaleFloor);
 * - z = (x - mean) / sd; density = Gaussian p(x); relative density r = p(x) / p(mode):
 *   predictive Student-t with n - 1 dof and scale s sqrt(1 + 1/n), or plug-in exp(-z^2 / 2)
 *   (plug-in also when n < 2, where the t has no degrees of freedom);
 * - tail = two-sided tail probability of the deviation under that same distribution;
 * - regressed when r < cutoff on the worse side beyond the tolerance; improved likewise on the
 *   better side; learning below `min-runs`; new with no baseline.
 * A zero spread (constant history, resolution 0) is decided by the tolerance alone, with r = 0
 * for any move and no z. Throws InputError for a value that cannot take the transform.
 * @example judgeMetric('t', settings, [9, 10, 11, 10, 10, 9, 11, 10], 14).status // 'regressed'
 */
function judgeMetric(name, settings, baseline, value, extras = {}) {
    return scoreMetric(name, settings, baseline, value, extras).result;
}
/** judgeMetric, keeping the pieces that family control and groups decide on. */
function scoreMetric(name, settings, baseline, value, extras = {}) {
    if (!Number.isFinite(value)) {
        throw new _model_input_error_js__WEBPACK_IMPORTED_MODULE_2__/* .InputError */ .d(`value ${value} of ${name} is not a finite number`, { where: name, fix: 'check the metric file' });
    }
    const current = (0,_model_transform_js__WEBPACK_IMPORTED_MODULE_4__/* .toFitScale */ .P)(value, settings.transform, name);
    // Built key by key (in the report's key order) rather than by spreads: this runs per metric.
    const base = { name, status: 'ok', value, cutoff: settings.cutoff, worse: settings.worse, reason: '' };
    if (extras.unit !== undefined)
        base.unit = extras.unit;
    if (extras.count !== undefined)
        base.count = extras.count;
    const n = baseline.length;
    if (n === 0)
        return unscored(settings, { ...base, status: 'new', reason: 'no history for this metric yet' });
    base.recent = recentValues(baseline, settings.transform);
    if (n < settings.minRuns) {
        const reason = `only ${n} baseline run${n === 1 ? '' : 's'}; min-runs is ${settings.minRuns}`;
        const early = fitWithFloor(baseline, settings);
        return unscored(settings, { ...base, status: 'learning', baseline: { n, mean: early.mean, sd: early.sd }, reason });
    }
    const fit = fitWithFloor(baseline, settings);
    const centre = (0,_model_transform_js__WEBPACK_IMPORTED_MODULE_4__/* .fromFitScale */ .G)(fit.mean, settings.transform);
    const summary = { n, mean: fit.mean, sd: fit.sd };
    if (settings.transform === 'log')
        summary.scale = 'log';
    if (extras.since !== undefined)
        summary.since = extras.since;
    if (extras.relativeTo !== undefined)
        summary.relativeTo = extras.relativeTo;
    base.baseline = summary;
    if (centre !== 0)
        base.change = (value - centre) / centre;
    const deviation = current - fit.mean;
    addDeviationFigures(base, current, fit, settings);
    const score = {
        result: base,
        settings,
        scored: true,
        direction: (0,_sides_js__WEBPACK_IMPORTED_MODULE_5__/* .directionOf */ .F)(deviation, settings.worse),
        beyondTolerance: (0,_tolerance_js__WEBPACK_IMPORTED_MODULE_6__/* .beyondTolerance */ .f5)(value, centre, settings.tolerance),
        current,
        fit,
    };
    // `base` is this call's own object, so the decision is written into it (decideMetric would copy).
    const decided = (0,_decide_metric_js__WEBPACK_IMPORTED_MODULE_7__/* .decision */ .xR)(score, (0,_decide_metric_js__WEBPACK_IMPORTED_MODULE_7__/* .plainTest */ .hB)(base));
    base.status = decided.status;
    base.reason = decided.reason;
    return score;
}
/** A new or learning result, which no later decision changes. */
function unscored(settings, result) {
    return { settings, scored: false, direction: 'none', beyondTolerance: false, result };
}
/** The newest RECENT_VALUES baseline values on the metric's own scale. */
function recentValues(baseline, transform) {
    const recent = baseline.slice(-RECENT_VALUES);
    if (transform === 'none')
        return recent;
    for (let i = 0; i < recent.length; i++)
        recent[i] = (0,_model_transform_js__WEBPACK_IMPORTED_MODULE_4__/* .fromFitScale */ .G)(recent[i], transform);
    return recent;
}
/** fitGaussian with the resolution moved to the fit scale around the fitted centre. */
function fitWithFloor(values, settings) {
    const raw = (0,_model_fit_js__WEBPACK_IMPORTED_MODULE_1__/* .fitGaussian */ .Dk)(values, settings.fit, 0);
    const floor = (0,_resolution_floor_js__WEBPACK_IMPORTED_MODULE_8__/* .fitScaleFloor */ .c)(settings.resolution, settings.transform, raw.mean);
    return floor > 0 ? (0,_model_fit_js__WEBPACK_IMPORTED_MODULE_1__/* .fitGaussian */ .Dk)(values, settings.fit, floor) : raw;
}
/** Sets z, density, relative density and tail on the result; a zero spread gives 0 or 1 and no z. */
function addDeviationFigures(result, x, fit, settings) {
    const deviation = x - fit.mean;
    const predictive = settings.uncertainty === 'predictive' && fit.n >= 2;
    if (fit.sd === 0 || (predictive && fit.sampleSd === 0)) {
        const moved = deviation !== 0;
        result.relativeDensity = moved ? 0 : 1;
        result.tail = moved ? 0 : 1;
        return;
    }
    const z = deviation / fit.sd;
    result.z = z;
    result.density = (0,_model_density_js__WEBPACK_IMPORTED_MODULE_0__/* .gaussianDensity */ .QA)(x, fit.mean, fit.sd);
    if (!predictive) {
        result.relativeDensity = (0,_model_density_js__WEBPACK_IMPORTED_MODULE_0__/* .plugInRelativeDensity */ .YS)(x, fit.mean, fit.sd);
        result.tail = (0,_model_tails_js__WEBPACK_IMPORTED_MODULE_3__/* .normalTail */ .WI)(z, 'both');
        return;
    }
    const t = deviation / (0,_model_density_js__WEBPACK_IMPORTED_MODULE_0__/* .predictiveScale */ .Wn)(fit.sampleSd, fit.n);
    result.relativeDensity = (0,_model_density_js__WEBPACK_IMPORTED_MODULE_0__/* .predictiveRelativeDensity */ .kr)(x, fit.mean, fit.sampleSd, fit.n);
    result.tail = (0,_model_tails_js__WEBPACK_IMPORTED_MODULE_3__/* .studentTail */ .gq)(t, fit.n - 1, 'both');
}


/***/ }),

/***/ 1198:
/***/ ((__unused_webpack_module, __webpack_exports__, __webpack_require__) => {

/* harmony export */ __webpack_require__.d(__webpack_exports__, {
/* harmony export */   c: () => (/* binding */ fitScaleFloor)
/* harmony export */ });
/**
 * The sigma floor on the fit scale for a `resolution` given in the metric's own unit.
 * On the log scale a step dx near a centre m is a step of about dx / m in log x (d log x = dx / x),
 * so the floor becomes resolution / exp(centre). With `relative-to` the fitted values are ratios,
 * and the resolution is read in the ratio's unit.
 * @example fitScaleFloor(2, 'log', Math.log(100)) // 0.02
 */
function fitScaleFloor(resolution, transform, centre) {
    if (transform === 'none' || resolution === 0)
        return resolution;
    return resolution / Math.exp(centre);
}


/***/ }),

/***/ 3979:
/***/ ((__unused_webpack_module, __webpack_exports__, __webpack_require__) => {

/* harmony export */ __webpack_require__.d(__webpack_exports__, {
/* harmony export */   C: () => (/* binding */ worseSign),
/* harmony export */   F: () => (/* binding */ directionOf)
/* harmony export */ });
/**
 * Classifies a deviation (this run minus the baseline centre) by the metric's `worse` setting.
 * `worse: both` has no better side: any move away from the centre is worse. A zero move is neither.
 * Transforms are monotone, so the sign on the fit scale equals the sign on the metric's own scale.
 * @example directionOf(0.3, 'lower') // 'better'
 */
function directionOf(deviation, worse) {
    if (deviation === 0 || Number.isNaN(deviation))
        return 'none';
    if (worse === 'both')
        return 'worse';
    const up = deviation > 0;
    return up === (worse === 'higher') ? 'worse' : 'better';
}
/**
 * +1 when higher is worse, -1 when lower is worse; the sign that turns a deviation into a
 * "worse is positive" one. `both` counts as +1 (the group's common move is read as a slowdown).
 * @example worseSign('lower') // -1
 */
function worseSign(worse) {
    return worse === 'lower' ? -1 : 1;
}


/***/ }),

/***/ 592:
/***/ ((__unused_webpack_module, __webpack_exports__, __webpack_require__) => {

/* harmony export */ __webpack_require__.d(__webpack_exports__, {
/* harmony export */   Nn: () => (/* binding */ describeTolerance),
/* harmony export */   f5: () => (/* binding */ beyondTolerance)
/* harmony export */ });
/* unused harmony export toleranceAmount */
/* harmony import */ var _format_number_js__WEBPACK_IMPORTED_MODULE_0__ = __webpack_require__(9616);

/**
 * Whether |value - centre| exceeds the tolerance: an amount in the metric's unit, or a percent
 * of the baseline centre (on the metric's own scale). A percent tolerance holds the share, as the
 * config loader stores it (`1%` -> amount 0.01). A move exactly at the tolerance is within it.
 * @example beyondTolerance(103, 100, { kind: 'percent', amount: 0.02 }) // true
 */
function beyondTolerance(value, centre, tolerance) {
    return Math.abs(value - centre) > toleranceAmount(centre, tolerance);
}
/** The tolerance in the metric's unit around this centre. @example toleranceAmount(200, { kind: 'percent', amount: 0.01 }) // 2 */
function toleranceAmount(centre, tolerance) {
    return tolerance.kind === 'absolute' ? tolerance.amount : Math.abs(centre) * tolerance.amount;
}
/** "1%" or "512". @example describeTolerance({ kind: 'percent', amount: 0.01 }) // '1%' */
function describeTolerance(tolerance) {
    return tolerance.kind === 'percent' ? `${(0,_format_number_js__WEBPACK_IMPORTED_MODULE_0__/* .formatNumber */ .Z)(tolerance.amount * 100)}%` : (0,_format_number_js__WEBPACK_IMPORTED_MODULE_0__/* .formatNumber */ .Z)(tolerance.amount);
}


/***/ }),

/***/ 913:
/***/ ((__unused_webpack_module, __webpack_exports__, __webpack_require__) => {

/* harmony export */ __webpack_require__.d(__webpack_exports__, {
/* harmony export */   QA: () => (/* binding */ gaussianDensity),
/* harmony export */   Wn: () => (/* binding */ predictiveScale),
/* harmony export */   YS: () => (/* binding */ plugInRelativeDensity),
/* harmony export */   kr: () => (/* binding */ predictiveRelativeDensity)
/* harmony export */ });
/* unused harmony export gaussianLogDensity */
/* harmony import */ var _input_error_js__WEBPACK_IMPORTED_MODULE_0__ = __webpack_require__(8250);
/* harmony import */ var _special_normal_js__WEBPACK_IMPORTED_MODULE_1__ = __webpack_require__(2986);


/** A spread must be a finite number >= 0; 0 is the degenerate fit of a constant history. */
function checkSpread(sd) {
    if (!(sd >= 0) || !Number.isFinite(sd)) {
        throw new _input_error_js__WEBPACK_IMPORTED_MODULE_0__/* .InputError */ .d(`a standard deviation must be a finite number, 0 or more, got ${sd}`);
    }
}
/**
 * Gaussian density p(x) = exp(-(x - mu)^2 / (2 sigma^2)) / (sqrt(2 pi) sigma).
 * A zero sigma is the degenerate distribution: Infinity at the mean, 0 elsewhere.
 * Throws InputError on a negative or non-finite sd.
 * @example gaussianDensity(0, 0, 1) // 0.3989422804014327
 */
function gaussianDensity(x, mean, sd) {
    checkSpread(sd);
    return (0,_special_normal_js__WEBPACK_IMPORTED_MODULE_1__/* .normalDensity */ .kC)(x, mean, sd);
}
/**
 * log p(x), exact where p(x) underflows to 0 (beyond about 38 sigma).
 * @example gaussianLogDensity(0, 0, 1) // -0.9189385332046727
 */
function gaussianLogDensity(x, mean, sd) {
    checkSpread(sd);
    return normalLogDensity(x, mean, sd);
}
/**
 * Relative density under the fitted Gaussian used as is ("plug-in"): p(x) / p(mean) =
 * exp(-z^2 / 2). Unitless, in [0, 1]; 1 at the centre, about 0.0111 at 3 sigma. With a zero
 * sd it is 1 at the mean and 0 elsewhere (the limit), never NaN.
 * @example plugInRelativeDensity(3, 0, 1) // 0.011108996538242306
 */
function plugInRelativeDensity(x, mean, sd) {
    checkSpread(sd);
    if (sd === 0)
        return x === mean ? 1 : 0;
    const z = (x - mean) / sd;
    return Math.exp(-0.5 * z * z);
}
/**
 * Scale of the predictive distribution for one new run when mean and sigma were estimated from
 * n runs: s * sqrt(1 + 1/n), with s the n-1 standard deviation (a Student-t with n-1 degrees of
 * freedom around the mean; e.g. Gelman et al., Bayesian Data Analysis, section 3.2).
 * @example predictiveScale(1, 4) // 1.118033988749895
 */
function predictiveScale(sampleSd, n) {
    return sampleSd * Math.sqrt(1 + 1 / n);
}
/**
 * Relative density under the predictive Student-t with n-1 degrees of freedom:
 * f(t) / f(0) = (1 + t^2 / nu)^(-(nu + 1) / 2), t = (x - mean) / (s sqrt(1 + 1/n)).
 * Heavier tails than the Gaussian, so a short history needs a larger move to fall below a cutoff;
 * as n grows it approaches plugInRelativeDensity. Computed in log space (log1p) so far tails do
 * not underflow early. A zero sampleSd gives 1 at the mean, 0 elsewhere.
 * Throws InputError when n < 2 (no degrees of freedom) or sampleSd is negative or not finite.
 * @example predictiveRelativeDensity(3, 0, 1, 1e9) // ≈ 0.011109 (large n: the Gaussian)
 */
function predictiveRelativeDensity(x, mean, sampleSd, n) {
    if (!(n >= 2)) {
        throw new _input_error_js__WEBPACK_IMPORTED_MODULE_0__/* .InputError */ .d(`the predictive distribution needs at least 2 runs, got ${n}`, {
            fix: 'raise `min-runs` to 2 or more, or use `uncertainty: plug-in`',
        });
    }
    checkSpread(sampleSd);
    if (sampleSd === 0)
        return x === mean ? 1 : 0;
    const nu = n - 1;
    const t = (x - mean) / predictiveScale(sampleSd, n);
    return Math.exp((-(nu + 1) / 2) * Math.log1p((t * t) / nu));
}


/***/ }),

/***/ 7089:
/***/ ((__unused_webpack_module, __webpack_exports__, __webpack_require__) => {

/* harmony export */ __webpack_require__.d(__webpack_exports__, {
/* harmony export */   F: () => (/* binding */ adjustTails)
/* harmony export */ });
/* harmony import */ var _input_error_js__WEBPACK_IMPORTED_MODULE_0__ = __webpack_require__(8250);

/**
 * Adjusted p-values for testing m metrics at once, returned in input order and capped at 1;
 * a metric is flagged at level alpha when its adjusted value is <= alpha.
 * - bonferroni: min(1, m p) — controls the family-wise error rate.
 * - holm: Holm (1979) step-down; with p(1) <= ... <= p(m) sorted,
 *   adj(i) = max over j <= i of min(1, (m - j + 1) p(j)) — same guarantee, never less powerful.
 * - fdr: Benjamini & Hochberg (1995) step-up; adj(i) = min over j >= i of min(1, m p(j) / j) —
 *   controls the expected share of false alarms among the flagged metrics.
 * Ties keep input order. O(m log m). Throws InputError on a value outside [0, 1] or NaN.
 *
 * @example adjustTails([0.01, 0.04, 0.03, 0.005], 'holm') // [0.03, 0.06, 0.06, 0.02]
 */
function adjustTails(tails, method) {
    const m = tails.length;
    tails.forEach((p, i) => {
        if (!(p >= 0 && p <= 1)) {
            throw new _input_error_js__WEBPACK_IMPORTED_MODULE_0__/* .InputError */ .d(`tail probability ${p} at position ${i + 1} is not a number in [0, 1]`);
        }
    });
    if (method === 'bonferroni')
        return tails.map((p) => Math.min(1, m * p));
    if (method !== 'holm' && method !== 'fdr') {
        throw new _input_error_js__WEBPACK_IMPORTED_MODULE_0__/* .InputError */ .d(`unknown family method "${String(method)}"`, { fix: 'use bonferroni, holm or fdr' });
    }
    const order = tails.map((_, i) => i).sort((a, b) => tails[a] - tails[b] || a - b);
    const adjusted = new Array(m);
    if (method === 'holm') {
        let running = 0;
        order.forEach((index, rank) => {
            running = Math.max(running, Math.min(1, (m - rank) * tails[index]));
            adjusted[index] = running;
        });
    }
    else {
        let running = 1;
        for (let rank = m - 1; rank >= 0; rank--) {
            const index = order[rank];
            running = Math.min(running, (m * tails[index]) / (rank + 1));
            adjusted[index] = running;
        }
    }
    return adjusted;
}


/***/ }),

/***/ 5046:
/***/ ((__unused_webpack_module, __webpack_exports__, __webpack_require__) => {

/* harmony export */ __webpack_require__.d(__webpack_exports__, {
/* harmony export */   Dk: () => (/* binding */ fitGaussian),
/* harmony export */   tF: () => (/* binding */ MAD_TO_SIGMA)
/* harmony export */ });
/* unused harmony export MEAN_AD_TO_SIGMA */
/* harmony import */ var _input_error_js__WEBPACK_IMPORTED_MODULE_0__ = __webpack_require__(8250);
/* harmony import */ var _moments_js__WEBPACK_IMPORTED_MODULE_1__ = __webpack_require__(8884);
/* harmony import */ var _median_js__WEBPACK_IMPORTED_MODULE_2__ = __webpack_require__(71);



/** 1 / Phi^-1(3/4): makes the MAD a consistent estimate of a Gaussian's sigma. */
const MAD_TO_SIGMA = 1.4826;
/** sqrt(pi / 2): makes the mean absolute deviation a consistent estimate of a Gaussian's sigma. */
const MEAN_AD_TO_SIGMA = Math.sqrt(Math.PI / 2);
/**
 * Fits a Gaussian to the values.
 * - mle: mean and sqrt((1/n) sum (x - mean)^2), the maximum-likelihood estimate.
 * - unbiased: the same mean, dividing by n - 1.
 * - robust: median and 1.4826 x MAD, which a past outlier inside the baseline barely moves.
 *   When more than half the values are equal the MAD is 0 although the values vary; then the
 *   mean absolute deviation from the median x sqrt(pi/2) is used instead (common practice), so a
 *   quantised metric does not get a zero spread.
 * The spread is never below `resolution` (the smallest meaningful step). It is 0 only for a
 * constant history (or a single run) with resolution 0; the relative densities treat a zero
 * spread as "any other value is infinitely unlikely" instead of returning NaN.
 * O(n) (robust: O(n) expected, the medians by selection). Throws InputError on an empty input,
 * a non-finite value or a negative or non-finite resolution.
 *
 * @example fitGaussian([9, 10, 11], 'mle') // { n: 3, mean: 10, sd: 0.8165, sampleSd: 1, ... }
 */
function fitGaussian(values, method = 'mle', resolution = 0) {
    const { n, mean, squares } = (0,_moments_js__WEBPACK_IMPORTED_MODULE_1__/* .meanAndSquares */ .R7)(values);
    if (!(resolution >= 0) || !Number.isFinite(resolution)) {
        throw new _input_error_js__WEBPACK_IMPORTED_MODULE_0__/* .InputError */ .d(`resolution must be a finite number, 0 or more, got ${resolution}`, {
            fix: 'set `resolution` to the smallest meaningful step of the metric, or 0',
        });
    }
    const sampleVariance = n > 1 ? squares / (n - 1) : 0;
    let centre;
    let spread;
    let sampleSpread;
    if (method === 'robust') {
        centre = (0,_median_js__WEBPACK_IMPORTED_MODULE_2__/* .median */ .JZ)(values);
        spread = MAD_TO_SIGMA * (0,_median_js__WEBPACK_IMPORTED_MODULE_2__/* .medianAbsoluteDeviation */ .hK)(values);
        if (spread === 0)
            spread = MEAN_AD_TO_SIGMA * meanAbsoluteDeviation(values, centre);
        sampleSpread = spread;
    }
    else {
        centre = mean;
        spread = Math.sqrt(method === 'mle' ? squares / n : sampleVariance);
        sampleSpread = Math.sqrt(sampleVariance);
    }
    return {
        n,
        mean: centre,
        sd: Math.max(spread, resolution),
        sampleSd: Math.max(sampleSpread, resolution),
        method,
    };
}
/** Mean of |x - centre| (values already checked finite by meanAndSquares). */
function meanAbsoluteDeviation(values, centre) {
    let sum = 0;
    for (let i = 0; i < values.length; i++)
        sum += Math.abs(values[i] - centre);
    return sum / values.length;
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


/***/ }),

/***/ 916:
/***/ ((__unused_webpack_module, __webpack_exports__, __webpack_require__) => {

/* harmony export */ __webpack_require__.d(__webpack_exports__, {
/* harmony export */   RL: () => (/* binding */ regularizedBeta),
/* harmony export */   rP: () => (/* binding */ betaPointFromOdds)
/* harmony export */ });
/* unused harmony export betaPointAt */
/* harmony import */ var _log_gamma_js__WEBPACK_IMPORTED_MODULE_0__ = __webpack_require__(2231);

/**
 * The point with odds w = y / x >= 0: x = 1 / (1 + w), y = w / (1 + w), ln x = -log1p(w),
 * ln y = ln w - log1p(w) = -log1p(1 / w). A Student-t statistic has w = t^2 / nu, an F statistic w = d1 f / d2.
 * @example betaPointFromOdds(1).x // 0.5
 */
function betaPointFromOdds(w) {
    if (w === Infinity)
        return { x: 0, y: 1, logX: -Infinity, logY: 0 };
    const s = 1 + w;
    // ln y = ln w - log1p(w) cancels for large w; -log1p(1/w) is the same without the cancellation.
    const logY = w <= 1 ? Math.log(w) - Math.log1p(w) : -Math.log1p(1 / w);
    return { x: 1 / s, y: w / s, logX: -Math.log1p(w), logY };
}
/**
 * The point x itself (y = 1 - x, ln y = log1p(-x)), for callers that only have x.
 * @example betaPointAt(0.25).y // 0.75
 */
function betaPointAt(x) {
    return { x, y: 1 - x, logX: Math.log(x), logY: Math.log1p(-x) };
}
/**
 * x^a y^b / B(a, b). With both a and b at least 10, Stirling's formula for the three Gammas
 * folds the powers into a log1p(u) + b log1p(v) with u = (x (a + b) - a) / a and
 * v = -(x (a + b) - a) / b, whose first-order terms cancel exactly (a u + b v = 0), so the sum is
 * a log1pMinus(u) + b log1pMinus(v) (cf. DiDonato & Morris 1992, ACM TOMS 18, "BRCOMP"):
 *   sqrt(a b / (2 pi (a + b))) exp(a log1pMinus(u) + b log1pMinus(v) + mu(a + b) - mu(a) - mu(b)).
 * Otherwise exp(a ln x + b ln y - ln B(a, b)), every term of moderate size.
 */
function betaFront(a, b, p) {
    if (a >= _log_gamma_js__WEBPACK_IMPORTED_MODULE_0__/* .STIRLING_FROM */ .k0 && b >= _log_gamma_js__WEBPACK_IMPORTED_MODULE_0__/* .STIRLING_FROM */ .k0) {
        const s = a + b;
        const excess = p.x * b - p.y * a; // x (a + b) - a
        const exponent = powerExcess(a, excess / a, p.logX, s) +
            powerExcess(b, -excess / b, p.logY, s) +
            (0,_log_gamma_js__WEBPACK_IMPORTED_MODULE_0__/* .stirlingCorrection */ .np)(s) -
            (0,_log_gamma_js__WEBPACK_IMPORTED_MODULE_0__/* .stirlingCorrection */ .np)(a) -
            (0,_log_gamma_js__WEBPACK_IMPORTED_MODULE_0__/* .stirlingCorrection */ .np)(b);
        return Math.sqrt(((a / s) * b) / (2 * Math.PI)) * Math.exp(exponent);
    }
    return Math.exp(a * p.logX + b * p.logY - (0,_log_gamma_js__WEBPACK_IMPORTED_MODULE_0__/* .logBeta */ .ln)(a, b));
}
/**
 * a (log1p(u) - u) for u = x / x0 - 1, x0 = a / s: near x0 by log1pMinus; far below it
 * (u <= -1/2, where 1 + u has lost digits) with log1p(u) = ln x - ln x0 from the exact ln x.
 */
function powerExcess(a, u, logX, s) {
    if (u > -0.5)
        return a * (0,_log_gamma_js__WEBPACK_IMPORTED_MODULE_0__/* .log1pMinus */ ._g)(u);
    return a * (logX + Math.log(s / a) - u);
}
const TINY = 1e-300;
const TOLERANCE = 4 * Number.EPSILON;
/**
 * lambda = a - (a + b) x, from whichever of x and y is smaller so that a point near 1 (a Student-t
 * near its centre with many degrees of freedom) keeps its digits: (a + b) y - b there.
 */
function betaLambda(a, b, p) {
    return p.x <= p.y ? a - (a + b) * p.x : (a + b) * p.y - b;
}
/**
 * The continued fraction of I_x(a, b) (A&S 26.5.8: I = x^a y^b / (a B(a, b)) / (1 + d1 / (1 + d2 / ...)),
 * d_2m+1 = -(a + m)(a + b + m) x / ((a + 2m)(a + 2m + 1)), d_2m = m (b - m) x / ((a + 2m - 1)(a + 2m)))
 * in its even contraction 1 / (beta_1 + alpha_1 / (beta_2 + alpha_2 / ...)), beta_1 = 1 + d1,
 * beta_m+1 = 1 + d_2m + d_2m+1, alpha_m = -d_2m-1 d_2m, with the betas rewritten in
 * lambda = a - (a + b) x so that no 1 - x cancels (as DiDonato & Morris 1992, ACM TOMS 18, "BFRAC"):
 *   beta_1 = (1 + lambda) / (a + 1),
 *   beta_m+1 = (a^2 (2m + 1) + a b (4m + 1) + 2m^2 (a + 2b) - a - b
 *              + lambda (a^2 + a b + 2a m + 2m^2 - a - b)) / ((a + b)(a + 2m - 1)(a + 2m + 1)).
 * Evaluated by the modified Lentz method (Numerical Recipes 3rd ed., 5.2); converges fast for
 * x < (a + 1) / (a + b + 2), in O(sqrt(max(a, b))) steps at worst; the bound is far above that.
 */
function betaFraction(a, b, p) {
    const x = p.x;
    const lambda = betaLambda(a, b, p);
    const s = a + b;
    let f = (1 + lambda) / (a + 1);
    if (Math.abs(f) < TINY)
        f = TINY;
    let c = f;
    let d = 0;
    const steps = 1000 + Math.ceil(50 * Math.sqrt(Math.max(a, b)));
    for (let m = 1; m <= steps; m++) {
        const am = a + 2 * m;
        const alpha = ((a + m - 1) * (s + m - 1) * m * (b - m) * x * x) / ((am - 2) * (am - 1) * (am - 1) * am);
        const beta = (a * a * (2 * m + 1) + a * b * (4 * m + 1) + 2 * m * m * (a + 2 * b) - a - b +
            lambda * (a * a + a * b + 2 * a * m + 2 * m * m - a - b)) /
            (s * (am - 1) * (am + 1));
        d = beta + alpha * d;
        if (Math.abs(d) < TINY)
            d = TINY;
        c = beta + alpha / c;
        if (Math.abs(c) < TINY)
            c = TINY;
        d = 1 / d;
        const delta = c * d;
        f *= delta;
        if (Math.abs(delta - 1) < TOLERANCE)
            break;
    }
    return 1 / f;
}
/**
 * The regularised incomplete beta function I_x(a, b) (upper = false) or its complement
 * 1 - I_x(a, b) = I_y(b, a) (upper = true), for a, b > 0. The side below the mean
 * (x <= (a + 1) / (a + b + 2), where the continued fraction converges) is computed directly as
 * x^a y^b / (a B(a, b)) times the fraction, the other as 1 minus it; for a, b >= 1/2 (every
 * t, chi-square and F law) that other side is at least ~0.08, so small results, far tails
 * included, keep their relative accuracy (about 2e-13 against 50-digit references up to 1e6).
 * NaN when a or b is not above 0.
 * @example regularizedBeta(2, 3, betaPointAt(0.4), false) // 0.5248
 */
function regularizedBeta(a, b, p, upper) {
    if (!(a > 0 && b > 0) || Number.isNaN(p.x) || Number.isNaN(p.y))
        return Number.NaN;
    if (p.x <= 0)
        return upper ? 1 : 0;
    if (p.y <= 0)
        return upper ? 0 : 1;
    if (p.x <= (a + 1) / (a + b + 2)) {
        const lower = (betaFront(a, b, p) * betaFraction(a, b, p)) / a;
        return Math.min(1, Math.max(0, upper ? 1 - lower : lower));
    }
    const q = { x: p.y, y: p.x, logX: p.logY, logY: p.logX };
    const complement = (betaFront(b, a, q) * betaFraction(b, a, q)) / b;
    return Math.min(1, Math.max(0, upper ? complement : 1 - complement));
}


/***/ }),

/***/ 2231:
/***/ ((__unused_webpack_module, __webpack_exports__, __webpack_require__) => {

/* harmony export */ __webpack_require__.d(__webpack_exports__, {
/* harmony export */   SX: () => (/* binding */ logGamma),
/* harmony export */   _g: () => (/* binding */ log1pMinus),
/* harmony export */   k0: () => (/* binding */ STIRLING_FROM),
/* harmony export */   ln: () => (/* binding */ logBeta),
/* harmony export */   np: () => (/* binding */ stirlingCorrection)
/* harmony export */ });
/* unused harmony export logGammaShift */
/**
 * ln Gamma by Stirling's series with its Bernoulli-number corrections (A&S 6.1.40-41):
 *   ln Gamma(x) = (x - 1/2) ln x - x + ln sqrt(2 pi) + mu(x),
 *   mu(x) = 1/(12x) - 1/(360x^3) + 1/(1260x^5) - 1/(1680x^7) + 1/(1188x^9) - 691/(360360x^11) + 1/(156x^13),
 * used from x = 10 up (the next term is below 3e-17 there) and below 10 through the recurrence
 * Gamma(x) = Gamma(x + k) / (x (x + 1) ... (x + k - 1)). Absolute error a few 1e-15.
 */
const LN_SQRT_2PI = 0.91893853320467274178;
/** Where Stirling's series is used as is. */
const STIRLING_FROM = 10;
/**
 * The Stirling correction mu(x) = ln Gamma(x) - ((x - 1/2) ln x - x + ln sqrt(2 pi)), x >= 10
 * (A&S 6.1.41; coefficients B_2k / (2k (2k - 1))).
 * @example stirlingCorrection(10) // ≈ 0.0083305634
 */
function stirlingCorrection(x) {
    const r = 1 / x;
    const r2 = r * r;
    return r * (1 / 12 + r2 * (-1 / 360 + r2 * (1 / 1260 + r2 * (-1 / 1680 + r2 * (1 / 1188 + r2 * (-691 / 360360 + r2 / 156))))));
}
/**
 * ln Gamma(x) for x > 0 (Stirling's series, recurrence below 10). NaN for x <= 0 or NaN.
 * @example logGamma(0.5) // ≈ 0.5723649429247001 (ln sqrt(pi))
 */
function logGamma(x) {
    if (!(x > 0))
        return Number.NaN;
    if (x >= STIRLING_FROM)
        return (x - 0.5) * Math.log(x) - x + LN_SQRT_2PI + stirlingCorrection(x);
    let product = 1;
    let y = x;
    while (y < STIRLING_FROM) {
        product *= y;
        y += 1;
    }
    return logGamma(y) - Math.log(product);
}
/**
 * ln Gamma(x + s) - ln Gamma(x) for x >= 10 and s >= 0, without subtracting two large logs:
 *   (x - 1/2) log1p(s / x) + s ln(x + s) - s + mu(x + s) - mu(x).
 * @example logGammaShift(1e6, 0.5) // ≈ 0.5 ln 1e6 = 6.9077552789821
 */
function logGammaShift(x, s) {
    return (x - 0.5) * Math.log1p(s / x) + s * Math.log(x + s) - s + stirlingCorrection(x + s) - stirlingCorrection(x);
}
/**
 * ln B(a, b) = ln Gamma(a) + ln Gamma(b) - ln Gamma(a + b) for a, b > 0. When the larger argument
 * is 10 or more, the two large terms are combined by logGammaShift (no cancellation).
 * @example logBeta(0.5, 0.5) // ≈ 1.1447298858494002 (ln pi)
 */
function logBeta(a, b) {
    const small = Math.min(a, b);
    const large = Math.max(a, b);
    if (large < STIRLING_FROM)
        return logGamma(a) + logGamma(b) - logGamma(a + b);
    return logGamma(small) - logGammaShift(large, small);
}
/**
 * log1p(u) - u for u > -1, accurate near 0 where the two terms cancel: with t = u / (2 + u),
 * log1p(u) = 2 atanh(t) = 2 (t + t^3/3 + t^5/5 + ...) and u - 2t = u t.
 * @example log1pMinus(1e-10) // ≈ -5e-21
 */
function log1pMinus(u) {
    if (!(Math.abs(u) < 0.5))
        return Math.log1p(u) - u;
    const t = u / (2 + u);
    const t2 = t * t;
    let power = t * t2;
    let sum = 0;
    for (let k = 3; k < 80; k += 2) {
        const term = power / k;
        sum += term;
        if (Math.abs(term) <= 1e-17 * Math.abs(sum))
            break;
        power *= t2;
    }
    return 2 * sum - u * t;
}


/***/ }),

/***/ 2986:
/***/ ((__unused_webpack_module, __webpack_exports__, __webpack_require__) => {


// EXPORTS
__webpack_require__.d(__webpack_exports__, {
  kC: () => (/* binding */ normalDensity),
  Hi: () => (/* binding */ normalLogCdf),
  IL: () => (/* binding */ normalUpperTail)
});

// UNUSED EXPORTS: normalLogDensity

;// CONCATENATED MODULE: ./src/model/special/erfc.ts
/**
 * The complementary error function by W. J. Cody's rational Chebyshev approximations ("Rational
 * Chebyshev approximations for the error function", Math. Comp. 23 (1969) 631-637; the
 * coefficients of his CALERF routine in netlib's SPECFUN, good to about 1e-18): three intervals,
 * |x| <= 0.46875, up to 4, and beyond 4 (in 1/x^2). The exponential factor exp(-x^2) is taken
 * in two exact pieces so that far tails keep their relative accuracy down to the underflow.
 */
// Cody's coefficients for erf(x) = x R(x^2), |x| <= 0.46875.
const A = [3.1611237438705656, 113.86415415105016, 377.485237685302021, 3209.37758913846947, 0.185777706184603153];
const B = [23.6012909523441209, 244.024637934444173, 1282.61652607737228, 2844.23683343917062];
// exp(x^2) erfc(x) = R(x), 0.46875 < x <= 4.
const C = [
    0.564188496988670089, 8.88314979438837594, 66.1191906371416295, 298.635138197400131, 881.95222124176909,
    1712.04761263407058, 2051.07837782607147, 1230.33935479799725, 2.15311535474403846e-8,
];
const D = [
    15.7449261107098347, 117.693950891312499, 537.181101862009858, 1621.38957456669019, 3290.79923573345963,
    4362.61909014324716, 3439.36767414372164, 1230.33935480374942,
];
// exp(x^2) erfc(x) = (1/sqrt(pi) - R(1/x^2) / x^2) / x, x > 4.
const P = [
    0.305326634961232344, 0.360344899949804439, 0.125781726111229246, 0.0160837851487422766,
    6.58749161529837803e-4, 0.0163153871373020978,
];
const Q = [2.56852019228982242, 1.87295284992346725, 0.527905102951428412, 0.0605183413124413191, 2.33520497626869185e-3];
const INV_SQRT_PI = 0.56418958354775628695;
/** Where Cody's first interval (erf as a rational function of x^2) ends. */
const ERF_SMALL_LIMIT = 0.46875;
/** erf(x) for |x| <= ERF_SMALL_LIMIT (Cody's first interval). */
function erfSmall(x) {
    const z = x * x;
    let num = A[4] * z;
    let den = z;
    for (let i = 0; i < 3; i++) {
        num = (num + A[i]) * z;
        den = (den + B[i]) * z;
    }
    return (x * (num + A[3])) / (den + B[3]);
}
/**
 * exp(y^2) erfc(y) for y > ERF_SMALL_LIMIT (Cody's second and third intervals); about
 * 1 / (y sqrt(pi)) for large y, 0 at Infinity.
 */
function erfcScaledTail(y) {
    if (y <= 4) {
        let num = C[8] * y;
        let den = y;
        for (let i = 0; i < 7; i++) {
            num = (num + C[i]) * y;
            den = (den + D[i]) * y;
        }
        return (num + C[7]) / (den + D[7]);
    }
    const z = 1 / (y * y);
    let num = P[5] * z;
    let den = z;
    for (let i = 0; i < 4; i++) {
        num = (num + P[i]) * z;
        den = (den + Q[i]) * z;
    }
    return (INV_SQRT_PI - (z * (num + P[4])) / (den + Q[4])) / y;
}
/**
 * exp(-s y^2) for y >= 0 and s = 1 or 1/2, as Cody takes it: y = h + r with h a multiple of
 * 1/16, so h^2 is exact and only the small exp(-s (y - h)(y + h)) carries rounding. 0 beyond 40.
 */
function expNegSquare(y, s) {
    if (y > 40)
        return 0;
    const h = Math.trunc(y * 16) / 16;
    return Math.exp(-s * h * h) * Math.exp(-s * (y - h) * (y + h));
}
/**
 * Complementary error function erfc(x) = (2 / sqrt(pi)) integral_x^inf exp(-t^2) dt, with full
 * relative accuracy for large x (W. J. Cody 1969). NaN in, NaN out.
 * @example erfc(1) // 0.15729920705028513
 */
function erfc(x) {
    const y = Math.abs(x);
    if (!(y > ERF_SMALL_LIMIT))
        return 1 - erfSmall(x); // also NaN
    const upper = erfcScaledTail(y) * expNegSquare(y, 1);
    return x < 0 ? 2 - upper : upper;
}
/**
 * Scaled complementary error function exp(x^2) erfc(x) for x >= 0 (finite where erfc underflows:
 * about 1 / (x sqrt(pi)) for large x). Throws RangeError for negative x, where it grows as
 * 2 exp(x^2) and nothing here needs it.
 * @example erfcScaled(30) // ≈ 0.0187958888
 */
function erfcScaled(x) {
    if (x < 0)
        throw new RangeError(`erfcScaled takes x >= 0, got ${x}`);
    if (!(x > ERF_SMALL_LIMIT))
        return Math.exp(x * x) * (1 - erfSmall(x));
    return erfcScaledTail(x);
}

;// CONCATENATED MODULE: ./src/model/special/normal.ts

/** ln sqrt(2 pi). */
const LN_SQRT_2PI = 0.91893853320467274178;
const INV_SQRT_2PI = 0.39894228040143267794;
/**
 * Standard normal upper tail Q(z) = P(Z > z) = erfc(z / sqrt 2) / 2, computed directly (never as
 * 1 - cdf) with Cody's erfc; exp(-z^2/2) is split as in erfc so the
 * relative accuracy holds out to z = 37 and beyond, until the result underflows. NaN in, NaN out.
 * @example normalUpperTail(1.96) // ≈ 0.0249979
 */
function normalUpperTail(z) {
    const y = Math.abs(z) * Math.SQRT1_2;
    if (!(y > ERF_SMALL_LIMIT))
        return 0.5 - 0.5 * erfSmall(z * Math.SQRT1_2); // also NaN
    const far = 0.5 * erfcScaledTail(y) * expNegSquare(Math.abs(z), 0.5);
    return z < 0 ? 1 - far : far;
}
/**
 * ln P(Z < z) for a standard normal, finite far below where P underflows: for z < -1 it is
 * ln(erfcx(-z / sqrt 2) / 2) - z^2 / 2 with erfcx the scaled erfc, otherwise log1p(-Q(z)).
 * -Infinity at -Infinity, 0 at +Infinity, NaN for NaN.
 * @example normalLogCdf(-40) // ≈ -804.608
 */
function normalLogCdf(z) {
    if (z < -1) {
        if (z === -Infinity)
            return -Infinity;
        return Math.log(0.5 * erfcScaledTail(-z * Math.SQRT1_2)) - 0.5 * z * z;
    }
    return Math.log1p(-normalUpperTail(z));
}
/**
 * Normal density exp(-(x - mean)^2 / (2 sd^2)) / (sd sqrt(2 pi)). sd = 0 is the degenerate
 * distribution (Infinity at the mean, 0 elsewhere). The caller checks sd >= 0; NaN in, NaN out.
 * @example normalDensity(1, 0, 1) // 0.24197072451914337
 */
function normalDensity(x, mean, sd) {
    if (sd === 0)
        return x === mean ? Infinity : Number.isNaN(x - mean) ? Number.NaN : 0;
    const z = Math.abs((x - mean) / sd);
    return (INV_SQRT_2PI / sd) * expNegSquare(z, 0.5);
}
/**
 * ln of normalDensity: -(x - mean)^2 / (2 sd^2) - ln sd - ln sqrt(2 pi), finite where the density
 * underflows. sd = 0: Infinity at the mean, -Infinity elsewhere. NaN in, NaN out.
 * @example normalLogDensity(0, 0, 1) // -0.9189385332046727
 */
function normalLogDensity(x, mean, sd) {
    if (sd === 0)
        return x === mean ? Infinity : Number.isNaN(x - mean) ? Number.NaN : -Infinity;
    const z = (x - mean) / sd;
    return -0.5 * z * z - Math.log(sd) - LN_SQRT_2PI;
}


/***/ }),

/***/ 7963:
/***/ ((__unused_webpack_module, __webpack_exports__, __webpack_require__) => {


// EXPORTS
__webpack_require__.d(__webpack_exports__, {
  yp: () => (/* binding */ cutoffLevel),
  DE: () => (/* binding */ cutoffSigma),
  WI: () => (/* binding */ normalTail),
  gq: () => (/* binding */ studentTail)
});

// EXTERNAL MODULE: ./src/model/input-error.ts
var input_error = __webpack_require__(8250);
// EXTERNAL MODULE: ./src/model/special/normal.ts + 1 modules
var normal = __webpack_require__(2986);
// EXTERNAL MODULE: ./src/model/special/incomplete-beta.ts
var incomplete_beta = __webpack_require__(916);
;// CONCATENATED MODULE: ./src/model/special/student-t.ts


/**
 * Two-sided tail P(|T| > |t|) of Student's t with nu > 0 degrees of freedom:
 * I_x(nu/2, 1/2) with x = nu / (nu + t^2) (A&S 26.7.1 and 26.5.27), from the odds t^2 / nu so that
 * neither x nor 1 - x is formed by subtraction. nu = Infinity is the normal limit.
 * NaN for NaN input or nu <= 0.
 * @example studentTwoSidedTail(2.228, 10) // ≈ 0.05
 */
function studentTwoSidedTail(t, nu) {
    if (Number.isNaN(t) || !(nu > 0))
        return Number.NaN;
    if (nu === Infinity)
        return 2 * (0,normal/* normalUpperTail */.IL)(Math.abs(t));
    if (t === 0)
        return 1;
    return (0,incomplete_beta/* regularizedBeta */.RL)(nu / 2, 0.5, (0,incomplete_beta/* betaPointFromOdds */.rP)((t * t) / nu), false);
}
/**
 * Upper tail P(T > t): half the two-sided tail for t >= 0, one minus half of it below 0.
 * @example studentUpperTail(1.812, 10) // ≈ 0.05
 */
function studentUpperTail(t, nu) {
    const half = studentTwoSidedTail(t, nu) / 2;
    return t >= 0 ? half : 1 - half;
}

;// CONCATENATED MODULE: ./src/model/student-tail-series.ts
/**
 * The two-sided tail P(|T| > |t|) of Student's t with a whole number nu of degrees of freedom, by
 * the finite series of Abramowitz & Stegun 26.7.3 (odd nu) and 26.7.4 (even nu), with
 * theta = atan(|t| / sqrt(nu)):
 *   odd:  A = (2 / pi) (theta + sin(theta) [cos + 2/3 cos^3 + (2 4)/(3 5) cos^5 + ... to cos^(nu-2)])
 *   even: A = sin(theta) [1 + 1/2 cos^2 + (1 3)/(2 4) cos^4 + ... to cos^(nu-2)]
 * and the tail is 1 - A. About nu / 2 multiply-adds instead of an incomplete beta function: the
 * gate takes one tail per metric, so on many metrics this is most of the tail's cost.
 * 1 - A cancels when the tail is small, so the series answers only down to SERIES_TAIL_FLOOR
 * (where at most ~12 of 16 digits remain); below it, and for a fractional, huge or infinite
 * input, it returns undefined and the caller uses the incomplete beta (special/student-t.ts).
 *
 * @example seriesTwoSidedTail(2.228, 10) // ≈ 0.05 (standard t table, nu = 10)
 */
function seriesTwoSidedTail(t, nu) {
    if (!Number.isInteger(nu) || nu < 1 || nu > SERIES_MAX_NU || !Number.isFinite(t))
        return undefined;
    const a = Math.abs(t);
    if (a === 0)
        return 1;
    const r = Math.sqrt(nu + a * a);
    const sin = a / r;
    const cos = Math.sqrt(nu) / r;
    const cos2 = cos * cos;
    let tail;
    if (nu % 2 === 0) {
        let term = 1;
        let sum = 1;
        for (let k = 1; k < nu / 2; k++) {
            term *= (cos2 * (2 * k - 1)) / (2 * k);
            sum += term;
        }
        tail = 1 - sin * sum;
    }
    else {
        let sum = 0;
        if (nu > 1) {
            let term = cos;
            sum = cos;
            for (let k = 1; k <= (nu - 3) / 2; k++) {
                term *= (cos2 * (2 * k)) / (2 * k + 1);
                sum += term;
            }
        }
        // 1 - (2/pi) theta = (2/pi) atan(sqrt(nu) / |t|): no cancellation in the arctangent part.
        tail = (2 / Math.PI) * (Math.atan(Math.sqrt(nu) / a) - sin * sum);
    }
    return tail >= SERIES_TAIL_FLOOR ? tail : undefined;
}
/** Below this tail the series hands over to the incomplete beta (cancellation in 1 - A). */
const SERIES_TAIL_FLOOR = 1e-4;
/** Above this many degrees of freedom the series is long; the incomplete beta is cheaper. */
const SERIES_MAX_NU = 400;

;// CONCATENATED MODULE: ./src/model/tails.ts




/**
 * Tail probability of a standard normal z: P(Z > z), P(Z < z) or P(|Z| > |z|).
 * Uses the upper tail erfc(z / sqrt 2) / 2 directly (no 1 - cdf cancellation in the far tail).
 * @example normalTail(1.96, 'both') // ≈ 0.04999579
 */
function normalTail(z, side) {
    if (Number.isNaN(z))
        throw new input_error/* InputError */.d('a tail probability needs a number, got NaN');
    if (side === 'upper')
        return (0,normal/* normalUpperTail */.IL)(z);
    if (side === 'lower')
        return (0,normal/* normalUpperTail */.IL)(-z);
    return 2 * (0,normal/* normalUpperTail */.IL)(Math.abs(z));
}
/**
 * Tail probability of a Student-t statistic with nu degrees of freedom, sides as normalTail.
 * Whole nu and a tail not too small take the finite series (seriesTwoSidedTail, A&S 26.7.3-4);
 * the rest the incomplete beta I_x(nu/2, 1/2), x = nu / (nu + t^2), which keeps full relative
 * precision far out in the tail.
 * @example studentTail(2.228, 10, 'both') // ≈ 0.05 (standard t table, nu = 10)
 */
function studentTail(t, nu, side) {
    if (Number.isNaN(t))
        throw new input_error/* InputError */.d('a tail probability needs a number, got NaN');
    if (!(nu > 0))
        throw new input_error/* InputError */.d(`a Student-t needs degrees of freedom above 0, got ${nu}`);
    const both = seriesTwoSidedTail(t, nu);
    if (both !== undefined) {
        if (side === 'both')
            return both;
        // One side is half the two-sided tail on the far side of 0, and 1 minus that on the near side.
        const far = side === 'upper' ? t >= 0 : t <= 0;
        return far ? both / 2 : 1 - both / 2;
    }
    if (side === 'upper')
        return studentUpperTail(t, nu);
    if (side === 'lower')
        return studentUpperTail(-t, nu);
    return studentTwoSidedTail(t, nu);
}
/** A cutoff is a relative density: a number in (0, 1]. */
function checkCutoff(cutoff) {
    if (!(cutoff > 0 && cutoff <= 1)) {
        throw new input_error/* InputError */.d(`cutoff must be a number above 0 and at most 1, got ${cutoff}`, {
            fix: 'use a relative density such as 0.01',
        });
    }
}
/**
 * How many sigma away the relative density of a Gaussian falls to `cutoff`: sqrt(-2 ln cutoff).
 * Throws InputError unless 0 < cutoff <= 1.
 * @example cutoffSigma(0.01) // 3.0348542587702925
 */
function cutoffSigma(cutoff) {
    checkCutoff(cutoff);
    return Math.sqrt(Math.max(0, -2 * Math.log(cutoff)));
}
/**
 * The two-sided normal tail probability at the cutoff's sigma: the false-alarm level a cutoff
 * stands for under a Gaussian (0.01 -> 3.03 sigma -> 0.0024). Family control uses it as alpha.
 * @example cutoffLevel(0.01) // ≈ 0.002407
 */
function cutoffLevel(cutoff) {
    return normalTail(cutoffSigma(cutoff), 'both');
}


/***/ }),

/***/ 8077:
/***/ ((__unused_webpack_module, __webpack_exports__, __webpack_require__) => {

/* harmony export */ __webpack_require__.d(__webpack_exports__, {
/* harmony export */   G: () => (/* binding */ fromFitScale),
/* harmony export */   P: () => (/* binding */ toFitScale)
/* harmony export */ });
/* harmony import */ var _input_error_js__WEBPACK_IMPORTED_MODULE_0__ = __webpack_require__(8250);

/**
 * The scale a metric is fitted on. `log` suits right-skewed timings and sizes: a multiplicative
 * noise becomes additive, and the fit's sd reads as a relative spread. Values must be > 0 on log.
 * Throws InputError (where: the metric) on a non-finite value, or a value <= 0 on log.
 * @example toFitScale(Math.E, 'log', 'build/time') // 1
 */
function toFitScale(value, transform, metric) {
    if (!Number.isFinite(value)) {
        throw new _input_error_js__WEBPACK_IMPORTED_MODULE_0__/* .InputError */ .d(`value ${value} is not a finite number`, { where: metric, fix: 'check the metric file' });
    }
    if (transform === 'none')
        return value;
    if (!(value > 0)) {
        throw new _input_error_js__WEBPACK_IMPORTED_MODULE_0__/* .InputError */ .d(`value ${value} cannot be log-transformed (must be > 0)`, {
            where: metric,
            fix: 'use `transform: none` for this metric, or check the value',
        });
    }
    return Math.log(value);
}
/** Back from the fit scale to the metric's own scale. @example fromFitScale(0, 'log') // 1 */
function fromFitScale(value, transform) {
    return transform === 'log' ? Math.exp(value) : value;
}


/***/ }),

/***/ 23:
/***/ ((__unused_webpack_module, __webpack_exports__, __webpack_require__) => {

/* harmony export */ __webpack_require__.d(__webpack_exports__, {
/* harmony export */   X: () => (/* binding */ cleanText),
/* harmony export */   _: () => (/* binding */ MAX_SHOWN_LENGTH)
/* harmony export */ });
/**
 * Text from metric files (names, units) is untrusted: it may carry terminal escape sequences,
 * bidirectional overrides that make a name read differently from what it is (the "Trojan Source"
 * trick, CVE-2021-42574), line breaks that split a table row, or be 10 KB long. `cleanText` removes
 * all of that before any renderer adds its own escaping on top.
 */
/** Default cap on shown names: long enough for real paths, short enough for a table row. */
const MAX_SHOWN_LENGTH = 200;
// C0 and C1 controls (ESC starts terminal sequences), DEL, bidi embeddings/overrides U+202A-202E,
// isolates U+2066-2069, and the implicit marks U+200E/U+200F/U+061C that can also reorder text.
const UNSAFE = /[\u0000-\u0008\u000B\u000C\u000E-\u001F\u007F-\u009F\u202A-\u202E\u2066-\u2069\u200E\u200F\u061C]/g;
const LINE_BREAKS = /[\t\n\r\u2028\u2029\u0085]+/g;
/**
 * Strip control and bidi-override characters, turn line breaks and tabs into single spaces and cap
 * the length at `max` code points with an ellipsis. Never throws.
 * @example cleanText('a\u202Eb\nc') // 'ab c'
 * @example cleanText('x'.repeat(300)).length // 200
 */
function cleanText(s, max = MAX_SHOWN_LENGTH) {
    const flat = String(s).replace(LINE_BREAKS, ' ').replace(UNSAFE, '');
    if (flat.length <= max)
        return flat; // UTF-16 length bounds the code-point count
    const points = Array.from(flat);
    if (points.length <= max)
        return flat;
    return points.slice(0, Math.max(0, max - 1)).join('') + '…';
}


/***/ }),

/***/ 2011:
/***/ ((__unused_webpack_module, __webpack_exports__, __webpack_require__) => {

/* harmony export */ __webpack_require__.d(__webpack_exports__, {
/* harmony export */   Fl: () => (/* binding */ formatValue),
/* harmony export */   Hx: () => (/* binding */ formatSigma),
/* harmony export */   ZV: () => (/* binding */ formatNumber),
/* harmony export */   a7: () => (/* binding */ formatDensity),
/* harmony export */   e5: () => (/* binding */ NOT_AVAILABLE),
/* harmony export */   eD: () => (/* binding */ formatChange),
/* harmony export */   mM: () => (/* binding */ formatAgainstCutoff)
/* harmony export */ });
/**
 * Number formatting shared by every renderer. Pure and locale-free (CI logs and PR comments are
 * read everywhere; a decimal comma would break copy-paste into other tools). Non-finite numbers
 * print as "n/a", never "NaN".
 */
const NOT_AVAILABLE = 'n/a';
/**
 * A value with `digits` significant digits, but never rounding away integer digits (40211 stays
 * 40211) and switching to exponent form outside [1e-3, 1e9).
 * @example formatNumber(412.5) // '412.5'
 * @example formatNumber(0.000012345) // '1.235e-5'
 */
function formatNumber(x, digits = 4) {
    if (x === undefined || !Number.isFinite(x))
        return NOT_AVAILABLE;
    if (x === 0)
        return '0';
    const abs = Math.abs(x);
    if (abs < 1e-3 || abs >= 1e9)
        return x.toExponential(digits - 1).replace(/\.?0+e/, 'e').replace('e+', 'e');
    if (abs >= 10 ** digits)
        return String(Math.round(x));
    return String(Number(x.toPrecision(digits)));
}
/** A value with its unit ("412.5 ns"); the unit must already be escaped for the target format. */
function formatValue(x, unit) {
    const n = formatNumber(x);
    return unit && n !== NOT_AVAILABLE ? `${n} ${unit}` : n;
}
/**
 * A relative change as a signed percentage with two significant digits below 10%.
 * @example formatChange(0.217) // '+21.7%'
 * @example formatChange(-0.0042) // '-0.42%'
 */
function formatChange(change) {
    if (change === undefined || !Number.isFinite(change))
        return NOT_AVAILABLE;
    // A change near the largest double would overflow to Infinity when turned into percent.
    const pct = Math.max(-Number.MAX_VALUE, Math.min(Number.MAX_VALUE, change * 100));
    const abs = Math.abs(pct);
    const body = abs === 0 ? '0' : abs >= 1e6 ? formatNumber(abs, 3) : abs >= 10 ? abs.toFixed(1) : abs >= 1 ? abs.toFixed(2) : formatNumber(abs, 2);
    return `${pct > 0 ? '+' : pct < 0 ? '-' : '±'}${body}%`;
}
/** How many standard deviations from the baseline mean, signed. @example formatSigma(4.12) // '+4.1 sd' */
function formatSigma(z) {
    if (z === undefined || !Number.isFinite(z))
        return NOT_AVAILABLE;
    const r = Math.abs(z) >= 100 ? Math.round(z).toString() : z.toFixed(1);
    return `${z >= 0 ? '+' : ''}${r === '-0.0' ? '0.0' : r} sd`;
}
/**
 * A relative density (in (0, 1]): two significant digits, in scientific notation below 0.001
 * where a decimal would be all zeros.
 * @example formatDensity(2.6e-7) // '2.6e-7'
 * @example formatDensity(0.0342) // '0.034'
 */
function formatDensity(r) {
    if (r === undefined || !Number.isFinite(r))
        return NOT_AVAILABLE;
    if (r === 0)
        return '0';
    if (r >= 1e-3)
        return formatNumber(r, 2);
    return r.toExponential(1).replace('e+', 'e');
}
/** "2.6e-7 < 0.01": the relative density against the cutoff, the comparison the gate made. */
function formatAgainstCutoff(r, cutoff) {
    if (r === undefined || !Number.isFinite(r))
        return NOT_AVAILABLE;
    return `${formatDensity(r)} ${r < cutoff ? '<' : '≥'} ${formatDensity(cutoff)}`;
}


/***/ })

};
