import type { History } from '../../history/history.js';
import { selectBaseline } from './baseline.js';
import { scoreMetric } from './score-alone.js';
import type { MetricSequence } from './metric-sequence.js';
import { emptyReplay, type MetricReplay } from './replay-point.js';

/**
 * Replays a metric by calling the gate's own judge for every run: the window of values before
 * the run, change-point shortening by selectBaseline itself (on a history holding just that
 * window), then scoreMetric. Exactly the gate's decision, for any setting (robust fit, change
 * points, relative-to). Cost: O(runs x window) for the fits, plus one change-point search per run
 * when `change-points` is on (PELT over the window, up to O(window^2) each), so
 * O(runs x window^2) in the worst case — seconds for 500 runs x 60-run windows x 100 metrics.
 * @example refitReplay(sequence).relativeDensity[0] // the first judged run's relative density
 */
export function refitReplay(sequence: MetricSequence): MetricReplay {
  const { name, settings, values, own, runIds, runIndex } = sequence;
  const replay = emptyReplay(name, 'refit');
  for (let k = 0; k < values.length; k++) {
    const start = Math.max(0, k - settings.window);
    if (k - start < settings.minRuns || k === 0) continue;
    let baseline = values.slice(start, k);
    if (settings.changePoints) baseline = shortened(name, baseline, runIds.slice(start, k), sequence);
    const score = scoreMetric(name, settings, baseline, own[k]!);
    if (!score.scored) continue;
    replay.run.push(runIndex[k]!);
    replay.relativeDensity.push(score.relativeDensity);
    replay.tail.push(score.tail);
    replay.side.push(
      !score.beyondTolerance ? 0 : score.direction === 'worse' ? 1 : score.direction === 'better' ? -1 : 0,
    );
  }
  return replay;
}

/** The window after selectBaseline's change-point step, run on a history of just that window (already on the fit scale). */
function shortened(name: string, window: number[], ids: string[], sequence: MetricSequence): number[] {
  const history: History = {
    series: 'replay',
    runs: ids.map((id) => ({ id })),
    columns: new Map([[name, { values: window }]]),
  };
  const { relativeTo: _dropped, ...rest } = sequence.settings;
  return selectBaseline(history, name, { ...rest, transform: 'none', window: window.length }).values;
}
