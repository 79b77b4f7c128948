import { createRequire } from 'node:module';
import { describe, expect, it } from 'vitest';
import { collectRun } from '../../src/inputs/collect.js';
import type { Reading, ReadResult } from '../../src/inputs/run.js';
import { inputErrorOf } from './helpers.js';

// jStat, a reference statistics library from the npm registry (dev dependency; ships no types).
const jStat = createRequire(import.meta.url)('jstat') as Record<'median' | 'min', (values: number[]) => number>;

function result(readings: Reading[], meta: [string, string][] = [], notFitted: [string, string][] = []): ReadResult {
  return { readings, meta: new Map(meta), notFitted: new Map(notFitted) };
}

describe('collectRun', () => {
  it('aggregate auto keeps the fastest sample of a timing and the median of anything else (Chen & Revels 2016)', () => {
    const samples = [8.4, 8.1, 12.9, 8.2, 15.3];
    const run = collectRun(
      [
        result([
          ...samples.map((value) => ({ name: 'parse', value, unit: 'ms' })),
          ...samples.map((value) => ({ name: 'heap', value, unit: 'MiB' })),
        ]),
      ],
      () => 'auto',
    );
    // reference values: jStat (an npm statistics library) on the same samples
    expect(run.metrics.get('parse')!.value).toBe(jStat.min(samples));
    expect(run.metrics.get('heap')!.value).toBe(jStat.median(samples));
  });

  it('aggregates the samples of a name across files by the rule for that name, keeping the count', () => {
    const run = collectRun(
      [
        result([
          { name: 'a', value: 1 },
          { name: 'b', value: 10 },
          { name: 'a', value: 7 },
        ]),
        result([
          { name: 'a', value: 4 },
          { name: 'b', value: 30 },
        ]),
      ],
      (name) => (name === 'a' ? 'max' : 'mean'),
    );
    expect(run.metrics.get('a')).toMatchObject({ value: 7, count: 3 });
    expect(run.metrics.get('b')).toMatchObject({ value: 20, count: 2 });
  });

  it('uses the median by default rule and keeps the unit', () => {
    const run = collectRun([result([1, 9, 2].map((value) => ({ name: 'x', value, unit: 'ms' })))], () => 'median');
    expect(run.metrics.get('x')).toMatchObject({ value: 2, unit: 'ms', count: 3 });
  });

  it('converts later samples to the first-seen unit (1500 ms joins 2 s as 1.5 s)', () => {
    const run = collectRun(
      [
        result([{ name: 't', value: 2, unit: 's', where: 'a.json:1' }]),
        result([{ name: 't', value: 1500, unit: 'ms', where: 'b.csv:2' }]),
      ],
      () => 'mean',
    );
    expect(run.metrics.get('t')).toMatchObject({ value: 1.75, unit: 's', count: 2 });
  });

  it('refuses incompatible units, naming both sources', () => {
    const error = inputErrorOf(() =>
      collectRun(
        [
          result([{ name: 't', value: 2, unit: 'ms', where: 'a.json:1' }]),
          result([{ name: 't', value: 3, unit: 'B', where: 'b.csv:2' }]),
        ],
        () => 'mean',
      ),
    );
    expect(error.message).toBe(
      'metric "t" has unit "ms" at a.json:1 but unit "B" at b.csv:2, which cannot be converted',
    );
    const missing = inputErrorOf(() =>
      collectRun(
        [
          result([
            { name: 't', value: 2, unit: 'ms', where: 'a.json:1' },
            { name: 't', value: 2, where: 'a.json:2' },
          ]),
        ],
        () => 'mean',
      ),
    );
    expect(missing.message).toMatch(/unit "ms" at a.json:1 but no unit at a.json:2/);
  });

  it('refuses a mean that overflows instead of returning Infinity', () => {
    const error = inputErrorOf(() =>
      collectRun(
        [
          result([
            { name: 'big', value: 1.7e308 },
            { name: 'big', value: 1.7e308 },
          ]),
        ],
        () => 'mean',
      ),
    );
    expect(error.message).toMatch(/overflows/);
  });

  it('merges meta (first value wins) and notFitted, and keeps hostile names as Map keys', () => {
    const run = collectRun(
      [
        result([{ name: '__proto__', value: 1 }], [['goos', 'linux']], [['t/skip', 'skipped']]),
        result(
          [],
          [
            ['goos', 'darwin'],
            ['pkg', 'p'],
          ],
        ),
      ],
      () => 'median',
    );
    expect([...run.meta]).toEqual([
      ['goos', 'linux'],
      ['pkg', 'p'],
    ]);
    expect(run.notFitted?.get('t/skip')).toBe('skipped');
    expect(run.metrics.get('__proto__')).toMatchObject({ value: 1, count: 1 });
    expect(Object.getPrototypeOf(run.metrics)).toBe(Map.prototype);
  });
});
