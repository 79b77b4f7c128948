import type { History, MetricColumn, RunInfo } from './history.js';
import { RUN_FIELDS } from './decode-v2.js';
import { at, isObject, key, typeName, type ProblemSink } from './problems.js';

/**
 * Decodes a parsed version-1 document — the earlier, per-run form, read for migration and never
 * written: `{"schema": "bellgate.history/1", "series": "...", "runs": [{"id", "sha", "ref", "event",
 * "time", "values": {"name": number | null}, "units": {"name": "unit"}}]}`.
 * Metric columns appear in the order their names are first met; a run without a name is NaN there.
 * Names are read with Object.keys (JSON.parse makes "__proto__" an own key) into a Map.
 * Problems go to `report` with JSON paths; returns undefined when the shape is beyond use.
 *
 * @example decodeV1({ schema: 'bellgate.history/1', series: 's', runs: [] }, sink) // empty History
 */
export function decodeV1(root: Record<string, unknown>, report: ProblemSink): History | undefined {
  const series = typeof root.series === 'string' ? root.series : '';
  if (typeof root.series !== 'string') report('series', `series must be a string, found ${typeName(root.series)}`);
  const list = root.runs;
  if (!Array.isArray(list)) {
    report('runs', `runs must be an array of run objects, found ${typeName(list)}`);
    return undefined;
  }
  const runs: RunInfo[] = [];
  const columns = new Map<string, MetricColumn>();
  const first = new Map<string, number>();
  list.forEach((entry: unknown, r) => {
    const path = at('runs', r);
    const info: RunInfo = { id: `#${r}` };
    runs.push(info);
    if (!isObject(entry)) {
      report(path, `a run must be an object, found ${typeName(entry)}`);
      return;
    }
    if (typeof entry.id !== 'string' || entry.id === '') {
      report(`${path}.id`, `a run id must be a non-empty string, found ${typeName(entry.id)}`);
    } else {
      info.id = entry.id;
      const earlier = first.get(entry.id);
      if (earlier === undefined) first.set(entry.id, r);
      else
        report(
          `${path}.id`,
          `run id ${JSON.stringify(entry.id)} appears twice (also runs[${earlier}])`,
          'keep one copy of the run; each run id may appear once per series',
        );
    }
    for (const field of RUN_FIELDS) {
      const text = entry[field];
      if (typeof text === 'string') info[field] = text;
      else if (text !== undefined && text !== null)
        report(`${path}.${field}`, `${field} must be a string, found ${typeName(text)}`);
    }
    readValues(entry, path, r, list.length, columns, report);
  });
  return { series, runs, columns };
}

function readValues(
  entry: Record<string, unknown>,
  path: string,
  r: number,
  runCount: number,
  columns: Map<string, MetricColumn>,
  report: ProblemSink,
): void {
  const { values, units } = entry;
  if (units !== undefined && !isObject(units))
    report(`${path}.units`, `units must be an object of name -> unit, found ${typeName(units)}`);
  if (!isObject(values)) {
    report(`${path}.values`, `values must be an object of name -> number, found ${typeName(values)}`);
    return;
  }
  for (const name of Object.keys(values)) {
    const v = values[name];
    let column = columns.get(name);
    if (!column) {
      column = { values: new Array<number>(runCount).fill(NaN) };
      columns.set(name, column);
    }
    if (typeof v === 'number' && Number.isFinite(v)) column.values[r] = v;
    else if (v !== null)
      report(key(`${path}.values`, name), `a value must be a finite number or null, found ${typeName(v)}`);
    const unit = isObject(units) && Object.hasOwn(units, name) ? units[name] : undefined;
    if (typeof unit === 'string') column.unit = unit;
    else if (unit !== undefined && unit !== null)
      report(key(`${path}.units`, name), `a unit must be a string, found ${typeName(unit)}`);
  }
}
