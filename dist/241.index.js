export const id = 241;
export const ids = [241];
export const modules = {

/***/ 93241:
/***/ ((__unused_webpack_module, __webpack_exports__, __webpack_require__) => {

__webpack_require__.r(__webpack_exports__);
/* harmony export */ __webpack_require__.d(__webpack_exports__, {
/* harmony export */   readJunit: () => (/* binding */ readJunit)
/* harmony export */ });
/* harmony import */ var fast_xml_parser__WEBPACK_IMPORTED_MODULE_4__ = __webpack_require__(41143);
/* harmony import */ var fast_xml_parser__WEBPACK_IMPORTED_MODULE_5__ = __webpack_require__(75824);
/* harmony import */ var _errors_input_error_js__WEBPACK_IMPORTED_MODULE_0__ = __webpack_require__(33712);
/* harmony import */ var _limits_js__WEBPACK_IMPORTED_MODULE_1__ = __webpack_require__(56497);
/* harmony import */ var _numbers_js__WEBPACK_IMPORTED_MODULE_2__ = __webpack_require__(52671);
/* harmony import */ var _reading_sink_js__WEBPACK_IMPORTED_MODULE_3__ = __webpack_require__(17829);





const parser = new fast_xml_parser__WEBPACK_IMPORTED_MODULE_4__/* ["default"] */ .A({
    ignoreAttributes: false,
    attributeNamePrefix: '@_',
    parseAttributeValue: false,
    parseTagValue: false,
    isArray: (tag) => tag === 'testsuite' || tag === 'testcase' || tag === 'testsuites',
});
/**
 * Reads JUnit XML test reports (the `testsuites`/`testsuite`/`testcase` layout written by most
 * test runners). Every time is in seconds (unit "s").
 * - Each test suite with a `time` gives metric `<suite>` (nested suites: `<outer>/<inner>`).
 * - Each passed test case gives metric `<suite>/<classname>/<name>`; an empty part is left out,
 *   and so is a classname equal to the suite's name (many runners repeat it).
 * - Skipped, failed and erroring cases, and cases without a `time`, go to `notFitted` with the
 *   reason instead: their times say nothing about speed.
 * - A name that repeats (retries, several files) gives several samples of one metric.
 * - The document is parsed whole, so its `<testcase>` and `<testsuite>` elements are counted first
 *   and a file with more than `limits.max-samples` of them is refused before parsing.
 * @throws InputError with file:line:col for malformed XML, and with the element path
 *   (`file:/testsuites/testsuite[2]/testcase[5]`) for a missing name or a time that is not a number.
 * @example readJunit('<testsuite name="s" time="2"><testcase name="t" time="1"/></testsuite>', 'j.xml').readings.map((r) => r.name) // ['s', 's/t']
 */
function readJunit(text, file, limits = _limits_js__WEBPACK_IMPORTED_MODULE_1__/* .DEFAULT_LIMITS */ .dR) {
    if (countElements(text) > limits.maxSamples) {
        const what = `${file} has more than ${limits.maxSamples} test cases and suites`;
        throw (0,_limits_js__WEBPACK_IMPORTED_MODULE_1__/* .limitError */ .yT)('maxSamples', limits.maxSamples, file, what);
    }
    const checked = fast_xml_parser__WEBPACK_IMPORTED_MODULE_5__/* .XMLValidator */ .iI.validate(text);
    if (checked !== true) {
        const { msg, line, col } = checked.err;
        throw new _errors_input_error_js__WEBPACK_IMPORTED_MODULE_0__/* .InputError */ .dz(`malformed XML: ${msg}`, {
            where: `${file}:${line}:${col}`,
            fix: 'check that the file is complete, well-formed XML',
        });
    }
    let doc;
    try {
        doc = parser.parse(text);
    }
    catch (error) {
        throw new _errors_input_error_js__WEBPACK_IMPORTED_MODULE_0__/* .InputError */ .dz(`malformed XML: ${error instanceof Error ? error.message : String(error)}`, {
            where: file,
            cause: error,
        });
    }
    const sink = new _reading_sink_js__WEBPACK_IMPORTED_MODULE_3__/* .ReadingSink */ .I(file, limits);
    const roots = asElements(doc.testsuites);
    if (roots.length > 0) {
        roots.forEach((root, i) => {
            const where = `${file}:/testsuites${index(roots, i)}`;
            // Some writers put test cases straight under <testsuites>; they have no suite part.
            const cases = asElements(root.testcase);
            cases.forEach((testCase, j) => readCase(testCase, `${where}/testcase${index(cases, j)}`, [], '', sink));
            readSuites(root, where, [], sink);
        });
    }
    else if (doc.testsuite !== undefined) {
        readSuites(doc, `${file}:`, [], sink);
    }
    else {
        throw new _errors_input_error_js__WEBPACK_IMPORTED_MODULE_0__/* .InputError */ .dz('no <testsuites> or <testsuite> element at the root', {
            where: file,
            fix: 'pass a JUnit XML report, or choose the format with --input-format',
        });
    }
    return sink.result;
}
/** How many `<testcase` and `<testsuite` openings (not `<testsuites`) the text has: one linear scan. */
function countElements(text) {
    let count = 0;
    for (let at = text.indexOf('<test'); at >= 0; at = text.indexOf('<test', at + 5)) {
        if (text.startsWith('case', at + 5) || (text.startsWith('suite', at + 5) && text[at + 10] !== 's'))
            count++;
    }
    return count;
}
function readSuites(parent, path, suitePath, sink) {
    const suites = asElements(parent.testsuite);
    suites.forEach((suite, i) => {
        const where = `${path}/testsuite${index(suites, i)}`;
        const name = attribute(suite, 'name');
        const names = name === '' ? suitePath : [...suitePath, name];
        const time = attribute(suite, 'time');
        if (time !== '' && names.length > 0)
            sink.add(names.join('/'), seconds(time, where), 's', where);
        const cases = asElements(suite.testcase);
        cases.forEach((testCase, j) => readCase(testCase, `${where}/testcase${index(cases, j)}`, names, name, sink));
        readSuites(suite, where, names, sink);
    });
}
function readCase(testCase, where, suitePath, suiteName, sink) {
    const caseName = attribute(testCase, 'name');
    if (caseName === '') {
        throw new _errors_input_error_js__WEBPACK_IMPORTED_MODULE_0__/* .InputError */ .dz('test case has no name attribute', { where, fix: 'give every <testcase> a name' });
    }
    const className = attribute(testCase, 'classname');
    const parts = [...suitePath, className === suiteName ? '' : className, caseName].filter((p) => p !== '');
    const name = parts.join('/');
    const outcome = ['skipped', 'failure', 'error'].find((tag) => testCase[tag] !== undefined);
    if (outcome !== undefined) {
        const detail = attribute(asElements(testCase[outcome])[0] ?? {}, 'message');
        const reason = { skipped: 'skipped', failure: 'failed', error: 'error' }[outcome];
        sink.skip(name, detail === '' ? reason : `${reason}: ${detail}`, where);
        return;
    }
    const time = attribute(testCase, 'time');
    if (time === '')
        sink.skip(name, 'no time recorded', where);
    else
        sink.add(name, seconds(time, where), 's', where);
}
function seconds(text, where) {
    const value = (0,_numbers_js__WEBPACK_IMPORTED_MODULE_2__/* .parseDecimal */ .$Q)(text, `${where}@time`, 'time');
    if (value < 0) {
        throw new _errors_input_error_js__WEBPACK_IMPORTED_MODULE_0__/* .InputError */ .dz(`time ${text} is negative`, {
            where: `${where}@time`,
            fix: 'write the duration in seconds, 0 or more',
        });
    }
    return value;
}
/** Child elements as objects; `<skipped/>` parses to '' and is treated as an element without attributes. */
function asElements(value) {
    if (value === undefined)
        return [];
    const list = Array.isArray(value) ? value : [value];
    return list.map((v) => (typeof v === 'object' && v !== null ? v : {}));
}
function attribute(element, name) {
    const value = element[`@_${name}`];
    return typeof value === 'string' ? value.trim() : '';
}
function index(list, i) {
    return list.length > 1 ? `[${i + 1}]` : '';
}


/***/ })

};
