export const id = 604;
export const ids = [604];
export const modules = {

/***/ 6604:
/***/ ((__unused_webpack_module, __webpack_exports__, __webpack_require__) => {

__webpack_require__.r(__webpack_exports__);
/* harmony export */ __webpack_require__.d(__webpack_exports__, {
/* harmony export */   DEMO_FILES: () => (/* binding */ DEMO_FILES),
/* harmony export */   locateDemo: () => (/* binding */ locateDemo)
/* harmony export */ });
/* harmony import */ var node_fs__WEBPACK_IMPORTED_MODULE_0__ = __webpack_require__(3024);
/* harmony import */ var node_fs__WEBPACK_IMPORTED_MODULE_0___default = /*#__PURE__*/__webpack_require__.n(node_fs__WEBPACK_IMPORTED_MODULE_0__);
/* harmony import */ var node_path__WEBPACK_IMPORTED_MODULE_1__ = __webpack_require__(6760);
/* harmony import */ var node_path__WEBPACK_IMPORTED_MODULE_1___default = /*#__PURE__*/__webpack_require__.n(node_path__WEBPACK_IMPORTED_MODULE_1__);
/* harmony import */ var node_url__WEBPACK_IMPORTED_MODULE_2__ = __webpack_require__(3136);
/* harmony import */ var node_url__WEBPACK_IMPORTED_MODULE_2___default = /*#__PURE__*/__webpack_require__.n(node_url__WEBPACK_IMPORTED_MODULE_2__);
/* harmony import */ var _model_input_error_js__WEBPACK_IMPORTED_MODULE_3__ = __webpack_require__(8250);




/** The files of the demo scenario, all in examples/demo. */
const DEMO_FILES = { history: 'history.json', run: 'pr-run.json', config: 'bellgate.yml' };
/**
 * Finds examples/demo. The same code runs from src/cli/ (tests), from the bundle dist/cli/index.js
 * and from an installed package, so the folder is looked for two and three levels above this
 * module and above the running script, then in the working folder.
 * @throws InputError naming the places tried when none holds the demo data.
 */
function locateDemo(cwd, script, moduleUrl = import.meta.url) {
    const starts = [];
    try {
        starts.push((0,node_path__WEBPACK_IMPORTED_MODULE_1__.dirname)((0,node_url__WEBPACK_IMPORTED_MODULE_2__.fileURLToPath)(moduleUrl)));
    }
    catch {
        // A bundler may leave a non-file URL here; the script path and cwd still work.
    }
    if (script)
        starts.push((0,node_path__WEBPACK_IMPORTED_MODULE_1__.dirname)((0,node_path__WEBPACK_IMPORTED_MODULE_1__.resolve)(script)));
    const candidates = [
        ...starts.flatMap((s) => [(0,node_path__WEBPACK_IMPORTED_MODULE_1__.resolve)(s, '..', '..', 'examples', 'demo'), (0,node_path__WEBPACK_IMPORTED_MODULE_1__.resolve)(s, '..', '..', '..', 'examples', 'demo')]),
        (0,node_path__WEBPACK_IMPORTED_MODULE_1__.resolve)(cwd, 'examples', 'demo'),
    ];
    const unique = [...new Set(candidates)];
    const found = unique.find((dir) => Object.values(DEMO_FILES).every((f) => (0,node_fs__WEBPACK_IMPORTED_MODULE_0__.existsSync)((0,node_path__WEBPACK_IMPORTED_MODULE_1__.join)(dir, f))));
    if (found === undefined) {
        throw new _model_input_error_js__WEBPACK_IMPORTED_MODULE_3__/* .InputError */ .d('cannot find the demo data (examples/demo)', {
            where: unique.join(', '),
            fix: 'run the demo from a Bellgate checkout (npm run demo), where examples/demo holds history.json, pr-run.json and bellgate.yml',
        });
    }
    return found;
}


/***/ })

};
