#!/usr/bin/env node
import module from 'node:module';
import { warmUp } from './cli/warm-up.js';

// Node >= 22.1 keeps compiled code between runs (the runner's node24 has it; on 20 this is a no-op).
// It covers only what loads after it, so everything else is imported below, not statically
// (the warm-up is a few lines with dynamic imports only).
(module as { enableCompileCache?: () => unknown }).enableCompileCache?.();
// Commander and the command table load first; the command's own chunks start loading right
// behind them instead of after them (src/cli/warm-up.ts).
const loadingMain = import('./cli/main.js');
warmUp(process.argv.slice(2), process.cwd());
const { runCli } = await loadingMain;

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
void runCli(process.argv.slice(2), io).then((code) => (process.exitCode = code));
