import { scaleLinear } from 'd3-scale';
import { area, line } from 'd3-shape';
import type { MetricResult } from '../gate/report.js';
import type { MetricColumn, RunInfo } from '../history/history.js';
import { bottomAxis, leftAxis, valueScale } from './html-axis.js';
import { baselinePoints, columnPoints, cutoffBand, type ChartPoint } from './html-data.js';
import { statusSymbol } from './html-symbol.js';
import { chartSvg, px, svgElement } from './html-svg.js';
import { escapeHtml } from './escape.js';
import { formatValue } from './format.js';

const W = 560;
const H = 220;
const M = { top: 14, right: 18, bottom: 42, left: 72 };
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
export function historyChart(
  m: MetricResult,
  column: MetricColumn | undefined,
  runs: readonly RunInfo[],
  cutoff: number,
): string {
  const every = columnPoints(column, runs);
  const base = baselinePoints(every, m);
  // The newest runs only: enough to show the baseline and some before it, and a page of 500
  // metrics x 1000 runs stays a few MB.
  const shown = Math.min(runs.length, Math.min(MAX_RUNS, Math.max(MIN_RUNS, (m.baseline?.n ?? 0) + 20)));
  const start = runs.length - shown;
  const pts = every.filter((p) => p.index >= start);
  const now = m.value !== undefined && Number.isFinite(m.value) ? m.value : undefined;
  if (pts.length === 0 && now === undefined) return '';
  const band = cutoffBand(m, cutoff);
  const all = [...pts.map((p) => p.value), ...(now === undefined ? [] : [now]), ...(band ? [band.low, band.high] : [])];
  const log = m.baseline?.scale === 'log' && all.every((v) => v > 0);
  const y = valueScale(log, Math.min(...all), Math.max(...all), [H - M.bottom, M.top]);
  const x = scaleLinear()
    .domain([start, Math.max(start + 1, runs.length)])
    .range([M.left, W - M.right]);
  const unit = m.unit === undefined ? '' : escapeHtml(m.unit, 40);
  const parts: string[] = [];
  if (band && base.length > 0) {
    const first = Math.max(start, base[0]?.index ?? 0);
    const shade = area<number>()
      .x((i) => x(i))
      .y0(() => y(band.low))
      .y1(() => y(band.high));
    const bandTip = `density above the cutoff: ${escapeHtml(formatValue(band.low))} to ${escapeHtml(formatValue(band.high))} ${unit}`;
    parts.push(svgElement('path', { class: 'band', d: shade([first, runs.length]) ?? '' }, bandTip));
    const centre = line<number>()
      .x((i) => x(i))
      .y(() => y(band.mean));
    const meanTip = `fitted mean ${escapeHtml(formatValue(band.mean))} ${unit}`;
    parts.push(svgElement('path', { class: 'mean', d: centre([first, runs.length]) ?? '' }, meanTip));
  }
  const trace = line<ChartPoint>()
    .x((p) => x(p.index))
    .y((p) => y(p.value));
  if (pts.length > 1) parts.push(svgElement('path', { class: 'trace', d: trace(pts) ?? '' }));
  for (const p of pts) {
    const when = `${p.run.time ? ` · ${p.run.time}` : ''}${p.run.sha ? ` · ${p.run.sha.slice(0, 12)}` : ''}`;
    const tip = escapeHtml(`run ${p.run.id}${when}: ${formatValue(p.value)} ${m.unit ?? ''}`, 300);
    parts.push(svgElement('circle', { class: 'point', cx: x(p.index), cy: y(p.value), r: 2.6 }, tip));
  }
  if (now !== undefined) {
    const tip = `this run: ${escapeHtml(formatValue(now))} ${unit} (${m.status})`;
    parts.push(statusSymbol(m.status, px(x(runs.length)), px(y(now)), tip));
  }
  const xLabel =
    start > 0 ? `run, newest ${shown} of ${runs.length} (last: this run)` : 'run, oldest to newest (last: this run)';
  const axes = bottomAxis(x, H - M.bottom, xLabel) + leftAxis(y, M.left, unit || 'value');
  return chartSvg(W, H, `history of ${escapeHtml(m.name, 200)}`, axes + parts.join(''));
}
