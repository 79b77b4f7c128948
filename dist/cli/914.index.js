export const id = 914;
export const ids = [914];
export const modules = {

/***/ 6952:
/***/ ((__unused_webpack_module, __webpack_exports__, __webpack_require__) => {


// EXPORTS
__webpack_require__.d(__webpack_exports__, {
  j: () => (/* binding */ openHistory)
});

;// CONCATENATED MODULE: ./src/history/history.ts
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

// EXTERNAL MODULE: external "node:crypto"
var external_node_crypto_ = __webpack_require__(7598);
// EXTERNAL MODULE: external "node:fs/promises"
var promises_ = __webpack_require__(1455);
// EXTERNAL MODULE: external "node:path"
var external_node_path_ = __webpack_require__(6760);
// EXTERNAL MODULE: ./src/model/input-error.ts
var input_error = __webpack_require__(8250);
// EXTERNAL MODULE: ./src/history/document.ts + 3 modules
var history_document = __webpack_require__(3557);
// EXTERNAL MODULE: ./src/history/merge.ts + 2 modules
var merge = __webpack_require__(7822);
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
var store = __webpack_require__(4689);
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
                return emptyHistory(series);
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

// EXTERNAL MODULE: ./src/cli/paths.ts
var paths = __webpack_require__(5450);
;// CONCATENATED MODULE: ./src/cli/open-history.ts



/**
 * Loads the history of `series` from a file store (a missing file is an empty history), or starts
 * an empty one when no `--history` was given (every metric is then `new`).
 * @throws StoreError when the file exists but cannot be read or parsed (exit 3; never overwritten).
 */
async function openHistory(ctx, path, series) {
    if (path === undefined)
        return { history: emptyHistory(series) };
    const store = createFileStore((0,paths/* resolvePath */.o)(ctx, path), series);
    return { history: await store.load(), store };
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

/***/ 7822:
/***/ ((__unused_webpack_module, __webpack_exports__, __webpack_require__) => {


// EXPORTS
__webpack_require__.d(__webpack_exports__, {
  ah: () => (/* binding */ appendRun),
  WR: () => (/* binding */ concurrentRuns),
  UY: () => (/* binding */ healConcurrent),
  dk: () => (/* binding */ mergeHistories),
  lj: () => (/* binding */ trimHistory)
});

// EXTERNAL MODULE: ./src/model/input-error.ts
var input_error = __webpack_require__(8250);
// EXTERNAL MODULE: ./src/history/iso-time.ts
var iso_time = __webpack_require__(1459);
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
    return run.time === undefined ? -Infinity : (0,iso_time/* parseIsoTime */.s)(run.time) ?? -Infinity;
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
