import { digamma, inverseTrigamma, trigamma } from './special/polygamma.js';

/** The prior of the metrics' variances: s0^2 with d0 degrees of freedom (Infinity: no spread between metrics). */
export interface VariancePrior {
  d0: number;
  s0Squared: number;
}

/**
 * The empirical-Bayes prior of a set of sample variances by Smyth's method of moments on
 * their logarithms (Smyth 2004, "Linear models and empirical Bayes methods for assessing
 * differential expression in microarray experiments", section 6.2; limma's fitFDist):
 * with s_j^2 on d_j degrees of freedom scattered as s0^2 F(d_j, d0),
 *   e_j = ln s_j^2 - psi(d_j / 2) + ln(d_j / 2)
 *   mean(e) = ln s0^2 - psi(d0 / 2) + ln(d0 / 2)
 *   var(e) - mean(psi'(d_j / 2)) = psi'(d0 / 2)           (var with divisor m - 1)
 * so d0 = 2 psi'^-1(...) (inverseTrigamma) and s0^2 = exp(mean(e) + psi(d0/2) - ln(d0/2)). When
 * the left side is 0 or less the variances scatter no more than sampling alone explains: d0 is
 * Infinity and s0^2 = exp(mean(e)) (the pooled value every metric then takes).
 * Variances of 0 have no logarithm and are left out (a constant metric is judged by its
 * tolerance). Needs at least 2 positive variances; undefined otherwise. O(m).
 * @example variancePrior([0.8, 1.1, 1.3, 0.9, 1.2], [20, 20, 20, 20, 20]).d0 // Infinity (no more scatter than chi-square)
 */
export function variancePrior(variances: readonly number[], dofs: readonly number[]): VariancePrior | undefined {
  const e: number[] = [];
  let trigammaSum = 0;
  variances.forEach((s2, j) => {
    const d = dofs[j]!;
    if (!(s2 > 0) || !Number.isFinite(s2) || !(d > 0)) return;
    e.push(Math.log(s2) - digamma(d / 2) + Math.log(d / 2));
    trigammaSum += trigamma(d / 2);
  });
  const m = e.length;
  if (m < 2) return undefined;
  let mean = 0;
  for (const x of e) mean += x / m;
  let squares = 0;
  for (const x of e) squares += (x - mean) ** 2;
  const excess = squares / (m - 1) - trigammaSum / m;
  if (!(excess > 0)) return { d0: Infinity, s0Squared: Math.exp(mean) };
  const d0 = 2 * inverseTrigamma(excess);
  return { d0, s0Squared: Math.exp(mean + digamma(d0 / 2) - Math.log(d0 / 2)) };
}

/**
 * A metric's moderated variance, the posterior mean of its variance under the prior
 * (Smyth 2004, equation 2): (d0 s0^2 + d s^2) / (d0 + d), on d0 + d degrees of freedom; with
 * d0 = Infinity it is s0^2. Without a prior, s^2 on d as is.
 * @example moderatedVariance(2, 10, { d0: 10, s0Squared: 1 }) // { variance: 1.5, dof: 20 }
 */
export function moderatedVariance(
  s2: number,
  d: number,
  prior: VariancePrior | undefined,
): { variance: number; dof: number } {
  if (prior === undefined) return { variance: s2, dof: d };
  if (prior.d0 === Infinity) return { variance: prior.s0Squared, dof: Infinity };
  return { variance: (prior.d0 * prior.s0Squared + d * s2) / (prior.d0 + d), dof: prior.d0 + d };
}
