/**
 * The two REST calls of the release review: "List repository tags" (GET /repos/{owner}/{repo}/tags,
 * every tag with the commit it points to, annotated ones included) and "Get a commit" (its
 * committer date, so a tag whose commit has no recorded run is matched to the nearest earlier run).
 * Both need only `contents: read`. Made on the action's one octokit client (octokit-api.ts).
 */
import type { RequestClient } from './git-data.js';
import type { RepoTag } from './release-tags.js';

export interface ReleaseApi {
  /** The repository's tags (at most `maxPages` pages of 100). */
  listTags(maxPages?: number): Promise<RepoTag[]>;
  /** The committer date (ISO-8601) of a commit, undefined when GitHub gives none. */
  commitTime(sha: string): Promise<string | undefined>;
}

type Json = Record<string, unknown>;
const obj = (v: unknown): Json => (typeof v === 'object' && v !== null ? (v as Json) : {});

/**
 * @example await createReleaseApi(() => octokit(), { owner: 'acme', repo: 'router' }).listTags() // [{ name: 'v1.2.0', sha: '…' }]
 */
export function createReleaseApi(
  client: () => Promise<RequestClient>,
  repo: { owner: string; repo: string },
): ReleaseApi {
  return {
    async listTags(maxPages = 10) {
      const tags: RepoTag[] = [];
      for (let page = 1; page <= maxPages; page++) {
        const res = await (await client()).request('GET /repos/{owner}/{repo}/tags', { ...repo, per_page: 100, page });
        const items = Array.isArray(res.data) ? res.data : [];
        for (const t of items) {
          const name = obj(t).name;
          const sha = obj(obj(t).commit).sha;
          if (typeof name === 'string' && typeof sha === 'string') tags.push({ name, sha });
        }
        if (items.length < 100) break;
      }
      return tags;
    },
    async commitTime(sha) {
      const res = await (await client()).request('GET /repos/{owner}/{repo}/commits/{ref}', { ...repo, ref: sha });
      const date = obj(obj(obj(res.data).commit).committer).date;
      return typeof date === 'string' ? date : undefined;
    },
  };
}
