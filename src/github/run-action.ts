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
import { join } from 'node:path';
import { InputError } from '../model/input-error.js';
import { readConfigFile } from '../config/read.js';
import { settingsFor } from '../config/rules.js';
import type { Config } from '../config/types.js';
import { runGate } from '../gate/gate.js';
import type { Report } from '../gate/report.js';
import { artifactName, type ArtifactUploader } from '../history/artifact-store.js';
import { emptyHistory, type History, type RunInfo } from '../history/history.js';
import { appendRun, trimHistory } from '../history/merge.js';
import type { HistoryStore } from '../history/store.js';
import { readMetricFiles } from '../inputs/read-files.js';
import type { Run } from '../inputs/run.js';
import { renderHtmlReport } from '../report/html.js';
import { renderJson } from '../report/json.js';
import { renderMarkdown } from '../report/markdown.js';
import { commentMarker, markerLine } from '../report/marker.js';
import { annotate } from './annotations.js';
import { statusOf, type GitHubApi, type GitHubApiFactory, type RetryTuning } from './api.js';
import { upsertComment } from './comment.js';
import { readRunContext, type RunContext } from './context.js';
import { decideRecord, PULL_REQUEST_EVENTS } from './event-policy.js';
import { OUTPUT, readActionInputs, type ActionInputs } from './inputs.js';
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
  createStore?: (spec: StoreSpec) => HistoryStore;
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
  const config = await readConfigFile(inputs.config, { cwd: deps.cwd });
  const run = await readMetricFiles(inputs.metrics, {
    ...(inputs.inputFormat ?? config.inputFormat ? { format: inputs.inputFormat ?? config.inputFormat } : {}),
    limits: config.limits,
    aggregateFor: (name) => settingsFor(config, name).aggregate,
    cwd: deps.cwd,
  });
  const series = inputs.series ?? `${context.workflow}/${context.job}`;
  const baselineBranch = inputs.baselineBranch ?? context.defaultBranch;
  const decision = decideRecord(inputs.record, context, baselineBranch);
  if (decision.notice) sink.notice(`bellgate: not recording this run: ${decision.reason}`);
  else sink.info(`bellgate: series "${series}"; ${decision.record ? 'will record' : 'check only'} (${decision.reason})`);

  let api: GitHubApi | undefined;
  const apiOnce = (): GitHubApi => {
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
  const store = (deps.createStore ?? createHistoryStore)({
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
  const reportPath = join(context.runnerTemp, 'bellgate', `${artifactName('report', series)}.json`);
  await deps.writeText(reportPath, renderJson(report));
  sink.setOutput(OUTPUT.verdict, report.verdict);
  sink.setOutput(OUTPUT.regressed, String(regressed));
  sink.setOutput(OUTPUT.report, reportPath);
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
    recorded = await record(store, history, runInfo(context, deps.now()), run, config, inputs, sink);
    if (!recorded && inputs.historyFailure === 'fail') failed = true;
  }
  if (!readable && inputs.historyFailure === 'fail') failed = true;

  if (report.verdict === 'regressed' && inputs.block) {
    sink.setFailed(`bellgate: ${regressed} metric${regressed === 1 ? '' : 's'} regressed in series "${series}" (see the job summary)` +
      (context.pullRequest ? `; add the label "${inputs.acceptLabel}" to the pull request to accept` : ''));
    failed = true;
  } else if (report.verdict === 'regressed') {
    sink.warning(`bellgate: ${regressed} metric(s) regressed; not failing because block is false`);
  } else if (failed) {
    sink.setFailed('bellgate: the history store failed and `history-failure: fail` is set');
  }
  if (report.verdict === 'accepted') sink.notice(`bellgate: regressions accepted by the label "${inputs.acceptLabel}"`);
  return { failed, report, recorded, ...(comment ? { comment } : {}) };
}

async function loadHistory(store: HistoryStore, series: string, inputs: ActionInputs, sink: ActionSink): Promise<{ history: History; readable: boolean }> {
  try {
    const history = await store.load();
    sink.info(`bellgate: read ${history.runs.length} baseline runs from ${store.describe()}`);
    return { history, readable: true };
  } catch (error) {
    if (!isStoreError(error)) throw error;
    const message = `bellgate: the history could not be fetched from ${store.describe()}: ${describeError(error)}`;
    if (inputs.historyFailure === 'fail') sink.error(message);
    else sink.warning(`${message}\nGoing on without history (every metric is new); set \`history-failure: fail\` to fail instead.`);
    return { history: emptyHistory(series), readable: false };
  }
}

async function record(store: HistoryStore, history: History, info: RunInfo, run: Run, config: Config, inputs: ActionInputs, sink: ActionSink): Promise<boolean> {
  try {
    const next = trimHistory(appendRun(history, info, run), config.keep);
    await store.save(next, history.runs.length);
    sink.info(`bellgate: recorded run ${info.id} in ${store.describe()} (${next.runs.length} runs)`);
    return true;
  } catch (error) {
    if (!isStoreError(error)) throw error;
    const message = `bellgate: could not record run ${info.id} in ${store.describe()}: ${describeError(error)}`;
    if (inputs.historyFailure === 'fail') sink.error(message);
    else sink.warning(message);
    return false;
  }
}

async function postComment(api: () => GitHubApi, context: RunContext, inputs: ActionInputs, marker: string, markdown: string, flagged: boolean, sink: ActionSink): Promise<string | undefined> {
  const pr = context.pullRequest;
  if (!pr) return undefined;
  try {
    const outcome = await upsertComment(api(), pr.number, marker, markdown, inputs.comment, flagged);
    sink.info(`bellgate: PR comment ${outcome}`);
    return outcome;
  } catch (error) {
    const status = statusOf(error);
    // A fork's pull_request run gets a read-only token: 403 (or 404) on comment writes.
    const why = status === 403 || status === 404
      ? `the token may not comment on pull request #${pr.number}${pr.fromFork ? ' (a fork PR gets a read-only token)' : ' (give the job `permissions: pull-requests: write`)'}`
      : `the comment on pull request #${pr.number} failed: ${describeError(error)}`;
    sink.warning(`bellgate: ${why}; the report is in the job summary`);
    return 'failed';
  }
}

/** The HTML report is extra: written beside the JSON report and uploaded; a failure only warns. */
async function uploadHtml(deps: ActionDeps, context: RunContext, series: string, report: Report, history: History, retentionDays: number): Promise<void> {
  // One artifact per series and attempt: artifact names must be unique within a workflow run.
  const name = `${artifactName('bellgate-report', series)}-${context.attempt}`;
  try {
    const html = renderHtmlReport({ report, history, generatedAt: deps.now().toISOString() });
    await deps.writeText(join(context.runnerTemp, 'bellgate', `${name}.html`), html);
    await deps.upload(name, 'report.html', html, retentionDays);
    deps.sink.info(`bellgate: uploaded the HTML report as artifact ${name}`);
  } catch (error) {
    deps.sink.warning(`bellgate: could not upload the HTML report: ${describeError(error)}`);
  }
}

function runInfo(context: RunContext, now: Date): RunInfo {
  const info: RunInfo = { id: context.runId, event: context.eventName, time: now.toISOString() };
  if (context.sha) info.sha = context.sha;
  if (context.ref) info.ref = context.ref;
  return info;
}

function isStoreError(error: unknown): boolean {
  return error instanceof Error && error.name === 'StoreError';
}

/** One plain line (plus a fix), never a stack trace. */
export function describeError(error: unknown): string {
  if (error && typeof (error as { describe?: unknown }).describe === 'function') return (error as { describe(): string }).describe();
  if (error instanceof Error) return error.message;
  return String(error);
}
