import { visibleText } from './visible-text.js';

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

  /**
   * "where: message. fix" — the line a user sees. Messages quote untrusted text (metric names), so
   * control, C1 and bidirectional formatting characters are shown as \u{XXXX}: a refusal must not
   * send a terminal escape sequence or reorder the line it is printed on (CVE-2021-42574).
   */
  describe(): string {
    const head = this.where ? `${this.where}: ${this.message}` : this.message;
    return visibleText(this.fix ? `${head}\n  fix: ${this.fix}` : head);
  }
}
