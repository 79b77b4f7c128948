import { Command, Option } from 'commander';
import type { CommandContext } from '../context.js';
import { runSince, type SinceCliOptions } from '../run/since.js';
import { configOption, examples, historyOption, REPORT_FORMATS, seriesOption } from '../options.js';

/**
 * `bellgate since REF`: the release review — what changed in each metric between the run at REF
 * and now: levels then and now, steps, creep and accepted changes. Informational: exit 0, 2 for
 * bad input, 3 for an unreadable history.
 */
export function sinceCommand(ctx: CommandContext): Command {
  const cmd = new Command('since')
    .description('release review: levels, steps, creep and accepted changes since a reference run')
    .argument('<ref>', 'run id, commit sha (or its first digits) or ISO-8601 time of the reference');
  historyOption(cmd, true);
  configOption(cmd);
  seriesOption(cmd);
  cmd
    .addOption(
      new Option('--format <format>', 'how to print the review on stdout').choices(REPORT_FORMATS).default('text'),
    )
    .option(
      '--at <iso>',
      "the reference commit's time, so a commit without a recorded run is matched to the nearest earlier run",
    )
    .option('--all', 'list every metric in the text review, quiet ones too');
  examples(cmd, [
    'bellgate since "$(git rev-list -n 1 v2.3.0)" --at "$(git show -s --format=%cI v2.3.0)" --history h.json',
    'bellgate since 2026-03-01 --history .bellgate/history.json --format markdown >> "$GITHUB_STEP_SUMMARY"',
    'bellgate since 8123-1 --history h.json --format json > since.json',
  ]);
  cmd.addHelpText(
    'after',
    '\nThe review is evidence, not proof: levels are medians of the runs around each point, and steps and creep come from rank tests on noisy runs.\nExit codes: 0 reviewed; 2 bad input or usage; 3 history store unreachable.\n',
  );
  return cmd.action((ref: string, options: SinceCliOptions) => runSince(ctx, ref, options));
}
