import { studentRelativeDensity, type UpperQuantile } from '../model/tails.js';
import type { Scored } from './judge.js';
import type { MetricResult } from './report.js';

/** Family control's figures for one metric: its adjusted tail, the level of its rank, the budget and its Bonferroni share. */
export interface FamilyFigures {
  adjusted: number;
  level: number;
  budget: number;
  share: number;
}

/**
 * A scored metric's status (README.md "How the decision works"): regressed when its test fires on the worse
 * side and its own move is beyond the tolerance; improved likewise on the better side (reported,
 * never blocking); ok otherwise. The test: with family control, the adjusted worse-side tail at
 * or below the budget (for Holm the same as its tail at or below the level of its rank), and the
 * better side's tail below the Bonferroni share; without, the relative density below `cutoff`.
 * Under family control the result also carries the effective cutoff: the relative density at
 * which the worse side's tail equals the metric's level, so the density idea stays visible.
 * Returns a new result.
 * @example decide(scored, undefined, rememberedQuantile()).status // 'regressed'
 */
export function decide(s: Scored, family: FamilyFigures | undefined, quantile: UpperQuantile): MetricResult {
  const result: MetricResult = { ...s.result };
  const r = result.relativeDensity ?? 1;
  let worse: boolean;
  let better: boolean;
  if (family === undefined) {
    worse = r < result.cutoff && (s.move > 0 || (s.both && s.move !== 0));
    better = r < result.cutoff && s.move < 0 && !s.both;
  } else {
    result.adjusted = family.adjusted;
    result.level = family.level;
    const level = Math.min(0.5, s.both ? family.level / 2 : family.level);
    result.effectiveCutoff = studentRelativeDensity(quantile(level, s.worse.nu), s.worse.nu);
    worse = family.adjusted <= family.budget && (s.move > 0 || (s.both && s.move !== 0));
    better = s.betterTail < family.share && s.move < 0 && !s.both;
  }
  if ((worse || better) && s.beyondTolerance) result.status = worse ? 'regressed' : 'improved';
  else result.status = 'ok';
  if (result.status !== 'ok' || !(worse || better)) {
    if (result.note?.kind === 'within-tolerance') delete result.note;
  }
  return result;
}
