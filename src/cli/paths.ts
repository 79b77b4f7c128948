import { isAbsolute, resolve } from 'node:path';
import type { CommandContext } from './context.js';

/**
 * A user-given path, resolved against the CLI's working folder (not the process's, so in-process
 * callers and tests can point the CLI anywhere).
 * @example resolvePath(ctx, 'out/report.json') // '/repo/out/report.json' when ctx.io.cwd is '/repo'
 */
export function resolvePath(ctx: CommandContext, path: string): string {
  return isAbsolute(path) ? path : resolve(ctx.io.cwd, path);
}
