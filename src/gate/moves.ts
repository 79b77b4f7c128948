import { median } from 'simple-statistics';
import { groupFor } from '../config/rules.js';
import type { Config } from '../config/types.js';
import type { History } from '../history/history.js';
import { medianInPlace } from '../model/median.js';
import { medianOfOthers } from '../model/median-of-others.js';
import type { Candidate } from './candidates.js';
import { LASTING_RUNS, lastingStart } from './lasting-change.js';
import type { MetricResult, SinceReason } from './report.js';

/** The default group of the timings needs this many members: a median of fewer is no shared move. */
export const MIN_TIMINGS = 3;

/** A set of metrics judged beside a shared move: the timings, a configured group, a reference metric, or none. */
export interface MoveGroup {
  name: string;
  kind: 'timings' | 'group' | 'reference' | 'alone';
  members: Candidate[];
  /** For `reference` (relative-to): the metric whose move is the shared move. */
  reference?: Candidate;
}

/** One member after its moves were taken apart: everything the noise model and the judge need. */
export interface MemberMoves {
  candidate: Candidate;
  group: MoveGroup;
  /** Baseline runs (indexes into history.runs, ascending) behind the member. */
  rows: number[];
  /** Where each level of the member starts (indexes into history.runs, ascending; 0 first). */
  levels: number[];
  /** Why the current level starts where it does (absent: the whole window is one level). */
  since?: { index: number; run: string; reason: SinceReason; pr?: number };
  /** Own moves, worse side positive, in the member's deviation units, aligned with rows. */
  own: number[];
  /** This run's own move, and the shared move taken out of it (worse side positive). */
  ownNow: number;
  sharedNow: number;
  /** Centre of the current level on the fit scale. */
  centre: number;
  /** Per row: a calm run (false: a slow episode, see runStates); and whether this run is calm. */
  calm: boolean[];
  calmNow: boolean;
  runner?: 'same' | 'other' | 'mixed';
}

/** The shared moves of a group: one per baseline run, and this run's. */
export interface GroupMoves {
  group: MoveGroup;
  history: number[];
  now: number;
  members: number;
}

/**
 * Sorts candidates into move groups (issue 13 item 3): a `relative-to` metric is judged beside its
 * reference metric's move; a configured group's members beside the group's shared move; every
 * other timing (time unit, `shared-move` on) beside the timings' shared move; the rest alone.
 * A timings group of fewer than MIN_TIMINGS, or a configured group of one, has no shared move.
 * A relative-to metric whose reference this run lacks gets a `missing` result instead.
 * @example formGroups(config, candidates).groups.map((g) => g.name) // ['timings', 'alone']
 */
export function formGroups(
  config: Config,
  candidates: readonly Candidate[],
): { groups: MoveGroup[]; finished: MetricResult[] } {
  const byName = new Map(candidates.map((c) => [c.name, c] as const));
  const finished: MetricResult[] = [];
  const named = new Map<string, MoveGroup>();
  const alone: Candidate[] = [];
  const timings: Candidate[] = [];
  const add = (key: string, group: () => MoveGroup, member: Candidate): void => {
    const found = named.get(key) ?? group();
    found.members.push(member);
    named.set(key, found);
  };
  for (const c of candidates) {
    const reference = c.settings.relativeTo;
    if (reference !== undefined) {
      const ref = byName.get(reference);
      if (ref === undefined) {
        finished.push({
          name: c.name,
          status: 'missing',
          value: c.measurement.value,
          cutoff: c.settings.cutoff,
          worse: c.settings.worse,
          note: { kind: 'no-reference', reference },
        });
        continue;
      }
      const name = `relative-to ${reference}`;
      add(name, () => ({ name, kind: 'reference', members: [], reference: ref }), c);
      continue;
    }
    const spec = groupFor(config, c.name);
    if (spec !== undefined) add(`group ${spec.name}`, () => ({ name: spec.name, kind: 'group', members: [] }), c);
    else if (c.timing && c.settings.sharedMove) timings.push(c);
    else alone.push(c);
  }
  const groups: MoveGroup[] = [];
  for (const g of named.values()) {
    if (g.kind === 'group' && g.members.length < 2) alone.push(...g.members);
    else groups.push(g);
  }
  if (timings.length >= MIN_TIMINGS) groups.push({ name: 'timings', kind: 'timings', members: timings });
  else alone.push(...timings);
  for (const c of alone) groups.push({ name: c.name, kind: 'alone', members: [c] });
  return { groups, finished };
}

/** A member's deviation from a centre in its deviation units (log: the difference; else a share of the centre). */
function deviation(c: Candidate, x: number, centre: number): number {
  const d = x - centre;
  return c.sign * (c.log || centre === 0 ? d : d / Math.abs(centre));
}

/**
 * Takes one group's runs apart into shared and own moves (issue 13 item 3).
 * Rows: the newest `window` runs holding a member; when the caller knows this run's runner and at
 * least min-runs of those runs share its fingerprint, only those (for timings: a new CPU model
 * moves every timing). Levels: a member's runs before its newest level mark, and before a lasting
 * change of its own moves (lastingStart, with `change-points` on), are earlier levels, each with
 * its own centre, so the spread is taken over every level and a short new level still gets it.
 * Centres and shared moves: a median polish (Tukey 1977, "Exploratory Data Analysis", ch. 11) of
 * runs x members on the fit scale, value = centre(member, level) + shared(run) + own; then each
 * member's own move is its deviation minus the median of the OTHER members' deviations in that
 * run (medianOfOthers), so no member's own slowdown is ever part of the shared move it is judged
 * beside. `reference`: the shared move is the reference metric's deviation; `alone`: none.
 * O(rows x members x log members).
 */
export function takeApart(
  group: MoveGroup,
  history: History,
  runner: string | undefined,
): { members: MemberMoves[]; shared?: GroupMoves } {
  const everyone = group.reference ? [...group.members, group.reference] : group.members;
  const { rows, runnerMatch } = groupRows(everyone, history, runner);
  let members = everyone.map((c) => memberFrame(c, rows, history));
  let result = polish(group, members);
  const changed = members.map((m, j) => withLastingChange(m, result.own[j]!, history));
  if (changed.some((m, j) => m !== members[j])) {
    members = changed;
    result = polish(group, members);
  }
  const states =
    result.shared !== undefined && group.members.length >= EPISODE_MIN_MEMBERS
      ? runStates(
          result.own,
          result.ownNow,
          members.map((f) => f.rows),
        )
      : undefined;
  const out: MemberMoves[] = group.members.map((c, j) => {
    const m = members[j]!;
    return {
      candidate: c,
      group,
      rows: m.rows,
      levels: m.levels,
      ...(m.since === undefined ? {} : { since: m.since }),
      own: result.own[j]!,
      ownNow: result.ownNow[j]!,
      sharedNow: result.sharedNow[j]!,
      centre: result.centres[j]!.at(-1)!,
      calm: m.rows.map((i) => states?.calm.get(i) ?? true),
      calmNow: states?.calmNow ?? true,
      ...(runnerMatch === undefined ? {} : { runner: runnerMatch }),
    };
  });
  return result.shared === undefined ? { members: out } : { members: out, shared: result.shared };
}

interface Frame {
  candidate: Candidate;
  rows: number[];
  levels: number[];
  since?: MemberMoves['since'];
}

/** The rows of a group, newest `window` first chosen, returned ascending; with the runner preference. */
function groupRows(
  members: readonly Candidate[],
  history: History,
  runner: string | undefined,
): { rows: number[]; runnerMatch?: 'same' | 'other' | 'mixed' } {
  const window = Math.max(...members.map((c) => c.settings.window));
  const need = Math.max(...members.map((c) => c.settings.minRuns));
  const eligible: number[] = [];
  for (let i = Math.min(history.runs.length, ...members.map((c) => c.values.length)) - 1; i >= 0; i--) {
    if (members.some((c) => Number.isFinite(c.values[i]!))) eligible.push(i);
  }
  const timed = members.some((c) => c.timing);
  if (runner === undefined || !timed) return { rows: eligible.slice(0, window).reverse() };
  const same = eligible.filter((i) => history.runs[i]!.runner === runner);
  if (same.length >= need) return { rows: same.slice(0, window).reverse(), runnerMatch: 'same' };
  const rows = eligible.slice(0, window).reverse();
  const some = rows.some((i) => history.runs[i]!.runner === runner);
  return { rows, runnerMatch: some ? 'mixed' : 'other' };
}

/** A member's own rows (its newest `window` values among the group's rows) and its marked levels. */
function memberFrame(c: Candidate, groupRows: readonly number[], history: History): Frame {
  const held = groupRows.filter((i) => Number.isFinite(c.values[i]!));
  const rows = held.slice(Math.max(0, held.length - c.settings.window));
  const frame: Frame = { candidate: c, rows, levels: [0] };
  const mark = c.mark;
  if (mark !== undefined && rows.length > 0 && mark.index > rows[0]!) {
    frame.levels.push(mark.index);
    frame.since = {
      index: mark.index,
      run: history.runs[mark.index]!.id,
      reason: mark.reason,
      ...(mark.pr === undefined ? {} : { pr: mark.pr }),
    };
  }
  return frame;
}

/** The frame with a lasting change of its own moves as a new level, or the frame itself. */
function withLastingChange(frame: Frame, own: readonly number[], history: History): Frame {
  const { settings } = frame.candidate;
  if (!settings.changePoints) return frame;
  const from = frame.levels.at(-1)!;
  const at = frame.rows.findIndex((i) => i >= from);
  const series: number[] = [];
  const runs: number[] = [];
  for (let k = Math.max(0, at); k < frame.rows.length; k++) {
    if (!Number.isFinite(own[k]!)) continue;
    series.push(own[k]!);
    runs.push(frame.rows[k]!);
  }
  const start = lastingStart(series, Math.max(settings.minRuns, LASTING_RUNS));
  if (start === undefined) return frame;
  const index = runs[start]!;
  return {
    ...frame,
    levels: [...frame.levels, index],
    since: { index, run: history.runs[index]!.id, reason: 'change' },
  };
}

interface Polished {
  /** Per member: the centre of each level (fit scale). */
  centres: number[][];
  own: number[][];
  ownNow: number[];
  sharedNow: number[];
  shared?: GroupMoves;
}

/** Rounds of the median polish: the centres settle in two (Tukey's usual stopping point is a few). */
const POLISH_ROUNDS = 2;

/** A frame's values on its rows and where each of its levels starts among them. */
interface FrameValues {
  values: Float64Array;
  /** Per level k, the first position in rows of that level; one more entry: rows.length. */
  bounds: Int32Array;
}

function frameValues(f: Frame): FrameValues {
  const values = new Float64Array(f.rows.length);
  const bounds = new Int32Array(f.levels.length + 1);
  let k = 0;
  for (let r = 0; r < f.rows.length; r++) {
    const i = f.rows[r]!;
    values[r] = f.candidate.values[i]!;
    while (k + 1 < f.levels.length && f.levels[k + 1]! <= i) bounds[++k] = r;
  }
  while (k < f.levels.length) bounds[++k] = f.rows.length;
  return { values, bounds };
}

/**
 * The median polish of one group. Dense: runs x members deviations in one array and medians of
 * reused buffers, because a timings group holds every timing of the project (1,000 in the bench)
 * and is polished on every check.
 */
function polish(group: MoveGroup, frames: readonly Frame[]): Polished {
  const n = group.members.length;
  const framed = frames.map(frameValues);
  const scratch = new Array<number>(Math.max(frames.length, ...frames.map((f) => f.rows.length))).fill(0);
  // Plain level centres first: the medians of each level's values.
  const centres = framed.map(({ values, bounds }) => {
    const c: number[] = [];
    for (let k = 0; k + 1 < bounds.length; k++) {
      for (let r = bounds[k]!; r < bounds[k + 1]!; r++) scratch[r - bounds[k]!] = values[r]!;
      c.push(medianInPlace(scratch, bounds[k + 1]! - bounds[k]!));
    }
    return c;
  });
  // Fill a level without runs (a mark on the newest run) from the level before: it is learning anyway.
  for (const c of centres) for (let k = 1; k < c.length; k++) if (!Number.isFinite(c[k]!)) c[k] = c[k - 1]!;
  /** Member j's deviations at each position of its rows. */
  const devsOf = (j: number): Float64Array => {
    const { values, bounds } = framed[j]!;
    const candidate = frames[j]!.candidate;
    const out = new Float64Array(values.length);
    for (let k = 0; k + 1 < bounds.length; k++) {
      const centre = centres[j]![k]!;
      for (let r = bounds[k]!; r < bounds[k + 1]!; r++) {
        const x = values[r]!;
        out[r] = Number.isFinite(x) ? deviation(candidate, x, centre) : Number.NaN;
      }
    }
    return out;
  };
  const devNow = (j: number): number => {
    const f = frames[j]!;
    return deviation(f.candidate, f.candidate.current, centres[j]!.at(-1)!);
  };
  if (group.kind === 'alone') {
    return {
      centres,
      own: frames.map((_, j) => Array.from(devsOf(j))),
      ownNow: frames.map((_, j) => devNow(j)),
      sharedNow: frames.map(() => 0),
    };
  }
  if (group.kind === 'reference') {
    const r = frames.length - 1;
    const refSign = frames[r]!.candidate.sign;
    const refDevs = devsOf(r);
    const refAt = new Map(frames[r]!.rows.map((i, k) => [i, refDevs[k]! * refSign] as const));
    const refNow = devNow(r) * refSign;
    return {
      centres,
      // The reference itself comes last, with its plain deviations (for its lasting-change check).
      own: [
        ...frames.slice(0, n).map((f, j) => {
          const d = devsOf(j);
          return f.rows.map((i, k) => d[k]! - f.candidate.sign * (refAt.get(i) ?? Number.NaN));
        }),
        Array.from(refDevs),
      ],
      ownNow: frames.slice(0, n).map((f, j) => devNow(j) - f.candidate.sign * refNow),
      sharedNow: frames.slice(0, n).map((f) => f.candidate.sign * refNow),
    };
  }
  // The runs any member holds, ascending, and each one's row in devs.
  const end = Math.max(0, ...frames.map((f) => (f.rows.at(-1) ?? -1) + 1));
  const rowOf = new Int32Array(end).fill(-1);
  for (const f of frames) for (const i of f.rows) rowOf[i] = 0;
  const rowIndex: number[] = [];
  for (let i = 0; i < end; i++) if (rowOf[i] === 0) rowOf[i] = rowIndex.push(i) - 1;
  const place = frames.map((f) => {
    const rows = new Int32Array(f.rows.length);
    for (let r = 0; r < f.rows.length; r++) rows[r] = rowOf[f.rows[r]!]!;
    return rows;
  });
  const m = frames.length;
  // devs[row * m + j]: member j's deviation in that run, NaN where it has none.
  const devs = new Float64Array(rowIndex.length * m);
  const fill = (): void => {
    devs.fill(Number.NaN);
    for (let j = 0; j < m; j++) {
      const d = devsOf(j);
      const rows = place[j]!;
      for (let r = 0; r < rows.length; r++) devs[rows[r]! * m + j] = d[r]!;
    }
  };
  /** The median of a run's finite deviations, and how many there are. */
  const runMedian = (row: number): { median: number; count: number } => {
    let count = 0;
    for (let j = row * m; j < (row + 1) * m; j++) if (Number.isFinite(devs[j]!)) scratch[count++] = devs[j]!;
    return { median: medianInPlace(scratch, count), count };
  };
  for (let round = 0; round < POLISH_ROUNDS; round++) {
    fill();
    const shared = new Float64Array(rowIndex.length);
    for (let row = 0; row < rowIndex.length; row++) shared[row] = runMedian(row).median;
    for (let j = 0; j < m; j++) {
      const { log, sign } = frames[j]!.candidate;
      const { values, bounds } = framed[j]!;
      const rows = place[j]!;
      for (let k = 0; k + 1 < bounds.length; k++) {
        const c = centres[j]![k]!;
        let count = 0;
        for (let r = bounds[k]!; r < bounds[k + 1]!; r++) {
          const s = shared[rows[r]!]!;
          if (Number.isFinite(s)) scratch[count++] = values[r]! - (log || c === 0 ? sign * s : sign * s * Math.abs(c));
        }
        if (count > 0) centres[j]![k] = medianInPlace(scratch, count);
      }
    }
  }
  fill();
  const own: number[][] = frames.map((f) => f.rows.map(() => Number.NaN));
  const next = new Int32Array(m);
  const history_: number[] = [];
  for (let row = 0; row < rowIndex.length; row++) {
    const runDevs = devs.subarray(row * m, (row + 1) * m);
    const others = medianOfOthers(runDevs);
    for (let j = 0; j < m; j++) {
      const r = next[j]!;
      if (place[j]![r] !== row) continue;
      own[j]![r] = runDevs[j]! - others[j]!;
      next[j] = r + 1;
    }
    const present = runMedian(row);
    if (present.count >= 2) history_.push(present.median);
  }
  const nowDevs = frames.map((_, j) => devNow(j));
  const nowOthers = medianOfOthers(nowDevs);
  const ownNow = nowDevs.map((d, j) => d - nowOthers[j]!);
  return {
    centres,
    own,
    ownNow,
    sharedNow: nowOthers,
    shared: { group, history: history_, now: median(nowDevs), members: n },
  };
}

/** A member's own move counts towards a slow episode beyond this many robust sd (1.4826 MAD). */
export const EPISODE_SD = 3.5;

/**
 * A run is a slow episode when at least max(2, members / EPISODE_PER) of a group's members are
 * that far out: with many members a second far one comes by chance more often (rule of thumb,
 * measured on the simulated project's 40 timings).
 */
export const EPISODE_PER = 15;

/**
 * Groups of fewer members have no episodes: with a handful, one slowed metric moves the others'
 * leave-one-out medians and so their own moves, and two far members say nothing of a block.
 */
export const EPISODE_MIN_MEMBERS = 8;

/**
 * Sorts runs into calm runs and slow episodes (issue 13 item 1). Recorded CI timings show spells
 * in which a block of timings runs slower, each by its own amount (a busy neighbour or a
 * throttled CPU for part of the process): the median across timings moves little, so the shared
 * move does not remove it, and each timing's own moves get a second, slow mode. Judged against
 * a history that mixes both, a metric's spread is that of the episodes and nothing is visible; a
 * two-state view (calm or disturbed, as in a two-component mixture) keeps a calm run judged
 * against calm runs only. A run is an episode when at least 2 (EPISODE_PER) of its members have
 * an own move beyond EPISODE_SD robust sd of that member's own moves, so one slowed metric (a
 * real single-metric regression) never makes a run an episode. Robust sd: 1.4826 MAD, which
 * stays near the calm spread while fewer than half the runs are episodes (Hampel 1974, "The
 * influence curve and its role in robust estimation", JASA 69: breakdown point 1/2).
 */
function runStates(
  own: readonly (readonly number[])[],
  ownNow: readonly number[],
  rows: readonly (readonly number[])[],
): { calm: Map<number, boolean>; calmNow: boolean } {
  const scratch = new Array<number>(Math.max(0, ...own.map((o) => o.length))).fill(0);
  const scales = own.map((o) => {
    let count = 0;
    for (const x of o) if (Number.isFinite(x)) scratch[count++] = x;
    if (count < 3) return Number.NaN;
    const c = medianInPlace(scratch, count);
    for (let k = 0; k < count; k++) scratch[k] = Math.abs(scratch[k]! - c);
    return 1.4826 * medianInPlace(scratch, count);
  });
  const far = (x: number, j: number): boolean =>
    Number.isFinite(x) && scales[j]! > 0 && Math.abs(x) > EPISODE_SD * scales[j]!;
  const need = Math.max(2, Math.ceil(own.length / EPISODE_PER));
  // Far members per run, by history index; -1: a run no member holds.
  const counts = new Int32Array(Math.max(0, ...rows.map((r) => (r.at(-1) ?? -1) + 1))).fill(-1);
  own.forEach((o, j) =>
    o.forEach((x, k) => {
      const i = rows[j]![k]!;
      counts[i] = Math.max(0, counts[i]!) + (far(x, j) ? 1 : 0);
    }),
  );
  const calm = new Map<number, boolean>();
  counts.forEach((n, i) => {
    if (n >= 0) calm.set(i, n < need);
  });
  const nowCount = ownNow.filter((x, j) => far(x, j)).length;
  return { calm, calmNow: nowCount < need };
}
