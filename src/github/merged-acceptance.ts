/**
 * Whether a recording run on the baseline branch is the merge of a pull request that carried the
 * accept label (`GET /repos/{owner}/{repo}/commits/{sha}/pulls`). Asked only when the run
 * regressed: then the metrics it accepted start a new level at this run (a level mark stored
 * with it), so main is not red for the pushes after an intended step, and the next check fits
 * only runs since the mark. A read failure only warns: the run stays `regressed` and unmarked,
 * the safe side.
 */
import { literalGlob } from '../config/escape-glob.js';
import type { LevelMark } from '../history/history.js';
import type { CommitPull, GitHubApi } from './api.js';
import { describeError } from './describe-error.js';
import { logText } from './log-text.js';
import type { ActionSink } from './sink.js';

export interface MergedPull {
  number: number;
  /** It carries the accept label. */
  accepted: boolean;
}

/**
 * The merged pull request `sha` belongs to on `baseBranch`: the one whose merge made `sha`, else
 * the first merged into that branch; undefined when there is none or it cannot be read.
 * @example await mergedPull(api, 'c0ffee…', 'main', 'bellgate:accept', sink) // { number: 17, accepted: true }
 */
export async function mergedPull(
  api: () => GitHubApi | Promise<GitHubApi>,
  sha: string,
  baseBranch: string,
  label: string,
  sink: ActionSink,
): Promise<MergedPull | undefined> {
  let pulls: CommitPull[];
  try {
    pulls = await (await api()).listCommitPulls(sha);
  } catch (error) {
    sink.warning(
      `bellgate: could not read which pull request commit ${sha.slice(0, 12)} belongs to, so an accept label it carried does not count: ${logText(describeError(error))}` +
        '\nfix: give the recording job `permissions: pull-requests: read` and `contents: read` and keep the default `token`',
    );
    return undefined;
  }
  const merged = pulls.filter((p) => p.mergedAt !== undefined && (p.base === undefined || p.base === baseBranch));
  const pull = merged.find((p) => p.mergeSha === sha) ?? merged[0];
  return pull === undefined ? undefined : { number: pull.number, accepted: pull.labels.includes(label) };
}

/**
 * The level mark of an accepted merge: the regressed metrics by exact-name globs. Undefined when
 * no name can be written as a glob (then nothing restarts rather than every metric).
 * @example acceptedMark(['time/parse'], 17) // { metrics: ['time/parse'], reason: 'accepted', pr: 17 }
 */
export function acceptedMark(regressed: readonly string[], pr: number): LevelMark | undefined {
  const metrics = regressed.flatMap((name) => literalGlob(name) ?? []);
  return metrics.length === 0 ? undefined : { metrics, reason: 'accepted', pr };
}
