import { describe, expect, it } from 'vitest';
import { expectClose } from '../../helpers/close.js';
import { theilSen } from '../../../src/model/theil-sen.js';
import { normalQuantile } from '../../../src/model/normal-quantile.js';
import { jStat } from '../jstat.js';
import { seededNormal } from '../random.js';
import { scipy } from './reference.js';

const positions = (n: number): number[] => Array.from({ length: n }, (_, i) => i);

describe('theilSen', () => {
  it('SciPy theilslopes: slope and Sen interval (nearest ranks) on Student-t noise', () => {
    for (const ref of scipy.theil) {
      const r = theilSen([{ at: positions(ref.values.length), values: ref.values }]);
      expectClose(r.slope, ref.slope, 1e-12);
      expectClose(r.lower, ref.low, 1e-12);
      expectClose(r.upper, ref.high, 1e-12);
    }
  });

  it('the median of the pairwise slopes, by hand', () => {
    // Pairs of (1,1) (2,3) (3,2) (4,4): slopes 2, 0.5, 1, -1, 0.5, 2 -> sorted -1 .5 .5 1 2 2 -> 0.75.
    expect(theilSen([{ at: [1, 2, 3, 4], values: [1, 3, 2, 4] }]).slope).toBe(0.75);
  });

  it('resists outliers: 20% of wild values leave the slope of a line near the truth', () => {
    const draw = seededNormal(3);
    const n = 60;
    const values = positions(n).map((t) => 5 + 0.3 * t + 0.1 * draw() + (t % 5 === 0 ? 40 : 0));
    expectClose(theilSen([{ at: positions(n), values }]).slope, 0.3, 0.03);
  });

  it('blocks: a step between two segments does not bend the slope; pairs across it are not taken', () => {
    const first = { at: positions(10), values: positions(10).map((t) => 0.1 * t) };
    const second = { at: positions(10).map((t) => t + 10), values: positions(10).map((t) => 50 + 0.1 * (t + 10)) };
    expectClose(theilSen([first, second]).slope, 0.1, 1e-12);
    const joined = { at: [...first.at, ...second.at], values: [...first.values, ...second.values] };
    expect(theilSen([joined]).slope).toBeGreaterThan(1);
    // maxLag keeps only close pairs: 9 of the 10 x 2 lag-1 and lag-2 pairs per side see no step.
    expect(theilSen([joined], { maxLag: 2 }).slope).toBeCloseTo(0.1, 12);
  });

  it('the interval covers the true slope about 95% of the time (Sen 1968)', () => {
    const draw = seededNormal(11);
    let covered = 0;
    for (let k = 0; k < 300; k++) {
      const values = positions(30).map((t) => 0.05 * t + draw());
      const r = theilSen([{ at: positions(30), values }]);
      if (r.lower <= 0.05 && 0.05 <= r.upper) covered++;
    }
    expect(covered / 300).toBeGreaterThan(0.91);
    expect(covered / 300).toBeLessThan(0.99);
  });

  it('refuses bad input with a message', () => {
    expect(() => theilSen([{ at: [1, 2], values: [1] }])).toThrow(RangeError);
    expect(() => theilSen([{ at: [1, 1], values: [1, 2] }])).toThrow(/different positions/);
    expect(() => theilSen([{ at: [1, 2], values: [1, Number.NaN] }])).toThrow(RangeError);
    expect(() => theilSen([{ at: [1, 2], values: [1, 2] }], { confidence: 1 })).toThrow(RangeError);
  });
});

describe('normalQuantile', () => {
  it('SciPy norm.ppf from 1e-300 to 1 - 1e-6', () => {
    for (const { p, z } of scipy.quantile) expectClose(normalQuantile(p), z, 1e-13, 1e-15);
  });

  it('A&S table 26.1 (from memory) and jStat', () => {
    expectClose(normalQuantile(0.975), 1.959963984540054, 1e-14);
    expectClose(normalQuantile(0.95), 1.6448536269514722, 1e-14);
    for (const p of [0.01, 0.2, 0.6, 0.9, 0.999]) expectClose(normalQuantile(p), jStat.normal.inv(p, 0, 1), 1e-8);
  });

  it('refuses probabilities outside (0, 1)', () => {
    for (const p of [0, 1, -0.1, Number.NaN]) expect(() => normalQuantile(p)).toThrow(RangeError);
  });
});
