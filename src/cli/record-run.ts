import type { History, RunInfo } from '../history/history.js';
import { appendRun, trimHistory } from '../history/merge.js';
import type { HistoryStore } from '../history/store.js';
import type { Run } from '../inputs/run.js';

/**
 * Appends one run to the history (a run with the same id is replaced), trims to the newest `keep`
 * runs — the only deletion — and saves through the store, which refuses to lose runs otherwise.
 * Takes `history` over: afterwards only its runs and series may be read (its value arrays may
 * have been extended by the new run's values; see appendRun's extendInPlace).
 * @returns the history as saved.
 * @throws StoreError when the store cannot write.
 */
export async function recordRun(
  store: HistoryStore,
  history: History,
  info: RunInfo,
  run: Run,
  keep: number,
): Promise<History> {
  // The loaded history is not read again (callers use only its runs), so its columns are extended
  // in place rather than copied.
  const next = trimHistory(appendRun(history, info, run, { extendInPlace: true }), keep);
  await store.save(next, history.runs.length);
  return next;
}
