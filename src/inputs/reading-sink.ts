import type { InputLimits } from '../config/types.js';
import { InputError } from '../errors/input-error.js';
import { limitError, samplesError } from './limits.js';
import { checkMetricName, checkUnit } from './names.js';
import type { ReadResult } from './run.js';

/**
 * Where every reader puts what it finds, so that the checks every format needs live in one place:
 * the metric name rule (names.ts), finite values, and the caps on distinct names
 * (`limits.max-metrics`) and samples (`limits.max-samples`), enforced while parsing so a huge file
 * is refused before it fills memory.
 */
export class ReadingSink {
  readonly result: ReadResult = { readings: [], notFitted: new Map(), meta: new Map() };
  private readonly names = new Set<string>();

  constructor(
    readonly file: string,
    private readonly limits: InputLimits,
  ) {}

  /** Adds one sample. @throws InputError for a bad name or unit, a non-finite value, too many metrics or samples. */
  add(name: string, value: number, unit: string | undefined, where: string): void {
    if (this.result.readings.length >= this.limits.maxSamples)
      throw samplesError(this.file, this.limits.maxSamples, where);
    checkMetricName(name, where);
    if (!Number.isFinite(value)) {
      throw new InputError(`value of ${JSON.stringify(name)} is ${value}, not a finite number`, {
        where,
        fix: 'leave out metrics that were not measured instead of writing NaN or Infinity',
      });
    }
    if (unit !== undefined) checkUnit(unit, where);
    this.count(name, where);
    const reading = unit === undefined || unit === '' ? { name, value, where } : { name, value, unit, where };
    this.result.readings.push(reading);
  }

  /** Records a name that is kept but never fitted (a skipped test), with the reason. */
  skip(name: string, reason: string, where: string): void {
    checkMetricName(name, where);
    this.count(name, where);
    this.result.notFitted.set(name, reason);
  }

  /** Run metadata; the first value of a key wins. */
  meta(key: string, value: string): void {
    if (!this.result.meta.has(key)) this.result.meta.set(key, value);
  }

  private count(name: string, where: string): void {
    if (this.names.has(name)) return;
    if (this.names.size >= this.limits.maxMetrics) {
      throw limitError(
        'maxMetrics',
        this.limits.maxMetrics,
        where,
        `${this.file} has more than ${this.limits.maxMetrics} metrics`,
      );
    }
    this.names.add(name);
  }
}
