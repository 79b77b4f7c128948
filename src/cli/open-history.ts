import { visibleText } from '../errors/visible-text.js';
import { createFileStore } from '../history/file-store.js';
import { emptyHistory, type History } from '../history/history.js';
import type { HistoryStore } from '../history/store.js';
import type { CommandContext } from './context.js';
import { resolvePath } from './paths.js';

/** A loaded history and, when it came from a file, the store to write it back through. */
export interface OpenedHistory {
  history: History;
  store?: HistoryStore;
}

/**
 * The file store of `path` for `series`; what it repairs or skips (a torn last line, a killed
 * writer's temp file) is said on stderr.
 * @example historyStore(ctx, '.bellgate/history.jsonl', 'default').describe() // 'file /repo/.bellgate/history.jsonl'
 */
export function historyStore(ctx: CommandContext, path: string, series: string | undefined): HistoryStore {
  return createFileStore(resolvePath(ctx, path), series, {
    warn: (message) => ctx.io.stderr(`bellgate: note: ${visibleText(message)}\n`),
  });
}

/**
 * Reads the history of `series` from a file store (a missing file is an empty history; `newest`
 * reads only that many newest runs, from the end of the file), or starts an empty one when no
 * `--history` was given (every metric is then `new`). Series undefined: whichever the file holds.
 * @throws StoreError when the file exists but cannot be read (exit 3; never overwritten).
 */
export async function openHistory(
  ctx: CommandContext,
  path: string | undefined,
  series: string | undefined,
  newest?: number,
): Promise<OpenedHistory> {
  if (path === undefined) return { history: emptyHistory(series ?? '') };
  const store = historyStore(ctx, path, series);
  return { history: await store.read(newest === undefined ? {} : { newest }), store };
}
