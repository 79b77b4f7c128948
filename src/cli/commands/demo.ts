import { Command } from 'commander';
import { join, relative } from 'node:path';
import type { CommandContext } from '../context.js';
import { EXIT } from '../exit-codes.js';
import { examples } from '../options.js';
import { performCheck, verdictExitCode } from '../check-flow.js';
import { DEMO_FILES, locateDemo } from '../demo-data.js';

/** The demo's series name, as written in examples/demo/history.jsonl. */
export const DEMO_SERIES = 'kestrel-post/ci';

/**
 * `bellgate demo`: runs `check` on the invented scenario in examples/demo (a geocoding service's
 * CI history and one pull request), prints the text report and writes report.md, report.json and
 * report.txt into --out. It exits 0 even though the demo's verdict is `regressed` — the demo shows
 * the gate working, it is not a failing build — and says which code CI would have seen.
 */
export function demoCommand(ctx: CommandContext): Command {
  const cmd = new Command('demo')
    .description('run the gate on the built-in demo scenario and write its reports')
    .option('--out <dir>', 'folder for report.md, report.json and report.txt', 'bellgate-demo');
  examples(cmd, ['bellgate demo', 'bellgate demo --out /tmp/bellgate-demo']);
  return cmd.action(async (options: { out: string }) => {
    const dir = locateDemo(ctx.io.cwd, process.argv[1]);
    ctx.io.stdout(`Demo: the Kestrel Post geocoding service — 120 trusted runs on main, and one pull request.\n\n`);
    const report = await performCheck(ctx, {
      metrics: [join(dir, DEMO_FILES.run)],
      history: join(dir, DEMO_FILES.history),
      config: join(dir, DEMO_FILES.config),
      series: DEMO_SERIES,
      format: 'text',
      out: options.out,
    });
    const code = verdictExitCode(report);
    if (code !== EXIT.ok) ctx.io.stdout(`\n(demo: the verdict would exit ${code} in CI; the demo itself exits 0)\n`);
    const shown = (file: string): string => {
      const rel = relative(ctx.io.cwd, join(dir, file));
      return rel.startsWith('..') || rel === '' ? join(dir, file) : rel;
    };
    ctx.io.stdout(
      `\nSee one decision drawn out:\n  bellgate explain latency/geocode-p95 --history ${shown(DEMO_FILES.history)} ` +
        `--metrics ${shown(DEMO_FILES.run)} --config ${shown(DEMO_FILES.config)} --series ${DEMO_SERIES}\n`,
    );
    ctx.exitCode = EXIT.ok;
  });
}
