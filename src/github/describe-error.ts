/**
 * Turns any error into what a user sees: one plain line plus a fix for the project's typed errors
 * (InputError, StoreError: their describe()), the message otherwise — never a stack trace.
 * @example describeError(new InputError('bad', { where: 'input store', fix: 'use artifact' })) // 'input store: bad\n  fix: use artifact'
 */
export function describeError(error: unknown): string {
  if (error && typeof (error as { describe?: unknown }).describe === 'function')
    return (error as { describe(): string }).describe();
  if (error instanceof Error) return error.message;
  return String(error);
}
