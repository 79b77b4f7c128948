import { describe, expect, it } from 'vitest';
import { checkLabels, parseLabels } from '../../src/gate/tune/labels.js';
import { InputError } from '../../src/errors/input-error.js';
import { historyOf } from './helpers/scenario.js';

/** The InputError a call throws (fails the test when it does not throw one). */
function inputError(f: () => unknown): InputError {
  try {
    f();
  } catch (error) {
    expect(error).toBeInstanceOf(InputError);
    return error as InputError;
  }
  return expect.fail('expected an InputError');
}

describe('labels file', () => {
  it('reads YAML and JSON, runs as strings or numbers, with positions', () => {
    const yaml = parseLabels(
      '# known regressions\nregressions:\n  - run: "12-1"\n  - run: 13\n    metric: latency/p95\n',
      'labels.yml',
    );
    expect(yaml).toEqual([
      { run: '12-1', where: 'labels.yml:3:5' },
      { run: '13', metric: 'latency/p95', where: 'labels.yml:4:5' },
    ]);
    const json = parseLabels('{"regressions": [{"run": "12-1", "metric": "a"}]}', 'labels.json');
    expect(json).toEqual([{ run: '12-1', metric: 'a', where: 'labels.json:1:18' }]);
    expect(parseLabels('regressions: []\n', 'l.yml')).toEqual([]);
  });

  it.each([
    ['regressions:\n  - run: "1"\n  - rnu: "2"\n', 'l.yml:3:5', /unknown key "rnu"/],
    ['regressions:\n  - metric: a\n', 'l.yml:2:5', /lacks `run`/],
    ['regressions:\n  - run: ""\n', 'l.yml:2:10', /non-empty run id/],
    ['regressions:\n  - run: 1.5\n', 'l.yml:2:10', /non-empty run id/],
    ['regressions:\n  - run: "1"\n    metric: [a]\n', 'l.yml:3:13', /non-empty metric name/],
    ['regressions:\n  - "1"\n', 'l.yml:2:5', /must be a mapping/],
    ['regressions: {run: 1}\n', 'l.yml:1:14', /must be a list/],
    ['regresions:\n  - run: "1"\n', 'l.yml:1:1', /unknown key "regresions"/],
    ['- run: "1"\n', 'l.yml:1:1', /must be a mapping with a `regressions:` list/],
    ['regressions:\n  - run: "1\n', 'l.yml:', /not valid YAML or JSON/],
    ['', 'l.yml:1:1', /must be a mapping/],
    ['{"regressions": [{"run": "1",}]', 'l.yml:1', /not valid YAML or JSON/],
  ])('%j is refused at %s', (text, where, message) => {
    const error = inputError(() => parseLabels(text, 'l.yml'));
    expect(error.where?.startsWith(where)).toBe(true);
    expect(error.message).toMatch(message);
    expect(error.fix).toBeTruthy();
  });

  it('labels must name runs and metrics of the history', () => {
    const history = historyOf({ 'latency/p95': [1, 2, 3] });
    const labels = parseLabels('regressions:\n  - run: run-2\n  - run: run-9\n', 'l.yml');
    const error = inputError(() => checkLabels(labels, history));
    expect(error.where).toBe('l.yml:3:5');
    expect(error.message).toMatch(/no run "run-9"/);
    const metric = parseLabels('regressions:\n  - run: run-2\n    metric: latency/p99\n', 'l.yml');
    expect(inputError(() => checkLabels(metric, history)).message).toMatch(/no metric "latency\/p99"/);
  });
});
