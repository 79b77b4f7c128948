import { runCli } from './cli/main.js';

const io = { stdout: (s: string) => void process.stdout.write(s), stderr: (s: string) => void process.stderr.write(s), cwd: process.cwd(), env: process.env, isTTY: process.stdout.isTTY === true, stderrIsTTY: process.stderr.isTTY === true };
void runCli(process.argv.slice(2), io).then((code) => (process.exitCode = code));
