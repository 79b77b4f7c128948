import type { Config } from '../config/types.js';
import { groupFor, settingsFor } from '../config/rules.js';
import type { History } from '../history/history.js';
import type { Run } from '../inputs/run.js';
import { cutoffLevel } from '../model/tails.js';
import { selectBaseline } from './baseline.js';
import { decideMetric } from './decide-metric.js';
import { familyTests, type FamilyItem } from './family-test.js';
import type { GroupMemberInput as GroupEntry } from './group-frame.js';
import { judgeGroups } from './judge-groups.js';
import { scoreMetric, type MetricScore } from './judge-metric.js';
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

/**
 * The decision (DESIGN.md "Statistics", issue 6): every metric of the run and of the history is
 * scored against its baseline (selectBaseline, scoreMetric); metrics in a configured group are
 * judged together (judgeGroups); with `family` set, the tails of all remaining decisions are
 * adjusted together (familyTests); then the verdict. Pure: no I/O, no clock.
 * Throws InputError for values the settings cannot take (e.g. <= 0 on the log scale).
 * @example runGate({ config: defaultConfig(), history, run, series: 'main' }).verdict // 'pass'
 */
export function runGate(input: GateInput): Report {
  const { config, history, run } = input;
  const finished: MetricResult[] = [];
  const scored: GroupEntry[] = [];
  for (const name of metricNames(history, run)) {
    const entry = judgeName(config, history, run, name);
    if (entry === undefined) continue;
    if ('score' in entry) scored.push(entry);
    else finished.push(entry.result);
  }
  const groupOutcome = judgeGroups(config, scored, (name) => groupFor(config, name)?.name);
  const lone = scored.filter((e) => !groupOutcome.judged.has(e.score.result.name));
  const items: FamilyItem[] = [
    ...lone.map((e) => ({ tail: e.score.result.tail ?? 1, level: cutoffLevel(e.score.settings.cutoff) })),
    ...groupOutcome.pending.map((g) => ({ tail: g.analysis.tail, level: g.level })),
  ];
  const tests = familyTests(items, config.family);
  const metrics = [...finished];
  lone.forEach((e, i) => metrics.push(decideLone(e.score, tests[i])));
  const groups: GroupResult[] = [...groupOutcome.learning];
  groupOutcome.pending.forEach((g, i) => {
    const decided = g.decide(tests[lone.length + i]);
    groups.push(decided.group);
    metrics.push(...decided.members);
  });
  return {
    schema: REPORT_SCHEMA,
    verdict: decideVerdict(metrics, groups, input.accepted === true),
    series: input.series,
    family: config.family,
    metrics: orderMetrics(metrics),
    groups: groups.sort((a, b) => (a.name < b.name ? -1 : a.name > b.name ? 1 : 0)),
  };
}

function decideLone(score: MetricScore, family: { adjusted: number; test: { significant: boolean; phrase: string } } | undefined): MetricResult {
  if (family === undefined || !score.scored) return score.result;
  return { ...decideMetric(score, family.test), adjusted: family.adjusted };
}

/** Every metric named by this run or holding a value in the history, in code-unit order. */
function metricNames(history: History, run: Run): string[] {
  const names = new Set<string>(run.metrics.keys());
  for (const [name, column] of history.columns) {
    if (column.values.some((v) => Number.isFinite(v))) names.add(name);
  }
  return [...names].sort((a, b) => (a < b ? -1 : a > b ? 1 : 0));
}

/** A finished result (ignored, missing, new, ...) or a scored entry for groups and family control. */
function judgeName(config: Config, history: History, run: Run, name: string): GroupEntry | { result: MetricResult } | undefined {
  const settings = settingsFor(config, name);
  const measurement = run.metrics.get(name);
  const plain = { name, cutoff: settings.cutoff, worse: settings.worse };
  const own = measurement === undefined ? {} : { value: measurement.value, count: measurement.count, ...(measurement.unit === undefined ? {} : { unit: measurement.unit }) };
  if (settings.ignore) return { result: { ...plain, ...own, status: 'ignored', reason: 'matched a rule with ignore: true' } };
  const baseline = selectBaseline(history, name, settings);
  if (measurement === undefined) {
    const reason = `in the history (${baseline.available} run${baseline.available === 1 ? '' : 's'}) but absent from this run`;
    return { result: { ...plain, status: 'missing', reason } };
  }
  let value = measurement.value;
  if (settings.relativeTo !== undefined) {
    const reference = run.metrics.get(settings.relativeTo)?.value;
    if (reference === undefined || !Number.isFinite(reference) || reference === 0) {
      const lacks = reference === undefined ? 'lacks' : `has ${reference} for`;
      const reason = `cannot be judged relative to ${settings.relativeTo}: this run ${lacks} that metric`;
      return { result: { ...plain, ...own, status: baseline.values.length === 0 ? 'new' : 'missing', reason } };
    }
    value /= reference;
  }
  const extras = {
    count: measurement.count,
    ...(measurement.unit === undefined || settings.relativeTo !== undefined ? {} : { unit: measurement.unit }),
    ...(baseline.since === undefined ? {} : { since: baseline.since }),
    ...(baseline.relativeTo === undefined ? {} : { relativeTo: baseline.relativeTo }),
  };
  const score = scoreMetric(name, settings, baseline.values, value, extras);
  return score.scored ? { score, baseline } : { result: score.result };
}
