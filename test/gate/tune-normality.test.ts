import { describe, expect, it } from 'vitest';
import { normalityCheck } from '../../src/gate/tune/normality-check.js';
import { jStat } from '../model/jstat.js';
import { seededNormal } from '../model/random.js';

describe('normality diagnostics and the log suggestion', () => {
  const normal = seededNormal(31);
  // Log-normal timings, sigma 0.5: theoretical skewness (e^s2 + 2) sqrt(e^s2 - 1) = 1.75 (from memory).
  const lognormal = Array.from({ length: 200 }, () => Math.exp(4 + 0.5 * normal()));
  const gaussian = Array.from({ length: 200 }, () => 100 + 5 * normal());

  it('suggests transform: log for log-normal values', () => {
    const check = normalityCheck(lognormal)!;
    expect(check.suggestLog).toBe(true);
    expect(check.raw.andersonDarling).toBeGreaterThan(0.752); // 5% critical value (D'Agostino & Stephens 1986)
    expect(check.log!.andersonDarling).toBeLessThan(0.752);
    expect(check.raw.skewness).toBeGreaterThan(1);
    // On the log scale the sample is Gaussian: |G1| within 3 standard errors sqrt(6/n) (common practice).
    expect(Math.abs(check.log!.skewness)).toBeLessThan(3 * Math.sqrt(6 / 200));
    expect(check.note).toMatch(/log scale fits clearly better/);
  });

  it('skewness agrees with jstat (second opinion, after its population-to-sample factor)', () => {
    // jStat.skewness is the population g1; G1 = g1 sqrt(n (n - 1)) / (n - 2) (Joanes & Gill 1998).
    const n = lognormal.length;
    const g1 = jStat.skewness(lognormal);
    expect(normalityCheck(lognormal)!.raw.skewness).toBeCloseTo((g1 * Math.sqrt(n * (n - 1))) / (n - 2), 9);
  });

  it('does not suggest log for Gaussian values, for values <= 0, or for too few or constant values', () => {
    expect(normalityCheck(gaussian)?.suggestLog).toBe(false);
    const shifted = lognormal.map((x, i) => (i === 0 ? -1 : x));
    const check = normalityCheck(shifted)!;
    expect(check.log).toBeUndefined();
    expect(check.suggestLog).toBe(false);
    expect(check.note).toMatch(/no log scale/);
    expect(normalityCheck([1, 2, 3, 4, 5, 6, 7])).toBeUndefined();
    expect(normalityCheck(Array(20).fill(5))).toBeUndefined();
  });
});
