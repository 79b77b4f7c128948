import { andersonDarling, skewness } from '../../model/normality.js';

/** Shape of a metric's values on one scale. */
export interface ScaleShape {
  /** Adjusted Fisher-Pearson skewness G1 (Joanes & Gill 1998). */
  skewness: number;
  /** Anderson-Darling A*^2 (Stephens' small-sample adjustment) and its p-value (D'Agostino & Stephens 1986). */
  andersonDarling: number;
  pValue: number;
}

/** A metric's normality on the raw and log scales, and whether `transform: log` is suggested. */
export interface NormalityCheck {
  n: number;
  raw: ScaleShape;
  /** Absent when a value is <= 0 (no log scale). */
  log?: ScaleShape;
  suggestLog: boolean;
  /** One sentence: why log is (or is not) suggested. */
  note: string;
}

/** Critical value of A*^2 at the 5% level, normal with estimated mean and variance (D'Agostino & Stephens 1986; see andersonDarling). */
export const AD_CRITICAL_5 = 0.752;

/**
 * Skewness and Anderson-Darling on the raw values and on their logarithms. `transform: log` is
 * suggested when the raw values fail the 5% test (A*^2 > 0.752), every value is > 0, and the log
 * scale fits clearly better: its A*^2 at most half the raw one (our rule of thumb) and below the
 * critical value. Returns undefined for fewer than 8 values or a constant metric (nothing to test).
 * O(n log n).
 * @example normalityCheck(timings)?.suggestLog // true for log-normal timings
 */
export function normalityCheck(values: readonly number[]): NormalityCheck | undefined {
  if (values.length < 8 || values.every((v) => v === values[0])) return undefined;
  const raw = shape(values);
  const positive = values.every((v) => v > 0);
  const logValues = positive ? values.map(Math.log) : undefined;
  const log = logValues !== undefined && !logValues.every((v) => v === logValues[0]) ? shape(logValues) : undefined;
  const rejectsRaw = raw.andersonDarling > AD_CRITICAL_5;
  const suggestLog =
    log !== undefined &&
    rejectsRaw &&
    log.andersonDarling <= raw.andersonDarling / 2 &&
    log.andersonDarling <= AD_CRITICAL_5;
  let note: string;
  if (!positive) note = 'values <= 0: no log scale';
  else if (!rejectsRaw) note = 'raw scale looks Gaussian (A*² ≤ 0.752)';
  else if (suggestLog)
    note = `log scale fits clearly better (A*² ${fmt(log.andersonDarling)} vs ${fmt(raw.andersonDarling)})`;
  else note = 'not Gaussian on either scale (a level change or outliers?)';
  return { n: values.length, raw, ...(log === undefined ? {} : { log }), suggestLog, note };
}

function shape(values: readonly number[]): ScaleShape {
  const ad = andersonDarling(values);
  return { skewness: skewness(values), andersonDarling: ad.adjusted, pValue: ad.pValue };
}

function fmt(x: number): string {
  return x.toPrecision(3);
}
