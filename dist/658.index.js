export const id = 658;
export const ids = [658];
export const modules = {

/***/ 40658:
/***/ ((__unused_webpack_module, __webpack_exports__, __webpack_require__) => {

// ESM COMPAT FLAG
__webpack_require__.r(__webpack_exports__);

// EXPORTS
__webpack_require__.d(__webpack_exports__, {
  HISTORY_FILE: () => (/* binding */ HISTORY_FILE),
  artifactName: () => (/* reexport */ artifact_name/* artifactName */.C),
  createArtifactStore: () => (/* binding */ createArtifactStore)
});

// EXTERNAL MODULE: ./src/history/history.ts
var history_history = __webpack_require__(43328);
// EXTERNAL MODULE: ./src/history/document.ts + 5 modules
var history_document = __webpack_require__(70516);
// EXTERNAL MODULE: ./src/history/merge.ts + 3 modules
var merge = __webpack_require__(2278);
// EXTERNAL MODULE: ./src/history/store.ts
var store = __webpack_require__(84689);
// EXTERNAL MODULE: ./node_modules/fflate/esm/index.mjs
var esm = __webpack_require__(51306);
;// CONCATENATED MODULE: ./src/history/artifact-zip.ts
/**
 * Reads the history file out of a downloaded artifact zip, refusing anything that looks hostile:
 * too many entries, entries that would leave their folder (`../`, absolute or drive paths), and
 * declared or actual unzipped sizes over the cap (a zip bomb). Unzipping is fflate's.
 */

const DEFAULT_ZIP_LIMITS = { maxEntries: 16, maxUnzippedBytes: 64 * 1024 * 1024 };
/** Why a zip was refused; the artifact store turns it into a warning and skips the artifact. */
class ZipRefusedError extends Error {
    name = 'ZipRefusedError';
}
/** True when an entry name would be written outside the folder it is unpacked into. */
function leavesFolder(name) {
    const n = name.replace(/\\/g, '/');
    if (n.startsWith('/') || /^[A-Za-z]:/.test(n))
        return true;
    return n.split('/').some((part) => part === '..');
}
/**
 * Returns the text of entry `fileName` (at the zip's root) from `bytes`.
 * @throws ZipRefusedError when the zip is corrupt, hostile, too big or lacks the file.
 * @example readZipEntry(zipSync({ 'history.json': strToU8('{}') }), 'history.json') // '{}'
 */
function readZipEntry(bytes, fileName, limits = DEFAULT_ZIP_LIMITS) {
    let entries = 0;
    let declared = 0;
    let hostile;
    let files;
    try {
        files = (0,esm/* unzipSync */.AO)(bytes, {
            filter: (file) => {
                entries += 1;
                declared += file.originalSize;
                if (leavesFolder(file.name))
                    hostile ??= file.name;
                // Only the one file we need is inflated; the rest are counted, not unpacked.
                return file.name === fileName && file.originalSize <= limits.maxUnzippedBytes;
            },
        });
    }
    catch (cause) {
        throw new ZipRefusedError(`not a readable zip (${cause instanceof Error ? cause.message : String(cause)})`);
    }
    if (hostile !== undefined)
        throw new ZipRefusedError(`entry "${hostile}" would leave its folder`);
    if (entries > limits.maxEntries)
        throw new ZipRefusedError(`${entries} entries, more than the ${limits.maxEntries} allowed`);
    if (declared > limits.maxUnzippedBytes) {
        throw new ZipRefusedError(`unzips to ${declared} bytes, more than the ${limits.maxUnzippedBytes} allowed`);
    }
    const data = files[fileName];
    if (data === undefined)
        throw new ZipRefusedError(`no ${fileName} in the zip`);
    if (data.length > limits.maxUnzippedBytes)
        throw new ZipRefusedError(`${fileName} unzips beyond the size cap`);
    try {
        return new TextDecoder('utf-8', { fatal: true }).decode(data);
    }
    catch {
        throw new ZipRefusedError(`${fileName} is not UTF-8 text`);
    }
}

// EXTERNAL MODULE: ./src/history/artifact-name.ts
var artifact_name = __webpack_require__(63278);
;// CONCATENATED MODULE: ./src/history/artifact-store.ts
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







/** The history file's name inside the artifact zip. */
const HISTORY_FILE = 'history.json';
/**
 * Builds the artifact store.
 * @example await createArtifactStore({ api, upload, history: 'bellgate-history', series, baselineBranch: 'main', ... }).load()
 */
function createArtifactStore(options) {
    const name = (0,artifact_name/* artifactName */.C)(options.history, options.series);
    const mergeNewest = options.mergeNewest ?? 3;
    const maxDownload = options.maxDownloadBytes ?? 32 * 1024 * 1024;
    const zipLimits = options.zipLimits ?? DEFAULT_ZIP_LIMITS;
    const where = `artifact ${name}`;
    async function candidates() {
        let listed;
        try {
            listed = await options.api.listArtifacts(name);
        }
        catch (cause) {
            throw new store/* StoreError */.A(`cannot list the history artifacts "${name}": ${messageOf(cause)}`, {
                where,
                fix: 'give the job `permissions: actions: read` and check that the token reaches the API',
                cause,
            });
        }
        return listed
            .filter((a) => a.name === name && !a.expired && a.headBranch === options.baselineBranch)
            .filter((a) => a.repositoryId === undefined || a.headRepositoryId === undefined || a.repositoryId === a.headRepositoryId)
            .sort((a, b) => (a.createdAt === b.createdAt ? b.id - a.id : a.createdAt < b.createdAt ? 1 : -1));
    }
    async function readOne(entry) {
        if (entry.sizeInBytes > maxDownload)
            throw new Error(`${entry.sizeInBytes} bytes, over the ${maxDownload} byte cap`);
        let zip;
        try {
            zip = await options.api.downloadArtifact(entry.id, maxDownload);
        }
        catch (cause) {
            // Only an artifact too large to take is the artifact's own fault. Anything else (5xx after
            // the retries, a dropped connection) says nothing about its content: skipping it would make
            // this load miss runs, and the next upload would leave them out for good.
            if (/byte cap/.test(messageOf(cause)))
                throw cause;
            throw new store/* StoreError */.A(`cannot download history artifact #${entry.id}: ${messageOf(cause)}`, {
                where,
                fix: 'this is usually a passing fault of the API; re-run the job. Nothing was recorded, so nothing is lost',
                cause,
            });
        }
        const text = readZipEntry(zip, HISTORY_FILE, zipLimits);
        const history = (0,history_document/* parseHistory */.i6)(text, `${where} #${entry.id}/${HISTORY_FILE}`);
        if (history.series !== options.series)
            throw new Error(`it holds series "${history.series}", not "${options.series}"`);
        return history;
    }
    let readCount = 0;
    return {
        describe: () => `${where} (branch ${options.baselineBranch})`,
        async load() {
            const found = await candidates();
            let merged = (0,history_history/* emptyHistory */.s)(options.series);
            let good = 0;
            let bad = 0;
            // Bounded: at most mergeNewest good ones, and no more than twice that many tries in all.
            for (const entry of found.slice(0, mergeNewest * 2)) {
                if (good >= mergeNewest)
                    break;
                try {
                    merged = (0,merge/* mergeHistories */.dk)(merged, await readOne(entry));
                    good += 1;
                }
                catch (cause) {
                    if (cause instanceof store/* StoreError */.A)
                        throw cause;
                    bad += 1;
                    options.warn(`skipped history artifact #${entry.id} (${entry.createdAt}): ${messageOf(cause)}`);
                }
            }
            if (good === 0 && bad > 0) {
                throw new store/* StoreError */.A(`none of the newest ${bad} history artifacts "${name}" could be read`, {
                    where,
                    fix: 'see the warnings above; delete the broken artifacts or set a new `history` name to start over',
                });
            }
            readCount = merged.runs.length;
            return merged;
        },
        async save(history, read) {
            (0,store/* guardAgainstLoss */.y)(where, history, Math.max(read, readCount));
            try {
                await options.upload(name, HISTORY_FILE, (0,history_document/* serializeHistory */.ph)(history), options.retentionDays);
            }
            catch (cause) {
                throw new store/* StoreError */.A(`cannot upload the history artifact "${name}": ${messageOf(cause)}`, {
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
function messageOf(cause) {
    return cause instanceof Error ? cause.message : String(cause);
}


/***/ })

};
