import { readFileSync } from 'node:fs';

/** The SciPy reference values of scipy-values.json (see scipy-values.py for how each was made). */
export interface ScipyValues {
  scipy: string;
  kendall: { values: number[]; tau: number; p: number; method: 'exact' | 'asymptotic' }[];
  theil: { values: number[]; slope: number; low: number; high: number }[];
  ranksum: { a: number[]; b: number[]; u: number; p: number }[];
  shift: { a: number[]; b: number[]; shift: number }[];
  quantile: { p: number; z: number }[];
}

export const scipy = JSON.parse(readFileSync(new URL('./scipy-values.json', import.meta.url), 'utf8')) as ScipyValues;
