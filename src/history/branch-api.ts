/**
 * The Git Data calls the branch store makes (shaped after the public REST reference,
 * docs.github.com/rest/git: refs, commits, trees, blobs, and "Get repository content"), and the
 * error they throw. branch-rest.ts implements them over fetch; tests point it at a loopback server.
 */

/** One tree entry to write: a file (mode 100644) whose blob was created before. */
export interface TreeEntryInput {
  path: string;
  mode: '100644';
  type: 'blob';
  sha: string;
}

export interface GitDataApi {
  /** The commit sha the branch points at, or undefined when the branch does not exist (404). */
  getBranchHead(branch: string): Promise<string | undefined>;
  /** The tree sha of a commit. */
  getCommitTree(sha: string): Promise<string>;
  /** The blob sha and size of a file at a commit, or undefined when there is no such file (404). */
  findFile(path: string, commit: string): Promise<{ sha: string; size: number } | undefined>;
  /** A blob's bytes decoded as UTF-8. */
  getBlobText(sha: string): Promise<string>;
  createBlob(text: string): Promise<string>;
  /** A new tree: `baseTree` (when given) with `entries` added or replaced (paths may hold "/"). */
  createTree(entries: TreeEntryInput[], baseTree?: string): Promise<string>;
  /** A new commit; no parents makes an orphan (the first commit of a new branch). */
  createCommit(message: string, tree: string, parents: string[]): Promise<string>;
  /** Creates refs/heads/<branch> at sha; a branch that exists already is a GitDataError with conflict. */
  createBranch(branch: string, sha: string): Promise<void>;
  /** Moves the branch to sha with force false; a non-fast-forward is a GitDataError with conflict. */
  updateBranch(branch: string, sha: string): Promise<void>;
}

/**
 * A Git Data call failed. `status` is the HTTP status (undefined for a network error, timeout or
 * truncated answer); `transient` says a retry may succeed (5xx, 429, network); `conflict` says the
 * branch moved under us (409, or 422 on a ref write) and the store should re-read and merge.
 */
export class GitDataError extends Error {
  override name = 'GitDataError';
  readonly status?: number;
  readonly transient: boolean;
  readonly conflict: boolean;
  /** Seconds the server asked to wait (Retry-After), if it did. */
  readonly retryAfter?: number;

  constructor(
    message: string,
    options: { status?: number; transient?: boolean; conflict?: boolean; retryAfter?: number; cause?: unknown } = {},
  ) {
    super(message, options.cause === undefined ? undefined : { cause: options.cause });
    this.status = options.status;
    this.transient = options.transient ?? false;
    this.conflict = options.conflict ?? false;
    this.retryAfter = options.retryAfter;
  }
}
