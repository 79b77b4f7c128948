import { runGate } from '../gate/gate.js';
import type { Report } from '../gate/report.js';
import type { Config } from '../config/types.js';
import type { History } from '../history/history.js';
import type { Run } from '../inputs/run.js';
import { withExactPlace } from '../inputs/exact-place.js';
import { alignRunUnits } from '../inputs/units.js';
import type { CommandContext } from './context.js';
import { loadConfig } from '../config/load.js';
import { loadRun, type MetricFileOptions } from './load-run.js';
import { openHistory } from './open-history.js';
import { machineFacts, runnerFingerprint } from '../history/runner-fingerprint.js';
import { splitNewest } from './split-newest.js';

export interface RequestedRunOptions extends Partial<MetricFileOptions> {
  history: string;
  config?: string;
  series: string;
}

/**
 * The run `explain` and `report` look at, judged: the metric files given with --metrics against
 * the whole history, or without them the newest recorded run against the runs before it.
 * @throws InputError (bad files, flags), StoreError (history unreadable).
 * @example await judgeRequestedRun(ctx, { history: 'h.json', series: 'default' }) // { config, history, run, report }
 */
export async function judgeRequestedRun(
  ctx: CommandContext,
  options: RequestedRunOptions,
): Promise<{ config: Config; history: History; run: Run; report: Report }> {
  const config = await loadConfig(options.config, ctx.io.cwd);
  const opened = await openHistory(ctx, options.history, options.series);
  const metrics = options.metrics;
  // The runner: the newest recorded run's own fingerprint, or this machine's for metric files.
  const newest = opened.history.runs.at(-1)?.runner;
  const runner = metrics === undefined ? newest : runnerFingerprint(ctx.io.env, ctx.io.machine ?? machineFacts());
  const { history, run } =
    metrics === undefined
      ? splitNewest(opened.history, options.history)
      : {
          history: opened.history,
          // In the units the history stores, or a refusal naming the file's line and both units.
          run: await withExactPlace(
            async () =>
              alignRunUnits(
                await loadRun(ctx, config, { ...options, metrics }),
                (name) => opened.history.columns.get(name)?.unit,
              ),
            ctx.io.cwd,
          ),
        };
  return {
    config,
    history,
    run,
    report: runGate({ config, history, run, series: options.series, ...(runner === undefined ? {} : { runner }) }),
  };
}
