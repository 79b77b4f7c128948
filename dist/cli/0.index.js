export const id = 0;
export const ids = [0];
export const modules = {

/***/ 62000:
/***/ ((__unused_webpack_module, __webpack_exports__, __webpack_require__) => {

/* harmony export */ __webpack_require__.d(__webpack_exports__, {
/* harmony export */   readConfigFile: () => (/* binding */ readConfigFile)
/* harmony export */ });
/* unused harmony export MAX_CONFIG_FILE_BYTES */
/* harmony import */ var node_fs_promises__WEBPACK_IMPORTED_MODULE_0__ = __webpack_require__(51455);
/* harmony import */ var node_fs_promises__WEBPACK_IMPORTED_MODULE_0___default = /*#__PURE__*/__webpack_require__.n(node_fs_promises__WEBPACK_IMPORTED_MODULE_0__);
/* harmony import */ var node_path__WEBPACK_IMPORTED_MODULE_1__ = __webpack_require__(76760);
/* harmony import */ var node_path__WEBPACK_IMPORTED_MODULE_1___default = /*#__PURE__*/__webpack_require__.n(node_path__WEBPACK_IMPORTED_MODULE_1__);
/* harmony import */ var _model_input_error_js__WEBPACK_IMPORTED_MODULE_2__ = __webpack_require__(38250);
/* harmony import */ var _defaults_js__WEBPACK_IMPORTED_MODULE_3__ = __webpack_require__(31954);
/* harmony import */ var _load_js__WEBPACK_IMPORTED_MODULE_4__ = __webpack_require__(95446);
/* harmony import */ var _locate_js__WEBPACK_IMPORTED_MODULE_5__ = __webpack_require__(55562);







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
    const candidates = path === undefined ? _locate_js__WEBPACK_IMPORTED_MODULE_5__/* .DEFAULT_CONFIG_PATHS */ ._X : [path];
    for (const candidate of candidates) {
        const text = await readText(candidate, (0,node_path__WEBPACK_IMPORTED_MODULE_1__.resolve)(cwd, candidate));
        if (text !== undefined)
            return (0,_load_js__WEBPACK_IMPORTED_MODULE_4__/* .parseConfig */ .o)(text, candidate);
    }
    if (required) {
        throw new _model_input_error_js__WEBPACK_IMPORTED_MODULE_2__/* .InputError */ .d(`config file ${path ?? candidates[0]} does not exist`, {
            where: path,
            fix: 'check the path (it is relative to the working folder), or leave the config out to use the defaults',
        });
    }
    return (0,_defaults_js__WEBPACK_IMPORTED_MODULE_3__/* .defaultConfig */ .sb)();
}
/** The file's text, or undefined when it does not exist. */
async function readText(shown, full) {
    let size;
    try {
        const info = await (0,node_fs_promises__WEBPACK_IMPORTED_MODULE_0__.stat)(full);
        if (info.isDirectory()) {
            throw new _model_input_error_js__WEBPACK_IMPORTED_MODULE_2__/* .InputError */ .d(`config path ${shown} is a folder, not a file`, { where: shown, fix: 'name the YAML file itself' });
        }
        size = info.size;
    }
    catch (err) {
        if (err instanceof _model_input_error_js__WEBPACK_IMPORTED_MODULE_2__/* .InputError */ .d)
            throw err;
        const code = err.code;
        if (code === 'ENOENT' || code === 'ENOTDIR')
            return undefined;
        throw new _model_input_error_js__WEBPACK_IMPORTED_MODULE_2__/* .InputError */ .d(`cannot read config file ${shown} (${code ?? String(err)})`, { where: shown, fix: 'check that the file is readable', cause: err });
    }
    if (size > MAX_CONFIG_FILE_BYTES)
        throw tooLarge(shown, size);
    let bytes;
    try {
        bytes = await (0,node_fs_promises__WEBPACK_IMPORTED_MODULE_0__.readFile)(full);
    }
    catch (err) {
        const code = err.code;
        throw new _model_input_error_js__WEBPACK_IMPORTED_MODULE_2__/* .InputError */ .d(`cannot read config file ${shown} (${code ?? String(err)})`, { where: shown, fix: 'check that the file is readable', cause: err });
    }
    // The file may have grown since stat.
    if (bytes.length > MAX_CONFIG_FILE_BYTES)
        throw tooLarge(shown, bytes.length);
    try {
        return new TextDecoder('utf-8', { fatal: true }).decode(bytes);
    }
    catch (err) {
        throw new _model_input_error_js__WEBPACK_IMPORTED_MODULE_2__/* .InputError */ .d(`config file ${shown} is not UTF-8 text`, { where: shown, fix: 'save the file as UTF-8', cause: err });
    }
}
function tooLarge(shown, size) {
    return new _model_input_error_js__WEBPACK_IMPORTED_MODULE_2__/* .InputError */ .d(`config file ${shown} is ${size} bytes; the limit is ${MAX_CONFIG_FILE_BYTES} (1 MiB)`, {
        where: shown,
        fix: 'a Bellgate config is a few kilobytes; check that the right file is named',
    });
}


/***/ })

};
