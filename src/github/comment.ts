/**
 * The PR comment: one per series, found by its hidden marker and edited in place, never duplicated.
 *
 * `comment: auto` posts when something is flagged (regressed or improved), and keeps an existing
 * comment current even when a later push is clean (so a stale red comment never lingers);
 * `always` posts every time; `never` stays silent.
 */
import type { Mode } from './inputs.js';
import type { GitHubApi } from './api.js';

export type CommentOutcome = 'created' | 'updated' | 'unchanged' | 'skipped';

/**
 * Creates, updates or leaves the series' comment on pull request `issue`.
 * @throws whatever the API throws (the caller decides: a 403 on a fork PR only warns).
 * @example await upsertComment(api, 7, '<!-- bellgate:series=ci -->', body, 'auto', true) // 'created'
 */
export async function upsertComment(
  api: Pick<GitHubApi, 'listIssueComments' | 'createIssueComment' | 'updateIssueComment'>,
  issue: number,
  markerLine: string,
  body: string,
  mode: Mode,
  flagged: boolean,
): Promise<CommentOutcome> {
  if (mode === 'never') return 'skipped';
  const comments = await api.listIssueComments(issue);
  // Only a comment that starts with the marker is ours: a reviewer quoting it mid-text is not.
  const existing = comments.find((c) => c.body.trimStart().startsWith(markerLine));
  if (existing === undefined) {
    if (mode === 'auto' && !flagged) return 'skipped';
    await api.createIssueComment(issue, body);
    return 'created';
  }
  if (existing.body === body) return 'unchanged';
  await api.updateIssueComment(existing.id, body);
  return 'updated';
}
