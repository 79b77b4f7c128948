// Hostile metric names (and units, series, titles) through the whole program: `bellgate check`
// with --format markdown/json/text and `bellgate report --html`, run in-process on a history and a
// run that contain them. Each is either shown inert in every output or refused with exit 2 and a
// clear message. The injection strings are the usual probes (OWASP XSS filter evasion cheat sheet;
// GitHub's @mention/#reference autolinks; "Trojan Source", CVE-2021-42574) — from memory.
import { afterAll, describe, expect, it } from 'vitest';
import { readFileSync } from 'node:fs';
import { join } from 'node:path';
import { bellgate, scratch } from '../cli/helpers/cli-harness.js';
import { assertNoPollution, CaseCounter, STACK_LINE } from './guards.js';
import { assertInertHtml, assertInertMarkdown, assertInertText } from './outputs.js';

const work = scratch('bellgate-hostile-');
const counter = new CaseCounter('pipeline');
afterAll(() => {
  counter.print();
  work.remove();
});

/** Names any metric file may carry: shown, escaped, never live. */
const SHOWN: readonly string[] = [
  '__proto__',
  'constructor',
  'toString',
  'hasOwnProperty',
  'valueOf',
  '__defineGetter__',
  'prototype',
  '<img src=x onerror=alert(1)>',
  '<script>alert(1)</script>',
  '</script><script>alert(1)</script>',
  '"><svg onload=alert(1)>',
  "' onmouseover='alert(1)",
  '[click](javascript:alert(1))',
  '](javascript:alert(1))',
  '![x](https://evil.example/p.png)',
  '<https://evil.example>',
  'https://evil.example/a',
  'see www.evil.example/login',
  '@team please look',
  '@octo-org/perf-team',
  'fixes #123',
  'GH-77 and owner/repo#9',
  '`code` and ``` fence',
  '`',
  'a|b|c',
  '\\|escaped pipe\\',
  '| status | metric |',
  '**bold** _em_ ~~strike~~',
  '<!-- comment --> -->',
  '<details><summary>x</summary>',
  '&lt;img&gt; &amp;',
  '{{constructor.constructor("alert(1)")()}}',
  '${process.exit(1)}',
  '名前/測定 😀 é',
  'n'.repeat(512),
];

/** Names every reader refuses: too long, control characters, bidi overrides, blank. */
const REFUSED: ReadonlyArray<readonly [string, RegExp]> = [
  ['x'.repeat(10 * 1024), /10240 characters long, more than the 512/],
  ['a\u202Ebad\u202C', /bidirectional override/],
  ['rtl\u2066isolate\u2069', /bidirectional override/],
  ['line\nbreak', /control character/],
  ['bell\u0007', /control character/],
  ['esc\u001b[31mred', /control character/],
  ['nul\u0000', /control character/],
  ['del\u007f', /control character/],
  ['c1\u009b', /control character/],
  ['   ', /metric name is empty/],
];

const STEADY = [100, 101, 99, 100, 102, 98, 100, 101, 99, 100];
const CONFIG = 'defaults:\n  change-points: false\n';

/** A history in the stored layout (a header line, a line per run) with these names, ten steady runs each. */
function historyWith(series: string, names: readonly string[], unit?: string): string {
  const header = {
    schema: 'bellgate.history/3',
    series,
    metrics: names.map((name) => (unit === undefined ? { name } : { name, unit })),
  };
  const runs = STEADY.map((v, i) =>
    JSON.stringify({
      id: `r${i + 1}`,
      time: new Date(Date.UTC(2026, 0, 1 + i)).toISOString(),
      values: names.map(() => v),
    }),
  );
  return `${[JSON.stringify(header), ...runs].join('\n')}\n`;
}

/** The run's file in the own JSON list form: the first name regresses, the others stay calm. */
function runWith(names: readonly string[], unit?: string): string {
  return JSON.stringify({
    metrics: names.map((name, i) => ({ name, value: i === 0 ? 140 : 100.5, ...(unit === undefined ? {} : { unit }) })),
  });
}

interface Outputs {
  markdown: string;
  json: { verdict: string; metrics: Array<{ name: string; status: string; unit?: string }> };
  text: string;
  html: string;
}

let caseNo = 0;

/** Runs check in three formats and report --html on one history + run; asserts exit codes and no stack. */
async function everyOutput(
  names: readonly string[],
  options: { unit?: string; series?: string; title?: string } = {},
): Promise<Outputs> {
  const dir = `c${++caseNo}`;
  const series = options.series ?? 'default';
  const history = work.write(`${dir}/history.jsonl`, historyWith(series, names, options.unit));
  const run = work.write(`${dir}/run.json`, runWith(names, options.unit));
  const config = work.write(`${dir}/bellgate.yml`, CONFIG);
  const base = ['--history', history, '--metrics', run, '--config', config, '--series', series];
  const got: Partial<Record<'markdown' | 'json' | 'text', string>> = {};
  for (const format of ['markdown', 'json', 'text'] as const) {
    const r = await bellgate(work.dir, ['check', ...base, '--format', format]);
    expect(r.stderr).not.toMatch(STACK_LINE);
    expect(r.stderr).not.toMatch(/internal error/);
    expect(r.code, r.stderr).toBe(1); // the first name regressed (140 against 100 ± 1)
    got[format] = r.stdout;
    assertNoPollution();
  }
  const htmlPath = join(work.dir, dir, 'report.html');
  const title = options.title === undefined ? [] : ['--title', options.title];
  const r = await bellgate(work.dir, ['report', ...base, '--html', htmlPath, ...title]);
  expect(r.stderr).not.toMatch(STACK_LINE);
  expect(r.code, r.stderr).toBe(0);
  assertNoPollution();
  return {
    markdown: got.markdown ?? '',
    json: JSON.parse(got.json ?? '{}') as Outputs['json'],
    text: got.text ?? '',
    html: readFileSync(htmlPath, 'utf8'),
  };
}

function assertAllInert(out: Outputs, names: readonly string[]): void {
  assertInertMarkdown(out.markdown);
  assertInertHtml(out.html);
  assertInertText(out.text);
  // Nothing is lost: the JSON report keeps every name exactly, judged.
  const byName = new Map(out.json.metrics.map((m) => [m.name, m]));
  for (const [i, n] of names.entries())
    expect(byName.get(n)?.status, n.slice(0, 60)).toBe(i === 0 ? 'regressed' : 'ok');
  expect(out.json.verdict).toBe('regressed');
}

describe('hostile metric names through check (markdown, json, text) and report --html', () => {
  it.each(SHOWN.map((n) => [n.length > 60 ? `${n.slice(0, 20)}… (${n.length})` : n, n] as const))(
    'shows %j inert in every output',
    async (_label, name) => {
      // The hostile name regresses (so it reaches the flagged table and the pictures); a calm
      // neighbour keeps the collapsed table in use.
      const out = await everyOutput([name, 'calm/neighbour']);
      assertAllInert(out, [name, 'calm/neighbour']);
      counter.add('names shown', 'ok');
    },
  );

  it('shows every hostile name at once, calm ones in the collapsed table, with a hostile unit', async () => {
    const names = ['lead/regressing', ...SHOWN];
    const unit = '<img src=x onerror=alert(1)>|@u';
    const out = await everyOutput(names, { unit });
    assertAllInert(out, names);
    const rows = out.markdown.split('\n').filter((l) => l.startsWith('| ') && !l.startsWith('| status'));
    expect(rows.length).toBe(names.length); // one row per metric: no name split or swallowed a row
    expect(out.json.metrics.every((m) => m.unit === unit)).toBe(true);
    counter.add('names shown', 'ok');
  });

  it('keeps a hostile series and page title inert', async () => {
    const series = '<img src=x onerror=alert(1)> @team #1 | --> `x`';
    const out = await everyOutput(['api/latency'], { series, title: '</title><script>alert(1)</script>' });
    assertAllInert(out, ['api/latency']);
    counter.add('series and title', 'ok');
  });
});

describe('names every reader refuses, with exit 2 and a clear message', () => {
  it.each(REFUSED.map(([n, m]) => [JSON.stringify(n.slice(0, 24)), n, m] as const))(
    'refuses %s',
    async (_label, name, message) => {
      const dir = `refused${++caseNo}`;
      const run = work.write(`${dir}/run.json`, runWith(['ok/one', name]));
      const history = work.write(`${dir}/history.jsonl`, historyWith('default', ['ok/one']));
      for (const format of ['markdown', 'json', 'text'] as const) {
        const r = await bellgate(work.dir, ['check', '--metrics', run, '--history', history, '--format', format]);
        expect(r.code).toBe(2);
        expect(r.stdout).toBe('');
        expect(r.stderr).toMatch(message);
        expect(r.stderr).toContain('run.json');
        expect(r.stderr).toMatch(/fix: /);
        expect(r.stderr).not.toMatch(STACK_LINE);
        // The refusal quotes the name through JSON.stringify or a short prefix, never raw.
        expect(r.stderr).not.toMatch(/[\u0000-\u0009\u000B-\u001F\u007F-\u009F\u202A-\u202E\u2066-\u2069]/u);
        expect(r.stderr.length).toBeLessThan(2000);
      }
      const html = join(work.dir, dir, 'r.html');
      const r = await bellgate(work.dir, ['report', '--history', history, '--metrics', run, '--html', html]);
      expect(r.code).toBe(2);
      expect(r.stderr).toMatch(message);
      assertNoPollution();
      counter.add('names refused', 'refused');
    },
  );
});

describe('names that reached a history by hand (not through a reader) are still shown inert', () => {
  // A history document is data too: an edited or imported one may hold names no reader accepts.
  const odd = [
    'a\u202Ereversed\u202C',
    'esc\u001b[2J\u001b[31mred',
    'tab\there\nnewline',
    'x'.repeat(10 * 1024),
    'nul\u0000',
  ];
  it('check (missing metrics) and report --html (newest run) clean them', async () => {
    const dir = `byhand${++caseNo}`;
    const history = work.write(`${dir}/history.jsonl`, historyWith('default', ['ok/one', ...odd]));
    const run = work.write(`${dir}/run.json`, runWith(['ok/one']));
    for (const format of ['markdown', 'text'] as const) {
      const r = await bellgate(work.dir, ['check', '--metrics', run, '--history', history, '--format', format]);
      expect(r.stderr).not.toMatch(STACK_LINE);
      expect([0, 1, 2]).toContain(r.code);
      if (r.code !== 2) {
        if (format === 'markdown') assertInertMarkdown(r.stdout);
        else assertInertText(r.stdout);
        expect(r.stdout.length).toBeLessThan(8000); // the 10 KB name is cut for display
      } else {
        expect(r.stderr).toMatch(/fix: /);
      }
    }
    const html = join(work.dir, dir, 'r.html');
    const r = await bellgate(work.dir, ['report', '--history', history, '--html', html]);
    expect(r.stderr).not.toMatch(STACK_LINE);
    if (r.code === 0) assertInertHtml(readFileSync(html, 'utf8'));
    else expect(r.code).toBe(2);
    assertNoPollution();
    counter.add('names in history', r.code === 0 ? 'ok' : 'refused');
  });
});

describe('explain and --out with hostile names', () => {
  it('explain prints a hostile name (from the history or the argument) without escapes; --out files are inert', async () => {
    const names = ['<img src=x onerror=alert(1)>', 'esc\u001b[2J\u001b[31mred', 'a\u202Ereversed', '__proto__'];
    const dir = `explain${++caseNo}`;
    const history = work.write(`${dir}/history.jsonl`, historyWith('default', names));
    const run = work.write(`${dir}/run.json`, runWith(['<img src=x onerror=alert(1)>', '__proto__']));
    for (const name of names) {
      const r = await bellgate(work.dir, ['explain', name, '--history', history]);
      expect(r.stderr).not.toMatch(STACK_LINE);
      expect([0, 2], r.stderr).toContain(r.code);
      assertInertText((r.stdout + r.stderr).replace(/\n/g, ' '));
      counter.add('explain', r.code === 0 ? 'ok' : 'refused');
    }
    const unknown = await bellgate(work.dir, ['explain', 'nope\u001b[2J\u202E', '--history', history]);
    expect(unknown.code).toBe(2);
    assertInertText(unknown.stderr.replace(/\n/g, ' '));
    counter.add('explain', 'refused');
    const out = join(work.dir, dir, 'out');
    const r = await bellgate(work.dir, [
      'check',
      '--metrics',
      run,
      '--history',
      history,
      '--config',
      work.write(`${dir}/c.yml`, CONFIG),
      '--out',
      out,
    ]);
    expect([0, 1], r.stderr).toContain(r.code);
    assertInertMarkdown(readFileSync(join(out, 'report.md'), 'utf8'));
    assertInertText(readFileSync(join(out, 'report.txt'), 'utf8'));
    expect(
      (JSON.parse(readFileSync(join(out, 'report.json'), 'utf8')) as Outputs['json']).metrics.map((m) => m.name),
    ).toEqual(expect.arrayContaining(names));
    assertNoPollution();
    counter.add('check --out', 'ok');
  });
});

describe('long names quoted in refusals', () => {
  it('a 10 KB name quoted in a refusal is cut, with its length, in every format that quotes it', async () => {
    const long = 'y'.repeat(10 * 1024);
    const files: Array<[string, string]> = [
      ['long.json', JSON.stringify({ metrics: [{ name: long, value: 'x' }] })],
      ['long.csv', `name,value\n${long},x\n`],
      ['long.jsonl', `${JSON.stringify({ name: long, value: 1, unit: 5 })}\n`],
    ];
    for (const [file, text] of files) {
      const path = work.write(`long/${file}`, text);
      const r = await bellgate(work.dir, ['check', '--metrics', path]);
      expect(r.code).toBe(2);
      expect(r.stderr.length, file).toBeLessThan(1000);
      expect(r.stderr, file).not.toContain(long.slice(0, 200));
      counter.add('names refused', 'refused');
    }
  });
});

describe('the output checks themselves can fail', () => {
  // Without these, a checker that never looks would pass every case above.
  it('flags raw tags, links, mentions, references, broken rows and script URLs', () => {
    const head = '| status | metric | baseline (mean ± sd) | this run | change | sigma | rel. density vs cutoff |';
    const row = (name: string) => `${head}\n| ok | ${name} | 1 | 1 | 0% | 0 | 1 |`;
    for (const name of [
      '<img src=x onerror=alert(1)>',
      '[a](javascript:alert(1))',
      '@team',
      'fixes #12',
      'a|b',
      'x`y',
      'https://evil.example',
      'a\u202Eb',
    ]) {
      expect(() => assertInertMarkdown(row(name)), name).toThrow();
    }
    expect(() => assertInertMarkdown(row('a\\|b @\u200Bx \\#\u200B1'))).not.toThrow();
    const page = (body: string) =>
      `<html><head><meta http-equiv="Content-Security-Policy" content="default-src 'none'"></head><body>${body}<script></script></body></html>`;
    for (const body of [
      '<img src=x>',
      '<a href="javascript:alert(1)">x</a>',
      '<p title="" onclick="x">',
      '<p title=x>',
      '<script>x</script>',
    ]) {
      expect(() => assertInertHtml(page(body)), body).toThrow();
    }
    expect(() => assertInertHtml(page('<p title="&quot; onclick=&quot;x">&lt;img&gt;</p>'))).not.toThrow();
    expect(() => assertInertText('\u001b[31mred')).toThrow();
  });
  it('InputError.describe shows quoted controls and bidi overrides as code points', async () => {
    const { InputError } = await import('../../src/errors/input-error.js');
    const text = new InputError('metric name "a\u202Eb\u001b[2J\u009bc" is bad', {
      where: 'run.json:1:2',
      fix: 'rename it',
    }).describe();
    expect(text).toBe('run.json:1:2: metric name "a\\u{202E}b\\u{001B}[2J\\u{009B}c" is bad\n  fix: rename it');
    // Prose between two short quotes is never taken for a long quote; a long quote is cut.
    const prose = `"a" ${'word '.repeat(60)}"b"`;
    expect(new InputError(prose).describe()).toBe(prose);
    expect(new InputError(`name "${'z'.repeat(500)}" bad`).describe()).toBe(
      `name "${'z'.repeat(60)}…" (500 characters) bad`,
    );
  });
});
