// The Git Data client against the loopback stand-in, with the fault proxy in front for the failure
// modes. Status meanings follow the public REST reference (docs.github.com/rest: 404 for a missing
// ref, 422 for a refused ref update, 429 + Retry-After for rate limits).
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { GitDataError } from '../../src/history/branch-api.js';
import { backoffMs } from '../../src/history/branch-backoff.js';
import { createGitDataClient } from '../../src/history/branch-rest.js';
import { startFaultProxy, type FaultKind } from '../e2e/standins/fault-proxy.js';
import { startGitDataStandin, type GitDataStandin } from '../e2e/standins/git-data.js';
import { seededUniform as seededRandom } from '../model/random.js';
import { TOKEN } from './branch-helpers.js';

let git: GitDataStandin;
beforeAll(async () => {
  git = await startGitDataStandin();
});
afterAll(async () => {
  await git.close();
});

const client = (url: string, retries = 2, timeoutMs = 2000) =>
  createGitDataClient({ token: TOKEN, baseUrl: url, owner: 'acme', repo: 'router', retries, unitMs: 1, timeoutMs });

async function failure(promise: Promise<unknown>): Promise<GitDataError> {
  const e = await promise.then(
    () => undefined,
    (x: unknown) => x,
  );
  expect(e).toBeInstanceOf(GitDataError);
  return e as GitDataError;
}

describe('backoffMs', () => {
  // "Exponential backoff with jitter" (common practice): unit x 2^attempt x (0.5 + u), capped.
  it('doubles per attempt, spreads by the jitter, caps at 60 units, and obeys Retry-After', () => {
    expect(backoffMs(0, 10, () => 0.5)).toBe(10);
    expect(backoffMs(3, 10, () => 0)).toBe(40);
    expect(backoffMs(3, 10, () => 0.999)).toBeCloseTo(119.92, 10);
    expect(backoffMs(30, 10, () => 0.5)).toBe(600);
    expect(backoffMs(0, 10, () => 0.5, 2)).toBe(20);
    expect(backoffMs(0, 10, () => 0.5, 3600)).toBe(600);
  });
});

describe('createGitDataClient', () => {
  it('reads a missing branch as undefined and a refused ref update as a conflict', async () => {
    const api = client(git.url);
    expect(await api.getBranchHead('nope')).toBeUndefined();
    const tree = await api.createTree([
      { path: 'bellgate/x.json', mode: '100644', type: 'blob', sha: await api.createBlob('{}') },
    ]);
    const root = await api.createCommit('one', tree, []);
    await api.createBranch('data', root);
    expect(await api.getBranchHead('data')).toBe(root);
    expect((await failure(api.createBranch('data', root))).conflict).toBe(true);
    const sibling = await api.createCommit('two', tree, []); // not a descendant of root
    const refused = await failure(api.updateBranch('data', sibling));
    expect(refused).toMatchObject({ status: 422, conflict: true, transient: false });
    expect(refused.message).toMatch(/not a fast forward/);
    const child = await api.createCommit('three', tree, [root]);
    await api.updateBranch('data', child);
    expect(await api.findFile('bellgate/x.json', child)).toMatchObject({ size: 2 });
    expect(await api.findFile('bellgate/y.json', child)).toBeUndefined();
    expect(await api.getBlobText((await api.findFile('bellgate/x.json', child))?.sha ?? '')).toBe('{}');
  });

  it.each([
    ['500', /answered 500/],
    ['502', /answered 502/],
    ['429', /answered 429/],
    ['drop-before', /branch|fetch|socket|other side|terminated/i],
    ['truncate', /cut short|terminated|closed|fetch failed/i],
    ['slow', /no answer within 200 ms/],
  ] as [FaultKind, RegExp][])(
    'retries %s a bounded number of times, then reports it as transient',
    async (kind, message) => {
      const proxy = await startFaultProxy({
        target: git.url,
        rate: 1,
        seed: 3,
        kinds: [kind],
        slowMs: 1500,
        retryAfter: 0,
      });
      try {
        // Only the slow case may time out; the others get a generous timeout so a busy machine
        // cannot turn their answer into a timeout.
        const e = await failure(client(proxy.url, 2, kind === 'slow' ? 200 : 10_000).getBranchHead('data'));
        expect(e.transient).toBe(true);
        expect(e.message).toMatch(message);
        expect(proxy.requests).toBe(3);
      } finally {
        await proxy.close();
      }
    },
  );

  it('gets through when half of all calls fail, with enough retries, and returns the right answers', async () => {
    const proxy = await startFaultProxy({ target: git.url, rate: 0.5, seed: 11, slowMs: 1000, retryAfter: 0 });
    const api = createGitDataClient({
      token: TOKEN,
      baseUrl: proxy.url,
      owner: 'acme',
      repo: 'router',
      retries: 12,
      unitMs: 1,
      timeoutMs: 250,
      random: seededRandom(5),
    });
    try {
      for (let i = 0; i < 10; i++) {
        const text = `{"n":${i}}`;
        const sha = await api.createBlob(text);
        expect(await api.getBlobText(sha)).toBe(text);
      }
      expect(proxy.totalInjected()).toBeGreaterThan(5);
    } finally {
      await proxy.close();
    }
  });
});
