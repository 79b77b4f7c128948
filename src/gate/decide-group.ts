import { COMMON_WEIGHT, DISTANCE_WEIGHT, OWN_WEIGHT, type GroupAnalysis } from './analyse-group.js';
import { decideMetric, type Test } from './decide-metric.js';
import { formatNumber, formatPercent } from './format-number.js';
import type { GroupFrame } from './group-frame.js';
import type { GroupResult, MetricResult } from './report.js';
import type { Direction } from './sides.js';

/** A member counts as a main contributor when its share is at least this part of the largest. */
const MAIN_SHARE = 0.5;

/**
 * Decides a judged group and its members. `test` is the group's tail (raw, or adjusted by family
 * control) against the level; when it fires, the checks whose weighted tail is below the level
 * are the finding (see OWN_WEIGHT). Members follow it:
 * - when the common move is beyond its history, every member that moved that way with it is;
 * - otherwise, when the group's test fires, a main contributor (own move significant on its own at the
 *   own moves' share of the level, or a Mahalanobis share >= half the largest) is regressed or improved by
 *   the side its own move lies on, beyond the tolerance;
 * - everyone else is ok, even if alone it would have looked far off: the group explains it.
 * The group is regressed when a member is, improved when a member is and none regressed.
 * @example decideGroup('timings', frame, analysis, 0.0024, test).group.status // 'ok'
 */
export function decideGroup(
  name: string,
  frame: GroupFrame,
  analysis: GroupAnalysis,
  level: number,
  test: Test,
): { group: GroupResult; members: MetricResult[] } {
  const commonFired = test.significant && analysis.common.tail / COMMON_WEIGHT < level;
  const commonStatus = commonFired ? (analysis.common.z > 0 ? 'regressed' : 'improved') : ('ok' as const);
  const maxShare = Math.max(...analysis.shares);
  const members = frame.members.map((input, j) => {
    const own = analysis.own[j]!;
    const share = analysis.shares[j]!;
    const main =
      (own.tail * analysis.p) / OWN_WEIGHT < level ||
      (analysis.n > analysis.p && analysis.distanceTail / DISTANCE_WEIGHT < level && share >= MAIN_SHARE * maxShare);
    const describe = `in group ${name}: own move ${signed(own.z)} sd, ${formatPercent(share)} of the joint distance`;
    const single = input.score;
    const withCommon =
      (commonStatus === 'regressed' && single.direction === 'worse') ||
      (commonStatus === 'improved' && single.direction === 'better');
    const commonPhrase = `common move ${signed(analysis.common.z)} sd, tail ${formatNumber(analysis.common.tail)}`;
    if (withCommon) {
      return decideMetric(single, {
        significant: true,
        phrase: `${describe}; ${commonPhrase}, beyond the group's history; ${test.phrase}`,
      });
    }
    if (test.significant && main) {
      const direction = ownDirection(own.z, single.settings.worse === 'both');
      return decideMetric({ ...single, direction }, { significant: true, phrase: `${describe}; ${test.phrase}` });
    }
    const quiet = `${describe}; ${commonPhrase} within the group's history; ${test.phrase}`;
    return { ...decideMetric(single, { significant: false, phrase: quiet }), group: name };
  });
  for (const m of members) m.group = name;
  const status = members.some((m) => m.status === 'regressed')
    ? 'regressed'
    : members.some((m) => m.status === 'improved')
      ? 'improved'
      : 'ok';
  const group: GroupResult = {
    name,
    status,
    members: frame.members.map((input, j) => ({
      name: input.score.result.name,
      share: analysis.shares[j]!,
      ownZ: analysis.own[j]!.z,
    })),
    n: analysis.n,
    distance: analysis.distance,
    tail: analysis.tail,
    level,
    common: { z: analysis.common.z, tail: analysis.common.tail, status: commonStatus },
    shrinkage: analysis.shrinkage,
    reason: groupReason(status, analysis, test, commonStatus, level),
  };
  return { group, members };
}

function ownDirection(z: number, both: boolean): Direction {
  if (z === 0) return 'none';
  return z > 0 || both ? 'worse' : 'better';
}

function signed(x: number): string {
  return `${x >= 0 ? '+' : '-'}${formatNumber(Math.abs(x))}`;
}

function groupReason(status: string, a: GroupAnalysis, test: Test, common: string, level: number): string {
  const joint = `distance ${formatNumber(a.distance)} over ${a.p} metrics and ${a.n} runs; ${test.phrase}`;
  const commonText = `common move ${signed(a.common.z)} sd (tail ${formatNumber(a.common.tail)}, level ${formatNumber(level)})`;
  if (common !== 'ok') return `${commonText} is beyond the group's history; ${joint}`;
  return `${status === 'ok' ? 'no member moved beyond the group' : 'a member moved on its own'}; ${joint}; ${commonText}`;
}
