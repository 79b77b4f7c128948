import type { Config, Family, Transform } from '../../config/types.js';
import { cutoffLevel } from '../../model/tails.js';

/**
 * One candidate of the joint search (issue 13 item 7): the scale, the shared move, change points,
 * and how a run's metrics are decided — family control (holm) at a per-run budget, or each metric
 * by its cutoff (family none). These are the keys `--write` puts into a config.
 */
export interface TuneSetting {
  transform: Transform;
  sharedMove: boolean;
  changePoints: boolean;
  /** The ladder tries holm and none; the configured setting may be any family. */
  family: Family;
  /** family control: the chance of any false alarm in a run (0.01 = 1%). */
  budget?: number;
  /** none: the relative density below which a metric is flagged. */
  cutoff?: number;
}

/** The structural part of a setting: one replay through the gate serves every budget and cutoff. */
export type Structure = Pick<TuneSetting, 'transform' | 'sharedMove' | 'changePoints'>;

/** Budgets tried with holm, loosest first. */
export const BUDGETS: readonly number[] = [0.05, 0.02, 0.01, 0.005, 0.002, 0.001];

/** Cutoffs tried with family none, loosest first. */
export const CUTOFFS: readonly number[] = [0.01, 1e-3, 1e-4, 1e-5, 1e-6];

/**
 * The structures of the ladder: transform auto (the log scale for timings) or none, shared move
 * on or off, change points on or off; the configured one first, so it wins ties.
 */
export function structures(config: Config): Structure[] {
  const own: Structure = {
    transform: config.defaults.transform,
    sharedMove: config.defaults.sharedMove,
    changePoints: config.defaults.changePoints,
  };
  const all: Structure[] = [own];
  for (const transform of ['auto', 'none'] as const)
    for (const sharedMove of [true, false])
      for (const changePoints of [true, false]) {
        const s = { transform, sharedMove, changePoints };
        if (!all.some((t) => sameStructure(t, s))) all.push(s);
      }
  return all;
}

export function sameStructure(a: Structure, b: Structure): boolean {
  return a.transform === b.transform && a.sharedMove === b.sharedMove && a.changePoints === b.changePoints;
}

/**
 * The config with the setting in `defaults` (rules still override per metric) and at the top
 * level, as `--write` leaves it. A structure alone (no family) keeps the config's family.
 */
export function withSetting(config: Config, setting: Structure & Partial<TuneSetting>): Config {
  const defaults = {
    ...config.defaults,
    transform: setting.transform,
    sharedMove: setting.sharedMove,
    changePoints: setting.changePoints,
    ...(setting.cutoff === undefined ? {} : { cutoff: setting.cutoff }),
  };
  return {
    ...config,
    defaults,
    ...(setting.family === undefined ? {} : { family: setting.family }),
    ...(setting.budget === undefined ? {} : { budget: setting.budget }),
  };
}

/**
 * What the model promises as the chance of a false alarm in a clean run, per 100 runs: for holm
 * the budget (Holm 1979 holds the chance of any false alarm at it; so do bonferroni, and
 * Benjamini-Hochberg when every metric is clean); for family none, m metrics
 * each at the one-sided Gaussian tail of the cutoff's sigma, 1 - (1 - level / 2)^m.
 * @example promisedPer100({ ...s, family: 'none', cutoff: 0.01 }, 50) // ≈ 5.8
 */
export function promisedPer100(setting: TuneSetting, metricsPerRun: number): number {
  if (setting.family !== 'none') return 100 * setting.budget!;
  const level = cutoffLevel(setting.cutoff!) / 2;
  return 100 * -Math.expm1(metricsPerRun * Math.log1p(-level));
}

/** The setting in the config's words, e.g. "transform auto, shared move on, change points off, holm at 1%". */
export function describeSetting(s: TuneSetting): string {
  const decide = s.family === 'none' ? `family none, cutoff ${s.cutoff}` : `${s.family} at ${percent(s.budget!)}`;
  return `transform ${s.transform}, shared move ${s.sharedMove ? 'on' : 'off'}, change points ${s.changePoints ? 'on' : 'off'}, ${decide}`;
}

/** A share as the config writes a percent: 0.005 -> "0.5%". */
export function percent(share: number): string {
  return `${Number((100 * share).toPrecision(6))}%`;
}

/** The setting a config already has. */
export function settingOf(config: Config): TuneSetting {
  const { transform, sharedMove, changePoints, cutoff } = config.defaults;
  const family = config.family;
  return {
    transform,
    sharedMove,
    changePoints,
    family,
    ...(family === 'none' ? { cutoff } : { budget: config.budget }),
  };
}

export function sameSetting(a: TuneSetting, b: TuneSetting): boolean {
  return sameStructure(a, b) && a.family === b.family && a.budget === b.budget && a.cutoff === b.cutoff;
}
