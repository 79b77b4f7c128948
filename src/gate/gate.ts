import type { Config } from '../config/types.js';
import { groupFor } from '../config/rules.js';
import type { History } from '../history/history.js';
import type { Run } from '../inputs/run.js';
import { loadMatrixLibrary } from '../model/matrix-library.js';
import { cutoffLevel } from '../model/tails.js';
import { decideMetric, type Test } from './decide-metric.js';
import { familyTests } from './family-test.js';
import type { GroupMemberInput } from './group-frame.js';
import type { judgeGroups, PendingGroup } from './judge-groups.js';
import type { MetricScore } from './judge-metric.js';
import { judgeName, metricNames } from './judge-name.js';
import { missingMetrics } from './missing-metrics.js';
import { REPORT_SCHEMA, type GroupResult, type MetricResult, type Report } from './report.js';
import { decideVerdict, orderMetrics } from './verdict.js';

export interface GateInput {
  config: Config;
  history: History;
  run: Run;
  series: string;
  /** The pull request carries the accept label: a regression gives `accepted`. */
  accepted?: boolean;
}

/** The group judge (judge-groups.ts and the joint check under it), once prepareGate loaded it. */
let groupJudge: typeof judgeGroups | undefined;

/**
 * Loads what runGate needs beyond its own code for this config: when the config names groups,
 * their judge and ml-matrix (their joint check); nothing otherwise, so a run without groups does
 * not compile that code at all. Await it before runGate.
 * @example await prepareGate(config); const report = runGate({ config, history, run, series });
 */
export async function prepareGate(config: Config): Promise<void> {
  if (config.groups.length === 0) return;
  const [judge] = await Promise.all([import('./judge-groups.js'), loadMatrixLibrary()]);
  groupJudge = judge.judgeGroups;
}

/** The group judge; a caller that skipped prepareGate is told so. */
function loadedGroupJudge(): typeof judgeGroups {
  if (groupJudge === undefined)
    throw new Error('the group judge is not loaded: await prepareGate(config) before runGate');
  return groupJudge;
}

/**
 * The decision (DESIGN.md "Statistics", issue 6): every metric of the run and of the history is
 * scored against its baseline (selectBaseline, scoreMetric); metrics in a configured group are
 * judged together (judgeGroups); with `family` set, the tails of all remaining decisions are
 * adjusted together (familyTests); then the verdict. Pure: no I/O, no clock.
 * Throws InputError for values the settings cannot take (e.g. <= 0 on the log scale). With groups,
 * prepareGate must have run.
 * @example runGate({ config: defaultConfig(), history, run, series: 'main' }).verdict // 'pass'
 */
export function runGate(input: GateInput): Report {
  const { config, history, run } = input;
  const finished: MetricResult[] = [];
  const scored: GroupMemberInput[] = [];
  for (const name of metricNames(history, run)) {
    const entry = judgeName(config, history, run, name);
    if ('score' in entry) scored.push(entry);
    else finished.push(entry.result);
  }
  // Without groups or family control (the defaults) nothing below changes a lone score, so the
  // per-metric group lookups and cutoff levels are skipped.
  const groupOutcome =
    config.groups.length === 0 ? NO_GROUPS : loadedGroupJudge()(config, scored, (name) => groupFor(config, name)?.name);
  const lone =
    groupOutcome.judged.size === 0 ? scored : scored.filter((e) => !groupOutcome.judged.has(e.score.result.name));
  const tests =
    config.family === 'none'
      ? []
      : familyTests(
          [
            ...lone.map((e) => ({ tail: e.score.result.tail ?? 1, level: cutoffLevel(e.score.settings.cutoff) })),
            ...groupOutcome.pending.map((g) => ({ tail: g.analysis.tail, level: g.level })),
          ],
          config.family,
        );
  const metrics = [...finished];
  lone.forEach((e, i) => metrics.push(decideLone(e.score, tests[i])));
  const groups: GroupResult[] = [...groupOutcome.learning];
  groupOutcome.pending.forEach((g, i) => {
    const decided = g.decide(tests[lone.length + i]);
    groups.push(decided.group);
    metrics.push(...decided.members);
  });
  const report: Report = {
    schema: REPORT_SCHEMA,
    verdict: decideVerdict(metrics, groups, input.accepted === true),
    series: input.series,
    family: config.family,
    metrics: orderMetrics(metrics),
    groups: groups.sort((a, b) => (a.name < b.name ? -1 : a.name > b.name ? 1 : 0)),
  };
  const missing = missingMetrics(config, history, run);
  if (missing.of > 0) report.missing = missing;
  if (run.notFitted !== undefined && run.notFitted.size > 0)
    report.notJudged = [...run.notFitted]
      .sort(([a], [b]) => (a < b ? -1 : a > b ? 1 : 0))
      .map(([name, reason]) => ({ name, reason }));
  return report;
}

function decideLone(score: MetricScore, family: { adjusted: number; test: Test } | undefined): MetricResult {
  if (family === undefined || !score.scored) return score.result;
  return { ...decideMetric(score, family.test), adjusted: family.adjusted };
}

/** What judgeGroups returns when the config names no groups. */
const NO_GROUPS: { judged: ReadonlySet<string>; pending: readonly PendingGroup[]; learning: readonly GroupResult[] } = {
  judged: new Set(),
  pending: [],
  learning: [],
};
