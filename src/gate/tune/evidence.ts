import { betaPointAt, regularizedBeta } from '../../model/special/incomplete-beta.js';

/** How much a replayed count says: x events in n trials, with an exact 95% interval of the rate. */
export interface RateEvidence {
  events: number;
  trials: number;
  /** events / trials (0 without trials). */
  rate: number;
  /** Clopper-Pearson 95% interval of the rate (two-sided, 2.5% each side); [0, 1] without trials. */
  lower: number;
  upper: number;
  /**
   * With no event: the rule of three's one-sided 95% bound 3 / n (Hanley & Lippman-Hand 1983,
   * JAMA 249:1743), the rate that n clean trials can rule out; absent otherwise.
   */
  ruleOfThree?: number;
}

/**
 * The p-quantile of Beta(a, b): the x with I_x(a, b) = p, by bisection on the regularized
 * incomplete beta (monotone in x), 200 halvings at most, so the loop is bounded and exact to
 * double precision. Throws RangeError unless 0 <= p <= 1 and a, b > 0.
 * @example betaQuantile(0.975, 1, 10) // 0.3084971078187608
 */
export function betaQuantile(p: number, a: number, b: number): number {
  if (!(p >= 0 && p <= 1) || !(a > 0 && b > 0))
    throw new RangeError(`betaQuantile needs 0 <= p <= 1 and a, b > 0, got p ${p}, a ${a}, b ${b}`);
  let lo = 0;
  let hi = 1;
  for (let i = 0; i < 200 && hi - lo > 0; i++) {
    const mid = (lo + hi) / 2;
    if (mid === lo || mid === hi) break;
    if (regularizedBeta(a, b, betaPointAt(mid), false) < p) lo = mid;
    else hi = mid;
  }
  return (lo + hi) / 2;
}

/**
 * The exact (Clopper-Pearson 1934) 95% interval of a binomial rate: lower = Beta(0.025; x, n - x + 1),
 * upper = Beta(0.975; x + 1, n - x), with 0 and 1 at the ends; plus the rule of three for x = 0.
 * @example rateEvidence(0, 52).ruleOfThree // 0.0577
 */
export function rateEvidence(events: number, trials: number): RateEvidence {
  if (trials === 0) return { events, trials, rate: 0, lower: 0, upper: 1 };
  const lower = events === 0 ? 0 : betaQuantile(0.025, events, trials - events + 1);
  const upper = events === trials ? 1 : betaQuantile(0.975, events + 1, trials - events);
  return {
    events,
    trials,
    rate: events / trials,
    lower,
    upper,
    ...(events === 0 ? { ruleOfThree: Math.min(1, 3 / trials) } : {}),
  };
}
