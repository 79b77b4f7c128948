import { InputError } from '../errors/input-error.js';
import type { Measurement, Run } from './run.js';

/**
 * The unit algebra, in one place for every reader, `check` and the history: the units Bellgate
 * can convert between, each as an exact integer multiple of a base unit
 * (time: nanosecond; size: byte), so conversions multiply or divide by an exact integer and
 * round once (412 ms -> 412 / 1000 s = 0.412 exactly as printed).
 * Time: ns, us, µs (U+00B5), μs (U+03BC), ms, s, sec, min, h and the spelled-out forms
 * (seconds, milliseconds, ...). Size: B, byte(s), kB and KB (both 1000 B), KiB (1024 B), MB, MiB,
 * GB, GiB. Rates and per-operation units compose with "/": ns/op, B/op, MB/s, KiB/s.
 * Units outside these tables (allocs/op, requests, %) are compared as plain text.
 */
interface Scale {
  dimension: string;
  factor: number;
}

const NS = 1;
const TIME: Record<string, number> = {
  ns: NS,
  nanosecond: NS,
  nanoseconds: NS,
  us: 1e3,
  µs: 1e3,
  μs: 1e3,
  microsecond: 1e3,
  microseconds: 1e3,
  ms: 1e6,
  millisecond: 1e6,
  milliseconds: 1e6,
  s: 1e9,
  sec: 1e9,
  second: 1e9,
  seconds: 1e9,
  min: 6e10,
  minute: 6e10,
  minutes: 6e10,
  h: 3.6e12,
  hour: 3.6e12,
  hours: 3.6e12,
};
const SIZE: Record<string, number> = {
  B: 1,
  byte: 1,
  bytes: 1,
  kB: 1e3,
  KB: 1e3,
  KiB: 1024,
  MB: 1e6,
  MiB: 1024 ** 2,
  GB: 1e9,
  GiB: 1024 ** 3,
};

function simpleScale(unit: string): Scale | undefined {
  if (Object.hasOwn(TIME, unit)) return { dimension: 'time', factor: TIME[unit]! };
  if (Object.hasOwn(SIZE, unit)) return { dimension: 'size', factor: SIZE[unit]! };
  return undefined;
}

/**
 * The dimension and exact factor(s) of a unit: a simple unit, or `numerator/denominator` where the
 * denominator is "op" or a time unit. Undefined for units outside the tables.
 * @example unitScale('MiB') // [{ dimension: 'size', factor: 1048576 }]
 */
export function unitScale(unit: string): Scale[] | undefined {
  const simple = simpleScale(unit);
  if (simple) return [simple];
  const slash = unit.indexOf('/');
  if (slash <= 0) return undefined;
  const top = simpleScale(unit.slice(0, slash));
  const bottomText = unit.slice(slash + 1);
  const bottom = bottomText === 'op' ? { dimension: 'op', factor: 1 } : simpleScale(bottomText);
  return top && bottom && bottom.dimension !== 'size' ? [top, bottom] : undefined;
}

/**
 * Converts a value from one unit to another of the same dimension; undefined when they are not
 * convertible (different dimensions, or a unit outside the tables and not equal as text).
 * @example convertUnit(412, 'ms', 's') // 0.412
 * @example convertUnit(1, 'ms', 'B') // undefined
 */
export function convertUnit(value: number, from: string, to: string): number | undefined {
  if (from === to) return value;
  const a = unitScale(from);
  const b = unitScale(to);
  if (!a || !b || a.length !== b.length) return undefined;
  if (a.some((part, i) => part.dimension !== b[i]!.dimension)) return undefined;
  // Numerator scales up, denominator scales down; each step by an exact integer ratio.
  let out = rescale(value, a[0]!.factor, b[0]!.factor);
  if (a[1] && b[1]) out = rescale(out, b[1].factor, a[1].factor);
  return out;
}

function rescale(value: number, from: number, to: number): number {
  return from >= to ? value * (from / to) : value / (to / from);
}

/**
 * Why a value in unit `from` cannot join a column in unit `to`, or undefined when it can (same
 * unit, convertible units, or a side without a unit, which gives nothing to check).
 * @example unitMismatch('s', 'ms') // undefined
 * @example unitMismatch('kB', 'ms') // 'kB (size) cannot be converted to ms (time)'
 */
export function unitMismatch(from: string | undefined, to: string | undefined): string | undefined {
  if (from === undefined || to === undefined || from === to) return undefined;
  if (convertUnit(1, from, to) !== undefined) return undefined;
  const kind = (u: string): string => {
    const scale = unitScale(u);
    return scale === undefined ? 'a unit Bellgate does not convert' : scale.map((p) => p.dimension).join(' per ');
  };
  return `${from} (${kind(from)}) cannot be converted to ${to} (${kind(to)})`;
}

/**
 * This run's values in the units the history stores them in (the unit the history first saw for
 * each metric): 0.121 s against a history in ms becomes 121 ms. `unitOf(name)` is the stored
 * unit, undefined for a metric the history lacks or stores without a unit. Pure: the run is not
 * changed, a new one is returned when anything converts.
 * @throws InputError naming the file and line, the metric and both units when they do not convert.
 * @example alignRunUnits(run, (name) => history.columns.get(name)?.unit)
 */
export function alignRunUnits(run: Run, unitOf: (name: string) => string | undefined): Run {
  let metrics: Run['metrics'] | undefined;
  for (const [name, m] of run.metrics) {
    const stored = unitOf(name);
    if (m.unit === undefined || stored === undefined || m.unit === stored) continue;
    const value = inStoredUnit(name, m, stored);
    metrics ??= new Map(run.metrics);
    metrics.set(name, { ...m, value, unit: stored });
  }
  return metrics === undefined ? run : { ...run, metrics };
}

/**
 * A measurement's value in the unit its history stores the metric in (`stored`; undefined when
 * the history has none, which leaves the value as it is): 0.121 s against ms is 121.
 * @throws InputError naming the reading's place (file and line), the metric and both units when they do not convert.
 * @example inStoredUnit('time/parse', { value: 0.121, unit: 's', count: 1 }, 'ms') // 121
 */
export function inStoredUnit(name: string, m: Measurement, stored: string | undefined): number {
  if (m.unit === undefined || stored === undefined || m.unit === stored) return m.value;
  const value = convertUnit(m.value, m.unit, stored);
  if (value !== undefined && Number.isFinite(value)) return value;
  throw new InputError(
    `metric ${JSON.stringify(name)} is in ${JSON.stringify(m.unit)} but its history is in ${JSON.stringify(stored)}: ${unitMismatch(m.unit, stored) ?? 'the value does not fit that unit'}`,
    {
      where: m.where ?? name,
      fix: `write ${JSON.stringify(name)} in ${JSON.stringify(stored)} or a unit that converts to it, or give the metric another name to start a new history`,
    },
  );
}
