import { compileGlobs } from '../config/glob-matcher.js';
import type { History } from '../history/history.js';

/** Where a metric's current level starts by a level mark (README.md "How the decision works"). */
export interface LevelStart {
  /** Index into history.runs of the run the mark starts at. */
  index: number;
  reason: 'accepted' | 'manual';
  pr?: number;
}

/**
 * The newest level mark of the history that matches the metric (a mark without `metrics` matches
 * every metric): runs before it are another level of that metric. Marks are few, so their globs
 * are compiled per call. O(runs).
 * @example levelMark(history, 'time/parse')?.reason // 'accepted'
 */
export function levelMark(history: History, name: string): LevelStart | undefined {
  for (let i = history.runs.length - 1; i >= 0; i--) {
    const marks = history.runs[i]!.marks;
    if (marks === undefined) continue;
    for (let k = marks.length - 1; k >= 0; k--) {
      const mark = marks[k]!;
      if (mark.metrics !== undefined && mark.metrics.length > 0 && !compileGlobs(mark.metrics)(name)) continue;
      return { index: i, reason: mark.reason, ...(mark.pr === undefined ? {} : { pr: mark.pr }) };
    }
  }
  return undefined;
}
