import type { History } from './history.js';

/**
 * Where a series' history lives between CI runs: a local file, an artifact, a data branch.
 * `load` returns an empty history when there is none yet, and throws StoreError when there is one
 * that cannot be read. `save(h, readCount)` writes `h`; `readCount` is the number of runs `load`
 * returned, and a store refuses (StoreError) to write fewer runs than that unless trimHistory
 * explains the difference (`h.trimmed`, see guardAgainstLoss) — so a caller that accidentally
 * starts from an empty history cannot wipe the real one.
 */
export interface HistoryStore {
  /** For messages: "file .bellgate/history.json", "artifact bellgate-history (branch main)". */
  describe(): string;
  load(): Promise<History>;
  save(h: History, readCount: number): Promise<void>;
}

/**
 * What kind of failure a StoreError is, for callers that must tell a configuration fault (the
 * action fails the step) from a passing outage (it warns): `other-series` (the stored history
 * belongs to another series), `not-a-history` (what is stored is not a readable history),
 * `denied` (the token or the file system refuses access), `unreachable` (the store did not answer
 * in time or answered with a server error; trying again may work).
 */
export type StoreErrorKind = 'other-series' | 'not-a-history' | 'denied' | 'unreachable';

/**
 * A store could not be reached, read or written. The CLI maps it to exit 3 and the action fails
 * the step; the stored history is left as it was. `message` is the reason; `where` describes the
 * store (also as `store`); `fix` says what to do.
 *
 * @example new StoreError('the file is not a history document', { where: 'file h.json', fix: 'restore it' })
 */
export class StoreError extends Error {
  override name = 'StoreError';
  /** The store's description (HistoryStore.describe()). */
  readonly where?: string;
  /** What to do about it, in one sentence. */
  readonly fix?: string;
  /** The kind of failure, where the store knows it (StoreErrorKind). */
  readonly kind?: StoreErrorKind;

  constructor(reason: string, options: { where?: string; fix?: string; kind?: StoreErrorKind; cause?: unknown } = {}) {
    super(reason, options.cause === undefined ? undefined : { cause: options.cause });
    this.where = options.where;
    this.fix = options.fix;
    this.kind = options.kind;
  }

  /** The store's description, for callers that prefer the name. */
  get store(): string | undefined {
    return this.where;
  }

  /** Why it failed (the message). */
  get reason(): string {
    return this.message;
  }

  /** "store: reason\n  fix: ..." — the line a user sees. */
  describe(): string {
    const head = this.where ? `${this.where}: ${this.message}` : this.message;
    return this.fix ? `${head}\n  fix: ${this.fix}` : head;
  }
}

/**
 * The shrink rule every store's save applies: writing `h` is refused when it holds fewer runs
 * than were read, unless runs deleted on purpose by trimHistory (`h.trimmed`) make up the gap.
 * Throws StoreError naming the store; also rejects a readCount that is not a count.
 *
 * @example guardAgainstLoss('file h.json', history, 120) // throws when history has 100 runs, 0 trimmed
 */
export function guardAgainstLoss(store: string, h: History, readCount: number): void {
  if (!Number.isInteger(readCount) || readCount < 0) {
    throw new StoreError(`readCount must be the number of runs load returned, got ${readCount}`, { where: store });
  }
  const accounted = h.runs.length + (h.trimmed ?? 0);
  if (accounted < readCount) {
    throw new StoreError(
      `refusing to save ${h.runs.length} runs over the ${readCount} that were read: ${readCount - accounted} runs would be lost`,
      {
        where: store,
        fix: 'append to the history that load returned; delete runs only with trimHistory (the `keep` setting)',
      },
    );
  }
}
