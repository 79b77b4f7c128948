/**
 * The two store steps of a run. A StoreError on load or save becomes a StoreProblem (a
 * configuration fault or an outage, store-fault.ts) for the caller's failure policy; anything else
 * is a bug or bad input and propagates. A failed load gives an empty history, and the caller
 * records nothing over a history it could not read.
 */
import { emptyHistory, type History, type RunInfo } from '../history/history.js';
import type { HistoryStore } from '../history/store.js';
import type { Run } from '../inputs/run.js';
import type { RunContext } from './context.js';
import type { ActionSink } from './sink.js';
import { classifyStoreError, isStoreError, type StoreProblem, type StoreSetting } from './store-fault.js';
import { logText } from './log-text.js';

/**
 * @example (await loadHistory(store, 'ci', setting, sink)).problem // undefined when the store answered
 */
export async function loadHistory(
  store: HistoryStore,
  series: string,
  setting: Omit<StoreSetting, 'step'>,
  sink: ActionSink,
  newest?: number,
): Promise<{ history: History; problem?: StoreProblem }> {
  try {
    // Only the newest runs a check can use (the file store reads them from the end of the file).
    const history = await store.read(newest === undefined ? {} : { newest });
    sink.info(`bellgate: read ${history.runs.length} baseline runs from ${logText(store.describe())}`);
    return { history };
  } catch (error) {
    if (!isStoreError(error)) throw error;
    return { history: emptyHistory(series), problem: classifyStoreError(error, { ...setting, step: 'load' }) };
  }
}

/**
 * Records the run (the store appends it to what it holds when it writes, and trims to about the
 * `keep` newest runs).
 * @example (await recordRun(store, info, run, 4000, setting, sink)).problem // undefined when saved
 */
export async function recordRun(
  store: HistoryStore,
  info: RunInfo,
  run: Run,
  keep: number,
  setting: Omit<StoreSetting, 'step'>,
  sink: ActionSink,
): Promise<{ problem?: StoreProblem }> {
  try {
    const saved = await store.update({ kind: 'record', info, run, keep });
    sink.info(`bellgate: recorded run ${logText(info.id)} in ${logText(store.describe())} (${saved.runs} runs)`);
    return {};
  } catch (error) {
    if (!isStoreError(error)) throw error;
    return { problem: classifyStoreError(error, { ...setting, step: 'save' }) };
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
