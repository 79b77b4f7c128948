import { expect } from 'vitest';

/**
 * Checks of rendered reports that do not trust the renderers' own escaping functions: each looks
 * at the output the way GitHub's markdown or a browser's HTML tokenizer would (GitHub Flavored
 * Markdown spec, sections 4.10 "Tables", 6.3 "Links", 6.6 "Raw HTML"; WHATWG HTML "tag open state";
 * from memory).
 */

/** The tags our markdown writes itself: the collapsed section, the footer and the hidden marker. */
const OWN_MARKDOWN_TAG = /^<(?:\/?(?:details|summary|sub)>|!-- )/;

/** Pipes that GFM treats as cell separators: not preceded by an odd run of backslashes. */
export function cellSeparators(line: string): number {
  let n = 0;
  for (let i = 0; i < line.length; i++) {
    if (line[i] === '\\') i++;
    else if (line[i] === '|') n++;
  }
  return n;
}

/** Backticks that open or close code spans (unescaped). */
function liveBackticks(line: string): number {
  let n = 0;
  for (let i = 0; i < line.length; i++) {
    if (line[i] === '\\') i++;
    else if (line[i] === '`') n++;
  }
  return n;
}

/**
 * A markdown report where nothing from a metric file is live: no raw HTML tag but ours, no link,
 * no autolink, no @mention or #reference, every table row the header's cell count, code spans
 * balanced on each line, no control or bidi character.
 */
export function assertInertMarkdown(md: string): void {
  const lines = md.split('\n');
  const head = lines.find((l) => l.startsWith('| status |'));
  const cells = head === undefined ? 0 : cellSeparators(head);
  for (const raw of lines) {
    // The links our markdown writes itself (run and HTML report, web URLs only) are not from a file.
    const line = raw.replace(/\[(?:workflow run|full HTML report)\]\(https?:\/\/[^\s()<>]+\)/g, '');
    for (const m of line.matchAll(/</g)) {
      expect(line.slice(m.index), `raw HTML in: ${line.slice(0, 120)}`).toMatch(OWN_MARKDOWN_TAG);
    }
    expect(line, 'a link target').not.toMatch(/(?<!\\)\]\(/);
    expect(line).not.toMatch(/\]\(javascript:/i);
    expect(line, 'a bare-URL autolink').not.toMatch(/[a-z]+:\/\/(?!\u200B)/i);
    expect(line, 'a www. autolink').not.toMatch(/(^|[\s*_~(])www\./i);
    expect(line, 'a live @mention').not.toMatch(/(^|[^\w])@(?!\u200B)[A-Za-z0-9]/);
    expect(line, 'a live #reference').not.toMatch(/(^|[^\w&\\])#(?!\u200B)\d/);
    expect(line, 'a live GH- reference').not.toMatch(/\bGH-\d/i);
    expect(liveBackticks(line) % 2, `unbalanced code span in: ${line.slice(0, 120)}`).toBe(0);
    if (line.startsWith('|')) expect(cellSeparators(line), `cells of: ${line.slice(0, 160)}`).toBe(cells);
  }
  expect(md).not.toMatch(/[\u0000-\u0009\u000B-\u001F\u007F-\u009F\u202A-\u202E\u2066-\u2069]/u);
  expect((md.match(/-->/g) ?? []).length).toBe((md.match(/<!--/g) ?? []).length);
}

/** Every element the HTML report writes itself; any other tag name came from a metric file. */
const OWN_HTML_TAGS = new Set([
  '!doctype',
  'html',
  'head',
  'meta',
  'title',
  'style',
  'body',
  'header',
  'h1',
  'h2',
  'p',
  'strong',
  'main',
  'table',
  'caption',
  'thead',
  'tbody',
  'tr',
  'th',
  'td',
  'button',
  'a',
  'ul',
  'li',
  'section',
  'span',
  'div',
  'svg',
  'g',
  'circle',
  'rect',
  'line',
  'path',
  'polyline',
  'polygon',
  'text',
  'footer',
  'script',
  'details',
  'summary',
  'em',
]);

/**
 * An HTML report where nothing from a metric file became markup: every tag is one of ours, no tag
 * carries an event handler or a javascript: URL, exactly one script element, no control or bidi
 * character, and the Content-Security-Policy still forbids the network.
 */
export function assertInertHtml(html: string): void {
  const tags = [...html.matchAll(/<\/?([!a-zA-Z][\w:-]*)([^>]*)>/g)];
  for (const [tag, name = '', attrs = ''] of tags) {
    expect(OWN_HTML_TAGS.has(name.toLowerCase()), `foreign tag ${tag.slice(0, 80)}`).toBe(true);
    // Quoted values are text; what stays outside quotes is attribute names (a broken-out quote shows here).
    const outside = attrs.replace(/"[^"]*"|'[^']*'/g, '""');
    expect(outside, `event handler in ${tag.slice(0, 80)}`).not.toMatch(/\son[a-z]+\s*=/i);
    expect(outside, `unquoted value in ${tag.slice(0, 80)}`).not.toMatch(/=\s*[^"\s]/);
    expect(attrs, `script URL in ${tag.slice(0, 80)}`).not.toMatch(
      /(?:href|src|action|xlink:href)\s*=\s*["']?\s*javascript:/i,
    );
  }
  expect((html.match(/<script\b/gi) ?? []).length).toBe(1);
  expect((html.match(/<\/script/gi) ?? []).length).toBe(1);
  expect(html).not.toMatch(/[\u0000-\u0009\u000B-\u001F\u007F-\u009F\u202A-\u202E\u2066-\u2069]/u);
  expect(html).toContain("default-src 'none'");
}

/** A terminal report without escape sequences, bidi overrides or stray control characters. */
export function assertInertText(text: string): void {
  expect(text).not.toMatch(/[\u0000-\u0009\u000B-\u001F\u007F-\u009F\u202A-\u202E\u2066-\u2069]/u);
}
