/**
 * The tune bench (`node test/bench/run.mjs --only tune`): what `bellgate tune`'s written config
 * does on fresh runs, judged by the noise evaluator (test/noise/evaluate.ts), beside the defaults:
 * - the simulated project of issue 13 (test/noise/simulate.ts: 40 log-normal timings, 2% own and
 *   3% shared noise, 10 sizes, one +15% step, 60 history runs), three seeds of 300 clean and 300
 *   +10% regressed runs each; targets: at most 1 false alarm per 100 clean runs and at least 85%
 *   caught with tune's written config;
 * - every load regime of the recorded corpus (test/fixtures/noise, wall clock and CPU time), tune
 *   run on the regime's 60 history runs; target: at most 3 false alarms per 100 clean runs.
 * Tune runs as a user would: `tuneHistory` on the history with the default target, its
 * recommendation written into an empty config by the config writer and read back by the loader.
 */
import { afterAll, expect, it } from 'vitest';
import { defaultConfig } from '../../src/config/defaults.js';
import { parseConfig } from '../../src/config/load.js';
import { applyConfigEdit } from '../../src/config/write-config.js';
import { describeSetting, type TuneSetting } from '../../src/gate/tune/setting.js';
import { tuneHistory } from '../../src/gate/tune/tune.js';
import { corpusScenarios, readCorpus } from '../noise/corpus.js';
import { evaluate, formatTable, toHistory, type Evaluation, type TableRow } from '../noise/evaluate.js';
import { simulatedProject, type Scenario } from '../noise/simulate.js';

const SEEDS = [1305, 11, 12];

const rows: TableRow[] = [];
const verdicts: string[] = [];

afterAll(() => {
  console.log(`\n${formatTable(rows)}\n\n${verdicts.join('\n')}\n`);
});

/** The config tune writes for a scenario's history, and the setting it recommended. */
function writtenConfig(scenario: Scenario): { yaml: string; setting: TuneSetting; blind: boolean } {
  const result = tuneHistory({ config: defaultConfig(), history: toHistory(scenario.history, defaultConfig()) });
  const r = result.recommendation!;
  const s = r.setting;
  const yaml = applyConfigEdit('', 'bellgate.yml', {
    defaults: {
      transform: s.transform,
      sharedMove: s.sharedMove,
      changePoints: s.changePoints,
      ...(s.cutoff === undefined ? {} : { cutoff: s.cutoff }),
    },
    family: s.family,
    ...(s.budget === undefined ? {} : { budget: s.budget }),
  });
  return { yaml, setting: s, blind: r.blind };
}

function pooled(list: readonly Evaluation[]): { clean: number; alarms: number; regressed: number; caught: number } {
  return {
    clean: list.reduce((a, e) => a + e.clean, 0),
    alarms: list.reduce((a, e) => a + e.falseAlarms, 0),
    regressed: list.reduce((a, e) => a + e.regressed, 0),
    caught: list.reduce((a, e) => a + e.caught, 0),
  };
}

it("simulated project: tune's written config <= 1 false alarm per 100 clean runs, >= 85% of +10% caught", async () => {
  const tuned: Evaluation[] = [];
  const defaults: Evaluation[] = [];
  for (const seed of SEEDS) {
    const scenario = simulatedProject({ seed });
    const { yaml, setting } = writtenConfig(scenario);
    const t = await evaluate(parseConfig(yaml, 'bellgate.yml'), scenario);
    const d = await evaluate('', scenario);
    tuned.push(t);
    defaults.push(d);
    rows.push({ scenario: `project seed ${seed}`, setting: `tune: ${describeSetting(setting)}`, result: t });
    rows.push({ scenario: `project seed ${seed}`, setting: 'defaults', result: d });
  }
  const p = pooled(tuned);
  const fa = (100 * p.alarms) / p.clean;
  const caught = p.caught / p.regressed;
  verdicts.push(
    `simulated project, tune's written config, ${p.clean} clean + ${p.regressed} regressed runs (${SEEDS.length} seeds): ` +
      `${fa.toFixed(2)} false alarms per 100 (target <= 1: ${fa <= 1 ? 'met' : 'NOT met'}), ` +
      `${(100 * caught).toFixed(1)}% of +10% caught (target >= 85: ${caught >= 0.85 ? 'met' : 'NOT met'})`,
  );
  const q = pooled(defaults);
  verdicts.push(
    `simulated project, defaults: ${((100 * q.alarms) / q.clean).toFixed(2)} false alarms per 100, ${((100 * q.caught) / q.regressed).toFixed(1)}% caught`,
  );
  expect(fa).toBeLessThanOrEqual(1);
  expect(caught).toBeGreaterThanOrEqual(0.85);
}, 3_600_000);

it("recorded corpus: tune's written config <= 3 false alarms per 100 clean runs in every regime", async () => {
  const scenarios = corpusScenarios(readCorpus()).filter((s) => s.params.regime !== undefined);
  const worst: number[] = [];
  for (const scenario of scenarios) {
    const { yaml, setting, blind } = writtenConfig(scenario);
    const t = await evaluate(parseConfig(yaml, 'bellgate.yml'), scenario);
    rows.push({
      scenario: scenario.name,
      setting: `tune${blind ? ' (BLIND)' : ''}: ${describeSetting(setting)}`,
      result: t,
    });
    worst.push(t.falseAlarmsPer100);
  }
  const max = Math.max(...worst);
  verdicts.push(
    `corpus, tune's written config: at most ${max.toFixed(1)} false alarms per 100 clean runs in any of ${scenarios.length} regime scenarios (target <= 3: ${max <= 3 ? 'met' : 'NOT met'})`,
  );
  expect(max).toBeLessThanOrEqual(3);
}, 3_600_000);
