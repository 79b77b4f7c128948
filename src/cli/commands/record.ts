import { Command } from 'commander';
import type { CommandContext } from '../context.js';
import { runRecord, type RecordOptions } from '../run/record.js';
import {
  configOption,
  examples,
  historyOption,
  inputOptions,
  metricsOption,
  runInfoOptions,
  seriesOption,
} from '../options.js';

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
    'bellgate record --metrics bench.json --history .bellgate/history.jsonl',
    'bellgate record --metrics bench.json --history h.json --id 8812-1 --sha 3f2a9c1 --ref refs/heads/main --time 2026-05-04T10:20:30Z',
  ]);
  return cmd.action((options: RecordOptions) => runRecord(ctx, options));
}
