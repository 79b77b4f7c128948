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
    const head = this.where ? `${oneLine(this.where)}: ${this.message}` : this.message;
    return noCommandLines(visibleText(shortenQuotes(this.fix ? `${head}\n  fix: ${this.fix}` : head)));
  }
}

/** A place is one line: a line feed quoted from input (a metric name) is shown as its code point. */
export function oneLine(text: string): string {
  return text.replace(/\n/g, '\\u{000A}');
}

/**
 * A CI log reads a line that starts with "::" as a workflow command (GitHub's "Workflow commands
 * for GitHub Actions"): no line of a message may, whatever it quotes.
 */
export function noCommandLines(text: string): string {
  return text.replace(/\n(\s*)::/g, '\n$1\\u{003A}:');
}

/** Quoted text past this many characters is cut in messages: a 10 KB metric name is not echoed whole. */
const MAX_QUOTED = 120;
// Every quoted string, taken pairwise from the left, so prose between two quotes is never cut.
const QUOTED = /"((?:[^"\\]|\\.)*)"/g;

function shortenQuotes(text: string): string {
  if (text.length <= MAX_QUOTED) return text;
  return text.replace(QUOTED, (whole, inner: string) =>
    inner.length <= MAX_QUOTED
      ? whole
      : `"${Array.from(inner)
          .slice(0, MAX_QUOTED / 2)
          .join('')}…" (${inner.length} characters)`,
  );
}
