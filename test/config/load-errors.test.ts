import { readFileSync } from 'node:fs';
import { describe, expect, it } from 'vitest';
import { parseConfig } from '../../src/config/load.js';
import { reportedProblems } from './helpers.js';

// Line and column numbers are counted by hand in the fixture files (1-based, as editors and
// GitHub annotations count them); each comment says which token the position points at.
function fixture(name: string): () => unknown {
  const text = readFileSync(new URL(`../fixtures/config/${name}`, import.meta.url), 'utf8');
  return () => parseConfig(text, name);
}

describe('parseConfig: refused input, with line:column', () => {
  it('names unknown keys at the key, with a did-you-mean', () => {
    const { error, problems } = reportedProblems(fixture('unknown-keys.yml'), 'unknown-keys.yml');
    expect(problems.map((p) => [p.line, p.col])).toEqual([
      [3, 3], // "cuttoff"
      [4, 3], // "minruns"
      [7, 5], // "tolerence", inside the first rule
    ]);
    expect(error.where).toBe('unknown-keys.yml:3:3');
    expect(error.fix).toBe('did you mean "cutoff"?');
    expect(error.message).toContain('unknown key "minruns" in defaults (did you mean "min-runs"?)');
    expect(error.message).toContain('unknown key "tolerence" in metrics rule #1 (did you mean "tolerance"?)');
    expect(error.describe()).toMatch(/^unknown-keys\.yml:3:3: unknown key "cuttoff" in defaults\n/);
  });

  it('names every out-of-range or unknown value at the value and says what is allowed', () => {
    const { error, problems } = reportedProblems(fixture('bad-values.yml'), 'bad-values.yml');
    expect(problems.map((p) => [p.line, p.col])).toEqual([
      [2, 11], // cutoff: 1.5
      [3, 10], // worse: upward
      [4, 11], // window: 1
      [5, 14], // transform: sqrt
      [9, 16], // tolerance: "-2%"
      [10, 12], // match: []
      [12, 5], // the group entry without a name
      [13, 9], // family: all
      [14, 7], // keep: 0
    ]);
    const text = problems.map((p) => p.message).join('\n');
    expect(text).toContain('cutoff (in defaults) must be a number greater than 0 and less than 1; got 1.5');
    expect(text).toContain('worse (in defaults) must be one of higher, lower, both; got "upward"');
    expect(text).toContain('window (in defaults) must be a whole number of at least 2; got 1');
    expect(text).toContain('transform (in defaults) must be one of auto, none, log; got "sqrt"');
    expect(text).toContain(
      'tolerance (in metrics rule #1) must be a number of at least 0, or a percent such as "1%"; got "-2%"',
    );
    expect(text).toContain(
      'match (in metrics rule #2) must be a non-empty string, or a non-empty list of non-empty strings; got a list',
    );
    expect(text).toContain('groups entry #1 has no "name"');
    expect(text).toContain('family must be one of none, bonferroni, holm, fdr; got "all"');
    expect(text).toContain('keep must be a whole number of at least 1; got 0');
    expect(error.fix).toBe('for example: 0.01');
  });

  it('refuses wrong types, suggesting the fix for quoted numbers and yes/no', () => {
    const { error, problems } = reportedProblems(fixture('wrong-types.yml'), 'wrong-types.yml');
    expect(problems.map((p) => [p.line, p.col])).toEqual([
      [2, 11], // cutoff: "0.01" (a string)
      [3, 18], // change-points: "yes"
      [4, 13], // min-runs: 8.5
      [5, 10], // metrics: a string instead of a list
      [7, 16], // max-metrics: many
    ]);
    expect(error.fix).toBe('write the number without quotes: 0.01');
    expect(error.message).toContain('got "yes" (write true or false (YAML 1.2 reads yes as text))');
    expect(error.message).toContain('metrics must be a list; got "size/**"');
  });

  it('reports YAML syntax errors and duplicate keys where they are', () => {
    const { error, problems } = reportedProblems(fixture('yaml-syntax.yml'), 'yaml-syntax.yml');
    expect(problems[0]).toMatchObject({ line: 3, col: 3 }); // the second "cutoff:"
    expect(problems[0]!.message).toBe('the key "cutoff" appears twice in one mapping');
    expect(error.fix).toBe('keep one of the two entries');
    // The unclosed "[" of line 5 is found at the end of the text (line 6, column 1).
    expect(problems[1]).toMatchObject({ line: 6, col: 1 });
  });

  it('checks rules the schema cannot: relative-to naming itself, a group name used twice', () => {
    const { problems } = reportedProblems(fixture('cross-field.yml'), 'cross-field.yml');
    expect(problems).toEqual([
      {
        line: 3,
        col: 18,
        message: 'relative-to names the rule\'s own metric "latency/calibrate"; it would be divided by itself',
      },
      {
        line: 7,
        col: 11,
        message: 'group name "timings" is used twice (first on line 5) (give each group its own name)',
      },
    ]);
  });

  it('refuses window or keep smaller than min-runs (metrics would never leave learning)', () => {
    let r = reportedProblems(() => parseConfig('defaults:\n  min-runs: 100\n', 'c.yml'), 'c.yml');
    expect(r.problems[0]).toMatchObject({ line: 2, col: 3 });
    expect(r.error.message).toMatch(/window \(60\) is smaller than min-runs \(100\)/);
    r = reportedProblems(
      () => parseConfig('keep: 20\nmetrics:\n  - match: "a/*"\n    min-runs: 30\n    window: 40\n', 'c.yml'),
      'c.yml',
    );
    expect(r.problems).toHaveLength(1);
    expect(r.problems[0]).toMatchObject({ line: 1, col: 1 });
    expect(r.error.message).toMatch(/keep \(20\) is smaller than min-runs \(30\) in metrics rule #1/);
  });

  it('names top-level misplacements and rule-only keys in defaults', () => {
    let r = reportedProblems(() => parseConfig('# x\ncutoff: 0.05\n', 'c.yml'), 'c.yml');
    expect(r.problems[0]).toMatchObject({ line: 2, col: 1 });
    expect(r.error.fix).toBe('"cutoff" is a metric setting: put it under defaults: or in a metrics rule');
    r = reportedProblems(() => parseConfig('defaults:\n  relative-to: a\n', 'c.yml'), 'c.yml');
    expect(r.error.fix).toBe('"relative-to" belongs in a metrics rule (under metrics:), not in defaults');
    r = reportedProblems(() => parseConfig('defaults:\n  family: holm\n', 'c.yml'), 'c.yml');
    expect(r.error.fix).toBe('"family" is a top-level key: write it without indentation');
    r = reportedProblems(() => parseConfig('limits:\n  max_metrics: 5\n', 'c.yml'), 'c.yml');
    expect(r.error.fix).toBe('did you mean "max-metrics"?');
    r = reportedProblems(() => parseConfig('family: Holm\n', 'c.yml'), 'c.yml');
    expect(r.problems[0]).toMatchObject({ line: 1, col: 9 });
    expect(r.error.fix).toBe('did you mean "holm"?');
    r = reportedProblems(() => parseConfig('frobnicate: 1\n', 'c.yml'), 'c.yml');
    expect(r.error.fix).toBe(
      'allowed here: defaults, metrics, groups, family, budget, unsettled, keep, input-format, limits',
    );
  });

  it('refuses a document that is not a mapping, several documents, unknown tags and non-finite numbers', () => {
    let r = reportedProblems(() => parseConfig('- 1\n- 2\n', 'c.yml'), 'c.yml');
    expect(r.error.message).toBe('the config must be a mapping; got a list');
    r = reportedProblems(() => parseConfig('keep: 5\n---\nkeep: 6\n', 'c.yml'), 'c.yml');
    expect(r.problems[0]).toMatchObject({ line: 2, col: 1 });
    expect(r.error.message).toBe('the file holds 2 YAML documents; a config is one');
    r = reportedProblems(() => parseConfig('defaults:\n  window: !weird 5\n', 'c.yml'), 'c.yml');
    expect(r.problems[0]).toMatchObject({ line: 2, col: 11 });
    // YAML 1.2 core schema spells infinity .inf and not-a-number .nan (yaml.org/spec/1.2.2, 10.2.1.4).
    r = reportedProblems(() => parseConfig('defaults:\n  resolution: .inf\n  cutoff: .nan\n', 'c.yml'), 'c.yml');
    expect(r.problems.map((p) => [p.line, p.col, p.message])).toEqual([
      [2, 15, '.inf is not a finite number'],
      [3, 11, '.nan is not a finite number (write an ordinary number)'],
    ]);
    r = reportedProblems(() => parseConfig('metrics:\n  - {match: a, [x]: 1}\n', 'c.yml'), 'c.yml');
    expect(r.problems[0]).toMatchObject({ line: 2, col: 16 });
  });

  it('refuses a bad value for every key, at the value', () => {
    // [section template, key, bad value]; the value starts right after "key: " on line 2 (or 1).
    const defaults: Array<[string, string]> = [
      ['cutoff', '0'],
      ['cutoff', '1'],
      ['worse', 'up'],
      ['tolerance', '"1 percent"'],
      ['tolerance', '-1'],
      ['resolution', '-0.5'],
      ['window', '1'],
      ['window', '10.5'],
      ['min-runs', '1'],
      ['transform', 'sqrt'],
      ['shared-move', 'yes please'],
      ['aggregate', 'mode'],
      ['change-points', '1'],
    ];
    for (const [key, value] of defaults) {
      const { problems } = reportedProblems(() => parseConfig(`defaults:\n  ${key}: ${value}\n`, 'k.yml'), 'k.yml');
      expect(problems[0], `${key}: ${value}`).toMatchObject({ line: 2, col: 3 + key.length + 2 });
      const rule = reportedProblems(
        () => parseConfig(`metrics:\n  - match: a\n    ${key}: ${value}\n`, 'k.yml'),
        'k.yml',
      );
      expect(rule.problems[0], `rule ${key}: ${value}`).toMatchObject({ line: 3, col: 5 + key.length + 2 });
    }
    const rules: Array<[string, string]> = [
      ['ignore', '"yes"'],
      ['relative-to', '""'],
      ['relative-to', '5'],
      ['match', '""'],
      ['match', '[a, 5]'],
    ];
    for (const [key, value] of rules) {
      const text = `metrics:\n  - ${key}: ${value}\n${key === 'match' ? '' : '    match: x\n'}`;
      const { problems } = reportedProblems(() => parseConfig(text, 'k.yml'), 'k.yml');
      const col = 5 + key.length + 2 + (value === '[a, 5]' ? 4 : 0); // a list points at its bad item
      expect(problems[0], `${key}: ${value}`).toMatchObject({ line: 2, col });
    }
    const groups: Array<[string, string]> = [
      ['name', '""'],
      ['name', '[a]'],
      ['match', '[]'],
    ];
    for (const [key, value] of groups) {
      const other = key === 'name' ? 'match: x' : 'name: g';
      const { problems } = reportedProblems(
        () => parseConfig(`groups:\n  - ${key}: ${value}\n    ${other}\n`, 'k.yml'),
        'k.yml',
      );
      expect(problems[0], `group ${key}: ${value}`).toMatchObject({ line: 2, col: 5 + key.length + 2 });
    }
    const top: Array<[string, string]> = [
      ['family', 'sidak'],
      ['keep', '-1'],
      ['keep', '2.5'],
      ['input-format', 'xml'],
      ['defaults', '5'],
      ['limits', '[1]'],
      ['groups', 'x'],
    ];
    for (const [key, value] of top) {
      const { problems } = reportedProblems(() => parseConfig(`${key}: ${value}\n`, 'k.yml'), 'k.yml');
      expect(problems[0], `${key}: ${value}`).toMatchObject({ line: 1, col: key.length + 3 });
    }
    for (const key of ['max-file-bytes', 'max-line-length', 'max-metrics']) {
      for (const value of ['0', '1.5', '"10"']) {
        const { problems } = reportedProblems(() => parseConfig(`limits:\n  ${key}: ${value}\n`, 'k.yml'), 'k.yml');
        expect(problems[0], `${key}: ${value}`).toMatchObject({ line: 2, col: 3 + key.length + 2 });
      }
    }
  });

  it('reports every duplicate key, in mappings at any level', () => {
    const { problems } = reportedProblems(
      () => parseConfig('keep: 5\nmetrics:\n  - {match: a, worse: lower, worse: both}\nkeep: 6\n', 'd.yml'),
      'd.yml',
    );
    expect(problems.map((p) => [p.line, p.col])).toEqual([
      [3, 30], // the second "worse"
      [4, 1], // the second "keep"
    ]);
  });

  it('keeps at most 20 problems in one message', () => {
    const text = Array.from({ length: 30 }, (_, i) => `bogus${i}: 1`).join('\n');
    const { error, problems } = reportedProblems(() => parseConfig(text, 'c.yml'), 'c.yml');
    expect(problems).toHaveLength(20);
    expect(error.message).toContain('and 29 more problems:');
    expect(error.message).toContain('... 10 not shown');
  });
});
