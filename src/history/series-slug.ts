/**
 * A series name as a readable file-name part: letters, digits, `.`, `_` and `-` only, no leading or
 * trailing dot or dash (so never `..` or a hidden file), at most 60 characters; may be empty. Not
 * unique ("a/b" and "a b" coincide): callers add a hash of the exact name.
 * @example seriesSlug('bench/linux x64') // 'bench-linux-x64'
 */
export function seriesSlug(series: string): string {
  return series
    .replace(/[^A-Za-z0-9._-]+/g, '-')
    .replace(/^[-.]+|[-.]+$/g, '')
    .slice(0, 60);
}
