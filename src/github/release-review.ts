/**
 * The action's release mode (input `since`): instead of checking a run, review every metric of
 * the series since a reference — the previous release tag (`since: previous-release`, found from
 * the repository's tags: on a tag push or a published release the tag before GITHUB_REF's, else
 * the newest release) or a tag, run id, sha or time given. The review ends at the newest recorded
 * run of this commit when it has one (so a release published late reviews its own commit), else
 * at the newest recorded run, and says so. The markdown review goes to the job summary, the text
 * to the job log, the JSON to RUNNER_TEMP (output `report`); output `regressed` counts the metrics
 * worse since the reference.
 *
 * Failure policy: findings never fail the step unless `since-block: true`; a bad input or a
 * history store configuration fault does (an unreachable store too with `history-failure: fail`).
 * A history without any recorded run at or before the reference, or no earlier release tag, is a
 * notice.
 */
import type { Config } from '../config/types.js';
import { settingsFor } from '../config/rules.js';
import { InputError } from '../errors/input-error.js';
import { referenceFromText, type SinceReference } from '../gate/since/reference.js';
import { reviewSince } from '../gate/since/review-since.js';
import type { SinceReport } from '../gate/since/since-report.js';
import type { History } from '../history/history.js';
import type { HistoryStore } from '../history/store.js';
import { renderSinceJson } from '../report/since-json.js';
import { renderSinceMarkdown } from '../report/since-markdown.js';
import { renderSinceText } from '../report/since-text.js';
import type { GitHubApi } from './api.js';
import type { RunContext } from './context.js';
import { describeError } from './describe-error.js';
import { loadHistory } from './history-step.js';
import { OUTPUT, type ActionInputs } from './inputs.js';
import { logText } from './log-text.js';
import type { ReleaseApi } from './release-api.js';
import { previousRelease } from './release-tags.js';
import { reportPath } from './report-path.js';
import type { ActionSink } from './sink.js';

/** The `since` value that asks for the release before this one. */
export const PREVIOUS_RELEASE = 'previous-release';

export interface ReleaseReviewStep {
  sink: ActionSink;
  writeText(path: string, text: string): Promise<void>;
  inputs: ActionInputs & { since: string };
  context: RunContext;
  config: Config;
  store: HistoryStore;
  series: string;
  api: () => GitHubApi | Promise<GitHubApi>;
}

/** What the review found, for callers and tests. */
export interface ReleaseReviewResult {
  failed: boolean;
  /** Metrics worse since the reference. */
  worse: number;
  summary?: string;
}

/**
 * Runs the release review once. Throws InputError for a bad `since` value (the caller fails the step).
 * @example await runReleaseReview(step) // { failed: false, worse: 2, summary: '### Bellgate release review: …' }
 */
export async function runReleaseReview(step: ReleaseReviewStep): Promise<ReleaseReviewResult> {
  const { sink, inputs, context, series } = step;
  const setting = { store: inputs.store, history: inputs.history };
  const loaded = await loadHistory(step.store, series, setting, sink);
  if (loaded.problem) {
    const text = `bellgate: the release review could not read the history of series "${logText(series)}": ${loaded.problem.reason}\nfix: ${loaded.problem.fix}`;
    const fails = loaded.problem.fault === 'configuration' || inputs.historyFailure === 'fail';
    await summary(sink, `### Bellgate release review\n\n> ${text.replace(/\n/g, ' ')}\n`);
    if (fails) sink.setFailed(text);
    else sink.warning(text);
    return { failed: fails, worse: 0 };
  }
  const current = context.ref?.startsWith('refs/tags/') ? context.ref.slice('refs/tags/'.length) : undefined;
  const found = await findReference(step, loaded.history, current);
  if (found === undefined) {
    const text = `no release tag before ${current ?? 'this run'} among the repository's tags: nothing to review`;
    sink.notice(`bellgate: ${text}`);
    await summary(sink, `### Bellgate release review\n\n${text}.\n`);
    return { failed: false, worse: 0 };
  }
  const { history, note: endNote } = untilCommit(loaded.history, context.sha);
  let report: SinceReport;
  try {
    report = reviewSince(history, found.reference, { worse: (name) => settingsFor(step.config, name).worse });
  } catch (error) {
    // The history may start after the reference (a new series, trimmed runs): nothing to compare.
    if (!(error instanceof InputError)) throw error;
    const text = `${found.note}: ${error.message}; nothing to review`;
    sink.notice(`bellgate: ${text}`);
    await summary(sink, `### Bellgate release review\n\n${text}.\n`);
    return { failed: false, worse: 0 };
  }
  const notes = [found.note, endNote].filter((n): n is string => n !== undefined);
  const markdown = renderSinceMarkdown(report, { notes });
  const reportAt = reportPath(context.runnerTemp, series).replace(/\.json$/, '.since.json');
  await step.writeText(reportAt, renderSinceJson(report));
  const worse = report.metrics.filter((m) => m.status === 'worse').length;
  sink.setOutput(OUTPUT.report, reportAt);
  sink.setOutput(OUTPUT.regressed, String(worse));
  await summary(sink, markdown);
  sink.info([...notes, renderSinceText(report).trimEnd()].join('\n'));
  const failed = inputs.sinceBlock && worse > 0;
  if (failed)
    sink.setFailed(
      `bellgate: ${worse} metric${worse === 1 ? '' : 's'} worse since the reference in series "${logText(series)}" (\`since-block: true\`; see the job summary)`,
    );
  return { failed, worse, summary: markdown };
}

async function summary(sink: ActionSink, markdown: string): Promise<void> {
  try {
    await sink.appendSummary(markdown);
  } catch (error) {
    sink.warning(`bellgate: could not write the job summary: ${describeError(error)}`);
  }
}

async function releaseApi(step: ReleaseReviewStep): Promise<ReleaseApi> {
  const api = (await step.api()).release;
  if (api === undefined) throw new Error('this GitHub client has no tag calls');
  return api;
}

/**
 * The reference `since` names, with a sentence on where it came from. A tag stands for its
 * commit; a commit without a recorded run gets its committer date, so the nearest earlier
 * recorded run stands in (resolveReference says so).
 */
async function findReference(
  step: ReleaseReviewStep,
  history: History,
  current: string | undefined,
): Promise<{ reference: SinceReference; note: string } | undefined> {
  const wanted = step.inputs.since;
  if (wanted !== PREVIOUS_RELEASE && history.runs.some((r) => r.id === wanted))
    return { reference: { run: wanted }, note: `reference: run ${wanted}, as given` };
  const api = await releaseApi(step);
  const tags = await api.listTags();
  const tag = wanted === PREVIOUS_RELEASE ? previousRelease(tags, current) : tags.find((t) => t.name === wanted);
  if (tag === undefined) {
    if (wanted === PREVIOUS_RELEASE) return undefined;
    return { reference: referenceFromText(wanted, history.runs), note: `reference: ${wanted}, as given` };
  }
  const how =
    wanted === PREVIOUS_RELEASE
      ? `the release before ${current ?? 'this run'}, found among the repository's tags`
      : 'as given';
  const note = `reference: tag ${tag.name} (commit ${tag.sha.slice(0, 12)}), ${how}`;
  const recorded = history.runs.some((r) => r.sha?.toLowerCase() === tag.sha.toLowerCase());
  if (recorded) return { reference: { sha: tag.sha }, note };
  const time = await api.commitTime(tag.sha);
  if (time === undefined) {
    throw new InputError(`tag ${tag.name}'s commit has no recorded run, and GitHub gave no commit time`, {
      where: 'input since',
      fix: 'give a run id or an ISO-8601 time as `since`',
    });
  }
  return { reference: { sha: tag.sha, time }, note };
}

/** The history up to this commit's newest recorded run; all of it (and a note) when it has none. */
function untilCommit(history: History, sha: string | undefined): { history: History; note?: string } {
  let end = -1;
  for (let i = history.runs.length - 1; i >= 0 && sha !== undefined; i--) {
    if (history.runs[i]!.sha?.toLowerCase() === sha.toLowerCase()) {
      end = i;
      break;
    }
  }
  if (end < 0) {
    return {
      history,
      note: `this commit${sha ? ` (${sha.slice(0, 12)})` : ''} has no recorded run: the review ends at the newest recorded run`,
    };
  }
  const columns = new Map(
    [...history.columns].map(([name, c]) => [name, { ...c, values: c.values.slice(0, end + 1) }]),
  );
  return { history: { ...history, runs: history.runs.slice(0, end + 1), columns } };
}
