/**
 * The `branch` history store: one JSON document per series on a data branch (default
 * `bellgate-data`), at `bellgate/<series slug>-<hash>.json`, written through the Git Data API.
 *
 * - load: branch head -> the file at that commit (contents API) -> its blob. No branch or no file
 *   is an empty history; a file that is not a readable history of this series is a StoreError and
 *   is never overwritten. Transient API failures are retried like a save's (`attempts`).
 * - save: blob -> tree (base_tree = the head's tree, so other series' files stay) -> commit (parent
 *   = the head) -> ref update with force false. When the branch moved meanwhile the update is
 *   refused (422/409); the store re-reads, keeps the runs the other writer added (union by run id,
 *   minus what this history trimmed on purpose) and tries again after a backoff with jitter, at
 *   most `attempts` times. Each try is one commit moved into place by one ref update, so the branch
 *   holds either the old document or the new one, never half. A missing branch is created as an
 *   orphan commit holding only the history folder (no code, no need to read the default branch).
 * - Needs `permissions: contents: write` to record (`contents: read` to check).
 */
import { InputError } from '../errors/input-error.js';
import { GitDataError, type GitDataApi } from './branch-api.js';
import { backoffMs } from './branch-backoff.js';
import { combineWithStored } from './branch-combine.js';
import { seriesFilePath } from './branch-path.js';
import { parseHistory, serializeHistory } from './document.js';
import { emptyHistory, type History } from './history.js';
import { guardAgainstLoss, StoreError, type HistoryStore } from './store.js';

export interface BranchStoreOptions {
  api: GitDataApi;
  /** A valid branch name (see dataBranchName). */
  branch: string;
  series: string;
  /** Tries of one save, each re-reading the branch (default 6). */
  attempts?: number;
  /** Backoff unit between tries (default 1000 ms). */
  unitMs?: number;
  /** Jitter source in [0, 1) (default Math.random). */
  random?: () => number;
  /** Largest history file read (default 32 MiB). */
  maxBytes?: number;
}

interface Snapshot {
  head?: string;
  stored: History;
  text?: string;
}

/**
 * @example const store = createBranchStore({ api: createGitDataClient(target), branch: 'bellgate-data', series: 'bench/linux' });
 * await store.save(appendRun(await store.load(), info, run), readCount);
 */
export function createBranchStore(options: BranchStoreOptions): HistoryStore {
  const { api, branch, series } = options;
  const path = seriesFilePath(series);
  const where = `branch ${branch} (${path})`;
  const attempts = Math.max(1, options.attempts ?? 6);
  const unitMs = options.unitMs ?? 1000;
  const random = options.random ?? Math.random;
  const maxBytes = options.maxBytes ?? 32 * 1024 * 1024;
  let loaded: Snapshot | undefined;
  let loadedIds = new Set<string>();

  async function read(): Promise<Snapshot> {
    const head = await api.getBranchHead(branch);
    if (head === undefined) return { stored: emptyHistory(series) };
    const file = await api.findFile(path, head);
    if (file === undefined) return { head, stored: emptyHistory(series) };
    if (file.size > maxBytes) {
      throw new StoreError(
        `the history file is ${file.size} bytes, over the ${maxBytes} byte limit; it was left as it is`,
        { where, fix: 'lower `keep` and trim the history with the CLI' },
      );
    }
    const text = await api.getBlobText(file.sha);
    let stored: History;
    try {
      stored = parseHistory(text, `${branch}:${path}`);
    } catch (cause) {
      if (!(cause instanceof InputError)) throw cause;
      throw new StoreError(
        `the history file is not a readable history document (${cause.message}); it was left as it is`,
        { where, fix: cause.fix ?? 'repair or delete the file on the data branch', cause },
      );
    }
    if (stored.series !== series)
      throw new StoreError(`the file holds series ${JSON.stringify(stored.series)}, not ${JSON.stringify(series)}`, {
        where,
        fix: 'give each series its own file (the series name picks it)',
      });
    return { head, stored, text };
  }

  function failure(error: unknown, doing: string): StoreError {
    if (error instanceof StoreError) return error;
    const status = error instanceof GitDataError ? error.status : undefined;
    const denied = status === 401 || status === 403 || status === 404;
    return new StoreError(
      `cannot ${doing} the data branch: ${error instanceof Error ? error.message : String(error)}`,
      {
        where,
        fix: denied
          ? 'give the job `permissions: contents: write` (contents: read to only check) and check the token'
          : 'run the job again; the history on the branch was left as it was',
        cause: error,
      },
    );
  }

  async function write(snap: Snapshot, text: string, runs: number): Promise<string> {
    const blob = await api.createBlob(text);
    const entries = [{ path, mode: '100644' as const, type: 'blob' as const, sha: blob }];
    const message = `bellgate: history of ${JSON.stringify(series.slice(0, 100))}, ${runs} runs`;
    if (snap.head === undefined) {
      const commit = await api.createCommit(message, await api.createTree(entries), []);
      await api.createBranch(branch, commit);
      return commit;
    }
    const tree = await api.createTree(entries, await api.getCommitTree(snap.head));
    const commit = await api.createCommit(message, tree, [snap.head]);
    await api.updateBranch(branch, commit);
    return commit;
  }

  return {
    describe: () => where,
    async load(): Promise<History> {
      // A read changes nothing, so a transient failure is simply tried again, as often as a save would.
      let snap: Snapshot | undefined;
      for (let attempt = 0; snap === undefined; attempt++) {
        try {
          snap = await read();
        } catch (error) {
          if (!(error instanceof GitDataError && error.transient) || attempt + 1 >= attempts)
            throw failure(error, 'read');
          await new Promise((r) => setTimeout(r, backoffMs(attempt, unitMs, random, error.retryAfter)));
        }
      }
      loaded = snap;
      loadedIds = new Set(snap.stored.runs.map((r) => r.id));
      return snap.stored;
    },
    async save(h: History, readCount: number): Promise<void> {
      if (h.series !== series)
        throw new StoreError(
          `refusing to save series ${JSON.stringify(h.series)} into the history of ${JSON.stringify(series)}`,
          { where },
        );
      guardAgainstLoss(where, h, Math.max(readCount, loadedIds.size));
      const kept = new Set(h.runs.map((r) => r.id));
      const deleted = new Set([...loadedIds].filter((id) => !kept.has(id)));
      let snap = loaded;
      let last: unknown;
      for (let attempt = 0; attempt < attempts; attempt++) {
        try {
          snap ??= await read();
          const next = combineWithStored(h, snap.stored, deleted);
          // Runs on the branch are only ever dropped by this history's own trim.
          guardAgainstLoss(where, next, snap.stored.runs.filter((r) => !deleted.has(r.id)).length);
          const text = serializeHistory(next);
          if (text !== snap.text) snap = { head: await write(snap, text, next.runs.length), stored: next, text };
          loaded = snap;
          loadedIds = new Set(next.runs.map((r) => r.id));
          return;
        } catch (error) {
          if (!(error instanceof GitDataError) || !(error.conflict || error.transient))
            throw failure(error, 'write to');
          last = error;
          snap = undefined;
          if (attempt + 1 < attempts)
            await new Promise((r) => setTimeout(r, backoffMs(attempt, unitMs, random, error.retryAfter)));
        }
      }
      throw new StoreError(
        `gave up after ${attempts} tries (last: ${last instanceof Error ? last.message : String(last)}); the history on the branch is whole, but this run may not be recorded`,
        {
          where,
          fix: 'run the job again; if writers collide often, give each matrix job its own series',
        },
      );
    },
  };
}
