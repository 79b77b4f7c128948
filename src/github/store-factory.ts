/**
 * Picks the history store named by the `store` input. This is the seam for further stores: a
 * builder per kind in STORE_BUILDERS. The `branch` store (Git Data API) plugs in here by adding
 * its builder; until then choosing it is a clear input error.
 */
import { createArtifactStore, type ArtifactUploader } from '../history/artifact-store.js';
import { createFileStore } from '../history/file-store.js';
import type { HistoryStore } from '../history/store.js';
import { InputError } from '../model/input-error.js';
import type { GitHubApi } from './api.js';
import type { StoreKind } from './inputs.js';
import { isAbsolute, resolve } from 'node:path';

/** Everything a store might need; each builder takes what it uses. */
export interface StoreSpec {
  kind: StoreKind;
  /** The `history` input: artifact name prefix, branch name or file path. */
  history: string;
  series: string;
  baselineBranch: string;
  repositoryId?: number;
  retentionDays: number;
  workspace: string;
  api: () => GitHubApi;
  upload: ArtifactUploader;
  warn: (message: string) => void;
}

export type StoreBuilder = (spec: StoreSpec) => HistoryStore;

export const STORE_BUILDERS: Record<StoreKind, StoreBuilder> = {
  artifact: (s) =>
    createArtifactStore({
      api: s.api(),
      upload: s.upload,
      history: s.history,
      series: s.series,
      baselineBranch: s.baselineBranch,
      repositoryId: s.repositoryId,
      retentionDays: s.retentionDays,
      warn: s.warn,
    }),
  file: (s) => createFileStore(isAbsolute(s.history) ? s.history : resolve(s.workspace || '.', s.history), s.series),
  branch: () => {
    throw new InputError('`store: branch` is not available in this version', {
      where: 'input store',
      fix: 'use `store: artifact` (the default) or `store: file`',
    });
  },
};

/**
 * Builds the store for the spec's kind.
 * @throws InputError for a kind that is not available.
 * @example createHistoryStore({ kind: 'file', history: 'bench/history.json', ... }).describe()
 */
export function createHistoryStore(spec: StoreSpec, builders: Record<StoreKind, StoreBuilder> = STORE_BUILDERS): HistoryStore {
  return builders[spec.kind](spec);
}
