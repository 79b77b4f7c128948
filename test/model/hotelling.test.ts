import { beforeAll, describe, expect, it } from 'vitest';
import fc from 'fast-check';
import { expectClose } from '../helpers/close.js';
import { jStat } from './jstat.js';
import { seededNormal } from './random.js';
import { chiSquareTail, hotellingTail } from '../../src/model/hotelling.js';
import { InputError } from '../../src/errors/input-error.js';
import { mahalanobisSquared } from '../../src/model/mahalanobis.js';
import { loadMatrixLibrary } from '../../src/model/matrix-library.js';

// Groups' joint check needs ml-matrix, which the gate's callers load first (prepareGate).
beforeAll(loadMatrixLibrary);

describe('chiSquareTail', () => {
  // Upper critical values of the chi-square distribution, NIST/SEMATECH e-Handbook table
  // 1.3.6.7.4 (3 decimals, from memory).
  const table: [number, number, number][] = [
    [1, 0.05, 3.841],
    [2, 0.05, 5.991],
    [5, 0.05, 11.07],
    [10, 0.05, 18.307],
    [20, 0.05, 31.41],
    [1, 0.01, 6.635],
    [10, 0.01, 23.209],
  ];
  for (const [p, alpha, x] of table) {
    it(`P(chi2_${p} > ${x}) = ${alpha}`, () => {
      expectClose(chiSquareTail(x, p), alpha, 3e-3);
    });
  }

  it('agrees with jstat (second opinion) and is 1 at 0, 0 at infinity', () => {
    fc.assert(
      fc.property(fc.double({ min: 0, max: 80, noNaN: true }), fc.integer({ min: 1, max: 40 }), (x, p) => {
        expectClose(chiSquareTail(x, p), 1 - jStat.chisquare.cdf(x, p), 1e-6, 1e-12);
      }),
      { numRuns: 200, seed: 29 },
    );
    expect(chiSquareTail(0, 3)).toBe(1);
    expect(chiSquareTail(Infinity, 3)).toBe(0);
  });
});

describe('far tails (computed directly, not as 1 - cdf)', () => {
  it('chiSquareTail keeps relative accuracy where 1 - cdf would be 0 (50-digit mpmath 1.3.0)', () => {
    // mpmath: upper incomplete gamma Q(p/2, d2/2) at 50 digits (A&S 6.5.31 continued fraction).
    expectClose(chiSquareTail(1000, 1), 1.7958327848007262e-219, 1e-13);
    // Two degrees of freedom: P(chi^2_2 > x) = exp(-x/2) exactly (from memory).
    expectClose(chiSquareTail(600, 2), Math.exp(-300), 1e-13);
  });

  it('hotellingTail with p = 2 follows the closed form of F(2, m): (1 + 2F/m)^(-m/2) (from memory)', () => {
    for (const [d2, n] of [
      [40, 30],
      [400, 1000],
      [3000, 5000],
    ] as const) {
      const t2 = (d2 * n) / (n + 1);
      const f = (t2 * (n - 2)) / (2 * (n - 1));
      const m = n - 2;
      expectClose(hotellingTail(d2, 2, n, 'unbiased'), Math.exp((-m / 2) * Math.log1p((2 * f) / m)), 1e-12);
    }
  });
});

describe('hotellingTail', () => {
  // Upper critical values of F(d1, d2), NIST/SEMATECH e-Handbook table 1.3.6.7.3 (3 decimals,
  // from memory). For the prediction form, F = d2_mle (n - 1)/n * n/(n + 1) * (n - p)/(p (n - 1))
  // = d2_mle (n - p) / (p (n + 1)), so the d2 that sits at the critical value is c p (n+1)/(n-p).
  const table: [number, number, number, number][] = [
    // [p, n - p, alpha, critical F]
    [1, 10, 0.05, 4.965],
    [2, 10, 0.05, 4.103],
    [5, 10, 0.05, 3.326],
    [3, 20, 0.05, 3.098],
    [10, 10, 0.05, 2.978],
    [2, 10, 0.01, 7.559],
    [5, 20, 0.01, 4.103],
  ];
  for (const [p, m, alpha, c] of table) {
    it(`F(${p}, ${m}) critical ${c} gives tail ${alpha}`, () => {
      const n = m + p;
      const d2Mle = (c * p * (n + 1)) / (n - p);
      expectClose(hotellingTail(d2Mle, p, n), alpha, 3e-3);
      const d2Unbiased = (d2Mle * (n - 1)) / n;
      expectClose(hotellingTail(d2Unbiased, p, n, 'unbiased'), alpha, 3e-3);
    });
  }

  it('agrees with the jstat F distribution on random inputs (second opinion)', () => {
    fc.assert(
      fc.property(
        fc.double({ min: 0.01, max: 200, noNaN: true }),
        fc.integer({ min: 1, max: 8 }),
        fc.integer({ min: 1, max: 60 }),
        (d2, p, extra) => {
          const n = p + extra;
          const f = (d2 * (n - p)) / (p * (n + 1));
          expectClose(hotellingTail(d2, p, n), 1 - jStat.centralF.cdf(f, p, n - p), 1e-6, 1e-10);
        },
      ),
      { numRuns: 200, seed: 31 },
    );
  });

  it('is calibrated: a new run from the same Gaussian falls below 0.05 about 5% of the time', () => {
    // The prediction form is exact for the plain sample covariance (Hotelling's T^2 for a new
    // observation), so the tail is uniform; the chi-square tail, which ignores the estimation,
    // would fire far more often with n = 10 runs of p = 3 metrics.
    const normal = seededNormal(2026);
    const p = 3;
    const n = 10;
    const trials = 4000;
    let hotellingAlarms = 0;
    let chiSquareAlarms = 0;
    const draw = (): number[] => {
      const a = normal();
      const b = normal();
      const c = normal();
      return [a, 0.6 * a + 0.8 * b, 0.3 * a - 0.2 * b + c];
    };
    for (let t = 0; t < trials; t++) {
      const rows = Array.from({ length: n }, draw);
      const mean = [0, 1, 2].map((i) => rows.reduce((s, r) => s + r[i]!, 0) / n);
      const covariance = [0, 1, 2].map((i) =>
        [0, 1, 2].map((j) => rows.reduce((s, r) => s + (r[i]! - mean[i]!) * (r[j]! - mean[j]!), 0) / n),
      );
      const d2 = mahalanobisSquared(draw(), mean, covariance);
      if (hotellingTail(d2, p, n) < 0.05) hotellingAlarms++;
      if (chiSquareTail(d2, p) < 0.05) chiSquareAlarms++;
    }
    // Binomial(4000, 0.05): sd 0.0034; allow about 3 sd.
    expect(Math.abs(hotellingAlarms / trials - 0.05)).toBeLessThan(0.011);
    expect(chiSquareAlarms / trials).toBeGreaterThan(0.15);
  });

  it('tends to the chi-square tail as n grows (common practice)', () => {
    expectClose(hotellingTail(7.815, 3, 1e6), chiSquareTail(7.815, 3), 1e-4);
  });

  it('rejects too few runs and bad distances with an InputError', () => {
    expect(() => hotellingTail(1, 3, 3)).toThrow(/more than 3 runs/);
    expect(() => hotellingTail(-1, 3, 10)).toThrow(InputError);
    expect(() => hotellingTail(Number.NaN, 3, 10)).toThrow(InputError);
    expect(() => chiSquareTail(1, 0)).toThrow(InputError);
    expect(hotellingTail(0, 2, 10)).toBe(1);
  });
});
