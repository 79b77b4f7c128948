// How metric file patterns meet the files: `--prefix PATTERN=PREFIX` is matched against each file
// the globs found (not the literal --metrics text), and paths and globs are accepted with either
// separator, as a Windows runner writes them (`out\bench\*.json`, GITHUB_WORKSPACE `D:\a\app\app`).
import { mkdir, mkdtemp, rm, writeFile } from 'node:fs/promises';
import { tmpdir } from 'node:os';
import path from 'node:path';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { parsePrefixes } from '../../src/cli/load-run.js';
import { DEFAULT_LIMITS } from '../../src/inputs/limits.js';
import { readMetricFiles, slashes } from '../../src/inputs/read-files.js';
import { InputError } from '../../src/errors/input-error.js';

let dir = '';
async function refusal(reading: Promise<unknown>): Promise<InputError> {
  const error = await reading.then(
    () => undefined,
    (e: unknown) => e,
  );
  expect(error).toBeInstanceOf(InputError);
  return error as InputError;
}
const options = (extra: object = {}) => ({
  limits: DEFAULT_LIMITS,
  aggregateFor: () => 'median' as const,
  cwd: dir,
  ...extra,
});

beforeAll(async () => {
  dir = await mkdtemp(path.join(tmpdir(), 'bellgate-patterns-'));
  for (const [pkg, value] of [
    ['a', 12],
    ['b', 40],
  ] as const) {
    await mkdir(path.join(dir, 'pkgs', pkg), { recursive: true });
    await writeFile(path.join(dir, 'pkgs', pkg, 'bench.json'), JSON.stringify({ 'time/parse': value }));
  }
  await mkdir(path.join(dir, 'out', 'bench'), { recursive: true });
  await writeFile(path.join(dir, 'out', 'bench', 'route.json'), JSON.stringify({ 'route/match': 412 }));
});
afterAll(() => rm(dir, { recursive: true, force: true }));

describe('--prefix is matched against each file found', () => {
  it('pkgs/*/bench.json with pkgs/a/*=pkg-a keeps the two packages apart', async () => {
    const run = await readMetricFiles(['pkgs/*/bench.json'], options({ prefixes: parsePrefixes(['pkgs/a/*=pkg-a']) }));
    expect([...run.metrics.keys()].sort()).toEqual(['pkg-a/time/parse', 'time/parse']);
    expect(run.metrics.get('pkg-a/time/parse')).toMatchObject({ value: 12, count: 1 });
    expect(run.metrics.get('time/parse')).toMatchObject({ value: 40, count: 1 });
  });

  it('one prefix per package, by glob or by exact path', async () => {
    const run = await readMetricFiles(
      ['pkgs/*/bench.json'],
      options({ prefixes: parsePrefixes(['pkgs/a/**=pkg-a', 'pkgs/b/bench.json=pkg-b']) }),
    );
    expect([...run.metrics.keys()].sort()).toEqual(['pkg-a/time/parse', 'pkg-b/time/parse']);
  });

  it('a --prefix pattern that matches none of the files found is an error, not a silent no-op', async () => {
    const e = await refusal(
      readMetricFiles(['pkgs/*/bench.json'], options({ prefixes: parsePrefixes(['pkg/a/*=pkg-a']) })),
    );
    expect(e.describe()).toMatch(
      /--prefix "pkg\/a\/\*" matches none of the metric files found \(pkgs\/a\/bench\.json, pkgs\/b\/bench\.json\)/,
    );
  });

  it('two patterns giving one file different prefixes are refused', async () => {
    const e = await refusal(
      readMetricFiles(['pkgs/*/bench.json'], options({ prefixes: parsePrefixes(['pkgs/**=all', 'pkgs/a/*=pkg-a']) })),
    );
    expect(e.describe()).toMatch(/pkgs\/a\/bench\.json is matched by --prefix patterns with different prefixes/);
  });
});

describe('paths and globs as a Windows runner gives them', () => {
  it('a glob written with backslashes matches', async () => {
    const run = await readMetricFiles(['out\\bench\\*.json'], options());
    expect([...run.metrics.keys()]).toEqual(['route/match']);
  });

  it('a path written with backslashes, and mixed separators, are read', async () => {
    expect([...(await readMetricFiles(['out\\bench\\route.json'], options())).metrics.keys()]).toEqual(['route/match']);
    expect([...(await readMetricFiles(['out/bench\\*.json'], options())).metrics.keys()]).toEqual(['route/match']);
  });

  it('a --prefix pattern with backslashes matches the files', async () => {
    const run = await readMetricFiles(
      ['pkgs\\*\\bench.json'],
      options({ prefixes: parsePrefixes(['pkgs\\a\\*=pkg-a']) }),
    );
    expect([...run.metrics.keys()].sort()).toEqual(['pkg-a/time/parse', 'time/parse']);
  });

  it('turns a Windows workspace path into the slashes globs use', () => {
    expect(slashes('D:\\a\\app\\app\\out\\bench\\*.json')).toBe('D:/a/app/app/out/bench/*.json');
    expect(path.win32.relative('D:\\a\\app\\app', 'D:\\a\\app\\app\\out\\bench\\route.json')).toBe(
      'out\\bench\\route.json',
    );
    expect(slashes(path.win32.relative('D:\\a\\app\\app', 'D:\\a\\app\\app\\out\\bench\\route.json'))).toBe(
      'out/bench/route.json',
    );
  });
});
