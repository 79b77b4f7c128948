import fc from 'fast-check';
import { stringify } from 'yaml';
import { describe, expect, it } from 'vitest';
import { parseConfig } from '../../src/config/load.js';
import type { Config } from '../../src/config/types.js';
import { InputError } from '../../src/errors/input-error.js';

/** parseConfig's contract: a config that keeps its invariants, or an InputError at file:line:col. */
function holdsContract(text: string): void {
  let config: Config;
  try {
    config = parseConfig(text, 'fuzz.yml');
  } catch (err) {
    if (!(err instanceof InputError)) throw err;
    expect(err.where).toMatch(/^fuzz\.yml:\d+:\d+$/);
    expect(err.message.length).toBeGreaterThan(0);
    return;
  }
  for (const s of [config.defaults, ...config.rules.map((r) => ({ ...config.defaults, ...r.settings }))]) {
    expect(s.cutoff > 0 && s.cutoff < 1).toBe(true);
    expect(Number.isInteger(s.window) && s.window >= 2).toBe(true);
    expect(Number.isInteger(s.minRuns) && s.minRuns >= 2 && s.minRuns <= s.window).toBe(true);
    expect(Number.isFinite(s.tolerance.amount) && s.tolerance.amount >= 0).toBe(true);
    expect(Number.isFinite(s.resolution) && s.resolution >= 0).toBe(true);
  }
  for (const r of config.rules) expect(r.match.length).toBeGreaterThan(0);
  expect(Number.isInteger(config.keep) && config.keep >= 1).toBe(true);
}

const YAML_PIECES = [
  '[',
  ']',
  '{',
  '}',
  ',',
  '-',
  ' ',
  '  ',
  '\n',
  ':',
  ': ',
  '&a ',
  '*a',
  '!t ',
  '!!str ',
  '#',
  '"',
  "'",
  '?',
  '|',
  '>',
  '---',
  '...',
  '%YAML 1.2',
  '<<',
  'defaults',
  'metrics',
  'groups',
  'match',
  'cutoff',
  'window',
  'min-runs',
  'tolerance',
  'name',
  'keep',
  'limits',
  '__proto__',
  '0.5',
  '1%',
  '-3',
  '.inf',
  '1e400',
  'true',
  'null',
  '~',
  'latency/*',
  '\t',
  '\r\n',
];

// Property-based checks (fast-check, common practice for parser robustness): no input, however
// broken, escapes as anything but an InputError with a position.
describe('parseConfig never throws anything but InputError', () => {
  it('on arbitrary unicode text', () => {
    fc.assert(fc.property(fc.string({ unit: 'binary', maxLength: 300 }), holdsContract), { numRuns: 400 });
  });

  it('on text made of YAML punctuation and config words', () => {
    fc.assert(
      fc.property(
        fc.array(fc.constantFrom(...YAML_PIECES), { maxLength: 80 }).map((p) => p.join('')),
        holdsContract,
      ),
      { numRuns: 1500 },
    );
  });

  it('on arbitrary data written as YAML', () => {
    fc.assert(
      fc.property(fc.jsonValue({ maxDepth: 4 }), (value) => holdsContract(stringify(value))),
      { numRuns: 300 },
    );
  });

  it('on config-shaped data with arbitrary values', () => {
    const anyValue = fc.oneof(
      fc.double(),
      fc.integer({ min: -5, max: 600 }),
      fc.string({ maxLength: 6 }),
      fc.boolean(),
      fc.constant(null),
    );
    const settings = fc.dictionary(
      fc.constantFrom(
        'cutoff',
        'worse',
        'tolerance',
        'resolution',
        'window',
        'min-runs',
        'transform',
        'shared-move',
        'aggregate',
        'change-points',
      ),
      anyValue,
    );
    const shape = fc.record(
      {
        defaults: settings,
        metrics: fc.array(
          fc.record({
            match: fc.oneof(fc.string({ maxLength: 8 }), fc.array(fc.string({ maxLength: 8 }))),
            worse: anyValue,
          }),
        ),
        keep: anyValue,
        family: anyValue,
      },
      { requiredKeys: [] },
    );
    fc.assert(
      fc.property(shape, (value) => holdsContract(stringify(value))),
      { numRuns: 500 },
    );
  });
});
