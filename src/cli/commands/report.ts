import { Command } from 'commander';
import type { CommandContext } from '../context.js';
import type { ReportOptions } from '../run/report.js';
import { configOption, examples, historyOption, inputOptions, seriesOption } from '../options.js';

/**
 * `bellgate report`: one self-contained HTML file with every metric's history, fitted band and
 * this run (by default the newest recorded run, judged against the runs before it). Exit 0.
 */
export function reportCommand(ctx: CommandContext): Command {
  const cmd = new Command('report').description('write an HTML report of the history and this run');
  historyOption(cmd, true);
  cmd.option('--metrics <file...>', 'metric files of this run (default: the newest run in the history)');
  cmd.requiredOption('--html <file>', 'where to write the HTML file');
  cmd.option('--title <text>', 'title of the page');
  configOption(cmd);
  seriesOption(cmd);
  inputOptions(cmd);
  examples(cmd, [
    'bellgate report --history .bellgate/history.jsonl --html bellgate-report.html',
    'bellgate report --history h.json --metrics bench.json --html out/report.html --title "Nightly"',
  ]);
  // Imported when the command runs: d3 and the page code are needed by this command only.
  return cmd.action(async (options: ReportOptions) => (await import('../run/report.js')).runReport(ctx, options));
}
