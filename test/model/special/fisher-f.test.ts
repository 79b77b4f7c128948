import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import fCdf from '@stdlib/stats-base-dists-f-cdf';
import { expectClose } from '../../helpers/close.js';
import { jStat } from '../jstat.js';
import { fisherCdf, fisherUpperTail } from '../../../src/model/special/fisher-f.js';

/** log-uniform in [lo, hi]. */
const logUniform = (lo: number, hi: number) =>
  fc.double({ min: Math.log(lo), max: Math.log(hi), noNaN: true }).map(Math.exp);

describe('fisherUpperTail and fisherCdf', () => {
  it('matches the upper percentage points of the F table (standard F table, as in A&S chapter 26; from memory)', () => {
    const table: [number, number, number, number][] = [
      // [d1, d2, f, P(F > f)]
      [1, 10, 4.965, 0.05],
      [2, 10, 4.103, 0.05],
      [5, 10, 3.326, 0.05],
      [10, 10, 2.978, 0.05],
      [1, 1, 161.45, 0.05],
      [2, 2, 19, 0.05],
      [1, 10, 10.04, 0.01],
      [10, 10, 4.849, 0.01],
    ];
    for (const [d1, d2, f, p] of table) expectClose(fisherUpperTail(f, d1, d2), p, 2e-3);
  });

  it('has the closed forms F(1, 1), F(2, d2) and F(d1, 2) over wide f (from memory: they follow from I_x(a, 1) = x^a and I_x(1/2, 1/2) = (2/pi) asin sqrt x)', () => {
    fc.assert(
      fc.property(logUniform(1e-12, 1e12), logUniform(1, 1e6), (f, d2) => {
        expectClose(fisherUpperTail(f, 1, 1), (2 / Math.PI) * Math.atan(1 / Math.sqrt(f)), 1e-13);
        const tail = Math.exp((-d2 / 2) * Math.log1p((2 * f) / d2));
        // The exponent of the reference rounds to an ulp of itself (1e-13 at 700).
        if (tail > 1e-290) expectClose(fisherUpperTail(f, 2, d2), tail, 2e-13);
        // d2 = 2: P(F(d1, 2) > f) = 1 - (d1 f / (2 + d1 f))^(d1/2) = -expm1(-(d1/2) log1p(2 / (d1 f))).
        const d1 = d2;
        expectClose(fisherUpperTail(f, d1, 2), -Math.expm1((-d1 / 2) * Math.log1p(2 / (d1 * f))), 2e-13);
      }),
      { numRuns: 2000, seed: 144 },
    );
    expectClose(fisherCdf(1, 4, 4), 0.5, 1e-14); // symmetry of F(d, d) about 1
  });

  it('keeps relative accuracy far out and for huge degrees of freedom (mpmath 1.3.0, 50 digits)', () => {
    // mpmath at 50 digits (A&S 26.6.2 through 26.5.8); scipy.special.fdtrc agrees to 1e-13 on all but the last.
    expectClose(fisherUpperTail(1e4, 1, 1), 0.0063659855298165103, 1e-14);
    expectClose(fisherUpperTail(50, 3, 10), 2.5134704183840495e-6, 1e-13);
    expectClose(fisherUpperTail(400, 2, 998), 2.6673873744280961e-128, 1e-13);
    expectClose(fisherCdf(0.001, 10, 10), 1.2495493272492417e-13, 1e-13);
    // With 1e6 and 1e6 degrees of freedom one ulp of f moves this tail by about 8e-13
    // (d ln P / d ln f ~ 7000 here), so the answer can only be as good as that.
    expectClose(fisherUpperTail(1.03, 1e6, 1e6), 9.986705661344518e-50, 3e-12);
  });

  // @stdlib's F CDF is a weaker reference than the closed forms and the mpmath values (which hold
  // this function to 2e-13): measured against them it is off by 1e-12 at F(1, 64), 5e-11 in F(1, 1)
  // tails of 4e-4, 1e-10 in F(1413, 2) tails of 5e-4, 1.5e-7 in F(573394, 2.2) tails, and by up to
  // 8e-3 for CDFs near 1e-87 with one small and one large degree of freedom. So it is held to 1e-10
  // for d1, d2 <= 1e3 (results above 1e-100) and to 5e-7 beyond.
  it('agrees with @stdlib/stats-base-dists-f-cdf for d1, d2 in [1, 1e3] (1e-10, its own level)', () => {
    fc.assert(
      fc.property(logUniform(1, 1e3), logUniform(1, 1e3), logUniform(1e-3, 1e3), (d1, d2, f) => {
        const cdf = fCdf(f, d1, d2);
        const tail = fCdf(1 / f, d2, d1); // P(F(d1, d2) > f) = P(F(d2, d1) < 1/f)
        if (cdf > 1e-100) expectClose(fisherCdf(f, d1, d2), cdf, 1e-10);
        if (tail > 1e-100) expectClose(fisherUpperTail(f, d1, d2), tail, 1e-10);
      }),
      { numRuns: 3000, seed: 141 },
    );
  });

  // With d1 = d2 = 1 @stdlib's far tail drifts further (4e-8 off at f = 1e10 against the closed
  // form (2/pi) atan(1/sqrt f)); that case is checked against the closed form above.
  it('agrees with @stdlib for d1, d2 in [2, 1e6] (5e-7, the reference level there)', () => {
    fc.assert(
      fc.property(logUniform(2, 1e6), logUniform(2, 1e6), fc.double({ min: -8, max: 8, noNaN: true }), (d1, d2, k) => {
        // f within k standard deviations of ln F ~ sqrt(2/d1 + 2/d2) around 0.
        const f = Math.exp(k * Math.sqrt(2 / d1 + 2 / d2));
        const tail = fCdf(1 / f, d2, d1);
        if (tail > 1e-100) expectClose(fisherUpperTail(f, d1, d2), tail, 5e-7);
      }),
      { numRuns: 2000, seed: 142 },
    );
  });

  it('agrees with jStat.centralF.cdf (second opinion, 1e-7)', () => {
    fc.assert(
      fc.property(
        fc.integer({ min: 1, max: 200 }),
        fc.integer({ min: 1, max: 200 }),
        logUniform(0.01, 100),
        (d1, d2, f) => {
          const j = jStat.centralF.cdf(f, d1, d2);
          if (j > 1e-250) expectClose(fisherCdf(f, d1, d2), j, 1e-7, 1e-300);
        },
      ),
      { numRuns: 1000, seed: 143 },
    );
  });

  it('handles the ends', () => {
    expect(fisherUpperTail(0, 3, 4)).toBe(1);
    expect(fisherCdf(0, 3, 4)).toBe(0);
    expect(fisherUpperTail(Infinity, 3, 4)).toBe(0);
    expect(fisherUpperTail(1, 0, 4)).toBeNaN();
    expect(fisherCdf(Number.NaN, 3, 4)).toBeNaN();
  });
});
