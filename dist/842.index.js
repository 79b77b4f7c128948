export const id = 842;
export const ids = [842];
export const modules = {

/***/ 57842:
/***/ ((__unused_webpack_module, __webpack_exports__, __webpack_require__) => {

__webpack_require__.r(__webpack_exports__);
/* harmony export */ __webpack_require__.d(__webpack_exports__, {
/* harmony export */   parseCsvRuns: () => (/* binding */ parseCsvRuns)
/* harmony export */ });
/* harmony import */ var csv_parse_sync__WEBPACK_IMPORTED_MODULE_0__ = __webpack_require__(40712);
/* harmony import */ var _errors_input_error_js__WEBPACK_IMPORTED_MODULE_1__ = __webpack_require__(33712);
/* harmony import */ var _import_run_js__WEBPACK_IMPORTED_MODULE_2__ = __webpack_require__(12567);



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
        rows = (0,csv_parse_sync__WEBPACK_IMPORTED_MODULE_0__/* .parse */ .q)(text, {
            bom: true,
            skip_empty_lines: true,
            trim: true,
            relax_column_count: true,
            info: true,
        });
    }
    catch (cause) {
        const line = cause.lines;
        throw new _errors_input_error_js__WEBPACK_IMPORTED_MODULE_1__/* .InputError */ .dz(`not valid CSV (${cause instanceof Error ? cause.message : String(cause)})`, {
            where: line === undefined ? source : `${source}:${line}`,
            fix: 'check the quoting at that line',
            cause,
        });
    }
    const [head, ...body] = rows;
    if (!head)
        throw new _errors_input_error_js__WEBPACK_IMPORTED_MODULE_1__/* .InputError */ .dz('the file holds no rows', { where: source, fix: 'write a header row and one row per run' });
    const header = head.record.map((h) => (LONG_COLUMNS.has(h.toLowerCase()) ? h.toLowerCase() : h));
    const seen = new Set();
    for (const h of header) {
        if (h === '')
            throw new _errors_input_error_js__WEBPACK_IMPORTED_MODULE_1__/* .InputError */ .dz('a header cell is empty', {
                where: `${source}:${head.info.lines}`,
                fix: 'name every column',
            });
        if (seen.has(h))
            throw new _errors_input_error_js__WEBPACK_IMPORTED_MODULE_1__/* .InputError */ .dz(`column ${JSON.stringify(h)} appears twice in the header`, {
                where: `${source}:${head.info.lines}`,
                fix: 'name every column once',
            });
        seen.add(h);
    }
    for (const need of ['id', 'time']) {
        if (!seen.has(need)) {
            throw new _errors_input_error_js__WEBPACK_IMPORTED_MODULE_1__/* .InputError */ .dz(`the header has no "${need}" column`, {
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
        const runInfo = (0,_import_run_js__WEBPACK_IMPORTED_MODULE_2__/* .runInfoFrom */ .gc)(Object.fromEntries(RUN_COLUMNS.map((c) => [c, cell.get(c)])));
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
            run = { info: runInfo, metrics: new Map(), units: new Map(), places: new Map() };
            byId.set(runInfo.id, run);
        }
        const target = run;
        const add = (name, raw, unit) => {
            const badName = (0,_import_run_js__WEBPACK_IMPORTED_MODULE_2__/* .nameProblem */ .rH)(name);
            if (badName !== undefined)
                return skip(badName);
            const value = (0,_import_run_js__WEBPACK_IMPORTED_MODULE_2__/* .valueFrom */ .IK)(raw, true);
            if (typeof value === 'string')
                return skip(`metric ${JSON.stringify(name)}: ${value}`);
            if (target.metrics.has(name))
                skip(`metric ${JSON.stringify(name)} of run ${JSON.stringify(target.info.id)} was given before; this row's value is kept`);
            target.metrics.set(name, value);
            target.places?.set(name, where);
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


/***/ })

};
