import type { TuneResult } from '../gate/tune/tune.js';

/** Schema tag of the tune JSON; bumped only on a breaking change of its fields. */
export const TUNE_SCHEMA = 'bellgate.tune/1';

/**
 * `bellgate tune --format json`: the whole result for scripts, with stable field names. Ladders
 * become an object keyed by family setting (a fixed set of names, never metric names); per-metric
 * counts are arrays aligned with `metrics`. Non-finite numbers never occur (rates of empty sets
 * are 0). Two-space indent, trailing newline.
 * @example JSON.parse(renderTuneJson(result)).suggestion.cutoff // 0.01
 */
export function renderTuneJson(result: TuneResult, extra: { written?: { file: string; diff: string } } = {}): string {
  const ladders: Record<string, unknown> = Object.create(null) as Record<string, unknown>;
  for (const [family, rows] of result.ladders) ladders[family] = rows;
  const body = {
    schema: TUNE_SCHEMA,
    series: result.series,
    runs: result.runs,
    replayedRuns: result.replayedRuns,
    metricsPerRun: result.metricsPerRun,
    family: result.family,
    currentCutoff: result.currentCutoff,
    metrics: result.metrics,
    groups: result.groups,
    ladders,
    target: result.target,
    ...(result.labels === undefined ? {} : { labels: result.labels }),
    suggestion: result.suggestion,
    ...(extra.written === undefined ? {} : { written: extra.written }),
  };
  return `${JSON.stringify(body, null, 2)}\n`;
}
