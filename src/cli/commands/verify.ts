import { Command } from 'commander';
import type { CommandContext } from '../context.js';
import { examples, historyOption } from '../options.js';
import { runVerify } from '../run/verify.js';

/** `bellgate verify`: checks a history document's integrity. Exit 0 when clean, 2 when it finds problems. */
export function verifyCommand(ctx: CommandContext): Command {
  const cmd = new Command('verify').description('check the integrity of a history file');
  historyOption(cmd, true, 'history file to check');
  examples(cmd, ['bellgate verify --history .bellgate/history.jsonl']);
  return cmd.action((options: { history: string }) => runVerify(ctx, options));
}
