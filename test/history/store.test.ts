import { describe, expect, it } from 'vitest';
import { trimSlack, StoreError } from '../../src/history/store.js';

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

describe('trimSlack', () => {
  it('lets an append-only history grow a tenth past keep (at least one run) before one rewrite trims it', () => {
    expect([1, 9, 10, 11, 500, 4000].map(trimSlack)).toEqual([1, 1, 1, 2, 50, 400]);
    expect(trimSlack(Infinity)).toBe(0);
  });
});
