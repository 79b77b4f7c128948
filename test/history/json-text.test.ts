import { describe, expect, it } from 'vitest';
import { InputError } from '../../src/errors/input-error.js';
import { lineColumn, parseJsonText, syntaxErrorOffset } from '../../src/history/json-text.js';

function whereOf(text: string): string | undefined {
  try {
    parseJsonText(text, 'f.json');
  } catch (error) {
    expect(error).toBeInstanceOf(InputError);
    return (error as InputError).where;
  }
  return expect.fail('expected an InputError');
}

describe('parseJsonText', () => {
  it('parses valid JSON (RFC 8259 examples: a bare value is a valid text)', () => {
    expect(parseJsonText('{"a": [1, 2.5e3, null]}', 'f.json')).toEqual({ a: [1, 2500, null] });
    // RFC 8259 section 2: "JSON-text = ws value ws" — a lone number or string is a complete text.
    expect(parseJsonText(' 42 ', 'f.json')).toBe(42);
    expect(parseJsonText('\uFEFF"x"', 'f.json')).toBe('x');
  });

  it('points at the line and column where the parser stopped', () => {
    // A missing comma on line 3 after the value 1: V8 states "position" -> line 3, column 7 (the quote that opens "b").
    expect(whereOf('{\n  "a":\n    1 "b": 2}')).toBe('f.json:3:7');
    // Unterminated string: the parser reports the end of the text.
    expect(whereOf('{"a": "xyz')).toMatch(/^f\.json:1:\d+$/);
    // A bare word in a long document: V8 quotes the context instead of a position.
    const long = `{"padding": "${'p'.repeat(60)}",\n"flag": tru, "more": [${'1,'.repeat(30)}1]}`;
    expect(whereOf(long)).toMatch(/^f\.json:2:1[0-4]$/);
    expect(whereOf('')).toBe('f.json:1:1');
  });

  it('lineColumn counts 1-based lines and columns', () => {
    expect(lineColumn('ab\ncd\n', 0)).toEqual({ line: 1, column: 1 });
    expect(lineColumn('ab\ncd\n', 4)).toEqual({ line: 2, column: 2 });
    expect(lineColumn('ab\ncd\n', 6)).toEqual({ line: 3, column: 1 });
    expect(lineColumn('ab', 99)).toEqual({ line: 1, column: 3 });
  });

  it('syntaxErrorOffset falls back to 0 for a message it does not know', () => {
    expect(syntaxErrorOffset('{}', 'something else')).toBe(0);
    expect(syntaxErrorOffset('{"a":1 x', 'Unexpected token in JSON at position 7')).toBe(7);
  });
});
