/**
 * A maintenance run of the action (`maintenance:` input, from a manual `workflow_dispatch` run):
 * the history operations of `bellgate runs|mark|drop|rename|import` on the step's store. The
 * artifact store can only be written from inside a workflow run, so this is how its history is
 * maintained (examples/workflows/maintenance.yml); it works on the other stores too. Nothing is
 * checked or recorded; the job log and summary say what was done. The series must be named: a
 * manual workflow's default series ("<workflow>/<job>") is not the recording job's.
 */
import { isAbsolute, resolve } from 'node:path';
import { InputError } from '../errors/input-error.js';
import { maintain, type Maintenance } from '../history/maintain.js';
import type { HistoryStore } from '../history/store.js';
import { escapeMarkdown } from '../report/escape.js';
import { INPUT, type ActionInputs } from './inputs.js';
import { logText } from './log-text.js';
import type { ActionSink } from './sink.js';

type Spec = NonNullable<ActionInputs['maintenance']>;

/**
 * @throws InputError for a missing input of the operation; StoreError when the store fails.
 * @example await maintenanceRun({ op: 'drop', run: '8123-1', metric: [] }, 'bench', store, deps)
 */
export async function maintenanceRun(
  spec: Spec,
  series: string | undefined,
  store: HistoryStore,
  deps: { sink: ActionSink; cwd: string; now(): Date; readText(path: string): Promise<string> },
): Promise<void> {
  if (series === undefined)
    throw missing(INPUT.series, 'a maintenance run changes one series', 'the `series` of the recording job');
  const m = await operation(spec, deps);
  const done = await maintain(store, m, deps.now());
  for (const line of done.skipped) deps.sink.warning(`bellgate: ${logText(line)}`);
  for (const line of done.lines) deps.sink.info(`bellgate: ${logText(line)}`);
  const body = [...done.skipped, ...done.lines].map((l) => `    ${l}`).join('\n');
  try {
    await deps.sink.appendSummary(
      `### Bellgate maintenance: ${spec.op} (series ${escapeMarkdown(series)})\n\n${body}\n`,
    );
  } catch {
    // The log has it all; a summary that cannot be written is not worth failing a maintenance run.
  }
}

async function operation(
  spec: Spec,
  deps: { cwd: string; readText(path: string): Promise<string> },
): Promise<Maintenance> {
  switch (spec.op) {
    case 'runs':
      return { op: 'runs' };
    case 'mark':
      return {
        op: 'mark',
        run: need(spec.run, INPUT.maintenanceRun, 'the run the new level starts at'),
        ...(spec.metric.length > 0 ? { metrics: spec.metric } : {}),
        ...(spec.note ? { note: spec.note } : {}),
      };
    case 'drop':
      return {
        op: 'drop',
        run: need(spec.run, INPUT.maintenanceRun, 'the run to drop'),
        ...(spec.note ? { reason: spec.note } : {}),
      };
    case 'rename': {
      if (spec.metric.length !== 1) throw missing(INPUT.maintenanceMetric, 'rename needs one metric', 'the old name');
      return { op: 'rename', from: spec.metric[0]!, to: need(spec.to, INPUT.maintenanceTo, 'the new name') };
    }
    case 'import': {
      const file = need(spec.file, INPUT.maintenanceFile, 'a file of past results (JSON Lines or CSV)');
      const text = await deps.readText(isAbsolute(file) ? file : resolve(deps.cwd, file)).catch((error: unknown) => {
        throw new InputError(`cannot read ${file}: ${(error as Error).message}`, {
          where: `input ${INPUT.maintenanceFile}`,
          fix: 'name a file of the checked-out repository (a path relative to the workspace)',
        });
      });
      return { op: 'import', text, source: file };
    }
  }
}

function need(value: string | undefined, input: string, what: string): string {
  if (value === undefined || value === '') throw missing(input, `input \`${input}\` is empty`, what);
  return value;
}

function missing(input: string, why: string, what: string): InputError {
  return new InputError(`${why}: set \`${input}\``, {
    where: `input ${input}`,
    fix: `set \`${input}:\` to ${what} in the step's \`with:\``,
  });
}
