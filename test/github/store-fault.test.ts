// How the action reads a store's failure: configuration faults (fail the step) against outages
// (warn, per history-failure), with the fix in the action's own words. The messages are the
// stores' own (src/history), the statuses GitHub's (401/403 for a token that may not).
import { describe, expect, it } from 'vitest';
import { StoreError } from '../../src/history/store.js';
import { classifyStoreError } from '../../src/github/store-fault.js';

const at = { history: 'h.json', step: 'load' as const };

describe('classifyStoreError', () => {
  it('another series: a configuration fault whose fix is the `series` input, never a CLI flag', () => {
    const e = new StoreError('the file holds the history of series "bench-macos", not "bench-linux"', {
      fix: 'use one file per series, or pass --series "bench-macos"',
    });
    const p = classifyStoreError(e, { ...at, store: 'file' });
    expect(p).toMatchObject({ fault: 'configuration', kind: 'other-series' });
    expect(p.fix).toBe(
      'set `series: "bench-macos"` in the step\'s `with:` to extend that history, or give this series its own `history`',
    );
  });

  it('a refused artifact listing (403) is a missing `actions: read`; a 503 is an outage', () => {
    const denied = new StoreError('cannot list the history artifacts "x": Resource not accessible by integration', {
      cause: Object.assign(new Error('forbidden'), { status: 403 }),
    });
    expect(classifyStoreError(denied, { ...at, store: 'artifact' })).toMatchObject({
      fault: 'configuration',
      fix: 'give the job `permissions: actions: read` (listing and downloading the history artifacts)',
    });
    const down = new StoreError('cannot list the history artifacts "x": Service Unavailable', {
      cause: Object.assign(new Error('unavailable'), { status: 503 }),
      fix: 'give the job `permissions: actions: read` and check that the token reaches the API',
    });
    const p = classifyStoreError(down, { ...at, store: 'artifact' });
    expect(p.fault).toBe('outage');
    expect(p.fix).not.toMatch(/permissions/);
  });

  it('a data branch write refused is a missing `contents: write` for the recording job', () => {
    const e = new StoreError('cannot write to the data branch: POST /git/blobs answered 403', {
      cause: Object.assign(new Error('403'), { status: 403 }),
    });
    expect(classifyStoreError(e, { history: 'bellgate-data', step: 'save', store: 'branch' }).fix).toMatch(
      /`permissions: contents: write`/,
    );
  });

  it("a store's own kind wins over the message", () => {
    const e = new StoreError('odd words', { kind: 'not-a-history' });
    expect(classifyStoreError(e, { ...at, store: 'file' })).toMatchObject({
      fault: 'configuration',
      kind: 'not-a-history',
    });
    expect(
      classifyStoreError(new StoreError('odd words', { kind: 'unreachable' }), { ...at, store: 'file' }).fault,
    ).toBe('outage');
  });
});
