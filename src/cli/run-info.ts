import type { RunInfo } from '../history/history.js';
import { machineFacts, runnerFingerprint } from '../history/runner-fingerprint.js';
import { InputError } from '../errors/input-error.js';
import type { CommandContext } from './context.js';

/** The flags that describe a recorded run; all optional. */
export interface RunInfoOptions {
  id?: string;
  sha?: string;
  ref?: string;
  time?: string;
}

/** ISO-8601 date-time with a zone, e.g. 2026-05-04T10:20:30Z or 2026-05-04T10:20:30.5+02:00. */
const ISO_TIME = /^\d{4}-\d{2}-\d{2}T\d{2}:\d{2}(:\d{2}(\.\d+)?)?(Z|[+-]\d{2}:\d{2})$/;

/**
 * Describes the run being recorded. Flags win; in GitHub Actions the standard variables fill the
 * gaps (id = GITHUB_RUN_ID-GITHUB_RUN_ATTEMPT, so a re-run replaces rather than doubles); else the
 * id is "local-" plus the time, and the time is now. The runner fingerprint describes the machine.
 * @throws InputError when --time is not an ISO-8601 date-time with a zone, or --id is empty.
 * @example runInfoFrom(ctx, { id: '77-1', time: '2026-05-04T10:20:30Z' }) // { id: '77-1', time: '2026-05-04T10:20:30.000Z', ... }
 */
export function runInfoFrom(ctx: CommandContext, options: RunInfoOptions): RunInfo {
  const env = ctx.io.env;
  let time: string;
  if (options.time !== undefined) {
    const ms = Date.parse(options.time);
    if (!ISO_TIME.test(options.time) || !Number.isFinite(ms)) {
      // A time without a zone means another instant on every machine: refused, never guessed.
      const zoneless = ISO_TIME.test(`${options.time}Z`) && Number.isFinite(Date.parse(`${options.time}Z`));
      throw new InputError(
        zoneless
          ? `--time "${options.time}" has no time zone, so it names a different instant on every machine`
          : `--time "${options.time}" is not an ISO-8601 date-time`,
        {
          where: '--time',
          fix: zoneless
            ? `add the zone it was measured in: "${options.time}Z" for UTC, or e.g. "${options.time}+02:00"`
            : 'write it like 2026-05-04T10:20:30Z (a zone, Z or +hh:mm, is required)',
        },
      );
    }
    time = new Date(ms).toISOString();
  } else {
    time = ctx.now().toISOString();
  }
  const ciId = env.GITHUB_RUN_ID ? `${env.GITHUB_RUN_ID}-${env.GITHUB_RUN_ATTEMPT || '1'}` : undefined;
  const id = options.id ?? ciId ?? `local-${time}`;
  if (id.trim() === '') {
    throw new InputError('--id is empty', {
      where: '--id',
      fix: 'give a run id such as "1234-1", or leave the flag out',
    });
  }
  const info: RunInfo = { id, time };
  const sha = options.sha ?? (env.GITHUB_SHA || undefined);
  const ref = options.ref ?? (env.GITHUB_REF || undefined);
  const event = env.GITHUB_EVENT_NAME || undefined;
  if (sha !== undefined) info.sha = sha;
  if (ref !== undefined) info.ref = ref;
  if (event !== undefined) info.event = event;
  info.runner = runnerFingerprint(env, ctx.io.machine ?? machineFacts());
  return info;
}
