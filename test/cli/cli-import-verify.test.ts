import { join } from 'node:path';
import { afterAll, describe, expect, it } from 'vitest';
import { bellgate, handHistory, steadyFixture } from './helpers/cli-harness.js';

// Exit codes are README's ("Exit codes"): 0 pass/learning/accepted, 1 regressed, 2 bad input or usage,
// 3 store unreachable. Every failure must be one readable message, never a stack trace.
const { work } = steadyFixture();
afterAll(() => work.remove());

describe('import and verify', () => {
  const lines = Array.from({ length: 12 }, (_, i) =>
    JSON.stringify({
      id: `imp-${i}`,
      time: new Date(Date.UTC(2026, 1, 1 + i)).toISOString(),
      sha: `s${i}`,
      ref: 'refs/heads/main',
      metrics: { 'api/latency': 100 + (i % 3) },
    }),
  );
  const runs = work.write(
    'runs.jsonl',
    `${lines.join('\n')}\n{"id": "broken", "time": "not a time", "metrics": {"api/latency": 1}}\n`,
  );

  it('import merges JSON Lines runs and reports what it skipped', async () => {
    const h = join(work.dir, 'imported/history.json');
    const r = await bellgate(work.dir, ['import', '--history', h, '--runs', runs]);
    expect(r.code).toBe(0);
    expect(r.stdout).toContain('12 runs added');
    expect(r.stderr).toContain('skipped');
    const again = await bellgate(work.dir, ['import', '--history', h, '--runs', runs]);
    expect(again.stdout).toContain('0 runs added');
    expect(again.stdout).toContain('12 runs in');
    const verify = await bellgate(work.dir, ['verify', '--history', h]);
    expect(verify.code).toBe(0);
    expect(verify.stdout).toContain('no problems');
  });

  it('import of a missing runs file: exit 2 naming it', async () => {
    const r = await bellgate(work.dir, ['import', '--history', join(work.dir, 'x.json'), '--runs', 'missing.jsonl']);
    expect(r.code).toBe(2);
    expect(r.stderr).toContain('missing.jsonl');
  });

  it('verify lists the problems of a damaged history, each with its line, and exits 2', async () => {
    const lines = handHistory('default', { m: [1, 2, 3] }).split('\n');
    lines[2] = lines[2]!.replace('"values":[2]', '"values":["2"]'); // a value that is text
    const bad = work.write('dup.jsonl', lines.join('\n'));
    const r = await bellgate(work.dir, ['verify', '--history', bad]);
    expect(r.code).toBe(2);
    expect(r.stdout).toBe(`${bad}:3: run "r2": values[0] is a string, not a finite number or null\n`);
    expect(r.stderr).toContain('1 problem');
  });

  it('verify of a missing file: exit 2 naming it', async () => {
    const r = await bellgate(work.dir, ['verify', '--history', 'nope.json']);
    expect(r.code).toBe(2);
    expect(r.stderr).toContain('nope.json');
  });
});
