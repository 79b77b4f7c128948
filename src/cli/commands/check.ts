import { Command, Option } from 'commander';
import { OK_ROWS_LISTED } from '../../report/ok-rows.js';
import type { CommandContext } from '../context.js';
import { performCheck, verdictExitCode, type CheckOptions } from '../check-flow.js';
import {
  configOption,
  examples,
  historyOption,
  inputOptions,
  metricsOption,
  REPORT_FORMATS,
  runInfoOptions,
  seriesOption,
} from '../options.js';

/**
 * `bellgate check`: judges this run's metrics against the history and prints the report.
 * Exit 0 pass/learning/accepted, 1 regressed, 2 bad input, 3 history store unreachable.
 */
export function checkCommand(ctx: CommandContext): Command {
  const cmd = new Command('check').description('judge this run against the history of trusted runs');
  metricsOption(cmd, true);
  historyOption(cmd, false);
  configOption(cmd);
  seriesOption(cmd);
  cmd
    .addOption(
      new Option('--format <format>', 'how to print the report on stdout').choices(REPORT_FORMATS).default('text'),
    )
    .option(
      '--all',
      `list every metric in the text report, ok ones too (by default more than ${OK_ROWS_LISTED} ok metrics are counted, not listed)`,
    )
    .option('--out <dir>', 'also write report.md, report.json and report.txt (every metric) into this folder')
    .option('--record', 'append this run to the history after checking it (needs --history)')
    .addOption(
      new Option(
        '--missing-metrics <policy>',
        'when this run lacks more than half of the baseline metrics: warn, or fail with exit 2',
      )
        .choices(['warn', 'fail'])
        .default('warn'),
    );
  inputOptions(cmd);
  runInfoOptions(cmd);
  examples(cmd, [
    'bellgate check --metrics bench.json --history .bellgate/history.jsonl',
    'bellgate check --metrics "out/*.json" --history h.json --format json > report.json',
    'bellgate check --metrics results.txt --input-format gobench --history h.json --out bellgate-out',
    'bellgate check --metrics bench.json --history h.json --record --sha "$(git rev-parse HEAD)"',
  ]);
  cmd.addHelpText(
    'after',
    '\nExit codes: 0 pass, learning or accepted; 1 regressed; 2 bad input or usage (and --missing-metrics fail); 3 history store unreachable.\n',
  );
  return cmd.action(async (options: CheckOptions) => {
    const report = await performCheck(ctx, options);
    ctx.exitCode = verdictExitCode(report, options.missingMetrics);
  });
}
