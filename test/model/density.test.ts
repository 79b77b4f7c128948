import { describe, expect, it } from 'vitest';
import fc from 'fast-check';
import { expectClose } from '../helpers/close.js';
import { jStat } from './jstat.js';
import {
  gaussianDensity,
  gaussianLogDensity,
  plugInRelativeDensity,
  predictiveRelativeDensity,
  predictiveScale,
} from '../../src/model/density.js';

describe('gaussianDensity', () => {
  // Abramowitz & Stegun, Handbook of Mathematical Functions, table 26.1, Z(x) column
  // (10 significant digits, from memory).
  const table: [number, number][] = [
    [0, 0.3989422804],
    [0.5, 0.3520653268],
    [1, 0.2419707245],
    [1.5, 0.1295175957],
    [2, 0.05399096651],
    [2.5, 0.01752830049],
    [3, 0.004431848412],
    [4, 0.0001338302258],
  ];
  for (const [x, z] of table) {
    it(`Z(${x}) = ${z} (A&S table 26.1)`, () => {
      expectClose(gaussianDensity(x, 0, 1), z, 5e-10);
      // Symmetry and location-scale: p(mu + s x; mu, s) = Z(x) / s.
      expectClose(gaussianDensity(-x, 0, 1), z, 5e-10);
      expectClose(gaussianDensity(100 + 2 * x, 100, 2), z / 2, 5e-10);
    });
  }

  it('integrates to 1 (Simpson rule over ±12 sigma; common practice)', () => {
    const mean = 412.5;
    const sd = 3.2;
    const steps = 2400;
    const a = mean - 12 * sd;
    const h = (24 * sd) / steps;
    let sum = gaussianDensity(a, mean, sd) + gaussianDensity(a + steps * h, mean, sd);
    for (let i = 1; i < steps; i++) sum += (i % 2 === 1 ? 4 : 2) * gaussianDensity(a + i * h, mean, sd);
    expectClose((sum * h) / 3, 1, 1e-10);
  });

  it('log density stays finite where the density underflows (exact: -x^2/2 - ln sqrt(2 pi))', () => {
    expect(gaussianDensity(60, 0, 1)).toBe(0);
    expectClose(gaussianLogDensity(60, 0, 1), -1800 - 0.5 * Math.log(2 * Math.PI), 1e-14);
  });

  it('agrees with jstat on random inputs (second opinion)', () => {
    fc.assert(
      fc.property(
        fc.double({ min: -1e6, max: 1e6, noNaN: true }),
        fc.double({ min: 1e-3, max: 1e3, noNaN: true }),
        fc.double({ min: -8, max: 8, noNaN: true }),
        (mean, sd, z) => {
          const x = mean + z * sd;
          expectClose(gaussianDensity(x, mean, sd), jStat.normal.pdf(x, mean, sd), 1e-8, 1e-300);
        },
      ),
      { numRuns: 300, seed: 20261201 },
    );
  });

  it('rejects a negative or non-finite sd', () => {
    expect(() => gaussianDensity(0, 0, -1)).toThrow(RangeError);
    expect(() => gaussianLogDensity(0, 0, Number.NaN)).toThrow(RangeError);
  });
});

describe('relative densities', () => {
  it('is about 0.0111 at 3 sigma, 1 at the centre (common practice: exp(-4.5))', () => {
    expectClose(plugInRelativeDensity(3, 0, 1), 0.0111, 0.01);
    expectClose(plugInRelativeDensity(10, 10, 0.4), 1, 0);
    // The ratio of A&S table 26.1 values Z(3) / Z(0) is the same quantity.
    expectClose(plugInRelativeDensity(-3, 0, 1), 0.004431848412 / 0.3989422804, 1e-9);
  });

  it('a zero spread gives 1 at the mean and 0 elsewhere, never NaN', () => {
    expect(plugInRelativeDensity(5, 5, 0)).toBe(1);
    expect(plugInRelativeDensity(5.1, 5, 0)).toBe(0);
    expect(predictiveRelativeDensity(5, 5, 0, 10)).toBe(1);
    expect(predictiveRelativeDensity(4, 5, 0, 10)).toBe(0);
  });

  it('predictive equals the Student-t density ratio of jstat (second opinion)', () => {
    fc.assert(
      fc.property(
        fc.double({ min: -1e4, max: 1e4, noNaN: true }),
        fc.double({ min: 1e-2, max: 1e2, noNaN: true }),
        fc.double({ min: -20, max: 20, noNaN: true }),
        fc.integer({ min: 2, max: 500 }),
        (mean, s, z, n) => {
          const x = mean + z * s;
          const t = (x - mean) / predictiveScale(s, n);
          const expected = jStat.studentt.pdf(t, n - 1) / jStat.studentt.pdf(0, n - 1);
          expectClose(predictiveRelativeDensity(x, mean, s, n), expected, 1e-7, 1e-300);
        },
      ),
      { numRuns: 300, seed: 7 },
    );
  });

  it('predictive approaches plug-in as n grows, and is more lenient for small n', () => {
    // Student-t tends to the normal as nu grows (common practice); sqrt(1 + 1/n) tends to 1.
    const x = 3;
    const plugIn = plugInRelativeDensity(x, 0, 1);
    let previousGap = Infinity;
    for (const n of [5, 10, 30, 100, 1000, 100000]) {
      const predictive = predictiveRelativeDensity(x, 0, 1, n);
      expect(predictive).toBeGreaterThan(plugIn);
      const gap = predictive - plugIn;
      expect(gap).toBeLessThan(previousGap);
      previousGap = gap;
    }
    expectClose(predictiveRelativeDensity(x, 0, 1, 1e7), plugIn, 1e-5);
    // With 5 runs, 3 sample sd away is far from the 0.01 cutoff: the t with 4 df and the
    // sqrt(1.2) scale give (1 + 7.5/4)^(-2.5) ≈ 0.0714 (arithmetic from the formula).
    expectClose(predictiveRelativeDensity(3, 0, 1, 5), Math.pow(1 + 9 / 1.2 / 4, -2.5), 1e-12);
  });

  it('predictive needs at least 2 runs', () => {
    expect(() => predictiveRelativeDensity(1, 0, 1, 1)).toThrow(RangeError);
  });
});
