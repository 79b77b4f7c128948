import { parse } from 'csv-parse/sync';
import { InputError } from '../errors/input-error.js';
import { nameProblem, runInfoFrom, valueFrom, type ImportedRun, type ImportParse } from './import-run.js';

const RUN_COLUMNS = ['id', 'time', 'sha', 'ref', 'event'] as const;
const RUN_SET = new Set<string>(RUN_COLUMNS);
const LONG_COLUMNS = new Set<string>([...RUN_COLUMNS, 'name', 'value', 'unit']);

/**
 * Reads past runs from CSV with a header row, in either of two layouts:
 * - long, one row per run and metric: `id,time,sha,ref,name,value[,unit]` (rows of one id join);
 * - wide, one row per run: `id,time,sha,ref,<metric>,<metric>...`; a header `name [unit]` gives
 *   the unit, an empty cell means the run lacks that metric.
 * The layout is long when the header has `name` and `value` and nothing but run columns and
 * `unit` besides. Run columns (id, time, sha, ref, event) are matched ignoring case; id and time
 * are required. Bad rows and values are skipped with "source:line" and a reason.
 * Throws InputError for a file that is not CSV, has no header, or lacks id/time columns.
 *
 * @example parseCsvRuns('id,time,build\n81,2026-03-01,12.5\n', 'runs.csv').runs[0]?.metrics // Map { build => 12.5 }
 */
export function parseCsvRuns(text: string, source: string): ImportParse {
  let rows: Array<{ record: string[]; info: { lines: number } }>;
  try {
    rows = parse(text, {
      bom: true,
      skip_empty_lines: true,
      trim: true,
      relax_column_count: true,
      info: true,
    }) as unknown as typeof rows;
  } catch (cause) {
    const line = (cause as { lines?: number }).lines;
    throw new InputError(`not valid CSV (${cause instanceof Error ? cause.message : String(cause)})`, {
      where: line === undefined ? source : `${source}:${line}`,
      fix: 'check the quoting at that line',
      cause,
    });
  }
  const [head, ...body] = rows;
  if (!head)
    throw new InputError('the file holds no rows', { where: source, fix: 'write a header row and one row per run' });
  const header = head.record.map((h) => (LONG_COLUMNS.has(h.toLowerCase()) ? h.toLowerCase() : h));
  const seen = new Set<string>();
  for (const h of header) {
    if (h === '')
      throw new InputError('a header cell is empty', {
        where: `${source}:${head.info.lines}`,
        fix: 'name every column',
      });
    if (seen.has(h))
      throw new InputError(`column ${JSON.stringify(h)} appears twice in the header`, {
        where: `${source}:${head.info.lines}`,
        fix: 'name every column once',
      });
    seen.add(h);
  }
  for (const need of ['id', 'time']) {
    if (!seen.has(need)) {
      throw new InputError(`the header has no "${need}" column`, {
        where: `${source}:${head.info.lines}`,
        fix: 'start the file with a header such as id,time,sha,ref,name,value,unit (long) or id,time,sha,ref,<metric>... (wide)',
      });
    }
  }
  const long = seen.has('name') && seen.has('value') && header.every((h) => LONG_COLUMNS.has(h));
  const result: ImportParse = { runs: [], skipped: [] };
  const byId = new Map<string, ImportedRun>();
  for (const { record, info } of body) {
    const where = `${source}:${info.lines}`;
    const skip = (reason: string): void => void result.skipped.push({ where, reason });
    if (record.length !== header.length) {
      skip(`the row has ${record.length} cells for ${header.length} columns`);
      continue;
    }
    const cell = new Map(header.map((h, i) => [h, record[i] ?? '']));
    const runInfo = runInfoFrom(Object.fromEntries(RUN_COLUMNS.map((c) => [c, cell.get(c)])));
    if (typeof runInfo === 'string') {
      skip(runInfo);
      continue;
    }
    let run = byId.get(runInfo.id);
    if (run && run.info.time !== runInfo.time) {
      skip(`run ${JSON.stringify(runInfo.id)} has time ${runInfo.time} here but ${run.info.time} on an earlier row`);
      continue;
    }
    if (!run) {
      run = { info: runInfo, metrics: new Map(), units: new Map(), places: new Map() };
      byId.set(runInfo.id, run);
    }
    const target = run;
    const add = (name: string, raw: string, unit: string | undefined): void => {
      const badName = nameProblem(name);
      if (badName !== undefined) return skip(badName);
      const value = valueFrom(raw, true);
      if (typeof value === 'string') return skip(`metric ${JSON.stringify(name)}: ${value}`);
      if (target.metrics.has(name))
        skip(
          `metric ${JSON.stringify(name)} of run ${JSON.stringify(target.info.id)} was given before; this row's value is kept`,
        );
      target.metrics.set(name, value);
      target.places?.set(name, where);
      if (unit) target.units.set(name, unit);
    };
    if (long) {
      const name = cell.get('name') ?? '';
      if (name === '') skip('a row needs a metric name');
      else add(name, cell.get('value') ?? '', cell.get('unit'));
    } else {
      header.forEach((h, i) => {
        const raw = record[i] ?? '';
        if (RUN_SET.has(h) || raw === '') return;
        // Metric names keep their case; only run columns were matched ignoring it.
        const title = head.record[i] ?? h;
        const named = /^(.*\S)\s*\[([^\]]+)\]$/.exec(title);
        add(named?.[1] ?? title, raw, named?.[2]);
      });
    }
  }
  for (const run of byId.values()) {
    if (run.metrics.size > 0) result.runs.push(run);
    else result.skipped.push({ where: source, reason: `run ${JSON.stringify(run.info.id)} has no metric values` });
  }
  return result;
}
