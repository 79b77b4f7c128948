import { describe, expect, it } from 'vitest';
import type { History } from '../../src/history/history.js';
import { guardAgainstLoss, StoreError } from '../../src/history/store.js';

const history = (runs: number, trimmed?: number): History => ({
  series: 's',
  runs: Array.from({ length: runs }, (_, i) => ({ id: String(i) })),
  columns: new Map(),
  ...(trimmed === undefined ? {} : { trimmed }),
});

describe('StoreError', () => {
  it('carries the store, the reason and the fix', () => {
    const e = new StoreError('the artifact list failed', {
      where: 'artifact bellgate-history',
      fix: 'grant actions: read',
    });
    expect(e.name).toBe('StoreError');
    expect(e.store).toBe('artifact bellgate-history');
    expect(e.reason).toBe('the artifact list failed');
    expect(e.describe()).toBe('artifact bellgate-history: the artifact list failed\n  fix: grant actions: read');
    expect(e).toBeInstanceOf(Error);
  });
});

describe('guardAgainstLoss', () => {
  it('allows growth and equal size, refuses a shrink unless trimming explains it', () => {
    expect(() => guardAgainstLoss('file h', history(5), 5)).not.toThrow();
    expect(() => guardAgainstLoss('file h', history(6), 5)).not.toThrow();
    expect(() => guardAgainstLoss('file h', history(3), 5)).toThrow(/2 runs would be lost/);
    expect(() => guardAgainstLoss('file h', history(3, 2), 5)).not.toThrow();
    expect(() => guardAgainstLoss('file h', history(3, 1), 5)).toThrow(StoreError);
  });

  it('refuses a readCount that is not a count', () => {
    for (const n of [-1, 1.5, NaN]) expect(() => guardAgainstLoss('file h', history(1), n)).toThrow(StoreError);
  });
});
