import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { selectBaseline } from '../../src/gate/baseline.js';
import { InputError } from '../../src/model/input-error.js';
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
    expect(() => selectBaseline(bad, 'time/x', settingsWith({ transform: 'log' }))).toThrow(/run-2 has value -1 for time\/x/);
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
    const young = selectBaseline(historyOf({ m: [...level(100, 40), ...level(110, 5)] }), 'm', settingsWith({ minRuns: 8 }));
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
        // The log scale still goes through the checked path and agrees on which runs it keeps.
        if (present.every((p) => p.x > 0)) {
          const logged = selectBaseline(history, 'm', settingsWith({ window, changePoints: false, transform: 'log' }));
          expect(logged.runIds).toEqual(got.runIds);
          expect(logged.available).toBe(got.available);
        }
      }),
      { numRuns: 300, seed: 9117 },
    );
  });
});
