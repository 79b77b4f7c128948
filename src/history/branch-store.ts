/**
 * The `branch` history store: one JSON Lines document per series on a data branch (default
 * `bellgate-data`), at `bellgate/<series slug>-<hash>.jsonl`, written through the Git Data API.
 *
 * - read: branch head -> its commit (tree) -> the file (contents API) -> its blob. No branch or no
 *   file is an empty history; a file that is not a readable history of this series is a StoreError
 *   and is never written over. Passing faults are retried.
 * - update: reads, applies the change to what the branch holds (applyChange), and writes three
 *   content-creating requests: a tree on the head's tree with the file's new text (the server
 *   writes the blob), a commit on the head, and a server-side merge of that commit into the branch
 *   ("Merge a branch"). The merge is what lets a wide matrix through: legs that record different
 *   series change different files, so their merges never conflict however many race, and each
 *   leg costs exactly those three requests — 24 legs make 72, inside GitHub's documented 80
 *   content-creating requests a minute. A merge that conflicts (the same series written meanwhile)
 *   re-reads and tries again after a backoff with jitter, at most `attempts` times. The document
 *   keeps one run a line with the header's metric order stable, so even a line-wise merge of two
 *   changes to one file (a drop and a record) keeps the meaning of both. A missing branch is
 *   created as an orphan commit holding only the history folder.
 * - Failures: a branch protection rule or ruleset that refuses the write fails at once, saying how
 *   to exempt the data branch; a rate limit waits as long as GitHub asked (the octokit plugin does
 *   the first waits, see src/github/retry-after.ts, and the store a few more); 401/403 name the
 *   permission.
 * - Needs `permissions: contents: write` to record (`contents: read` to check).
 */
import { InputError } from '../errors/input-error.js';
import { applyChange, type HistoryChange } from './changes.js';
import { GitDataError, type GitDataApi } from './branch-api.js';
import { seriesFilePath } from './branch-path.js';
import { parseHistory, serializeHistory } from './document.js';
import { emptyHistory, type History } from './history.js';
import { StoreError, type HistoryStore, type ReadOptions, type UpdateOutcome } from './store.js';

export interface BranchStoreOptions {
  api: GitDataApi;
  /** A valid branch name (see dataBranchName). */
  branch: string;
  series: string;
  /** Tries of one update after a conflict or a passing fault (default 8 of each). */
  attempts?: number;
  /** Backoff unit between tries and the unit of rate-limit waits (default 1000 ms). */
  unitMs?: number;
  /** Jitter source in [0, 1) (default Math.random). */
  random?: () => number;
  /** Largest history file read (default 64 MiB). */
  maxBytes?: number;
  /** Rate-limit answers waited out by one update or read, beyond the client's own (default 6). */
  rateLimitWaits?: number;
}

interface Snapshot {
  head?: string;
  tree?: string;
  stored: History;
  text?: string;
}

/**
 * @example const store = createBranchStore({ api, branch: 'bellgate-data', series: 'bench/linux' });
 * await store.update({ kind: 'record', info, run, keep: 4000 });
 */
export function createBranchStore(options: BranchStoreOptions): HistoryStore {
  const { api, branch, series } = options;
  const path = seriesFilePath(series);
  const where = `branch ${branch} (${path})`;
  const attempts = Math.max(1, options.attempts ?? 8);
  const unitMs = options.unitMs ?? 1000;
  const random = options.random ?? Math.random;
  const maxBytes = options.maxBytes ?? 64 * 1024 * 1024;
  const rateLimitWaits = options.rateLimitWaits ?? 6;

  async function snapshot(newest?: number): Promise<Snapshot> {
    const head = await api.getBranchHead(branch);
    if (head === undefined) return { stored: emptyHistory(series) };
    const tree = await api.getCommitTree(head);
    const file = await api.findFile(path, head);
    if (file === undefined) return { head, tree, stored: emptyHistory(series) };
    if (file.size > maxBytes) {
      throw new StoreError(
        `the history file is ${file.size} bytes, over the ${maxBytes} byte limit; it was left as it is`,
        {
          where,
          fix: 'lower `keep` so the history stays smaller',
        },
      );
    }
    const text = await api.getBlobText(file.sha);
    let stored: History;
    try {
      stored = parseHistory(text, `${branch}:${path}`, newest === undefined ? {} : { newest });
    } catch (cause) {
      if (!(cause instanceof InputError)) throw cause;
      throw new StoreError(
        `the history file is not a readable history document (${cause.where ?? path}: ${cause.message}); it was left as it is`,
        { where, fix: cause.fix ?? 'repair or delete the file on the data branch', cause },
      );
    }
    if (stored.series !== series)
      throw new StoreError(`the file holds series ${JSON.stringify(stored.series)}, not ${JSON.stringify(series)}`, {
        where,
        fix: 'give each series its own file (the series name picks it)',
      });
    return { head, tree, stored, text };
  }

  function failure(error: unknown, doing: string): StoreError {
    if (error instanceof StoreError) return error;
    const reason = error instanceof Error ? error.message : String(error);
    const kind = error instanceof GitDataError ? error.kind : 'other';
    const fix =
      kind === 'protected'
        ? `exempt the data branch ${branch} from the branch protection rule or ruleset that refuses the write (or let GitHub Actions bypass it), or name an unprotected branch with the \`history\` input`
        : kind === 'denied'
          ? 'give the job `permissions: contents: write` (contents: read to only check) and check the token'
          : kind === 'rate-limited'
            ? 'GitHub rate-limited the writes; run the job again later, or record fewer series at once'
            : 'run the job again; the history on the branch was left as it was';
    return new StoreError(`cannot ${doing} the data branch: ${reason}`, { where, fix, cause: error });
  }

  /** Commits `text` on the snapshot's head and merges it into the branch (or creates the branch). */
  async function write(snap: Snapshot, text: string, runs: number): Promise<void> {
    const files = [{ path, text }];
    const message = `bellgate: history of ${JSON.stringify(series.slice(0, 100))}, ${runs} runs`;
    if (snap.head === undefined) {
      const commit = await api.createCommit(message, await api.createTree(files), []);
      await api.createBranch(branch, commit);
      return;
    }
    const commit = await api.createCommit(message, await api.createTree(files, snap.tree), [snap.head]);
    await api.mergeIntoBranch(branch, commit, `bellgate: merge ${message.slice('bellgate: '.length)}`);
  }

  /**
   * Runs `step` until it succeeds: conflicts and passing faults are retried after a backoff with
   * jitter (at most `attempts` of each), rate limits after the wait GitHub asked for (at most
   * rateLimitWaits of them); anything else fails at once.
   */
  async function retrying<T>(doing: string, step: () => Promise<T>): Promise<T> {
    let conflicts = 0;
    let faults = 0;
    let limits = 0;
    let last: unknown;
    for (;;) {
      try {
        return await step();
      } catch (error) {
        // A change that does not apply (InputError) says so plainly; it is not a store failure.
        if (error instanceof InputError) throw error;
        if (!(error instanceof GitDataError)) throw failure(error, doing);
        last = error;
        let wait: number;
        if (error.kind === 'conflict' || error.kind === 'missing') {
          conflicts += 1;
          if (conflicts >= attempts) break;
          wait = backoff(conflicts - 1);
        } else if (error.kind === 'transient') {
          faults += 1;
          if (faults >= attempts) break;
          wait = backoff(faults - 1);
        } else if (error.kind === 'rate-limited') {
          limits += 1;
          if (limits > rateLimitWaits) throw failure(error, doing);
          // As GitHub asks; when it did not say, at least a minute, growing (its documented rule).
          wait = (error.retryAfter ?? 60 * 2 ** Math.min(limits - 1, 4)) * unitMs;
        } else throw failure(error, doing);
        await new Promise((r) => setTimeout(r, wait));
      }
    }
    throw new StoreError(
      `gave up after ${attempts} tries (last: ${last instanceof Error ? last.message : String(last)}); the history on the branch is whole, but this run may not be recorded`,
      { where, fix: 'run the job again; if writers of one series collide often, record it from one job' },
    );
  }

  /** Full jitter on a doubling step, capped at 60 units: writers that collided do not collide again in step. */
  function backoff(attempt: number): number {
    return Math.min(60 * unitMs, unitMs * 2 ** Math.min(attempt, 16) * (0.5 + random()));
  }

  return {
    describe: () => where,
    async read(readOptions: ReadOptions = {}): Promise<History> {
      // A read changes nothing, so a passing fault is simply tried again.
      return (await retrying('read', () => snapshot(readOptions.newest))).stored;
    },
    async update(change: HistoryChange): Promise<UpdateOutcome> {
      return retrying('write to', async () => {
        const snap = await snapshot();
        const { history, replaced } = applyChange(snap.stored, change);
        const text = serializeHistory(history);
        if (text !== snap.text) await write(snap, text, history.runs.length);
        const outcome: UpdateOutcome = { runs: history.runs.length, wrote: 'rewritten' };
        if (replaced !== undefined) outcome.replaced = replaced;
        return outcome;
      });
    },
  };
}
