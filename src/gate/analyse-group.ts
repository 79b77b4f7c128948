import { hotellingTail, chiSquareTail } from '../model/hotelling.js';
import { shrunkCovariance } from '../model/ledoit-wolf.js';
import { mahalanobisContributions } from '../model/mahalanobis.js';
import { meanAndSquares } from '../model/moments.js';
import { studentTail } from '../model/tails.js';
import type { GroupFrame } from './group-frame.js';

/**
 * Shares of the group's level. A change usually touches one benchmark, which the own moves find
 * far sooner than the distance (it spreads its power over every member), so they get 0.8; the
 * common move (everything slower) and the distance (broad patterns) keep 0.1 each. Spending the
 * level once for the whole group keeps its false alarms at the level, not three times it.
 */
export const OWN_WEIGHT = 0.8;
export const COMMON_WEIGHT = 0.1;
export const DISTANCE_WEIGHT = 0.1;

/** A move judged against the history of the same quantity: z in its sd, two-sided predictive tail. */
export interface Move {
  z: number;
  tail: number;
}

/** Everything the group's decision needs, before any family adjustment. */
export interface GroupAnalysis {
  n: number;
  p: number;
  /** Mean of the members' signed standardised values in this run, against its baseline history. */
  common: Move;
  /** Each member's own move (its value minus the common move), against its own history. */
  own: Move[];
  /** min(1, p x smallest own tail): Bonferroni over the members' own moves. */
  ownTail: number;
  /** Squared Mahalanobis distance under the Ledoit-Wolf shrunk covariance, and its tail. */
  distance: number;
  distanceTail: number;
  shrinkage: number;
  /** Each member's share of the distance (mahalanobisContributions / distance). */
  shares: number[];
  /**
   * The group's one tail: min(1, ownTail / 0.8, commonTail / 0.1, distanceTail / 0.1), a weighted
   * Bonferroni over the three checks (Holm 1979; weights as in Benjamini & Hochberg 1997), so the
   * group is one test at its level. The distance is left out while runs do not exceed members,
   * where the chi-square stand-in for Hotelling's law is far too optimistic about the covariance.
   */
  tail: number;
}

/**
 * Analyses a group of metrics judged together (issue 6):
 * - joint: squared Mahalanobis distance of this run from the baseline mean, covariance shrunk
 *   toward its diagonal (Ledoit & Wolf 2004), tail by Hotelling's T^2 for a new observation
 *   (chi-square, reported only, when runs do not exceed members: Hotelling's law is undefined);
 * - common move c = mean of the signed standardised values, judged against the common move of
 *   each baseline run (predictive Student-t, n - 1 dof), so a slow runner within what runners
 *   have shown passes while a slowdown of everything beyond it does not;
 * - own moves o_j = u_j - c, each judged against its own history; a single metric that moved
 *   shows here with its own noise only, which is much smaller than the runner's.
 * The Mahalanobis distance spreads its power over p directions, so a lone moved member is found
 * far sooner by the largest own move (a union-intersection check, Bonferroni over members); the
 * group's tail is the weighted Bonferroni combination of the three checks, one test at its level.
 * O(n p^2 + p^3). Needs at least 3 rows and 2 members (the caller checks).
 * @example analyseGroup(frame).tail // 0.73 for an ordinary run
 */
export function analyseGroup(frame: GroupFrame): GroupAnalysis {
  const { rows, current } = frame;
  const n = rows.length;
  const p = current.length;
  const commons = rows.map(average);
  const now = average(current);
  const common = judgeMove(commons, now);
  const own = current.map((u, j) =>
    judgeMove(
      rows.map((row, i) => row[j]! - commons[i]!),
      u - now,
    ),
  );
  const ownTail = Math.min(1, p * Math.min(...own.map((m) => m.tail)));
  const shrunk = shrunkCovariance(rows);
  const contributions = mahalanobisContributions(current, shrunk.mean, shrunk.covariance);
  const distance = Math.max(
    0,
    contributions.reduce((sum, c) => sum + c, 0),
  );
  const distanceTail = n > p ? hotellingTail(distance, p, n) : chiSquareTail(distance, p);
  return {
    n,
    p,
    common,
    own,
    ownTail,
    distance,
    distanceTail,
    shrinkage: shrunk.shrinkage,
    shares: contributions.map((c) => (distance > 0 ? c / distance : 0)),
    tail: Math.min(1, ownTail / OWN_WEIGHT, common.tail / COMMON_WEIGHT, n > p ? distanceTail / DISTANCE_WEIGHT : 1),
  };
}

const MIN_MOVE_SD = 1e-6;

/** A new value against the history of the same quantity: z and the predictive t tail. */
function judgeMove(history: readonly number[], value: number): Move {
  const { n, mean, squares } = meanAndSquares(history);
  // Values are in member sd units; a history with no spread at all (members moving in perfect
  // lockstep) gets a floor of 1e-6 of a member's sd, far below any real noise, so a move off it
  // is extreme instead of undefined.
  const sd = Math.max(Math.sqrt(squares / (n - 1)), MIN_MOVE_SD);
  const z = (value - mean) / sd;
  return { z, tail: studentTail(z / Math.sqrt(1 + 1 / n), n - 1, 'both') };
}

function average(values: readonly number[]): number {
  let sum = 0;
  for (const v of values) sum += v;
  return sum / values.length;
}
