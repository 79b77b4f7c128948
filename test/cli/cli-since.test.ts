import { readFileSync } from 'node:fs';
import { join } from 'node:path';
import { afterAll, describe, expect, it } from 'vitest';
import { serializeHistory } from '../../src/history/document.js';
import type { History } from '../../src/history/history.js';
import { generateHistory } from '../gate/since/generate.js';
import { bellgate, noStack, scratch } from './helpers/cli-harness.js';

// `bellgate since REF` end to end in-process: a generated history written as the file store
// writes it (serializeHistory), read back through the store, reviewed and printed.
const work = scratch();
afterAll(() => work.remove());
const generated = generateHistory({
  before: 40,
  after: 40,
  seed: 3,
  metrics: {
    'build/compile': { steps: [{ offset: 20, factor: 1.08 }] },
    'api/latency': { creep: 0.004 },
    'size/app.js': { level: 40_000, unit: 'B', sd: 0.001 },
  },
});
// The one history layout (src/history): the fields it stores, the merged pull request included.
const stored: History = {
  series: 'default',
  runs: generated.runs.map(({ id, sha, time, pr }) => ({ id, sha, time, pr, ref: 'refs/heads/main', event: 'push' })),
  columns: generated.columns,
};
const file = work.write('history.json', serializeHistory(stored));

describe('bellgate since', () => {
  it('--format json: the stable schema with the step, the creep and the ratio', async () => {
    const r = await bellgate(work.dir, ['since', 'run-40', '--history', file, '--format', 'json']);
    expect(r.stderr).toBe('');
    expect(r.code).toBe(0);
    const doc = JSON.parse(r.stdout) as {
      schema: string;
      reference: { run: string; exact: boolean };
      runs: number;
      metrics: {
        name: string;
        ratio: number;
        status: string;
        steps: { run: string; pr?: number }[];
        creep: { slope: number; p: number; reported: boolean };
      }[];
    };
    expect(doc.schema).toBe('bellgate.since/1');
    expect(doc.reference).toMatchObject({ run: 'run-40', exact: true });
    expect(doc.runs).toBe(40);
    const byName = new Map(doc.metrics.map((m) => [m.name, m]));
    expect(byName.get('build/compile')!.steps.map((s) => s.run)).toEqual([
      expect.stringMatching(/^run-(58|59|60|61|62)$/),
    ]);
    // generate.ts gives run-N the pull request 99 + N: read back from the stored history.
    const step = byName.get('build/compile')!.steps[0]!;
    expect(step.pr).toBe(99 + Number(step.run.slice('run-'.length)));
    expect(byName.get('api/latency')!.creep.reported).toBe(true);
    expect(byName.get('api/latency')!.creep.slope).toBeGreaterThan(0.003);
    expect(byName.get('api/latency')!.creep.slope).toBeLessThan(0.005);
    expect(byName.get('size/app.js')!.status).toBe('unchanged');
    expect(typeof byName.get('size/app.js')!.ratio).toBe('number');
  });

  it('bellgate report --since adds the review section with each changed metric drawn', async () => {
    const out = join(work.dir, 'review.html');
    const r = await bellgate(work.dir, ['report', '--history', file, '--html', out, '--since', 'run-40']);
    expect(r.stderr).toBe('');
    expect(r.code).toBe(0);
    const html = readFileSync(out, 'utf8');
    expect(html).toContain('<section id="since"');
    expect(html.match(/class="since-metric"/g)).toHaveLength(2);
    expect(html).toContain('data-metric="build/compile"');
    expect(html).toContain('data-metric="api/latency"');
  });

  it('text and markdown name the step, the creep and the range', async () => {
    const text = await bellgate(work.dir, ['since', 'run-40', '--history', file]);
    expect(text.code).toBe(0);
    expect(text.stdout).toMatch(/^Bellgate release review — series "default" since run run-40/);
    expect(text.stdout).toMatch(/step \+\d\.\d+% at run run-\d+ \(sha [0-9a-f]{7}, PR #\d+\)/);
    expect(text.stdout).toMatch(/creep \+0\.\d+% per run/);
    expect(text.stdout).toContain('Evidence, not proof');
    const md = await bellgate(work.dir, ['since', 'run-40', '--history', file, '--format', 'markdown']);
    expect(md.stdout.startsWith('### Bellgate release review: ')).toBe(true);
    expect(md.stdout).toContain('| build/compile | **worse** |');
  });

  it('a time between runs stands for the nearest earlier run, and says so', async () => {
    const r = await bellgate(work.dir, ['since', '2026-01-02T15:30:00Z', '--history', file]);
    expect(r.code).toBe(0);
    expect(r.stdout).toContain('Note: no run was recorded at 2026-01-02T15:30:00Z; run run-40');
  });

  it('a commit without a recorded run: with --at the nearest earlier run, without it exit 2 with a fix', async () => {
    const r = await bellgate(work.dir, ['since', 'fedcba9876', '--history', file, '--at', '2026-01-02T15:30:00Z']);
    expect(r.code).toBe(0);
    expect(r.stdout).toContain('commit fedcba9876 has no recorded run; run run-40');
    const bad = await bellgate(work.dir, ['since', 'fedcba9876', '--history', file]);
    expect(bad.code).toBe(2);
    expect(bad.stderr).toContain("give the commit's time");
    noStack(bad.stderr);
  });

  it('bad REF and a missing history: exit 2, one readable message', async () => {
    const r = await bellgate(work.dir, ['since', 'not a ref', '--history', file]);
    expect(r.code).toBe(2);
    expect(r.stderr).toContain('is not a run id of the history');
    noStack(r.stderr);
    const missing = await bellgate(work.dir, ['since', 'run-1', '--history', 'nope.json']);
    expect(missing.code).toBe(2);
    expect(missing.stderr).toContain('no runs to review');
  });
});
