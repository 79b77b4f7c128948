import { describe, expect, it } from 'vitest';
import { InputError } from '../../src/errors/input-error.js';
import { StoreError } from '../../src/history/store.js';

// GitHub Actions reads a log line that starts with "::" as a workflow command (GitHub's docs,
// "Workflow commands for GitHub Actions"): a line feed quoted from input must not start one.
describe('error messages quote input on one line', () => {
  const name = 'x\n::error title=pwn::injected';

  it('InputError: where, message and fix keep a quoted line feed escaped, the fix on its own line', () => {
    const text = new InputError(`metric name ${name} is bad`, {
      where: `m.json (${name})`,
      fix: 'rename it',
    }).describe();
    expect(text.split('\n').some((line) => line.startsWith('::'))).toBe(false);
    expect(text).toContain('x\\u{000A}::error');
    expect(text.split('\n').at(-1)).toBe('  fix: rename it');
  });

  it('StoreError does the same', () => {
    const text = new StoreError(`series ${name}`, { where: 'h.jsonl', fix: 'pass --series' }).describe();
    expect(text.split('\n').some((line) => line.startsWith('::'))).toBe(false);
    expect(text).toBe('h.jsonl: series x\n\\u{003A}:error title=pwn::injected\n  fix: pass --series');
  });
});
