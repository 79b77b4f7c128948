import { Command, InvalidArgumentError, Option } from 'commander';
import type { CommandContext } from '../context.js';
import { configOption, examples, historyOption } from '../options.js';
import { runTune, type TuneOptions } from '../run/tune.js';

/**
 * `bellgate tune`: replays the gate over the history and prints the cutoff ladder, per-metric
 * false alarms, normality and a suggestion; `--labels` scores known regressions (precision,
 * recall, F1), `--target N` picks the loosest cutoff with at most N falsely flagged runs per 100,
 * `--write FILE` puts the suggestion into a config (comments and order kept) and prints the diff.
 * Exit 0, or 2 for bad input (a labels problem names file:line:col).
 */
export function tuneCommand(ctx: CommandContext): Command {
  const cmd = new Command('tune').description(
    'suggest cutoffs from evidence: replay the gate over the history and score a ladder of cutoffs',
  );
  historyOption(cmd, true, 'history file of trusted runs to replay (JSON)');
  configOption(cmd);
  cmd
    .option(
      '--labels <file>',
      'YAML or JSON list of known regressions: `regressions: [{run: "1234-1"}, {run: "1240-1", metric: "latency/p95"}]`',
    )
    .option('--target <n>', 'false alarms per 100 runs to stay at or under (default 1)', parseTarget)
    .option('--write <file>', 'write the suggested cutoffs and transforms into this config file and print the diff')
    .addOption(new Option('--format <format>', 'output format').choices(['text', 'json']).default('text'));
  examples(cmd, [
    'bellgate tune --history .bellgate/history.jsonl --config .github/bellgate.yml',
    'bellgate tune --history h.json --labels known-regressions.yml --format json',
    'bellgate tune --history h.json --target 0.5 --write .github/bellgate.yml',
  ]);
  return cmd.action((options: TuneOptions) => runTune(ctx, options));
}

function parseTarget(text: string): number {
  const n = Number(text);
  if (text.trim() === '' || !Number.isFinite(n) || n < 0 || n > 100) {
    throw new InvalidArgumentError('expected a number of false alarms per 100 runs from 0 to 100, e.g. 1');
  }
  return n;
}
