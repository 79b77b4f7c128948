import { expect } from 'vitest';
import { mkdtempSync, rmSync, writeFileSync, mkdirSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { dirname, join } from 'node:path';
import { runCli } from '../../../src/cli/main.js';

/** What one in-process `bellgate` invocation produced. */
export interface CliResult {
  code: number;
  stdout: string;
  stderr: string;
}

/** Runs the CLI in-process in `cwd` with a captured terminal; no process exit, no real env. */
export async function bellgate(
  cwd: string,
  argv: string[],
  options: { env?: Record<string, string | undefined>; isTTY?: boolean } = {},
): Promise<CliResult> {
  let stdout = '';
  let stderr = '';
  const code = await runCli(argv, {
    stdout: (s) => (stdout += s),
    stderr: (s) => (stderr += s),
    cwd,
    env: options.env ?? {},
    isTTY: options.isTTY ?? false,
  });
  return { code, stdout, stderr };
}

/** A scratch folder with helpers to write files into it; `remove()` in afterAll. */
export function scratch(prefix = 'bellgate-cli-'): {
  dir: string;
  write: (path: string, text: string) => string;
  remove: () => void;
} {
  const dir = mkdtempSync(join(tmpdir(), prefix));
  return {
    dir,
    write(path, text) {
      const full = join(dir, path);
      mkdirSync(dirname(full), { recursive: true });
      writeFileSync(full, text);
      return full;
    },
    remove: () => rmSync(dir, { recursive: true, force: true }),
  };
}

/**
 * A history document written by hand in the stored layout (bellgate.history/3: a header line, then
 * one line per run): one run per value, ids r1.., a day apart.
 */
export function handHistory(series: string, values: Record<string, number[]>, unit?: string): string {
  const names = Object.keys(values);
  const length = Math.max(...names.map((n) => values[n]?.length ?? 0));
  const header = {
    schema: 'bellgate.history/3',
    series,
    metrics: names.map((name) => (unit === undefined ? { name } : { name, unit })),
  };
  const runs = Array.from({ length }, (_, i) =>
    JSON.stringify({
      id: `r${i + 1}`,
      time: new Date(Date.UTC(2026, 0, 1 + i)).toISOString(),
      ref: 'refs/heads/main',
      values: names.map((n) => values[n]?.[i] ?? null),
    }),
  );
  return `${[JSON.stringify(header), ...runs].join('\n')}\n`;
}

/** A stack-trace line ("    at f (file:1:2)"): never allowed in what a user sees. */
export const STACK = /\n\s+at [^\n]*\(?[^\n]*:\d+:\d+\)?/;

export function noStack(text: string): void {
  expect(text).not.toMatch(STACK);
}

/**
 * A scratch folder with a steady hand-made history of ten runs (api/latency around 100,
 * api/size around 100000), a calm run, a clearly slower run, and a config without change points.
 */
export function steadyFixture() {
  const work = scratch();
  const steady = [100, 101, 99, 100, 102, 98, 100, 101, 99, 100];
  return {
    work,
    steady,
    history: work.write(
      'h/history.jsonl',
      handHistory('default', { 'api/latency': steady, 'api/size': steady.map((v) => v * 1000) }),
    ),
    calm: work.write('calm.json', JSON.stringify({ 'api/latency': 100.5, 'api/size': 100_200 })),
    slow: work.write('slow.json', JSON.stringify({ 'api/latency': 130, 'api/size': 100_200 })),
    config: work.write('bellgate.yml', 'defaults:\n  change-points: false\n'),
  };
}
