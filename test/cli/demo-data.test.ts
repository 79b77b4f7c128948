import { existsSync, readFileSync } from 'node:fs';
import { join, resolve } from 'node:path';
import { afterAll, describe, expect, it } from 'vitest';
import { bellgate, scratch } from './helpers/cli-harness.js';

// The demo's committed files must be exactly what examples/demo/generate.mjs produces, so the
// scenario can be regenerated and reviewed, never hand-edited.
const demo = resolve(import.meta.dirname, '..', '..', 'examples', 'demo');

interface Generator {
  SERIES: string;
  generateScenario: () => { runs: unknown[]; pr: unknown[] };
  renderRunsJsonl: (runs: unknown[]) => string;
  renderPrRun: (pr: unknown[]) => string;
  renderConfig: () => string;
}
const generatorPath = join(demo, 'generate.mjs');
const gen = (await import(generatorPath)) as Generator;
const work = scratch('bellgate-demo-');
afterAll(() => work.remove());

const committed = (name: string): string => readFileSync(join(demo, name), 'utf8');

describe('demo data', () => {
  it('the generator is deterministic', () => {
    expect(JSON.stringify(gen.generateScenario())).toBe(JSON.stringify(gen.generateScenario()));
  });

  it('runs.jsonl, pr-run.json and bellgate.yml equal a fresh generation', () => {
    const { runs, pr } = gen.generateScenario();
    expect(runs).toHaveLength(120);
    expect(committed('runs.jsonl')).toBe(gen.renderRunsJsonl(runs));
    expect(committed('pr-run.json')).toBe(gen.renderPrRun(pr));
    expect(committed('bellgate.yml')).toBe(gen.renderConfig());
  });

  it('history.jsonl equals what `bellgate import` makes of runs.jsonl', async () => {
    const out = join(work.dir, 'history.jsonl');
    const r = await bellgate(work.dir, [
      'import',
      '--history',
      out,
      '--runs',
      join(demo, 'runs.jsonl'),
      '--series',
      gen.SERIES,
    ]);
    expect(r.code, r.stderr).toBe(0);
    expect(readFileSync(out, 'utf8')).toBe(committed('history.jsonl'));
  });
});

describe('bellgate demo', () => {
  it('prints the report, writes the files, explains the CI exit code, and exits 0', async () => {
    const r = await bellgate(work.dir, ['demo', '--out', 'demo-out']);
    expect(r.code, r.stderr).toBe(0);
    expect(r.stdout).toContain('(demo: the verdict would exit 1 in CI');
    for (const f of ['report.md', 'report.json', 'report.txt'])
      expect(existsSync(join(work.dir, 'demo-out', f)), f).toBe(true);
  });

  it('finds the planted changes and nothing else', async () => {
    const r = await bellgate(work.dir, ['demo', '--out', 'demo-out-2']);
    expect(r.code).toBe(0);
    const report = JSON.parse(readFileSync(join(work.dir, 'demo-out-2', 'report.json'), 'utf8')) as {
      verdict: string;
      metrics: Array<{ name: string; status: string }>;
    };
    const status = new Map(report.metrics.map((m) => [m.name, m.status]));
    expect(report.verdict).toBe('regressed');
    expect(status.get('latency/geocode-p95')).toBe('regressed'); // +24% planted by generate.mjs
    expect(status.get('memory/peak-rss')).toBe('improved'); // -11% planted
    expect(status.get('latency/autocomplete-p50')).toBe('new');
    expect(status.get('latency/batch-1k')).toBe('missing');
    const regressed = report.metrics.filter((m) => m.status === 'regressed').map((m) => m.name);
    expect(regressed).toEqual(['latency/geocode-p95']);
  });
});

describe('the explain hint the demo prints', () => {
  it('is a command that works as printed', async () => {
    const r = await bellgate(resolve(demo, '..', '..'), ['demo', '--out', join(work.dir, 'hint')]);
    const hint = r.stdout.split('\n').find((l) => l.trim().startsWith('bellgate explain'));
    expect(hint).toBeDefined();
    const argv = (hint ?? '').trim().split(/\s+/).slice(1);
    const explained = await bellgate(resolve(demo, '..', '..'), argv);
    expect(explained.code, explained.stderr).toBe(0);
    expect(explained.stdout).toContain('latency/geocode-p95');
    expect(explained.stdout).toContain('regressed');
  });
});
