/** The eight Unicode block heights, lowest first (U+2581..U+2588). */
export const BLOCKS = ['▁', '▂', '▃', '▄', '▅', '▆', '▇', '█'] as const;

/** Separates the history from this run's mark, so the mark reads as "and now". */
export const MARK_SEPARATOR = '→';

/**
 * A one-line picture of a series: one block per value, height linear between the smallest and
 * largest finite value (this run's `mark` included, so a jump stands out). Missing values (NaN)
 * show as a space; a constant series sits at mid height. When `mark` is given it follows the
 * history after an arrow. Returns '' when nothing is finite. Plain text, so it reads the same in a
 * terminal, a code span on GitHub and a screen reader's character mode.
 * @example sparkline([1, 2, 3, 4, 5, 6, 7, 8]) // '▁▂▃▄▅▆▇█'
 * @example sparkline([1, 1, 1], 2) // '▁▁▁→█'
 */
export function sparkline(values: readonly number[], mark?: number): string {
  const finite = values.filter((v) => Number.isFinite(v));
  const hasMark = mark !== undefined && Number.isFinite(mark);
  if (hasMark) finite.push(mark);
  if (finite.length === 0) return '';
  let lo = Infinity;
  let hi = -Infinity;
  for (const v of finite) {
    if (v < lo) lo = v;
    if (v > hi) hi = v;
  }
  const block = (v: number): string => {
    if (!Number.isFinite(v)) return ' ';
    if (hi === lo) return BLOCKS[3];
    const i = Math.round(((v - lo) / (hi - lo)) * (BLOCKS.length - 1));
    return BLOCKS[Math.min(BLOCKS.length - 1, Math.max(0, i))] ?? BLOCKS[3];
  };
  const line = values.map(block).join('');
  return hasMark ? `${line}${MARK_SEPARATOR}${block(mark)}` : line;
}
