import type { Report } from '../gate/report.js';
import { mostlyMissing } from '../gate/missing-metrics.js';

/** Names listed in the "not judged" line before it only counts the rest. */
const NOT_JUDGED_LISTED = 10;

/**
 * The lines every rendering of a report opens with, before its verdict: the adapters' notes (the
 * history was not used, this run was not recorded), "N of M baseline metrics missing" when more
 * than half of them are, and the values this run did not judge. Plain, unescaped text: each
 * renderer escapes it for its medium (`clean` is applied to names and reasons from metric files).
 * @example reportNotes(report, (s) => s) // ['7 of 10 baseline metrics are missing from this run: ...']
 */
export function reportNotes(report: Report, clean: (text: string) => string): string[] {
  const lines = (report.notes ?? []).map(clean);
  if (mostlyMissing(report.missing)) {
    const { count, of } = report.missing!;
    lines.push(
      `${count} of ${of} baseline metrics are missing from this run: check that every benchmark ran and wrote its file`,
    );
  }
  const notJudged = report.notJudged ?? [];
  if (notJudged.length > 0) {
    const shown = notJudged.slice(0, NOT_JUDGED_LISTED).map((n) => `${clean(n.name)} (${clean(n.reason)})`);
    const more = notJudged.length - shown.length;
    lines.push(
      `${notJudged.length} value${notJudged.length === 1 ? '' : 's'} not judged nor recorded: ${shown.join(', ')}${more > 0 ? ` and ${more} more` : ''}`,
    );
  }
  return lines;
}
