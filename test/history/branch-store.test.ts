// The branch store against the loopback Git Data stand-in (test/e2e/standins/git-data.ts), whose
// rules follow the public REST reference (docs.github.com/rest/git): a non-forced ref update is
// refused with 422 "Update is not a fast forward" unless the new commit descends from the head.
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { seriesFilePath } from '../../src/history/branch-path.js';
import { emptyHistory } from '../../src/history/history.js';
import { appendRun, trimHistory } from '../../src/history/merge.js';
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

const commitOf = (sha: string | undefined) => {
  const o = sha === undefined ? undefined : git.state.objects.get(sha);
  return o?.kind === 'commit' ? o : undefined;
};

describe('createBranchStore', () => {
  it('starts empty, creates the branch as an orphan commit, and reads back what it wrote', async () => {
    const store = branchStore(git.url, 'fresh/series');
    const h = await store.load();
    expect(h.runs).toEqual([]);
    await store.save(appendRun(h, infoOf('1-1', 1), runOf(41.5)), 0);
    const head = git.state.refs.get('refs/heads/bellgate-data');
    expect(commitOf(head)?.parents).toEqual([]);
    const again = await branchStore(git.url, 'fresh/series').load();
    expect(ids(again)).toEqual(['1-1']);
    expect(again.columns.get('build/compile')).toEqual({ unit: 's', values: [41.5] });
    // The token travels only in the Authorization header of requests to the API.
    expect(git.state.calls.every((c) => c.auth === `Bearer ${TOKEN}`)).toBe(true);
  });

  it('commits on top of the head, keeping the files of other series (base_tree)', async () => {
    const a = branchStore(git.url, 'series-a');
    await a.save(appendRun(await a.load(), infoOf('1-1', 1), runOf(10)), 0);
    const headBefore = git.state.refs.get('refs/heads/bellgate-data');
    const b = branchStore(git.url, 'series-b');
    await b.save(appendRun(await b.load(), infoOf('2-1', 2), runOf(20)), 0);
    const head = git.state.refs.get('refs/heads/bellgate-data');
    expect(commitOf(head)?.parents).toEqual([headBefore]);
    expect(ids(onBranch(git, 'series-a'))).toEqual(['1-1']);
    expect(ids(onBranch(git, 'series-b'))).toEqual(['2-1']);
    expect(ids(onBranch(git, 'fresh/series'))).toEqual(['1-1']);
  });

  it('does not commit when there is nothing new to write', async () => {
    const store = branchStore(git.url, 'series-a');
    const head = git.state.refs.get('refs/heads/bellgate-data');
    const h = await store.load();
    await store.save(h, h.runs.length);
    expect(git.state.refs.get('refs/heads/bellgate-data')).toBe(head);
  });

  it("on a refused ref update re-reads and keeps both writers' runs, even one older than all of its own", async () => {
    const series = 'race';
    const first = branchStore(git.url, series);
    await first.save(appendRun(await first.load(), infoOf('5-1', 5), runOf(10)), 0);
    const a = branchStore(git.url, series);
    const b = branchStore(git.url, series);
    const ha = await a.load();
    const hb = await b.load();
    await b.save(appendRun(hb, infoOf('3-1', 3), runOf(12)), hb.runs.length); // older than 5-1
    const refusedBefore = git.state.calls.filter((c) => c.method === 'PATCH' && c.status === 422).length;
    await a.save(appendRun(ha, infoOf('7-1', 7), runOf(11)), ha.runs.length);
    expect(git.state.calls.filter((c) => c.method === 'PATCH' && c.status === 422).length).toBe(refusedBefore + 1);
    expect(ids(onBranch(git, series))).toEqual(['3-1', '5-1', '7-1']);
  });

  it("keeps a trim on purpose while keeping a concurrent writer's new run", async () => {
    const series = 'trim';
    const seed = branchStore(git.url, series);
    let h = await seed.load();
    for (let i = 1; i <= 5; i++) h = appendRun(h, infoOf(`${i}-1`, i), runOf(30 + i));
    await seed.save(h, 0);
    const a = branchStore(git.url, series);
    const b = branchStore(git.url, series);
    const ha = await a.load();
    const hb = await b.load();
    await b.save(appendRun(hb, infoOf('6-1', 6), runOf(36)), 5);
    await a.save(trimHistory(appendRun(ha, infoOf('7-1', 7), runOf(37)), 3), 5); // trims 1-1..3-1 on purpose
    expect(ids(onBranch(git, series))).toEqual(['4-1', '5-1', '6-1', '7-1']);
  });

  it('refuses to write fewer runs than it read, and leaves the branch as it was', async () => {
    const store = branchStore(git.url, 'trim');
    const h = await store.load();
    const head = git.state.refs.get('refs/heads/bellgate-data');
    const error = await storeRejection(
      store.save(appendRun(emptyHistory('trim'), infoOf('9-1', 9), runOf(1)), h.runs.length),
    );
    expect(error.message).toMatch(/would be lost/);
    // A caller that passes 0 as readCount is still held to what this store loaded.
    await storeRejection(store.save(appendRun(emptyHistory('trim'), infoOf('9-1', 9), runOf(1)), 0));
    expect(git.state.refs.get('refs/heads/bellgate-data')).toBe(head);
  });

  it('never overwrites a file that is not a readable history (load and a save without load both fail)', async () => {
    const series = 'broken';
    const path = seriesFilePath(series);
    const store = branchStore(git.url, series);
    await store.save(appendRun(await store.load(), infoOf('1-1', 1), runOf(1)), 0);
    // Corrupt the file through the API itself: a commit with a blob that is not JSON.
    const api = await import('../../src/history/branch-rest.js');
    const client = api.createGitDataClient({
      token: TOKEN,
      baseUrl: git.url,
      owner: 'acme',
      repo: 'router',
      unitMs: 1,
    });
    const head = (await client.getBranchHead('bellgate-data')) as string;
    const tree = await client.createTree(
      [{ path, mode: '100644', type: 'blob', sha: await client.createBlob('{"schema": "bellgate.history/2", "ser') }],
      await client.getCommitTree(head),
    );
    await client.updateBranch('bellgate-data', await client.createCommit('corrupt', tree, [head]));
    const broken = git.state.refs.get('refs/heads/bellgate-data');
    const loadError = await storeRejection(branchStore(git.url, series).load());
    expect(loadError.message).toMatch(/not a readable history/);
    await storeRejection(
      branchStore(git.url, series).save(appendRun(emptyHistory(series), infoOf('2-1', 2), runOf(2)), 0),
    );
    expect(git.state.refs.get('refs/heads/bellgate-data')).toBe(broken);
  });

  it("refuses to save the history of another series into this series' file", async () => {
    const store = branchStore(git.url, 'series-a');
    await storeRejection(store.save(appendRun(emptyHistory('series-b'), infoOf('1-1', 1), runOf(1)), 0));
  });

  it('says which permission is missing when writes are refused (403)', async () => {
    git.state.readOnly = true;
    try {
      const store = branchStore(git.url, 'series-a');
      const h = await store.load();
      const error = await storeRejection(store.save(appendRun(h, infoOf('3-1', 3), runOf(1)), h.runs.length));
      expect(error.fix).toMatch(/contents: write/);
    } finally {
      git.state.readOnly = false;
    }
  });

  it('gives up after the configured tries when the API keeps failing, with exact call counts', async () => {
    const proxy = await startFaultProxy({ target: git.url, rate: 1, seed: 1, kinds: ['502'] });
    try {
      const store = branchStore(proxy.url, 'series-a', { attempts: 3 }, { retries: 2 });
      const error = await storeRejection(
        store.save(appendRun(emptyHistory('series-a'), infoOf('4-1', 4), runOf(1)), 0),
      );
      expect(error.message).toMatch(/gave up after 3 tries/);
      // Each try stops at its first call (the branch head), which is tried 1 + 2 times.
      expect(proxy.requests).toBe(3 * 3);
      expect(proxy.injected.get('502')).toBe(9);
      // A load is retried the same way: 2 tries of 1 + 1 calls.
      const loadError = await storeRejection(
        branchStore(proxy.url, 'series-a', { attempts: 2 }, { retries: 1 }).load(),
      );
      expect(loadError.message).toMatch(/cannot read the data branch.*502/);
      expect(proxy.requests).toBe(9 + 2 * 2);
    } finally {
      await proxy.close();
    }
    expect(ids(onBranch(git, 'series-a'))).toEqual(['1-1']);
  });
});
