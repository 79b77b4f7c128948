export const id = 788;
export const ids = [788];
export const modules = {

/***/ 74788:
/***/ ((__unused_webpack_module, __webpack_exports__, __webpack_require__) => {


// EXPORTS
__webpack_require__.d(__webpack_exports__, {
  createBranchStore: () => (/* binding */ createBranchStore)
});

// EXTERNAL MODULE: ./src/model/input-error.ts + 1 modules
var input_error = __webpack_require__(71184);
// EXTERNAL MODULE: ./src/history/branch-api.ts
var branch_api = __webpack_require__(75939);
// EXTERNAL MODULE: ./src/history/branch-backoff.ts
var branch_backoff = __webpack_require__(40363);
// EXTERNAL MODULE: ./src/history/merge.ts + 3 modules
var merge = __webpack_require__(2278);
;// CONCATENATED MODULE: ./src/history/branch-combine.ts

/**
 * What the branch store writes when the branch moved after its load: every run of `stored` that
 * `h` neither holds nor deleted on purpose (`deleted`: ids that were loaded and that h no longer
 * has, i.e. trimmed away), plus all of `h`; h's copy wins a shared id. Unlike a cut by time, this
 * keeps a concurrent writer's run even when its time is older than all of h's. Pure; the
 * result's `trimmed` is h's.
 *
 * @example combineWithStored(mine, onBranch, new Set()).runs // union by run id, time order
 */
function combineWithStored(h, stored, deleted) {
    const mine = new Set(h.runs.map((r) => r.id));
    const keep = [];
    stored.runs.forEach((r, i) => {
        if (!mine.has(r.id) && !deleted.has(r.id))
            keep.push(i);
    });
    if (keep.length === 0)
        return h;
    const columns = new Map();
    for (const [name, column] of stored.columns) {
        const values = keep.map((i) => column.values[i] ?? NaN);
        if (!values.some((v) => !Number.isNaN(v)))
            continue;
        columns.set(name, column.unit === undefined ? { values } : { unit: column.unit, values });
    }
    const theirs = { series: h.series, runs: keep.map((i) => ({ ...stored.runs[i] })), columns };
    const combined = (0,merge/* mergeHistories */.dk)(theirs, h);
    if (h.trimmed === undefined)
        delete combined.trimmed;
    else
        combined.trimmed = h.trimmed;
    return combined;
}

// EXTERNAL MODULE: ./src/history/branch-path.ts
var branch_path = __webpack_require__(39148);
// EXTERNAL MODULE: ./src/history/document.ts + 5 modules
var history_document = __webpack_require__(70516);
// EXTERNAL MODULE: ./src/history/history.ts
var history_history = __webpack_require__(43328);
// EXTERNAL MODULE: ./src/history/store.ts
var store = __webpack_require__(84689);
;// CONCATENATED MODULE: ./src/history/branch-store.ts
/**
 * The `branch` history store: one JSON document per series on a data branch (default
 * `bellgate-data`), at `bellgate/<series slug>-<hash>.json`, written through the Git Data API.
 *
 * - load: branch head -> the file at that commit (contents API) -> its blob. No branch or no file
 *   is an empty history; a file that is not a readable history of this series is a StoreError and
 *   is never overwritten. Transient API failures are retried like a save's (`attempts`).
 * - save: blob -> tree (base_tree = the head's tree, so other series' files stay) -> commit (parent
 *   = the head) -> ref update with force false. When the branch moved meanwhile the update is
 *   refused (422/409); the store re-reads, keeps the runs the other writer added (union by run id,
 *   minus what this history trimmed on purpose) and tries again after a backoff with jitter, at
 *   most `attempts` times. Each try is one commit moved into place by one ref update, so the branch
 *   holds either the old document or the new one, never half. A missing branch is created as an
 *   orphan commit holding only the history folder (no code, no need to read the default branch).
 * - Needs `permissions: contents: write` to record (`contents: read` to check).
 */








/**
 * @example const store = createBranchStore({ api: createGitDataClient(target), branch: 'bellgate-data', series: 'bench/linux' });
 * await store.save(appendRun(await store.load(), info, run), readCount);
 */
function createBranchStore(options) {
    const { api, branch, series } = options;
    const path = (0,branch_path/* seriesFilePath */.hq)(series);
    const where = `branch ${branch} (${path})`;
    const attempts = Math.max(1, options.attempts ?? 6);
    const unitMs = options.unitMs ?? 1000;
    const random = options.random ?? Math.random;
    const maxBytes = options.maxBytes ?? 32 * 1024 * 1024;
    let loaded;
    let loadedIds = new Set();
    async function read() {
        const head = await api.getBranchHead(branch);
        if (head === undefined)
            return { stored: (0,history_history/* emptyHistory */.s)(series) };
        const file = await api.findFile(path, head);
        if (file === undefined)
            return { head, stored: (0,history_history/* emptyHistory */.s)(series) };
        if (file.size > maxBytes) {
            throw new store/* StoreError */.A(`the history file is ${file.size} bytes, over the ${maxBytes} byte limit; it was left as it is`, { where, fix: 'lower `keep` and trim the history with the CLI' });
        }
        const text = await api.getBlobText(file.sha);
        let stored;
        try {
            stored = (0,history_document/* parseHistory */.i6)(text, `${branch}:${path}`);
        }
        catch (cause) {
            if (!(cause instanceof input_error/* InputError */.d))
                throw cause;
            throw new store/* StoreError */.A(`the history file is not a readable history document (${cause.message}); it was left as it is`, { where, fix: cause.fix ?? 'repair or delete the file on the data branch', cause });
        }
        if (stored.series !== series)
            throw new store/* StoreError */.A(`the file holds series ${JSON.stringify(stored.series)}, not ${JSON.stringify(series)}`, { where, fix: 'give each series its own file (the series name picks it)' });
        return { head, stored, text };
    }
    function failure(error, doing) {
        if (error instanceof store/* StoreError */.A)
            return error;
        const status = error instanceof branch_api/* GitDataError */.x ? error.status : undefined;
        const denied = status === 401 || status === 403 || status === 404;
        return new store/* StoreError */.A(`cannot ${doing} the data branch: ${error instanceof Error ? error.message : String(error)}`, {
            where,
            fix: denied ? 'give the job `permissions: contents: write` (contents: read to only check) and check the token' : 'run the job again; the history on the branch was left as it was',
            cause: error,
        });
    }
    async function write(snap, text, runs) {
        const blob = await api.createBlob(text);
        const entries = [{ path, mode: '100644', type: 'blob', sha: blob }];
        const message = `bellgate: history of ${JSON.stringify(series.slice(0, 100))}, ${runs} runs`;
        if (snap.head === undefined) {
            const commit = await api.createCommit(message, await api.createTree(entries), []);
            await api.createBranch(branch, commit);
            return commit;
        }
        const tree = await api.createTree(entries, await api.getCommitTree(snap.head));
        const commit = await api.createCommit(message, tree, [snap.head]);
        await api.updateBranch(branch, commit);
        return commit;
    }
    return {
        describe: () => where,
        async load() {
            // A read changes nothing, so a transient failure is simply tried again, as often as a save would.
            let snap;
            for (let attempt = 0; snap === undefined; attempt++) {
                try {
                    snap = await read();
                }
                catch (error) {
                    if (!(error instanceof branch_api/* GitDataError */.x && error.transient) || attempt + 1 >= attempts)
                        throw failure(error, 'read');
                    await new Promise((r) => setTimeout(r, (0,branch_backoff/* backoffMs */.j)(attempt, unitMs, random, error.retryAfter)));
                }
            }
            loaded = snap;
            loadedIds = new Set(snap.stored.runs.map((r) => r.id));
            return snap.stored;
        },
        async save(h, readCount) {
            if (h.series !== series)
                throw new store/* StoreError */.A(`refusing to save series ${JSON.stringify(h.series)} into the history of ${JSON.stringify(series)}`, { where });
            (0,store/* guardAgainstLoss */.y)(where, h, Math.max(readCount, loadedIds.size));
            const kept = new Set(h.runs.map((r) => r.id));
            const deleted = new Set([...loadedIds].filter((id) => !kept.has(id)));
            let snap = loaded;
            let last;
            for (let attempt = 0; attempt < attempts; attempt++) {
                try {
                    snap ??= await read();
                    const next = combineWithStored(h, snap.stored, deleted);
                    // Runs on the branch are only ever dropped by this history's own trim.
                    (0,store/* guardAgainstLoss */.y)(where, next, snap.stored.runs.filter((r) => !deleted.has(r.id)).length);
                    const text = (0,history_document/* serializeHistory */.ph)(next);
                    if (text !== snap.text)
                        snap = { head: await write(snap, text, next.runs.length), stored: next, text };
                    loaded = snap;
                    loadedIds = new Set(next.runs.map((r) => r.id));
                    return;
                }
                catch (error) {
                    if (!(error instanceof branch_api/* GitDataError */.x) || !(error.conflict || error.transient))
                        throw failure(error, 'write to');
                    last = error;
                    snap = undefined;
                    if (attempt + 1 < attempts)
                        await new Promise((r) => setTimeout(r, (0,branch_backoff/* backoffMs */.j)(attempt, unitMs, random, error.retryAfter)));
                }
            }
            throw new store/* StoreError */.A(`gave up after ${attempts} tries (last: ${last instanceof Error ? last.message : String(last)}); the history on the branch is whole, but this run may not be recorded`, {
                where,
                fix: 'run the job again; if writers collide often, give each matrix job its own series',
            });
        },
    };
}


/***/ })

};
