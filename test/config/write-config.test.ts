import { readFileSync } from 'node:fs';
import { describe, expect, it } from 'vitest';
import { parseConfig } from '../../src/config/load.js';
import { settingsFor } from '../../src/config/rules.js';
import { literalGlob } from '../../src/config/escape-glob.js';
import { applyConfigEdit } from '../../src/config/write-config.js';
import { InputError } from '../../src/errors/input-error.js';

const original = readFileSync(new URL('../fixtures/tune/bellgate.yml', import.meta.url), 'utf8');

describe('writing the suggestion into a config', () => {
  const out = applyConfigEdit(original, 'bellgate.yml', {
    defaults: { cutoff: 0.001 },
    rules: [
      { metric: 'render/slow-tile', cutoff: 1e-4, reason: 'noisy' },
      { metric: 'size/tiles.db', transform: 'log', reason: 'skewed' },
    ],
  });
  const lines = out.split('\n');

  it('keeps every other line, comment and the order exactly', () => {
    const kept = original.split('\n').filter((l) => !/cutoff: 0\.0?01 /.test(l));
    // Every untouched line is still there, in the same order.
    let at = 0;
    for (const line of kept) {
      at = lines.indexOf(line, at);
      expect(at, `line ${JSON.stringify(line)} kept`).toBeGreaterThanOrEqual(0);
    }
    expect(lines).toContain('  cutoff: 0.001          # flag below 1% relative density');
    expect(lines).toContain('    cutoff: 0.0001       # was noisy once');
    expect(lines.filter((l) => l.includes('# end of rules'))).toHaveLength(1);
  });

  it('appends a new rule after the last one, with its reason, and it reads back', () => {
    const added = lines.indexOf('  - match: "size/tiles.db"');
    expect(added).toBeGreaterThan(lines.indexOf('    worse: lower'));
    expect(lines[added - 1]).toBe('  # suggested by bellgate tune: skewed');
    expect(lines[added + 1]).toBe('    transform: log');
    const config = parseConfig(out, 'bellgate.yml');
    expect(config.defaults.cutoff).toBe(0.001);
    expect(settingsFor(config, 'render/slow-tile').cutoff).toBe(1e-4);
    expect(settingsFor(config, 'size/tiles.db').transform).toBe('log');
    expect(settingsFor(config, 'render/fast-tile').cutoff).toBe(0.001);
  });

  it('writes into an empty file, and into flow-style sections', () => {
    const fresh = applyConfigEdit('', 'b.yml', {
      defaults: { cutoff: 0.005 },
      rules: [{ metric: 'a/b', cutoff: 1e-5, reason: 'x' }],
    });
    expect(fresh).toBe(
      'defaults:\n  cutoff: 0.005\nmetrics:\n  # suggested by bellgate tune: x\n  - match: "a/b"\n    cutoff: 0.00001\n',
    );
    const flow = applyConfigEdit('defaults: {window: 30} # short\n', 'b.yml', {
      defaults: { cutoff: 0.005 },
      rules: [],
    });
    expect(parseConfig(flow, 'b.yml').defaults).toMatchObject({ cutoff: 0.005, window: 30 });
    expect(flow).toContain('# short');
  });

  it('escapes glob characters so a rule names exactly one metric', () => {
    for (const name of ['cache[hit]', '!legacy', 'a*b', 'p95{eu}', 'x?(y)', 'back\\slash']) {
      const glob = literalGlob(name)!;
      const out2 = applyConfigEdit('', 'b.yml', {
        defaults: { cutoff: 0.01 },
        rules: [{ metric: name, cutoff: 1e-3, reason: 'r' }],
      });
      expect(settingsFor(parseConfig(out2, 'b.yml'), name).cutoff).toBe(1e-3);
      expect(settingsFor(parseConfig(out2, 'b.yml'), `${name}x`).cutoff).toBe(0.01);
      expect(glob).toBeTruthy();
    }
  });

  it('refuses a config it cannot parse, naming file:line:col', () => {
    try {
      applyConfigEdit('defaults:\n  cuttoff: 0.05\n', 'b.yml', { defaults: { cutoff: 0.01 }, rules: [] });
      expect.fail('should throw');
    } catch (error) {
      expect(error).toBeInstanceOf(InputError);
      expect((error as InputError).where).toBe('b.yml:2:3');
    }
  });

  it('writes defaults and top-level keys in place or as new lines, keeping comments, and it loads', () => {
    const text = applyConfigEdit(original, 'bellgate.yml', {
      defaults: { transform: 'auto', sharedMove: true, changePoints: true },
      family: 'holm',
      budget: 0.005,
    });
    const lines = text.split('\n');
    // change-points was set: edited in place; shared-move and transform were not: inserted at the top of defaults.
    expect(lines).toContain('  change-points: true');
    expect(lines.indexOf('  transform: auto')).toBe(lines.indexOf('defaults:') + 1);
    expect(lines).toContain('  shared-move: true');
    expect(lines).toContain('  cutoff: 0.01          # flag below 1% relative density');
    expect(text.endsWith('# end of rules\nfamily: holm\nbudget: 0.5%\n')).toBe(true);
    const config = parseConfig(text, 'bellgate.yml');
    expect(config).toMatchObject({ family: 'holm', budget: 0.005 });
    expect(config.defaults).toMatchObject({ transform: 'auto', sharedMove: true, changePoints: true, window: 40 });
    // A second write of the same keys changes nothing; a new value is spliced over the old one.
    expect(applyConfigEdit(text, 'bellgate.yml', { family: 'holm', budget: 0.005 })).toBe(text);
    const none = applyConfigEdit(text, 'bellgate.yml', { family: 'none', defaults: { cutoff: 1e-4 } });
    expect(none).toBe(text.replace('family: holm', 'family: none').replace('cutoff: 0.01 ', 'cutoff: 0.0001 '));
  });
});
