import type { SettingScore } from '../gate/tune/score.js';
import type { TuneResult } from '../gate/tune/tune.js';

/** Schema tag of the tune JSON; bumped only on a breaking change of its fields. */
export const TUNE_SCHEMA = 'bellgate.tune/1';

/**
 * `bellgate tune --format json`: the whole result for scripts, with stable field names. Every
 * rate carries its evidence (events, trials, rate, Clopper-Pearson `lower`/`upper`, and
 * `ruleOfThree` when there was no event); shares caught are a list by `shift`. Metric names only
 * appear as values, never as keys. Two-space indent, trailing newline.
 * @example JSON.parse(renderTuneJson(result)).recommendation.setting.family // 'holm'
 */
export function renderTuneJson(
  result: TuneResult,
  extra: { written?: { file: string; diff: string }; refused?: string } = {},
): string {
  const row = (r: SettingScore) => ({
    setting: r.setting,
    measured: r.measured,
    falseAlarms: r.falseAlarms,
    promisedPer100: r.promisedPer100,
    unsettled: r.unsettled,
    steps: r.steps,
    caught: r.caught.map((c) => ({ shift: c.shift, ...c.evidence })),
  });
  const r = result.recommendation;
  const body = {
    schema: TUNE_SCHEMA,
    series: result.series,
    runs: result.runs,
    replayed: result.replayed,
    injected: result.injected,
    shifts: result.shifts,
    metricsPerRun: result.metricsPerRun,
    target: result.target,
    current: row(result.current),
    ...(r === undefined
      ? {}
      : {
          recommendation: {
            ...row(r.score),
            reason: r.reason,
            blind: r.blind,
            replayTooShort: r.replayTooShort,
            misses: r.misses,
          },
        }),
    ladder: result.ladder.map(row),
    ...(result.labels === undefined ? {} : { labels: result.labels }),
    ...(extra.written === undefined ? {} : { written: extra.written }),
    ...(extra.refused === undefined ? {} : { refused: extra.refused }),
  };
  return `${JSON.stringify(body, null, 2)}\n`;
}
