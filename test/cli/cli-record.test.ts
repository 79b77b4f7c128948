import { existsSync, readFileSync } from 'node:fs';
import { join } from 'node:path';
import { afterAll, describe, expect, it } from 'vitest';
import { bellgate, steadyFixture } from './helpers/cli-harness.js';

// Exit codes are README's ("Exit codes"): 0 pass/learning/accepted, 1 regressed, 2 bad input or usage,
// 3 store unreachable. Every failure must be one readable message, never a stack trace.
const { work, calm } = steadyFixture();
afterAll(() => work.remove());

describe('record', () => {
  it('creates the history, appends runs, replaces a run with the same id', async () => {
    const h = join(work.dir, 'new/history.json');
    const base = ['record', '--metrics', calm, '--history', h, '--time', '2026-03-01T10:00:00Z'];
    expect((await bellgate(work.dir, [...base, '--id', 'a-1', '--sha', 'abc123'])).code).toBe(0);
    const second = await bellgate(work.dir, [...base, '--id', 'a-2']);
    expect(second.code).toBe(0);
    expect(second.stdout).toContain('2 runs');
    const again = await bellgate(work.dir, [...base, '--id', 'a-2']);
    expect(again.stdout).toContain('replacing');
    expect(again.stdout).toContain('2 runs');
    expect(readFileSync(h, 'utf8')).toContain('abc123');
  });

  it('takes the run id from GitHub Actions variables when no --id is given', async () => {
    const h = join(work.dir, 'gh/history.json');
    const r = await bellgate(work.dir, ['record', '--metrics', calm, '--history', h], {
      env: { GITHUB_RUN_ID: '4242', GITHUB_RUN_ATTEMPT: '2', GITHUB_SHA: 'feedbeef', GITHUB_REF: 'refs/heads/main' },
    });
    expect(r.code).toBe(0);
    expect(r.stdout).toContain('4242-2');
    expect(readFileSync(h, 'utf8')).toContain('feedbeef');
  });

  it('a bad --time: exit 2 saying the expected form', async () => {
    const r = await bellgate(work.dir, [
      'record',
      '--metrics',
      calm,
      '--history',
      join(work.dir, 't.json'),
      '--time',
      'yesterday',
    ]);
    expect(r.code).toBe(2);
    expect(r.stderr).toContain('ISO-8601');
    expect(existsSync(join(work.dir, 't.json'))).toBe(false);
  });

  it('refuses to write over a corrupt history: exit 2, file unchanged', async () => {
    const bad = work.write('bad-history.json', 'not json at all');
    const r = await bellgate(work.dir, ['record', '--metrics', calm, '--history', bad]);
    expect(r.code).toBe(2); // what is stored is the wrong thing: bad input (README, Exit codes)
    expect(readFileSync(bad, 'utf8')).toBe('not json at all');
  });

  // The history is read while the metric files load (openEarly); a bad metric file still comes first.
  it('a missing metric file and a corrupt history: exit 2 naming the metric file, history unchanged', async () => {
    const bad = work.write('bad-history-2.json', 'not json either');
    const r = await bellgate(work.dir, ['record', '--metrics', 'missing-run.json', '--history', bad]);
    expect(r.code).toBe(2);
    expect(r.stderr).toContain('missing-run.json');
    expect(r.stderr).not.toContain('bad-history-2.json');
    expect(readFileSync(bad, 'utf8')).toBe('not json either');
  });
});
