export const id = 838;
export const ids = [838];
export const modules = {

/***/ 7336:
/***/ ((module) => {

let p = process || {}, argv = p.argv || [], env = p.env || {}
let isColorSupported =
	!(!!env.NO_COLOR || argv.includes("--no-color")) &&
	(!!env.FORCE_COLOR || argv.includes("--color") || p.platform === "win32" || ((p.stdout || {}).isTTY && env.TERM !== "dumb") || !!env.CI)

let formatter = (open, close, replace = open) =>
	input => {
		let string = "" + input, index = string.indexOf(close, open.length)
		return ~index ? open + replaceClose(string, close, replace, index) + close : open + string + close
	}

let replaceClose = (string, close, replace, index) => {
	let result = "", cursor = 0
	do {
		result += string.substring(cursor, index) + replace
		cursor = index + close.length
		index = string.indexOf(close, cursor)
	} while (~index)
	return result + string.substring(cursor)
}

let createColors = (enabled = isColorSupported) => {
	let f = enabled ? formatter : () => String
	return {
		isColorSupported: enabled,
		reset: f("\x1b[0m", "\x1b[0m"),
		bold: f("\x1b[1m", "\x1b[22m", "\x1b[22m\x1b[1m"),
		dim: f("\x1b[2m", "\x1b[22m", "\x1b[22m\x1b[2m"),
		italic: f("\x1b[3m", "\x1b[23m"),
		underline: f("\x1b[4m", "\x1b[24m"),
		inverse: f("\x1b[7m", "\x1b[27m"),
		hidden: f("\x1b[8m", "\x1b[28m"),
		strikethrough: f("\x1b[9m", "\x1b[29m"),

		black: f("\x1b[30m", "\x1b[39m"),
		red: f("\x1b[31m", "\x1b[39m"),
		green: f("\x1b[32m", "\x1b[39m"),
		yellow: f("\x1b[33m", "\x1b[39m"),
		blue: f("\x1b[34m", "\x1b[39m"),
		magenta: f("\x1b[35m", "\x1b[39m"),
		cyan: f("\x1b[36m", "\x1b[39m"),
		white: f("\x1b[37m", "\x1b[39m"),
		gray: f("\x1b[90m", "\x1b[39m"),

		bgBlack: f("\x1b[40m", "\x1b[49m"),
		bgRed: f("\x1b[41m", "\x1b[49m"),
		bgGreen: f("\x1b[42m", "\x1b[49m"),
		bgYellow: f("\x1b[43m", "\x1b[49m"),
		bgBlue: f("\x1b[44m", "\x1b[49m"),
		bgMagenta: f("\x1b[45m", "\x1b[49m"),
		bgCyan: f("\x1b[46m", "\x1b[49m"),
		bgWhite: f("\x1b[47m", "\x1b[49m"),

		blackBright: f("\x1b[90m", "\x1b[39m"),
		redBright: f("\x1b[91m", "\x1b[39m"),
		greenBright: f("\x1b[92m", "\x1b[39m"),
		yellowBright: f("\x1b[93m", "\x1b[39m"),
		blueBright: f("\x1b[94m", "\x1b[39m"),
		magentaBright: f("\x1b[95m", "\x1b[39m"),
		cyanBright: f("\x1b[96m", "\x1b[39m"),
		whiteBright: f("\x1b[97m", "\x1b[39m"),

		bgBlackBright: f("\x1b[100m", "\x1b[49m"),
		bgRedBright: f("\x1b[101m", "\x1b[49m"),
		bgGreenBright: f("\x1b[102m", "\x1b[49m"),
		bgYellowBright: f("\x1b[103m", "\x1b[49m"),
		bgBlueBright: f("\x1b[104m", "\x1b[49m"),
		bgMagentaBright: f("\x1b[105m", "\x1b[49m"),
		bgCyanBright: f("\x1b[106m", "\x1b[49m"),
		bgWhiteBright: f("\x1b[107m", "\x1b[49m"),
	}
}

module.exports = createColors()
module.exports.createColors = createColors


/***/ }),

/***/ 4838:
/***/ ((__unused_webpack_module, __webpack_exports__, __webpack_require__) => {

// ESM COMPAT FLAG
__webpack_require__.r(__webpack_exports__);

// EXPORTS
__webpack_require__.d(__webpack_exports__, {
  REPORT_FORMATS: () => (/* reexport */ options/* REPORT_FORMATS */.EL),
  performCheck: () => (/* binding */ performCheck),
  verdictExitCode: () => (/* binding */ verdictExitCode)
});

// EXTERNAL MODULE: ./src/gate/gate.ts + 16 modules
var gate = __webpack_require__(8129);
;// CONCATENATED MODULE: ./src/report/json.ts
/** JSON has no NaN or Infinity; a number that is not finite becomes null, never a string. */
const num = (x) => (x !== undefined && Number.isFinite(x) ? x : null);
/** Copy the optional extras in a fixed order, leaving out the absent ones. */
function extras(pairs) {
    const o = {};
    for (const [k, v] of pairs)
        if (v !== undefined)
            o[k] = v;
    return o;
}
function baseline(b) {
    if (!b)
        return null;
    return {
        n: num(b.n),
        mean: num(b.mean),
        sd: num(b.sd),
        ...extras([
            ['scale', b.scale],
            ['since', b.since],
            ['relativeTo', b.relativeTo],
        ]),
    };
}
function metric(m) {
    // DESIGN.md's fields first and always present (null when not known), then the extras.
    return {
        name: m.name,
        status: m.status,
        value: num(m.value),
        unit: m.unit ?? null,
        baseline: baseline(m.baseline),
        z: num(m.z),
        change: num(m.change),
        density: num(m.density),
        relativeDensity: num(m.relativeDensity),
        cutoff: num(m.cutoff),
        ...extras([
            ['worse', m.worse],
            ['count', m.count === undefined ? undefined : num(m.count)],
            ['tail', m.tail === undefined ? undefined : num(m.tail)],
            ['adjusted', m.adjusted === undefined ? undefined : num(m.adjusted)],
            ['group', m.group],
            ['recent', m.recent?.map(num)],
            ['reason', m.reason],
        ]),
    };
}
function group(g) {
    return {
        name: g.name,
        status: g.status,
        members: g.members.map((m) => ({ name: m.name, share: num(m.share), ownZ: num(m.ownZ) })),
        n: num(g.n),
        distance: num(g.distance),
        tail: num(g.tail),
        level: num(g.level),
        common: { z: num(g.common.z), tail: num(g.common.tail), status: g.common.status },
        shrinkage: num(g.shrinkage),
        ...extras([
            ['distanceTail', g.distanceTail === undefined ? undefined : num(g.distanceTail)],
            ['ownTail', g.ownTail === undefined ? undefined : num(g.ownTail)],
            ['adjusted', g.adjusted === undefined ? undefined : num(g.adjusted)],
        ]),
        reason: g.reason,
    };
}
/**
 * The JSON report (`--format json`, the action's `report` output) with DESIGN.md's field names in
 * a stable order: schema, verdict, series, family, metrics[], groups[]. Non-finite numbers become
 * null; 2-space indent; ends with a newline. Names are values, never keys, so an untrusted name
 * such as `__proto__` cannot reach an object's prototype.
 * @example JSON.parse(renderJson(report)).schema // 'bellgate.report/1'
 */
function renderJson(report) {
    const doc = {
        schema: report.schema,
        verdict: report.verdict,
        series: report.series,
        family: report.family,
        metrics: report.metrics.map(metric),
        groups: report.groups.map(group),
    };
    return JSON.stringify(doc, null, 2) + '\n';
}

// EXTERNAL MODULE: ./src/report/cells.ts
var report_cells = __webpack_require__(571);
// EXTERNAL MODULE: ./src/report/escape.ts
var report_escape = __webpack_require__(4031);
// EXTERNAL MODULE: ./src/report/format.ts
var format = __webpack_require__(2011);
;// CONCATENATED MODULE: ./src/report/marker.ts
/**
 * The hidden marker that lets the action find its own PR comment for a series and update it in
 * place. Percent-encoding keeps any series name inside one HTML comment: no `-->` can close it
 * early and no newline can split it.
 * @example commentMarker('linux x64') // 'bellgate:series=linux%20x64'
 */
function commentMarker(series) {
    return `bellgate:series=${safeMarker(series)}`;
}
/**
 * Percent-encode everything but [A-Za-z0-9._~-] (and a `-` that starts `--`), so the text is safe
 * inside `<!-- ... -->`: it can contain neither `>` nor the `--` that HTML forbids in comments.
 * @example safeMarker('a-->b') // 'a%2D-%3Eb'
 */
function safeMarker(s) {
    return encodeURIComponent(s)
        .replace(/[!'()*]/g, (ch) => `%${ch.charCodeAt(0).toString(16).toUpperCase()}`)
        .replace(/-(?=-)/g, '%2D');
}
/** The first line of a comment: `<!-- marker -->`; a marker from commentMarker passes unchanged. */
function markerLine(marker) {
    const safe = marker.replace(/[^A-Za-z0-9._~:=/%-]/g, (ch) => safeMarker(ch)).replace(/-(?=-)/g, '%2D');
    return `<!-- ${safe} -->`;
}

// EXTERNAL MODULE: ./src/report/sparkline.ts
var sparkline = __webpack_require__(9833);
// EXTERNAL MODULE: ./src/report/status.ts
var report_status = __webpack_require__(6934);
;// CONCATENATED MODULE: ./src/report/markdown.ts






/** GitHub rejects comment bodies over 65,536 characters; stay well under with room for the footer. */
const MARKDOWN_LIMIT = 65_536;
const BUDGET = MARKDOWN_LIMIT - 2_000;
const FLAGGED = new Set(['regressed', 'improved']);
const HEAD = '| status | metric | baseline (mean ± sd) | this run | change | sigma | rel. density vs cutoff |\n|---|---|---|---|---|---|---|';
function row(m) {
    const unit = m.unit === undefined ? undefined : (0,report_escape/* escapeMarkdown */.F)(m.unit, 20);
    const c = (0,report_cells/* metricCells */.G)(m, unit);
    const status = FLAGGED.has(m.status) ? `${report_status/* STATUS_GLYPH */.id[m.status]} **${m.status}**` : `${report_status/* STATUS_GLYPH */.id[m.status]} ${m.status}`;
    return `| ${status} | ${(0,report_escape/* escapeMarkdown */.F)(m.name)} | ${c.baseline} | ${c.value} | ${c.change} | ${c.sigma} | ${c.density.replace('<', '&lt;')} |`;
}
function picture(m) {
    const recent = m.recent ?? [];
    const line = (0,sparkline/* sparkline */.KM)(recent, m.value);
    const unit = m.unit === undefined ? undefined : (0,report_escape/* escapeMarkdown */.F)(m.unit, 20);
    const shown = line ? `\`${line}\` ${recent.length} baseline runs → this run ${(0,format/* formatValue */.Fl)(m.value, unit)}` : `this run ${(0,format/* formatValue */.Fl)(m.value, unit)}`;
    return `- **${(0,report_escape/* escapeMarkdown */.F)(m.name)}** ${shown}. ${(0,report_escape/* escapeMarkdown */.F)(m.reason, 500)}`;
}
function groupLine(g) {
    const top = [...g.members]
        .sort((a, b) => b.share - a.share)
        .slice(0, 3)
        .map((m) => `${(0,report_escape/* escapeMarkdown */.F)(m.name)} ${Math.round(m.share * 100)}% (own ${(0,format/* formatSigma */.Hx)(m.ownZ)})`);
    return `- group **${(0,report_escape/* escapeMarkdown */.F)(g.name)}**: ${g.status} — common move ${(0,format/* formatSigma */.Hx)(g.common.z)} (${g.common.status}); main contributors: ${top.join(', ') || 'none'}. ${(0,report_escape/* escapeMarkdown */.F)(g.reason, 500)}`;
}
/** Take lines while they fit in `room` characters; say how many were left out. */
function fit(lines, room, what) {
    const kept = [];
    let used = 0;
    for (const [i, l] of lines.entries()) {
        if (used + l.length + 1 > room - 200) {
            kept.push(`\n_…and ${lines.length - i} more ${what} not shown (comment size limit); see the JSON report._`);
            break;
        }
        kept.push(l);
        used += l.length + 1;
    }
    const text = kept.join('\n');
    return { text, used: text.length };
}
const isWebUrl = (u) => u !== undefined && /^https?:\/\/[^\s<>()[\]"'`]+$/.test(u);
/**
 * The PR comment and job summary: optional hidden marker, a one-line verdict, a table of flagged
 * metrics with a sparkline of each one's recent baseline and this run, the groups' findings, and
 * every other metric in a collapsed `<details>` table; links to the run and HTML report when given;
 * a footer naming Bellgate. Every metric-file string passes escapeMarkdown. The body stays under
 * GitHub's 65,536-character limit by cutting table rows with a note.
 * @example renderMarkdown(report, { marker: commentMarker('ci') }).startsWith('<!-- bellgate:series=ci -->') // true
 */
function renderMarkdown(report, options = {}) {
    const out = [];
    if (options.marker !== undefined)
        out.push(markerLine(options.marker));
    const counts = (0,report_status/* statusCounts */.rc)(report.metrics.map((m) => m.status)) || 'no metrics';
    out.push(`### Bellgate: **${report.verdict}** — ${counts}`);
    out.push(`Verdict ${report.verdict}: ${report_status/* VERDICT_HEADLINE */.pB[report.verdict]} (series ${(0,report_escape/* escapeMarkdown */.F)(report.series)}).`);
    let room = BUDGET - out.join('\n').length;
    const sorted = [...report.metrics].sort((a, b) => (0,report_status/* statusRank */.Tx)(a.status) - (0,report_status/* statusRank */.Tx)(b.status));
    const flagged = sorted.filter((m) => FLAGGED.has(m.status));
    const rest = sorted.filter((m) => !FLAGGED.has(m.status));
    const add = (text) => {
        out.push(text);
        room -= text.length + 1;
    };
    if (flagged.length > 0) {
        add('');
        add(`${HEAD}\n${fit(flagged.map(row), room / 2, 'flagged metrics').text}`);
        add('');
        add(fit(flagged.map(picture), room / 2, 'pictures').text);
    }
    if (report.groups.length > 0) {
        add('');
        add(fit(report.groups.map(groupLine), room / 2, 'groups').text);
    }
    if (rest.length > 0) {
        add('');
        add(`<details><summary>${rest.length} other metric${rest.length === 1 ? '' : 's'}: ${(0,report_status/* statusCounts */.rc)(rest.map((m) => m.status))}</summary>\n`);
        add(`${HEAD}\n${fit(rest.map(row), room, 'metrics').text}\n\n</details>`);
    }
    const links = [];
    if (isWebUrl(options.runUrl))
        links.push(`[workflow run](${options.runUrl})`);
    if (isWebUrl(options.htmlReportUrl))
        links.push(`[full HTML report](${options.htmlReportUrl})`);
    out.push('');
    if (links.length > 0)
        out.push(links.join(' · '));
    out.push('<sub>Reported by Bellgate: a metric is flagged when its relative density under the baseline fit falls below its cutoff on its worse side.</sub>');
    return out.join('\n') + '\n';
}

// EXTERNAL MODULE: ./node_modules/picocolors/picocolors.js
var picocolors = __webpack_require__(7336);
var picocolors_default = /*#__PURE__*/__webpack_require__.n(picocolors);
// EXTERNAL MODULE: ./src/report/clean.ts
var clean = __webpack_require__(23);
;// CONCATENATED MODULE: ./src/report/text.ts





/** Names are capped shorter in a terminal table than elsewhere, so a row fits a wide terminal. */
const TEXT_NAME_MAX = 80;
/** The statuses of the table, in statusRank order. */
const JUDGED = ['regressed', 'improved', 'ok'];
const LISTED = ['missing', 'learning', 'new', 'ignored'];
function paint(c, s, text) {
    if (s === 'regressed')
        return c.red(c.bold(text));
    if (s === 'improved')
        return c.green(text);
    if (s === 'missing')
        return c.yellow(text);
    if (s === 'ok')
        return text;
    return c.dim(text);
}
// Printable ASCII only: such a name is what cleanText would return (within the cap), and its
// width is its length. One native regular-expression test per cell costs less than a loop over
// its characters in a process that runs the report once, before the loop could be optimised.
const PLAIN = /^[\u0020-\u007E]*$/;
const SURROGATE = /[\uD800-\uDFFF]/;
/** cleanText, skipping its two replacements for a printable-ASCII name within the cap. */
function text_clean(s, max) {
    return s.length <= max && PLAIN.test(s) ? s : (0,clean/* cleanText */.X)(s, max);
}
/** Width in code points (Array.from(s).length), building the array only when a pair can occur. */
function codePoints(s) {
    return SURROGATE.test(s) ? Array.from(s).length : s.length;
}
function text_groupLine(g) {
    const top = [...g.members]
        .sort((a, b) => b.share - a.share)
        .slice(0, 3)
        .map((m) => `${text_clean(m.name, TEXT_NAME_MAX)} (${Math.round(m.share * 100)}%, own ${(0,format/* formatSigma */.Hx)(m.ownZ)})`);
    return `group ${text_clean(g.name, TEXT_NAME_MAX)}: ${g.status} — common move ${(0,format/* formatSigma */.Hx)(g.common.z)} (${g.common.status}); main contributors: ${top.join(', ') || 'none'}`;
}
/**
 * The terminal report: a headline (verdict and counts), a table of judged metrics (regressed and
 * improved first) with the reason under each flagged one, one line per group, then one line per
 * learning/new/missing/ignored set. Colour (picocolors) only when `color` is true; status words are
 * always printed, so the report reads the same without colour. Every name passes cleanText, so a
 * metric file cannot send terminal escape sequences.
 * @example renderText(report, { color: false }).split('\n')[0] // 'Bellgate — series "ci": pass — ...'
 */
function renderText(report, options) {
    const c = picocolors_default().createColors(options.color);
    const lines = [];
    const verdictWord = report.verdict === 'regressed' ? c.red(c.bold('REGRESSED')) : c.bold(report.verdict.toUpperCase());
    lines.push(`Bellgate — series "${text_clean(report.series, TEXT_NAME_MAX)}": ${verdictWord}`);
    lines.push(`${report_status/* VERDICT_HEADLINE */.pB[report.verdict]}; ${(0,report_status/* statusCounts */.rc)(report.metrics.map((m) => m.status)) || 'no metrics'}.`);
    // Regressed, then improved, then ok, each in report order (a stable sort by statusRank, in one pass).
    const byStatus = new Map(JUDGED.map((status) => [status, []]));
    for (const m of report.metrics)
        byStatus.get(m.status)?.push(m);
    const judged = [...byStatus.values()].flat();
    if (judged.length > 0) {
        const head = ['status', 'metric', 'this run', 'baseline', 'change', 'sigma', 'rel. density vs cutoff'];
        const columns = head.length;
        // Every cell and its width once, flat (row-major); the widths pad the columns and the cells.
        const cells = new Array(judged.length * columns);
        const cellWidths = new Int32Array(judged.length * columns);
        const widths = head.map((h) => h.length);
        judged.forEach((m, row) => {
            const shown = (0,report_cells/* metricCells */.G)(m, m.unit === undefined ? undefined : text_clean(m.unit, 20));
            const at = row * columns;
            cells[at] = `${report_status/* STATUS_GLYPH */.id[m.status]} ${m.status}`;
            cells[at + 1] = text_clean(m.name, TEXT_NAME_MAX);
            cells[at + 2] = shown.value;
            cells[at + 3] = shown.baseline;
            cells[at + 4] = shown.change;
            cells[at + 5] = shown.sigma;
            cells[at + 6] = shown.density;
            for (let i = 0; i < columns; i++) {
                const width = codePoints(cells[at + i]);
                cellWidths[at + i] = width;
                if (width > widths[i])
                    widths[i] = width;
            }
        });
        lines.push('');
        lines.push(c.bold(head.map((h, i) => h + ' '.repeat(widths[i] - h.length)).join('  ').trimEnd()));
        const parts = new Array(columns);
        judged.forEach((m, row) => {
            const at = row * columns;
            for (let i = 0; i < columns; i++)
                parts[i] = cells[at + i] + ' '.repeat(widths[i] - cellWidths[at + i]);
            lines.push(paint(c, m.status, parts.join('  ').trimEnd()));
            if (m.status !== 'ok')
                lines.push(`    ${text_clean(m.reason, 400)}`);
        });
    }
    if (report.groups.length > 0)
        lines.push('');
    for (const g of report.groups)
        lines.push(paint(c, g.status, text_groupLine(g)));
    const listed = new Map(LISTED.map((status) => [status, []]));
    for (const m of report.metrics)
        listed.get(m.status)?.push(text_clean(m.name, TEXT_NAME_MAX));
    let first = true;
    for (const [s, names] of listed) {
        if (names.length === 0)
            continue;
        if (first)
            lines.push('');
        first = false;
        lines.push(paint(c, s, `${report_status/* STATUS_GLYPH */.id[s]} ${s} (${names.length}): ${names.join(', ')}`));
    }
    return lines.join('\n') + '\n';
}

// EXTERNAL MODULE: ./src/model/input-error.ts
var input_error = __webpack_require__(8250);
// EXTERNAL MODULE: ./src/cli/exit-codes.ts
var exit_codes = __webpack_require__(8551);
// EXTERNAL MODULE: ./src/cli/load-config.ts
var load_config = __webpack_require__(6783);
// EXTERNAL MODULE: ./src/cli/load-run.ts + 8 modules
var load_run = __webpack_require__(5946);
// EXTERNAL MODULE: ./src/cli/open-history.ts + 3 modules
var open_history = __webpack_require__(6952);
// EXTERNAL MODULE: ./src/cli/paths.ts
var paths = __webpack_require__(5450);
// EXTERNAL MODULE: ./src/cli/record-run.ts
var record_run = __webpack_require__(5881);
// EXTERNAL MODULE: ./src/cli/run-info.ts
var run_info = __webpack_require__(5795);
// EXTERNAL MODULE: external "node:fs/promises"
var promises_ = __webpack_require__(1455);
// EXTERNAL MODULE: external "node:path"
var external_node_path_ = __webpack_require__(6760);
;// CONCATENATED MODULE: ./src/cli/write-reports.ts





/** The files `--out DIR` writes, in this order. */
const REPORT_FILES = ['report.md', 'report.json', 'report.txt'];
/**
 * Writes the report as markdown (for a PR comment or job summary), JSON (for scripts) and plain
 * text (no colour codes) into `dir`, creating it.
 * @returns the paths written.
 * @throws the file system's error when the folder cannot be created or written (the CLI names the path).
 */
async function writeReports(dir, report) {
    await (0,promises_.mkdir)(dir, { recursive: true });
    const contents = {
        'report.md': renderMarkdown(report, {}),
        'report.json': renderJson(report),
        'report.txt': renderText(report, { color: false }),
    };
    const written = [];
    for (const name of REPORT_FILES) {
        const path = (0,external_node_path_.join)(dir, name);
        await (0,promises_.writeFile)(path, ensureNewline(contents[name]));
        written.push(path);
    }
    return written;
}
function ensureNewline(s) {
    return s.endsWith('\n') ? s : `${s}\n`;
}

// EXTERNAL MODULE: ./src/cli/options.ts
var options = __webpack_require__(776);
;// CONCATENATED MODULE: ./src/cli/check-flow.ts














/**
 * read -> load -> (gate: select, fit, score, decide) -> render -> record. Prints the report in the
 * chosen format on stdout (JSON: nothing else on stdout; notes go to stderr), writes `--out` files,
 * records the run when asked, and returns the report. The caller turns the verdict into the exit code.
 * @throws InputError (bad files, flags), StoreError (history unreadable or unwritable).
 */
async function performCheck(ctx, options) {
    if (options.record && options.history === undefined) {
        throw new input_error/* InputError */.d('--record needs --history FILE', { where: '--record', fix: 'name the history file to append this run to' });
    }
    const config = await (0,load_config/* loadConfig */.Z)(ctx, options.config);
    const run = await (0,load_run/* loadRun */.S)(ctx, config, options);
    const { history, store } = await (0,open_history/* openHistory */.j)(ctx, options.history, options.series);
    if (options.history !== undefined && history.runs.length === 0) {
        // Said out loud because a mistyped --history would otherwise pass quietly as "learning".
        ctx.io.stderr(`bellgate: note: ${options.history} holds no runs yet (missing or empty), so every metric is new\n`);
    }
    const report = (0,gate/* runGate */.R)({ config, history, run, series: options.series });
    ctx.io.stdout(check_flow_ensureNewline(render(ctx, report, options.format)));
    if (options.out !== undefined) {
        const written = await writeReports((0,paths/* resolvePath */.o)(ctx, options.out), report);
        ctx.io.stderr(`bellgate: wrote ${written.join(', ')}\n`);
    }
    if (options.record && store) {
        const info = (0,run_info/* runInfoFrom */.g)(ctx, options);
        const saved = await (0,record_run/* recordRun */.v)(store, history, info, run, config.keep);
        ctx.io.stderr(`bellgate: recorded run ${info.id} in ${store.describe()} (${saved.runs.length} runs)\n`);
    }
    return report;
}
/** The exit code a verdict stands for: only `regressed` fails (accepted, learning and pass do not). */
function verdictExitCode(report) {
    return report.verdict === 'regressed' ? exit_codes/* EXIT */.d.regressed : exit_codes/* EXIT */.d.ok;
}
function render(ctx, report, format) {
    if (format === 'json')
        return renderJson(report);
    if (format === 'markdown')
        return renderMarkdown(report, {});
    return renderText(report, { color: ctx.color });
}
function check_flow_ensureNewline(s) {
    return s.endsWith('\n') ? s : `${s}\n`;
}


/***/ }),

/***/ 5881:
/***/ ((__unused_webpack_module, __webpack_exports__, __webpack_require__) => {

/* harmony export */ __webpack_require__.d(__webpack_exports__, {
/* harmony export */   v: () => (/* binding */ recordRun)
/* harmony export */ });
/* harmony import */ var _history_merge_js__WEBPACK_IMPORTED_MODULE_0__ = __webpack_require__(7822);

/**
 * Appends one run to the history (a run with the same id is replaced), trims to the newest `keep`
 * runs — the only deletion — and saves through the store, which refuses to lose runs otherwise.
 * @returns the history as saved.
 * @throws StoreError when the store cannot write.
 */
async function recordRun(store, history, info, run, keep) {
    const next = (0,_history_merge_js__WEBPACK_IMPORTED_MODULE_0__/* .trimHistory */ .lj)((0,_history_merge_js__WEBPACK_IMPORTED_MODULE_0__/* .appendRun */ .ah)(history, info, run), keep);
    await store.save(next, history.runs.length);
    return next;
}


/***/ }),

/***/ 5795:
/***/ ((__unused_webpack_module, __webpack_exports__, __webpack_require__) => {

/* harmony export */ __webpack_require__.d(__webpack_exports__, {
/* harmony export */   g: () => (/* binding */ runInfoFrom)
/* harmony export */ });
/* harmony import */ var _model_input_error_js__WEBPACK_IMPORTED_MODULE_0__ = __webpack_require__(8250);

/** ISO-8601 date-time with a zone, e.g. 2026-05-04T10:20:30Z or 2026-05-04T10:20:30.5+02:00. */
const ISO_TIME = /^\d{4}-\d{2}-\d{2}T\d{2}:\d{2}(:\d{2}(\.\d+)?)?(Z|[+-]\d{2}:\d{2})$/;
/**
 * Describes the run being recorded. Flags win; in GitHub Actions the standard variables fill the
 * gaps (id = GITHUB_RUN_ID-GITHUB_RUN_ATTEMPT, so a re-run replaces rather than doubles); else the
 * id is "local-" plus the time, and the time is now.
 * @throws InputError when --time is not an ISO-8601 date-time with a zone, or --id is empty.
 * @example runInfoFrom(ctx, { id: '77-1', time: '2026-05-04T10:20:30Z' }) // { id: '77-1', time: '2026-05-04T10:20:30.000Z', ... }
 */
function runInfoFrom(ctx, options) {
    const env = ctx.io.env;
    let time;
    if (options.time !== undefined) {
        const ms = Date.parse(options.time);
        if (!ISO_TIME.test(options.time) || !Number.isFinite(ms)) {
            throw new _model_input_error_js__WEBPACK_IMPORTED_MODULE_0__/* .InputError */ .d(`--time "${options.time}" is not an ISO-8601 date-time`, {
                where: '--time',
                fix: 'write it like 2026-05-04T10:20:30Z (a zone, Z or +hh:mm, is required)',
            });
        }
        time = new Date(ms).toISOString();
    }
    else {
        time = ctx.now().toISOString();
    }
    const ciId = env.GITHUB_RUN_ID ? `${env.GITHUB_RUN_ID}-${env.GITHUB_RUN_ATTEMPT || '1'}` : undefined;
    const id = options.id ?? ciId ?? `local-${time}`;
    if (id.trim() === '') {
        throw new _model_input_error_js__WEBPACK_IMPORTED_MODULE_0__/* .InputError */ .d('--id is empty', { where: '--id', fix: 'give a run id such as "1234-1", or leave the flag out' });
    }
    const info = { id, time };
    const sha = options.sha ?? (env.GITHUB_SHA || undefined);
    const ref = options.ref ?? (env.GITHUB_REF || undefined);
    const event = env.GITHUB_EVENT_NAME || undefined;
    if (sha !== undefined)
        info.sha = sha;
    if (ref !== undefined)
        info.ref = ref;
    if (event !== undefined)
        info.event = event;
    return info;
}


/***/ }),

/***/ 571:
/***/ ((__unused_webpack_module, __webpack_exports__, __webpack_require__) => {

/* harmony export */ __webpack_require__.d(__webpack_exports__, {
/* harmony export */   G: () => (/* binding */ metricCells)
/* harmony export */ });
/* unused harmony export formatBaseline */
/* harmony import */ var _format_js__WEBPACK_IMPORTED_MODULE_0__ = __webpack_require__(2011);

/**
 * "10.1 ± 0.4 ms (n=60)". On the log scale the fitted centre is shown as the geometric mean
 * exp(mean) and the spread as the factor exp(sd) ("×/÷ 1.03"), which is what a log-normal fit means
 * on the metric's own scale. `unit` must already be escaped for the target format.
 * @example formatBaseline({ n: 60, mean: 10.1, sd: 0.4 }, 'ms') // '10.1 ± 0.4 ms (n=60)'
 */
function formatBaseline(b, unit) {
    if (!b)
        return _format_js__WEBPACK_IMPORTED_MODULE_0__/* .NOT_AVAILABLE */ .e5;
    const u = unit ? ` ${unit}` : '';
    const ratio = b.relativeTo !== undefined ? ' (ratio)' : '';
    if (b.scale === 'log') {
        return `${(0,_format_js__WEBPACK_IMPORTED_MODULE_0__/* .formatNumber */ .ZV)(Math.exp(b.mean))}${u} ×/÷ ${(0,_format_js__WEBPACK_IMPORTED_MODULE_0__/* .formatNumber */ .ZV)(Math.exp(b.sd), 4)} (n=${b.n}, log)${ratio}`;
    }
    return `${(0,_format_js__WEBPACK_IMPORTED_MODULE_0__/* .formatNumber */ .ZV)(b.mean)} ± ${(0,_format_js__WEBPACK_IMPORTED_MODULE_0__/* .formatNumber */ .ZV)(b.sd, 2)}${u} (n=${b.n})${ratio}`;
}
/** Format the numeric columns of a metric result; `unit` already escaped for the target. */
function metricCells(m, unit) {
    return {
        value: (0,_format_js__WEBPACK_IMPORTED_MODULE_0__/* .formatValue */ .Fl)(m.value, unit),
        baseline: formatBaseline(m.baseline, unit),
        change: (0,_format_js__WEBPACK_IMPORTED_MODULE_0__/* .formatChange */ .eD)(m.change),
        sigma: (0,_format_js__WEBPACK_IMPORTED_MODULE_0__/* .formatSigma */ .Hx)(m.z),
        density: (0,_format_js__WEBPACK_IMPORTED_MODULE_0__/* .formatAgainstCutoff */ .mM)(m.relativeDensity, m.cutoff),
    };
}


/***/ }),

/***/ 4031:
/***/ ((__unused_webpack_module, __webpack_exports__, __webpack_require__) => {

/* harmony export */ __webpack_require__.d(__webpack_exports__, {
/* harmony export */   F: () => (/* binding */ escapeMarkdown),
/* harmony export */   Z: () => (/* binding */ escapeHtml)
/* harmony export */ });
/* harmony import */ var _clean_js__WEBPACK_IMPORTED_MODULE_0__ = __webpack_require__(23);

/** Zero-width space: breaks GitHub's @mention and #123 autolinks while reading the same. */
const ZWSP = '\u200B';
// Characters with a meaning in GitHub-flavoured markdown, inline or in a table cell.
const MARKDOWN_SPECIAL = /[\\*_[\]()#|`+!~]/g;
/**
 * Make untrusted text (a metric name or unit) inert inside GitHub markdown text and table cells.
 * Steps: cleanText (controls, bidi overrides, newlines, cap at 200); `&`, `<`, `>` become entities
 * (so no HTML tag such as `<img onerror=...>` can open); every markdown punctuation character
 * `\ * _ [ ] ( ) # | \` + ! ~` gets a backslash (so `](javascript:...)` is no link, `|` no
 * new cell); a zero-width space after `@` and after `#`/`GH-` before digits stops mentions and
 * issue references, and one after `:` in `://` and after `www` in `www.` stops bare-URL autolinks.
 * @example escapeMarkdown('a|b') // 'a\\|b'
 * @example escapeMarkdown('@team') // '@\u200Bteam'
 */
function escapeMarkdown(s, max = _clean_js__WEBPACK_IMPORTED_MODULE_0__/* .MAX_SHOWN_LENGTH */ ._) {
    return (0,_clean_js__WEBPACK_IMPORTED_MODULE_0__/* .cleanText */ .X)(s, max)
        .replace(/&/g, '&amp;')
        .replace(/</g, '&lt;')
        .replace(/>/g, '&gt;')
        .replace(/@/g, `@${ZWSP}`)
        .replace(/#(?=\d)/g, `#${ZWSP}`)
        .replace(/\b(GH)-(?=\d)/gi, `$1${ZWSP}-`)
        .replace(/:\/\//g, `:${ZWSP}//`)
        .replace(/\b(www)\./gi, `$1${ZWSP}.`)
        .replace(MARKDOWN_SPECIAL, (c) => `\\${c}`);
}
/**
 * Escape text for HTML element content and quoted attribute values: `& < > " '` become entities,
 * after cleanText removed controls and bidi overrides (no length cap unless `max` is given).
 * @example escapeHtml('<img src=x onerror=alert(1)>') // '&lt;img src=x onerror=alert(1)&gt;'
 */
function escapeHtml(s, max = Number.POSITIVE_INFINITY) {
    return (0,_clean_js__WEBPACK_IMPORTED_MODULE_0__/* .cleanText */ .X)(s, max)
        .replace(/&/g, '&amp;')
        .replace(/</g, '&lt;')
        .replace(/>/g, '&gt;')
        .replace(/"/g, '&quot;')
        .replace(/'/g, '&#39;');
}


/***/ }),

/***/ 9833:
/***/ ((__unused_webpack_module, __webpack_exports__, __webpack_require__) => {

/* harmony export */ __webpack_require__.d(__webpack_exports__, {
/* harmony export */   KM: () => (/* binding */ sparkline),
/* harmony export */   nA: () => (/* binding */ BLOCKS)
/* harmony export */ });
/* unused harmony export MARK_SEPARATOR */
/** The eight Unicode block heights, lowest first (U+2581..U+2588). */
const BLOCKS = ['▁', '▂', '▃', '▄', '▅', '▆', '▇', '█'];
/** Separates the history from this run's mark, so the mark reads as "and now". */
const MARK_SEPARATOR = '→';
/**
 * A one-line picture of a series: one block per value, height linear between the smallest and
 * largest finite value (this run's `mark` included, so a jump stands out). Missing values (NaN)
 * show as a space; a constant series sits at mid height. When `mark` is given it follows the
 * history after an arrow. Returns '' when nothing is finite. Plain text, so it reads the same in a
 * terminal, a code span on GitHub and a screen reader's character mode.
 * @example sparkline([1, 2, 3, 4, 5, 6, 7, 8]) // '▁▂▃▄▅▆▇█'
 * @example sparkline([1, 1, 1], 2) // '▁▁▁→█'
 */
function sparkline(values, mark) {
    const finite = values.filter((v) => Number.isFinite(v));
    const hasMark = mark !== undefined && Number.isFinite(mark);
    if (hasMark)
        finite.push(mark);
    if (finite.length === 0)
        return '';
    let lo = Infinity;
    let hi = -Infinity;
    for (const v of finite) {
        if (v < lo)
            lo = v;
        if (v > hi)
            hi = v;
    }
    const block = (v) => {
        if (!Number.isFinite(v))
            return ' ';
        if (hi === lo)
            return BLOCKS[3];
        const i = Math.round(((v - lo) / (hi - lo)) * (BLOCKS.length - 1));
        return BLOCKS[Math.min(BLOCKS.length - 1, Math.max(0, i))] ?? BLOCKS[3];
    };
    const line = values.map(block).join('');
    return hasMark ? `${line}${MARK_SEPARATOR}${block(mark)}` : line;
}


/***/ })

};
