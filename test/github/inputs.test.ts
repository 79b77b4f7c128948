// The action's inputs: names mirror action.yml, the runner's variable naming is @actions/core's,
// and every bad value fails with a message naming the input.
import { readFileSync } from 'node:fs';
import { afterEach, describe, expect, it } from 'vitest';
import { parse } from 'yaml';
import * as core from '@actions/core';
import { INPUT, OUTPUT, readActionInputs } from '../../src/github/inputs.js';
import { runnerInputs } from './action-harness.js';
import { InputError } from '../../src/errors/input-error.js';

const actionYml = parse(readFileSync(new URL('../../action.yml', import.meta.url), 'utf8')) as {
  inputs: Record<string, { default?: string; description: string }>;
  outputs: Record<string, { description: string }>;
  runs: { using: string; main: string };
};

describe('action.yml and the input constants', () => {
  it('declare the same inputs and outputs, each described', () => {
    expect(Object.keys(actionYml.inputs).sort()).toEqual(Object.values(INPUT).sort());
    expect(Object.keys(actionYml.outputs).sort()).toEqual(Object.values(OUTPUT).sort());
    for (const i of Object.values(actionYml.inputs)) expect(i.description.length).toBeGreaterThan(20);
    expect(actionYml.runs).toEqual({ using: 'node24', main: 'dist/index.js' });
  });

  it('reads action.yml defaults the way the action does when the runner passes them', () => {
    const env: Record<string, string> = { INPUT_METRICS: 'out/*.json' };
    for (const [name, spec] of Object.entries(actionYml.inputs)) {
      if (spec.default !== undefined && !spec.default.includes('${{'))
        env[`INPUT_${name.toUpperCase()}`] = spec.default;
    }
    const got = readActionInputs(runnerInputs(env));
    expect(got).toMatchObject({
      store: 'artifact',
      history: 'bellgate-history',
      record: 'auto',
      block: true,
      comment: 'auto',
      acceptLabel: 'bellgate:accept',
      retentionDays: 90,
      historyFailure: 'warn',
      missingMetrics: 'warn',
      htmlReport: false,
    });
    expect(got.config).toBeUndefined();
  });
});

describe("the tests' runner inputs", () => {
  const saved = { ...process.env };
  afterEach(() => {
    process.env = { ...saved };
  });
  it('read the variables exactly as @actions/core getInput, which the action uses, does', () => {
    // Reference: @actions/core's own getInput, the runner's contract for INPUT_* names.
    const env: Record<string, string> = {};
    for (const name of ['retention-days', 'accept-label', 'metrics', 'history failure']) {
      const variable = `INPUT_${name.replace(/ /g, '_').toUpperCase()}`;
      process.env[variable] = `  value of ${name} `;
      env[variable] = `  value of ${name} `;
      expect(runnerInputs(env)(name)).toBe(core.getInput(name));
    }
    expect(core.getInput('retention-days')).toBe('value of retention-days');
  });
});

describe('readActionInputs', () => {
  const base = { INPUT_METRICS: 'bench/a.json\n  # a comment\n\nbench/b.json  ' };
  const fails = (env: Record<string, string>, input: string, pattern: RegExp) => {
    try {
      readActionInputs(runnerInputs({ ...base, ...env }));
      expect.fail('expected an InputError');
    } catch (e) {
      expect(e).toBeInstanceOf(InputError);
      expect((e as InputError).where).toBe(`input ${input}`);
      expect((e as InputError).describe()).toMatch(pattern);
    }
  };

  it('splits metrics one a line, skipping blanks and # comments', () => {
    expect(readActionInputs(runnerInputs(base)).metrics).toEqual(['bench/a.json', 'bench/b.json']);
  });
  it('refuses an empty metrics list', () => fails({ INPUT_METRICS: ' \n ' }, 'metrics', /empty/));
  it('refuses unknown choices, naming the allowed ones', () => {
    fails({ INPUT_STORE: 's3' }, 'store', /artifact, branch, file/);
    fails({ INPUT_RECORD: 'sometimes' }, 'record', /auto, always, never/);
    fails({ INPUT_COMMENT: 'yes' }, 'comment', /auto, always, never/);
    fails({ 'INPUT_HISTORY-FAILURE': 'ignore' }, 'history-failure', /warn, fail/);
  });
  it('accepts only YAML booleans for block (as getBooleanInput does)', () => {
    expect(readActionInputs(runnerInputs({ ...base, INPUT_BLOCK: 'False' })).block).toBe(false);
    fails({ INPUT_BLOCK: 'no' }, 'block', /true or false/);
  });
  it('refuses a retention that is not a whole number of days', () => {
    fails({ 'INPUT_RETENTION-DAYS': '0' }, 'retention-days', /1 to 400/);
    fails({ 'INPUT_RETENTION-DAYS': '7.5' }, 'retention-days', /whole number/);
    expect(readActionInputs(runnerInputs({ ...base, 'INPUT_RETENTION-DAYS': '14' })).retentionDays).toBe(14);
  });
  it('refuses artifact names the artifact service would refuse', () => {
    fails({ INPUT_HISTORY: 'a/b' }, 'history', /artifact name/);
    expect(readActionInputs(runnerInputs({ ...base, INPUT_HISTORY: 'a/b.json', INPUT_STORE: 'file' })).history).toBe(
      'a/b.json',
    );
  });
  it('treats an explicit non-default config path as explicit and strips refs/heads/ from the branch', () => {
    const got = readActionInputs(
      runnerInputs({ ...base, INPUT_CONFIG: 'ci/gate.yml', 'INPUT_BASELINE-BRANCH': 'refs/heads/trunk' }),
    );
    expect(got.config).toBe('ci/gate.yml');
    expect(got.baselineBranch).toBe('trunk');
  });
});
