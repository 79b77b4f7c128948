import { cutoffSigma, normalTail } from '../../../src/model/index.js';

/**
 * The README's cutoff table, row by row, computed with the model's own functions: sigmas
 * sqrt(-2 ln c), and the standard normal's one- and two-sided tail beyond them.
 */
export function cutoffRows(): string[] {
  const p = (x: number): string => (x >= 0.001 ? x.toPrecision(3) : x.toExponential(2));
  return ['0.1', '0.05', '0.01', '0.001', '1e-4', '1e-6'].map((c) => {
    const k = cutoffSigma(Number(c));
    return `| ${c} | ${k.toFixed(3)} | ${p(normalTail(k, 'upper'))} | ${p(normalTail(k, 'both'))} |`;
  });
}
