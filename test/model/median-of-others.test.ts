import fc from 'fast-check';
import { median } from 'simple-statistics';
import { describe, expect, it } from 'vitest';
import { medianOfOthers } from '../../src/model/median-of-others.js';

describe('medianOfOthers', () => {
  it('equals the median of the others (simple-statistics as the reference), NaN entries skipped', () => {
    fc.assert(
      fc.property(
        fc.array(fc.oneof(fc.double({ min: -1e6, max: 1e6, noNaN: true }), fc.constant(NaN)), { maxLength: 30 }),
        (xs) => {
          const got = medianOfOthers(xs);
          xs.forEach((x, i) => {
            const others = xs.filter((y, k) => k !== i && Number.isFinite(y));
            if (!Number.isFinite(x) || others.length === 0) expect(got[i]).toBeNaN();
            else
              expect(Math.abs(got[i]! - median(others))).toBeLessThanOrEqual(1e-15 * Math.abs(median(others)) + 1e-300);
          });
        },
      ),
      { numRuns: 300, seed: 13 },
    );
  });

  it('a metric that moves alone does not move the median it is compared with', () => {
    expect(medianOfOthers([1, 2, 3, 100])).toEqual([3, 3, 2, 2]);
  });
});
