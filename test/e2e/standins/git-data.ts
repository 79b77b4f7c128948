/**
 * A loopback stand-in for the Git Data part of the GitHub REST API (docs.github.com/rest/git:
 * "Get a reference", "Create a reference", "Update a reference", "Get/Create a commit", "Create a
 * tree", "Get/Create a blob"; and "Get repository content"), with the semantics the branch store
 * relies on: objects addressed by content, trees built on a base_tree with nested paths, commits
 * with parents, and a non-forced ref update that is refused (422 "Update is not a fast forward")
 * unless the new commit descends from the current head. Blob shas are real git object ids
 * (SHA-1 of "blob <size>\0<bytes>"); tree and commit ids hash a canonical form. Every request is
 * held to GitHub's published REST description and every answer to its documented response schema
 * (openapi.ts), recorded in `state.violations`. 127.0.0.1 only.
 */
import { createHash } from 'node:crypto';
import { createServer, type IncomingMessage, type ServerResponse } from 'node:http';
import type { AddressInfo } from 'node:net';
import { githubApiCheck } from './openapi.js';

type Entry = { mode: string; type: 'blob' | 'tree'; sha: string };
export type GitObject =
  | { kind: 'blob'; bytes: Buffer }
  | { kind: 'tree'; entries: Map<string, Entry> }
  | { kind: 'commit'; tree: string; parents: string[]; message: string };

export interface GitDataState {
  objects: Map<string, GitObject>;
  /** "refs/heads/<name>" -> commit sha */
  refs: Map<string, string>;
  calls: { method: string; path: string; status: number; auth?: string }[];
  /** When set, writes answer 403 like a token with `contents: read` only. */
  readOnly?: boolean;
  /** Requests and answers that do not match GitHub's REST description (should stay empty). */
  violations: string[];
}

export interface GitDataStandin {
  url: string;
  state: GitDataState;
  /** The text of a file at the head of a branch, or undefined. */
  readFile(branch: string, path: string): string | undefined;
  /** The first-parent chain of commits from the branch head, newest first. */
  history(branch: string): string[];
  close(): Promise<void>;
}

const sha1 = (data: Buffer | string) => createHash('sha1').update(data).digest('hex');

/** The git object id of a blob, as `git hash-object` computes it. */
export function gitBlobId(bytes: Buffer): string {
  return sha1(Buffer.concat([Buffer.from(`blob ${bytes.length}\0`), bytes]));
}

function send(res: ServerResponse, status: number, body: unknown): number {
  res.writeHead(status, { 'content-type': 'application/json; charset=utf-8' });
  res.end(JSON.stringify(body));
  return status;
}

/** Every recorded violation of GitHub's REST description, and forgets them. */
export function takeGitViolations(state: GitDataState): string[] {
  return state.violations.splice(0, state.violations.length);
}

export async function startGitDataStandin(): Promise<GitDataStandin> {
  const state: GitDataState = { objects: new Map(), refs: new Map(), calls: [], violations: [] };
  const api = githubApiCheck();
  const put = (o: GitObject): string => {
    const id =
      o.kind === 'blob'
        ? gitBlobId(o.bytes)
        : o.kind === 'tree'
          ? sha1(`tree ${JSON.stringify([...o.entries].sort(([a], [b]) => (a < b ? -1 : 1)))}`)
          : sha1(`commit ${JSON.stringify([o.tree, o.parents, o.message])}`);
    state.objects.set(id, o);
    return id;
  };
  const get = <K extends GitObject['kind']>(sha: unknown, kind: K) => {
    const o = typeof sha === 'string' ? state.objects.get(sha) : undefined;
    return o?.kind === kind ? (o as Extract<GitObject, { kind: K }>) : undefined;
  };
  /** Writes blob `sha` at a slash path below tree `base` (undefined: empty), returning the new tree id. */
  const plant = (base: string | undefined, parts: string[], entry: Entry): string => {
    const entries = new Map(base ? (get(base, 'tree')?.entries ?? []) : []);
    const [head = '', ...rest] = parts;
    if (rest.length === 0) entries.set(head, entry);
    else {
      const sub = entries.get(head);
      entries.set(head, {
        mode: '040000',
        type: 'tree',
        sha: plant(sub?.type === 'tree' ? sub.sha : undefined, rest, entry),
      });
    }
    return put({ kind: 'tree', entries });
  };
  const lookup = (tree: string | undefined, path: string): Entry | undefined => {
    let entry: Entry | undefined = tree ? { mode: '040000', type: 'tree', sha: tree } : undefined;
    for (const part of path.split('/'))
      entry = entry?.type === 'tree' ? get(entry.sha, 'tree')?.entries.get(part) : undefined;
    return entry;
  };
  const descends = (from: string, ancestor: string): boolean => {
    const seen = new Set<string>();
    const todo = [from];
    while (todo.length > 0) {
      const sha = todo.pop() as string;
      if (sha === ancestor) return true;
      if (seen.has(sha)) continue;
      seen.add(sha);
      todo.push(...(get(sha, 'commit')?.parents ?? []));
    }
    return false;
  };

  async function handle(req: IncomingMessage, res: ServerResponse, url: URL): Promise<number> {
    const method = req.method ?? 'GET';
    const chunks: Buffer[] = [];
    for await (const c of req) chunks.push(c as Buffer);
    const text = Buffer.concat(chunks).toString('utf8');
    let body: Record<string, unknown> = {};
    try {
      body = text === '' ? {} : (JSON.parse(text) as Record<string, unknown>);
    } catch {
      return send(res, 400, { message: 'Problems parsing JSON' });
    }
    const checked = api.request(method, url, text === '' ? undefined : body);
    state.violations.push(...checked.problems);
    const operation = checked.operation;
    if (operation === undefined) return send(res, 404, { message: 'Not Found' });
    // Every answer is held to the documented response of its status.
    const reply = (status: number, answer: unknown): number => {
      state.violations.push(...api.response(operation, status, answer));
      return send(res, status, answer);
    };
    const base = `${url.origin}${/^\/repos\/[^/]+\/[^/]+/.exec(url.pathname)?.[0] ?? ''}`;
    const refJson = (ref: string, sha: unknown) => ({
      ref,
      node_id: `REF_${ref}`,
      url: `${base}/git/${ref}`,
      object: { type: 'commit', sha, url: `${base}/git/commits/${String(sha)}` },
    });
    const commitJson = (sha: string, c: { tree: string; parents: string[]; message: string }) => {
      const who = {
        name: 'github-actions[bot]',
        email: '41898282+github-actions[bot]@users.noreply.github.com',
        date: '2026-04-01T12:00:00Z',
      };
      return {
        sha,
        node_id: `C_${sha}`,
        url: `${base}/git/commits/${sha}`,
        html_url: `https://github.com/${base.split('/repos/')[1] ?? ''}/commit/${sha}`,
        author: who,
        committer: who,
        tree: { sha: c.tree, url: `${base}/git/trees/${c.tree}` },
        message: c.message,
        parents: c.parents.map((p) => ({
          sha: p,
          url: `${base}/git/commits/${p}`,
          html_url: `https://github.com/commit/${p}`,
        })),
        verification: { verified: false, reason: 'unsigned', signature: null, payload: null, verified_at: null },
      };
    };
    if (!req.headers.authorization?.startsWith('Bearer ')) return reply(401, { message: 'Requires authentication' });
    if (state.readOnly && method !== 'GET') return reply(403, { message: 'Resource not accessible by integration' });
    const m = /^\/repos\/[^/]+\/[^/]+(\/.*)$/.exec(url.pathname);
    const rest = m?.[1] ?? '';
    const tail = (prefix: string) => decodeURIComponent(rest.slice(prefix.length));

    if (method === 'GET' && rest.startsWith('/git/ref/heads/')) {
      const ref = `refs/heads/${tail('/git/ref/heads/')}`;
      const sha = state.refs.get(ref);
      return sha ? reply(200, refJson(ref, sha)) : reply(404, { message: 'Not Found' });
    }
    if (method === 'POST' && rest === '/git/refs') {
      const ref = String(body.ref ?? '');
      if (!/^refs\/heads\/./.test(ref)) return reply(422, { message: 'Reference name is not valid' });
      if (!get(body.sha, 'commit')) return reply(422, { message: 'Object does not exist' });
      if (state.refs.has(ref)) return reply(422, { message: 'Reference already exists' });
      state.refs.set(ref, body.sha as string);
      return reply(201, refJson(ref, body.sha));
    }
    if (method === 'PATCH' && rest.startsWith('/git/refs/heads/')) {
      const ref = `refs/heads/${tail('/git/refs/heads/')}`;
      const current = state.refs.get(ref);
      if (!current) return reply(422, { message: 'Reference does not exist' });
      if (!get(body.sha, 'commit')) return reply(422, { message: 'Object does not exist' });
      if (body.force !== true && !descends(body.sha as string, current))
        return reply(422, { message: 'Update is not a fast forward' });
      state.refs.set(ref, body.sha as string);
      return reply(200, refJson(ref, body.sha));
    }
    if (method === 'POST' && rest === '/git/blobs') {
      if (typeof body.content !== 'string') return reply(422, { message: 'content is required' });
      const bytes = Buffer.from(body.content, body.encoding === 'base64' ? 'base64' : 'utf8');
      const sha = put({ kind: 'blob', bytes });
      return reply(201, { sha, url: `${base}/git/blobs/${sha}` });
    }
    if (method === 'GET' && rest.startsWith('/git/blobs/')) {
      const blob = get(tail('/git/blobs/'), 'blob');
      if (!blob) return reply(404, { message: 'Not Found' });
      // GitHub wraps base64 content at 60 characters.
      const content = blob.bytes.toString('base64').replace(/.{60}/g, '$&\n');
      const sha = gitBlobId(blob.bytes);
      return reply(200, {
        sha,
        node_id: `B_${sha}`,
        url: `${base}/git/blobs/${sha}`,
        size: blob.bytes.length,
        encoding: 'base64',
        content,
      });
    }
    if (method === 'POST' && rest === '/git/trees') {
      if (body.base_tree !== undefined && !get(body.base_tree, 'tree'))
        return reply(422, { message: 'base_tree is not a valid tree' });
      let tree = body.base_tree as string | undefined;
      for (const raw of Array.isArray(body.tree) ? (body.tree as Record<string, unknown>[]) : []) {
        const path = String(raw.path ?? '');
        if (path === '' || path.split('/').some((p) => p === '' || p === '.' || p === '..'))
          return reply(422, { message: `invalid tree path ${path}` });
        if (!get(raw.sha, 'blob')) return reply(422, { message: 'tree.sha is not a valid blob' });
        tree = plant(tree, path.split('/'), { mode: String(raw.mode), type: 'blob', sha: raw.sha as string });
      }
      tree ??= put({ kind: 'tree', entries: new Map() });
      const entries = [...(get(tree, 'tree')?.entries ?? [])].map(([path, e]) => ({
        path,
        ...e,
        url: `${base}/git/${e.type}s/${e.sha}`,
      }));
      return reply(201, { sha: tree, url: `${base}/git/trees/${tree}`, truncated: false, tree: entries });
    }
    if (method === 'POST' && rest === '/git/commits') {
      const parents = Array.isArray(body.parents) ? (body.parents as unknown[]) : [];
      if (!get(body.tree, 'tree') || parents.some((p) => !get(p, 'commit')))
        return reply(422, { message: 'Tree or parent does not exist' });
      const sha = put({
        kind: 'commit',
        tree: body.tree as string,
        parents: parents as string[],
        message: String(body.message ?? ''),
      });
      return reply(
        201,
        commitJson(sha, {
          tree: body.tree as string,
          parents: parents as string[],
          message: String(body.message ?? ''),
        }),
      );
    }
    if (method === 'GET' && rest.startsWith('/git/commits/')) {
      const sha = tail('/git/commits/');
      const c = get(sha, 'commit');
      return c ? reply(200, commitJson(sha, c)) : reply(404, { message: 'Not Found' });
    }
    if (method === 'GET' && rest.startsWith('/contents/')) {
      const path = tail('/contents/');
      const at = url.searchParams.get('ref') ?? '';
      const commit = get(state.refs.get(`refs/heads/${at}`) ?? at, 'commit');
      const entry = lookup(commit?.tree, path);
      if (!entry) return reply(404, { message: 'Not Found' });
      if (entry.type === 'tree') return reply(200, [] as unknown[]);
      const bytes = get(entry.sha, 'blob')?.bytes ?? Buffer.alloc(0);
      // Over 1 MB the contents API leaves content empty (encoding "none"); the blob API serves it.
      const small = bytes.length <= 1024 * 1024;
      const self = `${base}/contents/${path}?ref=${encodeURIComponent(at)}`;
      const gitUrl = `${base}/git/blobs/${entry.sha}`;
      const htmlUrl = `https://github.com/blob/${encodeURIComponent(at)}/${path}`;
      return reply(200, {
        type: 'file',
        path,
        name: path.split('/').pop(),
        sha: entry.sha,
        size: bytes.length,
        encoding: small ? 'base64' : 'none',
        content: small ? bytes.toString('base64') : '',
        url: self,
        git_url: gitUrl,
        html_url: htmlUrl,
        download_url: null,
        _links: { self, git: gitUrl, html: htmlUrl },
      });
    }
    return reply(404, { message: 'Not Found' });
  }

  const server = createServer((req, res) => {
    const url = new URL(req.url ?? '/', 'http://127.0.0.1');
    handle(req, res, url).then(
      (status) =>
        state.calls.push({
          method: req.method ?? 'GET',
          path: url.pathname + url.search,
          status,
          auth: req.headers.authorization,
        }),
      (e: unknown) => send(res, 500, { message: String(e) }),
    );
  });
  await new Promise<void>((r) => server.listen(0, '127.0.0.1', r));
  const url = `http://127.0.0.1:${(server.address() as AddressInfo).port}`;
  return {
    url,
    state,
    readFile(branch, path) {
      const head = state.refs.get(`refs/heads/${branch}`);
      const entry = lookup(get(head, 'commit')?.tree, path);
      const blob = entry?.type === 'blob' ? get(entry.sha, 'blob') : undefined;
      return blob?.bytes.toString('utf8');
    },
    history(branch) {
      const out: string[] = [];
      let sha = state.refs.get(`refs/heads/${branch}`);
      // Bounded by the number of objects: a commit chain cannot be longer.
      for (let i = 0; sha !== undefined && i <= state.objects.size; i++) {
        out.push(sha);
        sha = get(sha, 'commit')?.parents[0];
      }
      return out;
    },
    close: () =>
      new Promise<void>((r) => {
        server.closeAllConnections();
        server.close(() => r());
      }),
  };
}
