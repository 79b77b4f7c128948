import { afterAll, describe, expect, it } from 'vitest';
import { corpusScenarios, readCorpus } from './corpus.js';
import { evaluate, formatTable, type Evaluation, type TableRow } from './evaluate.js';
import { formatFigures, regimeFigures } from './figures.js';
import { bimodal, heavyTails, regimes, sharedRunner, simulatedProject, type Scenario } from './simulate.js';

// Issue 13 item 8: the gate measured on simulated noise (and the recorded corpus), at today's
// defaults and a few settings. The table is printed so `npm test` shows it. The assertions here
// hold for any gate worth the name (the counts add up, an impossible cutoff never fires, an
// absurdly loose one fires on most clean runs); the targets of issue 13 are asserted where the
// model meets them.

const SETTINGS: readonly (readonly [string, string])[] = [
  ['defaults', ''],
  ['change-points off', 'defaults:\n  change-points: false\n'],
  ['transform log', 'defaults:\n  transform: log\n'],
  ['family holm', 'family: holm\n'],
];

/** Three seeds of each generator, pooled: one history per seed, so one lucky fit does not decide. */
const SEEDS = [11, 12, 13];
const SIMULATIONS: readonly (readonly [string, readonly Scenario[]])[] = [
  ['sim: heavy tails', SEEDS.map((seed) => heavyTails({ seed }))],
  ['sim: bimodal slow runs', SEEDS.map((seed) => bimodal({ seed }))],
  ['sim: regime switches', SEEDS.map((seed) => regimes({ seed }))],
  ['sim: shared runner factor', SEEDS.map((seed) => sharedRunner({ seed }))],
  ['sim: project (issue 13)', SEEDS.map((seed) => simulatedProject({ seed }))],
];

/** The recorded corpus (test/fixtures/noise/README.md): each regime, cross-regime and mixed, by CPU and wall time. */
const REGIMES = readCorpus();
const CORPUS = corpusScenarios(REGIMES);

const rows: TableRow[] = [];
const corpusRows: TableRow[] = [];

afterAll(() => {
  const figures = REGIMES.flatMap((r) => (['cpu', 'wall'] as const).map((source) => regimeFigures(r, source)));
  console.log(
    `\nThe recorded corpus: noise figures over the timings (history and clean runs)\n${formatFigures(figures)}\n`,
  );
  console.log(
    `\nBellgate on the recorded corpus (false alarms per 100 clean runs; share of slowdowns caught)\n${formatTable(corpusRows)}\n`,
  );
  console.log(
    `\nBellgate on simulated noise (false alarms per 100 clean runs; share of slowdowns caught)\n${formatTable(rows)}\n`,
  );
});

function countsAddUp(result: Evaluation, scenarios: readonly Scenario[]): void {
  expect(result.clean).toBe(scenarios.reduce((n, s) => n + s.clean.length, 0));
  expect(result.regressed).toBe(scenarios.reduce((n, s) => n + s.regressed.length, 0));
  const byFactor = Object.values(result.caughtByFactor);
  expect(byFactor.reduce((n, f) => n + f.n, 0)).toBe(result.regressed);
  expect(byFactor.reduce((n, f) => n + f.caught, 0)).toBe(result.caught);
  expect(result.caught + result.wrongMetric).toBeLessThanOrEqual(result.regressed);
  expect(result.falseAlarms).toBeLessThanOrEqual(result.clean);
  expect(result.detectableCheck.caught).toBeLessThanOrEqual(result.detectableCheck.eligible);
}

describe('the gate on the recorded corpus', () => {
  it('holds every load regime with history, clean and slowed runs', () => {
    expect(REGIMES.map((r) => r.name)).toEqual(expect.arrayContaining(['quiet', 'loaded']));
    for (const r of REGIMES) {
      const kinds = (kind: string) => r.runs.filter((x) => x.kind === kind).length;
      expect(kinds('history')).toBeGreaterThanOrEqual(60);
      expect(kinds('clean')).toBeGreaterThanOrEqual(100);
      expect(kinds('slowed')).toBeGreaterThanOrEqual(60);
      // the workload's byte counts come from seeded data: one value each in every run; the
      // memory peak is the one size that varies
      r.header.sizes.forEach((size, j) => {
        const distinct = new Set(r.runs.map((x) => x.sizes[j])).size;
        if (size.unit === 'B') expect(distinct, size.name).toBe(1);
        else expect(distinct, size.name).toBeGreaterThan(1);
      });
      // a slowed run names a timing of the header, with one of the planned factors
      for (const x of r.runs.filter((x) => x.kind === 'slowed')) {
        expect(r.header.timings).toContain(x.metric);
        expect(r.header.plan.factors).toContain(x.factor);
      }
    }
  });

  for (const scenario of CORPUS)
    for (const [setting, yaml] of SETTINGS)
      it(`${scenario.name}, ${setting}: counts add up`, async () => {
        const result = await evaluate(yaml, scenario);
        corpusRows.push({ scenario: scenario.name, setting, result });
        countsAddUp(result, [scenario]);
      });

  it('a cutoff of 1e-300 never alarms and never catches (only timings are slowed, and they all vary)', async () => {
    const result = await evaluate('defaults:\n  cutoff: 1e-300\n', CORPUS);
    expect(result.falseAlarms).toBe(0);
    expect(result.caught).toBe(0);
  });

  it('an absurdly loose gate (cutoff 0.999, no tolerance, both sides worse) alarms on most clean runs', async () => {
    const result = await evaluate(
      'defaults:\n  cutoff: 0.999\n  tolerance: 0\n  worse: both\n  change-points: false\n',
      CORPUS,
    );
    expect(result.falseAlarmsPer100).toBeGreaterThan(80);
  });
});

describe('the gate on simulated noise', () => {
  for (const [name, scenarios] of SIMULATIONS)
    for (const [setting, yaml] of SETTINGS)
      it(`${name}, ${setting}: counts add up`, async () => {
        const result = await evaluate(yaml, scenarios);
        rows.push({ scenario: name, setting, result });
        countsAddUp(result, scenarios);
      });

  it('a cutoff of 1e-300 never alarms on a clean run and catches no slowdown of a metric that varies', async () => {
    // both sides: in a bimodal history a normal run sits below the mean on every timing (the slow
    // runs pull the mean up), so a loose gate on the higher side alone fires only on slow runs
    for (const [, scenarios] of SIMULATIONS) {
      const result = await evaluate('defaults:\n  cutoff: 1e-300\n', scenarios);
      expect(result.falseAlarms).toBe(0);
      // a constant size (sd 0) moved by 10% is certainly flagged; anything noisy is not, at 1e-300
      const varying = scenarios.map((s) => ({
        ...s,
        regressed: s.regressed.filter((r) => new Set(s.history.map((h) => h.metrics.get(r.metric)!.value)).size > 1),
      }));
      const onVarying = await evaluate('defaults:\n  cutoff: 1e-300\n', varying);
      expect(onVarying.regressed).toBeGreaterThan(0);
      expect(onVarying.caught).toBe(0);
    }
  });

  it('an absurdly loose gate (cutoff 0.999, no tolerance, both sides worse) alarms on most clean runs', async () => {
    // both sides: in a bimodal history a normal run sits below the mean on every timing (the slow
    // runs pull the mean up), so a loose gate on the higher side alone fires only on slow runs
    for (const [, scenarios] of SIMULATIONS) {
      const result = await evaluate(
        'defaults:\n  cutoff: 0.999\n  tolerance: 0\n  worse: both\n  change-points: false\n',
        scenarios,
      );
      expect(result.falseAlarmsPer100).toBeGreaterThan(80);
    }
  });
});
