import type { Family } from '../../config/types.js';
import { adjustTails } from '../../model/family.js';
import { cutoffLevel, cutoffSigma } from '../../model/tails.js';
import type { Replay } from './replay.js';
import { isLabelled, type Truth } from './truth.js';

/** The candidate cutoffs tried when none are given, loosest first. */
export const DEFAULT_LADDER: readonly number[] = [0.1, 0.05, 0.02, 0.01, 0.005, 0.001, 1e-4, 1e-5, 1e-6];

/** Precision and recall of one cutoff against the labels. */
export interface LabelScore {
  labels: number;
  caught: number;
  /** Alarms on labelled pairs, and on unlabelled ones. */
  trueAlarms: number;
  falseAlarms: number;
  /** trueAlarms / all alarms (0 when nothing alarms). */
  precision: number;
  /** caught / labels (0 without labels). */
  recall: number;
  /** 2 P R / (P + R), 0 when both are 0. */
  f1: number;
}

/** What one cutoff would have done over the replayed history. */
export interface LadderRow {
  cutoff: number;
  /** sqrt(-2 ln cutoff): how many sd away a plain Gaussian falls to this relative density. */
  sigma: number;
  /** cutoffLevel(cutoff): the tail level family control compares adjusted tails with. */
  level: number;
  /** Alarms on runs/metrics not labelled as regressions (the baseline is assumed clean). */
  falseAlarms: number;
  /** falseAlarms / replayed runs: the expected false alarms per run across all metrics. */
  alarmsPerRun: number;
  /** Runs with at least one false alarm, and per 100 replayed runs. */
  runsFlagged: number;
  runsFlaggedPer100: number;
  /** False alarms per metric, aligned with replay.metrics. */
  perMetric: number[];
  labelled?: LabelScore;
}

/**
 * Scores a ladder of cutoffs (every metric at the same cutoff) from one replay, for one family
 * setting. A replayed metric alarms when it lies on its worse side beyond the tolerance and
 * - family none: relative density < cutoff (the gate's plain test);
 * - bonferroni / holm / fdr: its tail, adjusted with every other metric judged in that run
 *   (adjustTails), < cutoffLevel(cutoff) (the gate's family test).
 * Adjusted tails are computed once per run, so the cost is O(points x (log metrics + cutoffs)).
 * @example scoreLadder(replay, [0.01], 'none')[0].runsFlaggedPer100 // 2.5
 */
export function scoreLadder(replay: Replay, cutoffs: readonly number[], family: Family, truth?: Truth): LadderRow[] {
  const stat = family === 'none' ? replay.metrics.map((m) => m.relativeDensity) : adjustedTails(replay, family);
  const runsJudged = new Set<number>();
  for (const m of replay.metrics) for (const r of m.run) runsJudged.add(r);
  const runs = runsJudged.size;
  return cutoffs.map((cutoff) => {
    const level = cutoffLevel(cutoff);
    const threshold = family === 'none' ? cutoff : level;
    const perMetric = replay.metrics.map(() => 0);
    const falseRuns = new Set<number>();
    const alarmedRuns = new Set<number>();
    const caughtPairs = new Set<string>();
    let trueAlarms = 0;
    replay.metrics.forEach((m, j) => {
      const values = stat[j]!;
      for (let p = 0; p < m.run.length; p++) {
        if (m.side[p] !== 1 || !(values[p]! < threshold)) continue;
        const run = m.run[p]!;
        alarmedRuns.add(run);
        if (isLabelled(truth, run, m.name)) {
          trueAlarms++;
          caughtPairs.add(truth!.byRun.get(run) === 'run' ? `${run}` : `${run}\u0000${m.name}`);
        } else {
          perMetric[j]!++;
          falseRuns.add(run);
        }
      }
    });
    const falseAlarms = perMetric.reduce((a, b) => a + b, 0);
    const row: LadderRow = {
      cutoff,
      sigma: cutoffSigma(cutoff),
      level,
      falseAlarms,
      alarmsPerRun: runs === 0 ? 0 : falseAlarms / runs,
      runsFlagged: falseRuns.size,
      runsFlaggedPer100: runs === 0 ? 0 : (100 * falseRuns.size) / runs,
      perMetric,
    };
    if (truth !== undefined) row.labelled = labelScore(truth.count, caughtPairs.size, trueAlarms, falseAlarms);
    return row;
  });
}

/** Precision, recall and F1 (van Rijsbergen's F-measure with beta = 1). */
export function labelScore(labels: number, caught: number, trueAlarms: number, falseAlarms: number): LabelScore {
  const alarms = trueAlarms + falseAlarms;
  const precision = alarms === 0 ? 0 : trueAlarms / alarms;
  const recall = labels === 0 ? 0 : caught / labels;
  const f1 = precision + recall === 0 ? 0 : (2 * precision * recall) / (precision + recall);
  return { labels, caught, trueAlarms, falseAlarms, precision, recall, f1 };
}

/** For each metric and replayed run, its tail adjusted over all metrics judged in that run. */
function adjustedTails(replay: Replay, family: Exclude<Family, 'none'>): number[][] {
  const out = replay.metrics.map((m) => new Array<number>(m.run.length).fill(1));
  const byRun = new Map<number, [number, number][]>();
  replay.metrics.forEach((m, j) => {
    m.run.forEach((run, p) => {
      let list = byRun.get(run);
      if (list === undefined) byRun.set(run, (list = []));
      list.push([j, p]);
    });
  });
  for (const members of byRun.values()) {
    const adjusted = adjustTails(
      members.map(([j, p]) => replay.metrics[j]!.tail[p]!),
      family,
    );
    members.forEach(([j, p], i) => (out[j]![p] = adjusted[i]!));
  }
  return out;
}
