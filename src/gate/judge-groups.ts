import type { Config } from '../config/types.js';
import { InputError } from '../errors/input-error.js';
import { cutoffLevel } from '../model/tails.js';
import { analyseGroup, type GroupAnalysis } from './analyse-group.js';
import type { Test } from './decide-metric.js';
import { decideGroup } from './decide-group.js';
import { formatNumber } from './format-number.js';
import { frameGroup, type GroupMemberInput } from './group-frame.js';
import type { GroupResult, MetricResult } from './report.js';

/** A group analysed and waiting for family control before it is decided. */
export interface PendingGroup {
  analysis: GroupAnalysis;
  level: number;
  /** Decides with the family-adjusted test, or the plain one (joint tail < level) without. */
  decide(family?: { adjusted: number; test: Test }): { group: GroupResult; members: MetricResult[] };
}

/**
 * Gathers the scored metrics of each configured group (`groups:` in the config) and analyses the
 * groups that can be judged: at least 2 members with spread and as many shared baseline runs as
 * the members' largest `min-runs` (and 3). Others come back as `learning` groups whose members
 * stay judged alone. The group's level is cutoffLevel of its strictest member's cutoff.
 * @example judgeGroups(config, entries, groupOf).judged.has('bench/parse') // true
 */
export function judgeGroups(
  config: Config,
  entries: readonly GroupMemberInput[],
  groupOf: (name: string) => string | undefined,
): { judged: Set<string>; pending: PendingGroup[]; learning: GroupResult[] } {
  const judged = new Set<string>();
  const pending: PendingGroup[] = [];
  const learning: GroupResult[] = [];
  const byGroup = new Map<string, GroupMemberInput[]>();
  for (const entry of entries) {
    const group = groupOf(entry.score.result.name);
    if (group !== undefined) byGroup.set(group, [...(byGroup.get(group) ?? []), entry]);
  }
  for (const spec of config.groups) {
    const inputs = byGroup.get(spec.name);
    if (inputs === undefined) continue;
    const frame = frameGroup(inputs);
    const level = Math.min(...inputs.map((e) => cutoffLevel(e.score.settings.cutoff)));
    const minRows = Math.max(3, ...inputs.map((e) => e.score.settings.minRuns));
    if (frame.members.length < 2 || frame.rows.length < minRows) {
      learning.push(learningGroup(spec.name, frame.members.length, frame.rows.length, minRows, level));
      continue;
    }
    let analysis: GroupAnalysis;
    try {
      analysis = analyseGroup(frame);
    } catch (error) {
      // A covariance no ridge can rescue (members that are exact copies of each other): say so
      // and judge the members alone rather than stop the whole gate.
      if (!(error instanceof InputError)) throw error;
      const reason = `cannot be judged together: ${error.message}; members are judged alone`;
      learning.push({ ...learningGroup(spec.name, frame.members.length, frame.rows.length, minRows, level), reason });
      continue;
    }
    for (const member of frame.members) judged.add(member.score.result.name);
    pending.push({
      analysis,
      level,
      decide(family) {
        const significant = analysis.tail < level;
        const test = family?.test ?? {
          significant,
          phrase: `joint tail ${formatNumber(analysis.tail)} ${significant ? '<' : '≥'} level ${formatNumber(level)}`,
        };
        const decided = decideGroup(spec.name, frame, analysis, level, test);
        Object.assign(decided.group, { distanceTail: analysis.distanceTail, ownTail: analysis.ownTail });
        if (family !== undefined) decided.group.adjusted = family.adjusted;
        return decided;
      },
    });
  }
  return { judged, pending, learning };
}

function learningGroup(name: string, members: number, rows: number, minRows: number, level: number): GroupResult {
  const reason =
    members < 2
      ? `only ${members} member${members === 1 ? '' : 's'} with enough varying history; a group needs 2`
      : `only ${rows} baseline runs hold every member; ${minRows} needed`;
  return {
    name,
    status: 'learning',
    members: [],
    n: rows,
    distance: 0,
    tail: 1,
    level,
    common: { z: 0, tail: 1, status: 'ok' },
    shrinkage: 0,
    reason: `${reason}; members are judged alone until then`,
  };
}
