import { parse } from 'csv-parse/sync';
import type { InputLimits } from '../config/types.js';
import { InputError } from '../errors/input-error.js';
import { checkLineLengths, DEFAULT_LIMITS } from './limits.js';
import { parseDecimal } from './numbers.js';
import { ReadingSink } from './reading-sink.js';
import type { ReadResult } from './run.js';

/** What to do with each data row, decided by the header. */
interface Layout {
  row(record: string[], line: number): void;
  /** Called when the file has a header and no data rows. */
  noRows(): void;
}

/**
 * Reads CSV (RFC 4180 quoting, comma-separated, first row a header) in one of two layouts:
 * - long form: the header is `name,value` or `name,value,unit` (any order, case-insensitive);
 *   each row is one sample; a name on several rows is several samples;
 * - wide form: any other header; each column is one metric and each row one sample of every
 *   metric. A unit may follow a column name in square brackets: `build time [s]` is metric
 *   "build time" in unit "s". An empty cell is a sample not taken.
 * Whitespace around unquoted cells is ignored; quoted cells are kept as written. Rows are handed
 * to the sink as they are parsed, so a file past `limits.max-samples` stops there.
 * @throws InputError naming file:line and the column for malformed CSV, non-numbers, empty names.
 * @example readCsvMetrics('name,value,unit\na,1,ms\n', 'm.csv').readings[0] // { name: 'a', value: 1, unit: 'ms', where: 'm.csv:2' }
 */
export function readCsvMetrics(text: string, file: string, limits: InputLimits = DEFAULT_LIMITS): ReadResult {
  checkLineLengths(text, file, limits);
  const sink = new ReadingSink(file, limits);
  let layout: Layout | undefined;
  let rows = 0;
  eachRow(text, file, (record, line) => {
    if (layout === undefined) layout = layoutOf(record, file, sink);
    else layout.row(record, line);
    rows++;
  });
  if (layout === undefined)
    throw new InputError('the CSV file has no header row', {
      where: file,
      fix: 'start the file with a header such as name,value,unit',
    });
  if (rows === 1) layout.noRows();
  return sink.result;
}

function layoutOf(header: string[], file: string, sink: ReadingSink): Layout {
  const columns = header.map((cell) => cell.toLowerCase());
  const isLong =
    columns.includes('name') &&
    columns.includes('value') &&
    columns.every((c) => c === 'name' || c === 'value' || c === 'unit');
  return isLong ? longLayout(columns, file, sink) : wideLayout(header, file, sink);
}

function longLayout(columns: string[], file: string, sink: ReadingSink): Layout {
  if (new Set(columns).size !== columns.length) {
    throw new InputError(`the CSV header repeats a column: ${columns.join(',')}`, {
      where: `${file}:1`,
      fix: 'name each column once',
    });
  }
  const nameAt = columns.indexOf('name');
  const valueAt = columns.indexOf('value');
  const unitAt = columns.indexOf('unit');
  return {
    row(record, line) {
      const where = `${file}:${line}`;
      const name = record[nameAt] ?? '';
      const value = parseDecimal(record[valueAt] ?? '', where, `value of ${JSON.stringify(name)}`);
      sink.add(name, value, unitAt < 0 ? undefined : record[unitAt], where);
    },
    noRows() {},
  };
}

function wideLayout(header: string[], file: string, sink: ReadingSink): Layout {
  const headerWhere = `${file}:1`;
  const metrics = header.map(splitUnit);
  const seen = new Set<string>();
  for (const [i, { name }] of metrics.entries()) {
    if (seen.has(name)) {
      throw new InputError(`the CSV header names metric ${JSON.stringify(name)} twice (column ${i + 1})`, {
        where: headerWhere,
        fix: 'give each metric one column; put repeated measurements in more rows',
      });
    }
    seen.add(name);
  }
  return {
    row(record, line) {
      const where = `${file}:${line}`;
      record.forEach((cell, i) => {
        if (cell === '') return;
        const { name, unit } = metrics[i]!;
        const value = parseDecimal(cell, `${where}:${i + 1}`, `value of ${JSON.stringify(name)} (column ${i + 1})`);
        sink.add(name, value, unit, where);
      });
    },
    // A header with no data rows still names metrics; check them so a bad name is not accepted silently.
    noRows() {
      metrics.forEach(({ name }) => sink.skip(name, 'no samples in the CSV file', headerWhere));
    },
  };
}

/** Parses the rows one at a time (none is kept), handing each with its line number to `each`. */
function eachRow(text: string, file: string, each: (record: string[], line: number) => void): void {
  try {
    parse(text, {
      trim: true,
      skip_empty_lines: true,
      bom: true,
      on_record: (record: string[], context) => {
        each(record, context.lines);
        return null;
      },
    });
  } catch (error) {
    if (error instanceof InputError) throw error;
    const e = error as { message?: string; lines?: number; code?: string };
    throw new InputError(`malformed CSV: ${e.message ?? String(error)}`, {
      where: typeof e.lines === 'number' ? `${file}:${e.lines}` : file,
      fix: 'give every row as many cells as the header and close every quoted cell',
      cause: error,
    });
  }
}

/** `build time [s]` -> name "build time", unit "s"; a cell without a final `[...]` is all name. */
function splitUnit(cell: string): { name: string; unit: string | undefined } {
  // Index arithmetic, not a regular expression: a header cell may be a megabyte long.
  const open = cell.lastIndexOf('[');
  if (!cell.endsWith(']') || open < 0) return { name: cell, unit: undefined };
  const unit = cell.slice(open + 1, -1);
  if (unit.includes(']')) return { name: cell, unit: undefined };
  return { name: cell.slice(0, open).trimEnd(), unit: unit.trim() };
}
