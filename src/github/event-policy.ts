/**
 * Which runs are checked only and which also add themselves to the history.
 *
 * - push, schedule, workflow_dispatch on the baseline branch: check, then record. These are the
 *   trusted runs the gate learns from.
 * - pull_request, pull_request_target, merge_group: check only. A pull request's numbers must never teach the
 *   gate what is normal, or a regression could be accepted by repetition. pull_request_target runs
 *   with the base repository's token and secrets: if a workflow checks out and builds the PR's code
 *   under it, that code runs with write access, so gate fork PRs with `pull_request` instead. A
 *   merge queue's run tests a pull request merged onto the base branch, not a trusted run.
 * - any other event: check only, with a notice saying why nothing was recorded.
 * `record: always` / `never` override all of this.
 */
import type { Mode } from './inputs.js';
import type { RunContext } from './context.js';

export const BASELINE_EVENTS: readonly string[] = ['push', 'schedule', 'workflow_dispatch'];
export const PULL_REQUEST_EVENTS: readonly string[] = ['pull_request', 'pull_request_target'];
/** Checked like pull requests, never recorded: the pull request events and merge queue runs. */
export const CHECK_ONLY_EVENTS: readonly string[] = [...PULL_REQUEST_EVENTS, 'merge_group'];

export interface RecordDecision {
  record: boolean;
  /** Why; shown in the log (and as a notice for unusual events). */
  reason: string;
  notice: boolean;
}

/**
 * Decides whether this run is recorded.
 * @example decideRecord('auto', { eventName: 'push', ref: 'refs/heads/main', ... }, 'main').record // true
 */
export function decideRecord(
  mode: Mode,
  context: Pick<RunContext, 'eventName' | 'ref'>,
  baselineBranch: string | undefined,
): RecordDecision {
  if (mode === 'always') return { record: true, reason: 'record: always', notice: false };
  if (mode === 'never') return { record: false, reason: 'record: never', notice: false };
  const { eventName, ref } = context;
  if (CHECK_ONLY_EVENTS.includes(eventName)) {
    return { record: false, reason: `${eventName} runs are checked, never recorded`, notice: false };
  }
  if (!BASELINE_EVENTS.includes(eventName)) {
    return {
      record: false,
      reason: `event ${eventName} is checked only; set \`record: always\` to record it`,
      notice: true,
    };
  }
  if (baselineBranch === undefined) {
    return { record: false, reason: 'the baseline branch is unknown; set `baseline-branch`', notice: true };
  }
  if (ref !== `refs/heads/${baselineBranch}`) {
    return {
      record: false,
      reason: `${ref ?? 'this ref'} is not the baseline branch ${baselineBranch}`,
      notice: false,
    };
  }
  return { record: true, reason: `${eventName} on the baseline branch ${baselineBranch}`, notice: false };
}
