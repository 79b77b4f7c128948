import { median } from 'simple-statistics';
import { unitScale } from '../inputs/units.js';
import type { History } from './history.js';

/** Ratios between units of one dimension that a value written in the wrong unit shows. */
const FACTORS = [1000, 1024, 1e6, 1024 ** 2, 60, 3600];
const NEAR = 0.1;
const MIN_VALUES = 5;

/**
 * Values that look written in another unit than their column's (mixed units, e.g. 0.121 recorded
 * as "ms" in a column of about 121 ms): off the column's median by about a unit ratio (1000, 1024,
 * 10^6, 2^20, 60, 3600, either way, within 10%), for columns in a unit Bellgate converts and with
 * at least 5 values. Pure; O(values).
 * @example unitMixups(history) // [{ run: '81-1', metric: 'time/parse', problem: '...' }]
 */
export function unitMixups(h: History): { run: string; problem: string }[] {
  const out: { run: string; problem: string }[] = [];
  for (const [name, column] of h.columns) {
    if (column.unit === undefined || unitScale(column.unit) === undefined) continue;
    const held = column.values.filter((v) => Number.isFinite(v) && v > 0);
    if (held.length < MIN_VALUES) continue;
    const mid = median(held);
    column.values.forEach((v, i) => {
      if (!(Number.isFinite(v) && v > 0)) return;
      const ratio = v / mid;
      const factor = FACTORS.find((f) => Math.abs(ratio / f - 1) < NEAR || Math.abs(ratio * f - 1) < NEAR);
      if (factor === undefined) return;
      const run = h.runs[i]!.id;
      out.push({
        run,
        problem: `mixed units: ${JSON.stringify(name)} is ${v} ${column.unit}, about ${ratio > 1 ? factor : `1/${factor}`} of its median ${mid} ${column.unit}, as if it was written in another unit; drop the run (bellgate drop ${run}) or re-import it in ${column.unit}`,
      });
    });
  }
  return out;
}
