/**
 * The ActionSink spoken straight to the runner: workflow commands on stdout (`::warning ...::`),
 * outputs appended to the GITHUB_OUTPUT file, the job summary appended to GITHUB_STEP_SUMMARY.
 *
 * Why not @actions/core: its entry module always loads @actions/http-client and undici (for OIDC
 * tokens, which Bellgate never asks for) — about half a megabyte evaluated on every run, the
 * largest single start-up cost of a PR check. The protocol is small and documented
 * (https://docs.github.com/actions/reference/workflow-commands-for-github-actions); this file
 * writes the same bytes as @actions/core 3 (test/github/runner-sink.test.ts compares the two).
 */
import { accessSync, appendFileSync, constants, existsSync } from 'node:fs';
import { EOL } from 'node:os';
import type { ActionSink, AnnotationProps } from './sink.js';

/** Where the sink writes; the real ones by default, tests pass their own. */
export interface RunnerEdges {
  env: Record<string, string | undefined>;
  write: (text: string) => void;
  /** Called by setFailed: the step fails when the process exits. */
  fail: () => void;
}

const defaultEdges = (): RunnerEdges => ({
  env: process.env,
  write: (text) => void process.stdout.write(text),
  fail: () => (process.exitCode = 1),
});

/** Message text: `%`, CR and LF escaped, as the runner decodes them (the workflow-commands page). */
export function escapeData(s: string): string {
  return s.replace(/%/g, '%25').replace(/\r/g, '%0D').replace(/\n/g, '%0A');
}

/** Property values: as escapeData, plus `:` and `,`, which separate the properties. */
export function escapeProperty(s: string): string {
  return escapeData(s).replace(/:/g, '%3A').replace(/,/g, '%2C');
}

type Properties = Record<string, string | number | undefined>;

/** Annotation properties by the runner's names; a props object without keys means none at all. */
function annotationProperties(props: AnnotationProps | undefined): Properties {
  if (props === undefined || Object.keys(props).length === 0) return {};
  return { title: props.title, file: props.file, line: props.startLine };
}

/**
 * One workflow command line, e.g. `::warning title=slower,file=bench.json,line=3::p95 regressed`.
 * Properties without a value ('' and 0 too) are left out, but a non-empty property object keeps
 * the separating space even then, as @actions/core writes it.
 * @example workflowCommand('notice', {}, 'hi') // '::notice::hi'
 */
export function workflowCommand(command: string, properties: Properties, message: string): string {
  let line = `::${command}`;
  const keys = Object.keys(properties);
  if (keys.length > 0) {
    const pairs = keys.flatMap((k) => {
      const v = properties[k];
      return v === undefined || v === '' || v === 0 ? [] : [`${k}=${escapeProperty(String(v))}`];
    });
    line += ` ${pairs.join(',')}`;
  }
  return `${line}::${escapeData(message)}`;
}

/**
 * `name<<delimiter`, value, delimiter: the multi-line form of a GITHUB_OUTPUT entry, with a random
 * delimiter that neither the name nor the value may contain.
 * @throws Error when either contains it (astronomically unlikely; refused rather than cut short).
 */
export function keyValueEntry(name: string, value: string): string {
  const delimiter = `ghadelimiter_${randomId()}`;
  if (name.includes(delimiter) || value.includes(delimiter)) throw new Error(`output ${name} contains its delimiter`);
  return `${name}<<${delimiter}${EOL}${value}${EOL}${delimiter}`;
}

/**
 * 128 random bits as 32 hex digits in a UUID's 8-4-4-4-12 shape. Math.random is enough: the
 * delimiter need not be secret, only absent from the value, which keyValueEntry checks; node:crypto
 * would add ~3 ms to every run's start-up.
 */
function randomId(): string {
  let hex = '';
  for (let i = 0; i < 4; i++)
    hex += Math.floor(Math.random() * 2 ** 32)
      .toString(16)
      .padStart(8, '0');
  return `${hex.slice(0, 8)}-${hex.slice(8, 12)}-${hex.slice(12, 16)}-${hex.slice(16, 20)}-${hex.slice(20)}`;
}

/**
 * The real sink. Outputs without GITHUB_OUTPUT fall back to the old `::set-output` command.
 * @throws (appendSummary) when GITHUB_STEP_SUMMARY is unset or the file is not writable.
 * @example createRunnerSink().warning('p95 regressed', { title: 'bellgate', file: 'bench.json' })
 */
export function createRunnerSink(edges: RunnerEdges = defaultEdges()): ActionSink {
  const { env, write } = edges;
  const command = (name: string, properties: Properties, message: string): void =>
    write(workflowCommand(name, properties, message) + EOL);
  const error = (m: string, p?: AnnotationProps): void => command('error', annotationProperties(p), m);
  return {
    info: (m) => write(m + EOL),
    warning: (m, p) => command('warning', annotationProperties(p), m),
    error,
    notice: (m, p) => command('notice', annotationProperties(p), m),
    setOutput(name, value) {
      const file = env.GITHUB_OUTPUT || '';
      if (file === '') {
        write(EOL);
        command('set-output', { name }, value);
        return;
      }
      if (!existsSync(file)) throw new Error(`Missing file at path: ${file}`);
      appendFileSync(file, `${keyValueEntry(name, value)}${EOL}`, { encoding: 'utf8' });
    },
    setSecret: (v) => command('add-mask', {}, v),
    setFailed(m) {
      edges.fail();
      error(m);
    },
    async appendSummary(md) {
      const file = env.GITHUB_STEP_SUMMARY;
      if (!file)
        throw new Error(
          'Unable to find environment variable for $GITHUB_STEP_SUMMARY. Check if your runtime environment supports job summaries.',
        );
      try {
        accessSync(file, constants.R_OK | constants.W_OK);
      } catch {
        throw new Error(
          `Unable to access summary file: '${file}'. Check if the file has correct read/write permissions.`,
        );
      }
      // Synchronous, as the outputs are: at the end of a run an await only lets queued V8 tasks run.
      appendFileSync(file, md + EOL, { encoding: 'utf8' });
    },
  };
}
