import type { MetricResult, Status } from './report.js';
import type { MetricScore } from './judge-metric.js';
import { formatNumber, formatPercent } from './format-number.js';
import { describeTolerance } from './tolerance.js';
import { rememberLast } from './remember-last.js';

/** The outcome of the test a metric's decision rests on, and how to say it in a reason. */
export interface Test {
  significant: boolean;
  /** e.g. "relative density 3.2e-4 < cutoff 0.01". */
  phrase: string;
}

/**
 * The plain per-metric test: relative density below the cutoff.
 * @example plainTest({ relativeDensity: 0.002, cutoff: 0.01 }).phrase // 'relative density 2e-3 < cutoff 0.01'
 */
export function plainTest(result: Pick<MetricResult, 'relativeDensity' | 'cutoff'>): Test {
  const r = result.relativeDensity ?? 1;
  const significant = r < result.cutoff;
  return {
    significant,
    phrase: `relative density ${formatNumber(r)} ${significant ? '<' : '≥'} cutoff ${cutoffText(result.cutoff)}`,
  };
}

/** formatNumber(cutoff), computed once for the cutoff the metrics share. */
const cutoffText = rememberLast(formatNumber);

/**
 * Status and reason of a scored metric from the outcome of its test (plain, family-adjusted or
 * its group's): regressed when significant on the worse side beyond the tolerance, improved when
 * significant on the better side beyond it, ok otherwise. Returns a new result.
 * @example decideMetric(score, plainTest(score.result)).status // 'regressed'
 */
export function decideMetric(score: MetricScore, test: Test): MetricResult {
  return { ...score.result, ...decision(score, test) };
}

/** decideMetric's status and reason alone, for a caller that owns the result and sets them in place. */
export function decision(score: MetricScore, test: Test): { status: Status; reason: string } {
  const { result } = score;
  const where = position(result);
  let status: Status = 'ok';
  let reason = `${where}; ${test.phrase}`;
  if (test.significant && score.direction !== 'none') {
    if (!score.beyondTolerance) {
      const move = result.change === undefined ? '' : ` ${formatPercent(Math.abs(result.change))}`;
      reason += `, but the change${move} is within the tolerance ${describeTolerance(score.settings.tolerance)}`;
    } else if (score.direction === 'worse') {
      status = 'regressed';
    } else {
      status = 'improved';
      reason = `${where} (the better side); ${test.phrase}`;
    }
  }
  return { status, reason };
}

/** "4.1 sd above the baseline mean", or the constant-baseline wording when there is no z. */
function position(result: MetricResult): string {
  const z = result.z;
  if (z === undefined) {
    const centre = result.baseline?.mean ?? NaN;
    const same = result.relativeDensity === 1;
    const scale = result.baseline?.scale === 'log' ? ' (log scale)' : '';
    return same
      ? `equal to the constant baseline ${formatNumber(centre)}${scale}`
      : `off the constant baseline ${formatNumber(centre)}${scale} (sd 0; set \`resolution\` to the smallest meaningful step)`;
  }
  if (z === 0) return 'at the baseline mean';
  return `${formatNumber(Math.abs(z))} sd ${z > 0 ? 'above' : 'below'} the baseline mean`;
}
