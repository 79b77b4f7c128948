import { median as ssMedian, medianAbsoluteDeviation as ssMad, quickselect as ssQuickselect } from 'simple-statistics';

/** Rejects what has no median: an empty set or a non-finite value (1-based position in the message). */
function checkFinite(values: ArrayLike<number>): number[] {
  if (values.length === 0) throw new RangeError('cannot take the median of an empty set of values');
  const list = Array.from(values);
  list.forEach((x, i) => {
    if (!Number.isFinite(x)) throw new RangeError(`value ${x} at position ${i + 1} is not a finite number`);
  });
  return list;
}

/**
 * Median of the values (simple-statistics' median, which sorts a copy), after checking them:
 * simple-statistics returns NaN or throws a bare message on such input, Bellgate names the value.
 * Throws RangeError on an empty input or a non-finite value.
 * @example median([3, 1, 2, 10]) // 2.5
 */
export function median(values: ArrayLike<number>): number {
  return ssMedian(checkFinite(values));
}

/**
 * Median absolute deviation from the median (unscaled; simple-statistics). Multiply by 1.4826 for a
 * consistent estimate of sigma under a Gaussian (Rousseeuw & Croux 1993; 1.4826 = 1 / Phi^-1(3/4)).
 * Throws RangeError on an empty input or a non-finite value.
 * @example medianAbsoluteDeviation([1, 2, 3, 4, 100]) // 1
 */
export function medianAbsoluteDeviation(values: ArrayLike<number>): number {
  return ssMad(checkFinite(values));
}

/**
 * Median of the first `count` entries of a scratch buffer of finite values, which it reorders
 * (simple-statistics' quickselect, O(count)). For the move polish, which takes thousands of
 * medians per check over buffers it reuses: simple-statistics' median copies its input.
 * @example medianInPlace([3, 1, 2, 10, 99], 4) // 2.5
 */
export function medianInPlace(scratch: number[], count: number): number {
  if (count === 0) return Number.NaN;
  // quickselect reads a right end of 0 as "the whole array", so one value is answered here.
  if (count === 1) return scratch[0]!;
  const half = count >> 1;
  ssQuickselect(scratch, half, 0, count - 1);
  if (count % 2 === 1) return scratch[half]!;
  // quickselect leaves the smaller values below `half`: the largest of them is the other middle one.
  let below = scratch[0]!;
  for (let i = 1; i < half; i++) if (scratch[i]! > below) below = scratch[i]!;
  return (below + scratch[half]!) / 2;
}
