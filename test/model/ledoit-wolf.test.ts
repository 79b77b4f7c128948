import { beforeAll, describe, expect, it } from 'vitest';
import { expectClose } from '../helpers/close.js';
import { seededNormal } from './random.js';
import { InputError } from '../../src/errors/input-error.js';
import { shrunkCovariance } from '../../src/model/ledoit-wolf.js';
import { loadMatrixLibrary } from '../../src/model/matrix-library.js';

// Groups' joint check needs ml-matrix, which the gate's callers load first (prepareGate).
beforeAll(loadMatrixLibrary);

/**
 * An independent plain computation (no ml-matrix) from the formulas of Schäfer & Strimmer (2005),
 * "A shrinkage approach to large-scale covariance matrix estimation", target D: with the n-1
 * covariance s_ij and w_kij = (x_ki - mean_i)(x_kj - mean_j),
 *   Var(s_ij) = n / (n-1)^3 sum_k (w_kij - wbar_ij)^2,  lambda = sum_{i!=j} Var(s_ij) / sum_{i!=j} s_ij^2.
 * With the 1/n covariance of Ledoit & Wolf (2004) the same intensity is lambda_SS (n - 1) / n,
 * since s_ij scales by (n-1)/n and Var(s_ij) by (n-1)^2/n^2 relative to the n / (n-1)^3 form.
 */
function plainShrinkage(rows: number[][]): { mean: number[]; sample: number[][]; lambdaSS: number } {
  const n = rows.length;
  const p = rows[0]!.length;
  const mean = Array.from({ length: p }, (_, i) => rows.reduce((s, r) => s + r[i]!, 0) / n);
  const sample: number[][] = [];
  let numerator = 0;
  let denominator = 0;
  for (let i = 0; i < p; i++) {
    sample.push([]);
    for (let j = 0; j < p; j++) {
      const w = rows.map((r) => (r[i]! - mean[i]!) * (r[j]! - mean[j]!));
      const wbar = w.reduce((s, v) => s + v, 0) / n;
      sample[i]!.push(wbar);
      if (i === j) continue;
      const sUnbiased = (wbar * n) / (n - 1);
      numerator += (n / (n - 1) ** 3) * w.reduce((s, v) => s + (v - wbar) ** 2, 0);
      denominator += sUnbiased ** 2;
    }
  }
  return { mean, sample, lambdaSS: numerator / denominator };
}

/** Runs x metrics with a shared factor (like a runner's speed) plus independent noise. */
function correlatedRows(n: number, p: number, shared: number, seed: number): number[][] {
  const normal = seededNormal(seed);
  return Array.from({ length: n }, () => {
    const common = normal();
    return Array.from({ length: p }, (_, i) => 100 * (i + 1) + shared * common + normal());
  });
}

describe('shrunkCovariance', () => {
  it('matches the plain Schäfer-Strimmer computation on several data sets', () => {
    for (const [n, p, shared, seed] of [
      [12, 5, 0.3, 1],
      [30, 8, 1, 2],
      [8, 10, 0, 3],
      [60, 4, 2, 4],
    ] as const) {
      const rows = correlatedRows(n, p, shared, seed);
      const { mean, sample, lambdaSS } = plainShrinkage(rows);
      const result = shrunkCovariance(rows);
      const lambda = Math.min(1, Math.max(0, (lambdaSS * (n - 1)) / n));
      expectClose(result.shrinkage, lambda, 1e-9);
      mean.forEach((m, i) => expectClose(result.mean[i]!, m, 1e-14));
      for (let i = 0; i < p; i++) {
        for (let j = 0; j < p; j++) {
          const expected = i === j ? sample[i]![j]! : (1 - lambda) * sample[i]![j]!;
          expectClose(result.covariance[i]![j]!, expected, 1e-9, 1e-12);
        }
      }
    }
  });

  it('shrinks hard for independent metrics with few runs, little for strong correlation with many', () => {
    // The point of the method (Ledoit & Wolf 2004): the intensity falls as evidence for the
    // off-diagonal structure grows.
    const independent = shrunkCovariance(correlatedRows(10, 20, 0, 5)).shrinkage;
    const correlated = shrunkCovariance(correlatedRows(200, 5, 3, 6)).shrinkage;
    expect(independent).toBeGreaterThan(0.5);
    expect(correlated).toBeLessThan(0.05);
  });

  it('keeps precision with a large offset (timings around 1e9)', () => {
    const rows = correlatedRows(20, 3, 1, 7);
    const shifted = rows.map((r) => r.map((x) => x + 1e9));
    const a = shrunkCovariance(rows);
    const b = shrunkCovariance(shifted);
    expectClose(b.shrinkage, a.shrinkage, 1e-5);
    expectClose(b.covariance[0]![1]!, a.covariance[0]![1]!, 1e-5, 1e-6);
  });

  it('one metric: nothing to shrink', () => {
    const result = shrunkCovariance([[1], [2], [3], [4]]);
    expect(result.shrinkage).toBe(0);
    expectClose(result.covariance[0]![0]!, 1.25, 1e-15);
  });

  it('rejects ragged rows, non-finite values and too few runs with an InputError', () => {
    expect(() => shrunkCovariance([[1, 2], [3]])).toThrow(/run 2/);
    expect(() =>
      shrunkCovariance([
        [1, 2],
        [3, Number.NaN],
      ]),
    ).toThrow(InputError);
    expect(() => shrunkCovariance([[1, 2]])).toThrow(InputError);
    expect(() => shrunkCovariance([[], []])).toThrow(InputError);
  });
});
