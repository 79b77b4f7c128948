import { describe, expect, it } from 'vitest';
import { parseConfig } from '../../src/config/load.js';
import { MAX_CONFIG_DEPTH } from '../../src/config/yaml-limits.js';
import { reportedProblems } from './helpers.js';

// Resource-exhaustion shapes from common practice in parser hardening: the "billion laughs"
// entity expansion (Klein, 2003, first shown for XML; the same shape works with YAML anchors),
// deep nesting that overflows recursive parsers, and oversized scalars.
describe('parseConfig: hard limits', () => {
  it('refuses the "billion laughs" alias shape before expanding it', () => {
    const lines = ['a: &a ["lol", "lol", "lol", "lol", "lol", "lol", "lol", "lol", "lol"]'];
    for (let i = 1; i < 10; i++) {
      const prev = String.fromCharCode(96 + i);
      const name = String.fromCharCode(97 + i);
      lines.push(`${name}: &${name} [${Array(9).fill(`*${prev}`).join(', ')}]`);
    }
    // 9^10 (about 3.5e9) strings if expanded.
    const { error, problems } = reportedProblems(() => parseConfig(lines.join('\n'), 'bomb.yml'), 'bomb.yml');
    expect(error.message).toMatch(/more than 100 aliases|more than 10000 values/);
    expect(problems[0]!.line).toBeGreaterThanOrEqual(2);
  });

  it('refuses an alias fan-out that stays under the alias count but expands past 10,000 values', () => {
    // 99 aliases to a 200-item list: 19,800 values.
    const text = `x: &x [${Array(200).fill('1').join(',')}]\ny: [${Array(99).fill('*x').join(',')}]\n`;
    const { error } = reportedProblems(() => parseConfig(text, 'fan.yml'), 'fan.yml');
    expect(error.message).toBe('the config expands to more than 10000 values');
  });

  it('refuses 10,000-deep flow nesting without overflowing the stack', () => {
    const text = `${'['.repeat(10_000)}${']'.repeat(10_000)}`;
    const { error, problems } = reportedProblems(() => parseConfig(text, 'deep.yml'), 'deep.yml');
    expect(error.message).toBe(`nesting is deeper than ${MAX_CONFIG_DEPTH} levels`);
    // The 33rd "[" is the first one past the limit.
    expect(problems[0]).toMatchObject({ line: 1, col: MAX_CONFIG_DEPTH + 1 });
  });

  it('refuses compact block nesting ("- - - x") on one line, at the first indicator past the limit', () => {
    const text = `metrics:\n${'- '.repeat(300_000)}x\n`;
    const { error, problems } = reportedProblems(() => parseConfig(text, 'deep.yml'), 'deep.yml');
    expect(error.message).toBe(`nesting is deeper than ${MAX_CONFIG_DEPTH} levels`);
    expect(problems[0]).toMatchObject({ line: 2, col: 2 * MAX_CONFIG_DEPTH + 1 });
  });

  it('does not count brackets inside quotes, comments or balanced globs as nesting', () => {
    const many = '['.repeat(100);
    const text = `# ${many}\nmetrics:\n  - match: "${many}"\n    relative-to: 'x${many}'\n  - match: "size/[ab]*/**"\n`;
    const config = parseConfig(text, 'ok.yml');
    expect(config.rules.map((r) => r.match[0])).toEqual([many, 'size/[ab]*/**']);
  });

  it('refuses deep block nesting too', () => {
    const text = Array.from({ length: 40 }, (_, i) => `${' '.repeat(i)}k${i}:`).join('\n');
    const { error } = reportedProblems(() => parseConfig(text, 'deep.yml'), 'deep.yml');
    expect(error.message).toBe(`nesting is deeper than ${MAX_CONFIG_DEPTH} levels`);
  });

  it('refuses a 2 MB scalar (the whole text is over 1 MiB)', () => {
    const text = `defaults:\n  worse: "${'x'.repeat(2_000_000)}"\n`;
    const { error, problems } = reportedProblems(() => parseConfig(text, 'big.yml'), 'big.yml');
    expect(error.message).toBe(`the config is ${text.length} characters; the limit is 1048576 (1 MiB)`);
    expect(problems[0]).toMatchObject({ line: 1, col: 1 });
  });

  it('refuses a 20,000-character scalar inside a small file, at the scalar', () => {
    const text = `metrics:\n  - match: ${'y'.repeat(20_000)}\n`;
    const { error, problems } = reportedProblems(() => parseConfig(text, 'long.yml'), 'long.yml');
    expect(error.message).toBe('a value of 20000 characters is longer than the limit of 16384');
    expect(problems[0]).toMatchObject({ line: 2, col: 12 });
  });

  it('refuses more than 5,000 entries before parsing, at the entry past the limit', () => {
    const text = Array.from({ length: 6000 }, (_, i) => `k${i}: 1`).join('\n');
    const { error, problems } = reportedProblems(() => parseConfig(text, 'wide.yml'), 'wide.yml');
    expect(error.message).toBe('the config has more than 5000 entries');
    expect(problems[0]).toMatchObject({ line: 5001, col: 6 }); // the ":" of "k5000: 1"
  });

  it('accepts exactly the documented nesting a config needs', () => {
    expect(parseConfig('metrics:\n  - match:\n      - "a/*"\n      - "!a/b"\n', 'ok.yml').rules[0]!.match).toEqual([
      'a/*',
      '!a/b',
    ]);
  });
});

describe('parseConfig: names are data, never object machinery', () => {
  it('refuses __proto__, constructor and prototype keys without touching Object.prototype', () => {
    for (const key of ['__proto__', 'constructor', 'prototype']) {
      for (const text of [
        `${key}: {polluted: 1}\n`,
        `defaults:\n  ${key}:\n    polluted: 1\n`,
        `metrics:\n  - match: a\n    ${key}: {polluted: 1}\n`,
      ]) {
        const { error } = reportedProblems(() => parseConfig(text, 'p.yml'), 'p.yml');
        expect(error.message).toContain(`unknown key "${key}"`);
      }
    }
    expect(({} as Record<string, unknown>).polluted).toBeUndefined();
    expect(Object.prototype).not.toHaveProperty('polluted');
  });

  it('keeps metric names like __proto__ as plain strings in rules and groups', () => {
    const config = parseConfig(
      'metrics:\n  - match: __proto__\n    worse: lower\ngroups:\n  - name: constructor\n',
      'p.yml',
    );
    expect(config.rules[0]!.match).toEqual(['__proto__']);
    expect(config.groups[0]).toEqual({ name: 'constructor', match: ['constructor/**'], line: 5 });
  });
});
