import type { CommandContext } from '../context.js';
import { loadConfig } from '../load-config.js';
import { loadRun, type MetricFileOptions } from '../load-run.js';
import { openEarly } from '../open-history.js';
import { recordRun } from '../record-run.js';
import { runInfoFrom, type RunInfoOptions } from '../run-info.js';

export interface RecordOptions extends MetricFileOptions, RunInfoOptions {
  history: string;
  config?: string;
  series: string;
}

/**
 * The work of `bellgate record` (loaded only when that command runs): appends the run to the
 * history file and says how many runs are kept.
 * @throws InputError (bad files, flags), StoreError (history unreadable or unwritable).
 * @example await runRecord(ctx, { metrics: ['bench.json'], history: 'h.json', series: 'default' })
 */
export async function runRecord(ctx: CommandContext, options: RecordOptions): Promise<void> {
  const opening = openEarly(ctx, options.history, options.series);
  const config = await loadConfig(ctx, options.config);
  const run = await loadRun(ctx, config, options);
  const { history, store } = await opening;
  const info = runInfoFrom(ctx, options);
  // openHistory always returns a store when a path is given; the guard keeps the types honest.
  if (!store) return;
  const saved = await recordRun(store, history, info, run, config.keep);
  const replaced = history.runs.some((r) => r.id === info.id) ? ' (replacing the earlier run with this id)' : '';
  ctx.io.stdout(
    `recorded run ${info.id} with ${run.metrics.size} metrics in ${store.describe()}${replaced}; ${saved.runs.length} runs kept\n`,
  );
}
