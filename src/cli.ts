#!/usr/bin/env node
import { runCli } from './cli/main.js';

// A reader that closes the pipe early (`bellgate check | head`) is not a failure of the check.
process.stdout.on('error', (e: NodeJS.ErrnoException) => {
  if (e.code !== 'EPIPE') throw e;
  process.exit(process.exitCode ?? 0);
});
const io = {
  stdout: (s: string) => void process.stdout.write(s),
  stderr: (s: string) => void process.stderr.write(s),
  cwd: process.cwd(),
  env: process.env,
  isTTY: process.stdout.isTTY === true,
  stderrIsTTY: process.stderr.isTTY === true,
};
process.exitCode = await runCli(process.argv.slice(2), io);
