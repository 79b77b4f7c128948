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
  cmd.requiredOption('--html <file>', 'where to write the HTML file (required)');
  cmd.option('--title <text>', 'title of the page');
  cmd.option('--since <ref>', 'add a release review section: each metric since this run id, commit sha or time');
  cmd.option('--at <iso>', "with --since: the reference commit's time (a commit without a recorded run)");
  configOption(cmd);
  seriesOption(cmd);
  inputOptions(cmd);
  examples(cmd, [
    'bellgate report --history .bellgate/history.jsonl --html bellgate-report.html',
    'bellgate report --history h.json --metrics bench.json --html out/report.html --title "Nightly"',
    'bellgate report --history h.json --html review.html --since "$(git rev-list -n 1 v2.3.0)" --at "$(git show -s --format=%cI v2.3.0)"',
  ]);
  // Imported when the command runs: d3 and the page code are needed by this command only.
  return cmd.action(async (options: ReportOptions) => (await import('../run/report.js')).runReport(ctx, options));
}
