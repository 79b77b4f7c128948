/**
 * The one shape every metric reader produces, and the aggregated Run the gate judges.
 * Readers return raw readings (one per sample); `collectRun` (src/inputs/collect.ts) folds the
 * samples of each name into one Measurement with the aggregate the config asks for.
 */

/** One sample of one metric, as a reader found it. `where` is "file:line" (or an XML element path). */
export interface Reading {
  name: string;
  value: number;
  unit?: string;
  where?: string;
}

/** What a reader returns for one file. `meta` holds run metadata (e.g. Go `key: value` lines). */
export interface ReadResult {
  readings: Reading[];
  /** Things recorded but never fitted (JUnit skipped/failed cases), name -> reason. */
  notFitted: Map<string, string>;
  meta: Map<string, string>;
}

/** The aggregated value of one metric in one run. `count` is the number of samples behind it. */
export interface Measurement {
  value: number;
  unit?: string;
  count: number;
  /** The relative spread of the samples behind the value (see collectRun), when there were 2 or more. */
  spread?: number;
}

/** One CI run's metrics, name -> measurement. Maps, never plain objects: names are untrusted. */
export interface Run {
  metrics: Map<string, Measurement>;
  meta: Map<string, string>;
  /** Names recorded but never fitted (skipped or failed tests), name -> reason; from collectRun. */
  notFitted?: Map<string, string>;
}
