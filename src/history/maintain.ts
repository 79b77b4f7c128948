/**
 * The maintenance operations, as the CLI (`bellgate mark|drop|rename|runs|import`) and the
 * action's manual run (`maintenance:` input) both perform them on any store: each becomes one
 * HistoryChange applied by the store at the moment of writing (so a record running at once is
 * not lost), or a read for `runs`. Returns the lines to show; throws InputError for an unknown
 * run or metric (applyChange), StoreError when the store fails.
 */
import { visibleText } from '../errors/visible-text.js';
import { listRuns, type RunSummary } from './changes.js';
import type { LevelMark } from './history.js';
import { importRuns, parseImportRuns } from './import.js';
import type { HistoryStore } from './store.js';

export type Maintenance =
  /** A level change starts at `run` for the metrics matching `metrics` (all when absent). */
  | { op: 'mark'; run: string; metrics?: string[]; note?: string }
  /** Drop `run` for good (a tombstone keeps it from coming back in a merge). */
  | { op: 'drop'; run: string; reason?: string }
  /** Give metric `from` the name `to`, keeping its history. */
  | { op: 'rename'; from: string; to: string }
  /** List the runs, their marks and sizes. */
  | { op: 'runs' }
  /** Merge past results (JSON Lines or CSV text from `source`) into the store. */
  | { op: 'import'; text: string; source: string };

/** How many skipped import rows are listed one by one before the rest are counted. */
const SHOWN_SKIPS = 20;

/** What an operation did (`lines`), and the import rows it skipped with their place and reason (`skipped`). */
export interface MaintenanceOutcome {
  lines: string[];
  skipped: string[];
}

/**
 * @example (await maintain(store, { op: 'drop', run: '81-1', reason: 'broken runner' }, new Date())).lines // ['dropped run 81-1 ...']
 */
export async function maintain(store: HistoryStore, m: Maintenance, now: Date): Promise<MaintenanceOutcome> {
  // Names and ids come from the user or a file: nothing in them may steer the terminal or log.
  const skipped: string[] = [];
  const lines = await perform(store, m, now, skipped);
  return { lines: lines.map((l) => visibleText(l)), skipped: skipped.map((l) => visibleText(l)) };
}

async function perform(store: HistoryStore, m: Maintenance, now: Date, skipped: string[]): Promise<string[]> {
  const where = store.describe();
  switch (m.op) {
    case 'mark': {
      const mark: LevelMark = { reason: 'manual' };
      if (m.metrics !== undefined && m.metrics.length > 0) mark.metrics = m.metrics;
      if (m.note !== undefined && m.note !== '') mark.note = m.note;
      const done = await store.update({ kind: 'mark', id: m.run, mark });
      const which = mark.metrics === undefined ? 'every metric' : mark.metrics.join(', ');
      return [`marked run ${m.run}: a new level of ${which} starts there (${done.runs} runs in ${where})`];
    }
    case 'drop': {
      const tombstone = { id: m.run, time: now.toISOString(), ...(m.reason ? { reason: m.reason } : {}) };
      const done = await store.update({ kind: 'drop', tombstone });
      return [`dropped run ${m.run}; it stays dropped after merges (${done.runs} runs left in ${where})`];
    }
    case 'rename': {
      const done = await store.update({ kind: 'rename', from: m.from, to: m.to });
      return [`renamed ${m.from} to ${m.to}, keeping its history (${done.runs} runs in ${where})`];
    }
    case 'runs': {
      const h = await store.read();
      return runLines(listRuns(h), h.dropped?.size ?? 0, where);
    }
    case 'import': {
      const parsed = await parseImportRuns(m.text, m.source);
      const result = importRuns(await store.read(), parsed);
      for (const s of result.skipped.slice(0, SHOWN_SKIPS)) skipped.push(`skipped ${s.where}: ${s.reason}`);
      if (result.skipped.length > SHOWN_SKIPS)
        skipped.push(`... and ${result.skipped.length - SHOWN_SKIPS} more skipped rows`);
      // The store merges what it holds when it writes with these runs.
      const done = await store.update({ kind: 'merge', history: result.incoming });
      return [
        `imported ${m.source}: ${result.added} runs added, ${result.updated} updated, ${result.unchanged} unchanged, ${result.skipped.length} skipped; ${done.runs} runs in ${where}`,
      ];
    }
  }
}

/** One line per run, oldest first: id, time, sha, event, pull request, metric count, marks. */
function runLines(runs: RunSummary[], dropped: number, where: string): string[] {
  const out = [`${runs.length} runs in ${where}${dropped > 0 ? ` (${dropped} dropped)` : ''}`];
  for (const r of runs) {
    const parts = [r.id, r.time ?? '-', r.sha?.slice(0, 12) ?? '-', r.event ?? '-'];
    if (r.pr !== undefined) parts.push(`#${r.pr}`);
    parts.push(`${r.metricCount} metric${r.metricCount === 1 ? '' : 's'}`);
    for (const mark of r.marks ?? []) {
      const why = mark.reason === 'accepted' ? `accepted${mark.pr === undefined ? '' : ` in #${mark.pr}`}` : 'manual';
      parts.push(`level mark (${why}${mark.metrics ? `: ${mark.metrics.join(', ')}` : ': every metric'})`);
    }
    out.push(parts.join('  '));
  }
  return out;
}
