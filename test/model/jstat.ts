import { createRequire } from 'node:module';

/** The few jStat functions used as a second opinion (jstat ships no type declarations). */
export interface JStatSubset {
  normal: {
    pdf(x: number, mean: number, sd: number): number;
    cdf(x: number, mean: number, sd: number): number;
    inv(p: number, mean: number, sd: number): number;
  };
  studentt: { pdf(x: number, nu: number): number; cdf(x: number, nu: number): number };
  chisquare: { cdf(x: number, k: number): number };
  centralF: { cdf(x: number, d1: number, d2: number): number };
  inv(m: number[][]): number[][];
  skewness(values: number[]): number;
  ibeta(x: number, a: number, b: number): number;
  gammaln(x: number): number;
  lowRegGamma(a: number, x: number): number;
  erfc(x: number): number;
}

/** jStat, the reference statistics library from the npm registry (dev dependency). */
export const jStat = createRequire(import.meta.url)('jstat') as JStatSubset;
