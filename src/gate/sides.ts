import type { Worse } from '../config/types.js';

/** Where a deviation from the baseline lies for a metric: on its worse side, its better side, or neither. */
export type Direction = 'worse' | 'better' | 'none';

/**
 * Classifies a deviation (this run minus the baseline centre) by the metric's `worse` setting.
 * `worse: both` has no better side: any move away from the centre is worse. A zero move is neither.
 * Transforms are monotone, so the sign on the fit scale equals the sign on the metric's own scale.
 * @example directionOf(0.3, 'lower') // 'better'
 */
export function directionOf(deviation: number, worse: Worse): Direction {
  if (deviation === 0 || Number.isNaN(deviation)) return 'none';
  if (worse === 'both') return 'worse';
  const up = deviation > 0;
  return up === (worse === 'higher') ? 'worse' : 'better';
}

/**
 * +1 when higher is worse, -1 when lower is worse; the sign that turns a deviation into a
 * "worse is positive" one. `both` counts as +1 (the group's common move is read as a slowdown).
 * @example worseSign('lower') // -1
 */
export function worseSign(worse: Worse): 1 | -1 {
  return worse === 'lower' ? -1 : 1;
}
