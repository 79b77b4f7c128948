import type { Transform } from '../config/types.js';
import { InputError } from '../errors/input-error.js';

/**
 * The scale a metric is fitted on. `log` suits right-skewed timings and sizes: a multiplicative
 * noise becomes additive, and the fit's sd reads as a relative spread. Values must be > 0 on log.
 * Throws InputError (where: the metric) on a non-finite value, or a value <= 0 on log.
 * @example toFitScale(Math.E, 'log', 'build/time') // 1
 */
export function toFitScale(value: number, transform: Transform, metric: string): number {
  if (!Number.isFinite(value)) {
    throw new InputError(`value ${value} is not a finite number`, { where: metric, fix: 'check the metric file' });
  }
  if (transform === 'none') return value;
  if (!(value > 0)) {
    throw new InputError(`value ${value} cannot be log-transformed (must be > 0)`, {
      where: metric,
      fix: 'use `transform: none` for this metric, or check the value',
    });
  }
  return Math.log(value);
}

/** Back from the fit scale to the metric's own scale. @example fromFitScale(0, 'log') // 1 */
export function fromFitScale(value: number, transform: Transform): number {
  return transform === 'log' ? Math.exp(value) : value;
}
