import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { metricNames } from '../../src/gate/candidates.js';
import { historyOf, runOf } from './helpers/scenario.js';

// Names mixing case, digits, '/', astral characters (surrogate pairs), lone surrogates and the
// property names a plain object would treat specially.
const name = fc.oneof(
  fc.string({ minLength: 1, maxLength: 8, unit: 'binary' }),
  fc.constantFrom(
    '__proto__',
    'constructor',
    'toString',
    'Z/upper',
    'a/lower',
    'é/accent',
    '\u{1F680}/rocket',
    '\uFF21/wide-A',
    'a/10',
    'a/9',
  ),
);

describe('metricNames', () => {
  it('property: the run names plus the history names holding a value, in code-unit order', () => {
    // Reference: a plain filter and a comparator sort by `<` on UTF-16 code units (ECMA-262
    // IsLessThan on strings), written out here independently of the module.
    fc.assert(
      fc.property(
        fc.uniqueArray(name, { maxLength: 12 }),
        fc.uniqueArray(name, { maxLength: 12 }),
        fc.array(fc.boolean(), { minLength: 12, maxLength: 12 }),
        (inRun, inHistory, holds) => {
          const columns: Record<string, number[]> = Object.create(null);
          inHistory.forEach((n, i) => (columns[n] = holds[i] ? [Number.NaN, 1] : [Number.NaN, Number.NaN]));
          const values: Record<string, number> = Object.create(null);
          for (const n of inRun) values[n] = 1;
          const expected = [...new Set([...inRun, ...inHistory.filter((_, i) => holds[i])])];
          expected.sort((a, b) => (a < b ? -1 : a > b ? 1 : 0));
          expect(metricNames(historyOf(columns), runOf(values))).toEqual(expected);
        },
      ),
      { numRuns: 300, seed: 5150 },
    );
  });
});
