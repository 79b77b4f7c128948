import type { History, MetricColumn, RunInfo } from './history.js';
import { at, isObject, typeName, type ProblemSink } from './problems.js';

/** The optional text columns of the runs table, in the order they are written. */
export const RUN_FIELDS = ['sha', 'ref', 'event', 'time'] as const;

/**
 * Decodes a parsed version-2 document (see document.ts for the layout) into a History.
 * Fast on purpose: the value columns JSON.parse made are reused as the History's columns, and
 * one pass per column checks each entry and turns null (missing) into NaN — no object per value.
 * Every problem goes to `report` with its JSON path; when `report` returns (verify mode), the bad
 * entry becomes NaN and decoding carries on. Returns undefined when the shape is beyond use.
 * `finiteRows`: the value columns are known to be arrays of finite doubles or NaN (the byte
 * scan's rows), so only their lengths are checked.
 *
 * @example decodeV2(JSON.parse(text), throwingSink('h.json')) // { series, runs, columns }
 */
export function decodeV2(root: Record<string, unknown>, report: ProblemSink, finiteRows = false): History | undefined {
  const series = typeof root.series === 'string' ? root.series : '';
  if (typeof root.series !== 'string') report('series', `series must be a string, found ${typeName(root.series)}`);
  const runs = decodeRuns(root.runs, report);
  if (!runs) return undefined;
  const columns = decodeMetrics(root.metrics, runs.length, report, finiteRows);
  if (!columns) return undefined;
  return { series, runs, columns };
}

function decodeRuns(table: unknown, report: ProblemSink): RunInfo[] | undefined {
  if (!isObject(table)) {
    report('runs', `runs must be an object of columns {id, ${RUN_FIELDS.join(', ')}}, found ${typeName(table)}`);
    return undefined;
  }
  const ids = table.id;
  if (!Array.isArray(ids)) {
    report('runs.id', `runs.id must be an array of run ids, found ${typeName(ids)}`);
    return undefined;
  }
  const first = new Map<string, number>();
  const runs: RunInfo[] = ids.map((id: unknown, i) => {
    if (typeof id !== 'string' || id === '') {
      report(at('runs.id', i), `a run id must be a non-empty string, found ${typeName(id)}`);
      return { id: `#${i}` };
    }
    const earlier = first.get(id);
    if (earlier !== undefined) {
      report(
        at('runs.id', i),
        `run id ${JSON.stringify(id)} appears twice (also runs.id[${earlier}])`,
        'keep one copy of the run; each run id may appear once per series',
      );
    } else first.set(id, i);
    return { id };
  });
  for (const field of RUN_FIELDS) {
    const column = table[field];
    if (column === undefined) continue;
    const path = `runs.${field}`;
    if (!Array.isArray(column) || column.length !== runs.length) {
      report(path, `${path} must be an array as long as runs.id (${runs.length}), found ${lengthOrType(column)}`);
      continue;
    }
    column.forEach((text: unknown, i) => {
      if (typeof text === 'string') (runs[i] as RunInfo)[field] = text;
      else if (text !== null) report(at(path, i), `${field} must be a string or null, found ${typeName(text)}`);
    });
  }
  return runs;
}

function decodeMetrics(
  table: unknown,
  runCount: number,
  report: ProblemSink,
  finiteRows: boolean,
): Map<string, MetricColumn> | undefined {
  if (!isObject(table)) {
    report('metrics', `metrics must be an object {names, units, values}, found ${typeName(table)}`);
    return undefined;
  }
  const { names, units, values } = table;
  if (!Array.isArray(names)) {
    report('metrics.names', `metrics.names must be an array of metric names, found ${typeName(names)}`);
    return undefined;
  }
  if (!Array.isArray(values) || values.length !== names.length) {
    report(
      'metrics.values',
      `metrics.values must hold one column per name (${names.length}), found ${lengthOrType(values)}`,
    );
    return undefined;
  }
  const unitsOk = units === undefined || (Array.isArray(units) && units.length === names.length);
  if (!unitsOk)
    report(
      'metrics.units',
      `metrics.units must be as long as metrics.names (${names.length}), found ${lengthOrType(units)}`,
    );
  const columns = new Map<string, MetricColumn>();
  for (let m = 0; m < names.length; m++) {
    const name: unknown = names[m];
    if (typeof name !== 'string') {
      report(at('metrics.names', m), `a metric name must be a string, found ${typeName(name)}`);
      continue;
    }
    if (columns.has(name)) {
      report(
        at('metrics.names', m),
        `metric ${JSON.stringify(name)} appears twice in metrics.names`,
        'merge the two columns into one',
      );
      continue;
    }
    const column = checkColumn(values[m], m, runCount, report, finiteRows);
    if (!column) continue;
    const unit: unknown = unitsOk && units !== undefined ? (units as unknown[])[m] : null;
    if (typeof unit === 'string') columns.set(name, { unit, values: column });
    else {
      if (unit !== null) report(at('metrics.units', m), `a unit must be a string or null, found ${typeName(unit)}`);
      columns.set(name, { values: column });
    }
  }
  return columns;
}

/**
 * Checks one value column in place, in one tight pass: numbers stay, null becomes NaN, anything
 * else is reported. NaN is already "missing": scanHistoryBytes reads null as NaN (JSON.parse never
 * makes one). Rows the scan read are arrays of doubles, finite or NaN unless it says otherwise
 * (`finiteRows`), and then only their lengths are checked.
 */
function checkColumn(
  column: unknown,
  m: number,
  runCount: number,
  report: ProblemSink,
  finiteRows: boolean,
): number[] | undefined {
  if (!Array.isArray(column) || column.length !== runCount) {
    report(
      at('metrics.values', m),
      `each value column must hold one entry per run (${runCount}), found ${lengthOrType(column)}`,
      'the columns are ragged: a column was cut or extended by hand; restore the document from a backup',
    );
    return undefined;
  }
  // The scan's rows hold nothing this pass would change or report (a million entries at scale).
  if (finiteRows) return column as number[];
  const cells = column as unknown[];
  for (let r = 0; r < runCount; r++) {
    const v = cells[r];
    // v - v is 0 for every finite number, NaN for NaN and the infinities.
    if (typeof v === 'number') {
      if (v - v !== 0 && v === v)
        badCell(cells, m, r, `value ${v} is not finite (an overflowing number such as 1e999?)`, report);
    } else if (v === null) cells[r] = NaN;
    else badCell(cells, m, r, `a value must be a number or null (missing), found ${typeName(v)}`, report);
  }
  return cells as number[];
}

/** Reports a bad entry (JSON.parse turns an overflowing literal such as 1e999 into Infinity) and makes it missing. */
function badCell(cells: unknown[], m: number, r: number, problem: string, report: ProblemSink): void {
  report(at(at('metrics.values', m), r), problem);
  cells[r] = NaN;
}

function lengthOrType(value: unknown): string {
  return Array.isArray(value) ? `${value.length} entries` : typeName(value);
}
