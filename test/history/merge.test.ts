import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import type { Run } from '../../src/inputs/run.js';
import { InputError } from '../../src/errors/input-error.js';
import type { History, MetricColumn, RunInfo } from '../../src/history/history.js';
import { emptyHistory } from '../../src/history/history.js';
import { appendRun, mergeHistories, trimHistory } from '../../src/history/merge.js';
import { cell, historyArbitrary, metricName, runInfo } from './arbitraries.js';

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
        expect(new Set(ids)).toEqual(new Set([...a.runs, ...b.runs].map((r) => r.id)));
        for (const [name, column] of m.columns) {
          expect(column.values).toHaveLength(ids.length);
          m.runs.forEach((r, i) => {
            const from = b.runs.some((x) => x.id === r.id) ? b : a;
            expect(column.values[i]).toEqual(valueAt(from, r.id, name));
          });
        }
      }),
      { numRuns: 200 },
    );
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

  it('replaces a run with the same id instead of adding a second', () => {
    const next = appendRun(base(), { id: '8102-1', time: day(2) }, run({ 'build/compile': 39 }));
    expect(next.runs.map((r) => r.id)).toEqual(['8101-1', '8102-1']);
    expect(next.columns.get('build/compile')?.values).toEqual([41.25, 39]);
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
  it('keeps the newest runs, drops columns left empty, counts what it deleted', () => {
    let h = base();
    h = appendRun(h, { id: '8103-1', time: day(3) }, run({ 'bundle/app.js.gz': 40211 }));
    h = appendRun(h, { id: '8104-1', time: day(4) }, run({ 'build/compile': 43 }));
    const t = trimHistory(h, 1);
    expect(t.runs.map((r) => r.id)).toEqual(['8104-1']);
    expect([...t.columns.keys()]).toEqual(['build/compile']); // bundle column became all-NaN
    expect(t.trimmed).toBe(3);
    expect(trimHistory(t, 1).trimmed).toBe(3);
    expect(trimHistory(h, 10).runs).toHaveLength(4);
    expect(trimHistory(h, 10).trimmed).toBeUndefined();
    expect(trimHistory(h, Infinity).runs).toHaveLength(4);
  });

  it('refuses a keep that is not a whole number of at least 1', () => {
    for (const keep of [0, -1, 2.5, NaN]) expect(() => trimHistory(base(), keep)).toThrow(InputError);
  });
});

// appendRun has a fast path for a new run that sorts last (append-newest.ts); its definition is
// the merge with a one-run history, so every case must give exactly what that merge gives.
describe('appendRun equals the merge with a one-run history', () => {
  const slow = (h: History, info: RunInfo, r: Run): History => {
    const columns = new Map(
      [...r.metrics].map(([name, m]) => [
        name,
        m.unit === undefined ? { values: [m.value] } : { unit: m.unit, values: [m.value] },
      ]),
    );
    return mergeHistories(h, { series: h.series, runs: [{ ...info }], columns });
  };
  const runArbitrary = fc
    .uniqueArray(
      fc.tuple(
        metricName(),
        cell().filter((v) => !Number.isNaN(v)),
        fc.option(fc.constantFrom('ms', 's', 'B'), { nil: undefined }),
      ),
      { selector: ([n]) => n, maxLength: 5 },
    )
    .map((entries): Run => ({
      metrics: new Map(
        entries.map(([n, value, unit]) => [n, unit === undefined ? { value, count: 1 } : { value, unit, count: 1 }]),
      ),
      meta: new Map(),
    }));
  // Ordered histories (the merge with an empty one sorts them), sometimes with a trimmed count,
  // and a run that is sometimes new and newest (fast path), sometimes not (merge).
  const cases = fc.record({
    raw: historyArbitrary(),
    ordered: fc.boolean(),
    trimmed: fc.option(fc.integer({ min: 1, max: 5 }), { nil: undefined }),
    reuse: fc.nat(10),
    fresh: fc.boolean(),
    info: runInfo('x'),
    bump: fc.integer({ min: 0, max: 86_400_000 }),
    run: runArbitrary,
  });

  it('on ordered and unordered histories, new, newest, older and repeated ids', () => {
    fc.assert(
      fc.property(cases, ({ raw, ordered, trimmed, reuse, fresh, info, bump, run: r }) => {
        const h = ordered ? mergeHistories(raw, emptyHistory(raw.series)) : raw;
        if (trimmed !== undefined) h.trimmed = trimmed;
        const newest = h.runs.at(-1)?.time;
        const id = !fresh && h.runs.length > 0 ? (h.runs[reuse % h.runs.length] as RunInfo).id : `new-${reuse}`;
        const time = fresh && newest !== undefined ? new Date(Date.parse(newest) + bump).toISOString() : info.time;
        const next: RunInfo = time === undefined ? { ...info, id } : { ...info, id, time };
        const expected = slow(h, next, r);
        const got = appendRun(h, next, r);
        expect(got).toEqual(expected);
        expect([...got.columns.keys()]).toEqual([...expected.columns.keys()]);
        expect(got.trimmed).toBe(expected.trimmed);
      }),
      { numRuns: 500, seed: 7 },
    );
  });

  it('with extendInPlace gives the same History, only adding to the input arrays (their old entries unchanged)', () => {
    fc.assert(
      fc.property(cases, ({ raw, ordered, trimmed, reuse, fresh, info, bump, run: r }) => {
        const h = ordered ? mergeHistories(raw, emptyHistory(raw.series)) : raw;
        if (trimmed !== undefined) h.trimmed = trimmed;
        const newest = h.runs.at(-1)?.time;
        const id = !fresh && h.runs.length > 0 ? (h.runs[reuse % h.runs.length] as RunInfo).id : `new-${reuse}`;
        const time = fresh && newest !== undefined ? new Date(Date.parse(newest) + bump).toISOString() : info.time;
        const next: RunInfo = time === undefined ? { ...info, id } : { ...info, id, time };
        const expected = slow(h, next, r);
        const before = structuredClone(h);
        const got = appendRun(h, next, r, { extendInPlace: true });
        expect(got).toEqual(expected);
        expect([...got.columns.keys()]).toEqual([...expected.columns.keys()]);
        expect(got.trimmed).toBe(expected.trimmed);
        // The runs and series stay readable; each array keeps its entries and gains at most one.
        expect(h.runs).toEqual(before.runs);
        for (const [name, column] of before.columns) {
          const now = (h.columns.get(name) as MetricColumn).values;
          expect(now.slice(0, column.values.length)).toEqual(column.values);
          expect(now.length - column.values.length).toBeLessThanOrEqual(1);
        }
      }),
      { numRuns: 500, seed: 11 },
    );
  });

  it('leaves its input untouched (pure), on the fast path too', () => {
    const h = appendRun(
      appendRun(emptyHistory('s'), { id: '1-1', time: '2026-03-01T10:00:00Z' }, run({ a: 1 })),
      { id: '2-1', time: '2026-03-02T10:00:00Z' },
      run({ a: 2 }),
    );
    const before = structuredClone(h);
    const next = appendRun(h, { id: '3-1', time: '2026-03-03T10:00:00Z' }, run({ a: 3, b: 4 }, 'ms'));
    expect(h).toEqual(before);
    expect(next.columns.get('a')).toEqual({ unit: 'ms', values: [1, 2, 3] });
    expect(next.columns.get('b')).toEqual({ unit: 'ms', values: [NaN, NaN, 4] });
  });
});
