// Reads one hostile zip case with the artifact store's zip reader and prints what happened as one
// JSON line: the refusal (or the bytes read), peak memory and CPU time. Run by
// test/hostile/history-files.test.ts in a child process under a hard heap limit.
import { readFileSync } from 'node:fs';
import { DEFAULT_ZIP_LIMITS, readZipEntries } from '../../../src/history/artifact-zip.js';
import { craftZip, deflatedZeros, zip64Claiming } from '../zip-craft.js';

const cases: Record<string, () => Buffer | Promise<Buffer>> = {
  'ten-million-entries': () => zip64Claiming(10_000_000n),
  'four-billion-entries': () => zip64Claiming(2n ** 32n - 1n),
  // 1 GiB of zeros deflates to about 1 MB; the headers say 1,000 bytes.
  'lies-about-its-size': async () =>
    craftZip([
      {
        name: 'history.jsonl',
        data: Buffer.alloc(0),
        body: await deflatedZeros(1024 ** 3),
        declaredSize: 1000,
        declaredCrc: 0,
      },
    ]),
  'declares-two-gigabytes': () =>
    craftZip([{ name: 'history.jsonl', data: Buffer.from('{}\n'), declaredSize: 2 ** 31 }]),
  'claims-more-entries-than-it-has': () => craftZip([{ name: 'history.jsonl', data: Buffer.from('{}\n') }], 60_000),
};

const name = process.argv[2] ?? '';
const make = cases[name];
if (!make) throw new Error(`no case ${name}`);
const zip = await make();
const before = process.cpuUsage();
let outcome: Record<string, unknown>;
try {
  const files = readZipEntries(zip, ['history.jsonl'], DEFAULT_ZIP_LIMITS);
  outcome = { read: files.get('history.jsonl')?.length ?? null };
} catch (error) {
  outcome = { refused: `${(error as Error).name}: ${(error as Error).message}` };
}
const cpu = process.cpuUsage(before);
process.stdout.write(
  `${JSON.stringify({ ...outcome, zipBytes: zip.length, maxRssMiB: peakMiB(), cpuMs: Math.round((cpu.user + cpu.system) / 1000) })}\n`,
);

/**
 * Peak resident memory of this process (Linux VmHWM). Not ru_maxrss: after fork and exec that
 * still counts the parent's peak (the test runner's), so it would say nothing about this process.
 */
function peakMiB(): number {
  const kib = /VmHWM:\s*(\d+)\s*kB/.exec(readFileSync('/proc/self/status', 'utf8'))?.[1];
  return kib === undefined ? -1 : Math.round(Number(kib) / 1024);
}
