import type { CommandContext } from '../context.js';
import { loadConfig } from '../../config/load.js';
import { loadRun, type MetricFileOptions } from '../load-run.js';
import { historyStore } from '../open-history.js';
import { recordRun } from '../record-run.js';
import { withExactPlace } from '../../inputs/exact-place.js';
import { runInfoFrom, type RunInfoOptions } from '../run-info.js';

export interface RecordOptions extends MetricFileOptions, RunInfoOptions {
  history: string;
  config?: string;
  series: string;
}

/**
 * The work of `bellgate record`: appends the run to the history file (one line; the file is not
 * read beyond its header and last line) and says how many runs are kept.
 * @throws InputError (bad files, flags), StoreError (history unreadable or unwritable).
 * @example await runRecord(ctx, { metrics: ['bench.json'], history: 'h.json', series: 'default' })
 */
export async function runRecord(ctx: CommandContext, options: RecordOptions): Promise<void> {
  const config = await loadConfig(options.config, ctx.io.cwd);
  const run = await loadRun(ctx, config, options);
  const store = historyStore(ctx, options.history, options.series);
  const info = runInfoFrom(ctx, options);
  // A unit the history refuses is named at its exact line of the metric file.
  const saved = await withExactPlace(() => recordRun(store, info, run, config.keep), ctx.io.cwd);
  const replaced =
    saved.replaced === undefined
      ? ''
      : saved.replaced === info.id
        ? ' (replacing the earlier run with this id)'
        : ` (replacing ${saved.replaced}, an earlier attempt of this CI run)`;
  ctx.io.stdout(
    `recorded run ${info.id} with ${run.metrics.size} metrics in ${store.describe()}${replaced}; ${saved.runs} runs kept\n`,
  );
}
