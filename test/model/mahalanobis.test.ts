import { beforeAll, describe, expect, it } from 'vitest';
import fc from 'fast-check';
import { expectClose } from '../helpers/close.js';
import { jStat } from './jstat.js';
import { InputError } from '../../src/errors/input-error.js';
import { mahalanobisContributions, mahalanobisSquared } from '../../src/model/mahalanobis.js';
import { loadMatrixLibrary } from '../../src/model/matrix-library.js';

// Groups' joint check needs ml-matrix, which the gate's callers load first (prepareGate).
beforeAll(loadMatrixLibrary);

/** d' A^-1 d with the inverse from jstat (second opinion). */
function jstatDistance(x: number[], mean: number[], covariance: number[][]): number {
  const inverse = jStat.inv(covariance);
  const d = x.map((v, i) => v - mean[i]!);
  return d.reduce((sum, di, i) => sum + di * inverse[i]!.reduce((s, a, j) => s + a * d[j]!, 0), 0);
}

describe('mahalanobisSquared', () => {
  it('with a diagonal covariance is the sum of squared z-scores (definition)', () => {
    expectClose(
      mahalanobisSquared(
        [1, 1],
        [0, 0],
        [
          [1, 0],
          [0, 4],
        ],
      ),
      1.25,
      1e-15,
    );
    expectClose(
      mahalanobisSquared(
        [13, 5, -1],
        [10, 5, 0],
        [
          [9, 0, 0],
          [0, 2, 0],
          [0, 0, 0.25],
        ],
      ),
      1 + 0 + 4,
      1e-14,
    );
  });

  it('2 x 2 by the closed-form inverse [[c, -b], [-b, a]] / (ac - b^2)', () => {
    const [a, b, c] = [4, 1.5, 2];
    const [dx, dy] = [1.2, -0.7];
    const expected = (c * dx * dx - 2 * b * dx * dy + a * dy * dy) / (a * c - b * b);
    expectClose(
      mahalanobisSquared(
        [dx, dy],
        [0, 0],
        [
          [a, b],
          [b, c],
        ],
      ),
      expected,
      1e-14,
    );
  });

  it('agrees with jstat on random positive definite matrices (second opinion)', () => {
    fc.assert(
      fc.property(
        fc.integer({ min: 1, max: 6 }).chain((p) =>
          fc.tuple(
            fc.array(fc.array(fc.double({ min: -3, max: 3, noNaN: true }), { minLength: p, maxLength: p }), {
              minLength: p,
              maxLength: p,
            }),
            fc.array(fc.double({ min: -5, max: 5, noNaN: true }), { minLength: p, maxLength: p }),
          ),
        ),
        ([a, d]) => {
          const p = d.length;
          // A A' + I is symmetric positive definite.
          const covariance = a.map((ri, i) =>
            a.map((rj, j) => ri.reduce((s, v, k) => s + v * rj[k]!, 0) + (i === j ? 1 : 0)),
          );
          const mean = d.map(() => 0);
          const d2 = mahalanobisSquared(d, mean, covariance);
          expectClose(d2, jstatDistance(d, mean, covariance), 1e-8, 1e-10);
          const shares = mahalanobisContributions(d, mean, covariance);
          expect(shares).toHaveLength(p);
          expectClose(
            shares.reduce((s, v) => s + v, 0),
            d2,
            1e-12,
            1e-12,
          );
        },
      ),
      { numRuns: 200, seed: 23 },
    );
  });

  it('contributions point at the coordinate that moved', () => {
    const covariance = [
      [1, 0.5, 0],
      [0.5, 1, 0],
      [0, 0, 1],
    ];
    const shares = mahalanobisContributions([0, 0, 4], [0, 0, 0], covariance);
    expectClose(shares[2]!, 16, 1e-14);
    expectClose(shares[0]!, 0, 0, 1e-14);
  });

  it('a singular covariance (two identical metrics) gets a tiny ridge, not a crash', () => {
    const covariance = [
      [1, 1],
      [1, 1],
    ];
    // Along the shared direction: (1, 1) S^+ (1, 1)' = 1 with the pseudo-inverse S^+ = S / 4 of
    // S = [[1, 1], [1, 1]] (by hand); the ridge barely changes it.
    expectClose(mahalanobisSquared([1, 1], [0, 0], covariance), 1, 1e-6);
    // Off the shared direction the distance becomes huge (the metrics never disagreed before).
    expect(mahalanobisSquared([1, -1], [0, 0], covariance)).toBeGreaterThan(1e6);
  });

  it('rejects mismatched sizes, non-finite values and an all-zero covariance', () => {
    expect(() => mahalanobisSquared([1, 2], [0], [[1]])).toThrow(InputError);
    expect(() => mahalanobisSquared([1, 2], [0, 0], [[1, 0]])).toThrow(InputError);
    expect(() =>
      mahalanobisSquared(
        [1, Number.NaN],
        [0, 0],
        [
          [1, 0],
          [0, 1],
        ],
      ),
    ).toThrow(InputError);
    expect(() =>
      mahalanobisSquared(
        [1, 2],
        [0, 0],
        [
          [0, 0],
          [0, 0],
        ],
      ),
    ).toThrow(/no positive variance/);
    expect(() =>
      mahalanobisSquared(
        [1, 2],
        [0, 0],
        [
          [1, 0],
          [0, -0.5],
        ],
      ),
    ).toThrow(/not positive definite/);
  });
});
