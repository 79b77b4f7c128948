// K recording runs that race on the artifact store, through the real octokit client, the loopback
// REST stand-in ("List artifacts for a repository", "Download an artifact", "Delete an artifact")
// and a fault proxy that spoils 10% of the API calls (500, 502, 429, dropped connections, cut
// bodies, answers slower than the client's time limit). Every run loads the same parent and
// uploads a sibling; a run whose update fails is run again, as a CI re-run would. Then one more
// run records. Every run must be in the final history once: 0 lost, 0 doubled, for K = 2..8.
import { strToU8, zipSync } from 'fflate';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { createOctokitApi } from '../../src/github/octokit-api.js';
import { artifactName, createArtifactStore, type ArtifactUploader } from '../../src/history/artifact-store.js';
import type { HistoryChange } from '../../src/history/changes.js';
import { StoreError } from '../../src/history/store.js';
import { seededUniform } from '../model/random.js';
import { startFaultProxy, type FaultProxy } from '../e2e/standins/fault-proxy.js';
import { startRestStandin, type RestStandin } from '../e2e/standins/rest-api.js';

const SERIES = 'render/scenes';
const NAME = artifactName('bellgate-history', SERIES);

let rest: RestStandin;
beforeAll(async () => {
  rest = await startRestStandin();
});
afterAll(async () => rest.close());

function storeVia(url: string, upload: ArtifactUploader, notes: string[] = []) {
  return createArtifactStore({
    api: createOctokitApi({
      token: 'ghs_standin',
      baseUrl: url,
      owner: 'acme',
      repo: 'render',
      retry: { retries: 4, unitMs: 1, timeoutMs: 400 },
    }),
    upload,
    history: 'bellgate-history',
    series: SERIES,
    baselineBranch: 'main',
    repositoryId: 5,
    retentionDays: 7,
    warn: (m) => notes.push(m),
    info: (m) => notes.push(m),
  });
}

const record = (id: string, minute: number): HistoryChange => ({
  kind: 'record',
  info: { id, time: new Date(Date.UTC(2026, 4, 1, 12, minute)).toISOString(), event: 'push' },
  run: { metrics: new Map([['scene-3/shade', { value: 1000 + minute, unit: 'ms', count: 1 }]]), meta: new Map() },
  keep: 4000,
});

describe('K racing recording runs on the artifact store, 10% API faults', () => {
  for (let k = 2; k <= 8; k++) {
    it(`K = ${k}: 0 lost, 0 doubled`, async () => {
      rest.state.artifacts = [];
      rest.state.artifactDeleteStatus = k % 2 === 0 ? undefined : 403; // with and without actions: write
      const random = seededUniform(1000 + k);
      let clock = Date.UTC(2026, 4, 1);
      let runId = 9000;
      let faults = false;
      // While the racers run, the first upload waits (at most 3 s) until all K have loaded: they
      // all read the same parent, the race the store must survive.
      let racing = false;
      let arrived = 0;
      const released = new Promise<void>((resolve) => {
        const done = () => {
          clearInterval(check);
          resolve();
        };
        const check = setInterval(() => {
          if (arrived >= k) done();
        }, 5);
        setTimeout(done, 3000);
      });
      // Stands in for @actions/artifact (the results service): a tenth of uploads fail outright.
      const upload: ArtifactUploader = async (name, files) => {
        if (racing) {
          arrived += 1;
          await released;
        }
        if (faults && random() < 0.1) throw new Error('upload failed: stand-in fault');
        const zip = zipSync(Object.fromEntries(files.map((f) => [f.name, strToU8(f.text)])));
        clock += 1000;
        const id = rest.state.nextId++;
        rest.state.artifacts.push({
          id,
          name,
          createdAt: new Date(clock).toISOString(),
          expired: false,
          headBranch: 'main',
          headRepositoryId: 5,
          repositoryId: 5,
          workflowRunId: runId++,
          sizeInBytes: zip.length,
          zip,
        });
        return { id };
      };
      const clean = storeVia(rest.url, upload);
      for (let i = 0; i < 5; i++) await clean.update(record(`${100 + i}-1`, i));
      const proxy: FaultProxy = await startFaultProxy({
        target: rest.url,
        rate: 0.1,
        seed: 77 + k,
        slowMs: 800,
        retryAfter: 1,
      });
      let reruns = 0;
      faults = true;
      try {
        const notes: string[] = [];
        /** One CI job: its update, run again (at most 8 times) when the store fails. */
        const job = async (id: string, minute: number): Promise<void> => {
          for (let attempt = 0; ; attempt++) {
            try {
              await storeVia(proxy.url, upload, notes).update(record(id, minute));
              return;
            } catch (error) {
              expect(error).toBeInstanceOf(StoreError);
              if (attempt >= 8) throw error;
              reruns += 1;
            }
          }
        };
        const racers = Array.from({ length: k }, (_, w) => `${200 + w}-1`);
        racing = true;
        await Promise.all(racers.map((id, w) => job(id, 10 + w)));
        racing = false;
        await job('300-1', 30);
        proxy.enabled = false;
        const final = await clean.read();
        const ids = final.runs.map((r) => r.id);
        const expected = ['100-1', '101-1', '102-1', '103-1', '104-1', ...racers, '300-1'];
        const lost = expected.filter((id) => !ids.includes(id));
        const doubled = ids.length - new Set(ids).size;
        console.log(
          `artifact race K=${k}: ${lost.length} lost, ${doubled} doubled, ${reruns} re-runs, ${proxy.totalInjected()} of ${proxy.requests} API calls spoiled, ` +
            `${rest.state.artifacts.filter((a) => a.name === NAME).length} artifacts left (deletes ${k % 2 === 0 ? 'allowed' : 'refused'})`,
        );
        expect(lost).toEqual([]);
        expect(doubled).toBe(0);
        expect(ids).toEqual(expected);
        expect(final.columns.get('scene-3/shade')?.values).toEqual([
          1000,
          1001,
          1002,
          1003,
          1004,
          ...racers.map((_, w) => 1010 + w),
          1030,
        ]);
      } finally {
        await proxy.close();
      }
    });
  }
});
