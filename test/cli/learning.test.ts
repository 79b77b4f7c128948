// A `learning` report says how many baseline runs there are and how many are needed (min-runs is
// 8 by default, README.md "Configuration"), and how to get them sooner. Invented data.
import { join } from 'node:path';
import { afterAll, describe, expect, it } from 'vitest';
import { bellgate, scratch } from './helpers/cli-harness.js';

const work = scratch('bellgate-learning-');
afterAll(() => work.remove());
const bench = work.write('bench.json', JSON.stringify({ 'time/parse': 12.5 }));

describe('a learning report', () => {
  it('with 5 recorded runs: "holds 5 runs ... 8 (min-runs): 3 more", first in text and markdown', async () => {
    const runs = Array.from({ length: 5 }, (_, i) =>
      JSON.stringify({ id: `${i + 1}-1`, time: `2026-04-0${i + 1}T10:00:00Z`, metrics: { 'time/parse': 12 + i / 10 } }),
    );
    const h = join(work.dir, 'h.jsonl');
    expect(
      (await bellgate(work.dir, ['import', '--history', h, '--runs', work.write('r.jsonl', runs.join('\n'))])).code,
    ).toBe(0);
    const text = await bellgate(work.dir, ['check', '--metrics', bench, '--history', h]);
    expect(text.code).toBe(0);
    expect(text.stdout.split('\n')[0]).toBe(
      'note: learning: the baseline holds 5 runs; a metric is judged once it has 8 (min-runs): 3 more; record runs on the baseline branch, or seed the history with `bellgate import`',
    );
    const md = await bellgate(work.dir, ['check', '--metrics', bench, '--history', h, '--format', 'markdown']);
    expect(md.stdout.split('\n')[0]).toMatch(
      /^> \*\*Note:\*\* learning: the baseline holds 5 runs; .*8 \\\(min-runs\\\): 3 more/,
    );
  });

  it('without any history: says there are no runs yet and how to seed them', async () => {
    const r = await bellgate(work.dir, ['check', '--metrics', bench]);
    expect(r.stdout.split('\n')[0]).toMatch(
      /^note: learning: the history holds no runs of these metrics yet; .*bellgate import/,
    );
  });
});
