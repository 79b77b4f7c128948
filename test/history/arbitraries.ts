import fc from 'fast-check';
import type { History, LevelMark, MetricColumn, RunInfo, Tombstone } from '../../src/history/history.js';

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

const mark = (): fc.Arbitrary<LevelMark> =>
  fc
    .record({
      reason: fc.constantFrom('accepted' as const, 'manual' as const),
      metrics: fc.option(fc.array(fc.string({ minLength: 1, maxLength: 6 }), { minLength: 1, maxLength: 2 }), {
        nil: undefined,
      }),
      pr: fc.option(fc.integer({ min: 1, max: 99999 }), { nil: undefined }),
      note: fc.option(fc.string({ maxLength: 10 }), { nil: undefined }),
    })
    .map((m) => Object.fromEntries(Object.entries(m).filter(([, v]) => v !== undefined)) as unknown as LevelMark);

/** A RunInfo with only defined optional fields. */
export const runInfo = (id: string): fc.Arbitrary<RunInfo> =>
  fc
    .record({
      sha: fc.option(fc.string(), { nil: undefined }),
      ref: fc.option(fc.string(), { nil: undefined }),
      event: fc.option(fc.string(), { nil: undefined }),
      time: fc.option(isoTime(), { nil: undefined }),
      pr: fc.option(fc.integer({ min: 1, max: 99999 }), { nil: undefined }),
      runner: fc.option(fc.string({ maxLength: 20 }), { nil: undefined }),
      marks: fc.option(fc.uniqueArray(mark(), { minLength: 1, maxLength: 2, selector: (m) => JSON.stringify(m) }), {
        nil: undefined,
      }),
    })
    .map((r) => {
      const info: RunInfo = { id };
      for (const [k, v] of Object.entries(r)) if (v !== undefined) (info as unknown as Record<string, unknown>)[k] = v;
      return info;
    });

/** Run ids that never replace one another: "r<text>" ids and CI ids of distinct runs ("<run>-<attempt>"). */
export const runIds = (maxLength = 8): fc.Arbitrary<string[]> =>
  fc.uniqueArray(
    fc.oneof(
      fc.string({ minLength: 1, maxLength: 6 }).map((s) => `r${s}`),
      fc.tuple(fc.integer({ min: 1, max: 10 ** 9 }), fc.integer({ min: 1, max: 9 })).map(([r, a]) => `${r}-${a}`),
    ),
    { maxLength, selector: (id) => (/^\d+-\d+$/.test(id) ? id.split('-')[0] : id) },
  );

/**
 * A consistent History as a read returns it: unique run keys, oldest first by time then id,
 * columns aligned with the runs that hold at least one value, tombstones of other ids.
 */
export function historyArbitrary(series = 's'): fc.Arbitrary<History> {
  return fc
    .record({
      ids: runIds(),
      names: fc.uniqueArray(metricName(), { maxLength: 5 }),
      dropped: fc.uniqueArray(
        fc.string({ minLength: 1, maxLength: 5 }).map((s) => `d${s}`),
        { maxLength: 2 },
      ),
    })
    .chain(({ ids, names, dropped }) =>
      fc.record({
        runs: fc.tuple(...ids.map((id) => runInfo(id))),
        dropped: fc.tuple(
          ...dropped.map((id) =>
            fc
              .record({
                time: fc.option(isoTime(), { nil: undefined }),
                reason: fc.option(fc.string(), { nil: undefined }),
              })
              .map((t): Tombstone => ({
                id,
                ...(t.time ? { time: t.time } : {}),
                ...(t.reason !== undefined ? { reason: t.reason } : {}),
              })),
          ),
        ),
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
    .map(({ runs, columns, dropped }) => {
      // The order a read gives: time (untimed first), then id with numeric collation.
      const collator = new Intl.Collator('en', { numeric: true });
      const key = (r: RunInfo) => (r.time === undefined ? -Infinity : Date.parse(r.time));
      const order = runs
        .map((_, i) => i)
        .sort((a, b) => {
          const ka = key(runs[a] as RunInfo);
          const kb = key(runs[b] as RunInfo);
          return ka !== kb ? (ka < kb ? -1 : 1) : collator.compare((runs[a] as RunInfo).id, (runs[b] as RunInfo).id);
        });
      const sorted = order.map((i) => runs[i] as RunInfo);
      const cols = new Map<string, MetricColumn>();
      for (const [name, c] of columns) {
        const values = order.map((i) => c.values[i] as number);
        if (values.some((v) => !Number.isNaN(v)))
          cols.set(name, c.unit === undefined ? { values } : { unit: c.unit, values });
      }
      return { series, runs: sorted, columns: cols, dropped: new Map(dropped.map((t) => [t.id, t])) };
    });
}
