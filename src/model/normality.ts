import { meanAndSquares } from './moments.js';
import { normalLogCdf } from './special/normal.js';

/**
 * Sample skewness G1, the adjusted Fisher-Pearson coefficient (Joanes & Gill 1998, "Comparing
 * measures of sample skewness and kurtosis"; also NIST/SEMATECH e-Handbook 1.3.5.11):
 *   g1 = m3 / m2^(3/2),  m_k = (1/n) sum (x - mean)^k,   G1 = g1 sqrt(n (n - 1)) / (n - 2).
 * Positive for a long right tail (timings often are; `transform: log` may suit them). A constant
 * sample has no asymmetry to report: 0. O(n). Throws RangeError on fewer than 3 values or
 * non-finite values.
 * @example skewness([1, 2, 3, 10]) // ≈ 1.7636
 */
export function skewness(values: ArrayLike<number>): number {
  const { n, mean, squares } = meanAndSquares(values);
  if (n < 3) throw new RangeError(`skewness needs at least 3 values, got ${n}`);
  if (squares === 0) return 0;
  let cubes = 0;
  for (let i = 0; i < n; i++) {
    const d = values[i]! - mean;
    cubes += d * d * d;
  }
  const g1 = cubes / n / Math.pow(squares / n, 1.5);
  return (g1 * Math.sqrt(n * (n - 1))) / (n - 2);
}

/** Result of the Anderson-Darling test for normality. */
export interface AndersonDarling {
  /** A^2 with the mean and n-1 standard deviation estimated from the sample. */
  statistic: number;
  /** Stephens' A*^2 = A^2 (1 + 0.75/n + 2.25/n^2), compared with the critical values. */
  adjusted: number;
  /** Approximate p-value of normality (small: the sample does not look Gaussian). */
  pValue: number;
}

/**
 * p-value of A*^2 for the composite normal case (mean and variance estimated), the piecewise
 * formulas of D'Agostino & Stephens (1986), "Goodness-of-Fit Techniques", Table 4.9.
 * Throws RangeError on a negative or NaN A*^2.
 * @example andersonDarlingPValue(0.752) // ≈ 0.05
 */
export function andersonDarlingPValue(a: number): number {
  if (!(a >= 0)) throw new RangeError(`an Anderson-Darling statistic must be 0 or more, got ${a}`);
  let p: number;
  if (a >= 0.6) p = Math.exp(1.2937 - 5.709 * a + 0.0186 * a * a);
  else if (a >= 0.34) p = Math.exp(0.9177 - 4.279 * a - 1.38 * a * a);
  else if (a >= 0.2) p = 1 - Math.exp(-8.318 + 42.796 * a - 59.938 * a * a);
  else p = 1 - Math.exp(-13.436 + 101.14 * a - 223.73 * a * a);
  return Math.min(1, Math.max(0, p));
}

/**
 * Anderson-Darling test of normality with estimated mean and sd (Stephens 1974; D'Agostino &
 * Stephens 1986, section 4.8): with w_i the sorted standardised values,
 *   A^2 = -n - (1/n) sum_i (2i - 1) [ln Phi(w_i) + ln(1 - Phi(w_{n+1-i}))].
 * ln(1 - Phi(w)) is taken as ln Phi(-w), so an extreme value gives a large finite A^2 instead of
 * ln 0. Critical values of A*^2 (D'Agostino & Stephens): 0.631 at 10%, 0.752 at 5%, 1.035 at 1%.
 * O(n log n). Throws RangeError on fewer than 8 values (the p-value formulas are not meant for
 * less), non-finite values, or a constant sample (no spread to standardise by).
 * @example andersonDarling(values).pValue < 0.05 // the values do not look Gaussian
 */
export function andersonDarling(values: ArrayLike<number>): AndersonDarling {
  const { n, mean, squares } = meanAndSquares(values);
  if (n < 8) throw new RangeError(`the normality test needs at least 8 values, got ${n}`);
  if (squares === 0) {
    throw new RangeError('the normality test needs values that vary; all values are equal');
  }
  const sd = Math.sqrt(squares / (n - 1));
  const w = Float64Array.from(values, (x) => (x - mean) / sd).sort();
  let sum = 0;
  for (let i = 0; i < n; i++) {
    sum += (2 * i + 1) * (normalLogCdf(w[i]!) + normalLogCdf(-w[n - 1 - i]!));
  }
  const statistic = -n - sum / n;
  const adjusted = statistic * (1 + 0.75 / n + 2.25 / (n * n));
  return { statistic, adjusted, pValue: andersonDarlingPValue(adjusted) };
}
