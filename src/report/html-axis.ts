import { scaleLinear, scaleLog } from 'd3-scale';
import type { ScaleLinear, ScaleLogarithmic } from 'd3-scale';
import { escapeHtml } from './escape.js';

/** The scales the charts use; both give ticks and a matching tick format (d3-scale). */
export type AxisScale = ScaleLinear<number, number> | ScaleLogarithmic<number, number>;

/** SVG coordinates with two decimals: enough for a screen, and non-finite values never leak in. */
export const px = (x: number): number => (Number.isFinite(x) ? Math.round(x * 100) / 100 : 0);

/**
 * A horizontal axis at height `y`: a baseline, d3-scale's ticks with their own format, and an
 * escaped label centred under it.
 */
export function bottomAxis(scale: AxisScale, y: number, label: string, count = 6): string {
  const [x0 = 0, x1 = 0] = scale.range();
  const format = scale.tickFormat(count);
  const ticks = scale
    .ticks(count)
    .map((t) => {
      const x = px(scale(t));
      const text = format(t);
      return `<line x1="${x}" x2="${x}" y1="${px(y)}" y2="${px(y + 5)}"/>` + (text ? `<text x="${x}" y="${px(y + 17)}" text-anchor="middle">${escapeHtml(text)}</text>` : '');
    })
    .join('');
  return `<g class="axis"><line x1="${px(x0)}" x2="${px(x1)}" y1="${px(y)}" y2="${px(y)}"/>${ticks}<text class="axis-label" x="${px((x0 + x1) / 2)}" y="${px(y + 32)}" text-anchor="middle">${label}</text></g>`;
}

/** A vertical axis at `x`, ticks to the left, label rotated along it. `label` must be escaped. */
export function leftAxis(scale: AxisScale, x: number, label: string, count = 5): string {
  const [y0 = 0, y1 = 0] = scale.range();
  const format = scale.tickFormat(count);
  const ticks = scale
    .ticks(count)
    .map((t) => {
      const y = px(scale(t));
      const text = format(t);
      return `<line x1="${px(x - 5)}" x2="${px(x)}" y1="${y}" y2="${y}"/>` + (text ? `<text x="${px(x - 8)}" y="${y}" dy="0.32em" text-anchor="end">${escapeHtml(text)}</text>` : '');
    })
    .join('');
  const mid = px((y0 + y1) / 2);
  return `<g class="axis"><line x1="${px(x)}" x2="${px(x)}" y1="${px(y0)}" y2="${px(y1)}"/>${ticks}<text class="axis-label" transform="translate(${px(x - 52)},${mid}) rotate(-90)" text-anchor="middle">${label}</text></g>`;
}

/**
 * A value scale over [lo, hi] onto `range`: linear with d3's nice() round ends, or logarithmic
 * padded by 4% of the span in log units (nice() on a log scale widens to whole decades, which
 * would flatten a 3% spread into a line).
 */
export function valueScale(log: boolean, lo: number, hi: number, range: [number, number]): AxisScale {
  if (lo === hi) {
    const d = lo === 0 ? 1 : Math.abs(lo) * 0.05;
    [lo, hi] = log ? [lo / 1.05, hi * 1.05] : [lo - d, hi + d];
  }
  if (!log) return scaleLinear().domain([lo, hi]).range(range).nice();
  const pad = (hi / lo) ** 0.04;
  return scaleLog().domain([lo / pad, hi * pad]).range(range);
}
