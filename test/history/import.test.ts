import { describe, expect, it } from 'vitest';
import { InputError } from '../../src/errors/input-error.js';
import type { History } from '../../src/history/history.js';
import { importRuns, parseImportRuns } from '../../src/history/import.js';

const stored = (): History => ({
  series: 'linux-x64',
  runs: [{ id: '8101-1', time: '2026-03-01T10:00:00.000Z', sha: 'aaa' }],
  columns: new Map([['build/compile', { unit: 's', values: [41.25] }]]),
});

describe('parseImportRuns: JSON Lines', () => {
  const text = [
    '{"id":"8101-1","time":"2026-03-01T10:00:00Z","sha":"aaa","metrics":{"build/compile":41.25}}',
    '{"id":"8102-1","time":"2026-03-02T10:00:00+01:00","sha":"bbb","ref":"refs/heads/main","metrics":[{"name":"build/compile","value":40.5,"unit":"s"},{"name":"bundle/app.js.gz","value":40211,"unit":"B"}]}',
    '',
    '{"time":"2026-03-03T10:00:00Z","metrics":{"a":1}}',
    '{"id":"8104-1","time":"yesterday","metrics":{"a":1}}',
    '{"id":"8105-1","time":"2026-03-05","metrics":{"a":1e999,"b":"7","__proto__":3}}',
    '{"id":"8106-1", "time": ',
    '{"id":8107,"time":"2026-03-07T10:00:00Z","metrics":{"a":2},"units":{"a":"ms"}}',
  ].join('\n');

  it('reads each run and says why each line or value was left out', async () => {
    const { runs, skipped } = await parseImportRuns(text, 'runs.jsonl');
    expect(runs.map((r) => r.info.id)).toEqual(['8101-1', '8102-1', '8105-1', '8107']);
    // RFC 3339 offsets are normalised to UTC: 10:00+01:00 is 09:00Z
    expect(runs[1]?.info).toEqual({
      id: '8102-1',
      time: '2026-03-02T09:00:00.000Z',
      sha: 'bbb',
      ref: 'refs/heads/main',
    });
    expect(runs[1]?.units.get('bundle/app.js.gz')).toBe('B');
    expect([...(runs[2]?.metrics ?? [])]).toEqual([['__proto__', 3]]);
    expect(runs[3]?.units.get('a')).toBe('ms');
    expect(skipped).toEqual([
      { where: 'runs.jsonl:4', reason: expect.stringMatching(/^no id/) },
      { where: 'runs.jsonl:5', reason: expect.stringMatching(/bad time "yesterday"/) },
      { where: 'runs.jsonl:6', reason: expect.stringMatching(/"a".*not a finite number/) },
      { where: 'runs.jsonl:6', reason: expect.stringMatching(/"b".*"7" is text, not a number/) },
      { where: 'runs.jsonl:7', reason: expect.stringMatching(/not valid JSON/) },
    ]);
  });

  it('counts added, updated, unchanged and passes the skipped on', async () => {
    const outcome = importRuns(stored(), await parseImportRuns(text, 'runs.jsonl'));
    expect(outcome).toMatchObject({ added: 3, updated: 0, unchanged: 1 });
    expect(outcome.skipped).toHaveLength(5);
    expect(outcome.history.runs.map((r) => r.id)).toEqual(['8101-1', '8102-1', '8105-1', '8107']);
    expect(outcome.history.columns.get('build/compile')?.values).toEqual([41.25, 40.5, NaN, NaN]);
    // importing the same file again changes nothing
    const again = importRuns(outcome.history, await parseImportRuns(text, 'runs.jsonl'));
    expect(again).toMatchObject({ added: 0, updated: 0, unchanged: 4 });
    expect(again.history).toEqual(outcome.history);
  });

  it('a run id given twice: the later line is kept and the earlier one is noted', async () => {
    const twice =
      '{"id":"1","time":"2026-03-01","metrics":{"a":1}}\n{"id":"1","time":"2026-03-01","metrics":{"a":2}}\n';
    const parsed = await parseImportRuns(twice, 'r.jsonl');
    expect(parsed.runs.map((r) => r.metrics.get('a'))).toEqual([2]);
    expect(parsed.skipped).toEqual([{ where: 'r.jsonl:1', reason: expect.stringMatching(/appears again on line 2/) }]);
  });
});

describe('parseImportRuns: CSV', () => {
  it('reads the long form (one row per run and metric) and joins rows of one run', async () => {
    const csv = [
      'id,time,sha,ref,name,value,unit',
      '8101-1,2026-03-01T10:00:00Z,aaa,,build/compile,41.25,s',
      '8102-1,2026-03-02T10:00:00Z,bbb,refs/heads/main,build/compile,40.5,s',
      '8102-1,2026-03-02T10:00:00Z,bbb,refs/heads/main,"bundle/app.js,gz",40211,B',
      '8102-1,2026-03-04T10:00:00Z,bbb,refs/heads/main,other,1,',
      '8103-1,2026-03-03T10:00:00Z,ccc,refs/heads/main,build/compile,NaN,s',
      ',2026-03-03T10:00:00Z,ddd,,build/compile,1,s',
      '8104-1,2026-03-04T10:00:00Z,eee,,build/compile,0x10,s',
      '8105-1,2026-03-05T10:00:00Z,fff,,build/compile,39.9',
    ].join('\r\n');
    const parsed = await parseImportRuns(csv, 'runs.csv');
    expect(parsed.runs.map((r) => r.info.id)).toEqual(['8101-1', '8102-1']);
    expect([...(parsed.runs[1]?.metrics ?? [])]).toEqual([
      ['build/compile', 40.5],
      ['bundle/app.js,gz', 40211],
    ]);
    expect(parsed.runs[1]?.units.get('bundle/app.js,gz')).toBe('B');
    expect(parsed.skipped.map((s) => s.where)).toEqual([
      'runs.csv:5',
      'runs.csv:6',
      'runs.csv:7',
      'runs.csv:8',
      'runs.csv:9',
      'runs.csv',
      'runs.csv',
    ]);
    expect(parsed.skipped.map((s) => s.reason)).toEqual([
      expect.stringMatching(/has time .* on an earlier row/),
      expect.stringMatching(/"NaN" is not a number/),
      expect.stringMatching(/^no id/),
      expect.stringMatching(/"0x10" is not a number/),
      expect.stringMatching(/6 cells for 7 columns/),
      expect.stringMatching(/"8103-1" has no metric values/),
      expect.stringMatching(/"8104-1" has no metric values/),
    ]);
    const outcome = importRuns(stored(), parsed);
    // 8101-1 in the file equals the stored copy (same instant, sha, value; an empty ref cell is no ref)
    expect(outcome).toMatchObject({ added: 1, updated: 0, unchanged: 1 });
  });

  it('notes a metric given twice for one run (long form); the later row counts', async () => {
    const parsed = await parseImportRuns('id,time,name,value\n1,2026-03-01,a,1\n1,2026-03-01,a,2\n', 'd.csv');
    expect(parsed.runs[0]?.metrics.get('a')).toBe(2);
    expect(parsed.skipped).toEqual([
      { where: 'd.csv:3', reason: expect.stringMatching(/"a" of run "1" was given before/) },
    ]);
  });

  it('reads the wide form (one row per run), units from "name [unit]" headers, empty cells as missing', async () => {
    const csv = [
      'ID,Time,SHA,Ref,build/compile [s],route/match-static [ns],tiles',
      '8101-1,2026-03-01T10:00:00Z,aaa,,41.25,,3',
      '8102-1,2026-03-02 10:00Z,bbb,main,40.5,412.5,',
      '8103-1,2026-03-03,ccc,main,abc,1,2',
    ].join('\n');
    const parsed = await parseImportRuns(csv, 'wide.csv');
    expect(parsed.runs.map((r) => [r.info.id, [...r.metrics]])).toEqual([
      [
        '8101-1',
        [
          ['build/compile', 41.25],
          ['tiles', 3],
        ],
      ],
      [
        '8102-1',
        [
          ['build/compile', 40.5],
          ['route/match-static', 412.5],
        ],
      ],
      [
        '8103-1',
        [
          ['route/match-static', 1],
          ['tiles', 2],
        ],
      ],
    ]);
    expect(parsed.runs[1]?.info).toEqual({ id: '8102-1', time: '2026-03-02T10:00:00.000Z', sha: 'bbb', ref: 'main' });
    expect(parsed.runs[0]?.units.get('build/compile')).toBe('s');
    expect(parsed.skipped).toEqual([
      { where: 'wide.csv:4', reason: expect.stringMatching(/"build\/compile".*"abc" is not a number/) },
    ]);
    const outcome = importRuns(stored(), parsed);
    expect(outcome).toMatchObject({ added: 2, updated: 1, unchanged: 0 });
    expect(outcome.history.columns.get('route/match-static')).toEqual({ unit: 'ns', values: [NaN, 412.5, 1] });
  });

  it('throws InputError for files that are no import form at all', async () => {
    for (const [text, message] of [
      ['', /no runs/],
      ['[{"id":"1"}]', /JSON array/],
      ['name,value\na,1\n', /no "id" column/],
      ['id,time,id\n', /appears twice/],
      ['id,time\n"1,2026-03-01\n', /not valid CSV/],
    ] as const) {
      await expect(parseImportRuns(text, 'x.csv')).rejects.toThrow(InputError);
      await expect(parseImportRuns(text, 'x.csv')).rejects.toThrow(message);
    }
  });
});

describe('importRuns', () => {
  it('accepts a bare list of runs, refuses non-finite values, the later of two copies counts', () => {
    const outcome = importRuns(stored(), [
      {
        info: { id: '8101-1', time: '2026-03-01T10:00:00.000Z', sha: 'aaa' },
        metrics: new Map([['build/compile', 39]]),
        units: new Map(),
      },
      { info: { id: '9', time: '2026-03-09T10:00:00.000Z' }, metrics: new Map([['x', Infinity]]), units: new Map() },
      { info: { id: '10', time: '2026-03-10T10:00:00.000Z' }, metrics: new Map([['x', 1]]), units: new Map() },
      { info: { id: '10', time: '2026-03-10T10:00:00.000Z' }, metrics: new Map([['x', 2]]), units: new Map() },
    ]);
    expect(outcome).toMatchObject({ added: 1, updated: 1, unchanged: 0 });
    expect(outcome.skipped).toEqual([{ where: 'run 9', reason: expect.stringMatching(/not a finite number/) }]);
    expect(outcome.history.columns.get('build/compile')?.values).toEqual([39, NaN]);
    expect(outcome.history.columns.get('x')?.values).toEqual([NaN, 2]);
  });
});
