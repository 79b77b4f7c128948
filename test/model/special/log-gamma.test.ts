import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import gammaln from '@stdlib/math-base-special-gammaln';
import { expectClose } from '../../helpers/close.js';
import { jStat } from '../jstat.js';
import { log1pMinus, logBeta, logGamma, logGammaShift } from '../../../src/model/special/log-gamma.js';

/** ln (n - 1)! summed exactly enough in double precision for small n (the definition of Gamma). */
function logFactorial(n: number): number {
  let sum = 0;
  for (let k = 2; k <= n; k++) sum += Math.log(k);
  return sum;
}

describe('logGamma (Stirling series with recurrence)', () => {
  it('gives ln (n - 1)! at whole numbers and ln sqrt(pi) at 1/2 (definitions; from memory)', () => {
    // Below 10 the recurrence subtracts two logs near 15: a few 1e-15 absolute.
    for (const n of [1, 2, 3, 5, 10, 20, 50]) expectClose(logGamma(n), logFactorial(n - 1), 1e-14, 1e-14);
    expectClose(logGamma(0.5), 0.5 * Math.log(Math.PI), 0, 1e-14);
    // Gamma(3/2) = sqrt(pi) / 2 = 0.8862269255 (A&S Table 6.1, from memory).
    expectClose(Math.exp(logGamma(1.5)), 0.886226925452758, 1e-14);
  });

  // @stdlib's gammaln (the FreeBSD lgamma) is good to an ulp or two. Near the zeros at 1 and 2 the
  // relative error of any method blows up, so the check is absolute there (what the callers need:
  // ln Gamma always enters an exponent).
  it('agrees with @stdlib/math-base-special-gammaln from 1e-300 to 1e300', () => {
    fc.assert(
      fc.property(fc.double({ min: -690, max: 690, noNaN: true }), (e) => {
        const x = Math.exp(e);
        expectClose(logGamma(x), gammaln(x), 1e-14, 1e-14);
      }),
      { numRuns: 3000, seed: 91 },
    );
  });

  // jStat.gammaln is a 6-term Lanczos sum: about 1e-13 relative (2e-12 off at 13.05 against mpmath).
  it('agrees with jStat.gammaln on (0, 1e4] (second opinion, 1e-12 relative)', () => {
    fc.assert(
      fc.property(fc.double({ min: 1e-3, max: 1e4, noNaN: true }), (x) => {
        expectClose(logGamma(x), jStat.gammaln(x), 1e-12, 1e-13);
      }),
      { numRuns: 1000, seed: 92 },
    );
  });

  it('is NaN for x <= 0', () => {
    expect(logGamma(0)).toBeNaN();
    expect(logGamma(-1)).toBeNaN();
  });
});

describe('logGammaShift and logBeta', () => {
  it('logGammaShift equals the difference of @stdlib gammaln where that difference is not cancelling', () => {
    fc.assert(
      fc.property(
        fc.double({ min: 10, max: 1e3, noNaN: true }),
        fc.double({ min: 0, max: 1e3, noNaN: true }),
        (x, s) => {
          // The difference of two logs near 7e3 carries ~1e-12 absolute rounding of its own.
          expectClose(logGammaShift(x, s), gammaln(x + s) - gammaln(x), 1e-13, 2e-12);
        },
      ),
      { numRuns: 1000, seed: 93 },
    );
  });

  it('logGammaShift(x, 1/2) follows Gamma(x + 1/2) / Gamma(x) ~ sqrt(x) (1 - 1/(8x) + 1/(128x^2)) (A&S 6.1.47, from memory)', () => {
    for (const x of [1e4, 1e6, 1e9]) {
      const series = 0.5 * Math.log(x) + Math.log1p(-1 / (8 * x) + 1 / (128 * x * x));
      expectClose(logGammaShift(x, 0.5), series, 1e-15, 1e-15);
    }
  });

  it('logBeta: B(a, 1) = 1/a, B(1/2, 1/2) = pi, symmetry (definitions, from memory)', () => {
    for (const a of [0.5, 3, 17.5, 1e3, 1e7]) expectClose(logBeta(a, 1), -Math.log(a), 1e-14, 1e-14);
    expectClose(logBeta(0.5, 0.5), Math.log(Math.PI), 0, 1e-14);
    expectClose(logBeta(2.5, 1e5), logBeta(1e5, 2.5), 0);
    expectClose(logBeta(7, 9), gammaln(7) + gammaln(9) - gammaln(16), 1e-14);
  });
});

describe('log1pMinus', () => {
  it('is log1p(u) - u, also where the two cancel (series -u^2/2 + u^3/3 - u^4/4, A&S 4.1.24, from memory)', () => {
    for (const u of [1e-12, -1e-8, 1e-5, -1e-4]) {
      const series = -(u * u) / 2 + u ** 3 / 3 - u ** 4 / 4 + u ** 5 / 5 - u ** 6 / 6;
      expectClose(log1pMinus(u), series, 1e-15);
    }
    for (const u of [0.3, -0.45, 0.7, -0.9, 5]) expectClose(log1pMinus(u), Math.log1p(u) - u, 2e-15);
    expect(log1pMinus(0)).toBe(0);
  });
});
