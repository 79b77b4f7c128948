import { scaleLinear } from 'd3-scale';
import { line } from 'd3-shape';
import type { MetricResult } from '../gate/report.js';
import { gaussianDensity } from '../model/density.js';
import { bottomAxis, leftAxis, valueScale } from './html-axis.js';
import { cutoffBand } from './html-data.js';
import { statusSymbol } from './html-symbol.js';
import { chartSvg, px, svgElement, textElement } from './html-svg.js';
import { escapeHtml } from './escape.js';
import { formatDensity, formatValue } from './format.js';

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
export function baselineHistogram(m: MetricResult, values: readonly number[], cutoff: number): string {
  const b = m.baseline;
  const band = cutoffBand(m, cutoff);
  const log = b?.scale === 'log';
  const vals = values.filter((v) => Number.isFinite(v) && (!log || v > 0));
  if (!b || !band || !(b.sd > 0 && Number.isFinite(b.sd)) || vals.length === 0) return '';
  const toFit = (v: number): number => (log ? Math.log(v) : v);
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
  const y = scaleLinear()
    .domain([0, top])
    .range([H - M.bottom, M.top])
    .nice();
  const unit = m.unit === undefined ? '' : escapeHtml(m.unit, 40);
  const parts: string[] = [];
  for (const bin of bins) {
    if (bin.count === 0) continue;
    const tip = `${bin.count} run${bin.count === 1 ? '' : 's'} in ${formatValue(bin.loEdge)} to ${formatValue(bin.hiEdge)}`;
    const width = Math.max(1, x(bin.hiEdge) - x(bin.loEdge) - 1);
    const attrs = { class: 'bin', x: x(bin.loEdge), y: y(bin.density), width, height: y(0) - y(bin.density) };
    parts.push(svgElement('rect', attrs, `${escapeHtml(tip)} ${unit}`));
  }
  const ts = Array.from(
    { length: CURVE_POINTS + 1 },
    (_, i) => toFit(d0) + ((toFit(d1) - toFit(d0)) * i) / CURVE_POINTS,
  );
  const curve = line<number>()
    .x((t) => x(log ? Math.exp(t) : t))
    .y((t) => y(gaussianDensity(t, b.mean, b.sd)));
  const curveTip = `fitted Gaussian: mean ${escapeHtml(formatValue(band.mean))} ${unit}${log ? ' (geometric)' : ''}`;
  parts.push(svgElement('path', { class: 'curve', d: curve(ts) ?? '' }, curveTip));
  const level = y(peak * cutoff);
  for (const edge of [band.low, band.high]) {
    const tip = `relative density = cutoff ${escapeHtml(formatDensity(cutoff))} at ${escapeHtml(formatValue(edge))} ${unit}`;
    parts.push(svgElement('line', { class: 'cutoff', x1: x(edge), x2: x(edge), y1: y(0), y2: M.top }, tip));
  }
  parts.push(svgElement('line', { class: 'cutoff', x1: x(band.low), x2: x(band.high), y1: level, y2: level }));
  if (now !== undefined) {
    parts.push(svgElement('line', { class: 'now', x1: x(now), x2: x(now), y1: y(0), y2: M.top }));
    parts.push(
      statusSymbol(
        m.status,
        px(x(now)),
        px(y(0) - 9),
        `this run: ${escapeHtml(formatValue(now))} ${unit} (${m.status})`,
      ),
    );
  }
  if (offChart && given !== undefined) {
    const right = toFit(given) > b.mean;
    const edgeX = right ? W - M.right - 8 : M.left + 8;
    const shown = `${escapeHtml(formatValue(given))} ${unit}`;
    const tip = `this run: ${shown} (${m.status}), beyond ${OFF_CHART_SD} sd: off the chart ${right ? 'to the right' : 'to the left'}`;
    parts.push(statusSymbol(m.status, px(edgeX), px(y(0) - 9), tip));
    // Above the plot, where no cutoff or run line reaches (they stop at M.top).
    const noteAttrs = { class: 'note', x: edgeX, y: M.top - 10, 'text-anchor': right ? 'end' : 'start' };
    parts.push(textElement(noteAttrs, `this run ${right ? '→' : '←'} ${shown}`));
  }
  const axes =
    bottomAxis(x, H - M.bottom, unit || 'value') + leftAxis(y, M.left, log ? 'density (per log unit)' : 'density');
  const title = `baseline of ${escapeHtml(m.name, 200)}: histogram and fitted density`;
  return chartSvg(W, H, title, axes + parts.join(''));
}
