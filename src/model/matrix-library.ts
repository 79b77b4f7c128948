import type * as MlMatrix from 'ml-matrix';

let library: typeof MlMatrix | undefined;

/**
 * Loads ml-matrix, once. Only the joint check of metric groups needs it, so the gate's callers
 * await this when the config names groups (prepareGate in gate.ts) and never otherwise: a check
 * without groups does not even fetch its chunk (98 KB; it used to be loaded, and compiled, by
 * every run, 5-10 ms of a PR check).
 * @example await loadMatrixLibrary(); matrixLibrary().Matrix.eye(2).get(0, 0) // 1
 */
export async function loadMatrixLibrary(): Promise<void> {
  library ??= await import('ml-matrix');
}

/**
 * ml-matrix, once loadMatrixLibrary has run. Synchronous, so shrunkCovariance and the Mahalanobis
 * functions stay synchronous.
 * @throws Error when it was not loaded first (a caller's mistake, not a user's).
 */
export function matrixLibrary(): typeof MlMatrix {
  if (library === undefined)
    throw new Error('ml-matrix is not loaded: await loadMatrixLibrary() (or prepareGate) first');
  return library;
}
