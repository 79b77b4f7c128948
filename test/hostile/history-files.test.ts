// Hostile history input that must be refused before it costs time or memory: a history path that
// is not a regular file (/dev/zero, a FIFO, a folder), and artifact zips that lie — a 98-byte zip
// claiming 10 million entries (APPNOTE.TXT 4.3.14: the ZIP64 end record holds a 64-bit count), and
// one whose headers declare 1,000 bytes for an entry that inflates to 1 GiB. Each runs in a child
// process (the CLI, or the zip reader, bundled by test/helpers/bundle.ts) under a hard heap limit,
// so a case that tried to read everything would die of it; the refusal and its message are checked,
// never the time taken.
import { execFileSync, spawnSync } from 'node:child_process';
import { mkdirSync, mkdtempSync, rmSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { bundleScript } from '../helpers/bundle.js';
import { STACK_LINE } from './guards.js';

const HEAP_MIB = 96;
let work: string;
let cli: string;
let zipReader: string;

beforeAll(async () => {
  work = mkdtempSync(join(tmpdir(), 'bellgate-hostile-files-'));
  cli = await bundleScript(new URL('./workers/cli.ts', import.meta.url).pathname, join(work, 'cli'));
  zipReader = await bundleScript(new URL('./workers/zip.ts', import.meta.url).pathname, join(work, 'zip'));
});
afterAll(() => rmSync(work, { recursive: true, force: true }));

/** Runs a bundled script under the heap limit; a hang is stopped at 60 s (a bound, not a measurement). */
function capped(
  script: string,
  args: string[],
): { code: number | null; signal: NodeJS.Signals | null; stdout: string; stderr: string } {
  const r = spawnSync(process.execPath, [`--max-old-space-size=${HEAP_MIB}`, script, ...args], {
    cwd: work,
    encoding: 'utf8',
    timeout: 60_000,
    env: { PATH: process.env.PATH ?? '', NO_COLOR: '1' },
  });
  return { code: r.status, signal: r.signal, stdout: r.stdout, stderr: r.stderr };
}

describe('a history that is not a regular file is refused before a byte is read', () => {
  it('check, record, verify and tune refuse /dev/zero, a FIFO and a folder with exit 3 and one plain message', () => {
    const metrics = join(work, 'run.json');
    writeFileSync(metrics, '{"render/frame": 16.4}');
    const fifo = join(work, 'history.fifo');
    execFileSync('mkfifo', [fifo]);
    const folder = join(work, 'history-folder');
    mkdirSync(folder);
    for (const [path, kind] of [
      ['/dev/zero', 'a character device'],
      [fifo, 'a FIFO (named pipe)'],
      [folder, 'a folder'],
    ] as const) {
      for (const args of [
        ['check', '--metrics', metrics, '--history', path],
        ['check', '--metrics', metrics, '--history', path, '--record', '--id', '1-1'],
        ['record', '--metrics', metrics, '--history', path, '--id', '1-1'],
        ['verify', '--history', path],
        ['tune', '--history', path],
      ]) {
        const r = capped(cli, args);
        expect(r.signal, `${args.join(' ')}: ${r.stderr}`).toBeNull();
        expect(r.code, `${args.join(' ')}: ${r.stderr}`).toBe(3);
        expect(r.stderr).toContain(
          `${path} is ${kind}, not a regular file; a history is read only from a regular file`,
        );
        expect(r.stderr).toContain('fix: name a history file');
        expect(r.stderr).not.toMatch(STACK_LINE);
      }
    }
  });
});

describe('artifact zips that lie are refused before they are inflated', () => {
  const cases: Array<[string, RegExp]> = [
    ['ten-million-entries', /^ZipRefusedError: it claims 10000000 entries, more than the 16 allowed$/],
    ['four-billion-entries', /^ZipRefusedError: it claims 4294967295 entries, more than the 16 allowed$/],
    ['claims-more-entries-than-it-has', /^ZipRefusedError: it claims 60000 entries, more than the 16 allowed$/],
    [
      'declares-two-gigabytes',
      /^ZipRefusedError: it declares 2147483648 unzipped bytes, more than the 67108864 allowed$/,
    ],
    [
      'lies-about-its-size',
      /^ZipRefusedError: entry "history\.jsonl" inflates past the 1000 bytes it declares; inflating stopped there$/,
    ],
  ];
  it.each(cases)('%s', (name, message) => {
    const r = capped(zipReader, [name]);
    expect(r.signal, r.stderr).toBeNull();
    expect(r.code, r.stderr).toBe(0);
    const outcome = JSON.parse(r.stdout) as { refused?: string; zipBytes: number; maxRssMiB: number; cpuMs: number };
    expect(outcome.refused).toMatch(message);
    if (name === 'ten-million-entries') expect(outcome.zipBytes).toBe(98);
    // the bound (512 MB); the heap limit above is far below it anyway
    expect(outcome.maxRssMiB).toBeLessThan(512);
    console.log(
      `hostile zip ${name}: ${outcome.zipBytes} bytes, refused using ${outcome.maxRssMiB} MiB peak, ${outcome.cpuMs} ms CPU`,
    );
  });
});
