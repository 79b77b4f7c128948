import { Command } from 'commander';
import type { CommandContext } from '../context.js';
import { storeOptions, type StoreFlags } from '../open-store.js';
import { examples } from '../options.js';
import { runMaintenance } from '../run/maintain.js';

/** `bellgate rename FROM TO`: gives a metric a new name, keeping its history. */
export function renameCommand(ctx: CommandContext): Command {
  const cmd = new Command('rename')
    .description('give a metric a new name, keeping its history')
    .argument('<from>', 'the metric name in the history')
    .argument('<to>', 'its new name');
  storeOptions(cmd);
  examples(cmd, ['bellgate rename build/compile build/compile-ms --history .bellgate/history.jsonl']);
  return cmd.action((from: string, to: string, o: StoreFlags) => runMaintenance(ctx, o, { op: 'rename', from, to }));
}
