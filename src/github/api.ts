/**
 * The GitHub REST calls the action makes, as one small interface: the artifact store's listing and
 * download, the labels and issue comments of a pull request. The real implementation is octokit-api.ts;
 * tests point it at a loopback server.
 */
import type { ArtifactApi } from '../history/artifact-store.js';
import type { GitDataApi } from '../history/branch-api.js';
import type { ReleaseApi } from './release-api.js';
import type { RetryTuning } from './retry-after.js';

export interface IssueComment {
  id: number;
  body: string;
  /** Login of the author, e.g. github-actions[bot]. */
  author?: string;
}

/** A pull request a commit belongs to ("List pull requests associated with a commit"). */
export interface CommitPull {
  number: number;
  /** When it was merged; absent for an open or closed-unmerged pull request. */
  mergedAt?: string;
  /** The commit its merge made on the base branch (merge, squash or rebase). */
  mergeSha?: string;
  /** The branch it was merged into, e.g. "main". */
  base?: string;
  /** Names of the labels it carries now. */
  labels: string[];
}

export interface GitHubApi extends ArtifactApi {
  /** The names of the labels a pull request (an issue) carries now (paginated, bounded). */
  listIssueLabels(issue: number): Promise<string[]>;
  /** The pull requests the commit belongs to (the merged one of a push to the base branch). */
  listCommitPulls(sha: string): Promise<CommitPull[]>;
  /** Every comment of the issue or pull request, oldest first (paginated, bounded). */
  listIssueComments(issue: number): Promise<IssueComment[]>;
  createIssueComment(issue: number, body: string): Promise<IssueComment>;
  updateIssueComment(id: number, body: string): Promise<void>;
  /** The Git Data calls of the `branch` store (same token and API URL); fakes may leave it out. */
  gitData?: GitDataApi;
  /** The release review's tag and commit calls (release-api.ts); fakes may leave it out. */
  release?: ReleaseApi;
}

/** The retries of the action's calls. */
export const DEFAULT_RETRY: RetryTuning = { retries: 3, unitMs: 1000 };

export interface ApiTarget {
  token: string;
  baseUrl: string;
  owner: string;
  repo: string;
  retry?: RetryTuning;
  /** Most pages read by any list call (100 items a page). */
  maxPages?: number;
  log?: (message: string) => void;
}

/** Makes the client; the real one loads its code on first use (octokit and retries stay out of a
 * run that never calls the API), so it may answer with a promise. */
export type GitHubApiFactory = (target: ApiTarget) => GitHubApi | Promise<GitHubApi>;

/** The HTTP status of an octokit RequestError (or similar), if any. */
export function statusOf(error: unknown): number | undefined {
  const s = (error as { status?: unknown } | null)?.status;
  return typeof s === 'number' ? s : undefined;
}
