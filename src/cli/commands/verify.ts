import { Command } from 'commander';
import { verifyHistory } from '../../history/verify.js';
import { visibleText } from '../../model/visible-text.js';
import type { CommandContext } from '../context.js';
import { EXIT } from '../exit-codes.js';
import { resolvePath } from '../paths.js';
import { readUserText } from '../read-text.js';
import { examples, historyOption } from '../options.js';

/** `bellgate verify`: checks a history document's integrity. Exit 0 when clean, 2 when it finds problems. */
export function verifyCommand(ctx: CommandContext): Command {
  const cmd = new Command('verify').description('check the integrity of a history file');
  historyOption(cmd, true, 'history file to check');
  examples(cmd, ['bellgate verify --history .bellgate/history.json']);
  return cmd.action(async (options: { history: string }) => {
    const text = await readUserText(resolvePath(ctx, options.history), '--history');
    const problems = verifyHistory(text, options.history);
    if (problems.length === 0) {
      ctx.io.stdout(`${options.history}: no problems found\n`);
      return;
    }
    // Problems quote metric names from the file: no control or bidi character reaches the terminal.
    for (const p of problems) ctx.io.stdout(visibleText(`${options.history}: ${p.where}: ${p.problem}`) + '\n');
    ctx.io.stderr(`bellgate: ${problems.length} problem${problems.length === 1 ? '' : 's'} in ${options.history}\n`);
    ctx.exitCode = EXIT.input;
  });
}
