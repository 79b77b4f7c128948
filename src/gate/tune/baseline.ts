import type { MetricSettings } from '../../config/types.js';
import type { History } from '../../history/history.js';
import { detectChangePoints } from '../../model/change-points.js';
import { InputError } from '../../errors/input-error.js';
import { toFitScale, type Scale } from '../../model/transform.js';

/** The baseline of one metric: the values the fit will see, oldest first, and the runs behind them. */
export interface SelectedBaseline {
  /** Values on the fit scale (after relative-to and the transform). */
  values: number[];
  /** Id of the run behind each value, aligned with `values`. */
  runIds: string[];
  /** Set when change-point detection shortened the baseline: the first run used. */
  since?: string;
  /** Set when the values are ratios to this metric of the same run. */
  relativeTo?: string;
  /** Runs of the history that hold this metric at all (before pairing and windowing). */
  available: number;
  /**
   * The whole window when change points shortened it. Groups align on it: one member's level
   * change must not cut every member's history (it only widens that member's own moves).
   */
  window?: { values: number[]; runIds: string[] };
}

/**
 * Selects a metric's baseline for tune's per-metric replay (the gate itself takes a run apart in
 * moves.ts; tune is to replay the gate whole, issue 13 item 7), with `transform` already resolved
 * to none or log (replaySettings):
 * 1. the runs that hold the metric (with `relative-to`: that also hold a non-zero reference, and
 *    the value becomes metric / reference of the same run, cancelling a runner's common speed);
 * 2. the newest `window` of them, moved to the fit scale (`transform`);
 * 3. with `change-points` on, PELT-style segmentation of that window (detectChangePoints); when the
 *    last segment already spans `min-runs` runs, only it is kept, so a merged level change stops
 *    counting as a regression once the new level has enough history.
 * O(window) on the plain scale (older runs are counted only when `available` is read), O(runs)
 * with a transform or ratio, plus the change-point search. Throws InputError when a value cannot
 * take the transform.
 * @example selectBaseline(history, 'build/time', settings).values // [412.5, 409.9, ...]
 */
export function selectBaseline(history: History, name: string, settings: MetricSettings): SelectedBaseline {
  const column = history.columns.get(name);
  const plain = settings.transform === 'none' && settings.relativeTo === undefined;
  const selected: SelectedBaseline =
    column === undefined
      ? { values: [], runIds: [], available: 0 }
      : plain
        ? newestWindow(history, column.values, settings.window)
        : checkedWindow(history, name, column.values, settings);
  if (settings.relativeTo !== undefined) selected.relativeTo = settings.relativeTo;
  return settings.changePoints ? sinceLastChange(selected, settings.minRuns) : selected;
}

/**
 * The plain scale (no transform, no ratio), where no value can be refused: walks back from the
 * newest run only until `window` values are found (copied in one slice when none is missing), and
 * names their runs or counts the older ones only when asked (see NewestWindow).
 */
function newestWindow(history: History, column: readonly number[], window: number): SelectedBaseline {
  const count = Math.min(column.length, history.runs.length);
  let first = count;
  let found = 0;
  while (first > 0 && found < window) {
    first--;
    if (Number.isFinite(column[first]!)) found++;
  }
  let values: number[];
  if (found === count - first) {
    values = column.slice(first, count);
  } else {
    values = [];
    for (let i = first; i < count; i++) if (Number.isFinite(column[i]!)) values.push(column[i]!);
  }
  return new NewestWindow(values, history, column, first, count);
}

/**
 * A plain-scale baseline: the values, with the run ids and the `available` count computed when
 * read. Most metrics need neither (no level change, no group, not missing), and building an id
 * array per metric, or walking every older run, was most of the selection's cost on a long history.
 */
class NewestWindow implements SelectedBaseline {
  readonly #history: History;
  readonly #column: readonly number[];
  /** Runs [first, count) hold the window (with any missing values skipped). */
  readonly #first: number;
  readonly #count: number;
  #runIds: string[] | undefined;

  constructor(
    readonly values: number[],
    history: History,
    column: readonly number[],
    first: number,
    count: number,
  ) {
    this.#history = history;
    this.#column = column;
    this.#first = first;
    this.#count = count;
  }

  get runIds(): string[] {
    if (this.#runIds === undefined) {
      const ids: string[] = [];
      for (let i = this.#first; i < this.#count; i++)
        if (Number.isFinite(this.#column[i]!)) ids.push(this.#history.runs[i]!.id);
      this.#runIds = ids;
    }
    return this.#runIds;
  }

  get available(): number {
    let available = this.values.length;
    for (let k = this.#first - 1; k >= 0; k--) if (Number.isFinite(this.#column[k]!)) available++;
    return available;
  }
}

/**
 * Any other scale: every value of the history is checked, since the transform or ratio can refuse
 * it. One forward pass checks and counts (in run order, so an error names the oldest bad run), then
 * a walk back from the newest run builds just the `window` kept values.
 */
function checkedWindow(
  history: History,
  name: string,
  column: readonly number[],
  settings: MetricSettings,
): SelectedBaseline {
  const reference = settings.relativeTo === undefined ? undefined : history.columns.get(settings.relativeTo);
  const ratio = settings.relativeTo !== undefined;
  const count = Math.min(column.length, history.runs.length);
  let available = 0;
  for (let i = 0; i < count; i++) {
    const x = pairedValue(column, reference?.values, ratio, i);
    if (Number.isFinite(column[i]!)) available++;
    if (x !== undefined) toHistoryFitScale(x, settings, name, history.runs[i]!.id);
  }
  const values: number[] = [];
  const runIds: string[] = [];
  for (let i = count - 1; i >= 0 && values.length < settings.window; i--) {
    const x = pairedValue(column, reference?.values, ratio, i);
    if (x === undefined) continue;
    const id = history.runs[i]!.id;
    values.push(toHistoryFitScale(x, settings, name, id));
    runIds.push(id);
  }
  return { values: values.reverse(), runIds: runIds.reverse(), available };
}

/** Run i's value, divided by the reference of the same run for a ratio; undefined when it lacks either. */
function pairedValue(
  column: readonly number[],
  reference: readonly number[] | undefined,
  ratio: boolean,
  i: number,
): number | undefined {
  const x = column[i]!;
  if (!Number.isFinite(x)) return undefined;
  if (!ratio) return x;
  const r = reference?.[i];
  if (r === undefined || !Number.isFinite(r) || r === 0) return undefined;
  return x / r;
}

/** Keeps only the runs after the last level change, once they are at least `minRuns`. */
function sinceLastChange(baseline: SelectedBaseline, minRuns: number): SelectedBaseline {
  if (baseline.values.length <= minRuns) return baseline;
  // The detector's own shortest segment (5 runs), not min-runs: forcing longer segments would
  // place a fresh change too early and mix the old level into the new baseline.
  const starts = detectChangePoints(baseline.values);
  const last = starts.filter((s) => s > 0 && s < baseline.values.length).at(-1);
  if (last === undefined || baseline.values.length - last < minRuns) return baseline;
  // Field by field: a NewestWindow's run ids and count are getters, which a spread would drop.
  const shortened: SelectedBaseline = {
    values: baseline.values.slice(last),
    runIds: baseline.runIds.slice(last),
    since: baseline.runIds[last]!,
    available: baseline.available,
    window: { values: baseline.values, runIds: baseline.runIds },
  };
  if (baseline.relativeTo !== undefined) shortened.relativeTo = baseline.relativeTo;
  return shortened;
}

function toHistoryFitScale(x: number, settings: MetricSettings, name: string, runId: string): number {
  try {
    return toFitScale(x, settings.transform as Scale);
  } catch (error) {
    if (!(error instanceof RangeError)) throw error;
    throw new InputError(`history run ${runId} has value ${x} for ${name}, which cannot be log-transformed`, {
      where: name,
      fix: 'use `transform: none` for this metric, or remove the bad run from the history',
      cause: error,
    });
  }
}
