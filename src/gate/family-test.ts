import type { Family } from '../config/types.js';
import { adjustTails } from '../model/family.js';
import type { Test } from './decide-metric.js';
import { formatNumber } from './format-number.js';

/** One decision of the run that family control adjusts: a lone metric or a whole group. */
export interface FamilyItem {
  tail: number;
  /** The level its cutoff stands for: cutoffLevel(cutoff). */
  level: number;
}

/**
 * Adjusts the tails of all decisions of a run for being made together (issue 6) and returns each
 * decision's test: adjusted tail below its level. Bonferroni and Holm (1979) bound the chance of
 * any false alarm in the run; fdr (Benjamini & Hochberg 1995) bounds the share of false alarms
 * among the flagged. With `none` the caller keeps its plain tests; this returns an empty list.
 * @example familyTests([{ tail: 1e-5, level: 0.0024 }], 'holm')[0].test.significant // true
 */
export function familyTests(items: readonly FamilyItem[], family: Family): { adjusted: number; test: Test }[] {
  if (family === 'none' || items.length === 0) return [];
  const adjusted = adjustTails(
    items.map((item) => item.tail),
    family,
  );
  return items.map((item, i) => {
    const a = adjusted[i]!;
    const significant = a < item.level;
    const phrase =
      `tail ${formatNumber(item.tail)}, ${family}-adjusted over ${items.length} to ${formatNumber(a)} ` +
      `${significant ? '<' : '≥'} level ${formatNumber(item.level)}`;
    return { adjusted: a, test: { significant, phrase } };
  });
}
