import { InputError } from '../errors/input-error.js';
import { chiSquareUpperTail } from './special/chi-square.js';
import { fisherUpperTail } from './special/fisher-f.js';

function checkDistance(d2: number, p: number): void {
  if (!(d2 >= 0)) {
    throw new InputError(`a squared distance must be a number, 0 or more, got ${d2}`);
  }
  if (!Number.isInteger(p) || p < 1) throw new InputError(`the number of metrics must be 1 or more, got ${p}`);
}

/**
 * P(chi^2_p > d2): the tail of a squared Mahalanobis distance when mean and covariance are known
 * exactly (the large-history limit of hotellingTail): the upper incomplete gamma Q(p/2, d2/2),
 * computed directly, so far tails keep their relative accuracy. An infinite d2 has tail 0.
 * Throws InputError on a negative or NaN d2 or p < 1.
 * @example chiSquareTail(3.841458820645, 1) // ≈ 0.05 (chi-square table, 1 degree of freedom)
 */
export function chiSquareTail(d2: number, p: number): number {
  checkDistance(d2, p);
  if (d2 === Infinity) return 0;
  return chiSquareUpperTail(d2, p);
}

/**
 * Tail probability of a NEW run's squared Mahalanobis distance d2 from a mean and covariance
 * estimated from n earlier runs (the prediction form of Hotelling's T^2).
 * `divisor` says which covariance d2 was computed with: 'mle' (divide by n, as shrunkCovariance
 * returns; the default) or 'unbiased' (divide by n - 1). With the n-1 covariance S_u,
 *   T^2 = d2_u n / (n + 1),  F = T^2 (n - p) / (p (n - 1)) ~ F(p, n - p)
 * (x_new - mean has covariance Sigma (1 + 1/n), independent of S_u). Since S_mle = S_u (n-1)/n,
 * d2_u = d2_mle (n - 1) / n. The F tail is computed directly as an incomplete beta — no 1 - cdf
 * cancellation. Needs n > p. With a shrunk covariance this is an approximation (the F law holds
 * for the plain sample covariance). Throws InputError on bad d2, p < 1 or n <= p.
 *
 * @example hotellingTail(0, 2, 10) // 1
 */
export function hotellingTail(d2: number, p: number, n: number, divisor: 'mle' | 'unbiased' = 'mle'): number {
  checkDistance(d2, p);
  if (!Number.isInteger(n) || n <= p) {
    throw new InputError(`the joint check of ${p} metrics needs more than ${p} runs, got ${n}`, {
      fix: 'wait for more baseline runs, or check fewer metrics together',
    });
  }
  if (d2 === 0) return 1;
  if (d2 === Infinity) return 0;
  const unbiased = divisor === 'mle' ? (d2 * (n - 1)) / n : d2;
  const t2 = (unbiased * n) / (n + 1);
  const statistic = (t2 * (n - p)) / (p * (n - 1));
  return fisherUpperTail(statistic, p, n - p);
}
