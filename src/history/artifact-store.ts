/**
 * The default history store: GitHub Actions artifacts.
 *
 * Naming. The REST list endpoint filters by exact name (`?name=`), and an artifact name must be
 * unique within one workflow run. So each series gets one fixed name, `<history>-<series slug>`:
 * every recording run's upload is found by one exact-name query, and matrix jobs of one run
 * (different series) never collide.
 *
 * An artifact zip holds the history (history.jsonl) and the ids of the artifacts that history
 * already merged (merged.json). A read lists the artifacts of that name — unexpired, made on the
 * baseline branch of this repository (not a fork's branch of the same name) — and, newest first,
 * downloads each one that no artifact read before it covers, merging them all (mergeHistories: a
 * union by run that honours tombstones). K runs that raced from the same parent each uploaded a
 * sibling; the next read merges all K, whatever K is, and downloads nothing older that they cover.
 * A corrupt or hostile artifact is skipped with a warning (and covered from then on); one deleted
 * or expired since the listing is skipped (whoever deleted it merged it first); a download that
 * fails for a passing reason (5xx, network) fails the read instead, since skipping it would drop
 * its runs from the next upload. If artifacts exist but none can be read, the read fails: writing
 * then would bury the history.
 * An update applies its change to that merge and uploads the result as a new artifact, covering
 * every artifact it merged; then it deletes those, when the token may (`actions: write`). Without
 * that permission the superseded copies stay until their retention ends (README: the cost).
 */
import { applyChange, type HistoryChange } from './changes.js';
import { parseHistory, serializeHistory } from './document.js';
import { emptyHistory, type History } from './history.js';
import { mergeHistories } from './merge.js';
import { StoreError, type HistoryStore, type ReadOptions, type UpdateOutcome } from './store.js';
import { DEFAULT_ZIP_LIMITS, readZipEntries, ZipRefusedError, type ZipLimits } from './artifact-zip.js';
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

/** Why a download did not give bytes: the artifact is gone (deleted or expired since it was listed). */
export class ArtifactGoneError extends Error {
  override name = 'ArtifactGoneError';
}

/** The REST calls the store makes; src/github/octokit-api.ts implements them over octokit. */
export interface ArtifactApi {
  /** All artifacts with exactly this name (as many pages as the client allows). */
  listArtifacts(name: string): Promise<ArtifactEntry[]>;
  /** The artifact's zip; throws ArtifactGoneError on 404/410, another error past `maxBytes` or on a fault. */
  downloadArtifact(id: number, maxBytes: number): Promise<Uint8Array>;
  /** Deletes an artifact: 'denied' when the token may not (no `actions: write`), 'gone' when it was already. */
  deleteArtifact?(id: number): Promise<'deleted' | 'denied' | 'gone'>;
}

/** A file of an upload. */
export interface UploadFile {
  name: string;
  text: string;
}

/** Uploads files as one new artifact; resolves with its id when the service says it. */
export type ArtifactUploader = (name: string, files: UploadFile[], retentionDays: number) => Promise<{ id?: number }>;

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
  /** Told what is routine but worth a line in the log (copies that could not be deleted). */
  info?: (message: string) => void;
  maxDownloadBytes?: number;
  zipLimits?: ZipLimits;
  /** Most artifacts downloaded by one read (default 64). */
  maxDownloads?: number;
}

/** The history file's name inside the artifact zip. */
export const HISTORY_FILE = 'history.jsonl';
/** The ids of the artifacts the history in the zip has merged. */
export const MERGED_FILE = 'merged.json';

/**
 * Builds the artifact store.
 * @example await createArtifactStore({ api, upload, history: 'bellgate-history', series, baselineBranch: 'main', ... }).read()
 */
export function createArtifactStore(options: ArtifactStoreOptions): HistoryStore {
  const name = artifactName(options.history, options.series);
  const maxDownload = options.maxDownloadBytes ?? 32 * 1024 * 1024;
  const zipLimits = options.zipLimits ?? DEFAULT_ZIP_LIMITS;
  const maxDownloads = options.maxDownloads ?? 64;
  const where = `artifact ${name}`;
  const info = options.info ?? (() => undefined);

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

  // What this store downloaded already: an update after a read lists again (another run may have
  // uploaded meanwhile) but does not download the same artifact twice, nor warn about it twice.
  const downloaded = new Map<number, Uint8Array>();
  const warned = new Set<number>();

  /** The artifact's history and the ids it covers; undefined when it is gone since the listing. */
  async function readOne(
    entry: ArtifactEntry,
    newest: number | undefined,
  ): Promise<{ history: History; covers: number[] } | undefined> {
    if (entry.sizeInBytes > maxDownload)
      throw new ZipRefusedError(`${entry.sizeInBytes} bytes, over the ${maxDownload} byte cap`);
    let zip = downloaded.get(entry.id);
    if (zip === undefined) {
      zip = await download(entry);
      if (zip === undefined) return undefined;
      downloaded.set(entry.id, zip);
    }
    const files = readZipEntries(zip, [HISTORY_FILE, MERGED_FILE], zipLimits);
    const text = files.get(HISTORY_FILE);
    if (text === undefined) throw new ZipRefusedError(`no ${HISTORY_FILE} in the zip`);
    const history = parseHistory(text, `${where} #${entry.id}/${HISTORY_FILE}`, newest === undefined ? {} : { newest });
    if (history.series !== options.series)
      throw new ZipRefusedError(`it holds series "${history.series}", not "${options.series}"`);
    return { history, covers: coveredIds(files.get(MERGED_FILE)) };
  }

  /** The artifact's zip; undefined when it is gone since the listing. */
  async function download(entry: ArtifactEntry): Promise<Uint8Array | undefined> {
    try {
      return await options.api.downloadArtifact(entry.id, maxDownload);
    } catch (cause) {
      if (cause instanceof ArtifactGoneError) return undefined;
      // Only an artifact too large to take is the artifact's own fault. Anything else (5xx after
      // the retries, a dropped connection) says nothing about its content: skipping it would make
      // this read miss runs, and the next upload would leave them out for good.
      if (/byte cap/.test(messageOf(cause))) throw new ZipRefusedError(messageOf(cause));
      throw new StoreError(`cannot download history artifact #${entry.id}: ${messageOf(cause)}`, {
        where,
        fix: 'this is usually a passing fault of the API; re-run the job. Nothing was recorded, so nothing is lost',
        cause,
      });
    }
  }

  /** Every artifact not covered by a newer one, merged; and the ids the result covers. */
  async function load(newest: number | undefined): Promise<{ history: History; covered: number[] }> {
    const found = await candidates();
    const listed = new Set(found.map((a) => a.id));
    const covered = new Set<number>();
    let merged = emptyHistory(options.series);
    let good = 0;
    let bad = 0;
    let downloads = 0;
    for (const entry of found) {
      if (covered.has(entry.id)) continue;
      if (downloads >= maxDownloads) {
        options.warn(
          `read only ${maxDownloads} of the history artifacts "${name}"; the older ones are left out of this run`,
        );
        break;
      }
      downloads += 1;
      try {
        const one = await readOne(entry, newest);
        covered.add(entry.id);
        if (one === undefined) {
          info(`history artifact #${entry.id} went away since it was listed (merged and deleted by a newer run)`);
          continue;
        }
        for (const id of one.covers) covered.add(id);
        // Newest first: what is merged so far is the later copy and wins a shared run.
        merged = mergeHistories(one.history, merged);
        good += 1;
      } catch (cause) {
        if (cause instanceof StoreError) throw cause;
        if (!(cause instanceof ZipRefusedError) && !(cause instanceof Error && cause.name === 'InputError'))
          throw cause;
        bad += 1;
        // Covered from now on: its runs cannot be read, and the next upload need not look at it again.
        covered.add(entry.id);
        if (!warned.has(entry.id))
          options.warn(`skipped history artifact #${entry.id} (${entry.createdAt}): ${messageOf(cause)}`);
        warned.add(entry.id);
      }
    }
    if (good === 0 && bad > 0) {
      throw new StoreError(`none of the ${bad} history artifacts "${name}" could be read`, {
        where,
        fix: 'see the warnings above; delete the broken artifacts or set a new `history` name to start over',
      });
    }
    if (newest !== undefined && merged.runs.length > newest) merged = tail(merged, newest);
    return { history: merged, covered: [...covered].filter((id) => listed.has(id)) };
  }

  async function removeSuperseded(ids: number[], uploaded: number | undefined): Promise<void> {
    const remove = options.api.deleteArtifact;
    if (remove === undefined) return;
    for (const id of ids) {
      if (id === uploaded) continue;
      let result: 'deleted' | 'denied' | 'gone';
      try {
        result = await remove.call(options.api, id);
      } catch (cause) {
        info(`could not delete the superseded history artifact #${id}: ${messageOf(cause)}`);
        continue;
      }
      if (result === 'denied') {
        info(
          `kept ${ids.length} superseded history artifact(s) until they expire: give the job \`permissions: actions: write\` to let Bellgate delete them`,
        );
        return;
      }
    }
  }

  return {
    describe: () => `${where} (branch ${options.baselineBranch})`,
    async read(readOptions: ReadOptions = {}): Promise<History> {
      return (await load(readOptions.newest)).history;
    },
    async update(change: HistoryChange): Promise<UpdateOutcome> {
      const { history: stored, covered } = await load(undefined);
      const { history, replaced } = applyChange(stored, change);
      let uploaded: { id?: number };
      try {
        uploaded = await options.upload(
          name,
          [
            { name: HISTORY_FILE, text: serializeHistory(history) },
            { name: MERGED_FILE, text: `${JSON.stringify({ artifacts: covered })}\n` },
          ],
          options.retentionDays,
        );
      } catch (cause) {
        throw new StoreError(`cannot upload the history artifact "${name}": ${messageOf(cause)}`, {
          where,
          fix: /409|already exists/i.test(messageOf(cause))
            ? 'an earlier attempt of this workflow run already recorded it, and its artifact could not be replaced; nothing is lost'
            : 'check that the job may upload artifacts (ACTIONS_RUNTIME_TOKEN is set by the runner)',
          cause,
        });
      }
      await removeSuperseded(covered, uploaded.id);
      const outcome: UpdateOutcome = { runs: history.runs.length, wrote: 'rewritten' };
      if (replaced !== undefined) outcome.replaced = replaced;
      return outcome;
    },
  };
}

/** The artifact ids a merged.json lists; none when it is missing or not readable. */
function coveredIds(text: string | undefined): number[] {
  if (text === undefined) return [];
  try {
    const value = JSON.parse(text) as { artifacts?: unknown };
    return Array.isArray(value.artifacts) ? value.artifacts.filter((id): id is number => Number.isSafeInteger(id)) : [];
  } catch {
    return [];
  }
}

/** The newest `newest` runs of a history. */
function tail(h: History, newest: number): History {
  const drop = h.runs.length - newest;
  const columns = new Map<string, { unit?: string; values: number[] }>();
  for (const [metric, column] of h.columns) {
    const values = column.values.slice(drop);
    if (values.some((v) => !Number.isNaN(v))) columns.set(metric, { ...column, values });
  }
  return { ...h, runs: h.runs.slice(drop), columns };
}

function messageOf(cause: unknown): string {
  return cause instanceof Error ? cause.message : String(cause);
}
