export const id = 7;
export const ids = [7];
export const modules = {

/***/ 8007:
/***/ ((__unused_webpack_module, __webpack_exports__, __webpack_require__) => {

// ESM COMPAT FLAG
__webpack_require__.r(__webpack_exports__);

// EXPORTS
__webpack_require__.d(__webpack_exports__, {
  createOctokitApi: () => (/* binding */ createOctokitApi)
});

// EXTERNAL MODULE: ./src/history/changes.ts
var changes = __webpack_require__(5201);
// EXTERNAL MODULE: ./src/history/document.ts
var history_document = __webpack_require__(8363);
// EXTERNAL MODULE: ./src/history/merge.ts
var merge = __webpack_require__(4292);
// EXTERNAL MODULE: ./src/history/store.ts
var store = __webpack_require__(4689);
// EXTERNAL MODULE: external "node:zlib"
var external_node_zlib_ = __webpack_require__(8522);
;// CONCATENATED MODULE: ./src/history/artifact-zip.ts
/**
 * Reads named files out of a downloaded artifact zip, refusing anything hostile before it costs
 * time or memory: the entry count and the central directory are checked against the end record
 * (APPNOTE.TXT 4.3.16, and the ZIP64 end record 4.3.14) before any entry is looked at; entries that
 * would leave their folder (`../`, absolute or drive paths), encrypted entries and methods other
 * than stored (0) and deflate (8) are refused; the declared sizes are summed against the cap before
 * anything is inflated; inflating stops as soon as an entry passes its declared size (node:zlib's
 * maxOutputLength), and a shorter entry, or one whose CRC-32 differs, is refused too.
 */

const artifact_zip_DEFAULT_ZIP_LIMITS = { maxEntries: 16, maxUnzippedBytes: 64 * 1024 * 1024 };
/** Why a zip was refused; the artifact store turns it into a warning and skips the artifact. */
class artifact_zip_ZipRefusedError extends (/* unused pure expression or super */ null && (Error)) {
    name = 'ZipRefusedError';
}
/** True when an entry name would be written outside the folder it is unpacked into. */
function leavesFolder(name) {
    const n = name.replace(/\\/g, '/');
    if (n.startsWith('/') || /^[A-Za-z]:/.test(n))
        return true;
    return n.split('/').some((part) => part === '..');
}
const EOCD = 0x06054b50;
const ZIP64_LOCATOR = 0x07064b50;
const ZIP64_EOCD = 0x06064b50;
const CENTRAL = 0x02014b50;
const LOCAL = 0x04034b50;
/**
 * The texts of the entries named `wanted` (at the zip's root) that the zip holds, by name.
 * @throws ZipRefusedError when the zip is corrupt, hostile, too big, or an entry is not UTF-8.
 * @example readZipEntries(zipSync({ 'history.jsonl': strToU8('{}\n') }), ['history.jsonl']).get('history.jsonl') // '{}\n'
 */
function artifact_zip_readZipEntries(bytes, wanted, limits = artifact_zip_DEFAULT_ZIP_LIMITS) {
    const buf = Buffer.from(bytes.buffer, bytes.byteOffset, bytes.byteLength);
    const entries = centralDirectory(buf, limits);
    let declared = 0;
    for (const e of entries) {
        if (leavesFolder(e.name))
            throw new artifact_zip_ZipRefusedError(`entry "${e.name}" would leave its folder`);
        declared += e.size;
    }
    if (declared > limits.maxUnzippedBytes)
        throw new artifact_zip_ZipRefusedError(`it declares ${declared} unzipped bytes, more than the ${limits.maxUnzippedBytes} allowed`);
    const out = new Map();
    for (const e of entries) {
        if (!wanted.includes(e.name) || out.has(e.name))
            continue;
        const data = inflateEntry(buf, e);
        try {
            out.set(e.name, new TextDecoder('utf-8', { fatal: true }).decode(data));
        }
        catch {
            throw new artifact_zip_ZipRefusedError(`${e.name} is not UTF-8 text`);
        }
    }
    return out;
}
/** Returns the text of entry `fileName`; throws ZipRefusedError when it is missing (see readZipEntries). */
function readZipEntry(bytes, fileName, limits = artifact_zip_DEFAULT_ZIP_LIMITS) {
    const text = artifact_zip_readZipEntries(bytes, [fileName], limits).get(fileName);
    if (text === undefined)
        throw new artifact_zip_ZipRefusedError(`no ${fileName} in the zip`);
    return text;
}
function centralDirectory(buf, limits) {
    // The end record is the last 22 bytes plus a comment of at most 65,535 bytes.
    let end = -1;
    for (let i = buf.length - 22; i >= Math.max(0, buf.length - 22 - 0xffff); i--) {
        if (buf.readUInt32LE(i) === EOCD) {
            end = i;
            break;
        }
    }
    if (end < 0)
        throw new artifact_zip_ZipRefusedError('not a readable zip (no end of central directory record)');
    let count = buf.readUInt16LE(end + 10);
    let size = buf.readUInt32LE(end + 12);
    let offset = buf.readUInt32LE(end + 16);
    if (buf.readUInt16LE(end + 4) !== 0 || buf.readUInt16LE(end + 6) !== 0)
        throw new artifact_zip_ZipRefusedError('a zip split over several disks is not read');
    if (count === 0xffff || size === 0xffffffff || offset === 0xffffffff) {
        const locator = end - 20;
        if (locator < 0 || buf.readUInt32LE(locator) !== ZIP64_LOCATOR)
            throw new artifact_zip_ZipRefusedError('not a readable zip (a ZIP64 end record is announced but missing)');
        const at = Number(buf.readBigUInt64LE(locator + 8));
        if (!Number.isSafeInteger(at) || at < 0 || at + 56 > locator || buf.readUInt32LE(at) !== ZIP64_EOCD)
            throw new artifact_zip_ZipRefusedError('not a readable zip (the ZIP64 end record is out of place)');
        const big = (n) => (n > BigInt(Number.MAX_SAFE_INTEGER) ? Infinity : Number(n));
        count = big(buf.readBigUInt64LE(at + 32));
        size = big(buf.readBigUInt64LE(at + 40));
        offset = big(buf.readBigUInt64LE(at + 48));
        end = at;
    }
    if (count > limits.maxEntries)
        throw new artifact_zip_ZipRefusedError(`it claims ${count} entries, more than the ${limits.maxEntries} allowed`);
    if (!(offset + size <= end))
        throw new artifact_zip_ZipRefusedError('not a readable zip (the central directory lies outside it)');
    const entries = [];
    let at = offset;
    for (let i = 0; i < count; i++) {
        if (at + 46 > offset + size || buf.readUInt32LE(at) !== CENTRAL)
            throw new artifact_zip_ZipRefusedError(`not a readable zip (central directory entry ${i + 1} is damaged)`);
        const flags = buf.readUInt16LE(at + 8);
        const nameLength = buf.readUInt16LE(at + 28);
        const next = at + 46 + nameLength + buf.readUInt16LE(at + 30) + buf.readUInt16LE(at + 32);
        if (next > offset + size)
            throw new artifact_zip_ZipRefusedError(`not a readable zip (central directory entry ${i + 1} is cut short)`);
        const name = buf.toString((flags & 0x800) !== 0 ? 'utf8' : 'latin1', at + 46, at + 46 + nameLength);
        const entry = {
            name,
            method: buf.readUInt16LE(at + 10),
            crc: buf.readUInt32LE(at + 16),
            compressed: buf.readUInt32LE(at + 20),
            size: buf.readUInt32LE(at + 24),
            localOffset: buf.readUInt32LE(at + 42),
        };
        if ((flags & 1) !== 0)
            throw new artifact_zip_ZipRefusedError(`entry "${name}" is encrypted`);
        if (entry.size === 0xffffffff || entry.compressed === 0xffffffff || entry.localOffset === 0xffffffff)
            throw new artifact_zip_ZipRefusedError(`entry "${name}" is a ZIP64 entry (over 4 GiB), which is not read`);
        entries.push(entry);
        at = next;
    }
    return entries;
}
function inflateEntry(buf, e) {
    const at = e.localOffset;
    if (at + 30 > buf.length || buf.readUInt32LE(at) !== LOCAL)
        throw new artifact_zip_ZipRefusedError(`not a readable zip (the local header of "${e.name}" is missing)`);
    const start = at + 30 + buf.readUInt16LE(at + 26) + buf.readUInt16LE(at + 28);
    if (start + e.compressed > buf.length)
        throw new artifact_zip_ZipRefusedError(`entry "${e.name}" runs past the end of the zip`);
    const raw = buf.subarray(start, start + e.compressed);
    let data;
    if (e.method === 0)
        data = raw;
    else if (e.method === 8) {
        try {
            // Stops once the output passes the declared size (maxOutputLength must be at least 1).
            data = inflateRawSync(raw, { maxOutputLength: Math.max(1, e.size) });
        }
        catch (cause) {
            if (cause.code === 'ERR_BUFFER_TOO_LARGE')
                throw new artifact_zip_ZipRefusedError(`entry "${e.name}" inflates past the ${e.size} bytes it declares; inflating stopped there`);
            throw new artifact_zip_ZipRefusedError(`entry "${e.name}" is not readable deflate data (${cause.message})`);
        }
    }
    else
        throw new artifact_zip_ZipRefusedError(`entry "${e.name}" uses compression method ${e.method}, which is not read`);
    if (data.length !== e.size)
        throw new artifact_zip_ZipRefusedError(`entry "${e.name}" holds ${data.length} bytes, not the ${e.size} it declares`);
    if (crc32(data) >>> 0 !== e.crc >>> 0)
        throw new artifact_zip_ZipRefusedError(`entry "${e.name}" fails its CRC-32 check`);
    return data;
}

// EXTERNAL MODULE: external "node:crypto"
var external_node_crypto_ = __webpack_require__(7598);
;// CONCATENATED MODULE: ./src/history/artifact-name.ts

/**
 * The artifact name of a series: readable slug plus a short hash, so distinct series never share a
 * name even when their slugs coincide. Only characters the artifact service accepts. A module of
 * its own so the action can name artifacts without loading the artifact store and its zip reader.
 * @example artifactName('bellgate-history', 'bench/linux') // 'bellgate-history-bench-linux-<8 hex>'
 */
function artifact_name_artifactName(history, series) {
    const slug = series
        .replace(/[^A-Za-z0-9._-]+/g, '-')
        .replace(/^-+|-+$/g, '')
        .slice(0, 60);
    const hash = createHash('sha256').update(series).digest('hex').slice(0, 8);
    return slug === '' ? `${history}-${hash}` : `${history}-${slug}-${hash}`;
}

;// CONCATENATED MODULE: ./src/history/artifact-store.ts
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








/** Why a download did not give bytes: the artifact is gone (deleted or expired since it was listed). */
class ArtifactGoneError extends Error {
    name = 'ArtifactGoneError';
}
/** The history file's name inside the artifact zip. */
const HISTORY_FILE = 'history.jsonl';
/** The ids of the artifacts the history in the zip has merged. */
const MERGED_FILE = 'merged.json';
/**
 * Builds the artifact store.
 * @example await createArtifactStore({ api, upload, history: 'bellgate-history', series, baselineBranch: 'main', ... }).read()
 */
function createArtifactStore(options) {
    const name = artifactName(options.history, options.series);
    const maxDownload = options.maxDownloadBytes ?? 32 * 1024 * 1024;
    const zipLimits = options.zipLimits ?? DEFAULT_ZIP_LIMITS;
    const maxDownloads = options.maxDownloads ?? 64;
    const where = `artifact ${name}`;
    const info = options.info ?? (() => undefined);
    async function candidates() {
        let listed;
        try {
            listed = await options.api.listArtifacts(name);
        }
        catch (cause) {
            throw new StoreError(`cannot list the history artifacts "${name}": ${messageOf(cause)}`, {
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
    // What this store downloaded already: an update after a read lists again (another run may have
    // uploaded meanwhile) but does not download the same artifact twice, nor warn about it twice.
    const downloaded = new Map();
    const warned = new Set();
    /** The artifact's history and the ids it covers; undefined when it is gone since the listing. */
    async function readOne(entry, newest) {
        if (entry.sizeInBytes > maxDownload)
            throw new ZipRefusedError(`${entry.sizeInBytes} bytes, over the ${maxDownload} byte cap`);
        let zip = downloaded.get(entry.id);
        if (zip === undefined) {
            zip = await download(entry);
            if (zip === undefined)
                return undefined;
            downloaded.set(entry.id, zip);
        }
        const files = readZipEntries(zip, [HISTORY_FILE, MERGED_FILE], zipLimits);
        const text = files.get(HISTORY_FILE);
        if (text === undefined)
            throw new ZipRefusedError(`no ${HISTORY_FILE} in the zip`);
        const history = parseHistory(text, `${where} #${entry.id}/${HISTORY_FILE}`, newest === undefined ? {} : { newest });
        if (history.series !== options.series)
            throw new ZipRefusedError(`it holds series "${history.series}", not "${options.series}"`);
        return { history, covers: coveredIds(files.get(MERGED_FILE)) };
    }
    /** The artifact's zip; undefined when it is gone since the listing. */
    async function download(entry) {
        try {
            return await options.api.downloadArtifact(entry.id, maxDownload);
        }
        catch (cause) {
            if (cause instanceof ArtifactGoneError)
                return undefined;
            // Only an artifact too large to take is the artifact's own fault. Anything else (5xx after
            // the retries, a dropped connection) says nothing about its content: skipping it would make
            // this read miss runs, and the next upload would leave them out for good.
            if (/byte cap/.test(messageOf(cause)))
                throw new ZipRefusedError(messageOf(cause));
            throw new StoreError(`cannot download history artifact #${entry.id}: ${messageOf(cause)}`, {
                where,
                fix: 'this is usually a passing fault of the API; re-run the job. Nothing was recorded, so nothing is lost',
                cause,
            });
        }
    }
    /** Every artifact not covered by a newer one, merged; and the ids the result covers. */
    async function load(newest) {
        const found = await candidates();
        const listed = new Set(found.map((a) => a.id));
        const covered = new Set();
        let merged = emptyHistory(options.series);
        let good = 0;
        let bad = 0;
        let downloads = 0;
        for (const entry of found) {
            if (covered.has(entry.id))
                continue;
            if (downloads >= maxDownloads) {
                options.warn(`read only ${maxDownloads} of the history artifacts "${name}"; the older ones are left out of this run`);
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
                for (const id of one.covers)
                    covered.add(id);
                // Newest first: what is merged so far is the later copy and wins a shared run.
                merged = mergeHistories(one.history, merged);
                good += 1;
            }
            catch (cause) {
                if (cause instanceof StoreError)
                    throw cause;
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
        if (newest !== undefined && merged.runs.length > newest)
            merged = tail(merged, newest);
        return { history: merged, covered: [...covered].filter((id) => listed.has(id)) };
    }
    async function removeSuperseded(ids, uploaded) {
        const remove = options.api.deleteArtifact;
        if (remove === undefined)
            return;
        for (const id of ids) {
            if (id === uploaded)
                continue;
            let result;
            try {
                result = await remove.call(options.api, id);
            }
            catch (cause) {
                info(`could not delete the superseded history artifact #${id}: ${messageOf(cause)}`);
                continue;
            }
            if (result === 'denied') {
                info(`kept ${ids.length} superseded history artifact(s) until they expire: give the job \`permissions: actions: write\` to let Bellgate delete them`);
                return;
            }
        }
    }
    return {
        describe: () => `${where} (branch ${options.baselineBranch})`,
        async read(readOptions = {}) {
            return (await load(readOptions.newest)).history;
        },
        async update(change) {
            const { history: stored, covered } = await load(undefined);
            const { history, replaced } = applyChange(stored, change);
            let uploaded;
            try {
                uploaded = await options.upload(name, [
                    { name: HISTORY_FILE, text: serializeHistory(history) },
                    { name: MERGED_FILE, text: `${JSON.stringify({ artifacts: covered })}\n` },
                ], options.retentionDays);
            }
            catch (cause) {
                throw new StoreError(`cannot upload the history artifact "${name}": ${messageOf(cause)}`, {
                    where,
                    fix: /409|already exists/i.test(messageOf(cause))
                        ? 'an earlier attempt of this workflow run already recorded it, and its artifact could not be replaced; nothing is lost'
                        : 'check that the job may upload artifacts (ACTIONS_RUNTIME_TOKEN is set by the runner)',
                    cause,
                });
            }
            await removeSuperseded(covered, uploaded.id);
            const outcome = { runs: history.runs.length, wrote: 'rewritten' };
            if (replaced !== undefined)
                outcome.replaced = replaced;
            return outcome;
        },
    };
}
/** The artifact ids a merged.json lists; none when it is missing or not readable. */
function coveredIds(text) {
    if (text === undefined)
        return [];
    try {
        const value = JSON.parse(text);
        return Array.isArray(value.artifacts) ? value.artifacts.filter((id) => Number.isSafeInteger(id)) : [];
    }
    catch {
        return [];
    }
}
/** The newest `newest` runs of a history. */
function tail(h, newest) {
    const drop = h.runs.length - newest;
    const columns = new Map();
    for (const [metric, column] of h.columns) {
        const values = column.values.slice(drop);
        if (values.some((v) => !Number.isNaN(v)))
            columns.set(metric, { ...column, values });
    }
    return { ...h, runs: h.runs.slice(drop), columns };
}
function messageOf(cause) {
    return cause instanceof Error ? cause.message : String(cause);
}

;// CONCATENATED MODULE: ./src/github/api.ts
/** The retries of the action's calls. */
const DEFAULT_RETRY = { retries: 3, unitMs: 1000 };
/** The HTTP status of an octokit RequestError (or similar), if any. */
function statusOf(error) {
    const s = error?.status;
    return typeof s === 'number' ? s : undefined;
}

;// CONCATENATED MODULE: ./src/github/fetch-capped.ts
/**
 * Reads a downloaded body (the artifact zip) to its end, failing as soon as it passes `maxBytes`:
 * a hostile or runaway download never fills memory.
 */
async function readCapped(stream, maxBytes) {
    const reader = stream.getReader();
    const chunks = [];
    let total = 0;
    for (;;) {
        const { done, value } = await reader.read();
        if (done)
            break;
        total += value.length;
        if (total > maxBytes) {
            await reader.cancel();
            throw new Error(`download passed the ${maxBytes} byte cap`);
        }
        chunks.push(value);
    }
    const out = new Uint8Array(total);
    let at = 0;
    for (const c of chunks) {
        out.set(c, at);
        at += c.length;
    }
    return out;
}

// EXTERNAL MODULE: ./src/history/branch-api.ts
var branch_api = __webpack_require__(5939);
;// CONCATENATED MODULE: ./src/github/retry-after.ts
/** Longest wait honoured, in seconds; a longer ask fails now. */
const MAX_RETRY_AFTER = 120;
/** Default time limit of one try of a request. */
const REQUEST_TIMEOUT_MS = 30_000;
/**
 * The seconds GitHub asks to wait before `error` may be retried, or undefined when it is not a
 * rate limit. `attempt` counts the tries made (0 for the first failure).
 * @example rateLimitWait({ status: 403, message: 'You have exceeded a secondary rate limit', response: { headers: { 'retry-after': '30' } } }, 0, Date.now()) // 30
 */
function rateLimitWait(error, attempt, now) {
    const e = error;
    if (e?.status !== 403 && e?.status !== 429)
        return undefined;
    const headers = e.response?.headers ?? {};
    const said = `${e.message ?? ''} ${JSON.stringify(e.response?.data ?? '')}`;
    const secondary = /secondary rate limit/i.test(said);
    const exhausted = headers['x-ratelimit-remaining'] === '0';
    const raw = headers['retry-after'];
    if (e.status === 403 && !secondary && !exhausted && raw === undefined)
        return undefined;
    if (raw !== undefined) {
        const seconds = /^\s*\d+\s*$/.test(raw) ? Number(raw) : Math.ceil((Date.parse(raw) - now) / 1000);
        if (Number.isFinite(seconds))
            return Math.max(0, seconds);
    }
    if (exhausted) {
        const reset = Number(headers['x-ratelimit-reset']);
        if (Number.isFinite(reset) && reset > 0)
            return Math.max(0, Math.ceil(reset - now / 1000) + 1);
    }
    if (secondary)
        return 60 * 2 ** Math.min(attempt, 4);
    return (attempt + 1) ** 2;
}
/**
 * The wait this plugin honours: rateLimitWait, unless it is over MAX_RETRY_AFTER (undefined: give up).
 * @example retryAfterSeconds({ status: 429, response: { headers: { 'retry-after': '3' } } }, 0, Date.now()) // 3
 */
function retryAfterSeconds(error, attempt, now) {
    const wait = rateLimitWait(error, attempt, now);
    return wait === undefined || wait > MAX_RETRY_AFTER ? undefined : wait;
}
/**
 * The plugin, for getOctokit(token, options, honourRetryAfter(tuning, log), retry, throttling).
 * Waits are `seconds x tuning.unitMs` (1000 in production; tests pass milliseconds).
 * @example getOctokit(token, {}, honourRetryAfter({ retries: 3, unitMs: 1000 }))
 */
function honourRetryAfter(tuning, log = () => undefined) {
    const timeoutMs = tuning.timeoutMs ?? REQUEST_TIMEOUT_MS;
    return (octokit) => {
        octokit.hook.wrap('request', async (request, options) => {
            for (let attempt = 0;; attempt++) {
                try {
                    return await timed(request, options, timeoutMs);
                }
                catch (error) {
                    const wait = attempt < tuning.retries ? retryAfterSeconds(error, attempt, Date.now()) : undefined;
                    if (wait === undefined)
                        throw error;
                    const o = options;
                    log(`GitHub asked to wait ${wait} s before ${o.method ?? ''} ${o.url ?? ''} (retry ${attempt + 1} of ${tuning.retries})`);
                    await new Promise((r) => setTimeout(r, wait * tuning.unitMs));
                }
            }
        });
    };
}
/** One try with its own time limit; no answer in time is a 504 that plugin-retry retries. */
async function timed(request, options, timeoutMs) {
    const o = options;
    const signal = AbortSignal.timeout(timeoutMs);
    try {
        return await request({ ...o, request: { ...o.request, signal } });
    }
    catch (error) {
        if (!signal.aborted)
            throw error;
        throw Object.assign(new Error(`${o.method ?? ''} ${o.url ?? ''}: no answer within ${Math.round(timeoutMs / 1000)} s`), {
            name: 'HttpError',
            status: 504,
            request: o,
        });
    }
}

;// CONCATENATED MODULE: ./src/github/git-data.ts
/**
 * The branch store's Git Data calls (GitDataApi) over the action's one octokit client, so they
 * share its retries (plugin-retry: 5xx, network, timeouts), its rate-limit waits (retry-after.ts),
 * the spacing of content-creating requests (plugin-throttling's write group) and the runner's
 * proxy. Every failure becomes a GitDataError whose kind the store acts on (classifyGitDataFailure).
 */


const obj = (v) => (typeof v === 'object' && v !== null ? v : {});
const segments = (path) => path.split('/').map(encodeURIComponent).join('/');
/** A GitDataError for a failed request: its status, GitHub's message and what it means. */
function gitDataError(error, doing) {
    const e = error;
    const status = typeof e?.status === 'number' && e.status > 0 ? e.status : undefined;
    const said = obj(e?.response?.data).message;
    const message = typeof said === 'string' ? said : typeof e?.message === 'string' ? e.message : String(error);
    const { kind, retryAfter } = (0,branch_api/* classifyGitDataFailure */.l)(status, message, rateLimitWait(error, 0, Date.now()));
    return new branch_api/* GitDataError */.x(`${doing}${status === undefined ? '' : ` answered ${status}`}: ${message.slice(0, 300)}`, {
        ...(status === undefined ? {} : { status }),
        kind,
        ...(retryAfter === undefined ? {} : { retryAfter }),
        cause: error,
    });
}
function git_data_text(v, what) {
    if (typeof v !== 'string' || v === '')
        throw new branch_api/* GitDataError */.x(`the API answer lacks ${what}`, { kind: 'transient' });
    return v;
}
/**
 * @example const api = createGitData(() => octokit(), { owner: 'acme', repo: 'router' });
 * await api.getBranchHead('bellgate-data') // '3f1c…' or undefined
 */
function createGitData(client, repo) {
    const base = `/repos/${encodeURIComponent(repo.owner)}/${encodeURIComponent(repo.repo)}`;
    /** One call; a 404 gives undefined when `missingOk`, every other failure a GitDataError. */
    async function call(method, path, body, missingOk = false) {
        try {
            const res = await (await client()).request(`${method} ${base}${path}`, body ?? {});
            return { status: res.status, data: obj(res.data) };
        }
        catch (error) {
            if (missingOk && error.status === 404)
                return undefined;
            throw gitDataError(error, `${method} ${path}`);
        }
    }
    const found = async (method, path, body) => (await call(method, path, body))?.data ?? {};
    return {
        async getBranchHead(branch) {
            const res = await call('GET', `/git/ref/heads/${segments(branch)}`, undefined, true);
            return res === undefined ? undefined : git_data_text(obj(res.data.object).sha, 'the branch head');
        },
        async getCommitTree(sha) {
            return git_data_text(obj((await found('GET', `/git/commits/${encodeURIComponent(sha)}`)).tree).sha, 'the commit tree');
        },
        async findFile(path, commit) {
            const res = await call('GET', `/contents/${segments(path)}?ref=${encodeURIComponent(commit)}`, undefined, true);
            if (res === undefined)
                return undefined;
            if (res.data.type !== 'file')
                throw new branch_api/* GitDataError */.x(`${path} on the data branch is a ${String(res.data.type)}, not a file`, {
                    kind: 'other',
                });
            return { sha: git_data_text(res.data.sha, 'the file sha'), size: typeof res.data.size === 'number' ? res.data.size : 0 };
        },
        async getBlobText(sha) {
            const json = await found('GET', `/git/blobs/${encodeURIComponent(sha)}`);
            if (json.encoding !== 'base64' || typeof json.content !== 'string')
                throw new branch_api/* GitDataError */.x(`blob ${sha} came back without base64 content`, { kind: 'transient' });
            const bytes = Buffer.from(json.content, 'base64');
            if (typeof json.size === 'number' && bytes.length !== json.size)
                throw new branch_api/* GitDataError */.x(`blob ${sha} came back with ${bytes.length} of ${json.size} bytes`, {
                    kind: 'transient',
                });
            try {
                return new TextDecoder('utf-8', { fatal: true }).decode(bytes);
            }
            catch {
                throw new branch_api/* GitDataError */.x(`blob ${sha} is not UTF-8 text`, { kind: 'other' });
            }
        },
        async createTree(files, baseTree) {
            const tree = files.map((f) => ({ path: f.path, mode: '100644', type: 'blob', content: f.text }));
            return git_data_text((await found('POST', '/git/trees', { tree, ...(baseTree ? { base_tree: baseTree } : {}) })).sha, 'the tree sha');
        },
        async createCommit(message, tree, parents) {
            return git_data_text((await found('POST', '/git/commits', { message, tree, parents })).sha, 'the commit sha');
        },
        async createBranch(branch, sha) {
            await call('POST', '/git/refs', { ref: `refs/heads/${branch}`, sha });
        },
        async mergeIntoBranch(branch, sha, message) {
            const res = await call('POST', '/merges', { base: branch, head: sha, commit_message: message });
            return res?.status === 204 ? 'contained' : 'merged';
        },
    };
}

;// CONCATENATED MODULE: ./src/github/client-fetch.ts
/**
 * The fetch of the action's HTTP client: undici's, the copy @actions/http-client brings (the
 * action loads it at start through @actions/core, so Node's own fetch would be a second one to
 * start). When the runner has a proxy for `baseUrl` (https_proxy/HTTPS_PROXY for an https API,
 * http_proxy/HTTP_PROXY for http; no_proxy/NO_PROXY and loopback addresses bypass it, all looked
 * up as @actions/http-client does), its proxy agent carries every request, redirects included.
 * @example (await clientFetch('https://api.github.com'))('https://api.github.com/meta')
 */
async function clientFetch(baseUrl) {
    const [{ getProxyUrl }, undici] = await Promise.all([__webpack_require__.e(/* import() */ 783).then(__webpack_require__.bind(__webpack_require__, 9783)), __webpack_require__.e(/* import() */ 752).then(__webpack_require__.t.bind(__webpack_require__, 4371, 19))]);
    const send = undici.fetch;
    if (getProxyUrl(new URL(baseUrl)) === undefined)
        return send;
    const { HttpClient } = await Promise.all(/* import() */[__webpack_require__.e(752), __webpack_require__.e(779)]).then(__webpack_require__.bind(__webpack_require__, 2779));
    const dispatcher = new HttpClient('bellgate').getAgentDispatcher(baseUrl);
    return ((url, init) => send(url, { ...init, dispatcher }));
}

;// CONCATENATED MODULE: ./src/github/release-api.ts
const release_api_obj = (v) => (typeof v === 'object' && v !== null ? v : {});
/**
 * @example await createReleaseApi(() => octokit(), { owner: 'acme', repo: 'router' }).listTags() // [{ name: 'v1.2.0', sha: '…' }]
 */
function createReleaseApi(client, repo) {
    return {
        async listTags(maxPages = 10) {
            const tags = [];
            for (let page = 1; page <= maxPages; page++) {
                const res = await (await client()).request('GET /repos/{owner}/{repo}/tags', { ...repo, per_page: 100, page });
                const items = Array.isArray(res.data) ? res.data : [];
                for (const t of items) {
                    const name = release_api_obj(t).name;
                    const sha = release_api_obj(release_api_obj(t).commit).sha;
                    if (typeof name === 'string' && typeof sha === 'string')
                        tags.push({ name, sha });
                }
                if (items.length < 100)
                    break;
            }
            return tags;
        },
        async commitTime(sha) {
            const res = await (await client()).request('GET /repos/{owner}/{repo}/commits/{ref}', { ...repo, ref: sha });
            const date = release_api_obj(release_api_obj(release_api_obj(res.data).commit).committer).date;
            return typeof date === 'string' ? date : undefined;
        },
    };
}

;// CONCATENATED MODULE: ./src/github/octokit-api.ts
/**
 * The real GitHubApi over octokit — the action's one HTTP client: @octokit/core with
 * honourRetryAfter (rate-limit waits as GitHub documents them, and a time limit on every try),
 * @octokit/plugin-retry (5xx, network errors and timeouts, growing backoff) and
 * @octokit/plugin-throttling (content-creating requests spaced apart). The branch store's Git
 * Data calls (git-data.ts), the artifact calls and the PR comment go through it. Behind the
 * runner's proxy (HTTPS_PROXY, HTTP_PROXY, NO_PROXY, read as @actions/http-client reads them)
 * every request, the download's redirect to storage included, goes through that proxy
 * (client-fetch.ts); without one, through the same fetch. Intervals are tunable so tests can run
 * the same code with millisecond waits.
 */







const PER_PAGE = 100;
const octokit_api_obj = (v) => (typeof v === 'object' && v !== null ? v : {});
const num = (v) => (typeof v === 'number' ? v : undefined);
function toArtifact(raw) {
    const a = octokit_api_obj(raw);
    const run = octokit_api_obj(a.workflow_run);
    return {
        id: Number(a.id),
        name: String(a.name ?? ''),
        expired: a.expired === true,
        createdAt: String(a.created_at ?? ''),
        sizeInBytes: num(a.size_in_bytes) ?? 0,
        headBranch: typeof run.head_branch === 'string' ? run.head_branch : undefined,
        headRepositoryId: num(run.head_repository_id),
        repositoryId: num(run.repository_id),
    };
}
/**
 * A stand-in for plugin-throttling's Bottleneck group that spaces content-creating requests
 * `minTime` apart (GitHub asks for about a second between them; the plugin's own group does the
 * same with a fixed 1 s), scaled with the retry unit so tests wait milliseconds.
 */
function spacedGroup(minTime) {
    let next = 0;
    const limiter = {
        schedule: async (_options, job, ...args) => {
            const now = Date.now();
            const at = Math.max(now, next);
            next = at + minTime;
            if (at > now)
                await new Promise((r) => setTimeout(r, at - now));
            return job(...args);
        },
    };
    return { key: () => limiter };
}
function toComment(raw) {
    const c = octokit_api_obj(raw);
    const login = octokit_api_obj(c.user).login;
    return { id: Number(c.id), body: String(c.body ?? ''), author: typeof login === 'string' ? login : undefined };
}
function toCommitPull(raw) {
    const p = octokit_api_obj(raw);
    const text = (v) => (typeof v === 'string' && v !== '' ? v : undefined);
    const pull = {
        number: Number(p.number),
        labels: (Array.isArray(p.labels) ? p.labels : []).map((l) => String(octokit_api_obj(l).name ?? '')),
    };
    const mergedAt = text(p.merged_at);
    const mergeSha = text(p.merge_commit_sha);
    const base = text(octokit_api_obj(p.base).ref);
    if (mergedAt !== undefined)
        pull.mergedAt = mergedAt;
    if (mergeSha !== undefined)
        pull.mergeSha = mergeSha;
    if (base !== undefined)
        pull.base = base;
    return pull;
}
/**
 * Creates the API client for one repository.
 * @example createOctokitApi({ token, baseUrl: 'https://api.github.com', owner: 'acme', repo: 'router' })
 */
function createOctokitApi(target) {
    const tuning = target.retry ?? DEFAULT_RETRY;
    const maxPages = target.maxPages ?? 10;
    const log = target.log ?? (() => undefined);
    // Rate limits are waited out in honourRetryAfter, once; the throttling plugin only spaces
    // writes and logs what reaches it.
    const noRetry = (after, options) => {
        log(`GitHub API rate limit on ${options.method ?? ''} ${options.url ?? ''} (asked to wait ${after} s)`);
        return false;
    };
    // octokit and its plugins (with Bottleneck) load on the first call: a run that never calls the
    // API loads none of it, and a failure there becomes a plain message instead of a crash at start-up.
    let client;
    const octokit = () => (client ??= Promise.all([
        __webpack_require__.e(/* import() */ 561).then(__webpack_require__.bind(__webpack_require__, 5561)),
        Promise.all(/* import() */[__webpack_require__.e(251), __webpack_require__.e(735)]).then(__webpack_require__.bind(__webpack_require__, 9735)),
        Promise.all(/* import() */[__webpack_require__.e(251), __webpack_require__.e(856)]).then(__webpack_require__.bind(__webpack_require__, 6856)),
        clientFetch(target.baseUrl),
    ]).then(([{ Octokit }, { retry }, { throttling }, fetch]) => {
        const Client = Octokit.plugin(honourRetryAfter(tuning, log), retry, throttling);
        return new Client({
            auth: target.token,
            baseUrl: target.baseUrl.replace(/\/+$/, ''),
            userAgent: 'bellgate',
            request: { fetch },
            // 403 and 429 rate limits are waited out by honourRetryAfter, not by plugin-retry.
            retry: {
                retries: tuning.retries,
                retryAfterBaseValue: tuning.unitMs,
                // 409 (a merge conflict) and 422 mean the branch moved: the store re-reads, not the client.
                doNotRetry: [400, 401, 403, 404, 409, 410, 422, 429, 451],
            },
            throttle: {
                onRateLimit: noRetry,
                write: spacedGroup(tuning.unitMs),
                notifications: spacedGroup(3 * tuning.unitMs),
                onSecondaryRateLimit: noRetry,
                retryAfterBaseValue: tuning.unitMs,
            },
            log: { debug: () => undefined, info: () => undefined, warn: log, error: log },
        });
    }));
    const repo = { owner: target.owner, repo: target.repo };
    async function pages(route, params, pick, map) {
        const out = [];
        for (let page = 1; page <= maxPages; page++) {
            const res = await (await octokit()).request(route, { ...repo, ...params, per_page: PER_PAGE, page });
            const items = pick(res.data);
            out.push(...items.map(map));
            if (items.length < PER_PAGE)
                break;
        }
        return out;
    }
    return {
        listArtifacts: (name) => pages('GET /repos/{owner}/{repo}/actions/artifacts', { name }, (d) => (Array.isArray(octokit_api_obj(d).artifacts) ? octokit_api_obj(d).artifacts : []), toArtifact),
        async downloadArtifact(id, maxBytes) {
            // The API answers 302 with a short-lived storage URL, which fetch follows through the same
            // client (proxy, retries of 5xx from storage); a redirect to another origin drops the
            // Authorization header (Fetch standard, "HTTP-redirect fetch"), so the token stays here.
            let res;
            try {
                res = await (await octokit()).request('GET /repos/{owner}/{repo}/actions/artifacts/{artifact_id}/{archive_format}', {
                    ...repo,
                    artifact_id: id,
                    archive_format: 'zip',
                    request: { parseSuccessResponseBody: false },
                });
            }
            catch (error) {
                const status = statusOf(error);
                if (status === 404 || status === 410)
                    throw new ArtifactGoneError(`artifact #${id} answered ${status}`);
                throw error;
            }
            const declared = Number(res.headers['content-length'] ?? 0);
            if (declared > maxBytes) {
                await res.data?.cancel?.();
                throw new Error(`artifact is ${declared} bytes, over the ${maxBytes} byte cap`);
            }
            if (res.data && typeof res.data.getReader === 'function')
                return readCapped(res.data, maxBytes);
            throw new Error(`download of artifact #${id} answered ${res.status} without a body`);
        },
        async deleteArtifact(id) {
            try {
                await (await octokit()).request('DELETE /repos/{owner}/{repo}/actions/artifacts/{artifact_id}', { ...repo, artifact_id: id });
                return 'deleted';
            }
            catch (error) {
                const status = statusOf(error);
                if (status === 403)
                    return 'denied';
                if (status === 404 || status === 410)
                    return 'gone';
                throw error;
            }
        },
        listIssueLabels: (issue) => pages('GET /repos/{owner}/{repo}/issues/{issue_number}/labels', { issue_number: issue }, (d) => (Array.isArray(d) ? d : []), (raw) => String(octokit_api_obj(raw).name ?? '')),
        listCommitPulls: (sha) => pages('GET /repos/{owner}/{repo}/commits/{commit_sha}/pulls', { commit_sha: sha }, (d) => (Array.isArray(d) ? d : []), toCommitPull),
        listIssueComments: (issue) => pages('GET /repos/{owner}/{repo}/issues/{issue_number}/comments', { issue_number: issue }, (d) => (Array.isArray(d) ? d : []), toComment),
        async createIssueComment(issue, body) {
            const res = await (await octokit()).request('POST /repos/{owner}/{repo}/issues/{issue_number}/comments', { ...repo, issue_number: issue, body });
            return toComment(res.data);
        },
        async updateIssueComment(id, body) {
            await (await octokit()).request('PATCH /repos/{owner}/{repo}/issues/comments/{comment_id}', { ...repo, comment_id: id, body });
        },
        // The branch store's calls, through this same client.
        gitData: createGitData(octokit, repo),
        release: createReleaseApi(octokit, repo),
    };
}


/***/ }),

/***/ 5939:
/***/ ((__unused_webpack_module, __webpack_exports__, __webpack_require__) => {

/* harmony export */ __webpack_require__.d(__webpack_exports__, {
/* harmony export */   l: () => (/* binding */ classifyGitDataFailure),
/* harmony export */   x: () => (/* binding */ GitDataError)
/* harmony export */ });
/**
 * The Git Data calls the branch store makes (shaped after the public REST reference,
 * docs.github.com/rest/git: refs, commits, trees, blobs; "Get repository content"; "Merge a
 * branch"), the error they throw, and how a failure answer is classified. src/github/git-data.ts
 * implements them over octokit; tests point it at a loopback stand-in.
 */
/** A Git Data call failed; `kind` says what that means (classifyGitDataFailure). */
class GitDataError extends Error {
    name = 'GitDataError';
    status;
    kind;
    /** Seconds GitHub asked to wait, for a rate limit. */
    retryAfter;
    constructor(message, options) {
        super(message, options.cause === undefined ? undefined : { cause: options.cause });
        this.status = options.status;
        this.kind = options.kind;
        if (options.retryAfter !== undefined)
            this.retryAfter = options.retryAfter;
    }
    /** True when trying again (after a wait) may succeed. */
    get transient() {
        return this.kind === 'transient' || this.kind === 'rate-limited';
    }
}
const PROTECTION = /repository rule|rule violation|protected branch|protected ref|branch protection|ruleset|required status check|status checks? .*expected|changes must be made through a pull request|cannot (update|create) (this )?(protected )?ref/i;
/**
 * The meaning of a failure answer: HTTP `status` (undefined for a network error or a timeout),
 * GitHub's `message`, and `rateWait`, the seconds a rate-limit answer asks to wait (undefined when
 * the answer is not a rate limit; see src/github/retry-after.ts for how it is read).
 * Refs and merges: 422 "Update is not a fast forward", "Reference already exists" and "Reference
 * does not exist", and 409 "Merge conflict", mean the branch moved; a 422 or 409 that speaks of a
 * repository rule, a protected branch or a required status check is a protection that refuses us.
 *
 * @example classifyGitDataFailure(422, 'Repository rule violations found\n\nCannot update this protected ref.', undefined) // { kind: 'protected' }
 */
function classifyGitDataFailure(status, message, rateWait) {
    if (rateWait !== undefined)
        return { kind: 'rate-limited', retryAfter: rateWait };
    if (status === undefined || status >= 500)
        return { kind: 'transient' };
    if ((status === 422 || status === 409 || status === 403) && PROTECTION.test(message))
        return { kind: 'protected' };
    if (status === 409)
        return { kind: 'conflict' };
    if (status === 422)
        return /not a fast[- ]?forward|reference already exists|reference does not exist|merge conflict/i.test(message)
            ? { kind: 'conflict' }
            : { kind: 'other' };
    if (status === 401 || status === 403)
        return { kind: 'denied' };
    if (status === 404)
        return { kind: 'missing' };
    return { kind: 'other' };
}


/***/ })

};
