import { maintain, type Maintenance } from '../../history/maintain.js';
import type { CommandContext } from '../context.js';
import { openStore, type StoreFlags } from '../open-store.js';

/**
 * The work of `bellgate mark|drop|rename|runs`: one maintenance operation on the store the flags
 * name; what it did goes to stdout.
 * @throws InputError (bad flags, no such run or metric), StoreError (exit 3).
 * @example await runMaintenance(ctx, { history: 'h.jsonl', store: 'file' }, { op: 'runs' })
 */
export async function runMaintenance(ctx: CommandContext, flags: StoreFlags, m: Maintenance): Promise<void> {
  const store = await openStore(ctx, flags);
  const done = await maintain(store, m, ctx.now());
  for (const line of done.skipped) ctx.io.stderr(`bellgate: ${line}\n`);
  for (const line of done.lines) ctx.io.stdout(`${line}\n`);
}
