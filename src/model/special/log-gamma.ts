/**
 * ln Gamma by Stirling's series with its Bernoulli-number corrections (A&S 6.1.40-41):
 *   ln Gamma(x) = (x - 1/2) ln x - x + ln sqrt(2 pi) + mu(x),
 *   mu(x) = 1/(12x) - 1/(360x^3) + 1/(1260x^5) - 1/(1680x^7) + 1/(1188x^9) - 691/(360360x^11) + 1/(156x^13),
 * used from x = 10 up (the next term is below 3e-17 there) and below 10 through the recurrence
 * Gamma(x) = Gamma(x + k) / (x (x + 1) ... (x + k - 1)). Absolute error a few 1e-15.
 */

const LN_SQRT_2PI = 0.91893853320467274178;

/** Where Stirling's series is used as is. */
export const STIRLING_FROM = 10;

/**
 * The Stirling correction mu(x) = ln Gamma(x) - ((x - 1/2) ln x - x + ln sqrt(2 pi)), x >= 10
 * (A&S 6.1.41; coefficients B_2k / (2k (2k - 1))).
 * @example stirlingCorrection(10) // ≈ 0.0083305634
 */
export function stirlingCorrection(x: number): number {
  const r = 1 / x;
  const r2 = r * r;
  return (
    r *
    (1 / 12 + r2 * (-1 / 360 + r2 * (1 / 1260 + r2 * (-1 / 1680 + r2 * (1 / 1188 + r2 * (-691 / 360360 + r2 / 156))))))
  );
}

/**
 * ln Gamma(x) for x > 0 (Stirling's series, recurrence below 10). NaN for x <= 0 or NaN.
 * @example logGamma(0.5) // ≈ 0.5723649429247001 (ln sqrt(pi))
 */
export function logGamma(x: number): number {
  if (!(x > 0)) return Number.NaN;
  if (x >= STIRLING_FROM) return (x - 0.5) * Math.log(x) - x + LN_SQRT_2PI + stirlingCorrection(x);
  let product = 1;
  let y = x;
  while (y < STIRLING_FROM) {
    product *= y;
    y += 1;
  }
  return logGamma(y) - Math.log(product);
}

/**
 * ln Gamma(x + s) - ln Gamma(x) for x >= 10 and s >= 0, without subtracting two large logs:
 *   (x - 1/2) log1p(s / x) + s ln(x + s) - s + mu(x + s) - mu(x).
 * @example logGammaShift(1e6, 0.5) // ≈ 0.5 ln 1e6 = 6.9077552789821
 */
export function logGammaShift(x: number, s: number): number {
  return (x - 0.5) * Math.log1p(s / x) + s * Math.log(x + s) - s + stirlingCorrection(x + s) - stirlingCorrection(x);
}

/**
 * ln B(a, b) = ln Gamma(a) + ln Gamma(b) - ln Gamma(a + b) for a, b > 0. When the larger argument
 * is 10 or more, the two large terms are combined by logGammaShift (no cancellation).
 * @example logBeta(0.5, 0.5) // ≈ 1.1447298858494002 (ln pi)
 */
export function logBeta(a: number, b: number): number {
  const small = Math.min(a, b);
  const large = Math.max(a, b);
  if (large < STIRLING_FROM) return logGamma(a) + logGamma(b) - logGamma(a + b);
  return logGamma(small) - logGammaShift(large, small);
}

/**
 * log1p(u) - u for u > -1, accurate near 0 where the two terms cancel: with t = u / (2 + u),
 * log1p(u) = 2 atanh(t) = 2 (t + t^3/3 + t^5/5 + ...) and u - 2t = u t.
 * @example log1pMinus(1e-10) // ≈ -5e-21
 */
export function log1pMinus(u: number): number {
  if (!(Math.abs(u) < 0.5)) return Math.log1p(u) - u;
  const t = u / (2 + u);
  const t2 = t * t;
  let power = t * t2;
  let sum = 0;
  for (let k = 3; k < 80; k += 2) {
    const term = power / k;
    sum += term;
    if (Math.abs(term) <= 1e-17 * Math.abs(sum)) break;
    power *= t2;
  }
  return 2 * sum - u * t;
}
