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
export async function openHistory(ctx: CommandContext, path: string | undefined, series: string): Promise<OpenedHistory> {
  if (path === undefined) return { history: emptyHistory(series) };
  const store = createFileStore(resolvePath(ctx, path), series);
  return { history: await store.load(), store };
}
