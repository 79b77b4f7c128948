export const id = 148;
export const ids = [148];
export const modules = {

/***/ 39148:
/***/ ((__unused_webpack_module, __webpack_exports__, __webpack_require__) => {

/* harmony export */ __webpack_require__.d(__webpack_exports__, {
/* harmony export */   DEFAULT_DATA_BRANCH: () => (/* binding */ DEFAULT_DATA_BRANCH),
/* harmony export */   dataBranchName: () => (/* binding */ dataBranchName),
/* harmony export */   h: () => (/* binding */ seriesFilePath)
/* harmony export */ });
/* unused harmony export BRANCH_FOLDER */
/* harmony import */ var node_crypto__WEBPACK_IMPORTED_MODULE_0__ = __webpack_require__(77598);
/* harmony import */ var node_crypto__WEBPACK_IMPORTED_MODULE_0___default = /*#__PURE__*/__webpack_require__.n(node_crypto__WEBPACK_IMPORTED_MODULE_0__);
/* harmony import */ var _errors_input_error_js__WEBPACK_IMPORTED_MODULE_1__ = __webpack_require__(33712);
/* harmony import */ var _series_slug_js__WEBPACK_IMPORTED_MODULE_2__ = __webpack_require__(78547);
/**
 * Names on the data branch: the branch itself (checked against git's ref-name rules so a typo is an
 * input error, not a 422 from the API) and the file of one series, `bellgate/<slug>-<hash>.json`.
 */



/** The data branch used when the `history` input is left at its default. */
const DEFAULT_DATA_BRANCH = 'bellgate-data';
/** The folder on the data branch that holds one history file per series. */
const BRANCH_FOLDER = 'bellgate';
/**
 * The file of a series on the data branch: a readable slug (letters, digits, `.`, `_`, `-`; no
 * leading dot, so never `..` or a hidden file) plus 8 hex of SHA-256 of the exact series name, so
 * series whose slugs coincide ("a/b", "a b") still get different files. Any string is safe.
 * @example seriesFilePath('bench/linux') // 'bellgate/bench-linux-<8 hex>.jsonl'
 */
function seriesFilePath(series) {
    const slug = (0,_series_slug_js__WEBPACK_IMPORTED_MODULE_2__/* .seriesSlug */ .B)(series);
    const hash = (0,node_crypto__WEBPACK_IMPORTED_MODULE_0__.createHash)('sha256').update(series, 'utf8').digest('hex').slice(0, 8);
    return `${BRANCH_FOLDER}/${slug === '' ? hash : `${slug}-${hash}`}.jsonl`;
}
/**
 * Checks a branch name against the rules of git's check-ref-format (from memory: no `..`, no
 * control characters, space, `~ ^ : ? * [ \`, no `@{`, no component starting with `.` or ending in
 * `.lock`, no leading `-`, no empty component, not `@`). Returns the name without `refs/heads/`.
 * @throws InputError naming the rule and the input.
 * @example dataBranchName('refs/heads/bellgate-data') // 'bellgate-data'
 */
function dataBranchName(raw) {
    const name = raw.trim().replace(/^refs\/heads\//, '');
    const bad = (why) => {
        throw new _errors_input_error_js__WEBPACK_IMPORTED_MODULE_1__/* .InputError */ .dz(`input \`history\` is ${JSON.stringify(raw)}, which cannot be a branch name: ${why}`, {
            where: 'input history',
            fix: `name the data branch with letters, digits, dashes and slashes, e.g. \`history: ${DEFAULT_DATA_BRANCH}\``,
        });
    };
    if (name === '' || name === '@')
        bad('it is empty');
    if (name.length > 200)
        bad('it is longer than 200 characters');
    if (/[\u0000-\u0020\u007f~^:?*[\\]/.test(name))
        bad('it holds a space, a control character or one of ~ ^ : ? * [ \\');
    if (name.includes('..') || name.includes('@{'))
        bad('it holds ".." or "@{"');
    if (name.startsWith('-'))
        bad('it starts with "-"');
    for (const part of name.split('/')) {
        if (part === '')
            bad('it has an empty path component (a leading, trailing or double "/")');
        if (part.startsWith('.') || part.endsWith('.lock'))
            bad('a component starts with "." or ends with ".lock"');
    }
    if (name.endsWith('.'))
        bad('it ends with "."');
    return name;
}


/***/ })

};
