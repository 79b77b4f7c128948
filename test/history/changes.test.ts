import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import {
  applyChange,
  dropRun,
  listRuns,
  markRun,
  renameMetric,
  type HistoryChange,
} from '../../src/history/changes.js';
import { parseHistory, serializeHistory } from '../../src/history/document.js';
import type { History } from '../../src/history/history.js';
import { mergeHistories } from '../../src/history/merge.js';
import { historyArbitrary } from './arbitraries.js';

const day = (d: number): string => new Date(Date.UTC(2026, 2, d, 10)).toISOString();

function base(): History {
  return {
    series: 'render',
    runs: [
      { id: '501-1', time: day(1) },
      { id: '502-1', time: day(2) },
      { id: '503-1', time: day(3) },
    ],
    columns: new Map([
      ['scene-1/shade', { unit: 'ms', values: [120, 121, NaN] }],
      ['scene-2/shade', { values: [NaN, 88, 87] }],
    ]),
    dropped: new Map(),
  };
}

describe('markRun', () => {
  it('adds a mark to the run, once, and refuses an unknown run naming the fix', () => {
    const mark = { reason: 'manual' as const, metrics: ['scene-1/*'], note: 'new shader compiler' };
    const h = markRun(markRun(base(), '502-1', mark), '502-1', mark);
    expect(h.runs[1]?.marks).toEqual([mark]);
    expect(() => markRun(base(), '999-1', mark)).toThrow(/holds no run "999-1" to mark/);
  });

  it('marks the later attempt that replaced the run named', () => {
    const h: History = {
      ...base(),
      runs: [
        { id: '501-1', time: day(1) },
        { id: '502-2', time: day(2) },
        { id: '503-1', time: day(3) },
      ],
    };
    expect(markRun(h, '502-1', { reason: 'manual' }).runs[1]).toEqual({
      id: '502-2',
      time: day(2),
      marks: [{ reason: 'manual' }],
    });
  });
});

describe('dropRun', () => {
  it('removes the run, keeps a tombstone, drops a column left empty, and a merge with an older copy does not bring it back', () => {
    const h = dropRun(base(), { id: '501-1', time: day(4), reason: 'thermal throttling' });
    expect(h.runs.map((r) => r.id)).toEqual(['502-1', '503-1']);
    expect(h.columns.get('scene-1/shade')).toEqual({ unit: 'ms', values: [121, NaN] });
    expect(h.dropped?.get('501-1')).toEqual({ id: '501-1', time: day(4), reason: 'thermal throttling' });
    expect(mergeHistories(base(), h).runs.map((r) => r.id)).toEqual(['502-1', '503-1']);
    // stored and read back, the tombstone is still there
    expect(parseHistory(serializeHistory(h), 'h').dropped?.has('501-1')).toBe(true);
    expect(dropRun(h, { id: '501-1' })).toBe(h);
    expect(() => dropRun(base(), { id: 'nope' })).toThrow(/holds no run "nope" to drop/);
  });
});

describe('renameMetric', () => {
  it('keeps the values, unit and place of the metric', () => {
    const h = renameMetric(base(), 'scene-1/shade', 'scene-1/shade-ms');
    expect([...h.columns.keys()]).toEqual(['scene-1/shade-ms', 'scene-2/shade']);
    expect(h.columns.get('scene-1/shade-ms')).toEqual({ unit: 'ms', values: [120, 121, NaN] });
    expect(renameMetric(h, 'scene-1/shade', 'scene-1/shade-ms')).toBe(h);
  });

  it('joins into an existing metric when no run holds both and the units agree; refuses otherwise', () => {
    const h: History = {
      ...base(),
      columns: new Map([
        ['old', { unit: 'ms', values: [1, 2, NaN] }],
        ['new', { unit: 'ms', values: [NaN, NaN, 3] }],
        ['other', { unit: 's', values: [NaN, NaN, 9] }],
      ]),
    };
    expect(renameMetric(h, 'old', 'new').columns.get('new')).toEqual({ unit: 'ms', values: [1, 2, 3] });
    expect(() => renameMetric(h, 'old', 'other')).toThrow(/units differ/);
    expect(() =>
      renameMetric(
        {
          ...h,
          columns: new Map([
            ['a', { values: [1, 1, 1] }],
            ['b', { values: [2, NaN, NaN] }],
          ]),
        },
        'a',
        'b',
      ),
    ).toThrow(/holds both/);
    expect(() => renameMetric(h, 'missing', 'x')).toThrow(/no metric named "missing"/);
    expect(() => renameMetric(h, 'old', 'bad\u0007name')).toThrow(/control character/);
  });
});

describe('listRuns', () => {
  it('lists the runs oldest first with how many metrics each holds', () => {
    expect(listRuns(base()).map((r) => [r.id, r.metricCount])).toEqual([
      ['501-1', 1],
      ['502-1', 2],
      ['503-1', 1],
    ]);
  });
});

describe('applyChange', () => {
  it('applying a change again to its result changes nothing more (a store may retry freely)', () => {
    const change = fc.oneof(
      fc.record({
        kind: fc.constant('mark' as const),
        id: fc.constantFrom('501-1', '503-1'),
        mark: fc.constant({ reason: 'manual' as const }),
      }),
      fc.record({
        kind: fc.constant('drop' as const),
        tombstone: fc.constantFrom({ id: '502-1' }, { id: '501-1', reason: 'x' }),
      }),
      fc.record({
        kind: fc.constant('rename' as const),
        from: fc.constant('scene-2/shade'),
        to: fc.constant('scene-2/shade-ms'),
      }),
      fc.record({
        kind: fc.constant('record' as const),
        info: fc.constantFrom({ id: '504-1', time: day(4) }, { id: '503-2', time: day(5) }),
        run: fc.constant({ metrics: new Map([['scene-2/shade', { value: 86, count: 1 }]]), meta: new Map() }),
        keep: fc.constantFrom(2, 10),
      }),
      historyArbitrary('render').map((history) => ({ kind: 'merge' as const, history })),
    );
    fc.assert(
      fc.property(change, (c: HistoryChange) => {
        const once = applyChange(base(), c).history;
        const twice = applyChange(once, c).history;
        expect(serializeHistory(twice)).toBe(serializeHistory(once));
      }),
      { numRuns: 200 },
    );
  });

  it('a record trims to keep and says which run it replaced', () => {
    const result = applyChange(base(), {
      kind: 'record',
      info: { id: '503-2', time: day(4) },
      run: { metrics: new Map([['scene-2/shade', { value: 86, count: 1 }]]), meta: new Map() },
      keep: 2,
    });
    expect(result.replaced).toBe('503-1');
    expect(result.history.runs.map((r) => r.id)).toEqual(['502-1', '503-2']);
  });
});
