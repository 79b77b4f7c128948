/**
 * Levenshtein edit distance (insertions, deletions, substitutions each cost 1), by the classic
 * two-row dynamic programme (Wagner & Fischer 1974). O(|a| * |b|) time, O(|b|) memory.
 * @example editDistance('cuttoff', 'cutoff') // 1
 */
export function editDistance(a: string, b: string): number {
  let previous = Array.from({ length: b.length + 1 }, (_, j) => j);
  for (let i = 1; i <= a.length; i++) {
    const current = [i];
    for (let j = 1; j <= b.length; j++) {
      const cost = a[i - 1] === b[j - 1] ? 0 : 1;
      current[j] = Math.min(previous[j]! + 1, current[j - 1]! + 1, previous[j - 1]! + cost);
    }
    previous = current;
  }
  return previous[b.length]!;
}

/** Case, dashes, underscores and spaces are what people most often get "wrong" in a key. */
function normalise(word: string): string {
  return word.toLowerCase().replace(/[-_\s]/g, '');
}

/**
 * The candidate a mistyped word most likely meant, or undefined when none is close: equal after
 * ignoring case, '-', '_' and spaces (`minRuns`, `min_runs` -> `min-runs`), else within an edit
 * distance of about a third of the candidate's length (`cuttoff` -> `cutoff`).
 * @example didYouMean('tolerence', ['cutoff', 'tolerance']) // 'tolerance'
 */
export function didYouMean(word: string, candidates: readonly string[]): string | undefined {
  if (word.length > 64) return undefined;
  const plain = normalise(word);
  let best: string | undefined;
  let bestDistance = Infinity;
  for (const candidate of candidates) {
    const target = normalise(candidate);
    if (target === plain) return candidate;
    const distance = editDistance(plain, target);
    if (distance <= Math.max(1, Math.floor(target.length / 3)) && distance < bestDistance) {
      best = candidate;
      bestDistance = distance;
    }
  }
  return best;
}
