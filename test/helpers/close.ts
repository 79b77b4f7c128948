import { expect } from 'vitest';

/**
 * The one tolerance helper of the suite: |actual - expected| <= rel * max(|expected|, tiny) + abs.
 * Reference values come from published tables with a fixed number of digits, so each check passes
 * the tolerance the table's precision allows.
 */
export function expectClose(actual: number, expected: number, rel = 1e-9, abs = 0): void {
  const allowed = rel * Math.max(Math.abs(expected), Number.MIN_VALUE) + abs;
  const diff = Math.abs(actual - expected);
  if (!(diff <= allowed)) {
    expect.fail(`expected ${actual} to be within ${allowed} of ${expected} (off by ${diff})`);
  }
}
