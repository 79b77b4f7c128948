import { visibleText } from '../errors/visible-text.js';

/**
 * Untrusted text (a series name, a path from an input) inside one line of the job log: controls
 * and bidi marks shown as code points (visibleText), and line feeds as `\n`, so the text can never
 * start a line of its own: a line starting with `::` would be a workflow command to the runner.
 * @example logText('a\n::error::x') // 'a\\n::error::x'
 */
export function logText(text: string): string {
  return visibleText(text).replace(/\n/g, '\\n');
}
