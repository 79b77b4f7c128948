import { InputError } from '../../errors/input-error.js';
import { readHistoryText } from '../../history/file-store.js';
import { verifyHistory } from '../../history/verify.js';
import { visibleText } from '../../errors/visible-text.js';
import type { CommandContext } from '../context.js';
import { EXIT } from '../exit-codes.js';
import { resolvePath } from '../paths.js';

/**
 * The work of `bellgate verify`: lists the history file's
 * problems on stdout and sets exit 2 when there are any.
 * @throws InputError when the file is missing; StoreError when it is not a regular file or too large.
 * @example await runVerify(ctx, { history: '.bellgate/history.json' })
 */
export async function runVerify(ctx: CommandContext, options: { history: string }): Promise<void> {
  const text = readHistoryText(resolvePath(ctx, options.history));
  if (text === undefined) {
    throw new InputError(`cannot read --history ${options.history}: no such file`, {
      where: options.history,
      fix: 'check the path given to --history',
    });
  }
  const problems = verifyHistory(text);
  if (problems.length === 0) {
    ctx.io.stdout(`${options.history}: no problems found\n`);
    return;
  }
  // Problems quote metric names from the file: no control or bidi character reaches the terminal.
  for (const p of problems)
    ctx.io.stdout(visibleText(`${options.history}${p.where === '' ? '' : `:${p.where}`}: ${p.problem}`) + '\n');
  ctx.io.stderr(`bellgate: ${problems.length} problem${problems.length === 1 ? '' : 's'} in ${options.history}\n`);
  ctx.exitCode = EXIT.input;
}
