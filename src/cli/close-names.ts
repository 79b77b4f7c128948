import { editDistance } from '../config/did-you-mean.js';

/**
 * Names near a mistyped one, for "did you mean" hints: by Levenshtein edit distance (at most a
 * third of the name's length), plus names that contain the typed text. At most `limit`, nearest first.
 * Bounded: names longer than 200 characters are not compared (the distance is O(a*b)).
 * @example closeNames('latency/p59', ['latency/p50', 'size/app']) // ['latency/p50']
 */
export function closeNames(typed: string, names: Iterable<string>, limit = 3): string[] {
  if (typed.length > 200) return [];
  const scored: Array<{ name: string; d: number }> = [];
  const allowed = Math.max(2, Math.floor(typed.length / 3));
  for (const name of names) {
    if (name.length > 200) continue;
    const d = name.includes(typed) ? 0.5 : editDistance(typed, name);
    if (d <= allowed) scored.push({ name, d });
  }
  scored.sort((a, b) => a.d - b.d || (a.name < b.name ? -1 : 1));
  return scored.slice(0, limit).map((s) => s.name);
}

export { editDistance };
