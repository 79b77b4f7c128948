// Units against the history in `record` and `import`: a unit that converts is converted to the
// unit the history first saw (1 s = 1000 ms, 1 KiB = 1024 B: SI and IEC definitions, from
// memory), one that does not is refused naming the file, the line, the metric and both units, and
// the stored column is never relabelled. A time of day without a zone is refused with the fix.
import { readFileSync } from 'node:fs';
import { join } from 'node:path';
import { afterAll, describe, expect, it } from 'vitest';
import { bellgate, noStack, scratch } from './helpers/cli-harness.js';

const work = scratch('bellgate-units-');
afterAll(() => work.remove());
const header = (h: string) => JSON.parse(readFileSync(h, 'utf8').split('\n')[0]!) as { metrics: unknown[] };
const values = (h: string) =>
  readFileSync(h, 'utf8')
    .trimEnd()
    .split('\n')
    .slice(1)
    .map((l) => (JSON.parse(l) as { values: number[] }).values[0]);

describe('record', () => {
  const h = join(work.dir, 'record/history.jsonl');
  const rec = (file: string, id: string) =>
    bellgate(work.dir, ['record', '--metrics', file, '--history', h, '--id', id, '--time', '2026-05-04T10:20:30Z']);

  it('converts 0.121 s into a history in ms (121 ms), keeping the column in ms', async () => {
    const ms = work.write('ms.json', JSON.stringify({ metrics: [{ name: 'time/parse', value: 120, unit: 'ms' }] }));
    const s = work.write('s.json', JSON.stringify({ metrics: [{ name: 'time/parse', value: 0.121, unit: 's' }] }));
    expect((await rec(ms, '1-1')).code).toBe(0);
    const r = await rec(s, '2-1');
    expect(r.code, r.stderr).toBe(0);
    expect(header(h).metrics).toEqual([{ name: 'time/parse', unit: 'ms' }]);
    expect(values(h)[1]).toBeCloseTo(121, 9);
  });

  it('refuses kB into a history in ms, naming the file, line, metric and both units', async () => {
    const kb = work.write('kb.json', `{"metrics": [\n  {"name": "time/parse", "value": 3, "unit": "kB"}\n]}\n`);
    const r = await rec(kb, '3-1');
    expect(r.code).toBe(2);
    expect(r.stderr).toMatch(/kb\.json:2/);
    expect(r.stderr).toMatch(
      /"time\/parse" is in "kB" but its history is in "ms": kB \(size\) cannot be converted to ms \(time\)/,
    );
    noStack(r.stderr);
    expect(header(h).metrics).toEqual([{ name: 'time/parse', unit: 'ms' }]);
    expect(values(h)).toHaveLength(2);
  });

  it('refuses --time without a zone, with the fix', async () => {
    const ms = work.write('ms2.json', JSON.stringify({ 'time/parse': 1 }));
    const r = await bellgate(work.dir, ['record', '--metrics', ms, '--history', h, '--time', '2026-05-04T10:20:30']);
    expect(r.code).toBe(2);
    expect(r.stderr).toMatch(/has no time zone/);
    expect(r.stderr).toMatch(/"2026-05-04T10:20:30Z"/);
  });
});

describe('import', () => {
  it('converts KiB into a history in B, skips ms with its line and both units, and a time without a zone', async () => {
    const h = join(work.dir, 'import/history.jsonl');
    const first = work.write(
      'first.jsonl',
      '{"id":"1-1","time":"2026-05-01T10:00:00Z","metrics":[{"name":"size/app","value":2048,"unit":"B"}]}\n',
    );
    expect((await bellgate(work.dir, ['import', '--history', h, '--runs', first])).code).toBe(0);
    const more = work.write(
      'more.jsonl',
      [
        '{"id":"2-1","time":"2026-05-02T10:00:00Z","metrics":[{"name":"size/app","value":2,"unit":"KiB"}]}',
        '{"id":"3-1","time":"2026-05-03T10:00:00Z","metrics":[{"name":"size/app","value":5,"unit":"ms"}]}',
        '{"id":"4-1","time":"2026-05-04 10:00","metrics":[{"name":"size/app","value":2049,"unit":"B"}]}',
      ].join('\n'),
    );
    const r = await bellgate(work.dir, ['import', '--history', h, '--runs', more]);
    expect(r.code, r.stderr).toBe(0);
    expect(r.stdout).toMatch(/2 runs added, 0 updated, 0 unchanged, 2 skipped; 3 runs in/);
    expect(r.stderr).toMatch(
      /skipped .*more\.jsonl:2: metric "size\/app" is in "ms" but its history is in "B": ms \(time\) cannot be converted to B \(size\)/,
    );
    expect(r.stderr).toMatch(
      /skipped .*more\.jsonl:3: run "4-1" has a time without a zone, "2026-05-04 10:00".*"2026-05-04T10:00Z"/,
    );
    expect(header(h).metrics).toEqual([{ name: 'size/app', unit: 'B' }]);
    // 2 KiB = 2048 B; run 3-1 is kept without its refused value.
    expect(values(h).slice(0, 2)).toEqual([2048, 2048]);
  });
});

describe('verify', () => {
  it('reports mixed units: 0.121 in a column of about 121 ms (a factor of 1000, 1 s = 1000 ms), at its line', async () => {
    const lines = [
      '{"schema":"bellgate.history/3","series":"default","metrics":[{"name":"time/parse","unit":"ms"}]}',
      ...[120.5, 121.2, 119.8, 0.121, 120.9, 121.4].map(
        (v, i) => `{"id":"${i + 1}-1","time":"2026-05-0${i + 1}T10:00:00.000Z","values":[${v}]}`,
      ),
    ];
    const h = work.write('mixed.jsonl', `${lines.join('\n')}\n`);
    const r = await bellgate(work.dir, ['verify', '--history', h]);
    expect(r.code).toBe(2);
    expect(r.stdout).toMatch(
      /mixed\.jsonl:5: mixed units: "time\/parse" is 0\.121 ms, about 1\/1000 of its median .* ms, as if it was written in another unit; drop the run \(bellgate drop 4-1\)/,
    );
    expect(r.stdout.trimEnd().split('\n')).toHaveLength(1);
  });
});
