import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import chisquareCdf from '@stdlib/stats-base-dists-chisquare-cdf';
import stdlibErfc from '@stdlib/math-base-special-erfc';
import { expectClose } from '../../helpers/close.js';
import { jStat } from '../jstat.js';
import { chiSquareCdf, chiSquareUpperTail } from '../../../src/model/special/chi-square.js';

describe('chiSquareUpperTail and chiSquareCdf', () => {
  it('matches the upper percentage points of the chi-square table (standard chi-square table, as in A&S chapter 26; from memory)', () => {
    const table: [number, number, number][] = [
      // [k, q, P(chi^2_k > q)]
      [1, 3.841, 0.05],
      [1, 6.635, 0.01],
      [2, 5.991, 0.05],
      [3, 7.815, 0.05],
      [5, 11.07, 0.05],
      [10, 18.307, 0.05],
      [10, 23.209, 0.01],
      [30, 43.773, 0.05],
      [100, 124.342, 0.05],
    ];
    for (const [k, q, p] of table) expectClose(chiSquareUpperTail(q, k), p, 2e-3);
  });

  it('keeps relative accuracy far out and for a million degrees of freedom (mpmath 1.3.0, 50 digits)', () => {
    // mpmath at 50 digits (A&S 6.5.29 / 6.5.31 with mp.loggamma); scipy.special.chdtrc agrees to 1e-14.
    expectClose(chiSquareUpperTail(1000, 1), 1.7958327848007262e-219, 1e-13);
    expectClose(chiSquareUpperTail(400, 100), 1.6927979958857088e-37, 1e-13);
    expectClose(chiSquareCdf(50, 200), 1.2293884805874739e-29, 1e-13);
    expectClose(chiSquareCdf(1e-3, 3), 8.4079190580461593e-6, 1e-14);
  });

  // @stdlib's chi-square CDF (its gammainc) is a good reference for k <= 200 (measured 1e-13 there
  // against mpmath) and not beyond (off by up to 3e-3 for k in the thousands).
  it('agrees with @stdlib/stats-base-dists-chisquare-cdf to 1e-12 for k in [1, 200], both tails', () => {
    fc.assert(
      fc.property(
        fc.double({ min: 0, max: Math.log(200), noNaN: true }).map(Math.exp),
        fc.double({ min: -4, max: 1.3, noNaN: true }),
        (k, e) => {
          const q = k * Math.pow(10, e);
          const cdf = chisquareCdf(q, k);
          if (cdf > 1e-290) expectClose(chiSquareCdf(q, k), cdf, 1e-12);
          if (cdf < 0.5) expectClose(chiSquareUpperTail(q, k), 1 - cdf, 1e-14);
        },
      ),
      { numRuns: 3000, seed: 131 },
    );
  });

  it('matches the closed forms for k = 2 (e^(-q/2)) and k = 1 (erfc sqrt(q/2)) on q up to 1400 (from memory)', () => {
    fc.assert(
      fc.property(fc.double({ min: Math.log(1e-6), max: Math.log(1400), noNaN: true }).map(Math.exp), (q) => {
        // The exponent q/2 carries one rounding of its own (an ulp of 700 is 1e-13), hence 2e-13.
        expectClose(chiSquareUpperTail(q, 2), Math.exp(-q / 2), 2e-13);
        expectClose(chiSquareCdf(q, 2), -Math.expm1(-q / 2), 2e-13);
        expectClose(chiSquareUpperTail(q, 1), stdlibErfc(Math.sqrt(q / 2)), 2e-13);
      }),
      { numRuns: 2000, seed: 133 },
    );
  });

  it('agrees with jStat.chisquare.cdf (second opinion, 1e-8)', () => {
    fc.assert(
      fc.property(fc.integer({ min: 1, max: 500 }), fc.double({ min: 0.01, max: 3, noNaN: true }), (k, r) => {
        const j = jStat.chisquare.cdf(k * r, k);
        if (j > 1e-250) expectClose(chiSquareCdf(k * r, k), j, 1e-8, 1e-300);
      }),
      { numRuns: 1000, seed: 132 },
    );
  });

  it('handles the ends', () => {
    expect(chiSquareUpperTail(0, 3)).toBe(1);
    expect(chiSquareUpperTail(-1, 3)).toBe(1);
    expect(chiSquareUpperTail(Infinity, 3)).toBe(0);
    expect(chiSquareCdf(Number.NaN, 3)).toBeNaN();
    expect(chiSquareUpperTail(1, 0)).toBeNaN();
  });
});
