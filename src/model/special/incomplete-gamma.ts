import { STIRLING_FROM, log1pMinus, logGamma, stirlingCorrection } from './log-gamma.js';

const TINY = 1e-300;
const TOLERANCE = 4 * Number.EPSILON;

/**
 * x^a e^-x / Gamma(a). For a >= 10 Stirling's formula gives
 * sqrt(a / (2 pi)) exp(a log1pMinus((x - a) / a) - mu(a)): x - a is exact near the peak, so large
 * a loses nothing to cancelling logarithms (cf. Temme; DiDonato & Morris 1986, ACM TOMS 12).
 */
function gammaFront(a: number, x: number): number {
  if (a >= STIRLING_FROM) {
    const u = (x - a) / a;
    // Far below the peak 1 + u has lost digits; ln(x / a) is exact enough there.
    const power = u > -0.5 ? a * log1pMinus(u) : a * Math.log(x / a) - (x - a);
    return Math.sqrt(a / (2 * Math.PI)) * Math.exp(power - stirlingCorrection(a));
  }
  return Math.exp(a * Math.log(x) - x - logGamma(a));
}

/** sum_n x^n / (a (a + 1) ... (a + n)) (A&S 6.5.29; Numerical Recipes 3rd ed., 6.2.5). */
function gammaSeries(a: number, x: number): number {
  let term = 1 / a;
  let sum = term;
  const steps = 1000 + Math.ceil(50 * Math.sqrt(a));
  for (let n = 1; n <= steps; n++) {
    term *= x / (a + n);
    sum += term;
    if (Math.abs(term) < Math.abs(sum) * TOLERANCE) break;
  }
  return sum;
}

/**
 * The continued fraction of Gamma(a, x) e^x x^-a (A&S 6.5.31; Numerical Recipes 3rd ed., 6.2.7)
 * by the modified Lentz method; for x >= a + 1.
 */
function gammaFraction(a: number, x: number): number {
  let b = x + 1 - a;
  let c = 1 / TINY;
  let d = 1 / b;
  let h = d;
  const steps = 1000 + Math.ceil(50 * Math.sqrt(a));
  for (let i = 1; i <= steps; i++) {
    const an = -i * (i - a);
    b += 2;
    d = an * d + b;
    if (Math.abs(d) < TINY) d = TINY;
    c = b + an / c;
    if (Math.abs(c) < TINY) c = TINY;
    d = 1 / d;
    const delta = d * c;
    h *= delta;
    if (Math.abs(delta - 1) < TOLERANCE) break;
  }
  return h;
}

/**
 * The regularised incomplete gamma function P(a, x) (upper = false) or Q(a, x) = 1 - P(a, x)
 * (upper = true), a > 0, x >= 0: the series for x < a + 1, the continued fraction above, each
 * computing its own side directly and the other as 1 minus it (the directly computed side is
 * the smaller one, or close to it), so far tails keep their relative accuracy. NaN for a <= 0,
 * x < 0 or NaN.
 * @example regularizedGamma(1, 2, true) // e^-2 = 0.1353352832366127
 */
export function regularizedGamma(a: number, x: number, upper: boolean): number {
  if (!(a > 0) || !(x >= 0)) return Number.NaN;
  if (x === 0) return upper ? 1 : 0;
  if (x === Infinity) return upper ? 0 : 1;
  if (x < a + 1) {
    const lower = gammaFront(a, x) * gammaSeries(a, x);
    return Math.min(1, Math.max(0, upper ? 1 - lower : lower));
  }
  const tail = gammaFront(a, x) * gammaFraction(a, x);
  return Math.min(1, Math.max(0, upper ? tail : 1 - tail));
}
