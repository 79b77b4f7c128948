import { describe, expect, it } from 'vitest';
import { betaQuantile, rateEvidence } from '../../src/gate/tune/evidence.js';
import { expectClose } from '../helpers/close.js';
import { jStat as jStatSubset } from '../model/jstat.js';

// jstat's beta quantile (the shared subset type leaves it out).
const jStat = jStatSubset as unknown as { beta: { inv(p: number, a: number, b: number): number } };

describe('the evidence behind a replayed rate', () => {
  it('beta quantiles agree with jstat (second opinion) across shapes and levels', () => {
    for (const [a, b] of [
      [1, 10],
      [3, 50],
      [0.5, 0.5],
      [20, 281],
      [1, 300],
      [150, 151],
    ] as const)
      for (const p of [0.001, 0.025, 0.5, 0.975, 0.999])
        // jstat's own Newton steps stop near 1e-7 in places (its median of Beta(150, 151) is 0.50000003).
        expectClose(betaQuantile(p, a, b), jStat.beta.inv(p, a, b), 1e-6, 1e-14);
    // Beta(a, a) is symmetric about 1/2: its median is exactly 0.5.
    for (const a of [0.5, 3, 150]) expectClose(betaQuantile(0.5, a, a), 0.5, 1e-12);
  });

  it('Clopper-Pearson intervals agree with jstat beta quantiles, and 0 of 10 gives the tabled 0-0.3085', () => {
    // 0 of 10: upper 1 - 0.025^(1/10) = 0.30850 (Clopper & Pearson 1934; the exact form of the x = 0 bound).
    const none = rateEvidence(0, 10);
    expect(none.lower).toBe(0);
    expectClose(none.upper, 1 - 0.025 ** (1 / 10), 1e-10);
    expectClose(none.upper, 0.3085, 1e-4);
    for (const [x, n] of [
      [1, 52],
      [2, 300],
      [7, 100],
      [52, 52],
    ] as const) {
      const e = rateEvidence(x, n);
      expect(e.rate).toBe(x / n);
      if (x > 0) expectClose(e.lower, jStat.beta.inv(0.025, x, n - x + 1), 1e-6);
      if (x < n) expectClose(e.upper, jStat.beta.inv(0.975, x + 1, n - x), 1e-6);
      expect(e.ruleOfThree).toBeUndefined();
    }
  });

  it('with no event the rule of three bounds the rate by 3 / n, close to the exact one-sided 1 - 0.05^(1/n)', () => {
    // Hanley & Lippman-Hand 1983 (JAMA 249:1743): 3 / n is the 95% upper bound for 0 events in n,
    // within a few percent of the exact bound from n = 30 on.
    for (const n of [30, 52, 100, 300, 1000]) {
      const e = rateEvidence(0, n);
      expect(e.ruleOfThree).toBe(3 / n);
      const exact = 1 - 0.05 ** (1 / n);
      expect(Math.abs(e.ruleOfThree! - exact) / exact).toBeLessThan(0.06);
    }
    // 52 replayed runs cannot show a rate below about 6 per 100 (issue 13: "~2 per 100" is optimistic).
    expectClose(rateEvidence(0, 52).ruleOfThree!, 0.0577, 1e-3);
  });

  it('refuses a quantile outside [0, 1] or a shape at or below 0', () => {
    expect(() => betaQuantile(1.5, 1, 1)).toThrow(RangeError);
    expect(() => betaQuantile(0.5, 0, 1)).toThrow(RangeError);
  });
});
