export const id = 100;
export const ids = [100];
export const modules = {

/***/ 1100:
/***/ ((__unused_webpack_module, __webpack_exports__, __webpack_require__) => {

// ESM COMPAT FLAG
__webpack_require__.r(__webpack_exports__);

// EXPORTS
__webpack_require__.d(__webpack_exports__, {
  runReport: () => (/* binding */ runReport)
});

// EXTERNAL MODULE: external "node:fs/promises"
var promises_ = __webpack_require__(1455);
// EXTERNAL MODULE: external "node:path"
var external_node_path_ = __webpack_require__(6760);
// EXTERNAL MODULE: ./src/report/cells.ts
var cells = __webpack_require__(571);
// EXTERNAL MODULE: ./src/report/notes.ts
var notes = __webpack_require__(4931);
// EXTERNAL MODULE: ./src/report/escape.ts
var report_escape = __webpack_require__(4031);
// EXTERNAL MODULE: ./src/report/family-line.ts
var family_line = __webpack_require__(4551);
// EXTERNAL MODULE: ./src/model/tails.ts + 1 modules
var tails = __webpack_require__(2170);
;// CONCATENATED MODULE: ./src/report/html-data.ts

/** The finite values of a history column with their run, oldest first. */
function columnPoints(column, runs) {
    if (!column)
        return [];
    const out = [];
    column.values.forEach((value, index) => {
        const run = runs[index];
        if (run && Number.isFinite(value))
            out.push({ index, value, run });
    });
    return out;
}
/**
 * The runs behind the fit, as far as the history shows them: from run `baseline.since` when
 * change points shortened the baseline, then the newest `baseline.n` values. (The gate decides
 * the exact window; this reconstruction is for pictures only.)
 */
function baselinePoints(points, m) {
    const b = m.baseline;
    if (!b)
        return [];
    const start = b.since === undefined ? -1 : points.findIndex((p) => p.run.id === b.since);
    const from = start >= 0 ? points.slice(start) : points;
    return from.slice(Math.max(0, from.length - b.n));
}
/**
 * The band in the metric's own unit: on the log scale the edges are exp(mean ± k sd), so the
 * band is asymmetric around the geometric mean. Undefined without a usable fit. (With relative-to
 * the band is of ratios; chartColumn gives the matching values.)
 * @example cutoffBand({ ...m, baseline: { n: 9, mean: 10, sd: 1 } }, 0.01) // { mean: 10, low: 6.965, high: 13.035 }
 */
function cutoffBand(m, cutoff) {
    const b = m.baseline;
    if (!b || !Number.isFinite(b.mean) || !(b.sd >= 0 && Number.isFinite(b.sd)) || !(cutoff > 0 && cutoff < 1))
        return undefined;
    const k = (0,tails/* cutoffSigma */.DE)(cutoff);
    const back = (t) => (b.scale === 'log' ? Math.exp(t) : t);
    return { mean: back(b.mean), low: back(b.mean - k * b.sd), high: back(b.mean + k * b.sd) };
}
/**
 * The values a metric's charts show: its history column, or with relative-to the run-by-run ratio
 * to the reference metric, the quantity the gate fitted and judged (NaN where either is missing
 * or the reference is 0).
 */
function chartColumn(history, m) {
    const own = history.columns.get(m.name);
    const refName = m.baseline?.relativeTo;
    if (!own || refName === undefined)
        return own;
    const ref = history.columns.get(refName);
    return {
        values: own.values.map((v, i) => {
            const r = ref?.values[i];
            return r === undefined || r === 0 ? NaN : v / r;
        }),
    };
}

// EXTERNAL MODULE: ./node_modules/d3-scale/dist/d3-scale.mjs + 4 modules
var d3_scale = __webpack_require__(5602);
// EXTERNAL MODULE: ./node_modules/d3-shape/dist/d3-shape.mjs + 1 modules
var d3_shape = __webpack_require__(6879);
// EXTERNAL MODULE: ./src/model/special/normal.ts + 1 modules
var normal = __webpack_require__(2986);
;// CONCATENATED MODULE: ./src/model/density.ts

/** A spread must be a finite number >= 0; 0 is the degenerate fit of a constant history. */
function checkSpread(sd) {
    if (!(sd >= 0) || !Number.isFinite(sd)) {
        throw new RangeError(`a standard deviation must be a finite number, 0 or more, got ${sd}`);
    }
}
/**
 * Gaussian density p(x) = exp(-(x - mu)^2 / (2 sigma^2)) / (sqrt(2 pi) sigma).
 * A zero sigma is the degenerate distribution: Infinity at the mean, 0 elsewhere.
 * Throws RangeError on a negative or non-finite sd.
 * @example gaussianDensity(0, 0, 1) // 0.3989422804014327
 */
function gaussianDensity(x, mean, sd) {
    checkSpread(sd);
    return (0,normal/* normalDensity */.kC)(x, mean, sd);
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
 * Throws RangeError when n < 2 (no degrees of freedom) or sampleSd is negative or not finite.
 * @example predictiveRelativeDensity(3, 0, 1, 1e9) // ≈ 0.011109 (large n: the Gaussian)
 */
function predictiveRelativeDensity(x, mean, sampleSd, n) {
    if (!(n >= 2)) {
        throw new RangeError(`the predictive distribution needs at least 2 runs, got ${n}`);
    }
    checkSpread(sampleSd);
    if (sampleSd === 0)
        return x === mean ? 1 : 0;
    const nu = n - 1;
    const t = (x - mean) / predictiveScale(sampleSd, n);
    return Math.exp((-(nu + 1) / 2) * Math.log1p((t * t) / nu));
}

;// CONCATENATED MODULE: ./src/report/html-svg.ts
/** SVG coordinates with two decimals: enough for a screen, and non-finite values never leak in. */
const px = (x) => (Number.isFinite(x) ? Math.round(x * 100) / 100 : 0);
/**
 * One SVG element as text: numbers in `attrs` are rounded to two decimals (non-finite ones to 0,
 * see px), strings are written as given and must already be escaped; `titleHtml` (escaped) becomes
 * the element's tooltip.
 * @example svgElement('circle', { cx: 1.234, cy: 2, r: 3 }) // '<circle cx="1.23" cy="2" r="3"/>'
 */
function svgElement(tag, attrs, titleHtml) {
    const list = Object.entries(attrs)
        .map(([k, v]) => `${k}="${typeof v === 'number' ? px(v) : v}"`)
        .join(' ');
    return titleHtml === undefined ? `<${tag} ${list}/>` : `<${tag} ${list}><title>${titleHtml}</title></${tag}>`;
}
/** The outer <svg> of a chart, sized and labelled for screen readers (`titleHtml` escaped). */
function chartSvg(width, height, titleHtml, body) {
    const size = `viewBox="0 0 ${width} ${height}" width="${width}" height="${height}"`;
    return `<svg class="chart" ${size} role="img" aria-label="${titleHtml}"><title>${titleHtml}</title>${body}</svg>`;
}
/** An SVG <text> element; `textHtml` must already be escaped. */
function textElement(attrs, textHtml) {
    return svgElement('text', attrs).replace(/\/>$/, `>${textHtml}</text>`);
}

;// CONCATENATED MODULE: ./src/report/html-axis.ts



/**
 * Tick labels from the scale's own tickFormat. A log scale's format skips ticks away from powers
 * of ten, which can leave a log axis narrower than a decade (35 to 48 ms) almost bare; there the
 * linear format of the same domain labels every tick.
 */
function tickLabels(scale, ticks, count) {
    const own = ticks.map(scale.tickFormat(count));
    const [a = 1, b = 1] = scale.domain();
    if ('base' in scale && own.includes('') && Math.max(a, b) / Math.min(a, b) < 10) {
        const linear = (0,d3_scale/* scaleLinear */.m4)().domain(scale.domain()).tickFormat(count);
        return ticks.map(linear);
    }
    return own;
}
/**
 * A horizontal axis at height `y`: a baseline, d3-scale's ticks with their own format, and an
 * escaped label centred under it.
 */
function bottomAxis(scale, y, label, count = 6) {
    const [x0 = 0, x1 = 0] = scale.range();
    const values = scale.ticks(count);
    const labels = tickLabels(scale, values, count);
    const ticks = values
        .map((t, i) => {
        const x = scale(t);
        const text = labels[i] ?? '';
        const tick = svgElement('line', { x1: x, x2: x, y1: y, y2: y + 5 });
        return text ? tick + textElement({ x, y: y + 17, 'text-anchor': 'middle' }, (0,report_escape/* escapeHtml */.Z)(text)) : tick;
    })
        .join('');
    const rule = svgElement('line', { x1: x0, x2: x1, y1: y, y2: y });
    const name = textElement({ class: 'axis-label', x: (x0 + x1) / 2, y: y + 32, 'text-anchor': 'middle' }, label);
    return `<g class="axis">${rule}${ticks}${name}</g>`;
}
/**
 * Width of one tick-label character at the charts' 11px: an upper bound for digits, separators and
 * the letters of SI prefixes in common sans-serif faces (about 0.6 em).
 */
const TICK_CHAR_WIDTH = 6.6;
/** A vertical axis at `x`, ticks to the left, label rotated along it. `label` must be escaped. */
function leftAxis(scale, x, label, count = 5) {
    const [y0 = 0, y1 = 0] = scale.range();
    const values = scale.ticks(count);
    const labels = tickLabels(scale, values, count);
    const ticks = values
        .map((t, i) => {
        const y = scale(t);
        const text = labels[i] ?? '';
        const tick = svgElement('line', { x1: x - 5, x2: x, y1: y, y2: y });
        return text ? tick + textElement({ x: x - 8, y, dy: '0.32em', 'text-anchor': 'end' }, (0,report_escape/* escapeHtml */.Z)(text)) : tick;
    })
        .join('');
    const rule = svgElement('line', { x1: x, x2: x, y1: y0, y2: y1 });
    // The rotated label stands left of the widest tick label, never on it (its 12px line is about
    // 12px wide once turned; half of that, plus a gap, past the labels' left edge).
    const widest = Math.max(0, ...labels.map((l) => l.length * TICK_CHAR_WIDTH));
    const turn = `translate(${px(Math.max(8, x - 8 - widest - 9))},${px((y0 + y1) / 2)}) rotate(-90)`;
    const name = textElement({ class: 'axis-label', transform: turn, 'text-anchor': 'middle' }, label);
    return `<g class="axis">${rule}${ticks}${name}</g>`;
}
/**
 * A value scale over [lo, hi] onto `range`: linear with d3's nice() round ends, or logarithmic
 * padded by 4% of the span in log units (nice() on a log scale widens to whole decades, which
 * would flatten a 3% spread into a line).
 */
function valueScale(log, lo, hi, range) {
    // Near the ends of the doubles a log axis has no usable ticks; draw those values linearly.
    log = log && lo > 1e-200 && hi < 1e200;
    // A (near-)empty span has no ticks to speak of (d3 would try to make billions): widen it by 5%,
    // or by 1 around zero and denormal values.
    if (!(hi - lo > Math.max(Math.abs(lo), Math.abs(hi)) * 1e-12 && hi - lo > 1e-200)) {
        const d = Math.abs(lo) > 1e-200 ? Math.abs(lo) * 0.05 : 1;
        [lo, hi] = log ? [lo / 1.05, hi * 1.05] : [lo - d, hi + d];
    }
    const pad = (hi / lo) ** 0.04;
    const [a, b] = [lo / pad, hi * pad];
    // Values so extreme that the padded log domain leaves the doubles are drawn on a linear axis.
    if (!log || !(a > 0) || !Number.isFinite(b))
        return (0,d3_scale/* scaleLinear */.m4)().domain([lo, hi]).range(range).nice();
    return (0,d3_scale/* scaleLog */.ZE)().domain([a, b]).range(range);
}

;// CONCATENATED MODULE: ./src/report/html-symbol.ts

/** The shape that marks this run in the charts, the same meaning as STATUS_GLYPH in tables. */
const SHAPES = {
    regressed: { type: d3_shape/* symbolTriangle */.ZK, rotate: 0 },
    improved: { type: d3_shape/* symbolTriangle */.ZK, rotate: 180 },
    missing: { type: d3_shape/* symbolCross */.BV, rotate: 45 },
    ok: { type: d3_shape/* symbolCircle */.hK, rotate: 0 },
    learning: { type: d3_shape/* symbolDiamond */.j, rotate: 0 },
    new: { type: d3_shape/* symbolCross */.BV, rotate: 0 },
    ignored: { type: d3_shape/* symbolDiamond */.j, rotate: 0 },
};
/**
 * An SVG path for this run's marker at (x, y), drawn by d3-shape's symbol generator, with a
 * tooltip. `titleHtml` must already be escaped.
 */
function statusSymbol(status, x, y, titleHtml, area = 110) {
    const shape = SHAPES[status];
    const d = (0,d3_shape/* symbol */.HR)(shape.type, area)() ?? '';
    return `<path class="run-mark s-${status}" d="${d}" transform="translate(${x},${y}) rotate(${shape.rotate})"><title>${titleHtml}</title></path>`;
}

// EXTERNAL MODULE: ./src/report/format.ts + 1 modules
var format = __webpack_require__(5956);
;// CONCATENATED MODULE: ./src/report/html-histogram.ts









const W = 420;
const H = 220;
// A taller top margin than the history chart's: the note of a run drawn off the chart sits there.
const M = { top: 26, right: 18, bottom: 42, left: 72 };
const CURVE_POINTS = 160;
const OFF_CHART_SD = 8;
/**
 * An SVG histogram of the baseline values with the fitted Gaussian density over it, the band
 * edges where the relative density equals the cutoff (dashed verticals), the cutoff's density
 * level p(mode)·cutoff (dashed horizontal between them) and this run marked below the axis.
 * Bars show density (count / (m · bin width) on the fit scale) so bars and curve share one y
 * axis whatever the bin widths; on the log scale the x axis is logarithmic and widths are in
 * log units. Bin edges are d3-scale's ticks. Returns '' without a fit or baseline values.
 */
function baselineHistogram(m, values, cutoff) {
    const b = m.baseline;
    const band = cutoffBand(m, cutoff);
    const log = b?.scale === 'log';
    const vals = values.filter((v) => Number.isFinite(v) && (!log || v > 0));
    if (!b || !band || !(b.sd > 0 && Number.isFinite(b.sd)) || vals.length === 0)
        return '';
    const toFit = (v) => (log ? Math.log(v) : v);
    const given = m.value !== undefined && Number.isFinite(m.value) && (!log || m.value > 0) ? m.value : undefined;
    // A run far out (a 40-sd jump) would squash the baseline into one bar; it is drawn at the edge instead.
    const offChart = given !== undefined && Math.abs(toFit(given) - b.mean) > OFF_CHART_SD * b.sd;
    const now = given === undefined || offChart ? undefined : given;
    const tails = [b.mean - 3.5 * b.sd, b.mean + 3.5 * b.sd].map((t) => (log ? Math.exp(t) : t));
    const all = [...vals, band.low, band.high, ...tails, ...(now === undefined ? [] : [now])];
    const x = valueScale(log, Math.min(...all), Math.max(...all), [M.left, W - M.right]);
    const [d0 = 0, d1 = 1] = x.domain();
    const edges = [
        d0,
        ...x.ticks(Math.min(40, Math.max(8, Math.ceil(2 * Math.sqrt(vals.length))))).filter((t) => t > d0 && t < d1),
        d1,
    ];
    const bins = edges.slice(1).map((hiEdge, i) => {
        const loEdge = edges[i] ?? d0;
        const last = i === edges.length - 2;
        const count = vals.filter((v) => v >= loEdge && (v < hiEdge || (last && v <= hiEdge))).length;
        return { loEdge, hiEdge, count, density: count / (vals.length * (toFit(hiEdge) - toFit(loEdge))) };
    });
    const peak = gaussianDensity(b.mean, b.mean, b.sd);
    const top = Math.max(peak, ...bins.map((bin) => bin.density));
    const y = (0,d3_scale/* scaleLinear */.m4)()
        .domain([0, top])
        .range([H - M.bottom, M.top])
        .nice();
    const unit = m.unit === undefined ? '' : (0,report_escape/* escapeHtml */.Z)(m.unit, 40);
    const parts = [];
    for (const bin of bins) {
        if (bin.count === 0)
            continue;
        const tip = `${bin.count} run${bin.count === 1 ? '' : 's'} in ${(0,format/* formatValue */.Fl)(bin.loEdge)} to ${(0,format/* formatValue */.Fl)(bin.hiEdge)}`;
        const width = Math.max(1, x(bin.hiEdge) - x(bin.loEdge) - 1);
        const attrs = { class: 'bin', x: x(bin.loEdge), y: y(bin.density), width, height: y(0) - y(bin.density) };
        parts.push(svgElement('rect', attrs, `${(0,report_escape/* escapeHtml */.Z)(tip)} ${unit}`));
    }
    const ts = Array.from({ length: CURVE_POINTS + 1 }, (_, i) => toFit(d0) + ((toFit(d1) - toFit(d0)) * i) / CURVE_POINTS);
    const curve = (0,d3_shape/* line */.n8)()
        .x((t) => x(log ? Math.exp(t) : t))
        .y((t) => y(gaussianDensity(t, b.mean, b.sd)));
    const curveTip = `fitted Gaussian: mean ${(0,report_escape/* escapeHtml */.Z)((0,format/* formatValue */.Fl)(band.mean))} ${unit}${log ? ' (geometric)' : ''}`;
    parts.push(svgElement('path', { class: 'curve', d: curve(ts) ?? '' }, curveTip));
    const level = y(peak * cutoff);
    for (const edge of [band.low, band.high]) {
        const tip = `relative density = cutoff ${(0,report_escape/* escapeHtml */.Z)((0,format/* formatDensity */.a7)(cutoff))} at ${(0,report_escape/* escapeHtml */.Z)((0,format/* formatValue */.Fl)(edge))} ${unit}`;
        parts.push(svgElement('line', { class: 'cutoff', x1: x(edge), x2: x(edge), y1: y(0), y2: M.top }, tip));
    }
    parts.push(svgElement('line', { class: 'cutoff', x1: x(band.low), x2: x(band.high), y1: level, y2: level }));
    if (now !== undefined) {
        parts.push(svgElement('line', { class: 'now', x1: x(now), x2: x(now), y1: y(0), y2: M.top }));
        parts.push(statusSymbol(m.status, px(x(now)), px(y(0) - 9), `this run: ${(0,report_escape/* escapeHtml */.Z)((0,format/* formatValue */.Fl)(now))} ${unit} (${m.status})`));
    }
    if (offChart && given !== undefined) {
        const right = toFit(given) > b.mean;
        const edgeX = right ? W - M.right - 8 : M.left + 8;
        const shown = `${(0,report_escape/* escapeHtml */.Z)((0,format/* formatValue */.Fl)(given))} ${unit}`;
        const tip = `this run: ${shown} (${m.status}), beyond ${OFF_CHART_SD} sd: off the chart ${right ? 'to the right' : 'to the left'}`;
        parts.push(statusSymbol(m.status, px(edgeX), px(y(0) - 9), tip));
        // Above the plot, where no cutoff or run line reaches (they stop at M.top).
        const noteAttrs = { class: 'note', x: edgeX, y: M.top - 10, 'text-anchor': right ? 'end' : 'start' };
        parts.push(textElement(noteAttrs, `this run ${right ? '→' : '←'} ${shown}`));
    }
    const axes = bottomAxis(x, H - M.bottom, unit || 'value') + leftAxis(y, M.left, log ? 'density (per log unit)' : 'density');
    const title = `baseline of ${(0,report_escape/* escapeHtml */.Z)(m.name, 200)}: histogram and fitted density`;
    return chartSvg(W, H, title, axes + parts.join(''));
}

;// CONCATENATED MODULE: ./src/report/html-history-chart.ts








const html_history_chart_W = 560;
const html_history_chart_H = 220;
const html_history_chart_M = { top: 14, right: 18, bottom: 42, left: 72 };
const MIN_RUNS = 120;
const MAX_RUNS = 400;
/**
 * An SVG of a metric's history over runs (values from the history's column), with the fitted mean
 * as a dashed line, the band where the relative density stays above the cutoff shaded over the
 * baseline runs, and this run marked by its status shape after the last run (the newest 120-400
 * runs, as many as the baseline needs). On the log scale the
 * y axis is logarithmic, so the band reads symmetric as it was fitted. Every point has a <title>
 * tooltip (run id, time, value). Returns '' when there is nothing to draw.
 */
function historyChart(m, column, runs, cutoff) {
    const every = columnPoints(column, runs);
    const base = baselinePoints(every, m);
    // The newest runs only: enough to show the baseline and some before it, and a page of 500
    // metrics x 1000 runs stays a few MB.
    const shown = Math.min(runs.length, Math.min(MAX_RUNS, Math.max(MIN_RUNS, (m.baseline?.n ?? 0) + 20)));
    const start = runs.length - shown;
    const pts = every.filter((p) => p.index >= start);
    const now = m.value !== undefined && Number.isFinite(m.value) ? m.value : undefined;
    if (pts.length === 0 && now === undefined)
        return '';
    const band = cutoffBand(m, cutoff);
    const all = [...pts.map((p) => p.value), ...(now === undefined ? [] : [now]), ...(band ? [band.low, band.high] : [])];
    const log = m.baseline?.scale === 'log' && all.every((v) => v > 0);
    const y = valueScale(log, Math.min(...all), Math.max(...all), [html_history_chart_H - html_history_chart_M.bottom, html_history_chart_M.top]);
    const x = (0,d3_scale/* scaleLinear */.m4)()
        .domain([start, Math.max(start + 1, runs.length)])
        .range([html_history_chart_M.left, html_history_chart_W - html_history_chart_M.right]);
    const unit = m.unit === undefined ? '' : (0,report_escape/* escapeHtml */.Z)(m.unit, 40);
    const parts = [];
    if (band && base.length > 0) {
        const first = Math.max(start, base[0]?.index ?? 0);
        const shade = (0,d3_shape/* area */.Wc)()
            .x((i) => x(i))
            .y0(() => y(band.low))
            .y1(() => y(band.high));
        const bandTip = `density above the cutoff: ${(0,report_escape/* escapeHtml */.Z)((0,format/* formatValue */.Fl)(band.low))} to ${(0,report_escape/* escapeHtml */.Z)((0,format/* formatValue */.Fl)(band.high))} ${unit}`;
        parts.push(svgElement('path', { class: 'band', d: shade([first, runs.length]) ?? '' }, bandTip));
        const centre = (0,d3_shape/* line */.n8)()
            .x((i) => x(i))
            .y(() => y(band.mean));
        const meanTip = `fitted mean ${(0,report_escape/* escapeHtml */.Z)((0,format/* formatValue */.Fl)(band.mean))} ${unit}`;
        parts.push(svgElement('path', { class: 'mean', d: centre([first, runs.length]) ?? '' }, meanTip));
    }
    const trace = (0,d3_shape/* line */.n8)()
        .x((p) => x(p.index))
        .y((p) => y(p.value));
    if (pts.length > 1)
        parts.push(svgElement('path', { class: 'trace', d: trace(pts) ?? '' }));
    for (const p of pts) {
        const when = `${p.run.time ? ` · ${p.run.time}` : ''}${p.run.sha ? ` · ${p.run.sha.slice(0, 12)}` : ''}`;
        const tip = (0,report_escape/* escapeHtml */.Z)(`run ${p.run.id}${when}: ${(0,format/* formatValue */.Fl)(p.value)} ${m.unit ?? ''}`, 300);
        parts.push(svgElement('circle', { class: 'point', cx: x(p.index), cy: y(p.value), r: 2.6 }, tip));
    }
    if (now !== undefined) {
        const tip = `this run: ${(0,report_escape/* escapeHtml */.Z)((0,format/* formatValue */.Fl)(now))} ${unit} (${m.status})`;
        parts.push(statusSymbol(m.status, px(x(runs.length)), px(y(now)), tip));
    }
    const xLabel = start > 0 ? `run, newest ${shown} of ${runs.length} (last: this run)` : 'run, oldest to newest (last: this run)';
    const axes = bottomAxis(x, html_history_chart_H - html_history_chart_M.bottom, xLabel) + leftAxis(y, html_history_chart_M.left, unit || 'value');
    return chartSvg(html_history_chart_W, html_history_chart_H, `history of ${(0,report_escape/* escapeHtml */.Z)(m.name, 200)}`, axes + parts.join(''));
}

;// CONCATENATED MODULE: ./src/report/html-script.ts
/**
 * The report's only script: sort the summary table when a header button is clicked (numbers by
 * their data-sort value, text otherwise; click again to reverse). Without JavaScript the table
 * stays in the markup's order, by status. No network, no eval, no data from the page's text
 * reaches innerHTML: rows are moved, never rebuilt.
 */
const HTML_SCRIPT = `
(function () {
  var table = document.getElementById('summary');
  if (!table || !table.tBodies[0]) return;
  var body = table.tBodies[0];
  var heads = table.tHead.rows[0].cells;
  function key(row, col) {
    var cell = row.cells[col];
    var v = cell.getAttribute('data-sort');
    if (v === null) return cell.textContent.trim().toLowerCase();
    var n = parseFloat(v);
    return isNaN(n) ? v : n;
  }
  Array.prototype.forEach.call(heads, function (th, col) {
    var button = th.querySelector('button');
    if (!button) return;
    button.addEventListener('click', function () {
      var dir = th.getAttribute('aria-sort') === 'ascending' ? -1 : 1;
      Array.prototype.forEach.call(heads, function (h) { h.removeAttribute('aria-sort'); });
      th.setAttribute('aria-sort', dir === 1 ? 'ascending' : 'descending');
      var rows = Array.prototype.slice.call(body.rows);
      rows.sort(function (a, b) {
        var x = key(a, col), y = key(b, col);
        var xm = x === '' || x === 'n/a', ym = y === '' || y === 'n/a';
        if (xm !== ym) return xm ? 1 : -1;
        if (typeof x === 'number' && typeof y === 'number') return (x - y) * dir;
        return String(x).localeCompare(String(y)) * dir;
      });
      rows.forEach(function (r) { body.appendChild(r); });
    });
  });
})();
`;

// EXTERNAL MODULE: ./src/report/since-order.ts
var since_order = __webpack_require__(3801);
// EXTERNAL MODULE: ./src/report/since-words.ts
var since_words = __webpack_require__(3056);
;// CONCATENATED MODULE: ./src/report/html-since.ts








const html_since_W = 560;
const html_since_H = 200;
const html_since_M = { top: 14, right: 18, bottom: 40, left: 72 };
/** Metrics drawn at most; the rest are listed (a page of thousands of charts helps no one). */
const MAX_CHARTS = 60;
/**
 * An SVG of one metric's path from the reference to now: every recorded value from the first
 * run of the level-then window to the newest run, the reference as a vertical line, the level
 * then and the level now as dashed lines over their windows, and each step as a marked vertical
 * line with a tooltip (its size, first run, pull request). The y axis is logarithmic when the
 * review compared ratios. Returns '' when the history holds none of the metric's runs.
 */
function sincePathChart(m, report, history) {
    const ids = new Map(history.runs.map((r, i) => [r.id, i]));
    const from = ids.get(m.then?.from ?? report.reference.run) ?? ids.get(report.reference.run);
    const to = ids.get(report.latest.run);
    const column = history.columns.get(m.name);
    if (from === undefined || to === undefined || column === undefined)
        return '';
    const pts = [];
    for (let i = from; i <= to; i++) {
        const value = column.values[i];
        if (value !== undefined && Number.isFinite(value))
            pts.push({ index: i, value, run: history.runs[i] });
    }
    if (pts.length === 0)
        return '';
    const levels = [m.then?.level, m.now?.level].filter((v) => v !== undefined && Number.isFinite(v));
    const all = [...pts.map((p) => p.value), ...levels];
    const log = m.scale === 'log' && all.every((v) => v > 0);
    const y = valueScale(log, Math.min(...all), Math.max(...all), [html_since_H - html_since_M.bottom, html_since_M.top]);
    const x = (0,d3_scale/* scaleLinear */.m4)()
        .domain([from, Math.max(from + 1, to)])
        .range([html_since_M.left, html_since_W - html_since_M.right]);
    const unit = m.unit === undefined ? '' : (0,report_escape/* escapeHtml */.Z)(m.unit, 40);
    const parts = [];
    const vertical = (index, cls, tip) => svgElement('line', { class: cls, x1: x(index), x2: x(index), y1: html_since_M.top, y2: html_since_H - html_since_M.bottom }, tip);
    const reference = ids.get(report.reference.run);
    if (reference !== undefined)
        parts.push(vertical(reference, 'since-ref', `reference: run ${(0,report_escape/* escapeHtml */.Z)(report.reference.run, 100)}`));
    for (const [window, name] of [
        [m.then, 'then'],
        [m.now, 'now'],
    ]) {
        const a = window === undefined ? undefined : ids.get(window.from);
        const b = window === undefined ? undefined : ids.get(window.to);
        if (window === undefined || a === undefined || b === undefined)
            continue;
        const tip = `level ${name}: ${(0,report_escape/* escapeHtml */.Z)((0,format/* formatValue */.Fl)(window.level))} ${unit} (median of ${window.n} runs)`;
        parts.push(svgElement('line', {
            class: `mean since-${name}`,
            x1: x(a),
            x2: x(Math.max(b, a + 0.5)),
            y1: y(window.level),
            y2: y(window.level),
        }, tip));
    }
    for (const s of m.steps) {
        const at = ids.get(s.run);
        if (at === undefined)
            continue;
        const pr = s.pr === undefined ? '' : `, PR #${s.pr}`;
        const mark = s.mark ? `, ${s.mark.reason}` : '';
        parts.push(vertical(at, 'since-step', (0,report_escape/* escapeHtml */.Z)(`step ${(0,since_words/* ratioText */.B9)(s.ratio)} from run ${s.run}${pr}${mark}`, 300)));
        parts.push(textElement({ class: 'note', x: x(at) + 3, y: html_since_M.top + 10 }, (0,report_escape/* escapeHtml */.Z)((0,since_words/* ratioText */.B9)(s.ratio))));
    }
    const trace = (0,d3_shape/* line */.n8)()
        .x((p) => x(p.index))
        .y((p) => y(p.value));
    if (pts.length > 1)
        parts.push(svgElement('path', { class: 'trace', d: trace(pts) ?? '' }));
    for (const p of pts) {
        const tip = (0,report_escape/* escapeHtml */.Z)(`run ${p.run.id}${p.run.time ? ` · ${p.run.time}` : ''}: ${(0,format/* formatValue */.Fl)(p.value)} ${m.unit ?? ''}`, 300);
        parts.push(svgElement('circle', { class: 'point', cx: x(p.index), cy: y(p.value), r: 2.4 }, tip));
    }
    const axes = bottomAxis(x, html_since_H - html_since_M.bottom, 'run, from the level-then window to the newest') + leftAxis(y, html_since_M.left, unit || 'value');
    return chartSvg(html_since_W, html_since_H, `path of ${(0,report_escape/* escapeHtml */.Z)(m.name, 200)} since the reference`, axes + parts.join(''));
}
/**
 * The HTML report's release review section: the headline counts and range, how the reference was
 * matched, then per metric (worse first; the first MAX_CHARTS that have something to tell) its
 * sentence and its path chart; quiet metrics are listed by name. Everything from the history is
 * escaped.
 */
function sinceSection(report, history) {
    const ordered = (0,since_order/* sinceOrder */.v)(report.metrics);
    const told = ordered.filter(since_order/* noteworthy */.o);
    const quiet = ordered.filter((m) => !(0,since_order/* noteworthy */.o)(m));
    const drawn = told.slice(0, MAX_CHARTS).map((m) => {
        const chart = sincePathChart(m, report, history);
        const unit = m.unit === undefined ? '' : ` <span class="meta">(${(0,report_escape/* escapeHtml */.Z)(m.unit, 40)})</span>`;
        return (`<div class="since-metric" data-metric="${(0,report_escape/* escapeHtml */.Z)(m.name, 300)}"><h3><span class="s-${m.status === 'worse' ? 'regressed' : m.status === 'better' ? 'improved' : 'ok'}">${m.status}</span> ${(0,report_escape/* escapeHtml */.Z)(m.name, 300)}${unit}</h3>` +
            `<p class="reason">${(0,report_escape/* escapeHtml */.Z)((0,since_words/* metricSentence */.I9)(m, report), 1500)}</p>${chart || '<p class="note-text">No values to draw.</p>'}</div>`);
    });
    const more = told.length > MAX_CHARTS
        ? `<p class="note-text">…and ${told.length - MAX_CHARTS} more metrics with changes; see the JSON review.</p>`
        : '';
    const rest = quiet.length > 0
        ? `<p class="meta">Unchanged, new or gone without steps or creep: ${quiet.map((m) => (0,report_escape/* escapeHtml */.Z)(m.name, 300)).join(', ')}.</p>`
        : '';
    const note = report.reference.note ? `<p class="report-note">${(0,report_escape/* escapeHtml */.Z)(report.reference.note, 500)}.</p>` : '';
    return (`<section id="since" class="since"><h2>Release review: ${(0,report_escape/* escapeHtml */.Z)((0,since_words/* statusLine */.Bs)(report))}</h2>` +
        `<p class="meta">${(0,report_escape/* escapeHtml */.Z)((0,since_words/* rangeLine */.ye)(report, (t) => t), 600)}. Dots are recorded runs; the solid line is the reference, dashed lines the level then and now, red lines the steps.</p>` +
        note +
        (told.length === 0 ? '<p>No metric changed level, stepped or crept in this range.</p>' : drawn.join('')) +
        more +
        rest +
        `<p class="legend">${(0,report_escape/* escapeHtml */.Z)(since_words/* EVIDENCE_NOTE */.te)}</p></section>`);
}

;// CONCATENATED MODULE: ./src/report/html-style.ts
/**
 * The report's inline stylesheet. Status colours always come with a word and a shape; print
 * turns the page black on white, keeps charts whole on a page and hides the sort hints.
 */
const HTML_STYLE = `
:root { --fg: #1f2328; --muted: #59636e; --bg: #fff; --line: #d1d9e0; --band: #dbeafe; --mean: #1d4ed8;
  --bad: #b91c1c; --good: #15803d; --warn: #a16207; --dot: #374151; }
@media (prefers-color-scheme: dark) { :root { --fg: #e6edf3; --muted: #9198a1; --bg: #0d1117; --line: #3d444d;
  --band: #1e3a5f; --mean: #93c5fd; --bad: #f87171; --good: #4ade80; --warn: #facc15; --dot: #c9d1d9; } }
* { box-sizing: border-box; }
body { font: 14px/1.45 system-ui, -apple-system, "Segoe UI", sans-serif; color: var(--fg); background: var(--bg);
  margin: 0 auto; padding: 1.5rem; max-width: 1080px; }
h1 { font-size: 1.5rem; margin: 0 0 .25rem; } h2 { font-size: 1.15rem; margin: 0 0 .25rem; overflow-wrap: anywhere; }
.meta, .reason, .note-text { color: var(--muted); }
.verdict { font-size: 1.1rem; margin: .5rem 0 1rem; }
.report-note { border-left: 4px solid #d29922; padding: .25rem .75rem; margin: .5rem 0; }
table { border-collapse: collapse; width: 100%; margin-bottom: 1.5rem; }
th, td { text-align: left; padding: .3rem .5rem; border-bottom: 1px solid var(--line); vertical-align: top; }
td.num, th.num { text-align: right; font-variant-numeric: tabular-nums; white-space: nowrap; }
td:first-child { white-space: nowrap; }
td.name { overflow-wrap: anywhere; max-width: 22rem; }
th button { font: inherit; font-weight: 600; color: inherit; background: none; border: 0; padding: 0; cursor: pointer; }
th button::after { content: " ↕"; color: var(--muted); }
th[aria-sort="ascending"] button::after { content: " ↑"; } th[aria-sort="descending"] button::after { content: " ↓"; }
.s-regressed { color: var(--bad); font-weight: 600; } .s-improved { color: var(--good); } .s-missing { color: var(--warn); }
.s-learning, .s-new, .s-ignored { color: var(--muted); }
section.metric { border-top: 1px solid var(--line); padding: 1rem 0; }
.charts { display: flex; flex-wrap: wrap; gap: 1rem; }
svg.chart { max-width: 100%; height: auto; overflow: visible; }
svg text { fill: var(--fg); font-size: 11px; } svg .axis line { stroke: var(--muted); } svg .axis-label { font-size: 12px; }
svg .band { fill: var(--band); } svg .mean { stroke: var(--mean); stroke-dasharray: 6 4; fill: none; stroke-width: 1.5; }
svg .trace { stroke: var(--dot); stroke-opacity: .45; fill: none; } svg .point { fill: var(--dot); }
svg .bin { fill: var(--band); stroke: var(--mean); stroke-width: .5; } svg .curve { stroke: var(--mean); fill: none; stroke-width: 2; }
svg .cutoff { stroke: var(--warn); stroke-dasharray: 4 3; stroke-width: 1.5; } svg .now { stroke: var(--fg); stroke-dasharray: 2 2; }
svg .run-mark { fill: var(--fg); stroke: var(--bg); stroke-width: 1; }
svg .run-mark.s-regressed { fill: var(--bad); } svg .run-mark.s-improved { fill: var(--good); }
svg .note { font-size: 11px; paint-order: stroke; stroke: var(--bg); stroke-width: 3px; }
section.since { border-top: 2px solid var(--line); padding: 1rem 0; } .since-metric h3 { font-size: 1rem; margin: .75rem 0 .25rem; }
svg .since-ref { stroke: var(--fg); stroke-width: 1.5; } svg .since-step { stroke: var(--bad); stroke-dasharray: 3 2; stroke-width: 1.5; }
.legend { color: var(--muted); font-size: 12px; margin: .25rem 0 0; }
footer { color: var(--muted); font-size: 12px; margin-top: 2rem; }
@media print {
  :root { --fg: #000; --muted: #333; --bg: #fff; --band: #e5e7eb; --mean: #000; --bad: #000; --good: #000; --warn: #000; --dot: #000; }
  body { padding: 0; max-width: none; font-size: 11pt; }
  th button::after { content: ""; }
  section.metric { break-inside: avoid; page-break-inside: avoid; }
  a { color: inherit; text-decoration: none; }
}
`;

// EXTERNAL MODULE: ./src/report/reason.ts
var report_reason = __webpack_require__(8880);
// EXTERNAL MODULE: ./src/report/status.ts
var report_status = __webpack_require__(6934);
;// CONCATENATED MODULE: ./src/report/html.ts












// No network at all: the page may only use its own inline style and script, and data: images.
const CSP = "default-src 'none'; style-src 'unsafe-inline'; script-src 'unsafe-inline'; img-src data:";
const COLUMNS = [
    'status',
    'metric',
    'this run',
    'baseline (mean ± sd)',
    'change',
    'sigma',
    'rel. density vs cutoff',
    'detectable',
];
const NUMERIC = new Set([2, 4, 5, 6, 7]);
const LEGEND = '<p class="legend">Charts: dots are baseline-branch runs; the shaded band is where the fitted density stays above ' +
    'the cutoff; the dashed line is the fitted mean; this run is the large mark (▲ the worse side, regressed; ▼ the better side, improved; ● ok). ' +
    'Histograms show the baseline runs, the fitted density and the cutoff (dashed).</p>';
const sortAttr = (x) => (x !== undefined && Number.isFinite(x) ? ` data-sort="${x}"` : '');
function summaryRow(m, i) {
    const c = (0,cells/* metricCells */.G)(m, m.unit === undefined ? undefined : (0,report_escape/* escapeHtml */.Z)(m.unit, 40));
    return (`<tr class="s-${m.status}"><td data-sort="${(0,report_status/* statusRank */.Tx)(m.status)}">${report_status/* STATUS_GLYPH */.id[m.status]} ${m.status}</td>` +
        `<td class="name"><a href="#m${i}">${(0,report_escape/* escapeHtml */.Z)(m.name, 300)}</a></td>` +
        `<td class="num"${sortAttr(m.value)}>${c.value}</td><td class="num">${c.baseline}</td>` +
        `<td class="num"${sortAttr(m.change)}>${c.change}</td><td class="num"${sortAttr(m.z)}>${c.sigma}</td>` +
        `<td class="num"${sortAttr(m.relativeDensity)}>${(0,report_escape/* escapeHtml */.Z)(c.density)}</td>` +
        `<td class="num"${sortAttr(m.detectable)}>${(0,report_escape/* escapeHtml */.Z)(c.detectable)}</td></tr>`);
}
function metricSection(m, i, history, report) {
    const column = chartColumn(history, m);
    const baseValues = baselinePoints(columnPoints(column, history.runs), m).map((p) => p.value);
    // A chart whose coordinates overflowed (values near the largest double) is left out, not drawn wrong.
    const cutoff = m.effectiveCutoff ?? m.cutoff;
    const charts = [historyChart(m, column, history.runs, cutoff), baselineHistogram(m, baseValues, cutoff)]
        .filter((s) => s !== '')
        .map((s) => /\bNaN\b|Infinity/.test(s) ? '<p class="note-text">This chart cannot be drawn for these values.</p>' : s);
    const unit = m.unit === undefined ? '' : ` <span class="meta">(${(0,report_escape/* escapeHtml */.Z)(m.unit, 40)})</span>`;
    const reason = (0,report_escape/* escapeHtml */.Z)((0,report_reason/* fullReason */.EZ)(m, report), 1500).replace(/([^.!?])$/, '$1.');
    const scale = m.baseline?.scale === 'log' ? ' Fitted on the log scale.' : '';
    const judged = m.z === undefined
        ? ''
        : ' Judged on its own move by the predictive Student-t of its own moves, whose tails are fitted to the history (heavier than the Gaussian band drawn).';
    const ratio = m.baseline?.relativeTo !== undefined
        ? ` Judged beside the move of ${(0,report_escape/* escapeHtml */.Z)(m.baseline.relativeTo, 300)} in the same run.`
        : '';
    return (`<section class="metric" id="m${i}"><h2><span class="s-${m.status}">${report_status/* STATUS_GLYPH */.id[m.status]} ${m.status}</span> ${(0,report_escape/* escapeHtml */.Z)(m.name, 300)}${unit}</h2>` +
        `<p class="reason">${reason}${scale}${ratio}${judged}</p>` +
        (charts.length > 0
            ? `<div class="charts">${charts.join('')}</div>`
            : '<p class="note-text">No values to draw yet.</p>') +
        '</section>');
}
/**
 * One self-contained HTML page for a report and its history: a summary table of all metrics by
 * status (sortable by its headers when JavaScript runs; readable without), then per metric an SVG
 * of its history with the fitted mean, the band where the relative density stays above the cutoff
 * (mean ± sqrt(-2 ln cutoff) sd; on the log scale when the fit was) and this run, and an SVG
 * histogram of the baseline with the fitted density and the cutoff. Inline CSS, SVG and script
 * only, under a Content-Security-Policy that forbids any network access. Everything from metric
 * files is escaped.
 * @example renderHtmlReport({ report, history }).startsWith('<!doctype html>') // true
 */
function renderHtmlReport(input) {
    const { report, history } = input;
    const title = (0,report_escape/* escapeHtml */.Z)(input.title ?? `Bellgate report: ${report.series}`, 300);
    const order = report.metrics
        .map((m, i) => ({ m, i }))
        .sort((a, b) => (0,report_status/* statusRank */.Tx)(a.m.status) - (0,report_status/* statusRank */.Tx)(b.m.status) || a.i - b.i);
    const head = COLUMNS.map((c, k) => `<th scope="col"${NUMERIC.has(k) ? ' class="num"' : ''}><button type="button">${c}</button></th>`);
    const shared = report.shared.map((g) => `<li><span class="s-${g.status === 'unsettled' ? 'regressed' : 'ok'}">${g.status}</span> shared move of ` +
        `<strong>${(0,report_escape/* escapeHtml */.Z)(g.name, 300)}</strong>: ${(0,report_escape/* escapeHtml */.Z)((0,report_reason/* sharedReason */.KM)(g), 1500)}</li>`);
    const verdictClass = report.verdict === 'regressed' ? 'regressed' : 'ok';
    const counts = (0,report_status/* statusCounts */.rc)(report.metrics.map((m) => m.status)) || 'no metrics';
    return [
        '<!doctype html>',
        '<html lang="en"><head><meta charset="utf-8">',
        `<meta http-equiv="Content-Security-Policy" content="${CSP}">`,
        '<meta name="viewport" content="width=device-width, initial-scale=1">',
        `<title>${title}</title><style>${HTML_STYLE}</style></head><body>`,
        `<header><h1>${title}</h1><p class="meta">series ${(0,report_escape/* escapeHtml */.Z)(report.series, 300)} · ` +
            `${history.runs.length} runs in the history · ${(0,report_escape/* escapeHtml */.Z)((0,family_line/* familyLine */.l)(report))}</p>`,
        ...(0,notes/* reportNotes */.W)(report, (t) => t).map((note) => `<p class="report-note">${(0,report_escape/* escapeHtml */.Z)(note, 2000)}</p>`),
        `<p class="verdict"><strong class="s-${verdictClass}">${report.verdict}</strong> — ` +
            `${(0,report_escape/* escapeHtml */.Z)(report_status/* VERDICT_HEADLINE */.pB[report.verdict])}. ${counts}.</p></header>`,
        '<main><table id="summary"><caption class="meta">All metrics, regressions first. Click a header to sort.</caption>',
        `<thead><tr>${head.join('')}</tr></thead><tbody>${order.map(({ m, i }) => summaryRow(m, i)).join('')}</tbody></table>`,
        shared.length > 0 ? `<h2>Shared moves</h2><ul>${shared.join('')}</ul>` : '',
        LEGEND,
        order.map(({ m, i }) => metricSection(m, i, history, report)).join(''),
        input.since ? sinceSection(input.since.report, input.since.history) : '',
        `</main><footer>Generated by Bellgate${input.generatedAt ? ` at ${(0,report_escape/* escapeHtml */.Z)(input.generatedAt, 100)}` : ''}. ` +
            `Schema ${(0,report_escape/* escapeHtml */.Z)(report.schema)}.</footer>`,
        `<script>${HTML_SCRIPT}</script></body></html>`,
        '',
    ].join('\n');
}

// EXTERNAL MODULE: ./src/cli/judge-requested-run.ts + 1 modules
var judge_requested_run = __webpack_require__(8370);
// EXTERNAL MODULE: ./src/cli/paths.ts
var paths = __webpack_require__(5450);
// EXTERNAL MODULE: ./src/cli/run/since.ts + 18 modules
var run_since = __webpack_require__(8304);
;// CONCATENATED MODULE: ./src/cli/run/report.ts






/**
 * The work of `bellgate report` (loaded only when that command runs, so d3 and the HTML code are
 * never loaded by the others): judges the run and writes the self-contained HTML file.
 * @throws InputError (bad files, flags), StoreError (history unreadable).
 * @example await runReport(ctx, { history: 'h.json', html: 'report.html', series: 'default' })
 */
async function runReport(ctx, options) {
    const { history, report } = await (0,judge_requested_run/* judgeRequestedRun */.v)(ctx, options);
    const since = options.since === undefined ? undefined : await (0,run_since/* reviewSinceRef */.A)(ctx, options.since, options);
    const html = renderHtmlReport({
        report,
        history,
        ...(since === undefined ? {} : { since }),
        title: options.title ?? `Bellgate report: ${options.series}`,
        generatedAt: ctx.now().toISOString(),
    });
    const out = (0,paths/* resolvePath */.o)(ctx, options.html);
    await (0,promises_.mkdir)((0,external_node_path_.dirname)(out), { recursive: true });
    await (0,promises_.writeFile)(out, html);
    ctx.io.stdout(`wrote ${out} (verdict ${report.verdict}, ${report.metrics.length} metrics)\n`);
}


/***/ })

};
