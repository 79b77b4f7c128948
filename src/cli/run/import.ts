import { importRuns, parseImportRuns } from '../../history/import.js';
import { visibleText } from '../../errors/visible-text.js';
import type { CommandContext } from '../context.js';
import { openHistory } from '../open-history.js';
import { readFlagFile } from '../read-text.js';

export interface ImportOptions {
  history: string;
  runs: string;
  series: string;
}

/** How many skipped rows are listed one by one before the rest are counted. */
const SHOWN_SKIPS = 20;

/**
 * The work of `bellgate import`: merges the past runs into
 * the history file by run id; rows that cannot be used are listed on stderr with place and reason.
 * @throws InputError (unreadable runs file), StoreError (history unreadable or unwritable).
 * @example await runImport(ctx, { history: 'h.json', runs: 'past-runs.jsonl', series: 'default' })
 */
export async function runImport(ctx: CommandContext, options: ImportOptions): Promise<void> {
  const text = await readFlagFile(ctx, '--runs', options.runs, false);
  const parsed = parseImportRuns(text, options.runs);
  const { history, store } = await openHistory(ctx, options.history, options.series);
  const result = importRuns(history, parsed);
  const skipped = result.skipped;
  // Reasons quote names from the file: no control or bidi character reaches the terminal.
  for (const skip of skipped.slice(0, SHOWN_SKIPS))
    ctx.io.stderr(visibleText(`bellgate: skipped ${skip.where}: ${skip.reason}`) + '\n');
  if (skipped.length > SHOWN_SKIPS)
    ctx.io.stderr(`bellgate: ... and ${skipped.length - SHOWN_SKIPS} more skipped rows\n`);
  // The store merges what it holds at the moment of writing (under its lock) with these runs.
  const runs = store
    ? (await store.update({ kind: 'merge', history: result.incoming })).runs
    : result.history.runs.length;
  ctx.io.stdout(
    `imported ${options.runs}: ${result.added} runs added, ${result.updated} updated, ${result.unchanged} unchanged, ${skipped.length} skipped; ` +
      `${runs} runs in ${store?.describe() ?? options.history}\n`,
  );
}
