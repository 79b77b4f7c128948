/**
 * The digamma, trigamma and tetragamma functions psi(x), psi'(x), psi''(x) for x > 0, by the
 * recurrence psi^(n)(x) = psi^(n)(x + 1) - (-1)^n n! / x^(n+1) (A&S 6.4.6) up to x >= 10 and the
 * asymptotic series there (A&S 6.3.18, 6.4.11-12, with Bernoulli numbers B2..B10):
 *   psi(x)   ~ ln x - 1/(2x) - 1/(12x^2) + 1/(120x^4) - 1/(252x^6) + 1/(240x^8) - 1/(132x^10) + 691/(32760x^12)
 *   psi'(x)  ~ 1/x + 1/(2x^2) + 1/(6x^3) - 1/(30x^5) + 1/(42x^7) - 1/(30x^9) + 5/(66x^11) - 691/(2730x^13)
 *   psi''(x) ~ -1/x^2 - 1/x^3 - 1/(2x^4) + 1/(6x^6) - 1/(6x^8) + 3/(10x^10) - 5/(6x^12) + 691/(210x^14)
 * The next terms are below 1e-15 relative at x = 10. Smyth's moderated variances need them
 * (the trigamma method): no library on the registry is loaded at run time for three series.
 * NaN for x <= 0 or NaN (the moderated variances only take positive arguments).
 */

const RECUR_TO = 10;

/** @example digamma(1) // -0.5772156649015329 (minus Euler's constant) */
export function digamma(x: number): number {
  if (!(x > 0)) return Number.NaN;
  let shift = 0;
  while (x < RECUR_TO) {
    shift -= 1 / x;
    x += 1;
  }
  const r = 1 / (x * x);
  const series = r * (-1 / 12 + r * (1 / 120 + r * (-1 / 252 + r * (1 / 240 + r * (-1 / 132 + r * (691 / 32760))))));
  return shift + Math.log(x) - 0.5 / x + series;
}

/** @example trigamma(1) // 1.6449340668482264 (pi^2 / 6) */
export function trigamma(x: number): number {
  if (!(x > 0)) return Number.NaN;
  let shift = 0;
  while (x < RECUR_TO) {
    shift += 1 / (x * x);
    x += 1;
  }
  const r = 1 / (x * x);
  const series =
    (1 / x) * (1 + r * (1 / 6 + r * (-1 / 30 + r * (1 / 42 + r * (-1 / 30 + r * (5 / 66 + r * (-691 / 2730)))))));
  return shift + series + 0.5 * r;
}

/** @example tetragamma(1) // -2.4041138063191885 (-2 zeta(3)) */
export function tetragamma(x: number): number {
  if (!(x > 0)) return Number.NaN;
  let shift = 0;
  while (x < RECUR_TO) {
    shift -= 2 / (x * x * x);
    x += 1;
  }
  const r = 1 / (x * x);
  const series =
    -r * (1 + 1 / x + r * (0.5 + r * (-1 / 6 + r * (1 / 6 + r * (-3 / 10 + r * (5 / 6 + r * (-691 / 210)))))));
  return shift + series;
}

/**
 * The x > 0 with trigamma(x) = y, by Smyth's Newton iteration on 1 / trigamma (Smyth 2004,
 * "Linear models and empirical Bayes methods for assessing differential expression in microarray
 * experiments", Statistical Applications in Genetics and Molecular Biology 3(1), Article 3,
 * appendix; the same steps as limma's trigammaInverse): start at 1/2 + 1/y, step
 * trigamma(x) (1 - trigamma(x) / y) / tetragamma(x) until the step is below 1e-8 of x; 1/y for
 * y < 1e-6 and 1/sqrt(y) for y > 1e7 (the limits limma uses), NaN for y <= 0.
 * @example inverseTrigamma(Math.PI ** 2 / 6) // ≈ 1
 */
export function inverseTrigamma(y: number): number {
  if (!(y > 0)) return Number.NaN;
  if (y > 1e7) return 1 / Math.sqrt(y);
  if (y < 1e-6) return 1 / y;
  let x = 0.5 + 1 / y;
  for (let i = 0; i < 50; i++) {
    const tri = trigamma(x);
    const step = (tri * (1 - tri / y)) / tetragamma(x);
    x += step;
    if (-step / x < 1e-8) break;
  }
  return x;
}
