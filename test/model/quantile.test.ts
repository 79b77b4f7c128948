import tQuantile from '@stdlib/stats-base-dists-t-quantile';
import { describe, expect, it } from 'vitest';
import { detectableShift } from '../../src/model/detectable.js';
import { cutoffT, rememberedQuantile, studentRelativeDensity, studentUpperQuantile } from '../../src/model/tails.js';
import { expectClose } from '../helpers/close.js';

describe('studentUpperQuantile', () => {
  it('standard t table: t(0.975; 10) = 2.228, t(0.95; 10) = 1.812, t(0.995; 5) = 4.032 (from memory)', () => {
    expectClose(studentUpperQuantile(0.025, 10), 2.228, 2e-4);
    expectClose(studentUpperQuantile(0.05, 10), 1.812, 3e-4);
    expectClose(studentUpperQuantile(0.005, 5), 4.032, 2e-4);
  });

  it('agrees with @stdlib/stats-base-dists-t-quantile for whole and fractional nu, tails down to 1e-12', () => {
    for (const nu of [1, 1.5, 2.5, 3, 7, 30, 200])
      for (const p of [0.4, 0.2, 0.05, 1e-3, 2e-4, 1e-6, 1e-9, 1e-12]) {
        // stdlib takes 1 - p, which keeps only about 1e-16 / p of p's digits
        expectClose(studentUpperQuantile(p, nu), tQuantile(1 - p, nu), Math.max(1e-9, 1e-15 / p));
      }
  });

  it('agrees with stdlib for nu below 1 and far above the start expansion (nu 0.3, 0.7, 1e4)', () => {
    for (const nu of [0.3, 0.7, 1e4])
      for (const p of [0.3, 1e-2, 1e-5, 1e-9])
        expectClose(studentUpperQuantile(p, nu), tQuantile(1 - p, nu), Math.max(1e-9, 1e-15 / p));
  });

  it('rememberedQuantile answers as studentUpperQuantile for every (p, nu) asked, in any order', () => {
    const remembered = rememberedQuantile();
    const asks = [0.2, 1e-5, 0.2, 3e-4].flatMap((p) => [Infinity, 4, 60.5, 4].map((nu) => [p, nu] as const));
    for (const [p, nu] of asks) expect(remembered(p, nu)).toBe(studentUpperQuantile(p, nu));
  });

  it('nu = 1 is the Cauchy: t = 1 / tan(pi p), exact far out where 1 - p has lost its digits', () => {
    for (const p of [0.1, 1e-3, 1e-9, 1e-15]) expectClose(studentUpperQuantile(p, 1), 1 / Math.tan(Math.PI * p), 1e-10);
  });

  it('nu = Infinity is the normal quantile (A&S table 26.1: z(0.999) = 3.0902, z(0.8) = 0.8416)', () => {
    expectClose(studentUpperQuantile(0.001, Infinity), 3.0902, 2e-5);
    expectClose(studentUpperQuantile(0.2, Infinity), 0.8416, 5e-5);
    expect(() => studentUpperQuantile(0.7, 3)).toThrow(RangeError);
  });
});

describe('the relative density of a Student-t and its cutoff', () => {
  it('cutoffT inverts studentRelativeDensity; the Gaussian limit is sqrt(-2 ln c)', () => {
    for (const nu of [1, 3, 10, Infinity])
      for (const c of [0.5, 0.01, 1e-6]) expectClose(studentRelativeDensity(cutoffT(c, nu), nu), c, 1e-12);
    expectClose(cutoffT(0.01, Infinity), 3.0348542587702925, 1e-14);
  });
});

describe('detectableShift', () => {
  it('Gaussian noise and a Bonferroni level 0.01 / 50: 3.540 + 0.8416 sd (A&S table 26.1)', () => {
    const threshold = studentUpperQuantile(0.01 / 50, Infinity);
    expectClose(threshold, 3.5401, 5e-5);
    expectClose(
      detectableShift(threshold, { scale: 1, nu: Infinity }, 0.8, studentUpperQuantile),
      3.5401 + 0.8416,
      5e-5,
    );
  });
});
