// Shared by the branch store tests: runs of an invented build-farm scenario (compile time of a
// router service), a store pointed at the loopback Git Data stand-in, and a direct reader.
import { expect } from 'vitest';
import { createBranchStore, type BranchStoreOptions } from '../../src/history/branch-store.js';
import type { RetryTuning } from '../../src/github/retry-after.js';
import { createOctokitApi } from '../../src/github/octokit-api.js';
import { seriesFilePath } from '../../src/history/branch-path.js';
import { parseHistory } from '../../src/history/document.js';
import type { History } from '../../src/history/history.js';
import type { Run } from '../../src/inputs/run.js';
import { StoreError } from '../../src/history/store.js';
import type { GitDataStandin } from '../e2e/standins/git-data.js';

export const TOKEN = 'ghs_standin-token';

export const runOf = (value: number): Run => ({
  metrics: new Map([['build/compile', { value, unit: 's', count: 1 }]]),
  meta: new Map(),
});

/** Run `n` of the scenario: a minute apart from 2026-03-01 10:00 UTC. */
export const infoOf = (id: string, n: number) => ({
  id,
  time: new Date(Date.UTC(2026, 2, 1, 10) + n * 60_000).toISOString(),
  ref: 'refs/heads/main',
  event: 'push',
});

/** The branch store over the action's own client (octokit with its plugins), pointed at `url`. */
export function branchStore(
  url: string,
  series: string,
  over: Partial<BranchStoreOptions> = {},
  retry: Partial<RetryTuning> = {},
  token = TOKEN,
) {
  const client = createOctokitApi({
    token,
    baseUrl: url,
    owner: 'acme',
    repo: 'router',
    retry: { retries: 2, unitMs: 1, timeoutMs: 2000, ...retry },
  });
  if (!client.gitData) throw new Error('the octokit client has no Git Data calls');
  return createBranchStore({ api: client.gitData, branch: 'bellgate-data', series, unitMs: 1, ...over });
}

/** The history on the branch as the stand-in holds it (no API, no faults), or undefined. */
export function onBranch(git: GitDataStandin, series: string, branch = 'bellgate-data'): History | undefined {
  const text = git.readFile(branch, seriesFilePath(series));
  return text === undefined ? undefined : parseHistory(text, 'stand-in');
}

export const ids = (h: History | undefined): string[] => (h?.runs ?? []).map((r) => r.id);

export async function storeRejection(promise: Promise<unknown>): Promise<StoreError> {
  const error = await promise.then(
    () => undefined,
    (e: unknown) => e,
  );
  expect(error).toBeInstanceOf(StoreError);
  return error as StoreError;
}
