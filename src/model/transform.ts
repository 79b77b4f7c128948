/** The scale a metric is judged on: its own, or the logarithm (timings: a multiplicative noise becomes additive). */
export type Scale = 'none' | 'log';

/**
 * A value on the fit scale. Values must be finite, and > 0 on the log scale.
 * Throws RangeError otherwise (the gate checks values first and says which metric and run).
 * @example toFitScale(Math.E, 'log') // 1
 */
export function toFitScale(value: number, scale: Scale): number {
  if (!Number.isFinite(value)) throw new RangeError(`value ${value} is not a finite number`);
  if (scale === 'none') return value;
  if (!(value > 0)) throw new RangeError(`value ${value} cannot be log-transformed (must be > 0)`);
  return Math.log(value);
}

/** Back from the fit scale to the metric's own scale. @example fromFitScale(0, 'log') // 1 */
export function fromFitScale(value: number, scale: Scale): number {
  return scale === 'log' ? Math.exp(value) : value;
}
