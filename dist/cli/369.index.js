export const id = 369;
export const ids = [369,517];
export const modules = {

/***/ 4034:
/***/ ((__unused_webpack_module, __webpack_exports__, __webpack_require__) => {

/* harmony export */ __webpack_require__.d(__webpack_exports__, {
/* harmony export */   n: () => (/* binding */ readUserText)
/* harmony export */ });
/* unused harmony export MAX_TEXT_BYTES */
/* harmony import */ var node_fs_promises__WEBPACK_IMPORTED_MODULE_0__ = __webpack_require__(1455);
/* harmony import */ var node_fs_promises__WEBPACK_IMPORTED_MODULE_0___default = /*#__PURE__*/__webpack_require__.n(node_fs_promises__WEBPACK_IMPORTED_MODULE_0__);
/* harmony import */ var _model_input_error_js__WEBPACK_IMPORTED_MODULE_1__ = __webpack_require__(8250);


/** Files the CLI reads whole (history, import runs) are refused above this size (256 MiB). */
const MAX_TEXT_BYTES = 256 * 1024 * 1024;
/**
 * Reads a whole UTF-8 text file the user named, with errors that say which flag and file.
 * @throws InputError when the file is missing, a folder, unreadable or too large.
 */
async function readUserText(path, flag) {
    let size;
    try {
        const info = await (0,node_fs_promises__WEBPACK_IMPORTED_MODULE_0__.stat)(path);
        if (info.isDirectory())
            throw new _model_input_error_js__WEBPACK_IMPORTED_MODULE_1__/* .InputError */ .d(`${flag} ${path} is a folder, not a file`, { where: path, fix: `name a file with ${flag}` });
        size = info.size;
    }
    catch (error) {
        if (error instanceof _model_input_error_js__WEBPACK_IMPORTED_MODULE_1__/* .InputError */ .d)
            throw error;
        throw new _model_input_error_js__WEBPACK_IMPORTED_MODULE_1__/* .InputError */ .d(`cannot read ${flag} ${path}: ${reason(error)}`, { where: path, fix: `check the path given to ${flag}`, cause: error });
    }
    if (size > MAX_TEXT_BYTES) {
        throw new _model_input_error_js__WEBPACK_IMPORTED_MODULE_1__/* .InputError */ .d(`${flag} ${path} is ${size} bytes, over the ${MAX_TEXT_BYTES}-byte limit`, {
            where: path,
            fix: 'split the file, or trim old runs first',
        });
    }
    try {
        return await (0,node_fs_promises__WEBPACK_IMPORTED_MODULE_0__.readFile)(path, 'utf8');
    }
    catch (error) {
        throw new _model_input_error_js__WEBPACK_IMPORTED_MODULE_1__/* .InputError */ .d(`cannot read ${flag} ${path}: ${reason(error)}`, { where: path, fix: `check the path given to ${flag}`, cause: error });
    }
}
function reason(error) {
    const code = error.code;
    if (code === 'ENOENT')
        return 'no such file';
    if (code === 'EACCES' || code === 'EPERM')
        return 'permission denied';
    return error instanceof Error ? error.message : String(error);
}


/***/ }),

/***/ 2369:
/***/ ((__unused_webpack_module, __webpack_exports__, __webpack_require__) => {

// ESM COMPAT FLAG
__webpack_require__.r(__webpack_exports__);

// EXPORTS
__webpack_require__.d(__webpack_exports__, {
  runTune: () => (/* binding */ runTune)
});

// EXTERNAL MODULE: external "node:fs/promises"
var promises_ = __webpack_require__(1455);
// EXTERNAL MODULE: ./node_modules/diff/libesm/patch/create.js + 2 modules
var create = __webpack_require__(7291);
// EXTERNAL MODULE: ./node_modules/yaml/dist/index.js
var dist = __webpack_require__(8815);
// EXTERNAL MODULE: ./src/model/input-error.ts
var input_error = __webpack_require__(8250);
;// CONCATENATED MODULE: ./src/gate/tune/labels.ts


/** Largest labels file read, in entries; a real one lists tens. */
const MAX_LABELS = 100_000;
const FIX = 'write `regressions:` as a list of entries like `- run: "1234-1"` with an optional `metric: "latency/p95"`';
/**
 * Reads a labels file (YAML, or JSON, which YAML reads too) of known regressions:
 *   regressions:
 *     - run: "4180203-1"                      # the whole run was a real regression
 *     - run: "4180230-1"
 *       metric: latency/geocode-p95            # only this metric of it
 * Run ids may be written as numbers. Throws InputError with "file:line:col" for a syntax error,
 * a missing or misspelt key, a wrong type, or too many entries.
 * @example parseLabels('regressions:\n  - run: "12-1"\n', 'labels.yml')[0].run // '12-1'
 */
function parseLabels(text, source) {
    const counter = new dist/* LineCounter */.HN();
    const doc = (0,dist/* parseDocument */.Tp)(text, { lineCounter: counter, prettyErrors: false, uniqueKeys: true });
    const at = (node, fallback = 0) => {
        const offset = node?.range?.[0] ?? fallback;
        const { line, col } = counter.linePos(offset);
        return `${source}:${line}:${col}`;
    };
    const error = doc.errors[0];
    if (error !== undefined) {
        throw new input_error/* InputError */.d(`the labels file is not valid YAML or JSON: ${error.message.split('\n')[0]}`, { where: at(null, error.pos[0]), fix: FIX });
    }
    const root = doc.contents;
    if (!(0,dist/* isMap */.jh)(root))
        throw new input_error/* InputError */.d('the labels file must be a mapping with a `regressions:` list', { where: at(root), fix: FIX });
    const labels = [];
    for (const pair of root.items) {
        const key = (0,dist/* isScalar */.jn)(pair.key) ? String(pair.key.value) : '';
        if (key !== 'regressions') {
            throw new input_error/* InputError */.d(`unknown key "${key}" in the labels file`, { where: at(pair.key), fix: FIX });
        }
        const list = pair.value;
        if (!(0,dist/* isSeq */.oP)(list))
            throw new input_error/* InputError */.d('`regressions` must be a list', { where: at(list ?? pair.key), fix: FIX });
        if (list.items.length > MAX_LABELS) {
            throw new input_error/* InputError */.d(`the labels file has ${list.items.length} entries, over the limit of ${MAX_LABELS}`, { where: at(list), fix: 'label fewer runs' });
        }
        for (const item of list.items)
            labels.push(entry(item, at));
    }
    return labels;
}
function entry(item, at) {
    if (!(0,dist/* isMap */.jh)(item))
        throw new input_error/* InputError */.d('each regression must be a mapping with a `run` key', { where: at(item), fix: FIX });
    const found = {};
    for (const pair of item.items) {
        const key = (0,dist/* isScalar */.jn)(pair.key) ? String(pair.key.value) : '';
        if (key !== 'run' && key !== 'metric') {
            throw new input_error/* InputError */.d(`unknown key "${key}" in a regression entry`, { where: at(pair.key), fix: 'use `run` and, optionally, `metric`' });
        }
        const value = pair.value;
        const raw = (0,dist/* isScalar */.jn)(value) ? value.value : undefined;
        const ok = typeof raw === 'string' ? raw !== '' : key === 'run' && typeof raw === 'number' && Number.isSafeInteger(raw);
        if (!ok) {
            throw new input_error/* InputError */.d(`\`${key}\` must be a non-empty ${key === 'run' ? 'run id' : 'metric name'} string`, { where: at(value ?? pair.key), fix: FIX });
        }
        found[key] = String(raw);
    }
    if (found.run === undefined)
        throw new input_error/* InputError */.d('a regression entry lacks `run`', { where: at(item), fix: FIX });
    return { run: found.run, ...(found.metric === undefined ? {} : { metric: found.metric }), where: at(item) };
}
/**
 * Checks labels against the history: every run id must be a run of it, every metric a metric of
 * it (a typo would otherwise silently count as a missed regression).
 * Throws InputError at the entry's "file:line:col".
 * @example checkLabels(labels, history) // returns nothing, or throws
 */
function checkLabels(labels, history) {
    const runs = new Set(history.runs.map((r) => r.id));
    for (const label of labels) {
        if (!runs.has(label.run)) {
            throw new input_error/* InputError */.d(`no run "${label.run}" in the history`, { where: label.where, fix: 'use a run id as the history stores it ("run id-attempt", e.g. "1234-1")' });
        }
        if (label.metric !== undefined && !history.columns.has(label.metric)) {
            throw new input_error/* InputError */.d(`no metric "${label.metric}" in the history`, { where: label.where, fix: 'use the metric name exactly as the report shows it' });
        }
    }
}

// EXTERNAL MODULE: ./src/config/rules.ts
var config_rules = __webpack_require__(5413);
// EXTERNAL MODULE: ./src/model/median.ts
var median = __webpack_require__(71);
// EXTERNAL MODULE: ./src/model/family.ts
var model_family = __webpack_require__(7089);
// EXTERNAL MODULE: ./src/model/tails.ts + 2 modules
var tails = __webpack_require__(7963);
;// CONCATENATED MODULE: ./src/gate/tune/truth.ts
/**
 * Indexes labels (already checked with checkLabels) by run. A whole-run label covers every metric
 * of that run; it wins over metric labels of the same run.
 * @example buildTruth(labels, history).count // 2
 */
function buildTruth(labels, history) {
    const indexOf = new Map(history.runs.map((run, i) => [run.id, i]));
    const byRun = new Map();
    for (const label of labels) {
        const i = indexOf.get(label.run);
        if (i === undefined)
            continue;
        const known = byRun.get(i);
        if (label.metric === undefined || known === 'run') {
            byRun.set(i, 'run');
            continue;
        }
        byRun.set(i, (known ?? new Set()).add(label.metric));
    }
    let count = 0;
    for (const v of byRun.values())
        count += v === 'run' ? 1 : v.size;
    return { count, byRun };
}
/** Whether an alarm of `metric` in run `run` is a labelled (real) regression. */
function isLabelled(truth, run, metric) {
    const labelled = truth?.byRun.get(run);
    return labelled === 'run' || (labelled !== undefined && labelled.has(metric));
}

;// CONCATENATED MODULE: ./src/gate/tune/ladder.ts



/** The candidate cutoffs tried when none are given, loosest first. */
const DEFAULT_LADDER = [0.1, 0.05, 0.02, 0.01, 0.005, 0.001, 1e-4, 1e-5, 1e-6];
/**
 * Scores a ladder of cutoffs (every metric at the same cutoff) from one replay, for one family
 * setting. A replayed metric alarms when it lies on its worse side beyond the tolerance and
 * - family none: relative density < cutoff (the gate's plain test);
 * - bonferroni / holm / fdr: its tail, adjusted with every other metric judged in that run
 *   (adjustTails), < cutoffLevel(cutoff) (the gate's family test).
 * Adjusted tails are computed once per run, so the cost is O(points x (log metrics + cutoffs)).
 * @example scoreLadder(replay, [0.01], 'none')[0].runsFlaggedPer100 // 2.5
 */
function scoreLadder(replay, cutoffs, family, truth) {
    const stat = family === 'none' ? replay.metrics.map((m) => m.relativeDensity) : adjustedTails(replay, family);
    const runsJudged = new Set();
    for (const m of replay.metrics)
        for (const r of m.run)
            runsJudged.add(r);
    const runs = runsJudged.size;
    return cutoffs.map((cutoff) => {
        const level = (0,tails/* cutoffLevel */.yp)(cutoff);
        const threshold = family === 'none' ? cutoff : level;
        const perMetric = replay.metrics.map(() => 0);
        const falseRuns = new Set();
        const alarmedRuns = new Set();
        const caughtPairs = new Set();
        let trueAlarms = 0;
        replay.metrics.forEach((m, j) => {
            const values = stat[j];
            for (let p = 0; p < m.run.length; p++) {
                if (m.side[p] !== 1 || !(values[p] < threshold))
                    continue;
                const run = m.run[p];
                alarmedRuns.add(run);
                if (isLabelled(truth, run, m.name)) {
                    trueAlarms++;
                    caughtPairs.add(truth.byRun.get(run) === 'run' ? `${run}` : `${run}\u0000${m.name}`);
                }
                else {
                    perMetric[j]++;
                    falseRuns.add(run);
                }
            }
        });
        const falseAlarms = perMetric.reduce((a, b) => a + b, 0);
        const row = {
            cutoff,
            sigma: (0,tails/* cutoffSigma */.DE)(cutoff),
            level,
            falseAlarms,
            alarmsPerRun: runs === 0 ? 0 : falseAlarms / runs,
            runsFlagged: falseRuns.size,
            runsFlaggedPer100: runs === 0 ? 0 : (100 * falseRuns.size) / runs,
            perMetric,
        };
        if (truth !== undefined)
            row.labelled = labelScore(truth.count, caughtPairs.size, trueAlarms, falseAlarms);
        return row;
    });
}
/** Precision, recall and F1 (van Rijsbergen's F-measure with beta = 1). */
function labelScore(labels, caught, trueAlarms, falseAlarms) {
    const alarms = trueAlarms + falseAlarms;
    const precision = alarms === 0 ? 0 : trueAlarms / alarms;
    const recall = labels === 0 ? 0 : caught / labels;
    const f1 = precision + recall === 0 ? 0 : (2 * precision * recall) / (precision + recall);
    return { labels, caught, trueAlarms, falseAlarms, precision, recall, f1 };
}
/** For each metric and replayed run, its tail adjusted over all metrics judged in that run. */
function adjustedTails(replay, family) {
    const out = replay.metrics.map((m) => new Array(m.run.length).fill(1));
    const byRun = new Map();
    replay.metrics.forEach((m, j) => {
        m.run.forEach((run, p) => {
            let list = byRun.get(run);
            if (list === undefined)
                byRun.set(run, (list = []));
            list.push([j, p]);
        });
    });
    for (const members of byRun.values()) {
        const adjusted = (0,model_family/* adjustTails */.F)(members.map(([j, p]) => replay.metrics[j].tail[p]), family);
        members.forEach(([j, p], i) => (out[j][p] = adjusted[i]));
    }
    return out;
}

// EXTERNAL MODULE: ./src/gate/baseline.ts + 1 modules
var baseline = __webpack_require__(4614);
;// CONCATENATED MODULE: ./src/gate/tune/metric-sequence.ts

/**
 * Builds a metric's sequence with selectBaseline over an unbounded window and no change points,
 * so the pairing and transform are exactly the gate's; `own` is recomputed from the column with
 * the same division the gate applies to a run (value / reference), not by undoing the log, so
 * the replayed "this run" is bit-identical to what `bellgate check` would see. O(runs).
 * Throws InputError when a history value cannot take the transform (as the gate would).
 * @example metricSequence(history, 'build/time', settings).values.length // runs holding build/time
 */
function metricSequence(history, name, settings, indexOf) {
    const all = (0,baseline/* selectBaseline */.w)(history, name, { ...settings, window: Number.MAX_SAFE_INTEGER, changePoints: false });
    const column = history.columns.get(name)?.values ?? [];
    const reference = settings.relativeTo === undefined ? undefined : history.columns.get(settings.relativeTo)?.values;
    const runIndex = all.runIds.map((id) => indexOf.get(id));
    const own = runIndex.map((i) => {
        const x = column[i];
        return reference === undefined ? x : x / reference[i];
    });
    return { name, settings, values: all.values, own, runIds: all.runIds, runIndex };
}

// EXTERNAL MODULE: ./src/model/moments.ts
var moments = __webpack_require__(8884);
// EXTERNAL MODULE: ./src/model/special/normal.ts + 1 modules
var normal = __webpack_require__(2986);
;// CONCATENATED MODULE: ./src/model/normality.ts



/**
 * Sample skewness G1, the adjusted Fisher-Pearson coefficient (Joanes & Gill 1998, "Comparing
 * measures of sample skewness and kurtosis"; also NIST/SEMATECH e-Handbook 1.3.5.11):
 *   g1 = m3 / m2^(3/2),  m_k = (1/n) sum (x - mean)^k,   G1 = g1 sqrt(n (n - 1)) / (n - 2).
 * Positive for a long right tail (timings often are; `transform: log` may suit them). A constant
 * sample has no asymmetry to report: 0. O(n). Throws InputError on fewer than 3 values or
 * non-finite values.
 * @example skewness([1, 2, 3, 10]) // ≈ 1.7636
 */
function skewness(values) {
    const { n, mean, squares } = (0,moments/* meanAndSquares */.R7)(values);
    if (n < 3)
        throw new input_error/* InputError */.d(`skewness needs at least 3 values, got ${n}`);
    if (squares === 0)
        return 0;
    let cubes = 0;
    for (let i = 0; i < n; i++) {
        const d = values[i] - mean;
        cubes += d * d * d;
    }
    const g1 = cubes / n / Math.pow(squares / n, 1.5);
    return (g1 * Math.sqrt(n * (n - 1))) / (n - 2);
}
/**
 * p-value of A*^2 for the composite normal case (mean and variance estimated), the piecewise
 * formulas of D'Agostino & Stephens (1986), "Goodness-of-Fit Techniques", Table 4.9.
 * Throws InputError on a negative or NaN A*^2.
 * @example andersonDarlingPValue(0.752) // ≈ 0.05
 */
function andersonDarlingPValue(a) {
    if (!(a >= 0))
        throw new input_error/* InputError */.d(`an Anderson-Darling statistic must be 0 or more, got ${a}`);
    let p;
    if (a >= 0.6)
        p = Math.exp(1.2937 - 5.709 * a + 0.0186 * a * a);
    else if (a >= 0.34)
        p = Math.exp(0.9177 - 4.279 * a - 1.38 * a * a);
    else if (a >= 0.2)
        p = 1 - Math.exp(-8.318 + 42.796 * a - 59.938 * a * a);
    else
        p = 1 - Math.exp(-13.436 + 101.14 * a - 223.73 * a * a);
    return Math.min(1, Math.max(0, p));
}
/**
 * Anderson-Darling test of normality with estimated mean and sd (Stephens 1974; D'Agostino &
 * Stephens 1986, section 4.8): with w_i the sorted standardised values,
 *   A^2 = -n - (1/n) sum_i (2i - 1) [ln Phi(w_i) + ln(1 - Phi(w_{n+1-i}))].
 * ln(1 - Phi(w)) is taken as ln Phi(-w), so an extreme value gives a large finite A^2 instead of
 * ln 0. Critical values of A*^2 (D'Agostino & Stephens): 0.631 at 10%, 0.752 at 5%, 1.035 at 1%.
 * O(n log n). Throws InputError on fewer than 8 values (the p-value formulas are not meant for
 * less), non-finite values, or a constant sample (no spread to standardise by).
 * @example andersonDarling(values).pValue < 0.05 // the values do not look Gaussian
 */
function andersonDarling(values) {
    const { n, mean, squares } = (0,moments/* meanAndSquares */.R7)(values);
    if (n < 8)
        throw new input_error/* InputError */.d(`the normality test needs at least 8 values, got ${n}`);
    if (squares === 0) {
        throw new input_error/* InputError */.d('the normality test needs values that vary; all values are equal', {
            fix: 'skip the test for a constant metric',
        });
    }
    const sd = Math.sqrt(squares / (n - 1));
    const w = Float64Array.from(values, (x) => (x - mean) / sd).sort();
    let sum = 0;
    for (let i = 0; i < n; i++) {
        sum += (2 * i + 1) * ((0,normal/* normalLogCdf */.Hi)(w[i]) + (0,normal/* normalLogCdf */.Hi)(-w[n - 1 - i]));
    }
    const statistic = -n - sum / n;
    const adjusted = statistic * (1 + 0.75 / n + 2.25 / (n * n));
    return { statistic, adjusted, pValue: andersonDarlingPValue(adjusted) };
}

;// CONCATENATED MODULE: ./src/gate/tune/normality-check.ts

/** Critical value of A*^2 at the 5% level, normal with estimated mean and variance (D'Agostino & Stephens 1986; see andersonDarling). */
const AD_CRITICAL_5 = 0.752;
/**
 * Skewness and Anderson-Darling on the raw values and on their logarithms. `transform: log` is
 * suggested when the raw values fail the 5% test (A*^2 > 0.752), every value is > 0, and the log
 * scale fits clearly better: its A*^2 at most half the raw one (our rule of thumb) and below the
 * critical value. Returns undefined for fewer than 8 values or a constant metric (nothing to test).
 * O(n log n).
 * @example normalityCheck(timings)?.suggestLog // true for log-normal timings
 */
function normalityCheck(values) {
    if (values.length < 8 || values.every((v) => v === values[0]))
        return undefined;
    const raw = shape(values);
    const positive = values.every((v) => v > 0);
    const logValues = positive ? values.map(Math.log) : undefined;
    const log = logValues !== undefined && !logValues.every((v) => v === logValues[0]) ? shape(logValues) : undefined;
    const rejectsRaw = raw.andersonDarling > AD_CRITICAL_5;
    const suggestLog = log !== undefined && rejectsRaw && log.andersonDarling <= raw.andersonDarling / 2 && log.andersonDarling <= AD_CRITICAL_5;
    let note;
    if (!positive)
        note = 'values <= 0: no log scale';
    else if (!rejectsRaw)
        note = 'raw scale looks Gaussian (A*² ≤ 0.752)';
    else if (suggestLog)
        note = `log scale fits clearly better (A*² ${fmt(log.andersonDarling)} vs ${fmt(raw.andersonDarling)})`;
    else
        note = 'not Gaussian on either scale (a level change or outliers?)';
    return { n: values.length, raw, ...(log === undefined ? {} : { log }), suggestLog, note };
}
function shape(values) {
    const ad = andersonDarling(values);
    return { skewness: skewness(values), andersonDarling: ad.adjusted, pValue: ad.pValue };
}
function fmt(x) {
    return x.toPrecision(3);
}

// EXTERNAL MODULE: ./src/model/density.ts
var density = __webpack_require__(913);
// EXTERNAL MODULE: ./src/model/fit.ts
var fit = __webpack_require__(5046);
;// CONCATENATED MODULE: ./src/model/running-moments.ts

/**
 * Mean and sum of squared deviations of a changing set of values, updated in O(1) per value by
 * Welford's method (Welford 1962; Knuth, TAOCP vol. 2, 4.2.2): with d = x - mean,
 *   add:    n += 1, mean += d / n,       squares += d * (x - new mean)
 *   remove: n -= 1, mean -= d / n,       squares -= d * (x - new mean)
 * The updates work on deviations from the running mean, never on raw sums of squares, so values
 * with a large offset (1e7 + noise) keep their precision, unlike sum(x^2) - n mean^2.
 * A sliding window (add the newest, remove the oldest) makes replaying a long history O(n).
 * Numerical care: rounding accumulates slowly over add/remove pairs (about one ulp of the offset
 * per step); squares is clamped at 0 so cancellation never makes a variance negative, and a
 * caller replaying many thousands of steps can rebuild with `RunningMoments.of(window)`.
 * Throws InputError on a non-finite value or removing from an empty set.
 *
 * @example const m = RunningMoments.of([1, 2, 3]); m.remove(1); m.add(4); m.mean // 3
 */
class RunningMoments {
    #n = 0;
    #mean = 0;
    #squares = 0;
    /** A RunningMoments holding the given values. */
    static of(values) {
        const moments = new RunningMoments();
        for (const x of values)
            moments.add(x);
        return moments;
    }
    get n() {
        return this.#n;
    }
    /** Mean of the values held (0 when empty). */
    get mean() {
        return this.#mean;
    }
    /** Sum of squared deviations from the mean. */
    get squares() {
        return this.#squares;
    }
    add(x) {
        if (!Number.isFinite(x))
            throw new input_error/* InputError */.d(`value ${x} is not a finite number`);
        this.#n += 1;
        const d = x - this.#mean;
        this.#mean += d / this.#n;
        this.#squares += d * (x - this.#mean);
    }
    /** Removes a value that was added before (the caller keeps the window). */
    remove(x) {
        if (!Number.isFinite(x))
            throw new input_error/* InputError */.d(`value ${x} is not a finite number`);
        if (this.#n === 0)
            throw new input_error/* InputError */.d('cannot remove a value from an empty set');
        if (this.#n === 1) {
            this.#n = 0;
            this.#mean = 0;
            this.#squares = 0;
            return;
        }
        this.#n -= 1;
        const d = x - this.#mean;
        this.#mean -= d / this.#n;
        this.#squares = Math.max(0, this.#squares - d * (x - this.#mean));
    }
    /**
     * squares / n ("mle") or squares / (n - 1) ("unbiased").
     * Throws InputError when empty, or with fewer than 2 values for "unbiased".
     */
    variance(divisor) {
        if (divisor === 'unbiased') {
            if (this.#n < 2)
                throw new input_error/* InputError */.d('the unbiased variance needs at least 2 values');
            return this.#squares / (this.#n - 1);
        }
        if (this.#n === 0)
            throw new input_error/* InputError */.d('the variance of an empty set is undefined');
        return this.#squares / this.#n;
    }
}

// EXTERNAL MODULE: ./src/model/transform.ts
var transform = __webpack_require__(8077);
// EXTERNAL MODULE: ./src/gate/resolution-floor.ts
var resolution_floor = __webpack_require__(1198);
// EXTERNAL MODULE: ./src/gate/sides.ts
var sides = __webpack_require__(3979);
// EXTERNAL MODULE: ./src/gate/tolerance.ts
var tolerance = __webpack_require__(592);
;// CONCATENATED MODULE: ./src/gate/tune/replay-point.ts
/** An empty replay for a metric. */
function emptyReplay(name, method) {
    return { name, method, run: [], relativeDensity: [], tail: [], side: [] };
}

;// CONCATENATED MODULE: ./src/gate/tune/incremental-replay.ts









/**
 * Whether a metric's settings let the replay slide one RunningMoments window instead of refitting:
 * `fit: mle` or `unbiased` (the median of robust has no O(1) update) and no change points (the
 * baseline's start would jump). `relative-to` is fine: the sequence already holds the ratios.
 * @example canSlide({ ...settings, fit: 'robust' }) // false
 */
function canSlide(settings) {
    return settings.fit !== 'robust' && !settings.changePoints;
}
/**
 * Replays a metric with a sliding window: Welford updates (RunningMoments) add the newest run and
 * drop the one leaving the window, O(1) per run, so O(runs) per metric. The fit and the figures
 * follow judgeMetric step by step (sd floored at the resolution on the fit scale; predictive
 * Student-t with n - 1 dof and scale s sqrt(1 + 1/n), else plug-in). Two guards keep it equal to
 * the refit: the moments are rebuilt from the window every `window` steps (rounding drift stays
 * bounded), and a window with (almost) no spread is refitted exactly with fitGaussian, since a
 * constant history must give sd 0, not 1e-17.
 * @example incrementalReplay(sequence).run.length // judged runs
 */
function incrementalReplay(sequence) {
    const { name, settings, values, own, runIndex } = sequence;
    const replay = emptyReplay(name, 'incremental');
    // Moments of (value - shift), the shift a recent value: Welford's rounding then scales with the
    // spread, not with the offset (1e6 + noise keeps its digits).
    let shift = values[0] ?? 0;
    let moments = new RunningMoments();
    let start = 0;
    let sinceRebuild = 0;
    for (let k = 0; k < values.length; k++) {
        if (k > 0) {
            moments.add(values[k - 1] - shift);
            if (k - start > settings.window)
                moments.remove(values[start++] - shift);
            if (++sinceRebuild >= settings.window) {
                shift = values[start];
                moments = RunningMoments.of(values.slice(start, k).map((v) => v - shift));
                sinceRebuild = 0;
            }
        }
        const n = k - start;
        if (n === 0 || n < settings.minRuns)
            continue;
        const fit = slidingFit(moments, shift, values, start, k, settings);
        const x = (0,transform/* toFitScale */.P)(own[k], settings.transform, name);
        const figures = decisionFigures(x, fit, settings);
        const direction = (0,sides/* directionOf */.F)(x - fit.mean, settings.worse);
        const beyond = (0,tolerance/* beyondTolerance */.f5)(own[k], (0,transform/* fromFitScale */.G)(fit.mean, settings.transform), settings.tolerance);
        replay.run.push(runIndex[k]);
        replay.relativeDensity.push(figures.relativeDensity);
        replay.tail.push(figures.tail);
        replay.side.push(sideOf(direction, beyond));
    }
    return replay;
}
function sideOf(direction, beyond) {
    if (!beyond)
        return 0;
    return direction === 'worse' ? 1 : direction === 'better' ? -1 : 0;
}
/** fitGaussian's mle/unbiased result from running moments, floored like judgeMetric's fitWithFloor. */
function slidingFit(moments, shift, values, start, end, settings) {
    const { n, squares } = moments;
    const mean = shift + moments.mean;
    // A spread within rounding of the offset is a constant window (or nearly): refit exactly, since
    // a constant history must give sd 0, not 1e-17.
    if (squares <= 1e-20 * n * mean * mean)
        return floored(values.slice(start, end), settings);
    const sampleVariance = n > 1 ? squares / (n - 1) : 0;
    const spread = Math.sqrt(settings.fit === 'mle' ? squares / n : sampleVariance);
    const floor = (0,resolution_floor/* fitScaleFloor */.c)(settings.resolution, settings.transform, mean);
    return { n, mean, sd: Math.max(spread, floor), sampleSd: Math.max(Math.sqrt(sampleVariance), floor), method: settings.fit };
}
function floored(window, settings) {
    const raw = (0,fit/* fitGaussian */.Dk)(window, settings.fit, 0);
    const floor = (0,resolution_floor/* fitScaleFloor */.c)(settings.resolution, settings.transform, raw.mean);
    return floor > 0 ? (0,fit/* fitGaussian */.Dk)(window, settings.fit, floor) : raw;
}
/** Relative density and two-sided tail, as judgeMetric computes them for a fit (zero spread: 0 or 1). */
function decisionFigures(x, fit, settings) {
    const deviation = x - fit.mean;
    const predictive = settings.uncertainty === 'predictive' && fit.n >= 2;
    if (fit.sd === 0 || (predictive && fit.sampleSd === 0)) {
        const moved = deviation !== 0;
        return { relativeDensity: moved ? 0 : 1, tail: moved ? 0 : 1 };
    }
    if (!predictive) {
        return { relativeDensity: (0,density/* plugInRelativeDensity */.YS)(x, fit.mean, fit.sd), tail: (0,tails/* normalTail */.WI)(deviation / fit.sd, 'both') };
    }
    return {
        relativeDensity: (0,density/* predictiveRelativeDensity */.kr)(x, fit.mean, fit.sampleSd, fit.n),
        tail: (0,tails/* studentTail */.gq)(deviation / (0,density/* predictiveScale */.Wn)(fit.sampleSd, fit.n), fit.n - 1, 'both'),
    };
}

// EXTERNAL MODULE: ./src/gate/judge-metric.ts
var judge_metric = __webpack_require__(1177);
;// CONCATENATED MODULE: ./src/gate/tune/refit-replay.ts



/**
 * Replays a metric by calling the gate's own judge for every run: the window of values before
 * the run, change-point shortening by selectBaseline itself (on a history holding just that
 * window), then scoreMetric. Exactly the gate's decision, for any setting (robust fit, change
 * points, relative-to). Cost: O(runs x window) for the fits, plus one change-point search per run
 * when `change-points` is on (PELT over the window, up to O(window^2) each), so
 * O(runs x window^2) in the worst case — seconds for 500 runs x 60-run windows x 100 metrics.
 * @example refitReplay(sequence).relativeDensity[0] // the first judged run's relative density
 */
function refitReplay(sequence) {
    const { name, settings, values, own, runIds, runIndex } = sequence;
    const replay = emptyReplay(name, 'refit');
    for (let k = 0; k < values.length; k++) {
        const start = Math.max(0, k - settings.window);
        if (k - start < settings.minRuns || k === 0)
            continue;
        let baseline = values.slice(start, k);
        if (settings.changePoints)
            baseline = shortened(name, baseline, runIds.slice(start, k), sequence);
        const score = (0,judge_metric/* scoreMetric */.zN)(name, settings, baseline, own[k]);
        if (!score.scored)
            continue;
        replay.run.push(runIndex[k]);
        replay.relativeDensity.push(score.result.relativeDensity ?? 1);
        replay.tail.push(score.result.tail ?? 1);
        replay.side.push(!score.beyondTolerance ? 0 : score.direction === 'worse' ? 1 : score.direction === 'better' ? -1 : 0);
    }
    return replay;
}
/** The window after selectBaseline's change-point step, run on a history of just that window (already on the fit scale). */
function shortened(name, window, ids, sequence) {
    const history = {
        series: 'replay',
        runs: ids.map((id) => ({ id })),
        columns: new Map([[name, { values: window }]]),
    };
    const { relativeTo: _dropped, ...rest } = sequence.settings;
    return (0,baseline/* selectBaseline */.w)(history, name, { ...rest, transform: 'none', window: window.length }).values;
}

;// CONCATENATED MODULE: ./src/gate/tune/replay.ts




/**
 * Replays the gate over a history: every baseline run is judged against the runs before it with
 * the config's settings for each metric (window, min-runs, transform, fit, uncertainty,
 * tolerance, relative-to, change points), by the gate's own per-metric judge (refitReplay) or its
 * O(1)-per-run sliding equivalent where the settings allow (incrementalReplay, see canSlide).
 * Metrics a rule ignores are left out. Groups are not replayed jointly: a grouped metric is
 * replayed as the gate judges it alone (what it falls back to while its group is learning).
 * Pure. Throws InputError when a history value cannot take a metric's transform.
 * @example replayHistory(config, history).metrics[0].relativeDensity // one per judged run
 */
function replayHistory(config, history, options = {}) {
    const indexOf = new Map(history.runs.map((run, i) => [run.id, i]));
    const names = [...history.columns.keys()]
        .filter((name) => history.columns.get(name).values.some((v) => Number.isFinite(v)))
        .sort((a, b) => (a < b ? -1 : a > b ? 1 : 0));
    const metrics = [];
    names.forEach((name, i) => {
        const settings = (0,config_rules/* settingsFor */.z)(config, name);
        if (!settings.ignore) {
            const sequence = metricSequence(history, name, settings, indexOf);
            metrics.push(!options.refit && canSlide(settings) ? incrementalReplay(sequence) : refitReplay(sequence));
        }
        options.onProgress?.(i + 1, names.length);
    });
    return { runCount: history.runs.length, metrics };
}

;// CONCATENATED MODULE: ./src/gate/tune/suggest.ts
/** The false alarms per 100 runs aimed at when no --target is given (DESIGN.md "What good looks like"). */
const DEFAULT_TARGET = 1;
/** Runs with at least this many judged metrics count as "many metrics" for the family advice (rule of thumb). */
const MANY_METRICS = 10;
/**
 * The loosest cutoff (largest relative density, most alarms) whose runs with a false alarm stay at
 * or under `per100` per 100 replayed runs. Rows are loosest first. Undefined when none qualifies.
 * @example loosestUnder(rows, 1)?.cutoff // 0.001
 */
function loosestUnder(rows, per100) {
    return [...rows].sort((a, b) => b.cutoff - a.cutoff).find((row) => row.runsFlaggedPer100 <= per100);
}
/**
 * The cutoff with the highest F1 against the labels; a tie goes to the stricter cutoff (fewer
 * alarms for the same score). Undefined without labels.
 * @example bestF1(rows)?.cutoff // 0.005
 */
function bestF1(rows) {
    let best;
    for (const row of rows) {
        if (row.labelled === undefined)
            continue;
        const f1 = row.labelled.f1;
        if (best === undefined || f1 > best.labelled.f1 || (f1 === best.labelled.f1 && row.cutoff < best.cutoff))
            best = row;
    }
    return best;
}
/**
 * The defaults cutoff: the F1-optimal one when labels are given, else the loosest meeting the
 * false-alarm target, else (nothing meets it) the strictest of the ladder.
 * @example chooseCutoff(rows, 1, false).cutoff // 0.001
 */
function chooseCutoff(rows, target, labelled) {
    const best = labelled ? bestF1(rows) : undefined;
    if (best?.labelled !== undefined && best.labelled.f1 > 0) {
        const l = best.labelled;
        return { cutoff: best.cutoff, reason: `best F1 ${l.f1.toFixed(3)} against the labels (precision ${l.precision.toFixed(3)}, recall ${l.recall.toFixed(3)})` };
    }
    const under = loosestUnder(rows, target);
    if (under !== undefined) {
        return { cutoff: under.cutoff, reason: `loosest cutoff with at most ${target} run${target === 1 ? '' : 's'} per 100 falsely flagged (${under.runsFlaggedPer100.toFixed(1)} replayed)` };
    }
    const strictest = [...rows].sort((a, b) => a.cutoff - b.cutoff)[0];
    return { cutoff: strictest.cutoff, reason: `no cutoff keeps false alarms at ${target} per 100 runs; the strictest tried flags ${strictest.runsFlaggedPer100.toFixed(1)} (consider groups, relative-to or change points)` };
}
/**
 * Per-metric cutoffs for metrics that are much noisier than the rest at the chosen cutoff: at least
 * 2 false alarms and more than twice the mean per metric (rule of thumb). Such a metric gets the
 * loosest stricter cutoff at which its own false alarms drop to the mean, or the strictest tried.
 * @example noisyMetricRules(rows, names, 0.01) // [{ metric: 'latency/p99', cutoff: 1e-4, reason: ... }]
 */
function noisyMetricRules(rows, names, chosen) {
    const sorted = [...rows].sort((a, b) => b.cutoff - a.cutoff);
    const at = sorted.find((row) => row.cutoff === chosen);
    if (at === undefined || names.length === 0)
        return [];
    const mean = at.falseAlarms / names.length;
    const rules = [];
    names.forEach((metric, j) => {
        const own = at.perMetric[j];
        if (own < 2 || own <= 2 * mean)
            return;
        const stricter = sorted.filter((row) => row.cutoff < chosen);
        const fit = stricter.find((row) => row.perMetric[j] <= mean) ?? stricter.at(-1);
        if (fit === undefined)
            return;
        rules.push({ metric, cutoff: fit.cutoff, reason: `${own} false alarms at ${chosen} (mean ${mean.toFixed(1)} a metric); ${fit.perMetric[j]} at ${fit.cutoff}` });
    });
    return rules;
}
/**
 * Which family setting to use. With fewer than MANY_METRICS judged metrics a typical run, the
 * current setting stays. With many: the family with the best F1 when labelled (ties: holm, then
 * fdr, bonferroni, none); without labels the current setting when it is not none, else holm, which bounds the chance of any false alarm in a
 * run and is never less powerful than bonferroni (Holm 1979).
 * @example recommendFamily(48, ladders, 0.01, 'none', 1).family // 'holm'
 */
function recommendFamily(metricsPerRun, ladders, cutoff, current, target) {
    const share = (family) => {
        const row = ladders.get(family)?.find((r) => r.cutoff === cutoff);
        return row === undefined ? '?' : row.runsFlaggedPer100.toFixed(1);
    };
    if (metricsPerRun < MANY_METRICS) {
        return { family: current, reason: `${metricsPerRun} metrics a typical run: few enough that per-metric cutoffs suffice` };
    }
    const preference = ['holm', 'fdr', 'bonferroni', 'none'];
    const f1 = (f) => bestF1(ladders.get(f) ?? [])?.labelled?.f1 ?? -1;
    let family = current === 'none' ? 'holm' : current;
    if (preference.some((f) => f1(f) >= 0))
        family = preference.reduce((a, b) => (f1(b) > f1(a) ? b : a));
    const loosest = (f) => {
        const row = loosestUnder(ladders.get(f) ?? [], target);
        return row === undefined ? 'none of the ladder' : String(row.cutoff);
    };
    const reason = `${metricsPerRun} metrics a typical run: at cutoff ${cutoff}, family none flags ${share('none')} runs per 100 falsely, ` +
        `${family} ${share(family)}; loosest cutoff meeting ${target} per 100: none ${loosest('none')}, ${family} ${loosest(family)}` +
        (f1(family) >= 0 ? ` (best F1 ${f1(family).toFixed(3)})` : '; holm bounds the chance of any false alarm in a run and is never less powerful than bonferroni (Holm 1979)');
    return { family, reason };
}

;// CONCATENATED MODULE: ./src/gate/tune/tune.ts










const FAMILIES = ['none', 'bonferroni', 'holm', 'fdr'];
/**
 * Tunes cutoffs from evidence (issue 5.1): replays the gate over the history (replayHistory),
 * scores the cutoff ladder for every family setting (scoreLadder), checks each metric's shape on
 * the raw and log scales (normalityCheck), and suggests a defaults cutoff (best F1 with labels,
 * else the loosest meeting the target), per-metric cutoffs for much noisier metrics, `transform:
 * log` where it fits clearly better, and a family setting. Pure.
 * Throws InputError for a label naming an unknown run or metric, or a bad target or cutoff.
 * @example tuneHistory({ config, history }).suggestion.cutoff // 0.001
 */
function tuneHistory(input) {
    const { config, history } = input;
    const target = input.target ?? DEFAULT_TARGET;
    if (!(target >= 0 && target <= 100))
        throw new input_error/* InputError */.d(`--target must be a number of false alarms per 100 runs from 0 to 100, got ${target}`, { fix: 'e.g. --target 1' });
    const cutoffs = [...new Set([...(input.cutoffs ?? DEFAULT_LADDER), config.defaults.cutoff])].sort((a, b) => b - a);
    if (input.labels !== undefined)
        checkLabels(input.labels, history);
    const truth = input.labels === undefined ? undefined : buildTruth(input.labels, history);
    const replay = replayHistory(config, history, { ...(input.refit ? { refit: true } : {}), ...(input.onProgress ? { onProgress: input.onProgress } : {}) });
    const ladders = new Map(FAMILIES.map((f) => [f, scoreLadder(replay, cutoffs, f, truth)]));
    const perRun = new Map();
    for (const m of replay.metrics)
        for (const r of m.run)
            perRun.set(r, (perRun.get(r) ?? 0) + 1);
    const metricsPerRun = perRun.size === 0 ? 0 : (0,median/* median */.JZ)([...perRun.values()]);
    const rows = ladders.get(config.family);
    // No judged run is no evidence: keep the configured cutoff rather than "0 false alarms at 0.1".
    const choice = perRun.size === 0
        ? { cutoff: config.defaults.cutoff, reason: 'no run had enough baseline runs to be judged (min-runs), so there is no evidence yet; keeping the configured cutoff' }
        : chooseCutoff(rows, target, truth !== undefined);
    const names = replay.metrics.map((m) => m.name);
    const rules = perRun.size === 0 ? [] : noisyMetricRules(rows, names, choice.cutoff);
    const indexOf = new Map(history.runs.map((run, i) => [run.id, i]));
    const metrics = replay.metrics.map((m) => {
        const settings = (0,config_rules/* settingsFor */.z)(config, m.name);
        const own = metricSequence(history, m.name, settings, indexOf).own.slice(-settings.window);
        const normality = normalityCheck(own);
        if (normality?.suggestLog && settings.transform === 'none') {
            const rule = rules.find((r) => r.metric === m.name);
            if (rule !== undefined)
                Object.assign(rule, { transform: 'log', reason: `${rule.reason}; ${normality.note}` });
            else
                rules.push({ metric: m.name, transform: 'log', reason: normality.note });
        }
        return { name: m.name, method: m.method, judged: m.run.length, transform: settings.transform, ...(normality ? { normality } : {}) };
    });
    const family = recommendFamily(metricsPerRun, ladders, choice.cutoff, config.family, target);
    const best = bestF1(rows);
    const targetRow = loosestUnder(rows, target);
    return {
        series: history.series,
        runs: history.runs.length,
        replayedRuns: perRun.size,
        metricsPerRun,
        family: config.family,
        currentCutoff: config.defaults.cutoff,
        metrics,
        groups: config.groups.map((g) => g.name),
        ladders,
        target: { per100: target, ...(targetRow ? { cutoff: targetRow.cutoff } : {}) },
        ...(truth === undefined
            ? {}
            : { labels: { count: truth.count, ...(best?.labelled ? { best: { cutoff: best.cutoff, precision: best.labelled.precision, recall: best.labelled.recall, f1: best.labelled.f1 } } : {}) } }),
        suggestion: { ...choice, family: family.family, familyReason: family.reason, rules: rules.sort((a, b) => (a.metric < b.metric ? -1 : 1)) },
    };
}

// EXTERNAL MODULE: ./src/config/glob-matcher.ts
var glob_matcher = __webpack_require__(517);
// EXTERNAL MODULE: ./src/config/config-text.ts + 10 modules
var config_text = __webpack_require__(6964);
// EXTERNAL MODULE: ./src/config/defaults.ts
var defaults = __webpack_require__(1954);
;// CONCATENATED MODULE: ./src/config/load.ts




/**
 * Reads the text of a Bellgate config (YAML, `.github/bellgate.yml`) into a Config.
 * Steps: YAML under hard limits (1 MiB, 32 levels, 16 KiB scalars, 100 aliases, 10,000 values),
 * the JSON Schema (bellgate.schema.json), then the rules the schema cannot express.
 * An empty file, or one of only comments, gives the defaults.
 * Synchronous, so it loads picomatch with it; readConfigFile (parse-lazily.ts) loads it only for
 * configs that need it.
 * Throws InputError for any problem: where = "source:line:col" of the first one, fix = what to
 * write instead; every problem found is listed in the message, in reading order.
 * @example parseConfig('defaults:\n  tolerance: 2%\n', 'bellgate.yml').defaults.tolerance // { kind: 'percent', amount: 0.02 }
 * @example parseConfig('defaults:\n  cuttoff: 0.05\n', 'bellgate.yml') // throws InputError at bellgate.yml:2:3, fix 'did you mean "cutoff"?'
 */
function parseConfig(text, source) {
    const tree = (0,config_text/* checkedConfigTree */.wR)(text, source);
    if (tree === undefined)
        return { ...(0,defaults/* defaultConfig */.sb)(), source };
    return (0,config_text/* configFromTree */.H2)(tree, source, glob_matcher.picomatchCompiler);
}

;// CONCATENATED MODULE: ./src/gate/tune/escape-glob.ts

/**
 * A glob that matches exactly this metric name: picomatch's special characters are escaped with
 * a backslash, so "cache[hit]" or "!legacy" are read literally. Returns undefined when the escaped
 * glob still does not match the name alone (then no rule is written for it).
 * @example literalGlob('latency/p95{eu}') // 'latency/p95\\{eu\\}'
 */
function literalGlob(name) {
    const glob = name.replace(/[\\*?[\]{}()!+@|^$]/g, '\\$&');
    return (0,glob_matcher.compileGlobs)([glob])(name) ? glob : undefined;
}

;// CONCATENATED MODULE: ./src/gate/tune/write-config.ts






/**
 * Writes suggested settings into a config's text, keeping the user's comments, key order and
 * formatting byte for byte wherever it can: the YAML is parsed with yaml's Document API only to
 * find node positions, and the edits are spliced into the original text —
 * - `defaults.cutoff`: its value replaced in place (a comment beside it stays), or a line inserted
 *   at the top of a block `defaults:`, or a new `defaults:` section at the end;
 * - a per-metric rule: the metric's own literal rule edited in place when it already sets that key
 *   and no later rule also matches the metric, else a new rule (with a comment saying why)
 *   appended to the end of `metrics:` (a later rule wins).
 * Flow-style sections (`defaults: {cutoff: 0.01}`) are edited through the Document instead
 * (comments and order kept, spacing normalised).
 * Refuses (InputError with file:line:col) a text that is not a valid config, and checks that the
 * result reads back to the suggested settings. An empty text gives a new config.
 * @example applyConfigEdit('defaults:\n  cutoff: 0.01 # strict\n', 'b.yml', { cutoff: 0.001, rules: [] }) // 'defaults:\n  cutoff: 0.001 # strict\n'
 */
function applyConfigEdit(text, source, edit) {
    parseConfig(text, source);
    const rules = edit.rules.filter((r) => literalGlob(r.metric) !== undefined);
    const out = spliceEdit(text, edit.cutoff, rules) ?? documentEdit(text, edit.cutoff, rules);
    const config = parseConfig(out, source);
    if (!readsBack(config, edit.cutoff, rules)) {
        throw new input_error/* InputError */.d('could not write the suggestion so that it reads back as suggested; the config was not changed', {
            where: source,
            fix: 'edit the config by hand with the suggestion printed above',
        });
    }
    return out;
}
function readsBack(config, cutoff, rules) {
    if (config.defaults.cutoff !== cutoff)
        return false;
    return rules.every((rule) => {
        const s = (0,config_rules/* settingsFor */.z)(config, rule.metric);
        return (rule.cutoff === undefined || s.cutoff === rule.cutoff) && (rule.transform === undefined || s.transform === rule.transform);
    });
}
/** The splice strategy; undefined when the layout needs the Document fallback. */
function spliceEdit(text, cutoff, rules) {
    const doc = (0,dist/* parseDocument */.Tp)(text);
    const root = doc.contents;
    if (root !== null && !((0,dist/* isMap */.jh)(root) && !root.flow))
        return undefined;
    const splices = [];
    const tail = [];
    const defaults = root?.get('defaults', true);
    if (defaults === undefined)
        tail.push(`defaults:\n  cutoff: ${cutoff}\n`);
    else if (!(0,dist/* isMap */.jh)(defaults) || defaults.flow || defaults.items.length === 0)
        return undefined;
    else {
        const value = defaults.get('cutoff', true);
        if ((0,dist/* isScalar */.jn)(value) && value.range)
            splices.push({ start: value.range[0], end: value.range[1], text: String(cutoff) });
        else if (value !== undefined)
            return undefined;
        else {
            const first = defaults.items[0].key;
            const lineStart = text.lastIndexOf('\n', first.range[0] - 1) + 1;
            splices.push({ start: lineStart, end: lineStart, text: `${' '.repeat(first.range[0] - lineStart)}cutoff: ${cutoff}\n` });
        }
    }
    const metrics = root?.get('metrics', true);
    const appended = [];
    for (const rule of rules) {
        const edited = metrics !== undefined && (0,dist/* isSeq */.oP)(metrics) ? editInPlace(metrics, rule) : undefined;
        if (edited === undefined)
            appended.push(rule);
        else
            splices.push(...edited);
    }
    if (appended.length > 0) {
        if (metrics === undefined)
            tail.push(`metrics:\n${appended.map((r) => ruleText(r, '  ')).join('')}`);
        else if (!(0,dist/* isSeq */.oP)(metrics) || metrics.flow || metrics.items.length === 0)
            return undefined;
        else {
            const firstItem = metrics.items[0];
            const dashLine = text.lastIndexOf('\n', firstItem.range[0] - 1) + 1;
            const indent = /^ */.exec(text.slice(dashLine))[0];
            const end = metrics.range[1];
            const at = end > 0 && text[end - 1] === '\n' ? end : lineEnd(text, end);
            splices.push({ start: at, end: at, text: (at === text.length && !text.endsWith('\n') ? '\n' : '') + appended.map((r) => ruleText(r, indent)).join('') });
        }
    }
    let out = text;
    for (const s of splices.sort((a, b) => b.start - a.start))
        out = out.slice(0, s.start) + s.text + out.slice(s.end);
    if (tail.length > 0)
        out += (out === '' || out.endsWith('\n') ? '' : '\n') + tail.join('');
    return out;
}
/** Offset just past the end of the line holding `offset` (or the text's end). */
function lineEnd(text, offset) {
    const nl = text.indexOf('\n', offset);
    return nl < 0 ? text.length : nl + 1;
}
/** Value splices for a rule already written for this metric alone, when it is the last to match it and sets every key. */
function editInPlace(metrics, rule) {
    const own = ownRuleIndex(metrics, rule);
    if (own < 0)
        return undefined;
    const map = metrics.items[own];
    const splices = [];
    for (const [key, value] of [['cutoff', rule.cutoff], ['transform', rule.transform]]) {
        if (value === undefined)
            continue;
        const node = map.get(key, true);
        if (!(0,dist/* isScalar */.jn)(node) || !node.range)
            return undefined;
        splices.push({ start: node.range[0], end: node.range[1], text: String(value) });
    }
    return splices;
}
/** Index of the metric's own literal rule when no later rule matches it, else -1. */
function ownRuleIndex(metrics, rule) {
    const glob = literalGlob(rule.metric);
    const globsOf = (item) => {
        if (!(0,dist/* isMap */.jh)(item))
            return [];
        const m = item.toJSON().match;
        return typeof m === 'string' ? [m] : Array.isArray(m) ? m.filter((x) => typeof x === 'string') : [];
    };
    let own = -1;
    metrics.items.forEach((item, i) => {
        const globs = globsOf(item);
        if (globs.length === 1 && globs[0] === glob && item.get('ignore') !== true)
            own = i;
    });
    if (own < 0)
        return -1;
    const later = metrics.items.slice(own + 1).some((item) => {
        const globs = globsOf(item);
        return globs.length > 0 && (0,glob_matcher.compileGlobs)(globs)(rule.metric);
    });
    return later ? -1 : own;
}
/** A new rule as block YAML at the given dash indent, with a comment saying why. */
function ruleText(rule, indent) {
    const lines = [`${indent}# suggested by bellgate tune: ${oneLine(rule.reason)}`, `${indent}- match: ${JSON.stringify(literalGlob(rule.metric))}`];
    if (rule.cutoff !== undefined)
        lines.push(`${indent}  cutoff: ${rule.cutoff}`);
    if (rule.transform !== undefined)
        lines.push(`${indent}  transform: ${rule.transform}`);
    return `${lines.join('\n')}\n`;
}
function oneLine(s) {
    // eslint-disable-next-line no-control-regex
    return s.replace(/[\u0000-\u001f\u007f\u2028\u2029]+/g, ' ');
}
/** The Document fallback for flow-style or empty sections: nodes edited, comments and order kept. */
function documentEdit(text, cutoff, rules) {
    const doc = (0,dist/* parseDocument */.Tp)(text);
    if (doc.contents === null || ((0,dist/* isScalar */.jn)(doc.contents) && doc.contents.value === null))
        doc.contents = doc.createNode({});
    setScalar(doc, ['defaults', 'cutoff'], cutoff);
    for (const rule of rules) {
        let seq = doc.get('metrics', true);
        if (!(0,dist/* isSeq */.oP)(seq)) {
            seq = doc.createNode([]);
            doc.set('metrics', seq);
        }
        const metrics = seq;
        const own = ownRuleIndex(metrics, rule);
        if (own >= 0) {
            const map = metrics.items[own];
            if (rule.cutoff !== undefined)
                setScalar(map, ['cutoff'], rule.cutoff);
            if (rule.transform !== undefined)
                setScalar(map, ['transform'], rule.transform);
            continue;
        }
        const node = doc.createNode({
            match: literalGlob(rule.metric),
            ...(rule.cutoff === undefined ? {} : { cutoff: rule.cutoff }),
            ...(rule.transform === undefined ? {} : { transform: rule.transform }),
        });
        node.commentBefore = ` suggested by bellgate tune: ${oneLine(rule.reason)}`;
        metrics.items.push(node);
    }
    return doc.toString({ flowCollectionPadding: false });
}
/** Sets a scalar, editing an existing scalar node in place so its comments stay. */
function setScalar(target, path, value) {
    const node = target.getIn(path, true);
    if ((0,dist/* isScalar */.jn)(node))
        node.value = value;
    else
        target.setIn(path, value);
}

// EXTERNAL MODULE: ./src/history/document.ts + 3 modules
var history_document = __webpack_require__(3557);
;// CONCATENATED MODULE: ./src/report/tune-json.ts
/** Schema tag of the tune JSON; bumped only on a breaking change of its fields. */
const TUNE_SCHEMA = 'bellgate.tune/1';
/**
 * `bellgate tune --format json`: the whole result for scripts, with stable field names. Ladders
 * become an object keyed by family setting (a fixed set of names, never metric names); per-metric
 * counts are arrays aligned with `metrics`. Non-finite numbers never occur (rates of empty sets
 * are 0). Two-space indent, trailing newline.
 * @example JSON.parse(renderTuneJson(result)).suggestion.cutoff // 0.01
 */
function renderTuneJson(result, extra = {}) {
    const ladders = Object.create(null);
    for (const [family, rows] of result.ladders)
        ladders[family] = rows;
    const body = {
        schema: TUNE_SCHEMA,
        series: result.series,
        runs: result.runs,
        replayedRuns: result.replayedRuns,
        metricsPerRun: result.metricsPerRun,
        family: result.family,
        currentCutoff: result.currentCutoff,
        metrics: result.metrics,
        groups: result.groups,
        ladders,
        target: result.target,
        ...(result.labels === undefined ? {} : { labels: result.labels }),
        suggestion: result.suggestion,
        ...(extra.written === undefined ? {} : { written: extra.written }),
    };
    return `${JSON.stringify(body, null, 2)}\n`;
}

// EXTERNAL MODULE: ./src/report/clean.ts
var clean = __webpack_require__(23);
// EXTERNAL MODULE: ./src/report/format.ts
var format = __webpack_require__(2011);
;// CONCATENATED MODULE: ./src/report/tune-table.ts
/**
 * A plain text table: columns padded to their widest cell, aligned by `align` ('l' left for
 * names, 'r' right for numbers; columns past its end are right-aligned), two spaces between
 * columns. Cells must already be clean.
 * @example textTable([['a', '1'], ['bb', '22']], 'lr') // 'a    1\nbb  22'
 */
function textTable(rows, align = 'l') {
    const widths = [];
    for (const row of rows)
        row.forEach((cell, i) => (widths[i] = Math.max(widths[i] ?? 0, Array.from(cell).length)));
    return rows
        .map((row) => row
        .map((cell, i) => {
        const pad = ' '.repeat(widths[i] - Array.from(cell).length);
        return align[i] === 'l' ? cell + pad : pad + cell;
    })
        .join('  ')
        .trimEnd())
        .join('\n');
}

;// CONCATENATED MODULE: ./src/report/tune-text.ts




/**
 * `bellgate tune` for a terminal: the cutoff ladder (false alarms per run, share of runs with a
 * false alarm per family setting, precision/recall/F1 with labels), false alarms per metric at the
 * current and the suggested cutoff, normality per metric, and the suggestion with its reasons.
 * Metric names pass through cleanText. Pure.
 * @example renderTuneText(result).split('\n')[0] // 'bellgate tune: series main, 120 runs, 112 replayed, ...'
 */
function renderTuneText(result) {
    const out = [];
    const refit = result.metrics.filter((m) => m.method === 'refit').length;
    out.push(`bellgate tune: series ${(0,clean/* cleanText */.X)(result.series)}, ${result.runs} runs, ${result.replayedRuns} replayed, ` +
        `${(0,format/* formatNumber */.ZV)(result.metricsPerRun)} metrics judged in a typical run`);
    out.push(`replay: ${result.metrics.length - refit} metrics slid incrementally, ${refit} refitted per run (change points or robust fit)`);
    if (result.groups.length > 0) {
        out.push(`note: groups (${result.groups.map((g) => (0,clean/* cleanText */.X)(g)).join(', ')}) are replayed member by member, as the gate judges them while a group is learning; their joint check is not in the ladder`);
    }
    out.push('', ladderTable(result), '');
    out.push(`false alarms: alarms on runs not labelled as regressions; "runs/100" is the share of runs with at least one, by family setting (config: ${result.family}).`);
    out.push('', perMetricTable(result));
    const normality = normalityTable(result);
    if (normality !== '')
        out.push('', normality);
    out.push('', ...suggestionLines(result));
    return `${out.join('\n')}\n`;
}
function ladderTable(result) {
    const own = result.ladders.get(result.family);
    const labelled = own.some((r) => r.labelled !== undefined);
    const head = ['', 'cutoff', 'sigma', 'false/run', ...FAMILIES.map((f) => `runs/100 ${f}`)];
    if (labelled)
        head.push('precision', 'recall', 'F1');
    const rows = own.map((row, i) => {
        const mark = [row.cutoff === result.suggestion.cutoff ? '>' : ' ', row.cutoff === result.currentCutoff ? '*' : ' '].join('');
        const cells = [mark, (0,format/* formatNumber */.ZV)(row.cutoff), row.sigma.toFixed(2), row.alarmsPerRun.toFixed(3)];
        for (const f of FAMILIES)
            cells.push(per100(result.ladders.get(f)[i].runsFlaggedPer100));
        if (row.labelled !== undefined)
            cells.push(row.labelled.precision.toFixed(3), row.labelled.recall.toFixed(3), row.labelled.f1.toFixed(3));
        return cells;
    });
    const legend = `  (> suggested, * current; ladder scored with family ${result.family}${labelled ? `; ${result.labels?.count ?? 0} labelled regressions` : ''})`;
    return `cutoff ladder\n${textTable([head, ...rows], 'lr')}\n${legend}`;
}
function perMetricTable(result) {
    const own = result.ladders.get(result.family);
    const current = own.find((r) => r.cutoff === result.currentCutoff);
    const suggested = own.find((r) => r.cutoff === result.suggestion.cutoff);
    const shown = current === suggested ? [current] : [current, suggested];
    const head = ['metric', 'judged', ...shown.map((row) => `per100 @${(0,format/* formatNumber */.ZV)(row.cutoff)}`), 'replay'];
    const rows = result.metrics.map((m, j) => [
        (0,clean/* cleanText */.X)(m.name),
        String(m.judged),
        ...shown.map((row) => per100(rate(row.perMetric[j], m.judged))),
        m.method,
    ]);
    return `false alarms per 100 judged runs, by metric\n${textTable([head, ...rows], `lr${'r'.repeat(shown.length)}l`)}`;
}
function normalityTable(result) {
    const rows = result.metrics
        .filter((m) => m.normality !== undefined)
        .map((m) => {
        const n = m.normality;
        return [
            (0,clean/* cleanText */.X)(m.name),
            String(n.n),
            n.raw.skewness.toFixed(2),
            n.raw.andersonDarling.toFixed(3),
            n.log ? n.log.skewness.toFixed(2) : '-',
            n.log ? n.log.andersonDarling.toFixed(3) : '-',
            m.transform,
            n.note,
        ];
    });
    if (rows.length === 0)
        return '';
    const head = ['metric', 'n', 'skew', 'A*²', 'skew log', 'A*² log', 'transform', 'note'];
    return ('normality of the newest window (skewness: Joanes & Gill 1998; Anderson-Darling A*² with estimated mean and sd, 5% critical value 0.752: D\'Agostino & Stephens 1986)\n' +
        textTable([head, ...rows], 'lrrrrrll'));
}
function suggestionLines(result) {
    const s = result.suggestion;
    const lines = ['suggestion', `  defaults.cutoff: ${(0,format/* formatNumber */.ZV)(s.cutoff)} — ${s.reason}`];
    lines.push(`  family: ${s.family}${s.family === result.family ? ' (as configured)' : ` (configured: ${result.family})`} — ${s.familyReason}`);
    for (const rule of s.rules) {
        const keys = [rule.cutoff === undefined ? '' : `cutoff: ${(0,format/* formatNumber */.ZV)(rule.cutoff)}`, rule.transform === undefined ? '' : `transform: ${rule.transform}`].filter((k) => k !== '');
        lines.push(`  rule ${(0,clean/* cleanText */.X)(rule.metric)}: ${keys.join(', ')} — ${(0,clean/* cleanText */.X)(rule.reason, 400)}`);
    }
    const t = result.target;
    lines.push(t.cutoff === undefined
        ? `  target ${t.per100} per 100 runs: no cutoff of the ladder meets it`
        : `  target ${t.per100} per 100 runs: loosest qualifying cutoff ${(0,format/* formatNumber */.ZV)(t.cutoff)}`);
    if (result.labels?.best !== undefined) {
        const b = result.labels.best;
        lines.push(`  labels: best F1 ${b.f1.toFixed(3)} at cutoff ${(0,format/* formatNumber */.ZV)(b.cutoff)} (precision ${b.precision.toFixed(3)}, recall ${b.recall.toFixed(3)})`);
    }
    return lines;
}
function rate(count, of) {
    return of === 0 ? 0 : (100 * count) / of;
}
function per100(x) {
    return x.toFixed(1);
}

// EXTERNAL MODULE: ./src/cli/load-config.ts
var load_config = __webpack_require__(6783);
// EXTERNAL MODULE: ./src/cli/paths.ts
var paths = __webpack_require__(5450);
// EXTERNAL MODULE: ./src/cli/read-text.ts
var read_text = __webpack_require__(4034);
;// CONCATENATED MODULE: ./src/cli/run/tune.ts












/**
 * The work of `bellgate tune` (loaded only when that command runs, so the replay and the diff
 * library are never loaded by the others): replays the gate, prints the ladder and suggestion,
 * and writes the config when `--write` is given.
 * @throws InputError for an empty history, bad labels (file:line:col) or unreadable files.
 * @example await runTune(ctx, { history: 'h.json', format: 'text' })
 */
async function runTune(ctx, options) {
    const config = await (0,load_config/* loadConfig */.Z)(ctx, options.config);
    const historyText = await (0,read_text/* readUserText */.n)((0,paths/* resolvePath */.o)(ctx, options.history), '--history');
    const history = (0,history_document/* parseHistory */.i6)(historyText, options.history);
    if (history.runs.length === 0) {
        throw new input_error/* InputError */.d('the history holds no runs, so there is nothing to replay', { where: options.history, fix: 'record runs first (bellgate record / import)' });
    }
    let labels;
    if (options.labels !== undefined)
        labels = parseLabels(await (0,read_text/* readUserText */.n)((0,paths/* resolvePath */.o)(ctx, options.labels), '--labels'), options.labels);
    const progress = progressBar(ctx.io);
    const result = tuneHistory({
        config,
        history,
        ...(labels === undefined ? {} : { labels }),
        ...(options.target === undefined ? {} : { target: options.target }),
        onProgress: progress.update,
    });
    progress.done();
    const written = options.write === undefined ? undefined : await writeSuggestion(ctx, options.write, result.suggestion);
    if (options.format === 'json') {
        ctx.io.stdout(renderTuneJson(result, written === undefined ? {} : { written }));
        return;
    }
    ctx.io.stdout(renderTuneText(result));
    if (written !== undefined) {
        ctx.io.stdout(written.diff === '' ? `\n${options.write}: already as suggested, not changed\n` : `\nwrote ${options.write}:\n${written.diff}`);
    }
}
/** Applies the suggestion to the file (missing: a new config), atomically; returns the unified diff ('' when unchanged). */
async function writeSuggestion(ctx, path, suggestion) {
    const full = (0,paths/* resolvePath */.o)(ctx, path);
    let before = '';
    try {
        before = await (0,read_text/* readUserText */.n)(full, '--write');
    }
    catch (error) {
        if (!(error instanceof input_error/* InputError */.d && /no such file/.test(error.message)))
            throw error;
    }
    const after = applyConfigEdit(before, path, suggestion);
    if (after === before)
        return { file: path, diff: '' };
    const temp = `${full}.bellgate-tune-${process.pid}.tmp`;
    try {
        await (0,promises_.writeFile)(temp, after, 'utf8');
        await (0,promises_.rename)(temp, full);
    }
    catch (error) {
        await (0,promises_.rm)(temp, { force: true });
        throw error;
    }
    return { file: path, diff: (0,create/* createTwoFilesPatch */.ss)(path, path, before, after, 'before', 'suggested by bellgate tune') };
}
/** A one-line progress bar on stderr, drawn only when stderr is a terminal (CliIo's optional stderrIsTTY). */
function progressBar(io) {
    const tty = io.stderrIsTTY === true;
    let drawn = false;
    let last = -1;
    return {
        update(done, total) {
            if (!tty || total < 2)
                return;
            const width = 30;
            const filled = Math.round((width * done) / total);
            if (filled === last && done !== total)
                return;
            last = filled;
            drawn = true;
            io.stderr(`\rreplaying [${'#'.repeat(filled)}${'.'.repeat(width - filled)}] ${done}/${total} metrics`);
        },
        done() {
            if (drawn)
                io.stderr('\r\u001b[K');
        },
    };
}


/***/ }),

/***/ 517:
/***/ ((__unused_webpack_module, __webpack_exports__, __webpack_require__) => {

__webpack_require__.r(__webpack_exports__);
/* harmony export */ __webpack_require__.d(__webpack_exports__, {
/* harmony export */   compileGlobs: () => (/* binding */ compileGlobs),
/* harmony export */   isLiteralGlob: () => (/* binding */ isLiteralGlob),
/* harmony export */   picomatchCompiler: () => (/* binding */ picomatchCompiler)
/* harmony export */ });
/* harmony import */ var picomatch__WEBPACK_IMPORTED_MODULE_1__ = __webpack_require__(4006);
/* harmony import */ var picomatch__WEBPACK_IMPORTED_MODULE_1___default = /*#__PURE__*/__webpack_require__.n(picomatch__WEBPACK_IMPORTED_MODULE_1__);
/* harmony import */ var _name_matchers_js__WEBPACK_IMPORTED_MODULE_0__ = __webpack_require__(6471);


// Metric names are not paths: a leading '.' is an ordinary character (dot: true), and '\' is
// never a separator, whatever the operating system (windows: false).
const OPTIONS = { dot: true, windows: false };
/**
 * Compiles a rule's globs (picomatch syntax) into one matcher: a name matches when it matches at
 * least one plain glob and no glob starting with '!' (only '!' globs: everything but those).
 * Metric names contain '/', and `*` stays within one '/' segment while `**` crosses segments:
 * `throughput/*` matches `throughput/home` but not `throughput/api/v2`; `size/**` matches both
 * `size/app.js` and `size/assets/logo.svg`. Globs that are plain names are compared as strings
 * (exactMatcher, the same answers). Compiled once per globs array and filed for settingsFor.
 * Throws picomatch's error for a pattern it cannot compile (load.ts reports it with line:column).
 * @example compileGlobs(['latency/*', '!latency/calibrate'])('latency/render') // true
 */
function compileGlobs(globs) {
    const known = (0,_name_matchers_js__WEBPACK_IMPORTED_MODULE_0__/* .knownMatcher */ .at)(globs);
    if (known)
        return known;
    const exact = (0,_name_matchers_js__WEBPACK_IMPORTED_MODULE_0__/* .exactMatcher */ .Gh)(globs);
    if (exact)
        return (0,_name_matchers_js__WEBPACK_IMPORTED_MODULE_0__/* .rememberMatcher */ .gV)(globs, exact);
    const plain = globs.filter((g) => !g.startsWith('!'));
    const negated = globs.filter((g) => g.startsWith('!')).map((g) => g.slice(1));
    const include = plain.length > 0 ? picomatch__WEBPACK_IMPORTED_MODULE_1___default()(plain, OPTIONS) : () => true;
    const exclude = negated.length > 0 ? picomatch__WEBPACK_IMPORTED_MODULE_1___default()(negated, OPTIONS) : () => false;
    return (0,_name_matchers_js__WEBPACK_IMPORTED_MODULE_0__/* .rememberMatcher */ .gV)(globs, (name) => include(name) && !exclude(name));
}
/**
 * True when the glob has no wildcard or brace characters, so it names exactly one metric.
 * @example isLiteralGlob('latency/calibrate') // true
 */
function isLiteralGlob(glob) {
    return !picomatch__WEBPACK_IMPORTED_MODULE_1___default().scan(glob).isGlob && !glob.startsWith('!');
}
/** The full glob syntax, through picomatch. */
const picomatchCompiler = { compile: compileGlobs, isLiteral: isLiteralGlob };
// Once picomatch is loaded anyway, globs filed by no reader (a Config built in code) still match.
(0,_name_matchers_js__WEBPACK_IMPORTED_MODULE_0__/* .useFallbackCompiler */ .Bz)(compileGlobs);


/***/ })

};
