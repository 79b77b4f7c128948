import { Command } from 'commander';
import { createContext, type CliIo, type CommandContext } from './context.js';
import { toFailure } from './errors.js';
import { checkCommand } from './commands/check.js';
import { recordCommand } from './commands/record.js';
import { explainCommand } from './commands/explain.js';
import { importCommand } from './commands/import.js';
import { verifyCommand } from './commands/verify.js';
import { reportCommand } from './commands/report.js';
import { demoCommand } from './commands/demo.js';
import { tuneCommand } from './commands/tune.js';
import { sinceCommand } from './commands/since.js';
import { markCommand } from './commands/mark.js';
import { dropCommand } from './commands/drop.js';
import { renameCommand } from './commands/rename.js';
import { runsCommand } from './commands/runs.js';

export type { CliIo } from './context.js';

/** A command factory: builds one subcommand whose action reports its exit code through ctx. */
export type CommandFactory = (ctx: CommandContext) => Command;

/** Every subcommand, in the order --help lists them. Adding a command: its import and one line here. */
export const COMMANDS: readonly CommandFactory[] = [
  checkCommand,
  recordCommand,
  explainCommand,
  tuneCommand,
  reportCommand,
  sinceCommand,
  importCommand,
  verifyCommand,
  runsCommand,
  markCommand,
  dropCommand,
  renameCommand,
  demoCommand,
];

/** Version shown by --version; kept in step with package.json by the release steps in DEVELOPERS.md. */
export const VERSION = '0.1.0';

/**
 * Runs `bellgate` with the given arguments (without node and script) against injected process
 * edges and resolves to the exit code: 0 pass/learning/accepted, 1 regressed, 2 bad input or usage,
 * 3 history store unreachable. Never throws and never prints a stack trace.
 * @example await runCli(['check', '--metrics', 'bench.json', '--history', 'h.json'], io) // 0 or 1
 */
export async function runCli(argv: string[], io: CliIo): Promise<number> {
  const ctx = createContext(io);
  const program = buildProgram(ctx);
  try {
    await program.parseAsync(argv, { from: 'user' });
    return ctx.exitCode;
  } catch (error) {
    const failure = toFailure(error);
    if (failure.text !== '') io.stderr(`${failure.text}\n`);
    return failure.code;
  }
}

/** The commander program with every subcommand, writing through io and throwing instead of exiting. */
export function buildProgram(ctx: CommandContext): Command {
  const program = new Command('bellgate')
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
  program.addHelpText(
    'after',
    '\nExit codes: 0 pass, learning or accepted; 1 regressed; 2 bad input or usage; 3 history store unreachable.\nRun "bellgate <command> --help" for a command\'s flags and examples; "bellgate demo" to see it work.\n',
  );
  return program;
}
