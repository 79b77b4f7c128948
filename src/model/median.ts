import { InputError } from './input-error.js';

/** A sorted copy, rejecting what has no median (the input is not reordered). */
function sortedCopy(values: ArrayLike<number>): Float64Array {
  const n = values.length;
  if (n === 0) throw new InputError('cannot take the median of an empty set of values');
  for (let i = 0; i < n; i++) {
    const x = values[i]!;
    if (!Number.isFinite(x)) throw new InputError(`value ${x} at position ${i + 1} is not a finite number`);
  }
  // A Float64Array sorts numerically (a plain array would sort as strings).
  return Float64Array.from(values).sort();
}

/**
 * Median of the values. O(n log n). Throws InputError on an empty input or a non-finite value.
 * @example median([3, 1, 2, 10]) // 2.5
 */
export function median(values: ArrayLike<number>): number {
  const sorted = sortedCopy(values);
  const n = sorted.length;
  const half = n >> 1;
  return n % 2 === 1 ? sorted[half]! : (sorted[half - 1]! + sorted[half]!) / 2;
}

/**
 * Median absolute deviation from the median (unscaled). Multiply by 1.4826 for a consistent
 * estimate of sigma under a Gaussian (Rousseeuw & Croux 1993; 1.4826 = 1 / Phi^-1(3/4)).
 * Throws InputError on an empty input or a non-finite value.
 * @example medianAbsoluteDeviation([1, 2, 3, 4, 100]) // 1
 */
export function medianAbsoluteDeviation(values: ArrayLike<number>): number {
  const centre = median(values);
  // A plain loop: Float64Array.from with a map function takes a slow generic path in V8.
  const deviations = new Float64Array(values.length);
  for (let i = 0; i < values.length; i++) deviations[i] = Math.abs(values[i]! - centre);
  return median(deviations);
}
