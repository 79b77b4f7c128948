// The CLI as one bundled file (test/helpers/bundle.ts), for hostile cases run in a child process
// under a hard memory cap: node --max-old-space-size=N cli.mjs ARGS... ; the exit code is the CLI's.
import { runCli } from '../../../src/cli/main.js';

process.exitCode = await runCli(process.argv.slice(2), {
  stdout: (s) => void process.stdout.write(s),
  stderr: (s) => void process.stderr.write(s),
  cwd: process.cwd(),
  env: process.env,
  isTTY: false,
});
