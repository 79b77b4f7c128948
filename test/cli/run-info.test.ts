import { describe, expect, it } from 'vitest';
import { createContext, type CliIo } from '../../src/cli/context.js';
import { runInfoFrom } from '../../src/cli/run-info.js';
import { splitNewest } from '../../src/cli/split-newest.js';
import { InputError } from '../../src/errors/input-error.js';

// A fixed machine, so the runner fingerprint of a recorded run is known.
const machine = {
  platform: 'linux',
  arch: 'x64',
  cpuModel: 'AMD EPYC 7763 64-Core Processor',
  cpuCount: 4,
  nodeVersion: 'v24.11.0',
};
const io = (env: Record<string, string | undefined> = {}, isTTY = false): CliIo => ({
  stdout: () => {},
  stderr: () => {},
  cwd: '/',
  env,
  isTTY,
  machine,
});
const clock = () => new Date(Date.UTC(2026, 4, 4, 10, 20, 30));

describe('createContext colour rule', () => {
  // https://no-color.org: NO_COLOR "present and not an empty string" disables colour (common practice).
  it('colour on a TTY unless NO_COLOR is set and non-empty', () => {
    expect(createContext(io({}, true)).color).toBe(true);
    expect(createContext(io({ NO_COLOR: '1' }, true)).color).toBe(false);
    expect(createContext(io({ NO_COLOR: '' }, true)).color).toBe(true);
    expect(createContext(io({}, false)).color).toBe(false);
  });
});

describe('runInfoFrom', () => {
  it('without flags or CI variables: id local-<time>, time now', () => {
    expect(runInfoFrom(createContext(io(), clock), {})).toEqual({
      id: 'local-2026-05-04T10:20:30.000Z',
      time: '2026-05-04T10:20:30.000Z',
      runner: 'Linux X64 | AMD EPYC 7763 64-Core Processor | 4 cpu | node 24.11.0',
    });
  });

  it('GitHub Actions variables fill the gaps; flags win', () => {
    const ctx = createContext(
      io({ GITHUB_RUN_ID: '99', GITHUB_SHA: 'abc', GITHUB_REF: 'refs/heads/main', GITHUB_EVENT_NAME: 'push' }),
      clock,
    );
    expect(runInfoFrom(ctx, {})).toEqual({
      id: '99-1',
      time: '2026-05-04T10:20:30.000Z',
      sha: 'abc',
      ref: 'refs/heads/main',
      event: 'push',
      runner: 'Linux X64 | AMD EPYC 7763 64-Core Processor | 4 cpu | node 24.11.0',
    });
    expect(runInfoFrom(ctx, { id: 'x', sha: 'def' })).toMatchObject({ id: 'x', sha: 'def' });
  });

  it('--time: ISO-8601 with a zone, normalised to UTC', () => {
    const ctx = createContext(io(), clock);
    expect(runInfoFrom(ctx, { time: '2026-05-04T12:20:30+02:00' }).time).toBe('2026-05-04T10:20:30.000Z');
    for (const bad of ['2026-05-04', '2026-05-04T10:20:30', 'yesterday', '2026-13-40T99:99:99Z']) {
      expect(() => runInfoFrom(ctx, { time: bad }), bad).toThrow(InputError);
    }
    expect(() => runInfoFrom(ctx, { id: '  ' })).toThrow(InputError);
  });
});

describe('splitNewest', () => {
  it('makes the newest run "this run" and keeps the earlier ones as history', () => {
    const history = {
      series: 's',
      runs: [{ id: 'a' }, { id: 'b' }, { id: 'c' }],
      columns: new Map([
        ['__proto__', { unit: 'ms', values: [1, 2, 3] }],
        ['only-new', { values: [NaN, NaN, 7] }],
        ['gone', { values: [4, 5, NaN] }],
      ]),
    };
    const { history: before, run, id } = splitNewest(history, 'h.json');
    expect(id).toBe('c');
    expect(before.runs.map((r) => r.id)).toEqual(['a', 'b']);
    expect([...before.columns.keys()]).toEqual(['__proto__', 'gone']);
    expect(before.columns.get('__proto__')?.values).toEqual([1, 2]);
    expect([...run.metrics]).toEqual([
      ['__proto__', { value: 3, unit: 'ms', count: 1 }],
      ['only-new', { value: 7, count: 1 }],
    ]);
  });

  it('an empty history is an InputError saying to pass --metrics', () => {
    expect(() => splitNewest({ series: 's', runs: [], columns: new Map() }, 'h.json')).toThrow(/nothing to judge/);
  });
});
