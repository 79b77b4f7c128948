import { Command } from 'commander';
import type { CommandContext } from '../context.js';
import { storeOptions, type StoreFlags } from '../open-store.js';
import { examples } from '../options.js';
import { runMaintenance } from '../run/maintain.js';

/** `bellgate drop RUN`: removes a bad run (a broken runner); a tombstone keeps it out after merges. */
export function dropCommand(ctx: CommandContext): Command {
  const cmd = new Command('drop')
    .description('remove a bad run for good (it stays dropped after merges)')
    .argument('<run>', 'id of the run to drop (see `bellgate runs`)');
  storeOptions(cmd).option('--reason <text>', 'why, kept with the tombstone');
  examples(cmd, ['bellgate drop 8123-1 --history .bellgate/history.jsonl --reason "broken runner"']);
  return cmd.action((run: string, o: StoreFlags & { reason?: string }) =>
    runMaintenance(ctx, o, { op: 'drop', run, ...(o.reason ? { reason: o.reason } : {}) }),
  );
}
