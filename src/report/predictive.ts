import type { MetricResult } from '../gate/report.js';

/**
 * Whether the reported relative density came from the predictive Student-t rather than the
 * Gaussian drawn: under the plug-in fit it equals exp(-z^2/2) exactly, while the t's heavier tails
 * give a larger value once the run is away from the centre.
 * @example usesPredictive({ ...m, z: 3, relativeDensity: Math.exp(-4.5) }) // false (plug-in)
 */
export function usesPredictive(m: MetricResult): boolean {
  if (m.z === undefined || m.relativeDensity === undefined || !Number.isFinite(m.z) || Math.abs(m.z) < 0.5)
    return false;
  const plugIn = Math.exp(-0.5 * m.z * m.z);
  return m.relativeDensity > plugIn * (1 + 1e-6);
}
