import { settingsFor } from '../../config/rules.js';
import type { Config, Family } from '../../config/types.js';
import type { History } from '../../history/history.js';
import { InputError } from '../../errors/input-error.js';
import { median } from '../../model/median.js';
import { checkLabels, type RegressionLabel } from './labels.js';
import { DEFAULT_LADDER, scoreLadder, type LadderRow } from './ladder.js';
import { metricSequence } from './metric-sequence.js';
import { normalityCheck, type NormalityCheck } from './normality-check.js';
import { replayHistory } from './replay.js';
import { replaySettings } from './score-alone.js';
import {
  chooseCutoff,
  DEFAULT_TARGET,
  loosestUnder,
  noisyMetricRules,
  recommendFamily,
  bestF1,
  type SuggestedRule,
} from './suggest.js';
import { buildTruth } from './truth.js';

export const FAMILIES: readonly Family[] = ['none', 'bonferroni', 'holm', 'fdr'];

export interface TuneInput {
  config: Config;
  history: History;
  labels?: readonly RegressionLabel[];
  /** False alarms per 100 runs to stay at or under (default DEFAULT_TARGET). */
  target?: number;
  /** Candidate cutoffs (default DEFAULT_LADDER plus the config's own default cutoff). */
  cutoffs?: readonly number[];
  /** Refit every baseline even where a sliding window would do (for checking). */
  refit?: boolean;
  onProgress?: (done: number, total: number) => void;
}

export interface MetricTune {
  name: string;
  /** Replay path used: incremental (sliding moments) or refit. */
  method: 'incremental' | 'refit';
  /** Runs in which the metric was judged (enough baseline runs). */
  judged: number;
  transform: 'none' | 'log';
  normality?: NormalityCheck;
}

/** Everything `bellgate tune` found. Ladders are loosest cutoff first. */
export interface TuneResult {
  series: string;
  runs: number;
  /** Runs in which at least one metric was judged. */
  replayedRuns: number;
  /** Median number of metrics judged in a replayed run. */
  metricsPerRun: number;
  /** The config's family setting and default cutoff. */
  family: Family;
  currentCutoff: number;
  metrics: MetricTune[];
  /** Configured groups: the replay judges their members one by one (see replayHistory). */
  groups: string[];
  ladders: Map<Family, LadderRow[]>;
  target: { per100: number; cutoff?: number };
  labels?: { count: number; best?: { cutoff: number; precision: number; recall: number; f1: number } };
  suggestion: { cutoff: number; reason: string; family: Family; familyReason: string; rules: SuggestedRule[] };
}

/**
 * Tunes cutoffs from evidence (issue 5.1): replays the gate over the history (replayHistory),
 * scores the cutoff ladder for every family setting (scoreLadder), checks each metric's shape on
 * the raw and log scales (normalityCheck), and suggests a defaults cutoff (best F1 with labels,
 * else the loosest meeting the target), per-metric cutoffs for much noisier metrics, `transform:
 * log` where it fits clearly better, and a family setting. Pure.
 * Throws InputError for a label naming an unknown run or metric, or a bad target or cutoff.
 * @example tuneHistory({ config, history }).suggestion.cutoff // 0.001
 */
export function tuneHistory(input: TuneInput): TuneResult {
  const { config, history } = input;
  const target = input.target ?? DEFAULT_TARGET;
  if (!(target >= 0 && target <= 100))
    throw new InputError(`--target must be a number of false alarms per 100 runs from 0 to 100, got ${target}`, {
      fix: 'e.g. --target 1',
    });
  const cutoffs = [...new Set([...(input.cutoffs ?? DEFAULT_LADDER), config.defaults.cutoff])].sort((a, b) => b - a);
  if (input.labels !== undefined) checkLabels(input.labels, history);
  const truth = input.labels === undefined ? undefined : buildTruth(input.labels, history);
  const replay = replayHistory(config, history, {
    ...(input.refit ? { refit: true } : {}),
    ...(input.onProgress ? { onProgress: input.onProgress } : {}),
  });
  const ladders = new Map(FAMILIES.map((f) => [f, scoreLadder(replay, cutoffs, f, truth)] as const));
  const perRun = new Map<number, number>();
  for (const m of replay.metrics) for (const r of m.run) perRun.set(r, (perRun.get(r) ?? 0) + 1);
  const metricsPerRun = perRun.size === 0 ? 0 : median([...perRun.values()]);
  // A cutoff decides only with family: none (under a family the run's budget does), so the
  // cutoff is chosen on that ladder until tune replays the whole gate (issue 13 item 7).
  const rows = ladders.get('none')!;
  // No judged run is no evidence: keep the configured cutoff rather than "0 false alarms at 0.1".
  const choice =
    perRun.size === 0
      ? {
          cutoff: config.defaults.cutoff,
          reason:
            'no run had enough baseline runs to be judged (min-runs), so there is no evidence yet; keeping the configured cutoff',
        }
      : chooseCutoff(rows, target, truth !== undefined);
  const names = replay.metrics.map((m) => m.name);
  const rules = perRun.size === 0 ? [] : noisyMetricRules(rows, names, choice.cutoff);
  const indexOf = new Map(history.runs.map((run, i) => [run.id, i] as const));
  const metrics = replay.metrics.map((m): MetricTune => {
    const settings = replaySettings(settingsFor(config, m.name), history.columns.get(m.name)?.unit);
    const own = metricSequence(history, m.name, settings, indexOf).own.slice(-settings.window);
    const normality = normalityCheck(own);
    if (normality?.suggestLog && settings.transform === 'none') {
      const rule = rules.find((r) => r.metric === m.name);
      if (rule !== undefined) Object.assign(rule, { transform: 'log', reason: `${rule.reason}; ${normality.note}` });
      else rules.push({ metric: m.name, transform: 'log', reason: normality.note });
    }
    return {
      name: m.name,
      method: m.method,
      judged: m.run.length,
      transform: settings.transform === 'log' ? 'log' : 'none',
      ...(normality ? { normality } : {}),
    };
  });
  const family = recommendFamily(metricsPerRun, ladders, choice.cutoff, config.family, target);
  const best = bestF1(rows);
  const targetRow = loosestUnder(rows, target);
  return {
    series: history.series,
    runs: history.runs.length,
    replayedRuns: perRun.size,
    metricsPerRun,
    family: config.family,
    currentCutoff: config.defaults.cutoff,
    metrics,
    groups: config.groups.map((g) => g.name),
    ladders,
    target: { per100: target, ...(targetRow ? { cutoff: targetRow.cutoff } : {}) },
    ...(truth === undefined
      ? {}
      : {
          labels: {
            count: truth.count,
            ...(best?.labelled
              ? {
                  best: {
                    cutoff: best.cutoff,
                    precision: best.labelled.precision,
                    recall: best.labelled.recall,
                    f1: best.labelled.f1,
                  },
                }
              : {}),
          },
        }),
    suggestion: {
      ...choice,
      family: family.family,
      familyReason: family.reason,
      rules: rules.sort((a, b) => (a.metric < b.metric ? -1 : 1)),
    },
  };
}
