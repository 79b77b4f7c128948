export const id = 199;
export const ids = [199];
export const modules = {

/***/ 43199:
/***/ ((__unused_webpack_module, __webpack_exports__, __webpack_require__) => {

// ESM COMPAT FLAG
__webpack_require__.r(__webpack_exports__);

// EXPORTS
__webpack_require__.d(__webpack_exports__, {
  createOctokitApi: () => (/* binding */ createOctokitApi)
});

// EXTERNAL MODULE: ./src/history/artifact-store.ts + 1 modules
var artifact_store = __webpack_require__(40658);
// EXTERNAL MODULE: ./src/github/api.ts
var api = __webpack_require__(28943);
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
var branch_api = __webpack_require__(75939);
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
    const [{ getProxyUrl }, undici] = await Promise.all([Promise.resolve(/* import() */).then(__webpack_require__.bind(__webpack_require__, 19783)), Promise.resolve(/* import() */).then(__webpack_require__.t.bind(__webpack_require__, 46752, 19))]);
    const send = undici.fetch;
    if (getProxyUrl(new URL(baseUrl)) === undefined)
        return send;
    const { HttpClient } = await Promise.resolve(/* import() */).then(__webpack_require__.bind(__webpack_require__, 22779));
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
    const tuning = target.retry ?? api/* DEFAULT_RETRY */.v;
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
        __webpack_require__.e(/* import() */ 561).then(__webpack_require__.bind(__webpack_require__, 15561)),
        Promise.all(/* import() */[__webpack_require__.e(251), __webpack_require__.e(735)]).then(__webpack_require__.bind(__webpack_require__, 49735)),
        Promise.all(/* import() */[__webpack_require__.e(251), __webpack_require__.e(856)]).then(__webpack_require__.bind(__webpack_require__, 86856)),
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
                const status = (0,api/* statusOf */.c)(error);
                if (status === 404 || status === 410)
                    throw new artifact_store.ArtifactGoneError(`artifact #${id} answered ${status}`);
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
                const status = (0,api/* statusOf */.c)(error);
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


/***/ })

};
