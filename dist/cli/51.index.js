export const id = 51;
export const ids = [51];
export const modules = {

/***/ 850:
/***/ ((__unused_webpack_module, __webpack_exports__, __webpack_require__) => {

/* harmony export */ __webpack_require__.d(__webpack_exports__, {
/* harmony export */   Pl: () => (/* binding */ readNumbers),
/* harmony export */   hB: () => (/* binding */ readEntry),
/* harmony export */   kw: () => (/* binding */ describeJson),
/* harmony export */   u4: () => (/* binding */ isRecord)
/* harmony export */ });
/* harmony import */ var _model_input_error_js__WEBPACK_IMPORTED_MODULE_0__ = __webpack_require__(8250);

/** A plain object (not an array, not null). */
function isRecord(value) {
    return typeof value === 'object' && value !== null && !Array.isArray(value);
}
/**
 * Reads one list-form entry `{"name", "value" | "samples", "unit"?}` into the sink. Shared by the
 * own JSON form and JSON Lines. Unknown keys are ignored, so newer writers stay readable.
 * `place` is the cheap location stored with each reading; `where` finds the exact line:col and is
 * called only when there is an error to report.
 * @returns the metric name.
 * @throws InputError for a missing or empty name, a missing value, both value and samples, or
 *   values that are not finite numbers.
 */
function readEntry(entry, sink, place, where) {
    if (!isRecord(entry)) {
        throw new _model_input_error_js__WEBPACK_IMPORTED_MODULE_0__/* .InputError */ .d(`a metric entry must be an object, found ${describeJson(entry)}`, {
            where: where(),
            fix: 'write each metric as {"name": "...", "value": 1.5, "unit": "ms"}',
        });
    }
    const { name, value, samples, unit } = entry;
    if (typeof name !== 'string') {
        throw new _model_input_error_js__WEBPACK_IMPORTED_MODULE_0__/* .InputError */ .d(`metric entry has ${name === undefined ? 'no "name"' : `a "name" that is ${describeJson(name)}`}`, {
            where: where(),
            fix: 'give every entry a "name" string',
        });
    }
    if (unit !== undefined && typeof unit !== 'string') {
        throw new _model_input_error_js__WEBPACK_IMPORTED_MODULE_0__/* .InputError */ .d(`"unit" of ${JSON.stringify(name)} is ${describeJson(unit)}, not a string`, {
            where: where(),
            fix: 'write the unit as a string such as "ms" or "B", or leave it out',
        });
    }
    if (value !== undefined && samples !== undefined) {
        throw new _model_input_error_js__WEBPACK_IMPORTED_MODULE_0__/* .InputError */ .d(`metric ${JSON.stringify(name)} has both "value" and "samples"`, {
            where: where(),
            fix: 'give either one "value" or a "samples" array, not both',
        });
    }
    if (value === undefined && samples === undefined) {
        throw new _model_input_error_js__WEBPACK_IMPORTED_MODULE_0__/* .InputError */ .d(`metric ${JSON.stringify(name)} has neither "value" nor "samples"`, {
            where: where(),
            fix: 'add "value": <number> or "samples": [<number>, ...]',
        });
    }
    const values = value !== undefined ? [value] : samples;
    if (!Array.isArray(values) || values.length === 0) {
        throw new _model_input_error_js__WEBPACK_IMPORTED_MODULE_0__/* .InputError */ .d(`"samples" of ${JSON.stringify(name)} must be a non-empty array of numbers`, {
            where: where(),
            fix: 'write "samples": [<number>, ...] with at least one number',
        });
    }
    readNumbers(name, values, unit, sink, place, where);
    return name;
}
/** Adds each element of `values` as a sample; each must be a JSON number. */
function readNumbers(name, values, unit, sink, place, where) {
    for (const v of values) {
        if (typeof v !== 'number') {
            throw new _model_input_error_js__WEBPACK_IMPORTED_MODULE_0__/* .InputError */ .d(`value of ${JSON.stringify(name)} is ${describeJson(v)}, not a number`, {
                where: where(),
                fix: 'write values as JSON numbers (no quotes), such as 412.5',
            });
        }
        if (!Number.isFinite(v)) {
            // JSON.parse turns 1e999 into Infinity.
            throw new _model_input_error_js__WEBPACK_IMPORTED_MODULE_0__/* .InputError */ .d(`value of ${JSON.stringify(name)} overflows to ${v}`, { where: where(), fix: 'write a finite number' });
        }
        sink.add(name, v, unit, place);
    }
}
/** A short description of a JSON value for messages: `the string "12"`, `null`, `an object`. */
function describeJson(value) {
    if (value === null)
        return 'null';
    if (Array.isArray(value))
        return 'an array';
    if (typeof value === 'string')
        return `the string ${JSON.stringify(value.length > 40 ? `${value.slice(0, 40)}...` : value)}`;
    if (typeof value === 'object')
        return 'an object';
    return `${typeof value} ${String(value)}`;
}


/***/ }),

/***/ 7138:
/***/ ((__unused_webpack_module, __webpack_exports__, __webpack_require__) => {


// EXPORTS
__webpack_require__.d(__webpack_exports__, {
  lk: () => (/* binding */ parseJsonText),
  LF: () => (/* binding */ whereInJson)
});

// UNUSED EXPORTS: jsonValueOffset, locateJsonError

// EXTERNAL MODULE: ./src/model/input-error.ts
var input_error = __webpack_require__(8250);
;// CONCATENATED MODULE: ./src/inputs/position.ts
/**
 * 1-based line and column of a UTF-16 offset in a text, as editors count them (a "\r\n" ends one line).
 * O(offset).
 * @example lineColumnAt('{\n  "a": x}', 9) // { line: 2, column: 8 }
 */
function lineColumnAt(text, offset) {
    const end = Math.max(0, Math.min(offset, text.length));
    let line = 1;
    let lineStart = 0;
    for (let i = text.indexOf('\n'); i >= 0 && i < end; i = text.indexOf('\n', i + 1)) {
        line++;
        lineStart = i + 1;
    }
    return { line, column: end - lineStart + 1 };
}
/** "file:line:col" for an offset. */
function whereAt(file, text, offset) {
    const { line, column } = lineColumnAt(text, offset);
    return `${file}:${line}:${column}`;
}

;// CONCATENATED MODULE: ./src/inputs/json-text.ts


/**
 * JSON.parse with errors a user can act on: the message names the file and, where the engine tells
 * the offset ("... at position 12"), the line and column. `line` is given when the text is one
 * line of a larger file (JSON Lines).
 * @throws InputError for malformed JSON.
 * @example parseJsonText('{"a": 1}', 'm.json') // { a: 1 }
 */
function parseJsonText(text, file, line) {
    try {
        return JSON.parse(text);
    }
    catch (error) {
        const message = error instanceof Error ? error.message : String(error);
        const at = /at position (\d+)/.exec(message);
        const offset = at ? Number(at[1]) : locateJsonError(text);
        let where = file;
        if (offset !== undefined) {
            where = whereAt(file, text, offset);
            if (line !== undefined)
                where = shiftLine(where, line - 1);
        }
        else if (line !== undefined) {
            where = `${file}:${line}`;
        }
        throw new input_error/* InputError */.d(`malformed JSON: ${message.replace(/ in JSON at position \d+.*$/, '')}`, {
            where,
            fix: 'check the file with a JSON validator; the metric file must be one JSON document',
            cause: error,
        });
    }
}
/**
 * "file:line:col" of the value at a path inside JSON text, found only when an error needs it.
 * Falls back to "file (path)" when the path is not in the text.
 * @example whereInJson('{\n  "a": [1, "x"]\n}', 'm.json', ['a', 1]) // 'm.json:2:12 (a[1])'
 */
function whereInJson(text, file, path) {
    const label = path.map((p) => (typeof p === 'number' ? `[${p}]` : `.${p}`)).join('').replace(/^\./, '');
    const offset = jsonValueOffset(text, path);
    return offset === undefined ? `${file} (${label})` : `${whereAt(file, text, offset)} (${label})`;
}
// JSON's own whitespace (RFC 8259, section 2): space, tab, line feed, carriage return.
const SPACE = new Set([0x20, 0x09, 0x0a, 0x0d]);
/**
 * Offset of the value at `path` (object keys and array indices) in text that JSON.parse has
 * accepted, or undefined when the path is not there. One pass over the text that steps over the
 * values it does not enter; of a key written twice, the last (the one JSON.parse keeps). This
 * spares every metric file a second parser (the YAML library, ~300 KB, loaded for error positions
 * only): metric readers are synchronous, so it could not be loaded just when needed.
 * @example jsonValueOffset('{"a": [1, 2]}', ['a', 1]) // 10
 */
function jsonValueOffset(text, path) {
    let at = skipSpace(text, 0);
    for (const step of path) {
        const open = text.charCodeAt(at);
        let found;
        if (open === 0x7b && typeof step === 'string') {
            at = skipSpace(text, at + 1);
            while (text.charCodeAt(at) === 0x22) {
                const keyEnd = skipString(text, at);
                const valueAt = skipSpace(text, skipSpace(text, keyEnd) + 1); // past the ':'
                if (JSON.parse(text.slice(at, keyEnd)) === step)
                    found = valueAt;
                at = skipSpace(text, skipValue(text, valueAt));
                if (text.charCodeAt(at) === 0x2c)
                    at = skipSpace(text, at + 1);
            }
        }
        else if (open === 0x5b && typeof step === 'number' && Number.isInteger(step) && step >= 0) {
            at = skipSpace(text, at + 1);
            for (let index = 0; text.charCodeAt(at) !== 0x5d && at < text.length; index++) {
                if (index === step) {
                    found = at;
                    break;
                }
                at = skipSpace(text, skipValue(text, at));
                if (text.charCodeAt(at) === 0x2c)
                    at = skipSpace(text, at + 1);
            }
        }
        if (found === undefined)
            return undefined;
        at = found;
    }
    return at;
}
function skipSpace(text, at) {
    while (SPACE.has(text.charCodeAt(at)))
        at++;
    return at;
}
/** From an opening quote to just after the closing one ('\' escapes the next character). */
function skipString(text, at) {
    for (let i = at + 1; i < text.length; i++) {
        const c = text.charCodeAt(i);
        if (c === 0x5c)
            i++;
        else if (c === 0x22)
            return i + 1;
    }
    return text.length;
}
/** From the first character of a value to just after it. */
function skipValue(text, at) {
    const first = text.charCodeAt(at);
    if (first === 0x22)
        return skipString(text, at);
    if (first !== 0x7b && first !== 0x5b) {
        let i = at; // a number, true, false or null: up to the next delimiter
        while (i < text.length && !SPACE.has(text.charCodeAt(i)) && !',]}'.includes(text[i]))
            i++;
        return i;
    }
    let depth = 0;
    for (let i = at; i < text.length; i++) {
        const c = text.charCodeAt(i);
        if (c === 0x22)
            i = skipString(text, i) - 1;
        else if (c === 0x7b || c === 0x5b)
            depth++;
        else if ((c === 0x7d || c === 0x5d) && --depth === 0)
            return i + 1;
    }
    return text.length;
}
/**
 * Offset of the first character that makes `text` invalid JSON, for the engine messages that give
 * none (Node 20: "Unexpected token 'N', ... is not valid JSON" for a NaN). Bisection on prefixes:
 * a prefix either could still grow into valid JSON (it fails only at its end) or already holds the
 * error, and once a prefix holds it every longer one does. O(n log n), on the error path only.
 */
function locateJsonError(text) {
    const broken = (length) => {
        try {
            JSON.parse(text.slice(0, length));
            return false;
        }
        catch (error) {
            const message = error instanceof Error ? error.message : '';
            if (/end of JSON input/.test(message))
                return false;
            const at = /at position (\d+)/.exec(message);
            return !(at && Number(at[1]) >= length);
        }
    };
    if (!broken(text.length))
        return undefined;
    let low = 0; // not broken
    let high = text.length; // broken
    while (high - low > 1) {
        const mid = (low + high) >>> 1;
        if (broken(mid))
            high = mid;
        else
            low = mid;
    }
    return high - 1;
}
function shiftLine(where, lineOffset) {
    return where.replace(/:(\d+):(\d+)$/, (_m, line, col) => `:${Number(line) + lineOffset}:${col}`);
}


/***/ }),

/***/ 3051:
/***/ ((__unused_webpack_module, __webpack_exports__, __webpack_require__) => {

__webpack_require__.r(__webpack_exports__);
/* harmony export */ __webpack_require__.d(__webpack_exports__, {
/* harmony export */   readJsonMetrics: () => (/* binding */ readJsonMetrics)
/* harmony export */ });
/* harmony import */ var _model_input_error_js__WEBPACK_IMPORTED_MODULE_0__ = __webpack_require__(8250);
/* harmony import */ var _json_entry_js__WEBPACK_IMPORTED_MODULE_1__ = __webpack_require__(850);
/* harmony import */ var _json_text_js__WEBPACK_IMPORTED_MODULE_2__ = __webpack_require__(7138);
/* harmony import */ var _limits_js__WEBPACK_IMPORTED_MODULE_3__ = __webpack_require__(6497);
/* harmony import */ var _reading_sink_js__WEBPACK_IMPORTED_MODULE_4__ = __webpack_require__(7829);





/**
 * Reads Bellgate's own metric file (DESIGN "Metric file"), in either form:
 * - list form `{"metrics": [{"name", "value", "unit"?} | {"name", "samples": [...], "unit"?}]}`;
 *   a name may appear once per file (repeat measurements go in `samples`);
 * - flat form `{"name": 412.5, "other": [1, 2]}` (a number, or an array of samples; no units).
 * An object whose "metrics" key holds an array is the list form; anything else is the flat form.
 * @throws InputError with file:line:col for malformed JSON, non-numbers, non-finite values, empty
 *   names, duplicate names, and entries without a value.
 * @example readJsonMetrics('{"a": 1}', 'm.json').readings // [{ name: 'a', value: 1, where: 'm.json (a)' }]
 */
function readJsonMetrics(text, file, limits = _limits_js__WEBPACK_IMPORTED_MODULE_3__/* .DEFAULT_LIMITS */ .dR) {
    const doc = (0,_json_text_js__WEBPACK_IMPORTED_MODULE_2__/* .parseJsonText */ .lk)(text, file);
    if (!(0,_json_entry_js__WEBPACK_IMPORTED_MODULE_1__/* .isRecord */ .u4)(doc)) {
        throw new _model_input_error_js__WEBPACK_IMPORTED_MODULE_0__/* .InputError */ .d(`the metric file must hold a JSON object, found ${(0,_json_entry_js__WEBPACK_IMPORTED_MODULE_1__/* .describeJson */ .kw)(doc)}`, {
            where: file,
            fix: 'write {"metrics": [{"name": "...", "value": 1}]} or {"name": 1}',
        });
    }
    const sink = new _reading_sink_js__WEBPACK_IMPORTED_MODULE_4__/* .ReadingSink */ .I(file, limits);
    if (Array.isArray(doc.metrics))
        readListForm(doc.metrics, text, file, sink);
    else
        readFlatForm(doc, text, file, sink);
    return sink.result;
}
function readListForm(entries, text, file, sink) {
    const seen = new Map();
    entries.forEach((entry, i) => {
        const where = () => (0,_json_text_js__WEBPACK_IMPORTED_MODULE_2__/* .whereInJson */ .LF)(text, file, ['metrics', i]);
        const name = (0,_json_entry_js__WEBPACK_IMPORTED_MODULE_1__/* .readEntry */ .hB)(entry, sink, `${file} (metrics[${i}])`, where);
        const first = seen.get(name);
        if (first !== undefined) {
            throw new _model_input_error_js__WEBPACK_IMPORTED_MODULE_0__/* .InputError */ .d(`metric ${JSON.stringify(name)} appears twice (metrics[${first}] and metrics[${i}])`, {
                where: where(),
                fix: 'give repeated measurements of one metric as "samples": [...] in a single entry',
            });
        }
        seen.set(name, i);
    });
}
function readFlatForm(doc, text, file, sink) {
    const keys = Object.keys(doc);
    for (const name of keys) {
        const value = doc[name];
        const where = () => (0,_json_text_js__WEBPACK_IMPORTED_MODULE_2__/* .whereInJson */ .LF)(text, file, [name]);
        const values = Array.isArray(value) ? value : [value];
        if (values.length === 0) {
            throw new _model_input_error_js__WEBPACK_IMPORTED_MODULE_0__/* .InputError */ .d(`metric ${JSON.stringify(name)} has an empty array of samples`, {
                where: where(),
                fix: 'give at least one number, or leave the metric out',
            });
        }
        (0,_json_entry_js__WEBPACK_IMPORTED_MODULE_1__/* .readNumbers */ .Pl)(name, values, undefined, sink, `${file} (${name})`, where);
    }
    const duplicate = findDuplicateKey(text, keys.length);
    if (duplicate !== undefined) {
        throw new _model_input_error_js__WEBPACK_IMPORTED_MODULE_0__/* .InputError */ .d(`metric ${JSON.stringify(duplicate)} appears twice; JSON keeps only the last value`, {
            where: file,
            fix: 'give repeated measurements as an array of samples under one key',
        });
    }
}
/**
 * JSON.parse silently keeps the last of two equal keys, which would lose a measurement. Once the
 * flat form is known to hold only numbers and arrays of numbers, every string literal in the text
 * is a key, so counting them finds duplicates in one pass.
 */
function findDuplicateKey(text, distinct) {
    const literal = /"(?:[^"\\]|\\.)*"/g;
    const seen = new Set();
    let count = 0;
    let duplicate;
    for (let m = literal.exec(text); m; m = literal.exec(text)) {
        const key = JSON.parse(m[0]);
        count++;
        if (seen.has(key))
            duplicate ??= key;
        seen.add(key);
    }
    return count > distinct ? duplicate : undefined;
}


/***/ }),

/***/ 7829:
/***/ ((__unused_webpack_module, __webpack_exports__, __webpack_require__) => {

/* harmony export */ __webpack_require__.d(__webpack_exports__, {
/* harmony export */   I: () => (/* binding */ ReadingSink)
/* harmony export */ });
/* harmony import */ var _model_input_error_js__WEBPACK_IMPORTED_MODULE_0__ = __webpack_require__(8250);
/* harmony import */ var _limits_js__WEBPACK_IMPORTED_MODULE_1__ = __webpack_require__(6497);
/* harmony import */ var _names_js__WEBPACK_IMPORTED_MODULE_2__ = __webpack_require__(5585);



/**
 * Where every reader puts what it finds, so that the checks every format needs live in one place:
 * the metric name rule (names.ts), finite values, and the `limits.max-metrics` cap on distinct names,
 * enforced while parsing so a huge file is refused before it fills memory.
 */
class ReadingSink {
    file;
    limits;
    result = { readings: [], notFitted: new Map(), meta: new Map() };
    names = new Set();
    constructor(file, limits) {
        this.file = file;
        this.limits = limits;
    }
    /** Adds one sample. @throws InputError for a bad name or unit, a non-finite value or too many metrics. */
    add(name, value, unit, where) {
        (0,_names_js__WEBPACK_IMPORTED_MODULE_2__/* .checkMetricName */ .WO)(name, where);
        if (!Number.isFinite(value)) {
            throw new _model_input_error_js__WEBPACK_IMPORTED_MODULE_0__/* .InputError */ .d(`value of ${JSON.stringify(name)} is ${value}, not a finite number`, {
                where,
                fix: 'leave out metrics that were not measured instead of writing NaN or Infinity',
            });
        }
        if (unit !== undefined)
            (0,_names_js__WEBPACK_IMPORTED_MODULE_2__/* .checkUnit */ .lg)(unit, where);
        this.count(name, where);
        const reading = unit === undefined || unit === '' ? { name, value, where } : { name, value, unit, where };
        this.result.readings.push(reading);
    }
    /** Records a name that is kept but never fitted (a skipped test), with the reason. */
    skip(name, reason, where) {
        (0,_names_js__WEBPACK_IMPORTED_MODULE_2__/* .checkMetricName */ .WO)(name, where);
        this.count(name, where);
        this.result.notFitted.set(name, reason);
    }
    /** Run metadata; the first value of a key wins. */
    meta(key, value) {
        if (!this.result.meta.has(key))
            this.result.meta.set(key, value);
    }
    count(name, where) {
        if (this.names.has(name))
            return;
        if (this.names.size >= this.limits.maxMetrics) {
            throw (0,_limits_js__WEBPACK_IMPORTED_MODULE_1__/* .limitError */ .yT)('maxMetrics', this.limits.maxMetrics, where, `${this.file} has more than ${this.limits.maxMetrics} metrics`);
        }
        this.names.add(name);
    }
}


/***/ })

};
