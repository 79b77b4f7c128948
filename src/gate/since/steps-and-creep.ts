import { hampelOutliers } from '../../model/hampel.js';
import { levelSteps, splitSearch } from '../../model/level-steps.js';
import { mannKendall, type MannKendall } from '../../model/mann-kendall.js';
import { median } from '../../model/median.js';
import { serialCorrection } from '../../model/serial-correction.js';
import { theilSen, type TheilSen, type TrendBlock } from '../../model/theil-sen.js';

/** One metric's values on the review's scale, at their run positions, oldest first. */
export interface Series {
  at: readonly number[];
  values: readonly number[];
}

/** What stepsAndCreep finds. */
export interface StepsAndCreep {
  /** Indices into the series where a new level starts (all after the reference). */
  steps: { index: number; p: number }[];
  /** Per value: false for an outlying run (hampelOutliers), left out of every test here. */
  kept: boolean[];
  /** How many runs were left out as outlying. */
  outlying: number;
  /** Theil-Sen slope per run and its interval, within the segments after the reference. */
  slope: TheilSen | null;
  /** Mann-Kendall test within the same segments, its variance widened for serial correlation. */
  trend: MannKendall | null;
  /** All values with the creep taken out after the reference (when the creep is significant). */
  detrended: number[];
  segments: number;
}

export interface StepOptions {
  minSegment: number;
  stepLevel: number;
  /** Level at which a creep is taken out before the steps are searched. */
  creepLevel: number;
  confidence: number;
}

/** Rounds of segment-and-slope before giving up on a fixed point (it settles in 2-3). */
const MAX_ROUNDS = 10;

interface Round {
  steps: { index: number; p: number }[];
  slope: TheilSen | null;
  trend: MannKendall | null;
  segments: number;
  /** The slope taken out: the Theil-Sen slope when the trend is significant, else 0. */
  taken: number;
}

/**
 * Steps and creep together, on the runs that are not outlying (hampelOutliers over windows of
 * minSegment runs each side: a burst of slow runs shorter than that is noise, not a level).
 * Since each hides the other: a slope fitted across a step is bent by
 * it, and a creep looks like steps to a level test. So they are found in turns, from a start b:
 * 1. the series, with the creep taken out after the reference (y - b (t - t_ref)), is searched
 *    for steps (levelSteps: binary segmentation with a rank split test, then the hold check),
 *    and steps that the slope explains are pruned (prune, by the BIC below);
 * 2. within the segments between those steps, the Theil-Sen slope and the Mann-Kendall test
 *    (Hirsch, Slack & Smith 1982: segments as blocks; Hamed & Rao 1998: variance widened for
 *    serial correlation); b becomes the slope when the test is below creepLevel, else 0;
 * until the steps and b repeat (a fixed point; at most MAX_ROUNDS rounds). The turns can settle
 * on a wrong pair (a slope bent by a step it then hides), so they start from b = 0, from the
 * local slope (Theil-Sen over pairs at most 2 x minSegment runs apart, which a step barely
 * bends) and from the slope within the cuts of the step search alone (cutSlope), each taken
 * when Mann-Kendall finds a trend, and the fixed point with the smallest Laplace
 * BIC, m ln(mean |residual|) + (2 steps + slope) ln m, is kept (Schwarz 1978; the Laplace
 * likelihood keeps a few wild runs from deciding). Runs at or before the reference (the window
 * of the level then) take part in the step search, so a step on the first run after the
 * reference is found; only steps after it are kept. `reference` is the reference run's
 * position; positions are run numbers.
 */
export function stepsAndCreep(all: Series, reference: number, options: StepOptions): StepsAndCreep {
  const outlying = hampelOutliers(all.values, 2 * options.minSegment);
  const kept = all.values.map((_, i) => i).filter((i) => !outlying[i]);
  const series: Series = { at: kept.map((i) => all.at[i]!), values: kept.map((i) => all.values[i]!) };
  const after = firstAfter(series, reference);
  const starts = new Set([0, localSlope(series, after, options), cutSlope(series, after, options)]);
  let best: { round: Round; cost: number } | undefined;
  for (const start of starts) {
    const round = settle(series, after, reference, start, options);
    const cost = bic(series, after, reference, round);
    if (best === undefined || cost < best.cost) best = { round, cost };
  }
  const round = best!.round;
  return {
    steps: round.steps.map((s) => ({ index: kept[s.index]!, p: s.p })),
    kept: outlying.map((o) => !o),
    slope: round.slope,
    trend: round.trend,
    detrended: takeOut(all, firstAfter(all, reference), reference, round.taken),
    segments: round.segments,
    outlying: outlying.filter(Boolean).length,
  };
}

/** The turns of search and slope from a start slope, to a fixed point. */
function settle(series: Series, after: number, reference: number, start: number, options: StepOptions): Round {
  const seen = new Set<string>();
  let round: Round = { steps: [], slope: null, trend: null, segments: 0, taken: start };
  for (let k = 0; k < MAX_ROUNDS; k++) {
    const detrended = takeOut(series, after, reference, round.taken);
    const steps = levelSteps(detrended, { minSegment: options.minSegment, level: options.stepLevel })
      .filter((s) => s.at >= after)
      .map((s) => ({ index: s.at, p: s.p }));
    round = prune(series, after, reference, measureCreep(series, after, steps, options), options);
    const key = `${steps.map((s) => s.index).join(',')}|${round.taken}`;
    if (seen.has(key)) break;
    seen.add(key);
  }
  return round;
}

/**
 * Backward elimination by the same BIC: while leaving one step out (and refitting the slope within
 * the wider segment) lowers the BIC, the step whose removal lowers it most goes. A creep seen
 * without its slope taken out looks like a staircase; once the slope explains it, its steps go.
 */
function prune(series: Series, after: number, reference: number, round: Round, options: StepOptions): Round {
  let current = round;
  let cost = bic(series, after, reference, current);
  while (current.steps.length > 0) {
    let best: { round: Round; cost: number } | undefined;
    for (let k = 0; k < current.steps.length; k++) {
      const fewer = current.steps.filter((_, i) => i !== k);
      const candidate = measureCreep(series, after, fewer, options);
      const c = bic(series, after, reference, candidate);
      if (best === undefined || c < best.cost) best = { round: candidate, cost: c };
    }
    if (!(best!.cost < cost)) break;
    current = best!.round;
    cost = best!.cost;
  }
  return current;
}

/** The local slope after the reference when Mann-Kendall finds a trend there, else 0. */
function localSlope(series: Series, after: number, options: StepOptions): number {
  const values = series.values.slice(after);
  if (values.length < 2 * options.minSegment) return 0;
  if (!(mannKendall([values]).p < options.creepLevel)) return 0;
  return theilSen([{ at: series.at.slice(after), values }], { maxLag: 2 * options.minSegment }).slope;
}

/**
 * The slope within the segments that the step search alone (no hold check) cuts the raw series
 * into, when Mann-Kendall finds a trend there, else 0: cuts in a creep only shorten its
 * segments, and a cut at a step keeps the step out of the slope.
 */
function cutSlope(series: Series, after: number, options: StepOptions): number {
  const cuts = splitSearch(Float64Array.from(series.values), options.minSegment, options.stepLevel)
    .filter((at) => at >= after)
    .map((index) => ({ index, p: 0 }));
  return measureCreep(series, after, cuts, options).taken;
}

/** Laplace BIC of a fixed point: each segment at its median, the slope taken out after the reference. */
function bic(series: Series, after: number, reference: number, round: Round): number {
  const detrended = takeOut(series, after, reference, round.taken);
  const cuts = [0, ...round.steps.map((s) => s.index), detrended.length];
  let absolute = 0;
  for (let k = 0; k + 1 < cuts.length; k++) {
    const part = detrended.slice(cuts[k], cuts[k + 1]);
    if (part.length === 0) continue;
    const level = median(part);
    for (const r of part) absolute += Math.abs(r - level);
  }
  const m = detrended.length;
  const parameters = 2 * round.steps.length + (round.taken === 0 ? 0 : 1);
  // A perfect fit (constant data) has no log; the floor keeps the comparison finite.
  return m * Math.log(Math.max(absolute / m, Number.MIN_VALUE)) + parameters * Math.log(m);
}

/** Index of the first value after the reference (the length when there is none). */
function firstAfter(series: Series, reference: number): number {
  const first = series.at.findIndex((t) => t > reference);
  return first < 0 ? series.at.length : first;
}

function takeOut(series: Series, after: number, reference: number, slope: number): number[] {
  return series.values.map((y, i) => (i >= after ? y - slope * (series.at[i]! - reference) : y));
}

/** The runs after the reference cut at the steps: one block per segment of 2 runs or more. */
function segmentBlocks(series: Series, after: number, steps: readonly { index: number }[]): TrendBlock[] {
  const cuts = [after, ...steps.map((s) => s.index).filter((i) => i > after), series.values.length];
  const blocks: TrendBlock[] = [];
  for (let k = 0; k + 1 < cuts.length; k++) {
    if (cuts[k + 1]! - cuts[k]! < 2) continue;
    blocks.push({ at: series.at.slice(cuts[k], cuts[k + 1]), values: series.values.slice(cuts[k], cuts[k + 1]) });
  }
  return blocks;
}

function measureCreep(
  series: Series,
  after: number,
  steps: { index: number; p: number }[],
  options: StepOptions,
): Round {
  const blocks = segmentBlocks(series, after, steps);
  if (blocks.length === 0) return { steps, slope: null, trend: null, segments: 0, taken: 0 };
  const first = theilSen(blocks, { confidence: options.confidence });
  // Residuals: each segment without its slope and its own level, one series for the correlation.
  const residuals: number[] = [];
  for (const { at, values } of blocks) {
    const flat = Array.from(values, (y, i) => y - first.slope * at[i]!);
    const level = median(flat);
    for (const r of flat) residuals.push(r - level);
  }
  const trend = mannKendall(
    blocks.map((b) => b.values),
    serialCorrection(residuals),
  );
  const slope = theilSen(blocks, { confidence: options.confidence, variance: trend.variance });
  return { steps, slope, trend, segments: blocks.length, taken: trend.p < options.creepLevel ? slope.slope : 0 };
}
