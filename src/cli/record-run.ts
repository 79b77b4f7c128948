import type { RunInfo } from '../history/history.js';
import type { HistoryStore, UpdateOutcome } from '../history/store.js';
import type { Run } from '../inputs/run.js';

/**
 * Records one run in the store: appended (a run with the same id, or an earlier attempt of the
 * same CI run, is replaced), the history trimmed to about the newest `keep` runs — besides a drop,
 * the only deletion. The store applies it to what is stored when it writes, under its lock.
 * @returns what the store did (runs kept, the run replaced).
 * @throws StoreError when the store cannot write; InputError when the run cannot be recorded.
 */
export async function recordRun(store: HistoryStore, info: RunInfo, run: Run, keep: number): Promise<UpdateOutcome> {
  return store.update({ kind: 'record', info, run, keep });
}
