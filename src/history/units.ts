import { InputError } from '../errors/input-error.js';
import type { Measurement } from '../inputs/run.js';
import { inStoredUnit } from '../inputs/units.js';

/**
 * The value a measurement is stored as, given the unit the history holds for its metric
 * (`stored`, the unit the history first saw; undefined when it never saw one). The stored unit is
 * authoritative: a column is never relabelled, so a value in a unit that converts (s to ms, KiB
 * to B) is converted, and one that does not is refused naming its file and line, the metric and
 * both units. A measurement with a unit where the history had none gives the metric its unit.
 * Throws InputError for a non-finite value or a unit that does not fit.
 *
 * @example storedValue('build/compile', { value: 0.0125, unit: 's', count: 1 }, 'ms') // 12.5
 */
export function storedValue(name: string, m: Measurement, stored: string | undefined): number {
  if (!Number.isFinite(m.value)) {
    throw new InputError(`metric value ${m.value} is not a finite number and cannot be recorded`, {
      where: m.where ?? name,
      fix: 'check the metric file that produced it',
    });
  }
  return inStoredUnit(name, m, stored);
}
