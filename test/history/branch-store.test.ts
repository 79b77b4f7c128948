// The branch store over the action's octokit client, against the loopback Git Data stand-in
// (test/e2e/standins/git-data.ts), whose rules follow the public REST reference
// (docs.github.com/rest/git, "Merge a branch", "Rate limits for the REST API").
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { createOctokitApi } from '../../src/github/octokit-api.js';
import type { GitDataApi } from '../../src/history/branch-api.js';
import { seriesFilePath } from '../../src/history/branch-path.js';
import { createBranchStore } from '../../src/history/branch-store.js';
import type { HistoryChange } from '../../src/history/changes.js';
import { startGitDataStandin, type GitDataStandin } from '../e2e/standins/git-data.js';
import { startFaultProxy } from '../e2e/standins/fault-proxy.js';
import { branchStore, ids, infoOf, onBranch, runOf, storeRejection, TOKEN } from './branch-helpers.js';

let git: GitDataStandin;
beforeAll(async () => {
  git = await startGitDataStandin();
});
afterAll(async () => {
  await git.close();
});

const head = () => git.state.refs.get('refs/heads/bellgate-data');
const commitOf = (sha: string | undefined) => {
  const o = sha === undefined ? undefined : git.state.objects.get(sha);
  return o?.kind === 'commit' ? o : undefined;
};
const record = (id: string, n: number, value = 40 + n, keep = 1000): HistoryChange => ({
  kind: 'record',
  info: infoOf(id, n),
  run: runOf(value),
  keep,
});
const count = (method: string, path: string, status?: number) =>
  git.state.calls.filter(
    (c) => c.method === method && c.path.endsWith(path) && (status === undefined || c.status === status),
  ).length;

/** The client's Git Data calls, with merges held back until `n` writers have reached theirs. */
function heldMerges(n: number): GitDataApi {
  const api = createOctokitApi({
    token: TOKEN,
    baseUrl: git.url,
    owner: 'acme',
    repo: 'router',
    retry: { retries: 2, unitMs: 1 },
  }).gitData as GitDataApi;
  let waiting = 0;
  let release: () => void = () => undefined;
  const all = new Promise<void>((r) => (release = r));
  return {
    ...api,
    async mergeIntoBranch(branch, sha, message) {
      waiting += 1;
      if (waiting === n) release();
      await Promise.race([all, new Promise((r) => setTimeout(r, 2000))]);
      return api.mergeIntoBranch(branch, sha, message);
    },
  };
}

describe('createBranchStore', () => {
  it('starts empty, creates the branch as an orphan commit holding the series file, and reads back what it wrote', async () => {
    const store = branchStore(git.url, 'fresh/series');
    expect((await store.read()).runs).toEqual([]);
    expect(await store.update(record('1-1', 1, 41.5))).toEqual({ runs: 1, wrote: 'rewritten' });
    expect(commitOf(head())?.parents).toEqual([]);
    const again = await branchStore(git.url, 'fresh/series').read();
    expect(ids(again)).toEqual(['1-1']);
    expect(again.columns.get('build/compile')).toEqual({ unit: 's', values: [41.5] });
    expect(git.readFile('bellgate-data', seriesFilePath('fresh/series'))?.split('\n')[0]).toMatch(
      /"schema":"bellgate\.history\/3"/,
    );
    // The token travels only in the Authorization header of requests to the API.
    expect(git.state.calls.every((c) => c.auth === `token ${TOKEN}`)).toBe(true);
  });

  it('writes with three content-creating requests: a tree with the text inline, a commit, a merge; other series stay', async () => {
    const a = branchStore(git.url, 'series-a');
    await a.update(record('1-1', 1, 10));
    const before = git.state.calls.length;
    const headBefore = head();
    await branchStore(git.url, 'series-b').update(record('2-1', 2, 20));
    const writes = git.state.calls.slice(before).filter((c) => c.method !== 'GET');
    expect(writes.map((c) => `${c.method} ${c.path.replace(/^\/repos\/acme\/router/, '')} ${c.status}`)).toEqual([
      'POST /git/trees 201',
      'POST /git/commits 201',
      'POST /merges 201',
    ]);
    expect(commitOf(head())?.parents[0]).toBe(headBefore);
    expect(ids(onBranch(git, 'series-a'))).toEqual(['1-1']);
    expect(ids(onBranch(git, 'series-b'))).toEqual(['2-1']);
    expect(ids(onBranch(git, 'fresh/series'))).toEqual(['1-1']);
  });

  it('does not commit when the change leaves the file as it is', async () => {
    const store = branchStore(git.url, 'series-a');
    const before = head();
    await store.update({ kind: 'merge', history: await store.read() });
    expect(head()).toBe(before);
  });

  it('writers of different series racing on one branch: no conflict, every run kept', async () => {
    const api = heldMerges(4);
    await Promise.all(
      ['r1', 'r2', 'r3', 'r4'].map((s, i) =>
        createBranchStore({ api, branch: 'bellgate-data', series: `race/${s}`, unitMs: 1 }).update(
          record(`${10 + i}-1`, i),
        ),
      ),
    );
    for (const [i, s] of ['r1', 'r2', 'r3', 'r4'].entries())
      expect(ids(onBranch(git, `race/${s}`))).toEqual([`${10 + i}-1`]);
    expect(count('POST', '/merges', 409)).toBe(0);
  });

  it('two writers of one series racing: the merge conflicts (409), the later re-reads, both runs are kept, older one included', async () => {
    await branchStore(git.url, 'same').update(record('5-1', 5));
    const conflictsBefore = count('POST', '/merges', 409);
    const api = heldMerges(2);
    await Promise.all([
      createBranchStore({ api, branch: 'bellgate-data', series: 'same', unitMs: 1 }).update(record('7-1', 7)),
      createBranchStore({ api, branch: 'bellgate-data', series: 'same', unitMs: 1 }).update(record('3-1', 3)),
    ]);
    // once: the client does not retry a 409 itself, the store re-reads and writes again
    expect(count('POST', '/merges', 409)).toBe(conflictsBefore + 1);
    expect(ids(onBranch(git, 'same'))).toEqual(['3-1', '5-1', '7-1']);
  });

  it('trims to keep on the branch, and a drop keeps its tombstone there', async () => {
    const store = branchStore(git.url, 'trim');
    for (let i = 1; i <= 5; i++) await store.update(record(`${i}-1`, i, 30 + i, 3));
    expect(ids(onBranch(git, 'trim'))).toEqual(['3-1', '4-1', '5-1']);
    await store.update({ kind: 'drop', tombstone: { id: '4-1', reason: 'noisy runner' } });
    expect(ids(onBranch(git, 'trim'))).toEqual(['3-1', '5-1']);
    expect(onBranch(git, 'trim')?.dropped?.get('4-1')?.reason).toBe('noisy runner');
  });

  it('never writes over a file that is not a readable history', async () => {
    const series = 'broken';
    const path = seriesFilePath(series);
    await branchStore(git.url, series).update(record('1-1', 1));
    // Corrupt the file through the API itself: a commit whose file is not a history.
    const api = createOctokitApi({ token: TOKEN, baseUrl: git.url, owner: 'acme', repo: 'router' })
      .gitData as GitDataApi;
    const current = (await api.getBranchHead('bellgate-data')) as string;
    const tree = await api.createTree(
      [{ path, text: '{"schema": "bellgate.history/3", "ser' }],
      await api.getCommitTree(current),
    );
    await api.mergeIntoBranch('bellgate-data', await api.createCommit('corrupt', tree, [current]), 'corrupt');
    const broken = head();
    const readError = await storeRejection(branchStore(git.url, series).read());
    expect(readError.message).toMatch(/not a readable history/);
    await storeRejection(branchStore(git.url, series).update(record('2-1', 2)));
    expect(head()).toBe(broken);
  });

  it('says which permission is missing when writes are refused (403)', async () => {
    git.state.readOnly = true;
    try {
      const error = await storeRejection(branchStore(git.url, 'series-a').update(record('3-1', 3)));
      expect(error.fix).toMatch(/contents: write/);
    } finally {
      git.state.readOnly = false;
    }
  });

  it('a ruleset or branch protection that refuses the merge (422) fails at once, saying how to exempt the branch', async () => {
    git.state.rulesetOn = 'bellgate-data';
    const merges = count('POST', '/merges');
    try {
      const error = await storeRejection(branchStore(git.url, 'series-a').update(record('4-1', 4)));
      expect(error.message).toMatch(/Repository rule violations found/);
      expect(error.fix).toMatch(/exempt the data branch bellgate-data from the branch protection rule or ruleset/);
      expect(count('POST', '/merges')).toBe(merges + 1); // tried once, not retried as a conflict
    } finally {
      git.state.rulesetOn = undefined;
    }
  });

  it('a secondary rate limit (403 with retry-after) is waited out as GitHub documents, and the run is recorded', async () => {
    git.state.writeLimit = { perMinute: 2, minuteMs: 200, secondMs: 10 };
    git.state.writes = [];
    const limitedBefore = git.state.limited;
    try {
      // unitMs 10: a retry-after of N seconds waits N x 10 ms, the stand-in's scaled second
      const store = branchStore(git.url, 'limited', { unitMs: 10 }, { unitMs: 10 });
      await store.update(record('1-1', 1));
      await store.update(record('2-1', 2));
      expect(git.state.limited).toBeGreaterThan(limitedBefore);
      expect(git.state.early).toBe(0);
      expect(ids(onBranch(git, 'limited'))).toEqual(['1-1', '2-1']);
    } finally {
      git.state.writeLimit = undefined;
    }
  });

  it('gives up after the configured tries when the API keeps failing, with exact call counts', async () => {
    const proxy = await startFaultProxy({ target: git.url, rate: 1, seed: 1, kinds: ['502'] });
    try {
      const store = branchStore(proxy.url, 'series-a', { attempts: 3 }, { retries: 2 });
      const error = await storeRejection(store.update(record('4-1', 4)));
      expect(error.message).toMatch(/gave up after 3 tries/);
      // Each try stops at its first call (the branch head), which octokit tries 1 + 2 times.
      expect(proxy.requests).toBe(3 * 3);
      expect(proxy.injected.get('502')).toBe(9);
      // A read is retried the same way: 2 tries of 1 + 1 calls.
      const readError = await storeRejection(
        branchStore(proxy.url, 'series-a', { attempts: 2 }, { retries: 1 }).read(),
      );
      expect(readError.message).toMatch(/gave up after 2 tries.*502/);
      expect(proxy.requests).toBe(9 + 2 * 2);
    } finally {
      await proxy.close();
    }
    expect(ids(onBranch(git, 'series-a'))).toEqual(['1-1']);
  });
});
