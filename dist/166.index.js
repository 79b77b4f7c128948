export const id = 166;
export const ids = [166,148];
export const modules = {

/***/ 75939:
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


/***/ }),

/***/ 39148:
/***/ ((__unused_webpack_module, __webpack_exports__, __webpack_require__) => {

/* harmony export */ __webpack_require__.d(__webpack_exports__, {
/* harmony export */   DEFAULT_DATA_BRANCH: () => (/* binding */ DEFAULT_DATA_BRANCH),
/* harmony export */   dataBranchName: () => (/* binding */ dataBranchName),
/* harmony export */   h: () => (/* binding */ seriesFilePath)
/* harmony export */ });
/* unused harmony export BRANCH_FOLDER */
/* harmony import */ var node_crypto__WEBPACK_IMPORTED_MODULE_0__ = __webpack_require__(77598);
/* harmony import */ var node_crypto__WEBPACK_IMPORTED_MODULE_0___default = /*#__PURE__*/__webpack_require__.n(node_crypto__WEBPACK_IMPORTED_MODULE_0__);
/* harmony import */ var _errors_input_error_js__WEBPACK_IMPORTED_MODULE_1__ = __webpack_require__(33712);
/* harmony import */ var _series_slug_js__WEBPACK_IMPORTED_MODULE_2__ = __webpack_require__(78547);
/**
 * Names on the data branch: the branch itself (checked against git's ref-name rules so a typo is an
 * input error, not a 422 from the API) and the file of one series, `bellgate/<slug>-<hash>.json`.
 */



/** The data branch used when the `history` input is left at its default. */
const DEFAULT_DATA_BRANCH = 'bellgate-data';
/** The folder on the data branch that holds one history file per series. */
const BRANCH_FOLDER = 'bellgate';
/**
 * The file of a series on the data branch: a readable slug (letters, digits, `.`, `_`, `-`; no
 * leading dot, so never `..` or a hidden file) plus 8 hex of SHA-256 of the exact series name, so
 * series whose slugs coincide ("a/b", "a b") still get different files. Any string is safe.
 * @example seriesFilePath('bench/linux') // 'bellgate/bench-linux-<8 hex>.jsonl'
 */
function seriesFilePath(series) {
    const slug = (0,_series_slug_js__WEBPACK_IMPORTED_MODULE_2__/* .seriesSlug */ .B)(series);
    const hash = (0,node_crypto__WEBPACK_IMPORTED_MODULE_0__.createHash)('sha256').update(series, 'utf8').digest('hex').slice(0, 8);
    return `${BRANCH_FOLDER}/${slug === '' ? hash : `${slug}-${hash}`}.jsonl`;
}
/**
 * Checks a branch name against the rules of git's check-ref-format (from memory: no `..`, no
 * control characters, space, `~ ^ : ? * [ \`, no `@{`, no component starting with `.` or ending in
 * `.lock`, no leading `-`, no empty component, not `@`). Returns the name without `refs/heads/`.
 * @throws InputError naming the rule and the input.
 * @example dataBranchName('refs/heads/bellgate-data') // 'bellgate-data'
 */
function dataBranchName(raw) {
    const name = raw.trim().replace(/^refs\/heads\//, '');
    const bad = (why) => {
        throw new _errors_input_error_js__WEBPACK_IMPORTED_MODULE_1__/* .InputError */ .dz(`input \`history\` is ${JSON.stringify(raw)}, which cannot be a branch name: ${why}`, {
            where: 'input history',
            fix: `name the data branch with letters, digits, dashes and slashes, e.g. \`history: ${DEFAULT_DATA_BRANCH}\``,
        });
    };
    if (name === '' || name === '@')
        bad('it is empty');
    if (name.length > 200)
        bad('it is longer than 200 characters');
    if (/[\u0000-\u0020\u007f~^:?*[\\]/.test(name))
        bad('it holds a space, a control character or one of ~ ^ : ? * [ \\');
    if (name.includes('..') || name.includes('@{'))
        bad('it holds ".." or "@{"');
    if (name.startsWith('-'))
        bad('it starts with "-"');
    for (const part of name.split('/')) {
        if (part === '')
            bad('it has an empty path component (a leading, trailing or double "/")');
        if (part.startsWith('.') || part.endsWith('.lock'))
            bad('a component starts with "." or ends with ".lock"');
    }
    if (name.endsWith('.'))
        bad('it ends with "."');
    return name;
}


/***/ }),

/***/ 42166:
/***/ ((__unused_webpack_module, __webpack_exports__, __webpack_require__) => {

/* harmony export */ __webpack_require__.d(__webpack_exports__, {
/* harmony export */   createBranchStore: () => (/* binding */ createBranchStore)
/* harmony export */ });
/* harmony import */ var _errors_input_error_js__WEBPACK_IMPORTED_MODULE_0__ = __webpack_require__(33712);
/* harmony import */ var _changes_js__WEBPACK_IMPORTED_MODULE_1__ = __webpack_require__(55201);
/* harmony import */ var _branch_api_js__WEBPACK_IMPORTED_MODULE_2__ = __webpack_require__(75939);
/* harmony import */ var _branch_path_js__WEBPACK_IMPORTED_MODULE_3__ = __webpack_require__(39148);
/* harmony import */ var _document_js__WEBPACK_IMPORTED_MODULE_4__ = __webpack_require__(78363);
/* harmony import */ var _history_js__WEBPACK_IMPORTED_MODULE_6__ = __webpack_require__(43328);
/* harmony import */ var _store_js__WEBPACK_IMPORTED_MODULE_5__ = __webpack_require__(84689);
/**
 * The `branch` history store: one JSON Lines document per series on a data branch (default
 * `bellgate-data`), at `bellgate/<series slug>-<hash>.jsonl`, written through the Git Data API.
 *
 * - read: branch head -> its commit (tree) -> the file (contents API) -> its blob. No branch or no
 *   file is an empty history; a file that is not a readable history of this series is a StoreError
 *   and is never written over. Passing faults are retried.
 * - update: reads, applies the change to what the branch holds (applyChange), and writes three
 *   content-creating requests: a tree on the head's tree with the file's new text (the server
 *   writes the blob), a commit on the head, and a server-side merge of that commit into the branch
 *   ("Merge a branch"). The merge is what lets a wide matrix through: legs that record different
 *   series change different files, so their merges never conflict however many race, and each
 *   leg costs exactly those three requests — 24 legs make 72, inside GitHub's documented 80
 *   content-creating requests a minute. A merge that conflicts (the same series written meanwhile)
 *   re-reads and tries again after a backoff with jitter, at most `attempts` times. The document
 *   keeps one run a line with the header's metric order stable, so even a line-wise merge of two
 *   changes to one file (a drop and a record) keeps the meaning of both. A missing branch is
 *   created as an orphan commit holding only the history folder.
 * - Failures: a branch protection rule or ruleset that refuses the write fails at once, saying how
 *   to exempt the data branch; a rate limit waits as long as GitHub asked (the octokit plugin does
 *   the first waits, see src/github/retry-after.ts, and the store a few more); 401/403 name the
 *   permission.
 * - Needs `permissions: contents: write` to record (`contents: read` to check).
 */







/**
 * @example const store = createBranchStore({ api, branch: 'bellgate-data', series: 'bench/linux' });
 * await store.update({ kind: 'record', info, run, keep: 4000 });
 */
function createBranchStore(options) {
    const { api, branch, series } = options;
    const path = (0,_branch_path_js__WEBPACK_IMPORTED_MODULE_3__/* .seriesFilePath */ .h)(series);
    const where = `branch ${branch} (${path})`;
    const attempts = Math.max(1, options.attempts ?? 8);
    const unitMs = options.unitMs ?? 1000;
    const random = options.random ?? Math.random;
    const maxBytes = options.maxBytes ?? 64 * 1024 * 1024;
    const rateLimitWaits = options.rateLimitWaits ?? 6;
    async function snapshot(newest) {
        const head = await api.getBranchHead(branch);
        if (head === undefined)
            return { stored: (0,_history_js__WEBPACK_IMPORTED_MODULE_6__/* .emptyHistory */ .s4)(series) };
        const tree = await api.getCommitTree(head);
        const file = await api.findFile(path, head);
        if (file === undefined)
            return { head, tree, stored: (0,_history_js__WEBPACK_IMPORTED_MODULE_6__/* .emptyHistory */ .s4)(series) };
        if (file.size > maxBytes) {
            throw new _store_js__WEBPACK_IMPORTED_MODULE_5__/* .StoreError */ .A(`the history file is ${file.size} bytes, over the ${maxBytes} byte limit; it was left as it is`, {
                where,
                fix: 'lower `keep` so the history stays smaller',
            });
        }
        const text = await api.getBlobText(file.sha);
        let stored;
        try {
            stored = (0,_document_js__WEBPACK_IMPORTED_MODULE_4__/* .parseHistory */ .i6)(text, `${branch}:${path}`, newest === undefined ? {} : { newest });
        }
        catch (cause) {
            if (!(cause instanceof _errors_input_error_js__WEBPACK_IMPORTED_MODULE_0__/* .InputError */ .dz))
                throw cause;
            throw new _store_js__WEBPACK_IMPORTED_MODULE_5__/* .StoreError */ .A(`the history file is not a readable history document (${cause.where ?? path}: ${cause.message}); it was left as it is`, { where, fix: cause.fix ?? 'repair or delete the file on the data branch', cause });
        }
        if (stored.series !== series)
            throw new _store_js__WEBPACK_IMPORTED_MODULE_5__/* .StoreError */ .A(`the file holds series ${JSON.stringify(stored.series)}, not ${JSON.stringify(series)}`, {
                where,
                fix: 'give each series its own file (the series name picks it)',
            });
        return { head, tree, stored, text };
    }
    function failure(error, doing) {
        if (error instanceof _store_js__WEBPACK_IMPORTED_MODULE_5__/* .StoreError */ .A)
            return error;
        const reason = error instanceof Error ? error.message : String(error);
        const kind = error instanceof _branch_api_js__WEBPACK_IMPORTED_MODULE_2__/* .GitDataError */ .x ? error.kind : 'other';
        const fix = kind === 'protected'
            ? `exempt the data branch ${branch} from the branch protection rule or ruleset that refuses the write (or let GitHub Actions bypass it), or name an unprotected branch with the \`history\` input`
            : kind === 'denied'
                ? 'give the job `permissions: contents: write` (contents: read to only check) and check the token'
                : kind === 'rate-limited'
                    ? 'GitHub rate-limited the writes; run the job again later, or record fewer series at once'
                    : 'run the job again; the history on the branch was left as it was';
        return new _store_js__WEBPACK_IMPORTED_MODULE_5__/* .StoreError */ .A(`cannot ${doing} the data branch: ${reason}`, { where, fix, cause: error });
    }
    /** Commits `text` on the snapshot's head and merges it into the branch (or creates the branch). */
    async function write(snap, text, runs) {
        const files = [{ path, text }];
        const message = `bellgate: history of ${JSON.stringify(series.slice(0, 100))}, ${runs} runs`;
        if (snap.head === undefined) {
            const commit = await api.createCommit(message, await api.createTree(files), []);
            await api.createBranch(branch, commit);
            return;
        }
        const commit = await api.createCommit(message, await api.createTree(files, snap.tree), [snap.head]);
        await api.mergeIntoBranch(branch, commit, `bellgate: merge ${message.slice('bellgate: '.length)}`);
    }
    /**
     * Runs `step` until it succeeds: conflicts and passing faults are retried after a backoff with
     * jitter (at most `attempts` of each), rate limits after the wait GitHub asked for (at most
     * rateLimitWaits of them); anything else fails at once.
     */
    async function retrying(doing, step) {
        let conflicts = 0;
        let faults = 0;
        let limits = 0;
        let last;
        for (;;) {
            try {
                return await step();
            }
            catch (error) {
                // A change that does not apply (InputError) says so plainly; it is not a store failure.
                if (error instanceof _errors_input_error_js__WEBPACK_IMPORTED_MODULE_0__/* .InputError */ .dz)
                    throw error;
                if (!(error instanceof _branch_api_js__WEBPACK_IMPORTED_MODULE_2__/* .GitDataError */ .x))
                    throw failure(error, doing);
                last = error;
                let wait;
                if (error.kind === 'conflict' || error.kind === 'missing') {
                    conflicts += 1;
                    if (conflicts >= attempts)
                        break;
                    wait = backoff(conflicts - 1);
                }
                else if (error.kind === 'transient') {
                    faults += 1;
                    if (faults >= attempts)
                        break;
                    wait = backoff(faults - 1);
                }
                else if (error.kind === 'rate-limited') {
                    limits += 1;
                    if (limits > rateLimitWaits)
                        throw failure(error, doing);
                    // As GitHub asks; when it did not say, at least a minute, growing (its documented rule).
                    wait = (error.retryAfter ?? 60 * 2 ** Math.min(limits - 1, 4)) * unitMs;
                }
                else
                    throw failure(error, doing);
                await new Promise((r) => setTimeout(r, wait));
            }
        }
        throw new _store_js__WEBPACK_IMPORTED_MODULE_5__/* .StoreError */ .A(`gave up after ${attempts} tries (last: ${last instanceof Error ? last.message : String(last)}); the history on the branch is whole, but this run may not be recorded`, { where, fix: 'run the job again; if writers of one series collide often, record it from one job' });
    }
    /** Full jitter on a doubling step, capped at 60 units: writers that collided do not collide again in step. */
    function backoff(attempt) {
        return Math.min(60 * unitMs, unitMs * 2 ** Math.min(attempt, 16) * (0.5 + random()));
    }
    return {
        describe: () => where,
        async read(readOptions = {}) {
            // A read changes nothing, so a passing fault is simply tried again.
            return (await retrying('read', () => snapshot(readOptions.newest))).stored;
        },
        async update(change) {
            return retrying('write to', async () => {
                const snap = await snapshot();
                const { history, replaced } = (0,_changes_js__WEBPACK_IMPORTED_MODULE_1__/* .applyChange */ .hX)(snap.stored, change);
                const text = (0,_document_js__WEBPACK_IMPORTED_MODULE_4__/* .serializeHistory */ .ph)(history);
                if (text !== snap.text)
                    await write(snap, text, history.runs.length);
                const outcome = { runs: history.runs.length, wrote: 'rewritten' };
                if (replaced !== undefined)
                    outcome.replaced = replaced;
                return outcome;
            });
        },
    };
}


/***/ })

};
