import { existsSync, readFileSync } from 'node:fs';
import { join } from 'node:path';
import { afterAll, describe, expect, it } from 'vitest';
import { bellgate, handHistory, noStack, steadyFixture } from './helpers/cli-harness.js';

// Exit codes are README's ("Exit codes"): 0 pass/learning/accepted, 1 regressed, 2 bad input or usage,
// 3 store unreachable. Every failure must be one readable message, never a stack trace.
const { work, steady, history, calm, slow, config } = steadyFixture();
afterAll(() => work.remove());

describe('check', () => {
  it('a calm run passes: exit 0', async () => {
    const r = await bellgate(work.dir, ['check', '--metrics', calm, '--history', history, '--config', config]);
    expect(r.code).toBe(0);
    expect(r.stdout).toContain('api/latency');
  });

  it('a clear slowdown regresses: exit 1', async () => {
    const r = await bellgate(work.dir, ['check', '--metrics', slow, '--history', history, '--config', config]);
    expect(r.code).toBe(1);
    expect(r.stdout).toMatch(/regressed/);
  });

  it('--format json prints only the JSON report on stdout', async () => {
    const r = await bellgate(work.dir, [
      'check',
      '--metrics',
      slow,
      '--history',
      history,
      '--config',
      config,
      '--format',
      'json',
    ]);
    expect(r.code).toBe(1);
    const parsed = JSON.parse(r.stdout) as {
      schema: string;
      verdict: string;
      metrics: Array<{ name: string; status: string }>;
    };
    expect(parsed.schema).toBe('bellgate.report/1'); // the documented JSON report schema
    expect(parsed.verdict).toBe('regressed');
    expect(parsed.metrics.find((m) => m.name === 'api/latency')?.status).toBe('regressed');
    expect(r.stdout.trim().startsWith('{')).toBe(true);
    expect(r.stdout.trim().endsWith('}')).toBe(true);
  });

  it('past 30 ok metrics the text report counts them on one line; --all lists them; report.txt always does', async () => {
    const names = Array.from({ length: 40 }, (_, i) => `suite/m${i}`);
    const values = Object.fromEntries(names.map((n) => [n, [100, 101, 99, 100, 102, 98, 100, 101, 99, 100]]));
    values['suite/m0'] = values['suite/m0']!.map((v) => v * 10);
    const wide = work.write('wide/history.json', handHistory('default', values));
    const run = work.write(
      'wide/run.json',
      JSON.stringify(Object.fromEntries(names.map((n) => [n, n === 'suite/m0' ? 1300 : 100.5]))),
    );
    const rowsOf = (out: string): string[] => out.split('\n').filter((l) => /^[▲●] \S+ {2,}suite\//.test(l));
    const folded = await bellgate(work.dir, [
      'check',
      '--metrics',
      run,
      '--history',
      wide,
      '--config',
      config,
      '--out',
      'wide/out',
    ]);
    expect(folded.code).toBe(1);
    expect(rowsOf(folded.stdout)).toHaveLength(1); // only the regressed metric
    expect(folded.stdout).toContain('● ok (39): within their baselines, not listed (--all lists every metric)');
    expect(rowsOf(readFileSync(join(work.dir, 'wide', 'out', 'report.txt'), 'utf8'))).toHaveLength(40);
    const all = await bellgate(work.dir, ['check', '--metrics', run, '--history', wide, '--config', config, '--all']);
    expect(rowsOf(all.stdout)).toHaveLength(40);
    expect(all.stdout).not.toContain('not listed');
  });

  it('--format markdown prints a table', async () => {
    const r = await bellgate(work.dir, [
      'check',
      '--metrics',
      slow,
      '--history',
      history,
      '--config',
      config,
      '--format',
      'markdown',
    ]);
    expect(r.code).toBe(1);
    expect(r.stdout).toContain('|');
  });

  it('no history at all: every metric is new, the verdict learning, exit 0', async () => {
    const r = await bellgate(work.dir, ['check', '--metrics', calm, '--format', 'json']);
    expect(r.code).toBe(0);
    const parsed = JSON.parse(r.stdout) as { verdict: string; metrics: Array<{ status: string }> };
    expect(parsed.verdict).toBe('learning');
    expect(parsed.metrics.every((m) => m.status === 'new')).toBe(true);
    // A forgotten --history is said, not a quiet pass.
    expect(r.stderr).toContain('no --history given, so every metric is new');
  });

  it('a --history file that does not exist yet: a note on stderr, every metric new', async () => {
    const r = await bellgate(work.dir, ['check', '--metrics', calm, '--history', 'not-yet.json', '--format', 'json']);
    expect(r.code).toBe(0);
    expect(r.stderr).toContain('not-yet.json holds no runs yet');
    expect((JSON.parse(r.stdout) as { verdict: string }).verdict).toBe('learning');
  });

  it('--out writes report.md, report.json and report.txt', async () => {
    const r = await bellgate(work.dir, [
      'check',
      '--metrics',
      slow,
      '--history',
      history,
      '--config',
      config,
      '--out',
      'out/a',
    ]);
    expect(r.code).toBe(1);
    for (const f of ['report.md', 'report.json', 'report.txt'])
      expect(existsSync(join(work.dir, 'out/a', f)), f).toBe(true);
    const json = JSON.parse(readFileSync(join(work.dir, 'out/a/report.json'), 'utf8')) as { verdict: string };
    expect(json.verdict).toBe('regressed');
    expect(readFileSync(join(work.dir, 'out/a/report.txt'), 'utf8')).not.toContain('\u001b['); // no colour in files
  });

  it('a missing metric file: exit 2 naming it', async () => {
    const r = await bellgate(work.dir, ['check', '--metrics', 'nowhere/bench.json', '--history', history]);
    expect(r.code).toBe(2);
    expect(r.stderr).toContain('nowhere/bench.json');
    noStack(r.stderr);
  });

  it('a malformed metric file: exit 2 naming the file', async () => {
    const bad = work.write('bad.json', '{"metrics": [{"name": "a", "value": }]}');
    const r = await bellgate(work.dir, ['check', '--metrics', bad]);
    expect(r.code).toBe(2);
    expect(r.stderr).toContain('bad.json');
    noStack(r.stderr);
  });

  it('a missing explicit --config: exit 2 naming it', async () => {
    const r = await bellgate(work.dir, ['check', '--metrics', calm, '--config', 'no-such.yml']);
    expect(r.code).toBe(2);
    expect(r.stderr).toContain('no-such.yml');
  });

  it('an invalid config: exit 2 with file:line:col', async () => {
    const bad = work.write('bad.yml', 'defaults:\n  cutoff: 7\n');
    const r = await bellgate(work.dir, ['check', '--metrics', calm, '--config', bad]);
    expect(r.code).toBe(2);
    expect(r.stderr).toMatch(/bad\.yml:2:\d+/);
  });

  it('a corrupt history: exit 2, the file left untouched', async () => {
    const corrupt = work.write('corrupt.json', '{"schema": "bellgate.history/2", "series": "default", "runs": ');
    const r = await bellgate(work.dir, ['check', '--metrics', calm, '--history', corrupt, '--record']);
    expect(r.code).toBe(2); // what is stored is the wrong thing: bad input (README, Exit codes)
    expect(r.stderr).toContain('corrupt.json');
    noStack(r.stderr);
    expect(readFileSync(corrupt, 'utf8')).toBe('{"schema": "bellgate.history/2", "series": "default", "runs": ');
  });

  // The history file is read while the config and metric files load (openEarly); the order of
  // failures must stay that of the steps: config, then metric files, then the history.
  it('an invalid config and a corrupt history: the config is reported (exit 2), not the history', async () => {
    const bad = work.write('bad-first.yml', 'defaults:\n  cutoff: 7\n');
    const corrupt = work.write('corrupt-too.json', '{"schema": "bellgate.history/2", "runs": ');
    const r = await bellgate(work.dir, ['check', '--metrics', calm, '--history', corrupt, '--config', bad]);
    expect(r.code).toBe(2);
    expect(r.stderr).toMatch(/bad-first\.yml:2:\d+/);
    expect(r.stderr).not.toContain('corrupt-too.json');
    noStack(r.stderr);
  });

  it('a missing metric file and a corrupt history: the metric file is reported (exit 2)', async () => {
    const corrupt = work.write('corrupt-three.json', '{"schema": "bellgate.history/2", "runs": ');
    const r = await bellgate(work.dir, ['check', '--metrics', 'no-such-metrics.json', '--history', corrupt]);
    expect(r.code).toBe(2);
    expect(r.stderr).toContain('no-such-metrics.json');
    expect(r.stderr).not.toContain('corrupt-three.json');
  });

  it('a history of another series: exit 2 saying which series it holds', async () => {
    const r = await bellgate(work.dir, ['check', '--metrics', calm, '--history', history, '--series', 'nightly']);
    expect(r.code).toBe(2); // what is stored is the wrong thing: bad input (README, Exit codes)
    expect(r.stderr).toContain('"default"');
  });

  it('--record without --history: exit 2', async () => {
    const r = await bellgate(work.dir, ['check', '--metrics', calm, '--record']);
    expect(r.code).toBe(2);
    expect(r.stderr).toContain('--history');
  });

  it('--record appends the checked run to the history', async () => {
    const h = work.write('rec/history.json', handHistory('default', { 'api/latency': steady }));
    const r = await bellgate(work.dir, [
      'check',
      '--metrics',
      calm,
      '--history',
      h,
      '--config',
      config,
      '--record',
      '--id',
      'pr-9',
      '--time',
      '2026-02-01T00:00:00Z',
    ]);
    expect(r.code).toBe(0);
    expect(r.stderr).toContain('recorded run pr-9');
    const doc = readFileSync(h, 'utf8');
    // appended as one line after the ten it had; the calm run has no api/size, so its values stop at 1
    const lines = doc.trimEnd().split('\n');
    expect(lines).toHaveLength(12);
    expect(JSON.parse(lines[11]!)).toMatchObject({
      id: 'pr-9',
      time: '2026-02-01T00:00:00.000Z',
      values: [100.5, 100200],
      n: 11,
    });
  });
});

describe('metric file flags', () => {
  it('--prefix puts a prefix before the names read from the files a pattern matches', async () => {
    const f = work.write('pre/a.json', JSON.stringify({ latency: 5 }));
    const r = await bellgate(work.dir, [
      'check',
      '--metrics',
      'pre/*.json',
      '--prefix',
      'pre/*.json=api',
      '--format',
      'json',
    ]);
    expect(r.code, r.stderr).toBe(0);
    const names = (JSON.parse(r.stdout) as { metrics: Array<{ name: string }> }).metrics.map((m) => m.name);
    expect(names).toEqual(['api/latency']);
    expect(f).toContain('pre');
  });

  it('a --prefix without "=": exit 2 showing the form', async () => {
    const r = await bellgate(work.dir, ['check', '--metrics', calm, '--prefix', 'api']);
    expect(r.code).toBe(2);
    expect(r.stderr).toContain('PATTERN=PREFIX');
  });

  it('--input-format forces a reader; an unknown one: exit 2 listing the formats', async () => {
    const gob = work.write('bench.out', 'BenchmarkParse-8   1000   1523 ns/op   64 B/op\n');
    const ok = await bellgate(work.dir, ['check', '--metrics', gob, '--input-format', 'gobench', '--format', 'json']);
    expect(ok.code, ok.stderr).toBe(0);
    expect(ok.stdout).toContain('ns/op');
    const bad = await bellgate(work.dir, ['check', '--metrics', gob, '--input-format', 'yaml']);
    expect(bad.code).toBe(2);
    expect(bad.stderr).toContain('gobench');
  });
});

describe('failures outside the input', () => {
  it('--out naming a file, not a folder: exit 2 naming the path', async () => {
    const file = work.write('occupied', 'x');
    const r = await bellgate(work.dir, ['check', '--metrics', calm, '--out', file]);
    expect(r.code).toBe(2);
    expect(r.stderr).toContain(file);
    noStack(r.stderr);
  });

  it('a fault inside the CLI (here: stdout throws): one line asking for a report, exit 2', async () => {
    let stderr = '';
    const { runCli } = await import('../../src/cli/main.js');
    const code = await runCli(['check', '--metrics', calm], {
      stdout: () => {
        throw new TypeError('stdout is gone');
      },
      stderr: (s) => (stderr += s),
      cwd: work.dir,
      env: {},
      isTTY: false,
    });
    expect(code).toBe(2);
    expect(stderr).toContain('internal error: stdout is gone');
    expect(stderr).toContain('please report');
    noStack(stderr);
  });
});

describe('colour', () => {
  it('only on a TTY without NO_COLOR', async () => {
    const args = ['check', '--metrics', slow, '--history', history, '--config', config];
    const tty = await bellgate(work.dir, args, { isTTY: true });
    const noColor = await bellgate(work.dir, args, { isTTY: true, env: { NO_COLOR: '1' } });
    const pipe = await bellgate(work.dir, args, { isTTY: false });
    expect(tty.stdout).toContain('\u001b[');
    expect(noColor.stdout).not.toContain('\u001b[');
    expect(pipe.stdout).not.toContain('\u001b[');
  });
});
