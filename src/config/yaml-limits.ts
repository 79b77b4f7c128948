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
          return {
            ...at,
            message: `nesting is deeper than ${MAX_CONFIG_DEPTH} levels`,
            fix: 'a Bellgate config needs only a few levels (section, list, rule, globs); flatten the document',
          };
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
