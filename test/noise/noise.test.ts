import { existsSync, readdirSync } from 'node:fs';
import { afterAll, describe, expect, it } from 'vitest';
import { CORPUS_DIR, corpusScenarios, readCorpus } from './corpus.js';
import { evaluate, formatTable, type Evaluation, type TableRow } from './evaluate.js';
import { formatFigures, regimeFigures } from './figures.js';
import { bimodal, heavyTails, regimes, sharedRunner, simulatedProject, type Scenario } from './simulate.js';

// Issue 13 item 8: the gate measured on simulated noise (and the recorded corpus). The table is
// printed so `npm test` shows it. `npm test` runs the defaults (and the targets of issue 13 on
// them); BELLGATE_NOISE_SWEEP=1 adds the alternative settings (a few minutes more: a sweep, as the
// bench's, not a check). The assertions hold for any gate worth the name (the counts add up, an
// impossible cutoff never fires, an absurdly loose one fires on most clean runs) plus the targets.

const SWEEP = process.env.BELLGATE_NOISE_SWEEP === '1';
const SETTINGS: readonly (readonly [string, string])[] = [
  ['defaults', ''],
  ...(SWEEP
    ? ([
        ['change-points off', 'defaults:\n  change-points: false\n'],
        ['shared move off', 'defaults:\n  shared-move: false\n'],
        ['family none', 'family: none\n'],
      ] as const)
    : []),
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

const rows: TableRow[] = [];
const corpusRows: TableRow[] = [];

afterAll(() => {
  if (regimesRecorded.length > 0) {
    const figures = regimesRecorded.flatMap((r) =>
      (['cpu', 'wall'] as const).map((source) => regimeFigures(r, source)),
    );
    console.log(
      `\nThe recorded corpus: noise figures over the timings (history and clean runs)\n${formatFigures(figures)}\n`,
    );
    console.log(
      `\nBellgate on the recorded corpus (false alarms per 100 clean runs; share of slowdowns caught)\n${formatTable(corpusRows)}\n`,
    );
  }
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

// Issue 13 "Done when", at defaults: on the simulated project (40 timings with 2% own and 3%
// shared runner noise, 10 sizes, a lasting +15% step; 900 clean and 900 regressed runs over three
// seeds) at most 1.5 false alarms per 100 clean runs and at least 80% of +10% single-metric
// regressions caught (the limit, knowing the runner, mean and sd, is 0.9 and 89.5%); on every
// simulated noise shape at most 3 false alarms per 100 clean runs, and slowdowns of at least
// 1.25 x the reported `detectable` caught at least 80% of the time.
describe('the gate on simulated noise', () => {
  for (const [name, scenarios] of SIMULATIONS)
    for (const [setting, yaml] of SETTINGS)
      it(`${name}, ${setting}: counts add up${setting === 'defaults' ? '; issue 13 targets' : ''}`, async () => {
        const result = await evaluate(yaml, scenarios);
        rows.push({ scenario: name, setting, result });
        countsAddUp(result, scenarios);
        if (setting !== 'defaults') return;
        const d = result.detectableCheck;
        expect(d.reported).toBeGreaterThan(0);
        if (d.eligible >= 10) expect(d.share).toBeGreaterThanOrEqual(0.8);
        expect(result.falseAlarmsPer100).toBeLessThanOrEqual(3);
        if (name.includes('project')) {
          expect(result.falseAlarmsPer100).toBeLessThanOrEqual(1.5);
          expect(result.caughtShare).toBeGreaterThanOrEqual(0.8);
        }
      }, 600_000);

  // One seed each: these only need a gate that can be made blind or absurd.
  const ONE = SIMULATIONS.map(([, scenarios]) => scenarios[0]!);

  it('a cutoff of 1e-300 (family none) never alarms on a clean run and catches no slowdown of a noisy timing', async () => {
    for (const scenario of ONE) {
      const result = await evaluate('family: none\ndefaults:\n  cutoff: 1e-300\n', scenario);
      expect(result.falseAlarms).toBe(0);
      // A constant size (sd 0) moved by 10% is certainly flagged, and so may be a size with 0.2%
      // noise (50 sd); a timing with 1% noise or more is not, at 1e-300 (a 10% move is <= 10 sd).
      const noisy = {
        ...scenario,
        regressed: scenario.regressed.filter((r) => {
          const values = scenario.history.map((h) => Math.log(h.metrics.get(r.metric)!.value));
          const mean = values.reduce((a, b) => a + b) / values.length;
          const sd = Math.sqrt(values.reduce((a, v) => a + (v - mean) ** 2, 0) / (values.length - 1));
          return sd >= 0.01;
        }),
      };
      const onNoisy = await evaluate('family: none\ndefaults:\n  cutoff: 1e-300\n', noisy);
      expect(onNoisy.regressed).toBeGreaterThan(0);
      expect(onNoisy.caught).toBe(0);
    }
  }, 600_000);

  it('an absurdly loose gate (family none, cutoff 0.999, no tolerance, both sides worse) stops most clean runs', async () => {
    for (const scenario of ONE) {
      const result = await evaluate(
        'family: none\ndefaults:\n  cutoff: 0.999\n  tolerance: 0\n  worse: both\n  change-points: false\n',
        scenario,
      );
      // A run in a slow episode holds its would-be regressions as `unsettled` (asks for a re-run):
      // it stops the run too, so both count here.
      const stopped = result.falseAlarms + (result.otherOutcomes.clean.unsettled ?? 0);
      expect((100 * stopped) / result.clean).toBeGreaterThan(80);
    }
  }, 600_000);
});

// The recorded corpus (test/fixtures/noise/, README there), when it is there: each load regime by
// CPU and wall time, and two harder cases printed beside them: history from one regime and test
// runs from another (the load moved between the baseline and the pull request), and a baseline
// that mixes the regimes. At defaults, every regime and source: at most 3 false alarms per 100
// clean runs, and slowdowns of at least 1.25 x the reported `detectable` caught at least 80% of the
// time wherever 10 or more were that large.
const regimesRecorded =
  existsSync(CORPUS_DIR) && readdirSync(CORPUS_DIR).some((f) => f.endsWith('.jsonl')) ? readCorpus() : [];
const recorded = corpusScenarios(regimesRecorded);
/** Each regime by CPU time: enough for the checks that only need a gate made blind or absurd. */
const regimesByCpu = recorded.filter((s) => s.params.regime !== undefined && s.params.source === 'cpu');
describe.skipIf(recorded.length === 0)('the gate on the recorded corpus', () => {
  it('holds every load regime with 60 history, 100 clean and 60 slowed runs, as recorded', () => {
    expect(regimesRecorded.map((r) => r.name)).toEqual(expect.arrayContaining(['quiet', 'loaded']));
    for (const r of regimesRecorded) {
      const kinds = (kind: string) => r.runs.filter((x) => x.kind === kind).length;
      expect([kinds('history'), kinds('clean'), kinds('slowed')]).toEqual([60, 100, 60]);
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

  for (const scenario of recorded)
    for (const [setting, yaml] of SETTINGS) {
      const target = setting === 'defaults' && scenario.params.regime !== undefined;
      it(`${scenario.name}, ${setting}: counts add up${target ? '; <= 3 false alarms per 100 clean runs; detectable honest' : ''}`, async () => {
        const result = await evaluate(yaml, scenario);
        corpusRows.push({ scenario: scenario.name, setting, result });
        countsAddUp(result, [scenario]);
        if (!target) return;
        expect(result.falseAlarmsPer100).toBeLessThanOrEqual(3);
        if (result.detectableCheck.eligible >= 10) expect(result.detectableCheck.share).toBeGreaterThanOrEqual(0.8);
      }, 600_000);
    }

  // Per regime only a few slowdowns are at least 1.25 x `detectable` (3-6), so the honesty of the
  // figure is asserted on all regimes together (runs after the regime tests above, in file order).
  it('pooled over the regimes at defaults: slowdowns of at least 1.25 x detectable caught at least 80% of the time', () => {
    const rows = corpusRows.filter((r) => r.setting === 'defaults' && !/->|mixed/.test(r.scenario));
    expect(rows.length).toBe(2 * regimesRecorded.length);
    const eligible = rows.reduce((n, r) => n + r.result.detectableCheck.eligible, 0);
    const caught = rows.reduce((n, r) => n + r.result.detectableCheck.caught, 0);
    expect(eligible).toBeGreaterThanOrEqual(10);
    expect(caught / eligible).toBeGreaterThanOrEqual(0.8);
  });

  it('a cutoff of 1e-300 (family none) never alarms and never catches (only timings are slowed, and they all vary)', async () => {
    const result = await evaluate('family: none\ndefaults:\n  cutoff: 1e-300\n', regimesByCpu);
    expect(result.falseAlarms).toBe(0);
    expect(result.caught).toBe(0);
  }, 600_000);

  it('an absurdly loose gate (family none, cutoff 0.999, no tolerance, both sides worse) alarms on most clean runs', async () => {
    const result = await evaluate(
      'family: none\ndefaults:\n  cutoff: 0.999\n  tolerance: 0\n  worse: both\n  change-points: false\n',
      regimesByCpu,
    );
    expect(result.falseAlarmsPer100).toBeGreaterThan(80);
  }, 600_000);
});
