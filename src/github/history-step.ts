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
): Promise<{ history: History; problem?: StoreProblem }> {
  try {
    const history = await store.load();
    sink.info(`bellgate: read ${history.runs.length} baseline runs from ${logText(store.describe())}`);
    return { history };
  } catch (error) {
    if (!isStoreError(error)) throw error;
    return { history: emptyHistory(series), problem: classifyStoreError(error, { ...setting, step: 'load' }) };
  }
}

/**
 * Appends the run, trims to `keep` newest runs and saves.
 * @example (await recordRun(store, history, info, run, 500, setting, sink)).problem // undefined when saved
 */
export async function recordRun(
  store: HistoryStore,
  history: History,
  info: RunInfo,
  run: Run,
  keep: number,
  setting: Omit<StoreSetting, 'step'>,
  sink: ActionSink,
): Promise<{ problem?: StoreProblem }> {
  try {
    // Loaded here: a check that records nothing (every pull request) never needs the merge code.
    const { appendRun, trimHistory } = await import('../history/merge.js');
    const next = trimHistory(appendRun(history, info, run), keep);
    await store.save(next, history.runs.length);
    sink.info(`bellgate: recorded run ${logText(info.id)} in ${logText(store.describe())} (${next.runs.length} runs)`);
    return {};
  } catch (error) {
    if (!isStoreError(error)) throw error;
    return { problem: classifyStoreError(error, { ...setting, step: 'save' }) };
  }
}

/**
 * The history entry of this run: id `${GITHUB_RUN_ID}-${GITHUB_RUN_ATTEMPT}`, sha, ref, event, time.
 * @example runInfo(context, new Date()).id // '8123-1'
 */
export function runInfo(context: RunContext, now: Date): RunInfo {
  const info: RunInfo = { id: context.runId, event: context.eventName, time: now.toISOString() };
  if (context.sha) info.sha = context.sha;
  if (context.ref) info.ref = context.ref;
  return info;
}
