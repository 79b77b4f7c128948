import type { Transform } from '../config/types.js';

/**
 * The sigma floor on the fit scale for a `resolution` given in the metric's own unit.
 * On the log scale a step dx near a centre m is a step of about dx / m in log x (d log x = dx / x),
 * so the floor becomes resolution / exp(centre). With `relative-to` the fitted values are ratios,
 * and the resolution is read in the ratio's unit.
 * @example fitScaleFloor(2, 'log', Math.log(100)) // 0.02
 */
export function fitScaleFloor(resolution: number, transform: Transform, centre: number): number {
  if (transform === 'none' || resolution === 0) return resolution;
  return resolution / Math.exp(centre);
}
