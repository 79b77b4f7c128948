import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import stdlibErfc from '@stdlib/math-base-special-erfc';
import stdlibErfcx from '@stdlib/math-base-special-erfcx';
import { expectClose } from '../../helpers/close.js';
import { erfc, erfcScaled } from '../../../src/model/special/erfc.js';

describe('erfc (Cody 1969)', () => {
  it('matches A&S Table 7.1 (erf to 10 decimals, from memory)', () => {
    // Abramowitz & Stegun Table 7.1: erf(0.1) = 0.1124629160, erf(0.5) = 0.5204998778,
    // erf(1) = 0.8427007929, erf(1.5) = 0.9661051465, erf(2) = 0.9953222650.
    for (const [x, erf] of [
      [0.1, 0.112462916],
      [0.5, 0.5204998778],
      [1, 0.8427007929],
      [1.5, 0.9661051465],
      [2, 0.995322265],
    ] as const) {
      expectClose(erfc(x), 1 - erf, 0, 6e-11);
      expectClose(erfc(-x), 1 + erf, 0, 6e-11);
    }
    expect(erfc(0)).toBe(1);
  });

  it('follows the asymptotic series far out (A&S 7.1.23: erfc x ~ e^-x^2 / (x sqrt pi) (1 - 1/(2x^2) + 3/(4x^4) - 15/(8x^6)))', () => {
    for (const x of [15, 20, 26]) {
      const r = 1 / (2 * x * x);
      const series = (Math.exp(-x * x) / (x * Math.sqrt(Math.PI))) * (1 - r + 3 * r * r - 15 * r ** 3 + 105 * r ** 4);
      expectClose(erfc(x), series, 1e-10); // next term of the series ~ 945 r^5 < 1e-10 at x >= 15
    }
  });

  // @stdlib's erfc (FreeBSD msun rational approximations) is good to about 1 ulp, so the two
  // implementations must agree to a few ulp over the whole range, the far tail included.
  it('agrees with @stdlib/math-base-special-erfc to 1e-14 relative on [-6, 27]', () => {
    fc.assert(
      fc.property(fc.double({ min: -6, max: 27, noNaN: true }), (x) => {
        expectClose(erfc(x), stdlibErfc(x), 1e-14);
      }),
      { numRuns: 3000, seed: 71 },
    );
  });

  it('agrees with @stdlib/math-base-special-erfcx (scaled) to 1e-14 relative on [0, 1e6]', () => {
    fc.assert(
      fc.property(
        fc.double({ min: 0, max: 1e6, noNaN: true }),
        fc.double({ min: 0, max: 5, noNaN: true }),
        (big, small) => {
          expectClose(erfcScaled(big), stdlibErfcx(big), 1e-14);
          expectClose(erfcScaled(small), stdlibErfcx(small), 1e-14);
        },
      ),
      { numRuns: 2000, seed: 72 },
    );
  });

  it('handles the limits and NaN', () => {
    expect(erfc(Infinity)).toBe(0);
    expect(erfc(-Infinity)).toBe(2);
    expect(erfc(30)).toBe(0); // below the smallest double (erfc 27.3 ~ 5e-326)
    expect(erfc(Number.NaN)).toBeNaN();
    expect(erfcScaled(Infinity)).toBe(0);
    expect(() => erfcScaled(-1)).toThrow(RangeError);
  });
});
