import { settingsFor } from '../../config/rules.js';
import type { Config } from '../../config/types.js';
import type { History } from '../../history/history.js';
import { canSlide, incrementalReplay } from './incremental-replay.js';
import { metricSequence } from './metric-sequence.js';
import { refitReplay } from './refit-replay.js';
import { replaySettings } from './score-alone.js';
import type { MetricReplay } from './replay-point.js';

/** Every metric's replay over one history. */
export interface Replay {
  /** Number of runs in the history (replay `run` indexes point into history.runs). */
  runCount: number;
  metrics: MetricReplay[];
}

export interface ReplayOptions {
  /** Force the refit path for every metric (the reference the incremental path is tested against). */
  refit?: boolean;
  /** Called after each metric with (metrics done, metrics in all): the CLI draws its progress bar from it. */
  onProgress?: (done: number, total: number) => void;
}

/**
 * Replays the gate over a history: every baseline run is judged against the runs before it with
 * the config's settings for each metric (window, min-runs, transform, fit, uncertainty,
 * tolerance, relative-to, change points), by the gate's own per-metric judge (refitReplay) or its
 * O(1)-per-run sliding equivalent where the settings allow (incrementalReplay, see canSlide).
 * Metrics a rule ignores are left out. Groups are not replayed jointly: a grouped metric is
 * replayed as the gate judges it alone (what it falls back to while its group is learning).
 * Pure. Throws InputError when a history value cannot take a metric's transform.
 * @example replayHistory(config, history).metrics[0].relativeDensity // one per judged run
 */
export function replayHistory(config: Config, history: History, options: ReplayOptions = {}): Replay {
  const indexOf = new Map(history.runs.map((run, i) => [run.id, i] as const));
  const names = [...history.columns.keys()]
    .filter((name) => history.columns.get(name)!.values.some((v) => Number.isFinite(v)))
    .sort((a, b) => (a < b ? -1 : a > b ? 1 : 0));
  const metrics: MetricReplay[] = [];
  names.forEach((name, i) => {
    const settings = replaySettings(settingsFor(config, name), history.columns.get(name)?.unit);
    if (!settings.ignore) {
      const sequence = metricSequence(history, name, settings, indexOf);
      metrics.push(!options.refit && canSlide(settings) ? incrementalReplay(sequence) : refitReplay(sequence));
    }
    options.onProgress?.(i + 1, names.length);
  });
  return { runCount: history.runs.length, metrics };
}
