import { Command } from 'commander';
import type { CommandContext } from '../context.js';
import { storeOptions, type StoreFlags } from '../open-store.js';
import { examples } from '../options.js';
import { runMaintenance } from '../run/maintain.js';

/** `bellgate runs`: lists the runs of a history, oldest first, with their marks and sizes. */
export function runsCommand(ctx: CommandContext): Command {
  const cmd = new Command('runs').description('list the runs of a history, their level marks and sizes');
  storeOptions(cmd);
  examples(cmd, [
    'bellgate runs --history .bellgate/history.jsonl',
    'GITHUB_TOKEN=... bellgate runs --store branch --history bellgate-data --series bench/linux --repo acme/router',
  ]);
  return cmd.action((o: StoreFlags) => runMaintenance(ctx, o, { op: 'runs' }));
}
