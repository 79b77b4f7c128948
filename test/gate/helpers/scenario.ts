import { defaultConfig, parseConfig } from '../../../src/config/load.js';
import type { Config, MetricSettings } from '../../../src/config/types.js';
import type { History } from '../../../src/history/history.js';
import type { Run } from '../../../src/inputs/run.js';

/** The default settings with some keys replaced (as a `defaults:` block would). */
export function settingsWith(overrides: Partial<MetricSettings> = {}): MetricSettings {
  return { ...defaultConfig().defaults, ...overrides };
}

/** A config from YAML text, through the real loader. */
export function configFrom(yaml: string): Config {
  return parseConfig(yaml, 'bellgate.yml');
}

/**
 * A history whose runs are "run-1" .. "run-N" (oldest first); each column lists one value per
 * run, NaN where the run lacks the metric. Columns shorter than the longest are padded in front
 * with NaN (the metric appeared later).
 */
export function historyOf(columns: Record<string, readonly number[]>, series = 'main'): History {
  const length = Math.max(0, ...Object.values(columns).map((c) => c.length));
  const runs = Array.from({ length }, (_, i) => ({ id: `run-${i + 1}` }));
  const map = new Map<string, { values: number[] }>();
  for (const [name, values] of Object.entries(columns)) {
    map.set(name, { values: [...Array<number>(length - values.length).fill(NaN), ...values] });
  }
  return { series, runs, columns: map };
}

/** A run holding these values (one sample each). */
export function runOf(values: Record<string, number>): Run {
  return {
    metrics: new Map(Object.entries(values).map(([name, value]) => [name, { value, count: 1 }])),
    meta: new Map(),
  };
}
