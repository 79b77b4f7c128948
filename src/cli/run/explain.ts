import { InputError } from '../../errors/input-error.js';
import { renderExplain } from '../../report/explain.js';
import type { CommandContext } from '../context.js';
import { judgeRequestedRun, type RequestedRunOptions } from '../judge-requested-run.js';
import { closeNames } from '../close-names.js';

export type ExplainOptions = RequestedRunOptions;

/**
 * The work of `bellgate explain METRIC`: judges the run and
 * draws the one metric's decision on stdout.
 * @throws InputError for an unknown metric (naming the closest names), bad files or flags.
 * @example await runExplain(ctx, 'latency/geocode-p95', { history: 'h.json', series: 'default' })
 */
export async function runExplain(ctx: CommandContext, metric: string, options: ExplainOptions): Promise<void> {
  const { history, run, report } = await judgeRequestedRun(ctx, options);
  const result = report.metrics.find((m) => m.name === metric);
  if (result === undefined) {
    const known = [...new Set([...history.columns.keys(), ...run.metrics.keys()])];
    const near = closeNames(metric, known);
    throw new InputError(`no metric named "${metric}" in the history or this run`, {
      where: options.history,
      fix:
        near.length > 0
          ? `did you mean ${near.map((n) => `"${n}"`).join(' or ')}?`
          : 'run bellgate check to list the metric names',
    });
  }
  const width = Number(ctx.io.env.COLUMNS);
  const text = renderExplain({
    result,
    // The newest baseline values the gate kept, on the metric's own scale.
    baselineValues: result.recent ?? [],
    cutoff: result.effectiveCutoff ?? result.cutoff,
    report,
    color: ctx.color,
    ...(Number.isInteger(width) && width >= 40 ? { width: Math.min(width, 160) } : {}),
  });
  ctx.io.stdout(text.endsWith('\n') ? text : `${text}\n`);
}
