/**
 * Runs the action bundle the way the runner does: `node dist/index.js` with INPUT_* variables
 * (upper-cased, hyphens kept), GITHUB_* variables, an event payload file, and GITHUB_OUTPUT /
 * GITHUB_STEP_SUMMARY files it appends to. Reads the outputs back in the runner's file format
 * (`name<<DELIMITER` ... `DELIMITER`, GitHub docs "Setting an output parameter").
 */
import { spawn } from 'node:child_process';
import { mkdir, readFile, writeFile } from 'node:fs/promises';
import { join, resolve } from 'node:path';

export const ROOT = resolve(new URL('../..', import.meta.url).pathname);
export const BUNDLE = resolve(ROOT, process.env.BELLGATE_ACTION_BUNDLE ?? 'dist/index.js');

export interface StepResult {
  code: number;
  stdout: string;
  stderr: string;
  outputs: Map<string, string>;
  summary: string;
  /** Workflow commands on stdout (::error title=...::message); `text` is properties and message. */
  annotations: { kind: string; text: string }[];
}

export function parseOutputFile(text: string): Map<string, string> {
  const out = new Map<string, string>();
  const lines = text.split('\n');
  for (let i = 0; i < lines.length; i++) {
    const m = /^([^<=]+)<<(.+)$/.exec(lines[i] ?? '');
    if (m) {
      const [, name = '', delim] = m;
      const value: string[] = [];
      // Bounded by the file's length.
      for (i += 1; i < lines.length && lines[i] !== delim; i++) value.push(lines[i] ?? '');
      out.set(name, value.join('\n'));
    } else if ((lines[i] ?? '').includes('=')) {
      const line = lines[i] ?? '';
      out.set(line.slice(0, line.indexOf('=')), line.slice(line.indexOf('=') + 1));
    }
  }
  return out;
}

export interface StepSpec {
  dir: string;
  inputs: Record<string, string>;
  env: Record<string, string>;
  event: unknown;
  /** A name for this step's files under dir. */
  tag: string;
}

export async function runStep(spec: StepSpec): Promise<StepResult> {
  const files = join(spec.dir, '.runner', spec.tag);
  await mkdir(files, { recursive: true });
  const eventPath = join(files, 'event.json');
  const outputPath = join(files, 'output');
  const summaryPath = join(files, 'summary.md');
  await writeFile(eventPath, JSON.stringify(spec.event));
  await writeFile(outputPath, '');
  await writeFile(summaryPath, '');
  const env: Record<string, string> = {
    PATH: process.env.PATH ?? '',
    HOME: process.env.HOME ?? spec.dir,
    GITHUB_ACTIONS: 'true',
    GITHUB_EVENT_PATH: eventPath,
    GITHUB_OUTPUT: outputPath,
    GITHUB_STEP_SUMMARY: summaryPath,
    GITHUB_WORKSPACE: spec.dir,
    RUNNER_TEMP: files,
    GITHUB_SERVER_URL: 'https://github.com',
    ...spec.env,
  };
  for (const [name, value] of Object.entries(spec.inputs))
    env[`INPUT_${name.replace(/ /g, '_').toUpperCase()}`] = value;
  const child = spawn(process.execPath, [BUNDLE], { cwd: spec.dir, env, stdio: ['ignore', 'pipe', 'pipe'] });
  let stdout = '';
  let stderr = '';
  child.stdout.on('data', (d: Buffer) => (stdout += d.toString()));
  child.stderr.on('data', (d: Buffer) => (stderr += d.toString()));
  const code = await new Promise<number>((r) => child.on('close', (c) => r(c ?? -1)));
  const annotations = [...stdout.matchAll(/^::(error|warning|notice)(.*)$/gm)].map((m) => ({
    kind: m[1] ?? '',
    text: m[2] ?? '',
  }));
  return {
    code,
    stdout,
    stderr,
    outputs: parseOutputFile(await readFile(outputPath, 'utf8')),
    summary: await readFile(summaryPath, 'utf8'),
    annotations,
  };
}
