import fc from 'fast-check';
import type { History, MetricColumn, RunInfo } from '../../src/history/history.js';

/** Metric names including the ones that break plain objects. */
export const metricName = (): fc.Arbitrary<string> =>
  fc.oneof(
    fc.string({ minLength: 1, maxLength: 12 }),
    fc.constantFrom('__proto__', 'constructor', 'hasOwnProperty', 'a.b[0]', 'size/"q"'),
  );

/** A finite double or NaN (missing); -0 is excluded because JSON has no negative zero. */
export const cell = (): fc.Arbitrary<number> =>
  fc.oneof(
    fc.double({ noNaN: true, noDefaultInfinity: true }).map((v) => (Object.is(v, -0) ? 0 : v)),
    fc.constant(NaN),
  );

const isoTime = (): fc.Arbitrary<string> =>
  fc.integer({ min: Date.UTC(2020, 0, 1), max: Date.UTC(2030, 0, 1) }).map((ms) => new Date(ms).toISOString());

/** A RunInfo with only defined optional fields. */
export const runInfo = (id: string): fc.Arbitrary<RunInfo> =>
  fc
    .record({
      sha: fc.option(fc.string(), { nil: undefined }),
      ref: fc.option(fc.string(), { nil: undefined }),
      event: fc.option(fc.string(), { nil: undefined }),
      time: fc.option(isoTime(), { nil: undefined }),
    })
    .map((r) => {
      const info: RunInfo = { id };
      for (const [k, v] of Object.entries(r)) if (v !== undefined) (info as unknown as Record<string, string>)[k] = v;
      return info;
    });

/** A consistent History: unique run ids, columns aligned with the runs, units sometimes. */
export function historyArbitrary(series = 's'): fc.Arbitrary<History> {
  return fc
    .record({
      ids: fc.uniqueArray(fc.string({ minLength: 1, maxLength: 8 }), { maxLength: 8 }),
      names: fc.uniqueArray(metricName(), { maxLength: 5 }),
    })
    .chain(({ ids, names }) =>
      fc.record({
        runs: fc.tuple(...ids.map((id) => runInfo(id))),
        columns: fc.tuple(
          ...names.map((name) =>
            fc
              .record({
                unit: fc.option(fc.string({ maxLength: 3 }), { nil: undefined }),
                values: fc.array(cell(), { minLength: ids.length, maxLength: ids.length }),
              })
              .map(({ unit, values }): [string, MetricColumn] => [
                name,
                unit === undefined ? { values } : { unit, values },
              ]),
          ),
        ),
      }),
    )
    .map(({ runs, columns }) => ({ series, runs, columns: new Map(columns) }));
}
