import { CommanderError } from 'commander';
import { describe, expect, it } from 'vitest';
import { toFailure } from '../../src/cli/errors.js';
import { closeNames, editDistance } from '../../src/cli/close-names.js';
import { parsePrefixes } from '../../src/cli/load-run.js';
import { InputError } from '../../src/errors/input-error.js';
import { StoreError } from '../../src/history/store.js';

describe('toFailure: one message and the documented exit code for anything thrown', () => {
  it('InputError -> 2 with where and fix', () => {
    const f = toFailure(new InputError('value is not a number', { where: 'bench.json:3:14', fix: 'write a number' }));
    expect(f).toEqual({ code: 2, text: 'bellgate: bench.json:3:14: value is not a number\n  fix: write a number' });
  });

  it('StoreError -> 3 naming the store', () => {
    const f = toFailure(
      new StoreError('cannot read the history file', { where: 'file h.json', fix: 'check the path' }),
    );
    expect(f.code).toBe(3);
    expect(f.text).toContain('file h.json');
    expect(f.text).toContain('fix: check the path');
  });

  it('commander help -> 0 silently; usage errors -> 2 silently (commander printed them)', () => {
    expect(toFailure(new CommanderError(0, 'commander.helpDisplayed', '(outputHelp)'))).toEqual({ code: 0, text: '' });
    expect(toFailure(new CommanderError(1, 'commander.unknownOption', "error: unknown option '--x'"))).toEqual({
      code: 2,
      text: '',
    });
  });

  it('a file-system error -> 2 naming the path, no stack', () => {
    const e = Object.assign(new Error("EACCES: permission denied, open '/ro/report.md'"), {
      code: 'EACCES',
      path: '/ro/report.md',
      syscall: 'open',
    });
    expect(toFailure(e)).toEqual({ code: 2, text: 'bellgate: cannot open /ro/report.md: permission denied' });
  });

  it('anything else -> 2, one line and a request to report it; never the stack', () => {
    const e = new TypeError('x.y is not a function\n    at f (/src/a.ts:1:1)');
    const f = toFailure(e);
    expect(f.code).toBe(2);
    expect(f.text).toContain('internal error: x.y is not a function');
    expect(f.text).toContain('please report');
    expect(f.text).not.toContain('/src/a.ts');
    expect(toFailure('a string').text).toContain('a string');
  });
});

describe('closeNames', () => {
  // Levenshtein distances checked by hand: kitten -> sitting is the textbook 3 (from memory).
  it('edit distance', () => {
    expect(editDistance('kitten', 'sitting')).toBe(3);
    expect(editDistance('', 'abc')).toBe(3);
    expect(editDistance('same', 'same')).toBe(0);
  });

  it('suggests near names first, and nothing for far ones', () => {
    expect(closeNames('latency/p59', ['latency/p50', 'size/app.js', 'latency/p95'])).toEqual([
      'latency/p50',
      'latency/p95',
    ]);
    expect(closeNames('zzzzzzzz', ['latency/p50'])).toEqual([]);
    expect(closeNames('__proto__', ['__proto__', 'constructor'])).toEqual(['__proto__']);
  });
});

describe('parsePrefixes', () => {
  it('splits PATTERN=PREFIX at the last =', () => {
    expect([...parsePrefixes(['bench/*.json=api', 'a=b=c'])]).toEqual([
      ['bench/*.json', 'api'],
      ['a=b', 'c'],
    ]);
  });

  it('refuses a value without both sides', () => {
    expect(() => parsePrefixes(['bench.json'])).toThrow(InputError);
    expect(() => parsePrefixes(['=api'])).toThrow(InputError);
    expect(() => parsePrefixes(['bench.json='])).toThrow(InputError);
  });
});
