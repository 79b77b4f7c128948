/**
 * The real GitHubApi over octokit — the action's one HTTP client: @octokit/core with
 * honourRetryAfter (rate-limit waits as GitHub documents them, and a time limit on every try),
 * @octokit/plugin-retry (5xx, network errors and timeouts, growing backoff) and
 * @octokit/plugin-throttling (content-creating requests spaced apart). The branch store's Git
 * Data calls (git-data.ts), the artifact calls and the PR comment go through it. Behind the
 * runner's proxy (HTTPS_PROXY, HTTP_PROXY, NO_PROXY, read as @actions/http-client reads them)
 * every request, the download's redirect to storage included, goes through that proxy
 * (client-fetch.ts); without one, through the same fetch. Intervals are tunable so tests can run
 * the same code with millisecond waits.
 */
import { ArtifactGoneError, type ArtifactEntry } from '../history/artifact-store.js';
import { DEFAULT_RETRY, statusOf, type ApiTarget, type CommitPull, type GitHubApi, type IssueComment } from './api.js';
import { readCapped } from './fetch-capped.js';
import { createGitData } from './git-data.js';
import { clientFetch } from './client-fetch.js';
import { createReleaseApi } from './release-api.js';
import { honourRetryAfter } from './retry-after.js';

const PER_PAGE = 100;

type Octokit = InstanceType<typeof import('@octokit/core').Octokit>;

type Json = Record<string, unknown>;
const obj = (v: unknown): Json => (typeof v === 'object' && v !== null ? (v as Json) : {});
const num = (v: unknown): number | undefined => (typeof v === 'number' ? v : undefined);

function toArtifact(raw: unknown): ArtifactEntry {
  const a = obj(raw);
  const run = obj(a.workflow_run);
  return {
    id: Number(a.id),
    name: String(a.name ?? ''),
    expired: a.expired === true,
    createdAt: String(a.created_at ?? ''),
    sizeInBytes: num(a.size_in_bytes) ?? 0,
    headBranch: typeof run.head_branch === 'string' ? run.head_branch : undefined,
    headRepositoryId: num(run.head_repository_id),
    repositoryId: num(run.repository_id),
  };
}

/**
 * A stand-in for plugin-throttling's Bottleneck group that spaces content-creating requests
 * `minTime` apart (GitHub asks for about a second between them; the plugin's own group does the
 * same with a fixed 1 s), scaled with the retry unit so tests wait milliseconds.
 */
function spacedGroup(minTime: number) {
  let next = 0;
  const limiter = {
    schedule: async <T>(
      _options: unknown,
      job: (...args: unknown[]) => Promise<T> | T,
      ...args: unknown[]
    ): Promise<T> => {
      const now = Date.now();
      const at = Math.max(now, next);
      next = at + minTime;
      if (at > now) await new Promise((r) => setTimeout(r, at - now));
      return job(...args);
    },
  };
  return { key: () => limiter };
}

function toComment(raw: unknown): IssueComment {
  const c = obj(raw);
  const login = obj(c.user).login;
  return { id: Number(c.id), body: String(c.body ?? ''), author: typeof login === 'string' ? login : undefined };
}

function toCommitPull(raw: unknown): CommitPull {
  const p = obj(raw);
  const text = (v: unknown): string | undefined => (typeof v === 'string' && v !== '' ? v : undefined);
  const pull: CommitPull = {
    number: Number(p.number),
    labels: (Array.isArray(p.labels) ? p.labels : []).map((l) => String(obj(l).name ?? '')),
  };
  const mergedAt = text(p.merged_at);
  const mergeSha = text(p.merge_commit_sha);
  const base = text(obj(p.base).ref);
  if (mergedAt !== undefined) pull.mergedAt = mergedAt;
  if (mergeSha !== undefined) pull.mergeSha = mergeSha;
  if (base !== undefined) pull.base = base;
  return pull;
}

/**
 * Creates the API client for one repository.
 * @example createOctokitApi({ token, baseUrl: 'https://api.github.com', owner: 'acme', repo: 'router' })
 */
export function createOctokitApi(target: ApiTarget): GitHubApi {
  const tuning = target.retry ?? DEFAULT_RETRY;
  const maxPages = target.maxPages ?? 10;
  const log = target.log ?? (() => undefined);
  // Rate limits are waited out in honourRetryAfter, once; the throttling plugin only spaces
  // writes and logs what reaches it.
  const noRetry = (after: number, options: { method?: string; url?: string }): boolean => {
    log(`GitHub API rate limit on ${options.method ?? ''} ${options.url ?? ''} (asked to wait ${after} s)`);
    return false;
  };
  // octokit and its plugins (with Bottleneck) load on the first call: a run that never calls the
  // API loads none of it, and a failure there becomes a plain message instead of a crash at start-up.
  let client: Promise<Octokit> | undefined;
  const octokit = (): Promise<Octokit> =>
    (client ??= Promise.all([
      import('@octokit/core'),
      import('@octokit/plugin-retry'),
      import('@octokit/plugin-throttling'),
      clientFetch(target.baseUrl),
    ]).then(([{ Octokit }, { retry }, { throttling }, fetch]) => {
      const Client = Octokit.plugin(honourRetryAfter(tuning, log) as never, retry, throttling);
      return new Client({
        auth: target.token,
        baseUrl: target.baseUrl.replace(/\/+$/, ''),
        userAgent: 'bellgate',
        request: { fetch },
        // 403 and 429 rate limits are waited out by honourRetryAfter, not by plugin-retry.
        retry: {
          retries: tuning.retries,
          retryAfterBaseValue: tuning.unitMs,
          // 409 (a merge conflict) and 422 mean the branch moved: the store re-reads, not the client.
          doNotRetry: [400, 401, 403, 404, 409, 410, 422, 429, 451],
        },
        throttle: {
          onRateLimit: noRetry,
          write: spacedGroup(tuning.unitMs) as never,
          notifications: spacedGroup(3 * tuning.unitMs) as never,
          onSecondaryRateLimit: noRetry,
          retryAfterBaseValue: tuning.unitMs,
        },
        log: { debug: () => undefined, info: () => undefined, warn: log, error: log },
      } as never) as Octokit;
    }));
  const repo = { owner: target.owner, repo: target.repo };

  async function pages<T>(
    route: string,
    params: Json,
    pick: (data: unknown) => unknown[],
    map: (raw: unknown) => T,
  ): Promise<T[]> {
    const out: T[] = [];
    for (let page = 1; page <= maxPages; page++) {
      const res = await (await octokit()).request(route, { ...repo, ...params, per_page: PER_PAGE, page });
      const items = pick(res.data);
      out.push(...items.map(map));
      if (items.length < PER_PAGE) break;
    }
    return out;
  }

  return {
    listArtifacts: (name) =>
      pages(
        'GET /repos/{owner}/{repo}/actions/artifacts',
        { name },
        (d) => (Array.isArray(obj(d).artifacts) ? (obj(d).artifacts as unknown[]) : []),
        toArtifact,
      ),
    async downloadArtifact(id, maxBytes) {
      // The API answers 302 with a short-lived storage URL, which fetch follows through the same
      // client (proxy, retries of 5xx from storage); a redirect to another origin drops the
      // Authorization header (Fetch standard, "HTTP-redirect fetch"), so the token stays here.
      let res: { status: number; headers: Record<string, unknown>; data: unknown };
      try {
        res = await (
          await octokit()
        ).request('GET /repos/{owner}/{repo}/actions/artifacts/{artifact_id}/{archive_format}', {
          ...repo,
          artifact_id: id,
          archive_format: 'zip',
          request: { parseSuccessResponseBody: false },
        });
      } catch (error) {
        const status = statusOf(error);
        if (status === 404 || status === 410) throw new ArtifactGoneError(`artifact #${id} answered ${status}`);
        throw error;
      }
      const declared = Number(res.headers['content-length'] ?? 0);
      if (declared > maxBytes) {
        await (res.data as ReadableStream | undefined)?.cancel?.();
        throw new Error(`artifact is ${declared} bytes, over the ${maxBytes} byte cap`);
      }
      if (res.data && typeof (res.data as ReadableStream).getReader === 'function')
        return readCapped(res.data as ReadableStream<Uint8Array>, maxBytes);
      throw new Error(`download of artifact #${id} answered ${res.status} without a body`);
    },
    async deleteArtifact(id) {
      try {
        await (
          await octokit()
        ).request('DELETE /repos/{owner}/{repo}/actions/artifacts/{artifact_id}', { ...repo, artifact_id: id });
        return 'deleted';
      } catch (error) {
        const status = statusOf(error);
        if (status === 403) return 'denied';
        if (status === 404 || status === 410) return 'gone';
        throw error;
      }
    },
    listIssueLabels: (issue) =>
      pages(
        'GET /repos/{owner}/{repo}/issues/{issue_number}/labels',
        { issue_number: issue },
        (d) => (Array.isArray(d) ? d : []),
        (raw) => String(obj(raw).name ?? ''),
      ),
    listCommitPulls: (sha) =>
      pages(
        'GET /repos/{owner}/{repo}/commits/{commit_sha}/pulls',
        { commit_sha: sha },
        (d) => (Array.isArray(d) ? d : []),
        toCommitPull,
      ),
    listIssueComments: (issue) =>
      pages(
        'GET /repos/{owner}/{repo}/issues/{issue_number}/comments',
        { issue_number: issue },
        (d) => (Array.isArray(d) ? d : []),
        toComment,
      ),
    async createIssueComment(issue, body) {
      const res = await (
        await octokit()
      ).request('POST /repos/{owner}/{repo}/issues/{issue_number}/comments', { ...repo, issue_number: issue, body });
      return toComment(res.data);
    },
    async updateIssueComment(id, body) {
      await (
        await octokit()
      ).request('PATCH /repos/{owner}/{repo}/issues/comments/{comment_id}', { ...repo, comment_id: id, body });
    },
    // The branch store's calls, through this same client.
    gitData: createGitData(octokit, repo),
    release: createReleaseApi(octokit, repo),
  };
}
