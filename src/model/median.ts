/**
 * Median of a copy of the values (the input is not reordered). O(n log n).
 * @example median([3, 1, 2, 10]) // 2.5
 */
export function median(values: ArrayLike<number>): number {
  const sorted = Float64Array.from(values).sort();
  const n = sorted.length;
  if (n === 0) return NaN;
  const half = n >> 1;
  return n % 2 === 1 ? sorted[half]! : (sorted[half - 1]! + sorted[half]!) / 2;
}

/**
 * Median absolute deviation from the median (unscaled). Multiply by 1.4826 for a consistent
 * estimate of sigma under a Gaussian (Rousseeuw & Croux 1993; 1.4826 = 1 / Phi^-1(3/4)).
 * @example medianAbsoluteDeviation([1, 2, 3, 4, 100]) // 1
 */
export function medianAbsoluteDeviation(values: ArrayLike<number>): number {
  const centre = median(values);
  const deviations = Float64Array.from(values, (x) => Math.abs(x - centre));
  return median(deviations);
}
