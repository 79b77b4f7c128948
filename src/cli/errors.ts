import { CommanderError } from 'commander';
import { InputError } from '../errors/input-error.js';
import { StoreError } from '../history/store.js';
import { EXIT } from './exit-codes.js';

/** What the user sees for a failure, and the exit code that goes with it. */
export interface Failure {
  code: number;
  /** Text for stderr, without the trailing newline; empty when commander already printed it. */
  text: string;
}

const SYSTEM_REASONS: Record<string, string> = {
  ENOENT: 'no such file or folder',
  EACCES: 'permission denied',
  EPERM: 'operation not permitted',
  EISDIR: 'is a folder, not a file',
  ENOTDIR: 'a part of the path is not a folder',
  ENOSPC: 'no space left on the device',
  EROFS: 'read-only file system',
  EEXIST: 'already exists',
  EMFILE: 'too many open files',
};

/**
 * Maps anything a command threw to one message and an exit code — never a stack trace.
 * InputError -> 2 with its describe(); StoreError -> 3; commander usage errors -> 2 (help -> 0);
 * file-system errors -> 2 naming the path; anything else is a fault of ours -> 2 with one line
 * asking for a report (2, not 1, so a crash can never pass for "a metric regressed").
 * @example toFailure(new InputError('bad', { where: 'a.json:1:2' })) // { code: 2, text: 'bellgate: a.json:1:2: bad' }
 */
export function toFailure(error: unknown): Failure {
  if (error instanceof CommanderError) {
    // Commander has already written its message (and the usage) through configureOutput.
    const quiet = error.code === 'commander.helpDisplayed' || error.code === 'commander.version';
    return { code: quiet ? EXIT.ok : EXIT.input, text: '' };
  }
  if (error instanceof InputError) return { code: EXIT.input, text: `bellgate: ${error.describe()}` };
  if (error instanceof StoreError || (error instanceof Error && error.name === 'StoreError')) {
    const text = error instanceof StoreError ? error.describe() : error.message;
    // What is stored is the wrong thing (another series, not a history): bad input, not an outage.
    const kind = error instanceof StoreError ? error.kind : undefined;
    const code = kind === 'other-series' || kind === 'not-a-history' ? EXIT.input : EXIT.store;
    return { code, text: `bellgate: history store: ${text}` };
  }
  const system = systemError(error);
  if (system) return { code: EXIT.input, text: `bellgate: ${system}` };
  const message = error instanceof Error ? error.message : String(error);
  return {
    code: EXIT.input,
    text: `bellgate: internal error: ${firstLine(message)}\n  please report this, with the command you ran, to the Bellgate maintainers`,
  };
}

function systemError(error: unknown): string | undefined {
  if (!(error instanceof Error)) return undefined;
  const { code, path, syscall } = error as { code?: unknown; path?: unknown; syscall?: unknown };
  if (typeof code !== 'string' || !/^E[A-Z]+$/.test(code)) return undefined;
  const reason = SYSTEM_REASONS[code] ?? code;
  const verb = typeof syscall === 'string' ? syscall : 'access';
  return typeof path === 'string' ? `cannot ${verb} ${path}: ${reason}` : `${verb} failed: ${reason}`;
}

function firstLine(s: string): string {
  const line = s.split('\n', 1)[0] ?? '';
  return line.length > 300 ? `${line.slice(0, 300)}…` : line;
}
