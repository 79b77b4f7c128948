import { InputError } from '../errors/input-error.js';
import type { ReadingSink } from './reading-sink.js';

/** A plain object (not an array, not null). */
export function isRecord(value: unknown): value is Record<string, unknown> {
  return typeof value === 'object' && value !== null && !Array.isArray(value);
}

/**
 * Reads one list-form entry `{"name", "value" | "samples", "unit"?}` into the sink. Shared by the
 * own JSON form and JSON Lines. Unknown keys are ignored, so newer writers stay readable.
 * `place` is the cheap location stored with each reading; `where` finds the exact line:col and is
 * called only when there is an error to report.
 * @returns the metric name.
 * @throws InputError for a missing or empty name, a missing value, both value and samples, or
 *   values that are not finite numbers.
 */
export function readEntry(entry: unknown, sink: ReadingSink, place: string, where: () => string): string {
  if (!isRecord(entry)) {
    throw new InputError(`a metric entry must be an object, found ${describeJson(entry)}`, {
      where: where(),
      fix: 'write each metric as {"name": "...", "value": 1.5, "unit": "ms"}',
    });
  }
  const { name, value, samples, unit } = entry;
  if (typeof name !== 'string') {
    throw new InputError(
      `metric entry has ${name === undefined ? 'no "name"' : `a "name" that is ${describeJson(name)}`}`,
      {
        where: where(),
        fix: 'give every entry a "name" string',
      },
    );
  }
  if (unit !== undefined && typeof unit !== 'string') {
    throw new InputError(`"unit" of ${JSON.stringify(name)} is ${describeJson(unit)}, not a string`, {
      where: where(),
      fix: 'write the unit as a string such as "ms" or "B", or leave it out',
    });
  }
  if (value !== undefined && samples !== undefined) {
    throw new InputError(`metric ${JSON.stringify(name)} has both "value" and "samples"`, {
      where: where(),
      fix: 'give either one "value" or a "samples" array, not both',
    });
  }
  if (value === undefined && samples === undefined) {
    throw new InputError(`metric ${JSON.stringify(name)} has neither "value" nor "samples"`, {
      where: where(),
      fix: 'add "value": <number> or "samples": [<number>, ...]',
    });
  }
  const values = value !== undefined ? [value] : samples;
  if (!Array.isArray(values) || values.length === 0) {
    throw new InputError(`"samples" of ${JSON.stringify(name)} must be a non-empty array of numbers`, {
      where: where(),
      fix: 'write "samples": [<number>, ...] with at least one number',
    });
  }
  readNumbers(name, values, unit, sink, place, where);
  return name;
}

/** Adds each element of `values` as a sample; each must be a JSON number. */
export function readNumbers(
  name: string,
  values: unknown[],
  unit: string | undefined,
  sink: ReadingSink,
  place: string,
  where: () => string,
): void {
  for (const v of values) {
    if (typeof v !== 'number') {
      throw new InputError(`value of ${JSON.stringify(name)} is ${describeJson(v)}, not a number`, {
        where: where(),
        fix: 'write values as JSON numbers (no quotes), such as 412.5',
      });
    }
    if (!Number.isFinite(v)) {
      // JSON.parse turns 1e999 into Infinity.
      throw new InputError(`value of ${JSON.stringify(name)} overflows to ${v}`, {
        where: where(),
        fix: 'write a finite number',
      });
    }
    sink.add(name, v, unit, place);
  }
}

/** A short description of a JSON value for messages: `the string "12"`, `null`, `an object`. */
export function describeJson(value: unknown): string {
  if (value === null) return 'null';
  if (Array.isArray(value)) return 'an array';
  if (typeof value === 'string')
    return `the string ${JSON.stringify(value.length > 40 ? `${value.slice(0, 40)}...` : value)}`;
  if (typeof value === 'object') return 'an object';
  return `${typeof value} ${String(value)}`;
}
