// combineWithStored as set algebra (the reference): result ids = (stored - deleted) ∪ mine, each
// once, in time order, and every value still beside its own run id.
import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { combineWithStored } from '../../src/history/branch-combine.js';
import { emptyHistory, type History } from '../../src/history/history.js';
import { appendRun } from '../../src/history/merge.js';
import { infoOf, runOf } from './branch-helpers.js';

const build = (nums: number[]): History =>
  nums.reduce((h, n) => appendRun(h, infoOf(`${n}-1`, n), runOf(n / 10)), emptyHistory('s'));

describe('combineWithStored', () => {
  it('is the union of mine and stored minus what I deleted, values aligned', () => {
    const id = fc.integer({ min: 1, max: 40 });
    fc.assert(
      fc.property(
        fc.uniqueArray(id, { maxLength: 20 }),
        fc.uniqueArray(id, { maxLength: 20 }),
        fc.uniqueArray(id, { maxLength: 10 }),
        (mine, stored, deleted) => {
          const gone = new Set(deleted.filter((d) => !mine.includes(d)).map((d) => `${d}-1`));
          const out = combineWithStored(build(mine), build(stored), gone);
          const expected = [...new Set([...mine, ...stored.filter((s) => !gone.has(`${s}-1`))])].sort((a, b) => a - b);
          expect(out.runs.map((r) => r.id)).toEqual(expected.map((n) => `${n}-1`));
          const values = out.columns.get('build/compile')?.values ?? [];
          expect(values).toEqual(expected.map((n) => n / 10));
        },
      ),
      { seed: 7, numRuns: 200 },
    );
  });
  it('keeps my trimmed count', () => {
    const mine = { ...build([5, 6]), trimmed: 4 };
    expect(combineWithStored(mine, build([1, 7]), new Set(['1-1'])).trimmed).toBe(4);
  });
});
