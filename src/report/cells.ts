import type { BaselineSummary, MetricResult } from '../gate/report.js';
import { formatAgainstCutoff, formatChange, formatNumber, formatSigma, formatValue, NOT_AVAILABLE } from './format.js';

/** The shown columns of one judged metric, already formatted; the same in text and markdown. */
export interface MetricCells {
  value: string;
  baseline: string;
  change: string;
  sigma: string;
  density: string;
  own: string;
  detectable: string;
}

/**
 * "10.1 ± 0.4 ms (n=60)"; sd is the spread of the metric's own moves (the shared move taken out). On the log scale the fitted centre is shown as the geometric mean
 * exp(mean) and the spread as the factor exp(sd) ("×/÷ 1.03"), which is what a log-normal fit means
 * on the metric's own scale. `unit` must already be escaped for the target format.
 * @example formatBaseline({ n: 60, mean: 10.1, sd: 0.4 }, 'ms') // '10.1 ± 0.4 ms (n=60)'
 */
export function formatBaseline(b: BaselineSummary | undefined, unit?: string): string {
  if (!b) return NOT_AVAILABLE;
  const u = unit ? ` ${unit}` : '';
  const ratio = b.relativeTo !== undefined ? ' (ratio)' : '';
  if (b.scale === 'log') {
    return `${formatNumber(Math.exp(b.mean))}${u} ×/÷ ${formatNumber(Math.exp(b.sd), 4)} (n=${b.n}, log)${ratio}`;
  }
  return `${formatNumber(b.mean)} ± ${formatNumber(b.sd, 2)}${u} (n=${b.n})${ratio}`;
}

/** Format the numeric columns of a metric result; `unit` already escaped for the target. */
export function metricCells(m: MetricResult, unit?: string): MetricCells {
  return {
    value: formatValue(m.value, unit),
    baseline: formatBaseline(m.baseline, unit),
    change: formatChange(m.change),
    sigma: formatSigma(m.z),
    density: formatAgainstCutoff(m.relativeDensity, m.effectiveCutoff ?? m.cutoff),
    own: formatChange(m.own),
    detectable: m.detectable === undefined ? NOT_AVAILABLE : formatChange(m.detectable).replace(/^\+/, '≥ '),
  };
}
