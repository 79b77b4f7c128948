// Fault injection: the stores run against loopback stand-ins behind a proxy that makes a fixed,
// seeded share of API calls fail (500, 502, 429 with Retry-After, connections dropped before or
// after the server acted, bodies cut short, answers slower than the client's timeout). The rule
// under test is the store contract (src/history/store.ts): every update ends with its run recorded
// or with a StoreError, the stored history always parses, and no run that was stored is ever lost.
import { strToU8, zipSync } from 'fflate';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { artifactName, createArtifactStore, type ArtifactUploader } from '../../src/history/artifact-store.js';
import type { HistoryChange } from '../../src/history/changes.js';
import { StoreError } from '../../src/history/store.js';
import { createOctokitApi } from '../../src/github/octokit-api.js';
import { branchStore, ids, infoOf, onBranch, runOf } from '../history/branch-helpers.js';
import { startFaultProxy, type FaultProxy } from './standins/fault-proxy.js';
import { startGitDataStandin, type GitDataStandin } from './standins/git-data.js';
import { startRestStandin, type RestStandin } from './standins/rest-api.js';
import { seededUniform as seededRandom } from '../model/random.js';

const RATE = 0.15;
// A slow answer arrives well after the client's timeout; ordinary answers arrive well before it.
const SLOW_MS = 600;
const TIMEOUT_MS = 200;

interface Tally {
  tried: number;
  recorded: number;
  failed: number;
  /** Reported as failed, yet the run is on the store (a write whose answer was lost). */
  failedButStored: number;
  lost: number;
}
const tally = (): Tally => ({ tried: 0, recorded: 0, failed: 0, failedButStored: 0, lost: 0 });
const missing = (before: string[], after: string[]) => before.filter((id) => !after.includes(id)).length;
const record = (id: string, n: number, value: number): HistoryChange => ({
  kind: 'record',
  info: infoOf(id, n),
  run: runOf(value),
  keep: 4000,
});

describe('branch store with faults', () => {
  let git: GitDataStandin;
  let proxy: FaultProxy;
  beforeAll(async () => {
    git = await startGitDataStandin();
    proxy = await startFaultProxy({ target: git.url, rate: RATE, seed: 20261201, slowMs: SLOW_MS, retryAfter: 1 });
  });
  afterAll(async () => {
    await proxy.close();
    await git.close();
  });

  it('1 writer x 60 appends: every append recorded whole or a StoreError; 0 runs lost', async () => {
    const series = 'bench/faulty-single';
    const t = tally();
    const random = seededRandom(3);
    const injectedBefore = proxy.totalInjected();
    const recorded: string[] = [];
    const reasons = new Map<string, number>();
    for (let i = 0; i < 60; i++) {
      const id = `${100 + i}-1`;
      const before = ids(onBranch(git, series));
      const store = branchStore(proxy.url, series, { random }, { timeoutMs: TIMEOUT_MS, retries: 2 });
      t.tried += 1;
      let ok = false;
      try {
        await store.update(record(id, i, 60 + i));
        ok = true;
      } catch (error) {
        expect(error).toBeInstanceOf(StoreError);
        const reason = (error as StoreError).message.replace(/[0-9a-f]{40}/g, '<sha>').replace(/ \(.*$/, '');
        reasons.set(reason, (reasons.get(reason) ?? 0) + 1);
      }
      const after = ids(onBranch(git, series));
      t.lost += missing(before, after);
      if (ok) {
        t.recorded += 1;
        recorded.push(id);
        expect(after).toContain(id);
      } else {
        t.failed += 1;
        if (after.includes(id)) t.failedButStored += 1;
      }
    }
    await new Promise((r) => setTimeout(r, SLOW_MS * 2));
    t.lost += missing(recorded, ids(onBranch(git, series)));
    console.log(
      `branch faults, one writer: ${JSON.stringify(t)}; ${proxy.totalInjected() - injectedBefore} faults injected; failures: ${JSON.stringify(Object.fromEntries(reasons))}`,
    );
    expect(t.lost).toBe(0);
    expect(proxy.totalInjected() - injectedBefore).toBeGreaterThan(20);
  }, 180_000);

  it('3 writers x 30 appends: each append is recorded whole or fails with StoreError; 0 runs lost', async () => {
    const series = 'bench/faulty';
    const t = tally();
    const recorded: string[] = [];
    async function writer(w: number): Promise<void> {
      const random = seededRandom(7 + w);
      for (let i = 0; i < 30; i++) {
        const id = `${(w + 1) * 1000 + i}-1`;
        const before = ids(onBranch(git, series));
        const store = branchStore(proxy.url, series, { attempts: 5, random }, { timeoutMs: TIMEOUT_MS, retries: 2 });
        t.tried += 1;
        let ok = false;
        try {
          await store.update(record(id, i * 3 + w, 50 + i));
          ok = true;
        } catch (error) {
          // A clear failure, never a stack trace from somewhere else.
          expect(error).toBeInstanceOf(StoreError);
          expect((error as StoreError).describe()).toMatch(/^branch bellgate-data/);
        }
        const after = ids(onBranch(git, series)); // parses: never half a document
        t.lost += missing(before, after);
        if (ok) {
          t.recorded += 1;
          recorded.push(id);
          expect(after).toContain(id);
        } else {
          t.failed += 1;
          if (after.includes(id)) t.failedButStored += 1;
        }
      }
    }
    await Promise.all([0, 1, 2].map((w) => writer(w)));
    // Let writes delayed past the client's timeout land, then look again.
    await new Promise((r) => setTimeout(r, SLOW_MS * 2));
    const final = ids(onBranch(git, series));
    t.lost += missing(recorded, final);
    expect(new Set(final).size).toBe(final.length);
    console.log(
      `branch faults: ${JSON.stringify(t)}; ${proxy.requests} API calls, ${proxy.totalInjected()} faults injected ${JSON.stringify(Object.fromEntries(proxy.injected))}`,
    );
    expect(t.tried).toBe(90);
    expect(t.lost).toBe(0);
    expect(proxy.totalInjected()).toBeGreaterThan(50);
    for (const kind of ['500', '502', '429', 'drop-before', 'drop-after', 'truncate', 'slow'])
      expect(proxy.injected.get(kind as never) ?? 0).toBeGreaterThan(0);
    expect(t.recorded).toBeGreaterThan(0);
  }, 180_000);
});

describe('artifact store with faults', () => {
  let rest: RestStandin;
  let proxy: FaultProxy;
  beforeAll(async () => {
    rest = await startRestStandin();
    proxy = await startFaultProxy({ target: rest.url, rate: RATE, seed: 4242, slowMs: SLOW_MS, retryAfter: 1 });
  });
  afterAll(async () => {
    await proxy.close();
    await rest.close();
  });

  it('a failed upload leaves the older artifact as the newest valid one; 0 runs lost', async () => {
    const series = 'bench/artifacts';
    const name = artifactName('bellgate-history', series);
    const random = seededRandom(99);
    const warnings: string[] = [];
    let clock = Date.UTC(2026, 2, 1);
    let run = 500;
    // The uploader stands in for @actions/artifact: a fifth of uploads fail, half of those after
    // leaving a broken artifact behind (a zip cut short), the rest before anything is stored.
    const upload: ArtifactUploader = async (artifact, files) => {
      const zip = zipSync(Object.fromEntries(files.map((f) => [f.name, strToU8(f.text)])));
      const roll = random();
      if (roll < 0.2) {
        if (roll < 0.1) register(artifact, zip.subarray(0, zip.length >> 1));
        throw new Error('upload failed: stand-in fault');
      }
      return { id: register(artifact, zip) };
    };
    function register(artifact: string, zip: Uint8Array): number {
      clock += 60_000;
      const id = rest.state.nextId++;
      rest.state.artifacts.push({
        id,
        name: artifact,
        createdAt: new Date(clock).toISOString(),
        expired: false,
        headBranch: 'main',
        headRepositoryId: 5,
        repositoryId: 5,
        workflowRunId: run++,
        sizeInBytes: zip.length,
        zip,
      });
      return id;
    }
    const storeVia = (url: string) =>
      createArtifactStore({
        api: createOctokitApi({
          token: 'ghs_standin',
          baseUrl: url,
          owner: 'acme',
          repo: 'router',
          retry: { retries: 2, unitMs: 1 },
        }),
        upload,
        history: 'bellgate-history',
        series,
        baselineBranch: 'main',
        repositoryId: 5,
        retentionDays: 5,
        warn: (m) => warnings.push(m),
      });
    const t = tally();
    let incompleteLoads = 0;
    const recorded: string[] = [];
    for (let i = 0; i < 40; i++) {
      const id = `${500 + i}-1`;
      const before = ids(await storeVia(rest.url).read()); // no faults: the truth
      t.tried += 1;
      let ok = false;
      try {
        const store = storeVia(proxy.url);
        const seen = warnings.length;
        const h = await store.read();
        if (missing(before, ids(h)) > 0) {
          incompleteLoads += 1;
          console.log(`artifact load ${i} missed ${missing(before, ids(h))} runs: ${warnings.slice(seen).join(' | ')}`);
        }
        await store.update(record(id, i, 70 + i));
        ok = true;
      } catch (error) {
        expect(error).toBeInstanceOf(StoreError);
      }
      const after = ids(await storeVia(rest.url).read());
      t.lost += missing(before, after);
      if (ok) {
        t.recorded += 1;
        recorded.push(id);
        expect(after).toContain(id);
      } else {
        t.failed += 1;
        if (after.includes(id)) t.failedButStored += 1;
      }
    }
    const final = ids(await storeVia(rest.url).read());
    t.lost += missing(recorded, final);
    const artifacts = rest.state.artifacts.filter((a) => a.name === name).length;
    console.log(
      `artifact faults: ${JSON.stringify(t)}; ${artifacts} artifacts, ${incompleteLoads} loads that missed runs, ${warnings.length} warnings; ${proxy.requests} API calls, ${proxy.totalInjected()} faults injected ${JSON.stringify(Object.fromEntries(proxy.injected))}`,
    );
    expect(t.lost).toBe(0);
    expect(t.failed).toBeGreaterThan(0);
    expect(proxy.totalInjected()).toBeGreaterThan(0);
  }, 180_000);
});
