import { describe, expect, it } from 'vitest';
import { expectClose } from '../../helpers/close.js';
import { rankSumTest } from '../../../src/model/rank-sum.js';
import { shiftEstimate } from '../../../src/model/shift-estimate.js';
import { rankSplit } from '../../../src/model/rank-split.js';
import { midranks } from '../../../src/model/ranks.js';
import { seededNormal } from '../random.js';
import { scipy } from './reference.js';

describe('rankSumTest', () => {
  it('SciPy mannwhitneyu (asymptotic, continuity and tie corrections), with and without ties', () => {
    for (const ref of scipy.ranksum) {
      const r = rankSumTest(ref.a, ref.b);
      expect(r.u).toBe(ref.u);
      expectClose(r.p, ref.p, 1e-10);
    }
  });

  it('the extreme case by hand: every b above every a gives U = mn', () => {
    const r = rankSumTest([1, 2, 3, 4, 5, 6, 7, 8], [9, 10, 11, 12, 13, 14, 15, 16]);
    expect(r.u).toBe(64);
    // z = (64 - 32 - 0.5) / sqrt(8 x 8 x 17 / 12) = 3.3082
    expectClose(r.z, 31.5 / Math.sqrt((64 * 17) / 12), 1e-12);
  });

  it('a variance factor widens the test', () => {
    const a = [1, 2, 3, 4, 5, 6, 7, 8];
    const b = [5, 6, 7, 8, 9, 10, 11, 12];
    expect(rankSumTest(a, b, 4).p).toBeGreaterThan(rankSumTest(a, b).p);
    expect(rankSumTest([2, 2], [2, 2]).p).toBe(1);
    expect(() => rankSumTest([], [1])).toThrow(RangeError);
  });

  it('midranks share tied ranks', () => {
    expect(Array.from(midranks([10, 30, 20, 20]).ranks)).toEqual([1, 4, 2.5, 2.5]);
    expect(midranks([10, 30, 20, 20]).ties).toBe(6);
  });
});

describe('shiftEstimate (Hodges-Lehmann)', () => {
  it('the median of the pairwise differences, as numpy computes it', () => {
    for (const ref of scipy.shift) expectClose(shiftEstimate(ref.a, ref.b).shift, ref.shift, 1e-12, 1e-15);
  });

  it('the interval covers the true shift about 95% of the time, on heavy-tailed noise too', () => {
    const draw = seededNormal(4);
    let covered = 0;
    for (let k = 0; k < 300; k++) {
      // Cauchy-like tails: a normal over the absolute value of another.
      const noise = (): number => draw() / Math.max(0.2, Math.abs(draw()));
      const a = Array.from({ length: 12 }, noise);
      const b = Array.from({ length: 15 }, () => 2 + noise());
      const r = shiftEstimate(a, b);
      if (r.lower <= 2 && 2 <= r.upper) covered++;
    }
    expect(covered / 300).toBeGreaterThan(0.92);
    expect(covered / 300).toBeLessThan(0.985);
  });

  it('too small samples give no interval; bad input throws', () => {
    const r = shiftEstimate([1, 2], [3, 4]);
    expect(r.shift).toBe(2);
    expect(Number.isNaN(r.lower)).toBe(true);
    expect(() => shiftEstimate([1], [Number.NaN])).toThrow(RangeError);
  });
});

describe('rankSplit', () => {
  it('finds a change near an end as well as in the middle', () => {
    const draw = seededNormal(8);
    const series = (at: number): number[] => Array.from({ length: 60 }, (_, i) => draw() + (i >= at ? 3 : 0));
    expect(rankSplit(series(30), 5).at).toBe(30);
    const late = rankSplit(series(53), 5);
    expect(Math.abs(late.at - 53)).toBeLessThanOrEqual(1); // 7 values after a 3 sd step
    expect(late.p).toBeLessThan(0.01);
  });

  it('is conservative under no change: at most about 5% of 400 series below 0.05', () => {
    const draw = seededNormal(12);
    let below = 0;
    for (let k = 0; k < 400; k++) {
      if (
        rankSplit(
          Array.from({ length: 50 }, () => draw()),
          5,
        ).p < 0.05
      )
        below++;
    }
    expect(below).toBeLessThanOrEqual(28); // 20 expected at the level; the bounds are conservative
  });

  it('no split in a too short series', () => {
    expect(rankSplit([1, 2, 3], 2).p).toBe(1);
    expect(() => rankSplit([1, 2], 0)).toThrow(RangeError);
  });
});
