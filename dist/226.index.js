export const id = 226;
export const ids = [226];
export const modules = {

/***/ 25226:
/***/ ((__unused_webpack_module, __webpack_exports__, __webpack_require__) => {


// EXPORTS
__webpack_require__.d(__webpack_exports__, {
  readConfigFile: () => (/* binding */ readConfigFile)
});

// UNUSED EXPORTS: DEFAULT_CONFIG_PATHS, MAX_CONFIG_FILE_BYTES

// EXTERNAL MODULE: external "node:fs/promises"
var promises_ = __webpack_require__(51455);
// EXTERNAL MODULE: external "node:path"
var external_node_path_ = __webpack_require__(76760);
// EXTERNAL MODULE: ./src/model/input-error.ts + 1 modules
var input_error = __webpack_require__(71184);
// EXTERNAL MODULE: ./src/config/defaults.ts
var defaults = __webpack_require__(31954);
;// CONCATENATED MODULE: ./src/config/did-you-mean.ts
/**
 * Levenshtein edit distance (insertions, deletions, substitutions each cost 1), by the classic
 * two-row dynamic programme (Wagner & Fischer 1974). O(|a| * |b|) time, O(|b|) memory.
 * @example editDistance('cuttoff', 'cutoff') // 1
 */
function editDistance(a, b) {
    let previous = Array.from({ length: b.length + 1 }, (_, j) => j);
    for (let i = 1; i <= a.length; i++) {
        const current = [i];
        for (let j = 1; j <= b.length; j++) {
            const cost = a[i - 1] === b[j - 1] ? 0 : 1;
            current[j] = Math.min(previous[j] + 1, current[j - 1] + 1, previous[j - 1] + cost);
        }
        previous = current;
    }
    return previous[b.length];
}
/** Case, dashes, underscores and spaces are what people most often get "wrong" in a key. */
function normalise(word) {
    return word.toLowerCase().replace(/[-_\s]/g, '');
}
/**
 * The candidate a mistyped word most likely meant, or undefined when none is close: equal after
 * ignoring case, '-', '_' and spaces (`minRuns`, `min_runs` -> `min-runs`), else within an edit
 * distance of about a third of the candidate's length (`cuttoff` -> `cutoff`).
 * @example didYouMean('tolerence', ['cutoff', 'tolerance']) // 'tolerance'
 */
function didYouMean(word, candidates) {
    if (word.length > 64)
        return undefined;
    const plain = normalise(word);
    let best;
    let bestDistance = Infinity;
    for (const candidate of candidates) {
        const target = normalise(candidate);
        if (target === plain)
            return candidate;
        const distance = editDistance(plain, target);
        if (distance <= Math.max(1, Math.floor(target.length / 3)) && distance < bestDistance) {
            best = candidate;
            bestDistance = distance;
        }
    }
    return best;
}

// EXTERNAL MODULE: ./node_modules/ajv/dist/ajv.js
var ajv = __webpack_require__(42463);
;// CONCATENATED MODULE: ./src/config/bellgate.schema.json
const bellgate_schema_namespaceObject = /*#__PURE__*/JSON.parse('{"$schema":"http://json-schema.org/draft-07/schema#","title":"Bellgate configuration (.github/bellgate.yml)","description":"All keys are optional. Rules under metrics apply in order; a later match overrides an earlier one.","type":["object","null"],"additionalProperties":false,"properties":{"defaults":{"description":"Settings for every metric, before rules apply.","type":["object","null"],"additionalProperties":false,"properties":{"cutoff":{"description":"Relative density below which a metric on its worse side is flagged.","type":"number","exclusiveMinimum":0,"exclusiveMaximum":1,"default":0.01,"examples":[0.01]},"worse":{"description":"Which direction is bad for the metric.","enum":["higher","lower","both"],"default":"higher","examples":["lower"]},"tolerance":{"description":"Smallest change worth flagging: a number in the metric\'s unit, or a percent of the baseline mean.","default":"1%","examples":["1%",512],"anyOf":[{"type":"number","minimum":0},{"type":"string","pattern":"^(?:[0-9]+(?:\\\\.[0-9]*)?|\\\\.[0-9]+) ?%$","description":"a percent such as \\"1%\\""}]},"resolution":{"description":"Smallest meaningful step of the metric; the fitted spread is never below it.","type":"number","minimum":0,"default":0,"examples":[1]},"window":{"description":"Newest baseline runs used for the fit.","type":"integer","minimum":2,"default":60,"examples":[60]},"min-runs":{"description":"Baseline runs needed before the metric is judged (fewer: learning).","type":"integer","minimum":2,"default":8,"examples":[8]},"transform":{"description":"Scale the Gaussian is fitted on.","enum":["none","log"],"default":"none","examples":["log"]},"fit":{"description":"How the centre and spread are estimated.","enum":["mle","unbiased","robust"],"default":"mle","examples":["robust"]},"uncertainty":{"description":"predictive: Student-t predictive density for a new run; plug-in: the fitted Gaussian as is.","enum":["predictive","plug-in"],"default":"predictive","examples":["plug-in"]},"aggregate":{"description":"How repeated samples of a metric in one run become one value.","enum":["median","mean","min","max"],"default":"median","examples":["min"]},"change-points":{"description":"Fit only the runs since the last detected level change.","type":"boolean","default":true,"examples":[false]}}},"metrics":{"description":"Rules over metric names, applied in order.","type":["array","null"],"items":{"type":"object","additionalProperties":false,"required":["match"],"properties":{"match":{"anyOf":[{"type":"string","minLength":1},{"type":"array","minItems":1,"items":{"type":"string","minLength":1}}],"description":"a glob over metric names, or a list of them; \'*\' stays within one \'/\' segment, \'**\' crosses them; a leading \'!\' excludes","examples":["size/**"]},"cutoff":{"description":"Relative density below which a metric on its worse side is flagged.","type":"number","exclusiveMinimum":0,"exclusiveMaximum":1,"examples":[0.01]},"worse":{"description":"Which direction is bad for the metric.","enum":["higher","lower","both"],"examples":["lower"]},"tolerance":{"description":"Smallest change worth flagging: a number in the metric\'s unit, or a percent of the baseline mean.","examples":["1%",512],"anyOf":[{"type":"number","minimum":0},{"type":"string","pattern":"^(?:[0-9]+(?:\\\\.[0-9]*)?|\\\\.[0-9]+) ?%$","description":"a percent such as \\"1%\\""}]},"resolution":{"description":"Smallest meaningful step of the metric; the fitted spread is never below it.","type":"number","minimum":0,"examples":[1]},"window":{"description":"Newest baseline runs used for the fit.","type":"integer","minimum":2,"examples":[60]},"min-runs":{"description":"Baseline runs needed before the metric is judged (fewer: learning).","type":"integer","minimum":2,"examples":[8]},"transform":{"description":"Scale the Gaussian is fitted on.","enum":["none","log"],"examples":["log"]},"fit":{"description":"How the centre and spread are estimated.","enum":["mle","unbiased","robust"],"examples":["robust"]},"uncertainty":{"description":"predictive: Student-t predictive density for a new run; plug-in: the fitted Gaussian as is.","enum":["predictive","plug-in"],"examples":["plug-in"]},"aggregate":{"description":"How repeated samples of a metric in one run become one value.","enum":["median","mean","min","max"],"examples":["min"]},"change-points":{"description":"Fit only the runs since the last detected level change.","type":"boolean","examples":[false]},"ignore":{"description":"Report matching metrics as ignored and never judge them.","type":"boolean","examples":[true]},"relative-to":{"description":"Divide matching metrics by this metric of the same run before fitting (a calibration benchmark).","type":"string","minLength":1,"examples":["latency/calibrate"]}}}},"groups":{"description":"Metrics that share a common move (for example the runner\'s speed).","type":["array","null"],"items":{"type":"object","additionalProperties":false,"required":["name"],"properties":{"name":{"description":"Name of the group, unique in the file.","type":"string","minLength":1,"maxLength":200,"examples":["latency"]},"match":{"anyOf":[{"type":"string","minLength":1},{"type":"array","minItems":1,"items":{"type":"string","minLength":1}}],"description":"Members of the group (default: the name followed by /**). a glob over metric names, or a list of them; \'*\' stays within one \'/\' segment, \'**\' crosses them; a leading \'!\' excludes","examples":["latency/*"]}}}},"family":{"description":"Correction for judging many metrics at once.","enum":["none","bonferroni","holm","fdr"],"default":"none","examples":["holm"]},"keep":{"description":"Newest runs kept in the history; trimming is the only deletion.","type":"integer","minimum":1,"default":500,"examples":[500]},"input-format":{"description":"Force the metric file format instead of detecting it from content.","enum":["json","jsonl","csv","openmetrics","gobench","junit"],"examples":["json"]},"limits":{"description":"Size limits for metric files.","type":["object","null"],"additionalProperties":false,"properties":{"max-file-bytes":{"description":"Largest metric file read, in bytes.","type":"integer","minimum":1,"default":67108864,"examples":[67108864]},"max-line-length":{"description":"Longest line in a metric file, in characters.","type":"integer","minimum":1,"default":1048576,"examples":[1048576]},"max-metrics":{"description":"Most metrics in one run.","type":"integer","minimum":1,"default":100000,"examples":[100000]}}}}}');
;// CONCATENATED MODULE: ./src/config/schema.ts


/**
 * The JSON Schema of `.github/bellgate.yml` (draft-07), the same file that ships in the package
 * for editors. Draft-07 because it is what editor YAML plugins and ajv's default build support best.
 */
const configSchema = bellgate_schema_namespaceObject;
let validate;
/**
 * Validates plain data (from the YAML tree) against the config schema and returns every error
 * (ajv allErrors, verbose so each error carries its schema node for wording). Compiled once.
 * @example schemaErrors({ defaults: { cutoff: 2 } })[0].keyword // 'exclusiveMaximum'
 */
function schemaErrors(value) {
    // validateSchema: false skips checking our own schema against the draft-07 meta-schema on every
    // start (about 55 ms, test/bench/README.md); test/config/schema.test.ts checks it once instead.
    validate ??= new ajv.Ajv({ allErrors: true, verbose: true, strict: true, validateSchema: false }).compile(bellgate_schema_namespaceObject);
    return validate(value) ? [] : [...(validate.errors ?? [])];
}

;// CONCATENATED MODULE: ./src/config/wording.ts
/** Words for config values and schema nodes, shared by the schema and cross-field checks. */
/**
 * A value as a user wrote it, short: strings quoted and cut at 60 characters.
 * @example describeValue(null) // 'an empty value'
 */
function describeValue(value) {
    if (value === null || value === undefined)
        return 'an empty value';
    if (typeof value === 'string')
        return JSON.stringify(value.length > 60 ? `${value.slice(0, 57)}...` : value);
    if (typeof value === 'number' || typeof value === 'boolean')
        return String(value);
    if (Array.isArray(value))
        return 'a list';
    if (typeof value === 'object' && Object.getPrototypeOf(value) === null)
        return 'a mapping';
    return 'a value of an unsupported type';
}
const TYPE_WORDS = {
    object: 'a mapping',
    array: 'a list',
    string: 'a string',
    number: 'a number',
    integer: 'a whole number',
    boolean: 'true or false',
};
/**
 * What a schema node allows, in words: "one of higher, lower, both", "a whole number of at
 * least 2", "a number greater than 0 and less than 1".
 * @example describeAllowed({ type: 'integer', minimum: 2 }) // 'a whole number of at least 2'
 */
function describeAllowed(node) {
    if (Array.isArray(node.anyOf))
        return node.anyOf.map(describeAllowed).join(', or ');
    if (Array.isArray(node.enum))
        return `one of ${node.enum.join(', ')}`;
    if (node.type === 'string' && typeof node.pattern === 'string' && typeof node.description === 'string') {
        return node.description;
    }
    const types = (Array.isArray(node.type) ? node.type : [node.type]).filter((t) => t !== 'null');
    let words = types.map((t) => TYPE_WORDS[t] ?? t).join(' or ');
    const bounds = [];
    if (typeof node.minimum === 'number')
        bounds.push(`at least ${node.minimum}`);
    if (typeof node.exclusiveMinimum === 'number')
        bounds.push(`greater than ${node.exclusiveMinimum}`);
    if (typeof node.maximum === 'number')
        bounds.push(`at most ${node.maximum}`);
    if (typeof node.exclusiveMaximum === 'number')
        bounds.push(`less than ${node.exclusiveMaximum}`);
    if (bounds.length > 0)
        words += `${bounds[0].startsWith('at ') ? ' of' : ''} ${bounds.join(' and ')}`;
    if (node.minLength === 1)
        words = words.replace(/^a /, 'a non-empty ');
    if (typeof node.maxLength === 'number')
        words += ` of at most ${node.maxLength} characters`;
    if (node.type === 'array' && typeof node.items === 'object' && node.items !== null) {
        words = `${node.minItems === 1 ? 'a non-empty list' : 'a list'} of ${plural(describeAllowed(node.items))}`;
    }
    return words;
}
function plural(words) {
    return words.replace(/^an? (non-empty )?(\w+)/, (_, ne, noun) => `${ne ?? ''}${noun}s`);
}

// EXTERNAL MODULE: ./node_modules/yaml/dist/index.js
var dist = __webpack_require__(38815);
;// CONCATENATED MODULE: ./src/config/yaml-limits.ts
/** Largest config text accepted (characters); a real config is a few kilobytes. */
const MAX_CONFIG_CHARS = 1024 * 1024;
/** Deepest nesting of collections; a config needs five levels, so 32 leaves room without risk. */
const MAX_CONFIG_DEPTH = 32;
/** Longest single scalar (characters); globs and names are short. */
const MAX_SCALAR_CHARS = 16 * 1024;
/** Most alias uses (`*name`) in one file; the guard against "billion laughs" expansion. */
const MAX_ALIAS_COUNT = 100;
/** Most values after aliases are expanded. */
const MAX_CONFIG_VALUES = 10_000;
/**
 * Most entries (keys, list items, flow commas and brackets) in the text, counted before parsing
 * so that an oversized document costs a linear scan, not a parse; a large real config has a few
 * hundred.
 */
const MAX_CONFIG_ENTRIES = 5_000;
const DEEP = {
    message: `nesting is deeper than ${MAX_CONFIG_DEPTH} levels`,
    fix: 'a Bellgate config needs only a few levels (section, list, rule, globs); flatten the document',
};
/**
 * Checks the raw token tree before anything recursive runs over it: nesting depth and scalar
 * length. Walks with an explicit stack, so a 10,000-deep `[[[[...` cannot overflow the call stack.
 * Returns the first problem found, or undefined.
 * @example checkTokenLimits(tokens, counter) // undefined for an ordinary config
 */
function checkTokenLimits(tokens, counter) {
    const stack = tokens.map((t) => [t, 0]);
    while (stack.length > 0) {
        const [token, depth] = stack.pop();
        const at = counter.linePos(token.offset);
        switch (token.type) {
            case 'document':
                if (token.value)
                    stack.push([token.value, depth]);
                break;
            case 'block-map':
            case 'block-seq':
            case 'flow-collection': {
                if (depth + 1 > MAX_CONFIG_DEPTH) {
                    return { ...at, ...DEEP };
                }
                for (const item of token.items) {
                    if ('key' in item && item.key)
                        stack.push([item.key, depth + 1]);
                    if (item.value)
                        stack.push([item.value, depth + 1]);
                }
                break;
            }
            case 'scalar':
            case 'single-quoted-scalar':
            case 'double-quoted-scalar':
            case 'block-scalar':
                if (token.source.length > MAX_SCALAR_CHARS) {
                    return {
                        ...at,
                        message: `a value of ${token.source.length} characters is longer than the limit of ${MAX_SCALAR_CHARS}`,
                        fix: 'globs, names and numbers are short; remove the oversized value',
                    };
                }
                break;
            default:
                break;
        }
    }
    return undefined;
}
/**
 * A linear scan of the raw text, before the parser, for the shapes that make the YAML library
 * slow down faster than linearly: flow brackets nested past the limit (10,000 "[" take 0.6 s to
 * parse), compact block indicators at the start of a line ("- - - x"; 300,000 take 4 s), and
 * more than MAX_CONFIG_ENTRIES keys or items. Quotes and
 * comments are skipped; checkTokenLimits still checks the real tree after parsing.
 * Returns a problem at the first bracket, indicator or entry past a limit, or undefined.
 * @example prescanShape('[[[]]]') // undefined
 */
function prescanShape(text) {
    let depth = 0;
    let entries = 0;
    let line = 1;
    let lineStart = 0;
    for (let i = 0; i < text.length; i++) {
        const c = text[i];
        if (c === '\n') {
            line++;
            lineStart = i + 1;
            continue;
        }
        if (i === lineStart) {
            let j = i;
            let indicators = 0;
            while (j < text.length && (text[j] === ' ' || text[j] === '\t'))
                j++;
            while ('-?:'.includes(text[j] ?? 'x') && (text[j + 1] === ' ' || text[j + 1] === '\t')) {
                if (++indicators > MAX_CONFIG_DEPTH)
                    return { line, col: j - lineStart + 1, ...DEEP };
                j += 2;
                while (text[j] === ' ' || text[j] === '\t')
                    j++;
            }
        }
        const prev = i === 0 ? ' ' : text[i - 1];
        const tokenStart = ' \t\n[{,:-?'.includes(prev);
        if (c === '#' && (prev === ' ' || prev === '\t' || i === lineStart)) {
            while (i + 1 < text.length && text[i + 1] !== '\n')
                i++;
        }
        else if ((c === '"' || c === "'") && tokenStart) {
            // Skip the quoted scalar, counting its line breaks.
            for (i++; i < text.length; i++) {
                if (c === '"' && text[i] === '\\')
                    i++;
                else if (text[i] === c)
                    break;
                else if (text[i] === '\n') {
                    line++;
                    lineStart = i + 1;
                }
            }
        }
        else if ((c === ':' && (' \t\r\n'.includes(text[i + 1] ?? ' ') || (depth > 0 && ',]}'.includes(text[i + 1])))) ||
            (c === '-' && tokenStart && ' \t\r\n'.includes(text[i + 1] ?? ' ')) ||
            (c === ',' && depth > 0) ||
            c === '[' ||
            c === '{') {
            if (++entries > MAX_CONFIG_ENTRIES) {
                return {
                    line,
                    col: i - lineStart + 1,
                    message: `the config has more than ${MAX_CONFIG_ENTRIES} entries`,
                    fix: 'a Bellgate config needs a few hundred keys and list items; use globs to cover many metrics with one rule',
                };
            }
        }
        if (c === '[' || c === '{') {
            if (++depth > MAX_CONFIG_DEPTH)
                return { line, col: i - lineStart + 1, ...DEEP };
        }
        else if ((c === ']' || c === '}') && depth > 0) {
            depth--;
        }
    }
    return undefined;
}

;// CONCATENATED MODULE: ./src/config/yaml-tree.ts


/** Thrown inside the builder to stop at a limit; turned into a problem by readYamlTree. */
class Stop {
    problem;
    constructor(problem) {
        this.problem = problem;
    }
}
/**
 * JSON pointer segment escaping (RFC 6901: "~" -> "~0", "/" -> "~1"), the same as ajv's instancePath.
 * @example pointerSegment('size/app.js') // 'size~1app.js'
 */
function pointerSegment(key) {
    return String(key).replace(/~/g, '~0').replace(/\//g, '~1');
}
/**
 * Parses YAML text into plain data under hard limits (size, depth, scalar length, alias uses and
 * expanded values), keeping the line:column of every key and value. Never throws for bad text:
 * problems come back in the list, and `tree` is undefined when any was found.
 * Keys are kept as own properties of null-prototype objects, so `__proto__` is just a key.
 * @example readYamlTree('cutoff: 0.05\n').tree?.value // { cutoff: 0.05 }
 */
function readYamlTree(text) {
    if (text.length > MAX_CONFIG_CHARS) {
        return {
            problems: [{
                    line: 1,
                    col: 1,
                    message: `the config is ${text.length} characters; the limit is ${MAX_CONFIG_CHARS} (1 MiB)`,
                    fix: 'a Bellgate config is a few kilobytes; check that the right file is named',
                }],
        };
    }
    const deep = prescanShape(text);
    if (deep)
        return { problems: [deep] };
    const counter = new dist/* LineCounter */.HN();
    let docs;
    try {
        const tokens = [...new dist/* Parser */.iX(counter.addNewLine).parse(text)];
        const tooBig = checkTokenLimits(tokens, counter);
        if (tooBig)
            return { problems: [tooBig] };
        docs = [...new dist/* Composer */.Dk({ uniqueKeys: false, merge: false, strict: true }).compose(tokens, true, text.length)];
    }
    catch (err) {
        // The YAML library reports problems in doc.errors; a throw would be its own bug, still shown as bad input.
        return { problems: [{ line: 1, col: 1, message: `the YAML could not be read (${err.message})`, fix: 'simplify the file' }] };
    }
    const problems = [];
    const at = (offset) => counter.linePos(offset);
    for (const doc of docs) {
        for (const issue of [...doc.errors, ...doc.warnings]) {
            problems.push({ ...at(issue.pos[0]), message: firstLine(issue.message), fix: 'write valid YAML (see https://yaml.org/spec/1.2.2/)' });
        }
    }
    if (docs.length > 1) {
        const second = docs[1];
        problems.push({
            ...at(second.range[0]),
            message: `the file holds ${docs.length} YAML documents; a config is one`,
            fix: 'remove the "---" separator and merge the documents',
        });
    }
    const doc = docs.length === 1 ? docs[0] : undefined;
    const tree = { value: undefined, valueAt: new Map(), keyAt: new Map() };
    // Built even when the parser complained, so duplicate keys are reported with syntax errors.
    if (doc !== undefined && doc.contents !== null) {
        try {
            tree.value = buildValue(doc, doc.contents, tree, at, problems);
        }
        catch (err) {
            if (!(err instanceof Stop))
                throw err;
            problems.push(err.problem);
        }
        problems.push(...collectNonFinite(tree));
    }
    return problems.length > 0 ? { problems } : { tree, problems };
}
function firstLine(message) {
    return message.split('\n')[0].trim();
}
// Duplicate keys are found here with a Set: the YAML library's own check (uniqueKeys) compares
// every pair of keys, which takes seconds on a few thousand keys.
function buildValue(doc, root, tree, at, problems) {
    let values = 0;
    let aliases = 0;
    const build = (node, pointer, depth) => {
        const pos = at(node.range?.[0] ?? 0);
        if (++values > MAX_CONFIG_VALUES || depth > MAX_CONFIG_DEPTH) {
            const what = values > MAX_CONFIG_VALUES ? `more than ${MAX_CONFIG_VALUES} values` : `nesting deeper than ${MAX_CONFIG_DEPTH} levels`;
            throw new Stop({ ...pos, message: `the config expands to ${what}`, fix: 'use fewer aliases (*name); a config needs a few hundred values at most' });
        }
        if (!tree.valueAt.has(pointer))
            tree.valueAt.set(pointer, pos);
        if ((0,dist/* isAlias */.Vj)(node)) {
            if (++aliases > MAX_ALIAS_COUNT) {
                throw new Stop({ ...pos, message: `more than ${MAX_ALIAS_COUNT} aliases (*name)`, fix: 'repeat the values instead of aliasing them' });
            }
            const target = node.resolve(doc);
            if (target === undefined)
                throw new Stop({ ...pos, message: `alias *${node.source} names no anchor`, fix: `define &${node.source} before using it` });
            return build(target, pointer, depth + 1);
        }
        if ((0,dist/* isScalar */.jn)(node))
            return node.value;
        if ((0,dist/* isSeq */.oP)(node))
            return node.items.map((item, i) => build(item, `${pointer}/${i}`, depth + 1));
        if ((0,dist/* isMap */.jh)(node)) {
            const out = Object.create(null);
            for (const pair of node.items) {
                const keyNode = pair.key;
                const keyPos = at(keyNode?.range?.[0] ?? node.range?.[0] ?? 0);
                const key = (0,dist/* isScalar */.jn)(keyNode) ? keyNode.value : undefined;
                if (typeof key !== 'string' && typeof key !== 'number') {
                    throw new Stop({ ...keyPos, message: 'a key must be a plain name', fix: 'write keys like "cutoff:"; lists and mappings cannot be keys' });
                }
                if (Object.hasOwn(out, String(key))) {
                    problems.push({ ...keyPos, message: `the key ${JSON.stringify(String(key))} appears twice in one mapping`, fix: 'keep one of the two entries' });
                    continue;
                }
                const child = `${pointer}/${pointerSegment(key)}`;
                tree.keyAt.set(child, keyPos);
                const value = pair.value === null ? null : build(pair.value, child, depth + 1);
                if (pair.value === null)
                    tree.valueAt.set(child, keyPos);
                out[String(key)] = value;
            }
            return out;
        }
        throw new Stop({ ...pos, message: 'unsupported YAML node', fix: 'write plain mappings, lists and scalars' });
    };
    return build(root, '', 0);
}
/** YAML spells infinity and not-a-number (.inf, .nan); no setting accepts them. */
function collectNonFinite(tree) {
    const problems = [];
    const walk = (value, pointer) => {
        if (typeof value === 'number' && !Number.isFinite(value)) {
            const pos = tree.valueAt.get(pointer) ?? { line: 1, col: 1 };
            problems.push({ ...pos, message: `${value > 0 ? '.inf' : value < 0 ? '-.inf' : '.nan'} is not a finite number`, fix: 'write an ordinary number' });
        }
        else if (Array.isArray(value)) {
            value.forEach((item, i) => walk(item, `${pointer}/${i}`));
        }
        else if (value !== null && typeof value === 'object') {
            for (const [key, item] of Object.entries(value))
                walk(item, `${pointer}/${pointerSegment(key)}`);
        }
    };
    walk(tree.value, '');
    return problems;
}

;// CONCATENATED MODULE: ./src/config/explain-schema-errors.ts




const MAX_EXPLAINED = 200;
const SETTING_KEYS = Object.keys(configSchema.properties.defaults.properties);
const RULE_ONLY_KEYS = ['match', 'ignore', 'relative-to'];
const TOP_KEYS = Object.keys(configSchema.properties);
function segments(pointer) {
    return pointer === '' ? [] : pointer.slice(1).split('/').map((s) => s.replace(/~1/g, '/').replace(/~0/g, '~'));
}
/**
 * A human name for a place in the config: "cutoff (in defaults)", "worse (in metrics rule #2)",
 * "match item #1 (in metrics rule #3)". List positions are 1-based, as people count.
 * @example placeName('/metrics/1/worse') // 'worse (in metrics rule #2)'
 */
function placeName(pointer) {
    const parts = segments(pointer);
    if (parts.length === 0)
        return 'the config';
    const section = parts[0];
    const entry = section === 'metrics' ? 'metrics rule' : 'groups entry';
    let context = '';
    let rest = parts.slice(1);
    if ((section === 'metrics' || section === 'groups') && rest.length > 0) {
        context = `${entry} #${Number(rest[0]) + 1}`;
        rest = rest.slice(1);
    }
    else if (rest.length > 0) {
        context = section;
    }
    if (rest.length === 0)
        return context === '' ? section : context;
    let name = rest[0];
    if (rest.length > 1)
        name += ` item #${Number(rest[1]) + 1}`;
    return `${name} (in ${context})`;
}
function position(tree, pointer, key = false) {
    for (let p = pointer;; p = p.slice(0, p.lastIndexOf('/'))) {
        const found = (key ? tree.keyAt.get(p) : undefined) ?? tree.valueAt.get(p);
        if (found)
            return found;
        if (p === '')
            return { line: 1, col: 1 };
    }
}
function unknownKey(error, tree) {
    const key = String(error.params.additionalProperty);
    const pointer = `${error.instancePath}/${pointerSegment(key)}`;
    const allowed = Object.keys(error.parentSchema.properties);
    const where = error.instancePath === '' ? 'at the top level' : `in ${placeName(error.instancePath)}`;
    const guess = didYouMean(key, allowed);
    let fix = guess ? `did you mean "${guess}"?` : `allowed here: ${allowed.join(', ')}`;
    if (!guess && error.instancePath === '' && SETTING_KEYS.includes(key))
        fix = `"${key}" is a metric setting: put it under defaults: or in a metrics rule`;
    if (!guess && error.instancePath !== '' && TOP_KEYS.includes(key))
        fix = `"${key}" is a top-level key: write it without indentation`;
    if (!guess && error.instancePath === '/defaults' && RULE_ONLY_KEYS.includes(key))
        fix = `"${key}" belongs in a metrics rule (under metrics:), not in defaults`;
    return { ...position(tree, pointer, true), message: `unknown key ${JSON.stringify(key)} ${where}`, fix };
}
function wrongValue(error, tree) {
    const node = error.parentSchema;
    const name = placeName(error.instancePath);
    const allowed = describeAllowed(node);
    const message = `${name} must be ${allowed}; got ${describeValue(error.data)}`;
    let fix;
    if (Array.isArray(node.enum) && typeof error.data === 'string') {
        const guess = didYouMean(error.data, node.enum.map(String));
        if (guess)
            fix = `did you mean "${guess}"?`;
    }
    const data = error.data;
    const wantsNumber = node.type === 'number' || node.type === 'integer' || Array.isArray(node.anyOf);
    if (!fix && typeof data === 'string' && wantsNumber && data.trim() !== '' && Number.isFinite(Number(data))) {
        fix = `write the number without quotes: ${data.trim()}`;
    }
    if (!fix && typeof data === 'string' && node.type === 'boolean' && /^(yes|no|on|off|y|n)$/i.test(data)) {
        fix = `write true or false (YAML 1.2 reads ${data} as text)`;
    }
    if (!fix && Array.isArray(node.examples))
        fix = `for example: ${JSON.stringify(node.examples[0])}`;
    if (!fix && node.type === 'array')
        fix = `write ${name} as a YAML list, one item per line starting with "- "`;
    if (!fix)
        fix = `change it to ${allowed}`; // every refusal says what to do, even without an example
    return { ...position(tree, error.instancePath), message, fix };
}
/**
 * Turns ajv errors into problems at the line:column of the offending key or value, worded as
 * what is allowed there. Errors inside an `anyOf` (match: string or list; tolerance: number or
 * percent) are folded into one problem, placed at the deepest failing part.
 * @example explainSchemaErrors(schemaErrors(value), tree) // [{ line: 2, col: 3, message: 'unknown key "cuttoff" in defaults', fix: 'did you mean "cutoff"?' }]
 */
function explainSchemaErrors(errors, tree) {
    const problems = [];
    const branches = errors.filter((e) => e.schemaPath.includes('/anyOf/'));
    // A message lists 20 problems; explaining thousands (a file of unknown keys) only costs time.
    for (const error of errors.slice(0, MAX_EXPLAINED)) {
        if (error.schemaPath.includes('/anyOf/'))
            continue;
        if (error.keyword === 'additionalProperties') {
            problems.push(unknownKey(error, tree));
        }
        else if (error.keyword === 'required') {
            const key = String(error.params.missingProperty);
            problems.push({
                ...position(tree, error.instancePath),
                message: `${placeName(error.instancePath)} has no "${key}"`,
                fix: key === 'match' ? 'add a glob over metric names, e.g. match: "latency/*"' : `add ${key}:`,
            });
        }
        else if (error.keyword === 'anyOf') {
            const inner = branches
                .filter((b) => b.instancePath.startsWith(`${error.instancePath}/`) && b.keyword !== 'type')
                .concat(branches.filter((b) => b.instancePath.startsWith(`${error.instancePath}/`)))[0];
            problems.push(wrongValue(inner ?? error, tree));
        }
        else {
            problems.push(wrongValue(error, tree));
        }
    }
    const seen = new Set();
    return problems.filter((p) => {
        const id = `${p.line}:${p.col}:${p.message}`;
        return seen.has(id) ? false : (seen.add(id), true);
    });
}

;// CONCATENATED MODULE: ./src/config/problems.ts

/** How many problems one error lists; a file with more has bigger trouble than a list can fix. */
const MAX_LISTED_PROBLEMS = 20;
/**
 * One InputError for all problems of a file, in reading order: the first one is the message,
 * `where` ("file:line:col") and `fix`; the others follow in the message, one a line.
 * @example problemsError([{ line: 2, col: 3, message: 'unknown key "cuttoff"' }], 'bellgate.yml').where // 'bellgate.yml:2:3'
 */
function problemsError(problems, source) {
    const sorted = [...problems].sort((a, b) => a.line - b.line || a.col - b.col);
    const first = sorted[0];
    if (first === undefined)
        throw new Error('problemsError needs at least one problem');
    const rest = sorted.slice(1, MAX_LISTED_PROBLEMS);
    let message = first.message;
    if (rest.length > 0) {
        const lines = rest.map((p) => `  ${source}:${p.line}:${p.col}: ${p.message}${p.fix ? ` (${p.fix})` : ''}`);
        const more = sorted.length - 1 - rest.length;
        message += `\nand ${sorted.length - 1} more problem${sorted.length > 2 ? 's' : ''}:\n${lines.join('\n')}`;
        if (more > 0)
            message += `\n  ... ${more} not shown`;
    }
    return new input_error/* InputError */.d(message, { where: `${source}:${first.line}:${first.col}`, fix: first.fix });
}

// EXTERNAL MODULE: ./src/config/glob-matcher.ts
var glob_matcher = __webpack_require__(80517);
;// CONCATENATED MODULE: ./src/config/tolerance.ts
const PERCENT = /^((?:[0-9]+(?:\.[0-9]*)?|\.[0-9]+)) ?%$/;
/**
 * Reads a `tolerance:` value: a number is absolute (in the metric's unit), a string "N%" is a
 * share of the baseline mean. Returns undefined for anything else (the schema has refused it).
 * @example parseTolerance('1%') // { kind: 'percent', amount: 0.01 }
 * @example parseTolerance(512) // { kind: 'absolute', amount: 512 }
 */
function parseTolerance(value) {
    if (typeof value === 'number' && Number.isFinite(value) && value >= 0)
        return { kind: 'absolute', amount: value };
    if (typeof value !== 'string')
        return undefined;
    const found = PERCENT.exec(value);
    return found ? { kind: 'percent', amount: Number(found[1]) / 100 } : undefined;
}

;// CONCATENATED MODULE: ./src/config/to-config.ts



/** YAML key -> MetricSettings field. */
const FIELDS = [
    ['cutoff', 'cutoff'], ['worse', 'worse'], ['tolerance', 'tolerance'], ['resolution', 'resolution'],
    ['window', 'window'], ['min-runs', 'minRuns'], ['transform', 'transform'], ['fit', 'fit'],
    ['uncertainty', 'uncertainty'], ['aggregate', 'aggregate'], ['change-points', 'changePoints'],
    ['ignore', 'ignore'], ['relative-to', 'relativeTo'],
];
function settingsOf(data) {
    const out = {};
    for (const [key, field] of FIELDS) {
        if (data[key] === undefined)
            continue;
        out[field] = field === 'tolerance' ? parseTolerance(data[key]) : data[key];
    }
    return out;
}
function globList(value) {
    return Array.isArray(value) ? value.map(String) : [String(value)];
}
/**
 * Builds the Config from schema-valid plain data, and checks what the schema cannot: globs that
 * do not compile, a `relative-to` naming its own rule's metric, group names used twice, and
 * window or keep too small for min-runs (such metrics could never leave learning).
 * @example toConfig({ defaults: { tolerance: '2%' } }, tree, 'bellgate.yml').config.defaults.tolerance // { kind: 'percent', amount: 0.02 }
 */
function toConfig(value, tree, source) {
    const config = (0,defaults/* defaultConfig */.sb)();
    config.source = source;
    const problems = [];
    const at = (pointer, key = false) => {
        for (let p = pointer;; p = p.slice(0, p.lastIndexOf('/'))) {
            const found = (key ? tree.keyAt.get(p) : undefined) ?? tree.valueAt.get(p);
            if (found || p === '')
                return found ?? { line: 1, col: 1 };
        }
    };
    const root = (value ?? {});
    Object.assign(config.defaults, settingsOf((root.defaults ?? {})));
    if (root.family !== undefined)
        config.family = root.family;
    if (root.keep !== undefined)
        config.keep = root.keep;
    if (root['input-format'] !== undefined)
        config.inputFormat = root['input-format'];
    const limits = (root.limits ?? {});
    if (limits['max-file-bytes'] !== undefined)
        config.limits.maxFileBytes = limits['max-file-bytes'];
    if (limits['max-line-length'] !== undefined)
        config.limits.maxLineLength = limits['max-line-length'];
    if (limits['max-metrics'] !== undefined)
        config.limits.maxMetrics = limits['max-metrics'];
    const checkGlobs = (globs, pointer) => {
        try {
            (0,glob_matcher/* compileGlobs */.t)(globs);
        }
        catch (err) {
            problems.push({ ...at(pointer), message: `a glob cannot be used: ${err.message}`, fix: 'write a shorter, simpler glob' });
        }
    };
    (root.metrics ?? []).forEach((item, i) => {
        const pointer = `/metrics/${i}`;
        const rule = { match: globList(item.match), settings: settingsOf(item), line: at(pointer).line };
        checkGlobs(rule.match, `${pointer}/match`);
        const target = rule.settings.relativeTo;
        if (target !== undefined && rule.match.length === 1 && (0,glob_matcher/* isLiteralGlob */.M)(rule.match[0]) && rule.match[0] === target) {
            problems.push({
                ...at(`${pointer}/relative-to`),
                message: `relative-to names the rule's own metric "${target}"; it would be divided by itself`,
                fix: 'name a different metric of the same run, such as a calibration benchmark',
            });
        }
        config.rules.push(rule);
    });
    const names = new Map();
    (root.groups ?? []).forEach((item, i) => {
        const pointer = `/groups/${i}`;
        const name = String(item.name);
        const group = { name, match: item.match === undefined ? [`${name}/**`] : globList(item.match), line: at(pointer).line };
        checkGlobs(group.match, `${pointer}/match`);
        const earlier = names.get(name);
        if (earlier !== undefined) {
            problems.push({ ...at(`${pointer}/name`), message: `group name "${name}" is used twice (first on line ${earlier})`, fix: 'give each group its own name' });
        }
        else {
            names.set(name, at(`${pointer}/name`).line);
        }
        config.groups.push(group);
    });
    checkRunCounts(config, root, at, problems);
    return { config, problems };
}
/** window and keep below min-runs leave a metric in learning for ever; say so where it was set. */
function checkRunCounts(config, root, at, problems) {
    const levels = [
        { pointer: '/defaults', own: (root.defaults ?? {}), settings: config.defaults, label: 'defaults' },
        ...config.rules.map((rule, i) => ({
            pointer: `/metrics/${i}`,
            own: (root.metrics ?? [])[i] ?? {},
            settings: { ...config.defaults, ...rule.settings },
            label: `metrics rule #${i + 1}`,
        })),
    ];
    for (const { pointer, own, settings, label } of levels) {
        const setHere = own.window !== undefined || own['min-runs'] !== undefined;
        if (settings.window < settings.minRuns && (setHere || pointer === '/defaults')) {
            const key = own.window !== undefined ? 'window' : own['min-runs'] !== undefined ? 'min-runs' : '';
            problems.push({
                ...at(key ? `${pointer}/${key}` : pointer, true),
                message: `window (${settings.window}) is smaller than min-runs (${settings.minRuns}) in ${label}, so its metrics would never leave learning`,
                fix: 'make window at least as large as min-runs',
            });
        }
        if (config.keep < settings.minRuns && (own['min-runs'] !== undefined || pointer === '/defaults')) {
            const pointerOfKeep = root.keep !== undefined ? '/keep' : `${pointer}/min-runs`;
            problems.push({
                ...at(pointerOfKeep, true),
                message: `keep (${config.keep}) is smaller than min-runs (${settings.minRuns}) in ${label}, so the history could never hold enough runs`,
                fix: 'make keep at least as large as every min-runs',
            });
        }
    }
}

;// CONCATENATED MODULE: ./src/config/load.ts







/**
 * Reads the text of a Bellgate config (YAML, `.github/bellgate.yml`) into a Config.
 * Steps: YAML under hard limits (1 MiB, 32 levels, 16 KiB scalars, 100 aliases, 10,000 values),
 * the JSON Schema (bellgate.schema.json), then the rules the schema cannot express.
 * An empty file, or one of only comments, gives the defaults.
 * Throws InputError for any problem: where = "source:line:col" of the first one, fix = what to
 * write instead; every problem found is listed in the message, in reading order.
 * @example parseConfig('defaults:\n  tolerance: 2%\n', 'bellgate.yml').defaults.tolerance // { kind: 'percent', amount: 0.02 }
 * @example parseConfig('defaults:\n  cuttoff: 0.05\n', 'bellgate.yml') // throws InputError at bellgate.yml:2:3, fix 'did you mean "cutoff"?'
 */
function parseConfig(text, source) {
    const body = text.startsWith('\uFEFF') ? text.slice(1) : text;
    const { tree, problems } = readYamlTree(body);
    if (!tree || problems.length > 0)
        throw problemsError(problems, source);
    if (tree.value === undefined || tree.value === null)
        return { ...(0,defaults/* defaultConfig */.sb)(), source };
    const schemaProblems = explainSchemaErrors(schemaErrors(tree.value), tree);
    if (schemaProblems.length > 0)
        throw problemsError(schemaProblems, source);
    const built = toConfig(tree.value, tree, source);
    if (built.problems.length > 0)
        throw problemsError(built.problems, source);
    return built.config;
}

// EXTERNAL MODULE: ./src/config/locate.ts
var locate = __webpack_require__(55562);
;// CONCATENATED MODULE: ./src/config/read.ts







/** Largest config file read, in bytes; a real one is a few kilobytes. */
const MAX_CONFIG_FILE_BYTES = 1024 * 1024;
/**
 * Reads and parses a config file. Without a path, looks for `.github/bellgate.yml` (then
 * `.yaml`) in the working folder and returns the defaults when there is none. A named path that
 * is missing is an InputError (unless `required: false`, as for the action's default input).
 * Refuses files over 1 MiB, folders and text that is not UTF-8. Messages name the path as given,
 * so "file:line:col" points where the user looks.
 * @example await readConfigFile() // defaults when the repository has no .github/bellgate.yml
 */
async function readConfigFile(path, options = {}) {
    const cwd = options.cwd ?? process.cwd();
    const required = options.required ?? path !== undefined;
    const candidates = path === undefined ? locate/* DEFAULT_CONFIG_PATHS */._X : [path];
    for (const candidate of candidates) {
        const text = await readText(candidate, (0,external_node_path_.resolve)(cwd, candidate));
        if (text !== undefined)
            return parseConfig(text, candidate);
    }
    if (required) {
        throw new input_error/* InputError */.d(`config file ${path ?? candidates[0]} does not exist`, {
            where: path,
            fix: 'check the path (it is relative to the working folder), or leave the config out to use the defaults',
        });
    }
    return (0,defaults/* defaultConfig */.sb)();
}
/** The file's text, or undefined when it does not exist. */
async function readText(shown, full) {
    let size;
    try {
        const info = await (0,promises_.stat)(full);
        if (info.isDirectory()) {
            throw new input_error/* InputError */.d(`config path ${shown} is a folder, not a file`, { where: shown, fix: 'name the YAML file itself' });
        }
        size = info.size;
    }
    catch (err) {
        if (err instanceof input_error/* InputError */.d)
            throw err;
        const code = err.code;
        if (code === 'ENOENT' || code === 'ENOTDIR')
            return undefined;
        throw new input_error/* InputError */.d(`cannot read config file ${shown} (${code ?? String(err)})`, { where: shown, fix: 'check that the file is readable', cause: err });
    }
    if (size > MAX_CONFIG_FILE_BYTES)
        throw tooLarge(shown, size);
    let bytes;
    try {
        bytes = await (0,promises_.readFile)(full);
    }
    catch (err) {
        const code = err.code;
        throw new input_error/* InputError */.d(`cannot read config file ${shown} (${code ?? String(err)})`, { where: shown, fix: 'check that the file is readable', cause: err });
    }
    // The file may have grown since stat.
    if (bytes.length > MAX_CONFIG_FILE_BYTES)
        throw tooLarge(shown, bytes.length);
    try {
        return new TextDecoder('utf-8', { fatal: true }).decode(bytes);
    }
    catch (err) {
        throw new input_error/* InputError */.d(`config file ${shown} is not UTF-8 text`, { where: shown, fix: 'save the file as UTF-8', cause: err });
    }
}
function tooLarge(shown, size) {
    return new input_error/* InputError */.d(`config file ${shown} is ${size} bytes; the limit is ${MAX_CONFIG_FILE_BYTES} (1 MiB)`, {
        where: shown,
        fix: 'a Bellgate config is a few kilobytes; check that the right file is named',
    });
}


/***/ })

};
