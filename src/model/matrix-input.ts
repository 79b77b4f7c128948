import { InputError } from '../errors/input-error.js';

/**
 * Checks a table of runs x metrics: at least `minRows` rows, all of one length >= 1, all finite.
 * Returns the number of columns. Throws InputError naming the row and column of the problem.
 * @example checkRows([[1, 2], [3, 4]], 2) // 2
 */
export function checkRows(rows: readonly (readonly number[])[], minRows: number): number {
  if (rows.length < minRows) {
    throw new InputError(`need at least ${minRows} runs, got ${rows.length}`);
  }
  const p = rows[0]?.length ?? 0;
  if (p === 0) throw new InputError('each run needs at least one value');
  rows.forEach((row, r) => {
    if (row.length !== p) {
      throw new InputError(`run ${r + 1} has ${row.length} values, the first run has ${p}`, {
        fix: 'give every run a value for every metric (drop runs or metrics with gaps first)',
      });
    }
    row.forEach((x, c) => {
      if (!Number.isFinite(x)) {
        throw new InputError(`value ${x} of run ${r + 1}, column ${c + 1} is not a finite number`);
      }
    });
  });
  return p;
}
