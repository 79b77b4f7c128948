import { median } from 'simple-statistics';
import { detectChangePoints, differenceSigma } from '../model/change-points.js';

/** A new level must differ from every earlier one by this many noise sigmas (our rule of thumb). */
export const DISTINCT_SIGMAS = 2;

/** Shortest run of a lasting level: min-runs, and never fewer than this (a regime of a few runs is noise). */
export const LASTING_RUNS = 10;

/**
 * Where a lasting new level of a metric's own moves starts, if it has one: the newest change
 * point of detectChangePoints (a robust cost and a penalty calibrated to the series' tails,
 * segments of at least `minSegment` runs) counts only when the level after it
 * - differs from EVERY earlier segment's level by at least DISTINCT_SIGMAS noise sigmas (a regime
 *   that came back to a level seen before is noise that comes and goes, not a new level), and
 * - holds: the newest half of the segment sits nearer the new level than the one before it.
 * The own moves are the values after the run's shared move is taken out, so a load regime that
 * slows every timing at once is not seen here at all. Returns the index into `values`, or undefined.
 * @example lastingStart([...Array(30).fill(0), ...Array(30).fill(5)].map((x, i) => x + (i % 3) * 0.1), 10) // 30
 */
export function lastingStart(values: readonly number[], minSegment: number): number | undefined {
  const starts = detectChangePoints(values, { minSegment });
  const last = starts.at(-1);
  if (last === undefined) return undefined;
  const sigma = differenceSigma(values);
  const bounds = [0, ...starts, values.length];
  const levels = bounds.slice(0, -1).map((b, k) => median(values.slice(b, bounds[k + 1])));
  const level = levels.at(-1)!;
  const before = levels.at(-2)!;
  if (levels.slice(0, -1).some((earlier) => Math.abs(level - earlier) < DISTINCT_SIGMAS * sigma)) return undefined;
  const newest = values.slice(values.length - Math.ceil((values.length - last) / 2));
  const now = median(newest);
  return Math.abs(now - level) < Math.abs(now - before) ? last : undefined;
}
