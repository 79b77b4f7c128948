export const id = 158;
export const ids = [158];
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

/***/ 6158:
/***/ ((__unused_webpack_module, __webpack_exports__, __webpack_require__) => {

// ESM COMPAT FLAG
__webpack_require__.r(__webpack_exports__);

// EXPORTS
__webpack_require__.d(__webpack_exports__, {
  runImport: () => (/* binding */ runImport)
});

// EXTERNAL MODULE: ./src/model/input-error.ts
var input_error = __webpack_require__(8250);
// EXTERNAL MODULE: ./node_modules/csv-parse/lib/sync.js + 8 modules
var sync = __webpack_require__(712);
// EXTERNAL MODULE: ./src/history/import-run.ts
var import_run = __webpack_require__(2567);
;// CONCATENATED MODULE: ./src/history/import-csv.ts



const RUN_COLUMNS = ['id', 'time', 'sha', 'ref', 'event'];
const RUN_SET = new Set(RUN_COLUMNS);
const LONG_COLUMNS = new Set([...RUN_COLUMNS, 'name', 'value', 'unit']);
/**
 * Reads past runs from CSV with a header row, in either of two layouts:
 * - long, one row per run and metric: `id,time,sha,ref,name,value[,unit]` (rows of one id join);
 * - wide, one row per run: `id,time,sha,ref,<metric>,<metric>...`; a header `name [unit]` gives
 *   the unit, an empty cell means the run lacks that metric.
 * The layout is long when the header has `name` and `value` and nothing but run columns and
 * `unit` besides. Run columns (id, time, sha, ref, event) are matched ignoring case; id and time
 * are required. Bad rows and values are skipped with "source:line" and a reason.
 * Throws InputError for a file that is not CSV, has no header, or lacks id/time columns.
 *
 * @example parseCsvRuns('id,time,build\n81,2026-03-01,12.5\n', 'runs.csv').runs[0]?.metrics // Map { build => 12.5 }
 */
function parseCsvRuns(text, source) {
    let rows;
    try {
        rows = (0,sync/* parse */.q)(text, { bom: true, skip_empty_lines: true, trim: true, relax_column_count: true, info: true });
    }
    catch (cause) {
        const line = cause.lines;
        throw new input_error/* InputError */.d(`not valid CSV (${cause instanceof Error ? cause.message : String(cause)})`, {
            where: line === undefined ? source : `${source}:${line}`,
            fix: 'check the quoting at that line',
            cause,
        });
    }
    const [head, ...body] = rows;
    if (!head)
        throw new input_error/* InputError */.d('the file holds no rows', { where: source, fix: 'write a header row and one row per run' });
    const header = head.record.map((h) => (LONG_COLUMNS.has(h.toLowerCase()) ? h.toLowerCase() : h));
    const seen = new Set();
    for (const h of header) {
        if (h === '')
            throw new input_error/* InputError */.d('a header cell is empty', { where: `${source}:${head.info.lines}`, fix: 'name every column' });
        if (seen.has(h))
            throw new input_error/* InputError */.d(`column ${JSON.stringify(h)} appears twice in the header`, { where: `${source}:${head.info.lines}`, fix: 'name every column once' });
        seen.add(h);
    }
    for (const need of ['id', 'time']) {
        if (!seen.has(need)) {
            throw new input_error/* InputError */.d(`the header has no "${need}" column`, {
                where: `${source}:${head.info.lines}`,
                fix: 'start the file with a header such as id,time,sha,ref,name,value,unit (long) or id,time,sha,ref,<metric>... (wide)',
            });
        }
    }
    const long = seen.has('name') && seen.has('value') && header.every((h) => LONG_COLUMNS.has(h));
    const result = { runs: [], skipped: [] };
    const byId = new Map();
    for (const { record, info } of body) {
        const where = `${source}:${info.lines}`;
        const skip = (reason) => void result.skipped.push({ where, reason });
        if (record.length !== header.length) {
            skip(`the row has ${record.length} cells for ${header.length} columns`);
            continue;
        }
        const cell = new Map(header.map((h, i) => [h, record[i] ?? '']));
        const runInfo = (0,import_run/* runInfoFrom */.gc)(Object.fromEntries(RUN_COLUMNS.map((c) => [c, cell.get(c)])));
        if (typeof runInfo === 'string') {
            skip(runInfo);
            continue;
        }
        let run = byId.get(runInfo.id);
        if (run && run.info.time !== runInfo.time) {
            skip(`run ${JSON.stringify(runInfo.id)} has time ${runInfo.time} here but ${run.info.time} on an earlier row`);
            continue;
        }
        if (!run) {
            run = { info: runInfo, metrics: new Map(), units: new Map() };
            byId.set(runInfo.id, run);
        }
        const target = run;
        const add = (name, raw, unit) => {
            const badName = (0,import_run/* nameProblem */.rH)(name);
            if (badName !== undefined)
                return skip(badName);
            const value = (0,import_run/* valueFrom */.IK)(raw, true);
            if (typeof value === 'string')
                return skip(`metric ${JSON.stringify(name)}: ${value}`);
            if (target.metrics.has(name))
                skip(`metric ${JSON.stringify(name)} of run ${JSON.stringify(target.info.id)} was given before; this row's value is kept`);
            target.metrics.set(name, value);
            if (unit)
                target.units.set(name, unit);
        };
        if (long) {
            const name = cell.get('name') ?? '';
            if (name === '')
                skip('a row needs a metric name');
            else
                add(name, cell.get('value') ?? '', cell.get('unit'));
        }
        else {
            header.forEach((h, i) => {
                const raw = record[i] ?? '';
                if (RUN_SET.has(h) || raw === '')
                    return;
                // Metric names keep their case; only run columns were matched ignoring it.
                const title = head.record[i] ?? h;
                const named = /^(.*\S)\s*\[([^\]]+)\]$/.exec(title);
                add(named?.[1] ?? title, raw, named?.[2]);
            });
        }
    }
    for (const run of byId.values()) {
        if (run.metrics.size > 0)
            result.runs.push(run);
        else
            result.skipped.push({ where: source, reason: `run ${JSON.stringify(run.info.id)} has no metric values` });
    }
    return result;
}

// EXTERNAL MODULE: ./src/history/problems.ts
var problems = __webpack_require__(7326);
;// CONCATENATED MODULE: ./src/history/import-jsonl.ts


/**
 * Reads past runs written as JSON Lines, one run a line:
 *   {"id": "81-1", "time": "2026-03-01T10:00:00Z", "sha": "4f1c", "ref": "refs/heads/main",
 *    "metrics": {"build/compile": 12.5}, "units": {"build/compile": "s"}}
 * or with "metrics": [{"name": "build/compile", "value": 12.5, "unit": "s"}].
 * A bad line (not JSON, no id, bad time) is skipped whole; a bad value is skipped alone; a run
 * id seen again replaces the earlier line (both noted). Locations are "source:line".
 *
 * @example parseJsonLines('{"id":"1","time":"2026-03-01","metrics":{"a":1}}', 'runs.jsonl').runs.length // 1
 */
function parseJsonLines(text, source) {
    const result = { runs: [], skipped: [] };
    const lineOf = new Map();
    const lines = text.split(/\r?\n/);
    lines.forEach((line, i) => {
        if (line.trim() === '')
            return;
        const where = `${source}:${i + 1}`;
        const skip = (reason) => void result.skipped.push({ where, reason });
        let entry;
        try {
            entry = JSON.parse(line);
        }
        catch (error) {
            skip(`not valid JSON (${error instanceof Error ? error.message.replace(/, ".*" is not valid JSON$/s, '') : 'syntax error'})`);
            return;
        }
        if (!(0,problems/* isObject */.Gv)(entry))
            return skip(`a run must be a JSON object, found ${(0,problems/* typeName */.go)(entry)}`);
        const info = (0,import_run/* runInfoFrom */.gc)(entry);
        if (typeof info === 'string')
            return skip(info);
        const run = { info, metrics: new Map(), units: new Map() };
        const units = (0,problems/* isObject */.Gv)(entry.units) ? entry.units : {};
        const add = (name, raw, unit) => {
            if (typeof name !== 'string' || name === '')
                return skip(`a metric needs a non-empty "name"`);
            const badName = (0,import_run/* nameProblem */.rH)(name);
            if (badName !== undefined)
                return skip(badName);
            const value = (0,import_run/* valueFrom */.IK)(raw);
            if (typeof value === 'string')
                return skip(`metric ${JSON.stringify(name)}: ${value}`);
            run.metrics.set(name, value);
            if (typeof unit === 'string' && unit !== '')
                run.units.set(name, unit);
        };
        const { metrics } = entry;
        if (Array.isArray(metrics)) {
            for (const m of metrics) {
                if ((0,problems/* isObject */.Gv)(m))
                    add(m.name, m.value, m.unit);
                else
                    skip(`a metric entry must be an object {"name", "value", "unit"}, found ${(0,problems/* typeName */.go)(m)}`);
            }
        }
        else if ((0,problems/* isObject */.Gv)(metrics)) {
            for (const name of Object.keys(metrics))
                add(name, metrics[name], Object.hasOwn(units, name) ? units[name] : undefined);
        }
        else
            return skip(`run ${JSON.stringify(info.id)}: "metrics" must be an object or an array, found ${(0,problems/* typeName */.go)(metrics)}`);
        if (run.metrics.size === 0)
            return skip(`run ${JSON.stringify(info.id)} has no metric values`);
        const earlier = lineOf.get(info.id);
        if (earlier !== undefined) {
            result.skipped.push({ where: `${source}:${earlier + 1}`, reason: `run ${JSON.stringify(info.id)} appears again on line ${i + 1}, which is kept` });
            result.runs = result.runs.filter((r) => r.info.id !== info.id);
        }
        lineOf.set(info.id, i);
        result.runs.push(run);
    });
    return result;
}

// EXTERNAL MODULE: ./src/history/merge.ts + 2 modules
var merge = __webpack_require__(7822);
;// CONCATENATED MODULE: ./src/history/import.ts




/**
 * Parses bulk past results for `bellgate import`, choosing the form by content: text whose
 * first character is `{` is JSON Lines (see parseJsonLines), anything else is CSV with a header
 * (see parseCsvRuns). Pure. Throws InputError for an empty file, a JSON array, or CSV without
 * the id and time columns; smaller problems are listed in `skipped`.
 *
 * @example parseImportRuns('id,time,name,value\n81,2026-03-01,build,12.5\n', 'runs.csv').runs.length // 1
 */
function parseImportRuns(text, source) {
    const body = text.charCodeAt(0) === 0xfeff ? text.slice(1) : text;
    const first = body.trimStart()[0];
    if (first === undefined)
        throw new input_error/* InputError */.d('the file holds no runs', { where: source, fix: 'write one run per line (JSON Lines) or a CSV with a header' });
    if (first === '{')
        return parseJsonLines(body, source);
    if (first === '[') {
        throw new input_error/* InputError */.d('a JSON array is not an import form', { where: `${source}:1:1`, fix: 'write one run object per line (JSON Lines)' });
    }
    return parseCsvRuns(body, source);
}
/**
 * Merges imported runs into a history by run id: an id not yet stored is added, a stored id is
 * replaced by the imported copy (updated, or unchanged when identical). A run given twice: the
 * later one counts. Accepts the runs, or parseImportRuns' whole result (its skipped entries are
 * passed on). Runs that cannot be stored (no id, non-finite value) are skipped with a reason.
 * Pure; O((stored + imported) x metrics).
 *
 * @example importRuns(emptyHistory('s'), parseImportRuns(text, 'runs.jsonl')) // { history, added: 3, updated: 0, ... }
 */
function importRuns(h, input) {
    const list = Array.isArray(input) ? input : input.runs;
    const skipped = Array.isArray(input) ? [] : [...input.skipped];
    const byId = new Map();
    list.forEach((run, i) => {
        const bad = [...run.metrics].find(([, v]) => !Number.isFinite(v));
        if (typeof run.info?.id !== 'string' || run.info.id === '')
            skipped.push({ where: `run ${i + 1}`, reason: 'no id' });
        else if (bad)
            skipped.push({ where: `run ${run.info.id}`, reason: `metric ${JSON.stringify(bad[0])}: value ${bad[1]} is not a finite number` });
        else
            byId.set(run.info.id, run);
    });
    const incoming = [...byId.values()];
    const columns = new Map();
    incoming.forEach((run, r) => {
        for (const [name, value] of run.metrics) {
            let column = columns.get(name);
            if (!column) {
                column = { values: new Array(incoming.length).fill(NaN) };
                columns.set(name, column);
            }
            column.values[r] = value;
            const unit = run.units.get(name);
            if (unit !== undefined)
                column.unit = unit;
        }
    });
    const stored = new Map(h.runs.map((run, i) => [run.id, i]));
    let added = 0;
    let updated = 0;
    let unchanged = 0;
    for (const run of incoming) {
        const index = stored.get(run.info.id);
        if (index === undefined)
            added += 1;
        else if (sameRun(h, index, run))
            unchanged += 1;
        else
            updated += 1;
    }
    const history = (0,merge/* mergeHistories */.dk)(h, { series: h.series, runs: incoming.map((r) => ({ ...r.info })), columns });
    return { history, added, updated, unchanged, skipped };
}
function sameRun(h, index, run) {
    const old = h.runs[index];
    const fields = ['id', 'sha', 'ref', 'event', 'time'];
    if (fields.some((f) => old[f] !== run.info[f]))
        return false;
    for (const [name, column] of h.columns) {
        const before = column.values[index] ?? NaN;
        const now = run.metrics.get(name);
        if (now === undefined ? !Number.isNaN(before) : now !== before)
            return false;
    }
    return [...run.metrics.keys()].every((name) => h.columns.has(name));
}

// EXTERNAL MODULE: ./src/model/visible-text.ts
var visible_text = __webpack_require__(2639);
// EXTERNAL MODULE: ./src/cli/open-history.ts + 3 modules
var open_history = __webpack_require__(6952);
// EXTERNAL MODULE: ./src/cli/paths.ts
var paths = __webpack_require__(5450);
// EXTERNAL MODULE: ./src/cli/read-text.ts
var read_text = __webpack_require__(4034);
;// CONCATENATED MODULE: ./src/cli/run/import.ts





/** How many skipped rows are listed one by one before the rest are counted. */
const SHOWN_SKIPS = 20;
/**
 * The work of `bellgate import` (loaded only when that command runs): merges the past runs into
 * the history file by run id; rows that cannot be used are listed on stderr with place and reason.
 * @throws InputError (unreadable runs file), StoreError (history unreadable or unwritable).
 * @example await runImport(ctx, { history: 'h.json', runs: 'past-runs.jsonl', series: 'default' })
 */
async function runImport(ctx, options) {
    const runsPath = (0,paths/* resolvePath */.o)(ctx, options.runs);
    const text = await (0,read_text/* readUserText */.n)(runsPath, '--runs');
    const parsed = parseImportRuns(text, options.runs);
    const { history, store } = await (0,open_history/* openHistory */.j)(ctx, options.history, options.series);
    const result = importRuns(history, parsed);
    const skipped = result.skipped;
    // Reasons quote names from the file: no control or bidi character reaches the terminal.
    for (const skip of skipped.slice(0, SHOWN_SKIPS))
        ctx.io.stderr((0,visible_text/* visibleText */.Q)(`bellgate: skipped ${skip.where}: ${skip.reason}`) + '\n');
    if (skipped.length > SHOWN_SKIPS)
        ctx.io.stderr(`bellgate: ... and ${skipped.length - SHOWN_SKIPS} more skipped rows\n`);
    if (store)
        await store.save(result.history, history.runs.length);
    ctx.io.stdout(`imported ${options.runs}: ${result.added} runs added, ${result.updated} updated, ${result.unchanged} unchanged, ${skipped.length} skipped; ` +
        `${result.history.runs.length} runs in ${store?.describe() ?? options.history}\n`);
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


/***/ })

};
