import { spawnSync } from 'node:child_process';
import { existsSync, mkdtempSync, readFileSync, rmSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join, resolve } from 'node:path';
import { afterAll, describe, expect, it } from 'vitest';

// The built `bellgate` run the way a user runs it: `node dist/cli/index.js ...` from some other
// folder, with real exit codes and real stdout/stderr. dist/ is built by `npm run build`; when it
// is absent these tests are skipped with a message (and .ci/check-dist fails and says so).
const root = resolve(import.meta.dirname, '..', '..');
const cli = join(root, 'dist', 'cli', 'index.js');
const built = existsSync(cli);
if (!built) console.warn(`cli-bundle e2e tests skipped: ${cli} is absent; run npm run build`);

const work = mkdtempSync(join(tmpdir(), 'bellgate-e2e-'));
afterAll(() => rmSync(work, { recursive: true, force: true }));

function run(
  args: string[],
  env: Record<string, string> = {},
): { code: number | null; stdout: string; stderr: string } {
  const r = spawnSync(process.execPath, [cli, ...args], {
    cwd: work,
    encoding: 'utf8',
    timeout: 60_000,
    env: { PATH: process.env.PATH ?? '', NO_COLOR: '1', ...env },
  });
  return { code: r.status, stdout: r.stdout, stderr: r.stderr };
}

const STACK = /\n\s+at [^\n]*:\d+:\d+/;

describe.skipIf(!built)('the built CLI (dist/cli/index.js)', () => {
  it('--help exits 0 and lists the commands', () => {
    const r = run(['--help']);
    expect(r.code).toBe(0);
    expect(r.stdout).toContain('demo');
  });

  it('demo runs from another folder, writes its reports and exits 0', () => {
    const r = run(['demo', '--out', 'demo']);
    expect(r.code, r.stderr).toBe(0);
    expect(r.stdout).toContain('(demo: the verdict would exit 1 in CI');
    const report = JSON.parse(readFileSync(join(work, 'demo', 'report.json'), 'utf8')) as { verdict: string };
    expect(report.verdict).toBe('regressed');
  });

  it('record then check: a slowdown exits 1 and --format json is the only stdout', () => {
    const history = join(work, 'history.json');
    for (let i = 0; i < 10; i++) {
      writeFileSync(join(work, 'run.json'), JSON.stringify({ 'api/latency': 100 + (i % 3) - 1 }));
      const rec = run([
        'record',
        '--metrics',
        'run.json',
        '--history',
        history,
        '--id',
        `r${i}`,
        '--time',
        `2026-01-${String(10 + i)}T00:00:00Z`,
      ]);
      expect(rec.code, rec.stderr).toBe(0);
    }
    writeFileSync(join(work, 'slow.json'), JSON.stringify({ 'api/latency': 140 }));
    const r = run(['check', '--metrics', 'slow.json', '--history', history, '--format', 'json']);
    expect(r.code).toBe(1);
    expect((JSON.parse(r.stdout) as { verdict: string }).verdict).toBe('regressed');
  });

  it('a bad flag exits 2 and a corrupt history exits 2 (bad input, README Exit codes), without stack traces', () => {
    const bad = run(['check', '--nope']);
    expect(bad.code).toBe(2);
    expect(bad.stderr).not.toMatch(STACK);
    writeFileSync(join(work, 'corrupt.json'), '{"schema":');
    writeFileSync(join(work, 'one.json'), '{"a": 1}');
    const corrupt = run(['check', '--metrics', 'one.json', '--history', 'corrupt.json']);
    expect(corrupt.code).toBe(2);
    expect(corrupt.stderr).toContain('corrupt.json');
    expect(corrupt.stderr).not.toMatch(STACK);
  });

  it('the CSV and XML parsers stay out of the first bundle files and load with such a file (DEVELOPERS.md "Speed")', () => {
    for (const first of [join(root, 'dist', 'index.js'), cli]) {
      expect(readFileSync(first, 'utf8')).not.toMatch(/node_modules\/(csv-parse|fast-xml-parser)\//);
    }
    writeFileSync(join(work, 'times.csv'), 'name,value,unit\nparse,12.5,ms\n');
    writeFileSync(join(work, 'suite.xml'), '<testsuite name="s"><testcase name="t" time="0.25"/></testsuite>');
    const r = run(['check', '--metrics', 'times.csv', '--metrics', 'suite.xml', '--format', 'json']);
    expect(r.code).toBe(0);
    const names = (JSON.parse(r.stdout) as { metrics: { name: string }[] }).metrics.map((m) => m.name).sort();
    expect(names).toEqual(['parse', 's/t']);
  });
});
