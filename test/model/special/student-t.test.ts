import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import tCdf from '@stdlib/stats-base-dists-t-cdf';
import { expectClose } from '../../helpers/close.js';
import { jStat } from '../jstat.js';
import { normalUpperTail } from '../../../src/model/special/normal.js';
import { studentTwoSidedTail, studentUpperTail } from '../../../src/model/special/student-t.js';

/** log-uniform in [lo, hi]. */
const logUniform = (lo: number, hi: number) =>
  fc.double({ min: Math.log(lo), max: Math.log(hi), noNaN: true }).map(Math.exp);

describe('studentUpperTail and studentTwoSidedTail', () => {
  it('matches the percentage points of the t table (standard t table, as in A&S chapter 26; 3-4 digits, from memory)', () => {
    const table: [number, number, number][] = [
      // [nu, t, P(T > t)]
      [1, 12.706, 0.025],
      [1, 63.657, 0.005],
      [2, 4.303, 0.025],
      [5, 2.571, 0.025],
      [10, 2.228, 0.025],
      [10, 3.169, 0.005],
      [10, 4.587, 0.0005],
      [30, 2.042, 0.025],
      [120, 1.98, 0.025],
    ];
    for (const [nu, t, p] of table) {
      expectClose(studentUpperTail(t, nu), p, 3e-3);
      expectClose(studentTwoSidedTail(-t, nu), 2 * p, 3e-3);
    }
  });

  it('has the closed forms of nu = 1 and nu = 2 over t in [1e-6, 1e9] (from memory)', () => {
    fc.assert(
      fc.property(logUniform(1e-6, 1e9), (t) => {
        // Cauchy: P(T > t) = 1/2 - atan(t)/pi = atan(1/t)/pi.
        expectClose(studentUpperTail(t, 1), Math.atan(1 / t) / Math.PI, 1e-13);
        // nu = 2: 1/2 - t / (2 sqrt(2 + t^2)), written without the cancellation as
        // 1 / ((2 + t^2)(1 + t / sqrt(2 + t^2))).
        const r = Math.sqrt(2 + t * t);
        expectClose(studentUpperTail(t, 2), 1 / ((2 + t * t) * (1 + t / r)), 1e-13);
      }),
      { numRuns: 2000, seed: 123 },
    );
  });

  it('keeps relative accuracy in far tails and huge nu (50-digit mpmath 1.3.0, A&S 26.7.1 via 26.5.8)', () => {
    // mpmath mp.betainc(nu/2, 1/2, 0, nu/(nu+t^2)) / 2 at 50 digits; scipy.special.stdtr agrees to 3e-14.
    const table: [number, number, number][] = [
      [1e6, 1, 3.1830988618368457e-7],
      [1e3, 3, 1.1026538212882963e-9],
      [40, 10, 1.1404288715428773e-12],
      [10, 100, 4.9508444922970696e-17],
      [30, 999, 8.3641360655859234e-142],
      [8, 1e4, 6.910604364532691e-16],
      [7.5, 1e6, 3.1935057368574253e-14],
    ];
    for (const [t, nu, p] of table) expectClose(studentUpperTail(t, nu), p, 1e-13);
    expectClose(studentUpperTail(-3, 1e6), 0.9986500687292891, 1e-15);
  });

  // @stdlib's t CDF is measured against mpmath at ~1e-13 relative in the tails for every nu; near
  // t = 0 with small nu it is off by up to 4e-11 (absolute, at a CDF of 1/2), so tails below 1/4
  // are compared relatively at 1e-12, the rest and the near side (1 - tail) absolutely.
  it('agrees with @stdlib/stats-base-dists-t-cdf for t up to 1e6 and nu in [1, 1e6]', () => {
    fc.assert(
      fc.property(logUniform(1e-3, 1e6), logUniform(1, 1e6), fc.boolean(), (a, nu, whole) => {
        const n = whole ? Math.round(nu) : nu;
        const reference = tCdf(-a, n);
        if (reference > 1e-290 && reference < 0.25) expectClose(studentUpperTail(a, n), reference, 1e-12);
        else expectClose(studentUpperTail(a, n), reference, 0, 1e-10);
        expectClose(studentUpperTail(-a, n), tCdf(a, n), 0, 1e-10);
      }),
      { numRuns: 3000, seed: 121 },
    );
  });

  // jStat's t CDF is good to ~1e-8 (it is 5e-8 off at t = 0, nu = 904).
  it('agrees with jStat.studentt.cdf for |t| <= 30, nu <= 1e3 (second opinion, 1e-7)', () => {
    fc.assert(
      fc.property(fc.double({ min: -30, max: 30, noNaN: true }), fc.integer({ min: 1, max: 1000 }), (t, nu) => {
        const j = jStat.studentt.cdf(t, nu);
        if (j > 1e-250) expectClose(studentUpperTail(-t, nu), j, 1e-7, 1e-7);
      }),
      { numRuns: 1000, seed: 122 },
    );
  });

  it('tends to the normal tail as nu grows, and is it at nu = Infinity', () => {
    expect(studentUpperTail(2, Infinity)).toBe(normalUpperTail(2));
    expectClose(studentUpperTail(2, 1e12), normalUpperTail(2), 1e-10);
    expect(studentTwoSidedTail(0, 3)).toBe(1);
    expect(studentTwoSidedTail(Infinity, 3)).toBe(0);
    expect(studentTwoSidedTail(1, 0)).toBeNaN();
    expect(studentTwoSidedTail(Number.NaN, 3)).toBeNaN();
  });
});
