import fc from 'fast-check';
import { median as referenceMedian, medianAbsoluteDeviation as referenceMad } from 'simple-statistics';
import { describe, expect, it } from 'vitest';
import { median, medianAbsoluteDeviation, medianInPlace } from '../../src/model/median.js';

// Values that stress a selection algorithm: heavy ties (few distinct values), runs already sorted
// or reversed, and ordinary doubles of mixed sign and size.
const few = fc.integer({ min: -3, max: 3 });
const anyFinite = fc.double({ min: -1e12, max: 1e12, noNaN: true, noDefaultInfinity: true });
const values = fc.oneof(
  fc.array(anyFinite, { minLength: 1, maxLength: 200 }),
  fc.array(few, { minLength: 1, maxLength: 200 }),
  fc.array(anyFinite, { minLength: 1, maxLength: 200 }).map((xs) => [...xs].sort((a, b) => a - b)),
  fc.array(anyFinite, { minLength: 1, maxLength: 200 }).map((xs) => [...xs].sort((a, b) => b - a)),
);

/** The straightforward median: sort a copy, take the middle value or the mean of the middle pair. */
function sortedMedian(xs: readonly number[]): number {
  const s = [...xs].sort((a, b) => a - b);
  const h = s.length >> 1;
  return s.length % 2 === 1 ? s[h]! : (s[h - 1]! + s[h]!) / 2;
}

/**
 * simple-statistics interpolates the middle pair as a + (b - a) / 2 (numpy's type 7), which can
 * round differently from (a + b) / 2 in the last bit: equal for odd n, within 2 ulp for even n.
 */
function expectSameMedian(ours: number, reference: number, n: number): void {
  if (n % 2 === 1) expect(ours).toBe(reference);
  else expect(Math.abs(ours - reference)).toBeLessThanOrEqual(4.5e-16 * Math.abs(reference) + 1e-323);
}

describe('median (simple-statistics, checked input)', () => {
  it('equals the sort-based median on any finite input, ties and sorted runs included', () => {
    fc.assert(
      fc.property(values, (xs) => {
        expectSameMedian(median(xs), sortedMedian(xs), xs.length);
        // Second opinion: simple-statistics median (sorts a copy, type-7 quantile at 0.5).
        expectSameMedian(median(xs), referenceMedian(xs), xs.length);
      }),
      { numRuns: 400, seed: 7001 },
    );
  });

  it('MAD equals the median of |x - median| (simple-statistics medianAbsoluteDeviation as a second opinion)', () => {
    fc.assert(
      fc.property(values, (xs) => {
        const centre = sortedMedian(xs);
        expectSameMedian(medianAbsoluteDeviation(xs), sortedMedian(xs.map((x) => Math.abs(x - centre))), xs.length);
        if (xs.length % 2 === 1) expect(medianAbsoluteDeviation(xs)).toBe(referenceMad(xs));
      }),
      { numRuns: 400, seed: 7002 },
    );
  });

  it('does not reorder its input and refuses empty or non-finite input', () => {
    const xs = [5, 1, 4, 2, 3];
    expect(median(xs)).toBe(3);
    expect(xs).toEqual([5, 1, 4, 2, 3]);
    expect(() => median([])).toThrow(RangeError);
    expect(() => medianAbsoluteDeviation([1, Number.POSITIVE_INFINITY])).toThrow(/position 2/);
  });
});

describe('medianInPlace (quickselect on a reused buffer)', () => {
  it('equals simple-statistics median over the first count entries, whatever follows them', () => {
    fc.assert(
      fc.property(values, fc.array(anyFinite, { maxLength: 5 }), (xs, tail) => {
        const buffer = [...xs, ...tail];
        // + 0 turns -0 into 0: between equal middle values of either sign, which one lands is arbitrary.
        expectSameMedian(medianInPlace(buffer, xs.length) + 0, referenceMedian(xs) + 0, xs.length);
      }),
      { numRuns: 400, seed: 29 },
    );
  });

  it('an empty count has no median', () => {
    expect(medianInPlace([1, 2], 0)).toBeNaN();
  });
});
