/**
 * The action, end to end: inputs -> context -> config -> metric files -> history -> gate ->
 * record -> outputs, summary, job log, annotations, PR comment. Effects go through `deps` only.
 *
 * Failure policy (what fails the step, what only warns):
 * - FAILS: a bad input or config, unreadable metric files, a missing GITHUB_* variable (message
 *   names the input/file and the fix); a regression when `block: true` and the pull request does
 *   not carry the accept label (read from the API at run time); a history store configuration
 *   fault (the history belongs to another series, is not a history, or needs a permission the job
 *   lacks: `actions: read`, `contents: write`); a store that cannot be reached when
 *   `history-failure: fail`; a run lacking most of its baseline metrics when `missing-metrics: fail`.
 * - WARNS: a store that cannot be reached (default `history-failure: warn`: the run goes on as if
 *   there were no history, every metric `new`, and nothing is recorded so nothing is buried); a
 *   run lacking most of its baseline metrics (default `missing-metrics: warn`); a corrupt history
 *   artifact among good ones (skipped); a PR comment the token may not write (a fork's pull request
 *   cannot be given `pull-requests: write`); labels, or the merged pull request of a regressed
 *   recording run, that cannot be read; a job summary that cannot be written.
 * - A regressed recording run that merged a pull request carrying the accept label is `accepted`
 *   and recorded with a level mark for the metrics it accepted (merged-acceptance.ts).
 * - NOTICE only: an event that is checked but never recorded (e.g. `release`), an accepted run.
 * Whenever the history was not used or the run not recorded, the summary, the PR comment and the
 * job log open with a line that says so and why. Nothing prints a stack trace or the token.
 */
import { loadConfig } from '../config/load.js';
import { settingsFor } from '../config/rules.js';
import { runGate } from '../gate/gate.js';
import { mostlyMissing } from '../gate/missing-metrics.js';
import type { Report } from '../gate/report.js';
import type { ArtifactUploader } from '../history/artifact-store.js';
import { runsToRead } from '../history/read-window.js';
import { machineFacts, runnerFingerprint, type MachineFacts } from '../history/runner-fingerprint.js';
import type { HistoryStore } from '../history/store.js';
import { readMetricFiles } from '../inputs/read-files.js';
import { withExactPlace } from '../inputs/exact-place.js';
import { alignRunUnits } from '../inputs/units.js';
import { InputError } from '../errors/input-error.js';
import { renderJson } from '../report/json.js';
import { renderMarkdown } from '../report/markdown.js';
import { commentMarker, markerLine } from '../report/marker.js';
import { renderText } from '../report/text.js';
import { acceptLabelSource } from './accept-label.js';
import { annotate } from './annotations.js';
import type { GitHubApi, GitHubApiFactory } from './api.js';
import type { RetryTuning } from './retry-after.js';
import { readRunContext } from './context.js';
import { describeError } from './describe-error.js';
import { decideRecord, PULL_REQUEST_EVENTS } from './event-policy.js';
import { loadHistory, recordRun, runInfo } from './history-step.js';
import { acceptedMark, mergedPull, type MergedPull } from './merged-acceptance.js';
import { maintenanceRun } from './maintenance-run.js';
import { uploadHtml } from './html-report.js';
import { OUTPUT, readActionInputs, type ActionInputs, type InputReader } from './inputs.js';
import { logText } from './log-text.js';
import { startComment } from './pr-comment.js';
import { runReleaseReview } from './release-review.js';
import { reportPath } from './report-path.js';
import type { ActionSink } from './sink.js';
import { createHistoryStore, type StoreSpec } from './store-factory.js';
import type { StoreProblem } from './store-fault.js';

export interface ActionDeps {
  /** The runner's GITHUB_* and RUNNER_* variables. */
  env: Record<string, string | undefined>;
  /** The step's inputs by their action.yml names (@actions/core's getInput in the action). */
  getInput: InputReader;
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
  /** The machine, for the runner fingerprint of a recorded run (default: node:os of this process). */
  machine?: MachineFacts;
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
  const inputs = readActionInputs(deps.getInput);
  if (inputs.token !== '') sink.setSecret(inputs.token);
  const context = await readRunContext(deps.env, deps.readText);
  const series = inputs.series ?? `${context.workflow}/${context.job}`;
  const shownSeries = logText(series);
  const baselineBranch = inputs.baselineBranch ?? context.defaultBranch;

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
      log: (m) => sink.info(`bellgate: ${logText(m)}`),
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
    info: (m) => sink.info(`bellgate: ${m}`),
  });
  if (inputs.maintenance !== undefined) {
    await maintenanceRun(inputs.maintenance, inputs.series, store, deps);
    return { failed: false, recorded: false };
  }
  // A missing file at the default path means default settings; a missing named file is an error.
  const config = await loadConfig(inputs.config, deps.cwd);
  // Release mode: review since a reference instead of checking this run (release-review.ts).
  if (inputs.since !== undefined) {
    const review = await runReleaseReview({
      ...deps,
      inputs: { ...inputs, since: inputs.since },
      context,
      config,
      store,
      series,
      api: apiOnce,
    });
    return { failed: review.failed, recorded: false };
  }
  // The comment's lookup goes out now: its answer comes while the history loads and the gate runs.
  const postComment =
    PULL_REQUEST_EVENTS.includes(context.eventName) && context.pullRequest
      ? startComment(apiOnce, context, inputs, sink)
      : undefined;
  const decision = decideRecord(inputs.record, context, baselineBranch);
  if (decision.notice) sink.notice(`bellgate: not recording this run: ${decision.reason}`);
  else
    sink.info(
      `bellgate: series "${shownSeries}"; ${decision.record ? 'will record' : 'check only'} (${decision.reason})`,
    );

  const read = await readMetricFiles(inputs.metrics, {
    ...((inputs.inputFormat ?? config.inputFormat) ? { format: inputs.inputFormat ?? config.inputFormat } : {}),
    limits: config.limits,
    aggregateFor: (name) => settingsFor(config, name).aggregate,
    cwd: deps.cwd,
  });
  const setting = { store: inputs.store, history: inputs.history };

  const loaded = await loadHistory(store, series, setting, sink, runsToRead(config));
  const { history } = loaded;
  // Values in the units the history stores them in, or a refusal naming file, line and units.
  const run = await withExactPlace(() => alignRunUnits(read, (name) => history.columns.get(name)?.unit), deps.cwd);
  const runner = runnerFingerprint(deps.env, deps.machine ?? machineFacts());
  let report = runGate({ config, history, run, series, runner, accepted: false });
  const info = runInfo(context, deps.now(), runner);
  let merged: MergedPull | undefined;
  if (report.verdict === 'regressed') {
    // Labels matter only now; the payload's may be stale (a label added after the push, a re-run).
    const source = await acceptLabelSource(apiOnce, context, inputs.acceptLabel, sink);
    // A recording run that merged an accepted pull request starts a new level of what it accepted.
    merged =
      source === undefined && decision.record && loaded.problem === undefined && context.sha && baselineBranch
        ? await mergedPull(apiOnce, context.sha, baselineBranch, inputs.acceptLabel, sink)
        : undefined;
    if (merged !== undefined) info.pr = merged.number;
    const mark = merged?.accepted ? acceptedMark(regressedNames(report), merged.number) : undefined;
    if (mark !== undefined) info.marks = [mark];
    if (source !== undefined || mark !== undefined)
      report = runGate({ config, history, run, series, runner, accepted: true });
  }

  let recorded = false;
  let saveProblem: StoreProblem | undefined;
  if (decision.record && loaded.problem === undefined) {
    saveProblem = (await recordRun(store, info, run, config.keep, setting, sink)).problem;
    recorded = saveProblem === undefined;
  }
  const notes = [
    ...(loaded.problem ? [problemNote('the history was not used', loaded.problem, inputs)] : []),
    ...(saveProblem ? [problemNote('this run was not recorded', saveProblem, inputs)] : []),
    ...(loaded.problem && decision.record
      ? ['this run was not recorded: a history that could not be read is never overwritten']
      : []),
  ];
  if (notes.length > 0) report = { ...report, notes };

  const regressed = report.metrics.filter((m) => m.status === 'regressed').length;
  const flagged = report.metrics.some((m) => m.status === 'regressed' || m.status === 'improved');
  const runUrl = `${context.serverUrl}/${context.owner}/${context.repo}/actions/runs/${context.runNumericId}`;
  const marker = commentMarker(series);
  const reportAt = reportPath(context.runnerTemp, series);
  await deps.writeText(reportAt, renderJson(report));
  sink.setOutput(OUTPUT.verdict, report.verdict);
  sink.setOutput(OUTPUT.regressed, String(regressed));
  sink.setOutput(OUTPUT.report, reportAt);
  try {
    await sink.appendSummary(renderMarkdown(report, { runUrl }));
  } catch (error) {
    sink.warning(`bellgate: could not write the job summary: ${describeError(error)}`);
  }
  // The verdict table in the job log, opening with the same notes as the summary.
  sink.info(renderText(report, { color: false }).trimEnd());

  // The step's own annotations come first, so GitHub's per-step limit never hides them.
  const failures = stepFailures(report, regressed, loaded.problem, saveProblem, inputs, series, context);
  const used = { error: 0, notice: 0 };
  if (failures.length > 0) {
    sink.setFailed(failures.join('\n'));
    used.error += 1;
  }
  for (const problem of [loaded.problem, saveProblem]) {
    if (problem?.fault === 'outage' && inputs.historyFailure === 'warn')
      sink.warning(`bellgate: ${problem.reason}\nfix: ${problem.fix}; the run went on without the history store`);
  }
  if (mostlyMissing(report.missing) && inputs.missingMetrics === 'warn') {
    sink.warning(
      `bellgate: ${report.missing!.count} of ${report.missing!.of} baseline metrics are missing from this run in series "${shownSeries}"; set \`missing-metrics: fail\` to fail the step instead`,
    );
  }
  if (report.verdict === 'regressed' && !inputs.block)
    sink.warning(`bellgate: ${regressed} metric(s) regressed; not failing because block is false`);
  if (report.verdict === 'accepted') {
    const by = merged?.accepted
      ? ` of the merged pull request #${merged.number}; ${recorded ? 'a new level starts at this run' : 'no new level was stored (this run was not recorded)'}`
      : '';
    sink.notice(
      `bellgate: ${regressed} regression${regressed === 1 ? '' : 's'} accepted by the label "${logText(inputs.acceptLabel)}"${by}`,
    );
    used.notice += 1;
  }
  annotate(report, sink, series, used);
  if (inputs.htmlReport) await uploadHtml(deps, context, series, report, history, inputs.retentionDays);

  const comment = postComment
    ? await postComment(markerLine(marker), renderMarkdown(report, { marker, runUrl }), flagged || notes.length > 0)
    : undefined;
  return { failed: failures.length > 0, report, recorded, ...(comment ? { comment } : {}) };
}

const regressedNames = (report: Report): string[] =>
  report.metrics.filter((m) => m.status === 'regressed').map((m) => m.name);

/** The note a report opens with when the store failed: what did not happen, why, and the fix. */
function problemNote(what: string, problem: StoreProblem, inputs: ActionInputs): string {
  const policy =
    problem.fault === 'configuration'
      ? 'this fails the step'
      : inputs.historyFailure === 'fail'
        ? 'the store could not be reached and `history-failure: fail` is set'
        : 'the store could not be reached; the run went on without it (`history-failure: warn`)';
  return `Bellgate: ${what}: ${problem.reason} (${policy}). Fix: ${problem.fix}`;
}

/** Every reason the step fails, most important first; empty when it passes. */
function stepFailures(
  report: Report,
  regressed: number,
  load: StoreProblem | undefined,
  save: StoreProblem | undefined,
  inputs: ActionInputs,
  series: string,
  context: { pullRequest?: unknown; queuedPullRequest?: number },
): string[] {
  const out: string[] = [];
  const shown = logText(series);
  if (report.verdict === 'regressed' && inputs.block) {
    out.push(
      `bellgate: ${regressed} metric${regressed === 1 ? '' : 's'} regressed in series "${shown}" (see the job summary)` +
        (context.pullRequest || context.queuedPullRequest
          ? `; add the label "${logText(inputs.acceptLabel)}" to the pull request and re-run this job to accept`
          : ''),
    );
  }
  if (report.verdict === 'unsettled' && report.blocks && inputs.block) {
    out.push(
      `bellgate: every timing moved together beyond what the history has shown in series "${shown}"; re-run the check, or record a baseline run on the same runner (\`unsettled: block\` is set)`,
    );
  }
  for (const [what, problem] of [
    ['the history was not used', load],
    ['this run was not recorded', save],
  ] as const) {
    if (problem === undefined) continue;
    if (problem.fault === 'configuration' || inputs.historyFailure === 'fail')
      out.push(`bellgate: ${what} in series "${shown}": ${problem.reason}\nfix: ${problem.fix}`);
  }
  if (mostlyMissing(report.missing) && inputs.missingMetrics === 'fail') {
    out.push(
      `bellgate: ${report.missing!.count} of ${report.missing!.of} baseline metrics are missing from this run in series "${shown}" (\`missing-metrics: fail\`)`,
    );
  }
  return out;
}
