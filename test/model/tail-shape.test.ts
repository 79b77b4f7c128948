import { describe, expect, it } from 'vitest';
import { halfTailProfile, halfTailShape, pooledTailShape } from '../../src/model/tail-shape.js';
import { studentLogDensity } from '../../src/model/tails.js';
import { seededNormal, seededUniform } from './random.js';

/** Student-t draws as normal / sqrt(chi-square / nu) (the definition; Student 1908). */
function studentDraws(nu: number, n: number, seed: number): number[] {
  const normal = seededNormal(seed);
  return Array.from({ length: n }, () => {
    let chi = 0;
    for (let i = 0; i < nu; i++) chi += normal() ** 2;
    return normal() / Math.sqrt(chi / nu);
  });
}

describe('halfTailShape: the maximum-likelihood half Student-t of one side (Lange, Little & Taylor 1989)', () => {
  it('finds heavy tails in t(3) draws and a light tail in Gaussian ones, with the scale they were drawn at', () => {
    const heavy = halfTailShape(studentDraws(3, 8000, 5).map((x) => 2 * x))!;
    expect(heavy.nu).toBeGreaterThanOrEqual(2);
    expect(heavy.nu).toBeLessThanOrEqual(4);
    expect(heavy.scale).toBeGreaterThan(1.8);
    expect(heavy.scale).toBeLessThan(2.2);
    const normal = seededNormal(9);
    const light = halfTailShape(Array.from({ length: 8000 }, () => normal()))!;
    expect(light.nu).toBeGreaterThanOrEqual(30);
    expect(light.scale).toBeGreaterThan(0.95);
    expect(light.scale).toBeLessThan(1.05);
  });

  it('its scale is a stationary point of the half-t likelihood (the derivative in the scale is 0)', () => {
    const uniform = seededUniform(3);
    const d = Array.from({ length: 300 }, () => -Math.log(uniform()));
    const fit = halfTailShape(d)!;
    const lik = (s: number): number => d.reduce((sum, x) => sum + studentLogDensity(x / s, fit.nu) - Math.log(s), 0);
    const h = 1e-5 * fit.scale;
    expect(Math.abs(lik(fit.scale + h) - lik(fit.scale - h)) / (2 * h)).toBeLessThan(1e-3);
  });

  it('needs 3 deviations on its side', () => {
    expect(halfTailShape([1, 2, -3, 0])).toBeUndefined();
  });
});

describe('pooledTailShape: one metric tail partially pooled with its class (a power prior, Ibrahim & Chen 2000)', () => {
  // Reference: the distributions the draws come from (t(1), Cauchy, for the metric; the Gaussian
  // for the class, Student 1908 and the definition of the normal).
  const normal = seededNormal(41);
  const classSide = Array.from({ length: 4000 }, () => normal());
  const own = studentDraws(1, 60, 42);

  it('a heavy-tailed metric keeps a heavy tail beside a Gaussian class; a weight of 1000 gives the class its say', () => {
    const pooled = halfTailProfile(classSide)!;
    expect(pooledTailShape(own, pooled, 0)!.nu).toBeLessThanOrEqual(2);
    expect(pooledTailShape(own, pooled, 3)!.nu).toBeLessThanOrEqual(3);
    expect(pooledTailShape(own, pooled, 1000)!.nu).toBeGreaterThanOrEqual(30);
  });

  it('takes the class scale at the chosen degrees of freedom (the deviations are already in moderated sd)', () => {
    const pooled = halfTailProfile(classSide)!;
    const fit = pooledTailShape(own, pooled, 1000)!;
    expect(fit.scale).toBe(pooled.find((f) => f.nu === fit.nu)!.scale);
    // the Gaussian class's scale is about 1 (its sd)
    expect(fit.scale).toBeGreaterThan(0.95);
    expect(fit.scale).toBeLessThan(1.05);
  });
});
