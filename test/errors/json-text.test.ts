import { describe, expect, it } from 'vitest';
import { InputError } from '../../src/errors/input-error.js';
import { jsonErrorOffset, lineColumn, parseJsonText, whereAt } from '../../src/errors/json-text.js';

function refusal(text: string, line?: number): InputError {
  try {
    parseJsonText(text, 'f.json', line);
  } catch (error) {
    expect(error).toBeInstanceOf(InputError);
    return error as InputError;
  }
  return expect.fail('expected an InputError');
}

// Positions are 1-based lines and columns, counted by hand in the literal texts.
describe('parseJsonText', () => {
  it('parses valid JSON (RFC 8259 section 2: a bare value is a complete JSON text)', () => {
    expect(parseJsonText('{"a": [1, 2.5e3, null]}', 'f.json')).toEqual({ a: [1, 2500, null] });
    expect(parseJsonText(' 42 ', 'f.json')).toBe(42);
    expect(parseJsonText('\uFEFF"x"', 'f.json')).toBe('x');
  });

  it('points at the character where the text stops being JSON', () => {
    // A missing comma on line 3 after the value 1: the quote that opens "b" is column 7.
    expect(refusal('{\n  "a":\n    1 "b": 2}').where).toBe('f.json:3:7');
    // A trailing comma (RFC 8259 section 4 forbids it): the '}' on line 3, column 1.
    expect(refusal('{\n  "a": 1,\n}').where).toBe('f.json:3:1');
    // NaN is not JSON (RFC 8259 section 6) and V8 states no position for it: the N is line 3, column 8.
    expect(refusal('{\n  "a": 1,\n  "b": NaN\n}').where).toBe('f.json:3:8');
    // A bare word in a long document, where V8 quotes context instead of a position: "tru" starts at
    // column 9 of line 2 and could still grow into "true", so the ',' after it (column 12) is the first
    // character no JSON text can have there.
    const long = `{"padding": "${'p'.repeat(60)}",\n"flag": tru, "more": [${'1,'.repeat(30)}1]}`;
    expect(refusal(long).where).toBe('f.json:2:12');
    // A truncated document: the position is its end.
    expect(refusal('{"a": "xyz').where).toBe('f.json:1:11');
  });

  it('says malformed JSON, and that an empty file is empty', () => {
    const empty = refusal('');
    expect(empty.where).toBe('f.json:1:1');
    expect(empty.message).toMatch(/^malformed JSON: /);
    expect(empty.fix).toMatch(/the file is empty/);
    expect(refusal('{"a": 1 x}').fix).toMatch(/repair the JSON at that spot/);
  });

  it('puts the position of one JSON Lines line on that line of the file', () => {
    // Line 7 of a file, "x" in column 9.
    expect(refusal('{"a": 1 x}', 7).where).toBe('f.json:7:9');
  });
});

describe('whereAt', () => {
  it('counts lines at "\\n" (so "\\r\\n" ends one line) and columns from 1', () => {
    expect(whereAt('m', 'ab\ncd\n', 0)).toBe('m:1:1');
    expect(whereAt('m', 'ab\r\ncd', 5)).toBe('m:2:2');
    expect(whereAt('m', 'ab', 99)).toBe('m:1:3');
  });
});

describe('jsonErrorOffset and lineColumn', () => {
  it('takes the position V8 states, or searches when it states none', () => {
    expect(jsonErrorOffset('{"a":1 x', 'Unexpected token in JSON at position 7')).toBe(7);
    // "NaN" is not JSON (RFC 8259 section 6): offset 5 is the N, counted by hand.
    expect(jsonErrorOffset('{"a":NaN}', 'Unexpected token \'N\', "{"a":NaN}" is not valid JSON')).toBe(5);
  });

  it('counts 1-based lines and columns', () => {
    expect(lineColumn('ab\ncd\n', 4)).toEqual({ line: 2, column: 2 });
    expect(lineColumn('ab\ncd\n', 6)).toEqual({ line: 3, column: 1 });
  });
});
