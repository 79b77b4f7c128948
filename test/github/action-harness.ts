// Shared by the runAction tests: a collecting sink, a temp workspace with metric files, and
// histories zipped the way the artifact store stores them.
import { mkdtemp, mkdir, readFile, rm, writeFile } from 'node:fs/promises';
import { tmpdir } from 'node:os';
import { dirname, join } from 'node:path';
import { strToU8, zipSync } from 'fflate';
import { HISTORY_FILE } from '../../src/history/artifact-store.js';
import { serializeHistory } from '../../src/history/document.js';
import { emptyHistory, type History } from '../../src/history/history.js';
import { appendRun } from '../../src/history/merge.js';
import { createOctokitApi } from '../../src/github/octokit-api.js';
import type { ActionDeps } from '../../src/github/run-action.js';
import type { ActionSink, AnnotationProps } from '../../src/github/sink.js';

/**
 * The step's inputs as the runner passes them: INPUT_ + the name upper-cased, spaces to
 * underscores, hyphens kept, trimmed (test/github/inputs.test.ts checks this against
 * @actions/core's own getInput, which the action uses).
 */
export function runnerInputs(env: Record<string, string | undefined>): (name: string) => string {
  return (name) => (env[`INPUT_${name.replace(/ /g, '_').toUpperCase()}`] ?? '').trim();
}

export interface Collected {
  lines: { kind: string; message: string; props?: AnnotationProps }[];
  outputs: Map<string, string>;
  secrets: string[];
  failed: string[];
  summary: string[];
}

export function collectingSink(): { sink: ActionSink; got: Collected } {
  const got: Collected = { lines: [], outputs: new Map(), secrets: [], failed: [], summary: [] };
  const line = (kind: string) => (message: string, props?: AnnotationProps) =>
    void got.lines.push({ kind, message, ...(props ? { props } : {}) });
  return {
    got,
    sink: {
      info: line('info'),
      warning: line('warning'),
      error: line('error'),
      notice: line('notice'),
      setOutput: (n, v) => void got.outputs.set(n, v),
      setSecret: (v) => void got.secrets.push(v),
      setFailed: (m) => void got.failed.push(m),
      appendSummary: async (md) => void got.summary.push(md),
    },
  };
}

/** Twelve clean baseline runs of two metrics, with small invented noise (route timings, bundle size). */
export function baselineHistory(series: string, runs = 12): History {
  let h = emptyHistory(series);
  const noise = [0.3, -0.8, 1.1, -0.2, 0.6, -1.0, 0.1, 0.9, -0.5, 0.4, -0.7, 0.2, 0.8, -0.3];
  for (let i = 0; i < runs; i++) {
    const e = noise[i % noise.length] ?? 0;
    h = appendRun(
      h,
      {
        id: `${100 + i}-1`,
        sha: `${i}`.padStart(40, 'a'),
        ref: 'refs/heads/main',
        event: 'push',
        time: new Date(Date.UTC(2026, 2, 1 + i)).toISOString(),
      },
      {
        metrics: new Map([
          ['route/match-static', { value: 412 + 4 * e, unit: 'ns', count: 1 }],
          ['bundle/app.js.gz', { value: 40211 + Math.round(10 * e), unit: 'B', count: 1 }],
        ]),
        meta: new Map(),
      },
    ).history;
  }
  return h;
}

export function zipHistory(h: History): Uint8Array {
  return zipSync({ [HISTORY_FILE]: strToU8(serializeHistory(h)) });
}

export interface Workspace {
  dir: string;
  write(rel: string, text: string): Promise<string>;
  metrics(values: Record<string, number>): Promise<void>;
  event(payload: unknown): Promise<string>;
  remove(): Promise<void>;
}

export async function workspace(): Promise<Workspace> {
  const dir = await mkdtemp(join(tmpdir(), 'bellgate-action-'));
  const write = async (rel: string, text: string) => {
    const p = join(dir, rel);
    await mkdir(dirname(p), { recursive: true });
    await writeFile(p, text);
    return p;
  };
  return {
    dir,
    write,
    metrics: async (values) => {
      await write(
        'out/bench.json',
        JSON.stringify({
          metrics: Object.entries(values).map(([name, value]) => ({
            name,
            value,
            unit: name.startsWith('bundle') ? 'B' : 'ns',
          })),
        }),
      );
    },
    event: (payload) => write('event.json', JSON.stringify(payload)),
    remove: () => rm(dir, { recursive: true, force: true }),
  };
}

export function deps(
  ws: Workspace,
  env: Record<string, string>,
  sink: ActionSink,
  uploads: { name: string; text: string }[],
): ActionDeps {
  return {
    env,
    getInput: runnerInputs(env),
    cwd: ws.dir,
    sink,
    readText: (p) => readFile(p, 'utf8'),
    writeText: async (p, t) => {
      await mkdir(dirname(p), { recursive: true });
      await writeFile(p, t);
    },
    now: () => new Date('2026-04-01T12:00:00Z'),
    createApi: createOctokitApi,
    // One entry per artifact, with the text of its first file (the history, or the HTML report).
    upload: async (name, files) => {
      uploads.push({ name, text: files[0]?.text ?? '' });
      return {};
    },
    retry: { retries: 2, unitMs: 1 },
  };
}
