/**
 * What the noise of a recorded regime looks like, in the figures issue 13 quotes: each timing's
 * coefficient of variation, the share of its log variance that the run's common factor explains,
 * how many runs lie beyond 3.5 robust sd, the share of the variance inside one run, and the skew
 * left on the log scale. Computed on the regime's runs without a slowdown (history and clean),
 * with simple-statistics doing the arithmetic.
 */
import {
  mean,
  median,
  medianAbsoluteDeviation,
  sampleCorrelation,
  sampleSkewness,
  sampleStandardDeviation,
  sampleVariance,
} from 'simple-statistics';
import type { Regime, Source } from './corpus.js';

export interface MetricFigures {
  name: string;
  /** Sample sd / mean of the per-run medians, on the raw scale. */
  cv: number;
  /** Squared correlation of the metric's log with the run's common log shift (the other timings' median). */
  commonShare: number;
  /** Runs whose log value is beyond 3.5 x 1.4826 x MAD from the median. */
  beyond35: number;
  /** Variance of one sample's log inside a run over the total (inside + between runs). */
  withinShare: number;
  /** Sample skewness (G1) of the per-run log values. */
  logSkew: number;
}

export interface RegimeFigures {
  regime: string;
  source: Source;
  runs: number;
  loadavg: { min: number; median: number; max: number };
  metrics: MetricFigures[];
}

export function regimeFigures(regime: Regime, source: Source): RegimeFigures {
  const runs = regime.runs.filter((r) => r.kind !== 'slowed');
  const names = regime.header.timings;
  // logs[j][k]: log of the median sample of timing j in run k
  const logs = names.map((_, j) => runs.map((r) => Math.log(median(r[source][j]!))));
  const centred = logs.map((column) => {
    const m = mean(column);
    return column.map((x) => x - m);
  });
  const metrics = names.map((name, j) => {
    const values = logs[j]!.map(Math.exp);
    // the run's common shift without this metric, so a metric does not explain itself
    const common = runs.map((_, k) => median(centred.filter((_, i) => i !== j).map((c) => c[k]!)));
    const centre = median(logs[j]!);
    const robustSd = 1.4826 * medianAbsoluteDeviation(logs[j]!);
    const within = mean(runs.map((r) => sampleVariance(r[source][j]!.map(Math.log))));
    const runMeans = runs.map((r) => mean(r[source][j]!.map(Math.log)));
    const samples = runs[0]![source][j]!.length;
    const between = Math.max(0, sampleVariance(runMeans) - within / samples);
    return {
      name,
      cv: sampleStandardDeviation(values) / mean(values),
      commonShare: sampleCorrelation(logs[j]!, common) ** 2,
      beyond35: logs[j]!.filter((x) => Math.abs(x - centre) > 3.5 * robustSd).length,
      withinShare: within / (within + between),
      logSkew: sampleSkewness(logs[j]!),
    };
  });
  const loads = runs.map((r) => r.loadavg[0]);
  return {
    regime: regime.name,
    source,
    runs: runs.length,
    loadavg: { min: Math.min(...loads), median: median(loads), max: Math.max(...loads) },
    metrics,
  };
}

function range(values: readonly number[], scale = 1, digits = 1): string {
  const sorted = [...values].sort((a, b) => a - b);
  const f = (x: number) => (x * scale).toFixed(digits);
  return `${f(sorted[0]!)}-${f(sorted[sorted.length - 1]!)} (median ${f(median(sorted))})`;
}

/** One line per regime and source: the ranges over the timings. */
export function formatFigures(all: readonly RegimeFigures[]): string {
  return all
    .map((f) => {
      const m = f.metrics;
      return [
        `${f.regime} ${f.source}: ${f.runs} runs, loadavg ${f.loadavg.min}-${f.loadavg.max} (median ${f.loadavg.median})`,
        `  CV % ${range(
          m.map((x) => x.cv),
          100,
        )}; common factor share % ${range(
          m.map((x) => x.commonShare),
          100,
          0,
        )}; within-run share % ${range(
          m.map((x) => x.withinShare),
          100,
        )}`,
        `  runs beyond 3.5 robust sd: ${range(
          m.map((x) => x.beyond35),
          1,
          0,
        )} per timing; log-scale skewness ${range(
          m.map((x) => x.logSkew),
          1,
          2,
        )}`,
      ].join('\n');
    })
    .join('\n');
}
