import { describe, expect, it } from 'vitest';
import { expectClose } from '../helpers/close.js';
import { seededNormal } from './random.js';
import { fitGaussian, MAD_TO_SIGMA } from '../../src/model/fit.js';
import { median, medianAbsoluteDeviation } from '../../src/model/median.js';

describe('fitGaussian', () => {
  it('sigma 0.5 means variance 0.25, sigma 2 means variance 4 (common practice)', () => {
    // Two points at mean ± s have a 1/n standard deviation of exactly s.
    const half = fitGaussian([9.5, 10.5], 'mle');
    expectClose(half.sd, 0.5, 1e-15);
    expectClose(half.sd ** 2, 0.25, 1e-15);
    const two = fitGaussian([8, 12, 8, 12], 'mle');
    expectClose(two.sd ** 2, 4, 1e-15);
    // A large sample drawn with sigma 2 fits a variance near 4 (sd of the estimate ≈ 4 sqrt(2/n)).
    const normal = seededNormal(42);
    const values = Array.from({ length: 20000 }, () => 50 + 2 * normal());
    const fit = fitGaussian(values, 'mle');
    expectClose(fit.sd ** 2, 4, 0.05);
    expectClose(fit.mean, 50, 0.001);
  });

  it('mle and unbiased differ by sqrt((n - 1) / n) (definitions)', () => {
    const values = [3.1, 2.9, 3.4, 3.0, 2.6, 3.3];
    const n = values.length;
    const mle = fitGaussian(values, 'mle');
    const unbiased = fitGaussian(values, 'unbiased');
    expectClose(mle.sd, unbiased.sd * Math.sqrt((n - 1) / n), 1e-14);
    expectClose(mle.sampleSd, unbiased.sd, 1e-14);
    expect(mle.n).toBe(n);
  });

  it('robust: a past outlier barely moves median and MAD while it moves the mle fit', () => {
    const normal = seededNormal(3);
    const clean = Array.from({ length: 40 }, () => 100 + normal());
    const dirty = [...clean.slice(0, 39), 160];
    const robustClean = fitGaussian(clean, 'robust');
    const robustDirty = fitGaussian(dirty, 'robust');
    const mleClean = fitGaussian(clean, 'mle');
    const mleDirty = fitGaussian(dirty, 'mle');
    // One value of 40 replaced: the median moves by at most one order statistic gap.
    expect(Math.abs(robustDirty.mean - robustClean.mean)).toBeLessThan(0.2);
    expect(robustDirty.sd / robustClean.sd).toBeLessThan(1.25);
    // The mle mean moves by about 60/40 = 1.5 and the sd grows several times.
    expect(mleDirty.mean - mleClean.mean).toBeGreaterThan(1);
    expect(mleDirty.sd / mleClean.sd).toBeGreaterThan(5);
    // The MAD scaled by 1.4826 estimates sigma = 1 (Rousseeuw & Croux 1993), within sampling error.
    expectClose(robustClean.sd, 1, 0.35);
  });

  it('median and MAD on hand-checked cases', () => {
    expect(median([3, 1, 2, 10])).toBe(2.5);
    expect(median([5, -1, 3])).toBe(3);
    expect(medianAbsoluteDeviation([1, 2, 3, 4, 100])).toBe(1);
    expect(() => median([])).toThrow(RangeError);
    expect(() => median([1, Number.NaN])).toThrow(RangeError);
    // 1 / Phi^-1(3/4) with Phi^-1(0.75) = 0.6744897502 (normal table, from memory).
    expectClose(MAD_TO_SIGMA, 1 / 0.6744897502, 1e-4);
  });

  it('robust fit of quantised data with a zero MAD still has a spread', () => {
    const values = [10, 10, 10, 10, 10, 10, 11, 9, 12];
    const fit = fitGaussian(values, 'robust');
    expect(medianAbsoluteDeviation(values)).toBe(0);
    // Mean absolute deviation from the median is 4/9; times sqrt(pi/2) (a Gaussian's
    // E|X - mu| = sigma sqrt(2/pi), common practice).
    expectClose(fit.sd, (4 / 9) * Math.sqrt(Math.PI / 2), 1e-14);
  });

  it('a constant history takes the resolution as its spread', () => {
    const fit = fitGaussian([7, 7, 7, 7], 'mle', 0.5);
    expect(fit.sd).toBe(0.5);
    expect(fit.sampleSd).toBe(0.5);
    expect(fitGaussian([7, 7, 7], 'mle').sd).toBe(0);
  });

  it('rejects bad input with a RangeError', () => {
    expect(() => fitGaussian([], 'mle')).toThrow(RangeError);
    expect(() => fitGaussian([1, 2], 'mle', -1)).toThrow(/resolution/);
    expect(() => fitGaussian([1, 2], 'mle', Number.NaN)).toThrow(RangeError);
    expect(() => fitGaussian([1, Number.POSITIVE_INFINITY], 'robust')).toThrow(RangeError);
  });
});
