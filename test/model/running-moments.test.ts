import { describe, expect, it } from 'vitest';
import fc from 'fast-check';
import { expectClose } from '../helpers/close.js';
import { seededNormal } from './random.js';
import { meanAndSquares } from '../../src/model/moments.js';
import { RunningMoments } from '../../src/model/running-moments.js';

describe('RunningMoments', () => {
  it('agrees with the two-pass meanAndSquares over a sliding window on random data', () => {
    const normal = seededNormal(99);
    // A large offset with small noise, the case where one-pass sums lose digits (cf. NIST NumAcc).
    const values = Array.from({ length: 3000 }, () => 1e6 + 0.1 * normal());
    const window = 60;
    const moments = new RunningMoments();
    for (let i = 0; i < values.length; i++) {
      moments.add(values[i]!);
      if (i >= window) moments.remove(values[i - window]!);
      if (i >= window - 1) {
        const reference = meanAndSquares(values.slice(i - window + 1, i + 1));
        expect(moments.n).toBe(window);
        expectClose(moments.mean, reference.mean, 1e-14);
        expectClose(moments.squares, reference.squares, 1e-7);
        expectClose(moments.variance('unbiased'), reference.squares / (window - 1), 1e-7);
      }
    }
  });

  it('agrees with meanAndSquares for any add/remove sequence (fast-check)', () => {
    fc.assert(
      fc.property(
        fc.array(fc.double({ min: -1e3, max: 1e3, noNaN: true }), { minLength: 3, maxLength: 80 }),
        fc.integer({ min: 2, max: 20 }),
        (values, window) => {
          const moments = new RunningMoments();
          values.forEach((x, i) => {
            moments.add(x);
            if (i >= window) moments.remove(values[i - window]!);
          });
          const reference = meanAndSquares(values.slice(Math.max(0, values.length - window)));
          expectClose(moments.mean, reference.mean, 1e-9, 1e-9);
          expectClose(moments.squares, reference.squares, 1e-6, 1e-6);
        },
      ),
      { numRuns: 200, seed: 5 },
    );
  });

  it('variance of 1..4: 1.25 (divide by n) and 5/3 (divide by n - 1), by hand', () => {
    const moments = RunningMoments.of([1, 2, 3, 4]);
    expectClose(moments.variance('mle'), 1.25, 1e-15);
    expectClose(moments.variance('unbiased'), 5 / 3, 1e-15);
  });

  it('empties cleanly and rejects misuse with a RangeError', () => {
    const moments = RunningMoments.of([5]);
    moments.remove(5);
    expect(moments.n).toBe(0);
    expect(moments.squares).toBe(0);
    expect(() => moments.remove(5)).toThrow(RangeError);
    expect(() => moments.variance('mle')).toThrow(RangeError);
    expect(() => RunningMoments.of([1]).variance('unbiased')).toThrow(RangeError);
    expect(() => moments.add(Number.NaN)).toThrow(RangeError);
  });
});
