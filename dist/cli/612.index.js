export const id = 612;
export const ids = [612];
export const modules = {

/***/ 8551:
/***/ ((__unused_webpack_module, __webpack_exports__, __webpack_require__) => {

/* harmony export */ __webpack_require__.d(__webpack_exports__, {
/* harmony export */   d: () => (/* binding */ EXIT)
/* harmony export */ });
/**
 * The exit codes of `bellgate` (DESIGN.md "Vocabulary"). CI scripts branch on them, so they are
 * part of the product: never renumber.
 */
const EXIT = {
    /** pass, learning, accepted — or a command that did its job. */
    ok: 0,
    /** at least one metric regressed. */
    regressed: 1,
    /** bad input or usage: a file that cannot be read or parsed, a wrong flag, an internal fault. */
    input: 2,
    /** the history store cannot be reached or read. */
    store: 3,
};


/***/ }),

/***/ 8612:
/***/ ((__unused_webpack_module, __webpack_exports__, __webpack_require__) => {


// EXPORTS
__webpack_require__.d(__webpack_exports__, {
  runCli: () => (/* binding */ runCli)
});

// UNUSED EXPORTS: COMMANDS, VERSION, buildProgram

// EXTERNAL MODULE: ./node_modules/commander/esm.mjs
var esm = __webpack_require__(8179);
;// CONCATENATED MODULE: ./src/cli/context.ts
/**
 * What every command receives: the outside world as plain values and callbacks, so tests run the
 * whole CLI in-process with a fake terminal, environment and working folder.
 */
/**
 * Builds the context for one invocation.
 * @example createContext({ stdout, stderr, cwd: '/repo', env: {}, isTTY: false }).color // false
 */
function createContext(io, now = () => new Date()) {
    const noColor = io.env.NO_COLOR !== undefined && io.env.NO_COLOR !== '';
    return { io, exitCode: 0, color: io.isTTY && !noColor, now };
}

// EXTERNAL MODULE: ./src/model/input-error.ts
var input_error = __webpack_require__(8250);
// EXTERNAL MODULE: ./src/history/store.ts
var store = __webpack_require__(4689);
// EXTERNAL MODULE: ./src/cli/exit-codes.ts
var exit_codes = __webpack_require__(8551);
;// CONCATENATED MODULE: ./src/cli/errors.ts




const SYSTEM_REASONS = {
    ENOENT: 'no such file or folder',
    EACCES: 'permission denied',
    EPERM: 'operation not permitted',
    EISDIR: 'is a folder, not a file',
    ENOTDIR: 'a part of the path is not a folder',
    ENOSPC: 'no space left on the device',
    EROFS: 'read-only file system',
    EEXIST: 'already exists',
    EMFILE: 'too many open files',
};
/**
 * Maps anything a command threw to one message and an exit code — never a stack trace.
 * InputError -> 2 with its describe(); StoreError -> 3; commander usage errors -> 2 (help -> 0);
 * file-system errors -> 2 naming the path; anything else is a fault of ours -> 2 with one line
 * asking for a report (2, not 1, so a crash can never pass for "a metric regressed").
 * @example toFailure(new InputError('bad', { where: 'a.json:1:2' })) // { code: 2, text: 'bellgate: a.json:1:2: bad' }
 */
function toFailure(error) {
    if (error instanceof esm/* CommanderError */.b7) {
        // Commander has already written its message (and the usage) through configureOutput.
        const quiet = error.code === 'commander.helpDisplayed' || error.code === 'commander.version';
        return { code: quiet ? exit_codes/* EXIT */.d.ok : exit_codes/* EXIT */.d.input, text: '' };
    }
    if (error instanceof input_error/* InputError */.d)
        return { code: exit_codes/* EXIT */.d.input, text: `bellgate: ${error.describe()}` };
    if (error instanceof store/* StoreError */.A || (error instanceof Error && error.name === 'StoreError')) {
        const text = error instanceof store/* StoreError */.A ? error.describe() : error.message;
        return { code: exit_codes/* EXIT */.d.store, text: `bellgate: history store: ${text}` };
    }
    const system = systemError(error);
    if (system)
        return { code: exit_codes/* EXIT */.d.input, text: `bellgate: ${system}` };
    const message = error instanceof Error ? error.message : String(error);
    return {
        code: exit_codes/* EXIT */.d.input,
        text: `bellgate: internal error: ${firstLine(message)}\n  please report this, with the command you ran, to the Bellgate maintainers`,
    };
}
function systemError(error) {
    if (!(error instanceof Error))
        return undefined;
    const { code, path, syscall } = error;
    if (typeof code !== 'string' || !/^E[A-Z]+$/.test(code))
        return undefined;
    const reason = SYSTEM_REASONS[code] ?? code;
    const verb = typeof syscall === 'string' ? syscall : 'access';
    return typeof path === 'string' ? `cannot ${verb} ${path}: ${reason}` : `${verb} failed: ${reason}`;
}
function firstLine(s) {
    const line = s.split('\n', 1)[0] ?? '';
    return line.length > 300 ? `${line.slice(0, 300)}…` : line;
}

// EXTERNAL MODULE: ./src/cli/options.ts
var options = __webpack_require__(776);
;// CONCATENATED MODULE: ./src/cli/commands/check.ts


/**
 * `bellgate check`: judges this run's metrics against the history and prints the report.
 * Exit 0 pass/learning/accepted, 1 regressed, 2 bad input, 3 history store unreachable.
 */
function checkCommand(ctx) {
    const cmd = new esm/* Command */.uB('check').description('judge this run against the history of trusted runs');
    (0,options/* metricsOption */.nw)(cmd, true);
    (0,options/* historyOption */.cc)(cmd, false);
    (0,options/* configOption */.KJ)(cmd);
    (0,options/* seriesOption */.LH)(cmd);
    cmd
        .addOption(new esm/* Option */.c$('--format <format>', 'how to print the report on stdout').choices(options/* REPORT_FORMATS */.EL).default('text'))
        .option('--out <dir>', 'also write report.md, report.json and report.txt into this folder')
        .option('--record', 'append this run to the history after checking it (needs --history)');
    (0,options/* inputOptions */.NH)(cmd);
    (0,options/* runInfoOptions */.qo)(cmd);
    (0,options/* examples */.K1)(cmd, [
        'bellgate check --metrics bench.json --history .bellgate/history.json',
        'bellgate check --metrics "out/*.json" --history h.json --format json > report.json',
        'bellgate check --metrics results.txt --input-format gobench --history h.json --out bellgate-out',
        'bellgate check --metrics bench.json --history h.json --record --sha "$(git rev-parse HEAD)"',
    ]);
    cmd.addHelpText('after', '\nExit codes: 0 pass, learning or accepted; 1 regressed; 2 bad input or usage; 3 history store unreachable.\n');
    return cmd.action(async (options) => {
        // Imported when the command runs, so `--help` and the other commands never load the gate.
        const { performCheck, verdictExitCode } = await Promise.all(/* import() */[__webpack_require__.e(76), __webpack_require__.e(614), __webpack_require__.e(914), __webpack_require__.e(628), __webpack_require__.e(946), __webpack_require__.e(718), __webpack_require__.e(838)]).then(__webpack_require__.bind(__webpack_require__, 4838));
        const report = await performCheck(ctx, options);
        ctx.exitCode = verdictExitCode(report);
    });
}

;// CONCATENATED MODULE: ./src/cli/commands/record.ts


/** `bellgate record`: appends a trusted run (a baseline-branch build) to the history file, without judging it. */
function recordCommand(ctx) {
    const cmd = new esm/* Command */.uB('record').description('append a trusted run to the history file (no judging)');
    (0,options/* metricsOption */.nw)(cmd, true);
    (0,options/* historyOption */.cc)(cmd, true, 'history file to append to (created when missing; never overwritten when unreadable)');
    (0,options/* configOption */.KJ)(cmd);
    (0,options/* seriesOption */.LH)(cmd);
    (0,options/* runInfoOptions */.qo)(cmd);
    (0,options/* inputOptions */.NH)(cmd);
    (0,options/* examples */.K1)(cmd, [
        'bellgate record --metrics bench.json --history .bellgate/history.json',
        'bellgate record --metrics bench.json --history h.json --id 8812-1 --sha 3f2a9c1 --ref refs/heads/main --time 2026-05-04T10:20:30Z',
    ]);
    // The work is imported when the command runs, so `--help` and the other commands never load it.
    return cmd.action(async (options) => (await Promise.all(/* import() */[__webpack_require__.e(614), __webpack_require__.e(914), __webpack_require__.e(946), __webpack_require__.e(268)]).then(__webpack_require__.bind(__webpack_require__, 5779))).runRecord(ctx, options));
}

;// CONCATENATED MODULE: ./src/cli/commands/explain.ts


/**
 * `bellgate explain METRIC`: one metric's decision drawn in the terminal — the fitted curve, the
 * baseline runs, the cutoff band and this run — with the numbers in words. Informational: exit 0.
 */
function explainCommand(ctx) {
    const cmd = new esm/* Command */.uB('explain')
        .description('show how one metric is judged: fitted curve, baseline runs, cutoff band, this run')
        .argument('<metric>', 'metric name, exactly as in the report');
    (0,options/* historyOption */.cc)(cmd, true);
    cmd.option('--metrics <file...>', 'metric files of this run (default: the newest run in the history, judged against the runs before it)');
    (0,options/* configOption */.KJ)(cmd);
    (0,options/* seriesOption */.LH)(cmd);
    (0,options/* inputOptions */.NH)(cmd);
    (0,options/* examples */.K1)(cmd, [
        'bellgate explain latency/geocode-p95 --history .bellgate/history.json',
        'bellgate explain size/web-bundle.js.gz --history h.json --metrics bench.json',
    ]);
    // The work is imported when the command runs, so `--help` and the other commands never load it.
    return cmd.action(async (metric, options) => (await Promise.all(/* import() */[__webpack_require__.e(76), __webpack_require__.e(614), __webpack_require__.e(914), __webpack_require__.e(628), __webpack_require__.e(946), __webpack_require__.e(718), __webpack_require__.e(535)]).then(__webpack_require__.bind(__webpack_require__, 2535))).runExplain(ctx, metric, options));
}

;// CONCATENATED MODULE: ./src/cli/commands/import.ts


/**
 * `bellgate import`: merges past results (JSON Lines or CSV, detected by content) into the history
 * file by run id, so a project can start with the history it already has. Rows that cannot be used
 * are listed on stderr with their place and reason; the rest are imported.
 */
function importCommand(ctx) {
    const cmd = new esm/* Command */.uB('import').description('merge past results (JSON Lines or CSV) into a history file');
    (0,options/* historyOption */.cc)(cmd, true, 'history file to merge into (created when missing)');
    cmd.requiredOption('--runs <file>', 'past runs: JSON Lines (one run a line) or CSV');
    (0,options/* seriesOption */.LH)(cmd);
    (0,options/* examples */.K1)(cmd, [
        'bellgate import --history .bellgate/history.json --runs past-runs.jsonl',
        'bellgate import --history h.json --runs nightly.csv --series nightly',
    ]);
    cmd.addHelpText('after', '\nJSON Lines: {"id":"812-1","time":"2026-05-04T10:20:30Z","sha":"3f2a9c1","ref":"refs/heads/main","metrics":{"latency/p50":12.4}}\nCSV: id,time,sha,ref,name,value[,unit] (one row per metric) or id,time,sha,ref,<one column per metric>\n');
    // The work is imported when the command runs, so `--help` and the other commands never load it.
    return cmd.action(async (options) => (await Promise.all(/* import() */[__webpack_require__.e(712), __webpack_require__.e(614), __webpack_require__.e(914), __webpack_require__.e(158)]).then(__webpack_require__.bind(__webpack_require__, 6158))).runImport(ctx, options));
}

;// CONCATENATED MODULE: ./src/cli/commands/verify.ts


/** `bellgate verify`: checks a history document's integrity. Exit 0 when clean, 2 when it finds problems. */
function verifyCommand(ctx) {
    const cmd = new esm/* Command */.uB('verify').description('check the integrity of a history file');
    (0,options/* historyOption */.cc)(cmd, true, 'history file to check');
    (0,options/* examples */.K1)(cmd, ['bellgate verify --history .bellgate/history.json']);
    // The work is imported when the command runs, so `--help` and the other commands never load it.
    return cmd.action(async (options) => (await Promise.all(/* import() */[__webpack_require__.e(614), __webpack_require__.e(774)]).then(__webpack_require__.bind(__webpack_require__, 3774))).runVerify(ctx, options));
}

;// CONCATENATED MODULE: ./src/cli/commands/report.ts


/**
 * `bellgate report`: one self-contained HTML file with every metric's history, fitted band and
 * this run (by default the newest recorded run, judged against the runs before it). Exit 0.
 */
function reportCommand(ctx) {
    const cmd = new esm/* Command */.uB('report').description('write an HTML report of the history and this run');
    (0,options/* historyOption */.cc)(cmd, true);
    cmd.option('--metrics <file...>', 'metric files of this run (default: the newest run in the history)');
    cmd.requiredOption('--html <file>', 'where to write the HTML file');
    cmd.option('--title <text>', 'title of the page');
    (0,options/* configOption */.KJ)(cmd);
    (0,options/* seriesOption */.LH)(cmd);
    (0,options/* inputOptions */.NH)(cmd);
    (0,options/* examples */.K1)(cmd, [
        'bellgate report --history .bellgate/history.json --html bellgate-report.html',
        'bellgate report --history h.json --metrics bench.json --html out/report.html --title "Nightly"',
    ]);
    // The work (with d3 and the HTML code) is imported when the command runs, so the others never load it.
    return cmd.action(async (options) => (await Promise.all(/* import() */[__webpack_require__.e(76), __webpack_require__.e(850), __webpack_require__.e(614), __webpack_require__.e(914), __webpack_require__.e(628), __webpack_require__.e(946), __webpack_require__.e(718), __webpack_require__.e(574)]).then(__webpack_require__.bind(__webpack_require__, 6574))).runReport(ctx, options));
}

// EXTERNAL MODULE: external "node:path"
var external_node_path_ = __webpack_require__(6760);
;// CONCATENATED MODULE: ./src/cli/commands/demo.ts




/** The demo's series name, as written in examples/demo/history.json. */
const DEMO_SERIES = 'kestrel-post/ci';
/**
 * `bellgate demo`: runs `check` on the invented scenario in examples/demo (a geocoding service's
 * CI history and one pull request), prints the text report and writes report.md, report.json and
 * report.txt into --out. It exits 0 even though the demo's verdict is `regressed` — the demo shows
 * the gate working, it is not a failing build — and says which code CI would have seen.
 */
function demoCommand(ctx) {
    const cmd = new esm/* Command */.uB('demo')
        .description('run the gate on the built-in demo scenario and write its reports')
        .option('--out <dir>', 'folder for report.md, report.json and report.txt', 'bellgate-demo');
    (0,options/* examples */.K1)(cmd, ['bellgate demo', 'bellgate demo --out /tmp/bellgate-demo']);
    return cmd.action(async (options) => {
        // Imported when the command runs, so `--help` and the other commands never load the gate.
        const [{ performCheck, verdictExitCode }, { DEMO_FILES, locateDemo }] = await Promise.all([Promise.all(/* import() */[__webpack_require__.e(76), __webpack_require__.e(614), __webpack_require__.e(914), __webpack_require__.e(628), __webpack_require__.e(946), __webpack_require__.e(718), __webpack_require__.e(838)]).then(__webpack_require__.bind(__webpack_require__, 4838)), __webpack_require__.e(/* import() */ 604).then(__webpack_require__.bind(__webpack_require__, 6604))]);
        const dir = locateDemo(ctx.io.cwd, process.argv[1]);
        ctx.io.stdout(`Demo: the Kestrel Post geocoding service — 120 trusted runs on main, and one pull request.\n\n`);
        const report = await performCheck(ctx, {
            metrics: [(0,external_node_path_.join)(dir, DEMO_FILES.run)],
            history: (0,external_node_path_.join)(dir, DEMO_FILES.history),
            config: (0,external_node_path_.join)(dir, DEMO_FILES.config),
            series: DEMO_SERIES,
            format: 'text',
            out: options.out,
        });
        const code = verdictExitCode(report);
        if (code !== exit_codes/* EXIT */.d.ok)
            ctx.io.stdout(`\n(demo: the verdict would exit ${code} in CI; the demo itself exits 0)\n`);
        const shown = (file) => {
            const rel = (0,external_node_path_.relative)(ctx.io.cwd, (0,external_node_path_.join)(dir, file));
            return rel.startsWith('..') || rel === '' ? (0,external_node_path_.join)(dir, file) : rel;
        };
        ctx.io.stdout(`\nSee one decision drawn out:\n  bellgate explain latency/geocode-p95 --history ${shown(DEMO_FILES.history)} ` +
            `--metrics ${shown(DEMO_FILES.run)} --config ${shown(DEMO_FILES.config)} --series ${DEMO_SERIES}\n`);
        ctx.exitCode = exit_codes/* EXIT */.d.ok;
    });
}

;// CONCATENATED MODULE: ./src/cli/commands/tune.ts


/**
 * `bellgate tune`: replays the gate over the history and prints the cutoff ladder, per-metric
 * false alarms, normality and a suggestion; `--labels` scores known regressions (precision,
 * recall, F1), `--target N` picks the loosest cutoff with at most N falsely flagged runs per 100,
 * `--write FILE` puts the suggestion into a config (comments and order kept) and prints the diff.
 * Exit 0, or 2 for bad input (a labels problem names file:line:col).
 */
function tuneCommand(ctx) {
    const cmd = new esm/* Command */.uB('tune').description('suggest cutoffs from evidence: replay the gate over the history and score a ladder of cutoffs');
    (0,options/* historyOption */.cc)(cmd, true, 'history file of trusted runs to replay (JSON)');
    (0,options/* configOption */.KJ)(cmd);
    cmd
        .option('--labels <file>', 'YAML or JSON list of known regressions: `regressions: [{run: "1234-1"}, {run: "1240-1", metric: "latency/p95"}]`')
        .option('--target <n>', 'false alarms per 100 runs to stay at or under (default 1)', parseTarget)
        .option('--write <file>', 'write the suggested cutoffs and transforms into this config file and print the diff')
        .addOption(new esm/* Option */.c$('--format <format>', 'output format').choices(['text', 'json']).default('text'));
    (0,options/* examples */.K1)(cmd, [
        'bellgate tune --history .bellgate/history.json --config .github/bellgate.yml',
        'bellgate tune --history h.json --labels known-regressions.yml --format json',
        'bellgate tune --history h.json --target 0.5 --write .github/bellgate.yml',
    ]);
    // The work (replay, diff library) is imported when the command runs, so the others never load it.
    return cmd.action(async (options) => (await Promise.all(/* import() */[__webpack_require__.e(6), __webpack_require__.e(815), __webpack_require__.e(291), __webpack_require__.e(614), __webpack_require__.e(628), __webpack_require__.e(964), __webpack_require__.e(369)]).then(__webpack_require__.bind(__webpack_require__, 2369))).runTune(ctx, options));
}
function parseTarget(text) {
    const n = Number(text);
    if (text.trim() === '' || !Number.isFinite(n) || n < 0 || n > 100) {
        throw new esm/* InvalidArgumentError */.Di('expected a number of false alarms per 100 runs from 0 to 100, e.g. 1');
    }
    return n;
}

;// CONCATENATED MODULE: ./src/cli/main.ts











/** Every subcommand, in the order --help lists them. Adding a command: its import and one line here. */
const COMMANDS = [
    checkCommand,
    recordCommand,
    explainCommand,
    tuneCommand,
    reportCommand,
    importCommand,
    verifyCommand,
    demoCommand,
];
/** Version shown by --version; kept in step with package.json by the release steps in DEVELOPERS.md. */
const VERSION = '0.1.0';
/**
 * Runs `bellgate` with the given arguments (without node and script) against injected process
 * edges and resolves to the exit code: 0 pass/learning/accepted, 1 regressed, 2 bad input or usage,
 * 3 history store unreachable. Never throws and never prints a stack trace.
 * @example await runCli(['check', '--metrics', 'bench.json', '--history', 'h.json'], io) // 0 or 1
 */
async function runCli(argv, io) {
    const ctx = createContext(io);
    const program = buildProgram(ctx);
    try {
        await program.parseAsync(argv, { from: 'user' });
        return ctx.exitCode;
    }
    catch (error) {
        const failure = toFailure(error);
        if (failure.text !== '')
            io.stderr(`${failure.text}\n`);
        return failure.code;
    }
}
/** The commander program with every subcommand, writing through io and throwing instead of exiting. */
function buildProgram(ctx) {
    const program = new esm/* Command */.uB('bellgate')
        .description('Gate pull requests on metric regressions, judged against the history of trusted runs.')
        .version(VERSION, '--version', 'print the version')
        .helpOption('-h, --help', 'show help for a command')
        .exitOverride()
        .configureOutput({
        writeOut: (s) => ctx.io.stdout(s),
        writeErr: (s) => ctx.io.stderr(s),
        outputError: (s, write) => write(s),
    })
        .showHelpAfterError('(run with --help for usage)')
        .showSuggestionAfterError(true)
        .allowExcessArguments(false);
    for (const factory of COMMANDS) {
        const cmd = factory(ctx);
        // addCommand does not copy the parent's settings (only .command() does), so copy them here:
        // every subcommand must throw instead of exiting and write through io.
        cmd.copyInheritedSettings(program);
        cmd.allowExcessArguments(false);
        program.addCommand(cmd);
    }
    program.addHelpText('after', '\nExit codes: 0 pass, learning or accepted; 1 regressed; 2 bad input or usage; 3 history store unreachable.\nRun "bellgate <command> --help" for a command\'s flags and examples; "bellgate demo" to see it work.\n');
    return program;
}


/***/ }),

/***/ 776:
/***/ ((__unused_webpack_module, __webpack_exports__, __webpack_require__) => {

/* harmony export */ __webpack_require__.d(__webpack_exports__, {
/* harmony export */   EL: () => (/* binding */ REPORT_FORMATS),
/* harmony export */   K1: () => (/* binding */ examples),
/* harmony export */   KJ: () => (/* binding */ configOption),
/* harmony export */   LH: () => (/* binding */ seriesOption),
/* harmony export */   NH: () => (/* binding */ inputOptions),
/* harmony export */   cc: () => (/* binding */ historyOption),
/* harmony export */   nw: () => (/* binding */ metricsOption),
/* harmony export */   qo: () => (/* binding */ runInfoOptions)
/* harmony export */ });
/* unused harmony export DEFAULT_SERIES */
/* harmony import */ var _inputs_formats_js__WEBPACK_IMPORTED_MODULE_0__ = __webpack_require__(7713);

const REPORT_FORMATS = ['text', 'markdown', 'json'];
/** The series used when --series is not given. */
const DEFAULT_SERIES = 'default';
/**
 * Flags several commands share, defined once so their wording and defaults never drift.
 * Each adds itself to a command and returns it, for chaining.
 */
function metricsOption(cmd, required) {
    const flags = '--metrics <file...>';
    const text = 'metric files of this run (paths or globs; several allowed)';
    return required ? cmd.requiredOption(flags, text) : cmd.option(flags, text);
}
function historyOption(cmd, required, text = 'history file of trusted runs (JSON; a missing file is an empty history)') {
    return required ? cmd.requiredOption('--history <file>', text) : cmd.option('--history <file>', text);
}
function configOption(cmd) {
    return cmd.option('--config <file>', 'config file (default: .github/bellgate.yml when present, else built-in defaults)');
}
function seriesOption(cmd) {
    return cmd.option('--series <key>', 'which series of runs this is (one history per series)', DEFAULT_SERIES);
}
function inputOptions(cmd) {
    return cmd
        // Checked by the readers (metricFormat), which also take spellings like "prometheus".
        .option('--input-format <format>', `read metric files as this format instead of detecting it: ${_inputs_formats_js__WEBPACK_IMPORTED_MODULE_0__/* .METRIC_FORMATS */ .Y.join(', ')}`)
        .option('--prefix <pattern=prefix...>', 'put "prefix/" before the names of metrics read from files the pattern matches');
}
function runInfoOptions(cmd) {
    return cmd
        .option('--id <id>', 'run id, unique in the series (default: GITHUB_RUN_ID-GITHUB_RUN_ATTEMPT, else local-<time>)')
        .option('--sha <sha>', 'commit of the run (default: GITHUB_SHA)')
        .option('--ref <ref>', 'branch or tag of the run (default: GITHUB_REF)')
        .option('--time <iso>', 'when the run happened, ISO-8601 with a zone (default: now)');
}
/** Appends an "Examples:" block to a command's --help. */
function examples(cmd, lines) {
    return cmd.addHelpText('after', `\nExamples:\n${lines.map((l) => `  $ ${l}`).join('\n')}\n`);
}


/***/ }),

/***/ 4689:
/***/ ((__unused_webpack_module, __webpack_exports__, __webpack_require__) => {

/* harmony export */ __webpack_require__.d(__webpack_exports__, {
/* harmony export */   A: () => (/* binding */ StoreError),
/* harmony export */   y: () => (/* binding */ guardAgainstLoss)
/* harmony export */ });
/**
 * A store could not be reached, read or written. The CLI maps it to exit 3 and the action fails
 * the step; the stored history is left as it was. `message` is the reason; `where` describes the
 * store (also as `store`); `fix` says what to do.
 *
 * @example new StoreError('the file is not a history document', { where: 'file h.json', fix: 'restore it' })
 */
class StoreError extends Error {
    name = 'StoreError';
    /** The store's description (HistoryStore.describe()). */
    where;
    /** What to do about it, in one sentence. */
    fix;
    constructor(reason, options = {}) {
        super(reason, options.cause === undefined ? undefined : { cause: options.cause });
        this.where = options.where;
        this.fix = options.fix;
    }
    /** The store's description, for callers that prefer the name. */
    get store() {
        return this.where;
    }
    /** Why it failed (the message). */
    get reason() {
        return this.message;
    }
    /** "store: reason\n  fix: ..." — the line a user sees. */
    describe() {
        const head = this.where ? `${this.where}: ${this.message}` : this.message;
        return this.fix ? `${head}\n  fix: ${this.fix}` : head;
    }
}
/**
 * The shrink rule every store's save applies: writing `h` is refused when it holds fewer runs
 * than were read, unless runs deleted on purpose by trimHistory (`h.trimmed`) make up the gap.
 * Throws StoreError naming the store; also rejects a readCount that is not a count.
 *
 * @example guardAgainstLoss('file h.json', history, 120) // throws when history has 100 runs, 0 trimmed
 */
function guardAgainstLoss(store, h, readCount) {
    if (!Number.isInteger(readCount) || readCount < 0) {
        throw new StoreError(`readCount must be the number of runs load returned, got ${readCount}`, { where: store });
    }
    const accounted = h.runs.length + (h.trimmed ?? 0);
    if (accounted < readCount) {
        throw new StoreError(`refusing to save ${h.runs.length} runs over the ${readCount} that were read: ${readCount - accounted} runs would be lost`, { where: store, fix: 'append to the history that load returned; delete runs only with trimHistory (the `keep` setting)' });
    }
}


/***/ }),

/***/ 7713:
/***/ ((__unused_webpack_module, __webpack_exports__, __webpack_require__) => {

/* harmony export */ __webpack_require__.d(__webpack_exports__, {
/* harmony export */   A: () => (/* binding */ metricFormat),
/* harmony export */   Y: () => (/* binding */ METRIC_FORMATS)
/* harmony export */ });
/* harmony import */ var _model_input_error_js__WEBPACK_IMPORTED_MODULE_0__ = __webpack_require__(8250);

/** The metric file formats Bellgate reads; the names `--input-format` and `input-format` accept. */
const METRIC_FORMATS = ['json', 'jsonl', 'csv', 'openmetrics', 'gobench', 'junit'];
// Other spellings users are likely to type.
const ALIASES = new Map([
    ['ndjson', 'jsonl'],
    ['json-lines', 'jsonl'],
    ['prometheus', 'openmetrics'],
    ['go', 'gobench'],
    ['xml', 'junit'],
]);
/**
 * The canonical format for a name given by a user (case-insensitive; a few aliases such as
 * `prometheus` and `ndjson`).
 * @throws InputError listing the accepted names.
 * @example metricFormat('Prometheus') // 'openmetrics'
 */
function metricFormat(name) {
    const key = name.trim().toLowerCase();
    const found = METRIC_FORMATS.includes(key) ? key : ALIASES.get(key);
    if (found)
        return found;
    throw new _model_input_error_js__WEBPACK_IMPORTED_MODULE_0__/* .InputError */ .d(`unknown input format ${JSON.stringify(name)}`, {
        fix: `use one of ${METRIC_FORMATS.join(', ')}`,
    });
}


/***/ }),

/***/ 8250:
/***/ ((__unused_webpack_module, __webpack_exports__, __webpack_require__) => {

/* harmony export */ __webpack_require__.d(__webpack_exports__, {
/* harmony export */   d: () => (/* binding */ InputError)
/* harmony export */ });
/* harmony import */ var _visible_text_js__WEBPACK_IMPORTED_MODULE_0__ = __webpack_require__(2639);

/**
 * The project's one contract for bad input: a typed error whose message a user can act on.
 * Pure modules throw it; adapters turn it into exit code 2 or a failed step, never a stack trace.
 */
class InputError extends Error {
    name = 'InputError';
    /** Where the problem is: "file:line:column", an XML element path, or a metric name. */
    where;
    /** What to do about it, in one sentence. */
    fix;
    constructor(message, options = {}) {
        super(message, options.cause === undefined ? undefined : { cause: options.cause });
        this.where = options.where;
        this.fix = options.fix;
    }
    /**
     * "where: message. fix" — the line a user sees. Messages quote untrusted text (metric names), so
     * control, C1 and bidirectional formatting characters are shown as \u{XXXX}: a refusal must not
     * send a terminal escape sequence or reorder the line it is printed on (CVE-2021-42574).
     */
    describe() {
        const head = this.where ? `${this.where}: ${this.message}` : this.message;
        return (0,_visible_text_js__WEBPACK_IMPORTED_MODULE_0__/* .visibleText */ .Q)(shortenQuotes(this.fix ? `${head}\n  fix: ${this.fix}` : head));
    }
}
/** Quoted text past this many characters is cut in messages: a 10 KB metric name is not echoed whole. */
const MAX_QUOTED = 120;
// Every quoted string, taken pairwise from the left, so prose between two quotes is never cut.
const QUOTED = /"((?:[^"\\]|\\.)*)"/g;
function shortenQuotes(text) {
    if (text.length <= MAX_QUOTED)
        return text;
    return text.replace(QUOTED, (whole, inner) => inner.length <= MAX_QUOTED ? whole : `"${Array.from(inner).slice(0, MAX_QUOTED / 2).join('')}…" (${inner.length} characters)`);
}


/***/ }),

/***/ 2639:
/***/ ((__unused_webpack_module, __webpack_exports__, __webpack_require__) => {

/* harmony export */ __webpack_require__.d(__webpack_exports__, {
/* harmony export */   Q: () => (/* binding */ visibleText)
/* harmony export */ });
/**
 * Text quoted from untrusted input (metric names, file content) inside a message printed to a
 * terminal or a log: every character that could move the cursor, ring, recolour or reorder the
 * line (C0 controls but tab and line feed, DEL, C1 controls, the bidi marks, embeddings, overrides
 * and isolates of "Trojan Source", CVE-2021-42574, and the Unicode line separators) is shown as
 * its code point, \u{XXXX}. Pure; never throws.
 * @example visibleText('a\u202Eb') // 'a\\u{202E}b'
 */
function visibleText(text) {
    return text.replace(INVISIBLE, (c) => `\\u{${c.charCodeAt(0).toString(16).toUpperCase().padStart(4, '0')}}`);
}
const INVISIBLE = /[\u0000-\u0008\u000B-\u001F\u007F-\u009F\u061C\u200E\u200F\u2028\u2029\u202A-\u202E\u2066-\u2069]/g;


/***/ })

};
