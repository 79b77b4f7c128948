import { Command } from 'commander';
import type { CommandContext } from '../context.js';
import { runExplain, type ExplainOptions } from '../run/explain.js';
import { configOption, examples, historyOption, inputOptions, seriesOption } from '../options.js';

/**
 * `bellgate explain METRIC`: one metric's decision drawn in the terminal — the fitted curve, the
 * baseline runs, the cutoff band and this run — with the numbers in words. Informational: exit 0.
 */
export function explainCommand(ctx: CommandContext): Command {
  const cmd = new Command('explain')
    .description('show how one metric is judged: fitted curve, baseline runs, cutoff band, this run')
    .argument('<metric>', 'metric name, exactly as in the report');
  historyOption(cmd, true);
  cmd.option(
    '--metrics <file...>',
    'metric files of this run (default: the newest run in the history, judged against the runs before it)',
  );
  configOption(cmd);
  seriesOption(cmd);
  inputOptions(cmd);
  examples(cmd, [
    'bellgate explain latency/geocode-p95 --history .bellgate/history.jsonl',
    'bellgate explain size/web-bundle.js.gz --history h.json --metrics bench.json',
  ]);
  return cmd.action((metric: string, options: ExplainOptions) => runExplain(ctx, metric, options));
}
