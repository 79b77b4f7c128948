/**
 * Picks the history store named by the `store` input. This is the seam for further stores: a
 * builder per kind in STORE_BUILDERS.
 */
import type { ArtifactUploader } from '../history/artifact-store.js';
import { createFileStore } from '../history/file-store.js';
import type { HistoryStore } from '../history/store.js';
import { InputError } from '../errors/input-error.js';
import type { GitHubApi } from './api.js';
import { DEFAULT_HISTORY, type StoreKind } from './inputs.js';
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
  api: () => GitHubApi | Promise<GitHubApi>;
  upload: ArtifactUploader;
  warn: (message: string) => void;
  /** Routine news worth a log line (superseded artifacts that could not be deleted). */
  info?: (message: string) => void;
}

/** Builds one kind of store. The artifact and branch stores load on use: a file store (and the
 * start-up of every run) need not pay for their zip reader, API code and node:crypto. */
export type StoreBuilder = (spec: StoreSpec) => HistoryStore | Promise<HistoryStore>;

export const STORE_BUILDERS: Record<StoreKind, StoreBuilder> = {
  artifact: async (s) =>
    (await import('../history/artifact-store.js')).createArtifactStore({
      api: await s.api(),
      upload: s.upload,
      history: s.history,
      series: s.series,
      baselineBranch: s.baselineBranch,
      repositoryId: s.repositoryId,
      retentionDays: s.retentionDays,
      warn: s.warn,
      ...(s.info ? { info: s.info } : {}),
    }),
  file: (s) => createFileStore(isAbsolute(s.history) ? s.history : resolve(s.workspace || '.', s.history), s.series),
  branch: buildBranchStore,
};

/**
 * `store: branch`: the history input names the data branch (left at its default it means
 * `bellgate-data`). Writing onto the baseline branch itself is refused: the history would land
 * among the code it measures.
 */
async function buildBranchStore(s: StoreSpec): Promise<HistoryStore> {
  const { dataBranchName, DEFAULT_DATA_BRANCH } = await import('../history/branch-path.js');
  const branch = dataBranchName(s.history === DEFAULT_HISTORY ? DEFAULT_DATA_BRANCH : s.history);
  if (branch === s.baselineBranch) {
    throw new InputError(`input \`history\` names the baseline branch "${branch}" as the data branch`, {
      where: 'input history',
      fix: `name a branch of its own, e.g. \`history: ${DEFAULT_DATA_BRANCH}\``,
    });
  }
  const api = (await s.api()).gitData;
  if (!api)
    throw new InputError('this GitHub client cannot write a data branch', {
      where: 'input store',
      fix: 'use `store: artifact` or `store: file`',
    });
  const { createBranchStore } = await import('../history/branch-store.js');
  return createBranchStore({ api, branch, series: s.series });
}

/**
 * Builds the store for the spec's kind.
 * @throws InputError for a kind that is not available.
 * @example (await createHistoryStore({ kind: 'file', history: 'bench/history.json', ... })).describe()
 */
export async function createHistoryStore(
  spec: StoreSpec,
  builders: Record<StoreKind, StoreBuilder> = STORE_BUILDERS,
): Promise<HistoryStore> {
  return builders[spec.kind](spec);
}
