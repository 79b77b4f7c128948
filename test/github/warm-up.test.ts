import { describe, expect, it } from 'vitest';
import { actionWarmUpPlan, warmUpAction } from '../../src/github/warm-up.js';

// Inputs reach the action as INPUT_<NAME> variables (GitHub's runner convention, also what
// inputVariable in src/github/inputs.ts builds); the plan must read the same variables.
const present =
  (...paths: string[]) =>
  (p: string) =>
    paths.includes(p);

describe('actionWarmUpPlan', () => {
  it('a named config that exists and JSON metric lines: both readers', () => {
    const env = { INPUT_CONFIG: 'bellgate.yml', INPUT_METRICS: 'out/a.csv\n out/b.JSON \n' };
    expect(actionWarmUpPlan(env, present('bellgate.yml'))).toEqual(['config', 'json']);
  });

  it('config input empty: the default paths decide', () => {
    expect(actionWarmUpPlan({ INPUT_METRICS: 'a.json' }, present('.github/bellgate.yaml'))).toEqual(['config', 'json']);
    expect(actionWarmUpPlan({ INPUT_CONFIG: '', INPUT_METRICS: 'a.json' }, present())).toEqual(['json']);
  });

  it('input-format other than json: no JSON reader; no metric file ending in .json: none', () => {
    expect(actionWarmUpPlan({ INPUT_METRICS: 'a.json', 'INPUT_INPUT-FORMAT': 'csv' }, present())).toEqual([]);
    expect(actionWarmUpPlan({ INPUT_METRICS: 'a.json', 'INPUT_INPUT-FORMAT': 'JSON' }, present())).toEqual(['json']);
    expect(actionWarmUpPlan({ INPUT_METRICS: 'bench/*.prom' }, present())).toEqual([]);
    expect(actionWarmUpPlan({}, present())).toEqual([]);
  });

  it('warmUpAction never throws on an empty environment', () => {
    expect(() => warmUpAction({})).not.toThrow();
  });
});
