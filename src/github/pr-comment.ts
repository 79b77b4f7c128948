/**
 * The PR comment step with its failure policy: the comment is feedback, not the gate, so any
 * failure only warns — a 403/404 (a fork's read-only token, or a job without
 * `pull-requests: write`) says why; the report stays in the job summary.
 */
import { statusOf, type GitHubApi } from './api.js';
import { upsertComment } from './comment.js';
import type { RunContext } from './context.js';
import { describeError } from './describe-error.js';
import type { ActionInputs } from './inputs.js';
import type { ActionSink } from './sink.js';

/** Posts the report: the outcome ('created', 'updated', 'unchanged', 'skipped', 'failed'), or undefined without a PR. */
export type PostComment = (marker: string, markdown: string, flagged: boolean) => Promise<string | undefined>;

/**
 * Starts the comment step as the run starts: the pull request's comments are asked for at once,
 * so their answer comes while the history loads and the gate runs rather than after it. A
 * refusal of that listing waits for the returned function, which warns as for any other failure.
 * @example await startComment(api, context, inputs, sink)(marker, markdown, true) // 'created'
 */
export function startComment(
  api: () => GitHubApi | Promise<GitHubApi>,
  context: RunContext,
  inputs: ActionInputs,
  sink: ActionSink,
): PostComment {
  const pr = context.pullRequest;
  if (!pr) return async () => undefined;
  // `never` must not touch the API at all: asking for it with an empty token would throw and warn.
  if (inputs.comment === 'never') {
    return async () => {
      sink.info('bellgate: PR comment skipped');
      return 'skipped';
    };
  }
  const listed = (async () => (await api()).listIssueComments(pr.number))();
  listed.catch(() => undefined);
  return async (marker, markdown, flagged) => {
    try {
      const comments = await listed;
      const client = await api();
      const outcome = await upsertComment(
        {
          listIssueComments: async () => comments,
          createIssueComment: (issue, body) => client.createIssueComment(issue, body),
          updateIssueComment: (id, body) => client.updateIssueComment(id, body),
        },
        pr.number,
        marker,
        markdown,
        inputs.comment,
        flagged,
      );
      sink.info(`bellgate: PR comment ${outcome}`);
      return outcome;
    } catch (error) {
      const status = statusOf(error);
      // A fork's pull_request run gets a read-only token: 403 (or 404) on comment writes.
      const why =
        status === 403 || status === 404
          ? `the token may not comment on pull request #${pr.number}${pr.fromFork ? ' (a fork PR gets a read-only token)' : ' (give the job `permissions: pull-requests: write`)'}`
          : `the comment on pull request #${pr.number} failed: ${describeError(error)}`;
      sink.warning(`bellgate: ${why}; the report is in the job summary`);
      return 'failed';
    }
  };
}
