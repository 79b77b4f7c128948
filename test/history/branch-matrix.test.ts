// A wide matrix recording at once on one data branch: 24 legs (24 series) through the real octokit
// client against the Git Data stand-in, which enforces GitHub's documented secondary limit on
// content-creating requests ("no more than 80 content-generating requests per minute", "Rate
// limits for the REST API") and answers over it as documented: 403, "You have exceeded a secondary
// rate limit", a retry-after header. Time is scaled: one stand-in second is SECOND ms, and the
// clients wait retry-after x SECOND ms, so the minute is 60 x SECOND ms.
import { afterEach, beforeEach, describe, expect, it } from 'vitest';
import { startGitDataStandin, type GitDataStandin } from '../e2e/standins/git-data.js';
import { branchStore, ids, infoOf, onBranch, runOf } from './branch-helpers.js';

const SECOND = 20;
const LEGS = 24;

let git: GitDataStandin;
beforeEach(async () => {
  git = await startGitDataStandin();
});
afterEach(async () => git.close());

/** Every leg records its own series, all at once; each leg has its own token (its own job). */
async function matrix(): Promise<void> {
  await Promise.all(
    Array.from({ length: LEGS }, (_, leg) =>
      branchStore(
        git.url,
        `matrix/leg-${leg}`,
        { unitMs: SECOND },
        { unitMs: SECOND, retries: 3 },
        `ghs_leg-${leg}`,
      ).update({
        kind: 'record',
        info: infoOf(`${7000 + leg}-1`, leg),
        run: runOf(100 + leg),
        keep: 4000,
      }),
    ),
  );
}

const writes = () => git.state.calls.filter((c) => c.method !== 'GET');

describe(`${LEGS} matrix legs recording at once on one data branch`, () => {
  it('stay inside 80 content-creating requests a minute: 3 each (tree, commit, merge), none refused, all recorded', async () => {
    await branchStore(git.url, 'matrix/seed').update({
      kind: 'record',
      info: infoOf('1-1', 0),
      run: runOf(1),
      keep: 4000,
    });
    git.state.writeLimit = { perMinute: 80, minuteMs: 60 * SECOND, secondMs: SECOND };
    const before = writes().length;
    await matrix();
    for (let leg = 0; leg < LEGS; leg++) expect(ids(onBranch(git, `matrix/leg-${leg}`))).toEqual([`${7000 + leg}-1`]);
    const made = writes().slice(before);
    console.log(
      `matrix of ${LEGS}: ${made.length} content-creating requests, ${git.state.limited} refused for the limit`,
    );
    expect(made).toHaveLength(3 * LEGS);
    expect(made.filter((c) => c.path.endsWith('/merges') && c.status === 409)).toHaveLength(0);
    expect(git.state.limited).toBe(0);
  });

  it('over a tighter limit (30 a minute) every leg waits as told — none comes back early — and all are recorded', async () => {
    await branchStore(git.url, 'matrix/seed').update({
      kind: 'record',
      info: infoOf('1-1', 0),
      run: runOf(1),
      keep: 4000,
    });
    git.state.writeLimit = { perMinute: 30, minuteMs: 60 * SECOND, secondMs: SECOND };
    await matrix();
    for (let leg = 0; leg < LEGS; leg++) expect(ids(onBranch(git, `matrix/leg-${leg}`))).toEqual([`${7000 + leg}-1`]);
    console.log(
      `matrix of ${LEGS} at 30 a minute: ${git.state.limited} requests refused for the limit, ${git.state.early} early`,
    );
    expect(git.state.limited).toBeGreaterThan(0);
    expect(git.state.early).toBe(0);
  });

  it('the first matrix of a repository creates the branch: the legs that lose the race re-read and merge; all recorded, none early', async () => {
    git.state.writeLimit = { perMinute: 80, minuteMs: 60 * SECOND, secondMs: SECOND };
    await matrix();
    for (let leg = 0; leg < LEGS; leg++) expect(ids(onBranch(git, `matrix/leg-${leg}`))).toEqual([`${7000 + leg}-1`]);
    expect(git.state.early).toBe(0);
  });
});
