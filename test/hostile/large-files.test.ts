// Large and endless inputs through the built CLI in a child process under a hard heap cap
// (--max-old-space-size=512, the bound): each must end as a clear refusal (exit 2, the
// limit and the key to raise), never as a killed process. Nothing here is timed; a run that does
// not end is killed by the child timeout and fails. Each metric file is about 58 MB, inside the
// default limits.max-file-bytes (64 MiB), with far more samples than limits.max-samples allows.
import { spawnSync } from 'node:child_process';
import { existsSync, mkdtempSync, rmSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join, resolve } from 'node:path';
import { afterAll, describe, expect, it } from 'vitest';
import { DEFAULT_LIMITS } from '../../src/inputs/limits.js';

const root = resolve(import.meta.dirname, '..', '..');
const cli = join(root, 'dist', 'cli', 'index.js');
const built = existsSync(cli);
if (!built) console.warn(`large-file tests skipped: ${cli} is absent; run npm run build`);

const work = mkdtempSync(join(tmpdir(), 'bellgate-large-'));
afterAll(() => rmSync(work, { recursive: true, force: true }));

const SIZE = 58 * 1024 * 1024;

/** A file of about 58 MB: the header, then `line(i)` for i = 0, 1, ... until the size is reached. */
function write(name: string, header: string, line: (i: number) => string, footer = ''): string {
  const block: string[] = [];
  for (let i = 0; i < 1000; i++) block.push(line(i));
  const chunk = block.join('');
  writeFileSync(join(work, name), header + chunk.repeat(Math.ceil(SIZE / chunk.length)) + footer);
  return name;
}

function bellgate(args: string[]): { code: number | null; signal: string | null; stderr: string } {
  const r = spawnSync(process.execPath, ['--max-old-space-size=512', cli, ...args], {
    cwd: work,
    encoding: 'utf8',
    timeout: 240_000,
    env: { PATH: process.env.PATH ?? '', NO_COLOR: '1' },
  });
  return { code: r.status, signal: r.signal, stderr: r.stderr };
}

const CASES: Array<[string, () => string]> = [
  ['CSV, long form', () => write('long.csv', 'name,value\n', (i) => `m${i % 10},${i}\n`)],
  [
    'CSV, wide form',
    () =>
      write(
        'wide.csv',
        'a,b,c,d,e,f,g,h\n',
        (i) =>
          `${Array(8)
            .fill(i % 97)
            .join(',')}\n`,
      ),
  ],
  ['JSON Lines', () => write('big.jsonl', '', (i) => `{"name":"m${i % 10}","value":${i}}\n`)],
  ['Go benchmark format', () => write('big.txt', '', (i) => `BenchmarkX${i % 10}-8 100 ${i} ns/op\n`)],
  ['OpenMetrics', () => write('big.prom', '', (i) => `m${i % 10} ${i}\n`)],
  [
    'JUnit XML',
    () =>
      write(
        'big.xml',
        '<testsuite name="s">\n',
        (i) => `<testcase name="t${i % 10}" time="${i}"/>\n`,
        '</testsuite>\n',
      ),
  ],
];

describe.skipIf(!built)('a 58 MB metric file within the default limits, under a 512 MB heap', () => {
  it.each(CASES)('%s is refused at limits.max-samples', (_label, make) => {
    const file = make();
    const r = bellgate(['check', '--metrics', file]);
    rmSync(join(work, file));
    expect(r.signal, r.stderr).toBeNull();
    expect(r.code, r.stderr).toBe(2);
    expect(r.stderr).toContain(`(limit limits.max-samples = ${DEFAULT_LIMITS.maxSamples})`);
    expect(r.stderr).toContain('fix: raise limits.max-samples in the config file');
  });
});

describe.skipIf(!built || process.platform === 'win32')('endless files through the built CLI', () => {
  it('--config /dev/zero and --metrics /dev/zero are refused at once, as devices', () => {
    const config = bellgate(['check', '--metrics', 'none.json', '--config', '/dev/zero']);
    expect(config.code, config.stderr).toBe(2);
    expect(config.stderr).toContain('config file /dev/zero is a device, not a regular file');
    const metrics = bellgate(['check', '--metrics', '/dev/zero']);
    expect(metrics.code, metrics.stderr).toBe(2);
    expect(metrics.stderr).toContain('metric file /dev/zero is a device, not a regular file');
  });
});
