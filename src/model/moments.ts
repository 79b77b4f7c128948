/**
 * Mean and sum of squared deviations by the corrected two-pass algorithm (Chan, Golub & LeVeque,
 * "Algorithms for computing the sample variance", 1983): the second pass subtracts the mean first,
 * and the small correction term removes the rounding left in the mean. Large offsets (values like
 * 1e13 + small noise, NIST NumAcc4) keep their precision, which a one-pass sum of squares loses.
 * O(n) time, O(1) space. Throws RangeError on an empty input or a non-finite value.
 *
 * @example meanAndSquares([1, 2, 3]) // { n: 3, mean: 2, squares: 2 }
 */
export function meanAndSquares(values: ArrayLike<number>): { n: number; mean: number; squares: number } {
  const n = values.length;
  if (n === 0) throw new RangeError('cannot fit an empty set of values');
  let sum = 0;
  for (let i = 0; i < n; i++) {
    const x = values[i]!;
    if (!Number.isFinite(x)) throw new RangeError(`value ${x} at position ${i + 1} is not a finite number`);
    sum += x;
  }
  const first = sum / n;
  let squares = 0;
  let drift = 0;
  for (let i = 0; i < n; i++) {
    const d = values[i]! - first;
    squares += d * d;
    drift += d;
  }
  squares -= (drift * drift) / n;
  return { n, mean: first + drift / n, squares: Math.max(0, squares) };
}

/** Arithmetic mean (two-pass, see meanAndSquares). @example mean([2, 4]) // 3 */
export function mean(values: ArrayLike<number>): number {
  return meanAndSquares(values).mean;
}

/**
 * Variance dividing by n ("mle", the maximum-likelihood estimate) or by n - 1 ("unbiased").
 * @example variance([1, 2, 3, 4], 'mle') // 1.25
 */
export function variance(values: ArrayLike<number>, divisor: 'mle' | 'unbiased'): number {
  const { n, squares } = meanAndSquares(values);
  if (divisor === 'unbiased') {
    if (n < 2) throw new RangeError('the unbiased variance needs at least 2 values');
    return squares / (n - 1);
  }
  return squares / n;
}
