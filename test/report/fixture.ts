import { mean, standardDeviation } from 'simple-statistics';
import type { History } from '../../src/history/history.js';
import type { MetricResult, Report, Status } from '../../src/gate/report.js';

/**
 * A hand-written report for an invented project (a static-site builder measured in CI). Baseline
 * summaries are computed from the generated history with simple-statistics (population sd, as the
 * MLE fit), so the HTML charts have data that agree with the report.
 */

/** Deterministic pseudo-noise in [-1, 1] (a fixed linear congruential sequence). */
function noise(seed: number): () => number {
  let s = seed >>> 0;
  return () => {
    s = (Math.imul(s, 1664525) + 1013904223) >>> 0;
    return (s / 2 ** 32) * 2 - 1;
  };
}

export const HOSTILE = {
  img: '<img src=x onerror=alert(1)>',
  link: '](javascript:alert(1))',
  mention: '@team please look',
  issue: 'fixes #123',
  tick: 'a`b`|c|d',
  proto: '__proto__',
  bidi: 'safe\u202Eevil\u2066x\u2069',
  control: 'ctl\u001b[31mred\u0007\u0000',
  long: 'L'.repeat(10_240),
};

interface Spec {
  name: string;
  unit?: string;
  centre: number;
  spread: number;
  now: number | undefined;
  status: Status;
  scale?: 'log';
  worse?: 'higher' | 'lower';
}

export function makeFixture(extra: Spec[] = []): { report: Report; history: History } {
  const runs = Array.from({ length: 30 }, (_, i) => ({
    id: `${9000 + i}-1`,
    sha: (0xabc000 + i).toString(16),
    time: new Date(Date.UTC(2026, 10, 1 + i)).toISOString(),
  }));
  const specs: Spec[] = [
    { name: 'build/time', unit: 's', centre: 41.2, spread: 0.8, now: 47.9, status: 'regressed' },
    { name: 'bundle/app.js.gz', unit: 'B', centre: 40211, spread: 12, now: 40190, status: 'ok' },
    { name: 'render/page-md', unit: 'ms', centre: 3.1, spread: 0.05, now: 2.7, status: 'improved', scale: 'log' },
    { name: 'serve/requests', unit: 'req/s', centre: 1830, spread: 25, now: 1822, status: 'ok', worse: 'lower' },
    { name: 'parse/front-matter', unit: 'µs', centre: 88, spread: 2, now: 90, status: 'learning' },
    { name: 'image/resize', unit: 'ms', centre: 0, spread: 0, now: 12, status: 'new' },
    { name: 'search/index-size', unit: 'B', centre: 5120, spread: 30, now: undefined, status: 'missing' },
    { name: 'legacy/old-bench', unit: 'ms', centre: 7, spread: 1, now: 7.5, status: 'ignored' },
    ...extra,
  ];
  const history: History = { series: 'linux-x64', runs, columns: new Map() };
  const metrics: MetricResult[] = specs.map((s, k) => {
    const rnd = noise(k + 1);
    const values = runs.map((_, i) =>
      s.status === 'new' ? NaN : s.status === 'learning' && i < 26 ? NaN : s.centre + s.spread * rnd() * 1.7,
    );
    if (s.status !== 'new') history.columns.set(s.name, { unit: s.unit, values });
    const cutoff = 0.01;
    const base = values.filter((v) => Number.isFinite(v));
    const judged =
      s.status === 'regressed' || s.status === 'improved' || s.status === 'ok' || (s.status === 'ignored' && false);
    const fitVals = s.scale === 'log' ? base.map(Math.log) : base;
    const mu = judged || s.status === 'missing' ? mean(fitVals) : undefined;
    const sd = judged || s.status === 'missing' ? standardDeviation(fitVals) : undefined;
    const r: MetricResult = {
      name: s.name,
      status: s.status,
      unit: s.unit,
      cutoff,
      worse: s.worse ?? 'higher',
      recent: base.slice(-20),
    };
    if (s.now !== undefined) r.value = s.now;
    if (mu !== undefined && sd !== undefined) {
      r.baseline = { n: base.length, mean: mu, sd, ...(s.scale ? { scale: s.scale } : {}) };
      if (s.now !== undefined) {
        const x = s.scale === 'log' ? Math.log(s.now) : s.now;
        r.z = (x - mu) / sd;
        r.change = (s.now - mean(base)) / mean(base);
        r.relativeDensity = Math.exp(-0.5 * r.z * r.z);
        r.density = r.relativeDensity / (Math.sqrt(2 * Math.PI) * sd);
        r.own = r.change;
        r.detectable = 0.07;
      }
    }
    return r;
  });
  const report: Report = {
    schema: 'bellgate.report/1',
    verdict: 'regressed',
    series: 'linux-x64',
    blocks: true,
    family: 'none',
    budget: 0.01,
    unsettled: 'pass',
    metrics,
    shared: [{ name: 'timings', status: 'ok', members: 4, move: 0.012, n: 30, tail: 0.27, largest: 0.05 }],
  };
  return { report, history };
}
