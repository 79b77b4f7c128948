import { execFileSync, spawn, spawnSync } from 'node:child_process';
import { closeSync, fstatSync, mkdirSync, openSync, readFileSync, writeFileSync } from 'node:fs';
import { mkdtemp, readdir, readFile, rm, stat, truncate, writeFile } from 'node:fs/promises';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import fc from 'fast-check';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import type { Run } from '../../src/inputs/run.js';
import { parseHistory, serializeHistory } from '../../src/history/document.js';
import { fileLines } from '../../src/history/file-lines.js';
import { createFileStore, HISTORY_FILE_LIMIT, lockPathOf, tempPathOf } from '../../src/history/file-store.js';
import { textLines } from '../../src/history/lines.js';
import { StoreError } from '../../src/history/store.js';
import { bundleScript } from '../helpers/bundle.js';

const run = (value: number, name = 'build/compile'): Run => ({
  metrics: new Map([[name, { value, unit: 's', count: 1 }]]),
  meta: new Map(),
});
const info = (n: number) => ({
  id: `${8100 + n}-1`,
  time: new Date(Date.UTC(2026, 2, n, 10)).toISOString(),
  ref: 'refs/heads/main',
  event: 'push',
});
const record = (n: number, value = 40 + n, keep = 1000) => ({
  kind: 'record' as const,
  info: info(n),
  run: run(value),
  keep,
});

let root: string;
let writer: string;
beforeAll(async () => {
  root = await mkdtemp(join(tmpdir(), 'bellgate-file-store-'));
  writer = await bundleScript(new URL('./workers/file-writer.ts', import.meta.url).pathname, join(root, 'bundle'));
});
afterAll(async () => {
  await rm(root, { recursive: true, force: true });
});

async function rejection(promise: Promise<unknown>): Promise<StoreError> {
  const error = await promise.then(
    () => undefined,
    (e: unknown) => e,
  );
  expect(error).toBeInstanceOf(StoreError);
  return error as StoreError;
}

describe('createFileStore: reading and writing', () => {
  it('reads a missing file as empty; the first record creates folder and file; the next ones append one line each', async () => {
    const path = join(root, 'a', 'deep', 'history.jsonl');
    const store = createFileStore(path, 'linux-x64');
    expect(store.describe()).toBe(`file ${path}`);
    expect((await store.read()).runs).toEqual([]);
    expect(await store.update(record(1))).toEqual({ runs: 1, wrote: 'rewritten' });
    const first = await readFile(path, 'utf8');
    expect(await store.update(record(2))).toEqual({ runs: 2, wrote: 'appended' });
    const second = await readFile(path, 'utf8');
    // an append leaves every byte that was there and adds exactly one line
    expect(second.startsWith(first)).toBe(true);
    expect(second.slice(first.length).split('\n')).toHaveLength(2);
    const back = await store.read();
    expect(back.runs.map((r) => r.id)).toEqual(['8101-1', '8102-1']);
    expect(back.columns.get('build/compile')).toEqual({ unit: 's', values: [41, 42] });
    expect((await readdir(join(root, 'a', 'deep'))).filter((n) => !n.startsWith('.'))).toEqual(['history.jsonl']);
  });

  it('a new metric, a drop and a rename rewrite; a mark is appended as a mark line; all read back', async () => {
    const path = join(root, 'kinds', 'history.jsonl');
    const store = createFileStore(path, 'linux-x64');
    for (let n = 1; n <= 3; n++) await store.update(record(n));
    expect(
      (await store.update({ kind: 'record', info: info(4), run: run(7, 'bundle/app.js'), keep: 1000 })).wrote,
    ).toBe('rewritten');
    expect(
      (await store.update({ kind: 'mark', id: '8102-1', mark: { reason: 'manual', note: 'new compiler' } })).wrote,
    ).toBe('appended');
    expect((await readFile(path, 'utf8')).trimEnd().split('\n').at(-1)).toBe(
      '{"mark":"8102-1","reason":"manual","note":"new compiler"}',
    );
    expect((await store.update({ kind: 'drop', tombstone: { id: '8101-1', reason: 'noisy' } })).wrote).toBe(
      'rewritten',
    );
    expect((await store.update({ kind: 'rename', from: 'bundle/app.js', to: 'bundle/app.js.gz' })).wrote).toBe(
      'rewritten',
    );
    const h = await store.read();
    expect(h.runs.map((r) => r.id)).toEqual(['8102-1', '8103-1', '8104-1']);
    expect(h.runs[0]?.marks).toEqual([{ reason: 'manual', note: 'new compiler' }]);
    expect(h.columns.get('bundle/app.js.gz')?.values).toEqual([NaN, NaN, 7]);
    expect(h.dropped?.has('8101-1')).toBe(true);
    // the dropped run is not recorded again; the file is left as it was
    const before = await readFile(path, 'utf8');
    await expect(store.update(record(1))).rejects.toThrow(/was dropped/);
    expect(await readFile(path, 'utf8')).toBe(before);
  });

  it('a re-run attempt replaces the earlier attempt, by an append', async () => {
    const path = join(root, 'rerun', 'history.jsonl');
    const store = createFileStore(path, 'linux-x64');
    await store.update(record(1));
    await store.update(record(2));
    const outcome = await store.update({
      kind: 'record',
      info: { ...info(2), id: '8102-2' },
      run: run(99),
      keep: 1000,
    });
    expect(outcome).toEqual({ runs: 2, replaced: '8102-1', wrote: 'appended' });
    const h = await store.read();
    expect(h.runs.map((r) => r.id)).toEqual(['8101-1', '8102-2']);
    expect(h.columns.get('build/compile')?.values).toEqual([41, 99]);
  });

  it('trims once the history passes keep by a tenth: appends until then, then one rewrite to keep runs', async () => {
    const path = join(root, 'trim', 'history.jsonl');
    const store = createFileStore(path, 'linux-x64');
    const wrote: string[] = [];
    for (let n = 1; n <= 13; n++) wrote.push((await store.update(record(n, 40 + n, 10))).wrote);
    // keep 10, slack 1: runs 2..11 append, the 12th would make 12 > 11 and rewrites to 10
    expect(wrote).toEqual(['rewritten', ...Array(10).fill('appended'), 'rewritten', 'appended']);
    const h = await store.read();
    expect(h.runs).toHaveLength(11);
    expect(h.runs[0]?.id).toBe('8103-1');
  });

  it('reads only the newest runs from the end of the file, the same as the whole read', async () => {
    const path = join(root, 'tail', 'history.jsonl');
    const store = createFileStore(path, 'linux-x64');
    for (let n = 1; n <= 30; n++) await store.update(record(n));
    const whole = await store.read();
    const tail = await store.read({ newest: 7 });
    expect(tail.runs).toEqual(whole.runs.slice(-7));
    expect(tail.columns.get('build/compile')?.values).toEqual(whole.columns.get('build/compile')?.values.slice(-7));
  });

  it('keeps the file mode of an existing file when it rewrites it', async () => {
    const path = join(root, 'mode', 'history.jsonl');
    const store = createFileStore(path, 'linux-x64');
    await store.update(record(1));
    execFileSync('chmod', ['640', path]);
    await store.update({ kind: 'drop', tombstone: { id: '8101-1' } });
    expect((await stat(path)).mode & 0o777).toBe(0o640);
  });
});

describe('createFileStore: refusals (the file is never written over)', () => {
  it('a corrupt file is a StoreError on read and on update naming file and line, and its bytes are kept', async () => {
    const path = join(root, 'corrupt', 'history.jsonl');
    const store = createFileStore(path, 'linux-x64');
    await store.update(record(1));
    await store.update(record(2));
    const broken = (await readFile(path, 'utf8')).replace('"values":[42]', '"values":[42');
    await writeFile(path, broken);
    const error = await rejection(store.read());
    expect(error.describe()).toMatch(new RegExp(`${path.replace(/[/.]/g, '\\$&')}:3:\\d+: not valid JSON`));
    expect(error.describe()).toMatch(/bellgate verify --history/);
    await rejection(store.update({ kind: 'drop', tombstone: { id: '8101-1' } }));
    expect(await readFile(path, 'utf8')).toBe(broken);
  });

  it('a file of a newer format says to upgrade, another series is refused, and neither is written over', async () => {
    const path = join(root, 'newer', 'history.jsonl');
    await rm(join(root, 'newer'), { recursive: true, force: true });
    await writeFile(
      join(await mkdirP(join(root, 'newer')), 'history.jsonl'),
      '{"schema":"bellgate.history/9","series":"linux-x64"}\n',
    );
    expect((await rejection(createFileStore(path, 'linux-x64').read())).describe()).toMatch(/upgrade Bellgate/);
    const other = join(root, 'newer', 'other.jsonl');
    await writeFile(other, serializeHistory({ series: 'windows', runs: [], columns: new Map() }));
    const error = await rejection(createFileStore(other, 'linux-x64').update(record(1)));
    expect(error.describe()).toMatch(/holds the history of series "windows"/);
    expect(await readFile(other, 'utf8')).toBe('{"schema":"bellgate.history/3","series":"windows","metrics":[]}\n');
  });

  it('refuses what is not a regular file before reading a byte: a folder, /dev/zero, a FIFO', async () => {
    const folder = join(root, 'not-regular');
    mkdirSync(folder, { recursive: true });
    const fifo = join(folder, 'pipe');
    execFileSync('mkfifo', [fifo]);
    for (const [path, kind] of [
      [folder, 'a folder'],
      ['/dev/zero', 'a character device'],
      [fifo, 'a FIFO (named pipe)'],
    ] as const) {
      for (const attempt of [
        () => createFileStore(path, 's').read(),
        () => createFileStore(path, 's').read({ newest: 5 }),
        () => createFileStore(path, 's').update(record(1)),
      ]) {
        const error = await rejection(attempt());
        expect(error.message).toBe(
          `${path} is ${kind}, not a regular file; a history is read only from a regular file`,
        );
        expect(error.fix).toMatch(/name a history file/);
      }
    }
  });

  it('a file over the size limit is refused by size before it is read, and kept', async () => {
    const path = join(root, 'huge', 'history.jsonl');
    await mkdirP(join(root, 'huge'));
    await writeFile(path, '');
    await truncate(path, HISTORY_FILE_LIMIT + 1); // sparse: no disk used
    const error = await rejection(createFileStore(path, 's').read());
    expect(error.message).toMatch(/over the limit of 500\.0 MiB/);
    expect((await stat(path)).size).toBe(HISTORY_FILE_LIMIT + 1);
  });
});

describe('createFileStore: killed writers and torn lines', () => {
  it('a torn last line is ignored by a read (with a note) and cut off by the next record; no run is lost', async () => {
    const path = join(root, 'torn', 'history.jsonl');
    const notes: string[] = [];
    const store = createFileStore(path, 'linux-x64', { warn: (m) => notes.push(m) });
    await store.update(record(1));
    await store.update(record(2));
    const whole = await readFile(path, 'utf8');
    const torn = '{"id":"8103-1","time":"2026-03-03T10:0';
    await writeFile(path, `${whole}${torn}`);
    expect((await store.read()).runs.map((r) => r.id)).toEqual(['8101-1', '8102-1']);
    expect((await store.read({ newest: 1 })).runs.map((r) => r.id)).toEqual(['8102-1']);
    expect(notes.at(-1)).toMatch(/:4: ignored the last line, which a write that was cut short left incomplete/);
    expect((await store.update(record(3))).wrote).toBe('appended');
    expect(notes.at(-1)).toMatch(new RegExp(`cut off an incomplete last line \\(${torn.length} bytes\\)`));
    const after = await readFile(path, 'utf8');
    expect(after.startsWith(whole)).toBe(true);
    expect(parseHistory(after, 'h').runs.map((r) => r.id)).toEqual(['8101-1', '8102-1', '8103-1']);
  });

  it('a last line that lacks only its newline is kept, and the next append ends it first', async () => {
    const path = join(root, 'no-newline', 'history.jsonl');
    const store = createFileStore(path, 'linux-x64');
    await store.update(record(1));
    await store.update(record(2));
    await writeFile(path, (await readFile(path, 'utf8')).slice(0, -1));
    await store.update(record(3));
    expect(parseHistory(await readFile(path, 'utf8'), 'h').runs.map((r) => r.id)).toEqual([
      '8101-1',
      '8102-1',
      '8103-1',
    ]);
  });

  it('a writer killed (SIGKILL) while holding the lock: the next writer recovers the lock, removes its temp file, cuts its torn line', async () => {
    const path = join(root, 'killed', 'history.jsonl');
    const notes: string[] = [];
    const store = createFileStore(path, 'linux-x64', { warn: (m) => notes.push(m) });
    await store.update(record(1));
    for (const mode of ['die-in-rewrite', 'die-in-append']) {
      const child = spawnSync(process.execPath, [writer, mode, path], { timeout: 20_000 });
      expect(child.signal).toBe('SIGKILL');
      expect(readFileSync(lockPathOf(path), 'utf8')).toMatch(/"pid":/); // left behind
    }
    expect(readFileSync(tempPathOf(path, 'deadbeef'), 'utf8')).toMatch(/bellgate/);
    await store.update(record(2));
    const names = await readdir(join(root, 'killed'));
    expect(names.filter((n) => n.endsWith('.tmp') || n.endsWith('.lock'))).toEqual([]);
    expect(notes.some((m) => /removed \..*\.deadbeef\.tmp, left by a writer that was stopped/.test(m))).toBe(true);
    expect((await store.read()).runs.map((r) => r.id)).toEqual(['8101-1', '8102-1']);
  });

  it('8 processes x 25 records on one file at once: exactly 200 runs, none twice', async () => {
    const path = join(root, 'race', 'history.jsonl');
    await mkdirP(join(root, 'race'));
    const children = Array.from(
      { length: 8 },
      (_, w) =>
        new Promise<string>((resolve, reject) => {
          const child = spawn(process.execPath, [writer, 'record', path, String(w + 1), '25'], {
            stdio: ['ignore', 'pipe', 'pipe'],
          });
          let out = '';
          child.stdout.on('data', (d: Buffer) => (out += d.toString()));
          child.stderr.on('data', (d: Buffer) => (out += d.toString()));
          child.on('exit', (code) =>
            code === 0 ? resolve(out) : reject(new Error(`writer ${w + 1} exited ${code}: ${out}`)),
          );
        }),
    );
    expect(await Promise.all(children)).toEqual(Array(8).fill('ok 25\n'));
    const h = await createFileStore(path, 'linux-x64').read();
    const ids = h.runs.map((r) => r.id);
    expect(ids).toHaveLength(200);
    expect(new Set(ids).size).toBe(200);
    for (let w = 1; w <= 8; w++) for (let i = 0; i < 25; i++) expect(ids).toContain(`${w}0${i}-1`);
    expect(h.columns.get('build/compile')?.values.filter((v) => !Number.isNaN(v))).toHaveLength(200);
  });
});

describe('fileLines reads the lines textLines reads', () => {
  it('from the start and from any line on, from the end, whatever the line lengths (fast-check)', async () => {
    const dir = await mkdirP(join(root, 'lines'));
    const path = join(dir, 'x.txt');
    fc.assert(
      fc.property(
        fc.array(fc.string({ maxLength: 300, unit: fc.constantFrom('a', 'é', '€', '𝄞', ' ') }), {
          minLength: 1,
          maxLength: 30,
        }),
        fc.boolean(),
        fc.nat(),
        (lines, finalNewline, pick) => {
          const text = lines.join('\n') + (finalNewline ? '\n' : '');
          writeFileSync(path, text);
          const fd = openSync(path, 'r');
          try {
            const size = fstatSync(fd).size;
            const file = fileLines(fd, size);
            const str = textLines(text);
            const decode = (l: { text: string; complete: boolean }) => [l.text, l.complete];
            expect([...file.forward()].map(decode)).toEqual([...str.forward()].map(decode));
            const fileStarts = [...file.forward()].map((l) => l.offset);
            const strStarts = [...str.forward()].map((l) => l.offset);
            if (fileStarts.length === 0) return;
            const k = pick % fileStarts.length;
            expect([...file.backward(fileStarts[k] as number)].map(decode)).toEqual(
              [...str.backward(strStarts[k] as number)].map(decode),
            );
            expect(file.lineNumber(fileStarts[k] as number)).toBe(k + 1);
          } finally {
            closeSync(fd);
          }
        },
      ),
      { numRuns: 200 },
    );
  });
});

describe('fileLines across block boundaries', () => {
  it('lines far longer than a block (up to 300,000 bytes) read the same from both ends (fast-check)', async () => {
    const dir = await mkdirP(join(root, 'long-lines'));
    const path = join(dir, 'x.txt');
    fc.assert(
      fc.property(
        fc.array(fc.tuple(fc.constantFrom('a', 'é', '𝄞'), fc.integer({ min: 0, max: 100_000 })), {
          minLength: 1,
          maxLength: 6,
        }),
        ([...parts]) => {
          const lines = parts.map(([c, n]) => c.repeat(n));
          const text = `${lines.join('\n')}\n`;
          writeFileSync(path, text);
          const fd = openSync(path, 'r');
          try {
            const file = fileLines(fd, fstatSync(fd).size);
            expect([...file.forward()].map((l) => l.text)).toEqual(lines);
            expect([...file.backward(0)].map((l) => l.text)).toEqual([...lines].reverse());
          } finally {
            closeSync(fd);
          }
        },
      ),
      { numRuns: 15 },
    );
  });
});

async function mkdirP(dir: string): Promise<string> {
  mkdirSync(dir, { recursive: true });
  return dir;
}
