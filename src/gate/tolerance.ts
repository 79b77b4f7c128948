import type { Tolerance } from '../config/types.js';

/**
 * The tolerance as a share of the baseline centre (on the metric's own scale): a percent as is,
 * an amount in the metric's unit divided by |centre| (Infinity around a centre of 0, unless the
 * amount is 0). A move is regressed only when its share is beyond this.
 * @example toleranceShare({ kind: 'absolute', amount: 2 }, 200) // 0.01
 */
export function toleranceShare(tolerance: Tolerance, centre: number): number {
  if (tolerance.kind === 'percent') return tolerance.amount;
  if (centre === 0) return tolerance.amount > 0 ? Infinity : 0;
  return tolerance.amount / Math.abs(centre);
}
