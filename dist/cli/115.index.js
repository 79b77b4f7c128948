export const id = 115;
export const ids = [115];
export const modules = {

/***/ 1115:
/***/ ((__unused_webpack_module, __webpack_exports__, __webpack_require__) => {


// EXPORTS
__webpack_require__.d(__webpack_exports__, {
  readConfigFile: () => (/* binding */ readConfigFile)
});

// UNUSED EXPORTS: DEFAULT_CONFIG_PATHS, MAX_CONFIG_FILE_BYTES

// EXTERNAL MODULE: external "node:fs/promises"
var promises_ = __webpack_require__(1455);
// EXTERNAL MODULE: external "node:path"
var external_node_path_ = __webpack_require__(6760);
// EXTERNAL MODULE: ./src/model/input-error.ts
var input_error = __webpack_require__(8250);
// EXTERNAL MODULE: ./src/config/defaults.ts
var defaults = __webpack_require__(1954);
// EXTERNAL MODULE: ./src/config/config-text.ts + 10 modules
var config_text = __webpack_require__(6964);
// EXTERNAL MODULE: ./src/config/name-matchers.ts
var name_matchers = __webpack_require__(6471);
;// CONCATENATED MODULE: ./src/config/parse-lazily.ts



/**
 * parseConfig (load.ts), loading the glob library (picomatch, ~60 KB) only when a rule or group
 * has a glob that is more than a plain name: a config without rules, or with rules over exact
 * metric names, is read without it. Same Config, same InputError for every input.
 * @throws InputError as parseConfig.
 * @example (await parseConfigLazily('keep: 900\n', 'bellgate.yml')).keep // 900
 */
async function parseConfigLazily(text, source) {
    const tree = (0,config_text/* checkedConfigTree */.wR)(text, source);
    if (tree === undefined)
        return { ...(0,defaults/* defaultConfig */.sb)(), source };
    const globs = (0,config_text/* needsGlobLibrary */.jW)(tree.value) ? (await Promise.all(/* import() */[__webpack_require__.e(6), __webpack_require__.e(517)]).then(__webpack_require__.bind(__webpack_require__, 517))).picomatchCompiler : name_matchers/* exactNameCompiler */.Cp;
    return (0,config_text/* configFromTree */.H2)(tree, source, globs);
}

// EXTERNAL MODULE: ./src/config/locate.ts
var locate = __webpack_require__(5562);
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
            return parseConfigLazily(text, candidate);
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
