import { InputError } from '../errors/input-error.js';
import { MAD_TO_SIGMA } from './fit.js';
import { medianInPlace } from './median.js';

/** Options of detectChangePoints. */
export interface ChangePointOptions {
  /** Cost of one more change, in units of the noise variance. Default 3 ln(n). */
  penalty?: number;
  /** Shortest segment allowed (runs). Default 5. */
  minSegment?: number;
}

/**
 * Scratch buffers shared by every call (the gate runs this once per metric; fresh typed arrays per
 * call were most of its cost). Grown on demand, never shrunk; safe because a call never yields
 * and nothing it calls re-enters detectChangePoints.
 */
let scratchSize = 0;
let work = new Float64Array(0);
let centred = new Float64Array(0);
let sum = new Float64Array(0);
let sumSq = new Float64Array(0);
let best = new Float64Array(0);
let totals = new Float64Array(0);
let previous = new Int32Array(0);
let candidates = new Int32Array(0);
let dropAt = new Int32Array(0);
/** reciprocal[k] = 1 / k, for the no-change test. */
let reciprocal = new Float64Array(0);

function ensureScratch(n: number): void {
  if (n + 1 <= scratchSize) return;
  scratchSize = Math.max(n + 1, 2 * scratchSize);
  work = new Float64Array(scratchSize);
  centred = new Float64Array(scratchSize);
  sum = new Float64Array(scratchSize);
  sumSq = new Float64Array(scratchSize);
  best = new Float64Array(scratchSize);
  totals = new Float64Array(scratchSize);
  previous = new Int32Array(scratchSize);
  candidates = new Int32Array(scratchSize);
  dropAt = new Int32Array(scratchSize);
  reciprocal = new Float64Array(scratchSize);
  for (let k = 1; k < scratchSize; k++) reciprocal[k] = 1 / k;
}

/**
 * The noise sigma of centred[0..n), estimated from successive differences so level shifts barely
 * bias it: x_{t+1} - x_t has variance 2 sigma^2 within a segment, and a step touches one
 * difference only. Robust (1.4826 MAD / sqrt 2), falling back to the plain RMS of differences for
 * quantised data. The MAD is taken by selection in the `work` buffer (no sort, no copy).
 */
function noiseSigma(n: number): number {
  const m = n - 1;
  const w = work;
  const c = centred;
  for (let i = 1; i < n; i++) {
    const d = c[i]! - c[i - 1]!;
    if (!Number.isFinite(d)) throw notFinite(d, i);
    w[i - 1] = d;
  }
  const centre = medianInPlace(w, m);
  // Refilled in series order (not from the reordered buffer) so an overflow names its position.
  for (let i = 1; i < n; i++) {
    const d = Math.abs(c[i]! - c[i - 1]! - centre);
    if (!Number.isFinite(d)) throw notFinite(d, i);
    w[i - 1] = d;
  }
  const robust = (MAD_TO_SIGMA * medianInPlace(w, m)) / Math.SQRT2;
  if (robust > 0) return robust;
  // Summed in series order, as the differences come.
  let squares = 0;
  for (let i = 1; i < n; i++) {
    const d = c[i]! - c[i - 1]!;
    squares += d * d;
  }
  return Math.sqrt(squares / (2 * m));
}

/** The error for a difference that overflowed (values near the largest double). Checked inline
 * by the callers: a call per value is what a cold start pays for most. */
function notFinite(x: number, position: number): InputError {
  return new InputError(`value ${x} at position ${position} is not a finite number`);
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
 * the median-centred values, so large offsets do not lose precision. Work: a window without a
 * change is usually settled by an exact bound (noSplitPays, about n^2 / 8 multiply-adds) without
 * PELT; PELT itself is O(n) expected when changes are frequent, O(n^2) on long quiet stretches
 * (nothing can be pruned there). Throws InputError on non-finite values or bad options.
 *
 * @example detectChangePoints([...Array(40).fill(100), ...Array(30).fill(110)].map((x, i) => x + (i % 2) * 0.5)) // [40]
 */
export function detectChangePoints(values: readonly number[], options: ChangePointOptions = {}): number[] {
  const n = values.length;
  const minSegment = options.minSegment ?? 5;
  if (!Number.isInteger(minSegment) || minSegment < 1) {
    throw new InputError(`minSegment must be a whole number, 1 or more, got ${minSegment}`);
  }
  const penalty = options.penalty ?? 3 * Math.log(Math.max(n, 2));
  if (!(penalty >= 0) || !Number.isFinite(penalty)) {
    throw new InputError(`penalty must be a finite number, 0 or more, got ${penalty}`);
  }
  if (n < 2 * minSegment) {
    values.forEach((x, i) => {
      if (!Number.isFinite(x)) throw new InputError(`value ${x} at position ${i + 1} is not a finite number`);
    });
    return [];
  }
  ensureScratch(n);
  const sigma = centreAndScale(values, n);
  if (!(sigma > 0)) return [];
  prefixSums(n, sigma);
  if (noSplitPays(n, penalty, minSegment)) return [];
  optimalPartition(n, penalty, minSegment);
  return segmentStarts(n);
}

// The steps below are separate small functions on purpose: V8 optimises each on its own, where one
// long function compiled while its first loop ran lacked type feedback for the rest and kept
// being thrown away (a cost paid on every cold start of the gate).

/** Copies the values to the scratch, centres them on their median and returns the noise sigma. */
function centreAndScale(values: readonly number[], n: number): number {
  const w = work;
  for (let i = 0; i < n; i++) {
    const x = values[i]!;
    if (!Number.isFinite(x)) throw new InputError(`value ${x} at position ${i + 1} is not a finite number`);
    w[i] = x;
  }
  const centre = medianInPlace(w, n);
  const c = centred;
  for (let i = 0; i < n; i++) c[i] = values[i]! - centre;
  return noiseSigma(n);
}

/** sum[i] and sumSq[i]: the sums of z and z^2 over the first i values, z = centred / sigma. */
function prefixSums(n: number, sigma: number): void {
  const c = centred;
  const s1 = sum;
  const s2 = sumSq;
  s1[0] = 0;
  s2[0] = 0;
  for (let i = 0; i < n; i++) {
    const z = c[i]! / sigma;
    s1[i + 1] = s1[i]! + z;
    s2[i + 1] = s2[i]! + z * z;
  }
}

/**
 * An exact shortcut for the common window without a change: true when no segmentation can beat
 * the single segment, so PELT would return no starts.
 * Any segmentation with starts b_1 < ... < b_k (and b_{k+1} = n) can be built from the whole
 * window by splitting [0, b_{i+1}) at b_i for i = k down to 1, and the cost it saves is the sum of
 * those splits' gains (the between-segment sums of squares add up over nested splits):
 *   gain(s, t) = C(0, t) - C(0, s) - C(s, t) = (S_s - (s / t) S_t)^2 (1/s + 1/(t - s)),
 * S the prefix sums of z. If no split of any prefix [0, t) gains more than the penalty, every
 * segmentation saves at most k x penalty for its k changes, so it never beats the single segment
 * (PELT keeps start 0 on ties). The same bound is what PELT itself checks for a prefix without
 * changes, with a few multiply-adds per pair instead of a segment cost; ends are taken in blocks
 * with one cheap bound per block (blockBounded), each pair only where that fails, and it stops at
 * the first pair over the limit (then PELT runs). A margin of 1e-9 of the sums' scale keeps
 * rounding (here and in PELT) on the safe side. O(n^2) at most, about O(n^2 / 8) when it holds;
 * on the gate's 60-run windows of plain noise it holds about 9 times in 10.
 */
function noSplitPays(n: number, penalty: number, minSegment: number): boolean {
  const limit = penalty - 1e-9 * (sumSq[n]! + n + penalty);
  if (!(limit > 0)) return false;
  for (let first = 2 * minSegment; first <= n; first += SPLIT_BLOCK) {
    const last = Math.min(first + SPLIT_BLOCK - 1, n);
    if (!blockBounded(first, last, limit, minSegment) && !splitsBounded(first, last, limit, minSegment)) return false;
  }
  return true;
}

/** Prefix ends taken together by blockBounded. */
const SPLIT_BLOCK = 8;

/**
 * A cheap sufficient test for the prefixes ending at first..last together: over those ends the
 * slope S_t / t lies in [low, high], so |S_s - slope s| is at most its value at low or high (it is
 * linear in the slope), and 1/(t - s) is at most 1/max(first - s, minSegment). One pass over the
 * splits s for the whole block; false only means "look at each end" (splitsBounded).
 */
function blockBounded(first: number, last: number, limit: number, minSegment: number): boolean {
  const s1 = sum;
  const inverse = reciprocal;
  let low = Infinity;
  let high = -Infinity;
  for (let t = first; t <= last; t++) {
    const slope = s1[t]! / t;
    if (slope < low) low = slope;
    if (slope > high) high = slope;
  }
  const end = last - minSegment;
  for (let s = minSegment; s <= end; s++) {
    const a = s1[s]! - low * s;
    const b = s1[s]! - high * s;
    const right = first - s;
    const weight = inverse[s]! + inverse[right > minSegment ? right : minSegment]!;
    // Comparisons rather than Math.max: the same, without a call before V8 optimises the loop.
    if ((a * a > b * b ? a * a : b * b) * weight > limit) return false;
  }
  return true;
}

/** The exact test for the prefixes ending at first..last: every split's gain within the limit. */
function splitsBounded(first: number, last: number, limit: number, minSegment: number): boolean {
  const s1 = sum;
  const inverse = reciprocal;
  for (let t = first; t <= last; t++) {
    const slope = s1[t]! / t;
    const end = t - minSegment;
    for (let s = minSegment; s <= end; s++) {
      const d = s1[s]! - slope * s;
      if (d * d * (inverse[s]! + inverse[t - s]!) > limit) return false;
    }
  }
  return true;
}

/**
 * The PELT recursion: best[end] = min over kept starts of best[start] + C(start, end) + penalty,
 * previous[end] the minimising start (the first one on ties).
 * Pruning with a shortest segment m: a start s with best[s] + C(s, t) > best[t] is beaten by t
 * for every later end u, since C(s, u) >= C(s, t) + C(t, u), but t may only start a segment
 * ending at u >= t + m. So s is dropped at end t + m (when t has joined), not at once; dropping
 * it at t (plain PELT) could lose the optimum for the ends in between. With m = 1 that is the
 * next end, as in plain PELT.
 * One pass over the candidates per end: the pruning test of the previous end (its totals are kept
 * in totals[]) is applied while the candidates are compacted and scored for this end. On a series
 * without a change nothing is pruned, so this pass is the whole O(n^2) cost; a second pass per end
 * doubled it.
 */
function optimalPartition(n: number, penalty: number, minSegment: number): void {
  const s1 = sum;
  const s2 = sumSq;
  const f = best;
  const from = previous;
  const kept = candidates;
  const t = totals;
  const until = dropAt;
  f[0] = -penalty;
  let count = 0;
  // The previous end's best total; -Infinity before the first end, so nothing is pruned then.
  let lastBest = -Infinity;
  const never = n + 1;
  for (let end = minSegment; end <= n; end++) {
    const sumEnd = s1[end]!;
    const sumSqEnd = s2[end]!;
    // A start worse by the penalty at end - 1 is beaten by end - 1 once that can start a segment.
    const beatenFrom = end - 1 + minSegment;
    let bestValue = Infinity;
    let bestStart = 0;
    let left = 0;
    for (let k = 0; k < count; k++) {
      const start = kept[k]!;
      // Branch-free on the rare pruning (a branch never taken before V8 optimised the loop has
      // no type feedback, and taking it later threw the optimised code away).
      const drop = Math.min(until[start]!, t[k]! - penalty > lastBest ? beatenFrom : never);
      until[start] = drop;
      if (drop <= end) continue;
      // Segment cost C = sum z^2 - (sum z)^2 / length, never below 0 (rounding).
      const s = sumEnd - s1[start]!;
      const cost = Math.max(0, sumSqEnd - s2[start]! - (s * s) / (end - start));
      const total = f[start]! + cost + penalty;
      kept[left] = start;
      t[left++] = total;
      if (total < bestValue) {
        bestValue = total;
        bestStart = start;
      }
    }
    // The start that just became far enough back joins the candidates, if it can end a segment.
    const fresh = end - minSegment;
    if (fresh === 0 || fresh >= minSegment) {
      until[fresh] = never;
      const s = sumEnd - s1[fresh]!;
      const cost = Math.max(0, sumSqEnd - s2[fresh]! - (s * s) / (end - fresh));
      const total = f[fresh]! + cost + penalty;
      kept[left] = fresh;
      t[left++] = total;
      if (total < bestValue) {
        bestValue = total;
        bestStart = fresh;
      }
    }
    count = left;
    f[end] = bestValue;
    from[end] = bestStart;
    lastBest = bestValue;
  }
}

/** The segment starts after 0, ascending, read back from previous[]. */
function segmentStarts(n: number): number[] {
  const from = previous;
  const starts: number[] = [];
  for (let at = from[n]!; at > 0; at = from[at]!) starts.push(at);
  return starts.reverse();
}
