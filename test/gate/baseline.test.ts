import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { selectBaseline } from '../../src/gate/baseline.js';
import { InputError } from '../../src/errors/input-error.js';
import { expectClose } from '../helpers/close.js';
import { historyOf, settingsWith } from './helpers/scenario.js';

describe('selectBaseline', () => {
  it('keeps the newest `window` values that exist, with their run ids', () => {
    const history = historyOf({ m: [1, 2, Number.NaN, 4, 5, 6] });
    const b = selectBaseline(history, 'm', settingsWith({ window: 3, changePoints: false }));
    expect(b.values).toEqual([4, 5, 6]);
    expect(b.runIds).toEqual(['run-4', 'run-5', 'run-6']);
    expect(b.available).toBe(5);
    expect(selectBaseline(history, 'other', settingsWith()).values).toEqual([]);
  });

  it('relative-to divides by the reference of the same run and skips runs without it', () => {
    const history = historyOf({ m: [10, 20, 30, 40], calib: [2, Number.NaN, 0, 8] });
    const b = selectBaseline(history, 'm', settingsWith({ relativeTo: 'calib', changePoints: false }));
    expect(b.values).toEqual([5, 5]); // 10/2, 40/8; run-2 lacks calib, run-3 has a zero reference
    expect(b.runIds).toEqual(['run-1', 'run-4']);
    expect(b.relativeTo).toBe('calib');
  });

  it('moves values to the log scale and names a run whose value cannot be logged', () => {
    const history = historyOf({ m: [Math.E, 1] });
    expectClose(selectBaseline(history, 'm', settingsWith({ transform: 'log' })).values[0]!, 1, 1e-15);
    const bad = historyOf({ 'time/x': [3, -1, 4] });
    expect(() => selectBaseline(bad, 'time/x', settingsWith({ transform: 'log' }))).toThrow(InputError);
    expect(() => selectBaseline(bad, 'time/x', settingsWith({ transform: 'log' }))).toThrow(
      /run-2 has value -1 for time\/x/,
    );
  });

  it('change points: uses only the runs since the last level change once they are min-runs', () => {
    // 40 runs near 100 then 12 near 110 (alternating +-0.5): a clear level change at run-41
    const level = (base: number, count: number) => Array.from({ length: count }, (_, i) => base + (i % 2 ? 0.5 : -0.5));
    const history = historyOf({ m: [...level(100, 40), ...level(110, 12)] });
    const b = selectBaseline(history, 'm', settingsWith({ minRuns: 8 }));
    expect(b.since).toBe('run-41');
    expect(b.values).toHaveLength(12);
    expect(b.window?.values).toHaveLength(52);
    // fewer than min-runs since the change: the whole window stays
    const young = selectBaseline(
      historyOf({ m: [...level(100, 40), ...level(110, 5)] }),
      'm',
      settingsWith({ minRuns: 8 }),
    );
    expect(young.since).toBeUndefined();
    expect(young.values).toHaveLength(45);
    // change-points: false turns it off
    expect(selectBaseline(history, 'm', settingsWith({ minRuns: 8, changePoints: false })).since).toBeUndefined();
  });

  it('property: on the plain scale it equals the straightforward filter-then-slice of the column', () => {
    // The optimised path walks back from the newest run and counts older runs only on demand;
    // the reference below builds every (run, value) pair, drops the missing, keeps the last
    // `window` and counts all of them. Missing values (NaN) and windows above the run count included.
    const cell = fc.oneof(fc.double({ min: -1e6, max: 1e6, noNaN: true }), fc.constant(Number.NaN));
    fc.assert(
      fc.property(fc.array(cell, { maxLength: 120 }), fc.integer({ min: 2, max: 150 }), (column, window) => {
        const history = historyOf({ m: column });
        const got = selectBaseline(history, 'm', settingsWith({ window, changePoints: false }));
        const present = column.map((x, i) => ({ x, id: `run-${i + 1}` })).filter((p) => Number.isFinite(p.x));
        const kept = present.slice(Math.max(0, present.length - window));
        expect(got.values).toEqual(kept.map((p) => p.x));
        expect(got.runIds).toEqual(kept.map((p) => p.id));
        expect(got.available).toBe(present.length);
        // The log scale goes through the checked path: the same runs, each value's Math.log, or
        // an error naming the oldest run whose value is not above 0.
        const logSettings = settingsWith({ window, changePoints: false, transform: 'log' });
        const firstBad = present.find((p) => !(p.x > 0));
        if (firstBad === undefined) {
          const logged = selectBaseline(history, 'm', logSettings);
          expect(logged.values).toEqual(kept.map((p) => Math.log(p.x)));
          expect(logged.runIds).toEqual(got.runIds);
          expect(logged.available).toBe(got.available);
        } else {
          expect(() => selectBaseline(history, 'm', logSettings)).toThrow(
            `history run ${firstBad.id} has value ${firstBad.x} for m`,
          );
        }
      }),
      { numRuns: 300, seed: 9117 },
    );
  });

  it('property: relative-to keeps the newest `window` runs holding both values and a non-zero reference', () => {
    // Reference: pair every run, keep those with a finite value and a finite non-zero reference,
    // divide, keep the last `window`; `available` counts the runs holding the metric at all.
    // Whole numbers and halves (no subnormal reference whose ratio would overflow), zeros and gaps.
    const cell = fc.oneof(
      fc.integer({ min: -400, max: 400 }).map((k) => k / 2),
      fc.constant(Number.NaN),
      fc.constant(0),
    );
    const columns = fc
      .integer({ min: 0, max: 80 })
      .chain((n) =>
        fc.tuple(fc.array(cell, { minLength: n, maxLength: n }), fc.array(cell, { minLength: n, maxLength: n })),
      );
    fc.assert(
      fc.property(columns, fc.integer({ min: 2, max: 90 }), ([m, calib], window) => {
        const history = historyOf({ m, calib });
        const got = selectBaseline(history, 'm', settingsWith({ window, changePoints: false, relativeTo: 'calib' }));
        const pairs = m
          .map((x, i) => ({ x, r: calib[i]!, id: `run-${i + 1}` }))
          .filter((p) => Number.isFinite(p.x) && Number.isFinite(p.r) && p.r !== 0);
        const kept = pairs.slice(Math.max(0, pairs.length - window));
        expect(got.values).toEqual(kept.map((p) => p.x / p.r));
        expect(got.runIds).toEqual(kept.map((p) => p.id));
        expect(got.available).toBe(m.filter((x) => Number.isFinite(x)).length);
      }),
      { numRuns: 300, seed: 9118 },
    );
  });
});
