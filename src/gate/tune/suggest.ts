import type { Family } from '../../config/types.js';
import type { LadderRow } from './ladder.js';

/** The false alarms per 100 runs aimed at when no --target is given (DESIGN.md "What good looks like"). */
export const DEFAULT_TARGET = 1;

/** Runs with at least this many judged metrics count as "many metrics" for the family advice (rule of thumb). */
export const MANY_METRICS = 10;

/** A per-metric rule the tune suggests adding to the config. */
export interface SuggestedRule {
  metric: string;
  cutoff?: number;
  transform?: 'log';
  reason: string;
}

/** The cutoff for `defaults`, with its evidence. */
export interface CutoffChoice {
  cutoff: number;
  reason: string;
}

/**
 * The loosest cutoff (largest relative density, most alarms) whose runs with a false alarm stay at
 * or under `per100` per 100 replayed runs. Rows are loosest first. Undefined when none qualifies.
 * @example loosestUnder(rows, 1)?.cutoff // 0.001
 */
export function loosestUnder(rows: readonly LadderRow[], per100: number): LadderRow | undefined {
  return [...rows].sort((a, b) => b.cutoff - a.cutoff).find((row) => row.runsFlaggedPer100 <= per100);
}

/**
 * The cutoff with the highest F1 against the labels; a tie goes to the stricter cutoff (fewer
 * alarms for the same score). Undefined without labels.
 * @example bestF1(rows)?.cutoff // 0.005
 */
export function bestF1(rows: readonly LadderRow[]): LadderRow | undefined {
  let best: LadderRow | undefined;
  for (const row of rows) {
    if (row.labelled === undefined) continue;
    const f1 = row.labelled.f1;
    if (best === undefined || f1 > best.labelled!.f1 || (f1 === best.labelled!.f1 && row.cutoff < best.cutoff))
      best = row;
  }
  return best;
}

/**
 * The defaults cutoff: the F1-optimal one when labels are given, else the loosest meeting the
 * false-alarm target, else (nothing meets it) the strictest of the ladder.
 * @example chooseCutoff(rows, 1, false).cutoff // 0.001
 */
export function chooseCutoff(rows: readonly LadderRow[], target: number, labelled: boolean): CutoffChoice {
  const best = labelled ? bestF1(rows) : undefined;
  if (best?.labelled !== undefined && best.labelled.f1 > 0) {
    const l = best.labelled;
    return {
      cutoff: best.cutoff,
      reason: `best F1 ${l.f1.toFixed(3)} against the labels (precision ${l.precision.toFixed(3)}, recall ${l.recall.toFixed(3)})`,
    };
  }
  const under = loosestUnder(rows, target);
  if (under !== undefined) {
    return {
      cutoff: under.cutoff,
      reason: `loosest cutoff with at most ${target} run${target === 1 ? '' : 's'} per 100 falsely flagged (${under.runsFlaggedPer100.toFixed(1)} replayed)`,
    };
  }
  const strictest = [...rows].sort((a, b) => a.cutoff - b.cutoff)[0]!;
  return {
    cutoff: strictest.cutoff,
    reason: `no cutoff keeps false alarms at ${target} per 100 runs; the strictest tried flags ${strictest.runsFlaggedPer100.toFixed(1)} (consider groups, relative-to or change points)`,
  };
}

/**
 * Per-metric cutoffs for metrics that are much noisier than the rest at the chosen cutoff: at least
 * 2 false alarms and more than twice the mean per metric (rule of thumb). Such a metric gets the
 * loosest stricter cutoff at which its own false alarms drop to the mean, or the strictest tried.
 * @example noisyMetricRules(rows, names, 0.01) // [{ metric: 'latency/p99', cutoff: 1e-4, reason: ... }]
 */
export function noisyMetricRules(
  rows: readonly LadderRow[],
  names: readonly string[],
  chosen: number,
): SuggestedRule[] {
  const sorted = [...rows].sort((a, b) => b.cutoff - a.cutoff);
  const at = sorted.find((row) => row.cutoff === chosen);
  if (at === undefined || names.length === 0) return [];
  const mean = at.falseAlarms / names.length;
  const rules: SuggestedRule[] = [];
  names.forEach((metric, j) => {
    const own = at.perMetric[j]!;
    if (own < 2 || own <= 2 * mean) return;
    const stricter = sorted.filter((row) => row.cutoff < chosen);
    const fit = stricter.find((row) => row.perMetric[j]! <= mean) ?? stricter.at(-1);
    if (fit === undefined) return;
    rules.push({
      metric,
      cutoff: fit.cutoff,
      reason: `${own} false alarms at ${chosen} (mean ${mean.toFixed(1)} a metric); ${fit.perMetric[j]} at ${fit.cutoff}`,
    });
  });
  return rules;
}

/**
 * Which family setting to use. With fewer than MANY_METRICS judged metrics a typical run, the
 * current setting stays. With many: the family with the best F1 when labelled (ties: holm, then
 * fdr, bonferroni, none); without labels the current setting when it is not none, else holm, which bounds the chance of any false alarm in a
 * run and is never less powerful than bonferroni (Holm 1979).
 * @example recommendFamily(48, ladders, 0.01, 'none', 1).family // 'holm'
 */
export function recommendFamily(
  metricsPerRun: number,
  ladders: ReadonlyMap<Family, readonly LadderRow[]>,
  cutoff: number,
  current: Family,
  target: number,
): { family: Family; reason: string } {
  const share = (family: Family): string => {
    const row = ladders.get(family)?.find((r) => r.cutoff === cutoff);
    return row === undefined ? '?' : row.runsFlaggedPer100.toFixed(1);
  };
  if (metricsPerRun < MANY_METRICS) {
    return {
      family: current,
      reason: `${metricsPerRun} metrics a typical run: few enough that per-metric cutoffs suffice`,
    };
  }
  const preference: Family[] = ['holm', 'fdr', 'bonferroni', 'none'];
  const f1 = (f: Family): number => bestF1(ladders.get(f) ?? [])?.labelled?.f1 ?? -1;
  let family: Family = current === 'none' ? 'holm' : current;
  if (preference.some((f) => f1(f) >= 0)) family = preference.reduce((a, b) => (f1(b) > f1(a) ? b : a));
  const loosest = (f: Family): string => {
    const row = loosestUnder(ladders.get(f) ?? [], target);
    return row === undefined ? 'none of the ladder' : String(row.cutoff);
  };
  const reason =
    `${metricsPerRun} metrics a typical run: at cutoff ${cutoff}, family none flags ${share('none')} runs per 100 falsely, ` +
    `${family} ${share(family)}; loosest cutoff meeting ${target} per 100: none ${loosest('none')}, ${family} ${loosest(family)}` +
    (f1(family) >= 0
      ? ` (best F1 ${f1(family).toFixed(3)})`
      : '; holm bounds the chance of any false alarm in a run and is never less powerful than bonferroni (Holm 1979)');
  return { family, reason };
}
