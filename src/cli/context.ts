import type { MachineFacts } from '../history/runner-fingerprint.js';

/**
 * What every command receives: the outside world as plain values and callbacks, so tests run the
 * whole CLI in-process with a fake terminal, environment and working folder.
 */

/** The process edges the CLI touches. `stdout`/`stderr` receive whole chunks (newlines included). */
export interface CliIo {
  stdout: (s: string) => void;
  stderr: (s: string) => void;
  /** Folder that relative paths are resolved against. */
  cwd: string;
  env: Record<string, string | undefined>;
  /** Whether stdout is a terminal (colour is used only then, and only without NO_COLOR). */
  isTTY: boolean;
  /** Whether stderr is a terminal (progress lines are drawn only then). */
  stderrIsTTY?: boolean;
  /** The machine, for the runner fingerprint of recorded runs (default: node:os of this process). */
  machine?: MachineFacts;
}

/** Passed to every command factory. A command's action sets `exitCode` (0 unless it says otherwise). */
export interface CommandContext {
  io: CliIo;
  exitCode: number;
  /** Colour for terminal output: a TTY and NO_COLOR unset or empty (https://no-color.org, common practice). */
  color: boolean;
  /** The clock, injected so recorded times are testable. */
  now: () => Date;
}

/**
 * Builds the context for one invocation.
 * @example createContext({ stdout, stderr, cwd: '/repo', env: {}, isTTY: false }).color // false
 */
export function createContext(io: CliIo, now: () => Date = () => new Date()): CommandContext {
  const noColor = io.env.NO_COLOR !== undefined && io.env.NO_COLOR !== '';
  return { io, exitCode: 0, color: io.isTTY && !noColor, now };
}
