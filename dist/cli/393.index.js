export const id = 393;
export const ids = [393];
export const modules = {

/***/ 94034:
/***/ ((__unused_webpack_module, __webpack_exports__, __webpack_require__) => {

/* harmony export */ __webpack_require__.d(__webpack_exports__, {
/* harmony export */   n: () => (/* binding */ readUserText)
/* harmony export */ });
/* unused harmony export MAX_TEXT_BYTES */
/* harmony import */ var node_fs_promises__WEBPACK_IMPORTED_MODULE_0__ = __webpack_require__(51455);
/* harmony import */ var node_fs_promises__WEBPACK_IMPORTED_MODULE_0___default = /*#__PURE__*/__webpack_require__.n(node_fs_promises__WEBPACK_IMPORTED_MODULE_0__);
/* harmony import */ var _model_input_error_js__WEBPACK_IMPORTED_MODULE_1__ = __webpack_require__(38250);


/** Files the CLI reads whole (history, import runs) are refused above this size (256 MiB). */
const MAX_TEXT_BYTES = 256 * 1024 * 1024;
/**
 * Reads a whole UTF-8 text file the user named, with errors that say which flag and file.
 * @throws InputError when the file is missing, a folder, unreadable or too large.
 */
async function readUserText(path, flag) {
    let size;
    try {
        const info = await (0,node_fs_promises__WEBPACK_IMPORTED_MODULE_0__.stat)(path);
        if (info.isDirectory())
            throw new _model_input_error_js__WEBPACK_IMPORTED_MODULE_1__/* .InputError */ .d(`${flag} ${path} is a folder, not a file`, { where: path, fix: `name a file with ${flag}` });
        size = info.size;
    }
    catch (error) {
        if (error instanceof _model_input_error_js__WEBPACK_IMPORTED_MODULE_1__/* .InputError */ .d)
            throw error;
        throw new _model_input_error_js__WEBPACK_IMPORTED_MODULE_1__/* .InputError */ .d(`cannot read ${flag} ${path}: ${reason(error)}`, { where: path, fix: `check the path given to ${flag}`, cause: error });
    }
    if (size > MAX_TEXT_BYTES) {
        throw new _model_input_error_js__WEBPACK_IMPORTED_MODULE_1__/* .InputError */ .d(`${flag} ${path} is ${size} bytes, over the ${MAX_TEXT_BYTES}-byte limit`, {
            where: path,
            fix: 'split the file, or trim old runs first',
        });
    }
    try {
        return await (0,node_fs_promises__WEBPACK_IMPORTED_MODULE_0__.readFile)(path, 'utf8');
    }
    catch (error) {
        throw new _model_input_error_js__WEBPACK_IMPORTED_MODULE_1__/* .InputError */ .d(`cannot read ${flag} ${path}: ${reason(error)}`, { where: path, fix: `check the path given to ${flag}`, cause: error });
    }
}
function reason(error) {
    const code = error.code;
    if (code === 'ENOENT')
        return 'no such file';
    if (code === 'EACCES' || code === 'EPERM')
        return 'permission denied';
    return error instanceof Error ? error.message : String(error);
}


/***/ }),

/***/ 63774:
/***/ ((__unused_webpack_module, __webpack_exports__, __webpack_require__) => {

// ESM COMPAT FLAG
__webpack_require__.r(__webpack_exports__);

// EXPORTS
__webpack_require__.d(__webpack_exports__, {
  runVerify: () => (/* binding */ runVerify)
});

// EXTERNAL MODULE: ./src/model/input-error.ts
var input_error = __webpack_require__(38250);
// EXTERNAL MODULE: ./src/history/document.ts + 2 modules
var history_document = __webpack_require__(85050);
// EXTERNAL MODULE: ./src/history/json-text.ts
var json_text = __webpack_require__(77670);
// EXTERNAL MODULE: ./src/history/problems.ts
var history_problems = __webpack_require__(17326);
// EXTERNAL MODULE: ./src/history/iso-time.ts
var iso_time = __webpack_require__(51459);
;// CONCATENATED MODULE: ./src/history/verify.ts





/**
 * Checks the integrity of a history document without throwing, for `bellgate verify` (exit 0
 * when the list is empty, 2 otherwise). Finds: malformed JSON ("line:col"), a missing, unknown or
 * newer version, wrong types, duplicated run ids, duplicated metric names, non-finite values,
 * ragged columns, unreadable times and runs out of time order — each located by a JSON path in
 * the document's own layout ("metrics.values[3][17]", "runs[4].values[\"build/compile\"]").
 * At most 200 problems are listed, then a count of the rest.
 *
 * @example verifyHistory('{"schema":"bellgate.history/9"}', 'h.json')
 * // [{ where: 'schema', problem: 'the history was written by a newer Bellgate (...)' }]
 */
function verifyHistory(text, source) {
    const problems = [];
    let root;
    try {
        root = (0,json_text/* parseJsonText */.lk)(text, source);
    }
    catch (error) {
        if (!(error instanceof input_error/* InputError */.d))
            throw error;
        const where = error.where?.startsWith(`${source}:`) ? error.where.slice(source.length + 1) : (error.where ?? '');
        return [{ where, problem: error.message }];
    }
    const { sink, finish } = (0,history_problems/* collectingSink */.wN)(problems);
    const history = (0,history_document/* decodeHistoryDocument */.q0)(root, sink);
    if (history) {
        const v1 = (0,history_problems/* isObject */.Gv)(root) && root.schema === history_document/* HISTORY_SCHEMA_V1 */.Z_;
        const timePath = (i) => (v1 ? `runs[${i}].time` : `runs.time[${i}]`);
        let previous = -Infinity;
        let previousIndex = -1;
        history.runs.forEach((run, i) => {
            if (run.time === undefined)
                return;
            const ms = (0,iso_time/* parseIsoTime */.s)(run.time);
            if (ms === undefined) {
                sink(timePath(i), `time ${JSON.stringify(run.time)} is not an ISO-8601 date-time`);
                return;
            }
            if (ms < previous) {
                sink(timePath(i), `run ${JSON.stringify(run.id)} (${run.time}) is older than the run before it (runs are stored oldest first; see ${timePath(previousIndex)})`);
            }
            else {
                previous = ms;
                previousIndex = i;
            }
        });
    }
    finish();
    return problems;
}

// EXTERNAL MODULE: ./src/model/visible-text.ts
var visible_text = __webpack_require__(22639);
// EXTERNAL MODULE: ./src/cli/exit-codes.ts
var exit_codes = __webpack_require__(28551);
// EXTERNAL MODULE: ./src/cli/paths.ts
var paths = __webpack_require__(45450);
// EXTERNAL MODULE: ./src/cli/read-text.ts
var read_text = __webpack_require__(94034);
;// CONCATENATED MODULE: ./src/cli/run/verify.ts





/**
 * The work of `bellgate verify` (loaded only when that command runs): lists the history file's
 * problems on stdout and sets exit 2 when there are any.
 * @throws InputError when the file cannot be read.
 * @example await runVerify(ctx, { history: '.bellgate/history.json' })
 */
async function runVerify(ctx, options) {
    const text = await (0,read_text/* readUserText */.n)((0,paths/* resolvePath */.o)(ctx, options.history), '--history');
    const problems = verifyHistory(text, options.history);
    if (problems.length === 0) {
        ctx.io.stdout(`${options.history}: no problems found\n`);
        return;
    }
    // Problems quote metric names from the file: no control or bidi character reaches the terminal.
    for (const p of problems)
        ctx.io.stdout((0,visible_text/* visibleText */.Q)(`${options.history}: ${p.where}: ${p.problem}`) + '\n');
    ctx.io.stderr(`bellgate: ${problems.length} problem${problems.length === 1 ? '' : 's'} in ${options.history}\n`);
    ctx.exitCode = exit_codes/* EXIT */.d.input;
}


/***/ }),

/***/ 51459:
/***/ ((__unused_webpack_module, __webpack_exports__, __webpack_require__) => {

/* harmony export */ __webpack_require__.d(__webpack_exports__, {
/* harmony export */   U: () => (/* binding */ normalizeIsoTime),
/* harmony export */   s: () => (/* binding */ parseIsoTime)
/* harmony export */ });
/**
 * Reads an ISO-8601 date or date-time ("2026-03-01", "2026-03-01T10:00:00.5+02:00",
 * "2026-03-01 10:00Z") as milliseconds since 1970 UTC. A time without an offset is taken as UTC,
 * so the answer never depends on the machine's time zone. Returns undefined for anything else,
 * including impossible dates such as 2026-02-30 (Date.parse would roll those over silently).
 *
 * @example parseIsoTime('2026-03-01T10:00:00+01:00') // 1772355600000 (09:00 UTC)
 */
function parseIsoTime(text) {
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


/***/ })

};
