/** How the tail probabilities of many metrics are adjusted for being tested together. */
export type FamilyMethod = 'bonferroni' | 'holm' | 'fdr';

/**
 * Adjusted p-values for testing m metrics at once, returned in input order and capped at 1;
 * a metric is flagged at level alpha when its adjusted value is <= alpha.
 * - bonferroni: min(1, m p) — controls the family-wise error rate.
 * - holm: Holm (1979) step-down; with p(1) <= ... <= p(m) sorted,
 *   adj(i) = max over j <= i of min(1, (m - j + 1) p(j)) — same guarantee, never less powerful.
 * - fdr: Benjamini & Hochberg (1995) step-up; adj(i) = min over j >= i of min(1, m p(j) / j) —
 *   controls the expected share of false alarms among the flagged metrics.
 * Ties keep input order. O(m log m). Throws RangeError on a value outside [0, 1] or NaN.
 *
 * @example adjustTails([0.01, 0.04, 0.03, 0.005], 'holm') // [0.03, 0.06, 0.06, 0.02]
 */
export function adjustTails(tails: readonly number[], method: FamilyMethod): number[] {
  const m = tails.length;
  tails.forEach((p, i) => {
    if (!(p >= 0 && p <= 1)) {
      throw new RangeError(`tail probability ${p} at position ${i + 1} is not a number in [0, 1]`);
    }
  });
  if (method === 'bonferroni') return tails.map((p) => Math.min(1, m * p));
  if (method !== 'holm' && method !== 'fdr') {
    throw new RangeError(`unknown family method "${String(method)}": use bonferroni, holm or fdr`);
  }
  const order = tails.map((_, i) => i).sort((a, b) => tails[a]! - tails[b]! || a - b);
  const adjusted = new Array<number>(m);
  if (method === 'holm') {
    let running = 0;
    order.forEach((index, rank) => {
      running = Math.max(running, Math.min(1, (m - rank) * tails[index]!));
      adjusted[index] = running;
    });
  } else {
    let running = 1;
    for (let rank = m - 1; rank >= 0; rank--) {
      const index = order[rank]!;
      running = Math.min(running, (m * tails[index]!) / (rank + 1));
      adjusted[index] = running;
    }
  }
  return adjusted;
}

/**
 * The level each of m tails is compared with by Holm's step-down at family level alpha (Holm
 * 1979): sorted ascending, the i-th smallest (i from 1) against alpha / (m - i + 1); the first that
 * fails stops the procedure, and it and every later one keep the level they would have faced.
 * The smallest level is alpha / m (Bonferroni's share), the largest alpha. Returned in input order;
 * ties keep input order. O(m log m).
 * @example holmLevels([0.03, 0.001, 0.2], 0.01) // [0.005, 0.00333, 0.01]
 */
export function holmLevels(tails: readonly number[], alpha: number): number[] {
  const m = tails.length;
  const order = tails.map((_, i) => i).sort((a, b) => tails[a]! - tails[b]! || a - b);
  const levels = new Array<number>(m);
  order.forEach((index, rank) => (levels[index] = alpha / (m - rank)));
  return levels;
}
