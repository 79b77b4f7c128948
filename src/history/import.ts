import { InputError } from '../errors/input-error.js';
import type { History, MetricColumn, RunInfo } from './history.js';
import { parseJsonLines } from './import-jsonl.js';
import type { ImportedRun, ImportParse, SkippedEntry } from './import-run.js';
import { inStoredUnit } from '../inputs/units.js';
import { mergeHistories } from './merge.js';

export type { ImportedRun, ImportParse, SkippedEntry } from './import-run.js';

/** What `bellgate import` did: the new history and how many runs were added, replaced, the same. */
export interface ImportOutcome {
  history: History;
  /** The usable imported runs alone, as a History: what a store merges into what it holds. */
  incoming: History;
  added: number;
  updated: number;
  /** Runs already stored with exactly these values and fields (re-importing a file is harmless). */
  unchanged: number;
  skipped: SkippedEntry[];
}

/**
 * Parses bulk past results for `bellgate import`, choosing the form by content: text whose
 * first character is `{` is JSON Lines (see parseJsonLines), anything else is CSV with a header
 * (see parseCsvRuns). Pure. Throws InputError for an empty file, a JSON array, or CSV without
 * the id and time columns; smaller problems are listed in `skipped`.
 *
 * CSV loads its parser library (csv-parse) here only: an import is rare.
 *
 * @example (await parseImportRuns('id,time,name,value\n81,2026-03-01,build,12.5\n', 'runs.csv')).runs.length // 1
 */
export async function parseImportRuns(text: string, source: string): Promise<ImportParse> {
  const body = text.charCodeAt(0) === 0xfeff ? text.slice(1) : text;
  const first = body.trimStart()[0];
  if (first === undefined)
    throw new InputError('the file holds no runs', {
      where: source,
      fix: 'write one run per line (JSON Lines) or a CSV with a header',
    });
  if (first === '{') return parseJsonLines(body, source);
  if (first === '[') {
    throw new InputError('a JSON array is not an import form', {
      where: `${source}:1:1`,
      fix: 'write one run object per line (JSON Lines)',
    });
  }
  return (await import('./import-csv.js')).parseCsvRuns(body, source);
}

/**
 * Merges imported runs into a history by run id: an id not yet stored is added, a stored id is
 * replaced by the imported copy (updated, or unchanged when identical). A run given twice: the
 * later one counts. Accepts the runs, or parseImportRuns' whole result (its skipped entries are
 * passed on). Runs that cannot be stored (no id, non-finite value) are skipped with a reason.
 * Pure; O((stored + imported) x metrics).
 *
 * @example importRuns(emptyHistory('s'), await parseImportRuns(text, 'runs.jsonl')) // { history, added: 3, updated: 0, ... }
 */
export function importRuns(h: History, input: ImportedRun[] | ImportParse): ImportOutcome {
  const list = Array.isArray(input) ? input : input.runs;
  const skipped = Array.isArray(input) ? [] : [...input.skipped];
  const byId = new Map<string, ImportedRun>();
  list.forEach((run, i) => {
    const bad = [...run.metrics].find(([, v]) => !Number.isFinite(v));
    if (typeof run.info?.id !== 'string' || run.info.id === '')
      skipped.push({ where: `run ${i + 1}`, reason: 'no id' });
    else if (bad)
      skipped.push({
        where: `run ${run.info.id}`,
        reason: `metric ${JSON.stringify(bad[0])}: value ${bad[1]} is not a finite number`,
      });
    else if (h.dropped?.has(run.info.id))
      skipped.push({ where: `run ${run.info.id}`, reason: 'this run was dropped from the history (bellgate drop)' });
    else byId.set(run.info.id, run);
  });
  const incoming = [...byId.values()];
  const columns = new Map<string, MetricColumn>();
  incoming.forEach((run, r) => {
    for (const [name, value] of run.metrics) {
      let column = columns.get(name);
      if (!column) {
        column = { values: new Array<number>(incoming.length).fill(NaN) };
        columns.set(name, column);
      }
      const unit = run.units.get(name);
      const stored = h.columns.get(name)?.unit ?? column.unit;
      // The stored unit is authoritative (never relabelled): a value in a unit that converts is
      // converted to it, one that does not is left out naming its line and both units.
      let inStored: number;
      try {
        inStored = inStoredUnit(name, { value, count: 1, ...(unit === undefined ? {} : { unit }) }, stored);
      } catch (error) {
        if (!(error instanceof InputError)) throw error;
        skipped.push({ where: run.places?.get(name) ?? `run ${run.info.id}`, reason: error.message });
        continue;
      }
      column.values[r] = inStored;
      if (column.unit === undefined && (stored ?? unit) !== undefined) column.unit = (stored ?? unit) as string;
    }
  });
  const stored = new Map(h.runs.map((run, i) => [run.id, i]));
  let added = 0;
  let updated = 0;
  let unchanged = 0;
  for (const run of incoming) {
    const index = stored.get(run.info.id);
    if (index === undefined) added += 1;
    else if (sameRun(h, index, run)) unchanged += 1;
    else updated += 1;
  }
  for (const [name, column] of columns) if (!column.values.some((v) => !Number.isNaN(v))) columns.delete(name);
  const theirs: History = { series: h.series, runs: incoming.map((r) => ({ ...r.info })), columns, dropped: new Map() };
  return { history: mergeHistories(h, theirs), incoming: theirs, added, updated, unchanged, skipped };
}

function sameRun(h: History, index: number, run: ImportedRun): boolean {
  const old = h.runs[index] as RunInfo;
  const fields = ['id', 'sha', 'ref', 'event', 'time'] as const;
  if (fields.some((f) => old[f] !== run.info[f])) return false;
  for (const [name, column] of h.columns) {
    const before = column.values[index] ?? NaN;
    const now = run.metrics.get(name);
    if (now === undefined ? !Number.isNaN(before) : now !== before) return false;
  }
  return [...run.metrics.keys()].every((name) => h.columns.has(name));
}
