export const id = 774;
export const ids = [774];
export const modules = {

/***/ 4034:
/***/ ((__unused_webpack_module, __webpack_exports__, __webpack_require__) => {

/* harmony export */ __webpack_require__.d(__webpack_exports__, {
/* harmony export */   n: () => (/* binding */ readUserText)
/* harmony export */ });
/* unused harmony export MAX_TEXT_BYTES */
/* harmony import */ var node_fs_promises__WEBPACK_IMPORTED_MODULE_0__ = __webpack_require__(1455);
/* harmony import */ var node_fs_promises__WEBPACK_IMPORTED_MODULE_0___default = /*#__PURE__*/__webpack_require__.n(node_fs_promises__WEBPACK_IMPORTED_MODULE_0__);
/* harmony import */ var _model_input_error_js__WEBPACK_IMPORTED_MODULE_1__ = __webpack_require__(8250);


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

/***/ 3774:
/***/ ((__unused_webpack_module, __webpack_exports__, __webpack_require__) => {

// ESM COMPAT FLAG
__webpack_require__.r(__webpack_exports__);

// EXPORTS
__webpack_require__.d(__webpack_exports__, {
  runVerify: () => (/* binding */ runVerify)
});

// EXTERNAL MODULE: ./src/model/input-error.ts
var input_error = __webpack_require__(8250);
// EXTERNAL MODULE: ./src/history/document.ts + 3 modules
var history_document = __webpack_require__(3557);
// EXTERNAL MODULE: ./src/history/json-text.ts
var json_text = __webpack_require__(7670);
// EXTERNAL MODULE: ./src/history/problems.ts
var history_problems = __webpack_require__(7326);
// EXTERNAL MODULE: ./src/history/iso-time.ts
var iso_time = __webpack_require__(1459);
// EXTERNAL MODULE: ./src/history/import-run.ts
var import_run = __webpack_require__(2567);
;// CONCATENATED MODULE: ./src/history/verify.ts






/**
 * Checks the integrity of a history document without throwing, for `bellgate verify` (exit 0
 * when the list is empty, 2 otherwise). Finds: malformed JSON ("line:col"), a missing, unknown or
 * newer version, wrong types, duplicated run ids, duplicated metric names, non-finite values,
 * ragged columns, unreadable times, runs out of time order and metric names every metric reader
 * would refuse (control or bidirectional-override characters, over 512 characters) — each located by a JSON path in
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
        // A hand-edited or imported history may hold names no reader lets in; the renderers clean
        // them, but the document should be mended.
        [...history.columns.keys()].forEach((name, i) => {
            const problem = (0,import_run/* nameProblem */.rH)(name);
            if (problem)
                sink(v1 ? 'runs[].values' : `metrics.names[${i}]`, problem);
        });
    }
    finish();
    return problems;
}

// EXTERNAL MODULE: ./src/model/visible-text.ts
var visible_text = __webpack_require__(2639);
// EXTERNAL MODULE: ./src/cli/exit-codes.ts
var exit_codes = __webpack_require__(8551);
// EXTERNAL MODULE: ./src/cli/paths.ts
var paths = __webpack_require__(5450);
// EXTERNAL MODULE: ./src/cli/read-text.ts
var read_text = __webpack_require__(4034);
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

/***/ 2567:
/***/ ((__unused_webpack_module, __webpack_exports__, __webpack_require__) => {

/* harmony export */ __webpack_require__.d(__webpack_exports__, {
/* harmony export */   IK: () => (/* binding */ valueFrom),
/* harmony export */   gc: () => (/* binding */ runInfoFrom),
/* harmony export */   rH: () => (/* binding */ nameProblem)
/* harmony export */ });
/* harmony import */ var _inputs_names_js__WEBPACK_IMPORTED_MODULE_0__ = __webpack_require__(5585);
/* harmony import */ var _model_input_error_js__WEBPACK_IMPORTED_MODULE_1__ = __webpack_require__(8250);
/* harmony import */ var _iso_time_js__WEBPACK_IMPORTED_MODULE_2__ = __webpack_require__(1459);



/**
 * Builds the RunInfo of an imported run from its raw fields, or says why it cannot be imported:
 * an id is required (a string, or a whole number such as a CI run id); a time is required and
 * must be ISO-8601 (stored normalised to UTC, since import order is time order); sha, ref and
 * event are optional strings. Returns the reason as a string when the run must be skipped.
 *
 * @example runInfoFrom({ id: 81, time: '2026-03-01 10:00' }) // { id: '81', time: '2026-03-01T10:00:00.000Z' }
 */
function runInfoFrom(fields) {
    const { id, time } = fields;
    let runId;
    if (typeof id === 'string' && id.trim() !== '')
        runId = id.trim();
    else if (typeof id === 'number' && Number.isSafeInteger(id))
        runId = String(id);
    else
        return 'no id: every run needs a non-empty "id" (the CI run id and attempt, e.g. 1234-1)';
    if (time === undefined || time === null || time === '')
        return `run ${JSON.stringify(runId)} has no time: imported runs are ordered by time`;
    const iso = typeof time === 'string' ? (0,_iso_time_js__WEBPACK_IMPORTED_MODULE_2__/* .normalizeIsoTime */ .U)(time) : undefined;
    if (iso === undefined)
        return `run ${JSON.stringify(runId)} has a bad time ${JSON.stringify(time)}: write ISO-8601, e.g. 2026-03-01T10:00:00Z`;
    const info = { id: runId, time: iso };
    for (const field of ['sha', 'ref', 'event']) {
        const text = fields[field];
        if (text === undefined || text === null || text === '')
            continue;
        if (typeof text !== 'string')
            return `run ${JSON.stringify(runId)}: ${field} must be a string`;
        info[field] = text;
    }
    return info;
}
/**
 * The reason a metric name cannot be imported, or undefined: the same rule as every metric file
 * reader (checkMetricName: not blank, at most 512 characters, no control or bidi characters), so a
 * name refused in a metric file cannot enter the history through an import instead.
 * @example nameProblem('a\u202Eb') // 'metric name "a\u202Eb" contains a bidirectional override character (U+202E)'
 */
function nameProblem(name) {
    try {
        (0,_inputs_names_js__WEBPACK_IMPORTED_MODULE_0__/* .checkMetricName */ .WO)(name);
        return undefined;
    }
    catch (error) {
        if (error instanceof _model_input_error_js__WEBPACK_IMPORTED_MODULE_1__/* .InputError */ .d)
            return error.message;
        throw error;
    }
}
/**
 * Reads one metric value: a finite JSON number, or decimal text when `text` is allowed (CSV
 * cells). Returns the reason when it is not one — "NaN", "Infinity", 1e999, hex and empty text
 * are all refused; in JSON a quoted number is refused too, since the writer meant something else.
 *
 * @example valueFrom('1.5e3', true) // 1500
 */
function valueFrom(raw, text = false) {
    let v;
    if (typeof raw === 'number')
        v = raw;
    else if (typeof raw === 'string' && text && /^[+-]?(\d+\.?\d*|\.\d+)(e[+-]?\d+)?$/i.test(raw.trim()))
        v = Number(raw.trim());
    else if (typeof raw === 'string' && !text)
        return `value ${JSON.stringify(raw)} is text, not a number`;
    else
        return `value ${JSON.stringify(raw) ?? String(raw)} is not a number`;
    return Number.isFinite(v) ? v : `value ${String(raw)} is not a finite number`;
}


/***/ }),

/***/ 1459:
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


/***/ }),

/***/ 5585:
/***/ ((__unused_webpack_module, __webpack_exports__, __webpack_require__) => {

/* harmony export */ __webpack_require__.d(__webpack_exports__, {
/* harmony export */   WO: () => (/* binding */ checkMetricName),
/* harmony export */   lg: () => (/* binding */ checkUnit)
/* harmony export */ });
/* unused harmony exports MAX_NAME_LENGTH, MAX_UNIT_LENGTH */
/* harmony import */ var _model_input_error_js__WEBPACK_IMPORTED_MODULE_0__ = __webpack_require__(8250);

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


/***/ })

};
