import { median, medianAbsoluteDeviation } from 'simple-statistics';
import { MAD_TO_SIGMA } from './fit.js';

/** Options of detectChangePoints. */
export interface ChangePointOptions {
  /** Cost of one more change, in units of the clipped noise's variance. Default 3 ln(n). */
  penalty?: number;
  /** Shortest segment allowed (runs). Default 5. */
  minSegment?: number;
  /** Standardised values are clipped to +-clip before the cost (a slow run costs at most clip^2). Default 3. */
  clip?: number;
}

/**
 * The noise sigma of a series from successive differences, so level shifts barely bias it:
 * x_{t+1} - x_t has variance 2 sigma^2 within a segment, and a step touches one difference only.
 * Robust (1.4826 MAD / sqrt 2), falling back to the root mean square of the differences for
 * quantised data whose MAD is 0.
 */
export function differenceSigma(values: ArrayLike<number>): number {
  if (values.length < 2) return 0;
  const diffs = new Array<number>(values.length - 1);
  for (let i = 1; i < values.length; i++) diffs[i - 1] = values[i]! - values[i - 1]!;
  const robust = (MAD_TO_SIGMA * medianAbsoluteDeviation(diffs)) / Math.SQRT2;
  if (robust > 0) return robust;
  let squares = 0;
  for (const d of diffs) squares += d * d;
  return Math.sqrt(squares / (2 * diffs.length));
}

/**
 * Where the level of a series changes, by optimal partitioning (Jackson et al. 2005, "An algorithm
 * for optimal partitioning of data on an interval", IEEE Signal Processing Letters 12; the recursion
 * PELT prunes, Killick, Fearnhead & Eckley 2012): the exact minimiser of
 *   sum over segments of C(segment) + penalty x (number of changes),
 * C the Gaussian cost of a change in mean on the standardised values clipped at +-clip, a
 * Huber-style robust cost (cf. Fearnhead & Rigaill 2019, "Changepoint detection in the presence of
 * outliers", JASA 114): a slow run costs at most clip^2, so a few slow runs do not buy a segment.
 * The values are standardised by their median and differenceSigma; the penalty is in units of the
 * clipped noise's own variance (estimated from the clipped successive differences), so it is
 * calibrated to the tails the series has: heavy tails raise the price of a change. Only the mean
 * is modelled. Returns the indices where new segments start, ascending; empty when none (also for
 * a constant series or fewer than 2 x minSegment values). O(n^2): n is a window of runs, short
 * enough that PELT's pruning would only add code.
 * Throws RangeError on non-finite values or bad options.
 * @example detectChangePoints([...Array(40).fill(100), ...Array(30).fill(110)].map((x, i) => x + (i % 2) * 0.5)) // [40]
 */
export function detectChangePoints(values: ArrayLike<number>, options: ChangePointOptions = {}): number[] {
  const n = values.length;
  const minSegment = options.minSegment ?? 5;
  if (!Number.isInteger(minSegment) || minSegment < 1) {
    throw new RangeError(`minSegment must be a whole number, 1 or more, got ${minSegment}`);
  }
  const clip = options.clip ?? 3;
  if (options.penalty !== undefined && !(options.penalty >= 0 && Number.isFinite(options.penalty))) {
    throw new RangeError(`penalty must be a finite number, 0 or more, got ${options.penalty}`);
  }
  for (let i = 0; i < n; i++) {
    if (!Number.isFinite(values[i]!))
      throw new RangeError(`value ${values[i]} at position ${i + 1} is not a finite number`);
  }
  if (n < 2 * minSegment) return [];
  const sigma = differenceSigma(values);
  if (!(sigma > 0)) return [];
  const centre = median(Array.from(values));
  const z = new Float64Array(n);
  for (let i = 0; i < n; i++) z[i] = Math.max(-clip, Math.min(clip, (values[i]! - centre) / sigma));
  let noise = 0;
  for (let i = 1; i < n; i++) noise += Math.min(clip * clip, (z[i]! - z[i - 1]!) ** 2 / 2);
  noise = Math.max(noise / (n - 1), 1e-12);
  const penalty = (options.penalty ?? 3 * Math.log(n)) * noise;
  // Prefix sums: the cost of values a..b-1 is s2 - s1^2 / length over that stretch.
  const s1 = new Float64Array(n + 1);
  const s2 = new Float64Array(n + 1);
  for (let i = 0; i < n; i++) {
    s1[i + 1] = s1[i]! + z[i]!;
    s2[i + 1] = s2[i]! + z[i]! * z[i]!;
  }
  // best[t]: the least total for the first t values; previous[t]: where its last segment starts.
  const best = new Float64Array(n + 1).fill(Infinity);
  const previous = new Int32Array(n + 1);
  best[0] = -penalty;
  const candidates: number[] = [];
  for (let end = minSegment; end <= n; end++) {
    const fresh = end - minSegment;
    if (fresh === 0 || fresh >= minSegment) candidates.push(fresh);
    let value = Infinity;
    let start = 0;
    for (const a of candidates) {
      const sum = s1[end]! - s1[a]!;
      const total = best[a]! + Math.max(0, s2[end]! - s2[a]! - (sum * sum) / (end - a)) + penalty;
      if (total < value) {
        value = total;
        start = a;
      }
    }
    best[end] = value;
    previous[end] = start;
  }
  const starts: number[] = [];
  for (let at = previous[n]!; at > 0; at = previous[at]!) starts.push(at);
  return starts.reverse();
}
