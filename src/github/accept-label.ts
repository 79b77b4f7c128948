/**
 * Whether this run's pull request carries the accept label. The event payload is a snapshot taken
 * when the run was triggered: a label added later, or a re-run (which replays the original
 * payload), is not in it. So when something regressed, the labels are read from the API at run
 * time (`GET /repos/{owner}/{repo}/issues/{number}/labels`); a label in the payload counts too. A
 * merge queue run asks about the pull request it tests. Read failures only warn: without the
 * label the verdict stays `regressed`, the safe side.
 */
import type { GitHubApi } from './api.js';
import type { RunContext } from './context.js';
import { describeError } from './describe-error.js';
import type { ActionSink } from './sink.js';
import { logText } from './log-text.js';

export type AcceptSource = 'payload' | 'api';

/**
 * @returns where the label was found, or undefined when the pull request does not carry it.
 * @example await acceptLabelSource(api, context, 'bellgate:accept', sink) // 'api'
 */
export async function acceptLabelSource(
  api: () => GitHubApi | Promise<GitHubApi>,
  context: Pick<RunContext, 'pullRequest' | 'queuedPullRequest'>,
  label: string,
  sink: ActionSink,
): Promise<AcceptSource | undefined> {
  if (context.pullRequest?.labels.includes(label)) return 'payload';
  const number = context.pullRequest?.number ?? context.queuedPullRequest;
  if (number === undefined) return undefined;
  try {
    const labels = await (await api()).listIssueLabels(number);
    sink.info(`bellgate: pull request #${number} carries ${labels.length} label${labels.length === 1 ? '' : 's'} now`);
    return labels.includes(label) ? 'api' : undefined;
  } catch (error) {
    sink.warning(
      `bellgate: could not read the labels of pull request #${number}, so only the event's labels count: ${logText(describeError(error))}` +
        '\nfix: give the job `permissions: pull-requests: read` (or write) and keep the default `token`',
    );
    return undefined;
  }
}
