import stdlibDigamma from '@stdlib/math-base-special-digamma';
import stdlibTrigamma from '@stdlib/math-base-special-trigamma';
import { describe, expect, it } from 'vitest';
import { moderatedVariance, variancePrior } from '../../src/model/moderated-variance.js';
import { expectClose } from '../helpers/close.js';
import { seededNormal } from './random.js';

/** A chi-square draw on d degrees of freedom (sum of d squared normals). */
function chiSquare(normal: () => number, d: number): number {
  let s = 0;
  for (let i = 0; i < d; i++) s += normal() ** 2;
  return s;
}

describe('variancePrior: Smyth (2004) section 6.2, the trigamma method', () => {
  it("meets the paper's moment equations, checked with @stdlib digamma and trigamma", () => {
    const variances = [0.8, 2.5, 1.1, 0.3, 4.2, 1.9, 0.7, 1.4];
    const d = 9;
    const prior = variancePrior(
      variances,
      variances.map(() => d),
    )!;
    const e = variances.map((s2) => Math.log(s2) - stdlibDigamma(d / 2) + Math.log(d / 2));
    const mean = e.reduce((a, b) => a + b) / e.length;
    const varE = e.reduce((a, x) => a + (x - mean) ** 2, 0) / (e.length - 1);
    // var(e) - trigamma(d/2) = trigamma(d0/2); mean(e) = ln s0^2 - digamma(d0/2) + ln(d0/2)
    expectClose(stdlibTrigamma(prior.d0 / 2), varE - stdlibTrigamma(d / 2), 1e-7);
    expectClose(Math.log(prior.s0Squared) - stdlibDigamma(prior.d0 / 2) + Math.log(prior.d0 / 2), mean, 1e-9);
  });

  it("recovers d0 and s0^2 from variances drawn as the paper's model says (s0^2 F(d, d0), 4000 metrics)", () => {
    const normal = seededNormal(2004);
    const d0 = 8;
    const s0Squared = 2;
    const d = 10;
    const variances = Array.from({ length: 4000 }, () => {
      const sigma2 = s0Squared / (chiSquare(normal, d0) / d0); // scaled inverse chi-square prior
      return (sigma2 * chiSquare(normal, d)) / d;
    });
    const prior = variancePrior(
      variances,
      variances.map(() => d),
    )!;
    expect(prior.d0).toBeGreaterThan(6.5);
    expect(prior.d0).toBeLessThan(9.8);
    expectClose(prior.s0Squared, s0Squared, 0.06);
  });

  it('variances no more scattered than sampling alone gives d0 = Infinity; fewer than 2 positive, none', () => {
    const normal = seededNormal(7);
    const variances = Array.from({ length: 500 }, () => chiSquare(normal, 30) / 30);
    expect(
      variancePrior(
        variances,
        variances.map(() => 30),
      )!.d0,
    ).toBeGreaterThan(200);
    expect(variancePrior([1, 1, 1, 1], [10, 10, 10, 10])).toEqual({ d0: Infinity, s0Squared: expect.any(Number) });
    expect(variancePrior([0, 2], [5, 5])).toBeUndefined();
  });

  it('moderatedVariance is the posterior mean (d0 s0^2 + d s^2) / (d0 + d) on d0 + d degrees of freedom (Smyth 2004, eq. 2)', () => {
    expect(moderatedVariance(2, 10, { d0: 10, s0Squared: 1 })).toEqual({ variance: 1.5, dof: 20 });
    expect(moderatedVariance(2, 10, { d0: Infinity, s0Squared: 1 })).toEqual({ variance: 1, dof: Infinity });
    expect(moderatedVariance(2, 10, undefined)).toEqual({ variance: 2, dof: 10 });
  });
});
