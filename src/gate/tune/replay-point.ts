/** Which side a replayed move lies on, as the gate decides it: 1 worse, -1 better, 0 neither or within the tolerance. */
export type Side = 1 | -1 | 0;

/**
 * One metric's replay: for every run it could be judged in (enough baseline runs), the
 * quantities the decision rests on, so a whole ladder of cutoffs is scored from one replay:
 * flagged at cutoff c when relativeDensity < c and side is 1 (family control: adjusted tail < level).
 * Arrays are aligned; `run` indexes History.runs.
 */
export interface MetricReplay {
  name: string;
  /** How the fits were made: a sliding RunningMoments window, or a refit of each baseline. */
  method: 'incremental' | 'refit';
  run: number[];
  relativeDensity: number[];
  tail: number[];
  side: Side[];
}

/** An empty replay for a metric. */
export function emptyReplay(name: string, method: MetricReplay['method']): MetricReplay {
  return { name, method, run: [], relativeDensity: [], tail: [], side: [] };
}
