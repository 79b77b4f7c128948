import { rankSplit } from './rank-split.js';
import { median } from './median.js';
import { rankSumTest } from './rank-sum.js';
import { longRunFactor } from './serial-correction.js';
import { theilSen } from './theil-sen.js';

/** A sustained change in level found by levelSteps. */
export interface LevelStep {
  /** Index of the first value at the new level. */
  at: number;
  /** Rank-sum p-value of the level since the step against the level before it (the hold test). */
  p: number;
}

/** Options of levelSteps. */
export interface LevelStepOptions {
  /** Fewest values on each side of a step. Default 5. */
  minSegment?: number;
  /** Level of the split test and of the hold test. Default 0.001. */
  level?: number;
}

/**
 * Sustained level changes of a series: binary segmentation (Scott & Knott 1974; Vostrikova 1981,
 * "Detecting disorder in multidimensional random processes") with rankSplit as the split test,
 * then a check that each step holds.
 * 1. Search: the whole series is split at rankSplit's place when its Bonferroni p-value is below
 *    `level`, and each part is searched again, down to parts of 2 x minSegment values.
 * 2. Hold: two neighbouring steps where the level after the second is the level before the first
 *    (rank-sum p at or above `level`) came and went, and both are dropped. Then a step counts only when the values from it to the end of the series differ from the
 *    values between the previous step and it (rank-sum test at `level`). The step that holds
 *    least is dropped first and the rest tested again, until every step left holds. So a regime
 *    that comes and goes (up at one split, back down at the next) is no step: the level after it
 *    is the level before it, and both of its splits are dropped. The test's variance is widened
 *    by longRunFactor of what the steps leave (values less their segment's Theil-Sen line: a steady
 *    drift is no serial correlation): runs in
 *    load regimes that last a few runs are not independent, and would pass for a level.
 * Ranks make both tests distribution-free: heavy tails and single wild values barely move them.
 * Returns the steps in order. O(n log n) per split tried. Throws RangeError for non-finite
 * values or bad options.
 * @example levelSteps([...Array(20).fill(0), ...Array(20).fill(1)].map((x, i) => x + (i % 5) * 0.01)) // [{ at: 20, p: ... }]
 */
export function levelSteps(values: ArrayLike<number>, options: LevelStepOptions = {}): LevelStep[] {
  const minSegment = options.minSegment ?? 5;
  const level = options.level ?? 0.001;
  if (!Number.isInteger(minSegment) || minSegment < 1) {
    throw new RangeError(`minSegment must be a whole number, 1 or more, got ${minSegment}`);
  }
  if (!(level > 0 && level < 1)) throw new RangeError(`a test level must be between 0 and 1, got ${level}`);
  const series = Float64Array.from(values, (x, i) => {
    if (!Number.isFinite(x)) throw new RangeError(`value ${x} at position ${i + 1} is not a finite number`);
    return x;
  });
  const starts = splitSearch(series, minSegment, level);
  return holding(series, starts, level);
}

/**
 * The search of levelSteps alone (step 1, no hold check): where binary segmentation with
 * rankSplit at `level` cuts the series, ascending. Every cut is a candidate, not a finding.
 */
export function splitSearch(series: Float64Array, minSegment: number, level: number): number[] {
  const starts: number[] = [];
  // An explicit stack of parts to search (each split shortens a part by at least minSegment).
  const parts: [number, number][] = [[0, series.length]];
  while (parts.length > 0) {
    const [from, to] = parts.pop()!;
    const split = rankSplit(series.subarray(from, to), minSegment);
    if (!(split.p < level)) continue;
    starts.push(from + split.at);
    parts.push([from, from + split.at], [from + split.at, to]);
  }
  return starts.sort((a, b) => a - b);
}

/** Drops the weakest step until every step left holds; returns the survivors with their p. */
function holding(series: Float64Array, starts: number[], level: number): LevelStep[] {
  let kept = [...starts];
  for (;;) {
    const factor = longRunFactor(residuals(series, kept));
    const tested = kept.map((at, i) => ({
      at,
      p: rankSumTest(series.subarray(i === 0 ? 0 : kept[i - 1]!, at), series.subarray(at), factor).p,
    }));
    const gone = cameAndWent(series, kept, level, factor);
    if (gone >= 0) {
      kept = kept.filter((_, i) => i !== gone && i !== gone + 1);
      continue;
    }
    let weakest = -1;
    tested.forEach((step, i) => {
      if (!(step.p < level) && (weakest < 0 || step.p > tested[weakest]!.p)) weakest = i;
    });
    if (weakest < 0) return tested;
    kept = kept.filter((_, i) => i !== weakest);
  }
}

/** The values less their segment's Theil-Sen line: what is left once the steps (and drifts) are taken out. */
function residuals(series: Float64Array, starts: readonly number[]): Float64Array {
  const out = new Float64Array(series.length);
  const cuts = [0, ...starts, series.length];
  for (let k = 0; k + 1 < cuts.length; k++) {
    const part = series.subarray(cuts[k], cuts[k + 1]);
    // A steady drift within a segment is no serial correlation: its Theil-Sen line is taken out too.
    const at = Array.from(part, (_, i) => i);
    const slope = part.length > 2 ? theilSen([{ at, values: Array.from(part) }]).slope : 0;
    const level = median(Array.from(part, (y, i) => y - slope * i));
    for (let i = 0; i < part.length; i++) out[cuts[k]! + i] = part[i]! - slope * i - level;
  }
  return out;
}

/**
 * The first pair of neighbouring steps that came and went: the level after the second is the
 * level before the first (rank-sum p at or above `level`). Their index, or -1.
 */
function cameAndWent(series: Float64Array, starts: readonly number[], level: number, factor: number): number {
  for (let i = 0; i + 1 < starts.length; i++) {
    const before = series.subarray(i === 0 ? 0 : starts[i - 1]!, starts[i]!);
    const after = series.subarray(starts[i + 1]!, i + 2 < starts.length ? starts[i + 2]! : series.length);
    if (!(rankSumTest(before, after, factor).p < level)) return i;
  }
  return -1;
}
