import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { expectClose } from '../helpers/close.js';
import studentTCdf from '@stdlib/stats-base-dists-t-cdf';
import { jStat } from './jstat.js';
import { SERIES_TAIL_FLOOR, seriesTwoSidedTail } from '../../src/model/student-tail-series.js';
import { studentTail } from '../../src/model/tails.js';

describe('seriesTwoSidedTail (A&S 26.7.3-4)', () => {
  it('matches the two-sided critical values of the standard t table', () => {
    // Standard t table (e.g. NIST/SEMATECH e-Handbook 1.3.6.7.2; 3 decimals, from memory).
    for (const [nu, alpha, t] of [
      [1, 0.05, 12.706],
      [2, 0.05, 4.303],
      [3, 0.01, 5.841],
      [10, 0.05, 2.228],
      [29, 0.01, 2.756],
      [59, 0.05, 2.001],
    ] as const) {
      expectClose(seriesTwoSidedTail(t, nu) ?? NaN, alpha, 2e-3);
    }
  });

  it('closed forms for nu = 1 (Cauchy) and nu = 2 (from memory: 1 - 2 atan(t)/pi, 1 - t / sqrt(2 + t^2))', () => {
    for (const t of [0.1, 1, 3, 20]) {
      expectClose(seriesTwoSidedTail(t, 1) ?? NaN, 1 - (2 * Math.atan(t)) / Math.PI, 1e-14);
      expectClose(seriesTwoSidedTail(t, 2) ?? NaN, 1 - t / Math.sqrt(2 + t * t), 1e-13);
    }
  });

  // jstat's t CDF is good to about 1e-8 (it is off by 4e-8 near t = 0), so it is held to the
  // tolerance the studentTail test uses (1e-6); stdlib's incomplete beta to 1e-9.
  it('agrees with jstat (1e-6) and with stdlib (1e-9) wherever it answers (second opinions)', () => {
    fc.assert(
      fc.property(fc.double({ min: -60, max: 60, noNaN: true }), fc.integer({ min: 1, max: 400 }), (t, nu) => {
        const tail = seriesTwoSidedTail(t, nu);
        const reference = 2 * studentTCdf(-Math.abs(t), nu);
        if (tail === undefined) {
          expect(reference).toBeLessThan(SERIES_TAIL_FLOOR * (1 + 1e-6));
          return;
        }
        expectClose(tail, reference, 1e-9);
        expectClose(tail, 2 * jStat.studentt.cdf(-Math.abs(t), nu), 1e-6);
      }),
      { numRuns: 2000, seed: 29 },
    );
  });

  it('declines fractional, huge and infinite inputs (the incomplete beta takes them)', () => {
    expect(seriesTwoSidedTail(1, 2.5)).toBeUndefined();
    expect(seriesTwoSidedTail(1, 1e6)).toBeUndefined();
    expect(seriesTwoSidedTail(Infinity, 5)).toBeUndefined();
    expect(seriesTwoSidedTail(40, 10)).toBeUndefined();
  });
});

describe('studentTail through the series and through the incomplete beta', () => {
  it('each side agrees with jstat on both paths, near 0 and far out (second opinion)', () => {
    fc.assert(
      fc.property(fc.double({ min: -40, max: 40, noNaN: true }), fc.integer({ min: 1, max: 80 }), (t, nu) => {
        expectClose(studentTail(t, nu, 'lower'), jStat.studentt.cdf(t, nu), 1e-6, 1e-12);
        expectClose(studentTail(t, nu, 'upper'), jStat.studentt.cdf(-t, nu), 1e-6, 1e-12);
        expectClose(studentTail(t, nu, 'both'), 2 * jStat.studentt.cdf(-Math.abs(t), nu), 1e-6, 1e-12);
      }),
      { numRuns: 1000, seed: 31 },
    );
  });
});
