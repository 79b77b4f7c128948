import { describe, expect, it } from 'vitest';
import { seededNormal } from './random.js';
import { detectChangePoints } from '../../src/model/change-points.js';

/** Levels of the given lengths with seeded Gaussian noise of sd `sd`. */
function steps(levels: [number, number][], sd: number, seed: number): number[] {
  const normal = seededNormal(seed);
  return levels.flatMap(([count, level]) => Array.from({ length: count }, () => level + sd * normal()));
}

describe('detectChangePoints', () => {
  it('finds one clear step: 40 runs at 100 ± 1, then 30 at 110 ± 1 -> [40]', () => {
    for (const seed of [1, 2, 3, 4, 5]) {
      expect(
        detectChangePoints(
          steps(
            [
              [40, 100],
              [30, 110],
            ],
            1,
            seed,
          ),
        ),
      ).toEqual([40]);
    }
  });

  it('finds injected steps up and down, on a large offset', () => {
    const values = steps(
      [
        [25, 1e9],
        [20, 1e9 + 8],
        [30, 1e9 + 3],
      ],
      1,
      8,
    );
    expect(detectChangePoints(values)).toEqual([25, 45]);
  });

  it('stays quiet on pure noise most of the time', () => {
    let alarms = 0;
    for (let seed = 100; seed < 300; seed++) {
      if (detectChangePoints(steps([[70, 50]], 2, seed)).length > 0) alarms++;
    }
    // The default penalty 3 ln(n) makes a split of pure noise rare; allow at most 5% of series.
    expect(alarms).toBeLessThanOrEqual(10);
  });

  it('a few slow runs do not buy a segment (the clipped, Huber-style cost; Fearnhead & Rigaill 2019)', () => {
    const normal = seededNormal(404);
    const values = Array.from({ length: 60 }, (_, i) => 100 + normal() + (i % 9 === 4 ? 40 : 0));
    expect(detectChangePoints(values, { minSegment: 10 })).toEqual([]);
    // the same slow runs as a lasting block are a level: found
    const block = Array.from({ length: 60 }, (_, i) => 100 + normal() + (i >= 35 ? 40 : 0));
    expect(detectChangePoints(block, { minSegment: 10 })).toEqual([35]);
  });

  it('respects the shortest segment and handles short or constant series', () => {
    // A 3-run burst cannot become its own segment with minSegment 5.
    const burst = [...steps([[30, 10]], 0.5, 21)];
    burst.splice(15, 3, 30, 30, 30);
    const bounds = [0, ...detectChangePoints(burst, { minSegment: 5 }), burst.length];
    for (let i = 1; i < bounds.length; i++) expect(bounds[i]! - bounds[i - 1]!).toBeGreaterThanOrEqual(5);
    // With minSegment 1 the same burst is cut out as its own segment (a sanity check that the
    // limit above is what kept it whole).
    expect(detectChangePoints(burst, { minSegment: 1 })).toEqual([15, 18]);
    expect(detectChangePoints([1, 2, 3])).toEqual([]);
    expect(detectChangePoints(new Array(50).fill(4))).toEqual([]);
    expect(detectChangePoints([])).toEqual([]);
  });

  it('rejects non-finite values and bad options with a RangeError', () => {
    const values = steps([[20, 5]], 1, 3);
    values[7] = Number.NaN;
    expect(() => detectChangePoints(values)).toThrow(/position 8/);
    expect(() => detectChangePoints([1, 2], { penalty: -1 })).toThrow(RangeError);
    expect(() => detectChangePoints([1, 2], { minSegment: 0 })).toThrow(RangeError);
    expect(() => detectChangePoints([1, Infinity])).toThrow(RangeError);
  });
});
