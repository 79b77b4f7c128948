import { meanAndSquares } from '../model/moments.js';
import type { SelectedBaseline } from './baseline.js';
import type { MetricScore } from './judge-metric.js';
import { fitScaleFloor } from './resolution-floor.js';
import { worseSign } from './sides.js';

/** A scored group member: its single-metric score and the baseline it was scored on. */
export interface GroupMemberInput {
  score: MetricScore;
  baseline: SelectedBaseline;
}

/**
 * The group's runs as a matrix of standardised, signed values: rows are the baseline runs that
 * hold every member (oldest first), columns the members; u = sign (x - mean) / sd on the fit
 * scale, with sign +1 when higher is worse and -1 when lower is worse, so "worse" is positive
 * for every column and a shared slowdown moves all columns the same way.
 */
export interface GroupFrame {
  members: GroupMemberInput[];
  rows: number[][];
  /** This run, standardised the same way. */
  current: number[];
}

/**
 * Aligns the members' windows (before any change-point shortening) on the runs they share and standardises each column by its mean
 * and n-1 sd over those runs (sd floored at the member's resolution). A member whose column has
 * no spread cannot be standardised and is left out (`dropped`), to be judged alone.
 * O(runs x members).
 * @example frameGroup(members).rows.length // number of shared baseline runs
 */
export function frameGroup(inputs: readonly GroupMemberInput[]): GroupFrame & { dropped: GroupMemberInput[] } {
  const shared = sharedRunIds(inputs);
  const members: GroupMemberInput[] = [];
  const dropped: GroupMemberInput[] = [];
  const columns: number[][] = [];
  const current: number[] = [];
  for (const input of inputs) {
    const byRun = new Map<string, number>();
    const whole = input.baseline.window ?? input.baseline;
    whole.runIds.forEach((id, i) => byRun.set(id, whole.values[i]!));
    const column = shared.map((id) => byRun.get(id)!);
    const { settings } = input.score;
    const stats = column.length >= 2 ? meanAndSquares(column) : { n: column.length, mean: 0, squares: 0 };
    const floor = fitScaleFloor(settings.resolution, settings.transform, stats.mean);
    const sd = Math.max(Math.sqrt(stats.squares / Math.max(stats.n - 1, 1)), floor);
    if (!(sd > 0) || input.score.current === undefined) {
      dropped.push(input);
      continue;
    }
    const sign = worseSign(settings.worse);
    members.push(input);
    columns.push(column.map((x) => (sign * (x - stats.mean)) / sd));
    current.push((sign * (input.score.current - stats.mean)) / sd);
  }
  const rows = shared.map((_, i) => columns.map((column) => column[i]!));
  return { members, rows, current, dropped };
}

/** Run ids present in every member's whole window, in the first member's (history) order. */
function sharedRunIds(inputs: readonly GroupMemberInput[]): string[] {
  const [first, ...others] = inputs;
  if (first === undefined) return [];
  const ids = (input: GroupMemberInput): string[] => (input.baseline.window ?? input.baseline).runIds;
  const sets = others.map((input) => new Set(ids(input)));
  return ids(first).filter((id) => sets.every((set) => set.has(id)));
}
