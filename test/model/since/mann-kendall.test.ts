import { describe, expect, it } from 'vitest';
import { expectClose } from '../../helpers/close.js';
import { mannKendall } from '../../../src/model/mann-kendall.js';
import { kendallExactUpperTail } from '../../../src/model/kendall-exact.js';
import { serialCorrection, longRunFactor } from '../../../src/model/serial-correction.js';
import { normalUpperTail } from '../../../src/model/special/normal.js';
import { seededNormal } from '../random.js';
import { scipy } from './reference.js';

/** S by brute force over every order of n distinct values: the exact null distribution, counted. */
function permutationTail(n: number, s: number): number {
  const values = Array.from({ length: n }, (_, i) => i);
  let hits = 0;
  let total = 0;
  const walk = (prefix: number[], rest: number[]): void => {
    if (rest.length === 0) {
      total++;
      let score = 0;
      for (let i = 0; i < n; i++) for (let j = i + 1; j < n; j++) score += Math.sign(prefix[j]! - prefix[i]!);
      if (score >= s) hits++;
      return;
    }
    rest.forEach((x, k) => walk([...prefix, x], [...rest.slice(0, k), ...rest.slice(k + 1)]));
  };
  walk([], values);
  return hits / total;
}

describe('kendallExactUpperTail', () => {
  it('matches counting every order of n = 3..7 values', () => {
    for (let n = 3; n <= 7; n++) {
      const most = (n * (n - 1)) / 2;
      for (let s = -most; s <= most; s += 2) expectClose(kendallExactUpperTail([n], s), permutationTail(n, s), 1e-12);
    }
  });

  it("Gilbert (1987) table A18 (Kendall's table), from memory: n = 4 and n = 5", () => {
    // n = 4: P(S >= 6) = 0.042, >= 4: 0.167, >= 2: 0.375; n = 5: >= 10: 0.0083, >= 8: 0.042,
    // >= 6: 0.117, >= 4: 0.242, >= 2: 0.408 (three significant digits, as the table prints them).
    const table: [number, number, number][] = [
      [4, 6, 0.042],
      [4, 4, 0.167],
      [4, 2, 0.375],
      [5, 10, 0.0083],
      [5, 8, 0.042],
      [5, 6, 0.117],
      [5, 4, 0.242],
      [5, 2, 0.408],
    ];
    for (const [n, s, p] of table) expectClose(kendallExactUpperTail([n], s), p, 0.012);
  });

  it('two blocks: the convolution equals counting both blocks together', () => {
    // Independent blocks of 3 and 4: P(S1 + S2 >= s) from the two exact distributions, by hand.
    const d3 = [-3, -1, -1, 1, 1, 3];
    const d4: number[] = [];
    for (let s = -6; s <= 6; s += 2) {
      const count = Math.round((permutationTail(4, s) - permutationTail(4, s + 2)) * 24);
      for (let k = 0; k < count; k++) d4.push(s);
    }
    let hits = 0;
    for (const a of d3) for (const b of d4) if (a + b >= 3) hits++;
    expectClose(kendallExactUpperTail([3, 4], 3), hits / (6 * 24), 1e-12);
  });

  it('refuses more pairs than it computes', () => {
    expect(() => kendallExactUpperTail([300], 0)).toThrow(RangeError);
  });
});

describe('mannKendall', () => {
  it('SciPy kendalltau against time: exact p without ties, tie-corrected variance with ties', () => {
    for (const ref of scipy.kendall) {
      const r = mannKendall([ref.values]);
      if (ref.method === 'exact') {
        expect(r.exact).toBe(true);
        expectClose(r.tau, ref.tau, 1e-12, 1e-15);
        expectClose(r.p, ref.p, 1e-9);
      } else {
        expect(r.exact).toBe(false);
        // SciPy's asymptotic p is 2 Q(|S| / sqrt Var S): no continuity correction, same variance.
        expectClose(Math.min(1, 2 * normalUpperTail(Math.abs(r.s) / Math.sqrt(r.variance))), ref.p, 1e-9);
      }
    }
  });

  it('the definition worked by hand (Kendall 1975): 3 1 4 1 5 9 2 6, one tie pair', () => {
    // Later-greater minus later-smaller, value by value: 3: +1, 1: +5, 4: +1, 1: +4, 5: +1, 9: -2,
    // 2: +1, so S = 11. Var S = (8 x 7 x 21 - 2 x 1 x 9) / 18 = 64.333; z = 10 / sqrt(64.333) = 1.2468.
    const r = mannKendall([[3, 1, 4, 1, 5, 9, 2, 6]]);
    expect(r.s).toBe(11);
    expect(r.exact).toBe(false); // a tie: the normal approximation with the tie correction
    expectClose(r.variance, (8 * 7 * 21 - 18) / 18, 1e-12);
    expectClose(r.z, 1.2468, 1e-4);
    expectClose(r.p, 2 * normalUpperTail(10 / Math.sqrt(64 + 1 / 3)), 1e-12);
  });

  it('blocks: S and Var S add up, pairs across blocks are not compared', () => {
    const a = [1, 2, 3, 4, 5, 6];
    const b = [0, 1, 2, 3, 4, 5];
    const r = mannKendall([a, b]);
    expect(r.s).toBe(30);
    expectClose(r.variance, (2 * (6 * 5 * 17)) / 18, 1e-12);
    expectClose(r.p, 2 * kendallExactUpperTail([6, 6], 30), 1e-12);
    // One block of the same twelve values has a step inside and a different S.
    expect(mannKendall([[...a, ...b]]).s).not.toBe(30);
  });

  it('is calibrated on independent noise: about 5% of 400 series below 0.05 (normal approximation)', () => {
    const draw = seededNormal(5);
    let below = 0;
    for (let k = 0; k < 400; k++) {
      const x = Array.from({ length: 120 }, () => draw());
      if (mannKendall([x]).p < 0.05) below++;
    }
    // Binomial(400, 0.05): mean 20, sd 4.4; the continuity correction makes it a little conservative.
    expect(below).toBeGreaterThanOrEqual(8);
    expect(below).toBeLessThanOrEqual(32);
  });

  it('refuses non-finite values, too few values and a variance factor below 1', () => {
    expect(() => mannKendall([[1, Number.NaN, 3]])).toThrow(/position 2/);
    expect(() => mannKendall([[1]])).toThrow(RangeError);
    expect(() => mannKendall([[1, 2, 3]], 0.5)).toThrow(RangeError);
    expect(mannKendall([[2, 2, 2, 2]]).p).toBe(1);
  });
});

describe('serialCorrection and longRunFactor (Hamed & Rao 1998; long-run variance)', () => {
  it('stay near 1 for independent noise and grow for an AR(1) with rho = 0.6', () => {
    const draw = seededNormal(9);
    const iid = Array.from({ length: 200 }, () => draw());
    expect(serialCorrection(iid)).toBeLessThan(1.3);
    expect(longRunFactor(iid)).toBeLessThan(1.3);
    const ar: number[] = [0];
    for (let i = 1; i < 200; i++) ar.push(0.6 * ar[i - 1]! + draw());
    // The long-run variance factor of an AR(1) is (1 + rho) / (1 - rho) = 4 (Box & Jenkins).
    expect(longRunFactor(ar)).toBeGreaterThan(2.5);
    expect(longRunFactor(ar)).toBeLessThan(5.5);
    expect(serialCorrection(ar)).toBeGreaterThan(2);
  });

  it('widened variance keeps the trend test calibrated on AR(1) noise', () => {
    const draw = seededNormal(21);
    let plain = 0;
    let corrected = 0;
    for (let k = 0; k < 200; k++) {
      const ar: number[] = [draw()];
      for (let i = 1; i < 80; i++) ar.push(0.5 * ar[i - 1]! + draw());
      if (mannKendall([ar]).p < 0.05) plain++;
      if (mannKendall([ar], serialCorrection(ar)).p < 0.05) corrected++;
    }
    expect(plain).toBeGreaterThan(30); // the plain test is far too eager (known, Hamed & Rao 1998)
    expect(corrected).toBeLessThanOrEqual(22); // 5% of 200 is 10, with room for the estimate
  });
});
