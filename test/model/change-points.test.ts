import { describe, expect, it } from 'vitest';
import { seededNormal } from './random.js';
import { detectChangePoints } from '../../src/model/change-points.js';
import { InputError } from '../../src/model/input-error.js';

/** Plain median, written here so the reference below shares no code with the module. */
function plainMedian(values: number[]): number {
  const s = [...values].sort((a, b) => a - b);
  const h = s.length >> 1;
  return s.length % 2 ? s[h]! : (s[h - 1]! + s[h]!) / 2;
}

/**
 * Optimal partitioning by the plain O(n^2) dynamic program (Jackson et al. 2005), which PELT must
 * reproduce exactly (Killick, Fearnhead & Eckley 2012, Theorem 3.2): same cost (squared
 * deviations from each segment mean over sigma^2, sigma = 1.4826 MAD of differences / sqrt 2),
 * same penalty, same shortest segment, no pruning.
 */
function optimalPartition(values: number[], penalty: number, minSegment: number): number[] {
  const n = values.length;
  const diffs = values.slice(1).map((x, i) => x - values[i]!);
  const centre = plainMedian(diffs);
  const sigma = (1.4826 * plainMedian(diffs.map((d) => Math.abs(d - centre)))) / Math.SQRT2;
  const cost = (a: number, b: number): number => {
    const seg = values.slice(a, b);
    const m = seg.reduce((s, x) => s + x, 0) / seg.length;
    return seg.reduce((s, x) => s + (x - m) ** 2, 0) / sigma ** 2;
  };
  const best = [-penalty];
  const from = [0];
  for (let end = 1; end <= n; end++) {
    best.push(Infinity);
    from.push(0);
    for (let start = 0; start <= end - minSegment; start++) {
      if (start !== 0 && start < minSegment) continue;
      const v = best[start]! + cost(start, end) + penalty;
      if (v < best[end]!) {
        best[end] = v;
        from[end] = start;
      }
    }
  }
  const starts: number[] = [];
  for (let at = from[n]!; at > 0; at = from[at]!) starts.push(at);
  return starts.reverse();
}

function steps(levels: [number, number][], sd: number, seed: number): number[] {
  const normal = seededNormal(seed);
  return levels.flatMap(([count, level]) => Array.from({ length: count }, () => level + sd * normal()));
}

describe('detectChangePoints', () => {
  it('finds one clear step: 40 runs at 100 ± 1, then 30 at 110 ± 1 -> [40]', () => {
    for (const seed of [1, 2, 3, 4, 5]) {
      expect(detectChangePoints(steps([[40, 100], [30, 110]], 1, seed))).toEqual([40]);
    }
  });

  it('finds injected steps up and down, on a large offset', () => {
    const values = steps([[25, 1e9], [20, 1e9 + 8], [30, 1e9 + 3]], 1, 8);
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

  it('returns exactly the optimal partition (PELT pruning loses nothing)', () => {
    for (const seed of [11, 12, 13, 14, 15, 16]) {
      const values = steps([[15, 0], [12, 2.5], [20, 1], [10, -1.5]], 1, seed);
      for (const [penalty, minSegment] of [[3 * Math.log(values.length), 5], [4, 2], [1, 1]] as const) {
        expect(detectChangePoints(values, { penalty, minSegment })).toEqual(optimalPartition(values, penalty, minSegment));
      }
    }
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

  it('rejects non-finite values and bad options with an InputError', () => {
    const values = steps([[20, 5]], 1, 3);
    values[7] = Number.NaN;
    expect(() => detectChangePoints(values)).toThrow(/position 8/);
    expect(() => detectChangePoints([1, 2], { penalty: -1 })).toThrow(InputError);
    expect(() => detectChangePoints([1, 2], { minSegment: 0 })).toThrow(InputError);
    expect(() => detectChangePoints([1, Infinity])).toThrow(InputError);
  });
});
