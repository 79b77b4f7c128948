/**
 * The branch store's Git Data calls (GitDataApi) over the action's one octokit client, so they
 * share its retries (plugin-retry: 5xx, network, timeouts), its rate-limit waits (retry-after.ts),
 * the spacing of content-creating requests (plugin-throttling's write group) and the runner's
 * proxy. Every failure becomes a GitDataError whose kind the store acts on (classifyGitDataFailure).
 */
import { classifyGitDataFailure, GitDataError, type GitDataApi } from '../history/branch-api.js';
import { rateLimitWait } from './retry-after.js';

/** The part of an octokit client this module uses. */
export interface RequestClient {
  request(route: string, parameters?: Record<string, unknown>): Promise<{ status: number; data: unknown }>;
}

type Json = Record<string, unknown>;
const obj = (v: unknown): Json => (typeof v === 'object' && v !== null ? (v as Json) : {});
const segments = (path: string): string => path.split('/').map(encodeURIComponent).join('/');

/** A GitDataError for a failed request: its status, GitHub's message and what it means. */
export function gitDataError(error: unknown, doing: string): GitDataError {
  const e = error as { status?: unknown; message?: unknown; response?: { data?: unknown } } | null;
  const status = typeof e?.status === 'number' && e.status > 0 ? e.status : undefined;
  const said = obj(e?.response?.data).message;
  const message = typeof said === 'string' ? said : typeof e?.message === 'string' ? e.message : String(error);
  const { kind, retryAfter } = classifyGitDataFailure(status, message, rateLimitWait(error, 0, Date.now()));
  return new GitDataError(`${doing}${status === undefined ? '' : ` answered ${status}`}: ${message.slice(0, 300)}`, {
    ...(status === undefined ? {} : { status }),
    kind,
    ...(retryAfter === undefined ? {} : { retryAfter }),
    cause: error,
  });
}

function text(v: unknown, what: string): string {
  if (typeof v !== 'string' || v === '') throw new GitDataError(`the API answer lacks ${what}`, { kind: 'transient' });
  return v;
}

/**
 * @example const api = createGitData(() => octokit(), { owner: 'acme', repo: 'router' });
 * await api.getBranchHead('bellgate-data') // '3f1c…' or undefined
 */
export function createGitData(client: () => Promise<RequestClient>, repo: { owner: string; repo: string }): GitDataApi {
  const base = `/repos/${encodeURIComponent(repo.owner)}/${encodeURIComponent(repo.repo)}`;

  /** One call; a 404 gives undefined when `missingOk`, every other failure a GitDataError. */
  async function call(
    method: string,
    path: string,
    body?: Json,
    missingOk = false,
  ): Promise<{ status: number; data: Json } | undefined> {
    try {
      const res = await (await client()).request(`${method} ${base}${path}`, body ?? {});
      return { status: res.status, data: obj(res.data) };
    } catch (error) {
      if (missingOk && (error as { status?: unknown }).status === 404) return undefined;
      throw gitDataError(error, `${method} ${path}`);
    }
  }
  const found = async (method: string, path: string, body?: Json): Promise<Json> =>
    (await call(method, path, body))?.data ?? {};

  return {
    async getBranchHead(branch) {
      const res = await call('GET', `/git/ref/heads/${segments(branch)}`, undefined, true);
      return res === undefined ? undefined : text(obj(res.data.object).sha, 'the branch head');
    },
    async getCommitTree(sha) {
      return text(obj((await found('GET', `/git/commits/${encodeURIComponent(sha)}`)).tree).sha, 'the commit tree');
    },
    async findFile(path, commit) {
      const res = await call('GET', `/contents/${segments(path)}?ref=${encodeURIComponent(commit)}`, undefined, true);
      if (res === undefined) return undefined;
      if (res.data.type !== 'file')
        throw new GitDataError(`${path} on the data branch is a ${String(res.data.type)}, not a file`, {
          kind: 'other',
        });
      return { sha: text(res.data.sha, 'the file sha'), size: typeof res.data.size === 'number' ? res.data.size : 0 };
    },
    async getBlobText(sha) {
      const json = await found('GET', `/git/blobs/${encodeURIComponent(sha)}`);
      if (json.encoding !== 'base64' || typeof json.content !== 'string')
        throw new GitDataError(`blob ${sha} came back without base64 content`, { kind: 'transient' });
      const bytes = Buffer.from(json.content, 'base64');
      if (typeof json.size === 'number' && bytes.length !== json.size)
        throw new GitDataError(`blob ${sha} came back with ${bytes.length} of ${json.size} bytes`, {
          kind: 'transient',
        });
      try {
        return new TextDecoder('utf-8', { fatal: true }).decode(bytes);
      } catch {
        throw new GitDataError(`blob ${sha} is not UTF-8 text`, { kind: 'other' });
      }
    },
    async createTree(files, baseTree) {
      const tree = files.map((f) => ({ path: f.path, mode: '100644', type: 'blob', content: f.text }));
      return text(
        (await found('POST', '/git/trees', { tree, ...(baseTree ? { base_tree: baseTree } : {}) })).sha,
        'the tree sha',
      );
    },
    async createCommit(message, tree, parents) {
      return text((await found('POST', '/git/commits', { message, tree, parents })).sha, 'the commit sha');
    },
    async createBranch(branch, sha) {
      await call('POST', '/git/refs', { ref: `refs/heads/${branch}`, sha });
    },
    async mergeIntoBranch(branch, sha, message) {
      const res = await call('POST', '/merges', { base: branch, head: sha, commit_message: message });
      return res?.status === 204 ? 'contained' : 'merged';
    },
  };
}
