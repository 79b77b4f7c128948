import fc from 'fast-check';
import { stringify } from 'yaml';
import { describe, expect, it } from 'vitest';
import { needsGlobLibrary } from '../../src/config/config-text.js';
import { parseConfig } from '../../src/config/load.js';
import { parseConfigLazily } from '../../src/config/parse-lazily.js';
import { groupFor, settingsFor } from '../../src/config/rules.js';
import type { Config } from '../../src/config/types.js';
import { InputError } from '../../src/errors/input-error.js';

// The reference is the synchronous reader (parseConfig, picomatch always loaded), whose glob
// answers rules.test.ts checks against picomatch's documented syntax. The lazy reader must give
// the same Config, the same settings for every name and the same refusals, byte for byte.
type Outcome = { config: Config } | { error: { message: string; where?: string; fix?: string } };

function eager(text: string): Outcome {
  try {
    return { config: parseConfig(text, 'lazy.yml') };
  } catch (err) {
    if (!(err instanceof InputError)) throw err;
    return { error: { message: err.message, where: err.where, fix: err.fix } };
  }
}

async function lazy(text: string): Promise<Outcome> {
  try {
    return { config: await parseConfigLazily(text, 'lazy.yml') };
  } catch (err) {
    if (!(err instanceof InputError)) throw err;
    return { error: { message: err.message, where: err.where, fix: err.fix } };
  }
}

const NAMES = [
  'latency/render',
  'latency/calibrate',
  'size/app.js',
  'size/a/b.js',
  'build',
  'build/x',
  'a',
  'b',
  '__proto__',
  'x y',
];

async function expectSame(text: string): Promise<void> {
  const want = eager(text);
  const got = await lazy(text);
  expect(got).toEqual(want);
  if ('config' in want && 'config' in got) {
    for (const name of NAMES) {
      expect(settingsFor(got.config, name), name).toEqual(settingsFor(want.config, name));
      expect(groupFor(got.config, name)?.name, name).toBe(groupFor(want.config, name)?.name);
    }
  }
}

describe('parseConfigLazily', () => {
  it('reads configs with plain names, globs, exclusions and groups as parseConfig does', async () => {
    const texts = [
      '',
      '# only a comment\n',
      'keep: 900\n',
      'metrics:\n  - match: latency/calibrate\n    ignore: true\n  - match: [size/app.js, "!size/vendor.js"]\n    worse: lower\n',
      'metrics:\n  - match: "latency/*"\n    relative-to: latency/calibrate\n  - match: latency/calibrate\n    relative-to: latency/calibrate\n',
      'metrics:\n  - match: ["!build"]\n    cutoff: 0.02\n',
      'groups:\n  - name: latency\n  - name: sizes\n    match: [size/app.js, size/a/b.js]\n',
      'groups:\n  - name: g\n    match: build\n  - name: g\n    match: a\n',
      'defaults:\n  cuttoff: 0.05\nmetrics:\n  - match: latency/render\n    window: 3\n    min-runs: 5\n',
      'metrics:\n  - match: "__proto__"\n    worse: lower\n  - match: "x y"\n    cutoff: 0.5\n',
    ];
    for (const text of texts) await expectSame(text);
  });

  it('agrees with parseConfig on random rules and groups', async () => {
    const glob = fc.constantFrom(
      'latency/render',
      'latency/*',
      '!latency/calibrate',
      'size/**',
      'size/app.js',
      'build',
      '!build',
      'a',
      '{a,b}',
      'x y',
      './a',
      'a\\b',
      '__proto__',
      '',
    );
    const match = fc.oneof(glob, fc.array(glob, { maxLength: 3 }));
    const rule = fc.record(
      {
        match,
        worse: fc.constantFrom('lower', 'higher'),
        'relative-to': fc.constantFrom('a', 'build', 'latency/render'),
      },
      { requiredKeys: ['match'] },
    );
    const group = fc.record({ name: fc.constantFrom('g', 'latency', 'size', 'h'), match }, { requiredKeys: ['name'] });
    const shape = fc.record(
      { metrics: fc.array(rule, { maxLength: 4 }), groups: fc.array(group, { maxLength: 3 }) },
      { requiredKeys: [] },
    );
    await fc.assert(
      fc.asyncProperty(shape, async (value) => expectSame(stringify(value))),
      { numRuns: 300, seed: 5 },
    );
  });

  it('needs the glob library only for globs, exclusions of globs and groups without match', () => {
    expect(needsGlobLibrary({ keep: 9 })).toBe(false);
    expect(
      needsGlobLibrary({ metrics: [{ match: 'a/b' }, { match: ['!c', 'd'] }], groups: [{ name: 'g', match: 'a/b' }] }),
    ).toBe(false);
    expect(needsGlobLibrary({ metrics: [{ match: 'a/*' }] })).toBe(true);
    expect(needsGlobLibrary({ metrics: [{ match: ['a', '!b/*'] }] })).toBe(true);
    expect(needsGlobLibrary({ groups: [{ name: 'g' }] })).toBe(true);
  });
});
