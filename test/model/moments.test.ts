import { describe, expect, it } from 'vitest';
import { expectClose } from '../helpers/close.js';
import { mean, meanAndSquares, variance } from '../../src/model/moments.js';

/**
 * NIST StRD univariate summary statistics, the NumAcc sets (structure and certified values from
 * memory of the NIST StRD dataset page): a first value, then two values alternating 500 times.
 */
function alternating(first: number, a: number, b: number): number[] {
  const values = [first];
  for (let i = 0; i < 500; i++) values.push(a, b);
  return values;
}

const numAcc = [
  // NumAcc1: 10000001, 10000003, 10000002; certified mean 10000002, sd 1.
  { name: 'NumAcc1', values: [10000001, 10000003, 10000002], mean: 10000002, sd: 1 },
  // NumAcc2: 1.2 then 1.1, 1.3 x 500 (1001 values); certified mean 1.2, sd 0.1.
  { name: 'NumAcc2', values: alternating(1.2, 1.1, 1.3), mean: 1.2, sd: 0.1 },
  // NumAcc3: 1000000.2 then 1000000.1, 1000000.3 x 500; certified mean 1000000.2, sd 0.1.
  { name: 'NumAcc3', values: alternating(1000000.2, 1000000.1, 1000000.3), mean: 1000000.2, sd: 0.1 },
];

/** A one-pass textbook formula, sqrt((sum x^2 - (sum x)^2 / n) / (n - 1)), to show what fails. */
function naiveSd(values: number[]): number {
  let sum = 0;
  let sumSq = 0;
  for (const x of values) {
    sum += x;
    sumSq += x * x;
  }
  const n = values.length;
  return Math.sqrt(Math.max(0, (sumSq - (sum * sum) / n) / (n - 1)));
}

/**
 * Exact sd of the doubles as stored: every NumAcc4 value is a multiple of 2^-29 below 2^24, so
 * x * 2^29 is an exact integer and BigInt arithmetic gives n S2 - S1^2 without rounding.
 */
function exactStoredSd(values: number[]): number {
  const scale = 2 ** 29;
  let s1 = 0n;
  let s2 = 0n;
  for (const x of values) {
    const k = BigInt(x * scale);
    s1 += k;
    s2 += k * k;
  }
  const n = BigInt(values.length);
  const numerator = Number(n * s2 - s1 * s1);
  const count = values.length;
  return Math.sqrt(numerator / (count * (count - 1))) / scale;
}

describe('meanAndSquares against NIST StRD', () => {
  for (const set of numAcc) {
    it(`${set.name}: certified mean and sd to 1e-9 relative`, () => {
      const n = set.values.length;
      // Certified values from the NIST StRD page (from memory); sd divides by n - 1.
      expectClose(mean(set.values), set.mean, 1e-12);
      expectClose(Math.sqrt(variance(set.values, 'unbiased')), set.sd, 1e-9);
      expectClose(Math.sqrt(variance(set.values, 'mle')), set.sd * Math.sqrt((n - 1) / n), 1e-9);
    });
  }

  it('NumAcc4: certified values, and exactly the sd of the stored doubles', () => {
    // NumAcc4: 10000000.2 then 10000000.1, 10000000.3 x 500; certified mean 10000000.2, sd 0.1
    // (from memory of the NIST StRD dataset page).
    const values = alternating(10000000.2, 10000000.1, 10000000.3);
    const n = values.length;
    expectClose(mean(values), 10000000.2, 1e-15);
    // The decimals are not representable: each is stored within 2^-30 (9.3e-10), which moves the
    // sd of the stored data by about 6e-9 relative. So the certified sd is checked to 1e-8, and
    // the algorithm itself against the exact sd of the stored doubles to 1e-12.
    const sd = Math.sqrt(variance(values, 'unbiased'));
    expectClose(sd, 0.1, 1e-8);
    expectClose(sd, exactStoredSd(values), 1e-12);
    expectClose(Math.sqrt(variance(values, 'mle')), 0.1 * Math.sqrt((n - 1) / n), 1e-8);
  });

  it('a naive one-pass sum of squares loses NumAcc4 (so the checks above can fail)', () => {
    const values = alternating(10000000.2, 10000000.1, 10000000.3);
    // Certified sd 0.1 (NIST StRD, from memory); the naive formula misses it by far more than 1%.
    expect(Math.abs(naiveSd(values) - 0.1) / 0.1).toBeGreaterThan(0.01);
  });
});

describe('meanAndSquares on small worked cases', () => {
  it('sum of squared deviations of 1..4 is 5 (arithmetic: 2.25 + 0.25 + 0.25 + 2.25)', () => {
    const { n, mean: m, squares } = meanAndSquares([1, 2, 3, 4]);
    expect(n).toBe(4);
    expectClose(m, 2.5, 1e-15);
    expectClose(squares, 5, 1e-15);
  });

  it('rejects empty and non-finite input with a RangeError', () => {
    expect(() => meanAndSquares([])).toThrow(RangeError);
    expect(() => meanAndSquares([1, Number.NaN])).toThrow(/position 2/);
    expect(() => meanAndSquares([Infinity])).toThrow(RangeError);
    expect(() => variance([1], 'unbiased')).toThrow(RangeError);
  });
});
