import { describe, expect, it } from 'vitest';
import fc from 'fast-check';
import { expectClose } from '../helpers/close.js';
import { jStat } from './jstat.js';
import { plugInRelativeDensity } from '../../src/model/density.js';
import { cutoffLevel, cutoffSigma, normalTail, studentTail } from '../../src/model/tails.js';

describe('normalTail', () => {
  it('matches standard normal table values', () => {
    // Abramowitz & Stegun table 26.1 / any standard normal table (from memory):
    // P(Z > 1.96) = 0.0249979, P(Z > 1.645) ≈ 0.049985, P(Z > 3) = 0.0013499.
    expectClose(normalTail(1.96, 'upper'), 0.0249979, 1e-5);
    expectClose(normalTail(1.96, 'both'), 0.0499958, 1e-5);
    expectClose(normalTail(-1.645, 'lower'), 0.049985, 1e-4);
    expectClose(normalTail(3, 'upper'), 0.0013499, 1e-4);
    expectClose(normalTail(0, 'both'), 1, 1e-15);
  });

  it('keeps precision in the far tail (A&S 26.2.12 asymptote: Z(x)/x (1 - 1/x^2 + 3/x^4))', () => {
    const x = 20;
    const z = Math.exp(-200) / Math.sqrt(2 * Math.PI);
    expectClose(normalTail(x, 'upper'), (z / x) * (1 - 1 / x ** 2 + 3 / x ** 4 - 15 / x ** 6), 1e-7);
  });

  it('agrees with jstat on random z (second opinion)', () => {
    fc.assert(
      fc.property(fc.double({ min: -8, max: 8, noNaN: true }), (z) => {
        expectClose(normalTail(z, 'lower'), jStat.normal.cdf(z, 0, 1), 1e-7, 1e-15);
        expectClose(normalTail(z, 'upper'), 1 - jStat.normal.cdf(z, 0, 1), 1e-6, 1e-14);
      }),
      { numRuns: 300, seed: 11 },
    );
  });
});

describe('far tails (relative accuracy, not 1 - cdf)', () => {
  it('normalTail and studentTail match 50-digit mpmath 1.3.0 values far out', () => {
    // mpmath: mp.ncdf(-z); mp.betainc(nu/2, 1/2, 0, nu/(nu+t^2)) / 2; mp.dps = 50.
    expectClose(normalTail(37, 'upper'), 5.7255712225245768e-300, 1e-14);
    expectClose(normalTail(-30, 'lower'), 4.9067139271481871e-198, 1e-14);
    expectClose(normalTail(20, 'both'), 2 * 2.7536241186062337e-89, 1e-14);
    expectClose(studentTail(1e6, 1, 'upper'), 3.1830988618368457e-7, 1e-14);
    expectClose(studentTail(-30, 999, 'lower'), 8.3641360655859234e-142, 1e-13);
    expectClose(studentTail(7.5, 1e6, 'both'), 2 * 3.1935057368574253e-14, 1e-13);
  });
});

describe('studentTail', () => {
  // Two-sided critical values of Student's t, standard t table (e.g. NIST/SEMATECH e-Handbook
  // 1.3.6.7.2; 3 decimals, from memory).
  const table: [number, number, number][] = [
    [1, 0.05, 12.706],
    [1, 0.01, 63.657],
    [5, 0.05, 2.571],
    [5, 0.01, 4.032],
    [10, 0.05, 2.228],
    [10, 0.01, 3.169],
    [30, 0.05, 2.042],
    [30, 0.01, 2.75],
  ];
  for (const [nu, alpha, t] of table) {
    it(`nu = ${nu}: P(|T| > ${t}) = ${alpha}`, () => {
      // 3 decimals in t allow a relative error of a few 1e-4 in the tail.
      expectClose(studentTail(t, nu, 'both'), alpha, 2e-3);
      expectClose(studentTail(t, nu, 'upper'), alpha / 2, 2e-3);
      expectClose(studentTail(-t, nu, 'lower'), alpha / 2, 2e-3);
    });
  }

  it('agrees with jstat on random inputs (second opinion)', () => {
    fc.assert(
      fc.property(fc.double({ min: -30, max: 30, noNaN: true }), fc.integer({ min: 1, max: 400 }), (t, nu) => {
        expectClose(studentTail(t, nu, 'lower'), jStat.studentt.cdf(t, nu), 1e-6, 1e-12);
      }),
      { numRuns: 300, seed: 13 },
    );
  });

  it('rejects NaN and non-positive degrees of freedom', () => {
    expect(() => studentTail(Number.NaN, 3, 'both')).toThrow(RangeError);
    expect(() => studentTail(1, 0, 'both')).toThrow(RangeError);
    expect(() => normalTail(Number.NaN, 'upper')).toThrow(RangeError);
  });
});

describe('cutoffSigma and cutoffLevel', () => {
  it('the relative density at cutoffSigma is the cutoff', () => {
    for (const cutoff of [0.5, 0.1, 0.01, 1e-4]) {
      expectClose(plugInRelativeDensity(cutoffSigma(cutoff), 0, 1), cutoff, 1e-12);
    }
  });

  it('cutoff 0.01 stands for a two-sided level of about 0.0024 (jstat normal cdf)', () => {
    const sigma = cutoffSigma(0.01);
    expectClose(cutoffLevel(0.01), 2 * (1 - jStat.normal.cdf(sigma, 0, 1)), 1e-6);
    // Normal table: 3.03 sigma two-sided ≈ 0.00245 (from memory); the cutoff sits just beyond.
    expect(cutoffLevel(0.01)).toBeLessThan(0.00245);
    expect(cutoffLevel(0.01)).toBeGreaterThan(0.0023);
  });

  it('rejects cutoffs outside (0, 1]', () => {
    for (const bad of [0, -0.1, 1.5, Number.NaN]) expect(() => cutoffSigma(bad)).toThrow(RangeError);
    expect(cutoffSigma(1)).toBe(0);
  });
});
