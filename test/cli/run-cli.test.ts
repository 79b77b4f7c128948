import { existsSync, readFileSync } from 'node:fs';
import { join } from 'node:path';
import { afterAll, describe, expect, it } from 'vitest';
import { bellgate, handHistoryV1, scratch } from './helpers/cli-harness.js';

// Exit codes are DESIGN.md's: 0 pass/learning/accepted, 1 regressed, 2 bad input or usage,
// 3 store unreachable. Every failure must be one readable message, never a stack trace.
const work = scratch();
afterAll(() => work.remove());

const STACK = /\n\s+at [^\n]*\(?[^\n]*:\d+:\d+\)?/;
const steady = [100, 101, 99, 100, 102, 98, 100, 101, 99, 100];
const history = work.write('h/history.json', handHistoryV1('default', { 'api/latency': steady, 'api/size': steady.map((v) => v * 1000) }));
const calm = work.write('calm.json', JSON.stringify({ 'api/latency': 100.5, 'api/size': 100_200 }));
const slow = work.write('slow.json', JSON.stringify({ 'api/latency': 130, 'api/size': 100_200 }));
const config = work.write('bellgate.yml', 'defaults:\n  change-points: false\n');

function noStack(text: string): void {
  expect(text).not.toMatch(STACK);
}

describe('usage', () => {
  it('--help lists every command and exits 0', async () => {
    const r = await bellgate(work.dir, ['--help']);
    expect(r.code).toBe(0);
    for (const c of ['check', 'record', 'explain', 'tune', 'report', 'import', 'verify', 'demo']) expect(r.stdout).toContain(c);
    expect(r.stdout).toContain('Exit codes');
  });

  it('each command has --help with examples', async () => {
    for (const c of ['check', 'record', 'explain', 'tune', 'report', 'import', 'verify', 'demo']) {
      const r = await bellgate(work.dir, [c, '--help']);
      expect(r.code, c).toBe(0);
      expect(r.stdout, c).toContain('Examples:');
      expect(r.stdout, c).toContain(`$ bellgate ${c}`);
    }
  });

  it('--version prints the version of package.json', async () => {
    const pkg = JSON.parse(readFileSync(join(import.meta.dirname, '..', '..', 'package.json'), 'utf8')) as { version: string };
    const r = await bellgate(work.dir, ['--version']);
    expect(r.code).toBe(0);
    expect(r.stdout.trim()).toBe(pkg.version);
  });

  it('no command: usage on stderr, exit 2', async () => {
    const r = await bellgate(work.dir, []);
    expect(r.code).toBe(2);
    expect(r.stderr).toContain('Usage: bellgate');
  });

  it('an unknown flag: exit 2, the flag named, a pointer to --help', async () => {
    const r = await bellgate(work.dir, ['check', '--metrics', calm, '--histroy', history]);
    expect(r.code).toBe(2);
    expect(r.stderr).toContain("unknown option '--histroy'");
    expect(r.stderr).toContain('--history'); // commander's did-you-mean
    expect(r.stdout).toBe('');
  });

  it('a required flag left out: exit 2 naming it', async () => {
    const r = await bellgate(work.dir, ['check']);
    expect(r.code).toBe(2);
    expect(r.stderr).toContain('--metrics');
  });

  it('a value outside the choices: exit 2 listing them', async () => {
    const r = await bellgate(work.dir, ['check', '--metrics', calm, '--format', 'xml']);
    expect(r.code).toBe(2);
    expect(r.stderr).toContain('text, markdown, json');
  });

  it('an unknown command: exit 2', async () => {
    const r = await bellgate(work.dir, ['chek']);
    expect(r.code).toBe(2);
    expect(r.stderr).toContain('check'); // did-you-mean
  });
});

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
    const r = await bellgate(work.dir, ['check', '--metrics', slow, '--history', history, '--config', config, '--format', 'json']);
    expect(r.code).toBe(1);
    const parsed = JSON.parse(r.stdout) as { schema: string; verdict: string; metrics: Array<{ name: string; status: string }> };
    expect(parsed.schema).toBe('bellgate.report/1'); // DESIGN.md JSON report
    expect(parsed.verdict).toBe('regressed');
    expect(parsed.metrics.find((m) => m.name === 'api/latency')?.status).toBe('regressed');
    expect(r.stdout.trim().startsWith('{')).toBe(true);
    expect(r.stdout.trim().endsWith('}')).toBe(true);
  });

  it('--format markdown prints a table', async () => {
    const r = await bellgate(work.dir, ['check', '--metrics', slow, '--history', history, '--config', config, '--format', 'markdown']);
    expect(r.code).toBe(1);
    expect(r.stdout).toContain('|');
  });

  it('no history at all: every metric is new, the verdict learning, exit 0', async () => {
    const r = await bellgate(work.dir, ['check', '--metrics', calm, '--format', 'json']);
    expect(r.code).toBe(0);
    const parsed = JSON.parse(r.stdout) as { verdict: string; metrics: Array<{ status: string }> };
    expect(parsed.verdict).toBe('learning');
    expect(parsed.metrics.every((m) => m.status === 'new')).toBe(true);
  });

  it('--out writes report.md, report.json and report.txt', async () => {
    const r = await bellgate(work.dir, ['check', '--metrics', slow, '--history', history, '--config', config, '--out', 'out/a']);
    expect(r.code).toBe(1);
    for (const f of ['report.md', 'report.json', 'report.txt']) expect(existsSync(join(work.dir, 'out/a', f)), f).toBe(true);
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

  it('a corrupt history: exit 3, the file left untouched', async () => {
    const corrupt = work.write('corrupt.json', '{"schema": "bellgate.history/2", "series": "default", "runs": ');
    const r = await bellgate(work.dir, ['check', '--metrics', calm, '--history', corrupt, '--record']);
    expect(r.code).toBe(3);
    expect(r.stderr).toContain('corrupt.json');
    noStack(r.stderr);
    expect(readFileSync(corrupt, 'utf8')).toBe('{"schema": "bellgate.history/2", "series": "default", "runs": ');
  });

  it('a history of another series: exit 3 saying which series it holds', async () => {
    const r = await bellgate(work.dir, ['check', '--metrics', calm, '--history', history, '--series', 'nightly']);
    expect(r.code).toBe(3);
    expect(r.stderr).toContain('"default"');
  });

  it('--record without --history: exit 2', async () => {
    const r = await bellgate(work.dir, ['check', '--metrics', calm, '--record']);
    expect(r.code).toBe(2);
    expect(r.stderr).toContain('--history');
  });

  it('--record appends the checked run to the history', async () => {
    const h = work.write('rec/history.json', handHistoryV1('default', { 'api/latency': steady }));
    const r = await bellgate(work.dir, ['check', '--metrics', calm, '--history', h, '--config', config, '--record', '--id', 'pr-9', '--time', '2026-02-01T00:00:00Z']);
    expect(r.code).toBe(0);
    expect(r.stderr).toContain('recorded run pr-9');
    const doc = readFileSync(h, 'utf8');
    expect(doc).toContain('pr-9');
    expect(doc).toContain('bellgate.history/2'); // rewritten in the current version
  });
});

describe('metric file flags', () => {
  it('--prefix puts a prefix before the names read from the files a pattern matches', async () => {
    const f = work.write('pre/a.json', JSON.stringify({ latency: 5 }));
    const r = await bellgate(work.dir, ['check', '--metrics', 'pre/*.json', '--prefix', 'pre/*.json=api', '--format', 'json']);
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
    const r = await bellgate(work.dir, ['record', '--metrics', calm, '--history', join(work.dir, 't.json'), '--time', 'yesterday']);
    expect(r.code).toBe(2);
    expect(r.stderr).toContain('ISO-8601');
    expect(existsSync(join(work.dir, 't.json'))).toBe(false);
  });

  it('refuses to write over a corrupt history: exit 3, file unchanged', async () => {
    const bad = work.write('bad-history.json', 'not json at all');
    const r = await bellgate(work.dir, ['record', '--metrics', calm, '--history', bad]);
    expect(r.code).toBe(3);
    expect(readFileSync(bad, 'utf8')).toBe('not json at all');
  });
});

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
  const runs = work.write('runs.jsonl', `${lines.join('\n')}\n{"id": "broken", "time": "not a time", "metrics": {"api/latency": 1}}\n`);

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

  it('verify lists the problems of a damaged history and exits 2', async () => {
    const doc = JSON.parse(handHistoryV1('default', { m: [1, 2, 3] })) as { runs: Array<{ id: string }> };
    const second = doc.runs[1];
    if (second) second.id = 'r1'; // a duplicated run id
    const bad = work.write('dup.json', JSON.stringify(doc));
    const r = await bellgate(work.dir, ['verify', '--history', bad]);
    expect(r.code).toBe(2);
    expect(r.stdout).toContain('r1');
    expect(r.stderr).toContain('1 problem');
  });

  it('verify of a missing file: exit 2 naming it', async () => {
    const r = await bellgate(work.dir, ['verify', '--history', 'nope.json']);
    expect(r.code).toBe(2);
    expect(r.stderr).toContain('nope.json');
  });
});

describe('explain and report', () => {
  it('explain draws one metric of the newest run against the runs before it', async () => {
    const r = await bellgate(work.dir, ['explain', 'api/latency', '--history', history, '--config', config]);
    expect(r.code).toBe(0);
    expect(r.stdout).toContain('api/latency');
    expect(r.stdout).toContain('▲'); // this run's mark in the picture
  });

  it('explain with --metrics judges that run', async () => {
    const r = await bellgate(work.dir, ['explain', 'api/latency', '--history', history, '--metrics', slow, '--config', config]);
    expect(r.code).toBe(0);
    expect(r.stdout).toContain('regressed');
  });

  it('explain of an unknown metric: exit 2 with a did-you-mean', async () => {
    const r = await bellgate(work.dir, ['explain', 'api/latensy', '--history', history]);
    expect(r.code).toBe(2);
    expect(r.stderr).toContain('"api/latency"');
  });

  it('report --html writes one self-contained page', async () => {
    const r = await bellgate(work.dir, ['report', '--history', history, '--metrics', slow, '--html', 'pages/report.html', '--config', config]);
    expect(r.code).toBe(0);
    const html = readFileSync(join(work.dir, 'pages/report.html'), 'utf8');
    expect(html).toContain('<svg');
    expect(html).toContain('api/latency');
    expect(html).not.toMatch(/<script[^>]+src=/); // nothing fetched from elsewhere
  });

  it('report on an empty history without --metrics: exit 2 saying what to pass', async () => {
    const r = await bellgate(work.dir, ['report', '--history', join(work.dir, 'none.json'), '--html', 'x.html']);
    expect(r.code).toBe(2);
    expect(r.stderr).toContain('--metrics');
  });
});
