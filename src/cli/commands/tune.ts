import { Command, InvalidArgumentError, Option } from 'commander';
import type { CommandContext } from '../context.js';
import { configOption, examples, historyOption } from '../options.js';
import { runTune, type TuneOptions } from '../run/tune.js';

/**
 * `bellgate tune`: replays the gate over the history, clean and with injected regressions (+5%,
 * +10%, +20% on one metric at a time), scores a ladder of whole settings by false alarms per 100
 * clean runs and share caught, and recommends the one catching the most +10% regressions within
 * `--target`; `--write FILE` writes every key it recommends (comments and order kept) and prints
 * the diff, refusing a blind setting unless `--force`. Exit 0, or 2 for bad input or a refused write.
 */
export function tuneCommand(ctx: CommandContext): Command {
  const cmd = new Command('tune').description(
    'recommend settings from evidence: replay the gate over the history, clean and with injected regressions',
  );
  historyOption(cmd, true, 'history file of trusted runs to replay (JSON)');
  configOption(cmd);
  cmd
    .option(
      '--labels <file>',
      'YAML or JSON list of known regressions in the history, left out of the clean count: `regressions: [{run: "1234-1"}]`',
    )
    .option('--target <n>', 'false alarms per 100 clean runs to stay at or under (default 1)', parseTarget)
    .option('--last <n>', 'replay only the newest N runs (default 100)', parseLast)
    .option('--write <file>', 'write the recommended settings into this config file and print the diff')
    .option('--force', 'with --write: write the recommendation even when it is blind (catches almost nothing)')
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

function parseLast(text: string): number {
  const n = Number(text);
  if (!Number.isInteger(n) || n < 1) throw new InvalidArgumentError('expected a whole number of runs, e.g. 100');
  return n;
}
