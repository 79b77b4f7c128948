export const id = 943;
export const ids = [943];
export const modules = {

/***/ 31954:
/***/ ((__unused_webpack_module, __webpack_exports__, __webpack_require__) => {

/* harmony export */ __webpack_require__.d(__webpack_exports__, {
/* harmony export */   sb: () => (/* binding */ defaultConfig)
/* harmony export */ });
/* unused harmony exports DEFAULT_SETTINGS, DEFAULT_LIMITS, DEFAULT_KEEP */
/**
 * Settings of a metric that no rule touches (DESIGN.md, "Config file"). A 1% tolerance keeps a
 * metric with a tiny spread from failing on a change nobody would act on.
 */
const DEFAULT_SETTINGS = Object.freeze({
    cutoff: 0.01,
    worse: 'higher',
    tolerance: Object.freeze({ kind: 'percent', amount: 0.01 }),
    resolution: 0,
    window: 60,
    minRuns: 8,
    transform: 'none',
    fit: 'mle',
    uncertainty: 'predictive',
    ignore: false,
    aggregate: 'median',
    changePoints: true,
});
/** Limits that fit ordinary CI output: 64 MiB files, 1 MiB lines, 100,000 metrics a run. */
const DEFAULT_LIMITS = Object.freeze({
    maxFileBytes: 64 * 1024 * 1024,
    maxLineLength: 1024 * 1024,
    maxMetrics: 100_000,
});
/** Newest runs kept in a history document. */
const DEFAULT_KEEP = 500;
/**
 * The configuration used when there is no file (or it is empty): a fresh, mutable copy each call.
 * @example defaultConfig().defaults.cutoff // 0.01
 */
function defaultConfig() {
    return {
        defaults: { ...DEFAULT_SETTINGS, tolerance: { ...DEFAULT_SETTINGS.tolerance } },
        rules: [],
        groups: [],
        family: 'none',
        keep: DEFAULT_KEEP,
        limits: { ...DEFAULT_LIMITS },
        source: '<defaults>',
    };
}


/***/ }),

/***/ 55562:
/***/ ((__unused_webpack_module, __webpack_exports__, __webpack_require__) => {

/* harmony export */ __webpack_require__.d(__webpack_exports__, {
/* harmony export */   _X: () => (/* binding */ DEFAULT_CONFIG_PATHS),
/* harmony export */   yH: () => (/* binding */ loadConfigLazily)
/* harmony export */ });
/* unused harmony export anyConfigPresent */
/* harmony import */ var node_fs_promises__WEBPACK_IMPORTED_MODULE_0__ = __webpack_require__(51455);
/* harmony import */ var node_fs_promises__WEBPACK_IMPORTED_MODULE_0___default = /*#__PURE__*/__webpack_require__.n(node_fs_promises__WEBPACK_IMPORTED_MODULE_0__);
/* harmony import */ var node_path__WEBPACK_IMPORTED_MODULE_1__ = __webpack_require__(76760);
/* harmony import */ var node_path__WEBPACK_IMPORTED_MODULE_1___default = /*#__PURE__*/__webpack_require__.n(node_path__WEBPACK_IMPORTED_MODULE_1__);
/* harmony import */ var _defaults_js__WEBPACK_IMPORTED_MODULE_2__ = __webpack_require__(31954);



/** Where a config is looked for when none is named, relative to the working folder. */
const DEFAULT_CONFIG_PATHS = ['.github/bellgate.yml', '.github/bellgate.yaml'];
/**
 * Whether any of the paths might hold a config: true unless every one is plainly absent (ENOENT,
 * ENOTDIR), so a folder or an unreadable file still reaches readConfigFile and its clear refusal.
 */
async function anyConfigPresent(cwd, paths = DEFAULT_CONFIG_PATHS) {
    for (const p of paths) {
        try {
            await (0,node_fs_promises__WEBPACK_IMPORTED_MODULE_0__.stat)((0,node_path__WEBPACK_IMPORTED_MODULE_1__.resolve)(cwd, p));
            return true;
        }
        catch (error) {
            const code = error.code;
            if (code !== 'ENOENT' && code !== 'ENOTDIR')
                return true;
        }
    }
    return false;
}
/**
 * The config for a run: a named file must exist (unless `required` is false); without a name,
 * `.github/bellgate.yml` (or `.yaml`) is read when present, else the defaults are used. The reader
 * (the YAML library, ~290 KB, and the generated schema validator) is imported only when there is
 * a file to read, picomatch only when its rules hold real globs; this module itself loads none.
 * @throws InputError for a missing named file or an invalid config (with file:line:col).
 * @example await loadConfigLazily(undefined, '/repo') // the defaults in a folder without a config file
 */
async function loadConfigLazily(path, cwd, required = path !== undefined) {
    if (path === undefined && !(await anyConfigPresent(cwd)))
        return (0,_defaults_js__WEBPACK_IMPORTED_MODULE_2__/* .defaultConfig */ .sb)();
    const { readConfigFile } = await Promise.all(/* import() */[__webpack_require__.e(815), __webpack_require__.e(110)]).then(__webpack_require__.bind(__webpack_require__, 61110));
    return readConfigFile(path, { cwd, required });
}


/***/ }),

/***/ 6471:
/***/ ((__unused_webpack_module, __webpack_exports__, __webpack_require__) => {

/* harmony export */ __webpack_require__.d(__webpack_exports__, {
/* harmony export */   Bz: () => (/* binding */ useFallbackCompiler),
/* harmony export */   Cp: () => (/* binding */ exactNameCompiler),
/* harmony export */   Gh: () => (/* binding */ exactMatcher),
/* harmony export */   at: () => (/* binding */ knownMatcher),
/* harmony export */   gV: () => (/* binding */ rememberMatcher),
/* harmony export */   sp: () => (/* binding */ matcherFor)
/* harmony export */ });
/* unused harmony export isPlainGlob */
// Characters that picomatch (dot: true, windows: false) reads as themselves, checked against it by
// test/config/name-matchers.test.ts. Left out: its specials (* ? [ ] { } ( ) ! + @ |), the escape
// '\', '"' and '$' (it treats them specially), and anything outside ASCII. A leading "./" is
// stripped by picomatch, so such a glob is not plain either.
const PLAIN = /^(?!\.\/)[A-Za-z0-9 _.,:;=#%&~<>'`^/-]+$/;
/**
 * True when the glob can only match the one name written, so a string comparison decides it and
 * no glob library is needed: letters, digits and the punctuation listed in PLAIN, not "./" first.
 * @example isPlainGlob('latency/calibrate') // true
 * @example isPlainGlob('latency/*') // false
 */
function isPlainGlob(glob) {
    return PLAIN.test(glob);
}
/**
 * The matcher of globs that are all plain names, each maybe with a leading '!' (exclude), with the
 * same meaning as compileGlobs: a name matches when it is one of the plain names (or there are
 * none) and none of the excluded ones. undefined when any glob needs the glob library.
 * @example exactMatcher(['a/b', 'a/c'])?.('a/c') // true
 */
function exactMatcher(globs) {
    const include = new Set();
    const exclude = new Set();
    for (const glob of globs) {
        const negated = glob.startsWith('!');
        const body = negated ? glob.slice(1) : glob;
        if (!isPlainGlob(body))
            return undefined;
        (negated ? exclude : include).add(body);
    }
    if (include.size === 1 && exclude.size === 0) {
        const only = [...include][0];
        return (name) => name === only;
    }
    return (name) => (include.size === 0 || include.has(name)) && !exclude.has(name);
}
// Matchers by globs array (the `match` array of a rule or group), filled when a config is read,
// so settingsFor and groupFor stay pure and synchronous however the glob library was loaded.
const compiled = new WeakMap();
let fallback;
/** Files the matcher of a globs array for matcherFor; returns it. */
function rememberMatcher(globs, matcher) {
    compiled.set(globs, matcher);
    return matcher;
}
/** The matcher filed for this globs array, if any. */
function knownMatcher(globs) {
    return compiled.get(globs);
}
/** Sets the compiler for globs that were never filed (glob-matcher.ts registers picomatch's). */
function useFallbackCompiler(compile) {
    fallback = compile;
}
/**
 * The matcher for a rule's globs: the one filed when the config was read, else plain names
 * compared as strings, else the fallback compiler (present once glob-matcher.ts is loaded).
 * @throws Error when the globs need the glob library and it was never loaded: a Config built by
 *   hand with globs must be read through parseConfig/readConfigFile or compiled with compileGlobs.
 * @example matcherFor(['latency/render'])('latency/render') // true
 */
function matcherFor(globs) {
    const known = compiled.get(globs);
    if (known)
        return known;
    const made = exactMatcher(globs) ?? fallback?.(globs);
    if (!made)
        throw new Error(`the globs ${JSON.stringify(globs)} were never compiled; read the config with readConfigFile or parseConfig`);
    return rememberMatcher(globs, made);
}
/** Compiles rules of plain names only, without any glob library. */
const exactNameCompiler = {
    compile(globs) {
        const matcher = knownMatcher(globs) ?? exactMatcher(globs);
        if (!matcher)
            throw new Error(`exactNameCompiler got globs that need the glob library: ${JSON.stringify(globs)}`);
        return rememberMatcher(globs, matcher);
    },
    isLiteral: isPlainGlob,
};


/***/ }),

/***/ 14943:
/***/ ((__unused_webpack_module, __webpack_exports__, __webpack_require__) => {


// EXPORTS
__webpack_require__.d(__webpack_exports__, {
  startAction: () => (/* binding */ startAction)
});

// EXTERNAL MODULE: external "node:fs/promises"
var promises_ = __webpack_require__(51455);
// EXTERNAL MODULE: external "node:path"
var external_node_path_ = __webpack_require__(76760);
var external_node_path_default = /*#__PURE__*/__webpack_require__.n(external_node_path_);
;// CONCATENATED MODULE: ./src/history/artifact-upload.ts
/**
 * Uploads a history file as a new artifact with @actions/artifact. The library (and its Azure
 * blob client) is imported only here, on the upload path, so runs that only check start fast.
 */


/**
 * The real uploader: writes `text` to a temp folder under `tempRoot` and uploads it zipped.
 * @example await createArtifactUploader(process.env.RUNNER_TEMP)('bellgate-history-x', 'history.json', '{}', 90)
 */
function createArtifactUploader(tempRoot) {
    return async (name, fileName, text, retentionDays) => {
        const dir = await (0,promises_.mkdtemp)((0,external_node_path_.join)(tempRoot, 'bellgate-upload-'));
        try {
            const file = (0,external_node_path_.join)(dir, fileName);
            await (0,promises_.writeFile)(file, text, 'utf8');
            const { DefaultArtifactClient } = await Promise.all(/* import() */[__webpack_require__.e(251), __webpack_require__.e(351), __webpack_require__.e(780), __webpack_require__.e(488)]).then(__webpack_require__.bind(__webpack_require__, 26488));
            await new DefaultArtifactClient().uploadArtifact(name, [file], dir, { retentionDays });
        }
        finally {
            await (0,promises_.rm)(dir, { recursive: true, force: true });
        }
    };
}

// EXTERNAL MODULE: ./src/history/branch-api.ts
var branch_api = __webpack_require__(75939);
// EXTERNAL MODULE: ./src/history/branch-backoff.ts
var branch_backoff = __webpack_require__(40363);
;// CONCATENATED MODULE: ./src/history/branch-rest.ts
/**
 * GitDataApi over fetch: the Git Data and contents endpoints of the GitHub REST API (v2022-11-28).
 * Every call has a timeout (a slow answer is a failure, not a hang) and is retried a bounded number
 * of times on answers a retry can cure — 5xx, 429 (honouring Retry-After), a dropped connection, a
 * timeout, a truncated or malformed body — with exponential backoff and jitter. Retrying writes is
 * safe: blobs, trees and commits are content-addressed, and a ref update that already happened is
 * answered as a conflict the store resolves by re-reading. The token goes in the Authorization
 * header of requests to `baseUrl` only (fetch drops it on a redirect to another origin).
 */


const branch_rest_text = (v, what) => {
    if (typeof v !== 'string' || v === '')
        throw new branch_api/* GitDataError */.x(`the API answer lacks ${what}`, { transient: true });
    return v;
};
const segments = (path) => path.split('/').map(encodeURIComponent).join('/');
/**
 * @example const api = createGitDataClient({ token, baseUrl: 'https://api.github.com', owner: 'acme', repo: 'router' });
 * await api.getBranchHead('bellgate-data') // '3f1c…' or undefined
 */
function createGitDataClient(options) {
    const base = `${options.baseUrl.replace(/\/+$/, '')}/repos/${encodeURIComponent(options.owner)}/${encodeURIComponent(options.repo)}`;
    const timeoutMs = options.timeoutMs ?? 30_000;
    const retries = options.retries ?? 3;
    const unitMs = options.unitMs ?? 1000;
    const random = options.random ?? Math.random;
    async function once(method, path, body, refWrite) {
        let res;
        let raw;
        try {
            res = await fetch(`${base}${path}`, {
                method,
                headers: {
                    authorization: `Bearer ${options.token}`,
                    accept: 'application/vnd.github+json',
                    'x-github-api-version': '2022-11-28',
                    'user-agent': 'bellgate',
                    ...(body === undefined ? {} : { 'content-type': 'application/json' }),
                },
                ...(body === undefined ? {} : { body: JSON.stringify(body) }),
                signal: AbortSignal.timeout(timeoutMs),
            });
            raw = await res.text();
        }
        catch (cause) {
            const timedOut = cause?.name === 'TimeoutError';
            // undici reports "fetch failed" and keeps the reason (a reset, a cut body) in `cause`.
            const inner = cause?.cause?.message;
            const why = `${cause?.message ?? String(cause)}${inner ? ` (${inner})` : ''}`;
            throw new branch_api/* GitDataError */.x(timedOut ? `${method} ${path}: no answer within ${timeoutMs} ms` : `${method} ${path}: ${why}`, { transient: true, cause });
        }
        let json = {};
        try {
            json = raw === '' ? {} : JSON.parse(raw);
        }
        catch (cause) {
            if (res.ok)
                throw new branch_api/* GitDataError */.x(`${method} ${path}: the answer was cut short or is not JSON`, { status: res.status, transient: true, cause });
        }
        if (res.ok || res.status === 404)
            return { status: res.status, json };
        const after = Number(res.headers.get('retry-after'));
        const retryAfter = Number.isFinite(after) && after >= 0 && res.headers.has('retry-after') ? after : undefined;
        const limited = res.status === 429 || (res.status === 403 && (retryAfter !== undefined || res.headers.get('x-ratelimit-remaining') === '0'));
        const said = typeof json.message === 'string' ? json.message : '';
        throw new branch_api/* GitDataError */.x(`${method} ${path} answered ${res.status}${said ? ` (${said.slice(0, 200)})` : ''}`, {
            status: res.status,
            transient: res.status >= 500 || limited,
            conflict: res.status === 409 || (refWrite && res.status === 422),
            ...(retryAfter === undefined ? {} : { retryAfter }),
        });
    }
    async function call(method, path, body, refWrite = false) {
        for (let attempt = 0;; attempt++) {
            try {
                return await once(method, path, body, refWrite);
            }
            catch (error) {
                if (!(error instanceof branch_api/* GitDataError */.x) || !error.transient || attempt >= retries)
                    throw error;
                await new Promise((r) => setTimeout(r, (0,branch_backoff/* backoffMs */.j)(attempt, unitMs, random, error.retryAfter)));
            }
        }
    }
    async function found(method, path, body) {
        const { status, json } = await call(method, path, body);
        if (status === 404)
            throw new branch_api/* GitDataError */.x(`${method} ${path} answered 404 (not found)`, { status });
        return json;
    }
    return {
        async getBranchHead(branch) {
            const { status, json } = await call('GET', `/git/ref/heads/${segments(branch)}`);
            if (status === 404)
                return undefined;
            return branch_rest_text(json.object?.sha, 'the branch head');
        },
        async getCommitTree(sha) {
            return branch_rest_text((await found('GET', `/git/commits/${sha}`)).tree?.sha, 'the commit tree');
        },
        async findFile(path, commit) {
            const { status, json } = await call('GET', `/contents/${segments(path)}?ref=${encodeURIComponent(commit)}`);
            if (status === 404)
                return undefined;
            if (json.type !== 'file')
                throw new branch_api/* GitDataError */.x(`${path} on the data branch is a ${String(json.type)}, not a file`);
            return { sha: branch_rest_text(json.sha, 'the file sha'), size: typeof json.size === 'number' ? json.size : 0 };
        },
        async getBlobText(sha) {
            const json = await found('GET', `/git/blobs/${sha}`);
            if (json.encoding !== 'base64' || typeof json.content !== 'string')
                throw new branch_api/* GitDataError */.x(`blob ${sha} came back without base64 content`, { transient: true });
            const bytes = Buffer.from(json.content, 'base64');
            if (typeof json.size === 'number' && bytes.length !== json.size)
                throw new branch_api/* GitDataError */.x(`blob ${sha} came back with ${bytes.length} of ${json.size} bytes`, { transient: true });
            return new TextDecoder('utf-8', { fatal: true }).decode(bytes);
        },
        async createBlob(content) {
            return branch_rest_text((await found('POST', '/git/blobs', { content, encoding: 'utf-8' })).sha, 'the blob sha');
        },
        async createTree(entries, baseTree) {
            return branch_rest_text((await found('POST', '/git/trees', { tree: entries, ...(baseTree ? { base_tree: baseTree } : {}) })).sha, 'the tree sha');
        },
        async createCommit(message, tree, parents) {
            return branch_rest_text((await found('POST', '/git/commits', { message, tree, parents })).sha, 'the commit sha');
        },
        async createBranch(branch, sha) {
            await call('POST', '/git/refs', { ref: `refs/heads/${branch}`, sha }, true);
        },
        async updateBranch(branch, sha) {
            const { status } = await call('PATCH', `/git/refs/heads/${segments(branch)}`, { sha, force: false }, true);
            if (status === 404)
                throw new branch_api/* GitDataError */.x(`the branch ${branch} disappeared`, { status, conflict: true });
        },
    };
}

;// CONCATENATED MODULE: ./src/github/api.ts
const DEFAULT_RETRY = { retries: 3, unitMs: 1000 };
/** The HTTP status of an octokit RequestError (or similar), if any. */
function statusOf(error) {
    const s = error?.status;
    return typeof s === 'number' ? s : undefined;
}

;// CONCATENATED MODULE: ./src/github/fetch-capped.ts
/**
 * @throws Error naming the status or the cap when the download fails for good.
 * @example await fetchCapped('https://blob.example/x.zip?sig=...', 1 << 20, { retries: 3, unitMs: 1000 })
 */
async function fetchCapped(url, maxBytes, tuning) {
    let last;
    for (let attempt = 0; attempt <= tuning.retries; attempt++) {
        if (attempt > 0)
            await new Promise((r) => setTimeout(r, attempt * attempt * tuning.unitMs));
        let res;
        try {
            res = await fetch(url, { redirect: 'follow' });
        }
        catch (cause) {
            last = cause;
            continue;
        }
        if (res.status >= 500 || res.status === 429) {
            last = new Error(`storage answered ${res.status}`);
            await res.body?.cancel();
            continue;
        }
        if (!res.ok || !res.body)
            throw new Error(`storage answered ${res.status}`);
        const declared = Number(res.headers.get('content-length') ?? '0');
        if (declared > maxBytes) {
            await res.body.cancel();
            throw new Error(`artifact is ${declared} bytes, over the ${maxBytes} byte cap`);
        }
        return readCapped(res.body, maxBytes);
    }
    throw new Error(`storage download failed after ${tuning.retries + 1} tries: ${last instanceof Error ? last.message : String(last)}`);
}
/** Reads a byte stream to its end, failing as soon as it passes `maxBytes`. */
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

;// CONCATENATED MODULE: ./src/github/retry-after.ts
/** Longest wait honoured, in Retry-After seconds; a longer ask fails now rather than stall the job. */
const MAX_RETRY_AFTER = 60;
/**
 * Seconds to wait before retrying `error`, or undefined when it is not this plugin's to retry.
 * @example retryAfterSeconds({ status: 429, response: { headers: { 'retry-after': '3' } } }, 0, Date.now()) // 3
 */
function retryAfterSeconds(error, attempt, now) {
    const e = error;
    if (e?.status !== 429)
        return undefined;
    const headers = e.response?.headers ?? {};
    if (/\bsecondary rate\b/i.test(e.message ?? '') || headers['x-ratelimit-remaining'] === '0')
        return undefined;
    const raw = headers['retry-after'];
    if (raw === undefined)
        return (attempt + 1) ** 2;
    const seconds = /^\d+$/.test(raw.trim()) ? Number(raw) : Math.ceil((Date.parse(raw) - now) / 1000);
    if (!Number.isFinite(seconds))
        return (attempt + 1) ** 2;
    if (seconds > MAX_RETRY_AFTER)
        return undefined;
    return Math.max(0, seconds);
}
/**
 * The plugin, for getOctokit(token, options, honourRetryAfter(tuning), retry, throttling).
 * @example getOctokit(token, {}, honourRetryAfter({ retries: 3, unitMs: 1000 }))
 */
function honourRetryAfter(tuning) {
    return (octokit) => {
        octokit.hook.wrap('request', async (request, options) => {
            for (let attempt = 0;; attempt++) {
                try {
                    return await request(options);
                }
                catch (error) {
                    const wait = attempt < tuning.retries ? retryAfterSeconds(error, attempt, Date.now()) : undefined;
                    if (wait === undefined)
                        throw error;
                    await new Promise((r) => setTimeout(r, wait * tuning.unitMs));
                }
            }
        });
    };
}

;// CONCATENATED MODULE: ./src/github/octokit-api.ts




const PER_PAGE = 100;
const obj = (v) => (typeof v === 'object' && v !== null ? v : {});
const num = (v) => (typeof v === 'number' ? v : undefined);
function toArtifact(raw) {
    const a = obj(raw);
    const run = obj(a.workflow_run);
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
    const c = obj(raw);
    const login = obj(c.user).login;
    return { id: Number(c.id), body: String(c.body ?? ''), author: typeof login === 'string' ? login : undefined };
}
/**
 * Creates the API client for one repository.
 * @example createOctokitApi({ token, baseUrl: 'https://api.github.com', owner: 'acme', repo: 'router' })
 */
function createOctokitApi(target) {
    const tuning = target.retry ?? DEFAULT_RETRY;
    const maxPages = target.maxPages ?? 10;
    const log = target.log ?? (() => undefined);
    const retryLimit = (after, options, _o, count) => {
        log(`GitHub API asked to wait ${after} s before ${options.method ?? ''} ${options.url ?? ''} (retry ${count + 1} of ${tuning.retries})`);
        return count < tuning.retries;
    };
    // @actions/github parses the event payload when it is first imported; importing it (and the
    // plugins, with Bottleneck) on first use keeps a run that never calls the API from loading any
    // of it, and any failure there becomes a plain message instead of a crash at start-up.
    let client;
    const octokit = () => (client ??= Promise.all([
        __webpack_require__.e(/* import() */ 351).then(__webpack_require__.bind(__webpack_require__, 61351)),
        Promise.all(/* import() */[__webpack_require__.e(251), __webpack_require__.e(735)]).then(__webpack_require__.bind(__webpack_require__, 49735)),
        Promise.all(/* import() */[__webpack_require__.e(251), __webpack_require__.e(856)]).then(__webpack_require__.bind(__webpack_require__, 86856)),
    ]).then(([{ getOctokit }, { retry }, { throttling }]) => getOctokit(target.token, {
        baseUrl: target.baseUrl.replace(/\/+$/, ''),
        // 429 is retried by honourRetryAfter (which reads Retry-After), not by plugin-retry.
        retry: { retries: tuning.retries, retryAfterBaseValue: tuning.unitMs, doNotRetry: [400, 401, 403, 404, 410, 422, 429, 451] },
        throttle: { onRateLimit: retryLimit, write: spacedGroup(tuning.unitMs), notifications: spacedGroup(3 * tuning.unitMs), onSecondaryRateLimit: retryLimit, retryAfterBaseValue: tuning.unitMs },
        log: { debug: () => undefined, info: () => undefined, warn: log, error: log },
    }, honourRetryAfter(tuning), retry, throttling)));
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
        listArtifacts: (name) => pages('GET /repos/{owner}/{repo}/actions/artifacts', { name }, (d) => (Array.isArray(obj(d).artifacts) ? obj(d).artifacts : []), toArtifact),
        async downloadArtifact(id, maxBytes) {
            // The API answers 302 with a short-lived storage URL; following it by hand keeps the token
            // off the storage request and lets the download stop at the size cap.
            const res = await (await octokit()).request('GET /repos/{owner}/{repo}/actions/artifacts/{artifact_id}/{archive_format}', {
                ...repo,
                artifact_id: id,
                archive_format: 'zip',
                request: { redirect: 'manual', parseSuccessResponseBody: false },
            });
            const location = res.headers.location;
            if (res.status >= 300 && res.status < 400 && location)
                return fetchCapped(location, maxBytes, tuning);
            if (res.status === 200 && res.data && typeof res.data.getReader === 'function') {
                return readCapped(res.data, maxBytes);
            }
            throw new Error(`download of artifact #${id} answered ${res.status} without a location`);
        },
        listIssueComments: (issue) => pages('GET /repos/{owner}/{repo}/issues/{issue_number}/comments', { issue_number: issue }, (d) => (Array.isArray(d) ? d : []), toComment),
        async createIssueComment(issue, body) {
            const res = await (await octokit()).request('POST /repos/{owner}/{repo}/issues/{issue_number}/comments', { ...repo, issue_number: issue, body });
            return toComment(res.data);
        },
        async updateIssueComment(id, body) {
            await (await octokit()).request('PATCH /repos/{owner}/{repo}/issues/comments/{comment_id}', { ...repo, comment_id: id, body });
        },
        // The branch store's client: fetch-based, with its own timeout and the same retry tuning.
        gitData: createGitDataClient({ ...repo, token: target.token, baseUrl: target.baseUrl, retries: tuning.retries, unitMs: tuning.unitMs }),
    };
}

// EXTERNAL MODULE: external "node:crypto"
var external_node_crypto_ = __webpack_require__(77598);
// EXTERNAL MODULE: external "node:fs"
var external_node_fs_ = __webpack_require__(73024);
// EXTERNAL MODULE: external "node:os"
var external_node_os_ = __webpack_require__(48161);
;// CONCATENATED MODULE: ./src/github/runner-sink.ts
/**
 * The ActionSink spoken straight to the runner: workflow commands on stdout (`::warning ...::`),
 * outputs appended to the GITHUB_OUTPUT file, the job summary appended to GITHUB_STEP_SUMMARY.
 *
 * Why not @actions/core: its entry module always loads @actions/http-client and undici (for OIDC
 * tokens, which Bellgate never asks for) — about half a megabyte evaluated on every run, the
 * largest single start-up cost of a PR check. The protocol is small and documented
 * (https://docs.github.com/actions/reference/workflow-commands-for-github-actions); this file
 * writes the same bytes as @actions/core 3 (test/github/runner-sink.test.ts compares the two).
 */




const defaultEdges = () => ({
    env: process.env,
    write: (text) => void process.stdout.write(text),
    fail: () => (process.exitCode = 1),
});
/** Message text: `%`, CR and LF escaped, as the runner decodes them (the workflow-commands page). */
function escapeData(s) {
    return s.replace(/%/g, '%25').replace(/\r/g, '%0D').replace(/\n/g, '%0A');
}
/** Property values: as escapeData, plus `:` and `,`, which separate the properties. */
function escapeProperty(s) {
    return escapeData(s).replace(/:/g, '%3A').replace(/,/g, '%2C');
}
/** Annotation properties by the runner's names; a props object without keys means none at all. */
function annotationProperties(props) {
    if (props === undefined || Object.keys(props).length === 0)
        return {};
    return { title: props.title, file: props.file, line: props.startLine };
}
/**
 * One workflow command line, e.g. `::warning title=slower,file=bench.json,line=3::p95 regressed`.
 * Properties without a value ('' and 0 too) are left out, but a non-empty property object keeps
 * the separating space even then, as @actions/core writes it.
 * @example workflowCommand('notice', {}, 'hi') // '::notice::hi'
 */
function workflowCommand(command, properties, message) {
    let line = `::${command}`;
    const keys = Object.keys(properties);
    if (keys.length > 0) {
        const pairs = keys.flatMap((k) => {
            const v = properties[k];
            return v === undefined || v === '' || v === 0 ? [] : [`${k}=${escapeProperty(String(v))}`];
        });
        line += ` ${pairs.join(',')}`;
    }
    return `${line}::${escapeData(message)}`;
}
/**
 * `name<<delimiter`, value, delimiter: the multi-line form of a GITHUB_OUTPUT entry, with a random
 * delimiter that neither the name nor the value may contain.
 * @throws Error when either contains it (astronomically unlikely; refused rather than cut short).
 */
function keyValueEntry(name, value) {
    const delimiter = `ghadelimiter_${(0,external_node_crypto_.randomUUID)()}`;
    if (name.includes(delimiter) || value.includes(delimiter))
        throw new Error(`output ${name} contains its delimiter`);
    return `${name}<<${delimiter}${external_node_os_.EOL}${value}${external_node_os_.EOL}${delimiter}`;
}
/**
 * The real sink. Outputs without GITHUB_OUTPUT fall back to the old `::set-output` command.
 * @throws (appendSummary) when GITHUB_STEP_SUMMARY is unset or the file is not writable.
 * @example createRunnerSink().warning('p95 regressed', { title: 'bellgate', file: 'bench.json' })
 */
function createRunnerSink(edges = defaultEdges()) {
    const { env, write } = edges;
    const command = (name, properties, message) => write(workflowCommand(name, properties, message) + external_node_os_.EOL);
    const error = (m, p) => command('error', annotationProperties(p), m);
    return {
        info: (m) => write(m + external_node_os_.EOL),
        warning: (m, p) => command('warning', annotationProperties(p), m),
        error,
        notice: (m, p) => command('notice', annotationProperties(p), m),
        setOutput(name, value) {
            const file = env.GITHUB_OUTPUT || '';
            if (file === '') {
                write(external_node_os_.EOL);
                command('set-output', { name }, value);
                return;
            }
            if (!(0,external_node_fs_.existsSync)(file))
                throw new Error(`Missing file at path: ${file}`);
            (0,external_node_fs_.appendFileSync)(file, `${keyValueEntry(name, value)}${external_node_os_.EOL}`, { encoding: 'utf8' });
        },
        setSecret: (v) => command('add-mask', {}, v),
        setFailed(m) {
            edges.fail();
            error(m);
        },
        async appendSummary(md) {
            const file = env.GITHUB_STEP_SUMMARY;
            if (!file)
                throw new Error('Unable to find environment variable for $GITHUB_STEP_SUMMARY. Check if your runtime environment supports job summaries.');
            try {
                (0,external_node_fs_.accessSync)(file, external_node_fs_.constants.R_OK | external_node_fs_.constants.W_OK);
            }
            catch {
                throw new Error(`Unable to access summary file: '${file}'. Check if the file has correct read/write permissions.`);
            }
            await (0,promises_.appendFile)(file, md + external_node_os_.EOL, { encoding: 'utf8' });
        },
    };
}

;// CONCATENATED MODULE: ./src/github/real-deps.ts
/**
 * The real collaborators of runAction: the runner's environment, the workflow-command sink, the
 * file system, the clock, octokit, and the lazily loaded artifact uploader.
 */





/**
 * @example await runAction(createRealDeps(process.env))
 */
function createRealDeps(env = process.env) {
    return {
        env,
        cwd: env.GITHUB_WORKSPACE || process.cwd(),
        sink: createRunnerSink(),
        readText: (path) => (0,promises_.readFile)(path, 'utf8'),
        writeText: async (path, text) => {
            await (0,promises_.mkdir)((0,external_node_path_.dirname)(path), { recursive: true });
            await (0,promises_.writeFile)(path, text, 'utf8');
        },
        now: () => new Date(),
        createApi: createOctokitApi,
        upload: createArtifactUploader(env.RUNNER_TEMP || process.cwd()),
        // BELLGATE_RETRY_UNIT_MS shortens API backoff for the end-to-end tests; the runner never sets it.
        ...(env.BELLGATE_RETRY_UNIT_MS ? { retry: { retries: 3, unitMs: Math.max(1, Number(env.BELLGATE_RETRY_UNIT_MS) || 1000) } } : {}),
    };
}

// EXTERNAL MODULE: ./src/config/name-matchers.ts
var name_matchers = __webpack_require__(6471);
;// CONCATENATED MODULE: ./src/config/rules.ts

/**
 * The settings that decide one metric: the defaults, then every `metrics:` rule whose globs match
 * the name, in file order, so a later match overrides an earlier one key by key. Pure.
 * Globs are picomatch globs over the whole name; `*` does not cross '/', `**` does; a glob starting
 * with '!' excludes (see compileGlobs). A metric is never relative to itself: when the resolved
 * `relative-to` names the metric (the calibration benchmark matched by its own rule), it is dropped.
 * The matchers were compiled when the config was read (name-matchers.ts), so no glob library is
 * loaded here.
 * @example settingsFor(config, 'throughput/home').worse // 'lower' with the rule { match: 'throughput/*', worse: lower }
 */
function settingsFor(config, metric) {
    const settings = { ...config.defaults };
    for (const rule of config.rules) {
        if ((0,name_matchers/* matcherFor */.sp)(rule.match)(metric))
            Object.assign(settings, rule.settings);
    }
    if (settings.relativeTo === metric)
        delete settings.relativeTo;
    return settings;
}
/**
 * The group a metric belongs to: the first `groups:` entry whose globs match, or undefined.
 * @example groupFor(config, 'latency/render')?.name // 'latency' with the group { name: latency, match: 'latency/*' }
 */
function groupFor(config, metric) {
    return config.groups.find((group) => (0,name_matchers/* matcherFor */.sp)(group.match)(metric));
}

// EXTERNAL MODULE: ./src/model/tails.ts + 2 modules
var tails = __webpack_require__(67963);
;// CONCATENATED MODULE: ./src/gate/format-number.ts
/**
 * Short numbers for reason sentences: 3 significant digits, exponent form below 1e-3.
 * @example formatNumber(0.000321) // '3.21e-4'
 */
function formatNumber(x) {
    if (x === 0 || !Number.isFinite(x))
        return String(x);
    const a = Math.abs(x);
    if (a < 1e-3 || a >= 1e6)
        return x.toExponential(2).replace(/\.?0+e/, 'e').replace('e+', 'e');
    return String(Number(x.toPrecision(3)));
}
/** A share as a percent with one decimal. @example formatPercent(0.0512) // '5.1%' */
function formatPercent(share) {
    return `${Number((share * 100).toFixed(1))}%`;
}

;// CONCATENATED MODULE: ./src/gate/tolerance.ts

/**
 * Whether |value - centre| exceeds the tolerance: an amount in the metric's unit, or a percent
 * of the baseline centre (on the metric's own scale). A percent tolerance holds the share, as the
 * config loader stores it (`1%` -> amount 0.01). A move exactly at the tolerance is within it.
 * @example beyondTolerance(103, 100, { kind: 'percent', amount: 0.02 }) // true
 */
function beyondTolerance(value, centre, tolerance) {
    return Math.abs(value - centre) > toleranceAmount(centre, tolerance);
}
/** The tolerance in the metric's unit around this centre. @example toleranceAmount(200, { kind: 'percent', amount: 0.01 }) // 2 */
function toleranceAmount(centre, tolerance) {
    return tolerance.kind === 'absolute' ? tolerance.amount : Math.abs(centre) * tolerance.amount;
}
/** "1%" or "512". @example describeTolerance({ kind: 'percent', amount: 0.01 }) // '1%' */
function describeTolerance(tolerance) {
    return tolerance.kind === 'percent' ? `${formatNumber(tolerance.amount * 100)}%` : formatNumber(tolerance.amount);
}

;// CONCATENATED MODULE: ./src/gate/decide-metric.ts


/**
 * The plain per-metric test: relative density below the cutoff.
 * @example plainTest({ relativeDensity: 0.002, cutoff: 0.01 }).phrase // 'relative density 2e-3 < cutoff 0.01'
 */
function plainTest(result) {
    const r = result.relativeDensity ?? 1;
    const significant = r < result.cutoff;
    return {
        significant,
        phrase: `relative density ${formatNumber(r)} ${significant ? '<' : '≥'} cutoff ${formatNumber(result.cutoff)}`,
    };
}
/**
 * Status and reason of a scored metric from the outcome of its test (plain, family-adjusted or
 * its group's): regressed when significant on the worse side beyond the tolerance, improved when
 * significant on the better side beyond it, ok otherwise. Returns a new result.
 * @example decideMetric(score, plainTest(score.result)).status // 'regressed'
 */
function decideMetric(score, test) {
    return { ...score.result, ...decision(score, test) };
}
/** decideMetric's status and reason alone, for a caller that owns the result and sets them in place. */
function decision(score, test) {
    const { result } = score;
    const where = position(result);
    let status = 'ok';
    let reason = `${where}; ${test.phrase}`;
    if (test.significant && score.direction !== 'none') {
        if (!score.beyondTolerance) {
            const move = result.change === undefined ? '' : ` ${formatPercent(Math.abs(result.change))}`;
            reason += `, but the change${move} is within the tolerance ${describeTolerance(score.settings.tolerance)}`;
        }
        else if (score.direction === 'worse') {
            status = 'regressed';
        }
        else {
            status = 'improved';
            reason = `${where} (the better side); ${test.phrase}`;
        }
    }
    return { status, reason };
}
/** "4.1 sd above the baseline mean", or the constant-baseline wording when there is no z. */
function position(result) {
    const z = result.z;
    if (z === undefined) {
        const centre = result.baseline?.mean ?? NaN;
        const same = result.relativeDensity === 1;
        const scale = result.baseline?.scale === 'log' ? ' (log scale)' : '';
        return same
            ? `equal to the constant baseline ${formatNumber(centre)}${scale}`
            : `off the constant baseline ${formatNumber(centre)}${scale} (sd 0; set \`resolution\` to the smallest meaningful step)`;
    }
    if (z === 0)
        return 'at the baseline mean';
    return `${formatNumber(Math.abs(z))} sd ${z > 0 ? 'above' : 'below'} the baseline mean`;
}

// EXTERNAL MODULE: ./src/model/input-error.ts + 1 modules
var input_error = __webpack_require__(71184);
;// CONCATENATED MODULE: ./src/model/family.ts

/**
 * Adjusted p-values for testing m metrics at once, returned in input order and capped at 1;
 * a metric is flagged at level alpha when its adjusted value is <= alpha.
 * - bonferroni: min(1, m p) — controls the family-wise error rate.
 * - holm: Holm (1979) step-down; with p(1) <= ... <= p(m) sorted,
 *   adj(i) = max over j <= i of min(1, (m - j + 1) p(j)) — same guarantee, never less powerful.
 * - fdr: Benjamini & Hochberg (1995) step-up; adj(i) = min over j >= i of min(1, m p(j) / j) —
 *   controls the expected share of false alarms among the flagged metrics.
 * Ties keep input order. O(m log m). Throws InputError on a value outside [0, 1] or NaN.
 *
 * @example adjustTails([0.01, 0.04, 0.03, 0.005], 'holm') // [0.03, 0.06, 0.06, 0.02]
 */
function adjustTails(tails, method) {
    const m = tails.length;
    tails.forEach((p, i) => {
        if (!(p >= 0 && p <= 1)) {
            throw new input_error/* InputError */.d(`tail probability ${p} at position ${i + 1} is not a number in [0, 1]`);
        }
    });
    if (method === 'bonferroni')
        return tails.map((p) => Math.min(1, m * p));
    if (method !== 'holm' && method !== 'fdr') {
        throw new input_error/* InputError */.d(`unknown family method "${String(method)}"`, { fix: 'use bonferroni, holm or fdr' });
    }
    const order = tails.map((_, i) => i).sort((a, b) => tails[a] - tails[b] || a - b);
    const adjusted = new Array(m);
    if (method === 'holm') {
        let running = 0;
        order.forEach((index, rank) => {
            running = Math.max(running, Math.min(1, (m - rank) * tails[index]));
            adjusted[index] = running;
        });
    }
    else {
        let running = 1;
        for (let rank = m - 1; rank >= 0; rank--) {
            const index = order[rank];
            running = Math.min(running, (m * tails[index]) / (rank + 1));
            adjusted[index] = running;
        }
    }
    return adjusted;
}

;// CONCATENATED MODULE: ./src/gate/family-test.ts


/**
 * Adjusts the tails of all decisions of a run for being made together (issue 6) and returns each
 * decision's test: adjusted tail below its level. Bonferroni and Holm (1979) bound the chance of
 * any false alarm in the run; fdr (Benjamini & Hochberg 1995) bounds the share of false alarms
 * among the flagged. With `none` the caller keeps its plain tests; this returns an empty list.
 * @example familyTests([{ tail: 1e-5, level: 0.0024 }], 'holm')[0].test.significant // true
 */
function familyTests(items, family) {
    if (family === 'none' || items.length === 0)
        return [];
    const adjusted = adjustTails(items.map((item) => item.tail), family);
    return items.map((item, i) => {
        const a = adjusted[i];
        const significant = a < item.level;
        const phrase = `tail ${formatNumber(item.tail)}, ${family}-adjusted over ${items.length} to ${formatNumber(a)} ` +
            `${significant ? '<' : '≥'} level ${formatNumber(item.level)}`;
        return { adjusted: a, test: { significant, phrase } };
    });
}

// EXTERNAL MODULE: ./src/model/special/log-gamma.ts
var log_gamma = __webpack_require__(32231);
;// CONCATENATED MODULE: ./src/model/special/incomplete-gamma.ts

const TINY = 1e-300;
const TOLERANCE = 4 * Number.EPSILON;
/**
 * x^a e^-x / Gamma(a). For a >= 10 Stirling's formula gives
 * sqrt(a / (2 pi)) exp(a log1pMinus((x - a) / a) - mu(a)): x - a is exact near the peak, so large
 * a loses nothing to cancelling logarithms (cf. Temme; DiDonato & Morris 1986, ACM TOMS 12).
 */
function gammaFront(a, x) {
    if (a >= log_gamma/* STIRLING_FROM */.k0) {
        const u = (x - a) / a;
        // Far below the peak 1 + u has lost digits; ln(x / a) is exact enough there.
        const power = u > -0.5 ? a * (0,log_gamma/* log1pMinus */._g)(u) : a * Math.log(x / a) - (x - a);
        return Math.sqrt(a / (2 * Math.PI)) * Math.exp(power - (0,log_gamma/* stirlingCorrection */.np)(a));
    }
    return Math.exp(a * Math.log(x) - x - (0,log_gamma/* logGamma */.SX)(a));
}
/** sum_n x^n / (a (a + 1) ... (a + n)) (A&S 6.5.29; Numerical Recipes 3rd ed., 6.2.5). */
function gammaSeries(a, x) {
    let term = 1 / a;
    let sum = term;
    const steps = 1000 + Math.ceil(50 * Math.sqrt(a));
    for (let n = 1; n <= steps; n++) {
        term *= x / (a + n);
        sum += term;
        if (Math.abs(term) < Math.abs(sum) * TOLERANCE)
            break;
    }
    return sum;
}
/**
 * The continued fraction of Gamma(a, x) e^x x^-a (A&S 6.5.31; Numerical Recipes 3rd ed., 6.2.7)
 * by the modified Lentz method; for x >= a + 1.
 */
function gammaFraction(a, x) {
    let b = x + 1 - a;
    let c = 1 / TINY;
    let d = 1 / b;
    let h = d;
    const steps = 1000 + Math.ceil(50 * Math.sqrt(a));
    for (let i = 1; i <= steps; i++) {
        const an = -i * (i - a);
        b += 2;
        d = an * d + b;
        if (Math.abs(d) < TINY)
            d = TINY;
        c = b + an / c;
        if (Math.abs(c) < TINY)
            c = TINY;
        d = 1 / d;
        const delta = d * c;
        h *= delta;
        if (Math.abs(delta - 1) < TOLERANCE)
            break;
    }
    return h;
}
/**
 * The regularised incomplete gamma function P(a, x) (upper = false) or Q(a, x) = 1 - P(a, x)
 * (upper = true), a > 0, x >= 0: the series for x < a + 1, the continued fraction above, each
 * computing its own side directly and the other as 1 minus it (the directly computed side is
 * the smaller one, or close to it), so far tails keep their relative accuracy. NaN for a <= 0,
 * x < 0 or NaN.
 * @example regularizedGamma(1, 2, true) // e^-2 = 0.1353352832366127
 */
function incomplete_gamma_regularizedGamma(a, x, upper) {
    if (!(a > 0) || !(x >= 0))
        return Number.NaN;
    if (x === 0)
        return upper ? 1 : 0;
    if (x === Infinity)
        return upper ? 0 : 1;
    if (x < a + 1) {
        const lower = gammaFront(a, x) * gammaSeries(a, x);
        return Math.min(1, Math.max(0, upper ? 1 - lower : lower));
    }
    const tail = gammaFront(a, x) * gammaFraction(a, x);
    return Math.min(1, Math.max(0, upper ? tail : 1 - tail));
}

;// CONCATENATED MODULE: ./src/model/special/chi-square.ts

/**
 * Upper tail P(chi^2_k > q) = Q(k/2, q/2) (chi-square is the gamma law of shape k/2 and scale 2), computed directly for far tails.
 * NaN for NaN input or k <= 0; 1 for q <= 0.
 * @example chiSquareUpperTail(3.841458820694124, 1) // ≈ 0.05
 */
function chiSquareUpperTail(q, k) {
    if (Number.isNaN(q))
        return Number.NaN;
    return incomplete_gamma_regularizedGamma(k / 2, Math.max(0, q / 2), true);
}
/**
 * Lower tail (CDF) P(chi^2_k <= q) = P(k/2, q/2).
 * @example chiSquareCdf(2, 2) // 1 - e^-1 = 0.6321205588285577
 */
function chiSquareCdf(q, k) {
    if (Number.isNaN(q))
        return Number.NaN;
    return regularizedGamma(k / 2, Math.max(0, q / 2), false);
}

// EXTERNAL MODULE: ./src/model/special/incomplete-beta.ts
var incomplete_beta = __webpack_require__(40916);
;// CONCATENATED MODULE: ./src/model/special/fisher-f.ts

/**
 * Upper tail P(F > f) of Fisher's F with d1 and d2 degrees of freedom:
 * I_x(d2/2, d1/2) with x = d2 / (d2 + d1 f) (A&S 26.6.2), from the odds d1 f / d2 so that a far
 * tail is computed directly. 1 for f <= 0; NaN for NaN input or d1, d2 not above 0.
 * @example fisherUpperTail(4.964602743730711, 1, 10) // ≈ 0.05
 */
function fisherUpperTail(f, d1, d2) {
    if (Number.isNaN(f) || !(d1 > 0 && d2 > 0))
        return Number.NaN;
    if (f <= 0)
        return 1;
    return (0,incomplete_beta/* regularizedBeta */.RL)(d2 / 2, d1 / 2, (0,incomplete_beta/* betaPointFromOdds */.rP)((d1 * f) / d2), false);
}
/**
 * Lower tail (CDF) P(F <= f) = 1 - I_x(d2/2, d1/2) = I_(1-x)(d1/2, d2/2), computed directly.
 * @example fisherCdf(1, 4, 4) // 0.5
 */
function fisherCdf(f, d1, d2) {
    if (Number.isNaN(f) || !(d1 > 0 && d2 > 0))
        return Number.NaN;
    if (f <= 0)
        return 0;
    return regularizedBeta(d2 / 2, d1 / 2, betaPointFromOdds((d1 * f) / d2), true);
}

;// CONCATENATED MODULE: ./src/model/hotelling.ts



function checkDistance(d2, p) {
    if (!(d2 >= 0)) {
        throw new input_error/* InputError */.d(`a squared distance must be a number, 0 or more, got ${d2}`);
    }
    if (!Number.isInteger(p) || p < 1)
        throw new input_error/* InputError */.d(`the number of metrics must be 1 or more, got ${p}`);
}
/**
 * P(chi^2_p > d2): the tail of a squared Mahalanobis distance when mean and covariance are known
 * exactly (the large-history limit of hotellingTail): the upper incomplete gamma Q(p/2, d2/2),
 * computed directly, so far tails keep their relative accuracy. An infinite d2 has tail 0.
 * Throws InputError on a negative or NaN d2 or p < 1.
 * @example chiSquareTail(3.841458820645, 1) // ≈ 0.05 (chi-square table, 1 degree of freedom)
 */
function chiSquareTail(d2, p) {
    checkDistance(d2, p);
    if (d2 === Infinity)
        return 0;
    return chiSquareUpperTail(d2, p);
}
/**
 * Tail probability of a NEW run's squared Mahalanobis distance d2 from a mean and covariance
 * estimated from n earlier runs (the prediction form of Hotelling's T^2).
 * `divisor` says which covariance d2 was computed with: 'mle' (divide by n, as shrunkCovariance
 * returns; the default) or 'unbiased' (divide by n - 1). With the n-1 covariance S_u,
 *   T^2 = d2_u n / (n + 1),  F = T^2 (n - p) / (p (n - 1)) ~ F(p, n - p)
 * (x_new - mean has covariance Sigma (1 + 1/n), independent of S_u). Since S_mle = S_u (n-1)/n,
 * d2_u = d2_mle (n - 1) / n. The F tail is computed directly as an incomplete beta — no 1 - cdf
 * cancellation. Needs n > p. With a shrunk covariance this is an approximation (the F law holds
 * for the plain sample covariance). Throws InputError on bad d2, p < 1 or n <= p.
 *
 * @example hotellingTail(0, 2, 10) // 1
 */
function hotellingTail(d2, p, n, divisor = 'mle') {
    checkDistance(d2, p);
    if (!Number.isInteger(n) || n <= p) {
        throw new input_error/* InputError */.d(`the joint check of ${p} metrics needs more than ${p} runs, got ${n}`, {
            fix: 'wait for more baseline runs, or check fewer metrics together',
        });
    }
    if (d2 === 0)
        return 1;
    if (d2 === Infinity)
        return 0;
    const unbiased = divisor === 'mle' ? (d2 * (n - 1)) / n : d2;
    const t2 = (unbiased * n) / (n + 1);
    const statistic = (t2 * (n - p)) / (p * (n - 1));
    return fisherUpperTail(statistic, p, n - p);
}

;// CONCATENATED MODULE: ./src/model/matrix-input.ts

/**
 * Checks a table of runs x metrics: at least `minRows` rows, all of one length >= 1, all finite.
 * Returns the number of columns. Throws InputError naming the row and column of the problem.
 * @example checkRows([[1, 2], [3, 4]], 2) // 2
 */
function checkRows(rows, minRows) {
    if (rows.length < minRows) {
        throw new input_error/* InputError */.d(`need at least ${minRows} runs, got ${rows.length}`);
    }
    const p = rows[0]?.length ?? 0;
    if (p === 0)
        throw new input_error/* InputError */.d('each run needs at least one value');
    rows.forEach((row, r) => {
        if (row.length !== p) {
            throw new input_error/* InputError */.d(`run ${r + 1} has ${row.length} values, the first run has ${p}`, {
                fix: 'give every run a value for every metric (drop runs or metrics with gaps first)',
            });
        }
        row.forEach((x, c) => {
            if (!Number.isFinite(x)) {
                throw new input_error/* InputError */.d(`value ${x} of run ${r + 1}, column ${c + 1} is not a finite number`);
            }
        });
    });
    return p;
}

;// CONCATENATED MODULE: ./src/model/matrix-library.ts
let library;
/**
 * ml-matrix, loaded on first use: only the joint check of metric groups needs it, and loading it
 * costs a `check` without groups several milliseconds at start-up. A synchronous require (the
 * bundler turns it into a lazy module load) keeps shrunkCovariance and the Mahalanobis functions
 * synchronous.
 * @example matrixLibrary().Matrix.eye(2).get(0, 0) // 1
 */
function matrixLibrary() {
    library ??= __webpack_require__(73076);
    return library;
}

;// CONCATENATED MODULE: ./src/model/ledoit-wolf.ts


/**
 * Covariance of runs x metrics that stays well conditioned when runs are few for the number of
 * metrics: S* = lambda D + (1 - lambda) S, with S the sample covariance dividing by n and D its
 * diagonal (variances kept, covariances zeroed). The intensity is the Ledoit-Wolf optimum
 * (Ledoit & Wolf 2004, "A well-conditioned estimator for large-dimensional covariance matrices")
 * for the diagonal target ("target D" of Schäfer & Strimmer 2005):
 *   lambda = sum_{i != j} Var(s_ij) / sum_{i != j} s_ij^2,  clipped to [0, 1],
 *   Var(s_ij) = (1/n^2) sum_k (w_kij - s_ij)^2,  w_kij = (x_ki - mean_i)(x_kj - mean_j).
 * (Schäfer & Strimmer write the same with the n-1 covariance: n/(n-1)^3 sum_k (w_kij - w̄_ij)^2;
 * the two agree as n grows.) With one metric, or no off-diagonal covariance at all, there is
 * nothing to shrink and lambda is 0. O(n p^2). Throws InputError on fewer than 2 runs, ragged
 * rows or non-finite values.
 *
 * @example shrunkCovariance([[1, 2], [2, 4], [3, 6], [4, 7]]).shrinkage // between 0 and 1
 */
function shrunkCovariance(rows) {
    const p = checkRows(rows, 2);
    const n = rows.length;
    const { Matrix } = matrixLibrary();
    const x = new Matrix(rows.map((row) => [...row]));
    const mean = x.mean('column');
    // Centring first keeps large offsets (timings around 1e9 ns) from swamping the products.
    x.subRowVector(mean);
    const sample = x.transpose().mmul(x).div(n);
    // sum_k w_kij^2 = sum_k x_ki^2 x_kj^2, so sum_k (w_kij - s_ij)^2 = that - n s_ij^2.
    const squared = x.clone().mul(x);
    const fourth = squared.transpose().mmul(squared);
    let varianceSum = 0;
    let offSquares = 0;
    for (let i = 0; i < p; i++) {
        for (let j = 0; j < p; j++) {
            if (i === j)
                continue;
            const s = sample.get(i, j);
            varianceSum += Math.max(0, fourth.get(i, j) - n * s * s) / (n * n);
            offSquares += s * s;
        }
    }
    const shrinkage = offSquares > 0 ? Math.min(1, Math.max(0, varianceSum / offSquares)) : 0;
    const covariance = sample.to2DArray().map((row, i) => row.map((s, j) => (i === j ? s : (1 - shrinkage) * s)));
    return { mean, covariance, shrinkage };
}

;// CONCATENATED MODULE: ./src/model/mahalanobis.ts


/**
 * Ridges tried, relative to the mean variance, when the covariance is not positive definite
 * (a metric that never varied, or two metrics that always move together). 1e-10 leaves any
 * well-conditioned matrix untouched in practice; 1e-6 is the most we add before giving up.
 */
const RELATIVE_RIDGES = [0, 1e-10, 1e-8, 1e-6];
/** Solves covariance * y = d by Cholesky, adding the smallest ridge that makes it factor. */
function solveCovariance(d, covariance) {
    const p = d.length;
    if (covariance.length !== p || covariance.some((row) => row.length !== p)) {
        throw new input_error/* InputError */.d(`the covariance must be ${p} x ${p} to match ${p} values`);
    }
    if (covariance.some((row) => row.some((v) => !Number.isFinite(v)))) {
        throw new input_error/* InputError */.d('the covariance holds a value that is not a finite number');
    }
    let trace = 0;
    for (let i = 0; i < p; i++)
        trace += covariance[i][i];
    if (!(trace > 0)) {
        throw new input_error/* InputError */.d('the covariance has no positive variance', {
            fix: 'give the metrics a resolution, or leave constant metrics out of the joint check',
        });
    }
    const { CholeskyDecomposition, Matrix } = matrixLibrary();
    for (const relative of RELATIVE_RIDGES) {
        const ridge = (relative * trace) / p;
        const matrix = new Matrix(covariance.map((row, i) => row.map((v, j) => (i === j ? v + ridge : v))));
        const cholesky = new CholeskyDecomposition(matrix);
        if (cholesky.isPositiveDefinite())
            return cholesky.solve(Matrix.columnVector(d)).getColumn(0);
    }
    throw new input_error/* InputError */.d('the covariance is not positive definite, even with a small ridge', {
        fix: 'drop metrics that are copies or linear combinations of others, or use more runs',
    });
}
function difference(x, mean) {
    if (x.length !== mean.length || x.length === 0) {
        throw new input_error/* InputError */.d(`the point has ${x.length} values, the mean has ${mean.length}`);
    }
    return x.map((v, i) => {
        const d = v - mean[i];
        if (!Number.isFinite(d))
            throw new input_error/* InputError */.d(`value ${v} at position ${i + 1} is not a finite number`);
        return d;
    });
}
/**
 * Squared Mahalanobis distance d^2 = (x - mean)' S^-1 (x - mean): how far a run lies from the
 * baseline in units of its covariance S (whatever divisor S was computed with; see hotellingTail).
 * Solved by Cholesky, not by an explicit inverse. A near-singular S gets the smallest ridge
 * (1e-10, 1e-8 or 1e-6 of the mean variance) that lets it factor; beyond that, InputError.
 * O(p^3). Throws InputError on mismatched sizes, non-finite values or a hopeless covariance.
 *
 * @example mahalanobisSquared([1, 1], [0, 0], [[1, 0], [0, 4]]) // 1.25
 */
function mahalanobisSquared(x, mean, covariance) {
    return mahalanobisContributions(x, mean, covariance).reduce((sum, c) => sum + c, 0);
}
/**
 * Each coordinate's share of d^2: c_i = d_i (S^-1 d)_i with d = x - mean, so sum c_i = d^2.
 * Shows which metrics drive a joint alarm. A share can be negative: with correlated metrics, a
 * coordinate that moved "as expected" given the others reduces the distance.
 *
 * @example mahalanobisContributions([1, 1], [0, 0], [[1, 0], [0, 4]]) // [1, 0.25]
 */
function mahalanobisContributions(x, mean, covariance) {
    const d = difference(x, mean);
    const y = solveCovariance(d, covariance);
    return d.map((di, i) => di * y[i]);
}

;// CONCATENATED MODULE: ./src/model/moments.ts

/**
 * Mean and sum of squared deviations by the corrected two-pass algorithm (Chan, Golub & LeVeque,
 * "Algorithms for computing the sample variance", 1983): the second pass subtracts the mean first,
 * and the small correction term removes the rounding left in the mean. Large offsets (values like
 * 1e13 + small noise, NIST NumAcc4) keep their precision, which a one-pass sum of squares loses.
 * O(n) time, O(1) space. Throws InputError on an empty input or a non-finite value.
 *
 * @example meanAndSquares([1, 2, 3]) // { n: 3, mean: 2, squares: 2 }
 */
function meanAndSquares(values) {
    const n = values.length;
    if (n === 0)
        throw new input_error/* InputError */.d('cannot fit an empty set of values');
    let sum = 0;
    for (let i = 0; i < n; i++) {
        const x = values[i];
        if (!Number.isFinite(x))
            throw new input_error/* InputError */.d(`value ${x} at position ${i + 1} is not a finite number`);
        sum += x;
    }
    const first = sum / n;
    let squares = 0;
    let drift = 0;
    for (let i = 0; i < n; i++) {
        const d = values[i] - first;
        squares += d * d;
        drift += d;
    }
    squares -= (drift * drift) / n;
    return { n, mean: first + drift / n, squares: Math.max(0, squares) };
}
/** Arithmetic mean (two-pass, see meanAndSquares). @example mean([2, 4]) // 3 */
function mean(values) {
    return meanAndSquares(values).mean;
}
/**
 * Variance dividing by n ("mle", the maximum-likelihood estimate) or by n - 1 ("unbiased").
 * @example variance([1, 2, 3, 4], 'mle') // 1.25
 */
function variance(values, divisor) {
    const { n, squares } = meanAndSquares(values);
    if (divisor === 'unbiased') {
        if (n < 2)
            throw new InputError('the unbiased variance needs at least 2 values');
        return squares / (n - 1);
    }
    return squares / n;
}

;// CONCATENATED MODULE: ./src/gate/analyse-group.ts





/**
 * Shares of the group's level. A change usually touches one benchmark, which the own moves find
 * far sooner than the distance (it spreads its power over every member), so they get 0.8; the
 * common move (everything slower) and the distance (broad patterns) keep 0.1 each. Spending the
 * level once for the whole group keeps its false alarms at the level, not three times it.
 */
const OWN_WEIGHT = 0.8;
const COMMON_WEIGHT = 0.1;
const DISTANCE_WEIGHT = 0.1;
/**
 * Analyses a group of metrics judged together (issue 6):
 * - joint: squared Mahalanobis distance of this run from the baseline mean, covariance shrunk
 *   toward its diagonal (Ledoit & Wolf 2004), tail by Hotelling's T^2 for a new observation
 *   (chi-square, reported only, when runs do not exceed members: Hotelling's law is undefined);
 * - common move c = mean of the signed standardised values, judged against the common move of
 *   each baseline run (predictive Student-t, n - 1 dof), so a slow runner within what runners
 *   have shown passes while a slowdown of everything beyond it does not;
 * - own moves o_j = u_j - c, each judged against its own history; a single metric that moved
 *   shows here with its own noise only, which is much smaller than the runner's.
 * The Mahalanobis distance spreads its power over p directions, so a lone moved member is found
 * far sooner by the largest own move (a union-intersection check, Bonferroni over members); the
 * group's tail is the weighted Bonferroni combination of the three checks, one test at its level.
 * O(n p^2 + p^3). Needs at least 3 rows and 2 members (the caller checks).
 * @example analyseGroup(frame).tail // 0.73 for an ordinary run
 */
function analyseGroup(frame) {
    const { rows, current } = frame;
    const n = rows.length;
    const p = current.length;
    const commons = rows.map(average);
    const now = average(current);
    const common = judgeMove(commons, now);
    const own = current.map((u, j) => judgeMove(rows.map((row, i) => row[j] - commons[i]), u - now));
    const ownTail = Math.min(1, p * Math.min(...own.map((m) => m.tail)));
    const shrunk = shrunkCovariance(rows);
    const contributions = mahalanobisContributions(current, shrunk.mean, shrunk.covariance);
    const distance = Math.max(0, contributions.reduce((sum, c) => sum + c, 0));
    const distanceTail = n > p ? hotellingTail(distance, p, n) : chiSquareTail(distance, p);
    return {
        n,
        p,
        common,
        own,
        ownTail,
        distance,
        distanceTail,
        shrinkage: shrunk.shrinkage,
        shares: contributions.map((c) => (distance > 0 ? c / distance : 0)),
        tail: Math.min(1, ownTail / OWN_WEIGHT, common.tail / COMMON_WEIGHT, n > p ? distanceTail / DISTANCE_WEIGHT : 1),
    };
}
const MIN_MOVE_SD = 1e-6;
/** A new value against the history of the same quantity: z and the predictive t tail. */
function judgeMove(history, value) {
    const { n, mean, squares } = meanAndSquares(history);
    // Values are in member sd units; a history with no spread at all (members moving in perfect
    // lockstep) gets a floor of 1e-6 of a member's sd, far below any real noise, so a move off it
    // is extreme instead of undefined.
    const sd = Math.max(Math.sqrt(squares / (n - 1)), MIN_MOVE_SD);
    const z = (value - mean) / sd;
    return { z, tail: (0,tails/* studentTail */.gq)(z / Math.sqrt(1 + 1 / n), n - 1, 'both') };
}
function average(values) {
    let sum = 0;
    for (const v of values)
        sum += v;
    return sum / values.length;
}

;// CONCATENATED MODULE: ./src/gate/decide-group.ts



/** A member counts as a main contributor when its share is at least this part of the largest. */
const MAIN_SHARE = 0.5;
/**
 * Decides a judged group and its members. `test` is the group's tail (raw, or adjusted by family
 * control) against the level; when it fires, the checks whose weighted tail is below the level
 * are the finding (see OWN_WEIGHT). Members follow it:
 * - when the common move is beyond its history, every member that moved that way with it is;
 * - otherwise, when the group's test fires, a main contributor (own move significant on its own at the
 *   own moves' share of the level, or a Mahalanobis share >= half the largest) is regressed or improved by
 *   the side its own move lies on, beyond the tolerance;
 * - everyone else is ok, even if alone it would have looked far off: the group explains it.
 * The group is regressed when a member is, improved when a member is and none regressed.
 * @example decideGroup('timings', frame, analysis, 0.0024, test).group.status // 'ok'
 */
function decideGroup(name, frame, analysis, level, test) {
    const commonFired = test.significant && analysis.common.tail / COMMON_WEIGHT < level;
    const commonStatus = commonFired ? (analysis.common.z > 0 ? 'regressed' : 'improved') : 'ok';
    const maxShare = Math.max(...analysis.shares);
    const members = frame.members.map((input, j) => {
        const own = analysis.own[j];
        const share = analysis.shares[j];
        const main = (own.tail * analysis.p) / OWN_WEIGHT < level ||
            (analysis.n > analysis.p && analysis.distanceTail / DISTANCE_WEIGHT < level && share >= MAIN_SHARE * maxShare);
        const describe = `in group ${name}: own move ${signed(own.z)} sd, ${formatPercent(share)} of the joint distance`;
        const single = input.score;
        const withCommon = (commonStatus === 'regressed' && single.direction === 'worse') ||
            (commonStatus === 'improved' && single.direction === 'better');
        const commonPhrase = `common move ${signed(analysis.common.z)} sd, tail ${formatNumber(analysis.common.tail)}`;
        if (withCommon) {
            return decideMetric(single, { significant: true, phrase: `${describe}; ${commonPhrase}, beyond the group's history; ${test.phrase}` });
        }
        if (test.significant && main) {
            const direction = ownDirection(own.z, single.settings.worse === 'both');
            return decideMetric({ ...single, direction }, { significant: true, phrase: `${describe}; ${test.phrase}` });
        }
        const quiet = `${describe}; ${commonPhrase} within the group's history; ${test.phrase}`;
        return { ...decideMetric(single, { significant: false, phrase: quiet }), group: name };
    });
    for (const m of members)
        m.group = name;
    const status = members.some((m) => m.status === 'regressed')
        ? 'regressed'
        : members.some((m) => m.status === 'improved')
            ? 'improved'
            : 'ok';
    const group = {
        name,
        status,
        members: frame.members.map((input, j) => ({
            name: input.score.result.name,
            share: analysis.shares[j],
            ownZ: analysis.own[j].z,
        })),
        n: analysis.n,
        distance: analysis.distance,
        tail: analysis.tail,
        level,
        common: { z: analysis.common.z, tail: analysis.common.tail, status: commonStatus },
        shrinkage: analysis.shrinkage,
        reason: groupReason(status, analysis, test, commonStatus, level),
    };
    return { group, members };
}
function ownDirection(z, both) {
    if (z === 0)
        return 'none';
    return z > 0 || both ? 'worse' : 'better';
}
function signed(x) {
    return `${x >= 0 ? '+' : '-'}${formatNumber(Math.abs(x))}`;
}
function groupReason(status, a, test, common, level) {
    const joint = `distance ${formatNumber(a.distance)} over ${a.p} metrics and ${a.n} runs; ${test.phrase}`;
    const commonText = `common move ${signed(a.common.z)} sd (tail ${formatNumber(a.common.tail)}, level ${formatNumber(level)})`;
    if (common !== 'ok')
        return `${commonText} is beyond the group's history; ${joint}`;
    return `${status === 'ok' ? 'no member moved beyond the group' : 'a member moved on its own'}; ${joint}; ${commonText}`;
}

;// CONCATENATED MODULE: ./src/gate/resolution-floor.ts
/**
 * The sigma floor on the fit scale for a `resolution` given in the metric's own unit.
 * On the log scale a step dx near a centre m is a step of about dx / m in log x (d log x = dx / x),
 * so the floor becomes resolution / exp(centre). With `relative-to` the fitted values are ratios,
 * and the resolution is read in the ratio's unit.
 * @example fitScaleFloor(2, 'log', Math.log(100)) // 0.02
 */
function fitScaleFloor(resolution, transform, centre) {
    if (transform === 'none' || resolution === 0)
        return resolution;
    return resolution / Math.exp(centre);
}

;// CONCATENATED MODULE: ./src/gate/sides.ts
/**
 * Classifies a deviation (this run minus the baseline centre) by the metric's `worse` setting.
 * `worse: both` has no better side: any move away from the centre is worse. A zero move is neither.
 * Transforms are monotone, so the sign on the fit scale equals the sign on the metric's own scale.
 * @example directionOf(0.3, 'lower') // 'better'
 */
function directionOf(deviation, worse) {
    if (deviation === 0 || Number.isNaN(deviation))
        return 'none';
    if (worse === 'both')
        return 'worse';
    const up = deviation > 0;
    return up === (worse === 'higher') ? 'worse' : 'better';
}
/**
 * +1 when higher is worse, -1 when lower is worse; the sign that turns a deviation into a
 * "worse is positive" one. `both` counts as +1 (the group's common move is read as a slowdown).
 * @example worseSign('lower') // -1
 */
function worseSign(worse) {
    return worse === 'lower' ? -1 : 1;
}

;// CONCATENATED MODULE: ./src/gate/group-frame.ts



/**
 * Aligns the members' windows (before any change-point shortening) on the runs they share and standardises each column by its mean
 * and n-1 sd over those runs (sd floored at the member's resolution). A member whose column has
 * no spread cannot be standardised and is left out (`dropped`), to be judged alone.
 * O(runs x members).
 * @example frameGroup(members).rows.length // number of shared baseline runs
 */
function frameGroup(inputs) {
    const shared = sharedRunIds(inputs);
    const members = [];
    const dropped = [];
    const columns = [];
    const current = [];
    for (const input of inputs) {
        const byRun = new Map();
        const whole = input.baseline.window ?? input.baseline;
        whole.runIds.forEach((id, i) => byRun.set(id, whole.values[i]));
        const column = shared.map((id) => byRun.get(id));
        const { settings } = input.score;
        const stats = column.length >= 2 ? meanAndSquares(column) : { n: column.length, mean: 0, squares: 0 };
        const floor = fitScaleFloor(settings.resolution, settings.transform, stats.mean);
        const sd = Math.max(Math.sqrt(stats.squares / Math.max(stats.n - 1, 1)), floor);
        if (!(sd > 0) || input.score.current === undefined) {
            dropped.push(input);
            continue;
        }
        const sign = worseSign(settings.worse);
        members.push(input);
        columns.push(column.map((x) => (sign * (x - stats.mean)) / sd));
        current.push((sign * (input.score.current - stats.mean)) / sd);
    }
    const rows = shared.map((_, i) => columns.map((column) => column[i]));
    return { members, rows, current, dropped };
}
/** Run ids present in every member's whole window, in the first member's (history) order. */
function sharedRunIds(inputs) {
    const [first, ...others] = inputs;
    if (first === undefined)
        return [];
    const ids = (input) => (input.baseline.window ?? input.baseline).runIds;
    const sets = others.map((input) => new Set(ids(input)));
    return ids(first).filter((id) => sets.every((set) => set.has(id)));
}

;// CONCATENATED MODULE: ./src/gate/judge-groups.ts






/**
 * Gathers the scored metrics of each configured group (`groups:` in the config) and analyses the
 * groups that can be judged: at least 2 members with spread and as many shared baseline runs as
 * the members' largest `min-runs` (and 3). Others come back as `learning` groups whose members
 * stay judged alone. The group's level is cutoffLevel of its strictest member's cutoff.
 * @example judgeGroups(config, entries, groupOf).judged.has('bench/parse') // true
 */
function judgeGroups(config, entries, groupOf) {
    const judged = new Set();
    const pending = [];
    const learning = [];
    const byGroup = new Map();
    for (const entry of entries) {
        const group = groupOf(entry.score.result.name);
        if (group !== undefined)
            byGroup.set(group, [...(byGroup.get(group) ?? []), entry]);
    }
    for (const spec of config.groups) {
        const inputs = byGroup.get(spec.name);
        if (inputs === undefined)
            continue;
        const frame = frameGroup(inputs);
        const level = Math.min(...inputs.map((e) => (0,tails/* cutoffLevel */.yp)(e.score.settings.cutoff)));
        const minRows = Math.max(3, ...inputs.map((e) => e.score.settings.minRuns));
        if (frame.members.length < 2 || frame.rows.length < minRows) {
            learning.push(learningGroup(spec.name, frame.members.length, frame.rows.length, minRows, level));
            continue;
        }
        let analysis;
        try {
            analysis = analyseGroup(frame);
        }
        catch (error) {
            // A covariance no ridge can rescue (members that are exact copies of each other): say so
            // and judge the members alone rather than stop the whole gate.
            if (!(error instanceof input_error/* InputError */.d))
                throw error;
            const reason = `cannot be judged together: ${error.message}; members are judged alone`;
            learning.push({ ...learningGroup(spec.name, frame.members.length, frame.rows.length, minRows, level), reason });
            continue;
        }
        for (const member of frame.members)
            judged.add(member.score.result.name);
        pending.push({
            analysis,
            level,
            decide(family) {
                const significant = analysis.tail < level;
                const test = family?.test ?? {
                    significant,
                    phrase: `joint tail ${formatNumber(analysis.tail)} ${significant ? '<' : '≥'} level ${formatNumber(level)}`,
                };
                const decided = decideGroup(spec.name, frame, analysis, level, test);
                Object.assign(decided.group, { distanceTail: analysis.distanceTail, ownTail: analysis.ownTail });
                if (family !== undefined)
                    decided.group.adjusted = family.adjusted;
                return decided;
            },
        });
    }
    return { judged, pending, learning };
}
function learningGroup(name, members, rows, minRows, level) {
    const reason = members < 2
        ? `only ${members} member${members === 1 ? '' : 's'} with enough varying history; a group needs 2`
        : `only ${rows} baseline runs hold every member; ${minRows} needed`;
    return {
        name,
        status: 'learning',
        members: [],
        n: rows,
        distance: 0,
        tail: 1,
        level,
        common: { z: 0, tail: 1, status: 'ok' },
        shrinkage: 0,
        reason: `${reason}; members are judged alone until then`,
    };
}

;// CONCATENATED MODULE: ./src/model/median.ts

/** Rejects what has no median: an empty set or a non-finite value (1-based position in the message). */
function checkFinite(values) {
    if (values.length === 0)
        throw new input_error/* InputError */.d('cannot take the median of an empty set of values');
    for (let i = 0; i < values.length; i++) {
        const x = values[i];
        if (!Number.isFinite(x))
            throw new input_error/* InputError */.d(`value ${x} at position ${i + 1} is not a finite number`);
    }
}
/**
 * Moves the k-th smallest of buffer[0..length) to index k, smaller-or-equal values before it and
 * larger-or-equal after (Hoare's FIND / quickselect, Hoare 1961, "Algorithm 65: Find"), with a
 * median-of-three pivot so sorted and reversed inputs stay linear. O(length) expected.
 * The values must be finite (no NaN: comparisons with NaN would not order).
 */
function selectInPlace(buffer, length, k) {
    let lo = 0;
    let hi = length - 1;
    while (hi > lo) {
        const mid = (lo + hi) >> 1;
        // Median of three: order buffer[lo] <= buffer[mid] <= buffer[hi], pivot on the middle one.
        if (buffer[mid] < buffer[lo])
            swap(buffer, mid, lo);
        if (buffer[hi] < buffer[lo])
            swap(buffer, hi, lo);
        if (buffer[hi] < buffer[mid])
            swap(buffer, hi, mid);
        const pivot = buffer[mid];
        let i = lo;
        let j = hi;
        while (i <= j) {
            while (buffer[i] < pivot)
                i++;
            while (buffer[j] > pivot)
                j--;
            if (i <= j) {
                swap(buffer, i, j);
                i++;
                j--;
            }
        }
        // Now [lo, j] <= pivot <= [i, hi], and any index strictly between j and i holds the pivot.
        if (k <= j)
            hi = j;
        else if (k >= i)
            lo = i;
        else
            break;
    }
    return buffer[k];
}
function swap(buffer, a, b) {
    const t = buffer[a];
    buffer[a] = buffer[b];
    buffer[b] = t;
}
/**
 * Median of buffer[0..length), reordering that part of the buffer (no copy). For the change-point
 * detector, which reuses one scratch buffer per call. The values must be finite and length >= 1.
 * O(length) expected (selection, not a sort): the same value a sort would give.
 * @example medianInPlace(Float64Array.of(3, 1, 2, 10), 4) // 2.5
 */
function medianInPlace(buffer, length) {
    const half = length >> 1;
    const upper = selectInPlace(buffer, length, half);
    if (length % 2 === 1)
        return upper;
    // Everything before `half` is <= the upper middle value; the lower middle is their largest.
    let lower = buffer[0];
    for (let i = 1; i < half; i++)
        if (buffer[i] > lower)
            lower = buffer[i];
    return (lower + upper) / 2;
}
/**
 * Median of the values. O(n) expected, by selection on a copy (the input is not reordered).
 * Throws InputError on an empty input or a non-finite value.
 * @example median([3, 1, 2, 10]) // 2.5
 */
function median(values) {
    checkFinite(values);
    return medianInPlace(Float64Array.from(values), values.length);
}
/**
 * Median absolute deviation from the median (unscaled). Multiply by 1.4826 for a consistent
 * estimate of sigma under a Gaussian (Rousseeuw & Croux 1993; 1.4826 = 1 / Phi^-1(3/4)).
 * Throws InputError on an empty input or a non-finite value.
 * @example medianAbsoluteDeviation([1, 2, 3, 4, 100]) // 1
 */
function medianAbsoluteDeviation(values) {
    checkFinite(values);
    const n = values.length;
    const scratch = Float64Array.from(values);
    const centre = medianInPlace(scratch, n);
    // The median of |x - centre| does not depend on the order, so the reordered copy serves.
    for (let i = 0; i < n; i++)
        scratch[i] = Math.abs(scratch[i] - centre);
    return medianInPlace(scratch, n);
}

;// CONCATENATED MODULE: ./src/model/fit.ts



/** 1 / Phi^-1(3/4): makes the MAD a consistent estimate of a Gaussian's sigma. */
const MAD_TO_SIGMA = 1.4826;
/** sqrt(pi / 2): makes the mean absolute deviation a consistent estimate of a Gaussian's sigma. */
const MEAN_AD_TO_SIGMA = Math.sqrt(Math.PI / 2);
/**
 * Fits a Gaussian to the values.
 * - mle: mean and sqrt((1/n) sum (x - mean)^2), the maximum-likelihood estimate.
 * - unbiased: the same mean, dividing by n - 1.
 * - robust: median and 1.4826 x MAD, which a past outlier inside the baseline barely moves.
 *   When more than half the values are equal the MAD is 0 although the values vary; then the
 *   mean absolute deviation from the median x sqrt(pi/2) is used instead (common practice), so a
 *   quantised metric does not get a zero spread.
 * The spread is never below `resolution` (the smallest meaningful step). It is 0 only for a
 * constant history (or a single run) with resolution 0; the relative densities treat a zero
 * spread as "any other value is infinitely unlikely" instead of returning NaN.
 * O(n) (robust: O(n) expected, the medians by selection). Throws InputError on an empty input,
 * a non-finite value or a negative or non-finite resolution.
 *
 * @example fitGaussian([9, 10, 11], 'mle') // { n: 3, mean: 10, sd: 0.8165, sampleSd: 1, ... }
 */
function fitGaussian(values, method = 'mle', resolution = 0) {
    const { n, mean, squares } = meanAndSquares(values);
    if (!(resolution >= 0) || !Number.isFinite(resolution)) {
        throw new input_error/* InputError */.d(`resolution must be a finite number, 0 or more, got ${resolution}`, {
            fix: 'set `resolution` to the smallest meaningful step of the metric, or 0',
        });
    }
    const sampleVariance = n > 1 ? squares / (n - 1) : 0;
    let centre;
    let spread;
    let sampleSpread;
    if (method === 'robust') {
        centre = median(values);
        spread = MAD_TO_SIGMA * medianAbsoluteDeviation(values);
        if (spread === 0)
            spread = MEAN_AD_TO_SIGMA * meanAbsoluteDeviation(values, centre);
        sampleSpread = spread;
    }
    else {
        centre = mean;
        spread = Math.sqrt(method === 'mle' ? squares / n : sampleVariance);
        sampleSpread = Math.sqrt(sampleVariance);
    }
    return {
        n,
        mean: centre,
        sd: Math.max(spread, resolution),
        sampleSd: Math.max(sampleSpread, resolution),
        method,
    };
}
/** Mean of |x - centre| (values already checked finite by meanAndSquares). */
function meanAbsoluteDeviation(values, centre) {
    let sum = 0;
    for (let i = 0; i < values.length; i++)
        sum += Math.abs(values[i] - centre);
    return sum / values.length;
}

;// CONCATENATED MODULE: ./src/model/change-points.ts



/**
 * Scratch buffers shared by every call (the gate runs this once per metric; fresh typed arrays per
 * call were most of its cost). Grown on demand, never shrunk; safe because a call never yields
 * and nothing it calls re-enters detectChangePoints.
 */
let scratchSize = 0;
let work = new Float64Array(0);
let centred = new Float64Array(0);
let sum = new Float64Array(0);
let sumSq = new Float64Array(0);
let best = new Float64Array(0);
let totals = new Float64Array(0);
let previous = new Int32Array(0);
let candidates = new Int32Array(0);
let dropAt = new Int32Array(0);
function ensureScratch(n) {
    if (n + 1 <= scratchSize)
        return;
    scratchSize = Math.max(n + 1, 2 * scratchSize);
    work = new Float64Array(scratchSize);
    centred = new Float64Array(scratchSize);
    sum = new Float64Array(scratchSize);
    sumSq = new Float64Array(scratchSize);
    best = new Float64Array(scratchSize);
    totals = new Float64Array(scratchSize);
    previous = new Int32Array(scratchSize);
    candidates = new Int32Array(scratchSize);
    dropAt = new Int32Array(scratchSize);
}
/**
 * The noise sigma of centred[0..n), estimated from successive differences so level shifts barely
 * bias it: x_{t+1} - x_t has variance 2 sigma^2 within a segment, and a step touches one
 * difference only. Robust (1.4826 MAD / sqrt 2), falling back to the plain RMS of differences for
 * quantised data. The MAD is taken by selection in the `work` buffer (no sort, no copy).
 */
function noiseSigma(n) {
    const m = n - 1;
    const w = work;
    const c = centred;
    for (let i = 1; i < n; i++)
        w[i - 1] = finite(c[i] - c[i - 1], i);
    const centre = medianInPlace(w, m);
    // Refilled in series order (not from the reordered buffer) so an overflow names its position.
    for (let i = 1; i < n; i++)
        w[i - 1] = finite(Math.abs(c[i] - c[i - 1] - centre), i);
    const robust = (MAD_TO_SIGMA * medianInPlace(w, m)) / Math.SQRT2;
    if (robust > 0)
        return robust;
    // Summed in series order, as the differences come.
    let squares = 0;
    for (let i = 1; i < n; i++) {
        const d = c[i] - c[i - 1];
        squares += d * d;
    }
    return Math.sqrt(squares / (2 * m));
}
/** x, or InputError when a difference overflowed (values near the largest double). */
function finite(x, position) {
    if (!Number.isFinite(x))
        throw new input_error/* InputError */.d(`value ${x} at position ${position} is not a finite number`);
    return x;
}
/**
 * Where the level of a series changes, by PELT (Killick, Fearnhead & Eckley 2012, "Optimal
 * detection of changepoints with a linear computational cost"): the exact minimiser of
 *   sum over segments of C(segment) + penalty x (number of changes),
 * with C the Gaussian cost of a change in mean, C = sum (x - segment mean)^2 / sigma^2, sigma the
 * noise level estimated once from successive differences. Only the mean is modelled: CI timings
 * change spread briefly and often, and the gate refits the spread anyway; a level shift is what
 * makes an old baseline wrong. The default penalty 3 ln(n) is 1.5 x the BIC charge of 2 ln(n)
 * for a change's two parameters (where and the new mean), so pure noise rarely splits.
 * Returns the indices where new segments start, ascending; empty when none (also for a
 * constant series or fewer than 2 x minSegment values). Segment sums come from prefix sums of
 * the median-centred values, so large offsets do not lose precision. Work: O(n) expected with
 * pruning, O(n^2) worst case. Throws InputError on non-finite values or bad options.
 *
 * @example detectChangePoints([...Array(40).fill(100), ...Array(30).fill(110)].map((x, i) => x + (i % 2) * 0.5)) // [40]
 */
function detectChangePoints(values, options = {}) {
    const n = values.length;
    const minSegment = options.minSegment ?? 5;
    if (!Number.isInteger(minSegment) || minSegment < 1) {
        throw new input_error/* InputError */.d(`minSegment must be a whole number, 1 or more, got ${minSegment}`);
    }
    const penalty = options.penalty ?? 3 * Math.log(Math.max(n, 2));
    if (!(penalty >= 0) || !Number.isFinite(penalty)) {
        throw new input_error/* InputError */.d(`penalty must be a finite number, 0 or more, got ${penalty}`);
    }
    if (n < 2 * minSegment) {
        values.forEach((x, i) => {
            if (!Number.isFinite(x))
                throw new input_error/* InputError */.d(`value ${x} at position ${i + 1} is not a finite number`);
        });
        return [];
    }
    ensureScratch(n);
    const sigma = centreAndScale(values, n);
    if (!(sigma > 0))
        return [];
    prefixSums(n, sigma);
    optimalPartition(n, penalty, minSegment);
    return segmentStarts(n);
}
// The steps below are separate small functions on purpose: V8 optimises each on its own, where one
// long function compiled while its first loop ran lacked type feedback for the rest and kept
// being thrown away (a cost paid on every cold start of the gate).
/** Copies the values to the scratch, centres them on their median and returns the noise sigma. */
function centreAndScale(values, n) {
    const w = work;
    for (let i = 0; i < n; i++) {
        const x = values[i];
        if (!Number.isFinite(x))
            throw new input_error/* InputError */.d(`value ${x} at position ${i + 1} is not a finite number`);
        w[i] = x;
    }
    const centre = medianInPlace(w, n);
    const c = centred;
    for (let i = 0; i < n; i++)
        c[i] = values[i] - centre;
    return noiseSigma(n);
}
/** sum[i] and sumSq[i]: the sums of z and z^2 over the first i values, z = centred / sigma. */
function prefixSums(n, sigma) {
    const c = centred;
    const s1 = sum;
    const s2 = sumSq;
    s1[0] = 0;
    s2[0] = 0;
    for (let i = 0; i < n; i++) {
        const z = c[i] / sigma;
        s1[i + 1] = s1[i] + z;
        s2[i + 1] = s2[i] + z * z;
    }
}
/**
 * The PELT recursion: best[end] = min over kept starts of best[start] + C(start, end) + penalty,
 * previous[end] the minimising start (the first one on ties).
 * Pruning with a shortest segment m: a start s with best[s] + C(s, t) > best[t] is beaten by t
 * for every later end u, since C(s, u) >= C(s, t) + C(t, u), but t may only start a segment
 * ending at u >= t + m. So s is dropped at end t + m (when t has joined), not at once; dropping
 * it at t (plain PELT) could lose the optimum for the ends in between. With m = 1 that is the
 * next end, as in plain PELT. Candidates are compacted in place.
 */
function optimalPartition(n, penalty, minSegment) {
    const s1 = sum;
    const s2 = sumSq;
    const f = best;
    const from = previous;
    const kept = candidates;
    const t = totals;
    const until = dropAt;
    f[0] = -penalty;
    let count = 0;
    for (let end = minSegment; end <= n; end++) {
        // The start that just became far enough back joins the candidates, if it can end a segment.
        const fresh = end - minSegment;
        if (fresh === 0 || fresh >= minSegment) {
            kept[count++] = fresh;
            until[fresh] = n + 1;
        }
        const sumEnd = s1[end];
        const sumSqEnd = s2[end];
        let bestValue = Infinity;
        let bestStart = 0;
        for (let k = 0; k < count; k++) {
            const start = kept[k];
            // Segment cost C = sum z^2 - (sum z)^2 / length, never below 0 (rounding).
            const s = sumEnd - s1[start];
            const cost = Math.max(0, sumSqEnd - s2[start] - (s * s) / (end - start));
            const total = f[start] + cost + penalty;
            t[k] = total;
            if (total < bestValue) {
                bestValue = total;
                bestStart = start;
            }
        }
        f[end] = bestValue;
        from[end] = bestStart;
        // A start already worse by the penalty is beaten by `end` once `end` can start a segment.
        const beatenFrom = end + minSegment;
        let left = 0;
        for (let k = 0; k < count; k++) {
            const start = kept[k];
            if (t[k] - penalty > bestValue && beatenFrom < until[start])
                until[start] = beatenFrom;
            if (until[start] > end + 1)
                kept[left++] = start;
        }
        count = left;
    }
}
/** The segment starts after 0, ascending, read back from previous[]. */
function segmentStarts(n) {
    const from = previous;
    const starts = [];
    for (let at = from[n]; at > 0; at = from[at])
        starts.push(at);
    return starts.reverse();
}

;// CONCATENATED MODULE: ./src/model/transform.ts

/**
 * The scale a metric is fitted on. `log` suits right-skewed timings and sizes: a multiplicative
 * noise becomes additive, and the fit's sd reads as a relative spread. Values must be > 0 on log.
 * Throws InputError (where: the metric) on a non-finite value, or a value <= 0 on log.
 * @example toFitScale(Math.E, 'log', 'build/time') // 1
 */
function toFitScale(value, transform, metric) {
    if (!Number.isFinite(value)) {
        throw new input_error/* InputError */.d(`value ${value} is not a finite number`, { where: metric, fix: 'check the metric file' });
    }
    if (transform === 'none')
        return value;
    if (!(value > 0)) {
        throw new input_error/* InputError */.d(`value ${value} cannot be log-transformed (must be > 0)`, {
            where: metric,
            fix: 'use `transform: none` for this metric, or check the value',
        });
    }
    return Math.log(value);
}
/** Back from the fit scale to the metric's own scale. @example fromFitScale(0, 'log') // 1 */
function fromFitScale(value, transform) {
    return transform === 'log' ? Math.exp(value) : value;
}

;// CONCATENATED MODULE: ./src/gate/baseline.ts



/**
 * Selects a metric's baseline from the history (DESIGN.md "Statistics"):
 * 1. the runs that hold the metric (with `relative-to`: that also hold a non-zero reference, and
 *    the value becomes metric / reference of the same run, cancelling a runner's common speed);
 * 2. the newest `window` of them, moved to the fit scale (`transform`);
 * 3. with `change-points` on, PELT-style segmentation of that window (detectChangePoints); when the
 *    last segment already spans `min-runs` runs, only it is kept, so a merged level change stops
 *    counting as a regression once the new level has enough history.
 * O(window) on the plain scale (older runs are counted only when `available` is read), O(runs)
 * with a transform or ratio, plus the change-point search. Throws InputError when a value cannot
 * take the transform.
 * @example selectBaseline(history, 'build/time', settings).values // [412.5, 409.9, ...]
 */
function selectBaseline(history, name, settings) {
    const column = history.columns.get(name);
    const plain = settings.transform === 'none' && settings.relativeTo === undefined;
    const selected = column === undefined
        ? { values: [], runIds: [], available: 0 }
        : plain
            ? newestWindow(history, column.values, settings.window)
            : checkedWindow(history, name, column.values, settings);
    if (settings.relativeTo !== undefined)
        selected.relativeTo = settings.relativeTo;
    return settings.changePoints ? sinceLastChange(selected, settings.minRuns) : selected;
}
/**
 * The plain scale (no transform, no ratio), where no value can be refused: walks back from the
 * newest run only until `window` values are found, and just counts the older ones.
 */
function newestWindow(history, column, window) {
    const count = Math.min(column.length, history.runs.length);
    const values = [];
    const runIds = [];
    let i = count - 1;
    for (; i >= 0 && values.length < window; i--) {
        const x = column[i];
        if (!Number.isFinite(x))
            continue;
        values.push(x);
        runIds.push(history.runs[i].id);
    }
    const newer = values.length;
    const older = i;
    return {
        values: values.reverse(),
        runIds: runIds.reverse(),
        // Counted only when read (the `missing` wording): walking the older runs of every metric was
        // most of the selection's cost on a long history.
        get available() {
            let available = newer;
            for (let k = older; k >= 0; k--)
                if (Number.isFinite(column[k]))
                    available++;
            return available;
        },
    };
}
/**
 * Any other scale: every value of the history is checked, since the transform or ratio can refuse
 * it. One forward pass checks and counts (in run order, so an error names the oldest bad run), then
 * a walk back from the newest run builds just the `window` kept values.
 */
function checkedWindow(history, name, column, settings) {
    const reference = settings.relativeTo === undefined ? undefined : history.columns.get(settings.relativeTo);
    const ratio = settings.relativeTo !== undefined;
    const count = Math.min(column.length, history.runs.length);
    let available = 0;
    for (let i = 0; i < count; i++) {
        const x = pairedValue(column, reference?.values, ratio, i);
        if (Number.isFinite(column[i]))
            available++;
        if (x !== undefined)
            toHistoryFitScale(x, settings, name, history.runs[i].id);
    }
    const values = [];
    const runIds = [];
    for (let i = count - 1; i >= 0 && values.length < settings.window; i--) {
        const x = pairedValue(column, reference?.values, ratio, i);
        if (x === undefined)
            continue;
        const id = history.runs[i].id;
        values.push(toHistoryFitScale(x, settings, name, id));
        runIds.push(id);
    }
    return { values: values.reverse(), runIds: runIds.reverse(), available };
}
/** Run i's value, divided by the reference of the same run for a ratio; undefined when it lacks either. */
function pairedValue(column, reference, ratio, i) {
    const x = column[i];
    if (!Number.isFinite(x))
        return undefined;
    if (!ratio)
        return x;
    const r = reference?.[i];
    if (r === undefined || !Number.isFinite(r) || r === 0)
        return undefined;
    return x / r;
}
/** Keeps only the runs after the last level change, once they are at least `minRuns`. */
function sinceLastChange(baseline, minRuns) {
    if (baseline.values.length <= minRuns)
        return baseline;
    // The detector's own shortest segment (5 runs), not min-runs: forcing longer segments would
    // place a fresh change too early and mix the old level into the new baseline.
    const starts = detectChangePoints(baseline.values);
    const last = starts.filter((s) => s > 0 && s < baseline.values.length).at(-1);
    if (last === undefined || baseline.values.length - last < minRuns)
        return baseline;
    return {
        ...baseline,
        values: baseline.values.slice(last),
        runIds: baseline.runIds.slice(last),
        since: baseline.runIds[last],
        window: { values: baseline.values, runIds: baseline.runIds },
    };
}
function toHistoryFitScale(x, settings, name, runId) {
    try {
        return toFitScale(x, settings.transform, name);
    }
    catch (error) {
        if (!(error instanceof input_error/* InputError */.d))
            throw error;
        throw new input_error/* InputError */.d(`history run ${runId} has value ${x} for ${name}, which cannot be log-transformed`, {
            where: name,
            fix: 'use `transform: none` for this metric, or remove the bad run from the history',
            cause: error,
        });
    }
}

// EXTERNAL MODULE: ./src/model/density.ts
var density = __webpack_require__(20913);
;// CONCATENATED MODULE: ./src/gate/judge-metric.ts









/** Newest baseline values kept in a result for sparklines. */
const RECENT_VALUES = 30;
/**
 * Judges one metric alone (DESIGN.md "Statistics"). Pure, so the cutoff-tuning replay reuses it.
 * - fit the baseline (fit scale) by `fit`, sigma floored at `resolution` (see fitScaleFloor);
 * - z = (x - mean) / sd; density = Gaussian p(x); relative density r = p(x) / p(mode):
 *   predictive Student-t with n - 1 dof and scale s sqrt(1 + 1/n), or plug-in exp(-z^2 / 2)
 *   (plug-in also when n < 2, where the t has no degrees of freedom);
 * - tail = two-sided tail probability of the deviation under that same distribution;
 * - regressed when r < cutoff on the worse side beyond the tolerance; improved likewise on the
 *   better side; learning below `min-runs`; new with no baseline.
 * A zero spread (constant history, resolution 0) is decided by the tolerance alone, with r = 0
 * for any move and no z. Throws InputError for a value that cannot take the transform.
 * @example judgeMetric('t', settings, [9, 10, 11, 10, 10, 9, 11, 10], 14).status // 'regressed'
 */
function judgeMetric(name, settings, baseline, value, extras = {}) {
    return scoreMetric(name, settings, baseline, value, extras).result;
}
/** judgeMetric, keeping the pieces that family control and groups decide on. */
function scoreMetric(name, settings, baseline, value, extras = {}) {
    if (!Number.isFinite(value)) {
        throw new input_error/* InputError */.d(`value ${value} of ${name} is not a finite number`, { where: name, fix: 'check the metric file' });
    }
    const current = toFitScale(value, settings.transform, name);
    // Built key by key (in the report's key order) rather than by spreads: this runs per metric.
    const base = { name, status: 'ok', value, cutoff: settings.cutoff, worse: settings.worse, reason: '' };
    if (extras.unit !== undefined)
        base.unit = extras.unit;
    if (extras.count !== undefined)
        base.count = extras.count;
    const n = baseline.length;
    if (n === 0)
        return unscored(settings, { ...base, status: 'new', reason: 'no history for this metric yet' });
    base.recent = recentValues(baseline, settings.transform);
    if (n < settings.minRuns) {
        const reason = `only ${n} baseline run${n === 1 ? '' : 's'}; min-runs is ${settings.minRuns}`;
        const early = fitWithFloor(baseline, settings);
        return unscored(settings, { ...base, status: 'learning', baseline: { n, mean: early.mean, sd: early.sd }, reason });
    }
    const fit = fitWithFloor(baseline, settings);
    const centre = fromFitScale(fit.mean, settings.transform);
    const summary = { n, mean: fit.mean, sd: fit.sd };
    if (settings.transform === 'log')
        summary.scale = 'log';
    if (extras.since !== undefined)
        summary.since = extras.since;
    if (extras.relativeTo !== undefined)
        summary.relativeTo = extras.relativeTo;
    base.baseline = summary;
    if (centre !== 0)
        base.change = (value - centre) / centre;
    const deviation = current - fit.mean;
    addDeviationFigures(base, current, fit, settings);
    const score = {
        result: base,
        settings,
        scored: true,
        direction: directionOf(deviation, settings.worse),
        beyondTolerance: beyondTolerance(value, centre, settings.tolerance),
        current,
        fit,
    };
    // `base` is this call's own object, so the decision is written into it (decideMetric would copy).
    const decided = decision(score, plainTest(base));
    base.status = decided.status;
    base.reason = decided.reason;
    return score;
}
/** A new or learning result, which no later decision changes. */
function unscored(settings, result) {
    return { settings, scored: false, direction: 'none', beyondTolerance: false, result };
}
/** The newest RECENT_VALUES baseline values on the metric's own scale. */
function recentValues(baseline, transform) {
    const recent = baseline.slice(-RECENT_VALUES);
    if (transform === 'none')
        return recent;
    for (let i = 0; i < recent.length; i++)
        recent[i] = fromFitScale(recent[i], transform);
    return recent;
}
/** fitGaussian with the resolution moved to the fit scale around the fitted centre. */
function fitWithFloor(values, settings) {
    const raw = fitGaussian(values, settings.fit, 0);
    const floor = fitScaleFloor(settings.resolution, settings.transform, raw.mean);
    return floor > 0 ? fitGaussian(values, settings.fit, floor) : raw;
}
/** Sets z, density, relative density and tail on the result; a zero spread gives 0 or 1 and no z. */
function addDeviationFigures(result, x, fit, settings) {
    const deviation = x - fit.mean;
    const predictive = settings.uncertainty === 'predictive' && fit.n >= 2;
    if (fit.sd === 0 || (predictive && fit.sampleSd === 0)) {
        const moved = deviation !== 0;
        result.relativeDensity = moved ? 0 : 1;
        result.tail = moved ? 0 : 1;
        return;
    }
    const z = deviation / fit.sd;
    result.z = z;
    result.density = (0,density/* gaussianDensity */.QA)(x, fit.mean, fit.sd);
    if (!predictive) {
        result.relativeDensity = (0,density/* plugInRelativeDensity */.YS)(x, fit.mean, fit.sd);
        result.tail = (0,tails/* normalTail */.WI)(z, 'both');
        return;
    }
    const t = deviation / (0,density/* predictiveScale */.Wn)(fit.sampleSd, fit.n);
    result.relativeDensity = (0,density/* predictiveRelativeDensity */.kr)(x, fit.mean, fit.sampleSd, fit.n);
    result.tail = (0,tails/* studentTail */.gq)(t, fit.n - 1, 'both');
}

;// CONCATENATED MODULE: ./src/gate/judge-name.ts



/**
 * Every metric named by this run or holding a value in the history, in code-unit order (the same
 * on every machine). Names come from Maps, so `__proto__` is an ordinary name.
 * @example metricNames(history, run) // ['bundle/app.js', 'time/parse']
 */
function metricNames(history, run) {
    const names = new Set(run.metrics.keys());
    for (const [name, column] of history.columns) {
        if (!names.has(name) && holdsValue(column.values))
            names.add(name);
    }
    // The default sort compares strings by UTF-16 code units, the same order as `<`, without a
    // callback per comparison.
    return [...names].sort();
}
/** Whether any value is finite (a plain loop: `some` with a closure costs more per metric). */
function holdsValue(values) {
    for (let i = 0; i < values.length; i++)
        if (Number.isFinite(values[i]))
            return true;
    return false;
}
/**
 * One metric up to its single-metric score: `ignored` by a rule, `missing` from this run, `new`,
 * `learning`, or a scored entry (with its baseline) that groups and family control decide on.
 * With `relative-to`, this run's value becomes metric / reference; a run lacking a usable
 * reference gets a result that says so instead of a crash.
 * @example judgeName(config, history, run, 'time/parse') // { score, baseline }
 */
function judgeName(config, history, run, name) {
    const settings = settingsFor(config, name);
    const measurement = run.metrics.get(name);
    if (settings.ignore) {
        return { result: { ...plain(name, settings), ...own(measurement), status: 'ignored', reason: 'matched a rule with ignore: true' } };
    }
    const baseline = selectBaseline(history, name, settings);
    if (measurement === undefined) {
        const runs = `${baseline.available} run${baseline.available === 1 ? '' : 's'}`;
        return { result: { ...plain(name, settings), status: 'missing', reason: `in the history (${runs}) but absent from this run` } };
    }
    let value = measurement.value;
    if (settings.relativeTo !== undefined) {
        const reference = run.metrics.get(settings.relativeTo)?.value;
        if (reference === undefined || !Number.isFinite(reference) || reference === 0) {
            const lacks = reference === undefined ? 'lacks' : `has ${reference} for`;
            const reason = `cannot be judged relative to ${settings.relativeTo}: this run ${lacks} that metric`;
            const status = baseline.values.length === 0 ? 'new' : 'missing';
            return { result: { ...plain(name, settings), ...own(measurement), status, reason } };
        }
        value /= reference;
    }
    // Set key by key rather than spread: this runs once per metric.
    const extras = { count: measurement.count };
    // a ratio has no unit
    if (measurement.unit !== undefined && settings.relativeTo === undefined)
        extras.unit = measurement.unit;
    if (baseline.since !== undefined)
        extras.since = baseline.since;
    if (baseline.relativeTo !== undefined)
        extras.relativeTo = baseline.relativeTo;
    const score = scoreMetric(name, settings, baseline.values, value, extras);
    return score.scored ? { score, baseline } : { result: score.result };
}
/** The fields every result of this metric starts with. */
function plain(name, settings) {
    return { name, cutoff: settings.cutoff, worse: settings.worse };
}
/** This run's own value, count and unit, for the results that are not scored. */
function own(measurement) {
    if (measurement === undefined)
        return {};
    const fields = { value: measurement.value, count: measurement.count };
    if (measurement.unit !== undefined)
        fields.unit = measurement.unit;
    return fields;
}

;// CONCATENATED MODULE: ./src/gate/report.ts
const REPORT_SCHEMA = 'bellgate.report/1';

;// CONCATENATED MODULE: ./src/gate/verdict.ts
/**
 * The run's verdict (DESIGN.md): `regressed` when any metric or group regressed (`accepted`
 * instead when the pull request carries the accept label); `learning` when no metric had enough
 * history to be judged; otherwise `pass`.
 * @example decideVerdict([{ status: 'ok' }], [], false) // 'pass'
 */
function decideVerdict(metrics, groups, accepted) {
    const regressed = metrics.some((m) => m.status === 'regressed') || groups.some((g) => g.status === 'regressed');
    if (regressed)
        return accepted ? 'accepted' : 'regressed';
    const judged = metrics.some((m) => JUDGED.has(m.status)) || groups.some((g) => g.status !== 'learning');
    return judged ? 'pass' : 'learning';
}
/** Statuses that mean the metric had enough history to be judged. */
const JUDGED = new Set(['ok', 'regressed', 'improved']);
const RANK = {
    regressed: 0,
    improved: 1,
    ok: 2,
    learning: 2,
    new: 2,
    missing: 2,
    ignored: 2,
};
/**
 * Report order: regressed first, then improved, then the rest, each by name (code-unit order,
 * the same on every machine). Returns a new array.
 * @example orderMetrics(results).map((m) => m.status) // ['regressed', 'improved', 'ok', 'new']
 */
function orderMetrics(metrics) {
    return [...metrics].sort((a, b) => RANK[a.status] - RANK[b.status] || (a.name < b.name ? -1 : a.name > b.name ? 1 : 0));
}

;// CONCATENATED MODULE: ./src/gate/gate.ts








/**
 * The decision (DESIGN.md "Statistics", issue 6): every metric of the run and of the history is
 * scored against its baseline (selectBaseline, scoreMetric); metrics in a configured group are
 * judged together (judgeGroups); with `family` set, the tails of all remaining decisions are
 * adjusted together (familyTests); then the verdict. Pure: no I/O, no clock.
 * Throws InputError for values the settings cannot take (e.g. <= 0 on the log scale).
 * @example runGate({ config: defaultConfig(), history, run, series: 'main' }).verdict // 'pass'
 */
function runGate(input) {
    const { config, history, run } = input;
    const finished = [];
    const scored = [];
    for (const name of metricNames(history, run)) {
        const entry = judgeName(config, history, run, name);
        if ('score' in entry)
            scored.push(entry);
        else
            finished.push(entry.result);
    }
    // Without groups or family control (the defaults) nothing below changes a lone score, so the
    // per-metric group lookups and cutoff levels are skipped.
    const groupOutcome = config.groups.length === 0 ? NO_GROUPS : judgeGroups(config, scored, (name) => groupFor(config, name)?.name);
    const lone = groupOutcome.judged.size === 0 ? scored : scored.filter((e) => !groupOutcome.judged.has(e.score.result.name));
    const tests = config.family === 'none'
        ? []
        : familyTests([
            ...lone.map((e) => ({ tail: e.score.result.tail ?? 1, level: (0,tails/* cutoffLevel */.yp)(e.score.settings.cutoff) })),
            ...groupOutcome.pending.map((g) => ({ tail: g.analysis.tail, level: g.level })),
        ], config.family);
    const metrics = [...finished];
    lone.forEach((e, i) => metrics.push(decideLone(e.score, tests[i])));
    const groups = [...groupOutcome.learning];
    groupOutcome.pending.forEach((g, i) => {
        const decided = g.decide(tests[lone.length + i]);
        groups.push(decided.group);
        metrics.push(...decided.members);
    });
    return {
        schema: REPORT_SCHEMA,
        verdict: decideVerdict(metrics, groups, input.accepted === true),
        series: input.series,
        family: config.family,
        metrics: orderMetrics(metrics),
        groups: groups.sort((a, b) => (a.name < b.name ? -1 : a.name > b.name ? 1 : 0)),
    };
}
function decideLone(score, family) {
    if (family === undefined || !score.scored)
        return score.result;
    return { ...decideMetric(score, family.test), adjusted: family.adjusted };
}
/** What judgeGroups returns when the config names no groups. */
const NO_GROUPS = {
    judged: new Set(),
    pending: [],
    learning: [],
};

// EXTERNAL MODULE: ./src/history/artifact-name.ts
var artifact_name = __webpack_require__(63278);
;// CONCATENATED MODULE: ./src/inputs/aggregate.ts


/**
 * Folds the samples of one metric in one run into one value: median (the default: robust to one
 * slow sample), mean (corrected two-pass, src/model/moments.ts), min (the usual choice for
 * timings, whose noise only adds) or max.
 * @throws Error for an empty list (collectRun never passes one).
 * @example aggregateSamples([3, 1, 2, 10], 'median') // 2.5
 */
function aggregateSamples(values, kind) {
    if (values.length === 0)
        throw new Error('aggregateSamples needs at least one value');
    switch (kind) {
        case 'mean':
            return mean(values);
        case 'min':
            return values.reduce((a, b) => Math.min(a, b));
        case 'max':
            return values.reduce((a, b) => Math.max(a, b));
        default:
            return median(values);
    }
}

;// CONCATENATED MODULE: ./src/inputs/units.ts
const NS = 1;
const TIME = {
    ns: NS, nanosecond: NS, nanoseconds: NS,
    us: 1e3, 'µs': 1e3, 'μs': 1e3, microsecond: 1e3, microseconds: 1e3,
    ms: 1e6, millisecond: 1e6, milliseconds: 1e6,
    s: 1e9, sec: 1e9, second: 1e9, seconds: 1e9,
    min: 6e10, minute: 6e10, minutes: 6e10,
    h: 3.6e12, hour: 3.6e12, hours: 3.6e12,
};
const SIZE = {
    B: 1, byte: 1, bytes: 1,
    kB: 1e3, KB: 1e3, KiB: 1024,
    MB: 1e6, MiB: 1024 ** 2,
    GB: 1e9, GiB: 1024 ** 3,
};
function simpleScale(unit) {
    if (Object.hasOwn(TIME, unit))
        return { dimension: 'time', factor: TIME[unit] };
    if (Object.hasOwn(SIZE, unit))
        return { dimension: 'size', factor: SIZE[unit] };
    return undefined;
}
/**
 * The dimension and exact factor(s) of a unit: a simple unit, or `numerator/denominator` where the
 * denominator is "op" or a time unit. Undefined for units outside the tables.
 * @example unitScale('MiB') // [{ dimension: 'size', factor: 1048576 }]
 */
function unitScale(unit) {
    const simple = simpleScale(unit);
    if (simple)
        return [simple];
    const slash = unit.indexOf('/');
    if (slash <= 0)
        return undefined;
    const top = simpleScale(unit.slice(0, slash));
    const bottomText = unit.slice(slash + 1);
    const bottom = bottomText === 'op' ? { dimension: 'op', factor: 1 } : simpleScale(bottomText);
    return top && bottom && bottom.dimension !== 'size' ? [top, bottom] : undefined;
}
/**
 * Converts a value from one unit to another of the same dimension; undefined when they are not
 * convertible (different dimensions, or a unit outside the tables and not equal as text).
 * @example convertUnit(412, 'ms', 's') // 0.412
 * @example convertUnit(1, 'ms', 'B') // undefined
 */
function convertUnit(value, from, to) {
    if (from === to)
        return value;
    const a = unitScale(from);
    const b = unitScale(to);
    if (!a || !b || a.length !== b.length)
        return undefined;
    if (a.some((part, i) => part.dimension !== b[i].dimension))
        return undefined;
    // Numerator scales up, denominator scales down; each step by an exact integer ratio.
    let out = rescale(value, a[0].factor, b[0].factor);
    if (a[1] && b[1])
        out = rescale(out, b[1].factor, a[1].factor);
    return out;
}
function rescale(value, from, to) {
    return from >= to ? value * (from / to) : value / (to / from);
}

;// CONCATENATED MODULE: ./src/inputs/collect.ts



/**
 * Folds the readings of several files into one Run. All samples of a name (repeated lines, several
 * files) are aggregated by `aggregateFor(name)` (median | mean | min | max); `count` is how many.
 * Units: the first-seen unit of a metric is kept and later samples are converted to it when both
 * are known units of the same dimension (units.ts: 1500 ms joins 2 s as 1.5 s). Meta: the first
 * value of a key wins. notFitted: the union, first reason kept.
 * @throws InputError naming both sources when a metric comes in incompatible units, or with a unit
 *   in one place and none in another.
 * @example collectRun([{ readings: [{ name: 'a', value: 1 }, { name: 'a', value: 3 }], notFitted: new Map(), meta: new Map() }], () => 'mean').metrics.get('a') // { value: 2, count: 2 }
 */
function collectRun(results, aggregateFor) {
    const byName = new Map();
    const meta = new Map();
    const notFitted = new Map();
    for (const result of results) {
        for (const reading of result.readings) {
            const seen = byName.get(reading.name);
            if (!seen) {
                byName.set(reading.name, { unit: reading.unit, where: reading.where, values: [reading.value] });
                continue;
            }
            seen.values.push(converted(reading.name, reading.value, reading.unit, reading.where, seen));
        }
        for (const [key, value] of result.meta)
            if (!meta.has(key))
                meta.set(key, value);
        for (const [name, reason] of result.notFitted)
            if (!notFitted.has(name))
                notFitted.set(name, reason);
    }
    const metrics = new Map();
    for (const [name, { unit, values, where }] of byName) {
        const value = aggregateSamples(values, aggregateFor(name));
        if (!Number.isFinite(value)) {
            throw new input_error/* InputError */.d(`the ${aggregateFor(name)} of the ${values.length} samples of ${JSON.stringify(name)} overflows`, {
                where,
                fix: 'check the values of this metric, or change its unit so the numbers are smaller',
            });
        }
        metrics.set(name, unit === undefined ? { value, count: values.length } : { value, unit, count: values.length });
    }
    return notFitted.size > 0 ? { metrics, meta, notFitted } : { metrics, meta };
}
function converted(name, value, unit, where, seen) {
    if (unit === seen.unit)
        return value;
    const out = unit !== undefined && seen.unit !== undefined ? convertUnit(value, unit, seen.unit) : undefined;
    if (out !== undefined && Number.isFinite(out))
        return out;
    const show = (u) => (u === undefined ? 'no unit' : `unit ${JSON.stringify(u)}`);
    throw new input_error/* InputError */.d(`metric ${JSON.stringify(name)} has ${show(seen.unit)} at ${seen.where ?? 'its first source'} but ${show(unit)} at ${where ?? 'another source'}, which cannot be converted`, { where, fix: 'write the metric in one unit everywhere, or in convertible units (ms and s, kB and MiB)' });
}

// EXTERNAL MODULE: ./src/inputs/limits.ts
var inputs_limits = __webpack_require__(56497);
;// CONCATENATED MODULE: ./src/inputs/formats.ts

/** The metric file formats Bellgate reads; the names `--input-format` and `input-format` accept. */
const METRIC_FORMATS = ['json', 'jsonl', 'csv', 'openmetrics', 'gobench', 'junit'];
// Other spellings users are likely to type.
const ALIASES = new Map([
    ['ndjson', 'jsonl'],
    ['json-lines', 'jsonl'],
    ['prometheus', 'openmetrics'],
    ['go', 'gobench'],
    ['xml', 'junit'],
]);
/**
 * The canonical format for a name given by a user (case-insensitive; a few aliases such as
 * `prometheus` and `ndjson`).
 * @throws InputError listing the accepted names.
 * @example metricFormat('Prometheus') // 'openmetrics'
 */
function metricFormat(name) {
    const key = name.trim().toLowerCase();
    const found = METRIC_FORMATS.includes(key) ? key : ALIASES.get(key);
    if (found)
        return found;
    throw new input_error/* InputError */.d(`unknown input format ${JSON.stringify(name)}`, {
        fix: `use one of ${METRIC_FORMATS.join(', ')}`,
    });
}

;// CONCATENATED MODULE: ./src/inputs/detect.ts


const HEAD_LINES = 64;
const GO_RESULT = /^Benchmark(?:$|[^\p{Ll}\s])\S*\s+\d+\s+\S+\s+\S+/u;
const OM_COMMENT = /^#\s+(?:TYPE|HELP|UNIT)\s+\S|^#\s*EOF\s*$/;
// Label sets are matched quote-aware and without backtracking between alternatives.
const OM_SAMPLE = /^[a-zA-Z_:][a-zA-Z0-9_:]*(?:\{(?:[^"}]|"(?:[^"\\]|\\.)*")*\})?[ \t]+[+-]?(?:\.?\d\S*|inf|nan)(?:[ \t]+\S+)?(?:[ \t]+#.*)?$/i;
const EXTENSIONS = new Map([
    ['json', 'json'], ['jsonl', 'jsonl'], ['ndjson', 'jsonl'], ['csv', 'csv'],
    ['prom', 'openmetrics'], ['om', 'openmetrics'], ['metrics', 'openmetrics'], ['xml', 'junit'],
]);
/**
 * Guesses a metric file's format from its content (the first 64 non-blank lines):
 * `<` + `<testsuite` -> junit; `{` -> json, or jsonl when the first line alone is a JSON object
 * with a "name"; a `BenchmarkX  N  v unit` line -> gobench; `# TYPE/HELP/UNIT/EOF` lines or only
 * `name{labels} value` lines -> openmetrics; a comma in the first line -> csv. When several
 * formats fit, the file extension (.json .jsonl .csv .prom .xml) decides if it names one of them.
 * @throws InputError when nothing fits, or several fit and the extension does not decide; the
 *   message lists the candidates and says to pass `--input-format`.
 * @example detectFormat('BenchmarkA-8 10 5 ns/op\n', 'out.txt') // 'gobench'
 */
function detectFormat(text, file) {
    const head = headLines(text);
    const first = head[0];
    if (first === undefined) {
        throw new input_error/* InputError */.d('the metric file is empty', { where: file, fix: 'check the step that writes this file' });
    }
    const candidates = new Set();
    if (first.startsWith('<')) {
        if (/<testsuites?[\s>/]/.test(text.slice(0, 65536)))
            candidates.add('junit');
    }
    else if (first.startsWith('{') || first.startsWith('[')) {
        candidates.add(looksLikeJsonLine(first, head.length) ? 'jsonl' : 'json');
    }
    else {
        if (head.some((line) => GO_RESULT.test(line)))
            candidates.add('gobench');
        const samples = head.filter((line) => !line.startsWith('#'));
        if (head.some((line) => OM_COMMENT.test(line)) || (samples.length > 0 && samples.every((line) => OM_SAMPLE.test(line)))) {
            candidates.add('openmetrics');
        }
        if (first.includes(',') && !first.startsWith('#'))
            candidates.add('csv');
    }
    if (candidates.size === 1)
        return [...candidates][0];
    const byExtension = EXTENSIONS.get(/\.([^./\\]+)$/.exec(file)?.[1]?.toLowerCase() ?? '');
    if (byExtension && (candidates.size === 0 ? false : candidates.has(byExtension)))
        return byExtension;
    const listed = candidates.size > 0 ? [...candidates] : [...METRIC_FORMATS];
    throw new input_error/* InputError */.d(candidates.size > 0
        ? `cannot tell the format of the metric file: it could be ${listed.join(' or ')}`
        : `the metric file is in no format Bellgate recognises (it reads ${listed.join(', ')})`, { where: file, fix: `pass --input-format (${listed.join(' | ')}) to say which` });
}
function headLines(text) {
    const out = [];
    let start = text.charCodeAt(0) === 0xfeff ? 1 : 0;
    while (start < text.length && out.length < HEAD_LINES) {
        let end = text.indexOf('\n', start);
        if (end < 0)
            end = text.length;
        // Cap each line looked at: detection must stay cheap on a huge single-line file.
        const line = text.slice(start, Math.min(end, start + 4096)).trim();
        if (line !== '')
            out.push(line);
        start = end + 1;
    }
    return out;
}
/** A first line that is a whole JSON object with a string "name" starts JSON Lines. */
function looksLikeJsonLine(first, lineCount) {
    if (!first.startsWith('{') || !first.endsWith('}'))
        return false;
    try {
        const value = JSON.parse(first);
        return typeof value === 'object' && value !== null && typeof value.name === 'string' && (lineCount > 1 || !('metrics' in value));
    }
    catch {
        return false;
    }
}

;// CONCATENATED MODULE: ./src/inputs/parse-core.ts



/** Drops a byte-order mark and settles the format (given, or detected from the content). */
function chooseFormat(text, file, format) {
    const body = text.charCodeAt(0) === 0xfeff ? text.slice(1) : text;
    const chosen = format === undefined || format === '' ? detectFormat(body, file) : metricFormat(format);
    return { body, chosen };
}
/**
 * Runs a reader so that only InputError comes out, and refuses a file that yields no metric at all
 * (almost always a step that failed to write it).
 */
function runReader(reader, chosen, body, file, limits) {
    let result;
    try {
        result = reader(body, file, limits);
    }
    catch (error) {
        if (error instanceof input_error/* InputError */.d)
            throw error;
        // A library failing in a way it does not document must still reach the user as bad input.
        throw new input_error/* InputError */.d(`cannot read the file as ${chosen}: ${error instanceof Error ? error.message : String(error)}`, {
            where: file,
            fix: 'check the file, or choose another format with --input-format',
            cause: error,
        });
    }
    if (result.readings.length === 0 && result.notFitted.size === 0) {
        throw new input_error/* InputError */.d(`no metrics found in the file (read as ${chosen})`, {
            where: file,
            fix: 'check the step that writes this file, or choose another format with --input-format',
        });
    }
    return result;
}

;// CONCATENATED MODULE: ./src/inputs/parse-lazy.ts


// Each reader (and its parser library: csv-parse, fast-xml-parser) loads only when a file of that
// format turns up, which keeps them out of the start-up of a run that reads plain JSON.
const LOADERS = {
    json: async () => (await __webpack_require__.e(/* import() */ 51).then(__webpack_require__.bind(__webpack_require__, 73051))).readJsonMetrics,
    jsonl: async () => (await __webpack_require__.e(/* import() */ 243).then(__webpack_require__.bind(__webpack_require__, 243))).readJsonLines,
    csv: async () => (await Promise.all(/* import() */[__webpack_require__.e(712), __webpack_require__.e(881)]).then(__webpack_require__.bind(__webpack_require__, 23881))).readCsvMetrics,
    openmetrics: async () => (await __webpack_require__.e(/* import() */ 532).then(__webpack_require__.bind(__webpack_require__, 86532))).readOpenMetrics,
    gobench: async () => (await __webpack_require__.e(/* import() */ 469).then(__webpack_require__.bind(__webpack_require__, 91469))).readGoBench,
    junit: async () => (await Promise.all(/* import() */[__webpack_require__.e(780), __webpack_require__.e(241)]).then(__webpack_require__.bind(__webpack_require__, 93241))).readJunit,
};
/**
 * parseMetricText (parse.ts), loading only the reader the format needs.
 * @throws InputError as parseMetricText.
 * @example (await parseMetricTextLazily('{"a": 1}', 'm.json')).readings.length // 1
 */
async function parseMetricTextLazily(text, file, format, limits = inputs_limits/* DEFAULT_LIMITS */.dR) {
    const { body, chosen } = chooseFormat(text, file, format);
    return runReader(await LOADERS[chosen](), chosen, body, file, limits);
}

// EXTERNAL MODULE: ./src/inputs/names.ts
var names = __webpack_require__(85585);
;// CONCATENATED MODULE: ./src/inputs/pattern.ts


/**
 * Splits `path-or-glob => prefix`: every metric read from the files the pattern matches is named
 * `<prefix>/<name>` (`bench/*.txt => server` turns `BenchmarkRoute/ns/op` into
 * `server/BenchmarkRoute/ns/op`). Slashes around the prefix are dropped; without `=>` there is
 * no prefix. The prefix follows the metric name rule (names.ts).
 * @throws InputError for an empty pattern or prefix.
 * @example splitPattern('out/*.json => api') // { pattern: 'out/*.json', prefix: 'api' }
 */
function splitPattern(text) {
    const arrow = text.indexOf('=>');
    const pattern = (arrow < 0 ? text : text.slice(0, arrow)).trim();
    if (pattern === '') {
        throw new input_error/* InputError */.d(`empty metric file pattern in ${JSON.stringify(text)}`, { fix: 'write a path or glob, optionally followed by "=> prefix"' });
    }
    if (arrow < 0)
        return { pattern };
    return { pattern, prefix: normalizePrefix(text.slice(arrow + 2), text) };
}
/**
 * A prefix as metric names will carry it: trimmed, without slashes at either end, following the
 * metric name rule. Shared by `pattern => prefix` and the `prefixes` option of readMetricFiles.
 * @throws InputError for an empty prefix or one the name rule refuses.
 * @example normalizePrefix(' /api/ ', 'x') // 'api'
 */
function normalizePrefix(text, where) {
    const prefix = trimSlashes(text.trim());
    if (prefix === '') {
        throw new input_error/* InputError */.d(`empty prefix in ${JSON.stringify(where)}`, { fix: 'write "path => prefix", or leave out the prefix' });
    }
    return (0,names/* checkMetricName */.WO)(prefix, where);
}
/** `<prefix>/<name>`, or the name itself without a prefix; the result is checked again (length). */
function prefixed(prefix, name, where) {
    return prefix === undefined ? name : (0,names/* checkMetricName */.WO)(`${prefix}/${name}`, where);
}
function trimSlashes(text) {
    let start = 0;
    let end = text.length;
    while (start < end && text[start] === '/')
        start++;
    while (end > start && text[end - 1] === '/')
        end--;
    return text.slice(start, end);
}

;// CONCATENATED MODULE: ./src/inputs/read-files.ts







/**
 * Reads every metric file the patterns name and folds them into one Run (collectRun).
 * - A pattern is a path or a glob (tinyglobby: `**`, `*`, `{a,b}`), optionally `pattern => prefix`
 *   (pattern.ts). An existing file path is taken literally even if it holds glob characters.
 *   A pattern that matches no file is an error: a silent empty run would pass every gate.
 * - Each file's size is checked against `limits.maxFileBytes` before it is read; line length and
 *   the number of metrics are checked while parsing, and the total number of metrics after.
 * - A file matched by two patterns with the same prefix is read once.
 * @throws InputError for no match, a limit passed (naming `limits.max-file-bytes` etc.), a file
 *   that is not UTF-8 text, or any problem in a file.
 * @example await readMetricFiles(['bench/*.txt'], { limits: DEFAULT_LIMITS, aggregateFor: () => 'median' })
 */
async function readMetricFiles(patterns, options) {
    const limits = { ...inputs_limits/* DEFAULT_LIMITS */.dR, ...options.limits };
    const cwd = external_node_path_default().resolve(options.cwd ?? process.cwd());
    if (patterns.length === 0) {
        throw new input_error/* InputError */.d('no metric files given', { fix: 'name at least one metric file or glob' });
    }
    const done = new Set();
    const results = [];
    for (const text of patterns) {
        const { pattern, prefix: arrowPrefix } = splitPattern(text);
        const given = options.prefixes?.get(pattern) ?? options.prefixes?.get(text);
        const prefix = arrowPrefix ?? (given === undefined ? undefined : normalizePrefix(given, `prefix for ${pattern}`));
        for (const file of await expand(pattern, cwd)) {
            const key = `${prefix ?? ''}\u0000${file}`;
            if (done.has(key))
                continue;
            done.add(key);
            const shown = external_node_path_default().relative(cwd, file).startsWith('..') ? file : external_node_path_default().relative(cwd, file);
            const result = await readOne(file, shown, options.format, limits);
            results.push(prefix === undefined ? result : withPrefix(result, prefix));
        }
    }
    const run = collectRun(results, options.aggregateFor);
    if (run.metrics.size > limits.maxMetrics) {
        throw (0,inputs_limits/* limitError */.yT)('maxMetrics', limits.maxMetrics, patterns.join(', '), `the metric files hold ${run.metrics.size} metrics`);
    }
    return run;
}
async function expand(pattern, cwd) {
    const literal = external_node_path_default().resolve(cwd, pattern);
    const info = await (0,promises_.stat)(literal).catch(() => undefined);
    if (info?.isFile())
        return [literal];
    if (info?.isDirectory()) {
        throw new input_error/* InputError */.d(`${pattern} is a directory`, { fix: `name files in it, such as ${external_node_path_default().join(pattern, '*.json')}` });
    }
    // The glob library (tinyglobby, with picomatch) loads only for a pattern that is not a file.
    const { glob } = await Promise.all(/* import() */[__webpack_require__.e(6), __webpack_require__.e(382)]).then(__webpack_require__.bind(__webpack_require__, 73382));
    const files = await glob([pattern], { cwd, absolute: true, onlyFiles: true, dot: true, expandDirectories: false });
    if (files.length === 0) {
        throw new input_error/* InputError */.d(`no metric file matches ${JSON.stringify(pattern)} (looked in ${cwd})`, {
            fix: 'check the path (relative to the working directory) and that the step writing the metrics ran',
        });
    }
    return files.sort();
}
async function readOne(file, shown, format, limits) {
    const info = await (0,promises_.stat)(file);
    if (info.size > limits.maxFileBytes) {
        throw (0,inputs_limits/* limitError */.yT)('maxFileBytes', limits.maxFileBytes, shown, `the file is ${info.size} bytes`);
    }
    let text;
    try {
        text = new TextDecoder('utf-8', { fatal: true }).decode(await (0,promises_.readFile)(file));
    }
    catch (error) {
        if (error instanceof TypeError) {
            throw new input_error/* InputError */.d('the file is not UTF-8 text', { where: shown, fix: 'write metric files as UTF-8', cause: error });
        }
        throw new input_error/* InputError */.d(`cannot read the file: ${error.message}`, { where: shown, cause: error });
    }
    return parseMetricTextLazily(text, shown, format, limits);
}
function withPrefix(result, prefix) {
    return {
        readings: result.readings.map((r) => ({ ...r, name: prefixed(prefix, r.name, r.where) })),
        notFitted: new Map([...result.notFitted].map(([name, reason]) => [prefixed(prefix, name), reason])),
        meta: result.meta,
    };
}

;// CONCATENATED MODULE: ./src/report/json.ts
/** JSON has no NaN or Infinity; a number that is not finite becomes null, never a string. */
const json_num = (x) => (x !== undefined && Number.isFinite(x) ? x : null);
/** Copy the optional extras in a fixed order, leaving out the absent ones. */
function extras(pairs) {
    const o = {};
    for (const [k, v] of pairs)
        if (v !== undefined)
            o[k] = v;
    return o;
}
function baseline(b) {
    if (!b)
        return null;
    return {
        n: json_num(b.n),
        mean: json_num(b.mean),
        sd: json_num(b.sd),
        ...extras([
            ['scale', b.scale],
            ['since', b.since],
            ['relativeTo', b.relativeTo],
        ]),
    };
}
function metric(m) {
    // DESIGN.md's fields first and always present (null when not known), then the extras.
    return {
        name: m.name,
        status: m.status,
        value: json_num(m.value),
        unit: m.unit ?? null,
        baseline: baseline(m.baseline),
        z: json_num(m.z),
        change: json_num(m.change),
        density: json_num(m.density),
        relativeDensity: json_num(m.relativeDensity),
        cutoff: json_num(m.cutoff),
        ...extras([
            ['worse', m.worse],
            ['count', m.count === undefined ? undefined : json_num(m.count)],
            ['tail', m.tail === undefined ? undefined : json_num(m.tail)],
            ['adjusted', m.adjusted === undefined ? undefined : json_num(m.adjusted)],
            ['group', m.group],
            ['recent', m.recent?.map(json_num)],
            ['reason', m.reason],
        ]),
    };
}
function group(g) {
    return {
        name: g.name,
        status: g.status,
        members: g.members.map((m) => ({ name: m.name, share: json_num(m.share), ownZ: json_num(m.ownZ) })),
        n: json_num(g.n),
        distance: json_num(g.distance),
        tail: json_num(g.tail),
        level: json_num(g.level),
        common: { z: json_num(g.common.z), tail: json_num(g.common.tail), status: g.common.status },
        shrinkage: json_num(g.shrinkage),
        ...extras([
            ['distanceTail', g.distanceTail === undefined ? undefined : json_num(g.distanceTail)],
            ['ownTail', g.ownTail === undefined ? undefined : json_num(g.ownTail)],
            ['adjusted', g.adjusted === undefined ? undefined : json_num(g.adjusted)],
        ]),
        reason: g.reason,
    };
}
/**
 * The JSON report (`--format json`, the action's `report` output) with DESIGN.md's field names in
 * a stable order: schema, verdict, series, family, metrics[], groups[]. Non-finite numbers become
 * null; 2-space indent; ends with a newline. Names are values, never keys, so an untrusted name
 * such as `__proto__` cannot reach an object's prototype.
 * @example JSON.parse(renderJson(report)).schema // 'bellgate.report/1'
 */
function renderJson(report) {
    const doc = {
        schema: report.schema,
        verdict: report.verdict,
        series: report.series,
        family: report.family,
        metrics: report.metrics.map(metric),
        groups: report.groups.map(group),
    };
    return JSON.stringify(doc, null, 2) + '\n';
}

// EXTERNAL MODULE: ./src/report/cells.ts
var cells = __webpack_require__(10571);
// EXTERNAL MODULE: ./src/report/escape.ts
var report_escape = __webpack_require__(14031);
// EXTERNAL MODULE: ./src/report/format.ts
var format = __webpack_require__(12011);
;// CONCATENATED MODULE: ./src/report/marker.ts
/**
 * The hidden marker that lets the action find its own PR comment for a series and update it in
 * place. Percent-encoding keeps any series name inside one HTML comment: no `-->` can close it
 * early and no newline can split it.
 * @example commentMarker('linux x64') // 'bellgate:series=linux%20x64'
 */
function commentMarker(series) {
    return `bellgate:series=${safeMarker(series)}`;
}
/**
 * Percent-encode everything but [A-Za-z0-9._~-] (and a `-` that starts `--`), so the text is safe
 * inside `<!-- ... -->`: it can contain neither `>` nor the `--` that HTML forbids in comments.
 * @example safeMarker('a-->b') // 'a%2D-%3Eb'
 */
function safeMarker(s) {
    return encodeURIComponent(s)
        .replace(/[!'()*]/g, (ch) => `%${ch.charCodeAt(0).toString(16).toUpperCase()}`)
        .replace(/-(?=-)/g, '%2D');
}
/** The first line of a comment: `<!-- marker -->`; a marker from commentMarker passes unchanged. */
function markerLine(marker) {
    const safe = marker.replace(/[^A-Za-z0-9._~:=/%-]/g, (ch) => safeMarker(ch)).replace(/-(?=-)/g, '%2D');
    return `<!-- ${safe} -->`;
}

;// CONCATENATED MODULE: ./src/report/sparkline.ts
/** The eight Unicode block heights, lowest first (U+2581..U+2588). */
const BLOCKS = ['▁', '▂', '▃', '▄', '▅', '▆', '▇', '█'];
/** Separates the history from this run's mark, so the mark reads as "and now". */
const MARK_SEPARATOR = '→';
/**
 * A one-line picture of a series: one block per value, height linear between the smallest and
 * largest finite value (this run's `mark` included, so a jump stands out). Missing values (NaN)
 * show as a space; a constant series sits at mid height. When `mark` is given it follows the
 * history after an arrow. Returns '' when nothing is finite. Plain text, so it reads the same in a
 * terminal, a code span on GitHub and a screen reader's character mode.
 * @example sparkline([1, 2, 3, 4, 5, 6, 7, 8]) // '▁▂▃▄▅▆▇█'
 * @example sparkline([1, 1, 1], 2) // '▁▁▁→█'
 */
function sparkline(values, mark) {
    const finite = values.filter((v) => Number.isFinite(v));
    const hasMark = mark !== undefined && Number.isFinite(mark);
    if (hasMark)
        finite.push(mark);
    if (finite.length === 0)
        return '';
    let lo = Infinity;
    let hi = -Infinity;
    for (const v of finite) {
        if (v < lo)
            lo = v;
        if (v > hi)
            hi = v;
    }
    const block = (v) => {
        if (!Number.isFinite(v))
            return ' ';
        if (hi === lo)
            return BLOCKS[3];
        const i = Math.round(((v - lo) / (hi - lo)) * (BLOCKS.length - 1));
        return BLOCKS[Math.min(BLOCKS.length - 1, Math.max(0, i))] ?? BLOCKS[3];
    };
    const line = values.map(block).join('');
    return hasMark ? `${line}${MARK_SEPARATOR}${block(mark)}` : line;
}

// EXTERNAL MODULE: ./src/report/status.ts
var report_status = __webpack_require__(16934);
;// CONCATENATED MODULE: ./src/report/markdown.ts






/** GitHub rejects comment bodies over 65,536 characters; stay well under with room for the footer. */
const MARKDOWN_LIMIT = 65_536;
const BUDGET = MARKDOWN_LIMIT - 2_000;
const FLAGGED = new Set(['regressed', 'improved']);
const HEAD = '| status | metric | baseline (mean ± sd) | this run | change | sigma | rel. density vs cutoff |\n|---|---|---|---|---|---|---|';
function row(m) {
    const unit = m.unit === undefined ? undefined : (0,report_escape/* escapeMarkdown */.F)(m.unit, 20);
    const c = (0,cells/* metricCells */.G)(m, unit);
    const status = FLAGGED.has(m.status) ? `${report_status/* STATUS_GLYPH */.id[m.status]} **${m.status}**` : `${report_status/* STATUS_GLYPH */.id[m.status]} ${m.status}`;
    return `| ${status} | ${(0,report_escape/* escapeMarkdown */.F)(m.name)} | ${c.baseline} | ${c.value} | ${c.change} | ${c.sigma} | ${c.density.replace('<', '&lt;')} |`;
}
function picture(m) {
    const recent = m.recent ?? [];
    const line = sparkline(recent, m.value);
    const unit = m.unit === undefined ? undefined : (0,report_escape/* escapeMarkdown */.F)(m.unit, 20);
    const shown = line ? `\`${line}\` ${recent.length} baseline runs → this run ${(0,format/* formatValue */.Fl)(m.value, unit)}` : `this run ${(0,format/* formatValue */.Fl)(m.value, unit)}`;
    return `- **${(0,report_escape/* escapeMarkdown */.F)(m.name)}** ${shown}. ${(0,report_escape/* escapeMarkdown */.F)(m.reason, 500)}`;
}
function groupLine(g) {
    const top = [...g.members]
        .sort((a, b) => b.share - a.share)
        .slice(0, 3)
        .map((m) => `${(0,report_escape/* escapeMarkdown */.F)(m.name)} ${Math.round(m.share * 100)}% (own ${(0,format/* formatSigma */.Hx)(m.ownZ)})`);
    return `- group **${(0,report_escape/* escapeMarkdown */.F)(g.name)}**: ${g.status} — common move ${(0,format/* formatSigma */.Hx)(g.common.z)} (${g.common.status}); main contributors: ${top.join(', ') || 'none'}. ${(0,report_escape/* escapeMarkdown */.F)(g.reason, 500)}`;
}
/** Take lines while they fit in `room` characters; say how many were left out. */
function fit(lines, room, what) {
    const kept = [];
    let used = 0;
    for (const [i, l] of lines.entries()) {
        if (used + l.length + 1 > room - 200) {
            kept.push(`\n_…and ${lines.length - i} more ${what} not shown (comment size limit); see the JSON report._`);
            break;
        }
        kept.push(l);
        used += l.length + 1;
    }
    const text = kept.join('\n');
    return { text, used: text.length };
}
const isWebUrl = (u) => u !== undefined && /^https?:\/\/[^\s<>()[\]"'`]+$/.test(u);
/**
 * The PR comment and job summary: optional hidden marker, a one-line verdict, a table of flagged
 * metrics with a sparkline of each one's recent baseline and this run, the groups' findings, and
 * every other metric in a collapsed `<details>` table; links to the run and HTML report when given;
 * a footer naming Bellgate. Every metric-file string passes escapeMarkdown. The body stays under
 * GitHub's 65,536-character limit by cutting table rows with a note.
 * @example renderMarkdown(report, { marker: commentMarker('ci') }).startsWith('<!-- bellgate:series=ci -->') // true
 */
function renderMarkdown(report, options = {}) {
    const out = [];
    if (options.marker !== undefined)
        out.push(markerLine(options.marker));
    const counts = (0,report_status/* statusCounts */.rc)(report.metrics.map((m) => m.status)) || 'no metrics';
    out.push(`### Bellgate: **${report.verdict}** — ${counts}`);
    out.push(`Verdict ${report.verdict}: ${report_status/* VERDICT_HEADLINE */.pB[report.verdict]} (series ${(0,report_escape/* escapeMarkdown */.F)(report.series)}).`);
    let room = BUDGET - out.join('\n').length;
    const sorted = [...report.metrics].sort((a, b) => (0,report_status/* statusRank */.Tx)(a.status) - (0,report_status/* statusRank */.Tx)(b.status));
    const flagged = sorted.filter((m) => FLAGGED.has(m.status));
    const rest = sorted.filter((m) => !FLAGGED.has(m.status));
    const add = (text) => {
        out.push(text);
        room -= text.length + 1;
    };
    if (flagged.length > 0) {
        add('');
        add(`${HEAD}\n${fit(flagged.map(row), room / 2, 'flagged metrics').text}`);
        add('');
        add(fit(flagged.map(picture), room / 2, 'pictures').text);
    }
    if (report.groups.length > 0) {
        add('');
        add(fit(report.groups.map(groupLine), room / 2, 'groups').text);
    }
    if (rest.length > 0) {
        add('');
        add(`<details><summary>${rest.length} other metric${rest.length === 1 ? '' : 's'}: ${(0,report_status/* statusCounts */.rc)(rest.map((m) => m.status))}</summary>\n`);
        add(`${HEAD}\n${fit(rest.map(row), room, 'metrics').text}\n\n</details>`);
    }
    const links = [];
    if (isWebUrl(options.runUrl))
        links.push(`[workflow run](${options.runUrl})`);
    if (isWebUrl(options.htmlReportUrl))
        links.push(`[full HTML report](${options.htmlReportUrl})`);
    out.push('');
    if (links.length > 0)
        out.push(links.join(' · '));
    out.push('<sub>Reported by Bellgate: a metric is flagged when its relative density under the baseline fit falls below its cutoff on its worse side.</sub>');
    return out.join('\n') + '\n';
}

// EXTERNAL MODULE: ./src/report/clean.ts
var clean = __webpack_require__(60023);
;// CONCATENATED MODULE: ./src/github/annotations.ts



// Names and units come from metric files (or a history they filled): shown through cleanText, so
// control and bidirectional-override characters never reach the run page.
function line(m) {
    const unit = m.unit === undefined ? undefined : (0,clean/* cleanText */.X)(m.unit);
    const parts = [];
    if (m.value !== undefined)
        parts.push(`value ${(0,format/* formatValue */.Fl)(m.value, unit)}`);
    if (m.baseline)
        parts.push(`baseline ${(0,cells/* formatBaseline */.J)(m.baseline, unit)}`);
    if (m.change !== undefined)
        parts.push(`change ${(0,format/* formatChange */.eD)(m.change)}`);
    if (m.relativeDensity !== undefined)
        parts.push(`relative density ${(0,format/* formatAgainstCutoff */.mM)(m.relativeDensity, m.cutoff)}`);
    return `${(0,clean/* cleanText */.X)(m.reason, 2000)}${parts.length ? ` (${parts.join(', ')})` : ''}`;
}
/**
 * Emits the annotations of a report; returns how many of each were written.
 * @example annotate(report, sink) // { errors: 1, notices: 0 }
 */
function annotate(report, sink, series) {
    let errors = 0;
    let notices = 0;
    for (const m of report.metrics) {
        if (m.status === 'regressed') {
            sink.error(line(m), { title: `bellgate [${(0,clean/* cleanText */.X)(series)}]: ${(0,clean/* cleanText */.X)(m.name)} regressed` });
            errors += 1;
        }
        else if (m.status === 'improved') {
            sink.notice(line(m), { title: `bellgate [${(0,clean/* cleanText */.X)(series)}]: ${(0,clean/* cleanText */.X)(m.name)} improved` });
            notices += 1;
        }
    }
    return { errors, notices };
}

;// CONCATENATED MODULE: ./src/github/context.ts
/**
 * What the runner tells the action about this run: the GITHUB_* variables and the event payload.
 * Read through small getters whose errors name the variable, never from @actions/github's
 * module-level context, so tests can pass any environment.
 */

function required(env, name) {
    const v = env[name];
    if (v === undefined || v === '') {
        throw new input_error/* InputError */.d(`environment variable ${name} is not set`, {
            where: name,
            fix: 'run this action inside a GitHub Actions job (the runner sets the GITHUB_* variables)',
        });
    }
    return v;
}
function record(value) {
    return typeof value === 'object' && value !== null && !Array.isArray(value) ? value : undefined;
}
/**
 * Builds the run context from the runner's environment and the event payload file.
 * @throws InputError naming the missing variable or the unreadable payload.
 * @example (await readRunContext(process.env, readFile)).runId // '8123456789-1'
 */
async function readRunContext(env, readText) {
    const [owner, repo, ...rest] = required(env, 'GITHUB_REPOSITORY').split('/');
    if (!owner || !repo || rest.length > 0) {
        throw new input_error/* InputError */.d(`GITHUB_REPOSITORY is "${env.GITHUB_REPOSITORY}", expected owner/name`, { where: 'GITHUB_REPOSITORY' });
    }
    const eventName = required(env, 'GITHUB_EVENT_NAME');
    let payload = {};
    const eventPath = env.GITHUB_EVENT_PATH;
    if (eventPath) {
        try {
            payload = record(JSON.parse(await readText(eventPath))) ?? {};
        }
        catch (cause) {
            throw new input_error/* InputError */.d(`the event payload ${eventPath} cannot be read as JSON`, { where: 'GITHUB_EVENT_PATH', cause });
        }
    }
    const repository = record(payload.repository);
    const pr = record(payload.pull_request);
    const attemptText = env.GITHUB_RUN_ATTEMPT || '1';
    const attempt = Number(attemptText);
    const runNumericId = required(env, 'GITHUB_RUN_ID');
    let pullRequest;
    // A PR number goes into API paths (issues/N/comments): only a positive safe integer is one.
    if (pr && typeof pr.number === 'number' && Number.isSafeInteger(pr.number) && pr.number > 0) {
        const labels = Array.isArray(pr.labels)
            ? pr.labels.map((l) => record(l)?.name).filter((n) => typeof n === 'string')
            : [];
        const headRepo = record(record(pr.head)?.repo);
        const fromFork = headRepo?.fork === true || (typeof headRepo?.full_name === 'string' && headRepo.full_name !== `${owner}/${repo}`);
        pullRequest = { number: pr.number, labels, fromFork };
    }
    const runnerTemp = env.RUNNER_TEMP || env.TMPDIR || '/tmp';
    return {
        eventName,
        owner,
        repo,
        repositoryId: typeof repository?.id === 'number' ? repository.id : undefined,
        runId: `${runNumericId}-${Number.isInteger(attempt) && attempt > 0 ? attempt : 1}`,
        runNumericId,
        attempt: Number.isInteger(attempt) && attempt > 0 ? attempt : 1,
        sha: env.GITHUB_SHA || undefined,
        ref: env.GITHUB_REF || undefined,
        workflow: env.GITHUB_WORKFLOW || 'workflow',
        job: env.GITHUB_JOB || 'job',
        defaultBranch: typeof repository?.default_branch === 'string' ? repository.default_branch : scheduledBranch(eventName, env.GITHUB_REF),
        pullRequest,
        apiUrl: env.GITHUB_API_URL || 'https://api.github.com',
        serverUrl: env.GITHUB_SERVER_URL || 'https://github.com',
        runnerTemp,
        workspace: env.GITHUB_WORKSPACE || '',
    };
}
/** Scheduled runs always run on the default branch, so their ref names it when the payload does not. */
function scheduledBranch(eventName, ref) {
    return eventName === 'schedule' && ref?.startsWith('refs/heads/') ? ref.slice('refs/heads/'.length) : undefined;
}

;// CONCATENATED MODULE: ./src/github/describe-error.ts
/**
 * Turns any error into what a user sees: one plain line plus a fix for the project's typed errors
 * (InputError, StoreError: their describe()), the message otherwise — never a stack trace.
 * @example describeError(new InputError('bad', { where: 'input store', fix: 'use artifact' })) // 'input store: bad\n  fix: use artifact'
 */
function describeError(error) {
    if (error && typeof error.describe === 'function')
        return error.describe();
    if (error instanceof Error)
        return error.message;
    return String(error);
}

// EXTERNAL MODULE: ./src/config/locate.ts
var locate = __webpack_require__(55562);
;// CONCATENATED MODULE: ./src/github/load-config.ts

/** Where a config is looked for when the `config` input is left at its default (src/config/locate.ts). */
const LOOKED_UP_CONFIGS = (/* unused pure expression or super */ null && (DEFAULT_CONFIG_PATHS));
/**
 * The action's config: a named file must exist; left at the default, `.github/bellgate.yml` (or
 * `.yaml`) is read when present, else the defaults are used without loading the config reader.
 * @throws InputError for a missing named file or an invalid config (with file:line:col).
 * @example await loadActionConfig(undefined, '/home/runner/work/repo') // defaults without a config file
 */
async function loadActionConfig(path, cwd) {
    return (0,locate/* loadConfigLazily */.yH)(path, cwd, path !== undefined);
}

;// CONCATENATED MODULE: ./src/github/event-policy.ts
const BASELINE_EVENTS = ['push', 'schedule', 'workflow_dispatch'];
const PULL_REQUEST_EVENTS = ['pull_request', 'pull_request_target'];
/**
 * Decides whether this run is recorded.
 * @example decideRecord('auto', { eventName: 'push', ref: 'refs/heads/main', ... }, 'main').record // true
 */
function decideRecord(mode, context, baselineBranch) {
    if (mode === 'always')
        return { record: true, reason: 'record: always', notice: false };
    if (mode === 'never')
        return { record: false, reason: 'record: never', notice: false };
    const { eventName, ref } = context;
    if (PULL_REQUEST_EVENTS.includes(eventName)) {
        return { record: false, reason: `${eventName} runs are checked, never recorded`, notice: false };
    }
    if (!BASELINE_EVENTS.includes(eventName)) {
        return { record: false, reason: `event ${eventName} is checked only; set \`record: always\` to record it`, notice: true };
    }
    if (baselineBranch === undefined) {
        return { record: false, reason: 'the baseline branch is unknown; set `baseline-branch`', notice: true };
    }
    if (ref !== `refs/heads/${baselineBranch}`) {
        return { record: false, reason: `${ref ?? 'this ref'} is not the baseline branch ${baselineBranch}`, notice: false };
    }
    return { record: true, reason: `${eventName} on the baseline branch ${baselineBranch}`, notice: false };
}

// EXTERNAL MODULE: ./src/history/history.ts
var history_history = __webpack_require__(43328);
// EXTERNAL MODULE: ./src/history/merge.ts + 3 modules
var merge = __webpack_require__(2278);
;// CONCATENATED MODULE: ./src/github/history-step.ts
/**
 * The two store steps of a run, with the action's failure policy: a StoreError on load or save is
 * reported (warning, or error when `history-failure: fail`) and the run goes on; anything else is
 * a bug or bad input and propagates. Load failures give an empty history marked unreadable, so
 * the caller records nothing over a history it could not read.
 */



function isStoreError(error) {
    return error instanceof Error && error.name === 'StoreError';
}
/**
 * @example (await loadHistory(store, 'ci', inputs, sink)).readable // false when the store failed
 */
async function loadHistory(store, series, inputs, sink) {
    try {
        const history = await store.load();
        sink.info(`bellgate: read ${history.runs.length} baseline runs from ${store.describe()}`);
        return { history, readable: true };
    }
    catch (error) {
        if (!isStoreError(error))
            throw error;
        const message = `bellgate: the history could not be fetched from ${store.describe()}: ${describeError(error)}`;
        if (inputs.historyFailure === 'fail')
            sink.error(message);
        else
            sink.warning(`${message}\nGoing on without history (every metric is new); set \`history-failure: fail\` to fail instead.`);
        return { history: (0,history_history/* emptyHistory */.s)(series), readable: false };
    }
}
/**
 * Appends the run, trims to `keep` newest runs and saves. Returns whether it was saved.
 * @example await recordRun(store, history, info, run, 500, inputs, sink) // true
 */
async function recordRun(store, history, info, run, keep, inputs, sink) {
    try {
        const next = (0,merge/* trimHistory */.lj)((0,merge/* appendRun */.ah)(history, info, run), keep);
        await store.save(next, history.runs.length);
        sink.info(`bellgate: recorded run ${info.id} in ${store.describe()} (${next.runs.length} runs)`);
        return true;
    }
    catch (error) {
        if (!isStoreError(error))
            throw error;
        const message = `bellgate: could not record run ${info.id} in ${store.describe()}: ${describeError(error)}`;
        if (inputs.historyFailure === 'fail')
            sink.error(message);
        else
            sink.warning(message);
        return false;
    }
}
/**
 * The history entry of this run: id `${GITHUB_RUN_ID}-${GITHUB_RUN_ATTEMPT}`, sha, ref, event, time.
 * @example runInfo(context, new Date()).id // '8123-1'
 */
function runInfo(context, now) {
    const info = { id: context.runId, event: context.eventName, time: now.toISOString() };
    if (context.sha)
        info.sha = context.sha;
    if (context.ref)
        info.ref = context.ref;
    return info;
}

;// CONCATENATED MODULE: ./src/github/html-report.ts



/**
 * The HTML report is extra: written beside the JSON report and uploaded as its own artifact;
 * a failure only warns.
 * @example await uploadHtml(deps, context, 'ci', report, history, 90)
 */
async function uploadHtml(deps, context, series, report, history, retentionDays) {
    // One artifact per series and attempt: artifact names must be unique within a workflow run.
    const name = `${(0,artifact_name/* artifactName */.C)('bellgate-report', series)}-${context.attempt}`;
    try {
        // Imported here, on the html-report path only: d3 and the page code stay out of every other run.
        const { renderHtmlReport } = await Promise.all(/* import() */[__webpack_require__.e(850), __webpack_require__.e(342)]).then(__webpack_require__.bind(__webpack_require__, 49342));
        const html = renderHtmlReport({ report, history, generatedAt: deps.now().toISOString() });
        await deps.writeText((0,external_node_path_.join)(context.runnerTemp, 'bellgate', `${name}.html`), html);
        await deps.upload(name, 'report.html', html, retentionDays);
        deps.sink.info(`bellgate: uploaded the HTML report as artifact ${name}`);
    }
    catch (error) {
        deps.sink.warning(`bellgate: could not upload the HTML report: ${describeError(error)}`);
    }
}

;// CONCATENATED MODULE: ./src/github/inputs.ts
/**
 * The action's inputs: names that mirror action.yml, and one reader that validates them all up front
 * so a typo fails the step at once with a message naming the input, before any file or API is touched.
 */

/** Input names exactly as action.yml declares them. */
const INPUT = {
    metrics: 'metrics',
    config: 'config',
    series: 'series',
    store: 'store',
    history: 'history',
    baselineBranch: 'baseline-branch',
    record: 'record',
    block: 'block',
    comment: 'comment',
    acceptLabel: 'accept-label',
    token: 'token',
    retentionDays: 'retention-days',
    inputFormat: 'input-format',
    historyFailure: 'history-failure',
    htmlReport: 'html-report',
};
/** Output names exactly as action.yml declares them. */
const OUTPUT = { verdict: 'verdict', regressed: 'regressed', report: 'report' };
const DEFAULT_CONFIG_PATH = '.github/bellgate.yml';
const DEFAULT_HISTORY = 'bellgate-history';
const DEFAULT_ACCEPT_LABEL = 'bellgate:accept';
/**
 * The runner passes input `retention-days` as INPUT_RETENTION-DAYS: upper-cased, spaces to
 * underscores, hyphens kept (the same rule @actions/core's getInput applies).
 */
function inputVariable(name) {
    return `INPUT_${name.replace(/ /g, '_').toUpperCase()}`;
}
function choice(name, raw, allowed, fallback) {
    if (raw === '')
        return fallback;
    const v = raw.toLowerCase();
    if (allowed.includes(v))
        return v;
    throw new input_error/* InputError */.d(`input \`${name}\` is "${raw}", expected one of ${allowed.join(', ')}`, {
        where: `input ${name}`,
        fix: `set \`${name}: ${fallback}\` (or another of ${allowed.join(' | ')}) in the workflow step's \`with:\``,
    });
}
function flag(name, raw, fallback) {
    if (raw === '')
        return fallback;
    // YAML 1.2 core schema booleans, as @actions/core's getBooleanInput accepts them.
    if (['true', 'True', 'TRUE'].includes(raw))
        return true;
    if (['false', 'False', 'FALSE'].includes(raw))
        return false;
    throw new input_error/* InputError */.d(`input \`${name}\` is "${raw}", expected true or false`, {
        where: `input ${name}`,
        fix: `write \`${name}: true\` or \`${name}: false\``,
    });
}
/**
 * Reads and validates every input from the environment the runner prepared.
 * @throws InputError naming the input and how to fix it.
 * @example readActionInputs({ 'INPUT_METRICS': 'out/bench.json' }).store // 'artifact'
 */
function readActionInputs(env) {
    const get = (name) => (env[inputVariable(name)] ?? '').trim();
    const metrics = get(INPUT.metrics)
        .split(/\r?\n/)
        .map((l) => l.trim())
        .filter((l) => l !== '' && !l.startsWith('#'));
    if (metrics.length === 0) {
        throw new input_error/* InputError */.d('input `metrics` is empty: there are no metric files to check', {
            where: `input ${INPUT.metrics}`,
            fix: 'list the metric files or globs, one a line, e.g. `metrics: out/bench/*.json`',
        });
    }
    const days = get(INPUT.retentionDays);
    const retentionDays = days === '' ? 90 : Number(days);
    if (!Number.isInteger(retentionDays) || retentionDays < 1 || retentionDays > 400) {
        throw new input_error/* InputError */.d(`input \`retention-days\` is "${days}", expected a whole number of days from 1 to 400`, {
            where: `input ${INPUT.retentionDays}`,
            fix: 'write e.g. `retention-days: 90` (the repository setting may lower it further)',
        });
    }
    const history = get(INPUT.history) || DEFAULT_HISTORY;
    const store = choice(INPUT.store, get(INPUT.store), ['artifact', 'branch', 'file'], 'artifact');
    // The artifact service refuses these characters in names (@actions/artifact's name validation).
    if (store === 'artifact' && /["\\/:<>|*?\r\n]/.test(history)) {
        throw new input_error/* InputError */.d(`input \`history\` is "${history}", which cannot be an artifact name`, {
            where: `input ${INPUT.history}`,
            fix: 'use letters, digits, dots, dashes and underscores only, e.g. `history: bellgate-history`',
        });
    }
    const config = get(INPUT.config);
    const series = get(INPUT.series);
    const baselineBranch = get(INPUT.baselineBranch);
    const inputFormat = get(INPUT.inputFormat);
    return {
        metrics,
        config: config === '' || config === DEFAULT_CONFIG_PATH ? undefined : config,
        series: series === '' ? undefined : series,
        store,
        history,
        baselineBranch: baselineBranch === '' ? undefined : baselineBranch.replace(/^refs\/heads\//, ''),
        record: choice(INPUT.record, get(INPUT.record), ['auto', 'always', 'never'], 'auto'),
        block: flag(INPUT.block, get(INPUT.block), true),
        comment: choice(INPUT.comment, get(INPUT.comment), ['auto', 'always', 'never'], 'auto'),
        acceptLabel: get(INPUT.acceptLabel) || DEFAULT_ACCEPT_LABEL,
        token: get(INPUT.token),
        retentionDays,
        inputFormat: inputFormat === '' ? undefined : inputFormat,
        historyFailure: choice(INPUT.historyFailure, get(INPUT.historyFailure), ['warn', 'fail'], 'warn'),
        htmlReport: flag(INPUT.htmlReport, get(INPUT.htmlReport), false),
    };
}

;// CONCATENATED MODULE: ./src/github/comment.ts
/**
 * Creates, updates or leaves the series' comment on pull request `issue`.
 * @throws whatever the API throws (the caller decides: a 403 on a fork PR only warns).
 * @example await upsertComment(api, 7, '<!-- bellgate:series=ci -->', body, 'auto', true) // 'created'
 */
async function upsertComment(api, issue, markerLine, body, mode, flagged) {
    if (mode === 'never')
        return 'skipped';
    const comments = await api.listIssueComments(issue);
    // Only a comment that starts with the marker is ours: a reviewer quoting it mid-text is not.
    const existing = comments.find((c) => c.body.trimStart().startsWith(markerLine));
    if (existing === undefined) {
        if (mode === 'auto' && !flagged)
            return 'skipped';
        await api.createIssueComment(issue, body);
        return 'created';
    }
    if (existing.body === body)
        return 'unchanged';
    await api.updateIssueComment(existing.id, body);
    return 'updated';
}

;// CONCATENATED MODULE: ./src/github/pr-comment.ts
/**
 * The PR comment step with its failure policy: the comment is feedback, not the gate, so any
 * failure only warns — a 403/404 (a fork's read-only token, or a job without
 * `pull-requests: write`) says why; the report stays in the job summary.
 */



/**
 * @returns the outcome ('created', 'updated', 'unchanged', 'skipped', 'failed'), or undefined without a PR.
 * @example await postComment(api, context, inputs, marker, markdown, true, sink) // 'created'
 */
async function postComment(api, context, inputs, marker, markdown, flagged, sink) {
    const pr = context.pullRequest;
    if (!pr)
        return undefined;
    // `never` must not touch the API at all: asking for it with an empty token would throw and warn.
    if (inputs.comment === 'never') {
        sink.info('bellgate: PR comment skipped');
        return 'skipped';
    }
    try {
        const outcome = await upsertComment(api(), pr.number, marker, markdown, inputs.comment, flagged);
        sink.info(`bellgate: PR comment ${outcome}`);
        return outcome;
    }
    catch (error) {
        const status = statusOf(error);
        // A fork's pull_request run gets a read-only token: 403 (or 404) on comment writes.
        const why = status === 403 || status === 404
            ? `the token may not comment on pull request #${pr.number}${pr.fromFork ? ' (a fork PR gets a read-only token)' : ' (give the job `permissions: pull-requests: write`)'}`
            : `the comment on pull request #${pr.number} failed: ${describeError(error)}`;
        sink.warning(`bellgate: ${why}; the report is in the job summary`);
        return 'failed';
    }
}

// EXTERNAL MODULE: ./src/history/document.ts + 5 modules
var history_document = __webpack_require__(70516);
;// CONCATENATED MODULE: ./src/history/splice-append.ts

/**
 * What spliceHistory needs to know of a document parseHistoryBytes read (bytes, rows) into `history`.
 *
 * @example const { history, rows } = parseHistoryBytes(bytes, path); if (rows) written = writtenHistory(bytes, rows, history);
 */
function writtenHistory(bytes, rows, history) {
    const columns = new Map();
    for (const [name, column] of history.columns)
        columns.set(name, { index: columns.size, values: column.values });
    return { bytes, rows, runIds: history.runs.map((r) => r.id), columns };
}
const COMMA = 0x2c;
const OPEN_SQUARE = 0x5b;
/**
 * serializeHistory(h) for the usual record — `h` is the history decoded from `written` with runs
 * appended at the end and possibly the oldest runs dropped (trimHistory) — without writing a
 * million numbers again: each values row whose kept values are exactly the old row's (same
 * doubles, NaN for NaN) is the old row's bytes, less the dropped leading entries, plus the new
 * values; the small head (runs, names, units) is written fresh. A row that differs in any way
 * (a new metric, a replaced run, a -0 the generic writer would print as 0) is written fresh.
 * The result parses to exactly what serializeHistory(h) parses to (test/history/splice-append.test.ts).
 * Returns undefined when the runs do not line up that way (reordered, merged, all dropped);
 * the caller then uses serializeHistory. Cost: one comparison per kept value and a copy of the bytes.
 * Throws InputError as serializeHistory does for a History that cannot be stored.
 *
 * @example spliceHistory(appendRun(history, info, run), writtenHistory(bytes, rows, history)) ?? serializeHistory(next)
 */
function spliceHistory(h, written) {
    (0,history_document/* checkRuns */.l4)(h);
    const { bytes, rows: where, runIds, columns: baseRows } = written;
    const drop = h.runs.length === 0 ? -1 : runIds.indexOf(h.runs[0].id);
    const kept = runIds.length - drop;
    if (drop < 0 || kept > h.runs.length || baseRows.size !== where.rowEnds.length)
        return undefined;
    for (let i = 0; i < kept; i++)
        if (h.runs[i].id !== runIds[drop + i])
            return undefined;
    const rows = [];
    for (const [name, column] of h.columns) {
        const values = column.values;
        const old = baseRows.get(name);
        const from = old !== undefined && keepsOld(values, old.values, drop, kept) ? rowBody(bytes, where, old.index, drop) : undefined;
        if (from === undefined) {
            (0,history_document/* checkStorable */.zz)(h, name, values);
            rows.push(JSON.stringify(values));
            continue;
        }
        (0,history_document/* checkStorable */.zz)(h, name, values, kept);
        let tail = '';
        for (let i = kept; i < values.length; i++)
            tail += values[i] === values[i] ? `,${values[i]}` : ',null';
        rows.push({ from, to: where.rowEnds[old.index], tail: `${tail}]` });
    }
    return assemble((0,history_document/* historyHead */.Td)(h), rows, bytes);
}
/**
 * True when values[0, kept) are old[drop, drop + kept) exactly, none of them -0 (the bytes might
 * say "-0" where serializeHistory writes 0), and values holds no fewer entries than that.
 */
function keepsOld(values, old, drop, kept) {
    if (values.length < kept)
        return false;
    for (let i = 0; i < kept; i++) {
        const x = values[i];
        const y = old[drop + i];
        if (x === y) {
            if (y === 0 && 1 / y < 0)
                return false;
        }
        else if (x === x || y === y)
            return false;
    }
    return true;
}
/**
 * The offset where row `index`'s kept entries begin, just after its `[` when nothing is dropped,
 * else just after the drop-th comma (a row holds only numbers and null, so every comma separates
 * entries). A leading "[" is written by assemble. Undefined when the row has too few entries.
 */
function rowBody(bytes, where, index, drop) {
    const end = where.rowEnds[index];
    let at = bytes.indexOf(OPEN_SQUARE, index === 0 ? where.valuesStart + 1 : where.rowEnds[index - 1] + 1) + 1;
    for (let d = 0; d < drop; d++) {
        at = bytes.indexOf(COMMA, at) + 1;
        if (at === 0 || at > end)
            return undefined;
    }
    return at;
}
/** head + "[" row "]" joined by ",\n" + HISTORY_TAIL, into one buffer. Rows are ASCII; the head may not be. */
function assemble(head, rows, bytes) {
    let size = Buffer.byteLength(head) + history_document/* HISTORY_TAIL */.Y_.length + Math.max(0, rows.length - 1) * 2;
    for (const row of rows)
        size += typeof row === 'string' ? row.length : 1 + row.to - row.from + row.tail.length;
    const out = Buffer.allocUnsafe(size);
    let at = out.write(head, 0, 'utf8');
    // Byte by byte for the short pieces: a Buffer.write or a subarray per row costs more than it copies.
    const ascii = (text) => {
        for (let j = 0; j < text.length; j++)
            out[at++] = text.charCodeAt(j);
    };
    const source = new Uint8Array(bytes.buffer, bytes.byteOffset, bytes.byteLength);
    for (let i = 0; i < rows.length; i++) {
        const row = rows[i];
        if (i > 0)
            ascii(',\n');
        if (typeof row === 'string')
            at += out.write(row, at, 'latin1');
        else {
            out[at++] = OPEN_SQUARE;
            out.set(source.subarray(row.from, row.to), at);
            at += row.to - row.from;
            ascii(row.tail);
        }
    }
    ascii(history_document/* HISTORY_TAIL */.Y_);
    return at === size ? out : out.subarray(0, at);
}

// EXTERNAL MODULE: ./src/history/store.ts
var store = __webpack_require__(84689);
;// CONCATENATED MODULE: ./src/history/file-store.ts









/**
 * The largest history file the file store reads or writes: 500 MiB. The file is read into one
 * string, and V8 (Node 20) cannot make a string longer than 2^29 - 24 UTF-16 units (just under
 * 512 MiB); a UTF-8 file never has more characters than bytes, so a byte limit below it is safe.
 * At 5 significant digits that is about 14,000 runs x 5,000 metrics; `keep` bounds it.
 */
const HISTORY_FILE_LIMIT = 500 * 1024 * 1024;
/**
 * A history kept in one local file (any version readable, version 2 written).
 * - load: a missing file is an empty history; a file that cannot be read, is larger than
 *   HISTORY_FILE_LIMIT, is not a history document, or holds another series is a StoreError — and
 *   it is never overwritten. save refuses to write a document over the limit the same way.
 * - save: refuses a shrink no trim explains (guardAgainstLoss), re-reads the file (it must still
 *   be a readable history of this series) and keeps the runs another writer added since the load
 *   (healConcurrent; parsed again only when its bytes differ from every loaded document's, or h
 *   lacks some of their runs; the window between re-read and rename is left to the caller to keep
 *   single-writer, e.g. one CI job per series), then writes: when h is the loaded document plus
 *   appended runs (and perhaps trimmed), by splicing the loaded rows' bytes (spliceHistory, same
 *   meaning as serializeHistory, which writes anything else), and atomically: a temp file in the same
 *   folder (so rename stays on one file system), fsync, rename over the old file, fsync the folder.
 *   A crash leaves either the old or the new document, never half of one. Creates the folder.
 *
 * @example const store = createFileStore('.bellgate/history.json', 'linux-x64');
 * await store.save(appendRun(await store.load(), info, run), readCount);
 */
function createFileStore(path, series) {
    const where = `file ${path}`;
    /** The file's bytes; undefined when it does not exist. Refuses a file over the limit unread. */
    async function readBytes() {
        try {
            // Stat first: past the limit, reading would fail with V8's unexplained "Invalid string length".
            const size = (await (0,promises_.stat)(path)).size;
            if (size > HISTORY_FILE_LIMIT)
                throw tooLarge(size, where, 'the history file is');
            const bytes = await (0,promises_.readFile)(path);
            if (bytes.length > HISTORY_FILE_LIMIT)
                throw tooLarge(bytes.length, where, 'the history file is');
            return bytes;
        }
        catch (cause) {
            if (cause instanceof store/* StoreError */.A)
                throw cause;
            if (cause.code === 'ENOENT')
                return undefined;
            throw new store/* StoreError */.A(`cannot read the history file: ${messageOf(cause)}`, {
                where,
                fix: 'check that the path names a readable file',
                cause,
            });
        }
    }
    /** The bytes read as a history of this series (parseHistoryBytes), or the StoreError why not. */
    function parseBytes(bytes) {
        let read;
        try {
            read = (0,history_document/* parseHistoryBytes */.pL)(bytes, path);
        }
        catch (cause) {
            if (!(cause instanceof input_error/* InputError */.d))
                throw cause;
            throw new store/* StoreError */.A(`the history file is not a readable history document (${cause.where ?? path}: ${cause.message}); it was left as it is`, {
                where,
                fix: `${cause.fix ?? 'repair it'}; \`bellgate verify --history ${path}\` lists every problem`,
                cause,
            });
        }
        const found = read.history.series;
        if (found !== series) {
            throw new store/* StoreError */.A(`the file holds the history of series ${JSON.stringify(found)}, not ${JSON.stringify(series)}`, {
                where,
                fix: `use one file per series, or pass --series ${JSON.stringify(found)}`,
            });
        }
        return read;
    }
    // Every document load() parsed, its bytes and runs: when save() finds the same bytes on disk it
    // knows their runs without parsing them again (the costliest step at scale). Comparing the bytes
    // (a memcmp) costs less than hashing them twice; they are kept for the splice anyway.
    const loaded = [];
    // The newest document load() read, kept with its bytes so save() can splice an append into its
    // rows instead of writing every number again (spliceHistory checks that h still agrees with it).
    let written;
    return {
        describe: () => where,
        async load() {
            written = undefined;
            const bytes = await readBytes();
            if (bytes === undefined)
                return (0,history_history/* emptyHistory */.s)(series);
            const { history, rows } = parseBytes(bytes);
            if (!loaded.some((d) => d.bytes.equals(bytes))) {
                loaded.push({ bytes, runs: history.runs.map((r) => (r.time === undefined ? { id: r.id } : { id: r.id, time: r.time })) });
            }
            // The bytes are kept only when they can be spliced (a plain version-2 document).
            if (rows !== undefined)
                written = writtenHistory(bytes, rows, history);
            return history;
        },
        async save(h, readCount) {
            if (h.series !== series) {
                throw new store/* StoreError */.A(`refusing to save series ${JSON.stringify(h.series)} into the history of ${JSON.stringify(series)}`, { where });
            }
            (0,store/* guardAgainstLoss */.y)(where, h, readCount);
            const healed = await healFromDisk(h);
            let text;
            try {
                text = (healed === h && written !== undefined ? spliceHistory(h, written) : undefined) ?? (0,history_document/* serializeHistory */.ph)(healed);
            }
            catch (cause) {
                // A document past V8's longest string fails inside serializeHistory with a RangeError.
                if (cause instanceof RangeError)
                    throw tooLarge(undefined, where, 'the history to write would be');
                throw new store/* StoreError */.A(`the history cannot be written: ${messageOf(cause)}`, { where, cause });
            }
            // Characters <= UTF-8 bytes <= 3 x characters: count the bytes only when the bound is unclear.
            if (typeof text !== 'string' || text.length * 3 > HISTORY_FILE_LIMIT) {
                const bytes = typeof text === 'string' ? Buffer.byteLength(text, 'utf8') : text.length;
                if (bytes > HISTORY_FILE_LIMIT)
                    throw tooLarge(bytes, where, 'the history to write would be');
            }
            await writeAtomically(path, text, where);
        },
    };
    /**
     * h plus the runs another writer added since the load (healConcurrent). The file must still be a
     * readable history of this series. When its bytes are those of a loaded document whose runs add
     * nothing to h (the usual case: nobody else wrote), healing is known to return h: no parse.
     */
    async function healFromDisk(h) {
        let bytes = await readBytes();
        if (bytes === undefined)
            return h;
        const disk = bytes;
        const runs = loaded.find((d) => d.bytes.equals(disk))?.runs;
        if (runs !== undefined && (0,merge/* concurrentRuns */.WR)(h, runs).length === 0)
            return h;
        const stored = parseBytes(bytes).history;
        bytes = undefined;
        return (0,merge/* healConcurrent */.UY)(h, stored);
    }
}
async function writeAtomically(path, text, where) {
    const folder = (0,external_node_path_.dirname)(path);
    // Short enough that a file name near the 255-byte limit still has room for its temp file.
    const temp = (0,external_node_path_.join)(folder, `.${(0,external_node_path_.basename)(path).slice(0, 32)}.${(0,external_node_crypto_.randomBytes)(6).toString('hex')}.tmp`);
    try {
        await (0,promises_.mkdir)(folder, { recursive: true });
        const mode = await (0,promises_.stat)(path).then((s) => s.mode & 0o777, () => 0o644);
        const handle = await (0,promises_.open)(temp, 'wx', mode);
        try {
            await handle.writeFile(text, 'utf8');
            await handle.sync();
        }
        finally {
            await handle.close();
        }
        await (0,promises_.rename)(temp, path);
    }
    catch (cause) {
        await (0,promises_.unlink)(temp).catch(() => undefined);
        throw new store/* StoreError */.A(`cannot write the history file: ${messageOf(cause)}`, {
            where,
            fix: 'check that the folder exists or can be created and is writable, and that the disk has room',
            cause,
        });
    }
    // The rename is durable only once the folder entry is on disk; some systems cannot fsync a folder.
    try {
        const dir = await (0,promises_.open)(folder, 'r');
        try {
            await dir.sync();
        }
        finally {
            await dir.close();
        }
    }
    catch {
        // best effort
    }
}
/** The refusal of a history past HISTORY_FILE_LIMIT: the size, the limit and what to do. */
function tooLarge(size, where, what) {
    const mib = (n) => `${(n / 1024 / 1024).toFixed(1)} MiB`;
    const amount = size === undefined ? 'larger than' : `${mib(size)} (${size} bytes), over`;
    return new store/* StoreError */.A(`${what} ${amount} the limit of ${mib(HISTORY_FILE_LIMIT)} a history file may hold; it was left as it is`, {
        where,
        fix: 'lower `keep` (fewer runs per history), or split the series into several (one per group of metrics)',
    });
}
function messageOf(cause) {
    return cause instanceof Error ? cause.message : String(cause);
}

// EXTERNAL MODULE: ./src/history/branch-path.ts
var branch_path = __webpack_require__(39148);
;// CONCATENATED MODULE: ./src/github/store-factory.ts





const STORE_BUILDERS = {
    artifact: async (s) => (await Promise.all(/* import() */[__webpack_require__.e(306), __webpack_require__.e(658)]).then(__webpack_require__.bind(__webpack_require__, 40658))).createArtifactStore({
        api: s.api(),
        upload: s.upload,
        history: s.history,
        series: s.series,
        baselineBranch: s.baselineBranch,
        repositoryId: s.repositoryId,
        retentionDays: s.retentionDays,
        warn: s.warn,
    }),
    file: (s) => createFileStore((0,external_node_path_.isAbsolute)(s.history) ? s.history : (0,external_node_path_.resolve)(s.workspace || '.', s.history), s.series),
    branch: buildBranchStore,
};
/**
 * `store: branch`: the history input names the data branch (left at its default it means
 * `bellgate-data`). Writing onto the baseline branch itself is refused: the history would land
 * among the code it measures.
 */
async function buildBranchStore(s) {
    const branch = (0,branch_path/* dataBranchName */.QK)(s.history === DEFAULT_HISTORY ? branch_path/* DEFAULT_DATA_BRANCH */.Yh : s.history);
    if (branch === s.baselineBranch) {
        throw new input_error/* InputError */.d(`input \`history\` names the baseline branch "${branch}" as the data branch`, {
            where: 'input history',
            fix: `name a branch of its own, e.g. \`history: ${branch_path/* DEFAULT_DATA_BRANCH */.Yh}\``,
        });
    }
    const api = s.api().gitData;
    if (!api)
        throw new input_error/* InputError */.d('this GitHub client cannot write a data branch', { where: 'input store', fix: 'use `store: artifact` or `store: file`' });
    const { createBranchStore } = await __webpack_require__.e(/* import() */ 788).then(__webpack_require__.bind(__webpack_require__, 74788));
    return createBranchStore({ api, branch, series: s.series });
}
/**
 * Builds the store for the spec's kind.
 * @throws InputError for a kind that is not available.
 * @example (await createHistoryStore({ kind: 'file', history: 'bench/history.json', ... })).describe()
 */
async function createHistoryStore(spec, builders = STORE_BUILDERS) {
    return builders[spec.kind](spec);
}

;// CONCATENATED MODULE: ./src/github/run-action.ts
/**
 * The action, end to end: inputs -> context -> config -> metric files -> history -> gate ->
 * outputs, summary, annotations, PR comment -> record. Effects go through `deps` only.
 *
 * Failure policy (what fails the step, what only warns):
 * - FAILS: a bad input or config, unreadable metric files, a missing GITHUB_* variable (message
 *   names the input/file and the fix); a regression when `block: true` and the PR does not carry
 *   the accept label; a history that cannot be fetched or saved when `history-failure: fail`.
 * - WARNS: a history that cannot be fetched (default `history-failure: warn`: the run goes on as
 *   if there were no history, every metric `new`, and nothing is recorded so nothing is buried);
 *   a history that cannot be saved (same input); a corrupt history artifact (skipped, the others
 *   are merged); a PR comment the token may not write (fork PRs: summary only); a job summary
 *   that cannot be written.
 * - NOTICE only: an event that is checked but never recorded (e.g. `release`).
 * Nothing prints a stack trace or the token (it is masked first).
 */



















/**
 * Runs the action once. Never throws: every failure becomes sink.setFailed with a plain message.
 * @example await runAction(realDeps()) // { failed: false, recorded: true, ... }
 */
async function runAction(deps) {
    const { sink } = deps;
    try {
        return await perform(deps);
    }
    catch (error) {
        sink.setFailed(describeError(error));
        return { failed: true, recorded: false };
    }
}
async function perform(deps) {
    const { sink } = deps;
    const inputs = readActionInputs(deps.env);
    if (inputs.token !== '')
        sink.setSecret(inputs.token);
    const context = await readRunContext(deps.env, deps.readText);
    // A missing file at the default path means default settings; a missing named file is an error.
    const config = await loadActionConfig(inputs.config, deps.cwd);
    const run = await readMetricFiles(inputs.metrics, {
        ...(inputs.inputFormat ?? config.inputFormat ? { format: inputs.inputFormat ?? config.inputFormat } : {}),
        limits: config.limits,
        aggregateFor: (name) => settingsFor(config, name).aggregate,
        cwd: deps.cwd,
    });
    const series = inputs.series ?? `${context.workflow}/${context.job}`;
    const baselineBranch = inputs.baselineBranch ?? context.defaultBranch;
    const decision = decideRecord(inputs.record, context, baselineBranch);
    if (decision.notice)
        sink.notice(`bellgate: not recording this run: ${decision.reason}`);
    else
        sink.info(`bellgate: series "${series}"; ${decision.record ? 'will record' : 'check only'} (${decision.reason})`);
    let api;
    const apiOnce = () => {
        if (inputs.token === '') {
            throw new input_error/* InputError */.d('input `token` is empty, but the GitHub API is needed (history artifacts, PR comment)', {
                where: 'input token',
                fix: 'leave `token` at its default (${{ github.token }}) or pass a token that may read actions and write pull requests',
            });
        }
        api ??= deps.createApi({
            token: inputs.token,
            baseUrl: context.apiUrl,
            owner: context.owner,
            repo: context.repo,
            ...(deps.retry ? { retry: deps.retry } : {}),
            log: (m) => sink.info(`bellgate: ${m}`),
        });
        return api;
    };
    const store = await (deps.createStore ?? createHistoryStore)({
        kind: inputs.store,
        history: inputs.history,
        series,
        baselineBranch: baselineBranch ?? '',
        repositoryId: context.repositoryId,
        retentionDays: inputs.retentionDays,
        workspace: deps.cwd,
        api: apiOnce,
        upload: deps.upload,
        warn: (m) => sink.warning(`bellgate: ${m}`),
    });
    const { history, readable } = await loadHistory(store, series, inputs, sink);
    const accepted = context.pullRequest?.labels.includes(inputs.acceptLabel) ?? false;
    const report = runGate({ config, history, run, series, accepted });
    const regressed = report.metrics.filter((m) => m.status === 'regressed').length;
    const flagged = report.metrics.some((m) => m.status === 'regressed' || m.status === 'improved');
    const runUrl = `${context.serverUrl}/${context.owner}/${context.repo}/actions/runs/${context.runNumericId}`;
    const marker = commentMarker(series);
    const markdown = renderMarkdown(report, { marker, runUrl });
    const reportPath = (0,external_node_path_.join)(context.runnerTemp, 'bellgate', `${(0,artifact_name/* artifactName */.C)('report', series)}.json`);
    await deps.writeText(reportPath, renderJson(report));
    sink.setOutput(OUTPUT.verdict, report.verdict);
    sink.setOutput(OUTPUT.regressed, String(regressed));
    sink.setOutput(OUTPUT.report, reportPath);
    try {
        await sink.appendSummary(markdown);
    }
    catch (error) {
        sink.warning(`bellgate: could not write the job summary: ${describeError(error)}`);
    }
    annotate(report, sink, series);
    if (inputs.htmlReport)
        await uploadHtml(deps, context, series, report, history, inputs.retentionDays);
    let comment;
    if (PULL_REQUEST_EVENTS.includes(context.eventName) && context.pullRequest) {
        comment = await postComment(apiOnce, context, inputs, markerLine(marker), markdown, flagged, sink);
    }
    let recorded = false;
    let failed = false;
    if (decision.record && !readable) {
        sink.warning('bellgate: not recording this run, because the history could not be read (it is never overwritten)');
    }
    else if (decision.record) {
        recorded = await recordRun(store, history, runInfo(context, deps.now()), run, config.keep, inputs, sink);
        if (!recorded && inputs.historyFailure === 'fail')
            failed = true;
    }
    if (!readable && inputs.historyFailure === 'fail')
        failed = true;
    if (report.verdict === 'regressed' && inputs.block) {
        sink.setFailed(`bellgate: ${regressed} metric${regressed === 1 ? '' : 's'} regressed in series "${series}" (see the job summary)` +
            (context.pullRequest ? `; add the label "${inputs.acceptLabel}" to the pull request to accept` : ''));
        failed = true;
    }
    else if (report.verdict === 'regressed') {
        sink.warning(`bellgate: ${regressed} metric(s) regressed; not failing because block is false`);
    }
    else if (failed) {
        sink.setFailed('bellgate: the history store failed and `history-failure: fail` is set');
    }
    if (report.verdict === 'accepted')
        sink.notice(`bellgate: regressions accepted by the label "${inputs.acceptLabel}"`);
    return { failed, report, recorded, ...(comment ? { comment } : {}) };
}

;// CONCATENATED MODULE: ./src/github/start.ts


/**
 * Runs the action with the real runner, file system and GitHub API: what src/action.ts loads,
 * as one module so the bundle puts it in one chunk.
 * @example await startAction() // the outcome reaches the runner as workflow commands and files
 */
function startAction() {
    return runAction(createRealDeps());
}


/***/ }),

/***/ 63278:
/***/ ((__unused_webpack_module, __webpack_exports__, __webpack_require__) => {

/* harmony export */ __webpack_require__.d(__webpack_exports__, {
/* harmony export */   C: () => (/* binding */ artifactName)
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
    const slug = series.replace(/[^A-Za-z0-9._-]+/g, '-').replace(/^-+|-+$/g, '').slice(0, 60);
    const hash = (0,node_crypto__WEBPACK_IMPORTED_MODULE_0__.createHash)('sha256').update(series).digest('hex').slice(0, 8);
    return slug === '' ? `${history}-${hash}` : `${history}-${slug}-${hash}`;
}


/***/ }),

/***/ 75939:
/***/ ((__unused_webpack_module, __webpack_exports__, __webpack_require__) => {

/* harmony export */ __webpack_require__.d(__webpack_exports__, {
/* harmony export */   x: () => (/* binding */ GitDataError)
/* harmony export */ });
/**
 * The Git Data calls the branch store makes (shaped after the public REST reference,
 * docs.github.com/rest/git: refs, commits, trees, blobs, and "Get repository content"), and the
 * error they throw. branch-rest.ts implements them over fetch; tests point it at a loopback server.
 */
/**
 * A Git Data call failed. `status` is the HTTP status (undefined for a network error, timeout or
 * truncated answer); `transient` says a retry may succeed (5xx, 429, network); `conflict` says the
 * branch moved under us (409, or 422 on a ref write) and the store should re-read and merge.
 */
class GitDataError extends Error {
    name = 'GitDataError';
    status;
    transient;
    conflict;
    /** Seconds the server asked to wait (Retry-After), if it did. */
    retryAfter;
    constructor(message, options = {}) {
        super(message, options.cause === undefined ? undefined : { cause: options.cause });
        this.status = options.status;
        this.transient = options.transient ?? false;
        this.conflict = options.conflict ?? false;
        this.retryAfter = options.retryAfter;
    }
}


/***/ }),

/***/ 40363:
/***/ ((__unused_webpack_module, __webpack_exports__, __webpack_require__) => {

/* harmony export */ __webpack_require__.d(__webpack_exports__, {
/* harmony export */   j: () => (/* binding */ backoffMs)
/* harmony export */ });
/**
 * The wait before retry number `attempt` (0-based): the server's Retry-After when it gave one
 * (seconds, scaled by unitMs / 1000 so tests wait milliseconds), else "full jitter" exponential
 * backoff, unitMs * 2^attempt * (0.5 + random), capped at 60 units. Randomness is passed in so tests
 * are repeatable; jitter spreads writers that collided so they do not collide again in step.
 * @example backoffMs(2, 100, () => 0.5) // 400
 */
function backoffMs(attempt, unitMs, random, retryAfterSeconds) {
    const cap = 60 * unitMs;
    if (retryAfterSeconds !== undefined)
        return Math.min(cap, retryAfterSeconds * unitMs);
    return Math.min(cap, unitMs * 2 ** Math.min(attempt, 16) * (0.5 + random()));
}


/***/ }),

/***/ 39148:
/***/ ((__unused_webpack_module, __webpack_exports__, __webpack_require__) => {

/* harmony export */ __webpack_require__.d(__webpack_exports__, {
/* harmony export */   QK: () => (/* binding */ dataBranchName),
/* harmony export */   Yh: () => (/* binding */ DEFAULT_DATA_BRANCH),
/* harmony export */   hq: () => (/* binding */ seriesFilePath)
/* harmony export */ });
/* unused harmony export BRANCH_FOLDER */
/* harmony import */ var node_crypto__WEBPACK_IMPORTED_MODULE_0__ = __webpack_require__(77598);
/* harmony import */ var node_crypto__WEBPACK_IMPORTED_MODULE_0___default = /*#__PURE__*/__webpack_require__.n(node_crypto__WEBPACK_IMPORTED_MODULE_0__);
/* harmony import */ var _model_input_error_js__WEBPACK_IMPORTED_MODULE_1__ = __webpack_require__(71184);
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
 * @example seriesFilePath('bench/linux') // 'bellgate/bench-linux-<8 hex>.json'
 */
function seriesFilePath(series) {
    const slug = series
        .replace(/[^A-Za-z0-9._-]+/g, '-')
        .replace(/^[-.]+|[-.]+$/g, '')
        .slice(0, 60);
    const hash = (0,node_crypto__WEBPACK_IMPORTED_MODULE_0__.createHash)('sha256').update(series, 'utf8').digest('hex').slice(0, 8);
    return `${BRANCH_FOLDER}/${slug === '' ? hash : `${slug}-${hash}`}.json`;
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
        throw new _model_input_error_js__WEBPACK_IMPORTED_MODULE_1__/* .InputError */ .d(`input \`history\` is ${JSON.stringify(raw)}, which cannot be a branch name: ${why}`, {
            where: 'input history',
            fix: `name the data branch with letters, digits, dashes and slashes, e.g. \`history: ${DEFAULT_DATA_BRANCH}\``,
        });
    };
    if (name === '' || name === '@')
        bad('it is empty');
    if (name.length > 200)
        bad('it is longer than 200 characters');
    // eslint-disable-next-line no-control-regex
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

/***/ 70516:
/***/ ((__unused_webpack_module, __webpack_exports__, __webpack_require__) => {


// EXPORTS
__webpack_require__.d(__webpack_exports__, {
  Y_: () => (/* binding */ HISTORY_TAIL),
  l4: () => (/* binding */ checkRuns),
  zz: () => (/* binding */ checkStorable),
  Td: () => (/* binding */ historyHead),
  i6: () => (/* binding */ parseHistory),
  pL: () => (/* binding */ parseHistoryBytes),
  ph: () => (/* binding */ serializeHistory)
});

// UNUSED EXPORTS: HISTORY_SCHEMA, HISTORY_SCHEMA_V1, decodeHistoryDocument

// EXTERNAL MODULE: ./src/model/input-error.ts + 1 modules
var input_error = __webpack_require__(71184);
;// CONCATENATED MODULE: ./src/history/problems.ts

/**
 * A sink that throws InputError at the first problem, located as "source at path".
 *
 * @example throwingSink('h.json')('runs.id[2]', 'run id "7-1" appears twice') // throws InputError
 */
function throwingSink(source) {
    return (path, problem, fix) => {
        throw new input_error/* InputError */.d(problem, {
            where: path === '' ? source : `${source} at ${path}`,
            fix: fix ?? 'repair the document (run `bellgate verify` to list every problem) or restore it from a backup',
        });
    };
}
/**
 * A sink that collects problems into `into`, keeping at most `limit` of them and then one line
 * saying how many more there were — a document with a million bad values stays readable.
 */
function collectingSink(into, limit = 200) {
    let extra = 0;
    return {
        sink: (path, problem) => {
            if (into.length < limit)
                into.push({ where: path, problem });
            else
                extra += 1;
        },
        finish: () => {
            if (extra > 0)
                into.push({ where: '', problem: `${extra} more problems not listed` });
        },
    };
}
/** `metrics.values[3]`-style path step for an array index. */
const at = (path, index) => `${path}[${index}]`;
/** Path step for an object key; quoted because metric names hold dots, slashes and brackets. */
const key = (path, name) => `${path}[${JSON.stringify(name)}]`;
/** A JSON object (not null, not an array). */
function isObject(value) {
    return typeof value === 'object' && value !== null && !Array.isArray(value);
}
/** Short description of a JSON value's type for messages ("a string", "null"). */
function typeName(value) {
    if (value === null)
        return 'null';
    if (Array.isArray(value))
        return 'an array';
    if (typeof value === 'object')
        return 'an object';
    if (typeof value === 'number' && !Number.isFinite(value))
        return `the non-finite number ${value}`;
    return `a ${typeof value}`;
}

;// CONCATENATED MODULE: ./src/history/decode-v2.ts

/** The optional text columns of the runs table, in the order they are written. */
const RUN_FIELDS = ['sha', 'ref', 'event', 'time'];
/**
 * Decodes a parsed version-2 document (see document.ts for the layout) into a History.
 * Fast on purpose: the value columns JSON.parse made are reused as the History's columns, and
 * one pass per column checks each entry and turns null (missing) into NaN — no object per value.
 * Every problem goes to `report` with its JSON path; when `report` returns (verify mode), the bad
 * entry becomes NaN and decoding carries on. Returns undefined when the shape is beyond use.
 *
 * @example decodeV2(JSON.parse(text), throwingSink('h.json')) // { series, runs, columns }
 */
function decodeV2(root, report) {
    const series = typeof root.series === 'string' ? root.series : '';
    if (typeof root.series !== 'string')
        report('series', `series must be a string, found ${typeName(root.series)}`);
    const runs = decodeRuns(root.runs, report);
    if (!runs)
        return undefined;
    const columns = decodeMetrics(root.metrics, runs.length, report);
    if (!columns)
        return undefined;
    return { series, runs, columns };
}
function decodeRuns(table, report) {
    if (!isObject(table)) {
        report('runs', `runs must be an object of columns {id, ${RUN_FIELDS.join(', ')}}, found ${typeName(table)}`);
        return undefined;
    }
    const ids = table.id;
    if (!Array.isArray(ids)) {
        report('runs.id', `runs.id must be an array of run ids, found ${typeName(ids)}`);
        return undefined;
    }
    const first = new Map();
    const runs = ids.map((id, i) => {
        if (typeof id !== 'string' || id === '') {
            report(at('runs.id', i), `a run id must be a non-empty string, found ${typeName(id)}`);
            return { id: `#${i}` };
        }
        const earlier = first.get(id);
        if (earlier !== undefined) {
            report(at('runs.id', i), `run id ${JSON.stringify(id)} appears twice (also runs.id[${earlier}])`, 'keep one copy of the run; each run id may appear once per series');
        }
        else
            first.set(id, i);
        return { id };
    });
    for (const field of RUN_FIELDS) {
        const column = table[field];
        if (column === undefined)
            continue;
        const path = `runs.${field}`;
        if (!Array.isArray(column) || column.length !== runs.length) {
            report(path, `${path} must be an array as long as runs.id (${runs.length}), found ${lengthOrType(column)}`);
            continue;
        }
        column.forEach((text, i) => {
            if (typeof text === 'string')
                runs[i][field] = text;
            else if (text !== null)
                report(at(path, i), `${field} must be a string or null, found ${typeName(text)}`);
        });
    }
    return runs;
}
function decodeMetrics(table, runCount, report) {
    if (!isObject(table)) {
        report('metrics', `metrics must be an object {names, units, values}, found ${typeName(table)}`);
        return undefined;
    }
    const { names, units, values } = table;
    if (!Array.isArray(names)) {
        report('metrics.names', `metrics.names must be an array of metric names, found ${typeName(names)}`);
        return undefined;
    }
    if (!Array.isArray(values) || values.length !== names.length) {
        report('metrics.values', `metrics.values must hold one column per name (${names.length}), found ${lengthOrType(values)}`);
        return undefined;
    }
    const unitsOk = units === undefined || (Array.isArray(units) && units.length === names.length);
    if (!unitsOk)
        report('metrics.units', `metrics.units must be as long as metrics.names (${names.length}), found ${lengthOrType(units)}`);
    const columns = new Map();
    for (let m = 0; m < names.length; m++) {
        const name = names[m];
        if (typeof name !== 'string') {
            report(at('metrics.names', m), `a metric name must be a string, found ${typeName(name)}`);
            continue;
        }
        if (columns.has(name)) {
            report(at('metrics.names', m), `metric ${JSON.stringify(name)} appears twice in metrics.names`, 'merge the two columns into one');
            continue;
        }
        const column = checkColumn(values[m], m, runCount, report);
        if (!column)
            continue;
        const unit = unitsOk && units !== undefined ? units[m] : null;
        if (typeof unit === 'string')
            columns.set(name, { unit, values: column });
        else {
            if (unit !== null)
                report(at('metrics.units', m), `a unit must be a string or null, found ${typeName(unit)}`);
            columns.set(name, { values: column });
        }
    }
    return columns;
}
/**
 * Checks one value column in place, in one tight pass: numbers stay, null becomes NaN, anything
 * else is reported. NaN is already "missing": scanHistoryBytes reads null as NaN (JSON.parse never
 * makes one). Rows the scan read are arrays of doubles, so the usual pass only compares numbers.
 */
function checkColumn(column, m, runCount, report) {
    if (!Array.isArray(column) || column.length !== runCount) {
        report(at('metrics.values', m), `each value column must hold one entry per run (${runCount}), found ${lengthOrType(column)}`, 'the columns are ragged: a column was cut or extended by hand; restore the document from a backup');
        return undefined;
    }
    const cells = column;
    for (let r = 0; r < runCount; r++) {
        const v = cells[r];
        // v - v is 0 for every finite number, NaN for NaN and the infinities.
        if (typeof v === 'number') {
            if (v - v !== 0 && v === v)
                badCell(cells, m, r, `value ${v} is not finite (an overflowing number such as 1e999?)`, report);
        }
        else if (v === null)
            cells[r] = NaN;
        else
            badCell(cells, m, r, `a value must be a number or null (missing), found ${typeName(v)}`, report);
    }
    return cells;
}
/** Reports a bad entry (JSON.parse turns an overflowing literal such as 1e999 into Infinity) and makes it missing. */
function badCell(cells, m, r, problem, report) {
    report(at(at('metrics.values', m), r), problem);
    cells[r] = NaN;
}
function lengthOrType(value) {
    return Array.isArray(value) ? `${value.length} entries` : typeName(value);
}

;// CONCATENATED MODULE: ./src/history/decode-v1.ts


/**
 * Decodes a parsed version-1 document — the earlier, per-run form, read for migration and never
 * written: `{"schema": "bellgate.history/1", "series": "...", "runs": [{"id", "sha", "ref", "event",
 * "time", "values": {"name": number | null}, "units": {"name": "unit"}}]}`.
 * Metric columns appear in the order their names are first met; a run without a name is NaN there.
 * Names are read with Object.keys (JSON.parse makes "__proto__" an own key) into a Map.
 * Problems go to `report` with JSON paths; returns undefined when the shape is beyond use.
 *
 * @example decodeV1({ schema: 'bellgate.history/1', series: 's', runs: [] }, sink) // empty History
 */
function decodeV1(root, report) {
    const series = typeof root.series === 'string' ? root.series : '';
    if (typeof root.series !== 'string')
        report('series', `series must be a string, found ${typeName(root.series)}`);
    const list = root.runs;
    if (!Array.isArray(list)) {
        report('runs', `runs must be an array of run objects, found ${typeName(list)}`);
        return undefined;
    }
    const runs = [];
    const columns = new Map();
    const first = new Map();
    list.forEach((entry, r) => {
        const path = at('runs', r);
        const info = { id: `#${r}` };
        runs.push(info);
        if (!isObject(entry)) {
            report(path, `a run must be an object, found ${typeName(entry)}`);
            return;
        }
        if (typeof entry.id !== 'string' || entry.id === '') {
            report(`${path}.id`, `a run id must be a non-empty string, found ${typeName(entry.id)}`);
        }
        else {
            info.id = entry.id;
            const earlier = first.get(entry.id);
            if (earlier === undefined)
                first.set(entry.id, r);
            else
                report(`${path}.id`, `run id ${JSON.stringify(entry.id)} appears twice (also runs[${earlier}])`, 'keep one copy of the run; each run id may appear once per series');
        }
        for (const field of RUN_FIELDS) {
            const text = entry[field];
            if (typeof text === 'string')
                info[field] = text;
            else if (text !== undefined && text !== null)
                report(`${path}.${field}`, `${field} must be a string, found ${typeName(text)}`);
        }
        readValues(entry, path, r, list.length, columns, report);
    });
    return { series, runs, columns };
}
function readValues(entry, path, r, runCount, columns, report) {
    const { values, units } = entry;
    if (units !== undefined && !isObject(units))
        report(`${path}.units`, `units must be an object of name -> unit, found ${typeName(units)}`);
    if (!isObject(values)) {
        report(`${path}.values`, `values must be an object of name -> number, found ${typeName(values)}`);
        return;
    }
    for (const name of Object.keys(values)) {
        const v = values[name];
        let column = columns.get(name);
        if (!column) {
            column = { values: new Array(runCount).fill(NaN) };
            columns.set(name, column);
        }
        if (typeof v === 'number' && Number.isFinite(v))
            column.values[r] = v;
        else if (v !== null)
            report(key(`${path}.values`, name), `a value must be a finite number or null, found ${typeName(v)}`);
        const unit = isObject(units) && Object.hasOwn(units, name) ? units[name] : undefined;
        if (typeof unit === 'string')
            column.unit = unit;
        else if (unit !== undefined && unit !== null)
            report(key(`${path}.units`, name), `a unit must be a string, found ${typeName(unit)}`);
    }
}

;// CONCATENATED MODULE: ./src/history/json-text.ts

/**
 * Parses JSON text, turning a syntax error into an InputError that points at "source:line:col".
 * V8 states the offset for most errors ("... in JSON at position 17"); for an unexpected token it
 * quotes about ten characters either side instead, so the quote is searched for in the text.
 * A leading byte-order mark is ignored.
 * Throws InputError (where = "source:line:col") on malformed JSON.
 *
 * @example parseJsonText('{"a": 1}', 'h.json') // { a: 1 }
 */
function parseJsonText(text, source) {
    const body = text.charCodeAt(0) === 0xfeff ? text.slice(1) : text;
    try {
        return JSON.parse(body);
    }
    catch (error) {
        const message = error instanceof Error ? error.message : String(error);
        const offset = syntaxErrorOffset(body, message);
        const { line, column } = lineColumn(body, offset);
        throw new input_error/* InputError */.d(`not valid JSON (${message.replace(/, ".*" is not valid JSON$/s, '')})`, {
            where: `${source}:${line}:${column}`,
            fix: body.trim() === '' ? 'the file is empty; remove it or write a complete document' : 'repair the JSON at that spot (a truncated or hand-edited file?)',
            cause: error,
        });
    }
}
/** Best estimate of where V8's JSON parser stopped, as an offset into `text`. */
function syntaxErrorOffset(text, message) {
    const stated = /at position (\d+)/.exec(message);
    if (stated)
        return Number(stated[1]);
    if (/end of JSON input/.test(message))
        return text.length;
    // 'Unexpected token 'x', ..."context"... is not valid JSON': the token sits ten characters
    // into the quote when the quote is cut on the left, else at its first place in the quote.
    const quoted = /^Unexpected token '(.)', (\.\.\.)?"(.*?)"(\.\.\.)? is not valid JSON$/s.exec(message);
    if (quoted) {
        const [, token = '', cutLeft, context = ''] = quoted;
        const at = text.indexOf(context);
        if (at >= 0)
            return at + (cutLeft ? 10 : Math.max(0, context.indexOf(token)));
    }
    return 0;
}
/** 1-based line and column of an offset (UTF-16 units; columns count characters of that line). */
function lineColumn(text, offset) {
    const end = Math.min(Math.max(offset, 0), text.length);
    let line = 1;
    let lineStart = 0;
    for (let i = text.indexOf('\n'); i >= 0 && i < end; i = text.indexOf('\n', i + 1)) {
        line += 1;
        lineStart = i + 1;
    }
    return { line, column: end - lineStart + 1 };
}

;// CONCATENATED MODULE: ./src/history/values-scan.ts
/**
 * The fast reader of a version-2 history document's bytes (document.ts has the layout).
 *
 * JSON.parse makes a heap object of every number in `metrics.values`, and collecting those objects
 * costs about as much again as parsing them; at 1,000 runs x 1,000 metrics that was most of a
 * check. This reader walks the bytes once: it finds `metrics.values`, reads its rows straight into
 * arrays of unboxed doubles (missing = NaN), and hands only the small rest of the document
 * (schema, series, runs, names, units) to JSON.parse with `"values":[]` in the rows' place.
 *
 * It is all or nothing: whenever the bytes stray from plain JSON of the expected shape (a syntax
 * error, a string or object inside a row, an escaped or repeated "metrics"/"values" key) it
 * returns undefined and the caller parses the whole text the ordinary way, which reports the
 * problem with its line and column. So it never changes what a document means, only how fast a
 * well-formed one is read.
 */
const SPACE = 0x20, TAB = 0x09, LF = 0x0a, CR = 0x0d;
const QUOTE = 0x22, BACKSLASH = 0x5c, COMMA = 0x2c, COLON = 0x3a;
const OPEN_SQUARE = 0x5b, CLOSE_SQUARE = 0x5d, OPEN_CURLY = 0x7b, CLOSE_CURLY = 0x7d;
const MINUS = 0x2d, PLUS = 0x2b, DOT = 0x2e, ZERO = 0x30, NINE = 0x39, LOWER_E = 0x65, UPPER_E = 0x45;
/** Exact powers of ten: every 10^k with k <= 22 is a double without rounding. */
const EXACT_POWERS = Array.from({ length: 23 }, (_, k) => Number(`1e${k}`));
/** A checked JSON number is ASCII, so any single-byte decoder reads it. */
const ASCII = new TextDecoder('latin1');
const isSpace = (c) => c === SPACE || c === LF || c === CR || c === TAB;
/** Fails the scan; the caller falls back to JSON.parse, which explains the problem. */
class NotPlain extends Error {
}
/**
 * Reads a history document's bytes; undefined when they are not plain JSON of the version-2
 * shape (then parse the text with JSON.parse instead). Work: one pass over the bytes, no object
 * per value.
 * @example scanHistoryBytes(Buffer.from('{"schema":"bellgate.history/2","metrics":{"names":["a"],"values":[[1,null]]}}'))?.root
 * // { schema: 'bellgate.history/2', metrics: { names: ['a'], values: [[1, NaN]] } }
 */
function scanHistoryBytes(bytes) {
    try {
        return scan(bytes);
    }
    catch (error) {
        if (error instanceof NotPlain)
            return undefined;
        throw error;
    }
}
function scan(bytes) {
    const reader = new ByteReader(bytes);
    // A UTF-8 byte-order mark, which parseJsonText also skips.
    if (bytes[0] === 0xef && bytes[1] === 0xbb && bytes[2] === 0xbf)
        reader.at = 3;
    const bodyStart = reader.at;
    let found;
    reader.members((topKey) => {
        if (topKey !== 'metrics' || reader.peek() !== OPEN_CURLY)
            return reader.skipValue();
        if (found !== undefined)
            throw new NotPlain();
        reader.members((key) => {
            if (key !== 'values')
                return reader.skipValue();
            if (found !== undefined)
                throw new NotPlain();
            const start = reader.at;
            const { rows, rowEnds } = reader.rows();
            found = { start, end: reader.at, rows, rowEnds };
        });
    });
    reader.skipSpace();
    if (reader.at !== bytes.length || found === undefined)
        return undefined;
    const { start, end, rows, rowEnds } = found;
    const decoder = new TextDecoder();
    const rest = decoder.decode(bytes.subarray(bodyStart, start)) + '[]' + decoder.decode(bytes.subarray(end));
    let root;
    try {
        root = JSON.parse(rest);
    }
    catch {
        return undefined;
    }
    const metrics = root.metrics;
    if (metrics === undefined || !Array.isArray(metrics.values) || metrics.values.length !== 0)
        return undefined;
    metrics.values = rows;
    return { root, rowEnds, valuesStart: start, valuesEnd: end };
}
/** A cursor over the bytes, with just the steps the scan needs. Every step throws NotPlain on surprise. */
class ByteReader {
    bytes;
    at = 0;
    constructor(bytes) {
        this.bytes = bytes;
    }
    peek() {
        this.skipSpace();
        return this.bytes[this.at] ?? -1;
    }
    skipSpace() {
        const b = this.bytes;
        let i = this.at;
        while (i < b.length && isSpace(b[i]))
            i++;
        this.at = i;
    }
    expect(c) {
        if (this.peek() !== c)
            throw new NotPlain();
        this.at++;
    }
    /** Walks an object's members, calling `onMember(key)` with the cursor on each value (which it must consume). */
    members(onMember) {
        this.expect(OPEN_CURLY);
        if (this.peek() === CLOSE_CURLY) {
            this.at++;
            return;
        }
        for (;;) {
            onMember(this.key());
            const c = this.peek();
            this.at++;
            if (c === CLOSE_CURLY)
                return;
            if (c !== COMMA)
                throw new NotPlain();
        }
    }
    /** A member's key and its colon. Keys with escapes are refused: they could spell "values" another way. */
    key() {
        this.expect(QUOTE);
        const b = this.bytes;
        const start = this.at;
        let i = start;
        while (i < b.length && b[i] !== QUOTE) {
            if (b[i] === BACKSLASH)
                throw new NotPlain();
            i++;
        }
        if (i >= b.length)
            throw new NotPlain();
        this.at = i + 1;
        this.expect(COLON);
        this.skipSpace();
        return new TextDecoder().decode(b.subarray(start, i));
    }
    /** Moves past any value; its content is checked later by JSON.parse of the rest. */
    skipValue() {
        const b = this.bytes;
        this.skipSpace();
        let depth = 0;
        let i = this.at;
        for (;;) {
            if (i >= b.length)
                throw new NotPlain();
            const c = b[i];
            if (c === QUOTE) {
                // A string ends at the first quote no backslash escapes (\uXXXX holds neither).
                i = stringEnd(b, i + 1);
                if (depth === 0)
                    break;
            }
            else if (c === OPEN_SQUARE || c === OPEN_CURLY) {
                depth++;
                i++;
            }
            else if (c === CLOSE_SQUARE || c === CLOSE_CURLY) {
                if (depth === 0)
                    break;
                depth--;
                i++;
                if (depth === 0)
                    break;
            }
            else if (depth === 0 && (c === COMMA || isSpace(c)))
                break;
            else
                i++;
        }
        this.at = i;
    }
    /** The values array: rows of numbers or null, each row read into an array of doubles. */
    rows() {
        const rows = [];
        const rowEnds = [];
        this.expect(OPEN_SQUARE);
        if (this.peek() === CLOSE_SQUARE) {
            this.at++;
            return { rows, rowEnds };
        }
        // Rows are as long as the runs table, so the first row's length sizes the others' arrays.
        let sizeHint = 0;
        for (;;) {
            this.expect(OPEN_SQUARE);
            // A copy of the previous row is an array of doubles of the right size: filling it stores
            // in place, where a new Array(n) would first hold tagged holes and be converted on the first double.
            let row = rows.length > 0 ? rows[rows.length - 1].slice() : [];
            let end = plainRow(this.bytes, this.at, row);
            if (end < 0) {
                row = readRow(this.bytes, this.at, sizeHint);
                end = rowEnd;
            }
            sizeHint = row.length;
            this.at = end + 1;
            rows.push(row);
            rowEnds.push(end);
            const c = this.peek();
            this.at++;
            if (c === CLOSE_SQUARE)
                return { rows, rowEnds };
            if (c !== COMMA)
                throw new NotPlain();
        }
    }
}
/**
 * The offset just past the closing quote of a string whose content starts at `from`. A quote
 * closes it unless an odd run of backslashes precedes it (\\uXXXX holds neither); indexOf keeps
 * the long id and name lists of the header from costing a step per byte.
 */
function stringEnd(b, from) {
    for (let i = b.indexOf(QUOTE, from); i >= 0; i = b.indexOf(QUOTE, i + 1)) {
        let slashes = 0;
        while (b[i - 1 - slashes] === BACKSLASH)
            slashes++;
        if (slashes % 2 === 0)
            return i + 1;
    }
    throw new NotPlain();
}
/**
 * The common row, as Bellgate writes it: no spaces, numbers of at most 15 significant digits
 * without an exponent, and null. Reads it from just after its `[` into `row` (pre-sized; cut to
 * the count read) and returns the offset of its `]`, or -1 at the first byte outside that form —
 * the caller then reads the row again with readRow, which knows all of JSON's row syntax. Kept
 * apart and small because V8 compiles it in a few milliseconds: one cold run of the whole reader
 * at 1,000 x 1,000 went from ~100 to ~55 ms CPU. Values as readRow's fast path (Clinger 1990):
 * digits / 10^scale, both exact, one correctly rounded division.
 */
function plainRow(b, start, row) {
    let i = start;
    let k = 0;
    let c = b[i];
    if (c === CLOSE_SQUARE) {
        row.length = 0;
        return i;
    }
    for (;;) {
        if (c === 0x6e) {
            if (b[i + 1] !== 0x75 || b[i + 2] !== 0x6c || b[i + 3] !== 0x6c)
                return -1;
            row[k++] = NaN;
            i += 4;
        }
        else {
            let negative = false;
            if (c === MINUS) {
                negative = true;
                c = b[++i];
            }
            let mantissa = 0;
            let digits = 0;
            let scale = 0;
            // Past the end of the bytes c is undefined, which every comparison below refuses.
            if (c === ZERO)
                c = b[++i];
            else if (c !== undefined && c > ZERO && c <= NINE) {
                do {
                    mantissa = mantissa * 10 + (c - ZERO);
                    digits++;
                    c = b[++i];
                } while (c !== undefined && c >= ZERO && c <= NINE);
            }
            else
                return -1;
            if (c === DOT) {
                c = b[++i];
                if (c === undefined || c < ZERO || c > NINE)
                    return -1;
                do {
                    mantissa = mantissa * 10 + (c - ZERO);
                    digits++;
                    scale++;
                    c = b[++i];
                } while (c !== undefined && c >= ZERO && c <= NINE);
            }
            if (digits > 15 || c === LOWER_E || c === UPPER_E)
                return -1;
            const magnitude = scale === 0 ? mantissa : mantissa / EXACT_POWERS[scale];
            row[k++] = negative ? -magnitude : magnitude;
        }
        c = b[i];
        if (c === COMMA) {
            c = b[++i];
            continue;
        }
        if (c !== CLOSE_SQUARE)
            return -1;
        if (k !== row.length)
            row.length = k;
        return i;
    }
}
/** Where readRow found its row's `]` (a module variable, so the hot loop returns no object). */
let rowEnd = 0;
/**
 * One row from just after its `[`: numbers and nulls (as NaN) into an array of doubles, stored by
 * index into an array sized by `sizeHint` (stores into a pre-sized array beat push). Sets rowEnd.
 */
function readRow(b, start, sizeHint) {
    const row = new Array(sizeHint);
    let k = 0;
    let i = start;
    const end = b.length;
    let c = i < end ? b[i] : -1;
    while (c === SPACE || c === LF || c === CR || c === TAB)
        c = ++i < end ? b[i] : -1;
    if (c === CLOSE_SQUARE) {
        rowEnd = i;
        row.length = 0;
        return row;
    }
    for (;;) {
        if (c === 0x6e) {
            // null
            if (b[i + 1] !== 0x75 || b[i + 2] !== 0x6c || b[i + 3] !== 0x6c)
                throw new NotPlain();
            row[k++] = NaN;
            i += 4;
        }
        else {
            // A JSON number. Up to 15 significant digits and no exponent, the value is digits / 10^scale:
            // both are exact doubles, so the one division rounds correctly (Clinger 1990, "How to read
            // floating point numbers accurately", the fast path). Anything else goes to Number(), which
            // rounds correctly too.
            const first = i;
            const negative = c === MINUS;
            if (negative)
                c = ++i < end ? b[i] : -1;
            let digits = 0;
            let mantissa = 0;
            let scale = 0;
            if (c === ZERO)
                c = ++i < end ? b[i] : -1;
            else if (c > ZERO && c <= NINE) {
                do {
                    mantissa = mantissa * 10 + (c - ZERO);
                    digits++;
                    c = ++i < end ? b[i] : -1;
                } while (c >= ZERO && c <= NINE);
            }
            else
                throw new NotPlain();
            if (c === DOT) {
                c = ++i < end ? b[i] : -1;
                if (!(c >= ZERO && c <= NINE))
                    throw new NotPlain();
                do {
                    mantissa = mantissa * 10 + (c - ZERO);
                    digits++;
                    scale++;
                    c = ++i < end ? b[i] : -1;
                } while (c >= ZERO && c <= NINE);
            }
            let exact = digits <= 15 && scale <= 22;
            if (c === LOWER_E || c === UPPER_E) {
                exact = false;
                c = ++i < end ? b[i] : -1;
                if (c === PLUS || c === MINUS)
                    c = ++i < end ? b[i] : -1;
                if (!(c >= ZERO && c <= NINE))
                    throw new NotPlain();
                do
                    c = ++i < end ? b[i] : -1;
                while (c >= ZERO && c <= NINE);
            }
            if (exact) {
                const magnitude = scale === 0 ? mantissa : mantissa / EXACT_POWERS[scale];
                row[k++] = negative ? -magnitude : magnitude;
            }
            else {
                row[k++] = Number(ASCII.decode(b.subarray(first, i)));
            }
        }
        c = i < end ? b[i] : -1;
        while (c === SPACE || c === LF || c === CR || c === TAB)
            c = ++i < end ? b[i] : -1;
        if (c === CLOSE_SQUARE)
            break;
        if (c !== COMMA)
            throw new NotPlain();
        c = ++i < end ? b[i] : -1;
        while (c === SPACE || c === LF || c === CR || c === TAB)
            c = ++i < end ? b[i] : -1;
    }
    rowEnd = i;
    if (k !== row.length)
        row.length = k;
    return row;
}

;// CONCATENATED MODULE: ./src/history/document.ts






/**
 * The history document, one per series. Version 2 is written; version 1 is still read.
 *
 * Version 2 ("bellgate.history/2") is columnar: run descriptions are columns of a runs table,
 * metric names and units are stored once, and each metric's values are one array aligned with
 * the runs (oldest first). A run without the metric holds null. Numbers are plain JSON numbers,
 * so they read back exactly. One metric per line keeps diffs of a data branch readable:
 *
 *     {"schema":"bellgate.history/2","series":"linux-x64",
 *     "runs":{"id":["81-1","82-1"],"sha":["4f1c…","9a0b…"],"ref":["refs/heads/main",…],
 *             "event":["push","push"],"time":["2026-03-01T10:00:00.000Z",…]},
 *     "metrics":{"names":["bundle/app.js.gz","build/compile"],"units":["B",null],"values":[
 *     [40211,40213],
 *     [12.5,null]]}}
 *
 * sha, ref, event and time columns may be absent (all missing); units may be absent (none).
 * Reading needs one JSON.parse and one pass over the values — see decodeV2.
 */
const HISTORY_SCHEMA = 'bellgate.history/2';
const HISTORY_SCHEMA_V1 = 'bellgate.history/1';
const CURRENT_VERSION = 2;
/**
 * Decodes an already parsed document of any known version, reporting problems to `report`.
 * Shared by parseHistory (stops at the first problem) and verifyHistory (lists them all).
 */
function decodeHistoryDocument(root, report) {
    if (!isObject(root)) {
        report('', `a history document must be a JSON object, found ${typeName(root)}`);
        return undefined;
    }
    const schema = root.schema;
    const version = typeof schema === 'string' ? /^bellgate\.history\/(\d{1,9})$/.exec(schema)?.[1] : undefined;
    if (version === undefined) {
        report('schema', `not a Bellgate history document: "schema" is ${typeName(schema) === 'a string' ? JSON.stringify(schema) : typeName(schema)}, expected "${HISTORY_SCHEMA}"`, 'point the history option at a file that Bellgate wrote');
        return undefined;
    }
    const n = Number(version);
    if (n > CURRENT_VERSION) {
        report('schema', `the history was written by a newer Bellgate (document version ${n}; this one reads up to ${CURRENT_VERSION})`, 'upgrade Bellgate to the version that wrote this history');
        return undefined;
    }
    if (n === 1)
        return decodeV1(root, report);
    if (n === 2)
        return decodeV2(root, report);
    report('schema', `unknown history document version ${n}`, 'point the history option at a file that Bellgate wrote');
    return undefined;
}
/**
 * Reads a history document of any version (1 or 2) into a History.
 * Cost: one JSON.parse plus one pass over the values (no object per value).
 * Throws InputError naming the source and the place: "source:line:col" for malformed JSON,
 * "source at metrics.values[3][17]" for a bad entry; a newer version asks to upgrade Bellgate.
 *
 * @example parseHistory('{"schema":"bellgate.history/2","series":"s","runs":{"id":[]},"metrics":{"names":[],"values":[]}}', 'h.json')
 * // { series: 's', runs: [], columns: Map {} }
 */
function parseHistory(text, source) {
    const history = decodeHistoryDocument(parseJsonText(text, source), throwingSink(source));
    // The throwing sink stops at the first problem, so undefined cannot come back; keep TS honest.
    if (!history)
        throw new input_error/* InputError */.d('unreadable history document', { where: source });
    return history;
}
/**
 * parseHistory for the file's bytes, taking the fast road when it can: scanHistoryBytes reads the
 * values rows straight into doubles (no JSON.parse object per number) and JSON.parse reads only
 * the small rest. Any document the scan declines (another version, odd but valid JSON, or broken
 * JSON) is decoded from its UTF-8 text by parseHistory, so the result and every error are the same.
 * `rows` says where each values row lies in `bytes` (present only after a scan), which lets a
 * store write an append by splicing the old rows (splice-append.ts).
 * Throws InputError exactly as parseHistory.
 *
 * @example parseHistoryBytes(readFileSync('h.json'), 'h.json').history.runs.length // 120
 */
function parseHistoryBytes(bytes, source) {
    const scanned = scanHistoryBytes(bytes);
    if (scanned === undefined)
        return { history: parseHistory(Buffer.from(bytes.buffer, bytes.byteOffset, bytes.byteLength).toString('utf8'), source) };
    const history = decodeHistoryDocument(scanned.root, throwingSink(source));
    if (!history)
        throw new input_error/* InputError */.d('unreadable history document', { where: source });
    return { history, rows: { valuesStart: scanned.valuesStart, rowEnds: scanned.rowEnds } };
}
/**
 * Writes a History as a version-2 document (layout above). NaN is written as null (missing).
 * Throws InputError when the History is inconsistent (a column not aligned with the runs, an
 * infinite value, a duplicated run id), so a broken History is never stored.
 *
 * @example serializeHistory(emptyHistory('s'))
 * // '{"schema":"bellgate.history/2","series":"s",\n"runs":{"id":[],...},\n"metrics":{...,"values":[\n]}}\n'
 */
function serializeHistory(h) {
    checkRuns(h);
    for (const [name, column] of h.columns)
        checkStorable(h, name, column.values);
    // JSON.stringify writes NaN as null, which is exactly the "missing" marker.
    const lines = [...h.columns.values()].map((c) => JSON.stringify(c.values));
    return `${historyHead(h)}${lines.join(',\n')}${HISTORY_TAIL}`;
}
/**
 * Everything of the version-2 layout before the first values row: schema, series, the runs table,
 * names and units, up to `"values":[` and its newline. The rows follow, joined by ",\n", then
 * HISTORY_TAIL. Shared by serializeHistory and the text splice of an append (splice-append.ts).
 *
 * @example historyHead(emptyHistory('s')).endsWith('"values":[\n') // true
 */
function historyHead(h) {
    const runs = { id: h.runs.map((r) => r.id) };
    for (const field of RUN_FIELDS)
        runs[field] = h.runs.map((r) => r[field] ?? null);
    const names = [...h.columns.keys()];
    const units = [...h.columns.values()].map((c) => c.unit ?? null);
    return (`{"schema":${JSON.stringify(HISTORY_SCHEMA)},"series":${JSON.stringify(h.series)},\n` +
        `"runs":${JSON.stringify(runs)},\n` +
        `"metrics":{"names":${JSON.stringify(names)},"units":${JSON.stringify(units)},"values":[\n`);
}
/** What closes a version-2 document after its last values row. */
const HISTORY_TAIL = ']}}\n';
const NOT_STORABLE_FIX = 'this is a bug in the code that built the history; please report it';
const storeWhere = (h) => `history of series ${JSON.stringify(h.series)}`;
/**
 * The runs half of the check before storing: every run has an id and no id appears twice.
 * Throws InputError, so a broken History is never stored.
 */
function checkRuns(h) {
    const where = storeWhere(h);
    const ids = new Set();
    for (const run of h.runs) {
        if (typeof run.id !== 'string' || run.id === '')
            throw new input_error/* InputError */.d('a run without an id cannot be stored', { where, fix: NOT_STORABLE_FIX });
        if (ids.has(run.id))
            throw new input_error/* InputError */.d(`run id ${JSON.stringify(run.id)} appears twice`, { where, fix: NOT_STORABLE_FIX });
        ids.add(run.id);
    }
}
/**
 * The column half: one value per run, each a finite number or NaN (missing). `from` skips values
 * already known to be storable (an append checks only what it adds). Throws InputError.
 */
function checkStorable(h, name, values, from = 0) {
    if (values.length !== h.runs.length) {
        throw new input_error/* InputError */.d(`metric ${JSON.stringify(name)} has ${values.length} values for ${h.runs.length} runs`, { where: storeWhere(h), fix: NOT_STORABLE_FIX });
    }
    for (let i = from; i < values.length; i++) {
        const v = values[i];
        if (v === Infinity || v === -Infinity || typeof v !== 'number') {
            throw new input_error/* InputError */.d(`metric ${JSON.stringify(name)} holds ${String(v)}, which cannot be stored`, { where: storeWhere(h), fix: NOT_STORABLE_FIX });
        }
    }
}


/***/ }),

/***/ 43328:
/***/ ((__unused_webpack_module, __webpack_exports__, __webpack_require__) => {

/* harmony export */ __webpack_require__.d(__webpack_exports__, {
/* harmony export */   s: () => (/* binding */ emptyHistory)
/* harmony export */ });
/**
 * The in-memory history of one series: run descriptions oldest first, and one value column per
 * metric aligned with them (NaN where a run lacks the metric). Columnar because the gate reads a
 * metric's whole past at once, and because the stored document is columnar too (names once).
 * This module is pure; reading and writing documents lives beside it (document.ts, stores).
 * A History is never changed in place: appendRun, trimHistory and merges return new ones, and may
 * share unchanged value arrays with their input; the file store relies on that when it splices an
 * append into the text it read (splice-append.ts compares values with the arrays it decoded).
 */
function emptyHistory(series) {
    return { series, runs: [], columns: new Map() };
}


/***/ }),

/***/ 2278:
/***/ ((__unused_webpack_module, __webpack_exports__, __webpack_require__) => {


// EXPORTS
__webpack_require__.d(__webpack_exports__, {
  ah: () => (/* binding */ appendRun),
  WR: () => (/* binding */ concurrentRuns),
  UY: () => (/* binding */ healConcurrent),
  dk: () => (/* binding */ mergeHistories),
  lj: () => (/* binding */ trimHistory)
});

// EXTERNAL MODULE: ./src/model/input-error.ts + 1 modules
var input_error = __webpack_require__(71184);
;// CONCATENATED MODULE: ./src/history/iso-time.ts
/**
 * Reads an ISO-8601 date or date-time ("2026-03-01", "2026-03-01T10:00:00.5+02:00",
 * "2026-03-01 10:00Z") as milliseconds since 1970 UTC. A time without an offset is taken as UTC,
 * so the answer never depends on the machine's time zone. Returns undefined for anything else,
 * including impossible dates such as 2026-02-30 (Date.parse would roll those over silently).
 *
 * @example parseIsoTime('2026-03-01T10:00:00+01:00') // 1772355600000 (09:00 UTC)
 */
function parseIsoTime(text) {
    // The canonical form Bellgate stores ("2026-03-01T10:00:00.000Z", toISOString): Date.parse reads
    // it exactly, and the round trip proves the text was that form (an impossible date such as
    // 2026-02-30 does not come back the same, and goes on to the checks below). A history holds one
    // per run, so this is the common case.
    if (text.length === 24 && text.charCodeAt(23) === 0x5a) {
        const ms = Date.parse(text);
        if (!Number.isNaN(ms) && new Date(ms).toISOString() === text)
            return ms;
    }
    const m = /^(\d{4})-(\d{2})-(\d{2})(?:[T ](\d{2}):(\d{2})(?::(\d{2})(\.\d{1,9})?)?)?\s*(Z|[+-]\d{2}(?::?\d{2})?)?$/i.exec(text.trim());
    if (!m)
        return undefined;
    const [, y, mo, d, h = '00', mi = '00', s = '00', frac = '', zone = 'Z'] = m;
    const day = Date.UTC(Number(y), Number(mo) - 1, Number(d));
    const check = new Date(day);
    if (check.getUTCFullYear() !== Number(y) || check.getUTCMonth() !== Number(mo) - 1 || check.getUTCDate() !== Number(d))
        return undefined;
    if (Number(h) > 23 || Number(mi) > 59 || Number(s) > 59)
        return undefined;
    let offset = 0;
    if (zone.toUpperCase() !== 'Z') {
        const z = /^([+-])(\d{2}):?(\d{2})?$/.exec(zone);
        if (!z || Number(z[2]) > 23 || Number(z[3] ?? 0) > 59)
            return undefined;
        offset = (z[1] === '-' ? -1 : 1) * (Number(z[2]) * 60 + Number(z[3] ?? 0)) * 60_000;
    }
    const ms = Math.floor(Number(`0${frac}`) * 1000);
    return day + ((Number(h) * 60 + Number(mi)) * 60 + Number(s)) * 1000 + ms - offset;
}
/**
 * The canonical form Bellgate stores: ISO-8601 in UTC with milliseconds, or undefined.
 *
 * @example normalizeIsoTime('2026-03-01 10:00') // '2026-03-01T10:00:00.000Z'
 */
function normalizeIsoTime(text) {
    const ms = parseIsoTime(text);
    return ms === undefined || !Number.isFinite(ms) || Math.abs(ms) > 8.64e15 ? undefined : new Date(ms).toISOString();
}

;// CONCATENATED MODULE: ./src/history/run-order.ts

// Numeric collation puts run "999-1" before "1000-1", as CI run ids grow. Made on first use: a
// collator loads locale data (~10 ms), and ids are compared only between runs of the same time.
let ids;
/**
 * The order of runs in a history: by time, then by id. A run without a readable time sorts
 * before every timed run (it is treated as the oldest), so the order is total and the same in
 * merge, append and import.
 *
 * @example [b, a].sort(compareRuns) // oldest first
 */
function compareRuns(a, b) {
    const ta = timeKey(a);
    const tb = timeKey(b);
    if (ta !== tb)
        return ta < tb ? -1 : 1;
    ids ??= new Intl.Collator('en', { numeric: true });
    return ids.compare(a.id, b.id);
}
/** Milliseconds of a run's time, -Infinity when it has none or it cannot be read. */
function timeKey(run) {
    return run.time === undefined ? -Infinity : parseIsoTime(run.time) ?? -Infinity;
}

;// CONCATENATED MODULE: ./src/history/append-newest.ts

/**
 * appendRun's fast path for the usual record: a run with a new id that sorts after every run
 * (compareRuns: time, then id) of a history already in run order goes at the end. Each column is
 * copied once (a native concat of the new value), instead of mergeHistories' sort and per-value map.
 * Returns undefined when that does not hold — an id already present, a run that sorts before the
 * newest, a history not in run order, duplicate ids, a column not aligned with the runs — and
 * appendRun then merges. The result equals mergeHistories(h, the one-run history): a stable sort
 * of an ordered list is the list itself, so the merge would put the run last too.
 *
 * @example appendNewest(h, { id: '83-1', time: '2026-03-02T10:00:00Z' }, columns)?.runs.at(-1)?.id // '83-1'
 */
function appendNewest(h, info, added) {
    const n = h.runs.length;
    const ids = new Set();
    // compareRuns, with each run's time read once (reading a time is the costly part).
    let previous;
    let previousKey = -Infinity;
    const inOrder = (run) => {
        const key = timeKey(run);
        const ordered = previous === undefined || previousKey < key || (previousKey === key && compareRuns(previous, run) <= 0);
        previous = run;
        previousKey = key;
        return ordered;
    };
    for (const run of h.runs) {
        if (!inOrder(run))
            return undefined;
        ids.add(run.id);
    }
    if (ids.size !== n || ids.has(info.id))
        return undefined;
    if (!inOrder(info))
        return undefined;
    for (const column of h.columns.values())
        if (column.values.length !== n)
            return undefined;
    const columns = new Map();
    for (const [name, column] of h.columns) {
        const fromRun = added.get(name);
        // One allocation of n + 1 (a slice and a push would allocate n, then grow to about 1.5 n).
        const values = column.values.concat(fromRun?.values[0] ?? NaN);
        const unit = fromRun?.unit ?? column.unit;
        columns.set(name, unit === undefined ? { values } : { unit, values });
    }
    for (const [name, column] of added) {
        if (columns.has(name))
            continue;
        const values = new Array(n + 1).fill(NaN);
        values[n] = column.values[0] ?? NaN;
        columns.set(name, column.unit === undefined ? { values } : { unit: column.unit, values });
    }
    const next = { series: h.series, runs: [...h.runs.map((r) => ({ ...r })), { ...info }], columns };
    if ((h.trimmed ?? 0) > 0)
        next.trimmed = h.trimmed;
    return next;
}

;// CONCATENATED MODULE: ./src/history/merge.ts



/**
 * The union of two histories of the same series, by run id: a run id held by both sides takes
 * b's copy whole (b is the later copy: a store merges older documents first). The result is
 * ordered by time, then id (see compareRuns); a metric one side never had is NaN for that side's
 * runs. Units: b's where it has one. Pure; O(runs x metrics). This is what heals a store that saw
 * two concurrent writers: each kept its own run, the next merge keeps both, no run twice.
 * Throws InputError when the series differ.
 *
 * @example mergeHistories(h1, h2).runs.map((r) => r.id) // union of both, oldest first
 */
function mergeHistories(a, b) {
    if (a.series !== b.series) {
        throw new input_error/* InputError */.d(`cannot merge the history of series ${JSON.stringify(b.series)} into ${JSON.stringify(a.series)}`, {
            where: `series ${a.series}`,
            fix: 'keep one history per series (the `series` option)',
        });
    }
    const chosen = new Map();
    for (const side of [a, b])
        side.runs.forEach((run, index) => chosen.set(run.id, { side, index }));
    const picks = [...chosen.values()].sort((x, y) => compareRuns(x.side.runs[x.index], y.side.runs[y.index]));
    const columns = new Map();
    for (const name of new Set([...a.columns.keys(), ...b.columns.keys()])) {
        const fromA = a.columns.get(name);
        const fromB = b.columns.get(name);
        const values = picks.map(({ side, index }) => (side === a ? fromA : fromB)?.values[index] ?? NaN);
        const unit = fromB?.unit ?? fromA?.unit;
        columns.set(name, unit === undefined ? { values } : { unit, values });
    }
    const merged = { series: a.series, runs: picks.map(({ side, index }) => ({ ...side.runs[index] })), columns };
    const trimmed = (a.trimmed ?? 0) + (b.trimmed ?? 0);
    if (trimmed > 0)
        merged.trimmed = trimmed;
    return merged;
}
/**
 * Adds one run (or replaces the run with the same id) at its place in time order. Metrics new
 * to the history get a column that is NaN for older runs; metrics the run lacks are NaN for it.
 * Units the run carries are recorded. Pure: returns a new History. The usual case (a new run,
 * newest of all) takes appendNewest's fast path; anything else merges; the result is the same.
 * Throws InputError on an empty id or a non-finite value (never stored as a silent gap).
 *
 * @example appendRun(h, { id: '83-1', time: '2026-03-02T10:00:00Z' }, run).runs.at(-1)?.id // '83-1'
 */
function appendRun(h, info, run) {
    if (typeof info.id !== 'string' || info.id.trim() === '') {
        throw new input_error/* InputError */.d('a run needs an id to be recorded', { where: `series ${h.series}`, fix: 'pass --id (the CI run id and attempt, e.g. 1234-1)' });
    }
    const columns = new Map();
    for (const [name, m] of run.metrics) {
        if (!Number.isFinite(m.value)) {
            throw new input_error/* InputError */.d(`metric value ${m.value} is not a finite number and cannot be recorded`, {
                where: name,
                fix: 'check the metric file that produced it',
            });
        }
        columns.set(name, m.unit === undefined ? { values: [m.value] } : { unit: m.unit, values: [m.value] });
    }
    return appendNewest(h, info, columns) ?? mergeHistories(h, { series: h.series, runs: [{ ...info }], columns });
}
/**
 * Keeps the `keep` newest runs (the end of the list) — the only way runs are deleted. Columns that
 * hold no value any more are dropped. Records the number deleted in `trimmed`, which a store's
 * save uses to tell an intended shrink from a lost history. Pure.
 * When no run is dropped the value arrays are shared with `h`, not copied (a History is never
 * changed in place; a copy of every column would only cost time and memory at record).
 * Throws InputError unless keep is a whole number of at least 1 (or Infinity: keep all).
 *
 * @example trimHistory(h, 60).runs.length // min(60, h.runs.length)
 */
function trimHistory(h, keep) {
    if (!(keep === Infinity || (Number.isInteger(keep) && keep >= 1))) {
        throw new input_error/* InputError */.d(`keep must be a whole number of runs, at least 1, got ${keep}`, { fix: 'set `keep` to the number of newest runs to keep, e.g. 500' });
    }
    const drop = Math.max(0, h.runs.length - keep);
    const columns = new Map();
    for (const [name, column] of h.columns) {
        const values = drop === 0 ? column.values : column.values.slice(drop);
        if (!values.some((v) => !Number.isNaN(v)))
            continue;
        columns.set(name, column.unit === undefined ? { values } : { unit: column.unit, values });
    }
    const trimmed = { series: h.series, runs: h.runs.slice(drop).map((r) => ({ ...r })), columns };
    const total = (h.trimmed ?? 0) + drop;
    if (total > 0)
        trimmed.trimmed = total;
    return trimmed;
}
/**
 * What a store writes when the stored document changed after it was loaded: `h`, plus the runs of
 * `stored` that another writer added meanwhile — ids `h` lacks that are not older than h's oldest
 * run (older ones are what h trimmed on purpose, and stay deleted). `h` wins every shared id.
 * A run without a time counts as the oldest. Pure.
 *
 * @example healConcurrent(mine, onDisk).runs // my runs and the other writer's new ones
 */
function healConcurrent(h, stored) {
    const keep = concurrentRuns(h, stored.runs);
    if (keep.length === 0)
        return h;
    const columns = new Map();
    for (const [name, column] of stored.columns) {
        const values = keep.map((i) => column.values[i] ?? NaN);
        columns.set(name, column.unit === undefined ? { values } : { unit: column.unit, values });
    }
    const added = { series: h.series, runs: keep.map((i) => ({ ...stored.runs[i] })), columns };
    const healed = mergeHistories(added, h);
    if (h.trimmed !== undefined)
        healed.trimmed = h.trimmed;
    return healed;
}
/**
 * The indexes of the runs in `storedRuns` that healConcurrent would add to `h`: ids `h` lacks, not
 * older than h's oldest run. Empty means healing changes nothing, which a store can decide from
 * the run list alone (no columns needed). Pure.
 *
 * @example concurrentRuns(mine, onDisk.runs) // [] when nobody else wrote
 */
function concurrentRuns(h, storedRuns) {
    const mine = new Set(h.runs.map((r) => r.id));
    // Reading every time is the costly part, and needed only when some stored id is not in h.
    let oldest;
    const keep = [];
    storedRuns.forEach((r, i) => {
        if (mine.has(r.id))
            return;
        oldest ??= h.runs.reduce((min, run) => Math.min(min, timeKey(run)), Infinity);
        if (timeKey(r) >= oldest)
            keep.push(i);
    });
    return keep;
}


/***/ }),

/***/ 84689:
/***/ ((__unused_webpack_module, __webpack_exports__, __webpack_require__) => {

/* harmony export */ __webpack_require__.d(__webpack_exports__, {
/* harmony export */   A: () => (/* binding */ StoreError),
/* harmony export */   y: () => (/* binding */ guardAgainstLoss)
/* harmony export */ });
/**
 * A store could not be reached, read or written. The CLI maps it to exit 3 and the action fails
 * the step; the stored history is left as it was. `message` is the reason; `where` describes the
 * store (also as `store`); `fix` says what to do.
 *
 * @example new StoreError('the file is not a history document', { where: 'file h.json', fix: 'restore it' })
 */
class StoreError extends Error {
    name = 'StoreError';
    /** The store's description (HistoryStore.describe()). */
    where;
    /** What to do about it, in one sentence. */
    fix;
    constructor(reason, options = {}) {
        super(reason, options.cause === undefined ? undefined : { cause: options.cause });
        this.where = options.where;
        this.fix = options.fix;
    }
    /** The store's description, for callers that prefer the name. */
    get store() {
        return this.where;
    }
    /** Why it failed (the message). */
    get reason() {
        return this.message;
    }
    /** "store: reason\n  fix: ..." — the line a user sees. */
    describe() {
        const head = this.where ? `${this.where}: ${this.message}` : this.message;
        return this.fix ? `${head}\n  fix: ${this.fix}` : head;
    }
}
/**
 * The shrink rule every store's save applies: writing `h` is refused when it holds fewer runs
 * than were read, unless runs deleted on purpose by trimHistory (`h.trimmed`) make up the gap.
 * Throws StoreError naming the store; also rejects a readCount that is not a count.
 *
 * @example guardAgainstLoss('file h.json', history, 120) // throws when history has 100 runs, 0 trimmed
 */
function guardAgainstLoss(store, h, readCount) {
    if (!Number.isInteger(readCount) || readCount < 0) {
        throw new StoreError(`readCount must be the number of runs load returned, got ${readCount}`, { where: store });
    }
    const accounted = h.runs.length + (h.trimmed ?? 0);
    if (accounted < readCount) {
        throw new StoreError(`refusing to save ${h.runs.length} runs over the ${readCount} that were read: ${readCount - accounted} runs would be lost`, { where: store, fix: 'append to the history that load returned; delete runs only with trimHistory (the `keep` setting)' });
    }
}


/***/ }),

/***/ 56497:
/***/ ((__unused_webpack_module, __webpack_exports__, __webpack_require__) => {

/* harmony export */ __webpack_require__.d(__webpack_exports__, {
/* harmony export */   Ak: () => (/* binding */ checkLineLengths),
/* harmony export */   dR: () => (/* binding */ DEFAULT_LIMITS),
/* harmony export */   yT: () => (/* binding */ limitError)
/* harmony export */ });
/* unused harmony export LIMIT_KEYS */
/* harmony import */ var _model_input_error_js__WEBPACK_IMPORTED_MODULE_0__ = __webpack_require__(71184);

/** Limits used when the config gives none: 64 MiB per file, 1 MiB per line, 100000 metrics. */
const DEFAULT_LIMITS = Object.freeze({
    maxFileBytes: 64 * 1024 * 1024,
    maxLineLength: 1024 * 1024,
    maxMetrics: 100_000,
});
/** The config key that raises each limit, for refusal messages. */
const LIMIT_KEYS = Object.freeze({
    maxFileBytes: 'limits.max-file-bytes',
    maxLineLength: 'limits.max-line-length',
    maxMetrics: 'limits.max-metrics',
});
/**
 * The refusal for a limit that was passed: names the limit, its value and the key that raises it.
 * @example limitError('maxMetrics', 100000, 'run.json', 'more than 100000 metrics')
 */
function limitError(limit, value, where, what) {
    return new _model_input_error_js__WEBPACK_IMPORTED_MODULE_0__/* .InputError */ .d(`${what} (limit ${LIMIT_KEYS[limit]} = ${value})`, {
        where,
        fix: `raise ${LIMIT_KEYS[limit]} in the config file if this input is expected`,
    });
}
/**
 * Refuses text with a line longer than `limits.maxLineLength` characters. O(n), no copies.
 * Applied by the line-oriented readers (JSON Lines, CSV, OpenMetrics, Go benchmark format), whose
 * work is per line; whole-document formats (own JSON, JUnit XML) are often written on one line and
 * are bounded by `limits.max-file-bytes` instead.
 * @throws InputError naming the line and `limits.max-line-length`.
 */
function checkLineLengths(text, file, limits) {
    const max = limits.maxLineLength;
    if (text.length <= max)
        return;
    let start = 0;
    let line = 1;
    while (start <= text.length) {
        let end = text.indexOf('\n', start);
        if (end < 0)
            end = text.length;
        if (end - start > max) {
            throw limitError('maxLineLength', max, `${file}:${line}`, `line ${line} is ${end - start} characters long`);
        }
        start = end + 1;
        line++;
    }
}


/***/ }),

/***/ 85585:
/***/ ((__unused_webpack_module, __webpack_exports__, __webpack_require__) => {

/* harmony export */ __webpack_require__.d(__webpack_exports__, {
/* harmony export */   WO: () => (/* binding */ checkMetricName),
/* harmony export */   lg: () => (/* binding */ checkUnit)
/* harmony export */ });
/* unused harmony exports MAX_NAME_LENGTH, MAX_UNIT_LENGTH */
/* harmony import */ var _model_input_error_js__WEBPACK_IMPORTED_MODULE_0__ = __webpack_require__(71184);

/** Longest metric name accepted, in characters (code points). */
const MAX_NAME_LENGTH = 512;
// C0 controls, DEL and C1 controls: they break terminals, log lines and markdown tables.
const CONTROL = /[\u0000-\u001f\u007f-\u009f]/u;
// Bidirectional embeddings/overrides and isolates: they make a name read differently from what it is
// ("Trojan Source", CVE-2021-42574), so a report could show a reviewer the wrong metric.
const BIDI = /[\u202a-\u202e\u2066-\u2069]/u;
/**
 * Checks one metric name and returns it unchanged. The rule, the same for every format:
 * - not empty (and not only whitespace);
 * - at most 512 characters (code points);
 * - no control characters (U+0000-001F, U+007F-009F);
 * - no bidirectional override or isolate characters (U+202A-202E, U+2066-2069).
 * Any other text is a valid name, `__proto__` and `constructor` included: names only ever key Maps.
 * @throws InputError naming the place and the offending character.
 * @example checkMetricName('route/match-static', 'bench.json:3') // 'route/match-static'
 */
function checkMetricName(name, where) {
    if (name.trim() === '') {
        throw new _model_input_error_js__WEBPACK_IMPORTED_MODULE_0__/* .InputError */ .d('metric name is empty', { where, fix: 'give every metric a non-empty name' });
    }
    const length = countCodePoints(name);
    if (length > MAX_NAME_LENGTH) {
        throw new _model_input_error_js__WEBPACK_IMPORTED_MODULE_0__/* .InputError */ .d(`metric name is ${length} characters long, more than the ${MAX_NAME_LENGTH} allowed ("${name.slice(0, 40)}...")`, { where, fix: `shorten the name to at most ${MAX_NAME_LENGTH} characters` });
    }
    const bad = CONTROL.exec(name) ?? BIDI.exec(name);
    if (bad) {
        const code = bad[0].codePointAt(0).toString(16).toUpperCase().padStart(4, '0');
        const kind = CONTROL.test(bad[0]) ? 'a control character' : 'a bidirectional override character';
        throw new _model_input_error_js__WEBPACK_IMPORTED_MODULE_0__/* .InputError */ .d(`metric name ${JSON.stringify(name)} contains ${kind} (U+${code})`, {
            where,
            fix: 'remove control and bidirectional formatting characters from metric names',
        });
    }
    return name;
}
function countCodePoints(text) {
    let count = 0;
    for (let i = 0; i < text.length; i++) {
        const c = text.charCodeAt(i);
        // A high surrogate followed by a low one is one character.
        if (c >= 0xd800 && c <= 0xdbff && i + 1 < text.length) {
            const d = text.charCodeAt(i + 1);
            if (d >= 0xdc00 && d <= 0xdfff)
                i++;
        }
        count++;
    }
    return count;
}
/** Longest unit accepted, in UTF-16 units. */
const MAX_UNIT_LENGTH = 64;
/**
 * Checks a unit string with the same character rule as names (no control or bidirectional
 * formatting characters) and a length of at most 64: units are printed beside every value.
 * @throws InputError naming the place.
 * @example checkUnit('ns/op', 'b.txt:3') // 'ns/op'
 */
function checkUnit(unit, where) {
    if (unit.length > MAX_UNIT_LENGTH || CONTROL.test(unit) || BIDI.test(unit)) {
        throw new _model_input_error_js__WEBPACK_IMPORTED_MODULE_0__/* .InputError */ .d(`unit ${JSON.stringify(unit.slice(0, 80))} is longer than ${MAX_UNIT_LENGTH} characters or contains control or bidirectional formatting characters`, {
            where,
            fix: 'write the unit as short plain text such as ms, B or ns/op',
        });
    }
    return unit;
}


/***/ }),

/***/ 20913:
/***/ ((__unused_webpack_module, __webpack_exports__, __webpack_require__) => {

/* harmony export */ __webpack_require__.d(__webpack_exports__, {
/* harmony export */   QA: () => (/* binding */ gaussianDensity),
/* harmony export */   Wn: () => (/* binding */ predictiveScale),
/* harmony export */   YS: () => (/* binding */ plugInRelativeDensity),
/* harmony export */   kr: () => (/* binding */ predictiveRelativeDensity)
/* harmony export */ });
/* unused harmony export gaussianLogDensity */
/* harmony import */ var _input_error_js__WEBPACK_IMPORTED_MODULE_0__ = __webpack_require__(71184);
/* harmony import */ var _special_normal_js__WEBPACK_IMPORTED_MODULE_1__ = __webpack_require__(92986);


/** A spread must be a finite number >= 0; 0 is the degenerate fit of a constant history. */
function checkSpread(sd) {
    if (!(sd >= 0) || !Number.isFinite(sd)) {
        throw new _input_error_js__WEBPACK_IMPORTED_MODULE_0__/* .InputError */ .d(`a standard deviation must be a finite number, 0 or more, got ${sd}`);
    }
}
/**
 * Gaussian density p(x) = exp(-(x - mu)^2 / (2 sigma^2)) / (sqrt(2 pi) sigma).
 * A zero sigma is the degenerate distribution: Infinity at the mean, 0 elsewhere.
 * Throws InputError on a negative or non-finite sd.
 * @example gaussianDensity(0, 0, 1) // 0.3989422804014327
 */
function gaussianDensity(x, mean, sd) {
    checkSpread(sd);
    return (0,_special_normal_js__WEBPACK_IMPORTED_MODULE_1__/* .normalDensity */ .kC)(x, mean, sd);
}
/**
 * log p(x), exact where p(x) underflows to 0 (beyond about 38 sigma).
 * @example gaussianLogDensity(0, 0, 1) // -0.9189385332046727
 */
function gaussianLogDensity(x, mean, sd) {
    checkSpread(sd);
    return normalLogDensity(x, mean, sd);
}
/**
 * Relative density under the fitted Gaussian used as is ("plug-in"): p(x) / p(mean) =
 * exp(-z^2 / 2). Unitless, in [0, 1]; 1 at the centre, about 0.0111 at 3 sigma. With a zero
 * sd it is 1 at the mean and 0 elsewhere (the limit), never NaN.
 * @example plugInRelativeDensity(3, 0, 1) // 0.011108996538242306
 */
function plugInRelativeDensity(x, mean, sd) {
    checkSpread(sd);
    if (sd === 0)
        return x === mean ? 1 : 0;
    const z = (x - mean) / sd;
    return Math.exp(-0.5 * z * z);
}
/**
 * Scale of the predictive distribution for one new run when mean and sigma were estimated from
 * n runs: s * sqrt(1 + 1/n), with s the n-1 standard deviation (a Student-t with n-1 degrees of
 * freedom around the mean; e.g. Gelman et al., Bayesian Data Analysis, section 3.2).
 * @example predictiveScale(1, 4) // 1.118033988749895
 */
function predictiveScale(sampleSd, n) {
    return sampleSd * Math.sqrt(1 + 1 / n);
}
/**
 * Relative density under the predictive Student-t with n-1 degrees of freedom:
 * f(t) / f(0) = (1 + t^2 / nu)^(-(nu + 1) / 2), t = (x - mean) / (s sqrt(1 + 1/n)).
 * Heavier tails than the Gaussian, so a short history needs a larger move to fall below a cutoff;
 * as n grows it approaches plugInRelativeDensity. Computed in log space (log1p) so far tails do
 * not underflow early. A zero sampleSd gives 1 at the mean, 0 elsewhere.
 * Throws InputError when n < 2 (no degrees of freedom) or sampleSd is negative or not finite.
 * @example predictiveRelativeDensity(3, 0, 1, 1e9) // ≈ 0.011109 (large n: the Gaussian)
 */
function predictiveRelativeDensity(x, mean, sampleSd, n) {
    if (!(n >= 2)) {
        throw new _input_error_js__WEBPACK_IMPORTED_MODULE_0__/* .InputError */ .d(`the predictive distribution needs at least 2 runs, got ${n}`, {
            fix: 'raise `min-runs` to 2 or more, or use `uncertainty: plug-in`',
        });
    }
    checkSpread(sampleSd);
    if (sampleSd === 0)
        return x === mean ? 1 : 0;
    const nu = n - 1;
    const t = (x - mean) / predictiveScale(sampleSd, n);
    return Math.exp((-(nu + 1) / 2) * Math.log1p((t * t) / nu));
}


/***/ }),

/***/ 71184:
/***/ ((__unused_webpack_module, __webpack_exports__, __webpack_require__) => {


// EXPORTS
__webpack_require__.d(__webpack_exports__, {
  d: () => (/* binding */ InputError)
});

;// CONCATENATED MODULE: ./src/model/visible-text.ts
/**
 * Text quoted from untrusted input (metric names, file content) inside a message printed to a
 * terminal or a log: every character that could move the cursor, ring, recolour or reorder the
 * line (C0 controls but tab and line feed, DEL, C1 controls, the bidi marks, embeddings, overrides
 * and isolates of "Trojan Source", CVE-2021-42574, and the Unicode line separators) is shown as
 * its code point, \u{XXXX}. Pure; never throws.
 * @example visibleText('a\u202Eb') // 'a\\u{202E}b'
 */
function visibleText(text) {
    return text.replace(INVISIBLE, (c) => `\\u{${c.charCodeAt(0).toString(16).toUpperCase().padStart(4, '0')}}`);
}
const INVISIBLE = /[\u0000-\u0008\u000B-\u001F\u007F-\u009F\u061C\u200E\u200F\u2028\u2029\u202A-\u202E\u2066-\u2069]/g;

;// CONCATENATED MODULE: ./src/model/input-error.ts

/**
 * The project's one contract for bad input: a typed error whose message a user can act on.
 * Pure modules throw it; adapters turn it into exit code 2 or a failed step, never a stack trace.
 */
class InputError extends Error {
    name = 'InputError';
    /** Where the problem is: "file:line:column", an XML element path, or a metric name. */
    where;
    /** What to do about it, in one sentence. */
    fix;
    constructor(message, options = {}) {
        super(message, options.cause === undefined ? undefined : { cause: options.cause });
        this.where = options.where;
        this.fix = options.fix;
    }
    /**
     * "where: message. fix" — the line a user sees. Messages quote untrusted text (metric names), so
     * control, C1 and bidirectional formatting characters are shown as \u{XXXX}: a refusal must not
     * send a terminal escape sequence or reorder the line it is printed on (CVE-2021-42574).
     */
    describe() {
        const head = this.where ? `${this.where}: ${this.message}` : this.message;
        return visibleText(shortenQuotes(this.fix ? `${head}\n  fix: ${this.fix}` : head));
    }
}
/** Quoted text past this many characters is cut in messages: a 10 KB metric name is not echoed whole. */
const MAX_QUOTED = 120;
// Every quoted string, taken pairwise from the left, so prose between two quotes is never cut.
const QUOTED = /"((?:[^"\\]|\\.)*)"/g;
function shortenQuotes(text) {
    if (text.length <= MAX_QUOTED)
        return text;
    return text.replace(QUOTED, (whole, inner) => inner.length <= MAX_QUOTED ? whole : `"${Array.from(inner).slice(0, MAX_QUOTED / 2).join('')}…" (${inner.length} characters)`);
}


/***/ }),

/***/ 40916:
/***/ ((__unused_webpack_module, __webpack_exports__, __webpack_require__) => {

/* harmony export */ __webpack_require__.d(__webpack_exports__, {
/* harmony export */   RL: () => (/* binding */ regularizedBeta),
/* harmony export */   rP: () => (/* binding */ betaPointFromOdds)
/* harmony export */ });
/* unused harmony export betaPointAt */
/* harmony import */ var _log_gamma_js__WEBPACK_IMPORTED_MODULE_0__ = __webpack_require__(32231);

/**
 * The point with odds w = y / x >= 0: x = 1 / (1 + w), y = w / (1 + w), ln x = -log1p(w),
 * ln y = ln w - log1p(w) = -log1p(1 / w). A Student-t statistic has w = t^2 / nu, an F statistic w = d1 f / d2.
 * @example betaPointFromOdds(1).x // 0.5
 */
function betaPointFromOdds(w) {
    if (w === Infinity)
        return { x: 0, y: 1, logX: -Infinity, logY: 0 };
    const s = 1 + w;
    // ln y = ln w - log1p(w) cancels for large w; -log1p(1/w) is the same without the cancellation.
    const logY = w <= 1 ? Math.log(w) - Math.log1p(w) : -Math.log1p(1 / w);
    return { x: 1 / s, y: w / s, logX: -Math.log1p(w), logY };
}
/**
 * The point x itself (y = 1 - x, ln y = log1p(-x)), for callers that only have x.
 * @example betaPointAt(0.25).y // 0.75
 */
function betaPointAt(x) {
    return { x, y: 1 - x, logX: Math.log(x), logY: Math.log1p(-x) };
}
/**
 * x^a y^b / B(a, b). With both a and b at least 10, Stirling's formula for the three Gammas
 * folds the powers into a log1p(u) + b log1p(v) with u = (x (a + b) - a) / a and
 * v = -(x (a + b) - a) / b, whose first-order terms cancel exactly (a u + b v = 0), so the sum is
 * a log1pMinus(u) + b log1pMinus(v) (cf. DiDonato & Morris 1992, ACM TOMS 18, "BRCOMP"):
 *   sqrt(a b / (2 pi (a + b))) exp(a log1pMinus(u) + b log1pMinus(v) + mu(a + b) - mu(a) - mu(b)).
 * Otherwise exp(a ln x + b ln y - ln B(a, b)), every term of moderate size.
 */
function betaFront(a, b, p) {
    if (a >= _log_gamma_js__WEBPACK_IMPORTED_MODULE_0__/* .STIRLING_FROM */ .k0 && b >= _log_gamma_js__WEBPACK_IMPORTED_MODULE_0__/* .STIRLING_FROM */ .k0) {
        const s = a + b;
        const excess = p.x * b - p.y * a; // x (a + b) - a
        const exponent = powerExcess(a, excess / a, p.logX, s) +
            powerExcess(b, -excess / b, p.logY, s) +
            (0,_log_gamma_js__WEBPACK_IMPORTED_MODULE_0__/* .stirlingCorrection */ .np)(s) -
            (0,_log_gamma_js__WEBPACK_IMPORTED_MODULE_0__/* .stirlingCorrection */ .np)(a) -
            (0,_log_gamma_js__WEBPACK_IMPORTED_MODULE_0__/* .stirlingCorrection */ .np)(b);
        return Math.sqrt(((a / s) * b) / (2 * Math.PI)) * Math.exp(exponent);
    }
    return Math.exp(a * p.logX + b * p.logY - (0,_log_gamma_js__WEBPACK_IMPORTED_MODULE_0__/* .logBeta */ .ln)(a, b));
}
/**
 * a (log1p(u) - u) for u = x / x0 - 1, x0 = a / s: near x0 by log1pMinus; far below it
 * (u <= -1/2, where 1 + u has lost digits) with log1p(u) = ln x - ln x0 from the exact ln x.
 */
function powerExcess(a, u, logX, s) {
    if (u > -0.5)
        return a * (0,_log_gamma_js__WEBPACK_IMPORTED_MODULE_0__/* .log1pMinus */ ._g)(u);
    return a * (logX + Math.log(s / a) - u);
}
const TINY = 1e-300;
const TOLERANCE = 4 * Number.EPSILON;
/**
 * lambda = a - (a + b) x, from whichever of x and y is smaller so that a point near 1 (a Student-t
 * near its centre with many degrees of freedom) keeps its digits: (a + b) y - b there.
 */
function betaLambda(a, b, p) {
    return p.x <= p.y ? a - (a + b) * p.x : (a + b) * p.y - b;
}
/**
 * The continued fraction of I_x(a, b) (A&S 26.5.8: I = x^a y^b / (a B(a, b)) / (1 + d1 / (1 + d2 / ...)),
 * d_2m+1 = -(a + m)(a + b + m) x / ((a + 2m)(a + 2m + 1)), d_2m = m (b - m) x / ((a + 2m - 1)(a + 2m)))
 * in its even contraction 1 / (beta_1 + alpha_1 / (beta_2 + alpha_2 / ...)), beta_1 = 1 + d1,
 * beta_m+1 = 1 + d_2m + d_2m+1, alpha_m = -d_2m-1 d_2m, with the betas rewritten in
 * lambda = a - (a + b) x so that no 1 - x cancels (as DiDonato & Morris 1992, ACM TOMS 18, "BFRAC"):
 *   beta_1 = (1 + lambda) / (a + 1),
 *   beta_m+1 = (a^2 (2m + 1) + a b (4m + 1) + 2m^2 (a + 2b) - a - b
 *              + lambda (a^2 + a b + 2a m + 2m^2 - a - b)) / ((a + b)(a + 2m - 1)(a + 2m + 1)).
 * Evaluated by the modified Lentz method (Numerical Recipes 3rd ed., 5.2); converges fast for
 * x < (a + 1) / (a + b + 2), in O(sqrt(max(a, b))) steps at worst; the bound is far above that.
 */
function betaFraction(a, b, p) {
    const x = p.x;
    const lambda = betaLambda(a, b, p);
    const s = a + b;
    let f = (1 + lambda) / (a + 1);
    if (Math.abs(f) < TINY)
        f = TINY;
    let c = f;
    let d = 0;
    const steps = 1000 + Math.ceil(50 * Math.sqrt(Math.max(a, b)));
    for (let m = 1; m <= steps; m++) {
        const am = a + 2 * m;
        const alpha = ((a + m - 1) * (s + m - 1) * m * (b - m) * x * x) / ((am - 2) * (am - 1) * (am - 1) * am);
        const beta = (a * a * (2 * m + 1) + a * b * (4 * m + 1) + 2 * m * m * (a + 2 * b) - a - b +
            lambda * (a * a + a * b + 2 * a * m + 2 * m * m - a - b)) /
            (s * (am - 1) * (am + 1));
        d = beta + alpha * d;
        if (Math.abs(d) < TINY)
            d = TINY;
        c = beta + alpha / c;
        if (Math.abs(c) < TINY)
            c = TINY;
        d = 1 / d;
        const delta = c * d;
        f *= delta;
        if (Math.abs(delta - 1) < TOLERANCE)
            break;
    }
    return 1 / f;
}
/**
 * The regularised incomplete beta function I_x(a, b) (upper = false) or its complement
 * 1 - I_x(a, b) = I_y(b, a) (upper = true), for a, b > 0. The side below the mean
 * (x <= (a + 1) / (a + b + 2), where the continued fraction converges) is computed directly as
 * x^a y^b / (a B(a, b)) times the fraction, the other as 1 minus it; for a, b >= 1/2 (every
 * t, chi-square and F law) that other side is at least ~0.08, so small results, far tails
 * included, keep their relative accuracy (about 2e-13 against 50-digit references up to 1e6).
 * NaN when a or b is not above 0.
 * @example regularizedBeta(2, 3, betaPointAt(0.4), false) // 0.5248
 */
function regularizedBeta(a, b, p, upper) {
    if (!(a > 0 && b > 0) || Number.isNaN(p.x) || Number.isNaN(p.y))
        return Number.NaN;
    if (p.x <= 0)
        return upper ? 1 : 0;
    if (p.y <= 0)
        return upper ? 0 : 1;
    if (p.x <= (a + 1) / (a + b + 2)) {
        const lower = (betaFront(a, b, p) * betaFraction(a, b, p)) / a;
        return Math.min(1, Math.max(0, upper ? 1 - lower : lower));
    }
    const q = { x: p.y, y: p.x, logX: p.logY, logY: p.logX };
    const complement = (betaFront(b, a, q) * betaFraction(b, a, q)) / b;
    return Math.min(1, Math.max(0, upper ? complement : 1 - complement));
}


/***/ }),

/***/ 32231:
/***/ ((__unused_webpack_module, __webpack_exports__, __webpack_require__) => {

/* harmony export */ __webpack_require__.d(__webpack_exports__, {
/* harmony export */   SX: () => (/* binding */ logGamma),
/* harmony export */   _g: () => (/* binding */ log1pMinus),
/* harmony export */   k0: () => (/* binding */ STIRLING_FROM),
/* harmony export */   ln: () => (/* binding */ logBeta),
/* harmony export */   np: () => (/* binding */ stirlingCorrection)
/* harmony export */ });
/* unused harmony export logGammaShift */
/**
 * ln Gamma by Stirling's series with its Bernoulli-number corrections (A&S 6.1.40-41):
 *   ln Gamma(x) = (x - 1/2) ln x - x + ln sqrt(2 pi) + mu(x),
 *   mu(x) = 1/(12x) - 1/(360x^3) + 1/(1260x^5) - 1/(1680x^7) + 1/(1188x^9) - 691/(360360x^11) + 1/(156x^13),
 * used from x = 10 up (the next term is below 3e-17 there) and below 10 through the recurrence
 * Gamma(x) = Gamma(x + k) / (x (x + 1) ... (x + k - 1)). Absolute error a few 1e-15.
 */
const LN_SQRT_2PI = 0.91893853320467274178;
/** Where Stirling's series is used as is. */
const STIRLING_FROM = 10;
/**
 * The Stirling correction mu(x) = ln Gamma(x) - ((x - 1/2) ln x - x + ln sqrt(2 pi)), x >= 10
 * (A&S 6.1.41; coefficients B_2k / (2k (2k - 1))).
 * @example stirlingCorrection(10) // ≈ 0.0083305634
 */
function stirlingCorrection(x) {
    const r = 1 / x;
    const r2 = r * r;
    return r * (1 / 12 + r2 * (-1 / 360 + r2 * (1 / 1260 + r2 * (-1 / 1680 + r2 * (1 / 1188 + r2 * (-691 / 360360 + r2 / 156))))));
}
/**
 * ln Gamma(x) for x > 0 (Stirling's series, recurrence below 10). NaN for x <= 0 or NaN.
 * @example logGamma(0.5) // ≈ 0.5723649429247001 (ln sqrt(pi))
 */
function logGamma(x) {
    if (!(x > 0))
        return Number.NaN;
    if (x >= STIRLING_FROM)
        return (x - 0.5) * Math.log(x) - x + LN_SQRT_2PI + stirlingCorrection(x);
    let product = 1;
    let y = x;
    while (y < STIRLING_FROM) {
        product *= y;
        y += 1;
    }
    return logGamma(y) - Math.log(product);
}
/**
 * ln Gamma(x + s) - ln Gamma(x) for x >= 10 and s >= 0, without subtracting two large logs:
 *   (x - 1/2) log1p(s / x) + s ln(x + s) - s + mu(x + s) - mu(x).
 * @example logGammaShift(1e6, 0.5) // ≈ 0.5 ln 1e6 = 6.9077552789821
 */
function logGammaShift(x, s) {
    return (x - 0.5) * Math.log1p(s / x) + s * Math.log(x + s) - s + stirlingCorrection(x + s) - stirlingCorrection(x);
}
/**
 * ln B(a, b) = ln Gamma(a) + ln Gamma(b) - ln Gamma(a + b) for a, b > 0. When the larger argument
 * is 10 or more, the two large terms are combined by logGammaShift (no cancellation).
 * @example logBeta(0.5, 0.5) // ≈ 1.1447298858494002 (ln pi)
 */
function logBeta(a, b) {
    const small = Math.min(a, b);
    const large = Math.max(a, b);
    if (large < STIRLING_FROM)
        return logGamma(a) + logGamma(b) - logGamma(a + b);
    return logGamma(small) - logGammaShift(large, small);
}
/**
 * log1p(u) - u for u > -1, accurate near 0 where the two terms cancel: with t = u / (2 + u),
 * log1p(u) = 2 atanh(t) = 2 (t + t^3/3 + t^5/5 + ...) and u - 2t = u t.
 * @example log1pMinus(1e-10) // ≈ -5e-21
 */
function log1pMinus(u) {
    if (!(Math.abs(u) < 0.5))
        return Math.log1p(u) - u;
    const t = u / (2 + u);
    const t2 = t * t;
    let power = t * t2;
    let sum = 0;
    for (let k = 3; k < 80; k += 2) {
        const term = power / k;
        sum += term;
        if (Math.abs(term) <= 1e-17 * Math.abs(sum))
            break;
        power *= t2;
    }
    return 2 * sum - u * t;
}


/***/ }),

/***/ 92986:
/***/ ((__unused_webpack_module, __webpack_exports__, __webpack_require__) => {


// EXPORTS
__webpack_require__.d(__webpack_exports__, {
  kC: () => (/* binding */ normalDensity),
  IL: () => (/* binding */ normalUpperTail)
});

// UNUSED EXPORTS: normalLogCdf, normalLogDensity

;// CONCATENATED MODULE: ./src/model/special/erfc.ts
/**
 * The complementary error function by W. J. Cody's rational Chebyshev approximations ("Rational
 * Chebyshev approximations for the error function", Math. Comp. 23 (1969) 631-637; the
 * coefficients of his CALERF routine in netlib's SPECFUN, good to about 1e-18): three intervals,
 * |x| <= 0.46875, up to 4, and beyond 4 (in 1/x^2). The exponential factor exp(-x^2) is taken
 * in two exact pieces so that far tails keep their relative accuracy down to the underflow.
 */
// Cody's coefficients for erf(x) = x R(x^2), |x| <= 0.46875.
const A = [3.1611237438705656, 113.86415415105016, 377.485237685302021, 3209.37758913846947, 0.185777706184603153];
const B = [23.6012909523441209, 244.024637934444173, 1282.61652607737228, 2844.23683343917062];
// exp(x^2) erfc(x) = R(x), 0.46875 < x <= 4.
const C = [
    0.564188496988670089, 8.88314979438837594, 66.1191906371416295, 298.635138197400131, 881.95222124176909,
    1712.04761263407058, 2051.07837782607147, 1230.33935479799725, 2.15311535474403846e-8,
];
const D = [
    15.7449261107098347, 117.693950891312499, 537.181101862009858, 1621.38957456669019, 3290.79923573345963,
    4362.61909014324716, 3439.36767414372164, 1230.33935480374942,
];
// exp(x^2) erfc(x) = (1/sqrt(pi) - R(1/x^2) / x^2) / x, x > 4.
const P = [
    0.305326634961232344, 0.360344899949804439, 0.125781726111229246, 0.0160837851487422766,
    6.58749161529837803e-4, 0.0163153871373020978,
];
const Q = [2.56852019228982242, 1.87295284992346725, 0.527905102951428412, 0.0605183413124413191, 2.33520497626869185e-3];
const INV_SQRT_PI = 0.56418958354775628695;
/** Where Cody's first interval (erf as a rational function of x^2) ends. */
const ERF_SMALL_LIMIT = 0.46875;
/** erf(x) for |x| <= ERF_SMALL_LIMIT (Cody's first interval). */
function erfSmall(x) {
    const z = x * x;
    let num = A[4] * z;
    let den = z;
    for (let i = 0; i < 3; i++) {
        num = (num + A[i]) * z;
        den = (den + B[i]) * z;
    }
    return (x * (num + A[3])) / (den + B[3]);
}
/**
 * exp(y^2) erfc(y) for y > ERF_SMALL_LIMIT (Cody's second and third intervals); about
 * 1 / (y sqrt(pi)) for large y, 0 at Infinity.
 */
function erfc_erfcScaledTail(y) {
    if (y <= 4) {
        let num = C[8] * y;
        let den = y;
        for (let i = 0; i < 7; i++) {
            num = (num + C[i]) * y;
            den = (den + D[i]) * y;
        }
        return (num + C[7]) / (den + D[7]);
    }
    const z = 1 / (y * y);
    let num = P[5] * z;
    let den = z;
    for (let i = 0; i < 4; i++) {
        num = (num + P[i]) * z;
        den = (den + Q[i]) * z;
    }
    return (INV_SQRT_PI - (z * (num + P[4])) / (den + Q[4])) / y;
}
/**
 * exp(-s y^2) for y >= 0 and s = 1 or 1/2, as Cody takes it: y = h + r with h a multiple of
 * 1/16, so h^2 is exact and only the small exp(-s (y - h)(y + h)) carries rounding. 0 beyond 40.
 */
function expNegSquare(y, s) {
    if (y > 40)
        return 0;
    const h = Math.trunc(y * 16) / 16;
    return Math.exp(-s * h * h) * Math.exp(-s * (y - h) * (y + h));
}
/**
 * Complementary error function erfc(x) = (2 / sqrt(pi)) integral_x^inf exp(-t^2) dt, with full
 * relative accuracy for large x (W. J. Cody 1969). NaN in, NaN out.
 * @example erfc(1) // 0.15729920705028513
 */
function erfc(x) {
    const y = Math.abs(x);
    if (!(y > ERF_SMALL_LIMIT))
        return 1 - erfSmall(x); // also NaN
    const upper = erfc_erfcScaledTail(y) * expNegSquare(y, 1);
    return x < 0 ? 2 - upper : upper;
}
/**
 * Scaled complementary error function exp(x^2) erfc(x) for x >= 0 (finite where erfc underflows:
 * about 1 / (x sqrt(pi)) for large x). Throws RangeError for negative x, where it grows as
 * 2 exp(x^2) and nothing here needs it.
 * @example erfcScaled(30) // ≈ 0.0187958888
 */
function erfcScaled(x) {
    if (x < 0)
        throw new RangeError(`erfcScaled takes x >= 0, got ${x}`);
    if (!(x > ERF_SMALL_LIMIT))
        return Math.exp(x * x) * (1 - erfSmall(x));
    return erfc_erfcScaledTail(x);
}

;// CONCATENATED MODULE: ./src/model/special/normal.ts

/** ln sqrt(2 pi). */
const LN_SQRT_2PI = 0.91893853320467274178;
const INV_SQRT_2PI = 0.39894228040143267794;
/**
 * Standard normal upper tail Q(z) = P(Z > z) = erfc(z / sqrt 2) / 2, computed directly (never as
 * 1 - cdf) with Cody's erfc; exp(-z^2/2) is split as in erfc so the
 * relative accuracy holds out to z = 37 and beyond, until the result underflows. NaN in, NaN out.
 * @example normalUpperTail(1.96) // ≈ 0.0249979
 */
function normalUpperTail(z) {
    const y = Math.abs(z) * Math.SQRT1_2;
    if (!(y > ERF_SMALL_LIMIT))
        return 0.5 - 0.5 * erfSmall(z * Math.SQRT1_2); // also NaN
    const far = 0.5 * erfc_erfcScaledTail(y) * expNegSquare(Math.abs(z), 0.5);
    return z < 0 ? 1 - far : far;
}
/**
 * ln P(Z < z) for a standard normal, finite far below where P underflows: for z < -1 it is
 * ln(erfcx(-z / sqrt 2) / 2) - z^2 / 2 with erfcx the scaled erfc, otherwise log1p(-Q(z)).
 * -Infinity at -Infinity, 0 at +Infinity, NaN for NaN.
 * @example normalLogCdf(-40) // ≈ -804.608
 */
function normalLogCdf(z) {
    if (z < -1) {
        if (z === -Infinity)
            return -Infinity;
        return Math.log(0.5 * erfcScaledTail(-z * Math.SQRT1_2)) - 0.5 * z * z;
    }
    return Math.log1p(-normalUpperTail(z));
}
/**
 * Normal density exp(-(x - mean)^2 / (2 sd^2)) / (sd sqrt(2 pi)). sd = 0 is the degenerate
 * distribution (Infinity at the mean, 0 elsewhere). The caller checks sd >= 0; NaN in, NaN out.
 * @example normalDensity(1, 0, 1) // 0.24197072451914337
 */
function normalDensity(x, mean, sd) {
    if (sd === 0)
        return x === mean ? Infinity : Number.isNaN(x - mean) ? Number.NaN : 0;
    const z = Math.abs((x - mean) / sd);
    return (INV_SQRT_2PI / sd) * expNegSquare(z, 0.5);
}
/**
 * ln of normalDensity: -(x - mean)^2 / (2 sd^2) - ln sd - ln sqrt(2 pi), finite where the density
 * underflows. sd = 0: Infinity at the mean, -Infinity elsewhere. NaN in, NaN out.
 * @example normalLogDensity(0, 0, 1) // -0.9189385332046727
 */
function normalLogDensity(x, mean, sd) {
    if (sd === 0)
        return x === mean ? Infinity : Number.isNaN(x - mean) ? Number.NaN : -Infinity;
    const z = (x - mean) / sd;
    return -0.5 * z * z - Math.log(sd) - LN_SQRT_2PI;
}


/***/ }),

/***/ 67963:
/***/ ((__unused_webpack_module, __webpack_exports__, __webpack_require__) => {


// EXPORTS
__webpack_require__.d(__webpack_exports__, {
  yp: () => (/* binding */ cutoffLevel),
  DE: () => (/* binding */ cutoffSigma),
  WI: () => (/* binding */ normalTail),
  gq: () => (/* binding */ studentTail)
});

// EXTERNAL MODULE: ./src/model/input-error.ts + 1 modules
var input_error = __webpack_require__(71184);
// EXTERNAL MODULE: ./src/model/special/normal.ts + 1 modules
var normal = __webpack_require__(92986);
// EXTERNAL MODULE: ./src/model/special/incomplete-beta.ts
var incomplete_beta = __webpack_require__(40916);
;// CONCATENATED MODULE: ./src/model/special/student-t.ts


/**
 * Two-sided tail P(|T| > |t|) of Student's t with nu > 0 degrees of freedom:
 * I_x(nu/2, 1/2) with x = nu / (nu + t^2) (A&S 26.7.1 and 26.5.27), from the odds t^2 / nu so that
 * neither x nor 1 - x is formed by subtraction. nu = Infinity is the normal limit.
 * NaN for NaN input or nu <= 0.
 * @example studentTwoSidedTail(2.228, 10) // ≈ 0.05
 */
function studentTwoSidedTail(t, nu) {
    if (Number.isNaN(t) || !(nu > 0))
        return Number.NaN;
    if (nu === Infinity)
        return 2 * (0,normal/* normalUpperTail */.IL)(Math.abs(t));
    if (t === 0)
        return 1;
    return (0,incomplete_beta/* regularizedBeta */.RL)(nu / 2, 0.5, (0,incomplete_beta/* betaPointFromOdds */.rP)((t * t) / nu), false);
}
/**
 * Upper tail P(T > t): half the two-sided tail for t >= 0, one minus half of it below 0.
 * @example studentUpperTail(1.812, 10) // ≈ 0.05
 */
function studentUpperTail(t, nu) {
    const half = studentTwoSidedTail(t, nu) / 2;
    return t >= 0 ? half : 1 - half;
}

;// CONCATENATED MODULE: ./src/model/student-tail-series.ts
/**
 * The two-sided tail P(|T| > |t|) of Student's t with a whole number nu of degrees of freedom, by
 * the finite series of Abramowitz & Stegun 26.7.3 (odd nu) and 26.7.4 (even nu), with
 * theta = atan(|t| / sqrt(nu)):
 *   odd:  A = (2 / pi) (theta + sin(theta) [cos + 2/3 cos^3 + (2 4)/(3 5) cos^5 + ... to cos^(nu-2)])
 *   even: A = sin(theta) [1 + 1/2 cos^2 + (1 3)/(2 4) cos^4 + ... to cos^(nu-2)]
 * and the tail is 1 - A. About nu / 2 multiply-adds instead of an incomplete beta function: the
 * gate takes one tail per metric, so on many metrics this is most of the tail's cost.
 * 1 - A cancels when the tail is small, so the series answers only down to SERIES_TAIL_FLOOR
 * (where at most ~12 of 16 digits remain); below it, and for a fractional, huge or infinite
 * input, it returns undefined and the caller uses the incomplete beta (special/student-t.ts).
 *
 * @example seriesTwoSidedTail(2.228, 10) // ≈ 0.05 (standard t table, nu = 10)
 */
function seriesTwoSidedTail(t, nu) {
    if (!Number.isInteger(nu) || nu < 1 || nu > SERIES_MAX_NU || !Number.isFinite(t))
        return undefined;
    const a = Math.abs(t);
    if (a === 0)
        return 1;
    const r = Math.sqrt(nu + a * a);
    const sin = a / r;
    const cos = Math.sqrt(nu) / r;
    const cos2 = cos * cos;
    let tail;
    if (nu % 2 === 0) {
        let term = 1;
        let sum = 1;
        for (let k = 1; k < nu / 2; k++) {
            term *= (cos2 * (2 * k - 1)) / (2 * k);
            sum += term;
        }
        tail = 1 - sin * sum;
    }
    else {
        let sum = 0;
        if (nu > 1) {
            let term = cos;
            sum = cos;
            for (let k = 1; k <= (nu - 3) / 2; k++) {
                term *= (cos2 * (2 * k)) / (2 * k + 1);
                sum += term;
            }
        }
        // 1 - (2/pi) theta = (2/pi) atan(sqrt(nu) / |t|): no cancellation in the arctangent part.
        tail = (2 / Math.PI) * (Math.atan(Math.sqrt(nu) / a) - sin * sum);
    }
    return tail >= SERIES_TAIL_FLOOR ? tail : undefined;
}
/** Below this tail the series hands over to the incomplete beta (cancellation in 1 - A). */
const SERIES_TAIL_FLOOR = 1e-4;
/** Above this many degrees of freedom the series is long; the incomplete beta is cheaper. */
const SERIES_MAX_NU = 400;

;// CONCATENATED MODULE: ./src/model/tails.ts




/**
 * Tail probability of a standard normal z: P(Z > z), P(Z < z) or P(|Z| > |z|).
 * Uses the upper tail erfc(z / sqrt 2) / 2 directly (no 1 - cdf cancellation in the far tail).
 * @example normalTail(1.96, 'both') // ≈ 0.04999579
 */
function normalTail(z, side) {
    if (Number.isNaN(z))
        throw new input_error/* InputError */.d('a tail probability needs a number, got NaN');
    if (side === 'upper')
        return (0,normal/* normalUpperTail */.IL)(z);
    if (side === 'lower')
        return (0,normal/* normalUpperTail */.IL)(-z);
    return 2 * (0,normal/* normalUpperTail */.IL)(Math.abs(z));
}
/**
 * Tail probability of a Student-t statistic with nu degrees of freedom, sides as normalTail.
 * Whole nu and a tail not too small take the finite series (seriesTwoSidedTail, A&S 26.7.3-4);
 * the rest the incomplete beta I_x(nu/2, 1/2), x = nu / (nu + t^2), which keeps full relative
 * precision far out in the tail.
 * @example studentTail(2.228, 10, 'both') // ≈ 0.05 (standard t table, nu = 10)
 */
function studentTail(t, nu, side) {
    if (Number.isNaN(t))
        throw new input_error/* InputError */.d('a tail probability needs a number, got NaN');
    if (!(nu > 0))
        throw new input_error/* InputError */.d(`a Student-t needs degrees of freedom above 0, got ${nu}`);
    const both = seriesTwoSidedTail(t, nu);
    if (both !== undefined) {
        if (side === 'both')
            return both;
        // One side is half the two-sided tail on the far side of 0, and 1 minus that on the near side.
        const far = side === 'upper' ? t >= 0 : t <= 0;
        return far ? both / 2 : 1 - both / 2;
    }
    if (side === 'upper')
        return studentUpperTail(t, nu);
    if (side === 'lower')
        return studentUpperTail(-t, nu);
    return studentTwoSidedTail(t, nu);
}
/** A cutoff is a relative density: a number in (0, 1]. */
function checkCutoff(cutoff) {
    if (!(cutoff > 0 && cutoff <= 1)) {
        throw new input_error/* InputError */.d(`cutoff must be a number above 0 and at most 1, got ${cutoff}`, {
            fix: 'use a relative density such as 0.01',
        });
    }
}
/**
 * How many sigma away the relative density of a Gaussian falls to `cutoff`: sqrt(-2 ln cutoff).
 * Throws InputError unless 0 < cutoff <= 1.
 * @example cutoffSigma(0.01) // 3.0348542587702925
 */
function cutoffSigma(cutoff) {
    checkCutoff(cutoff);
    return Math.sqrt(Math.max(0, -2 * Math.log(cutoff)));
}
/**
 * The two-sided normal tail probability at the cutoff's sigma: the false-alarm level a cutoff
 * stands for under a Gaussian (0.01 -> 3.03 sigma -> 0.0024). Family control uses it as alpha.
 * @example cutoffLevel(0.01) // ≈ 0.002407
 */
function cutoffLevel(cutoff) {
    return normalTail(cutoffSigma(cutoff), 'both');
}


/***/ }),

/***/ 10571:
/***/ ((__unused_webpack_module, __webpack_exports__, __webpack_require__) => {

/* harmony export */ __webpack_require__.d(__webpack_exports__, {
/* harmony export */   G: () => (/* binding */ metricCells),
/* harmony export */   J: () => (/* binding */ formatBaseline)
/* harmony export */ });
/* harmony import */ var _format_js__WEBPACK_IMPORTED_MODULE_0__ = __webpack_require__(12011);

/**
 * "10.1 ± 0.4 ms (n=60)". On the log scale the fitted centre is shown as the geometric mean
 * exp(mean) and the spread as the factor exp(sd) ("×/÷ 1.03"), which is what a log-normal fit means
 * on the metric's own scale. `unit` must already be escaped for the target format.
 * @example formatBaseline({ n: 60, mean: 10.1, sd: 0.4 }, 'ms') // '10.1 ± 0.4 ms (n=60)'
 */
function formatBaseline(b, unit) {
    if (!b)
        return _format_js__WEBPACK_IMPORTED_MODULE_0__/* .NOT_AVAILABLE */ .e5;
    const u = unit ? ` ${unit}` : '';
    const ratio = b.relativeTo !== undefined ? ' (ratio)' : '';
    if (b.scale === 'log') {
        return `${(0,_format_js__WEBPACK_IMPORTED_MODULE_0__/* .formatNumber */ .ZV)(Math.exp(b.mean))}${u} ×/÷ ${(0,_format_js__WEBPACK_IMPORTED_MODULE_0__/* .formatNumber */ .ZV)(Math.exp(b.sd), 4)} (n=${b.n}, log)${ratio}`;
    }
    return `${(0,_format_js__WEBPACK_IMPORTED_MODULE_0__/* .formatNumber */ .ZV)(b.mean)} ± ${(0,_format_js__WEBPACK_IMPORTED_MODULE_0__/* .formatNumber */ .ZV)(b.sd, 2)}${u} (n=${b.n})${ratio}`;
}
/** Format the numeric columns of a metric result; `unit` already escaped for the target. */
function metricCells(m, unit) {
    return {
        value: (0,_format_js__WEBPACK_IMPORTED_MODULE_0__/* .formatValue */ .Fl)(m.value, unit),
        baseline: formatBaseline(m.baseline, unit),
        change: (0,_format_js__WEBPACK_IMPORTED_MODULE_0__/* .formatChange */ .eD)(m.change),
        sigma: (0,_format_js__WEBPACK_IMPORTED_MODULE_0__/* .formatSigma */ .Hx)(m.z),
        density: (0,_format_js__WEBPACK_IMPORTED_MODULE_0__/* .formatAgainstCutoff */ .mM)(m.relativeDensity, m.cutoff),
    };
}


/***/ }),

/***/ 60023:
/***/ ((__unused_webpack_module, __webpack_exports__, __webpack_require__) => {

/* harmony export */ __webpack_require__.d(__webpack_exports__, {
/* harmony export */   X: () => (/* binding */ cleanText),
/* harmony export */   _: () => (/* binding */ MAX_SHOWN_LENGTH)
/* harmony export */ });
/**
 * Text from metric files (names, units) is untrusted: it may carry terminal escape sequences,
 * bidirectional overrides that make a name read differently from what it is (the "Trojan Source"
 * trick, CVE-2021-42574), line breaks that split a table row, or be 10 KB long. `cleanText` removes
 * all of that before any renderer adds its own escaping on top.
 */
/** Default cap on shown names: long enough for real paths, short enough for a table row. */
const MAX_SHOWN_LENGTH = 200;
// C0 and C1 controls (ESC starts terminal sequences), DEL, bidi embeddings/overrides U+202A-202E,
// isolates U+2066-2069, and the implicit marks U+200E/U+200F/U+061C that can also reorder text.
const UNSAFE = /[\u0000-\u0008\u000B\u000C\u000E-\u001F\u007F-\u009F\u202A-\u202E\u2066-\u2069\u200E\u200F\u061C]/g;
const LINE_BREAKS = /[\t\n\r\u2028\u2029\u0085]+/g;
/**
 * Strip control and bidi-override characters, turn line breaks and tabs into single spaces and cap
 * the length at `max` code points with an ellipsis. Never throws.
 * @example cleanText('a\u202Eb\nc') // 'ab c'
 * @example cleanText('x'.repeat(300)).length // 200
 */
function cleanText(s, max = MAX_SHOWN_LENGTH) {
    const flat = String(s).replace(LINE_BREAKS, ' ').replace(UNSAFE, '');
    if (flat.length <= max)
        return flat; // UTF-16 length bounds the code-point count
    const points = Array.from(flat);
    if (points.length <= max)
        return flat;
    return points.slice(0, Math.max(0, max - 1)).join('') + '…';
}


/***/ }),

/***/ 14031:
/***/ ((__unused_webpack_module, __webpack_exports__, __webpack_require__) => {

/* harmony export */ __webpack_require__.d(__webpack_exports__, {
/* harmony export */   F: () => (/* binding */ escapeMarkdown),
/* harmony export */   Z: () => (/* binding */ escapeHtml)
/* harmony export */ });
/* harmony import */ var _clean_js__WEBPACK_IMPORTED_MODULE_0__ = __webpack_require__(60023);

/** Zero-width space: breaks GitHub's @mention and #123 autolinks while reading the same. */
const ZWSP = '\u200B';
// Characters with a meaning in GitHub-flavoured markdown, inline or in a table cell.
const MARKDOWN_SPECIAL = /[\\*_[\]()#|`+!~]/g;
/**
 * Make untrusted text (a metric name or unit) inert inside GitHub markdown text and table cells.
 * Steps: cleanText (controls, bidi overrides, newlines, cap at 200); `&`, `<`, `>` become entities
 * (so no HTML tag such as `<img onerror=...>` can open); every markdown punctuation character
 * `\ * _ [ ] ( ) # | \` + ! ~` gets a backslash (so `](javascript:...)` is no link, `|` no
 * new cell); a zero-width space after `@` and after `#`/`GH-` before digits stops mentions and
 * issue references, and one after `:` in `://` and after `www` in `www.` stops bare-URL autolinks.
 * @example escapeMarkdown('a|b') // 'a\\|b'
 * @example escapeMarkdown('@team') // '@\u200Bteam'
 */
function escapeMarkdown(s, max = _clean_js__WEBPACK_IMPORTED_MODULE_0__/* .MAX_SHOWN_LENGTH */ ._) {
    return (0,_clean_js__WEBPACK_IMPORTED_MODULE_0__/* .cleanText */ .X)(s, max)
        .replace(/&/g, '&amp;')
        .replace(/</g, '&lt;')
        .replace(/>/g, '&gt;')
        .replace(/@/g, `@${ZWSP}`)
        .replace(/#(?=\d)/g, `#${ZWSP}`)
        .replace(/\b(GH)-(?=\d)/gi, `$1${ZWSP}-`)
        .replace(/:\/\//g, `:${ZWSP}//`)
        .replace(/\b(www)\./gi, `$1${ZWSP}.`)
        .replace(MARKDOWN_SPECIAL, (c) => `\\${c}`);
}
/**
 * Escape text for HTML element content and quoted attribute values: `& < > " '` become entities,
 * after cleanText removed controls and bidi overrides (no length cap unless `max` is given).
 * @example escapeHtml('<img src=x onerror=alert(1)>') // '&lt;img src=x onerror=alert(1)&gt;'
 */
function escapeHtml(s, max = Number.POSITIVE_INFINITY) {
    return (0,_clean_js__WEBPACK_IMPORTED_MODULE_0__/* .cleanText */ .X)(s, max)
        .replace(/&/g, '&amp;')
        .replace(/</g, '&lt;')
        .replace(/>/g, '&gt;')
        .replace(/"/g, '&quot;')
        .replace(/'/g, '&#39;');
}


/***/ }),

/***/ 12011:
/***/ ((__unused_webpack_module, __webpack_exports__, __webpack_require__) => {

/* harmony export */ __webpack_require__.d(__webpack_exports__, {
/* harmony export */   Fl: () => (/* binding */ formatValue),
/* harmony export */   Hx: () => (/* binding */ formatSigma),
/* harmony export */   ZV: () => (/* binding */ formatNumber),
/* harmony export */   a7: () => (/* binding */ formatDensity),
/* harmony export */   e5: () => (/* binding */ NOT_AVAILABLE),
/* harmony export */   eD: () => (/* binding */ formatChange),
/* harmony export */   mM: () => (/* binding */ formatAgainstCutoff)
/* harmony export */ });
/**
 * Number formatting shared by every renderer. Pure and locale-free (CI logs and PR comments are
 * read everywhere; a decimal comma would break copy-paste into other tools). Non-finite numbers
 * print as "n/a", never "NaN".
 */
const NOT_AVAILABLE = 'n/a';
/**
 * A value with `digits` significant digits, but never rounding away integer digits (40211 stays
 * 40211) and switching to exponent form outside [1e-3, 1e9).
 * @example formatNumber(412.5) // '412.5'
 * @example formatNumber(0.000012345) // '1.235e-5'
 */
function formatNumber(x, digits = 4) {
    if (x === undefined || !Number.isFinite(x))
        return NOT_AVAILABLE;
    if (x === 0)
        return '0';
    const abs = Math.abs(x);
    if (abs < 1e-3 || abs >= 1e9)
        return x.toExponential(digits - 1).replace(/\.?0+e/, 'e').replace('e+', 'e');
    if (abs >= 10 ** digits)
        return String(Math.round(x));
    return String(Number(x.toPrecision(digits)));
}
/** A value with its unit ("412.5 ns"); the unit must already be escaped for the target format. */
function formatValue(x, unit) {
    const n = formatNumber(x);
    return unit && n !== NOT_AVAILABLE ? `${n} ${unit}` : n;
}
/**
 * A relative change as a signed percentage with two significant digits below 10%.
 * @example formatChange(0.217) // '+21.7%'
 * @example formatChange(-0.0042) // '-0.42%'
 */
function formatChange(change) {
    if (change === undefined || !Number.isFinite(change))
        return NOT_AVAILABLE;
    // A change near the largest double would overflow to Infinity when turned into percent.
    const pct = Math.max(-Number.MAX_VALUE, Math.min(Number.MAX_VALUE, change * 100));
    const abs = Math.abs(pct);
    const body = abs === 0 ? '0' : abs >= 1e6 ? formatNumber(abs, 3) : abs >= 10 ? abs.toFixed(1) : abs >= 1 ? abs.toFixed(2) : formatNumber(abs, 2);
    return `${pct > 0 ? '+' : pct < 0 ? '-' : '±'}${body}%`;
}
/** How many standard deviations from the baseline mean, signed. @example formatSigma(4.12) // '+4.1 sd' */
function formatSigma(z) {
    if (z === undefined || !Number.isFinite(z))
        return NOT_AVAILABLE;
    const r = Math.abs(z) >= 100 ? Math.round(z).toString() : z.toFixed(1);
    return `${z >= 0 ? '+' : ''}${r === '-0.0' ? '0.0' : r} sd`;
}
/**
 * A relative density (in (0, 1]): two significant digits, in scientific notation below 0.001
 * where a decimal would be all zeros.
 * @example formatDensity(2.6e-7) // '2.6e-7'
 * @example formatDensity(0.0342) // '0.034'
 */
function formatDensity(r) {
    if (r === undefined || !Number.isFinite(r))
        return NOT_AVAILABLE;
    if (r === 0)
        return '0';
    if (r >= 1e-3)
        return formatNumber(r, 2);
    return r.toExponential(1).replace('e+', 'e');
}
/** "2.6e-7 < 0.01": the relative density against the cutoff, the comparison the gate made. */
function formatAgainstCutoff(r, cutoff) {
    if (r === undefined || !Number.isFinite(r))
        return NOT_AVAILABLE;
    return `${formatDensity(r)} ${r < cutoff ? '<' : '≥'} ${formatDensity(cutoff)}`;
}


/***/ }),

/***/ 16934:
/***/ ((__unused_webpack_module, __webpack_exports__, __webpack_require__) => {

/* harmony export */ __webpack_require__.d(__webpack_exports__, {
/* harmony export */   Tx: () => (/* binding */ statusRank),
/* harmony export */   id: () => (/* binding */ STATUS_GLYPH),
/* harmony export */   pB: () => (/* binding */ VERDICT_HEADLINE),
/* harmony export */   rc: () => (/* binding */ statusCounts)
/* harmony export */ });
/* unused harmony export STATUS_ORDER */
/**
 * Order in which statuses are shown: what needs attention first. Also the default sort of every
 * table, so a reviewer sees regressions without scrolling.
 */
const STATUS_ORDER = ['regressed', 'improved', 'missing', 'ok', 'learning', 'new', 'ignored'];
/** Rank of a status in STATUS_ORDER (unknown statuses last). */
function statusRank(s) {
    const i = STATUS_ORDER.indexOf(s);
    return i < 0 ? STATUS_ORDER.length : i;
}
/**
 * A shape per status, so colour is never the only carrier (WCAG 1.4.1): triangles point the way the
 * metric moved against its baseline, a hollow circle for still learning.
 */
const STATUS_GLYPH = {
    regressed: '▲',
    improved: '▼',
    missing: '✕',
    ok: '●',
    learning: '◌',
    new: '✚',
    ignored: '–',
};
/** What each verdict means, in a sentence that follows the verdict word in every headline. */
const VERDICT_HEADLINE = {
    pass: 'no metric regressed',
    regressed: 'at least one metric fell in the improbable tail on its worse side',
    learning: 'no metric has enough baseline runs yet',
    accepted: 'regressions found, accepted by the pull request label',
};
/** Count of metrics per status, in STATUS_ORDER, omitting zeros. @example "2 regressed, 40 ok" */
function statusCounts(statuses) {
    const counts = new Map();
    for (const s of statuses)
        counts.set(s, (counts.get(s) ?? 0) + 1);
    return STATUS_ORDER.filter((s) => counts.has(s))
        .map((s) => `${counts.get(s)} ${s}`)
        .join(', ');
}


/***/ })

};
