import { checkRows } from './matrix-input.js';
import { matrixLibrary } from './matrix-library.js';

/** A covariance estimate shrunk toward its diagonal. */
export interface ShrunkCovariance {
  mean: number[];
  covariance: number[][];
  /** The intensity lambda in [0, 1]: 0 keeps the sample covariance, 1 keeps only the variances. */
  shrinkage: number;
}

/**
 * Covariance of runs x metrics that stays well conditioned when runs are few for the number of
 * metrics: S* = lambda D + (1 - lambda) S, with S the sample covariance dividing by n and D its
 * diagonal (variances kept, covariances zeroed). The intensity is the Ledoit-Wolf optimum
 * (Ledoit & Wolf 2004, "A well-conditioned estimator for large-dimensional covariance matrices")
 * for the diagonal target ("target D" of Schäfer & Strimmer 2005):
 *   lambda = sum_{i != j} Var(s_ij) / sum_{i != j} s_ij^2,  clipped to [0, 1],
 *   Var(s_ij) = (1/n^2) sum_k (w_kij - s_ij)^2,  w_kij = (x_ki - mean_i)(x_kj - mean_j).
 * (Schäfer & Strimmer write the same with the n-1 covariance: n/(n-1)^3 sum_k (w_kij - w̄_ij)^2;
 * the two agree as n grows.) With one metric, or no off-diagonal covariance at all, there is
 * nothing to shrink and lambda is 0. O(n p^2). Throws InputError on fewer than 2 runs, ragged
 * rows or non-finite values.
 *
 * @example shrunkCovariance([[1, 2], [2, 4], [3, 6], [4, 7]]).shrinkage // between 0 and 1
 */
export function shrunkCovariance(rows: readonly (readonly number[])[]): ShrunkCovariance {
  const p = checkRows(rows, 2);
  const n = rows.length;
  const { Matrix } = matrixLibrary();
  const x = new Matrix(rows.map((row) => [...row]));
  const mean = x.mean('column');
  // Centring first keeps large offsets (timings around 1e9 ns) from swamping the products.
  x.subRowVector(mean);
  const sample = x.transpose().mmul(x).div(n);
  // sum_k w_kij^2 = sum_k x_ki^2 x_kj^2, so sum_k (w_kij - s_ij)^2 = that - n s_ij^2.
  const squared = x.clone().mul(x);
  const fourth = squared.transpose().mmul(squared);
  let varianceSum = 0;
  let offSquares = 0;
  for (let i = 0; i < p; i++) {
    for (let j = 0; j < p; j++) {
      if (i === j) continue;
      const s = sample.get(i, j);
      varianceSum += Math.max(0, fourth.get(i, j) - n * s * s) / (n * n);
      offSquares += s * s;
    }
  }
  const shrinkage = offSquares > 0 ? Math.min(1, Math.max(0, varianceSum / offSquares)) : 0;
  const covariance = sample.to2DArray().map((row, i) => row.map((s, j) => (i === j ? s : (1 - shrinkage) * s)));
  return { mean, covariance, shrinkage };
}
