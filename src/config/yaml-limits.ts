import type { CST, LineCounter } from 'yaml';
import type { ConfigProblem } from './problems.js';

/** Largest config text accepted (characters); a real config is a few kilobytes. */
export const MAX_CONFIG_CHARS = 1024 * 1024;
/** Deepest nesting of collections; a config needs five levels, so 32 leaves room without risk. */
export const MAX_CONFIG_DEPTH = 32;
/** Longest single scalar (characters); globs and names are short. */
export const MAX_SCALAR_CHARS = 16 * 1024;
/** Most alias uses (`*name`) in one file; the guard against "billion laughs" expansion. */
export const MAX_ALIAS_COUNT = 100;
/** Most values after aliases are expanded. */
export const MAX_CONFIG_VALUES = 10_000;
/**
 * Most entries (keys, list items, flow commas and brackets) in the text, counted before parsing
 * so that an oversized document costs a linear scan, not a parse; a large real config has a few
 * hundred.
 */
export const MAX_CONFIG_ENTRIES = 5_000;

const DEEP: Omit<ConfigProblem, 'line' | 'col'> = {
  message: `nesting is deeper than ${MAX_CONFIG_DEPTH} levels`,
  fix: 'a Bellgate config needs only a few levels (section, list, rule, globs); flatten the document',
};

/**
 * Checks the raw token tree before anything recursive runs over it: nesting depth and scalar
 * length. Walks with an explicit stack, so a 10,000-deep `[[[[...` cannot overflow the call stack.
 * Returns the first problem found, or undefined.
 * @example checkTokenLimits(tokens, counter) // undefined for an ordinary config
 */
export function checkTokenLimits(tokens: readonly CST.Token[], counter: LineCounter): ConfigProblem | undefined {
  const stack: Array<[CST.Token, number]> = tokens.map((t) => [t, 0]);
  while (stack.length > 0) {
    const [token, depth] = stack.pop()!;
    const at = counter.linePos(token.offset);
    switch (token.type) {
      case 'document':
        if (token.value) stack.push([token.value, depth]);
        break;
      case 'block-map':
      case 'block-seq':
      case 'flow-collection': {
        if (depth + 1 > MAX_CONFIG_DEPTH) {
          return { ...at, ...DEEP };
        }
        for (const item of token.items) {
          if ('key' in item && item.key) stack.push([item.key, depth + 1]);
          if (item.value) stack.push([item.value, depth + 1]);
        }
        break;
      }
      case 'scalar':
      case 'single-quoted-scalar':
      case 'double-quoted-scalar':
      case 'block-scalar':
        if (token.source.length > MAX_SCALAR_CHARS) {
          return {
            ...at,
            message: `a value of ${token.source.length} characters is longer than the limit of ${MAX_SCALAR_CHARS}`,
            fix: 'globs, names and numbers are short; remove the oversized value',
          };
        }
        break;
      default:
        break;
    }
  }
  return undefined;
}

/**
 * A linear scan of the raw text, before the parser, for the shapes that make the YAML library
 * slow down faster than linearly: flow brackets nested past the limit (10,000 "[" take 0.6 s to
 * parse), compact block indicators at the start of a line ("- - - x"; 300,000 take 4 s), and
 * more than MAX_CONFIG_ENTRIES keys or items. Quotes and
 * comments are skipped; checkTokenLimits still checks the real tree after parsing.
 * Returns a problem at the first bracket, indicator or entry past a limit, or undefined.
 * @example prescanShape('[[[]]]') // undefined
 */
export function prescanShape(text: string): ConfigProblem | undefined {
  let depth = 0;
  let entries = 0;
  let line = 1;
  let lineStart = 0;
  for (let i = 0; i < text.length; i++) {
    const c = text[i]!;
    if (c === '\n') {
      line++;
      lineStart = i + 1;
      continue;
    }
    if (i === lineStart) {
      let j = i;
      let indicators = 0;
      while (j < text.length && (text[j] === ' ' || text[j] === '\t')) j++;
      while ('-?:'.includes(text[j] ?? 'x') && (text[j + 1] === ' ' || text[j + 1] === '\t')) {
        if (++indicators > MAX_CONFIG_DEPTH) return { line, col: j - lineStart + 1, ...DEEP };
        j += 2;
        while (text[j] === ' ' || text[j] === '\t') j++;
      }
    }
    const prev = i === 0 ? ' ' : text[i - 1]!;
    const tokenStart = ' \t\n[{,:-?'.includes(prev);
    if (c === '#' && (prev === ' ' || prev === '\t' || i === lineStart)) {
      while (i + 1 < text.length && text[i + 1] !== '\n') i++;
    } else if ((c === '"' || c === "'") && tokenStart) {
      // Skip the quoted scalar, counting its line breaks.
      for (i++; i < text.length; i++) {
        if (c === '"' && text[i] === '\\') i++;
        else if (text[i] === c) break;
        else if (text[i] === '\n') {
          line++;
          lineStart = i + 1;
        }
      }
    } else if (
      (c === ':' && (' \t\r\n'.includes(text[i + 1] ?? ' ') || (depth > 0 && ',]}'.includes(text[i + 1]!)))) ||
      (c === '-' && tokenStart && ' \t\r\n'.includes(text[i + 1] ?? ' ')) ||
      (c === ',' && depth > 0) ||
      c === '[' ||
      c === '{'
    ) {
      if (++entries > MAX_CONFIG_ENTRIES) {
        return {
          line,
          col: i - lineStart + 1,
          message: `the config has more than ${MAX_CONFIG_ENTRIES} entries`,
          fix: 'a Bellgate config needs a few hundred keys and list items; use globs to cover many metrics with one rule',
        };
      }
    }
    if (c === '[' || c === '{') {
      if (++depth > MAX_CONFIG_DEPTH) return { line, col: i - lineStart + 1, ...DEEP };
    } else if ((c === ']' || c === '}') && depth > 0) {
      depth--;
    }
  }
  return undefined;
}
