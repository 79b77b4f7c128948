import type { CommandContext } from '../context.js';
import type { StoreFlags } from '../open-store.js';
import { readFlagFile } from '../read-text.js';
import { runMaintenance } from './maintain.js';

export interface ImportOptions extends StoreFlags {
  runs: string;
  series: string;
}

/**
 * The work of `bellgate import`: merges the past runs into the store (a history file, or a data
 * branch) by run id; rows that cannot be used are listed on stderr with place and reason.
 * @throws InputError (unreadable runs file), StoreError (history unreadable or unwritable).
 * @example await runImport(ctx, { history: 'h.json', store: 'file', runs: 'past-runs.jsonl', series: 'default' })
 */
export async function runImport(ctx: CommandContext, options: ImportOptions): Promise<void> {
  const text = await readFlagFile(ctx, '--runs', options.runs, false);
  await runMaintenance(ctx, options, { op: 'import', text, source: options.runs });
}
