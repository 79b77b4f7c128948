import { emptyHistory, type History } from '../history/history.js';
import { createFileStore } from '../history/file-store.js';
import type { HistoryStore } from '../history/store.js';
import type { CommandContext } from './context.js';
import { resolvePath } from './paths.js';

/** A loaded history and, when it came from a file, the store to write it back through. */
export interface OpenedHistory {
  history: History;
  store?: HistoryStore;
}

/**
 * Loads the history of `series` from a file store (a missing file is an empty history), or starts
 * an empty one when no `--history` was given (every metric is then `new`).
 * @throws StoreError when the file exists but cannot be read or parsed (exit 3; never overwritten).
 */
export async function openHistory(
  ctx: CommandContext,
  path: string | undefined,
  series: string,
): Promise<OpenedHistory> {
  if (path === undefined) return { history: emptyHistory(series) };
  const store = createFileStore(resolvePath(ctx, path), series);
  return { history: await store.load(), store };
}

/**
 * openHistory started now, to be awaited after the config and metric files are read: the history
 * file's read (I/O, off the main thread) overlaps their loading instead of following it. Awaiting
 * the result last keeps the order of failures: a bad config or metric file is still reported
 * before an unreadable history. A result nobody awaits (an earlier step threw) is dropped quietly.
 * @throws StoreError when awaited, as openHistory.
 * @example const opening = openEarly(ctx, 'h.json', 'default'); ...; const { history } = await opening;
 */
export function openEarly(ctx: CommandContext, path: string | undefined, series: string): Promise<OpenedHistory> {
  const opening = openHistory(ctx, path, series);
  opening.catch(() => undefined);
  return opening;
}
