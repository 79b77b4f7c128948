import { mkdir, mkdtemp, rm, writeFile } from 'node:fs/promises';
import { tmpdir } from 'node:os';
import path from 'node:path';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { DEFAULT_LIMITS } from '../../src/inputs/limits.js';
import { splitPattern } from '../../src/inputs/pattern.js';
import { readMetricFiles } from '../../src/inputs/read-files.js';
import { InputError } from '../../src/errors/input-error.js';
import { inputErrorOf } from './helpers.js';

let dir = '';
const options = (extra: object = {}) => ({
  limits: DEFAULT_LIMITS,
  aggregateFor: () => 'median' as const,
  cwd: dir,
  ...extra,
});

beforeAll(async () => {
  dir = await mkdtemp(path.join(tmpdir(), 'bellgate-inputs-'));
  await mkdir(path.join(dir, 'bench'));
  await writeFile(
    path.join(dir, 'bench', 'a.txt'),
    'goos: linux\nBenchmarkRoute-8 100 400 ns/op\nBenchmarkRoute-8 100 420 ns/op\n',
  );
  await writeFile(path.join(dir, 'bench', 'b.txt'), 'BenchmarkRoute-8 100 410 ns/op\n');
  await writeFile(path.join(dir, 'size.json'), '{"metrics": [{"name": "bundle", "value": 2, "unit": "KiB"}]}');
  await writeFile(path.join(dir, 'size2.csv'), 'name,value,unit\nbundle,1024,B\n');
  await writeFile(
    path.join(dir, 'latin1.csv'),
    Buffer.from([0x6e, 0x61, 0x6d, 0x65, 0x2c, 0x76, 0x61, 0x6c, 0x75, 0x65, 0x0a, 0xe9, 0x2c, 0x31, 0x0a]),
  );
  await writeFile(path.join(dir, '[odd].json'), '{"odd": 1}');
});

afterAll(async () => {
  await rm(dir, { recursive: true, force: true });
});

describe('splitPattern', () => {
  it('splits "path => prefix" and trims slashes around the prefix', () => {
    expect(splitPattern('out/*.json => /api/')).toEqual({ pattern: 'out/*.json', prefix: 'api' });
    expect(splitPattern(' out/*.json ')).toEqual({ pattern: 'out/*.json' });
    expect(inputErrorOf(() => splitPattern('out.json => /')).message).toMatch(/empty prefix/);
    expect(inputErrorOf(() => splitPattern(' => p')).message).toMatch(/empty metric file pattern/);
  });
});

describe('readMetricFiles', () => {
  it('expands globs, treats repeated lines and files as samples and keeps meta', async () => {
    const run = await readMetricFiles(['bench/*.txt'], options());
    expect(run.metrics.get('BenchmarkRoute/ns/op')).toMatchObject({ value: 410, unit: 'ns/op', count: 3 });
    expect(run.meta.get('goos')).toBe('linux');
    expect(run.meta.get('gomaxprocs')).toBe('8');
  });

  it('reads a file matched twice only once', async () => {
    const run = await readMetricFiles(['bench/b.txt', 'bench/*.txt'], options());
    expect(run.metrics.get('BenchmarkRoute/ns/op')!.count).toBe(3);
  });

  it('prefixes names with "=> prefix" or the prefixes option, joined with /', async () => {
    const run = await readMetricFiles(
      ['bench/b.txt => server', 'size.json'],
      options({ prefixes: new Map([['size.json', 'web/']]) }),
    );
    expect([...run.metrics.keys()].sort()).toEqual(['server/BenchmarkRoute/ns/op', 'web/bundle']);
  });

  it('converts units across files to the first-seen one (2 KiB and 1024 B -> KiB)', async () => {
    const run = await readMetricFiles(['size.json', 'size2.csv'], options({ aggregateFor: () => 'mean' }));
    expect(run.metrics.get('bundle')).toMatchObject({ value: 1.5, unit: 'KiB', count: 2 });
  });

  it('expands absolute globs too, and names files relative to the working directory', async () => {
    const run = await readMetricFiles([path.join(dir, 'bench', '*.txt')], options({ cwd: path.join(dir, 'bench') }));
    expect(run.metrics.get('BenchmarkRoute/ns/op')!.count).toBe(3);
    const error = (await readMetricFiles(['latin1.csv'], options()).catch((e: unknown) => e)) as InputError;
    expect(error.where).not.toContain(dir);
  });

  it('takes an existing path literally even with glob characters', async () => {
    const run = await readMetricFiles(['[odd].json'], options());
    expect(run.metrics.get('odd')?.value).toBe(1);
  });

  it('refuses a pattern with no match, a directory, and an empty list', async () => {
    await expect(readMetricFiles(['nothing/*.json'], options())).rejects.toThrow(
      /no metric file matches "nothing\/\*\.json"/,
    );
    await expect(readMetricFiles(['bench'], options())).rejects.toThrow(/is a directory/);
    await expect(readMetricFiles([], options())).rejects.toBeInstanceOf(InputError);
  });

  it('refuses a file that is not UTF-8, naming it', async () => {
    const error = await readMetricFiles(['latin1.csv'], options()).catch((e: unknown) => e);
    expect(error).toBeInstanceOf(InputError);
    expect((error as InputError).where).toBe('latin1.csv');
    expect((error as InputError).message).toBe('the file is not UTF-8 text');
  });

  it('refuses a file over limits.max-file-bytes before reading it', async () => {
    const limits = { ...DEFAULT_LIMITS, maxFileBytes: 10 };
    const error = (await readMetricFiles(['size.json'], options({ limits })).catch((e: unknown) => e)) as InputError;
    expect(error).toBeInstanceOf(InputError);
    expect(error.message).toMatch(/^the file is \d+ bytes \(limit limits\.max-file-bytes = 10\)$/);
    expect(error.fix).toMatch(/raise limits\.max-file-bytes/);
  });

  it('refuses more than limits.max-metrics metrics over all files', async () => {
    const limits = { ...DEFAULT_LIMITS, maxMetrics: 1 };
    await expect(readMetricFiles(['bench/b.txt', 'size.json'], options({ limits }))).rejects.toThrow(
      /limits\.max-metrics = 1/,
    );
  });

  it('refuses a prefixed name that grows past 512 characters', async () => {
    await expect(readMetricFiles([`size.json => ${'p'.repeat(510)}`], options())).rejects.toThrow(
      /more than the 512 allowed/,
    );
  });
});
