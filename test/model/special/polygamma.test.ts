import stdlibDigamma from '@stdlib/math-base-special-digamma';
import stdlibTrigamma from '@stdlib/math-base-special-trigamma';
import { describe, expect, it } from 'vitest';
import { digamma, inverseTrigamma, tetragamma, trigamma } from '../../../src/model/special/polygamma.js';
import { expectClose } from '../../helpers/close.js';

const POINTS = [1e-3, 0.05, 0.3, 0.5, 1, 1.5, 2.7, 5, 5.99, 6, 9.5, 20, 123.4, 1e4, 1e7];

describe('digamma, trigamma and tetragamma (A&S 6.3.18, 6.4.12 with the recurrence)', () => {
  it("exact values: psi(1) = -Euler gamma, psi(1/2) = -gamma - 2 ln 2, psi'(1) = pi^2/6, psi'(1/2) = pi^2/2, psi''(1) = -2 zeta(3) (A&S 6.3.2, 6.3.3, 6.4.2, 6.4.4; from memory)", () => {
    const gamma = 0.5772156649015329;
    expectClose(digamma(1), -gamma, 1e-14);
    expectClose(digamma(0.5), -gamma - 2 * Math.LN2, 1e-14);
    expectClose(trigamma(1), Math.PI ** 2 / 6, 1e-14);
    expectClose(trigamma(0.5), Math.PI ** 2 / 2, 1e-14);
    expectClose(tetragamma(1), -2 * 1.2020569031595942, 1e-13);
  });

  it('agree with @stdlib digamma and trigamma to 1e-13 relative from 1e-3 to 1e7', () => {
    for (const x of POINTS) {
      expectClose(digamma(x), stdlibDigamma(x), 1e-13, 1e-15);
      expectClose(trigamma(x), stdlibTrigamma(x), 1e-13);
    }
  });

  it('tetragamma is the derivative of @stdlib trigamma (central differences, 1e-6 relative)', () => {
    for (const x of POINTS.filter((v) => v >= 0.05 && v <= 1e4)) {
      const h = 1e-4 * x;
      expectClose(tetragamma(x), (stdlibTrigamma(x + h) - stdlibTrigamma(x - h)) / (2 * h), 1e-6);
    }
  });

  it('inverseTrigamma undoes @stdlib trigamma (Smyth 2004 Newton iteration) and refuses y <= 0', () => {
    for (const x of [1e-3, 0.1, 0.5, 1, 3, 10, 250, 1e5]) expectClose(inverseTrigamma(stdlibTrigamma(x)), x, 1e-7);
    expect(inverseTrigamma(0)).toBeNaN();
    expect(digamma(0)).toBeNaN();
  });
});
