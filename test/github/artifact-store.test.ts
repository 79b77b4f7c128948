// The artifact store and its zip reader, against an in-memory artifact API shaped like the REST
// "List artifacts for a repository" answer. Zips are made by fflate (an independent zip writer);
// the "zip slip" rule (refuse entries with ../ or absolute paths) is common practice.
import { describe, expect, it } from 'vitest';
import { strToU8, zipSync } from 'fflate';
import {
  artifactName,
  createArtifactStore,
  HISTORY_FILE,
  type ArtifactEntry,
} from '../../src/history/artifact-store.js';
import { leavesFolder, readZipEntry, ZipRefusedError } from '../../src/history/artifact-zip.js';
import { serializeHistory } from '../../src/history/document.js';
import { emptyHistory, type History } from '../../src/history/history.js';
import { appendRun } from '../../src/history/merge.js';
import { StoreError } from '../../src/history/store.js';

const SERIES = 'bench/linux';

function historyOf(ids: string[], series = SERIES): History {
  let h = emptyHistory(series);
  ids.forEach((id, i) => {
    h = appendRun(
      h,
      { id, time: new Date(Date.UTC(2026, 0, 1 + Number(id.split('-')[0]))).toISOString() },
      {
        metrics: new Map([['route/match', { value: 400 + i, unit: 'ns', count: 1 }]]),
        meta: new Map(),
      },
    );
  });
  return h;
}

interface Fake {
  entries: (ArtifactEntry & { zip: Uint8Array })[];
  uploads: { name: string; text: string; days: number }[];
  downloads: number[];
  warnings: string[];
}

function fake(): Fake {
  return { entries: [], uploads: [], downloads: [], warnings: [] };
}

let nextId = 1;
function put(f: Fake, zip: Uint8Array, over: Partial<ArtifactEntry> = {}): void {
  const id = nextId++;
  f.entries.push({
    id,
    name: artifactName('bellgate-history', SERIES),
    expired: false,
    createdAt: `2026-02-01T00:00:${String(id).padStart(2, '0')}Z`,
    sizeInBytes: zip.length,
    headBranch: 'main',
    headRepositoryId: 5,
    repositoryId: 5,
    zip,
    ...over,
  });
}
const zipOf = (h: History) => zipSync({ [HISTORY_FILE]: strToU8(serializeHistory(h)) });

function store(f: Fake, mergeNewest = 3) {
  return createArtifactStore({
    api: {
      listArtifacts: async (name) => f.entries.filter((e) => e.name === name),
      downloadArtifact: async (id) => {
        f.downloads.push(id);
        const e = f.entries.find((x) => x.id === id);
        if (!e) throw new Error('404');
        return e.zip;
      },
    },
    upload: async (name, _file, text, days) => {
      f.uploads.push({ name, text, days });
    },
    history: 'bellgate-history',
    series: SERIES,
    baselineBranch: 'main',
    repositoryId: 5,
    retentionDays: 30,
    warn: (m) => f.warnings.push(m),
    mergeNewest,
  });
}

describe('artifactName', () => {
  it('keeps only characters the artifact service accepts and separates series whose slugs coincide', () => {
    const a = artifactName('bellgate-history', 'bench/linux');
    const b = artifactName('bellgate-history', 'bench linux');
    expect(a).toMatch(/^bellgate-history-bench-linux-[0-9a-f]{8}$/);
    expect(a).not.toBe(b);
    expect(artifactName('h', '///')).toMatch(/^h-[0-9a-f]{8}$/);
  });
});

describe('readZipEntry', () => {
  it('reads the named entry', () => {
    expect(readZipEntry(zipSync({ 'history.json': strToU8('{"a":1}') }), 'history.json')).toBe('{"a":1}');
  });
  it('refuses entries that leave their folder', () => {
    expect(leavesFolder('../x')).toBe(true);
    expect(leavesFolder('a/../../x')).toBe(true);
    expect(leavesFolder('/etc/passwd')).toBe(true);
    expect(leavesFolder('C:\\x')).toBe(true);
    expect(leavesFolder('a/b..c/history.json')).toBe(false);
    expect(() =>
      readZipEntry(zipSync({ 'history.json': strToU8('{}'), '../evil.sh': strToU8('x') }), 'history.json'),
    ).toThrow(/leave its folder/);
  });
  it('refuses too many entries and too many unzipped bytes (a zip bomb)', () => {
    const many = Object.fromEntries(Array.from({ length: 20 }, (_, i) => [`f${i}`, strToU8('x')]));
    expect(() => readZipEntry(zipSync({ ...many, 'history.json': strToU8('{}') }), 'history.json')).toThrow(/entries/);
    const bomb = zipSync({ 'history.json': new Uint8Array(200_000) }, { level: 9 });
    expect(bomb.length).toBeLessThan(2_000);
    expect(() => readZipEntry(bomb, 'history.json', { maxEntries: 4, maxUnzippedBytes: 100_000 })).toThrow(
      ZipRefusedError,
    );
  });
  it('refuses bytes that are not a zip, and a zip without the file', () => {
    expect(() => readZipEntry(strToU8('definitely not a zip'), 'history.json')).toThrow(ZipRefusedError);
    expect(() => readZipEntry(zipSync({ 'other.json': strToU8('{}') }), 'history.json')).toThrow(/no history.json/);
  });
});

describe('createArtifactStore', () => {
  it('starts empty when there is no artifact yet', async () => {
    const f = fake();
    expect((await store(f).load()).runs).toEqual([]);
  });

  it('merges the newest readable artifacts of the baseline branch of this repository only', async () => {
    const f = fake();
    put(f, zipOf(historyOf(['1-1', '2-1'])));
    put(f, zipOf(historyOf(['1-1', '2-1', '3-1'])));
    put(f, zipOf(historyOf(['1-1', '2-1', '4-1']))); // raced with 3-1: sibling of the same parent
    put(f, zipOf(historyOf(['9-1'])), { headBranch: 'feature' });
    put(f, zipOf(historyOf(['8-1'])), { headRepositoryId: 77 }); // a fork's "main"
    put(f, zipOf(historyOf(['7-1'])), { expired: true });
    const h = await store(f).load();
    expect(h.runs.map((r) => r.id)).toEqual(['1-1', '2-1', '3-1', '4-1']);
  });

  it('skips a corrupt artifact with a warning and keeps the others', async () => {
    const f = fake();
    put(f, zipOf(historyOf(['1-1', '2-1'])));
    put(f, strToU8('garbage'));
    put(f, zipSync({ [HISTORY_FILE]: strToU8('{"schema":"bellgate.history/2"') }));
    const h = await store(f).load();
    expect(h.runs.map((r) => r.id)).toEqual(['1-1', '2-1']);
    expect(f.warnings).toHaveLength(2);
    expect(f.warnings[0]).toMatch(/skipped history artifact/);
  });

  it('fails with StoreError when artifacts exist but none can be read', async () => {
    const f = fake();
    put(f, strToU8('garbage'));
    await expect(store(f).load()).rejects.toBeInstanceOf(StoreError);
  });

  it('fails the load (nothing recorded) when a download fails for a passing reason, instead of skipping its runs', async () => {
    const f = fake();
    put(f, zipOf(historyOf(['1-1', '2-1'])));
    put(f, zipOf(historyOf(['1-1', '2-1', '3-1'])));
    const s = createArtifactStore({
      api: {
        listArtifacts: async (name) => f.entries.filter((e) => e.name === name),
        // The newest artifact fails to download; the older one would read fine, so skipping the
        // newest would silently lose run 3-1 from the next upload.
        downloadArtifact: async (id) => {
          const newest = Math.max(...f.entries.map((e) => e.id));
          if (id === newest) throw new Error('storage download failed after 3 tries: storage answered 502');
          return f.entries.find((e) => e.id === id)!.zip;
        },
      },
      upload: async (name, _file, text, days) => void f.uploads.push({ name, text, days }),
      history: 'bellgate-history',
      series: SERIES,
      baselineBranch: 'main',
      repositoryId: 5,
      retentionDays: 30,
      warn: (m) => f.warnings.push(m),
    });
    const failure = await s.load().catch((e: unknown) => e);
    expect(failure).toBeInstanceOf(StoreError);
    expect(String((failure as Error).message)).toMatch(/cannot download history artifact #\d+: .*502/);
    expect(f.uploads).toHaveLength(0);
  });

  it('skips a history of another series', async () => {
    const f = fake();
    put(f, zipOf(historyOf(['1-1'])));
    put(f, zipOf(historyOf(['2-1'], 'other')));
    expect((await store(f).load()).runs.map((r) => r.id)).toEqual(['1-1']);
    expect(f.warnings[0]).toMatch(/series "other"/);
  });

  it('downloads no more than mergeNewest readable artifacts', async () => {
    const f = fake();
    for (let i = 1; i <= 6; i++) put(f, zipOf(historyOf([`${i}-1`])));
    const h = await store(f, 2).load();
    expect(f.downloads).toHaveLength(2);
    expect(h.runs.map((r) => r.id)).toEqual(['5-1', '6-1']);
  });

  it('uploads the appended history under the series name, and refuses to upload fewer runs than read', async () => {
    const f = fake();
    put(f, zipOf(historyOf(['1-1', '2-1'])));
    const s = store(f);
    const read = await s.load();
    await s.save(historyOf(['1-1', '2-1', '3-1']), read.runs.length);
    expect(f.uploads).toHaveLength(1);
    expect(f.uploads[0]?.name).toBe(artifactName('bellgate-history', SERIES));
    expect(f.uploads[0]?.days).toBe(30);
    expect(f.uploads[0]?.text).toContain('3-1');
    await expect(s.save(historyOf(['3-1']), 0)).rejects.toThrow(/refusing to save/);
    expect(f.uploads).toHaveLength(1);
  });

  it('turns an upload failure into a StoreError', async () => {
    const s = createArtifactStore({
      api: { listArtifacts: async () => [], downloadArtifact: async () => new Uint8Array() },
      upload: async () => {
        throw new Error(
          'Failed request: (409) Conflict: an artifact with this name already exists on the workflow run',
        );
      },
      history: 'h',
      series: SERIES,
      baselineBranch: 'main',
      retentionDays: 1,
      warn: () => undefined,
    });
    await s.load();
    await expect(s.save(historyOf(['1-1']), 0)).rejects.toThrow(StoreError);
  });
});
