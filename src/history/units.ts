import { InputError } from '../errors/input-error.js';
import type { Measurement } from '../inputs/run.js';

/**
 * The value a measurement is stored as, given the unit the history holds for its metric
 * (`stored`, the unit the history first saw; undefined when it never saw one). The stored unit is
 * authoritative: a column is never relabelled, so a measurement in another unit is refused here
 * (converting known units is the one change this function may grow). A measurement with a unit
 * where the history had none gives the metric its unit.
 * Throws InputError for a non-finite value or a unit that does not fit.
 *
 * @example storedValue('build/compile', { value: 12.5, unit: 's', count: 1 }, 's') // 12.5
 */
export function storedValue(name: string, m: Measurement, stored: string | undefined): number {
  if (!Number.isFinite(m.value)) {
    throw new InputError(`metric value ${m.value} is not a finite number and cannot be recorded`, {
      where: name,
      fix: 'check the metric file that produced it',
    });
  }
  if (stored !== undefined && m.unit !== undefined && m.unit !== stored) {
    throw new InputError(
      `metric ${JSON.stringify(name)} is stored in ${JSON.stringify(stored)}, but this run gives it in ${JSON.stringify(m.unit)}; a stored metric is never relabelled`,
      {
        where: name,
        fix: `report it in ${JSON.stringify(stored)}, or under a new name (bellgate rename keeps the old history under the new name)`,
      },
    );
  }
  return m.value;
}
