// The artifact store and its zip reader, against an in-memory artifact API shaped like the REST
// "List artifacts for a repository" answer. Zips are made by fflate (an independent zip writer);
// the "zip slip" rule (refuse entries with ../ or absolute paths) is common practice.
import { describe, expect, it } from 'vitest';
import { strToU8, unzipSync, zipSync } from 'fflate';
import {
  ArtifactGoneError,
  artifactName,
  createArtifactStore,
  HISTORY_FILE,
  MERGED_FILE,
  type ArtifactEntry,
  type UploadFile,
} from '../../src/history/artifact-store.js';
import { leavesFolder, readZipEntry, ZipRefusedError } from '../../src/history/artifact-zip.js';
import { serializeHistory } from '../../src/history/document.js';
import { emptyHistory, type History } from '../../src/history/history.js';
import { appendRun } from '../../src/history/merge.js';
import { StoreError } from '../../src/history/store.js';

const SERIES = 'bench/linux';
const NAME = artifactName('bellgate-history', SERIES);

const runOf = (value: number) => ({
  metrics: new Map([['route/match', { value, unit: 'ns', count: 1 }]]),
  meta: new Map(),
});
const timeOf = (id: string) => new Date(Date.UTC(2026, 0, 1 + Number(id.split('-')[0]))).toISOString();

function historyOf(ids: string[], series = SERIES): History {
  let h = emptyHistory(series);
  ids.forEach((id, i) => {
    h = appendRun(h, { id, time: timeOf(id) }, runOf(400 + i)).history;
  });
  return h;
}

interface Fake {
  entries: (ArtifactEntry & { zip: Uint8Array })[];
  uploads: { name: string; files: UploadFile[]; days: number }[];
  downloads: number[];
  deleted: number[];
  warnings: string[];
  notes: string[];
  /** What deleteArtifact answers (default: it deletes). */
  deletes?: 'denied';
}

function fake(): Fake {
  return { entries: [], uploads: [], downloads: [], deleted: [], warnings: [], notes: [] };
}

let nextId = 1;
function put(f: Fake, zip: Uint8Array, over: Partial<ArtifactEntry> = {}): number {
  const id = nextId++;
  f.entries.push({
    id,
    name: NAME,
    expired: false,
    createdAt: `2026-02-01T00:${String(Math.floor(id / 60)).padStart(2, '0')}:${String(id % 60).padStart(2, '0')}Z`,
    sizeInBytes: zip.length,
    headBranch: 'main',
    headRepositoryId: 5,
    repositoryId: 5,
    zip,
    ...over,
  });
  return id;
}
const zipOf = (h: History, covers: number[] = []) =>
  zipSync({
    [HISTORY_FILE]: strToU8(serializeHistory(h)),
    [MERGED_FILE]: strToU8(JSON.stringify({ artifacts: covers })),
  });

function store(f: Fake) {
  return createArtifactStore({
    api: {
      listArtifacts: async (name) => f.entries.filter((e) => e.name === name),
      downloadArtifact: async (id) => {
        f.downloads.push(id);
        const e = f.entries.find((x) => x.id === id);
        if (!e) throw new ArtifactGoneError('404');
        return e.zip;
      },
      deleteArtifact: async (id) => {
        if (f.deletes === 'denied') return 'denied';
        f.deleted.push(id);
        f.entries = f.entries.filter((e) => e.id !== id);
        return 'deleted';
      },
    },
    upload: async (name, files, days) => {
      f.uploads.push({ name, files, days });
      const zip = zipSync(Object.fromEntries(files.map((x) => [x.name, strToU8(x.text)])));
      return { id: put(f, zip) };
    },
    history: 'bellgate-history',
    series: SERIES,
    baselineBranch: 'main',
    repositoryId: 5,
    retentionDays: 30,
    warn: (m) => f.warnings.push(m),
    info: (m) => f.notes.push(m),
  });
}

const record = (id: string) => ({
  kind: 'record' as const,
  info: { id, time: timeOf(id) },
  run: runOf(500),
  keep: 1000,
});

describe('artifactName', () => {
  it('keeps only characters the artifact service accepts and separates series whose slugs coincide', () => {
    const a = artifactName('bellgate-history', 'bench/linux');
    const b = artifactName('bellgate-history', 'bench linux');
    expect(a).toMatch(/^bellgate-history-bench-linux-[0-9a-f]{8}$/);
    expect(a).not.toBe(b);
    expect(artifactName('h', '///')).toMatch(/^h-[0-9a-f]{8}$/);
  });
});

describe('readZipEntry (zips written by fflate)', () => {
  it('reads the named entry, stored or deflated', () => {
    expect(readZipEntry(zipSync({ 'history.jsonl': strToU8('{"a":1}') }), 'history.jsonl')).toBe('{"a":1}');
    expect(
      readZipEntry(zipSync({ 'history.jsonl': strToU8('x'.repeat(5000)) }, { level: 0 }), 'history.jsonl'),
    ).toHaveLength(5000);
  });
  it('refuses entries that leave their folder', () => {
    expect(leavesFolder('../x')).toBe(true);
    expect(leavesFolder('a/../../x')).toBe(true);
    expect(leavesFolder('/etc/passwd')).toBe(true);
    expect(leavesFolder('C:\\x')).toBe(true);
    expect(leavesFolder('a/b..c/history.jsonl')).toBe(false);
    expect(() =>
      readZipEntry(zipSync({ 'history.jsonl': strToU8('{}'), '../evil.sh': strToU8('x') }), 'history.jsonl'),
    ).toThrow(/leave its folder/);
  });
  it('refuses too many entries and too many declared bytes (a zip bomb) before inflating', () => {
    const many = Object.fromEntries(Array.from({ length: 20 }, (_, i) => [`f${i}`, strToU8('x')]));
    expect(() => readZipEntry(zipSync({ ...many, 'history.jsonl': strToU8('{}') }), 'history.jsonl')).toThrow(
      /claims 21 entries/,
    );
    const bomb = zipSync({ 'history.jsonl': new Uint8Array(200_000) }, { level: 9 });
    expect(bomb.length).toBeLessThan(2_000);
    expect(() => readZipEntry(bomb, 'history.jsonl', { maxEntries: 4, maxUnzippedBytes: 100_000 })).toThrow(
      /declares 200000 unzipped bytes, more than the 100000 allowed/,
    );
  });
  it('refuses bytes that are not a zip, a zip without the file, and a damaged entry', () => {
    expect(() => readZipEntry(strToU8('definitely not a zip'), 'history.jsonl')).toThrow(ZipRefusedError);
    expect(() => readZipEntry(zipSync({ 'other.json': strToU8('{}') }), 'history.jsonl')).toThrow(/no history.jsonl/);
    const zip = zipSync({ 'history.jsonl': strToU8('hello, history') }, { level: 0 });
    const at = Buffer.from(zip).indexOf('hello');
    const flipped = Uint8Array.from(zip);
    flipped[at] = 0x48; // 'h' -> 'H': the CRC-32 no longer fits
    expect(() => readZipEntry(flipped, 'history.jsonl')).toThrow(/fails its CRC-32 check/);
    // fflate reads back what it wrote, so the fixture is a real zip
    expect(unzipSync(zip)['history.jsonl']).toBeDefined();
  });
});

describe('createArtifactStore', () => {
  it('starts empty when there is no artifact yet', async () => {
    expect((await store(fake()).read()).runs).toEqual([]);
  });

  it('merges every artifact no newer one covers — K siblings of one parent, whatever K — on this repository baseline branch only', async () => {
    const f = fake();
    const parent = put(f, zipOf(historyOf(['1-1', '2-1'])));
    for (const id of ['3-1', '4-1', '5-1', '6-1', '7-1']) put(f, zipOf(historyOf(['1-1', '2-1', id]), [parent]));
    put(f, zipOf(historyOf(['9-1'])), { headBranch: 'feature' });
    put(f, zipOf(historyOf(['8-1'])), { headRepositoryId: 77 }); // a fork's "main"
    put(f, zipOf(historyOf(['10-1'])), { expired: true });
    const h = await store(f).read();
    expect(h.runs.map((r) => r.id)).toEqual(['1-1', '2-1', '3-1', '4-1', '5-1', '6-1', '7-1']);
    // the parent is covered by its children: not downloaded
    expect(f.downloads).not.toContain(parent);
    expect(f.downloads).toHaveLength(5);
  });

  it('an update uploads the merge plus the change, covering what it merged, then deletes those copies', async () => {
    const f = fake();
    const parent = put(f, zipOf(historyOf(['1-1'])));
    const a = put(f, zipOf(historyOf(['1-1', '2-1']), [parent]));
    const b = put(f, zipOf(historyOf(['1-1', '3-1']), [parent]));
    expect(await store(f).update(record('4-1'))).toEqual({ runs: 4, wrote: 'rewritten' });
    expect(f.uploads).toHaveLength(1);
    const upload = f.uploads[0]!;
    expect(upload.name).toBe(NAME);
    expect(upload.days).toBe(30);
    expect(JSON.parse(upload.files.find((x) => x.name === MERGED_FILE)!.text).artifacts.sort()).toEqual(
      [parent, a, b].sort(),
    );
    expect(f.deleted.sort()).toEqual([parent, a, b].sort());
    expect(f.entries).toHaveLength(1);
    expect((await store(f).read()).runs.map((r) => r.id)).toEqual(['1-1', '2-1', '3-1', '4-1']);
  });

  it('without actions: write the superseded copies stay, with one note saying what to grant; the next read still downloads one', async () => {
    const f = fake();
    f.deletes = 'denied';
    put(f, zipOf(historyOf(['1-1'])));
    await store(f).update(record('2-1'));
    await store(f).update(record('3-1'));
    expect(f.entries).toHaveLength(3);
    expect(f.notes.filter((n) => /permissions: actions: write/.test(n))).toHaveLength(2);
    f.downloads.length = 0;
    expect((await store(f).read()).runs.map((r) => r.id)).toEqual(['1-1', '2-1', '3-1']);
    expect(f.downloads).toHaveLength(1);
  });

  it('a dropped run stays dropped when older copies are merged again', async () => {
    const f = fake();
    f.deletes = 'denied';
    put(f, zipOf(historyOf(['1-1', '2-1'])));
    await store(f).update({ kind: 'drop', tombstone: { id: '1-1', reason: 'noisy runner' } });
    put(f, zipOf(historyOf(['1-1', '2-1']))); // an old copy, uploaded late, covering nothing
    const h = await store(f).read();
    expect(h.runs.map((r) => r.id)).toEqual(['2-1']);
    expect(h.dropped?.get('1-1')?.reason).toBe('noisy runner');
  });

  it('skips a corrupt or hostile artifact with a warning, keeps the others, and covers it from then on', async () => {
    const f = fake();
    put(f, zipOf(historyOf(['1-1', '2-1'])));
    const garbage = put(f, strToU8('garbage'));
    put(f, zipSync({ [HISTORY_FILE]: strToU8('{"schema":"bellgate.history/3"') }));
    put(f, zipOf(historyOf(['2-1'], 'other')));
    const h = await store(f).read();
    expect(h.runs.map((r) => r.id)).toEqual(['1-1', '2-1']);
    expect(f.warnings).toHaveLength(3);
    expect(f.warnings.join('\n')).toMatch(/skipped history artifact #\d+ .*not a readable zip/);
    expect(f.warnings.join('\n')).toMatch(/series "other"/);
    await store(f).update(record('3-1'));
    expect(f.deleted).toContain(garbage);
  });

  it('fails with StoreError when artifacts exist but none can be read', async () => {
    const f = fake();
    put(f, strToU8('garbage'));
    await expect(store(f).read()).rejects.toBeInstanceOf(StoreError);
  });

  it('an artifact deleted since the listing is skipped (its deleter merged it); a passing download fault fails the read instead', async () => {
    const f = fake();
    put(f, zipOf(historyOf(['1-1', '2-1'])));
    const gone = put(f, zipOf(historyOf(['1-1', '2-1', '3-1'])));
    const entries = [...f.entries];
    f.entries = f.entries.filter((e) => e.id !== gone);
    const s = createArtifactStore({
      api: {
        listArtifacts: async () => entries,
        downloadArtifact: async (id) => {
          const e = f.entries.find((x) => x.id === id);
          if (!e) throw new ArtifactGoneError(`artifact #${id} answered 404`);
          return e.zip;
        },
      },
      upload: async () => ({}),
      history: 'bellgate-history',
      series: SERIES,
      baselineBranch: 'main',
      retentionDays: 30,
      warn: (m) => f.warnings.push(m),
    });
    expect((await s.read()).runs.map((r) => r.id)).toEqual(['1-1', '2-1']);
    const faulty = createArtifactStore({
      api: {
        listArtifacts: async () => entries,
        downloadArtifact: async () => {
          throw new Error('GET .../zip answered 502 after 3 retries');
        },
      },
      upload: async () => ({}),
      history: 'bellgate-history',
      series: SERIES,
      baselineBranch: 'main',
      retentionDays: 30,
      warn: () => undefined,
    });
    const failure = await faulty.update(record('4-1')).catch((e: unknown) => e);
    expect(failure).toBeInstanceOf(StoreError);
    expect((failure as StoreError).message).toMatch(/cannot download history artifact #\d+: .*502/);
  });

  it('turns an upload failure into a StoreError', async () => {
    const s = createArtifactStore({
      api: { listArtifacts: async () => [], downloadArtifact: async () => new Uint8Array() },
      upload: async () => {
        throw new Error('Failed request: (500) Internal Server Error');
      },
      history: 'h',
      series: SERIES,
      baselineBranch: 'main',
      retentionDays: 1,
      warn: () => undefined,
    });
    await expect(s.update(record('1-1'))).rejects.toThrow(/cannot upload the history artifact/);
  });
});
