/**
 * The real collaborators of runAction: the runner's environment and inputs (@actions/core), the
 * file system, the clock, and the lazily loaded GitHub client and artifact uploader.
 */
import { mkdir, readFile, writeFile } from 'node:fs/promises';
import { dirname } from 'node:path';
import { createArtifactUploader } from '../history/artifact-upload.js';
import type { ActionDeps } from './run-action.js';
import * as core from '@actions/core';
import { createCoreSink } from './core-sink.js';

/**
 * @example await runAction(createRealDeps(process.env))
 */
export function createRealDeps(env: Record<string, string | undefined> = process.env): ActionDeps {
  return {
    env,
    cwd: env.GITHUB_WORKSPACE || process.cwd(),
    sink: createCoreSink(),
    getInput: (name) => core.getInput(name),
    readText: (path) => readFile(path, 'utf8'),
    writeText: async (path, text) => {
      await mkdir(dirname(path), { recursive: true });
      await writeFile(path, text, 'utf8');
    },
    now: () => new Date(),
    // Loaded on first use: a PR check with the file store and `comment: never` never calls the API.
    createApi: async (target) => (await import('./octokit-api.js')).createOctokitApi(target),
    upload: createArtifactUploader(env.RUNNER_TEMP || process.cwd()),
    // BELLGATE_RETRY_UNIT_MS shortens API backoff for the end-to-end tests; the runner never sets it.
    ...(env.BELLGATE_RETRY_UNIT_MS
      ? { retry: { retries: 3, unitMs: Math.max(1, Number(env.BELLGATE_RETRY_UNIT_MS) || 1000) } }
      : {}),
  };
}
