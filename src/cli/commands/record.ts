import { Command } from 'commander';
import type { CommandContext } from '../context.js';
import { loadConfig } from '../load-config.js';
import { loadRun, type MetricFileOptions } from '../load-run.js';
import { openHistory } from '../open-history.js';
import { recordRun } from '../record-run.js';
import { runInfoFrom, type RunInfoOptions } from '../run-info.js';
import { configOption, examples, historyOption, inputOptions, metricsOption, runInfoOptions, seriesOption } from '../options.js';

interface RecordOptions extends MetricFileOptions, RunInfoOptions {
  history: string;
  config?: string;
  series: string;
}

/** `bellgate record`: appends a trusted run (a baseline-branch build) to the history file, without judging it. */
export function recordCommand(ctx: CommandContext): Command {
  const cmd = new Command('record').description('append a trusted run to the history file (no judging)');
  metricsOption(cmd, true);
  historyOption(cmd, true, 'history file to append to (created when missing; never overwritten when unreadable)');
  configOption(cmd);
  seriesOption(cmd);
  runInfoOptions(cmd);
  inputOptions(cmd);
  examples(cmd, [
    'bellgate record --metrics bench.json --history .bellgate/history.json',
    'bellgate record --metrics bench.json --history h.json --id 8812-1 --sha 3f2a9c1 --ref refs/heads/main --time 2026-05-04T10:20:30Z',
  ]);
  return cmd.action(async (options: RecordOptions) => {
    const config = await loadConfig(ctx, options.config);
    const run = await loadRun(ctx, config, options);
    const { history, store } = await openHistory(ctx, options.history, options.series);
    const info = runInfoFrom(ctx, options);
    // openHistory always returns a store when a path is given; the guard keeps the types honest.
    if (!store) return;
    const saved = await recordRun(store, history, info, run, config.keep);
    const replaced = history.runs.some((r) => r.id === info.id) ? ' (replacing the earlier run with this id)' : '';
    ctx.io.stdout(
      `recorded run ${info.id} with ${run.metrics.size} metrics in ${store.describe()}${replaced}; ${saved.runs.length} runs kept\n`,
    );
  });
}
