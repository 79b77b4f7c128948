export const id = 517;
export const ids = [517];
export const modules = {

/***/ 517:
/***/ ((__unused_webpack_module, __webpack_exports__, __webpack_require__) => {

__webpack_require__.r(__webpack_exports__);
/* harmony export */ __webpack_require__.d(__webpack_exports__, {
/* harmony export */   compileGlobs: () => (/* binding */ compileGlobs),
/* harmony export */   isLiteralGlob: () => (/* binding */ isLiteralGlob),
/* harmony export */   picomatchCompiler: () => (/* binding */ picomatchCompiler)
/* harmony export */ });
/* harmony import */ var picomatch__WEBPACK_IMPORTED_MODULE_1__ = __webpack_require__(4006);
/* harmony import */ var picomatch__WEBPACK_IMPORTED_MODULE_1___default = /*#__PURE__*/__webpack_require__.n(picomatch__WEBPACK_IMPORTED_MODULE_1__);
/* harmony import */ var _name_matchers_js__WEBPACK_IMPORTED_MODULE_0__ = __webpack_require__(6471);


// Metric names are not paths: a leading '.' is an ordinary character (dot: true), and '\' is
// never a separator, whatever the operating system (windows: false).
const OPTIONS = { dot: true, windows: false };
/**
 * Compiles a rule's globs (picomatch syntax) into one matcher: a name matches when it matches at
 * least one plain glob and no glob starting with '!' (only '!' globs: everything but those).
 * Metric names contain '/', and `*` stays within one '/' segment while `**` crosses segments:
 * `throughput/*` matches `throughput/home` but not `throughput/api/v2`; `size/**` matches both
 * `size/app.js` and `size/assets/logo.svg`. Globs that are plain names are compared as strings
 * (exactMatcher, the same answers). Compiled once per globs array and filed for settingsFor.
 * Throws picomatch's error for a pattern it cannot compile (load.ts reports it with line:column).
 * @example compileGlobs(['latency/*', '!latency/calibrate'])('latency/render') // true
 */
function compileGlobs(globs) {
    const known = (0,_name_matchers_js__WEBPACK_IMPORTED_MODULE_0__/* .knownMatcher */ .at)(globs);
    if (known)
        return known;
    const exact = (0,_name_matchers_js__WEBPACK_IMPORTED_MODULE_0__/* .exactMatcher */ .Gh)(globs);
    if (exact)
        return (0,_name_matchers_js__WEBPACK_IMPORTED_MODULE_0__/* .rememberMatcher */ .gV)(globs, exact);
    const plain = globs.filter((g) => !g.startsWith('!'));
    const negated = globs.filter((g) => g.startsWith('!')).map((g) => g.slice(1));
    const include = plain.length > 0 ? picomatch__WEBPACK_IMPORTED_MODULE_1___default()(plain, OPTIONS) : () => true;
    const exclude = negated.length > 0 ? picomatch__WEBPACK_IMPORTED_MODULE_1___default()(negated, OPTIONS) : () => false;
    return (0,_name_matchers_js__WEBPACK_IMPORTED_MODULE_0__/* .rememberMatcher */ .gV)(globs, (name) => include(name) && !exclude(name));
}
/**
 * True when the glob has no wildcard or brace characters, so it names exactly one metric.
 * @example isLiteralGlob('latency/calibrate') // true
 */
function isLiteralGlob(glob) {
    return !picomatch__WEBPACK_IMPORTED_MODULE_1___default().scan(glob).isGlob && !glob.startsWith('!');
}
/** The full glob syntax, through picomatch. */
const picomatchCompiler = { compile: compileGlobs, isLiteral: isLiteralGlob };
// Once picomatch is loaded anyway, globs filed by no reader (a Config built in code) still match.
(0,_name_matchers_js__WEBPACK_IMPORTED_MODULE_0__/* .useFallbackCompiler */ .Bz)(compileGlobs);


/***/ })

};
