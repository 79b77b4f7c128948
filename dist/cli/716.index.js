export const id = 716;
export const ids = [716];
export const modules = {

/***/ 1716:
/***/ ((__unused_webpack_module, __webpack_exports__, __webpack_require__) => {

// ESM COMPAT FLAG
__webpack_require__.r(__webpack_exports__);

// EXPORTS
__webpack_require__.d(__webpack_exports__, {
  BRANCH_FOLDER: () => (/* binding */ BRANCH_FOLDER),
  DEFAULT_DATA_BRANCH: () => (/* binding */ DEFAULT_DATA_BRANCH),
  dataBranchName: () => (/* binding */ dataBranchName),
  seriesFilePath: () => (/* binding */ seriesFilePath)
});

// EXTERNAL MODULE: external "node:crypto"
var external_node_crypto_ = __webpack_require__(7598);
// EXTERNAL MODULE: ./src/errors/input-error.ts
var input_error = __webpack_require__(3712);
;// CONCATENATED MODULE: ./src/history/series-slug.ts
/**
 * A series name as a readable file-name part: letters, digits, `.`, `_` and `-` only, no leading or
 * trailing dot or dash (so never `..` or a hidden file), at most 60 characters; may be empty. Not
 * unique ("a/b" and "a b" coincide): callers add a hash of the exact name.
 * @example seriesSlug('bench/linux x64') // 'bench-linux-x64'
 */
function seriesSlug(series) {
    return series
        .replace(/[^A-Za-z0-9._-]+/g, '-')
        .replace(/^[-.]+|[-.]+$/g, '')
        .slice(0, 60);
}

;// CONCATENATED MODULE: ./src/history/branch-path.ts
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
    const slug = seriesSlug(series);
    const hash = (0,external_node_crypto_.createHash)('sha256').update(series, 'utf8').digest('hex').slice(0, 8);
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
        throw new input_error/* InputError */.dz(`input \`history\` is ${JSON.stringify(raw)}, which cannot be a branch name: ${why}`, {
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
