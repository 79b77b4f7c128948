import { scaleLinear, scaleLog } from 'd3-scale';
import type { ScaleLinear, ScaleLogarithmic } from 'd3-scale';
import { escapeHtml } from './escape.js';

/** The scales the charts use; both give ticks and a matching tick format (d3-scale). */
export type AxisScale = ScaleLinear<number, number> | ScaleLogarithmic<number, number>;

/**
 * Tick labels from the scale's own tickFormat. A log scale's format skips ticks away from powers
 * of ten, which can leave a log axis narrower than a decade (35 to 48 ms) almost bare; there the
 * linear format of the same domain labels every tick.
 */
function tickLabels(scale: AxisScale, ticks: number[], count: number): string[] {
  const own = ticks.map(scale.tickFormat(count));
  const [a = 1, b = 1] = scale.domain();
  if ('base' in scale && own.includes('') && Math.max(a, b) / Math.min(a, b) < 10) {
    const linear = scaleLinear().domain(scale.domain()).tickFormat(count);
    return ticks.map(linear);
  }
  return own;
}

/** SVG coordinates with two decimals: enough for a screen, and non-finite values never leak in. */
export const px = (x: number): number => (Number.isFinite(x) ? Math.round(x * 100) / 100 : 0);

/**
 * A horizontal axis at height `y`: a baseline, d3-scale's ticks with their own format, and an
 * escaped label centred under it.
 */
export function bottomAxis(scale: AxisScale, y: number, label: string, count = 6): string {
  const [x0 = 0, x1 = 0] = scale.range();
  const values = scale.ticks(count);
  const labels = tickLabels(scale, values, count);
  const ticks = values
    .map((t, i) => {
      const x = px(scale(t));
      const text = labels[i] ?? '';
      return `<line x1="${x}" x2="${x}" y1="${px(y)}" y2="${px(y + 5)}"/>` + (text ? `<text x="${x}" y="${px(y + 17)}" text-anchor="middle">${escapeHtml(text)}</text>` : '');
    })
    .join('');
  return `<g class="axis"><line x1="${px(x0)}" x2="${px(x1)}" y1="${px(y)}" y2="${px(y)}"/>${ticks}<text class="axis-label" x="${px((x0 + x1) / 2)}" y="${px(y + 32)}" text-anchor="middle">${label}</text></g>`;
}

/** A vertical axis at `x`, ticks to the left, label rotated along it. `label` must be escaped. */
export function leftAxis(scale: AxisScale, x: number, label: string, count = 5): string {
  const [y0 = 0, y1 = 0] = scale.range();
  const values = scale.ticks(count);
  const labels = tickLabels(scale, values, count);
  const ticks = values
    .map((t, i) => {
      const y = px(scale(t));
      const text = labels[i] ?? '';
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
  if (!log || !(a > 0) || !Number.isFinite(b)) return scaleLinear().domain([lo, hi]).range(range).nice();
  return scaleLog().domain([a, b]).range(range);
}
