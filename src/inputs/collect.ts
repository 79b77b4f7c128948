import type { Aggregate } from '../config/types.js';
import { InputError } from '../errors/input-error.js';
import { aggregateSamples } from './aggregate.js';
import { meanAndSquares } from '../model/moments.js';
import type { Measurement, ReadResult, Run } from './run.js';
import { convertUnit } from './units.js';

interface Samples {
  unit: string | undefined;
  /** Where the first sample came from, for messages. */
  where: string | undefined;
  values: number[];
}

/**
 * Folds the readings of several files into one Run. All samples of a name (repeated lines, several
 * files) are aggregated by `aggregateFor(name)` (auto | median | mean | min | max; auto by the unit); `count` is how many.
 * Units: the first-seen unit of a metric is kept and later samples are converted to it when both
 * are known units of the same dimension (units.ts: 1500 ms joins 2 s as 1.5 s). Meta: the first
 * value of a key wins. notFitted: the union, first reason kept.
 * @throws InputError naming both sources when a metric comes in incompatible units, or with a unit
 *   in one place and none in another.
 * @example collectRun([{ readings: [{ name: 'a', value: 1 }, { name: 'a', value: 3 }], notFitted: new Map(), meta: new Map() }], () => 'mean').metrics.get('a') // { value: 2, count: 2 }
 */
export function collectRun(results: ReadResult[], aggregateFor: (name: string) => Aggregate): Run {
  const byName = new Map<string, Samples>();
  const meta = new Map<string, string>();
  const notFitted = new Map<string, string>();
  for (const result of results) {
    for (const reading of result.readings) {
      const seen = byName.get(reading.name);
      if (!seen) {
        byName.set(reading.name, { unit: reading.unit, where: reading.where, values: [reading.value] });
        continue;
      }
      seen.values.push(converted(reading.name, reading.value, reading.unit, reading.where, seen));
    }
    for (const [key, value] of result.meta) if (!meta.has(key)) meta.set(key, value);
    for (const [name, reason] of result.notFitted) if (!notFitted.has(name)) notFitted.set(name, reason);
  }
  const metrics: Run['metrics'] = new Map();
  for (const [name, { unit, values, where }] of byName) {
    const value = aggregateSamples(values, aggregateFor(name), unit);
    if (!Number.isFinite(value)) {
      throw new InputError(
        `the ${aggregateFor(name)} of the ${values.length} samples of ${JSON.stringify(name)} overflows`,
        {
          where,
          fix: 'check the values of this metric, or change its unit so the numbers are smaller',
        },
      );
    }
    const measurement: Measurement = { value, count: values.length };
    if (unit !== undefined) measurement.unit = unit;
    if (where !== undefined) measurement.where = where;
    const spread = sampleSpread(values);
    if (spread !== undefined) measurement.spread = spread;
    metrics.set(name, measurement);
  }
  return notFitted.size > 0 ? { metrics, meta, notFitted } : { metrics, meta };
}

function converted(
  name: string,
  value: number,
  unit: string | undefined,
  where: string | undefined,
  seen: Samples,
): number {
  if (unit === seen.unit) return value;
  const out = unit !== undefined && seen.unit !== undefined ? convertUnit(value, unit, seen.unit) : undefined;
  if (out !== undefined && Number.isFinite(out)) return out;
  const show = (u: string | undefined): string => (u === undefined ? 'no unit' : `unit ${JSON.stringify(u)}`);
  throw new InputError(
    `metric ${JSON.stringify(name)} has ${show(seen.unit)} at ${seen.where ?? 'its first source'} but ${show(unit)} at ${where ?? 'another source'}, which cannot be converted`,
    { where, fix: 'write the metric in one unit everywhere, or in convertible units (ms and s, kB and MiB)' },
  );
}

/**
 * The relative spread of one run's samples: the sd of their logarithms when all are above 0,
 * else sd / |mean|; undefined for one sample or a mean of 0. The gate compares it with the noise
 * between runs to say whether more samples per run would help.
 */
function sampleSpread(values: readonly number[]): number | undefined {
  if (values.length < 2) return undefined;
  const positive = values.every((v) => v > 0);
  const xs = positive ? values.map(Math.log) : values;
  const { mean, squares } = meanAndSquares(xs);
  const sd = Math.sqrt(squares / (xs.length - 1));
  if (positive) return sd;
  return mean === 0 ? undefined : sd / Math.abs(mean);
}
