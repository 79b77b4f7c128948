/**
 * The action, end to end: inputs -> context -> config -> metric files -> history -> gate ->
 * outputs, summary, annotations, PR comment -> record. Effects go through `deps` only.
 *
 * Failure policy (what fails the step, what only warns):
 * - FAILS: a bad input or config, unreadable metric files, a missing GITHUB_* variable (message
 *   names the input/file and the fix); a regression when `block: true` and the PR does not carry
 *   the accept label; a history that cannot be fetched or saved when `history-failure: fail`.
 * - WARNS: a history that cannot be fetched (default `history-failure: warn`: the run goes on as
 *   if there were no history, every metric `new`, and nothing is recorded so nothing is buried);
 *   a history that cannot be saved (same input); a corrupt history artifact (skipped, the others
 *   are merged); a PR comment the token may not write (fork PRs: summary only); a job summary
 *   that cannot be written.
 * - NOTICE only: an event that is checked but never recorded (e.g. `release`).
 * Nothing prints a stack trace or the token (it is masked first).
 */
import { settingsFor } from '../config/rules.js';
import { runGate } from '../gate/gate.js';
import type { Report } from '../gate/report.js';
import type { ArtifactUploader } from '../history/artifact-store.js';
import type { HistoryStore } from '../history/store.js';
import { readMetricFiles } from '../inputs/read-files.js';
import { InputError } from '../errors/input-error.js';
import { renderJson } from '../report/json.js';
import { renderMarkdown } from '../report/markdown.js';
import { commentMarker, markerLine } from '../report/marker.js';
import { annotate } from './annotations.js';
import type { GitHubApi, GitHubApiFactory, RetryTuning } from './api.js';
import { readRunContext } from './context.js';
import { describeError } from './describe-error.js';
import { loadActionConfig } from './load-config.js';
import { decideRecord, PULL_REQUEST_EVENTS } from './event-policy.js';
import { loadHistory, recordRun, runInfo } from './history-step.js';
import { uploadHtml } from './html-report.js';
import { OUTPUT, readActionInputs } from './inputs.js';
import { postComment } from './pr-comment.js';
import { reportPath } from './report-path.js';
import type { ActionSink } from './sink.js';
import { createHistoryStore, type StoreSpec } from './store-factory.js';

export interface ActionDeps {
  env: Record<string, string | undefined>;
  /** Working directory: the checkout (GITHUB_WORKSPACE); metric globs and config resolve here. */
  cwd: string;
  sink: ActionSink;
  readText(path: string): Promise<string>;
  /** Writes a file, creating its folder. */
  writeText(path: string, text: string): Promise<void>;
  now(): Date;
  createApi: GitHubApiFactory;
  upload: ArtifactUploader;
  createStore?: (spec: StoreSpec) => HistoryStore | Promise<HistoryStore>;
  retry?: RetryTuning;
}

/** The result, for callers and tests; the step's failure itself goes through sink.setFailed. */
export interface ActionResult {
  failed: boolean;
  report?: Report;
  recorded: boolean;
  comment?: string;
}

/**
 * Runs the action once. Never throws: every failure becomes sink.setFailed with a plain message.
 * @example await runAction(realDeps()) // { failed: false, recorded: true, ... }
 */
export async function runAction(deps: ActionDeps): Promise<ActionResult> {
  const { sink } = deps;
  try {
    return await perform(deps);
  } catch (error) {
    sink.setFailed(describeError(error));
    return { failed: true, recorded: false };
  }
}

async function perform(deps: ActionDeps): Promise<ActionResult> {
  const { sink } = deps;
  const inputs = readActionInputs(deps.env);
  if (inputs.token !== '') sink.setSecret(inputs.token);
  const context = await readRunContext(deps.env, deps.readText);
  // A missing file at the default path means default settings; a missing named file is an error.
  const config = await loadActionConfig(inputs.config, deps.cwd);
  const run = await readMetricFiles(inputs.metrics, {
    ...((inputs.inputFormat ?? config.inputFormat) ? { format: inputs.inputFormat ?? config.inputFormat } : {}),
    limits: config.limits,
    aggregateFor: (name) => settingsFor(config, name).aggregate,
    cwd: deps.cwd,
  });
  const series = inputs.series ?? `${context.workflow}/${context.job}`;
  const baselineBranch = inputs.baselineBranch ?? context.defaultBranch;
  const decision = decideRecord(inputs.record, context, baselineBranch);
  if (decision.notice) sink.notice(`bellgate: not recording this run: ${decision.reason}`);
  else
    sink.info(`bellgate: series "${series}"; ${decision.record ? 'will record' : 'check only'} (${decision.reason})`);

  let api: GitHubApi | Promise<GitHubApi> | undefined;
  const apiOnce = (): GitHubApi | Promise<GitHubApi> => {
    if (inputs.token === '') {
      throw new InputError('input `token` is empty, but the GitHub API is needed (history artifacts, PR comment)', {
        where: 'input token',
        fix: 'leave `token` at its default (${{ github.token }}) or pass a token that may read actions and write pull requests',
      });
    }
    api ??= deps.createApi({
      token: inputs.token,
      baseUrl: context.apiUrl,
      owner: context.owner,
      repo: context.repo,
      ...(deps.retry ? { retry: deps.retry } : {}),
      log: (m) => sink.info(`bellgate: ${m}`),
    });
    return api;
  };
  const store = await (deps.createStore ?? createHistoryStore)({
    kind: inputs.store,
    history: inputs.history,
    series,
    baselineBranch: baselineBranch ?? '',
    repositoryId: context.repositoryId,
    retentionDays: inputs.retentionDays,
    workspace: deps.cwd,
    api: apiOnce,
    upload: deps.upload,
    warn: (m) => sink.warning(`bellgate: ${m}`),
  });

  const { history, readable } = await loadHistory(store, series, inputs, sink);
  const accepted = context.pullRequest?.labels.includes(inputs.acceptLabel) ?? false;
  const report = runGate({ config, history, run, series, accepted });
  const regressed = report.metrics.filter((m) => m.status === 'regressed').length;
  const flagged = report.metrics.some((m) => m.status === 'regressed' || m.status === 'improved');

  const runUrl = `${context.serverUrl}/${context.owner}/${context.repo}/actions/runs/${context.runNumericId}`;
  const marker = commentMarker(series);
  const markdown = renderMarkdown(report, { marker, runUrl });
  const reportAt = reportPath(context.runnerTemp, series);
  await deps.writeText(reportAt, renderJson(report));
  sink.setOutput(OUTPUT.verdict, report.verdict);
  sink.setOutput(OUTPUT.regressed, String(regressed));
  sink.setOutput(OUTPUT.report, reportAt);
  try {
    await sink.appendSummary(markdown);
  } catch (error) {
    sink.warning(`bellgate: could not write the job summary: ${describeError(error)}`);
  }
  annotate(report, sink, series);
  if (inputs.htmlReport) await uploadHtml(deps, context, series, report, history, inputs.retentionDays);

  let comment: string | undefined;
  if (PULL_REQUEST_EVENTS.includes(context.eventName) && context.pullRequest) {
    comment = await postComment(apiOnce, context, inputs, markerLine(marker), markdown, flagged, sink);
  }

  let recorded = false;
  let failed = false;
  if (decision.record && !readable) {
    sink.warning('bellgate: not recording this run, because the history could not be read (it is never overwritten)');
  } else if (decision.record) {
    recorded = await recordRun(store, history, runInfo(context, deps.now()), run, config.keep, inputs, sink);
    if (!recorded && inputs.historyFailure === 'fail') failed = true;
  }
  if (!readable && inputs.historyFailure === 'fail') failed = true;

  if (report.verdict === 'regressed' && inputs.block) {
    sink.setFailed(
      `bellgate: ${regressed} metric${regressed === 1 ? '' : 's'} regressed in series "${series}" (see the job summary)` +
        (context.pullRequest ? `; add the label "${inputs.acceptLabel}" to the pull request to accept` : ''),
    );
    failed = true;
  } else if (report.verdict === 'unsettled' && report.blocks && inputs.block) {
    sink.setFailed(
      `bellgate: every timing moved together beyond what the history has shown in series "${series}"; re-run the check, or record a baseline run on the same runner (\`unsettled: block\` is set)`,
    );
    failed = true;
  } else if (report.verdict === 'regressed') {
    sink.warning(`bellgate: ${regressed} metric(s) regressed; not failing because block is false`);
  } else if (failed) {
    sink.setFailed('bellgate: the history store failed and `history-failure: fail` is set');
  }
  if (report.verdict === 'accepted') sink.notice(`bellgate: regressions accepted by the label "${inputs.acceptLabel}"`);
  return { failed, report, recorded, ...(comment ? { comment } : {}) };
}
