import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { seededNormal } from './random.js';
import { detectChangePoints } from '../../src/model/change-points.js';
import { InputError } from '../../src/errors/input-error.js';

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
  const cost = segmentCost(values);
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

/**
 * The noise sigma the detector documents: 1.4826 MAD of successive differences / sqrt 2, or, when
 * that MAD is 0 (quantised data), the RMS of the differences / sqrt 2.
 */
function noiseSigma(values: number[]): number {
  const diffs = values.slice(1).map((x, i) => x - values[i]!);
  const centre = plainMedian(diffs);
  const robust = (1.4826 * plainMedian(diffs.map((d) => Math.abs(d - centre)))) / Math.SQRT2;
  return robust > 0 ? robust : Math.sqrt(diffs.reduce((s, d) => s + d * d, 0) / (2 * diffs.length));
}

/** C(a, b): squared deviations of values[a..b) from their mean, over sigma^2, summed directly. */
function segmentCost(values: number[]): (a: number, b: number) => number {
  const sigma = noiseSigma(values);
  return (a, b) => {
    const seg = values.slice(a, b);
    const m = seg.reduce((s, x) => s + x, 0) / seg.length;
    return seg.reduce((s, x) => s + (x - m) ** 2, 0) / sigma ** 2;
  };
}

/** The penalised cost of a segmentation given by its starts. */
function penalisedCost(values: number[], starts: number[], penalty: number): number {
  const cost = segmentCost(values);
  const bounds = [0, ...starts, values.length];
  let total = penalty * starts.length;
  for (let i = 1; i < bounds.length; i++) total += cost(bounds[i - 1]!, bounds[i]!);
  return total;
}

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

  it('returns exactly the optimal partition (PELT pruning loses nothing)', () => {
    for (const seed of [11, 12, 13, 14, 15, 16]) {
      const values = steps(
        [
          [15, 0],
          [12, 2.5],
          [20, 1],
          [10, -1.5],
        ],
        1,
        seed,
      );
      for (const [penalty, minSegment] of [
        [3 * Math.log(values.length), 5],
        [4, 2],
        [1, 1],
      ] as const) {
        expect(detectChangePoints(values, { penalty, minSegment })).toEqual(
          optimalPartition(values, penalty, minSegment),
        );
      }
    }
  });

  it('property: equals the plain O(n^2) optimal partition on random level-shift series of any length', () => {
    // Segments of random length and level, Gaussian noise; some series quantised to whole units so
    // the MAD of differences is often 0 (the RMS fallback) and costs tie. A long series first, so
    // the scratch buffers shared between calls are larger than the series and hold stale values.
    const segment = fc.record({
      length: fc.integer({ min: 1, max: 40 }),
      level: fc.double({ min: -6, max: 6, noNaN: true }),
    });
    const series = fc.record({
      segments: fc.array(segment, { minLength: 1, maxLength: 5 }),
      seed: fc.integer({ min: 1, max: 1e6 }),
      offset: fc.constantFrom(0, 1e6),
      quantised: fc.boolean(),
      minSegment: fc.integer({ min: 1, max: 8 }),
      penaltyScale: fc.constantFrom(0, 0.5, 1, 3),
    });
    fc.assert(
      fc.property(series, ({ segments, seed, offset, quantised, minSegment, penaltyScale }) => {
        detectChangePoints(
          steps(
            [
              [300, 0],
              [200, 3],
            ],
            1,
            seed,
          ),
        );
        const raw = steps(
          segments.map((s) => [s.length, s.level] as [number, number]),
          1,
          seed,
        );
        const values = raw.map((x) => offset + (quantised ? Math.round(x) : x));
        const penalty = penaltyScale * Math.log(Math.max(values.length, 2));
        const found = detectChangePoints(values, { penalty, minSegment });
        if (values.length < 2 * minSegment || !(noiseSigma(values) > 0)) {
          expect(found).toEqual([]);
          return;
        }
        const optimal = optimalPartition(values, penalty, minSegment);
        for (let i = 0; i < found.length; i++) {
          const from = i === 0 ? 0 : found[i - 1]!;
          expect(found[i]! - from).toBeGreaterThanOrEqual(minSegment);
        }
        if (values.length - (found.at(-1) ?? 0) < minSegment) expect.fail('last segment shorter than minSegment');
        // Equal cost always (ties may pick another optimum); equal partition on untied data.
        const ours = penalisedCost(values, found, penalty);
        const best = penalisedCost(values, optimal, penalty);
        expect(Math.abs(ours - best)).toBeLessThanOrEqual(1e-7 * Math.max(1, Math.abs(best)));
        if (!quantised) expect(found).toEqual(optimal);
      }),
      { numRuns: 300, seed: 4242 },
    );
  });

  it('property: equals the plain optimal partition where a split barely pays or barely does not (the no-change shortcut)', () => {
    // Pure-noise windows of the gate's size (the shortcut's common case), and windows with one or
    // two steps sized so the best split gains about the penalty: a step d at b in n runs of unit
    // noise gains about d^2 b (n - b) / n (Killick et al. 2012's cost), so d = sqrt(penalty n /
    // (b (n - b))) x factor puts the gain near the penalty, where the shortcut hands over to PELT.
    const window = fc.record({
      n: fc.integer({ min: 10, max: 80 }),
      cut: fc.double({ min: 0.1, max: 0.9, noNaN: true }),
      second: fc.double({ min: 0, max: 1, noNaN: true }),
      factor: fc.constantFrom(0, 0.5, 0.8, 0.9, 1, 1.1, 1.25, 1.5, 2),
      steps: fc.constantFrom(1, 2),
      seed: fc.integer({ min: 1, max: 1e6 }),
      offset: fc.constantFrom(0, 250, 1e6),
    });
    fc.assert(
      fc.property(window, ({ n, cut, second, factor, steps: count, seed, offset }) => {
        const normal = seededNormal(seed);
        const b = Math.max(1, Math.min(n - 1, Math.round(cut * n)));
        const d = factor * Math.sqrt((3 * Math.log(n) * n) / (b * (n - b)));
        const c = Math.max(b, Math.min(n - 1, b + Math.round(second * (n - b))));
        const values = Array.from(
          { length: n },
          (_, i) => offset + normal() + (i >= b ? d : 0) - (count === 2 && i >= c ? d : 0),
        );
        expect(detectChangePoints(values)).toEqual(optimalPartition(values, 3 * Math.log(n), 5));
      }),
      { numRuns: 600, seed: 2718 },
    );
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
