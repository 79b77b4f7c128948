import type { RateEvidence } from '../gate/tune/evidence.js';
import type { SettingScore } from '../gate/tune/score.js';
import { percent, sameSetting, type TuneSetting } from '../gate/tune/setting.js';
import { AIM_SHIFT, BLIND_SHARE, caughtShare, meetsTarget, SWITCH_LEVEL, type TuneResult } from '../gate/tune/tune.js';
import { cleanText } from './clean.js';
import { formatNumber } from './format.js';
import { textTable } from './tune-table.js';

/** Rows of the ladder shown in the terminal (the JSON has all of them). */
const SHOWN = 12;

/** Metrics named as unseen before "and N more". */
const MISSES_SHOWN = 10;

/**
 * `bellgate tune` for a terminal: what was replayed, the best settings of the ladder (false alarms
 * per 100 clean replayed runs with their 95% interval, the model's promised rate, the share of each
 * injected shift caught), the configured setting, and the recommendation measured by the gate at
 * exactly that setting, with the evidence behind it and what it cannot see. Pure.
 * @example renderTuneText(result).split('\n')[0] // 'bellgate tune: series main, 60 runs; ...'
 */
export function renderTuneText(result: TuneResult): string {
  const out: string[] = [];
  const shifts = result.shifts.map(plus).join(', ');
  out.push(
    `bellgate tune: series ${cleanText(result.series)}, ${result.runs} runs; ${result.replayed} replayed clean (each judged against the runs before it), ` +
      `${result.injected} regressions injected (${shifts}, one metric at a time on its worse side); ` +
      `${formatNumber(result.metricsPerRun)} metrics judged in a typical run; target: at most ${result.target} false alarms per 100 clean runs`,
  );
  const r = result.recommendation;
  if (r === undefined) {
    out.push(
      '',
      'no run had enough runs before it to be judged (min-runs): there is no evidence yet, nothing to recommend',
    );
    return `${out.join('\n')}\n`;
  }
  const under = result.ladder.filter((row) => meetsTarget(row, result.target));
  const best = [...under].sort((a, b) => caughtShare(b, AIM_SHIFT) - caughtShare(a, AIM_SHIFT)).slice(0, SHOWN);
  const rows = [result.current, ...best.filter((row) => !sameSetting(row.setting, result.current.setting))];
  out.push(
    '',
    `settings meeting the target (${under.length} of ${result.ladder.length} tried; best ${best.length} shown) and the configured one`,
  );
  out.push(settingsTable(rows, result, r.setting));
  out.push(
    '  (> recommended, * configured; FA/100: clean replayed runs the check would have failed, per 100, with the exact 95% interval (Clopper-Pearson); model: the rate the setting promises; steps: runs flagged only on a change the later runs kept)',
  );
  out.push('', ...recommendationLines(result));
  if (result.labels !== undefined)
    out.push(
      '',
      `labels: ${result.labels.count} known regressions in ${result.labels.runs} runs, left out of the clean count; the configured setting flagged ${result.labels.flagged} of those runs`,
    );
  return `${out.join('\n')}\n`;
}

function settingsTable(rows: readonly SettingScore[], result: TuneResult, chosen: TuneSetting): string {
  const head = [
    '',
    'transform',
    'shared move',
    'change points',
    'decided by',
    'FA/100',
    '95% interval',
    'model',
    'steps',
    'unsettled',
  ];
  for (const s of result.shifts) head.push(`${plus(s)} caught`);
  const body = rows.map((row) => {
    const s = row.setting;
    const mark = `${sameSetting(s, chosen) ? '>' : ' '}${row === result.current ? '*' : ' '}`;
    return [
      mark,
      s.transform,
      s.sharedMove ? 'on' : 'off',
      s.changePoints ? 'on' : 'off',
      s.family === 'none' ? `cutoff ${formatNumber(s.cutoff)}` : `${s.family} ${percent(s.budget!)}`,
      per100(row.falseAlarms.rate),
      interval(row.falseAlarms),
      per100(row.promisedPer100 / 100),
      String(row.steps),
      String(row.unsettled),
      ...result.shifts.map((shift) => share(row.caught.find((c) => c.shift === shift)?.evidence)),
    ];
  });
  return textTable([head, ...body], 'lllll');
}

function recommendationLines(result: TuneResult): string[] {
  const r = result.recommendation!;
  const s = r.setting;
  const f = r.score.falseAlarms;
  const lines = ['recommendation'];
  const keys = [
    `transform: ${s.transform}`,
    `shared-move: ${s.sharedMove}`,
    `change-points: ${s.changePoints}`,
    `family: ${s.family}`,
    s.family === 'none' ? `cutoff: ${formatNumber(s.cutoff)}` : `budget: ${percent(s.budget!)}`,
  ];
  lines.push(`  ${keys.join(', ')}`);
  lines.push(
    r.reason === 'configured-holds'
      ? `  why: the configured setting meets the target, and no setting of the ladder catches significantly more ${plus(AIM_SHIFT)} regressions on the same injections (exact McNemar test, one-sided ${SWITCH_LEVEL})`
      : r.reason === 'best-under-target'
        ? `  why: the most ${plus(AIM_SHIFT)} regressions caught among the settings whose promised rate meets the target and whose replayed false alarms do not contradict it (the floor of their 95% interval is within it)`
        : `  why: NO setting of the ladder meets the target of ${result.target} per 100 on the replay; this one has the fewest false alarms`,
  );
  lines.push(`  measured by the gate set exactly so, over ${f.trials} clean replayed runs: ${alarmEvidence(f)}`);
  if (r.replayTooShort)
    lines.push(
      `  evidence: ${f.trials} replayed runs cannot show a rate below ${per100(Math.min(1, 3 / Math.max(1, f.trials)))} per 100 (rule of three), ` +
        `so the figure to rely on is the model's own calibrated rate: ${promise(s, r.score.promisedPer100)}`,
    );
  else lines.push(`  the model's own calibrated rate: ${promise(s, r.score.promisedPer100)}`);
  const caught = r.score.caught.map(
    (c) =>
      `${plus(c.shift)} ${c.evidence.events} of ${c.evidence.trials} (${share(c.evidence)}, 95% ${shareInterval(c.evidence)})`,
  );
  lines.push(`  injected regressions caught: ${caught.join('; ')}`);
  if (r.blind) {
    const largest = Math.max(...result.shifts);
    lines.push(
      `  BLIND: it catches fewer than ${Math.round(100 * BLIND_SHARE)}% of ${plus(largest)} regressions; --write refuses it unless --force is given`,
    );
  }
  if (r.misses.length > 0) {
    const named = r.misses
      .slice(0, MISSES_SHOWN)
      .map((m) => `${cleanText(m.metric)} (${Math.round(100 * m.detectable)}%)`)
      .join(', ');
    const more = r.misses.length > MISSES_SHOWN ? ` and ${r.misses.length - MISSES_SHOWN} more` : '';
    lines.push(
      `  unseen: a ${plus(Math.max(...result.shifts))} regression of ${r.misses.length} metric${r.misses.length === 1 ? '' : 's'} would pass (median detectable above it): ${named}${more}`,
    );
  }
  return lines;
}

function alarmEvidence(f: RateEvidence): string {
  if (f.events === 0)
    return `0 false alarms: below ${per100(f.ruleOfThree ?? 1)} per 100 at 95% (rule of three, Hanley & Lippman-Hand 1983; exact upper ${per100(f.upper)})`;
  return `${f.events} false alarm${f.events === 1 ? '' : 's'}, ${per100(f.rate)} per 100 (95% ${interval(f)})`;
}

function promise(s: TuneSetting, per100Rate: number): string {
  if (s.family !== 'none')
    return `${s.family} holds the chance of any false alarm in a run at ${percent(s.budget!)} (${per100(per100Rate / 100)} per 100)`;
  return `each metric at the one-sided Gaussian tail of cutoff ${formatNumber(s.cutoff)}: ${per100(per100Rate / 100)} per 100 runs`;
}

function plus(shift: number): string {
  return `+${Math.round(100 * shift)}%`;
}

function per100(rate: number): string {
  return (100 * rate).toFixed(1);
}

function interval(e: RateEvidence): string {
  return `${per100(e.lower)}-${per100(e.upper)}`;
}

function share(e: RateEvidence | undefined): string {
  return e === undefined || e.trials === 0 ? '-' : `${Math.round(100 * e.rate)}%`;
}

function shareInterval(e: RateEvidence): string {
  return `${Math.round(100 * e.lower)}-${Math.round(100 * e.upper)}%`;
}
