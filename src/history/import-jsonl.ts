import { isObject, typeName } from './problems.js';
import { nameProblem, runInfoFrom, valueFrom, type ImportedRun, type ImportParse } from './import-run.js';

/**
 * Reads past runs written as JSON Lines, one run a line:
 *   {"id": "81-1", "time": "2026-03-01T10:00:00Z", "sha": "4f1c", "ref": "refs/heads/main",
 *    "metrics": {"build/compile": 12.5}, "units": {"build/compile": "s"}}
 * or with "metrics": [{"name": "build/compile", "value": 12.5, "unit": "s"}].
 * A bad line (not JSON, no id, bad time) is skipped whole; a bad value is skipped alone; a run
 * id seen again replaces the earlier line (both noted). Locations are "source:line".
 *
 * @example parseJsonLines('{"id":"1","time":"2026-03-01","metrics":{"a":1}}', 'runs.jsonl').runs.length // 1
 */
export function parseJsonLines(text: string, source: string): ImportParse {
  const result: ImportParse = { runs: [], skipped: [] };
  const lineOf = new Map<string, number>();
  const lines = text.split(/\r?\n/);
  lines.forEach((line, i) => {
    if (line.trim() === '') return;
    const where = `${source}:${i + 1}`;
    const skip = (reason: string): void => void result.skipped.push({ where, reason });
    let entry: unknown;
    try {
      entry = JSON.parse(line);
    } catch (error) {
      skip(
        `not valid JSON (${error instanceof Error ? error.message.replace(/, ".*" is not valid JSON$/s, '') : 'syntax error'})`,
      );
      return;
    }
    if (!isObject(entry)) return skip(`a run must be a JSON object, found ${typeName(entry)}`);
    const info = runInfoFrom(entry);
    if (typeof info === 'string') return skip(info);
    const run: ImportedRun = { info, metrics: new Map(), units: new Map(), places: new Map() };
    const units = isObject(entry.units) ? entry.units : {};
    const add = (name: unknown, raw: unknown, unit: unknown): void => {
      if (typeof name !== 'string' || name === '') return skip(`a metric needs a non-empty "name"`);
      const badName = nameProblem(name);
      if (badName !== undefined) return skip(badName);
      const value = valueFrom(raw);
      if (typeof value === 'string') return skip(`metric ${JSON.stringify(name)}: ${value}`);
      run.metrics.set(name, value);
      run.places?.set(name, where);
      if (typeof unit === 'string' && unit !== '') run.units.set(name, unit);
    };
    const { metrics } = entry;
    if (Array.isArray(metrics)) {
      for (const m of metrics) {
        if (isObject(m)) add(m.name, m.value, m.unit);
        else skip(`a metric entry must be an object {"name", "value", "unit"}, found ${typeName(m)}`);
      }
    } else if (isObject(metrics)) {
      for (const name of Object.keys(metrics))
        add(name, metrics[name], Object.hasOwn(units, name) ? units[name] : undefined);
    } else
      return skip(
        `run ${JSON.stringify(info.id)}: "metrics" must be an object or an array, found ${typeName(metrics)}`,
      );
    if (run.metrics.size === 0) return skip(`run ${JSON.stringify(info.id)} has no metric values`);
    const earlier = lineOf.get(info.id);
    if (earlier !== undefined) {
      result.skipped.push({
        where: `${source}:${earlier + 1}`,
        reason: `run ${JSON.stringify(info.id)} appears again on line ${i + 1}, which is kept`,
      });
      result.runs = result.runs.filter((r) => r.info.id !== info.id);
    }
    lineOf.set(info.id, i);
    result.runs.push(run);
  });
  return result;
}
