import { scaleLinear, scaleLog } from 'd3-scale';
import type { ScaleLinear, ScaleLogarithmic } from 'd3-scale';
import { escapeHtml } from './escape.js';
import { px, svgElement, textElement } from './html-svg.js';

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
      const x = scale(t);
      const text = labels[i] ?? '';
      const tick = svgElement('line', { x1: x, x2: x, y1: y, y2: y + 5 });
      return text ? tick + textElement({ x, y: y + 17, 'text-anchor': 'middle' }, escapeHtml(text)) : tick;
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
export function leftAxis(scale: AxisScale, x: number, label: string, count = 5): string {
  const [y0 = 0, y1 = 0] = scale.range();
  const values = scale.ticks(count);
  const labels = tickLabels(scale, values, count);
  const ticks = values
    .map((t, i) => {
      const y = scale(t);
      const text = labels[i] ?? '';
      const tick = svgElement('line', { x1: x - 5, x2: x, y1: y, y2: y });
      return text ? tick + textElement({ x: x - 8, y, dy: '0.32em', 'text-anchor': 'end' }, escapeHtml(text)) : tick;
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
