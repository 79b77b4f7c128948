import { expect } from 'vitest';
import { InputError } from '../../src/errors/input-error.js';

export interface Reported {
  line: number;
  col: number;
  message: string;
}

/**
 * Runs `fn`, expects an InputError, and returns every problem it reports as the user reads them:
 * the first from `where` ("source:line:col"), the rest from the "  source:line:col: ..." lines.
 */
export function reportedProblems(fn: () => unknown, source: string): { error: InputError; problems: Reported[] } {
  let caught: unknown;
  try {
    fn();
  } catch (err) {
    caught = err;
  }
  expect(caught).toBeInstanceOf(InputError);
  const error = caught as InputError;
  const first = new RegExp(`^${escape(source)}:(\\d+):(\\d+)$`).exec(error.where ?? '');
  expect(first, `where = ${error.where}`).not.toBeNull();
  const problems: Reported[] = [
    { line: Number(first![1]), col: Number(first![2]), message: error.message.split('\n')[0]! },
  ];
  const rest = new RegExp(`^  ${escape(source)}:(\\d+):(\\d+): (.*)$`);
  for (const line of error.message.split('\n').slice(1)) {
    const found = rest.exec(line);
    if (found) problems.push({ line: Number(found[1]), col: Number(found[2]), message: found[3]! });
  }
  return { error, problems };
}

function escape(text: string): string {
  return text.replace(/[.*+?^${}()|[\]\\]/g, '\\$&');
}
