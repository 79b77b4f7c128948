import { describe, expect, it } from 'vitest';
import { aggregateSamples } from '../../src/inputs/aggregate.js';
import { convertUnit, unitScale } from '../../src/inputs/units.js';
import { expectClose } from '../helpers/close.js';
import { createRequire } from 'node:module';
import fc from 'fast-check';

// jStat, a reference statistics library from the npm registry (dev dependency; ships no types).
const jStat = createRequire(import.meta.url)('jstat') as Record<
  'median' | 'mean' | 'min' | 'max',
  (values: number[]) => number
>;

describe('convertUnit', () => {
  it('converts time units by the SI definitions (SI Brochure, 9th ed., tables 7 and 8)', () => {
    expect(convertUnit(412, 'ms', 's')).toBe(0.412);
    expect(convertUnit(1.5, 's', 'ms')).toBe(1500);
    expect(convertUnit(1, 'min', 's')).toBe(60);
    expect(convertUnit(1, 'h', 'min')).toBe(60);
    expect(convertUnit(2500, 'ns', 'µs')).toBe(2.5);
    expect(convertUnit(2.5, 'μs', 'us')).toBe(2.5); // Greek mu and micro sign are the same unit
    expect(convertUnit(3, 'seconds', 'ms')).toBe(3000);
  });

  it('converts size units: kB/KB = 1000 B, KiB = 1024 B (IEC 80000-13)', () => {
    expect(convertUnit(1, 'KiB', 'B')).toBe(1024);
    expect(convertUnit(1, 'kB', 'B')).toBe(1000);
    expect(convertUnit(1, 'KB', 'kB')).toBe(1);
    expect(convertUnit(1.5, 'MiB', 'kB')).toBe(1572.864);
    expect(convertUnit(1, 'GiB', 'MiB')).toBe(1024);
    expect(convertUnit(2, 'GB', 'MB')).toBe(2000);
  });

  it('converts per-operation and per-time units part by part', () => {
    expect(convertUnit(1, 'us/op', 'ns/op')).toBe(1000);
    expect(convertUnit(2, 'MB/s', 'kB/s')).toBe(2000);
    expect(convertUnit(1, 'MB/ms', 'MB/s')).toBe(1000);
  });

  it('refuses to convert across dimensions or unknown units', () => {
    expect(convertUnit(1, 'ms', 'B')).toBeUndefined();
    expect(convertUnit(1, 'ns/op', 'ns')).toBeUndefined();
    expect(convertUnit(1, 'allocs/op', 'B/op')).toBeUndefined();
    expect(convertUnit(1, 'furlongs', 'ms')).toBeUndefined();
    expect(convertUnit(7, 'allocs/op', 'allocs/op')).toBe(7);
    expect(unitScale('B/B')).toBeUndefined();
    expect(unitScale('__proto__')).toBeUndefined();
  });

  it('round-trips: converting there and back returns the value (property)', () => {
    const units = ['ns', 'us', 'ms', 's', 'min', 'h'];
    fc.assert(
      fc.property(
        fc.double({ min: -1e12, max: 1e12, noNaN: true }),
        fc.constantFrom(...units),
        fc.constantFrom(...units),
        (v, a, b) => {
          expectClose(convertUnit(convertUnit(v, a, b)!, b, a)!, v, 1e-15, 1e-290); // subnormals may underflow
        },
      ),
      { numRuns: 200 },
    );
  });
});

describe('aggregateSamples', () => {
  it('agrees with jstat (a reference library) for median, mean, min and max', () => {
    fc.assert(
      // -0 and 0 are the same measurement; jStat and Math.min may return either.
      fc.property(
        fc.array(
          fc.double({ min: -1e6, max: 1e6, noNaN: true }).map((v) => (v === 0 ? 0 : v)),
          { minLength: 1, maxLength: 50 },
        ),
        (values) => {
          expectClose(aggregateSamples(values, 'median'), jStat.median(values), 1e-12, 1e-9);
          expectClose(aggregateSamples(values, 'mean'), jStat.mean(values), 1e-9, 1e-6);
          expect(aggregateSamples(values, 'min')).toBe(jStat.min(values));
          expect(aggregateSamples(values, 'max')).toBe(jStat.max(values));
        },
      ),
      { numRuns: 200 },
    );
  });

  it('takes the middle pair for an even count (median definition)', () => {
    expect(aggregateSamples([3, 1, 2, 10], 'median')).toBe(2.5);
  });
});
