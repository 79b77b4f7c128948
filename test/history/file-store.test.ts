import { chmod, mkdir, mkdtemp, readdir, readFile, rm, stat, truncate, writeFile } from 'node:fs/promises';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import type { Run } from '../../src/inputs/run.js';
import { parseHistory, serializeHistory } from '../../src/history/document.js';
import { createFileStore, HISTORY_FILE_LIMIT } from '../../src/history/file-store.js';
import { appendRun, trimHistory } from '../../src/history/merge.js';
import { StoreError } from '../../src/history/store.js';

const run = (value: number): Run => ({
  metrics: new Map([['build/compile', { value, unit: 's', count: 1 }]]),
  meta: new Map(),
});
const info = (n: number) => ({
  id: `${8100 + n}-1`,
  time: new Date(Date.UTC(2026, 2, n, 10)).toISOString(),
  ref: 'refs/heads/main',
  event: 'push',
});

let root: string;
beforeAll(async () => {
  root = await mkdtemp(join(tmpdir(), 'bellgate-file-store-'));
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

describe('createFileStore', () => {
  it('reads a missing file as an empty history, creates the folder on save, leaves no temp file', async () => {
    const path = join(root, 'a', 'deep', 'history.json');
    const store = createFileStore(path, 'linux-x64');
    expect(store.describe()).toBe(`file ${path}`);
    const empty = await store.load();
    expect(empty.runs).toEqual([]);
    await store.save(appendRun(empty, info(1), run(41.25)), 0);
    expect(await readdir(join(root, 'a', 'deep'))).toEqual(['history.json']);
    const back = await store.load();
    expect(back.runs.map((r) => r.id)).toEqual(['8101-1']);
    expect(back.columns.get('build/compile')).toEqual({ unit: 's', values: [41.25] });
    expect(JSON.parse(await readFile(path, 'utf8')).schema).toBe('bellgate.history/2');
  });

  it('replaces the file in place over many saves, never leaving temp files', async () => {
    const path = join(root, 'many', 'history.json');
    const store = createFileStore(path, 'linux-x64');
    for (let n = 1; n <= 5; n++) {
      const h = await store.load();
      await store.save(appendRun(h, info(n), run(40 + n)), h.runs.length);
    }
    expect(await readdir(join(root, 'many'))).toEqual(['history.json']);
    expect((await store.load()).columns.get('build/compile')?.values).toEqual([41, 42, 43, 44, 45]);
  });

  it('a corrupt file is a StoreError on load and on save, and its bytes are kept', async () => {
    const path = join(root, 'corrupt.json');
    const bad = serializeHistory(
      appendRun(await createFileStore(join(root, 'x.json'), 'linux-x64').load(), info(1), run(1)),
    ).slice(0, 120);
    await writeFile(path, bad);
    const store = createFileStore(path, 'linux-x64');
    const onLoad = await rejection(store.load());
    expect(onLoad.message).toMatch(/not a readable history document.*left as it is/);
    expect(onLoad.where).toBe(`file ${path}`);
    expect(onLoad.fix).toMatch(/bellgate verify/);
    const fresh = appendRun({ series: 'linux-x64', runs: [], columns: new Map() }, info(2), run(2));
    await rejection(store.save(fresh, 0));
    expect(await readFile(path, 'utf8')).toBe(bad);
    expect(await readdir(root)).not.toContainEqual(expect.stringMatching(/\.tmp$/));
  });

  it('a file of a newer version is a StoreError that says to upgrade, and is not overwritten', async () => {
    const path = join(root, 'newer.json');
    const text = '{"schema":"bellgate.history/7","series":"linux-x64"}';
    await writeFile(path, text);
    const error = await rejection(createFileStore(path, 'linux-x64').load());
    expect(error.describe()).toMatch(/upgrade Bellgate/);
    await rejection(createFileStore(path, 'linux-x64').save({ series: 'linux-x64', runs: [], columns: new Map() }, 0));
    expect(await readFile(path, 'utf8')).toBe(text);
  });

  it('refuses another series, and a shrink that no trim explains', async () => {
    const path = join(root, 'guard.json');
    const store = createFileStore(path, 'linux-x64');
    let h = await store.load();
    for (let n = 1; n <= 3; n++) h = appendRun(h, info(n), run(n));
    await store.save(h, 0);
    await rejection(createFileStore(path, 'windows').load());
    await rejection(store.save({ ...h, series: 'windows' }, 3));
    const loaded = await store.load();
    const lost = await rejection(
      store.save(
        { ...loaded, runs: loaded.runs.slice(1), columns: new Map([['build/compile', { values: [2, 3] }]]) },
        3,
      ),
    );
    expect(lost.message).toMatch(/1 runs would be lost/);
    await store.save(trimHistory(loaded, 2), 3); // trimming explains the shrink
    expect((await store.load()).runs.map((r) => r.id)).toEqual(['8102-1', '8103-1']);
  });

  // root ignores folder permissions, so there is nothing to observe when the suite runs as root
  it.skipIf(process.getuid?.() === 0)(
    'a folder it cannot write to is a StoreError, and no temp file is left',
    async () => {
      const folder = join(root, 'locked');
      await mkdir(folder);
      await chmod(folder, 0o500);
      try {
        const store = createFileStore(join(folder, 'history.json'), 's');
        const error = await rejection(store.save(appendRun(await store.load(), info(1), run(1)), 0));
        expect(error.message).toMatch(/cannot write/);
        expect(await readdir(folder)).toEqual([]);
      } finally {
        await chmod(folder, 0o700);
      }
    },
  );

  it('a file name near the 255-byte limit still saves (the temp name stays short)', async () => {
    const path = join(root, `${'h'.repeat(250)}.json`);
    const store = createFileStore(path, 's');
    await store.save(appendRun(await store.load(), info(1), run(1)), 0);
    expect((await store.load()).runs).toHaveLength(1);
  });

  it('a path that is a folder, or under a file, is a StoreError, not a crash', async () => {
    await writeFile(join(root, 'plain'), 'x');
    expect((await rejection(createFileStore(join(root, 'plain', 'h.json'), 's').load())).message).toMatch(
      /cannot read/,
    );
    const error = await rejection(createFileStore(root, 's').load());
    expect(error.message).toMatch(/cannot read/);
  });

  it('a file over the size limit is refused by size on load and on save, before it is read, and kept', async () => {
    // A sparse file (truncate past the end) takes no disk space. V8's longest string in Node 20 is
    // 2^29 - 24 characters (from memory: v8::String::kMaxLength on 64-bit), so a file read into
    // one string must stay below it: the limit is checked against that, and the file against both.
    expect(HISTORY_FILE_LIMIT).toBeLessThan(2 ** 29 - 24);
    const path = join(root, 'huge.json');
    await writeFile(path, '{"schema":"bellgate.history/2"');
    const size = 600 * 1024 * 1024;
    await truncate(path, size);
    const store = createFileStore(path, 'linux-x64');
    const onLoad = await rejection(store.load());
    expect(onLoad.message).toContain('600.0 MiB (629145600 bytes)');
    expect(onLoad.message).toContain('limit of 500.0 MiB');
    expect(onLoad.message).not.toMatch(/Invalid string length/);
    expect(onLoad.fix).toMatch(/lower `keep`.*split the series/);
    const onSave = await rejection(
      store.save(appendRun(await createFileStore(join(root, 'none.json'), 'linux-x64').load(), info(1), run(1)), 0),
    );
    expect(onSave.message).toContain('629145600 bytes');
    expect((await stat(path)).size).toBe(size);
    await rm(path);
  });

  it('two writers from the same start: the later save keeps the run the first one added', async () => {
    const path = join(root, 'concurrent.json');
    const store = createFileStore(path, 'linux-x64');
    await store.save(appendRun(await store.load(), info(1), run(1)), 0);
    const startA = await store.load();
    const startB = await store.load();
    const a = appendRun(startA, info(2), run(2));
    const b = appendRun(startB, info(3), run(3));
    await store.save(a, 1);
    await store.save(b, 1);
    const healed = await store.load();
    expect(healed.runs.map((r) => r.id)).toEqual(['8101-1', '8102-1', '8103-1']);
    expect(healed.columns.get('build/compile')?.values).toEqual([1, 2, 3]);
  });

  it('runs trimmed on purpose stay deleted even though the file still held them', async () => {
    const path = join(root, 'trim-heal.json');
    const store = createFileStore(path, 'linux-x64');
    let h = await store.load();
    for (let n = 1; n <= 4; n++) h = appendRun(h, info(n), run(n));
    await store.save(h, 0);
    const loaded = await store.load();
    await store.save(trimHistory(appendRun(loaded, info(5), run(5)), 2), 4);
    expect((await store.load()).runs.map((r) => r.id)).toEqual(['8104-1', '8105-1']);
  });

  // save() skips re-parsing a file whose bytes are those load() read; these check that every case
  // still keeps every run (the healing rule of healConcurrent), unchanged file or not.
  it('unchanged since the load: the saved file holds the loaded runs plus the new one, values intact', async () => {
    const path = join(root, 'unchanged.json');
    const store = createFileStore(path, 'linux-x64');
    let h = await store.load();
    for (let n = 1; n <= 3; n++) h = appendRun(h, info(n), run(n + 0.5));
    await store.save(h, 0);
    const fresh = createFileStore(path, 'linux-x64');
    const loaded = await fresh.load();
    await fresh.save(appendRun(loaded, info(4), run(4.5)), 3);
    const back = await createFileStore(path, 'linux-x64').load();
    expect(back.runs.map((r) => r.id)).toEqual(['8101-1', '8102-1', '8103-1', '8104-1']);
    expect(back.columns.get('build/compile')?.values).toEqual([1.5, 2.5, 3.5, 4.5]);
  });

  it('an append to a hand-spaced file keeps its rows as written and reads back as the generic writer would write it', async () => {
    // Reference: serializeHistory (JSON.stringify of every row) read back by parseHistory.
    const path = join(root, 'hand-spaced.json');
    const runs = [info(1), info(2), info(3)];
    await writeFile(
      path,
      `{ "schema": "bellgate.history/2", "series": "linux-x64",\n  "runs": ${JSON.stringify({ id: runs.map((r) => r.id), time: runs.map((r) => r.time) }, null, 2)},\n` +
        '  "metrics": { "names": ["build/compile", "size"], "units": ["s", "B"], "values": [\n    [ 1.50, null, 2.5E0 ],\n    [-0, 7, 1e-300]\n  ] }\n}\n',
    );
    const store = createFileStore(path, 'linux-x64');
    const loaded = await store.load();
    const next = trimHistory(appendRun(loaded, info(4), run(4.25)), 3);
    await store.save(next, 3);
    const text = await readFile(path, 'utf8');
    expect(text).toContain('[ null, 2.5E0 ,4.25]'); // the old row's bytes, the oldest entry dropped
    expect(text).toContain('[ 7, 1e-300,null]'); // the -0 was dropped with the oldest run; no new size value
    expect(parseHistory(text, path)).toEqual(parseHistory(serializeHistory(next), 'generic'));
  });

  it('another writer (another process) saved between load and save: both runs are kept', async () => {
    const path = join(root, 'other-writer.json');
    await createFileStore(path, 'linux-x64').save(
      appendRun({ series: 'linux-x64', runs: [], columns: new Map() }, info(1), run(1)),
      0,
    );
    const mine = createFileStore(path, 'linux-x64');
    const theirs = createFileStore(path, 'linux-x64');
    const start = await mine.load();
    const other = await theirs.load();
    await theirs.save(appendRun(other, info(3), run(3)), 1);
    await mine.save(appendRun(start, info(2), run(2)), 1);
    const back = await createFileStore(path, 'linux-x64').load();
    expect(back.runs.map((r) => r.id)).toEqual(['8101-1', '8102-1', '8103-1']);
    expect(back.columns.get('build/compile')?.values).toEqual([1, 2, 3]);
  });

  it('the same store loaded again after another writer, then saves what it built on the first load: the other run is kept', async () => {
    const path = join(root, 'reloaded.json');
    const store = createFileStore(path, 'linux-x64');
    await store.save(appendRun(await store.load(), info(1), run(1)), 0);
    const first = await store.load();
    const other = createFileStore(path, 'linux-x64');
    await other.save(appendRun(await other.load(), info(3), run(3)), 1);
    await store.load(); // the bytes on disk are now a loaded document, but `first` lacks its run 8103-1
    await store.save(appendRun(first, info(2), run(2)), 1);
    expect((await store.load()).runs.map((r) => r.id)).toEqual(['8101-1', '8102-1', '8103-1']);
  });

  it('a file replaced by one of the same size but another series after the load is still refused', async () => {
    const path = join(root, 'same-size.json');
    const store = createFileStore(path, 'linux-x64');
    await store.save(appendRun(await store.load(), info(1), run(1)), 0);
    const loaded = await store.load();
    const text = await readFile(path, 'utf8');
    const swapped = text.replace('"linux-x64"', '"linux-arm"');
    expect(swapped.length).toBe(text.length);
    await writeFile(path, swapped);
    const error = await rejection(store.save(appendRun(loaded, info(2), run(2)), 1));
    expect(error.message).toMatch(/series "linux-arm"/);
    expect(await readFile(path, 'utf8')).toBe(swapped);
  });
});
