export const id = 628;
export const ids = [628];
export const modules = {

/***/ 86783:
/***/ ((__unused_webpack_module, __webpack_exports__, __webpack_require__) => {

/* harmony export */ __webpack_require__.d(__webpack_exports__, {
/* harmony export */   Z: () => (/* binding */ loadConfig)
/* harmony export */ });
/* unused harmony export LOOKED_UP_CONFIGS */
/* harmony import */ var _config_locate_js__WEBPACK_IMPORTED_MODULE_0__ = __webpack_require__(55562);

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

/***/ 31954:
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

/***/ 80517:
/***/ ((__unused_webpack_module, __webpack_exports__, __webpack_require__) => {

/* harmony export */ __webpack_require__.d(__webpack_exports__, {
/* harmony export */   M: () => (/* binding */ isLiteralGlob),
/* harmony export */   t: () => (/* binding */ compileGlobs)
/* harmony export */ });
/* harmony import */ var picomatch__WEBPACK_IMPORTED_MODULE_0__ = __webpack_require__(14006);
/* harmony import */ var picomatch__WEBPACK_IMPORTED_MODULE_0___default = /*#__PURE__*/__webpack_require__.n(picomatch__WEBPACK_IMPORTED_MODULE_0__);

// Metric names are not paths: a leading '.' is an ordinary character (dot: true), and '\' is
// never a separator, whatever the operating system (windows: false).
const OPTIONS = { dot: true, windows: false };
const cache = new WeakMap();
/**
 * Compiles a rule's globs (picomatch syntax) into one matcher: a name matches when it matches at
 * least one plain glob and no glob starting with '!' (only '!' globs: everything but those).
 * Metric names contain '/', and `*` stays within one '/' segment while `**` crosses segments:
 * `throughput/*` matches `throughput/home` but not `throughput/api/v2`; `size/**` matches both
 * `size/app.js` and `size/assets/logo.svg`. Compiled once per globs array (WeakMap cache).
 * Throws picomatch's error for a pattern it cannot compile (load.ts reports it with line:column).
 * @example compileGlobs(['latency/*', '!latency/calibrate'])('latency/render') // true
 */
function compileGlobs(globs) {
    const cached = cache.get(globs);
    if (cached)
        return cached;
    const plain = globs.filter((g) => !g.startsWith('!'));
    const negated = globs.filter((g) => g.startsWith('!')).map((g) => g.slice(1));
    const include = plain.length > 0 ? picomatch__WEBPACK_IMPORTED_MODULE_0___default()(plain, OPTIONS) : () => true;
    const exclude = negated.length > 0 ? picomatch__WEBPACK_IMPORTED_MODULE_0___default()(negated, OPTIONS) : () => false;
    const matcher = (name) => include(name) && !exclude(name);
    cache.set(globs, matcher);
    return matcher;
}
/**
 * True when the glob has no wildcard or brace characters, so it names exactly one metric.
 * @example isLiteralGlob('latency/calibrate') // true
 */
function isLiteralGlob(glob) {
    return !picomatch__WEBPACK_IMPORTED_MODULE_0___default().scan(glob).isGlob && !glob.startsWith('!');
}


/***/ }),

/***/ 55562:
/***/ ((__unused_webpack_module, __webpack_exports__, __webpack_require__) => {

/* harmony export */ __webpack_require__.d(__webpack_exports__, {
/* harmony export */   _X: () => (/* binding */ DEFAULT_CONFIG_PATHS),
/* harmony export */   yH: () => (/* binding */ loadConfigLazily)
/* harmony export */ });
/* unused harmony export anyConfigPresent */
/* harmony import */ var node_fs_promises__WEBPACK_IMPORTED_MODULE_0__ = __webpack_require__(51455);
/* harmony import */ var node_fs_promises__WEBPACK_IMPORTED_MODULE_0___default = /*#__PURE__*/__webpack_require__.n(node_fs_promises__WEBPACK_IMPORTED_MODULE_0__);
/* harmony import */ var node_path__WEBPACK_IMPORTED_MODULE_1__ = __webpack_require__(76760);
/* harmony import */ var node_path__WEBPACK_IMPORTED_MODULE_1___default = /*#__PURE__*/__webpack_require__.n(node_path__WEBPACK_IMPORTED_MODULE_1__);
/* harmony import */ var _defaults_js__WEBPACK_IMPORTED_MODULE_2__ = __webpack_require__(31954);



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
 * (YAML and schema validation, ~40 ms of start-up) is imported only when there is a file to read;
 * this module itself loads neither.
 * @throws InputError for a missing named file or an invalid config (with file:line:col).
 * @example await loadConfigLazily(undefined, '/repo') // the defaults in a folder without a config file
 */
async function loadConfigLazily(path, cwd, required = path !== undefined) {
    if (path === undefined && !(await anyConfigPresent(cwd)))
        return (0,_defaults_js__WEBPACK_IMPORTED_MODULE_2__/* .defaultConfig */ .sb)();
    const { readConfigFile } = await Promise.all(/* import() */[__webpack_require__.e(815), __webpack_require__.e(463), __webpack_require__.e(446), __webpack_require__.e(0)]).then(__webpack_require__.bind(__webpack_require__, 62000));
    return readConfigFile(path, { cwd, required });
}


/***/ }),

/***/ 85413:
/***/ ((__unused_webpack_module, __webpack_exports__, __webpack_require__) => {

/* harmony export */ __webpack_require__.d(__webpack_exports__, {
/* harmony export */   R: () => (/* binding */ groupFor),
/* harmony export */   z: () => (/* binding */ settingsFor)
/* harmony export */ });
/* harmony import */ var _glob_matcher_js__WEBPACK_IMPORTED_MODULE_0__ = __webpack_require__(80517);

/**
 * The settings that decide one metric: the defaults, then every `metrics:` rule whose globs match
 * the name, in file order, so a later match overrides an earlier one key by key. Pure.
 * Globs are picomatch globs over the whole name; `*` does not cross '/', `**` does; a glob starting
 * with '!' excludes (see compileGlobs). A metric is never relative to itself: when the resolved
 * `relative-to` names the metric (the calibration benchmark matched by its own rule), it is dropped.
 * @example settingsFor(config, 'throughput/home').worse // 'lower' with the rule { match: 'throughput/*', worse: lower }
 */
function settingsFor(config, metric) {
    const settings = { ...config.defaults };
    for (const rule of config.rules) {
        if ((0,_glob_matcher_js__WEBPACK_IMPORTED_MODULE_0__/* .compileGlobs */ .t)(rule.match)(metric))
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
    return config.groups.find((group) => (0,_glob_matcher_js__WEBPACK_IMPORTED_MODULE_0__/* .compileGlobs */ .t)(group.match)(metric));
}


/***/ }),

/***/ 64614:
/***/ ((__unused_webpack_module, __webpack_exports__, __webpack_require__) => {


// EXPORTS
__webpack_require__.d(__webpack_exports__, {
  w: () => (/* binding */ selectBaseline)
});

// EXTERNAL MODULE: ./src/model/input-error.ts
var input_error = __webpack_require__(38250);
// EXTERNAL MODULE: ./src/model/fit.ts
var fit = __webpack_require__(95046);
// EXTERNAL MODULE: ./src/model/median.ts
var median = __webpack_require__(90071);
;// CONCATENATED MODULE: ./src/model/change-points.ts



/**
 * The noise sigma, estimated from successive differences so level shifts barely bias it:
 * x_{t+1} - x_t has variance 2 sigma^2 within a segment, and a step touches one difference only.
 * Robust (1.4826 MAD / sqrt 2), falling back to the plain RMS of differences for quantised data.
 */
function noiseSigma(centred) {
    const diffs = new Float64Array(centred.length - 1);
    for (let i = 1; i < centred.length; i++)
        diffs[i - 1] = centred[i] - centred[i - 1];
    const robust = (fit/* MAD_TO_SIGMA */.tF * (0,median/* medianAbsoluteDeviation */.h)(diffs)) / Math.SQRT2;
    if (robust > 0)
        return robust;
    let squares = 0;
    for (const d of diffs)
        squares += d * d;
    return Math.sqrt(squares / (2 * diffs.length));
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
    const centre = (0,median/* median */.J)(values);
    const centred = new Float64Array(n);
    for (let i = 0; i < n; i++)
        centred[i] = values[i] - centre;
    const sigma = noiseSigma(centred);
    if (!(sigma > 0))
        return [];
    const sum = new Float64Array(n + 1);
    const sumSq = new Float64Array(n + 1);
    for (let i = 0; i < n; i++) {
        const z = centred[i] / sigma;
        sum[i + 1] = sum[i] + z;
        sumSq[i + 1] = sumSq[i] + z * z;
    }
    const best = new Float64Array(n + 1).fill(Infinity);
    const previous = new Int32Array(n + 1);
    best[0] = -penalty;
    // The candidate starts and their totals live in fixed typed arrays, pruned in place: the gate
    // runs this once per metric, and a fresh array and closure per step was most of its cost.
    const candidates = new Int32Array(n + 1);
    const totals = new Float64Array(n + 1);
    let count = 0;
    for (let end = minSegment; end <= n; end++) {
        // The start that just became far enough back joins the candidates, if it can end a segment.
        const fresh = end - minSegment;
        if (fresh === 0 || fresh >= minSegment)
            candidates[count++] = fresh;
        let bestValue = Infinity;
        let bestStart = 0;
        for (let k = 0; k < count; k++) {
            const start = candidates[k];
            // Segment cost C = sum z^2 - (sum z)^2 / length, never below 0 (rounding).
            const s = sum[end] - sum[start];
            const cost = Math.max(0, sumSq[end] - sumSq[start] - (s * s) / (end - start));
            const total = best[start] + cost + penalty;
            totals[k] = total;
            if (total < bestValue) {
                bestValue = total;
                bestStart = start;
            }
        }
        best[end] = bestValue;
        previous[end] = bestStart;
        // PELT pruning: a start already worse by the penalty can never become optimal again.
        let kept = 0;
        for (let k = 0; k < count; k++) {
            if (totals[k] - penalty <= bestValue)
                candidates[kept++] = candidates[k];
        }
        count = kept;
    }
    const starts = [];
    for (let at = previous[n]; at > 0; at = previous[at])
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
 * O(runs) plus the change-point search. Throws InputError when a value cannot take the transform.
 * @example selectBaseline(history, 'build/time', settings).values // [412.5, 409.9, ...]
 */
function selectBaseline(history, name, settings) {
    const column = history.columns.get(name);
    const reference = settings.relativeTo === undefined ? undefined : history.columns.get(settings.relativeTo);
    const values = [];
    const runIds = [];
    let available = 0;
    if (column !== undefined) {
        const count = Math.min(column.values.length, history.runs.length);
        // Only the newest `window` pairs are kept, so count the pairs first and build just those
        // (a long history otherwise costs an array entry and a run-id lookup per run and metric).
        const paired = pairs(column.values, reference?.values, count, settings.relativeTo !== undefined);
        const firstKept = paired - settings.window;
        // Values before the window are still checked when the scale can refuse them (log, ratios).
        const checkAll = settings.transform !== 'none' || settings.relativeTo !== undefined;
        let k = 0;
        for (let i = 0; i < count; i++) {
            let x = column.values[i];
            if (!Number.isFinite(x))
                continue;
            available++;
            if (settings.relativeTo !== undefined) {
                const r = reference?.values[i];
                if (r === undefined || !Number.isFinite(r) || r === 0)
                    continue;
                x /= r;
            }
            if (k++ < firstKept) {
                if (checkAll)
                    toHistoryFitScale(x, settings, name, history.runs[i].id);
                continue;
            }
            const id = history.runs[i].id;
            values.push(toHistoryFitScale(x, settings, name, id));
            runIds.push(id);
        }
    }
    const selected = { values, runIds, available };
    if (settings.relativeTo !== undefined)
        selected.relativeTo = settings.relativeTo;
    return settings.changePoints ? sinceLastChange(selected, settings.minRuns) : selected;
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
/** How many of the first `count` runs hold the metric (and, for ratios, a usable reference). */
function pairs(column, reference, count, ratio) {
    let n = 0;
    for (let i = 0; i < count; i++) {
        if (!Number.isFinite(column[i]))
            continue;
        if (ratio) {
            const r = reference?.[i];
            if (r === undefined || !Number.isFinite(r) || r === 0)
                continue;
        }
        n++;
    }
    return n;
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

/***/ 18176:
/***/ ((__unused_webpack_module, __webpack_exports__, __webpack_require__) => {

/* harmony export */ __webpack_require__.d(__webpack_exports__, {
/* harmony export */   h: () => (/* binding */ plainTest),
/* harmony export */   n: () => (/* binding */ decideMetric)
/* harmony export */ });
/* harmony import */ var _format_number_js__WEBPACK_IMPORTED_MODULE_0__ = __webpack_require__(19616);
/* harmony import */ var _tolerance_js__WEBPACK_IMPORTED_MODULE_1__ = __webpack_require__(20592);


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
    return { ...result, status, reason };
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

/***/ 19616:
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

/***/ 81177:
/***/ ((__unused_webpack_module, __webpack_exports__, __webpack_require__) => {

/* harmony export */ __webpack_require__.d(__webpack_exports__, {
/* harmony export */   zN: () => (/* binding */ scoreMetric)
/* harmony export */ });
/* unused harmony exports RECENT_VALUES, judgeMetric */
/* harmony import */ var _model_density_js__WEBPACK_IMPORTED_MODULE_0__ = __webpack_require__(20913);
/* harmony import */ var _model_fit_js__WEBPACK_IMPORTED_MODULE_1__ = __webpack_require__(95046);
/* harmony import */ var _model_input_error_js__WEBPACK_IMPORTED_MODULE_2__ = __webpack_require__(38250);
/* harmony import */ var _model_tails_js__WEBPACK_IMPORTED_MODULE_3__ = __webpack_require__(60312);
/* harmony import */ var _model_transform_js__WEBPACK_IMPORTED_MODULE_4__ = __webpack_require__(8077);
/* harmony import */ var _resolution_floor_js__WEBPACK_IMPORTED_MODULE_8__ = __webpack_require__(1198);
/* harmony import */ var _sides_js__WEBPACK_IMPORTED_MODULE_5__ = __webpack_require__(33979);
/* harmony import */ var _tolerance_js__WEBPACK_IMPORTED_MODULE_6__ = __webpack_require__(20592);
/* harmony import */ var _decide_metric_js__WEBPACK_IMPORTED_MODULE_7__ = __webpack_require__(18176);









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
    const base = {
        name,
        status: 'ok',
        value,
        cutoff: settings.cutoff,
        worse: settings.worse,
        reason: '',
        ...(extras.unit === undefined ? {} : { unit: extras.unit }),
        ...(extras.count === undefined ? {} : { count: extras.count }),
    };
    const unscored = { settings, scored: false, direction: 'none', beyondTolerance: false };
    const n = baseline.length;
    if (n === 0)
        return { ...unscored, result: { ...base, status: 'new', reason: 'no history for this metric yet' } };
    base.recent = baseline.slice(-RECENT_VALUES).map((x) => (0,_model_transform_js__WEBPACK_IMPORTED_MODULE_4__/* .fromFitScale */ .G)(x, settings.transform));
    if (n < settings.minRuns) {
        const reason = `only ${n} baseline run${n === 1 ? '' : 's'}; min-runs is ${settings.minRuns}`;
        const early = fitWithFloor(baseline, settings);
        return { ...unscored, result: { ...base, status: 'learning', baseline: { n, mean: early.mean, sd: early.sd }, reason } };
    }
    const fit = fitWithFloor(baseline, settings);
    const centre = (0,_model_transform_js__WEBPACK_IMPORTED_MODULE_4__/* .fromFitScale */ .G)(fit.mean, settings.transform);
    base.baseline = {
        n,
        mean: fit.mean,
        sd: fit.sd,
        ...(settings.transform === 'log' ? { scale: 'log' } : {}),
        ...(extras.since === undefined ? {} : { since: extras.since }),
        ...(extras.relativeTo === undefined ? {} : { relativeTo: extras.relativeTo }),
    };
    if (centre !== 0)
        base.change = (value - centre) / centre;
    const deviation = current - fit.mean;
    Object.assign(base, deviationFigures(current, fit, settings));
    const score = {
        result: base,
        settings,
        scored: true,
        direction: (0,_sides_js__WEBPACK_IMPORTED_MODULE_5__/* .directionOf */ .F)(deviation, settings.worse),
        beyondTolerance: (0,_tolerance_js__WEBPACK_IMPORTED_MODULE_6__/* .beyondTolerance */ .f5)(value, centre, settings.tolerance),
        current,
        fit,
    };
    return { ...score, result: (0,_decide_metric_js__WEBPACK_IMPORTED_MODULE_7__/* .decideMetric */ .n)(score, (0,_decide_metric_js__WEBPACK_IMPORTED_MODULE_7__/* .plainTest */ .h)(base)) };
}
/** fitGaussian with the resolution moved to the fit scale around the fitted centre. */
function fitWithFloor(values, settings) {
    const raw = (0,_model_fit_js__WEBPACK_IMPORTED_MODULE_1__/* .fitGaussian */ .Dk)(values, settings.fit, 0);
    const floor = (0,_resolution_floor_js__WEBPACK_IMPORTED_MODULE_8__/* .fitScaleFloor */ .c)(settings.resolution, settings.transform, raw.mean);
    return floor > 0 ? (0,_model_fit_js__WEBPACK_IMPORTED_MODULE_1__/* .fitGaussian */ .Dk)(values, settings.fit, floor) : raw;
}
/** z, density, relative density and tail; a zero spread gives 0 or 1 and no z. */
function deviationFigures(x, fit, settings) {
    const deviation = x - fit.mean;
    const predictive = settings.uncertainty === 'predictive' && fit.n >= 2;
    if (fit.sd === 0 || (predictive && fit.sampleSd === 0)) {
        const moved = deviation !== 0;
        return { relativeDensity: moved ? 0 : 1, tail: moved ? 0 : 1 };
    }
    const z = deviation / fit.sd;
    const density = (0,_model_density_js__WEBPACK_IMPORTED_MODULE_0__/* .gaussianDensity */ .QA)(x, fit.mean, fit.sd);
    if (!predictive)
        return { z, density, relativeDensity: (0,_model_density_js__WEBPACK_IMPORTED_MODULE_0__/* .plugInRelativeDensity */ .YS)(x, fit.mean, fit.sd), tail: (0,_model_tails_js__WEBPACK_IMPORTED_MODULE_3__/* .normalTail */ .WI)(z, 'both') };
    const t = deviation / (0,_model_density_js__WEBPACK_IMPORTED_MODULE_0__/* .predictiveScale */ .Wn)(fit.sampleSd, fit.n);
    return {
        z,
        density,
        relativeDensity: (0,_model_density_js__WEBPACK_IMPORTED_MODULE_0__/* .predictiveRelativeDensity */ .kr)(x, fit.mean, fit.sampleSd, fit.n),
        tail: (0,_model_tails_js__WEBPACK_IMPORTED_MODULE_3__/* .studentTail */ .gq)(t, fit.n - 1, 'both'),
    };
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

/***/ 33979:
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

/***/ 20592:
/***/ ((__unused_webpack_module, __webpack_exports__, __webpack_require__) => {

/* harmony export */ __webpack_require__.d(__webpack_exports__, {
/* harmony export */   Nn: () => (/* binding */ describeTolerance),
/* harmony export */   f5: () => (/* binding */ beyondTolerance)
/* harmony export */ });
/* unused harmony export toleranceAmount */
/* harmony import */ var _format_number_js__WEBPACK_IMPORTED_MODULE_0__ = __webpack_require__(19616);

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

/***/ 20913:
/***/ ((__unused_webpack_module, __webpack_exports__, __webpack_require__) => {

/* harmony export */ __webpack_require__.d(__webpack_exports__, {
/* harmony export */   QA: () => (/* binding */ gaussianDensity),
/* harmony export */   Wn: () => (/* binding */ predictiveScale),
/* harmony export */   YS: () => (/* binding */ plugInRelativeDensity),
/* harmony export */   kr: () => (/* binding */ predictiveRelativeDensity)
/* harmony export */ });
/* unused harmony export gaussianLogDensity */
/* harmony import */ var _stdlib_stats_base_dists_normal_logpdf__WEBPACK_IMPORTED_MODULE_0__ = __webpack_require__(80821);
/* harmony import */ var _stdlib_stats_base_dists_normal_logpdf__WEBPACK_IMPORTED_MODULE_0___default = /*#__PURE__*/__webpack_require__.n(_stdlib_stats_base_dists_normal_logpdf__WEBPACK_IMPORTED_MODULE_0__);
/* harmony import */ var _stdlib_stats_base_dists_normal_pdf__WEBPACK_IMPORTED_MODULE_1__ = __webpack_require__(49993);
/* harmony import */ var _stdlib_stats_base_dists_normal_pdf__WEBPACK_IMPORTED_MODULE_1___default = /*#__PURE__*/__webpack_require__.n(_stdlib_stats_base_dists_normal_pdf__WEBPACK_IMPORTED_MODULE_1__);
/* harmony import */ var _input_error_js__WEBPACK_IMPORTED_MODULE_2__ = __webpack_require__(38250);



/** A spread must be a finite number >= 0; 0 is the degenerate fit of a constant history. */
function checkSpread(sd) {
    if (!(sd >= 0) || !Number.isFinite(sd)) {
        throw new _input_error_js__WEBPACK_IMPORTED_MODULE_2__/* .InputError */ .d(`a standard deviation must be a finite number, 0 or more, got ${sd}`);
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
    return _stdlib_stats_base_dists_normal_pdf__WEBPACK_IMPORTED_MODULE_1___default()(x, mean, sd);
}
/**
 * log p(x), exact where p(x) underflows to 0 (beyond about 38 sigma).
 * @example gaussianLogDensity(0, 0, 1) // -0.9189385332046727
 */
function gaussianLogDensity(x, mean, sd) {
    checkSpread(sd);
    return normalLogpdf(x, mean, sd);
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
        throw new _input_error_js__WEBPACK_IMPORTED_MODULE_2__/* .InputError */ .d(`the predictive distribution needs at least 2 runs, got ${n}`, {
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

/***/ 97089:
/***/ ((__unused_webpack_module, __webpack_exports__, __webpack_require__) => {

/* harmony export */ __webpack_require__.d(__webpack_exports__, {
/* harmony export */   F: () => (/* binding */ adjustTails)
/* harmony export */ });
/* harmony import */ var _input_error_js__WEBPACK_IMPORTED_MODULE_0__ = __webpack_require__(38250);

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

/***/ 95046:
/***/ ((__unused_webpack_module, __webpack_exports__, __webpack_require__) => {

/* harmony export */ __webpack_require__.d(__webpack_exports__, {
/* harmony export */   Dk: () => (/* binding */ fitGaussian),
/* harmony export */   tF: () => (/* binding */ MAD_TO_SIGMA)
/* harmony export */ });
/* unused harmony export MEAN_AD_TO_SIGMA */
/* harmony import */ var _input_error_js__WEBPACK_IMPORTED_MODULE_0__ = __webpack_require__(38250);
/* harmony import */ var _moments_js__WEBPACK_IMPORTED_MODULE_1__ = __webpack_require__(88884);
/* harmony import */ var _median_js__WEBPACK_IMPORTED_MODULE_2__ = __webpack_require__(90071);



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
 * O(n) (robust: O(n log n)). Throws InputError on an empty input, a non-finite value or a
 * negative or non-finite resolution.
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
        centre = (0,_median_js__WEBPACK_IMPORTED_MODULE_2__/* .median */ .J)(values);
        spread = MAD_TO_SIGMA * (0,_median_js__WEBPACK_IMPORTED_MODULE_2__/* .medianAbsoluteDeviation */ .h)(values);
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

/***/ 90071:
/***/ ((__unused_webpack_module, __webpack_exports__, __webpack_require__) => {

/* harmony export */ __webpack_require__.d(__webpack_exports__, {
/* harmony export */   J: () => (/* binding */ median),
/* harmony export */   h: () => (/* binding */ medianAbsoluteDeviation)
/* harmony export */ });
/* harmony import */ var _input_error_js__WEBPACK_IMPORTED_MODULE_0__ = __webpack_require__(38250);

/** A sorted copy, rejecting what has no median (the input is not reordered). */
function sortedCopy(values) {
    const n = values.length;
    if (n === 0)
        throw new _input_error_js__WEBPACK_IMPORTED_MODULE_0__/* .InputError */ .d('cannot take the median of an empty set of values');
    for (let i = 0; i < n; i++) {
        const x = values[i];
        if (!Number.isFinite(x))
            throw new _input_error_js__WEBPACK_IMPORTED_MODULE_0__/* .InputError */ .d(`value ${x} at position ${i + 1} is not a finite number`);
    }
    // A Float64Array sorts numerically (a plain array would sort as strings).
    return Float64Array.from(values).sort();
}
/**
 * Median of the values. O(n log n). Throws InputError on an empty input or a non-finite value.
 * @example median([3, 1, 2, 10]) // 2.5
 */
function median(values) {
    const sorted = sortedCopy(values);
    const n = sorted.length;
    const half = n >> 1;
    return n % 2 === 1 ? sorted[half] : (sorted[half - 1] + sorted[half]) / 2;
}
/**
 * Median absolute deviation from the median (unscaled). Multiply by 1.4826 for a consistent
 * estimate of sigma under a Gaussian (Rousseeuw & Croux 1993; 1.4826 = 1 / Phi^-1(3/4)).
 * Throws InputError on an empty input or a non-finite value.
 * @example medianAbsoluteDeviation([1, 2, 3, 4, 100]) // 1
 */
function medianAbsoluteDeviation(values) {
    const centre = median(values);
    // A plain loop: Float64Array.from with a map function takes a slow generic path in V8.
    const deviations = new Float64Array(values.length);
    for (let i = 0; i < values.length; i++)
        deviations[i] = Math.abs(values[i] - centre);
    return median(deviations);
}


/***/ }),

/***/ 88884:
/***/ ((__unused_webpack_module, __webpack_exports__, __webpack_require__) => {

/* harmony export */ __webpack_require__.d(__webpack_exports__, {
/* harmony export */   R7: () => (/* binding */ meanAndSquares),
/* harmony export */   i2: () => (/* binding */ mean)
/* harmony export */ });
/* unused harmony export variance */
/* harmony import */ var _input_error_js__WEBPACK_IMPORTED_MODULE_0__ = __webpack_require__(38250);

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

/***/ 60312:
/***/ ((__unused_webpack_module, __webpack_exports__, __webpack_require__) => {


// EXPORTS
__webpack_require__.d(__webpack_exports__, {
  yp: () => (/* binding */ cutoffLevel),
  DE: () => (/* binding */ cutoffSigma),
  WI: () => (/* binding */ normalTail),
  gq: () => (/* binding */ studentTail)
});

// EXTERNAL MODULE: ./node_modules/@stdlib/stats-base-dists-normal-cdf/lib/index.js
var lib = __webpack_require__(72484);
var lib_default = /*#__PURE__*/__webpack_require__.n(lib);
// EXTERNAL MODULE: ./node_modules/@stdlib/stats-base-dists-t-cdf/lib/index.js
var stats_base_dists_t_cdf_lib = __webpack_require__(86021);
var stats_base_dists_t_cdf_lib_default = /*#__PURE__*/__webpack_require__.n(stats_base_dists_t_cdf_lib);
// EXTERNAL MODULE: ./src/model/input-error.ts
var input_error = __webpack_require__(38250);
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
 * input, it returns undefined and the caller uses the incomplete beta (stdlib's t CDF).
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
// One stdlib function per package: the namespace packages load every function of the
// distribution at start-up (about half of the stdlib load time; see test/bench/README.md).




/**
 * Tail probability of a standard normal z: P(Z > z), P(Z < z) or P(|Z| > |z|).
 * Uses the complementary CDF directly (no 1 - cdf cancellation in the far tail).
 * @example normalTail(1.96, 'both') // ≈ 0.04999579
 */
function normalTail(z, side) {
    if (Number.isNaN(z))
        throw new input_error/* InputError */.d('a tail probability needs a number, got NaN');
    if (side === 'upper')
        return lib_default()(-z, 0, 1);
    if (side === 'lower')
        return lib_default()(z, 0, 1);
    return 2 * lib_default()(-Math.abs(z), 0, 1);
}
/**
 * Tail probability of a Student-t statistic with nu degrees of freedom, sides as normalTail.
 * Whole nu and a tail not too small take the finite series (seriesTwoSidedTail, A&S 26.7.3-4);
 * the rest stdlib's incomplete-beta CDF, which keeps full precision far out in the tail.
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
        return stats_base_dists_t_cdf_lib_default()(-t, nu);
    if (side === 'lower')
        return stats_base_dists_t_cdf_lib_default()(t, nu);
    return 2 * stats_base_dists_t_cdf_lib_default()(-Math.abs(t), nu);
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
/* harmony import */ var _input_error_js__WEBPACK_IMPORTED_MODULE_0__ = __webpack_require__(38250);

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

/***/ 60023:
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

/***/ 12011:
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
