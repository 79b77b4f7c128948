import { describe, expect, it } from 'vitest';
import fc from 'fast-check';
import { expectClose } from '../helpers/close.js';
import { InputError } from '../../src/errors/input-error.js';
import { fromFitScale, toFitScale } from '../../src/model/transform.js';

describe('toFitScale and fromFitScale', () => {
  it('log turns a ratio into a difference: ln(1.1 x) - ln(x) = ln 1.1 ≈ 0.09531 (from memory)', () => {
    expectClose(toFitScale(1.1 * 412.5, 'log', 'm') - toFitScale(412.5, 'log', 'm'), 0.0953101798, 1e-9);
    expectClose(toFitScale(Math.E, 'log', 'm'), 1, 1e-15);
    expect(toFitScale(-3, 'none', 'm')).toBe(-3);
  });

  it('round-trips any positive value', () => {
    fc.assert(
      fc.property(fc.double({ min: 1e-300, max: 1e300, noNaN: true }), (x) => {
        expectClose(fromFitScale(toFitScale(x, 'log', 'm'), 'log'), x, 1e-13);
        expect(fromFitScale(toFitScale(x, 'none', 'm'), 'none')).toBe(x);
      }),
      { numRuns: 200, seed: 37 },
    );
  });

  it('names the metric when a value cannot be transformed', () => {
    for (const bad of [0, -1]) {
      try {
        toFitScale(bad, 'log', 'bundle/app.js.gz');
        expect.fail('expected an InputError');
      } catch (error) {
        expect(error).toBeInstanceOf(InputError);
        expect((error as InputError).where).toBe('bundle/app.js.gz');
        expect((error as InputError).fix).toMatch(/transform: none/);
      }
    }
    expect(() => toFitScale(Number.NaN, 'none', 'm')).toThrow(InputError);
  });
});
