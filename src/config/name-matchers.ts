/** Tests one metric name against a rule's globs. */
export type NameMatcher = (name: string) => boolean;

/** Turns a rule's globs into a matcher (throws for a glob it cannot compile) and tells literal globs. */
export interface GlobCompiler {
  compile(globs: readonly string[]): NameMatcher;
  isLiteral(glob: string): boolean;
}

// Characters that picomatch (dot: true, windows: false) reads as themselves, checked against it by
// test/config/name-matchers.test.ts. Left out: its specials (* ? [ ] { } ( ) ! + @ |), the escape
// '\', '"' and '$' (it treats them specially), and anything outside ASCII. A leading "./" is
// stripped by picomatch, so such a glob is not plain either.
const PLAIN = /^(?!\.\/)[A-Za-z0-9 _.,:;=#%&~<>'`^/-]+$/;

/**
 * True when the glob can only match the one name written, so a string comparison decides it and
 * no glob library is needed: letters, digits and the punctuation listed in PLAIN, not "./" first.
 * @example isPlainGlob('latency/calibrate') // true
 * @example isPlainGlob('latency/*') // false
 */
export function isPlainGlob(glob: string): boolean {
  return PLAIN.test(glob);
}

/**
 * The matcher of globs that are all plain names, each maybe with a leading '!' (exclude), with the
 * same meaning as compileGlobs: a name matches when it is one of the plain names (or there are
 * none) and none of the excluded ones. undefined when any glob needs the glob library.
 * @example exactMatcher(['a/b', 'a/c'])?.('a/c') // true
 */
export function exactMatcher(globs: readonly string[]): NameMatcher | undefined {
  const include = new Set<string>();
  const exclude = new Set<string>();
  for (const glob of globs) {
    const negated = glob.startsWith('!');
    const body = negated ? glob.slice(1) : glob;
    if (!isPlainGlob(body)) return undefined;
    (negated ? exclude : include).add(body);
  }
  if (include.size === 1 && exclude.size === 0) {
    const only = [...include][0];
    return (name) => name === only;
  }
  return (name) => (include.size === 0 || include.has(name)) && !exclude.has(name);
}

// Matchers by globs array (the `match` array of a rule or group), filled when a config is read,
// so settingsFor and groupFor stay pure and synchronous however the glob library was loaded.
const compiled = new WeakMap<readonly string[], NameMatcher>();
let fallback: ((globs: readonly string[]) => NameMatcher) | undefined;

/** Files the matcher of a globs array for matcherFor; returns it. */
export function rememberMatcher(globs: readonly string[], matcher: NameMatcher): NameMatcher {
  compiled.set(globs, matcher);
  return matcher;
}

/** The matcher filed for this globs array, if any. */
export function knownMatcher(globs: readonly string[]): NameMatcher | undefined {
  return compiled.get(globs);
}

/** Sets the compiler for globs that were never filed (glob-matcher.ts registers picomatch's). */
export function useFallbackCompiler(compile: (globs: readonly string[]) => NameMatcher): void {
  fallback = compile;
}

/**
 * The matcher for a rule's globs: the one filed when the config was read, else plain names
 * compared as strings, else the fallback compiler (present once glob-matcher.ts is loaded).
 * @throws Error when the globs need the glob library and it was never loaded: a Config built by
 *   hand with globs must be read through parseConfig/readConfigFile or compiled with compileGlobs.
 * @example matcherFor(['latency/render'])('latency/render') // true
 */
export function matcherFor(globs: readonly string[]): NameMatcher {
  const known = compiled.get(globs);
  if (known) return known;
  const made = exactMatcher(globs) ?? fallback?.(globs);
  if (!made)
    throw new Error(
      `the globs ${JSON.stringify(globs)} were never compiled; read the config with readConfigFile or parseConfig`,
    );
  return rememberMatcher(globs, made);
}

/** Compiles rules of plain names only, without any glob library. */
export const exactNameCompiler: GlobCompiler = {
  compile(globs) {
    const matcher = knownMatcher(globs) ?? exactMatcher(globs);
    if (!matcher) throw new Error(`exactNameCompiler got globs that need the glob library: ${JSON.stringify(globs)}`);
    return rememberMatcher(globs, matcher);
  },
  isLiteral: isPlainGlob,
};
