/**
 * GitDataApi over fetch: the Git Data and contents endpoints of the GitHub REST API (v2022-11-28).
 * Every call has a timeout (a slow answer is a failure, not a hang) and is retried a bounded number
 * of times on answers a retry can cure — 5xx, 429 (honouring Retry-After), a dropped connection, a
 * timeout, a truncated or malformed body — with exponential backoff and jitter. Retrying writes is
 * safe: blobs, trees and commits are content-addressed, and a ref update that already happened is
 * answered as a conflict the store resolves by re-reading. The token goes in the Authorization
 * header of requests to `baseUrl` only (fetch drops it on a redirect to another origin).
 */
import { GitDataError, type GitDataApi } from './branch-api.js';
import { backoffMs } from './branch-backoff.js';

export interface GitDataClientOptions {
  token: string;
  /** e.g. https://api.github.com (GITHUB_API_URL). */
  baseUrl: string;
  owner: string;
  repo: string;
  /** Per request, including the body (default 30 000 ms). */
  timeoutMs?: number;
  /** Retries of one call after the first try (default 3). */
  retries?: number;
  /** Backoff unit (default 1000 ms); Retry-After seconds are multiplied by it / 1000. */
  unitMs?: number;
  /** Jitter source in [0, 1) (default Math.random; tests pass a seeded one). */
  random?: () => number;
}

type Json = Record<string, unknown>;
const text = (v: unknown, what: string): string => {
  if (typeof v !== 'string' || v === '') throw new GitDataError(`the API answer lacks ${what}`, { transient: true });
  return v;
};
const segments = (path: string): string => path.split('/').map(encodeURIComponent).join('/');

/**
 * @example const api = createGitDataClient({ token, baseUrl: 'https://api.github.com', owner: 'acme', repo: 'router' });
 * await api.getBranchHead('bellgate-data') // '3f1c…' or undefined
 */
export function createGitDataClient(options: GitDataClientOptions): GitDataApi {
  const base = `${options.baseUrl.replace(/\/+$/, '')}/repos/${encodeURIComponent(options.owner)}/${encodeURIComponent(options.repo)}`;
  const timeoutMs = options.timeoutMs ?? 30_000;
  const retries = options.retries ?? 3;
  const unitMs = options.unitMs ?? 1000;
  const random = options.random ?? Math.random;

  async function once(
    method: string,
    path: string,
    body: unknown,
    refWrite: boolean,
  ): Promise<{ status: number; json: Json }> {
    let res: Response;
    let raw: string;
    try {
      res = await fetch(`${base}${path}`, {
        method,
        headers: {
          authorization: `Bearer ${options.token}`,
          accept: 'application/vnd.github+json',
          'x-github-api-version': '2022-11-28',
          'user-agent': 'bellgate',
          ...(body === undefined ? {} : { 'content-type': 'application/json' }),
        },
        ...(body === undefined ? {} : { body: JSON.stringify(body) }),
        signal: AbortSignal.timeout(timeoutMs),
      });
      raw = await res.text();
    } catch (cause) {
      const timedOut = (cause as Error)?.name === 'TimeoutError';
      // undici reports "fetch failed" and keeps the reason (a reset, a cut body) in `cause`.
      const inner = (cause as { cause?: { message?: string } })?.cause?.message;
      const why = `${(cause as Error)?.message ?? String(cause)}${inner ? ` (${inner})` : ''}`;
      throw new GitDataError(
        timedOut ? `${method} ${path}: no answer within ${timeoutMs} ms` : `${method} ${path}: ${why}`,
        { transient: true, cause },
      );
    }
    let json: Json = {};
    try {
      json = raw === '' ? {} : (JSON.parse(raw) as Json);
    } catch (cause) {
      if (res.ok)
        throw new GitDataError(`${method} ${path}: the answer was cut short or is not JSON`, {
          status: res.status,
          transient: true,
          cause,
        });
    }
    if (res.ok || res.status === 404) return { status: res.status, json };
    const after = Number(res.headers.get('retry-after'));
    const retryAfter = Number.isFinite(after) && after >= 0 && res.headers.has('retry-after') ? after : undefined;
    const limited =
      res.status === 429 ||
      (res.status === 403 && (retryAfter !== undefined || res.headers.get('x-ratelimit-remaining') === '0'));
    const said = typeof json.message === 'string' ? json.message : '';
    throw new GitDataError(`${method} ${path} answered ${res.status}${said ? ` (${said.slice(0, 200)})` : ''}`, {
      status: res.status,
      transient: res.status >= 500 || limited,
      conflict: res.status === 409 || (refWrite && res.status === 422),
      ...(retryAfter === undefined ? {} : { retryAfter }),
    });
  }

  async function call(
    method: string,
    path: string,
    body?: unknown,
    refWrite = false,
  ): Promise<{ status: number; json: Json }> {
    for (let attempt = 0; ; attempt++) {
      try {
        return await once(method, path, body, refWrite);
      } catch (error) {
        if (!(error instanceof GitDataError) || !error.transient || attempt >= retries) throw error;
        await new Promise((r) => setTimeout(r, backoffMs(attempt, unitMs, random, error.retryAfter)));
      }
    }
  }

  async function found(method: string, path: string, body?: unknown): Promise<Json> {
    const { status, json } = await call(method, path, body);
    if (status === 404) throw new GitDataError(`${method} ${path} answered 404 (not found)`, { status });
    return json;
  }

  return {
    async getBranchHead(branch) {
      const { status, json } = await call('GET', `/git/ref/heads/${segments(branch)}`);
      if (status === 404) return undefined;
      return text((json.object as Json | undefined)?.sha, 'the branch head');
    },
    async getCommitTree(sha) {
      return text(((await found('GET', `/git/commits/${sha}`)).tree as Json | undefined)?.sha, 'the commit tree');
    },
    async findFile(path, commit) {
      const { status, json } = await call('GET', `/contents/${segments(path)}?ref=${encodeURIComponent(commit)}`);
      if (status === 404) return undefined;
      if (json.type !== 'file')
        throw new GitDataError(`${path} on the data branch is a ${String(json.type)}, not a file`);
      return { sha: text(json.sha, 'the file sha'), size: typeof json.size === 'number' ? json.size : 0 };
    },
    async getBlobText(sha) {
      const json = await found('GET', `/git/blobs/${sha}`);
      if (json.encoding !== 'base64' || typeof json.content !== 'string')
        throw new GitDataError(`blob ${sha} came back without base64 content`, { transient: true });
      const bytes = Buffer.from(json.content, 'base64');
      if (typeof json.size === 'number' && bytes.length !== json.size)
        throw new GitDataError(`blob ${sha} came back with ${bytes.length} of ${json.size} bytes`, { transient: true });
      return new TextDecoder('utf-8', { fatal: true }).decode(bytes);
    },
    async createBlob(content) {
      return text((await found('POST', '/git/blobs', { content, encoding: 'utf-8' })).sha, 'the blob sha');
    },
    async createTree(entries, baseTree) {
      return text(
        (await found('POST', '/git/trees', { tree: entries, ...(baseTree ? { base_tree: baseTree } : {}) })).sha,
        'the tree sha',
      );
    },
    async createCommit(message, tree, parents) {
      return text((await found('POST', '/git/commits', { message, tree, parents })).sha, 'the commit sha');
    },
    async createBranch(branch, sha) {
      await call('POST', '/git/refs', { ref: `refs/heads/${branch}`, sha }, true);
    },
    async updateBranch(branch, sha) {
      const { status } = await call('PATCH', `/git/refs/heads/${segments(branch)}`, { sha, force: false }, true);
      if (status === 404) throw new GitDataError(`the branch ${branch} disappeared`, { status, conflict: true });
    },
  };
}
