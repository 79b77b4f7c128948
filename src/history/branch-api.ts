/**
 * The Git Data calls the branch store makes (shaped after the public REST reference,
 * docs.github.com/rest/git: refs, commits, trees, blobs; "Get repository content"; "Merge a
 * branch"), the error they throw, and how a failure answer is classified. src/github/git-data.ts
 * implements them over octokit; tests point it at a loopback stand-in.
 */

/** A file to write into a tree: its path (may hold "/") and text (the server writes the blob). */
export interface TreeFile {
  path: string;
  text: string;
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
  /** A new tree: `baseTree` (when given) with `files` added or replaced; one request, no blob calls. */
  createTree(files: TreeFile[], baseTree?: string): Promise<string>;
  /** A new commit; no parents makes an orphan (the first commit of a new branch). */
  createCommit(message: string, tree: string, parents: string[]): Promise<string>;
  /** Creates refs/heads/<branch> at sha; a branch that exists already is a GitDataError 'conflict'. */
  createBranch(branch: string, sha: string): Promise<void>;
  /**
   * Merges commit `sha` into the branch on the server ("Merge a branch"): 'merged', or 'contained'
   * when the branch holds it already (a retried request). Files both sides changed are a
   * GitDataError 'conflict'; a missing branch is 'missing'.
   */
  mergeIntoBranch(branch: string, sha: string, message: string): Promise<'merged' | 'contained'>;
}

/**
 * What a failed Git Data call means for the store:
 * - conflict: the branch moved under us (the same file changed; the branch appeared) — re-read, retry;
 * - protected: a branch protection rule or a ruleset refuses the write — retrying cannot help;
 * - rate-limited: a secondary or primary rate limit — wait as long as GitHub asked (`retryAfter`);
 * - transient: a server error, a dropped connection or a timeout — retry;
 * - denied: the token may not (401, 403) — fix the permissions;
 * - missing: the branch or an object is not there (404);
 * - other: anything else (a 422 that is none of the above): fail.
 */
export type GitDataFailure = 'conflict' | 'protected' | 'rate-limited' | 'transient' | 'denied' | 'missing' | 'other';

/** A Git Data call failed; `kind` says what that means (classifyGitDataFailure). */
export class GitDataError extends Error {
  override name = 'GitDataError';
  readonly status?: number;
  readonly kind: GitDataFailure;
  /** Seconds GitHub asked to wait, for a rate limit. */
  readonly retryAfter?: number;

  constructor(
    message: string,
    options: { status?: number; kind: GitDataFailure; retryAfter?: number; cause?: unknown },
  ) {
    super(message, options.cause === undefined ? undefined : { cause: options.cause });
    this.status = options.status;
    this.kind = options.kind;
    if (options.retryAfter !== undefined) this.retryAfter = options.retryAfter;
  }

  /** True when trying again (after a wait) may succeed. */
  get transient(): boolean {
    return this.kind === 'transient' || this.kind === 'rate-limited';
  }
}

const PROTECTION =
  /repository rule|rule violation|protected branch|protected ref|branch protection|ruleset|required status check|status checks? .*expected|changes must be made through a pull request|cannot (update|create) (this )?(protected )?ref/i;

/**
 * The meaning of a failure answer: HTTP `status` (undefined for a network error or a timeout),
 * GitHub's `message`, and `rateWait`, the seconds a rate-limit answer asks to wait (undefined when
 * the answer is not a rate limit; see src/github/retry-after.ts for how it is read).
 * Refs and merges: 422 "Update is not a fast forward", "Reference already exists" and "Reference
 * does not exist", and 409 "Merge conflict", mean the branch moved; a 422 or 409 that speaks of a
 * repository rule, a protected branch or a required status check is a protection that refuses us.
 *
 * @example classifyGitDataFailure(422, 'Repository rule violations found\n\nCannot update this protected ref.', undefined) // { kind: 'protected' }
 */
export function classifyGitDataFailure(
  status: number | undefined,
  message: string,
  rateWait: number | undefined,
): { kind: GitDataFailure; retryAfter?: number } {
  if (rateWait !== undefined) return { kind: 'rate-limited', retryAfter: rateWait };
  if (status === undefined || status >= 500) return { kind: 'transient' };
  if ((status === 422 || status === 409 || status === 403) && PROTECTION.test(message)) return { kind: 'protected' };
  if (status === 409) return { kind: 'conflict' };
  if (status === 422)
    return /not a fast[- ]?forward|reference already exists|reference does not exist|merge conflict/i.test(message)
      ? { kind: 'conflict' }
      : { kind: 'other' };
  if (status === 401 || status === 403) return { kind: 'denied' };
  if (status === 404) return { kind: 'missing' };
  return { kind: 'other' };
}
