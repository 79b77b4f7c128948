import { InputError } from '../errors/input-error.js';
import { matrixLibrary } from './matrix-library.js';

/**
 * Ridges tried, relative to the mean variance, when the covariance is not positive definite
 * (a metric that never varied, or two metrics that always move together). 1e-10 leaves any
 * well-conditioned matrix untouched in practice; 1e-6 is the most we add before giving up.
 */
const RELATIVE_RIDGES = [0, 1e-10, 1e-8, 1e-6];

/** Solves covariance * y = d by Cholesky, adding the smallest ridge that makes it factor. */
function solveCovariance(d: number[], covariance: readonly (readonly number[])[]): number[] {
  const p = d.length;
  if (covariance.length !== p || covariance.some((row) => row.length !== p)) {
    throw new InputError(`the covariance must be ${p} x ${p} to match ${p} values`);
  }
  if (covariance.some((row) => row.some((v) => !Number.isFinite(v)))) {
    throw new InputError('the covariance holds a value that is not a finite number');
  }
  let trace = 0;
  for (let i = 0; i < p; i++) trace += covariance[i]![i]!;
  if (!(trace > 0)) {
    throw new InputError('the covariance has no positive variance', {
      fix: 'give the metrics a resolution, or leave constant metrics out of the joint check',
    });
  }
  const { CholeskyDecomposition, Matrix } = matrixLibrary();
  for (const relative of RELATIVE_RIDGES) {
    const ridge = (relative * trace) / p;
    const matrix = new Matrix(covariance.map((row, i) => row.map((v, j) => (i === j ? v + ridge : v))));
    const cholesky = new CholeskyDecomposition(matrix);
    if (cholesky.isPositiveDefinite()) return cholesky.solve(Matrix.columnVector(d)).getColumn(0);
  }
  throw new InputError('the covariance is not positive definite, even with a small ridge', {
    fix: 'drop metrics that are copies or linear combinations of others, or use more runs',
  });
}

function difference(x: readonly number[], mean: readonly number[]): number[] {
  if (x.length !== mean.length || x.length === 0) {
    throw new InputError(`the point has ${x.length} values, the mean has ${mean.length}`);
  }
  return x.map((v, i) => {
    const d = v - mean[i]!;
    if (!Number.isFinite(d)) throw new InputError(`value ${v} at position ${i + 1} is not a finite number`);
    return d;
  });
}

/**
 * Squared Mahalanobis distance d^2 = (x - mean)' S^-1 (x - mean): how far a run lies from the
 * baseline in units of its covariance S (whatever divisor S was computed with; see hotellingTail).
 * Solved by Cholesky, not by an explicit inverse. A near-singular S gets the smallest ridge
 * (1e-10, 1e-8 or 1e-6 of the mean variance) that lets it factor; beyond that, InputError.
 * O(p^3). Throws InputError on mismatched sizes, non-finite values or a hopeless covariance.
 *
 * @example mahalanobisSquared([1, 1], [0, 0], [[1, 0], [0, 4]]) // 1.25
 */
export function mahalanobisSquared(
  x: readonly number[],
  mean: readonly number[],
  covariance: readonly (readonly number[])[],
): number {
  return mahalanobisContributions(x, mean, covariance).reduce((sum, c) => sum + c, 0);
}

/**
 * Each coordinate's share of d^2: c_i = d_i (S^-1 d)_i with d = x - mean, so sum c_i = d^2.
 * Shows which metrics drive a joint alarm. A share can be negative: with correlated metrics, a
 * coordinate that moved "as expected" given the others reduces the distance.
 *
 * @example mahalanobisContributions([1, 1], [0, 0], [[1, 0], [0, 4]]) // [1, 0.25]
 */
export function mahalanobisContributions(
  x: readonly number[],
  mean: readonly number[],
  covariance: readonly (readonly number[])[],
): number[] {
  const d = difference(x, mean);
  const y = solveCovariance(d, covariance);
  return d.map((di, i) => di * y[i]!);
}
