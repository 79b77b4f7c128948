import type { History, MetricColumn, RunInfo } from '../history/history.js';
import type { MetricResult } from '../gate/report.js';
import { cutoffSigma } from '../model/tails.js';

/** One run's value in a chart, with what its tooltip says. */
export interface ChartPoint {
  index: number;
  value: number;
  run: RunInfo;
}

/** The finite values of a history column with their run, oldest first. */
export function columnPoints(column: MetricColumn | undefined, runs: readonly RunInfo[]): ChartPoint[] {
  if (!column) return [];
  const out: ChartPoint[] = [];
  column.values.forEach((value, index) => {
    const run = runs[index];
    if (run && Number.isFinite(value)) out.push({ index, value, run });
  });
  return out;
}

/**
 * The runs behind the fit, as far as the history shows them: from run `baseline.since` when
 * change points shortened the baseline, then the newest `baseline.n` values. (The gate decides
 * the exact window; this reconstruction is for pictures only.)
 */
export function baselinePoints(points: readonly ChartPoint[], m: MetricResult): ChartPoint[] {
  const b = m.baseline;
  if (!b) return [];
  const start = b.since === undefined ? -1 : points.findIndex((p) => p.run.id === b.since);
  const from = start >= 0 ? points.slice(start) : points;
  return from.slice(Math.max(0, from.length - b.n));
}

/** The band where the fit's relative density stays above the cutoff, mean ± sqrt(-2 ln c) sd, on the metric's own scale. */
export interface Band {
  mean: number;
  low: number;
  high: number;
}

/**
 * The band in the metric's own unit: on the log scale the edges are exp(mean ± k sd), so the
 * band is asymmetric around the geometric mean. Undefined without a usable fit. (With relative-to
 * the band is of ratios; chartColumn gives the matching values.)
 * @example cutoffBand({ ...m, baseline: { n: 9, mean: 10, sd: 1 } }, 0.01) // { mean: 10, low: 6.965, high: 13.035 }
 */
export function cutoffBand(m: MetricResult, cutoff: number): Band | undefined {
  const b = m.baseline;
  if (!b || !Number.isFinite(b.mean) || !(b.sd >= 0 && Number.isFinite(b.sd)) || !(cutoff > 0 && cutoff < 1))
    return undefined;
  const k = cutoffSigma(cutoff);
  const back = (t: number): number => (b.scale === 'log' ? Math.exp(t) : t);
  return { mean: back(b.mean), low: back(b.mean - k * b.sd), high: back(b.mean + k * b.sd) };
}

/**
 * The values a metric's charts show: its history column, or with relative-to the run-by-run ratio
 * to the reference metric, the quantity the gate fitted and judged (NaN where either is missing
 * or the reference is 0).
 */
export function chartColumn(history: History, m: MetricResult): MetricColumn | undefined {
  const own = history.columns.get(m.name);
  const refName = m.baseline?.relativeTo;
  if (!own || refName === undefined) return own;
  const ref = history.columns.get(refName);
  return {
    values: own.values.map((v, i) => {
      const r = ref?.values[i];
      return r === undefined || r === 0 ? NaN : v / r;
    }),
  };
}
