import { readFileSync } from 'node:fs';
import { describe, expect, it } from 'vitest';
import { expectClose } from '../../helpers/close.js';
import { betaPointAt, regularizedBeta } from '../../../src/model/special/incomplete-beta.js';
import { normalLogCdf, normalUpperTail } from '../../../src/model/special/normal.js';
import { studentUpperTail } from '../../../src/model/special/student-t.js';

/**
 * 50-digit reference values from mpmath 1.3.0, written by mpmath-values.py beside this file (its
 * header says how each family is evaluated). Every entry ends with the condition number of the
 * value in its argument: the input is a double, known to half an ulp, so the allowance is
 * 1e-12 plus a few ulp times that condition number (it matters only for F and beta with both
 * parameters near 1e6, where one ulp of the argument moves a far tail by ~1e-12).
 */
const values = JSON.parse(readFileSync(new URL('./mpmath-values.json', import.meta.url), 'utf8')) as Record<
  string,
  number[][]
>;

const allowance = (condition: number) => 1e-12 + 4 * Number.EPSILON * condition;

describe('special functions against 50-digit mpmath values (wide ranges, far tails)', () => {
  it('normalUpperTail: z in [-38, 38]', () => {
    for (const [z, q, c] of values.normalUpper!) expectClose(normalUpperTail(z!), q!, allowance(c!));
  });

  it('normalLogCdf: z in [-1e4, 38]', () => {
    for (const [z, v, c] of values.normalLogCdf!) expectClose(normalLogCdf(z!), v!, allowance(c!));
  });

  it('studentUpperTail: |t| in [1e-6, 1e6], nu in [1, 1e6] (whole and fractional)', () => {
    for (const [t, nu, p, c] of values.studentUpper!) expectClose(studentUpperTail(t!, nu!), p!, allowance(c!));
  });

  it('regularizedBeta: a, b in [1/2, 1e6], both sides', () => {
    for (const [x, a, b, lower, upper, c] of values.beta!) {
      expectClose(regularizedBeta(a!, b!, betaPointAt(x!), false), lower!, allowance(c!));
      expectClose(regularizedBeta(a!, b!, betaPointAt(x!), true), upper!, allowance(c!));
    }
  });

  it('covers what it claims (far tails and huge parameters are in the file)', () => {
    expect(Math.min(...values.normalUpper!.map((e) => e[1]!))).toBeLessThan(1e-250);
    expect(Math.min(...values.studentUpper!.map((e) => e[2]!))).toBeLessThan(1e-100);
    expect(Math.max(...values.studentUpper!.map((e) => e[1]!))).toBeGreaterThan(5e5);
  });
});
