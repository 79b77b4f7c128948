import type { Config } from '../config/types.js';
import type { History } from '../history/history.js';
import type { Run } from '../inputs/run.js';
import { adjustTails, holmLevels } from '../model/family.js';
import { rememberedQuantile } from '../model/tails.js';
import { sortMetrics } from './candidates.js';
import { decide } from './decide.js';
import { formGroups, takeApart, type MemberMoves } from './moves.js';
import { noiseModel } from './noise.js';
import { isLearning, scoreMember, type Scored } from './judge.js';
import { REPORT_SCHEMA, type MetricResult, type Report, type SharedMoveResult } from './report.js';
import { judgeSharedMove } from './shared-verdict.js';
import { missingMetrics } from './missing-metrics.js';
import { decideVerdict, orderMetrics } from './verdict.js';

export interface GateInput {
  config: Config;
  history: History;
  run: Run;
  series: string;
  /** The pull request carries the accept label: a regression gives `accepted`. */
  accepted?: boolean;
  /** This run's runner fingerprint (README.md "How the decision works"), when the adapter knows it. */
  runner?: string;
}

/**
 * The decision (README.md "How the decision works"): every metric of the run and of the history
 * is sorted (sortMetrics), put in its move group (formGroups) and taken apart into the run's
 * shared move and its own move (takeApart); the own moves get a noise model that borrows
 * strength across metrics of one noise shape (noiseModel) and are scored against their predictive
 * Student-t (scoreMember); family control holds the chance of any false alarm in the run at the
 * budget (Holm by default) and each metric is decided (decide); each group's shared move is judged
 * against the history's (judgeSharedMove); then the verdict. Pure: no I/O, no clock, no state.
 * Throws InputError for values the settings cannot take (e.g. <= 0 with `transform: log`).
 * @example runGate({ config: defaultConfig(), history, run, series: 'main' }).verdict // 'pass'
 */
export function runGate(input: GateInput): Report {
  const { config, history, run } = input;
  const sorted = sortMetrics(config, history, run);
  const formed = formGroups(config, sorted.candidates);
  const metrics: MetricResult[] = [...sorted.finished, ...formed.finished];
  const shared: SharedMoveResult[] = [];
  const members: MemberMoves[] = [];
  for (const group of formed.groups) {
    const parts = takeApart(group, history, input.runner);
    members.push(...parts.members);
    if (parts.shared !== undefined && group.kind !== 'reference') shared.push(judgeSharedMove(parts.shared, config));
  }
  const noise = noiseModel(members);
  const family = config.family !== 'none';
  // The Bonferroni share of the budget bounds every metric's Holm level from below, so the
  // detectable computed at it holds whatever rank the metric takes.
  const judged = members.filter((m) => !isLearning(m, noise.get(m)!)).length;
  const share = family ? config.budget / Math.max(1, judged) : undefined;
  const scored: Scored[] = [];
  const quantile = rememberedQuantile();
  for (const m of members) {
    const s = scoreMember(m, noise.get(m)!, share, quantile);
    if ('result' in s) scored.push(s);
    else metrics.push(s);
  }
  if (config.family !== 'none' && share !== undefined) {
    const tails = scored.map((s) => s.worseTail);
    const adjusted = adjustTails(tails, config.family);
    const levels =
      config.family === 'holm'
        ? holmLevels(tails, config.budget)
        : config.family === 'bonferroni'
          ? tails.map(() => share)
          : fdrLevels(tails, config.budget);
    scored.forEach((s, i) =>
      metrics.push(decide(s, { adjusted: adjusted[i]!, level: levels[i]!, budget: config.budget, share }, quantile)),
    );
  } else {
    for (const s of scored) metrics.push(decide(s, undefined, quantile));
  }
  holdEpisodes(members, metrics, shared);
  const verdict = decideVerdict(metrics, shared, input.accepted === true);
  const report: Report = {
    schema: REPORT_SCHEMA,
    verdict,
    blocks: verdict === 'regressed' || (verdict === 'unsettled' && config.unsettled === 'block'),
    series: input.series,
    family: config.family,
    budget: config.budget,
    unsettled: config.unsettled,
    ...(input.runner === undefined ? {} : { runner: input.runner }),
    metrics: orderMetrics(metrics),
    shared: shared.sort((a, b) => (a.name < b.name ? -1 : a.name > b.name ? 1 : 0)),
  };
  const missing = missingMetrics(config, history, run);
  if (missing.of > 0) report.missing = missing;
  if (run.notFitted !== undefined && run.notFitted.size > 0)
    report.notJudged = [...run.notFitted]
      .sort(([a], [b]) => (a < b ? -1 : a > b ? 1 : 0))
      .map(([name, reason]) => ({ name, reason }));
  return report;
}

/** Benjamini-Hochberg's level of each tail at its rank i (ascending, from 1): i alpha / m. */
function fdrLevels(tails: readonly number[], alpha: number): number[] {
  const order = tails.map((_, i) => i).sort((a, b) => tails[a]! - tails[b]! || a - b);
  const levels = new Array<number>(tails.length);
  order.forEach((index, rank) => (levels[index] = ((rank + 1) * alpha) / tails.length));
  return levels;
}

/**
 * In a slow episode (runStates) a timing far out may be the episode's work or a real change, and
 * one run cannot tell which: like a shared move beyond the history's, it is its own outcome. A
 * timing that would regress in such a run is held (status ok, named in its group's `held`) and
 * the group's shared move becomes `unsettled`, which asks for a re-run. Mutates the results.
 */
function holdEpisodes(members: readonly MemberMoves[], metrics: MetricResult[], shared: SharedMoveResult[]): void {
  const calmless = members.filter((m) => !m.calmNow);
  const episode = new Set(calmless.map((m) => m.candidate.name));
  for (const g of shared) if (calmless.some((m) => m.group.name === g.name)) g.episode = true;
  for (const r of metrics) {
    if (r.status !== 'regressed' || !episode.has(r.name)) continue;
    const group = shared.find((g) => g.name === r.group);
    if (group === undefined) continue;
    r.status = 'ok';
    group.status = 'unsettled';
    (group.held ??= []).push(r.name);
  }
}
