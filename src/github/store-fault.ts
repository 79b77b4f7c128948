/**
 * The action's reading of a StoreError: a configuration fault (the workflow must change: the
 * history belongs to another series, what is stored is not a history, the token lacks a
 * permission the store needs) fails the step; an outage (the store could not be reached) warns,
 * per `history-failure`. The fix is said in the action's own words: inputs and permissions of the
 * workflow step, never CLI flags.
 */
import type { StoreErrorKind } from '../history/store.js';
import { statusOf } from './api.js';
import type { StoreKind } from './inputs.js';

export type StoreFault = 'configuration' | 'outage';

export interface StoreProblem {
  fault: StoreFault;
  kind: StoreErrorKind;
  /** Why, in one line (the store's own message). */
  reason: string;
  /** What the workflow should change or do, in the action's words. */
  fix: string;
}

/** What the action knows about the store that failed. */
export interface StoreSetting {
  store: StoreKind;
  history: string;
  step: 'load' | 'save';
}

interface StoreErrorLike {
  message: string;
  fix?: string;
  kind?: StoreErrorKind;
  cause?: unknown;
}

/** Whether an error is a StoreError (by name: the stores load in their own bundle chunks). */
export function isStoreError(error: unknown): error is Error & StoreErrorLike {
  return error instanceof Error && error.name === 'StoreError';
}

/**
 * The store's own kind when it says one; else read from today's messages and the HTTP status of
 * the cause (401/403: the token may not; the messages the stores give for another series and for
 * a document that does not parse).
 */
function kindOf(error: StoreErrorLike): StoreErrorKind {
  if (error.kind !== undefined) return error.kind;
  const status = statusOf(error.cause);
  if (status === 401 || status === 403) return 'denied';
  if (/\bholds (the history of )?series\b/.test(error.message)) return 'other-series';
  if (/not a readable history document|could be read|over the .* limit/.test(error.message)) return 'not-a-history';
  const code = (error.cause as { code?: unknown } | undefined)?.code;
  if (code === 'EACCES' || code === 'EPERM' || code === 'EISDIR' || code === 'ENOTDIR') return 'denied';
  return 'unreachable';
}

const quoted = (text: string): string => JSON.stringify(text);

/**
 * @example classifyStoreError(error, { store: 'file', history: 'h.json', step: 'load' }).fault // 'configuration'
 */
export function classifyStoreError(error: StoreErrorLike, setting: StoreSetting): StoreProblem {
  const kind = kindOf(error);
  const reason = error.message;
  const { store, history, step } = setting;
  if (kind === 'other-series') {
    const found = /series ("(?:[^"\\]|\\.)*")/.exec(reason)?.[1];
    const series = found === undefined ? undefined : (JSON.parse(found) as string);
    return {
      fault: 'configuration',
      kind,
      reason,
      fix:
        (series === undefined
          ? 'set the `series` input'
          : `set \`series: ${quoted(series)}\` in the step's \`with:\``) +
        ` to extend that history, or give this series its own \`history\``,
    };
  }
  if (kind === 'not-a-history') {
    return {
      fault: 'configuration',
      kind,
      reason,
      fix:
        store === 'file'
          ? `point the \`history\` input at a Bellgate history file, or move ${quoted(history)} away to start a new history`
          : store === 'branch'
            ? 'repair or delete the series file on the data branch, or set another `history` branch to start over'
            : 'delete the broken history artifacts, or set another `history` name to start over',
    };
  }
  if (kind === 'denied') {
    const fix =
      store === 'artifact'
        ? 'give the job `permissions: actions: read` (listing and downloading the history artifacts)'
        : store === 'branch'
          ? step === 'save'
            ? 'give the recording job `permissions: contents: write` (it commits to the data branch)'
            : 'give the job `permissions: contents: read`'
          : `check that the runner may ${step === 'save' ? 'write' : 'read'} ${quoted(history)} (the \`history\` input)`;
    return { fault: 'configuration', kind, reason, fix };
  }
  // An outage's own advice (re-run; an earlier attempt already recorded it) names no flag; advice
  // about permissions does not fit an answer that was not a refusal.
  const own = error.fix !== undefined && !/permissions/.test(error.fix) ? error.fix : undefined;
  return { fault: 'outage', kind, reason, fix: own ?? 're-run the job; the stored history was left as it was' };
}
