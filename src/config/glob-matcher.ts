import picomatch from 'picomatch';

/** Tests one metric name against a rule's globs. */
export type NameMatcher = (name: string) => boolean;

// Metric names are not paths: a leading '.' is an ordinary character (dot: true), and '\' is
// never a separator, whatever the operating system (windows: false).
const OPTIONS = { dot: true, windows: false } as const;

// One matcher per globs array (a rule's or group's `match`), so settingsFor compiles each rule once.
const compiled = new WeakMap<readonly string[], NameMatcher>();

/**
 * Compiles a rule's globs (picomatch syntax) into one matcher: a name matches when it matches at
 * least one plain glob and no glob starting with '!' (only '!' globs: everything but those).
 * Metric names contain '/', and `*` stays within one '/' segment while `**` crosses segments:
 * `throughput/*` matches `throughput/home` but not `throughput/api/v2`; `size/**` matches both
 * `size/app.js` and `size/assets/logo.svg`. Compiled once per globs array.
 * Throws picomatch's error for a pattern it cannot compile (to-config.ts reports it with line:column).
 * @example compileGlobs(['latency/*', '!latency/calibrate'])('latency/render') // true
 */
export function compileGlobs(globs: readonly string[]): NameMatcher {
  const known = compiled.get(globs);
  if (known) return known;
  const plain = globs.filter((g) => !g.startsWith('!'));
  const negated = globs.filter((g) => g.startsWith('!')).map((g) => g.slice(1));
  const include = plain.length > 0 ? picomatch(plain, OPTIONS) : () => true;
  const exclude = negated.length > 0 ? picomatch(negated, OPTIONS) : () => false;
  const matcher = (name: string) => include(name) && !exclude(name);
  compiled.set(globs, matcher);
  return matcher;
}

/**
 * True when the glob has no wildcard or brace characters, so it names exactly one metric.
 * @example isLiteralGlob('latency/calibrate') // true
 */
export function isLiteralGlob(glob: string): boolean {
  return !picomatch.scan(glob).isGlob && !glob.startsWith('!');
}
