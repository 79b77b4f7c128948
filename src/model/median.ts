import { median as ssMedian, medianAbsoluteDeviation as ssMad } from 'simple-statistics';

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
