import { normalQuantile } from './normal-quantile.js';

/** One block of a series: values at positions (e.g. run numbers), in time order. */
export interface TrendBlock {
  at: ArrayLike<number>;
  values: ArrayLike<number>;
}

/** The Theil-Sen slope of a series, with its distribution-free confidence interval. */
export interface TheilSen {
  /** Median of the pairwise slopes: change of the value per unit of position. */
  slope: number;
  /** Bounds of the confidence interval for the slope (NaN when there are too few pairs). */
  lower: number;
  upper: number;
  /** Pairwise slopes the median was taken over. */
  pairs: number;
}

export interface TheilSenOptions {
  /** Confidence of the interval. Default 0.95. */
  confidence?: number;
  /** Var(S) for the interval, e.g. widened for serial correlation. Default: Mann-Kendall's, no ties. */
  variance?: number;
  /** Only pairs at most this many values apart (a local slope that a level step barely bends). */
  maxLag?: number;
}

/** Pairs above which the slopes would not fit a reasonable amount of memory (8 bytes each). */
export const MAX_SLOPE_PAIRS = 20_000_000;

/**
 * The Theil-Sen estimate of a linear trend (Theil 1950, "A rank-invariant method of linear and
 * polynomial regression analysis"; Sen 1968, "Estimates of the regression coefficient based on
 * Kendall's tau"): the median of the slopes (y_j - y_i) / (t_j - t_i) over all pairs i < j with
 * t_i != t_j. With several blocks, only pairs within one block are taken (the seasonal Kendall
 * slope of Hirsch, Slack & Smith 1982), so a level step between blocks does not bend the slope.
 * The interval is Sen's: with N slopes in order and C = z_(1-a/2) sqrt(Var S), the bounds are
 * the ((N - C) / 2)-th and ((N + C) / 2 + 1)-th slopes, ranks rounded to the nearest (Gilbert
 * 1987, section 16.5, interpolates between them instead), Var S the
 * Mann-Kendall variance of the same blocks without tie correction (`variance` overrides it).
 * `maxLag` keeps only pairs close in the series: a step then touches few of the slopes, and their
 * median stays near the local trend (the interval is not meant for that case).
 * The interval is NaN where C leaves no slope on a side. Breakdown point about 29%: outliers move
 * it little. O(P log P) time and 8P bytes for P pairs; throws RangeError over MAX_SLOPE_PAIRS,
 * for non-finite input, mismatched lengths, or no pair with distinct positions.
 * @example theilSen([{ at: [1, 2, 3, 4], values: [1, 3, 2, 4] }]).slope // 0.75
 */
export function theilSen(blocks: readonly TrendBlock[], options: TheilSenOptions = {}): TheilSen {
  const confidence = options.confidence ?? 0.95;
  const maxLag = options.maxLag ?? Infinity;
  if (!(confidence > 0 && confidence < 1)) {
    throw new RangeError(`a confidence level must be between 0 and 1, got ${confidence}`);
  }
  let total = 0;
  let varianceSum = 0;
  blocks.forEach((block, b) => {
    const m = block.values.length;
    if (block.at.length !== m) {
      throw new RangeError(`block ${b + 1} has ${block.at.length} positions for ${m} values`);
    }
    for (let i = 0; i < m; i++) {
      if (!Number.isFinite(block.values[i]!) || !Number.isFinite(block.at[i]!)) {
        throw new RangeError(`block ${b + 1}, position ${i + 1}: value and position must be finite numbers`);
      }
    }
    total += maxLag >= m ? (m * (m - 1)) / 2 : maxLag * m - (maxLag * (maxLag + 1)) / 2;
    varianceSum += (m * (m - 1) * (2 * m + 5)) / 18;
  });
  if (total > MAX_SLOPE_PAIRS) {
    throw new RangeError(
      `a Theil-Sen slope over ${total} pairs is more than this build computes (${MAX_SLOPE_PAIRS}): review a shorter range of runs`,
    );
  }
  const slopes = new Float64Array(total);
  let count = 0;
  for (const { at, values } of blocks) {
    const m = values.length;
    for (let i = 0; i < m; i++) {
      const last = Math.min(m - 1, i + maxLag);
      for (let j = i + 1; j <= last; j++) {
        const dt = at[j]! - at[i]!;
        if (dt !== 0) slopes[count++] = (values[j]! - values[i]!) / dt;
      }
    }
  }
  if (count === 0) throw new RangeError('a Theil-Sen slope needs two values at different positions');
  const sorted = slopes.subarray(0, count).sort();
  const half = count >> 1;
  const slope = count % 2 === 1 ? sorted[half]! : (sorted[half - 1]! + sorted[half]!) / 2;
  const c = normalQuantile(1 - (1 - confidence) / 2) * Math.sqrt(options.variance ?? varianceSum);
  // 1-based ranks (N - C) / 2 and (N + C) / 2 + 1, each rounded to the nearest rank.
  const low = Math.round((count - c) / 2);
  const high = Math.round((count + c) / 2) + 1;
  return {
    slope,
    lower: low >= 1 ? sorted[low - 1]! : Number.NaN,
    upper: high <= count ? sorted[high - 1]! : Number.NaN,
    pairs: count,
  };
}
