import { noCommandLines, oneLine } from '../errors/input-error.js';
import { visibleText } from '../errors/visible-text.js';
import type { HistoryChange } from './changes.js';
import type { History } from './history.js';

/** What a read asks for. */
export interface ReadOptions {
  /**
   * Only the newest this-many runs (a check: its window and the change-point margin). The file
   * store then reads the file from its end; absent, the whole history is read.
   */
  newest?: number;
}

/** What an update did. */
export interface UpdateOutcome {
  /** Runs the stored history holds afterwards (after an append: the count the writer keeps, see document.ts). */
  runs: number;
  /** For a record: the id of the run it replaced (the same id, or an earlier attempt of the CI run). */
  replaced?: string;
  /** One line added at the end of the stored document, or the document written whole. */
  wrote: 'appended' | 'rewritten';
}

/**
 * Where a series' history lives between CI runs: a local file, artifacts, a data branch.
 * - `read` returns an empty history when there is none yet, and throws StoreError when there is
 *   one that cannot be read (it is then never written over).
 * - `update` applies a change to what is stored at the moment of writing — under the file lock,
 *   on the branch's newest head, over every artifact not yet merged — so a writer never loses what
 *   another added since it read. It throws StoreError when the store cannot be written, and
 *   InputError when the change does not apply (see applyChange).
 */
export interface HistoryStore {
  /** For messages: "file .bellgate/history.jsonl", "artifact bellgate-history-... (branch main)". */
  describe(): string;
  read(options?: ReadOptions): Promise<History>;
  update(change: HistoryChange): Promise<UpdateOutcome>;
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
 * @example new StoreError('the file is not a history document', { where: 'file h.jsonl', fix: 'restore it' })
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
    const head = this.where ? `${oneLine(this.where)}: ${this.message}` : this.message;
    return noCommandLines(visibleText(this.fix ? `${head}\n  fix: ${this.fix}` : head));
  }
}

/**
 * How many runs past `keep` an append-only store lets a history grow before it trims (rewrites
 * the whole document): a tenth of keep, at least 1. Trimming then costs one rewrite per that many
 * records instead of one per record.
 * @example trimSlack(4000) // 400
 */
export function trimSlack(keep: number): number {
  return keep === Infinity ? 0 : Math.max(1, Math.ceil(keep / 10));
}
