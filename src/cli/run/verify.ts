import { verifyHistory } from '../../history/verify.js';
import { visibleText } from '../../errors/visible-text.js';
import type { CommandContext } from '../context.js';
import { EXIT } from '../exit-codes.js';
import { resolvePath } from '../paths.js';
import { readUserText } from '../read-text.js';

/**
 * The work of `bellgate verify` (loaded only when that command runs): lists the history file's
 * problems on stdout and sets exit 2 when there are any.
 * @throws InputError when the file cannot be read.
 * @example await runVerify(ctx, { history: '.bellgate/history.json' })
 */
export async function runVerify(ctx: CommandContext, options: { history: string }): Promise<void> {
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
}
