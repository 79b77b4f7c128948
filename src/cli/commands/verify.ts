import { Command } from 'commander';
import type { CommandContext } from '../context.js';
import { examples, historyOption } from '../options.js';

/** `bellgate verify`: checks a history document's integrity. Exit 0 when clean, 2 when it finds problems. */
export function verifyCommand(ctx: CommandContext): Command {
  const cmd = new Command('verify').description('check the integrity of a history file');
  historyOption(cmd, true, 'history file to check');
  examples(cmd, ['bellgate verify --history .bellgate/history.jsonl']);
  // The work is imported when the command runs, so `--help` and the other commands never load it.
  return cmd.action(async (options: { history: string }) => (await import('../run/verify.js')).runVerify(ctx, options));
}
