import { describe, expect, it } from 'vitest';
import { checkMetricName, checkUnit, MAX_NAME_LENGTH } from '../../src/inputs/names.js';
import { inputErrorOf } from './helpers.js';

describe('checkMetricName', () => {
  it('accepts ordinary names, and __proto__ / constructor (names only key Maps)', () => {
    for (const name of ['route/match-static', '__proto__', 'constructor', 'größe [KiB]', 'p99 latency 🐢']) {
      expect(checkMetricName(name, 'x')).toBe(name);
    }
  });

  it('counts characters, not UTF-16 units, against the 512 limit', () => {
    expect(MAX_NAME_LENGTH).toBe(512);
    expect(checkMetricName('a'.repeat(512))).toHaveLength(512);
    // 512 astral characters are 1024 UTF-16 units but 512 characters.
    expect(checkMetricName('🐢'.repeat(512))).toHaveLength(1024);
    const error = inputErrorOf(() => checkMetricName('a'.repeat(513), 'f:1'));
    expect(error.message).toMatch(/513 characters long, more than the 512 allowed/);
    expect(error.where).toBe('f:1');
  });

  it('refuses empty names and names of whitespace only', () => {
    expect(inputErrorOf(() => checkMetricName('')).message).toBe('metric name is empty');
    expect(inputErrorOf(() => checkMetricName(' \t')).message).toBe('metric name is empty');
  });

  it('refuses C0/C1 control characters and DEL', () => {
    for (const c of ['\u0000', '\n', '\u001b', '\u007f', '\u0085', '\u009f']) {
      expect(inputErrorOf(() => checkMetricName(`a${c}b`)).message).toMatch(/control character/);
    }
  });

  it('refuses the bidirectional overrides and isolates U+202A-202E and U+2066-2069 (Unicode TR9)', () => {
    for (let code = 0x202a; code <= 0x202e; code++) {
      expect(inputErrorOf(() => checkMetricName(`a${String.fromCodePoint(code)}b`)).message).toMatch(
        /bidirectional override/,
      );
    }
    for (let code = 0x2066; code <= 0x2069; code++) {
      expect(inputErrorOf(() => checkMetricName(`a${String.fromCodePoint(code)}b`)).message).toMatch(/U\+206[6-9]/);
    }
    // U+200E (left-to-right mark) is not an override and stays allowed.
    expect(checkMetricName('a\u200eb')).toBe('a\u200eb');
  });
});

describe('checkUnit', () => {
  it('accepts plain units and refuses control characters, overrides and long text', () => {
    expect(checkUnit('µs/op')).toBe('µs/op');
    expect(inputErrorOf(() => checkUnit('ms\n', 'f:2')).where).toBe('f:2');
    expect(inputErrorOf(() => checkUnit('m\u202es')).message).toMatch(/bidirectional/);
    expect(inputErrorOf(() => checkUnit('x'.repeat(65))).message).toMatch(/longer than 64/);
  });
});
