// `bellgate check` against a history built with `bellgate record` (the CLI's own writer, whatever
// the stored layout): units converted to the history's or refused, values the run holds but does
// not judge (OpenMetrics NaN/+Inf samples, failed and skipped JUnit cases) shown in the report,
// the missing-metrics policy, and `record --time` without a zone. Unit factors are the SI and IEC
// definitions (1 s = 1000 ms, 1 kB = 1000 B).
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { bellgate, noStack, scratch } from './helpers/cli-harness.js';

const work = scratch('bellgate-check-history-');
afterAll(() => work.remove());
const NOISE = [0.3, -0.8, 1.1, -0.2, 0.6, -1.0, 0.1, 0.9, -0.5, 0.4];

async function record(history: string, file: string, i: number): Promise<void> {
  const r = await bellgate(work.dir, [
    'record',
    '--metrics',
    file,
    '--history',
    history,
    '--id',
    `${100 + i}-1`,
    '--time',
    new Date(Date.UTC(2026, 2, 1 + i)).toISOString(),
  ]);
  expect(r.code, r.stderr).toBe(0);
}

async function json(args: string[]): Promise<{ code: number; stderr: string; report: Record<string, unknown> }> {
  const r = await bellgate(work.dir, ['check', ...args, '--format', 'json']);
  return {
    code: r.code,
    stderr: r.stderr,
    report: r.code < 2 ? (JSON.parse(r.stdout) as Record<string, unknown>) : {},
  };
}

describe('units against the history', () => {
  const history = 'units/history.json';
  beforeAll(async () => {
    for (let i = 0; i < 10; i++) {
      work.write(
        'units/run.json',
        JSON.stringify({ metrics: [{ name: 'route/match', value: 121 + 0.5 * NOISE[i]!, unit: 'ms' }] }),
      );
      await record(history, 'units/run.json', i);
    }
  });

  it('0.121 s against a history in ms is judged as 121 ms: ok, not "improved by 99.9%"', async () => {
    work.write('units/s.json', JSON.stringify({ metrics: [{ name: 'route/match', value: 0.121, unit: 's' }] }));
    const { code, report } = await json(['--metrics', 'units/s.json', '--history', history]);
    expect(code).toBe(0);
    const m = (report.metrics as Record<string, unknown>[])[0]!;
    expect(m).toMatchObject({ name: 'route/match', status: 'ok', unit: 'ms' });
    expect(m.value as number).toBeCloseTo(121, 9);
    expect(Math.abs(m.change as number)).toBeLessThan(0.01);
  });

  it('121000 us converts too; kB is refused with the file, line, metric and both units', async () => {
    work.write('units/us.json', JSON.stringify({ metrics: [{ name: 'route/match', value: 121000, unit: 'us' }] }));
    expect((await json(['--metrics', 'units/us.json', '--history', history])).code).toBe(0);
    work.write('units/kb.json', JSON.stringify({ metrics: [{ name: 'route/match', value: 3, unit: 'kB' }] }));
    const r = await bellgate(work.dir, ['check', '--metrics', 'units/kb.json', '--history', history]);
    expect(r.code).toBe(2);
    expect(r.stderr).toMatch(/units\/kb\.json:\d+/);
    expect(r.stderr).toMatch(
      /metric "route\/match" is in "kB" but its history is in "ms": kB \(size\) cannot be converted to ms \(time\)/,
    );
    noStack(r.stderr);
  });
});

describe('values the run holds but does not judge', () => {
  it('an OpenMetrics NaN sample is shown, with its line, instead of turning the metric silently missing', async () => {
    const history = 'om/history.json';
    for (let i = 0; i < 10; i++) {
      work.write(
        'om/run.prom',
        `# TYPE queue_depth gauge\nqueue_depth ${40 + NOISE[i]!}\n# TYPE rss gauge\nrss ${900 + NOISE[i]!}\n# EOF\n`,
      );
      await record(history, 'om/run.prom', i);
    }
    work.write('om/now.prom', '# TYPE queue_depth gauge\nqueue_depth NaN\n# TYPE rss gauge\nrss +Inf\n# EOF\n');
    const { code, report } = await json(['--metrics', 'om/now.prom', '--history', history]);
    expect(code).toBe(0);
    expect(report.notJudged).toEqual([
      { name: 'queue_depth', reason: 'value is NaN at om/now.prom:2' },
      { name: 'rss', reason: 'value is +Inf at om/now.prom:4' },
    ]);
    const queue = (report.metrics as { name: string; status: string; reason: string }[]).find(
      (m) => m.name === 'queue_depth',
    );
    expect(queue).toMatchObject({ status: 'missing' });
    expect(queue?.reason).toMatch(/not judged in this run: value is NaN at om\/now\.prom:2/);
    // Both baseline metrics are gone: the missing-metrics line and the not-judged line lead the text report.
    const text = await bellgate(work.dir, ['check', '--metrics', 'om/now.prom', '--history', history]);
    const lines = text.stdout.split('\n');
    expect(lines[0]).toBe(
      'note: 2 of 2 baseline metrics are missing from this run: check that every benchmark ran and wrote its file',
    );
    expect(lines[1]).toBe(
      'note: 2 values not judged nor recorded: queue_depth (value is NaN at om/now.prom:2), rss (value is +Inf at om/now.prom:4)',
    );
    expect(text.stderr).toMatch(/warning: 2 of 2 baseline metrics are missing/);
  });

  it('failed and skipped JUnit cases are shown with their outcome', async () => {
    const history = 'junit/history.json';
    const suite = (parse: string, render: string) =>
      `<testsuite name="api" time="3"><testcase name="parse" time="${parse}"/><testcase name="render" time="${render}"/></testsuite>`;
    for (let i = 0; i < 10; i++) {
      work.write('junit/run.xml', suite(String(1.2 + 0.01 * NOISE[i]!), String(0.8 + 0.01 * NOISE[i]!)));
      await record(history, 'junit/run.xml', i);
    }
    work.write(
      'junit/now.xml',
      '<testsuite name="api" time="3"><testcase name="parse" time="9"><failure message="expected 200, got 500"/></testcase><testcase name="render" time="0"><skipped/></testcase></testsuite>',
    );
    const { report } = await json(['--metrics', 'junit/now.xml', '--history', history]);
    expect(report.notJudged).toEqual([
      { name: 'api/parse', reason: 'failed: expected 200, got 500' },
      { name: 'api/render', reason: 'skipped' },
    ]);
    const parse = (report.metrics as { name: string; status: string; reason: string }[]).find(
      (m) => m.name === 'api/parse',
    );
    expect(parse?.status).toBe('missing');
    expect(parse?.reason).toMatch(/not judged in this run: failed: expected 200, got 500/);
  });
});

describe('--missing-metrics', () => {
  const history = 'missing/history.json';
  beforeAll(async () => {
    for (let i = 0; i < 10; i++) {
      work.write(
        'missing/run.json',
        JSON.stringify(Object.fromEntries(['a', 'b', 'c', 'd'].map((n, k) => [`time/${n}`, 10 * (k + 1) + NOISE[i]!]))),
      );
      await record(history, 'missing/run.json', i);
    }
    work.write('missing/one.json', JSON.stringify({ 'time/a': 10 }));
  });

  it('warns by default (exit 0) and the report opens with "3 of 4 baseline metrics"', async () => {
    const r = await bellgate(work.dir, ['check', '--metrics', 'missing/one.json', '--history', history]);
    expect(r.code).toBe(0);
    expect(r.stdout.split('\n')[0]).toMatch(/^note: 3 of 4 baseline metrics are missing from this run/);
    expect(r.stderr).toMatch(
      /warning: 3 of 4 baseline metrics are missing from this run; --missing-metrics fail makes this exit 2/,
    );
  });

  it('--missing-metrics fail exits 2; half missing is not "mostly"', async () => {
    expect(
      (
        await bellgate(work.dir, [
          'check',
          '--metrics',
          'missing/one.json',
          '--history',
          history,
          '--missing-metrics',
          'fail',
        ])
      ).code,
    ).toBe(2);
    work.write('missing/two.json', JSON.stringify({ 'time/a': 10, 'time/b': 20 }));
    const half = await bellgate(work.dir, [
      'check',
      '--metrics',
      'missing/two.json',
      '--history',
      history,
      '--missing-metrics',
      'fail',
    ]);
    expect(half.code).toBe(0);
    expect(half.stdout).not.toMatch(/baseline metrics are missing/);
  });
});

describe('record --time', () => {
  it('refuses a time without a zone, with the fix', async () => {
    work.write('t/run.json', JSON.stringify({ 'time/a': 1 }));
    const r = await bellgate(work.dir, [
      'record',
      '--metrics',
      't/run.json',
      '--history',
      't/h.json',
      '--time',
      '2026-05-04T10:20:30',
    ]);
    expect(r.code).toBe(2);
    expect(r.stderr).toMatch(/--time "2026-05-04T10:20:30" has no time zone/);
    expect(r.stderr).toMatch(/"2026-05-04T10:20:30Z" for UTC/);
  });
});
