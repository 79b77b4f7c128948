export const id = 535;
export const ids = [535];
export const modules = {

/***/ 7336:
/***/ ((module) => {

let p = process || {}, argv = p.argv || [], env = p.env || {}
let isColorSupported =
	!(!!env.NO_COLOR || argv.includes("--no-color")) &&
	(!!env.FORCE_COLOR || argv.includes("--color") || p.platform === "win32" || ((p.stdout || {}).isTTY && env.TERM !== "dumb") || !!env.CI)

let formatter = (open, close, replace = open) =>
	input => {
		let string = "" + input, index = string.indexOf(close, open.length)
		return ~index ? open + replaceClose(string, close, replace, index) + close : open + string + close
	}

let replaceClose = (string, close, replace, index) => {
	let result = "", cursor = 0
	do {
		result += string.substring(cursor, index) + replace
		cursor = index + close.length
		index = string.indexOf(close, cursor)
	} while (~index)
	return result + string.substring(cursor)
}

let createColors = (enabled = isColorSupported) => {
	let f = enabled ? formatter : () => String
	return {
		isColorSupported: enabled,
		reset: f("\x1b[0m", "\x1b[0m"),
		bold: f("\x1b[1m", "\x1b[22m", "\x1b[22m\x1b[1m"),
		dim: f("\x1b[2m", "\x1b[22m", "\x1b[22m\x1b[2m"),
		italic: f("\x1b[3m", "\x1b[23m"),
		underline: f("\x1b[4m", "\x1b[24m"),
		inverse: f("\x1b[7m", "\x1b[27m"),
		hidden: f("\x1b[8m", "\x1b[28m"),
		strikethrough: f("\x1b[9m", "\x1b[29m"),

		black: f("\x1b[30m", "\x1b[39m"),
		red: f("\x1b[31m", "\x1b[39m"),
		green: f("\x1b[32m", "\x1b[39m"),
		yellow: f("\x1b[33m", "\x1b[39m"),
		blue: f("\x1b[34m", "\x1b[39m"),
		magenta: f("\x1b[35m", "\x1b[39m"),
		cyan: f("\x1b[36m", "\x1b[39m"),
		white: f("\x1b[37m", "\x1b[39m"),
		gray: f("\x1b[90m", "\x1b[39m"),

		bgBlack: f("\x1b[40m", "\x1b[49m"),
		bgRed: f("\x1b[41m", "\x1b[49m"),
		bgGreen: f("\x1b[42m", "\x1b[49m"),
		bgYellow: f("\x1b[43m", "\x1b[49m"),
		bgBlue: f("\x1b[44m", "\x1b[49m"),
		bgMagenta: f("\x1b[45m", "\x1b[49m"),
		bgCyan: f("\x1b[46m", "\x1b[49m"),
		bgWhite: f("\x1b[47m", "\x1b[49m"),

		blackBright: f("\x1b[90m", "\x1b[39m"),
		redBright: f("\x1b[91m", "\x1b[39m"),
		greenBright: f("\x1b[92m", "\x1b[39m"),
		yellowBright: f("\x1b[93m", "\x1b[39m"),
		blueBright: f("\x1b[94m", "\x1b[39m"),
		magentaBright: f("\x1b[95m", "\x1b[39m"),
		cyanBright: f("\x1b[96m", "\x1b[39m"),
		whiteBright: f("\x1b[97m", "\x1b[39m"),

		bgBlackBright: f("\x1b[100m", "\x1b[49m"),
		bgRedBright: f("\x1b[101m", "\x1b[49m"),
		bgGreenBright: f("\x1b[102m", "\x1b[49m"),
		bgYellowBright: f("\x1b[103m", "\x1b[49m"),
		bgBlueBright: f("\x1b[104m", "\x1b[49m"),
		bgMagentaBright: f("\x1b[105m", "\x1b[49m"),
		bgCyanBright: f("\x1b[106m", "\x1b[49m"),
		bgWhiteBright: f("\x1b[107m", "\x1b[49m"),
	}
}

module.exports = createColors()
module.exports.createColors = createColors


/***/ }),

/***/ 8370:
/***/ ((__unused_webpack_module, __webpack_exports__, __webpack_require__) => {


// EXPORTS
__webpack_require__.d(__webpack_exports__, {
  v: () => (/* binding */ judgeRequestedRun)
});

// EXTERNAL MODULE: ./src/gate/gate.ts + 16 modules
var gate = __webpack_require__(8129);
// EXTERNAL MODULE: ./src/cli/load-config.ts
var load_config = __webpack_require__(6783);
// EXTERNAL MODULE: ./src/cli/load-run.ts + 8 modules
var load_run = __webpack_require__(5946);
// EXTERNAL MODULE: ./src/cli/open-history.ts + 3 modules
var open_history = __webpack_require__(6952);
// EXTERNAL MODULE: ./src/model/input-error.ts
var input_error = __webpack_require__(8250);
;// CONCATENATED MODULE: ./src/cli/split-newest.ts

/**
 * For `explain` and `report` without `--metrics`: the newest recorded run becomes "this run" and
 * the runs before it the history, so a maintainer can see how the last trusted run was judged.
 * @throws InputError when the history holds no runs.
 * @example splitNewest(h).run.metrics.get('latency/p50') // the newest run's value of that metric
 */
function splitNewest(history, source) {
    const last = history.runs.length - 1;
    const newest = history.runs[last];
    if (newest === undefined) {
        throw new input_error/* InputError */.d('the history holds no runs, so there is nothing to judge', {
            where: source,
            fix: 'pass this run\'s metric files with --metrics, or record runs first (bellgate record / import)',
        });
    }
    const metrics = new Map();
    const columns = new Map();
    for (const [name, column] of history.columns) {
        const value = column.values[last];
        if (value !== undefined && !Number.isNaN(value)) {
            metrics.set(name, column.unit === undefined ? { value, count: 1 } : { value, unit: column.unit, count: 1 });
        }
        const earlier = column.values.slice(0, last);
        if (earlier.some((v) => !Number.isNaN(v)))
            columns.set(name, { ...column, values: earlier });
    }
    return {
        history: { series: history.series, runs: history.runs.slice(0, last), columns },
        run: { metrics, meta: new Map() },
        id: newest.id,
    };
}

;// CONCATENATED MODULE: ./src/cli/judge-requested-run.ts





/**
 * The run `explain` and `report` look at, judged: the metric files given with --metrics against
 * the whole history, or without them the newest recorded run against the runs before it.
 * @throws InputError (bad files, flags), StoreError (history unreadable).
 * @example await judgeRequestedRun(ctx, { history: 'h.json', series: 'default' }) // { config, history, run, report }
 */
async function judgeRequestedRun(ctx, options) {
    const config = await (0,load_config/* loadConfig */.Z)(ctx, options.config);
    const opened = await (0,open_history/* openHistory */.j)(ctx, options.history, options.series);
    const { history, run } = options.metrics === undefined
        ? splitNewest(opened.history, options.history)
        : { history: opened.history, run: await (0,load_run/* loadRun */.S)(ctx, config, { ...options, metrics: options.metrics }) };
    return { config, history, run, report: (0,gate/* runGate */.R)({ config, history, run, series: options.series }) };
}


/***/ }),

/***/ 2535:
/***/ ((__unused_webpack_module, __webpack_exports__, __webpack_require__) => {

// ESM COMPAT FLAG
__webpack_require__.r(__webpack_exports__);

// EXPORTS
__webpack_require__.d(__webpack_exports__, {
  runExplain: () => (/* binding */ runExplain)
});

// EXTERNAL MODULE: ./src/config/rules.ts
var rules = __webpack_require__(5413);
// EXTERNAL MODULE: ./src/gate/baseline.ts + 1 modules
var gate_baseline = __webpack_require__(4614);
// EXTERNAL MODULE: ./src/model/input-error.ts
var input_error = __webpack_require__(8250);
// EXTERNAL MODULE: ./src/model/transform.ts
var transform = __webpack_require__(8077);
// EXTERNAL MODULE: ./node_modules/picocolors/picocolors.js
var picocolors = __webpack_require__(7336);
var picocolors_default = /*#__PURE__*/__webpack_require__.n(picocolors);
// EXTERNAL MODULE: ./src/model/tails.ts + 2 modules
var tails = __webpack_require__(7963);
// EXTERNAL MODULE: ./src/report/clean.ts
var clean = __webpack_require__(23);
// EXTERNAL MODULE: ./src/report/format.ts
var format = __webpack_require__(2011);
// EXTERNAL MODULE: ./src/report/sparkline.ts
var sparkline = __webpack_require__(9833);
// EXTERNAL MODULE: ./src/report/status.ts
var report_status = __webpack_require__(6934);
// EXTERNAL MODULE: ./src/report/predictive.ts
var predictive = __webpack_require__(4713);
;// CONCATENATED MODULE: ./src/report/explain.ts







const ROWS = 8;
const DOT_ROWS = 3;
/** Put `label` into `line` at column `at`, aligned left/centre/right, without overrunning. */
function place(line, label, at, align) {
    const chars = Array.from(label);
    let start = align === 'left' ? at : align === 'right' ? at - chars.length + 1 : at - Math.floor(chars.length / 2);
    start = Math.max(0, Math.min(line.length - chars.length, start));
    if (chars.some((_, i) => line[start + i] !== ' '))
        return;
    chars.forEach((ch, i) => (line[start + i] = ch));
}
/**
 * A terminal picture of one metric's decision: the fitted Gaussian drawn as rows of block
 * characters (eighth-height steps), the baseline runs as a dot strip under it, the edges of the
 * band where the relative density stays above the cutoff (mean ± sqrt(-2 ln cutoff) sd) as `|`
 * and this run as `▲`, then the numbers in words. On the log scale the picture's x axis is
 * log(value) and labels are in the metric's own unit. Colour only when asked; never needed.
 * @example renderExplain({ result, baselineValues, cutoff: 0.01, color: false }).includes('▲') // true
 */
function renderExplain(input) {
    const { result: m, cutoff } = input;
    const c = picocolors_default().createColors(input.color);
    const width = Math.max(24, Math.floor(input.width ?? 72));
    const name = (0,clean/* cleanText */.X)(m.name);
    const unit = m.unit === undefined ? undefined : (0,clean/* cleanText */.X)(m.unit, 20);
    const out = [`${name} — ${report_status/* STATUS_GLYPH */.id[m.status]} ${m.status}`];
    const b = m.baseline;
    if (!b || !(b.sd > 0 && Number.isFinite(b.sd)) || !Number.isFinite(b.mean)) {
        out.push(`no fitted baseline: ${(0,clean/* cleanText */.X)(m.reason, 400)}`);
        if (m.value !== undefined)
            out.push(`this run: ${(0,format/* formatValue */.Fl)(m.value, unit)}`);
        return out.join('\n') + '\n';
    }
    const log = b.scale === 'log';
    const toFit = (x) => (log ? Math.log(x) : x);
    const fromFit = (t) => (log ? Math.exp(t) : t);
    const k = (0,tails/* cutoffSigma */.DE)(cutoff);
    const pts = input.baselineValues.map(toFit).filter((t) => Number.isFinite(t));
    const now = m.value === undefined ? NaN : toFit(m.value);
    const span = [b.mean - Math.max(k, 3.5) * b.sd, b.mean + Math.max(k, 3.5) * b.sd, ...pts, ...(Number.isFinite(now) ? [now] : [])];
    let lo = Math.min(...span);
    let hi = Math.max(...span);
    const pad = (hi - lo) * 0.03;
    lo -= pad;
    hi += pad;
    const col = (t) => Math.max(0, Math.min(width - 1, Math.floor(((t - lo) / (hi - lo)) * width)));
    const inBand = (t) => Math.abs(t - b.mean) <= k * b.sd;
    // Density rows: each column's height in eighths of a row, relative density exp(-z^2/2) of the fit.
    const eighths = Array.from({ length: width }, (_, i) => {
        const z = (lo + ((i + 0.5) / width) * (hi - lo) - b.mean) / b.sd;
        return Math.round(Math.exp(-0.5 * z * z) * ROWS * 8);
    });
    for (let r = ROWS - 1; r >= 0; r--) {
        const line = eighths.map((e, i) => {
            const fill = e - r * 8;
            const ch = fill >= 8 ? '█' : fill <= 0 ? ' ' : (sparkline/* BLOCKS */.nA[fill - 1] ?? ' ');
            return inBand(lo + ((i + 0.5) / width) * (hi - lo)) ? ch : c.dim(ch);
        });
        out.push(line.join('').trimEnd());
    }
    // Markers: band edges and this run on one rule.
    const rule = Array.from({ length: width }, () => '─');
    rule[col(b.mean - k * b.sd)] = '|';
    rule[col(b.mean + k * b.sd)] = '|';
    const nowCol = Number.isFinite(now) ? col(now) : -1;
    if (nowCol >= 0)
        rule[nowCol] = '▲';
    const paintRun = m.status === 'regressed' ? c.red : m.status === 'improved' ? c.green : (s) => s;
    out.push(rule.map((ch, i) => (i === nowCol ? paintRun(c.bold(ch)) : ch)).join(''));
    // Dot strip of the baseline runs, stacked up to DOT_ROWS high ('+' when more).
    const counts = new Array(width).fill(0);
    for (const t of pts)
        counts[col(t)] = (counts[col(t)] ?? 0) + 1;
    for (let r = 0; r < DOT_ROWS; r++) {
        const line = counts.map((n) => (n > r ? (r === DOT_ROWS - 1 && n > DOT_ROWS ? '+' : '•') : ' ')).join('').trimEnd();
        if (line)
            out.push(line);
    }
    const axis = Array.from({ length: width }, () => ' ');
    place(axis, (0,format/* formatNumber */.ZV)(fromFit(b.mean)), col(b.mean), 'centre');
    place(axis, (0,format/* formatNumber */.ZV)(fromFit(lo)), 0, 'left');
    place(axis, (0,format/* formatNumber */.ZV)(fromFit(hi)), width - 1, 'right');
    out.push(axis.join('').trimEnd());
    out.push(`█ fitted density${log ? ' (of log value)' : ''}   • baseline runs   | cutoff band edges   ▲ this run`);
    out.push('');
    const centre = log
        ? `geometric mean ${(0,format/* formatValue */.Fl)(Math.exp(b.mean), unit)}, sd ${(0,format/* formatNumber */.ZV)(b.sd, 3)} on the log scale (×/÷ ${(0,format/* formatNumber */.ZV)(Math.exp(b.sd), 4)})`
        : `mean ${(0,format/* formatValue */.Fl)(b.mean, unit)}, sd ${(0,format/* formatValue */.Fl)(b.sd, unit)}`;
    out.push(`baseline: ${centre}, n = ${b.n} runs${b.since ? ` since run ${(0,clean/* cleanText */.X)(b.since, 80)}` : ''}`);
    out.push(`this run: ${(0,format/* formatValue */.Fl)(m.value, unit)} (${(0,format/* formatChange */.eD)(m.change)}, ${(0,format/* formatSigma */.Hx)(m.z)})`);
    const [low, high] = [(0,format/* formatValue */.Fl)(fromFit(b.mean - k * b.sd), unit), (0,format/* formatValue */.Fl)(fromFit(b.mean + k * b.sd), unit)];
    out.push(`band where the fitted Gaussian's density stays above the cutoff: ${low} to ${high} (mean ± ${(0,format/* formatNumber */.ZV)(k, 3)} sd)`);
    out.push(`relative density vs cutoff: ${(0,format/* formatAgainstCutoff */.mM)(m.relativeDensity, cutoff)}; worse side: ${m.worse === 'both' ? 'either' : m.worse}`);
    if ((0,predictive/* usesPredictive */.i)(m)) {
        out.push(`  (from the predictive Student-t for a new run, n - 1 = ${b.n - 1} degrees of freedom: heavier tails than the ` +
            'Gaussian drawn, so a short history needs a larger move to fall below the cutoff)');
    }
    out.push(`verdict for this metric: ${paintRun(m.status)} — ${(0,clean/* cleanText */.X)(m.reason, 400)}`);
    return out.join('\n') + '\n';
}

// EXTERNAL MODULE: ./src/cli/judge-requested-run.ts + 1 modules
var judge_requested_run = __webpack_require__(8370);
// EXTERNAL MODULE: ./src/config/did-you-mean.ts
var did_you_mean = __webpack_require__(9255);
;// CONCATENATED MODULE: ./src/cli/close-names.ts

/**
 * Names near a mistyped one, for "did you mean" hints: by Levenshtein edit distance (at most a
 * third of the name's length), plus names that contain the typed text. At most `limit`, nearest first.
 * Bounded: names longer than 200 characters are not compared (the distance is O(a*b)).
 * @example closeNames('latency/p59', ['latency/p50', 'size/app']) // ['latency/p50']
 */
function closeNames(typed, names, limit = 3) {
    if (typed.length > 200)
        return [];
    const scored = [];
    const allowed = Math.max(2, Math.floor(typed.length / 3));
    for (const name of names) {
        if (name.length > 200)
            continue;
        const d = name.includes(typed) ? 0.5 : (0,did_you_mean/* editDistance */.Y)(typed, name);
        if (d <= allowed)
            scored.push({ name, d });
    }
    scored.sort((a, b) => a.d - b.d || (a.name < b.name ? -1 : 1));
    return scored.slice(0, limit).map((s) => s.name);
}


;// CONCATENATED MODULE: ./src/cli/run/explain.ts







/**
 * The work of `bellgate explain METRIC` (loaded only when that command runs): judges the run and
 * draws the one metric's decision on stdout.
 * @throws InputError for an unknown metric (naming the closest names), bad files or flags.
 * @example await runExplain(ctx, 'latency/geocode-p95', { history: 'h.json', series: 'default' })
 */
async function runExplain(ctx, metric, options) {
    const { config, history, run, report } = await (0,judge_requested_run/* judgeRequestedRun */.v)(ctx, options);
    const result = report.metrics.find((m) => m.name === metric);
    if (result === undefined) {
        const known = [...new Set([...history.columns.keys(), ...run.metrics.keys()])];
        const near = closeNames(metric, known);
        throw new input_error/* InputError */.d(`no metric named "${metric}" in the history or this run`, {
            where: options.history,
            fix: near.length > 0 ? `did you mean ${near.map((n) => `"${n}"`).join(' or ')}?` : 'run bellgate check to list the metric names',
        });
    }
    const settings = (0,rules/* settingsFor */.z)(config, metric);
    const baseline = (0,gate_baseline/* selectBaseline */.w)(history, metric, settings);
    const width = Number(ctx.io.env.COLUMNS);
    const text = renderExplain({
        result,
        // selectBaseline gives fit-scale values; the picture wants the metric's own unit.
        baselineValues: baseline.values.map((v) => (0,transform/* fromFitScale */.G)(v, settings.transform)),
        cutoff: result.cutoff,
        color: ctx.color,
        ...(Number.isInteger(width) && width >= 40 ? { width: Math.min(width, 160) } : {}),
    });
    ctx.io.stdout(text.endsWith('\n') ? text : `${text}\n`);
}


/***/ }),

/***/ 9255:
/***/ ((__unused_webpack_module, __webpack_exports__, __webpack_require__) => {

/* harmony export */ __webpack_require__.d(__webpack_exports__, {
/* harmony export */   Y: () => (/* binding */ editDistance),
/* harmony export */   a: () => (/* binding */ didYouMean)
/* harmony export */ });
/**
 * Levenshtein edit distance (insertions, deletions, substitutions each cost 1), by the classic
 * two-row dynamic programme (Wagner & Fischer 1974). O(|a| * |b|) time, O(|b|) memory.
 * @example editDistance('cuttoff', 'cutoff') // 1
 */
function editDistance(a, b) {
    let previous = Array.from({ length: b.length + 1 }, (_, j) => j);
    for (let i = 1; i <= a.length; i++) {
        const current = [i];
        for (let j = 1; j <= b.length; j++) {
            const cost = a[i - 1] === b[j - 1] ? 0 : 1;
            current[j] = Math.min(previous[j] + 1, current[j - 1] + 1, previous[j - 1] + cost);
        }
        previous = current;
    }
    return previous[b.length];
}
/** Case, dashes, underscores and spaces are what people most often get "wrong" in a key. */
function normalise(word) {
    return word.toLowerCase().replace(/[-_\s]/g, '');
}
/**
 * The candidate a mistyped word most likely meant, or undefined when none is close: equal after
 * ignoring case, '-', '_' and spaces (`minRuns`, `min_runs` -> `min-runs`), else within an edit
 * distance of about a third of the candidate's length (`cuttoff` -> `cutoff`).
 * @example didYouMean('tolerence', ['cutoff', 'tolerance']) // 'tolerance'
 */
function didYouMean(word, candidates) {
    if (word.length > 64)
        return undefined;
    const plain = normalise(word);
    let best;
    let bestDistance = Infinity;
    for (const candidate of candidates) {
        const target = normalise(candidate);
        if (target === plain)
            return candidate;
        const distance = editDistance(plain, target);
        if (distance <= Math.max(1, Math.floor(target.length / 3)) && distance < bestDistance) {
            best = candidate;
            bestDistance = distance;
        }
    }
    return best;
}


/***/ }),

/***/ 4713:
/***/ ((__unused_webpack_module, __webpack_exports__, __webpack_require__) => {

/* harmony export */ __webpack_require__.d(__webpack_exports__, {
/* harmony export */   i: () => (/* binding */ usesPredictive)
/* harmony export */ });
/**
 * Whether the reported relative density came from the predictive Student-t rather than the
 * Gaussian drawn: under the plug-in fit it equals exp(-z^2/2) exactly, while the t's heavier tails
 * give a larger value once the run is away from the centre.
 * @example usesPredictive({ ...m, z: 3, relativeDensity: Math.exp(-4.5) }) // false (plug-in)
 */
function usesPredictive(m) {
    if (m.z === undefined || m.relativeDensity === undefined || !Number.isFinite(m.z) || Math.abs(m.z) < 0.5)
        return false;
    const plugIn = Math.exp(-0.5 * m.z * m.z);
    return m.relativeDensity > plugIn * (1 + 1e-6);
}


/***/ }),

/***/ 9833:
/***/ ((__unused_webpack_module, __webpack_exports__, __webpack_require__) => {

/* harmony export */ __webpack_require__.d(__webpack_exports__, {
/* harmony export */   KM: () => (/* binding */ sparkline),
/* harmony export */   nA: () => (/* binding */ BLOCKS)
/* harmony export */ });
/* unused harmony export MARK_SEPARATOR */
/** The eight Unicode block heights, lowest first (U+2581..U+2588). */
const BLOCKS = ['▁', '▂', '▃', '▄', '▅', '▆', '▇', '█'];
/** Separates the history from this run's mark, so the mark reads as "and now". */
const MARK_SEPARATOR = '→';
/**
 * A one-line picture of a series: one block per value, height linear between the smallest and
 * largest finite value (this run's `mark` included, so a jump stands out). Missing values (NaN)
 * show as a space; a constant series sits at mid height. When `mark` is given it follows the
 * history after an arrow. Returns '' when nothing is finite. Plain text, so it reads the same in a
 * terminal, a code span on GitHub and a screen reader's character mode.
 * @example sparkline([1, 2, 3, 4, 5, 6, 7, 8]) // '▁▂▃▄▅▆▇█'
 * @example sparkline([1, 1, 1], 2) // '▁▁▁→█'
 */
function sparkline(values, mark) {
    const finite = values.filter((v) => Number.isFinite(v));
    const hasMark = mark !== undefined && Number.isFinite(mark);
    if (hasMark)
        finite.push(mark);
    if (finite.length === 0)
        return '';
    let lo = Infinity;
    let hi = -Infinity;
    for (const v of finite) {
        if (v < lo)
            lo = v;
        if (v > hi)
            hi = v;
    }
    const block = (v) => {
        if (!Number.isFinite(v))
            return ' ';
        if (hi === lo)
            return BLOCKS[3];
        const i = Math.round(((v - lo) / (hi - lo)) * (BLOCKS.length - 1));
        return BLOCKS[Math.min(BLOCKS.length - 1, Math.max(0, i))] ?? BLOCKS[3];
    };
    const line = values.map(block).join('');
    return hasMark ? `${line}${MARK_SEPARATOR}${block(mark)}` : line;
}


/***/ })

};
