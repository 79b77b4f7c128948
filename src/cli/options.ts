import type { Command } from 'commander';
import { METRIC_FORMATS } from '../inputs/formats.js';

/** The formats `check --format` prints (defined here, not in check-flow.ts, so --help loads no renderer). */
export type ReportFormat = 'text' | 'markdown' | 'json';
export const REPORT_FORMATS: readonly ReportFormat[] = ['text', 'markdown', 'json'];

/** The series used when --series is not given. */
export const DEFAULT_SERIES = 'default';

/**
 * Flags several commands share, defined once so their wording and defaults never drift.
 * Each adds itself to a command and returns it, for chaining.
 */
export function metricsOption(cmd: Command, required: boolean): Command {
  const flags = '--metrics <file...>';
  const text = 'metric files of this run (paths or globs; several allowed)';
  return required ? cmd.requiredOption(flags, text) : cmd.option(flags, text);
}

export function historyOption(
  cmd: Command,
  required: boolean,
  text = 'history file of trusted runs (JSON; a missing file is an empty history)',
): Command {
  return required ? cmd.requiredOption('--history <file>', text) : cmd.option('--history <file>', text);
}

export function configOption(cmd: Command): Command {
  return cmd.option(
    '--config <file>',
    'config file (default: .github/bellgate.yml when present, else built-in defaults)',
  );
}

export function seriesOption(cmd: Command): Command {
  return cmd.option('--series <key>', 'which series of runs this is (one history per series)', DEFAULT_SERIES);
}

export function inputOptions(cmd: Command): Command {
  return (
    cmd
      // Checked by the readers (metricFormat), which also take spellings like "prometheus".
      .option(
        '--input-format <format>',
        `read metric files as this format instead of detecting it: ${METRIC_FORMATS.join(', ')}`,
      )
      .option(
        '--prefix <pattern=prefix...>',
        'put "prefix/" before the names of metrics read from files the pattern matches',
      )
  );
}

export function runInfoOptions(cmd: Command): Command {
  return cmd
    .option('--id <id>', 'run id, unique in the series (default: GITHUB_RUN_ID-GITHUB_RUN_ATTEMPT, else local-<time>)')
    .option('--sha <sha>', 'commit of the run (default: GITHUB_SHA)')
    .option('--ref <ref>', 'branch or tag of the run (default: GITHUB_REF)')
    .option('--time <iso>', 'when the run happened, ISO-8601 with a zone (default: now)');
}

/** Appends an "Examples:" block to a command's --help. */
export function examples(cmd: Command, lines: string[]): Command {
  return cmd.addHelpText('after', `\nExamples:\n${lines.map((l) => `  $ ${l}`).join('\n')}\n`);
}
