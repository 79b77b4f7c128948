/**
 * The evaluation harness of issue 13: judges a scenario's clean and slowed test runs against its
 * history with the real gate, and counts false alarms per 100 clean runs, the share of slowdowns
 * caught (overall, per slowdown factor, and among those the report says it can see: the
 * `detectable` check), and everything else the gate answered. It reads the report tolerantly:
 * verdicts and statuses it does not know are counted under otherOutcomes, never dropped.
 */
import { parseConfig } from '../../src/config/load.js';
import type { Config } from '../../src/config/types.js';
import { settingsFor } from '../../src/config/rules.js';
import { runGate } from '../../src/gate/gate.js';
import { collectRun } from '../../src/inputs/collect.js';
import type { History, MetricColumn, RunInfo } from '../../src/history/history.js';
import type { Run } from '../../src/inputs/run.js';
import type { RunSpec, Scenario } from './simulate.js';

/** The part of a report the harness reads; anything else the gate adds is ignored. */
export interface GateAnswer {
  verdict: string;
  metrics: readonly { name: string; status: string; detectable?: number }[];
}

export type Judge = (history: History, run: Run) => Promise<GateAnswer>;

/**
 * The gate's entry, in one place (the model helper changes it here when the entry changes).
 * @example const judge = await gateJudge(config, 'main'); (await judge(history, run)).verdict
 */
export async function gateJudge(config: Config, series: string): Promise<Judge> {
  return async (history, run) => runGate({ config, history, run, series });
}

/** A config from YAML text through the project's loader, or a Config as is. */
export function configOf(config: string | Config): Config {
  return typeof config === 'string' ? parseConfig(config, 'bellgate.yml') : config;
}

/** The in-memory History of a scenario's history runs (oldest first), one column per metric seen. */
export function toHistory(runs: readonly RunSpec[], config: Config, series = 'main'): History {
  const columns = new Map<string, MetricColumn>();
  runs.forEach((spec, k) => {
    for (const [name, m] of toRun(spec, config).metrics) {
      let column = columns.get(name);
      if (column === undefined) {
        column = { ...(m.unit === undefined ? {} : { unit: m.unit }), values: Array<number>(runs.length).fill(NaN) };
        columns.set(name, column);
      }
      column.values[k] = m.value;
    }
  });
  const infos: RunInfo[] = runs.map((r) => ({ id: r.id, time: r.time }));
  // Built as a variable, not a literal, so fields the History gains later (dropped) can be added
  // here without the harness failing to compile in between.
  const history = { series, runs: infos, columns, dropped: new Map<string, { id: string }>() };
  return history;
}

/**
 * A scenario run as the gate's Run, built as the CLI and the action build it: every sample a
 * reading, folded by collectRun with the aggregate the config gives each metric (value, count and
 * the inside-run spread); a metric without samples is one reading.
 */
export function toRun(spec: RunSpec, config: Config): Run {
  const readings = [...spec.metrics].flatMap(([name, m]) =>
    (m.samples !== undefined && m.samples.length > 0 ? m.samples : [m.value]).map((value) => ({
      name,
      value,
      ...(m.unit === undefined ? {} : { unit: m.unit }),
    })),
  );
  return collectRun(
    [{ readings, notFitted: new Map(), meta: new Map() }],
    (name) => settingsFor(config, name).aggregate,
  );
}

export interface FactorCount {
  n: number;
  caught: number;
  share: number;
}

export interface Evaluation {
  scenario: string;
  clean: number;
  falseAlarms: number;
  falseAlarmsPer100: number;
  regressed: number;
  caught: number;
  caughtShare: number;
  /** Slowed runs with verdict regressed on other metrics only (the slowed one not flagged). */
  wrongMetric: number;
  /** Slowed runs where the slowed metric was caught and other metrics were flagged too. */
  alsoOthers: number;
  /** Keyed by the relative slowdown, rounded: "0.05", "0.1", "0.2". */
  caughtByFactor: Record<string, FactorCount>;
  /** Slowed runs whose slowdown is at least 1.25 x the slowed metric's `detectable`. */
  detectableCheck: { eligible: number; caught: number; share: number; reported: number };
  /** Verdicts other than pass/regressed, statuses of the slowed metric other than ok/regressed. */
  otherOutcomes: {
    clean: Record<string, number>;
    regressed: Record<string, number>;
    slowedStatus: Record<string, number>;
  };
  /** Which metrics fired on clean runs, and how often. */
  alarmsByMetric: Record<string, number>;
}

function bump(record: Record<string, number>, key: string): void {
  record[key] = (record[key] ?? 0) + 1;
}

/**
 * Judges every clean and slowed test run of the scenario(s) against the scenario's history.
 * Several scenarios (e.g. seeds of one generator) are pooled: each run is judged against its own
 * scenario's history and the counts are summed.
 */
export async function evaluate(
  config: string | Config,
  scenarios: Scenario | readonly Scenario[],
  series = 'main',
): Promise<Evaluation> {
  const list = Array.isArray(scenarios) ? (scenarios as readonly Scenario[]) : [scenarios as Scenario];
  const resolved = configOf(config);
  const judge = await gateJudge(resolved, series);
  const out: Evaluation = {
    scenario: [...new Set(list.map((s) => s.name))].join(' + '),
    clean: 0,
    falseAlarms: 0,
    falseAlarmsPer100: NaN,
    regressed: 0,
    caught: 0,
    caughtShare: NaN,
    wrongMetric: 0,
    alsoOthers: 0,
    caughtByFactor: {},
    detectableCheck: { eligible: 0, caught: 0, share: NaN, reported: 0 },
    otherOutcomes: { clean: {}, regressed: {}, slowedStatus: {} },
    alarmsByMetric: {},
  };
  for (const scenario of list) {
    const history = toHistory(scenario.history, resolved, series);
    for (const run of scenario.clean) {
      const answer = await judge(history, toRun(run, resolved));
      out.clean++;
      if (answer.verdict === 'regressed') {
        out.falseAlarms++;
        for (const m of answer.metrics) if (m.status === 'regressed') bump(out.alarmsByMetric, m.name);
      } else if (answer.verdict !== 'pass') bump(out.otherOutcomes.clean, answer.verdict);
    }
    for (const { run, metric, factor } of scenario.regressed) {
      const answer = await judge(history, toRun(run, resolved));
      out.regressed++;
      const slowedResult = answer.metrics.find((m) => m.name === metric);
      const caught = slowedResult?.status === 'regressed';
      const others = answer.metrics.some((m) => m.name !== metric && m.status === 'regressed');
      if (caught) out.caught++;
      if (caught && others) out.alsoOthers++;
      if (!caught && answer.verdict === 'regressed') out.wrongMetric++;
      if (answer.verdict !== 'pass' && answer.verdict !== 'regressed')
        bump(out.otherOutcomes.regressed, answer.verdict);
      const status = slowedResult?.status ?? 'absent';
      if (status !== 'ok' && status !== 'regressed') bump(out.otherOutcomes.slowedStatus, status);
      const key = String(Math.round((factor - 1) * 1000) / 1000);
      const byFactor = (out.caughtByFactor[key] ??= { n: 0, caught: 0, share: NaN });
      byFactor.n++;
      if (caught) byFactor.caught++;
      const detectable = slowedResult?.detectable;
      if (typeof detectable === 'number' && Number.isFinite(detectable) && detectable > 0) {
        out.detectableCheck.reported++;
        if (factor - 1 >= 1.25 * detectable) {
          out.detectableCheck.eligible++;
          if (caught) out.detectableCheck.caught++;
        }
      }
    }
  }
  out.falseAlarmsPer100 = out.clean === 0 ? NaN : (100 * out.falseAlarms) / out.clean;
  out.caughtShare = out.regressed === 0 ? NaN : out.caught / out.regressed;
  for (const f of Object.values(out.caughtByFactor)) f.share = f.caught / f.n;
  const d = out.detectableCheck;
  d.share = d.eligible === 0 ? NaN : d.caught / d.eligible;
  return out;
}

export interface TableRow {
  scenario: string;
  setting: string;
  result: Evaluation;
}

function percent(share: number): string {
  return Number.isFinite(share) ? `${(100 * share).toFixed(1)}` : '-';
}

function others(result: Evaluation): string {
  const parts: string[] = [];
  const { clean, regressed, slowedStatus } = result.otherOutcomes;
  for (const [k, n] of Object.entries(clean)) parts.push(`clean ${k} ${n}`);
  for (const [k, n] of Object.entries(regressed)) parts.push(`slowed ${k} ${n}`);
  for (const [k, n] of Object.entries(slowedStatus)) parts.push(`status ${k} ${n}`);
  if (result.wrongMetric > 0) parts.push(`wrong metric ${result.wrongMetric}`);
  return parts.join(', ');
}

/** A plain text table: one line per row, columns padded, for the test log. */
export function formatTable(rows: readonly TableRow[]): string {
  const factors = [...new Set(rows.flatMap((r) => Object.keys(r.result.caughtByFactor)))].sort(
    (a, b) => Number(a) - Number(b),
  );
  const header = [
    'scenario',
    'setting',
    'clean',
    'false alarms/100',
    'slowed',
    'caught %',
    ...factors.map((f) => `+${Math.round(Number(f) * 100)}% %`),
    'detectable check',
    'other outcomes',
  ];
  const body = rows.map((r) => [
    r.scenario,
    r.setting,
    String(r.result.clean),
    Number.isFinite(r.result.falseAlarmsPer100) ? r.result.falseAlarmsPer100.toFixed(1) : '-',
    String(r.result.regressed),
    percent(r.result.caughtShare),
    ...factors.map((f) => percent(r.result.caughtByFactor[f]?.share ?? NaN)),
    r.result.detectableCheck.reported === 0
      ? 'not reported'
      : `${r.result.detectableCheck.caught}/${r.result.detectableCheck.eligible} (${percent(r.result.detectableCheck.share)}%)`,
    others(r.result),
  ]);
  const widths = header.map((h, i) => Math.max(h.length, ...body.map((line) => line[i]!.length)));
  const line = (cells: string[]) =>
    cells
      .map((c, i) => (i < 2 || i === cells.length - 1 ? c.padEnd(widths[i]!) : c.padStart(widths[i]!)))
      .join('  ')
      .trimEnd();
  return [line(header), line(widths.map((w) => '-'.repeat(w))), ...body.map(line)].join('\n');
}
