// Five writers append to one series at once through the loopback Git Data stand-in, which refuses
// every ref update that is not a fast forward (docs.github.com/rest/git/refs, "Update a
// reference" with force false). Union by run id must keep every run exactly once.
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { appendRun } from '../../src/history/merge.js';
import { startGitDataStandin, type GitDataStandin } from '../e2e/standins/git-data.js';
import { seededUniform as seededRandom } from '../model/random.js';
import { branchStore, ids, infoOf, onBranch, runOf } from './branch-helpers.js';

const WRITERS = 5;
const APPENDS = 40;

let git: GitDataStandin;
beforeAll(async () => {
  git = await startGitDataStandin();
});
afterAll(async () => {
  await git.close();
});

describe('branch store under concurrent writers', () => {
  it(`${WRITERS} writers x ${APPENDS} appends in parallel: ${WRITERS * APPENDS} runs, none lost, none twice`, async () => {
    const series = 'bench/contended';
    let conflicts = 0;
    async function writer(w: number): Promise<void> {
      const random = seededRandom(100 + w);
      for (let i = 0; i < APPENDS; i++) {
        const store = branchStore(git.url, series, { attempts: 200, random });
        const h = await store.load();
        const before = git.state.calls.length;
        await store.save(appendRun(h, infoOf(`${i}-${w}`, i * WRITERS + w), runOf(40 + w + i / 100)), h.runs.length);
        conflicts += git.state.calls.slice(before).filter((c) => c.method === 'PATCH' && c.status === 422).length;
      }
    }
    await Promise.all(Array.from({ length: WRITERS }, (_, w) => writer(w)));
    const stored = onBranch(git, series);
    const got = ids(stored);
    expect(got).toHaveLength(WRITERS * APPENDS);
    expect(new Set(got).size).toBe(WRITERS * APPENDS);
    for (let w = 0; w < WRITERS; w++) for (let i = 0; i < APPENDS; i++) expect(got).toContain(`${i}-${w}`);
    // Each run's value landed beside its own id (columns stay aligned through every merge).
    const values = stored?.columns.get('build/compile')?.values ?? [];
    got.forEach((id, k) => {
      const [i = 0, w = 0] = id.split('-').map(Number);
      expect(values[k]).toBeCloseTo(40 + w + i / 100, 12);
    });
    // Every successful save is one commit on a single first-parent chain (plus the branch creation).
    expect(git.history('bellgate-data').length).toBe(WRITERS * APPENDS);
    expect(conflicts).toBeGreaterThan(0);
    console.log(
      `concurrency: ${WRITERS * APPENDS} appends, ${conflicts} refused ref updates resolved by re-read and merge`,
    );
  }, 180_000);
});
