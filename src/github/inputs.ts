/**
 * The action's inputs: names that mirror action.yml, and one reader that validates them all up front
 * so a typo fails the step at once with a message naming the input, before any file or API is touched.
 */
import { InputError } from '../errors/input-error.js';

/** Input names exactly as action.yml declares them. */
export const INPUT = {
  metrics: 'metrics',
  config: 'config',
  series: 'series',
  store: 'store',
  history: 'history',
  baselineBranch: 'baseline-branch',
  record: 'record',
  block: 'block',
  comment: 'comment',
  acceptLabel: 'accept-label',
  token: 'token',
  retentionDays: 'retention-days',
  inputFormat: 'input-format',
  historyFailure: 'history-failure',
  missingMetrics: 'missing-metrics',
  htmlReport: 'html-report',
  since: 'since',
  sinceBlock: 'since-block',
  maintenance: 'maintenance',
  maintenanceRun: 'maintenance-run',
  maintenanceMetric: 'maintenance-metric',
  maintenanceTo: 'maintenance-to',
  maintenanceNote: 'maintenance-note',
  maintenanceFile: 'maintenance-file',
} as const;

/** The operations of a maintenance run (`maintenance` input), as `bellgate runs|mark|drop|rename|import`. */
export const MAINTENANCE_OPS = ['runs', 'mark', 'drop', 'rename', 'import'] as const;
export type MaintenanceOp = (typeof MAINTENANCE_OPS)[number];

/** Output names exactly as action.yml declares them. */
export const OUTPUT = { verdict: 'verdict', regressed: 'regressed', report: 'report' } as const;

export const DEFAULT_CONFIG_PATH = '.github/bellgate.yml';
export const DEFAULT_HISTORY = 'bellgate-history';
export const DEFAULT_ACCEPT_LABEL = 'bellgate:accept';

export type StoreKind = 'artifact' | 'branch' | 'file';
export type Mode = 'auto' | 'always' | 'never';

export interface ActionInputs {
  metrics: string[];
  /** Undefined when the default path is meant (a missing default file means default settings). */
  config?: string;
  series?: string;
  store: StoreKind;
  history: string;
  baselineBranch?: string;
  record: Mode;
  block: boolean;
  comment: Mode;
  acceptLabel: string;
  token: string;
  retentionDays: number;
  inputFormat?: string;
  /** What an unreachable history does: `warn` goes on as learning, `fail` fails the step. */
  historyFailure: 'warn' | 'fail';
  /** A run lacking more than half of its baseline metrics: `warn` (annotation) or `fail` (the step). */
  missingMetrics: 'warn' | 'fail';
  htmlReport: boolean;
  /** Release mode (release-review.ts): the reference to review since; undefined: check the run. */
  since?: string;
  /** In release mode, a metric worse since the reference fails the step. */
  sinceBlock: boolean;
  /** A maintenance run instead of a check: the operation and its inputs (maintenance-run.ts). */
  maintenance?: {
    op: MaintenanceOp;
    run?: string;
    /** Globs (mark) or the old name (rename), one a line. */
    metric: string[];
    to?: string;
    note?: string;
    file?: string;
  };
}

/** Reads one input by its action.yml name, trimmed: @actions/core's getInput in the action. */
export type InputReader = (name: string) => string;

function choice<T extends string>(name: string, raw: string, allowed: readonly T[], fallback: T): T {
  if (raw === '') return fallback;
  const v = raw.toLowerCase() as T;
  if (allowed.includes(v)) return v;
  throw new InputError(`input \`${name}\` is "${raw}", expected one of ${allowed.join(', ')}`, {
    where: `input ${name}`,
    fix: `set \`${name}: ${fallback}\` (or another of ${allowed.join(' | ')}) in the workflow step's \`with:\``,
  });
}

function flag(name: string, raw: string, fallback: boolean): boolean {
  if (raw === '') return fallback;
  // YAML 1.2 core schema booleans, as @actions/core's getBooleanInput accepts them.
  if (['true', 'True', 'TRUE'].includes(raw)) return true;
  if (['false', 'False', 'FALSE'].includes(raw)) return false;
  throw new InputError(`input \`${name}\` is "${raw}", expected true or false`, {
    where: `input ${name}`,
    fix: `write \`${name}: true\` or \`${name}: false\``,
  });
}

/**
 * Reads and validates every input through `read` (the runner's INPUT_* variables, by
 * @actions/core's getInput).
 * @throws InputError naming the input and how to fix it.
 * @example readActionInputs((name) => core.getInput(name)).store // 'artifact'
 */
export function readActionInputs(read: InputReader): ActionInputs {
  const get = (name: string): string => read(name).trim();
  const metrics = get(INPUT.metrics)
    .split(/\r?\n/)
    .map((l) => l.trim())
    .filter((l) => l !== '' && !l.startsWith('#'));
  const since = get(INPUT.since);
  const op = get(INPUT.maintenance);
  const maintenance =
    op === ''
      ? undefined
      : {
          op: choice(INPUT.maintenance, op, MAINTENANCE_OPS, 'runs'),
          metric: lines(get(INPUT.maintenanceMetric)),
          ...optional('run', get(INPUT.maintenanceRun)),
          ...optional('to', get(INPUT.maintenanceTo)),
          ...optional('note', get(INPUT.maintenanceNote)),
          ...optional('file', get(INPUT.maintenanceFile)),
        };
  // A release review and a maintenance run read no metric files.
  if (metrics.length === 0 && since === '' && maintenance === undefined) {
    throw new InputError('input `metrics` is empty: there are no metric files to check', {
      where: `input ${INPUT.metrics}`,
      fix: 'list the metric files or globs, one a line, e.g. `metrics: out/bench/*.json`',
    });
  }
  const days = get(INPUT.retentionDays);
  const retentionDays = days === '' ? 90 : Number(days);
  if (!Number.isInteger(retentionDays) || retentionDays < 1 || retentionDays > 400) {
    throw new InputError(`input \`retention-days\` is "${days}", expected a whole number of days from 1 to 400`, {
      where: `input ${INPUT.retentionDays}`,
      fix: 'write e.g. `retention-days: 90` (the repository setting may lower it further)',
    });
  }
  const history = get(INPUT.history) || DEFAULT_HISTORY;
  const store = choice(INPUT.store, get(INPUT.store), ['artifact', 'branch', 'file'] as const, 'artifact');
  // The artifact service refuses these characters in names (@actions/artifact's name validation).
  if (store === 'artifact' && /["\\/:<>|*?\r\n]/.test(history)) {
    throw new InputError(`input \`history\` is "${history}", which cannot be an artifact name`, {
      where: `input ${INPUT.history}`,
      fix: 'use letters, digits, dots, dashes and underscores only, e.g. `history: bellgate-history`',
    });
  }
  const config = get(INPUT.config);
  const series = get(INPUT.series);
  const baselineBranch = get(INPUT.baselineBranch);
  const inputFormat = get(INPUT.inputFormat);
  return {
    metrics,
    config: config === '' || config === DEFAULT_CONFIG_PATH ? undefined : config,
    series: series === '' ? undefined : series,
    store,
    history,
    baselineBranch: baselineBranch === '' ? undefined : baselineBranch.replace(/^refs\/heads\//, ''),
    record: choice(INPUT.record, get(INPUT.record), ['auto', 'always', 'never'] as const, 'auto'),
    block: flag(INPUT.block, get(INPUT.block), true),
    comment: choice(INPUT.comment, get(INPUT.comment), ['auto', 'always', 'never'] as const, 'auto'),
    acceptLabel: get(INPUT.acceptLabel) || DEFAULT_ACCEPT_LABEL,
    token: get(INPUT.token),
    retentionDays,
    inputFormat: inputFormat === '' ? undefined : inputFormat,
    historyFailure: choice(INPUT.historyFailure, get(INPUT.historyFailure), ['warn', 'fail'] as const, 'warn'),
    missingMetrics: choice(INPUT.missingMetrics, get(INPUT.missingMetrics), ['warn', 'fail'] as const, 'warn'),
    htmlReport: flag(INPUT.htmlReport, get(INPUT.htmlReport), false),
    ...(since === '' ? {} : { since }),
    sinceBlock: flag(INPUT.sinceBlock, get(INPUT.sinceBlock), false),
    ...(maintenance === undefined ? {} : { maintenance }),
  };
}

const lines = (text: string): string[] =>
  text
    .split(/\r?\n/)
    .map((l) => l.trim())
    .filter((l) => l !== '');

const optional = <K extends string>(key: K, value: string): Partial<Record<K, string>> =>
  (value === '' ? {} : { [key]: value }) as Partial<Record<K, string>>;
