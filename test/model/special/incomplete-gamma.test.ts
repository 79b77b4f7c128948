import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import gammainc from '@stdlib/math-base-special-gammainc';
import { expectClose } from '../../helpers/close.js';
import { jStat } from '../jstat.js';
import { erfc } from '../../../src/model/special/erfc.js';
import { regularizedGamma } from '../../../src/model/special/incomplete-gamma.js';

/** log-uniform in [lo, hi]. */
const logUniform = (lo: number, hi: number) =>
  fc.double({ min: Math.log(lo), max: Math.log(hi), noNaN: true }).map(Math.exp);

describe('regularizedGamma', () => {
  it('matches closed forms: Q(1, x) = e^-x, Q(1/2, x) = erfc(sqrt x), Q(n, x) = e^-x sum x^k/k! (from memory)', () => {
    for (const x of [1e-8, 0.5, 3, 40, 700]) {
      // x^a e^-x is taken as exp(a ln x - x): that exponent rounds to an ulp of x (1e-13 at 700).
      expectClose(regularizedGamma(1, x, true), Math.exp(-x), 2e-13);
      expectClose(regularizedGamma(0.5, x, true), erfc(Math.sqrt(x)), 2e-13);
      expectClose(regularizedGamma(1, x, false), -Math.expm1(-x), 1e-14);
    }
    for (const [n, x] of [
      [3, 0.5],
      [5, 5],
      [12, 30],
      [40, 10],
    ] as const) {
      let term = 1;
      let sum = 1;
      for (let k = 1; k < n; k++) {
        term *= x / k;
        sum += term;
      }
      expectClose(regularizedGamma(n, x, true), Math.exp(-x) * sum, 1e-13);
    }
  });

  it('keeps relative accuracy for huge shapes (50-digit mpmath 1.3.0 evaluation of A&S 6.5.29 / 6.5.31)', () => {
    // mpmath at 50 digits (series and continued fraction with mp.loggamma); scipy.special.gammaincc agrees.
    expectClose(regularizedGamma(50, 200, true), 1.6927979958857088e-37, 1e-13);
    expectClose(regularizedGamma(100, 25, false), 1.2293884805874739e-29, 1e-13);
  });

  // @stdlib's gammainc is good to ~1e-13 for small shapes but measured (against 50-digit mpmath and
  // scipy) off by up to 3e-3 for shapes in the thousands, and its upper tail by 1e-3 from a ~ 500:
  // it is a reference here only for a <= 100, lower and upper tails.
  it('agrees with @stdlib/math-base-special-gammainc to 1e-12 for a in [1/2, 100], both tails', () => {
    fc.assert(
      fc.property(logUniform(0.5, 100), fc.double({ min: -3, max: 3, noNaN: true }), (a, e) => {
        const x = a * Math.pow(10, e);
        const p = gammainc(x, a, true, false);
        const q = gammainc(x, a, true, true);
        if (p > 1e-290) expectClose(regularizedGamma(a, x, false), p, 1e-12);
        if (q > 1e-290) expectClose(regularizedGamma(a, x, true), q, 1e-12);
      }),
      { numRuns: 3000, seed: 111 },
    );
  });

  // jStat.lowRegGamma: series / continued fraction in plain form, about 1e-10 relative.
  it('agrees with jStat.lowRegGamma for a in [1/2, 1e3] (second opinion, 1e-8)', () => {
    fc.assert(
      fc.property(logUniform(0.5, 1e3), fc.double({ min: -1, max: 1, noNaN: true }), (a, e) => {
        const x = a * Math.pow(10, e / 2);
        const j = jStat.lowRegGamma(a, x);
        if (j > 1e-250) expectClose(regularizedGamma(a, x, false), j, 1e-8, 1e-300);
      }),
      { numRuns: 1000, seed: 112 },
    );
  });

  it('handles the ends and bad shapes', () => {
    expect(regularizedGamma(2, 0, true)).toBe(1);
    expect(regularizedGamma(2, Infinity, true)).toBe(0);
    expect(regularizedGamma(0, 1, true)).toBeNaN();
    expect(regularizedGamma(1, -1, true)).toBeNaN();
  });
});
