import picomatch from 'picomatch';
import {
  exactMatcher,
  knownMatcher,
  rememberMatcher,
  useFallbackCompiler,
  type GlobCompiler,
  type NameMatcher,
} from './name-matchers.js';

export type { NameMatcher };

// Metric names are not paths: a leading '.' is an ordinary character (dot: true), and '\' is
// never a separator, whatever the operating system (windows: false).
const OPTIONS = { dot: true, windows: false } as const;

/**
 * Compiles a rule's globs (picomatch syntax) into one matcher: a name matches when it matches at
 * least one plain glob and no glob starting with '!' (only '!' globs: everything but those).
 * Metric names contain '/', and `*` stays within one '/' segment while `**` crosses segments:
 * `throughput/*` matches `throughput/home` but not `throughput/api/v2`; `size/**` matches both
 * `size/app.js` and `size/assets/logo.svg`. Globs that are plain names are compared as strings
 * (exactMatcher, the same answers). Compiled once per globs array and filed for settingsFor.
 * Throws picomatch's error for a pattern it cannot compile (load.ts reports it with line:column).
 * @example compileGlobs(['latency/*', '!latency/calibrate'])('latency/render') // true
 */
export function compileGlobs(globs: readonly string[]): NameMatcher {
  const known = knownMatcher(globs);
  if (known) return known;
  const exact = exactMatcher(globs);
  if (exact) return rememberMatcher(globs, exact);
  const plain = globs.filter((g) => !g.startsWith('!'));
  const negated = globs.filter((g) => g.startsWith('!')).map((g) => g.slice(1));
  const include = plain.length > 0 ? picomatch(plain, OPTIONS) : () => true;
  const exclude = negated.length > 0 ? picomatch(negated, OPTIONS) : () => false;
  return rememberMatcher(globs, (name) => include(name) && !exclude(name));
}

/**
 * True when the glob has no wildcard or brace characters, so it names exactly one metric.
 * @example isLiteralGlob('latency/calibrate') // true
 */
export function isLiteralGlob(glob: string): boolean {
  return !picomatch.scan(glob).isGlob && !glob.startsWith('!');
}

/** The full glob syntax, through picomatch. */
export const picomatchCompiler: GlobCompiler = { compile: compileGlobs, isLiteral: isLiteralGlob };

// Once picomatch is loaded anyway, globs filed by no reader (a Config built in code) still match.
useFallbackCompiler(compileGlobs);
