import type { History } from '../../src/history/history.js';

/** Park-Miller minimal standard generator (Park and Miller, CACM 1988), for repeatable data. */
export function lehmer(seed: number): () => number {
  let s = seed;
  return () => {
    s = (s * 16807) % 2147483647;
    return s / 2147483647;
  };
}

/** An invented series of hourly runs x metrics (timings in ms, sizes), about 2% of values missing. */
export function bigHistory(runs: number, metrics: number): History {
  const random = lehmer(20260301);
  const history: History = { series: 'linux-x64', runs: [], columns: new Map() };
  for (let r = 0; r < runs; r++) {
    history.runs.push({
      id: `${70000 + r}-1`,
      sha: (r * 2654435761).toString(16).padStart(12, '0'),
      ref: 'refs/heads/main',
      event: 'push',
      time: new Date(Date.UTC(2026, 0, 1) + r * 3_600_000).toISOString(),
    });
  }
  for (let m = 0; m < metrics; m++) {
    const centre = 10 + 1000 * random();
    // run 0 holds every metric, so version 1's first-appearance order equals version 2's order
    const values = Array.from({ length: runs }, (_, r) =>
      r > 0 && random() < 0.02 ? NaN : Math.round(centre * (1 + 0.03 * (random() - 0.5)) * 1000) / 1000,
    );
    history.columns.set(`suite-${m % 17}/case-${m}`, m % 3 === 0 ? { unit: 'ms', values } : { values });
  }
  return history;
}

/**
 * The earlier per-run layout, written the way version 1 stored it (one object per run, names repeated
 * in every run); units are written once, on the first run, so the comparison is not inflated by them.
 */
export function serializeV1(h: History): string {
  const columns = [...h.columns].map(([name, c]) => ({ key: JSON.stringify(name), unit: c.unit, values: c.values }));
  const units = columns
    .filter((c) => c.unit !== undefined)
    .map((c) => `${c.key}:${JSON.stringify(c.unit)}`)
    .join(',');
  const runs = h.runs.map((run, r) => {
    const values = columns
      .filter((c) => !Number.isNaN(c.values[r]))
      .map((c) => `${c.key}:${c.values[r]}`)
      .join(',');
    return `${JSON.stringify(run).slice(0, -1)},"values":{${values}}${r === 0 ? `,"units":{${units}}` : ''}}`;
  });
  return `{"schema":"bellgate.history/1","series":${JSON.stringify(h.series)},"runs":[${runs.join(',')}]}`;
}
