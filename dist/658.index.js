export const id = 658;
export const ids = [658,278];
export const modules = {

/***/ 63278:
/***/ ((__unused_webpack_module, __webpack_exports__, __webpack_require__) => {

/* harmony export */ __webpack_require__.d(__webpack_exports__, {
/* harmony export */   artifactName: () => (/* binding */ artifactName)
/* harmony export */ });
/* harmony import */ var node_crypto__WEBPACK_IMPORTED_MODULE_0__ = __webpack_require__(77598);
/* harmony import */ var node_crypto__WEBPACK_IMPORTED_MODULE_0___default = /*#__PURE__*/__webpack_require__.n(node_crypto__WEBPACK_IMPORTED_MODULE_0__);

/**
 * The artifact name of a series: readable slug plus a short hash, so distinct series never share a
 * name even when their slugs coincide. Only characters the artifact service accepts. A module of
 * its own so the action can name artifacts without loading the artifact store and its zip reader.
 * @example artifactName('bellgate-history', 'bench/linux') // 'bellgate-history-bench-linux-<8 hex>'
 */
function artifactName(history, series) {
    const slug = series
        .replace(/[^A-Za-z0-9._-]+/g, '-')
        .replace(/^-+|-+$/g, '')
        .slice(0, 60);
    const hash = (0,node_crypto__WEBPACK_IMPORTED_MODULE_0__.createHash)('sha256').update(series).digest('hex').slice(0, 8);
    return slug === '' ? `${history}-${hash}` : `${history}-${slug}-${hash}`;
}


/***/ }),

/***/ 40658:
/***/ ((__unused_webpack_module, __webpack_exports__, __webpack_require__) => {

// ESM COMPAT FLAG
__webpack_require__.r(__webpack_exports__);

// EXPORTS
__webpack_require__.d(__webpack_exports__, {
  ArtifactGoneError: () => (/* binding */ ArtifactGoneError),
  HISTORY_FILE: () => (/* binding */ HISTORY_FILE),
  MERGED_FILE: () => (/* binding */ MERGED_FILE),
  artifactName: () => (/* reexport */ artifact_name.artifactName),
  createArtifactStore: () => (/* binding */ createArtifactStore)
});

// EXTERNAL MODULE: ./src/history/changes.ts
var changes = __webpack_require__(55201);
// EXTERNAL MODULE: ./src/history/document.ts
var history_document = __webpack_require__(78363);
// EXTERNAL MODULE: ./src/history/history.ts
var history_history = __webpack_require__(43328);
// EXTERNAL MODULE: ./src/history/merge.ts
var merge = __webpack_require__(74292);
// EXTERNAL MODULE: ./src/history/store.ts
var store = __webpack_require__(84689);
// EXTERNAL MODULE: external "node:zlib"
var external_node_zlib_ = __webpack_require__(38522);
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
function readZipEntries(bytes, wanted, limits = DEFAULT_ZIP_LIMITS) {
    const buf = Buffer.from(bytes.buffer, bytes.byteOffset, bytes.byteLength);
    const entries = centralDirectory(buf, limits);
    let declared = 0;
    for (const e of entries) {
        if (leavesFolder(e.name))
            throw new ZipRefusedError(`entry "${e.name}" would leave its folder`);
        declared += e.size;
    }
    if (declared > limits.maxUnzippedBytes)
        throw new ZipRefusedError(`it declares ${declared} unzipped bytes, more than the ${limits.maxUnzippedBytes} allowed`);
    const out = new Map();
    for (const e of entries) {
        if (!wanted.includes(e.name) || out.has(e.name))
            continue;
        const data = inflateEntry(buf, e);
        try {
            out.set(e.name, new TextDecoder('utf-8', { fatal: true }).decode(data));
        }
        catch {
            throw new ZipRefusedError(`${e.name} is not UTF-8 text`);
        }
    }
    return out;
}
/** Returns the text of entry `fileName`; throws ZipRefusedError when it is missing (see readZipEntries). */
function readZipEntry(bytes, fileName, limits = DEFAULT_ZIP_LIMITS) {
    const text = readZipEntries(bytes, [fileName], limits).get(fileName);
    if (text === undefined)
        throw new ZipRefusedError(`no ${fileName} in the zip`);
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
        throw new ZipRefusedError('not a readable zip (no end of central directory record)');
    let count = buf.readUInt16LE(end + 10);
    let size = buf.readUInt32LE(end + 12);
    let offset = buf.readUInt32LE(end + 16);
    if (buf.readUInt16LE(end + 4) !== 0 || buf.readUInt16LE(end + 6) !== 0)
        throw new ZipRefusedError('a zip split over several disks is not read');
    if (count === 0xffff || size === 0xffffffff || offset === 0xffffffff) {
        const locator = end - 20;
        if (locator < 0 || buf.readUInt32LE(locator) !== ZIP64_LOCATOR)
            throw new ZipRefusedError('not a readable zip (a ZIP64 end record is announced but missing)');
        const at = Number(buf.readBigUInt64LE(locator + 8));
        if (!Number.isSafeInteger(at) || at < 0 || at + 56 > locator || buf.readUInt32LE(at) !== ZIP64_EOCD)
            throw new ZipRefusedError('not a readable zip (the ZIP64 end record is out of place)');
        const big = (n) => (n > BigInt(Number.MAX_SAFE_INTEGER) ? Infinity : Number(n));
        count = big(buf.readBigUInt64LE(at + 32));
        size = big(buf.readBigUInt64LE(at + 40));
        offset = big(buf.readBigUInt64LE(at + 48));
        end = at;
    }
    if (count > limits.maxEntries)
        throw new ZipRefusedError(`it claims ${count} entries, more than the ${limits.maxEntries} allowed`);
    if (!(offset + size <= end))
        throw new ZipRefusedError('not a readable zip (the central directory lies outside it)');
    const entries = [];
    let at = offset;
    for (let i = 0; i < count; i++) {
        if (at + 46 > offset + size || buf.readUInt32LE(at) !== CENTRAL)
            throw new ZipRefusedError(`not a readable zip (central directory entry ${i + 1} is damaged)`);
        const flags = buf.readUInt16LE(at + 8);
        const nameLength = buf.readUInt16LE(at + 28);
        const next = at + 46 + nameLength + buf.readUInt16LE(at + 30) + buf.readUInt16LE(at + 32);
        if (next > offset + size)
            throw new ZipRefusedError(`not a readable zip (central directory entry ${i + 1} is cut short)`);
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
            throw new ZipRefusedError(`entry "${name}" is encrypted`);
        if (entry.size === 0xffffffff || entry.compressed === 0xffffffff || entry.localOffset === 0xffffffff)
            throw new ZipRefusedError(`entry "${name}" is a ZIP64 entry (over 4 GiB), which is not read`);
        entries.push(entry);
        at = next;
    }
    return entries;
}
function inflateEntry(buf, e) {
    const at = e.localOffset;
    if (at + 30 > buf.length || buf.readUInt32LE(at) !== LOCAL)
        throw new ZipRefusedError(`not a readable zip (the local header of "${e.name}" is missing)`);
    const start = at + 30 + buf.readUInt16LE(at + 26) + buf.readUInt16LE(at + 28);
    if (start + e.compressed > buf.length)
        throw new ZipRefusedError(`entry "${e.name}" runs past the end of the zip`);
    const raw = buf.subarray(start, start + e.compressed);
    let data;
    if (e.method === 0)
        data = raw;
    else if (e.method === 8) {
        try {
            // Stops once the output passes the declared size (maxOutputLength must be at least 1).
            data = (0,external_node_zlib_.inflateRawSync)(raw, { maxOutputLength: Math.max(1, e.size) });
        }
        catch (cause) {
            if (cause.code === 'ERR_BUFFER_TOO_LARGE')
                throw new ZipRefusedError(`entry "${e.name}" inflates past the ${e.size} bytes it declares; inflating stopped there`);
            throw new ZipRefusedError(`entry "${e.name}" is not readable deflate data (${cause.message})`);
        }
    }
    else
        throw new ZipRefusedError(`entry "${e.name}" uses compression method ${e.method}, which is not read`);
    if (data.length !== e.size)
        throw new ZipRefusedError(`entry "${e.name}" holds ${data.length} bytes, not the ${e.size} it declares`);
    if ((0,external_node_zlib_.crc32)(data) >>> 0 !== e.crc >>> 0)
        throw new ZipRefusedError(`entry "${e.name}" fails its CRC-32 check`);
    return data;
}

// EXTERNAL MODULE: ./src/history/artifact-name.ts
var artifact_name = __webpack_require__(63278);
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
    const name = (0,artifact_name.artifactName)(options.history, options.series);
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
        const history = (0,history_document/* parseHistory */.i6)(text, `${where} #${entry.id}/${HISTORY_FILE}`, newest === undefined ? {} : { newest });
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
            throw new store/* StoreError */.A(`cannot download history artifact #${entry.id}: ${messageOf(cause)}`, {
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
        let merged = (0,history_history/* emptyHistory */.s4)(options.series);
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
                merged = (0,merge/* mergeHistories */.dk)(one.history, merged);
                good += 1;
            }
            catch (cause) {
                if (cause instanceof store/* StoreError */.A)
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
            throw new store/* StoreError */.A(`none of the ${bad} history artifacts "${name}" could be read`, {
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
            const { history, replaced } = (0,changes/* applyChange */.hX)(stored, change);
            let uploaded;
            try {
                uploaded = await options.upload(name, [
                    { name: HISTORY_FILE, text: (0,history_document/* serializeHistory */.ph)(history) },
                    { name: MERGED_FILE, text: `${JSON.stringify({ artifacts: covered })}\n` },
                ], options.retentionDays);
            }
            catch (cause) {
                throw new store/* StoreError */.A(`cannot upload the history artifact "${name}": ${messageOf(cause)}`, {
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


/***/ })

};
