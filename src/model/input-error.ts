/**
 * The project's one contract for bad input: a typed error whose message a user can act on.
 * Pure modules throw it; adapters turn it into exit code 2 or a failed step, never a stack trace.
 */
export class InputError extends Error {
  override name = 'InputError';
  /** Where the problem is: "file:line:column", an XML element path, or a metric name. */
  readonly where?: string;
  /** What to do about it, in one sentence. */
  readonly fix?: string;

  constructor(message: string, options: { where?: string; fix?: string; cause?: unknown } = {}) {
    super(message, options.cause === undefined ? undefined : { cause: options.cause });
    this.where = options.where;
    this.fix = options.fix;
  }

  /** "where: message. fix" — the line a user sees. */
  describe(): string {
    const head = this.where ? `${this.where}: ${this.message}` : this.message;
    return this.fix ? `${head}\n  fix: ${this.fix}` : head;
  }
}
