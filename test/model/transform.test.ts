import { describe, expect, it } from 'vitest';
import fc from 'fast-check';
import { expectClose } from '../helpers/close.js';
import { fromFitScale, toFitScale } from '../../src/model/transform.js';

describe('toFitScale and fromFitScale', () => {
  it('log turns a ratio into a difference: ln(1.1 x) - ln(x) = ln 1.1 ≈ 0.09531 (from memory)', () => {
    expectClose(toFitScale(1.1 * 412.5, 'log') - toFitScale(412.5, 'log'), 0.0953101798, 1e-9);
    expectClose(toFitScale(Math.E, 'log'), 1, 1e-15);
    expect(toFitScale(-3, 'none')).toBe(-3);
  });

  it('round-trips any positive value', () => {
    fc.assert(
      fc.property(fc.double({ min: 1e-300, max: 1e300, noNaN: true }), (x) => {
        expectClose(fromFitScale(toFitScale(x, 'log'), 'log'), x, 1e-13);
        expect(fromFitScale(toFitScale(x, 'none'), 'none')).toBe(x);
      }),
      { numRuns: 200, seed: 37 },
    );
  });

  it('refuses a value the scale cannot take (the gate names the metric)', () => {
    for (const bad of [0, -1]) expect(() => toFitScale(bad, 'log')).toThrow(RangeError);
    expect(() => toFitScale(Number.NaN, 'none')).toThrow(RangeError);
  });
});
