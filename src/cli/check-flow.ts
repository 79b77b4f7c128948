import { runGate } from '../gate/gate.js';
import { mostlyMissing } from '../gate/missing-metrics.js';
import type { Report } from '../gate/report.js';
import { renderJson } from '../report/json.js';
import { renderMarkdown } from '../report/markdown.js';
import { renderText } from '../report/text.js';
import { InputError } from '../errors/input-error.js';
import { withExactPlace } from '../inputs/exact-place.js';
import { alignRunUnits } from '../inputs/units.js';
import type { CommandContext } from './context.js';
import { EXIT } from './exit-codes.js';
import { loadConfig } from '../config/load.js';
import { loadRun, type MetricFileOptions } from './load-run.js';
import { runsToRead } from '../history/read-window.js';
import { machineFacts, runnerFingerprint } from '../history/runner-fingerprint.js';
import { openHistory } from './open-history.js';
import { resolvePath } from './paths.js';
import { recordRun } from './record-run.js';
import { runInfoFrom, type RunInfoOptions } from './run-info.js';
import { writeReports } from './write-reports.js';

import type { ReportFormat } from './options.js';

export { REPORT_FORMATS, type ReportFormat } from './options.js';

/** Everything `bellgate check` (and the demo) can be asked to do. */
export interface CheckOptions extends MetricFileOptions, RunInfoOptions {
  history?: string;
  config?: string;
  series: string;
  format: ReportFormat;
  out?: string;
  record?: boolean;
  /** List every ok metric in the text report (by default more than OK_ROWS_LISTED are counted). */
  all?: boolean;
  /** A run lacking more than half of its baseline metrics: `warn` (default) or `fail` (exit 2). */
  missingMetrics?: MissingMetricsPolicy;
}

export type MissingMetricsPolicy = 'warn' | 'fail';

/**
 * read -> load -> (gate: select, fit, score, decide) -> render -> record. Prints the report in the
 * chosen format on stdout (JSON: nothing else on stdout; notes go to stderr), writes `--out` files,
 * records the run when asked, and returns the report. The caller turns the verdict into the exit code.
 * @throws InputError (bad files, flags), StoreError (history unreadable or unwritable).
 */
export async function performCheck(ctx: CommandContext, options: CheckOptions): Promise<Report> {
  if (options.record && options.history === undefined) {
    throw new InputError('--record needs --history FILE', {
      where: '--record',
      fix: 'name the history file to append this run to',
    });
  }
  const config = await loadConfig(options.config, ctx.io.cwd);
  const read = await loadRun(ctx, config, options);
  // Read after the config and metric files, so their problems are reported first; only the
  // newest runs the gate can use are read (from the end of the file).
  const { history, store } = await openHistory(ctx, options.history, options.series, runsToRead(config));
  // Values in the units the history stores (0.121 s against ms becomes 121 ms), or a refusal.
  const run = await withExactPlace(() => alignRunUnits(read, (name) => history.columns.get(name)?.unit), ctx.io.cwd);
  if (options.history === undefined) {
    // Without a history nothing can regress: said, so a forgotten flag is not a quiet pass.
    ctx.io.stderr('bellgate: note: no --history given, so every metric is new and nothing is judged\n');
  } else if (history.runs.length === 0) {
    // Said out loud because a mistyped --history would otherwise pass quietly as "learning".
    ctx.io.stderr(`bellgate: note: ${options.history} holds no runs yet (missing or empty), so every metric is new\n`);
  }
  // This machine's fingerprint: timings are judged against baseline runs of the same runner when there are enough.
  const runner = runnerFingerprint(ctx.io.env, ctx.io.machine ?? machineFacts());
  const report = runGate({ config, history, run, series: options.series, runner });

  ctx.io.stdout(ensureNewline(render(ctx, report, options.format, options.all)));
  if (mostlyMissing(report.missing)) {
    const { count, of } = report.missing!;
    ctx.io.stderr(
      `bellgate: ${options.missingMetrics === 'fail' ? 'error' : 'warning'}: ${count} of ${of} baseline metrics are missing from this run` +
        (options.missingMetrics === 'fail'
          ? ' (--missing-metrics fail)\n'
          : '; --missing-metrics fail makes this exit 2\n'),
    );
  }
  if (options.out !== undefined) {
    const written = await writeReports(resolvePath(ctx, options.out), report);
    ctx.io.stderr(`bellgate: wrote ${written.join(', ')}\n`);
  }
  if (options.record && store) {
    const info = runInfoFrom(ctx, options);
    const saved = await recordRun(store, info, run, config.keep);
    ctx.io.stderr(`bellgate: recorded run ${info.id} in ${store.describe()} (${saved.runs} runs)\n`);
  }
  return report;
}

/**
 * The exit code a verdict stands for: `regressed` fails, and `unsettled` with `unsettled: block`
 * (report.blocks); with `--missing-metrics fail`, a run lacking most of its baseline metrics is bad
 * input (2).
 */
export function verdictExitCode(report: Report, missing: MissingMetricsPolicy = 'warn'): number {
  if (missing === 'fail' && mostlyMissing(report.missing)) return EXIT.input;
  return report.blocks ? EXIT.regressed : EXIT.ok;
}

function render(ctx: CommandContext, report: Report, format: ReportFormat, all = false): string {
  if (format === 'json') return renderJson(report);
  if (format === 'markdown') return renderMarkdown(report, {});
  return renderText(report, { color: ctx.color, all });
}

function ensureNewline(s: string): string {
  return s.endsWith('\n') ? s : `${s}\n`;
}
