import { describe, expect, it } from 'vitest';
import { levelSteps } from '../../../src/model/level-steps.js';
import { hampelOutliers } from '../../../src/model/hampel.js';
import { seededNormal } from '../random.js';

const noisy = (seed: number, levels: [number, number][]): number[] => {
  const draw = seededNormal(seed);
  return levels.flatMap(([count, level]) => Array.from({ length: count }, () => level + draw()));
};

describe('levelSteps', () => {
  it('finds two sustained steps where they are', () => {
    const steps = levelSteps(
      noisy(1, [
        [30, 0],
        [25, 4],
        [25, 8],
      ]),
    );
    expect(steps.map((s) => s.at)).toEqual([30, 55]);
    expect(steps.every((s) => s.p < 0.001)).toBe(true);
  });

  it('a regime that comes and goes is no step, even a long one', () => {
    for (const seed of [2, 3, 4, 5, 6]) {
      expect(
        levelSteps(
          noisy(seed, [
            [30, 0],
            [15, 6],
            [30, 0],
          ]),
        ),
      ).toEqual([]);
    }
  });

  it('finds nothing in 95 of 100 flat noise series', () => {
    let flagged = 0;
    for (let seed = 1; seed <= 100; seed++) if (levelSteps(noisy(100 + seed, [[80, 0]])).length > 0) flagged++;
    expect(flagged).toBeLessThanOrEqual(5);
  });

  it('keeps a step whose segments drift steadily with almost no noise (a drift is no serial correlation)', () => {
    // A +12% step after 18 runs, each segment drifting -0.06% a run with a small zigzag: the sample
    // project's deterministic noise (test/fixtures/sample-project/bench.mjs) had this shape.
    const values = Array.from({ length: 30 }, (_, i) => (i < 18 ? 31 : 34.7) * (1 - 0.0006 * i) + (i % 2) * 0.006);
    expect(levelSteps(values).map((s) => s.at)).toEqual([18]);
  });

  it('refuses bad options and values', () => {
    expect(() => levelSteps([1, 2, Number.NaN])).toThrow(RangeError);
    expect(() => levelSteps([1, 2], { level: 2 })).toThrow(RangeError);
    expect(() => levelSteps([1, 2], { minSegment: 0 })).toThrow(RangeError);
    expect(levelSteps([1, 2, 3])).toEqual([]);
  });
});

describe('hampelOutliers', () => {
  it('flags a burst shorter than the window and keeps a step sharp', () => {
    const draw = seededNormal(7);
    const values = Array.from(
      { length: 40 },
      (_, i) => (i >= 20 ? 10 : 0) + 0.1 * draw() + (i === 8 || i === 9 ? 5 : 0),
    );
    const flags = hampelOutliers(values, 5);
    expect(flags[8]).toBe(true);
    expect(flags[9]).toBe(true);
    // The runs on both sides of the step are the majority of their windows: none is flagged.
    expect(flags.slice(15, 25).some(Boolean)).toBe(false);
  });

  it('flags few values of clean noise (about 0.3% beyond 3 sd, a little more from the moving MAD)', () => {
    const draw = seededNormal(9);
    const flags = hampelOutliers(
      Array.from({ length: 2000 }, () => draw()),
      10,
    );
    expect(flags.filter(Boolean).length).toBeLessThan(40);
  });

  it('refuses bad options', () => {
    expect(() => hampelOutliers([1, 2], 0)).toThrow(RangeError);
    expect(() => hampelOutliers([1, Number.NaN], 1)).toThrow(RangeError);
  });
});
