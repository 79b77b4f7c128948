import { median } from 'simple-statistics';
import type { Config } from '../config/types.js';
import { halfTailShape } from '../model/tail-shape.js';
import { studentTail } from '../model/tails.js';
import { combinedDof } from './judge.js';
import type { GroupMoves } from './moves.js';
import type { SharedMoveResult } from './report.js';

/**
 * Judges a group's shared move in this run against the shared moves of its baseline runs
 * (issue 13 item 3): the same predictive as a metric's own move — the history's slow side
 * fitted with a half Student-t (halfTailShape), scale sqrt(1 + 1/n) for the centre's uncertainty,
 * degrees of freedom combined with n - 1 — and `unsettled` when its slow-side tail is below the
 * run's budget: every timing moved together beyond what the history has shown, which one run
 * cannot tell from a change that slowed everything (a re-run, or a baseline run on the same
 * runner, tells). A faster shared move is never unsettled. Learning below min-runs shared moves.
 * The group's moves are in its members' deviation units (the log scale for timings); the result's
 * `move` and `largest` are relative changes.
 */
export function judgeSharedMove(moves: GroupMoves, config: Config): SharedMoveResult {
  const { group } = moves;
  const log = group.members.every((c) => c.log);
  const relative = (d: number): number => (log ? Math.expm1(d) : d);
  const base: SharedMoveResult = {
    name: group.name,
    status: 'ok',
    members: moves.members,
    move: relative(moves.now),
    n: moves.history.length,
  };
  const minRuns = Math.max(...group.members.map((c) => c.settings.minRuns));
  if (moves.history.length < minRuns) return { ...base, status: 'learning' };
  base.largest = relative(Math.max(...moves.history));
  const centre = median(moves.history);
  const residuals = moves.history.map((s) => s - centre);
  const n = residuals.length;
  const sd = Math.sqrt(residuals.reduce((sum, e) => sum + e * e, 0) / Math.max(1, n - 1));
  const move = moves.now - centre;
  if (!(sd > 0)) return { ...base, tail: move > 0 ? 0 : 1, status: move > 0 ? 'unsettled' : 'ok' };
  const shape = halfTailShape(residuals.map((e) => e / sd)) ?? { nu: Infinity, scale: 1, n: 0 };
  const scale = shape.scale * sd * Math.sqrt(1 + 1 / n);
  const tail = studentTail(move / scale, combinedDof(shape.nu, n - 1), 'upper');
  return { ...base, tail, status: tail < config.budget ? 'unsettled' : 'ok' };
}
