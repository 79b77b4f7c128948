/**
 * A loopback stand-in for the parts of the GitHub REST API the action calls ("List artifacts for
 * a repository", "Download an artifact" answering 302 with a storage Location, "List labels for an
 * issue", "List pull requests associated with a commit", "List/Create/Update issue comment", "Delete an
 * artifact", "List repository tags", "Get a commit"): exact-name artifact filter, newest-first listing,
 * per_page/page pagination, and fault injection (status, headers, times) so retries can be
 * counted. Every request is held to GitHub's published REST description and every answer to its
 * documented response schema (openapi.ts); a mismatch, or a request the description does not
 * know, is recorded in `state.violations` (and the latter answered 404). Binds 127.0.0.1 only.
 */
import { createServer, type IncomingMessage, type ServerResponse } from 'node:http';
import type { AddressInfo } from 'node:net';
import { githubApiCheck } from './openapi.js';

export interface StoredArtifact {
  id: number;
  name: string;
  createdAt: string;
  expired: boolean;
  headBranch: string;
  headRepositoryId: number;
  repositoryId: number;
  workflowRunId: number;
  sizeInBytes: number;
  /** Bytes served directly by the stand-in's /blob route ... */
  zip?: Uint8Array;
  /** ... or the storage URL the download redirects to (e.g. an Azurite blob with a read SAS). */
  location?: string;
}

export interface StoredComment {
  id: number;
  body: string;
  user: { login: string; type: string };
}

/** A user object as the REST description requires one (simple-user). */
export function simpleUser(login: string, type: string, id = 41898282): Record<string, unknown> {
  const url = `https://api.github.com/users/${encodeURIComponent(login)}`;
  return {
    login,
    id,
    node_id: `U_${id}`,
    avatar_url: `https://avatars.githubusercontent.com/u/${id}?v=4`,
    gravatar_id: '',
    url,
    html_url: `https://github.com/${encodeURIComponent(login)}`,
    followers_url: `${url}/followers`,
    following_url: `${url}/following{/other_user}`,
    gists_url: `${url}/gists{/gist_id}`,
    starred_url: `${url}/starred{/owner}{/repo}`,
    subscriptions_url: `${url}/subscriptions`,
    organizations_url: `${url}/orgs`,
    repos_url: `${url}/repos`,
    events_url: `${url}/events{/privacy}`,
    received_events_url: `${url}/received_events`,
    type,
    site_admin: false,
  };
}

export interface Fault {
  method: string;
  /** Path prefix (without query) the fault applies to. */
  path: string;
  /** HTTP status; 0 drops the connection (a network error). */
  status: number;
  headers?: Record<string, string>;
  body?: unknown;
  /** How many more requests it answers; it is removed at 0. */
  times: number;
}

export interface RestState {
  artifacts: StoredArtifact[];
  comments: Map<number, StoredComment[]>;
  /** Labels each issue or pull request carries now, by number. */
  labels: Map<number, string[]>;
  /** The repository's tags, in the order "List repository tags" gives them, and commit times by sha. */
  tags: { name: string; sha: string }[];
  commitTimes: Map<string, string>;
  /**
   * "List pull requests associated with a commit", by commit sha: pull request objects in the
   * documented pull-request-simple shape (tests take them from GitHub's webhook examples).
   */
  commitPulls: Map<string, Record<string, unknown>[]>;
  /** Requests and answers that do not match GitHub's REST description (should stay empty). */
  violations: string[];
  /**
   * The permissions each token was given (a job's `permissions:`); a token listed here is refused
   * (403) what they do not grant, as GITHUB_TOKEN is. Tokens not listed may do anything.
   */
  tokenPermissions: Map<string, Record<string, string>>;
  faults: Fault[];
  calls: { method: string; path: string; auth?: string }[];
  /** Status answered to comment writes (e.g. 403 for a fork PR's read-only token). */
  commentWriteStatus?: number;
  /** Status answered to artifact deletes instead of deleting (e.g. 403 without `actions: write`). */
  artifactDeleteStatus?: number;
  nextId: number;
}

export interface RestStandin {
  url: string;
  state: RestState;
  close(): Promise<void>;
}

const OWNER_REPO = /^\/repos\/([^/]+)\/([^/]+)(\/.*)$/;

function sendRaw(res: ServerResponse, status: number, body?: unknown, headers: Record<string, string> = {}): void {
  const text = body === undefined ? '' : JSON.stringify(body);
  res.writeHead(status, { 'content-type': 'application/json; charset=utf-8', ...headers });
  res.end(text);
}

async function readBody(req: IncomingMessage): Promise<unknown> {
  const chunks: Buffer[] = [];
  for await (const c of req) chunks.push(c as Buffer);
  const text = Buffer.concat(chunks).toString('utf8');
  return text === '' ? undefined : JSON.parse(text);
}

function artifactJson(a: StoredArtifact, base: string, owner: string, repo: string): unknown {
  return {
    id: a.id,
    node_id: `A_${a.id}`,
    name: a.name,
    size_in_bytes: a.sizeInBytes,
    url: `${base}/repos/${owner}/${repo}/actions/artifacts/${a.id}`,
    archive_download_url: `${base}/repos/${owner}/${repo}/actions/artifacts/${a.id}/zip`,
    expired: a.expired,
    created_at: a.createdAt,
    updated_at: a.createdAt,
    expires_at: new Date(Date.parse(a.createdAt) + 90 * 86_400_000).toISOString(),
    workflow_run: {
      id: a.workflowRunId,
      repository_id: a.repositoryId,
      head_repository_id: a.headRepositoryId,
      head_branch: a.headBranch,
      head_sha: '0'.repeat(40),
    },
  };
}

/**
 * What GITHUB_TOKEN needs for the calls the action makes, any one of the pairs (GitHub docs,
 * "Permissions required for GitHub Apps": artifacts under `actions`, issue labels and comments
 * under `issues` or, for pull requests, `pull_requests`).
 */
function neededPermission(method: string, template: string): [string, 'read' | 'write'][] | undefined {
  const level = method === 'GET' ? 'read' : 'write';
  if (template.startsWith('/repos/{owner}/{repo}/actions/artifacts')) return [['actions', level]];
  // GitHub documents `contents: read` besides; every job token has that unless it is taken away.
  if (template.startsWith('/repos/{owner}/{repo}/commits/{commit_sha}/pulls')) return [['pull-requests', level]];
  if (template === '/repos/{owner}/{repo}/tags' || template.startsWith('/repos/{owner}/{repo}/commits/'))
    return [['contents', level]];
  if (template.startsWith('/repos/{owner}/{repo}/issues/'))
    return [
      ['issues', level],
      ['pull-requests', level],
    ];
  return undefined;
}

const allows = (granted: string | undefined, level: 'read' | 'write'): boolean =>
  granted === 'write' || (granted === 'read' && level === 'read');

/** Starts the stand-in on an ephemeral loopback port. */
function commentJson(c: StoredComment, base: string, owner: string, repo: string, issue: number): unknown {
  return {
    id: c.id,
    node_id: `IC_${c.id}`,
    url: `${base}/repos/${owner}/${repo}/issues/comments/${c.id}`,
    html_url: `https://github.com/${owner}/${repo}/pull/${issue}#issuecomment-${c.id}`,
    issue_url: `${base}/repos/${owner}/${repo}/issues/${issue}`,
    body: c.body,
    user: simpleUser(c.user.login, c.user.type),
    created_at: '2026-04-01T12:00:00Z',
    updated_at: '2026-04-01T12:00:00Z',
    author_association: 'NONE',
    performed_via_github_app: null,
  };
}

function labelJson(name: string, i: number, base: string, owner: string, repo: string): unknown {
  return {
    id: 208045946 + i,
    node_id: `LA_${i}`,
    url: `${base}/repos/${owner}/${repo}/labels/${encodeURIComponent(name)}`,
    name,
    description: null,
    color: 'f29513',
    default: false,
  };
}

function tagJson(t: { name: string; sha: string }, base: string, owner: string, repo: string): unknown {
  return {
    name: t.name,
    commit: { sha: t.sha, url: `${base}/repos/${owner}/${repo}/commits/${t.sha}` },
    zipball_url: `${base}/repos/${owner}/${repo}/zipball/refs/tags/${encodeURIComponent(t.name)}`,
    tarball_url: `${base}/repos/${owner}/${repo}/tarball/refs/tags/${encodeURIComponent(t.name)}`,
    node_id: `REF_${t.name}`,
  };
}

function commitJson(sha: string, date: string, base: string, owner: string, repo: string): unknown {
  const person = { name: 'Monalisa Octocat', email: 'octocat@github.com', date };
  return {
    url: `${base}/repos/${owner}/${repo}/commits/${sha}`,
    sha,
    node_id: `C_${sha.slice(0, 8)}`,
    html_url: `https://github.com/${owner}/${repo}/commit/${sha}`,
    comments_url: `${base}/repos/${owner}/${repo}/commits/${sha}/comments`,
    commit: {
      url: `${base}/repos/${owner}/${repo}/git/commits/${sha}`,
      author: person,
      committer: person,
      message: 'Release',
      comment_count: 0,
      tree: { sha: '0'.repeat(40), url: `${base}/repos/${owner}/${repo}/git/trees/${'0'.repeat(40)}` },
    },
    author: null,
    committer: null,
    parents: [],
  };
}

export async function startRestStandin(initial: Partial<RestState> = {}): Promise<RestStandin> {
  const api = githubApiCheck();
  const state: RestState = {
    artifacts: [],
    comments: new Map(),
    labels: new Map(),
    tags: [],
    commitTimes: new Map(),
    commitPulls: new Map(),
    violations: [],
    tokenPermissions: new Map(),
    faults: [],
    calls: [],
    nextId: 1000,
    ...initial,
  };
  let base = '';
  const server = createServer((req, res) => {
    handle(req, res).catch((e: unknown) => {
      // A fault of the stand-in itself must fail the test, not pass as a retried 500.
      state.violations.push(`the stand-in failed on ${req.method} ${req.url}: ${String(e)}`);
      sendRaw(res, 500, { message: String(e) });
    });
  });
  async function handle(req: IncomingMessage, res: ServerResponse): Promise<void> {
    const url = new URL(req.url ?? '/', base);
    const method = req.method ?? 'GET';
    state.calls.push({ method, path: url.pathname + url.search, auth: req.headers.authorization });
    const requestBody = await readBody(req).catch(() => undefined);
    // The storage the download redirects to is not part of the REST API; everything else is.
    const checked = url.pathname.startsWith('/blob/') ? undefined : api.request(method, url, requestBody);
    state.violations.push(...(checked?.problems ?? []));
    const operation = checked?.operation;
    const fault = state.faults.find((f) => f.method === method && url.pathname.startsWith(f.path) && f.times > 0);
    if (fault) {
      fault.times -= 1;
      if (fault.times === 0) state.faults.splice(state.faults.indexOf(fault), 1);
      // Status 0 stands for a network error: the connection is dropped without an answer.
      if (fault.status === 0) {
        req.socket.destroy();
        return;
      }
      sendRaw(res, fault.status, fault.body ?? { message: `stand-in fault ${fault.status}` }, fault.headers);
      return;
    }
    if (method === 'GET' && url.pathname.startsWith('/blob/')) {
      const a = state.artifacts.find((x) => String(x.id) === url.pathname.slice('/blob/'.length));
      if (!a?.zip) return sendRaw(res, 404, { message: 'Not Found' });
      res.writeHead(200, { 'content-type': 'application/zip', 'content-length': String(a.zip.length) });
      res.end(Buffer.from(a.zip));
      return;
    }
    if (operation === undefined) return sendRaw(res, 404, { message: 'Not Found' });
    // Every answer from here on is held to the documented response of its status.
    const send = (r: ServerResponse, status: number, body?: unknown, headers: Record<string, string> = {}): void => {
      state.violations.push(...api.response(operation, status, body));
      sendRaw(r, status, body, headers);
    };
    const granted = state.tokenPermissions.get((req.headers.authorization ?? '').replace(/^(token|bearer) /i, ''));
    const needed = neededPermission(method, operation.template);
    if (
      granted !== undefined &&
      needed !== undefined &&
      !needed.some(([scope, level]) => allows(granted[scope], level))
    )
      return send(res, 403, {
        message: 'Resource not accessible by integration',
        documentation_url: 'https://docs.github.com/rest',
      });
    const m = OWNER_REPO.exec(url.pathname);
    if (!m) return send(res, 404, { message: 'Not Found' });
    const [, owner = '', repo = '', rest = ''] = m;
    const perPage = Math.min(100, Number(url.searchParams.get('per_page') ?? 30));
    const page = Math.max(1, Number(url.searchParams.get('page') ?? 1));
    const slice = <T>(all: T[]): T[] => all.slice((page - 1) * perPage, page * perPage);

    if (method === 'GET' && rest === '/actions/artifacts') {
      const name = url.searchParams.get('name');
      // The REST name filter is an exact match; the list is newest first.
      const all = state.artifacts
        .filter((a) => name === null || a.name === name)
        .sort((a, b) => (a.createdAt === b.createdAt ? b.id - a.id : a.createdAt < b.createdAt ? 1 : -1));
      return send(res, 200, {
        total_count: all.length,
        artifacts: slice(all).map((a) => artifactJson(a, base, owner, repo)),
      });
    }
    const del = /^\/actions\/artifacts\/(\d+)$/.exec(rest);
    if (method === 'DELETE' && del) {
      // "Delete an artifact": 204, 404 when it is not there, 403 for a token without actions: write.
      if (state.artifactDeleteStatus)
        return send(res, state.artifactDeleteStatus, { message: 'Resource not accessible by integration' });
      const at = state.artifacts.findIndex((x) => x.id === Number(del[1]));
      if (at < 0) return send(res, 404, { message: 'Not Found' });
      state.artifacts.splice(at, 1);
      res.writeHead(204);
      res.end();
      return;
    }
    let d = /^\/actions\/artifacts\/(\d+)\/zip$/.exec(rest);
    if (method === 'GET' && d) {
      const a = state.artifacts.find((x) => x.id === Number(d?.[1]));
      if (!a) return send(res, 404, { message: 'Not Found' });
      if (a.expired) return send(res, 410, { message: 'Artifact has expired' });
      state.violations.push(...api.response(operation, 302, undefined));
      res.writeHead(302, { location: a.location ?? `${base}/blob/${a.id}?sig=standin` });
      res.end();
      return;
    }
    if (method === 'GET' && rest === '/tags')
      return send(res, 200, slice(state.tags.map((t) => tagJson(t, base, owner, repo))));
    d = /^\/commits\/([0-9a-f]{40})$/.exec(rest);
    if (method === 'GET' && d) {
      const date = state.commitTimes.get(d[1]!);
      if (date === undefined) return send(res, 404, { message: 'Not Found' });
      return send(res, 200, commitJson(d[1]!, date, base, owner, repo));
    }
    d = /^\/issues\/(\d+)\/labels$/.exec(rest);
    if (d && method === 'GET') {
      const names = state.labels.get(Number(d[1])) ?? [];
      return send(res, 200, slice(names.map((n, i) => labelJson(n, i, base, owner, repo))));
    }
    d = /^\/commits\/([^/]+)\/pulls$/.exec(rest);
    if (d && method === 'GET') return send(res, 200, slice(state.commitPulls.get(d[1] ?? '') ?? []));
    d = /^\/issues\/(\d+)\/comments$/.exec(rest);
    if (d) {
      const issue = Number(d[1]);
      const list = state.comments.get(issue) ?? [];
      if (method === 'GET')
        return send(
          res,
          200,
          slice(list).map((c) => commentJson(c, base, owner, repo, issue)),
        );
      if (method === 'POST') {
        const body = requestBody as { body?: string };
        if (state.commentWriteStatus)
          return send(res, state.commentWriteStatus, { message: 'Resource not accessible by integration' });
        const c: StoredComment = {
          id: state.nextId++,
          body: String(body?.body ?? ''),
          user: { login: 'github-actions[bot]', type: 'Bot' },
        };
        state.comments.set(issue, [...list, c]);
        return send(res, 201, commentJson(c, base, owner, repo, issue));
      }
    }
    d = /^\/issues\/comments\/(\d+)$/.exec(rest);
    if (d && method === 'PATCH') {
      const body = requestBody as { body?: string };
      if (state.commentWriteStatus)
        return send(res, state.commentWriteStatus, { message: 'Resource not accessible by integration' });
      for (const [issue, list] of state.comments) {
        const c = list.find((x) => x.id === Number(d?.[1]));
        if (c) {
          c.body = String(body?.body ?? '');
          return send(res, 200, commentJson(c, base, owner, repo, issue));
        }
      }
      return send(res, 404, { message: 'Not Found' });
    }
    send(res, 404, { message: 'Not Found' });
  }
  await new Promise<void>((resolve) => server.listen(0, '127.0.0.1', resolve));
  base = `http://127.0.0.1:${(server.address() as AddressInfo).port}`;
  return {
    url: base,
    state,
    close: () =>
      new Promise<void>((resolve) => {
        server.closeAllConnections();
        server.close(() => resolve());
      }),
  };
}

/** Fails with every recorded violation of GitHub's REST description, and forgets them. */
export function takeViolations(state: RestState): string[] {
  return state.violations.splice(0, state.violations.length);
}

/** Counts the stand-in's calls matching a method and path prefix. */
export function countCalls(state: RestState, method: string, pathPrefix: string): number {
  return state.calls.filter((c) => c.method === method && c.path.startsWith(pathPrefix)).length;
}
