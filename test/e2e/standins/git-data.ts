/**
 * A loopback stand-in for the Git Data part of the GitHub REST API (docs.github.com/rest/git:
 * "Get a reference", "Create a reference", "Update a reference", "Get/Create a commit", "Create a
 * tree", "Get/Create a blob"; "Get repository content"; and "Merge a branch"), with the semantics
 * the branch store relies on: objects addressed by content, trees built on a base_tree with nested
 * paths and inline `content` (the server writes the blob), commits with parents, a non-forced ref
 * update that is refused (422 "Update is not a fast forward") unless the new commit descends from
 * the current head, and a server-side merge (201 with the merge commit, 204 when the branch holds
 * the commit already, 409 "Merge conflict" when both sides changed a file). Merges are
 * three-way by file (stricter than git's line-wise merge: any file both sides changed conflicts).
 * Optionally it enforces GitHub's documented secondary limit on content-creating requests (80 a
 * minute, "Rate limits for the REST API"), answering over it as documented: 403 with "You have
 * exceeded a secondary rate limit" and a retry-after header; and it counts requests that came back
 * before the wait it asked for (which GitHub warns may get an integration banned).
 * Blob shas are real git object ids (SHA-1 of "blob <size>\0<bytes>"); tree and commit ids hash a
 * canonical form. Every request is held to GitHub's published REST description and every answer to
 * its documented response schema (openapi.ts), recorded in `state.violations`. 127.0.0.1 only.
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
  /** When set, ref writes and merges on this branch answer 422 as a ruleset would. */
  rulesetOn?: string;
  /** Content-creating requests (POST, PATCH, PUT, DELETE) allowed per `minuteMs`; unlimited when unset. */
  writeLimit?: { perMinute: number; minuteMs: number; secondMs: number };
  /** Times (ms) of the content-creating requests accepted, for the sliding window. */
  writes: number[];
  /** Content-creating requests refused for the limit, and those that came back too early. */
  limited: number;
  early: number;
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
  const state: GitDataState = {
    objects: new Map(),
    refs: new Map(),
    calls: [],
    violations: [],
    writes: [],
    limited: 0,
    early: 0,
  };
  const api = githubApiCheck();
  // When each client (by its X-Bellgate-Leg header, else its token) may come back after a refusal.
  const notBefore = new Map<string, number>();
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

  /** The nearest commit reachable from both (breadth first from `a`, checked against `b`'s ancestry). */
  const mergeBase = (a: string, b: string): string | undefined => {
    const queue = [a];
    const seen = new Set<string>();
    while (queue.length > 0) {
      const sha = queue.shift() as string;
      if (seen.has(sha)) continue;
      seen.add(sha);
      if (descends(b, sha)) return sha;
      queue.push(...(get(sha, 'commit')?.parents ?? []));
    }
    return undefined;
  };
  /** Every file of a tree, by slash path. */
  const flatten = (tree: string | undefined, prefix = '', out = new Map<string, Entry>()): Map<string, Entry> => {
    for (const [name, entry] of get(tree, 'tree')?.entries ?? []) {
      if (entry.type === 'tree') flatten(entry.sha, `${prefix}${name}/`, out);
      else out.set(`${prefix}${name}`, entry);
    }
    return out;
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
    if (!/^(Bearer|token) /.test(req.headers.authorization ?? ''))
      return reply(401, { message: 'Requires authentication' });
    if (state.readOnly && method !== 'GET') return reply(403, { message: 'Resource not accessible by integration' });
    if (method !== 'GET' && state.writeLimit) {
      const { perMinute, minuteMs, secondMs } = state.writeLimit;
      const now = Date.now();
      const client = String(req.headers['x-bellgate-leg'] ?? req.headers.authorization);
      if (now < (notBefore.get(client) ?? 0)) state.early += 1;
      state.writes = state.writes.filter((t) => t > now - minuteMs);
      if (state.writes.length >= perMinute) {
        state.limited += 1;
        // Seconds until the oldest write in the window leaves it, at least one.
        const wait = Math.max(1, Math.ceil(((state.writes[0] as number) + minuteMs - now) / secondMs));
        notBefore.set(client, now + wait * secondMs);
        res.writeHead(403, { 'content-type': 'application/json; charset=utf-8', 'retry-after': String(wait) });
        res.end(
          JSON.stringify({
            message: 'You have exceeded a secondary rate limit. Please wait a few minutes before you try again.',
            documentation_url: 'https://docs.github.com/rest/using-the-rest-api/rate-limits-for-the-rest-api',
          }),
        );
        return 403;
      }
      state.writes.push(now);
    }
    const m = /^\/repos\/[^/]+\/[^/]+(\/.*)$/.exec(url.pathname);
    const rest = m?.[1] ?? '';
    const tail = (prefix: string) => decodeURIComponent(rest.slice(prefix.length));

    const refused = (branch: string) =>
      state.rulesetOn === branch
        ? reply(422, {
            message: 'Repository rule violations found\n\nChanges must be made through a pull request.\n\n',
            documentation_url: 'https://docs.github.com/rest/git/refs#update-a-reference',
          })
        : undefined;
    if (method === 'GET' && rest.startsWith('/git/ref/heads/')) {
      const ref = `refs/heads/${tail('/git/ref/heads/')}`;
      const sha = state.refs.get(ref);
      return sha ? reply(200, refJson(ref, sha)) : reply(404, { message: 'Not Found' });
    }
    if (method === 'POST' && rest === '/git/refs') {
      const ref = String(body.ref ?? '');
      const stop = refused(ref.replace(/^refs\/heads\//, ''));
      if (stop !== undefined) return stop;
      if (!/^refs\/heads\/./.test(ref)) return reply(422, { message: 'Reference name is not valid' });
      if (!get(body.sha, 'commit')) return reply(422, { message: 'Object does not exist' });
      if (state.refs.has(ref)) return reply(422, { message: 'Reference already exists' });
      state.refs.set(ref, body.sha as string);
      return reply(201, refJson(ref, body.sha));
    }
    if (method === 'POST' && rest === '/merges') {
      const baseRef = `refs/heads/${String(body.base ?? '')}`;
      const stop = refused(String(body.base ?? ''));
      if (stop !== undefined) return stop;
      const ours = state.refs.get(baseRef);
      if (!ours) return reply(404, { message: 'Base does not exist' });
      const theirs = typeof body.head === 'string' ? (state.refs.get(`refs/heads/${body.head}`) ?? body.head) : '';
      if (!get(theirs, 'commit')) return reply(404, { message: 'Head does not exist' });
      if (descends(ours, theirs)) {
        state.violations.push(...api.response(operation, 204, undefined));
        res.writeHead(204);
        res.end();
        return 204;
      }
      const baseCommit = mergeBase(ours, theirs);
      const files = (c: string | undefined) => flatten(get(c, 'commit')?.tree);
      const [b, o, t] = [files(baseCommit), files(ours), files(theirs)];
      const merged = new Map<string, Entry>();
      for (const path of new Set([...b.keys(), ...o.keys(), ...t.keys()])) {
        const [eb, eo, et] = [b.get(path)?.sha, o.get(path)?.sha, t.get(path)?.sha];
        let pick: string | undefined;
        if (eo === et) pick = eo;
        else if (eo === eb) pick = et;
        else if (et === eb) pick = eo;
        else return reply(409, { message: 'Merge conflict' });
        if (pick !== undefined) merged.set(path, { mode: '100644', type: 'blob', sha: pick });
      }
      let tree = put({ kind: 'tree', entries: new Map() });
      for (const [path, entry] of merged) tree = plant(tree, path.split('/'), entry);
      const sha = put({
        kind: 'commit',
        tree,
        parents: [ours, theirs],
        message: String(body.commit_message ?? 'Merge'),
      });
      state.refs.set(baseRef, sha);
      const made = commitJson(sha, { tree, parents: [ours, theirs], message: String(body.commit_message ?? 'Merge') });
      return reply(201, {
        url: `${base}/commits/${sha}`,
        sha,
        node_id: made.node_id,
        html_url: made.html_url,
        comments_url: `${base}/commits/${sha}/comments`,
        commit: {
          url: made.url,
          author: made.author,
          committer: made.committer,
          message: made.message,
          comment_count: 0,
          tree: made.tree,
          verification: made.verification,
        },
        author: null,
        committer: null,
        parents: made.parents,
      });
    }
    if (method === 'PATCH' && rest.startsWith('/git/refs/heads/')) {
      const ref = `refs/heads/${tail('/git/refs/heads/')}`;
      const stop = refused(tail('/git/refs/heads/'));
      if (stop !== undefined) return stop;
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
        // `content` instead of `sha`: "GitHub will write this blob out and use that SHA for this entry".
        const sha =
          typeof raw.content === 'string' ? put({ kind: 'blob', bytes: Buffer.from(raw.content, 'utf8') }) : raw.sha;
        if (!get(sha, 'blob')) return reply(422, { message: 'tree.sha is not a valid blob' });
        tree = plant(tree, path.split('/'), { mode: String(raw.mode), type: 'blob', sha: sha as string });
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
      (e: unknown) => {
        // A fault of the stand-in itself must fail the test, not pass as a retried 500.
        state.violations.push(`the stand-in failed on ${req.method} ${url.pathname}: ${String(e)}`);
        return send(res, 500, { message: String(e) });
      },
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
