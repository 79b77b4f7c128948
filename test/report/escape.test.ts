import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { cleanText } from '../../src/report/clean.js';
import { escapeHtml, escapeMarkdown } from '../../src/report/escape.js';
import { HOSTILE } from './fixture.js';

/**
 * Undo escapeMarkdown the way a CommonMark renderer reads it: a backslash before ASCII punctuation
 * stands for the literal character (CommonMark spec 0.31, section 2.4 "Backslash escapes"), and
 * the entities &lt; &gt; &amp; for < > & (section 2.5 "Entity and numeric character references").
 * The zero-width spaces we insert are invisible and removed too.
 */
function readAsCommonMark(s: string): string {
  return s
    .replace(/\\([!-/:-@[-`{-~])/g, '$1')
    .replace(/&lt;/g, '<')
    .replace(/&gt;/g, '>')
    .replace(/&amp;/g, '&')
    .replace(/\u200B/g, '');
}

/** Characters that would start markup if left bare (CommonMark inlines and GFM tables). */
const SPECIAL = /[*_[\]()#|`+!~<>\\]/;
/** The text with every backslash-escaped punctuation pair removed: what is left is bare. */
const bare = (s: string): string => s.replace(/\\[!-/:-@[-`{-~]/g, '');
const BIDI_OR_CONTROL = /[\u0000-\u001F\u007F-\u009F\u202A-\u202E\u2066-\u2069]/;

describe('escapeMarkdown', () => {
  it('turns the hostile names inert', () => {
    const img = escapeMarkdown(HOSTILE.img);
    expect(img).not.toContain('<');
    expect(img).toContain('&lt;img');
    const link = escapeMarkdown(HOSTILE.link);
    // `](` can only open a link destination when both brackets are bare.
    expect(link).not.toMatch(/(^|[^\\])\]\(/);
    expect(link.startsWith('\\]\\(')).toBe(true);
    expect(escapeMarkdown(HOSTILE.mention)).not.toMatch(/@[A-Za-z0-9]/);
    expect(readAsCommonMark(escapeMarkdown(HOSTILE.issue))).toBe('fixes #123');
    expect(escapeMarkdown(HOSTILE.issue)).not.toMatch(/#\d/);
    expect(escapeMarkdown('see GH-42')).not.toMatch(/GH-\d/);
    expect(escapeMarkdown(HOSTILE.tick)).toBe('a\\`b\\`\\|c\\|d');
    expect(escapeMarkdown(HOSTILE.proto)).toBe('\\_\\_proto\\_\\_');
    expect(escapeMarkdown(HOSTILE.bidi)).not.toMatch(BIDI_OR_CONTROL);
    expect(escapeMarkdown(HOSTILE.control)).not.toMatch(BIDI_OR_CONTROL);
    expect(escapeMarkdown('a\nb\r\nc')).toBe('a b c');
    expect(escapeMarkdown('https://example.org/x')).not.toContain('://');
  });

  it('caps a 10 KB name at 200 characters with an ellipsis', () => {
    const out = escapeMarkdown(HOSTILE.long);
    expect(Array.from(out).length).toBe(200);
    expect(out.endsWith('…')).toBe(true);
  });

  it('leaves no bare markup character and reads back as the cleaned text (any string)', () => {
    fc.assert(
      fc.property(fc.string({ unit: 'binary', maxLength: 120 }), (s) => {
        const out = escapeMarkdown(s, 1000);
        expect(bare(out)).not.toMatch(SPECIAL);
        expect(out).not.toMatch(BIDI_OR_CONTROL);
        expect(readAsCommonMark(out)).toBe(cleanText(s, 1000));
      }),
      { numRuns: 500 },
    );
  });
});

describe('escapeHtml', () => {
  it('escapes the five HTML-significant characters (HTML Living Standard, "escaping a string")', () => {
    expect(escapeHtml(`<a href="x" title='y'>&</a>`)).toBe(
      '&lt;a href=&quot;x&quot; title=&#39;y&#39;&gt;&amp;&lt;/a&gt;',
    );
    expect(escapeHtml(HOSTILE.img)).toBe('&lt;img src=x onerror=alert(1)&gt;');
  });

  it('strips controls and bidi overrides, never leaves a bare < > " or \'', () => {
    fc.assert(
      fc.property(fc.string({ unit: 'binary', maxLength: 120 }), (s) => {
        const out = escapeHtml(s);
        expect(out).not.toMatch(/[<>"']/);
        expect(out).not.toMatch(BIDI_OR_CONTROL);
        // Every & starts one of the entities we write.
        expect(out.replace(/&(amp|lt|gt|quot|#39);/g, '')).not.toContain('&');
      }),
      { numRuns: 500 },
    );
  });
});
