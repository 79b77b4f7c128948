import { InputError } from '../errors/input-error.js';

/** One thing wrong with a config file, at a 1-based line and column. */
export interface ConfigProblem {
  line: number;
  col: number;
  message: string;
  fix?: string;
}

/** How many problems one error lists; a file with more has bigger trouble than a list can fix. */
export const MAX_LISTED_PROBLEMS = 20;

/**
 * One InputError for all problems of a file, in reading order: the first one is the message,
 * `where` ("file:line:col") and `fix`; the others follow in the message, one a line.
 * @example problemsError([{ line: 2, col: 3, message: 'unknown key "cuttoff"' }], 'bellgate.yml').where // 'bellgate.yml:2:3'
 */
export function problemsError(problems: readonly ConfigProblem[], source: string): InputError {
  const sorted = [...problems].sort((a, b) => a.line - b.line || a.col - b.col);
  const first = sorted[0];
  if (first === undefined) throw new Error('problemsError needs at least one problem');
  const rest = sorted.slice(1, MAX_LISTED_PROBLEMS);
  let message = first.message;
  if (rest.length > 0) {
    const lines = rest.map((p) => `  ${source}:${p.line}:${p.col}: ${p.message}${p.fix ? ` (${p.fix})` : ''}`);
    const more = sorted.length - 1 - rest.length;
    message += `\nand ${sorted.length - 1} more problem${sorted.length > 2 ? 's' : ''}:\n${lines.join('\n')}`;
    if (more > 0) message += `\n  ... ${more} not shown`;
  }
  return new InputError(message, { where: `${source}:${first.line}:${first.col}`, fix: first.fix });
}
