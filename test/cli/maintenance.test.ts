// The maintenance commands (`runs`, `mark`, `drop`, `rename`, and `import` into a store) on a
// history file and on a data branch (the Git Data stand-in, held to GitHub's REST description),
// judged by what a check does afterwards. The data are invented: a bundle size near 40,000 B (noise
// of a few bytes) that steps up by 2,000 B at run 908. Mixed, the 12 runs have a mean near 40,833
// and an sd near 990 (by hand), so 43,000 B is only about 2.2 sd out: ok. Fitted on the runs since
// the step (centre near 42,000, spread of a few bytes) it is +2.4% (past the 1% tolerance) and
// hundreds of sd out (a Student-t table puts any cutoff far inside that): regressed.
import { readFileSync } from 'node:fs';
import { join } from 'node:path';
import { afterAll, afterEach, beforeAll, describe, expect, it } from 'vitest';
import { startGitDataStandin, takeGitViolations, type GitDataStandin } from '../e2e/standins/git-data.js';
import { bellgate, noStack, scratch } from './helpers/cli-harness.js';

const NOISE = [3, -5, 4, -2, 6, -4, 1, 5, -3, 2, -6, 0];
const work = scratch('bellgate-maint-');
const line = (i: number): string =>
  JSON.stringify({
    id: `${900 + i}-1`,
    time: new Date(Date.UTC(2026, 2, 1 + i)).toISOString(),
    sha: `${i}`.padEnd(40, 'a'),
    ref: 'refs/heads/main',
    metrics: { 'size/app.js': 40_000 + (i >= 8 ? 2_000 : 0) + (NOISE[i % NOISE.length] ?? 0) },
  });
const runsFile = work.write('past.jsonl', `${Array.from({ length: 12 }, (_, i) => line(i + 1)).join('\n')}\n`);
const bench = work.write('bench.json', JSON.stringify({ metrics: [{ name: 'size/app.js', value: 43_000 }] }));
afterAll(() => work.remove());

async function judged(history: string, name = 'size/app.js'): Promise<Record<string, unknown>> {
  const r = await bellgate(work.dir, ['check', '--metrics', bench, '--history', history, '--format', 'json']);
  noStack(r.stderr);
  const report = JSON.parse(r.stdout) as { metrics: { name: string }[] };
  return report.metrics.find((m) => m.name === name) as Record<string, unknown>;
}

describe('maintenance on a history file', () => {
  const h = join(work.dir, 'file/history.jsonl');
  beforeAll(async () => {
    const r = await bellgate(work.dir, ['import', '--history', h, '--runs', runsFile]);
    expect(r.code, r.stderr).toBe(0);
  });

  it('runs lists every run, oldest first, with its metric count', async () => {
    const r = await bellgate(work.dir, ['runs', '--history', h]);
    expect(r.code, r.stderr).toBe(0);
    const lines = r.stdout.trimEnd().split('\n');
    expect(lines[0]).toMatch(/^12 runs in file /);
    expect(lines[1]).toMatch(/^901-1 {2}2026-03-02T00:00:00.000Z {2}1aaaaaaaaaaa {2}- {2}1 metric$/);
    expect(lines).toHaveLength(13);
  });

  it('mark: a level change at run 908-1 makes the check fit only runs since it', async () => {
    // Before: the step sits inside the baseline, which mixes both levels and hides the move.
    const before = await judged(h);
    expect(before.baseline).not.toHaveProperty('since');
    expect(before.status).toBe('ok');
    const r = await bellgate(work.dir, [
      'mark',
      '908-1',
      '--history',
      h,
      '--metric',
      'size/*',
      '--note',
      'new minifier',
    ]);
    expect(r.code, r.stderr).toBe(0);
    expect(r.stdout).toMatch(/^marked run 908-1: a new level of size\/\* starts there \(12 runs in file /);
    const after = await judged(h);
    // Runs 908..912: five runs of the new level; the spread still comes from all 12.
    expect(after).toMatchObject({
      status: 'regressed',
      baseline: { since: '908-1', sinceReason: 'manual', levelRuns: 5, n: 12 },
    });
    const listed = await bellgate(work.dir, ['runs', '--history', h]);
    expect(listed.stdout).toMatch(/^908-1 .*level mark \(manual: size\/\*\)$/m);
    const text = await bellgate(work.dir, ['check', '--metrics', bench, '--history', h]);
    expect(text.stdout).toMatch(/baseline since run 908-1 \(a level mark, 5 runs; spread from all 12\)/);
  });

  it('mark of a run the history does not hold: exit 2 with the fix', async () => {
    const r = await bellgate(work.dir, ['mark', '999-1', '--history', h]);
    expect(r.code).toBe(2);
    expect(r.stderr).toMatch(/holds no run "999-1" to mark/);
    expect(r.stderr).toMatch(/bellgate runs/);
    noStack(r.stderr);
  });

  it('drop: the run leaves the history and stays dropped when the same runs are imported again', async () => {
    const r = await bellgate(work.dir, ['drop', '903-1', '--history', h, '--reason', 'broken runner']);
    expect(r.code, r.stderr).toBe(0);
    expect(r.stdout).toMatch(/^dropped run 903-1; it stays dropped after merges \(11 runs left/);
    const again = await bellgate(work.dir, ['import', '--history', h, '--runs', runsFile]);
    expect(again.code, again.stderr).toBe(0);
    expect(again.stdout).toMatch(/11 runs in file /);
    const listed = await bellgate(work.dir, ['runs', '--history', h]);
    expect(listed.stdout).toMatch(/^11 runs in file .* \(1 dropped\)$/m);
    expect(listed.stdout).not.toMatch(/^903-1 /m);
  });

  it('rename: the metric keeps its history (and its level mark) under the new name', async () => {
    const r = await bellgate(work.dir, ['rename', 'size/app.js', 'size/app.min.js', '--history', h]);
    expect(r.code, r.stderr).toBe(0);
    const text = readFileSync(h, 'utf8');
    expect(JSON.parse(text.split('\n')[0]!).metrics).toEqual([{ name: 'size/app.min.js' }]);
    const renamed = work.write(
      'bench-renamed.json',
      JSON.stringify({ metrics: [{ name: 'size/app.min.js', value: 42_003 }] }),
    );
    const c = await bellgate(work.dir, ['check', '--metrics', renamed, '--history', h, '--format', 'json']);
    const m = (JSON.parse(c.stdout) as { metrics: Record<string, unknown>[] }).metrics[0]!;
    expect(m).toMatchObject({ name: 'size/app.min.js', status: 'ok', baseline: { n: 11, since: '908-1' } });
  });

  it('the artifact store is refused from the CLI, pointing at the manual workflow run', async () => {
    const r = await bellgate(work.dir, ['runs', '--store', 'artifact', '--history', 'bellgate-history']);
    expect(r.code).toBe(2);
    expect(r.stderr).toMatch(/only be changed from inside a workflow run/);
    expect(r.stderr).toMatch(/`maintenance` input/);
  });
});

describe('maintenance on a data branch (with a token)', () => {
  let git: GitDataStandin;
  let env: Record<string, string>;
  const flags = ['--store', 'branch', '--history', 'bellgate-data', '--series', 'bench/linux'];
  beforeAll(async () => {
    git = await startGitDataStandin();
    env = {
      GITHUB_TOKEN: 'ghs_maintenanceToken',
      GITHUB_API_URL: git.url,
      GITHUB_REPOSITORY: 'acme/router',
      BELLGATE_RETRY_UNIT_MS: '1',
    };
  });
  afterAll(() => git?.close());
  afterEach(() => expect(takeGitViolations(git.state)).toEqual([]));

  it('import seeds the branch, then runs, mark and drop change it', async () => {
    const seeded = await bellgate(work.dir, ['import', ...flags, '--runs', runsFile], { env });
    expect(seeded.code, seeded.stderr).toBe(0);
    expect(seeded.stdout).toMatch(/12 runs added.*12 runs in branch/);
    const marked = await bellgate(work.dir, ['mark', '908-1', ...flags], { env });
    expect(marked.code, marked.stderr).toBe(0);
    const dropped = await bellgate(work.dir, ['drop', '902-1', ...flags], { env });
    expect(dropped.code, dropped.stderr).toBe(0);
    const listed = await bellgate(work.dir, ['runs', ...flags], { env });
    expect(listed.stdout).toMatch(/^11 runs in branch .*\(1 dropped\)$/m);
    expect(listed.stdout).toMatch(/^908-1 .*level mark \(manual: every metric\)$/m);
    expect(listed.stdout).not.toContain('ghs_maintenanceToken');
  });

  it('without GITHUB_TOKEN: exit 2 saying how to give one', async () => {
    const r = await bellgate(work.dir, ['runs', ...flags], { env: { ...env, GITHUB_TOKEN: '' } });
    expect(r.code).toBe(2);
    expect(r.stderr).toMatch(/GITHUB_TOKEN is not set/);
  });
});
