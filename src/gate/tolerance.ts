import type { Tolerance } from '../config/types.js';
import { formatNumber } from './format-number.js';

/**
 * Whether |value - centre| exceeds the tolerance: an amount in the metric's unit, or a percent
 * of the baseline centre (on the metric's own scale). A percent tolerance holds the share, as the
 * config loader stores it (`1%` -> amount 0.01). A move exactly at the tolerance is within it.
 * @example beyondTolerance(103, 100, { kind: 'percent', amount: 0.02 }) // true
 */
export function beyondTolerance(value: number, centre: number, tolerance: Tolerance): boolean {
  return Math.abs(value - centre) > toleranceAmount(centre, tolerance);
}

/** The tolerance in the metric's unit around this centre. @example toleranceAmount(200, { kind: 'percent', amount: 0.01 }) // 2 */
export function toleranceAmount(centre: number, tolerance: Tolerance): number {
  return tolerance.kind === 'absolute' ? tolerance.amount : Math.abs(centre) * tolerance.amount;
}

/** "1%" or "512". @example describeTolerance({ kind: 'percent', amount: 0.01 }) // '1%' */
export function describeTolerance(tolerance: Tolerance): string {
  return tolerance.kind === 'percent' ? `${formatNumber(tolerance.amount * 100)}%` : formatNumber(tolerance.amount);
}
