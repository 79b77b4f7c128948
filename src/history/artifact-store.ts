/**
 * The default history store: GitHub Actions artifacts.
 *
 * Naming. The REST list endpoint filters by exact name (`?name=`), and an artifact name must be
 * unique within one workflow run. So each series gets one fixed name, `<history>-<series slug>`,
 * uploaded at most once per workflow run: every run's upload is found by one exact-name query, and
 * matrix jobs of one run (different series) never collide. A re-run attempt of a run that already
 * uploaded is refused by the service (409); that attempt's values are a second measurement of an
 * already recorded commit, so the store warns and keeps the first.
 *
 * Load lists the artifacts of that name, keeps unexpired ones made on the baseline branch of this
 * repository (not a fork's branch of the same name), newest first, and merges the newest few
 * readable ones: two runs that raced each read the same parent and uploaded siblings; merging
 * several newest heals that (union by run id). A corrupt or hostile artifact is skipped with a
 * warning; a download that fails for a passing reason (5xx, network) fails the load instead, since
 * skipping it would drop its runs from the next upload. If artifacts exist but none can be read,
 * load fails: writing then would bury the history.
 * Save never uploads fewer runs than load read.
 */
import { emptyHistory, type History } from './history.js';
import { parseHistory, serializeHistory } from './document.js';
import { mergeHistories } from './merge.js';
import { guardAgainstLoss, StoreError, type HistoryStore } from './store.js';
import { DEFAULT_ZIP_LIMITS, readZipEntry, type ZipLimits } from './artifact-zip.js';
import { artifactName } from './artifact-name.js';

export { artifactName } from './artifact-name.js';

/** One artifact as the REST API lists it (the fields the store needs). */
export interface ArtifactEntry {
  id: number;
  name: string;
  expired: boolean;
  createdAt: string;
  sizeInBytes: number;
  headBranch?: string;
  headRepositoryId?: number;
  repositoryId?: number;
}

/** The REST calls the store makes; src/github/octokit-api.ts implements it over octokit. */
export interface ArtifactApi {
  /** All artifacts with exactly this name, as many pages as `maxPages` allows. */
  listArtifacts(name: string): Promise<ArtifactEntry[]>;
  /** The artifact's zip; throws when it is larger than `maxBytes`. */
  downloadArtifact(id: number, maxBytes: number): Promise<Uint8Array>;
}

/** Uploads one text file as a new artifact (the real one imports @actions/artifact lazily). */
export type ArtifactUploader = (name: string, fileName: string, text: string, retentionDays: number) => Promise<void>;

export interface ArtifactStoreOptions {
  api: ArtifactApi;
  upload: ArtifactUploader;
  /** The `history` input: the artifact name prefix. */
  history: string;
  series: string;
  baselineBranch: string;
  repositoryId?: number;
  retentionDays: number;
  warn: (message: string) => void;
  /** Readable artifacts merged on load (default 3). */
  mergeNewest?: number;
  maxDownloadBytes?: number;
  zipLimits?: ZipLimits;
}

/** The history file's name inside the artifact zip. */
export const HISTORY_FILE = 'history.json';

/**
 * Builds the artifact store.
 * @example await createArtifactStore({ api, upload, history: 'bellgate-history', series, baselineBranch: 'main', ... }).load()
 */
export function createArtifactStore(options: ArtifactStoreOptions): HistoryStore {
  const name = artifactName(options.history, options.series);
  const mergeNewest = options.mergeNewest ?? 3;
  const maxDownload = options.maxDownloadBytes ?? 32 * 1024 * 1024;
  const zipLimits = options.zipLimits ?? DEFAULT_ZIP_LIMITS;
  const where = `artifact ${name}`;

  async function candidates(): Promise<ArtifactEntry[]> {
    let listed: ArtifactEntry[];
    try {
      listed = await options.api.listArtifacts(name);
    } catch (cause) {
      throw new StoreError(`cannot list the history artifacts "${name}": ${messageOf(cause)}`, {
        where,
        fix: 'give the job `permissions: actions: read` and check that the token reaches the API',
        cause,
      });
    }
    return listed
      .filter((a) => a.name === name && !a.expired && a.headBranch === options.baselineBranch)
      .filter(
        (a) =>
          a.repositoryId === undefined || a.headRepositoryId === undefined || a.repositoryId === a.headRepositoryId,
      )
      .sort((a, b) => (a.createdAt === b.createdAt ? b.id - a.id : a.createdAt < b.createdAt ? 1 : -1));
  }

  async function readOne(entry: ArtifactEntry): Promise<History> {
    if (entry.sizeInBytes > maxDownload)
      throw new Error(`${entry.sizeInBytes} bytes, over the ${maxDownload} byte cap`);
    let zip: Uint8Array;
    try {
      zip = await options.api.downloadArtifact(entry.id, maxDownload);
    } catch (cause) {
      // Only an artifact too large to take is the artifact's own fault. Anything else (5xx after
      // the retries, a dropped connection) says nothing about its content: skipping it would make
      // this load miss runs, and the next upload would leave them out for good.
      if (/byte cap/.test(messageOf(cause))) throw cause;
      throw new StoreError(`cannot download history artifact #${entry.id}: ${messageOf(cause)}`, {
        where,
        fix: 'this is usually a passing fault of the API; re-run the job. Nothing was recorded, so nothing is lost',
        cause,
      });
    }
    const text = readZipEntry(zip, HISTORY_FILE, zipLimits);
    const history = parseHistory(text, `${where} #${entry.id}/${HISTORY_FILE}`);
    if (history.series !== options.series)
      throw new Error(`it holds series "${history.series}", not "${options.series}"`);
    return history;
  }

  let readCount = 0;
  return {
    describe: () => `${where} (branch ${options.baselineBranch})`,
    async load(): Promise<History> {
      const found = await candidates();
      let merged = emptyHistory(options.series);
      let good = 0;
      let bad = 0;
      // Bounded: at most mergeNewest good ones, and no more than twice that many tries in all.
      for (const entry of found.slice(0, mergeNewest * 2)) {
        if (good >= mergeNewest) break;
        try {
          merged = mergeHistories(merged, await readOne(entry));
          good += 1;
        } catch (cause) {
          if (cause instanceof StoreError) throw cause;
          bad += 1;
          options.warn(`skipped history artifact #${entry.id} (${entry.createdAt}): ${messageOf(cause)}`);
        }
      }
      if (good === 0 && bad > 0) {
        throw new StoreError(`none of the newest ${bad} history artifacts "${name}" could be read`, {
          where,
          fix: 'see the warnings above; delete the broken artifacts or set a new `history` name to start over',
        });
      }
      readCount = merged.runs.length;
      return merged;
    },
    async save(history: History, read: number): Promise<void> {
      guardAgainstLoss(where, history, Math.max(read, readCount));
      try {
        await options.upload(name, HISTORY_FILE, serializeHistory(history), options.retentionDays);
      } catch (cause) {
        throw new StoreError(`cannot upload the history artifact "${name}": ${messageOf(cause)}`, {
          where,
          fix: /409|already exists/i.test(messageOf(cause))
            ? 'an earlier attempt of this workflow run already recorded it; nothing is lost'
            : 'check that the job may upload artifacts (ACTIONS_RUNTIME_TOKEN is set by the runner)',
          cause,
        });
      }
    },
  };
}

function messageOf(cause: unknown): string {
  return cause instanceof Error ? cause.message : String(cause);
}
