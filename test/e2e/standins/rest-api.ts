/**
 * A loopback stand-in for the parts of the GitHub REST API the action calls, shaped after the
 * public REST reference (docs.github.com/rest: "List artifacts for a repository", "Download an
 * artifact" answering 302 with a storage Location, "List/Create/Update issue comment"):
 * exact-name artifact filter, newest-first listing, per_page/page pagination, "Delete an artifact",
 * and fault injection
 * (status, headers, times) so retries can be counted. Binds 127.0.0.1 only.
 */
import { createServer, type IncomingMessage, type ServerResponse } from 'node:http';
import type { AddressInfo } from 'node:net';

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

function send(res: ServerResponse, status: number, body?: unknown, headers: Record<string, string> = {}): void {
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
    expires_at: null,
    workflow_run: {
      id: a.workflowRunId,
      repository_id: a.repositoryId,
      head_repository_id: a.headRepositoryId,
      head_branch: a.headBranch,
      head_sha: '0'.repeat(40),
    },
  };
}

/** Starts the stand-in on an ephemeral loopback port. */
export async function startRestStandin(initial: Partial<RestState> = {}): Promise<RestStandin> {
  const state: RestState = {
    artifacts: [],
    comments: new Map(),
    faults: [],
    calls: [],
    nextId: 1000,
    ...initial,
  };
  let base = '';
  const server = createServer((req, res) => {
    handle(req, res).catch((e: unknown) => send(res, 500, { message: String(e) }));
  });
  async function handle(req: IncomingMessage, res: ServerResponse): Promise<void> {
    const url = new URL(req.url ?? '/', base);
    const method = req.method ?? 'GET';
    state.calls.push({ method, path: url.pathname + url.search, auth: req.headers.authorization });
    const fault = state.faults.find((f) => f.method === method && url.pathname.startsWith(f.path) && f.times > 0);
    if (fault) {
      fault.times -= 1;
      if (fault.times === 0) state.faults.splice(state.faults.indexOf(fault), 1);
      await readBody(req).catch(() => undefined);
      // Status 0 stands for a network error: the connection is dropped without an answer.
      if (fault.status === 0) {
        req.socket.destroy();
        return;
      }
      send(res, fault.status, fault.body ?? { message: `stand-in fault ${fault.status}` }, fault.headers);
      return;
    }
    if (method === 'GET' && url.pathname.startsWith('/blob/')) {
      const a = state.artifacts.find((x) => String(x.id) === url.pathname.slice('/blob/'.length));
      if (!a?.zip) return send(res, 404, { message: 'Not Found' });
      res.writeHead(200, { 'content-type': 'application/zip', 'content-length': String(a.zip.length) });
      res.end(Buffer.from(a.zip));
      return;
    }
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
      res.writeHead(302, { location: a.location ?? `${base}/blob/${a.id}?sig=standin` });
      res.end();
      return;
    }
    d = /^\/issues\/(\d+)\/comments$/.exec(rest);
    if (d) {
      const issue = Number(d[1]);
      const list = state.comments.get(issue) ?? [];
      if (method === 'GET') return send(res, 200, slice(list));
      if (method === 'POST') {
        const body = (await readBody(req)) as { body?: string };
        if (state.commentWriteStatus)
          return send(res, state.commentWriteStatus, { message: 'Resource not accessible by integration' });
        const c: StoredComment = {
          id: state.nextId++,
          body: String(body?.body ?? ''),
          user: { login: 'github-actions[bot]', type: 'Bot' },
        };
        state.comments.set(issue, [...list, c]);
        return send(res, 201, c);
      }
    }
    d = /^\/issues\/comments\/(\d+)$/.exec(rest);
    if (d && method === 'PATCH') {
      const body = (await readBody(req)) as { body?: string };
      if (state.commentWriteStatus)
        return send(res, state.commentWriteStatus, { message: 'Resource not accessible by integration' });
      for (const list of state.comments.values()) {
        const c = list.find((x) => x.id === Number(d?.[1]));
        if (c) {
          c.body = String(body?.body ?? '');
          return send(res, 200, c);
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

/** Counts the stand-in's calls matching a method and path prefix. */
export function countCalls(state: RestState, method: string, pathPrefix: string): number {
  return state.calls.filter((c) => c.method === method && c.path.startsWith(pathPrefix)).length;
}
