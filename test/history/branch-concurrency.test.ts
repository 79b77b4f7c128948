// Five writers append to ONE series at once through the loopback Git Data stand-in, whose
// server-side merge refuses (409 "Merge conflict") a commit that changed the file another writer
// changed meanwhile ("Merge a branch"). Every write applies its change to the branch's newest
// history, so every run must be kept exactly once.
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
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
        const before = git.state.calls.length;
        await store.update({
          kind: 'record',
          info: infoOf(`${1000 * (w + 1) + i}-1`, i * WRITERS + w),
          run: runOf(40 + w + i / 100),
          keep: 4000,
        });
        conflicts += git.state.calls.slice(before).filter((c) => c.path.endsWith('/merges') && c.status === 409).length;
      }
    }
    await Promise.all(Array.from({ length: WRITERS }, (_, w) => writer(w)));
    const stored = onBranch(git, series);
    const got = ids(stored);
    expect(got).toHaveLength(WRITERS * APPENDS);
    expect(new Set(got).size).toBe(WRITERS * APPENDS);
    for (let w = 0; w < WRITERS; w++)
      for (let i = 0; i < APPENDS; i++) expect(got).toContain(`${1000 * (w + 1) + i}-1`);
    // Each run's value landed beside its own id (columns stay aligned through every merge).
    const values = stored?.columns.get('build/compile')?.values ?? [];
    got.forEach((id, k) => {
      const run = Number(id.split('-')[0]);
      const [w, i] = [Math.floor(run / 1000) - 1, run % 1000];
      expect(values[k]).toBeCloseTo(40 + w + i / 100, 12);
    });
    // Every successful write is one merge on the first-parent chain (the first created the branch).
    expect(git.history('bellgate-data').length).toBe(WRITERS * APPENDS);
    expect(conflicts).toBeGreaterThan(0);
    console.log(
      `concurrency: ${WRITERS * APPENDS} appends, ${conflicts} merge conflicts resolved by re-read and write`,
    );
  }, 180_000);
});
