import type * as MlMatrix from 'ml-matrix';

let library: typeof MlMatrix | undefined;

/**
 * ml-matrix, loaded on first use: only the joint check of metric groups needs it, and loading it
 * costs a `check` without groups several milliseconds at start-up. A synchronous require (the
 * bundler turns it into a lazy module load) keeps shrunkCovariance and the Mahalanobis functions
 * synchronous.
 * @example matrixLibrary().Matrix.eye(2).get(0, 0) // 1
 */
export function matrixLibrary(): typeof MlMatrix {
  library ??= require('ml-matrix') as typeof MlMatrix;
  return library;
}
