import { describe, expect, it } from 'vitest';
import { sampleSkewness } from 'simple-statistics';
import normal from '@stdlib/stats-base-dists-normal';
import { expectClose } from '../helpers/close.js';
import { jStat } from './jstat.js';
import { seededNormal, seededUniform } from './random.js';
import { andersonDarling, andersonDarlingPValue, skewness } from '../../src/model/normality.js';

/** A^2 written plainly from the textbook formula with Phi and 1 - Phi (no log-space care). */
function plainAndersonDarling(values: number[]): number {
  const n = values.length;
  const m = values.reduce((s, x) => s + x, 0) / n;
  const s = Math.sqrt(values.reduce((acc, x) => acc + (x - m) ** 2, 0) / (n - 1));
  const phi = [...values].sort((a, b) => a - b).map((x) => jStat.normal.cdf((x - m) / s, 0, 1));
  let sum = 0;
  for (let i = 1; i <= n; i++) sum += (2 * i - 1) * (Math.log(phi[i - 1]!) + Math.log(1 - phi[n - i]!));
  return -n - sum / n;
}

describe('skewness', () => {
  it('is G1 = g1 sqrt(n(n-1))/(n-2): agrees with simple-statistics and with jstat g1 (second opinions)', () => {
    const values = [1, 2, 3, 10];
    // simple-statistics' sampleSkewness is the adjusted Fisher-Pearson G1 (its documentation).
    expectClose(skewness(values), sampleSkewness(values), 1e-12);
    // jstat's skewness is the moment ratio g1; by hand: m2 = 12.5, m3 = 45, g1 = 45 / 12.5^1.5.
    expectClose(jStat.skewness(values), 45 / 12.5 ** 1.5, 1e-12);
    expectClose(skewness(values), (jStat.skewness(values) * Math.sqrt(12)) / 2, 1e-12);
  });

  it('is 0 for symmetric data, positive for a right tail, negative for a left tail', () => {
    expectClose(skewness([1, 2, 3, 4, 5]), 0, 0, 1e-15);
    expect(skewness([1, 1, 1, 2, 9])).toBeGreaterThan(1);
    expect(skewness([-9, -2, -1, -1, -1])).toBeLessThan(-1);
    expect(skewness([3, 3, 3])).toBe(0);
  });

  it('an exponential sample has skewness near 2 (a known property of the distribution)', () => {
    const uniform = seededUniform(8);
    const values = Array.from({ length: 50000 }, () => -Math.log(1 - uniform()));
    expectClose(skewness(values), 2, 0.1);
  });

  it('needs 3 finite values', () => {
    expect(() => skewness([1, 2])).toThrow(RangeError);
    expect(() => skewness([1, 2, Number.NaN])).toThrow(RangeError);
  });
});

describe('andersonDarling', () => {
  it('matches a plain computation of A^2 and applies Stephens adjustment', () => {
    const draw = seededNormal(77);
    for (const n of [8, 20, 60]) {
      const values = Array.from({ length: n }, () => 40 + 3 * draw());
      const result = andersonDarling(values);
      expectClose(result.statistic, plainAndersonDarling(values), 1e-9);
      expectClose(result.adjusted, result.statistic * (1 + 0.75 / n + 2.25 / n ** 2), 1e-15);
    }
  });

  it("p-values at the published critical values of A*^2 (D'Agostino & Stephens 1986)", () => {
    // Critical values for the normal case with both parameters estimated (from memory):
    // 0.631 at 10%, 0.752 at 5%, 0.873 at 2.5%, 1.035 at 1%. Table 4.9's formulas reproduce
    // them to about 2 digits.
    expectClose(andersonDarlingPValue(0.631), 0.1, 0.04);
    expectClose(andersonDarlingPValue(0.752), 0.05, 0.03);
    expectClose(andersonDarlingPValue(0.873), 0.025, 0.05);
    expectClose(andersonDarlingPValue(1.035), 0.01, 0.05);
    // The published pieces meet at their boundaries to within about 2% (a wrong coefficient
    // would open a gap far wider).
    expectClose(andersonDarlingPValue(0.6 - 1e-9), andersonDarlingPValue(0.6), 0.03);
    expectClose(andersonDarlingPValue(0.34 - 1e-9), andersonDarlingPValue(0.34), 0.03);
    expectClose(andersonDarlingPValue(0.2 - 1e-9), andersonDarlingPValue(0.2), 0.03);
    expectClose(andersonDarlingPValue(0), 1, 1e-5);
    expect(andersonDarlingPValue(20)).toBeLessThan(1e-40);
  });

  it('holds its level on Gaussian samples and rejects exponential ones', () => {
    const draw = seededNormal(404);
    const uniform = seededUniform(405);
    let gaussianRejections = 0;
    let exponentialRejections = 0;
    const trials = 1000;
    for (let t = 0; t < trials; t++) {
      const g = Array.from({ length: 30 }, () => draw());
      const e = Array.from({ length: 30 }, () => -Math.log(1 - uniform()));
      if (andersonDarling(g).pValue < 0.05) gaussianRejections++;
      if (andersonDarling(e).pValue < 0.05) exponentialRejections++;
    }
    // Level 5% (binomial sd 0.7%); power against the exponential at n = 30 is high (common practice).
    expect(Math.abs(gaussianRejections / trials - 0.05)).toBeLessThan(0.022);
    expect(exponentialRejections / trials).toBeGreaterThan(0.8);
  });

  it('stays finite with an extreme value where Phi rounds to 1', () => {
    const values = [0, 0.1, -0.1, 0.2, -0.2, 0.05, -0.05, 0.15, 1e6];
    const result = andersonDarling(values);
    expect(Number.isFinite(result.statistic)).toBe(true);
    expect(result.pValue).toBeLessThan(0.01);
    // Phi(-z) in log space is what the plain formula cannot do here: ln(1 - 1) = -Infinity.
    expect(normal.logcdf(-40, 0, 1)).toBeGreaterThan(-Infinity);
  });

  it('needs 8 varying finite values', () => {
    expect(() => andersonDarling([1, 2, 3])).toThrow(/at least 8/);
    expect(() => andersonDarling(new Array(10).fill(2))).toThrow(/vary/);
    expect(() => andersonDarling([1, 2, 3, 4, 5, 6, 7, Number.NaN])).toThrow(RangeError);
    expect(() => andersonDarlingPValue(Number.NaN)).toThrow(RangeError);
  });
});
