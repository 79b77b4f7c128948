import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import type { Run } from '../../src/inputs/run.js';
import { InputError } from '../../src/errors/input-error.js';
import { attemptOf, replacementKey, type History } from '../../src/history/history.js';
import { appendRun as appendWithReplaced, mergeHistories, trimHistory } from '../../src/history/merge.js';
import { historyArbitrary } from './arbitraries.js';

const appendRun = (...args: Parameters<typeof appendWithReplaced>): History => appendWithReplaced(...args).history;

/** A Run; `units` maps names to units, or one unit string applies to every metric. */
const run = (values: Record<string, number>, units?: string | Record<string, string>): Run => ({
  metrics: new Map(
    Object.entries(values).map(([name, value]) => {
      const unit = typeof units === 'string' ? units : units?.[name];
      return [name, unit === undefined ? { value, count: 1 } : { value, unit, count: 1 }];
    }),
  ),
  meta: new Map(),
});

const day = (d: number): string => new Date(Date.UTC(2026, 2, d, 10)).toISOString();

function base(): History {
  return {
    series: 'linux-x64',
    runs: [
      { id: '8101-1', time: day(1) },
      { id: '8102-1', time: day(2) },
    ],
    columns: new Map([['build/compile', { unit: 's', values: [41.25, 40.875] }]]),
  };
}

/** value of metric `name` in run `id`, NaN when absent. */
const valueAt = (h: History, id: string, name: string): number =>
  h.columns.get(name)?.values[h.runs.findIndex((r) => r.id === id)] ?? NaN;

describe('mergeHistories', () => {
  it('heals two concurrent writers: both appended runs kept, shared runs once', () => {
    const start = base();
    const writerA = appendRun(start, { id: '8103-1', time: day(3) }, run({ 'build/compile': 42 }));
    const writerB = appendRun(
      start,
      { id: '8104-1', time: day(4) },
      run({ 'build/compile': 43, 'bundle/app.js.gz': 40211 }, { 'build/compile': 's', 'bundle/app.js.gz': 'B' }),
    );
    const healed = mergeHistories(writerA, writerB);
    expect(healed.runs.map((r) => r.id)).toEqual(['8101-1', '8102-1', '8103-1', '8104-1']);
    expect(healed.columns.get('build/compile')?.values).toEqual([41.25, 40.875, 42, 43]);
    // the metric only writer B saw is NaN for the run only writer A kept
    expect(healed.columns.get('bundle/app.js.gz')).toEqual({ unit: 'B', values: [NaN, NaN, NaN, 40211] });
    // order of merging does not matter for disjoint writers
    const other = mergeHistories(writerB, writerA);
    expect(other.runs).toEqual(healed.runs);
    expect(other.columns.size).toBe(healed.columns.size);
    for (const [name, column] of healed.columns) expect(other.columns.get(name)).toEqual(column);
  });

  it('the later copy (b) of a duplicated run id wins, whole', () => {
    const a = base();
    const b: History = {
      series: 'linux-x64',
      runs: [{ id: '8102-1', time: day(2), sha: 'fixed' }],
      columns: new Map([['route/match', { values: [7] }]]),
    };
    const m = mergeHistories(a, b);
    expect(m.runs).toEqual([
      { id: '8101-1', time: day(1) },
      { id: '8102-1', time: day(2), sha: 'fixed' },
    ]);
    expect(valueAt(m, '8102-1', 'build/compile')).toBeNaN();
    expect(valueAt(m, '8102-1', 'route/match')).toBe(7);
    expect(valueAt(m, '8101-1', 'build/compile')).toBe(41.25);
  });

  it('orders by time then by id, numerically (run 999 before run 1000), untimed runs first', () => {
    const a: History = {
      series: 's',
      runs: [
        { id: '1000-1', time: day(5) },
        { id: 'late', time: day(9) },
      ],
      columns: new Map(),
    };
    const b: History = {
      series: 's',
      runs: [{ id: '999-1', time: day(5) }, { id: 'old', time: day(1) }, { id: 'untimed' }],
      columns: new Map(),
    };
    expect(mergeHistories(a, b).runs.map((r) => r.id)).toEqual(['untimed', 'old', '999-1', '1000-1', 'late']);
    // times in other offsets compare as instants (RFC 3339 5.8: 16:39:57-08:00 is 00:39:57Z the next day)
    const c: History = {
      series: 's',
      runs: [
        { id: 'x', time: '1996-12-20T00:39:58Z' },
        { id: 'y', time: '1996-12-19T16:39:57-08:00' },
      ],
      columns: new Map(),
    };
    expect(mergeHistories(c, { series: 's', runs: [], columns: new Map() }).runs.map((r) => r.id)).toEqual(['y', 'x']);
  });

  it('property: the union has every id once, and each value comes from the copy that won (fast-check)', () => {
    fc.assert(
      fc.property(historyArbitrary(), historyArbitrary(), (a, b) => {
        const m = mergeHistories(a, b);
        const ids = m.runs.map((r) => r.id);
        expect(new Set(ids).size).toBe(ids.length);
        const dropped = new Set([...(a.dropped?.keys() ?? []), ...(b.dropped?.keys() ?? [])]);
        // A higher attempt of a CI run ("7-2") replaces a lower one ("7-1").
        const all = [...a.runs, ...b.runs].map((r) => r.id).filter((id) => !dropped.has(id));
        const attempt = (id: string) => attemptOf(id)?.attempt ?? 0;
        const kept = all.filter(
          (id) => !all.some((o) => replacementKey(o) === replacementKey(id) && attempt(o) > attempt(id)),
        );
        expect(new Set(ids)).toEqual(new Set(kept));
        expect(new Set(m.dropped?.keys())).toEqual(dropped);
        for (const [name, column] of m.columns) {
          expect(column.values).toHaveLength(ids.length);
          m.runs.forEach((r, i) => {
            const from = b.runs.some((x) => x.id === r.id) ? b : a;
            expect(column.values[i]).toEqual(valueAt(from, r.id, name));
          });
        }
        // merging again, either way round, changes nothing (a store may retry)
        expect(mergeHistories(m, b).runs).toEqual(m.runs);
      }),
      { numRuns: 200 },
    );
  });

  it('honours tombstones: a run one side dropped never comes back from the other side', () => {
    const older = base(); // still holds 8101-1
    const newer: History = {
      ...base(),
      runs: [{ id: '8102-1', time: day(2) }],
      columns: new Map([['build/compile', { unit: 's', values: [40.875] }]]),
      dropped: new Map([['8101-1', { id: '8101-1', reason: 'noisy runner' }]]),
    };
    for (const m of [mergeHistories(older, newer), mergeHistories(newer, older)]) {
      expect(m.runs.map((r) => r.id)).toEqual(['8102-1']);
      expect(m.dropped?.get('8101-1')).toEqual({ id: '8101-1', reason: 'noisy runner' });
    }
  });

  it('folds the marks of both copies of a run, each mark once', () => {
    const a: History = {
      ...base(),
      runs: [
        { id: '8101-1', time: day(1), marks: [{ reason: 'accepted', pr: 4 }] },
        { id: '8102-1', time: day(2) },
      ],
    };
    const b: History = {
      ...base(),
      runs: [
        {
          id: '8101-1',
          time: day(1),
          marks: [
            { reason: 'accepted', pr: 4 },
            { reason: 'manual', metrics: ['build/*'] },
          ],
        },
        { id: '8102-1', time: day(2) },
      ],
    };
    expect(mergeHistories(a, b).runs[0]?.marks).toEqual([
      { reason: 'accepted', pr: 4 },
      { reason: 'manual', metrics: ['build/*'] },
    ]);
  });

  it('a higher attempt of a CI run replaces a lower one from either side', () => {
    const first: History = {
      series: 's',
      runs: [{ id: '77-1', time: day(1) }],
      columns: new Map([['m', { values: [1] }]]),
    };
    const rerun: History = {
      series: 's',
      runs: [{ id: '77-2', time: day(2) }],
      columns: new Map([['m', { values: [2] }]]),
    };
    for (const m of [mergeHistories(first, rerun), mergeHistories(rerun, first)]) {
      expect(m.runs.map((r) => r.id)).toEqual(['77-2']);
      expect(m.columns.get('m')?.values).toEqual([2]);
    }
  });

  it('keeps the unit the history first saw (a): a column is never relabelled', () => {
    const a: History = {
      series: 's',
      runs: [{ id: 'x', time: day(1) }],
      columns: new Map([['m', { unit: 'ms', values: [1] }]]),
    };
    const b: History = {
      series: 's',
      runs: [{ id: 'y', time: day(2) }],
      columns: new Map([['m', { unit: 's', values: [2] }]]),
    };
    expect(mergeHistories(a, b).columns.get('m')?.unit).toBe('ms');
  });

  it('refuses to merge two series', () => {
    expect(() => mergeHistories(base(), { ...base(), series: 'windows' })).toThrow(InputError);
  });
});

describe('appendRun', () => {
  it('adds a column NaN-filled for older runs, records the unit, leaves the input alone', () => {
    const h = base();
    const next = appendRun(
      h,
      { id: '8103-1', time: day(3), sha: 'c7d8' },
      run({ 'build/compile': 42.5, 'tiles/render-p95': 0.0183 }, 's'),
    );
    expect(next.runs.at(-1)).toEqual({ id: '8103-1', time: day(3), sha: 'c7d8' });
    expect(next.columns.get('tiles/render-p95')).toEqual({ unit: 's', values: [NaN, NaN, 0.0183] });
    expect(h.runs).toHaveLength(2);
    expect(h.columns.get('build/compile')?.values).toEqual([41.25, 40.875]);
  });

  it('replaces a run with the same id instead of adding a second, and says which', () => {
    const next = appendWithReplaced(base(), { id: '8102-1', time: day(2) }, run({ 'build/compile': 39 }));
    expect(next.history.runs.map((r) => r.id)).toEqual(['8101-1', '8102-1']);
    expect(next.history.columns.get('build/compile')?.values).toEqual([41.25, 39]);
    expect(next.replaced).toBe('8102-1');
  });

  it('a re-run attempt replaces the earlier attempt; an older attempt recorded late changes nothing', () => {
    const rerun = appendWithReplaced(base(), { id: '8102-2', time: day(3) }, run({ 'build/compile': 39 }));
    expect(rerun.history.runs.map((r) => r.id)).toEqual(['8101-1', '8102-2']);
    expect(rerun.replaced).toBe('8102-1');
    const late = appendWithReplaced(rerun.history, { id: '8102-1', time: day(2) }, run({ 'build/compile': 50 }));
    expect(late.history.runs.map((r) => r.id)).toEqual(['8101-1', '8102-2']);
    expect(late.replaced).toBeUndefined();
  });

  it('refuses a dropped id; converts a value in another unit to the stored one, refuses one that does not convert (never relabelled)', () => {
    const h: History = { ...base(), dropped: new Map([['8099-1', { id: '8099-1' }]]) };
    expect(() => appendRun(h, { id: '8099-1', time: day(3) }, run({ 'build/compile': 1 }))).toThrow(/was dropped/);
    // 41000 ms = 41 s (1 s = 1000 ms): converted to the stored unit, the column keeps "s".
    const converted = appendRun(base(), { id: 'x', time: day(3) }, run({ 'build/compile': 41000 }, 'ms'));
    expect(converted.columns.get('build/compile')?.unit).toBe('s');
    expect(converted.columns.get('build/compile')?.values.at(-1)).toBe(41);
    expect(() => appendRun(base(), { id: 'x', time: day(3) }, run({ 'build/compile': 41 }, 'kB'))).toThrow(
      /"build\/compile" is in "kB" but its history is in "s": kB \(size\) cannot be converted to s \(time\)/,
    );
    // a metric without a unit takes the first one it is given
    const first = appendRun(
      appendRun(base(), { id: 'y', time: day(3) }, run({ k: 1 })),
      { id: 'z', time: day(4) },
      run({ k: 2 }, 'B'),
    );
    expect(first.columns.get('k')?.unit).toBe('B');
  });

  it('puts a late-arriving older run at its place in time', () => {
    const next = appendRun(base(), { id: '8100-1', time: '2026-02-28T10:00:00.000Z' }, run({ 'build/compile': 40 }));
    expect(next.runs.map((r) => r.id)).toEqual(['8100-1', '8101-1', '8102-1']);
  });

  it('refuses a non-finite value or an empty id with InputError', () => {
    expect(() => appendRun(base(), { id: 'x', time: day(3) }, run({ m: NaN }))).toThrow(InputError);
    expect(() => appendRun(base(), { id: 'x', time: day(3) }, run({ m: Infinity }))).toThrow(/not a finite number/);
    expect(() => appendRun(base(), { id: ' ' }, run({ m: 1 }))).toThrow(InputError);
  });

  it('handles __proto__ as a metric name', () => {
    const next = appendRun(base(), { id: 'p', time: day(3) }, run({ ['__proto__']: 5 }));
    expect(next.columns.get('__proto__')?.values).toEqual([NaN, NaN, 5]);
  });
});

describe('trimHistory', () => {
  it('keeps the newest runs, drops columns left empty, keeps the tombstones', () => {
    let h: History = { ...base(), dropped: new Map([['8000-1', { id: '8000-1' }]]) };
    h = appendRun(h, { id: '8103-1', time: day(3) }, run({ 'bundle/app.js.gz': 40211 }));
    h = appendRun(h, { id: '8104-1', time: day(4) }, run({ 'build/compile': 43 }, 's'));
    const t = trimHistory(h, 1);
    expect(t.runs.map((r) => r.id)).toEqual(['8104-1']);
    expect([...t.columns.keys()]).toEqual(['build/compile']); // bundle column became all-NaN
    expect([...(t.dropped?.keys() ?? [])]).toEqual(['8000-1']);
    expect(trimHistory(h, 10).runs).toHaveLength(4);
    expect(trimHistory(h, Infinity).runs).toHaveLength(4);
  });

  it('refuses a keep that is not a whole number of at least 1', () => {
    for (const keep of [0, -1, 2.5, NaN]) expect(() => trimHistory(base(), keep)).toThrow(InputError);
  });
});
