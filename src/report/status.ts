import type { Status, Verdict } from '../gate/report.js';

/**
 * Order in which statuses are shown: what needs attention first. Also the default sort of every
 * table, so a reviewer sees regressions without scrolling.
 */
export const STATUS_ORDER: readonly Status[] = ['regressed', 'improved', 'missing', 'ok', 'learning', 'new', 'ignored'];

/** Rank of a status in STATUS_ORDER (unknown statuses last). */
export function statusRank(s: Status): number {
  const i = STATUS_ORDER.indexOf(s);
  return i < 0 ? STATUS_ORDER.length : i;
}

/**
 * A shape per status, so colour is never the only carrier (WCAG 1.4.1): ▲ is always the worse side
 * and ▼ the better side, whichever way the metric moved (a dropped throughput is ▲ regressed), a
 * hollow circle for still learning. GLYPH_LEGEND says so in every report.
 */
export const STATUS_GLYPH: Readonly<Record<Status, string>> = {
  regressed: '▲',
  improved: '▼',
  missing: '✕',
  ok: '●',
  learning: '◌',
  new: '✚',
  ignored: '–',
};

/** The legend of the status glyphs, shown under every table. */
export const GLYPH_LEGEND =
  'legend: ▲ the worse side (regressed) · ▼ the better side (improved), whichever way the number moved';

/** What each verdict means, in a sentence that follows the verdict word in every headline. */
export const VERDICT_HEADLINE: Readonly<Record<Verdict, string>> = {
  pass: 'no metric regressed',
  regressed: 'at least one metric fell in the improbable tail on its worse side',
  learning: 'no metric has enough baseline runs yet',
  accepted: 'regressions found, accepted by the pull request label',
  unsettled:
    'no metric regressed on its own, but the timings moved together beyond what the history has shown (re-run, or record a baseline run on the same runner)',
};

/** Count of metrics per status, in STATUS_ORDER, omitting zeros. @example "2 regressed, 40 ok" */
export function statusCounts(statuses: Iterable<Status>): string {
  const counts = new Map<Status, number>();
  for (const s of statuses) counts.set(s, (counts.get(s) ?? 0) + 1);
  return STATUS_ORDER.filter((s) => counts.has(s))
    .map((s) => `${counts.get(s)} ${s}`)
    .join(', ');
}
