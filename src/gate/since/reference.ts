import { InputError } from '../../errors/input-error.js';
import type { RunInfo } from '../../history/history.js';
import type { ResolvedReference } from './since-report.js';

/** The reference point of a review: a run id, a commit sha, a time, or a sha with its commit time. */
export interface SinceReference {
  run?: string;
  sha?: string;
  /** ISO-8601 time; with a sha, the commit's time, used when the commit has no recorded run. */
  time?: string;
}

const SHA = /^[0-9a-f]{4,40}$/i;
const ISO_DATE = /^\d{4}-\d{2}-\d{2}/;

/**
 * Reads the REF of `bellgate since REF`: a run id of the history (checked first, so an id that
 * looks like a sha is still an id), a commit sha or its prefix of at least 4 hex digits, or an
 * ISO-8601 date or time. A git tag is resolved to its commit by the caller.
 * Throws InputError naming what REF can be when it is none of these.
 * @example referenceFromText('2026-03-01', runs) // { time: '2026-03-01' }
 */
export function referenceFromText(text: string, runs: readonly RunInfo[]): SinceReference {
  const ref = text.trim();
  if (runs.some((r) => r.id === ref)) return { run: ref };
  if (SHA.test(ref)) return { sha: ref };
  if (ISO_DATE.test(ref) && Number.isFinite(Date.parse(ref))) return { time: ref };
  throw new InputError(`"${text}" is not a run id of the history, a commit sha or an ISO-8601 time`, {
    where: 'REF',
    fix: 'give a run id (bellgate runs lists them), a commit sha, or a time such as 2026-03-01T12:00:00Z; resolve a git tag with git rev-list -n 1 TAG',
  });
}

/**
 * The recorded run a reference stands for.
 * - run: that run (InputError when the history has no such run);
 * - sha: the newest run of that commit (a prefix must name one commit); when the commit has no
 *   recorded run and a time is given (the commit's time), the nearest earlier recorded run,
 *   said in `note`; without a time, InputError;
 * - time: the newest run at or before it (runs without a time are passed over).
 * Pure: times are compared as parsed ISO-8601 strings, never against a clock.
 * @example resolveReference(runs, { sha: '4f1c2ab' }).run // '812-1'
 */
export function resolveReference(runs: readonly RunInfo[], reference: SinceReference): ResolvedReference {
  const requested = { ...reference };
  if (reference.run !== undefined) {
    const index = findLast(runs, (r) => r.id === reference.run);
    if (index < 0) {
      throw new InputError(`the history has no run "${reference.run}"`, {
        where: 'REF',
        fix: 'give a run id the history holds (bellgate runs lists them), a commit sha or a time',
      });
    }
    return resolved(runs, index, requested, true);
  }
  if (reference.sha !== undefined) {
    const sha = reference.sha.toLowerCase();
    const matching = new Set(runs.filter((r) => r.sha?.toLowerCase().startsWith(sha)).map((r) => r.sha!.toLowerCase()));
    if (matching.size > 1) {
      throw new InputError(`commit "${reference.sha}" is ambiguous: ${matching.size} recorded commits start with it`, {
        where: 'REF',
        fix: 'give more digits of the sha',
      });
    }
    if (matching.size === 1) {
      const index = findLast(runs, (r) => r.sha?.toLowerCase().startsWith(sha) === true);
      return resolved(runs, index, requested, true);
    }
    if (reference.time === undefined) {
      throw new InputError(
        `commit "${reference.sha}" has no recorded run, and without its time no earlier run can stand in`,
        {
          where: 'REF',
          fix: "give the commit's time as well (git show -s --format=%cI SHA), or a run id or time",
        },
      );
    }
    const index = atOrBefore(runs, reference.time);
    const run = runs[index]!;
    return {
      ...resolved(runs, index, requested, false),
      note: `commit ${reference.sha.slice(0, 12)} has no recorded run; run ${run.id}${run.time ? ` (${run.time})` : ''}, the nearest earlier recorded run, stands in`,
    };
  }
  if (reference.time !== undefined) {
    const index = atOrBefore(runs, reference.time);
    const run = runs[index]!;
    const exact = run.time !== undefined && Date.parse(run.time) === Date.parse(reference.time);
    return exact
      ? resolved(runs, index, requested, true)
      : {
          ...resolved(runs, index, requested, false),
          note: `no run was recorded at ${reference.time}; run ${run.id}${run.time ? ` (${run.time})` : ''}, the nearest earlier recorded run, stands in`,
        };
  }
  throw new InputError('a review needs a reference: a run id, a commit sha or a time', { where: 'REF' });
}

function resolved(
  runs: readonly RunInfo[],
  index: number,
  requested: SinceReference,
  exact: boolean,
): ResolvedReference {
  const run = runs[index]!;
  return { ...runRef(run), index, requested, exact };
}

/** The run's id, sha, pr and time, leaving out the absent ones. */
export function runRef(run: RunInfo): { run: string; sha?: string; pr?: number; time?: string } {
  return {
    run: run.id,
    ...(run.sha === undefined ? {} : { sha: run.sha }),
    ...(run.pr === undefined ? {} : { pr: run.pr }),
    ...(run.time === undefined ? {} : { time: run.time }),
  };
}

function atOrBefore(runs: readonly RunInfo[], time: string): number {
  const t = Date.parse(time);
  if (!Number.isFinite(t)) {
    throw new InputError(`"${time}" is not an ISO-8601 time`, {
      where: 'REF',
      fix: 'write it as 2026-03-01T12:00:00Z',
    });
  }
  let best = -1;
  let bestTime = -Infinity;
  runs.forEach((r, i) => {
    const rt = r.time === undefined ? Number.NaN : Date.parse(r.time);
    // The newest run at or before t; runs are oldest first, so a later equal time wins.
    if (Number.isFinite(rt) && rt <= t && rt >= bestTime) {
      best = i;
      bestTime = rt;
    }
  });
  if (best < 0) {
    const first = runs.find((r) => r.time !== undefined);
    throw new InputError(`no recorded run at or before ${time}`, {
      where: 'REF',
      fix: first?.time
        ? `the history starts at ${first.time}: give a later reference`
        : 'the history has no run with a time',
    });
  }
  return best;
}

function findLast(runs: readonly RunInfo[], test: (r: RunInfo) => boolean): number {
  for (let i = runs.length - 1; i >= 0; i--) if (test(runs[i]!)) return i;
  return -1;
}
