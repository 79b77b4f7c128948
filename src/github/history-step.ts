/**
 * The two store steps of a run, with the action's failure policy: a StoreError on load or save is
 * reported (warning, or error when `history-failure: fail`) and the run goes on; anything else is
 * a bug or bad input and propagates. Load failures give an empty history marked unreadable, so
 * the caller records nothing over a history it could not read.
 */
import { emptyHistory, type History, type RunInfo } from '../history/history.js';
import type { HistoryStore } from '../history/store.js';
import type { Run } from '../inputs/run.js';
import type { RunContext } from './context.js';
import { describeError } from './describe-error.js';
import type { ActionInputs } from './inputs.js';
import type { ActionSink } from './sink.js';

function isStoreError(error: unknown): boolean {
  return error instanceof Error && error.name === 'StoreError';
}

/**
 * @example (await loadHistory(store, 'ci', inputs, sink)).readable // false when the store failed
 */
export async function loadHistory(
  store: HistoryStore,
  series: string,
  inputs: ActionInputs,
  sink: ActionSink,
  newest?: number,
): Promise<{ history: History; readable: boolean }> {
  try {
    // Only the newest runs a check can use (the file store reads them from the end of the file).
    const history = await store.read(newest === undefined ? {} : { newest });
    sink.info(`bellgate: read ${history.runs.length} baseline runs from ${store.describe()}`);
    return { history, readable: true };
  } catch (error) {
    if (!isStoreError(error)) throw error;
    const message = `bellgate: the history could not be fetched from ${store.describe()}: ${describeError(error)}`;
    if (inputs.historyFailure === 'fail') sink.error(message);
    else
      sink.warning(
        `${message}\nGoing on without history (every metric is new); set \`history-failure: fail\` to fail instead.`,
      );
    return { history: emptyHistory(series), readable: false };
  }
}

/**
 * Records the run (the store appends it to what it holds when it writes, and trims to about the
 * `keep` newest runs). Returns whether it was saved.
 * @example await recordRun(store, info, run, 4000, inputs, sink) // true
 */
export async function recordRun(
  store: HistoryStore,
  info: RunInfo,
  run: Run,
  keep: number,
  inputs: ActionInputs,
  sink: ActionSink,
): Promise<boolean> {
  try {
    const saved = await store.update({ kind: 'record', info, run, keep });
    sink.info(`bellgate: recorded run ${info.id} in ${store.describe()} (${saved.runs} runs)`);
    return true;
  } catch (error) {
    if (!isStoreError(error)) throw error;
    const message = `bellgate: could not record run ${info.id} in ${store.describe()}: ${describeError(error)}`;
    if (inputs.historyFailure === 'fail') sink.error(message);
    else sink.warning(message);
    return false;
  }
}

/**
 * The history entry of this run: id `${GITHUB_RUN_ID}-${GITHUB_RUN_ATTEMPT}`, sha, ref, event,
 * time, and the runner fingerprint (when given).
 * @example runInfo(context, new Date(), 'Linux X64 | ubuntu24 20261110.1 | ... | node 24.11.0').id // '8123-1'
 */
export function runInfo(context: RunContext, now: Date, runner?: string): RunInfo {
  const info: RunInfo = { id: context.runId, event: context.eventName, time: now.toISOString() };
  if (context.sha) info.sha = context.sha;
  if (context.ref) info.ref = context.ref;
  if (runner) info.runner = runner;
  return info;
}
