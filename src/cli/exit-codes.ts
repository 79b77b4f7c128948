/**
 * The exit codes of `bellgate` (README "Exit codes"). CI scripts branch on them, so they are
 * part of the product: never renumber.
 */
export const EXIT = {
  /** pass, learning, accepted — or a command that did its job. */
  ok: 0,
  /** at least one metric regressed. */
  regressed: 1,
  /** bad input or usage: a file that cannot be read or parsed, a wrong flag, an internal fault. */
  input: 2,
  /** the history store cannot be reached or read. */
  store: 3,
} as const;
