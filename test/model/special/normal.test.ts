import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import normalCdf from '@stdlib/stats-base-dists-normal-cdf';
import normalLogcdf from '@stdlib/stats-base-dists-normal-logcdf';
import normalLogpdf from '@stdlib/stats-base-dists-normal-logpdf';
import normalPdf from '@stdlib/stats-base-dists-normal-pdf';
import { expectClose } from '../../helpers/close.js';
import { jStat } from '../jstat.js';
import { normalDensity, normalLogCdf, normalLogDensity, normalUpperTail } from '../../../src/model/special/normal.js';

const EPS = Number.EPSILON;

describe('normalUpperTail', () => {
  it('matches A&S Table 26.1 (P(x) to 15 decimals, from memory)', () => {
    // A&S Table 26.1: P(1) = 0.841344746068543, P(2) = 0.977249868051821, P(3) = 0.998650101968370.
    expectClose(normalUpperTail(-1), 0.841344746068543, 0, 1e-15);
    expectClose(normalUpperTail(2), 1 - 0.977249868051821, 1e-13);
    expectClose(normalUpperTail(3), 1 - 0.99865010196837, 1e-11);
  });

  it('keeps 1e-14 relative accuracy in the far tail (mpmath 1.3.0, ncdf at 50 digits)', () => {
    // mpmath: mp.ncdf(-z) with mp.dps = 50, rounded to 17 digits.
    const table: [number, number][] = [
      [5, 2.8665157187919391e-7],
      [10, 7.6198530241605261e-24],
      [20, 2.7536241186062337e-89],
      [30, 4.9067139271481871e-198],
      [37, 5.7255712225245768e-300],
    ];
    for (const [z, q] of table) expectClose(normalUpperTail(z), q, 1e-14);
  });

  // @stdlib forms erfc(-x / (sigma sqrt 2)): the rounding of x / sqrt 2 alone moves the tail by
  // about z^2 ulp (the relative derivative of erfc(y) is 2y), so the agreement allowed grows with z^2
  // (1.5e-13 at z = 37). Measured against 50-digit mpmath values, this function stays below 1e-15.
  it('agrees with @stdlib/stats-base-dists-normal-cdf on z in [-37, 37] within its z^2 ulp rounding', () => {
    fc.assert(
      fc.property(fc.double({ min: -37, max: 37, noNaN: true }), (z) => {
        expectClose(normalUpperTail(z), normalCdf(-z, 0, 1), 4e-16 + 1.5 * z * z * EPS);
      }),
      { numRuns: 3000, seed: 81 },
    );
  });

  // jStat's normal CDF goes through its own erf (about 1e-14 absolute, relative only near the centre).
  it('agrees with jStat on z in [-8, 8] (second opinion, 1e-14 absolute)', () => {
    fc.assert(
      fc.property(fc.double({ min: -8, max: 8, noNaN: true }), (z) => {
        expectClose(normalUpperTail(-z), jStat.normal.cdf(z, 0, 1), 0, 1e-14);
      }),
      { numRuns: 1000, seed: 82 },
    );
  });

  it('handles the limits and NaN', () => {
    expect(normalUpperTail(Infinity)).toBe(0);
    expect(normalUpperTail(-Infinity)).toBe(1);
    expect(normalUpperTail(0)).toBe(0.5);
    expect(normalUpperTail(Number.NaN)).toBeNaN();
  });
});

describe('normalLogCdf', () => {
  it('stays finite and exact where the CDF underflows (mpmath 1.3.0, log(ncdf) at 50 digits)', () => {
    const table: [number, number][] = [
      [-40, -804.60844201375379],
      [-100, -5005.5242086942051],
      [-1000, -500007.82669481218],
      [-1e5, -5000000012.431864],
    ];
    for (const [z, v] of table) expectClose(normalLogCdf(z), v, 1e-15);
  });

  it('agrees with @stdlib/stats-base-dists-normal-logcdf on z in [-200, 37] (its z^2 ulp rounding allowed)', () => {
    fc.assert(
      fc.property(fc.double({ min: -200, max: 37, noNaN: true }), (z) => {
        // ln P has magnitude ~z^2/2 for z << 0 (relative 1e-15 is plenty); for z > 0 it is -Q(z).
        expectClose(normalLogCdf(z), normalLogcdf(z, 0, 1), z < 0 ? 1e-15 : 4e-16 + 1.5 * z * z * EPS);
      }),
      { numRuns: 3000, seed: 83 },
    );
  });

  it('handles the limits', () => {
    expect(normalLogCdf(-Infinity)).toBe(-Infinity);
    expect(normalLogCdf(Infinity) === 0).toBe(true); // -0, as log1p(-0)
    expect(normalLogCdf(Number.NaN)).toBeNaN();
  });
});

describe('normalDensity and normalLogDensity', () => {
  it('matches A&S Table 26.1 Z(x) (10 significant digits, from memory)', () => {
    expectClose(normalDensity(1, 0, 1), 0.2419707245, 5e-10);
    expectClose(normalDensity(5, 2, 1.5), 0.05399096651 / 1.5, 5e-10);
  });

  // @stdlib computes A exp(B (x - mu)^2); both are exact up to the rounding of z^2/2 (z^2 ulp).
  it('agrees with @stdlib/stats-base-dists-normal-pdf and -logpdf on wide random inputs', () => {
    fc.assert(
      fc.property(
        fc.double({ min: -1e6, max: 1e6, noNaN: true }),
        fc.double({ min: 1e-6, max: 1e6, noNaN: true }),
        fc.double({ min: -38, max: 38, noNaN: true }),
        (mean, sd, z) => {
          const x = mean + z * sd;
          const zz = (x - mean) / sd;
          expectClose(normalDensity(x, mean, sd), normalPdf(x, mean, sd), 1e-15 + 2 * zz * zz * EPS, 1e-300);
          expectClose(normalLogDensity(x, mean, sd), normalLogpdf(x, mean, sd), 1e-14, 1e-14);
        },
      ),
      { numRuns: 3000, seed: 84 },
    );
  });

  it('treats sd = 0 as the degenerate distribution, as @stdlib does', () => {
    expect(normalDensity(1, 1, 0)).toBe(normalPdf(1, 1, 0));
    expect(normalDensity(2, 1, 0)).toBe(normalPdf(2, 1, 0));
    expect(normalLogDensity(1, 1, 0)).toBe(normalLogpdf(1, 1, 0));
    expect(normalLogDensity(2, 1, 0)).toBe(normalLogpdf(2, 1, 0));
    expect(normalDensity(Infinity, 0, 1)).toBe(0);
    expect(normalDensity(Number.NaN, 0, 1)).toBeNaN();
    expect(normalLogDensity(Number.NaN, 0, 0)).toBeNaN();
  });
});
