import { settingsFor } from '../../config/rules.js';
import type { Config } from '../../config/types.js';
import type { History } from '../../history/history.js';
import { median } from '../../model/median.js';
import type { Report } from '../report.js';
import { rateEvidence, type RateEvidence } from './evidence.js';
import { holdsLater, replayGate, type ReplayPlan } from './replay.js';
import { BUDGETS, CUTOFFS, promisedPer100, withSetting, type Structure, type TuneSetting } from './setting.js';

/** A metric the gate flagged at the loosest thresholds, with what stricter ones compare. */
interface Flag {
  name: string;
  /** Holm-adjusted worse-side tail: flagged under holm at budget b when adjusted <= b. */
  adjusted: number;
  relativeDensity: number;
  /** A rule's own cutoff for the metric (family none compares with it, not the candidate's). */
  ruleCutoff?: number;
  /** On a clean run: a lasting step of the history (holdsLater), not a false alarm. */
  lasting: boolean;
}

/** What one report says at every budget and cutoff: its flags and its smallest shared-move tail. */
interface Observation {
  flags: Flag[];
  sharedTail: number;
}

/** What a setting did over the replay. */
export interface SettingScore {
  setting: TuneSetting;
  /** Clean runs that the check would have failed (false alarms), with their evidence. */
  falseAlarms: RateEvidence;
  /** Clean runs answered `unsettled` (a shared move beyond the history; blocks only when configured). */
  unsettled: number;
  /** Clean runs flagged only on lasting steps of the history (holdsLater): real changes, not false alarms. */
  steps: number;
  /** The model's own rate of false alarms per 100 clean runs (see promisedPer100). */
  promisedPer100: number;
  /** Per injected shift: injections caught (the injected metric regressed). */
  caught: { shift: number; evidence: RateEvidence }[];
  /** Labelled runs that the check would have failed. */
  labelledFlagged: number;
  /** Whether each injection of the plan was caught, in plan order (for paired comparisons). */
  hits: boolean[];
  /** How the figures were made: rescored from a replay at the loosest thresholds, or the gate run at exactly this setting. */
  measured: 'rescored' | 'exact';
}

/**
 * Replays one structure through the real gate once, at the loosest thresholds (holm with budget
 * 1: every metric on its worse side beyond its tolerance is flagged), and scores every budget of
 * BUDGETS and cutoff of CUTOFFS from the reports: a stricter threshold flags exactly the flagged
 * metrics whose adjusted tail (holm) or relative density (none) is below it — the gate's own
 * decision (src/gate/decide.ts), which tune-search.test.ts checks against the gate run at a
 * stricter setting. A shared move is unsettled at budget b when its tail is below b.
 */
export function scoreStructure(
  base: Config,
  history: History,
  plan: ReplayPlan,
  structure: Structure,
  metricsPerRun: number,
  tick?: () => void,
): SettingScore[] {
  const config = withSetting(base, {
    transform: structure.transform,
    sharedMove: structure.sharedMove,
    changePoints: structure.changePoints,
    family: 'holm',
    budget: 1,
  });
  const ruleCutoffs = ruleCutoffOf(base);
  const observe = (report: Report, k?: number): Observation => ({
    flags: report.metrics
      .filter((m) => m.status === 'regressed')
      .map((m) => {
        const rule = ruleCutoffs(m.name);
        return {
          name: m.name,
          adjusted: m.adjusted ?? 0,
          relativeDensity: m.relativeDensity ?? 0,
          lasting: k !== undefined && holdsLater(history, k, m.name, m.value!, m.change ?? Number.NaN),
          ...(rule === undefined ? {} : { ruleCutoff: rule }),
        };
      }),
    sharedTail: Math.min(Infinity, ...report.shared.map((s) => s.tail ?? Infinity)),
  });
  const clean: { k: number; o: Observation }[] = [];
  const injected: { shift: number; metric: string; o: Observation }[] = [];
  replayGate(
    config,
    history,
    plan,
    {
      clean: (k, report) => clean.push({ k, o: observe(report, k) }),
      injected: (i, report) => injected.push({ shift: i.shift, metric: i.metric, o: observe(report) }),
    },
    tick,
  );
  const { transform, sharedMove, changePoints } = structure;
  const shape = { transform, sharedMove, changePoints };
  const settings: TuneSetting[] = [
    ...BUDGETS.map((budget): TuneSetting => ({ ...shape, family: 'holm', budget })),
    ...CUTOFFS.map((cutoff): TuneSetting => ({ ...shape, family: 'none', cutoff })),
  ];
  const shifts = [...new Set(plan.injections.map((i) => i.shift))].sort((a, b) => a - b);
  return settings.map((setting) => {
    const flagged = (f: Flag): boolean =>
      setting.family === 'holm' ? f.adjusted <= setting.budget! : f.relativeDensity < (f.ruleCutoff ?? setting.cutoff!);
    const sharedBudget = setting.family === 'holm' ? setting.budget! : base.budget;
    let alarms = 0;
    let unsettled = 0;
    let steps = 0;
    let labelledFlagged = 0;
    let trials = 0;
    for (const { k, o } of clean) {
      const fired = o.flags.filter(flagged);
      const beyond = o.sharedTail < sharedBudget;
      const blocks = fired.length > 0 || (beyond && base.unsettled === 'block');
      if (plan.labelled.has(k)) {
        if (blocks) labelledFlagged++;
        continue;
      }
      trials++;
      if (fired.some((f) => !f.lasting) || (beyond && base.unsettled === 'block')) alarms++;
      else if (blocks) steps++;
      else if (beyond) unsettled++;
    }
    return {
      setting,
      falseAlarms: rateEvidence(alarms, trials),
      unsettled,
      steps,
      promisedPer100: promisedPer100(setting, metricsPerRun),
      caught: shifts.map((shift) => {
        const of = injected.filter((i) => i.shift === shift);
        const hits = of.filter((i) => i.o.flags.some((f) => f.name === i.metric && flagged(f))).length;
        return { shift, evidence: rateEvidence(hits, of.length) };
      }),
      labelledFlagged,
      hits: injected.map((i) => i.o.flags.some((f) => f.name === i.metric && flagged(f))),
      measured: 'rescored',
    };
  });
}

/** A metric's cutoff when a rule sets it (so the candidate's defaults cutoff does not apply), else undefined. */
function ruleCutoffOf(config: Config): (name: string) => number | undefined {
  const probe = { ...config, defaults: { ...config.defaults, cutoff: 0.5 } };
  const cache = new Map<string, number | undefined>();
  return (name) => {
    if (!cache.has(name)) {
      const own = settingsFor(probe, name).cutoff;
      cache.set(name, own === 0.5 ? undefined : own);
    }
    return cache.get(name);
  };
}

/** What the real gate at exactly one config did over the replay, and each metric's median `detectable` on clean runs. */
export interface ExactScore {
  falseAlarms: RateEvidence;
  unsettled: number;
  steps: number;
  caught: { shift: number; evidence: RateEvidence }[];
  labelledFlagged: number;
  hits: boolean[];
  /** Median `detectable` over the clean runs, per metric that reported one. */
  detectable: Map<string, number>;
  /** Median number of metrics judged (ok, regressed, improved) in a clean run. */
  metricsPerRun: number;
}

/**
 * Replays the gate at exactly `config` (no rescoring): false alarms are clean runs whose report
 * blocks (unless every metric it flags is a lasting step, holdsLater), a catch is the injected
 * metric regressed — as the noise evaluator counts them.
 */
export function scoreExact(config: Config, history: History, plan: ReplayPlan, tick?: () => void): ExactScore {
  let alarms = 0;
  let unsettled = 0;
  let steps = 0;
  let trials = 0;
  let labelledFlagged = 0;
  const detectables = new Map<string, number[]>();
  const judged: number[] = [];
  const hits = new Map<number, { n: number; caught: number }>();
  const each: boolean[] = [];
  replayGate(
    config,
    history,
    plan,
    {
      clean: (k, report) => {
        judged.push(report.metrics.filter((m) => JUDGED.has(m.status)).length);
        if (plan.labelled.has(k)) {
          if (report.blocks) labelledFlagged++;
          return;
        }
        trials++;
        const fired = report.metrics.filter((m) => m.status === 'regressed');
        const lasting = fired.every((m) => holdsLater(history, k, m.name, m.value!, m.change ?? Number.NaN));
        if (report.blocks && (fired.length === 0 || !lasting)) alarms++;
        else if (report.blocks) steps++;
        else if (report.verdict === 'unsettled') unsettled++;
        for (const m of report.metrics)
          if (m.detectable !== undefined && Number.isFinite(m.detectable))
            detectables.set(m.name, [...(detectables.get(m.name) ?? []), m.detectable]);
      },
      injected: (i, report) => {
        const h = hits.get(i.shift) ?? { n: 0, caught: 0 };
        h.n++;
        const caught = report.metrics.some((m) => m.name === i.metric && m.status === 'regressed');
        if (caught) h.caught++;
        each.push(caught);
        hits.set(i.shift, h);
      },
    },
    tick,
  );
  return {
    falseAlarms: rateEvidence(alarms, trials),
    unsettled,
    steps,
    caught: [...hits].sort(([a], [b]) => a - b).map(([shift, h]) => ({ shift, evidence: rateEvidence(h.caught, h.n) })),
    labelledFlagged,
    hits: each,
    detectable: new Map([...detectables].map(([name, list]) => [name, median(list)])),
    metricsPerRun: judged.length === 0 ? 0 : median(judged),
  };
}

const JUDGED: ReadonlySet<string> = new Set(['ok', 'regressed', 'improved']);
