import { describe, expect, it } from 'vitest';
import fc from 'fast-check';
import { expectClose } from '../helpers/close.js';
import { adjustTails, holmLevels } from '../../src/model/family.js';

const rejected = (adjusted: number[], alpha: number): number => adjusted.filter((p) => p <= alpha).length;

describe('adjustTails', () => {
  // Benjamini & Hochberg (1995), "Controlling the false discovery rate", section 4: the 15
  // p-values of their example (from memory). At q = 0.05 the step-up procedure rejects four;
  // Bonferroni (0.05/15 = 0.0033) rejects three, and so does Holm's step-down.
  const bh1995 = [
    0.0001, 0.0004, 0.0019, 0.0095, 0.0201, 0.0278, 0.0298, 0.0344, 0.0459, 0.324, 0.4262, 0.5719, 0.6528, 0.759, 1,
  ];

  it('BH 1995 example: fdr rejects 4 at 0.05, Bonferroni and Holm 3', () => {
    expect(rejected(adjustTails(bh1995, 'fdr'), 0.05)).toBe(4);
    expect(rejected(adjustTails(bh1995, 'bonferroni'), 0.05)).toBe(3);
    expect(rejected(adjustTails(bh1995, 'holm'), 0.05)).toBe(3);
    // The step-up value of the 4th: 15 x 0.0095 / 4 (definition).
    expectClose(adjustTails(bh1995, 'fdr')[3]!, (15 * 0.0095) / 4, 1e-12);
  });

  it('the order of the input does not matter; results come back in input order', () => {
    const shuffled = [...bh1995].reverse();
    expect(adjustTails(shuffled, 'fdr')).toEqual([...adjustTails(bh1995, 'fdr')].reverse());
    expect(adjustTails(shuffled, 'holm')).toEqual([...adjustTails(bh1995, 'holm')].reverse());
  });

  it('Holm worked example: p = 0.01, 0.04, 0.03, 0.005 at 0.05 rejects the 1st and 4th', () => {
    // Worked example of the Holm-Bonferroni method (from memory of the Wikipedia article):
    // sorted 0.005 < 0.05/4, 0.01 < 0.05/3, 0.03 > 0.05/2 stops. Adjusted: 4 x 0.005 = 0.02,
    // 3 x 0.01 = 0.03, max(0.03, 2 x 0.03) = 0.06, max(0.06, 1 x 0.04) = 0.06.
    const adjusted = adjustTails([0.01, 0.04, 0.03, 0.005], 'holm');
    [0.03, 0.06, 0.06, 0.02].forEach((expected, i) => expectClose(adjusted[i]!, expected, 1e-12));
    expect(rejected(adjusted, 0.05)).toBe(2);
  });

  it('Bonferroni multiplies by m and caps at 1', () => {
    expect(adjustTails([0.01, 0.3, 0.5], 'bonferroni')).toEqual([0.03, 0.8999999999999999, 1]);
    expect(adjustTails([], 'holm')).toEqual([]);
  });

  it('fdr <= holm <= bonferroni, all monotone in p (known properties of the methods)', () => {
    fc.assert(
      fc.property(fc.array(fc.double({ min: 0, max: 1, noNaN: true }), { minLength: 1, maxLength: 40 }), (tails) => {
        const bonferroni = adjustTails(tails, 'bonferroni');
        const holm = adjustTails(tails, 'holm');
        const fdr = adjustTails(tails, 'fdr');
        tails.forEach((p, i) => {
          expect(fdr[i]!).toBeLessThanOrEqual(holm[i]! + 1e-15);
          expect(holm[i]!).toBeLessThanOrEqual(bonferroni[i]! + 1e-15);
          expect(fdr[i]!).toBeGreaterThanOrEqual(p * (1 - 1e-15));
          expect(bonferroni[i]!).toBeLessThanOrEqual(1);
          tails.forEach((q, j) => {
            if (p < q) {
              expect(holm[i]!).toBeLessThanOrEqual(holm[j]!);
              expect(fdr[i]!).toBeLessThanOrEqual(fdr[j]!);
            }
          });
        });
      }),
      { numRuns: 200, seed: 17 },
    );
  });

  it('rejects values outside [0, 1] and unknown methods', () => {
    expect(() => adjustTails([0.1, 1.2], 'holm')).toThrow(/position 2/);
    expect(() => adjustTails([Number.NaN], 'fdr')).toThrow(RangeError);
    expect(() => adjustTails([0.1], 'sidak' as 'holm')).toThrow(RangeError);
  });
});

describe('holmLevels (Holm 1979)', () => {
  it('the i-th smallest tail faces alpha / (m - i + 1), in input order', () => {
    const levels = holmLevels([0.03, 0.001, 0.2], 0.01);
    expect(levels[1]).toBeCloseTo(0.01 / 3, 15);
    expect(levels[0]).toBeCloseTo(0.01 / 2, 15);
    expect(levels[2]).toBeCloseTo(0.01, 15);
  });
});
