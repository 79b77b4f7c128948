import { cleanText, MAX_SHOWN_LENGTH } from './clean.js';

/** Zero-width space: breaks GitHub's @mention and #123 autolinks while reading the same. */
const ZWSP = '\u200B';

// Characters with a meaning in GitHub-flavoured markdown, inline or in a table cell.
const MARKDOWN_SPECIAL = /[\\*_[\]()#|`+!~]/g;

/**
 * Make untrusted text (a metric name or unit) inert inside GitHub markdown text and table cells.
 * Steps: cleanText (controls, bidi overrides, newlines, cap at 200); `&`, `<`, `>` become entities
 * (so no HTML tag such as `<img onerror=...>` can open); every markdown punctuation character
 * `\ * _ [ ] ( ) # | \` + ! ~` gets a backslash (so `](javascript:...)` is no link, `|` no
 * new cell); a zero-width space after `@` and after `#`/`GH-` before digits stops mentions and
 * issue references, and one after `:` in `://` and after `www` in `www.` stops bare-URL autolinks.
 * @example escapeMarkdown('a|b') // 'a\\|b'
 * @example escapeMarkdown('@team') // '@\u200Bteam'
 */
export function escapeMarkdown(s: string, max: number = MAX_SHOWN_LENGTH): string {
  return cleanText(s, max)
    .replace(/&/g, '&amp;')
    .replace(/</g, '&lt;')
    .replace(/>/g, '&gt;')
    .replace(/@/g, `@${ZWSP}`)
    .replace(/#(?=\d)/g, `#${ZWSP}`)
    .replace(/\b(GH)-(?=\d)/gi, `$1${ZWSP}-`)
    .replace(/:\/\//g, `:${ZWSP}//`)
    .replace(/\b(www)\./gi, `$1${ZWSP}.`)
    .replace(MARKDOWN_SPECIAL, (c) => `\\${c}`);
}

/**
 * Escape text for HTML element content and quoted attribute values: `& < > " '` become entities,
 * after cleanText removed controls and bidi overrides (no length cap unless `max` is given).
 * @example escapeHtml('<img src=x onerror=alert(1)>') // '&lt;img src=x onerror=alert(1)&gt;'
 */
export function escapeHtml(s: string, max: number = Number.POSITIVE_INFINITY): string {
  return cleanText(s, max)
    .replace(/&/g, '&amp;')
    .replace(/</g, '&lt;')
    .replace(/>/g, '&gt;')
    .replace(/"/g, '&quot;')
    .replace(/'/g, '&#39;');
}
