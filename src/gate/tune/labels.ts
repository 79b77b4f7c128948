import { LineCounter, isMap, isScalar, isSeq, parseDocument, type Node } from 'yaml';
import type { History } from '../../history/history.js';
import { InputError } from '../../errors/input-error.js';

/** One known regression: a whole run (every metric of it may alarm), or one metric of a run. */
export interface RegressionLabel {
  run: string;
  metric?: string;
  /** "file:line:col" of the entry, for messages. */
  where: string;
}

/** Largest labels file read, in entries; a real one lists tens. */
export const MAX_LABELS = 100_000;

const FIX = 'write `regressions:` as a list of entries like `- run: "1234-1"` with an optional `metric: "latency/p95"`';

/**
 * Reads a labels file (YAML, or JSON, which YAML reads too) of known regressions:
 *   regressions:
 *     - run: "4180203-1"                      # the whole run was a real regression
 *     - run: "4180230-1"
 *       metric: latency/geocode-p95            # only this metric of it
 * Run ids may be written as numbers. Throws InputError with "file:line:col" for a syntax error,
 * a missing or misspelt key, a wrong type, or too many entries.
 * @example parseLabels('regressions:\n  - run: "12-1"\n', 'labels.yml')[0].run // '12-1'
 */
export function parseLabels(text: string, source: string): RegressionLabel[] {
  const counter = new LineCounter();
  const doc = parseDocument(text, { lineCounter: counter, prettyErrors: false, uniqueKeys: true });
  const at = (node: Node | null | undefined, fallback = 0): string => {
    const offset = node?.range?.[0] ?? fallback;
    const { line, col } = counter.linePos(offset);
    return `${source}:${line}:${col}`;
  };
  const error = doc.errors[0];
  if (error !== undefined) {
    throw new InputError(`the labels file is not valid YAML or JSON: ${error.message.split('\n')[0]}`, {
      where: at(null, error.pos[0]),
      fix: FIX,
    });
  }
  const root = doc.contents;
  if (!isMap(root))
    throw new InputError('the labels file must be a mapping with a `regressions:` list', { where: at(root), fix: FIX });
  const labels: RegressionLabel[] = [];
  for (const pair of root.items) {
    const key = isScalar(pair.key) ? String(pair.key.value) : '';
    if (key !== 'regressions') {
      throw new InputError(`unknown key "${key}" in the labels file`, { where: at(pair.key as Node), fix: FIX });
    }
    const list = pair.value as Node | null;
    if (!isSeq(list))
      throw new InputError('`regressions` must be a list', { where: at(list ?? (pair.key as Node)), fix: FIX });
    if (list.items.length > MAX_LABELS) {
      throw new InputError(`the labels file has ${list.items.length} entries, over the limit of ${MAX_LABELS}`, {
        where: at(list),
        fix: 'label fewer runs',
      });
    }
    for (const item of list.items) labels.push(entry(item as Node, at));
  }
  return labels;
}

function entry(item: Node, at: (node: Node | null | undefined) => string): RegressionLabel {
  if (!isMap(item))
    throw new InputError('each regression must be a mapping with a `run` key', { where: at(item), fix: FIX });
  const found: { run?: string; metric?: string } = {};
  for (const pair of item.items) {
    const key = isScalar(pair.key) ? String(pair.key.value) : '';
    if (key !== 'run' && key !== 'metric') {
      throw new InputError(`unknown key "${key}" in a regression entry`, {
        where: at(pair.key as Node),
        fix: 'use `run` and, optionally, `metric`',
      });
    }
    const value = pair.value as Node | null;
    const raw = isScalar(value) ? value.value : undefined;
    const ok =
      typeof raw === 'string' ? raw !== '' : key === 'run' && typeof raw === 'number' && Number.isSafeInteger(raw);
    if (!ok) {
      throw new InputError(`\`${key}\` must be a non-empty ${key === 'run' ? 'run id' : 'metric name'} string`, {
        where: at(value ?? (pair.key as Node)),
        fix: FIX,
      });
    }
    found[key] = String(raw);
  }
  if (found.run === undefined) throw new InputError('a regression entry lacks `run`', { where: at(item), fix: FIX });
  return { run: found.run, ...(found.metric === undefined ? {} : { metric: found.metric }), where: at(item) };
}

/**
 * Checks labels against the history: every run id must be a run of it, every metric a metric of
 * it (a typo would otherwise silently count as a missed regression).
 * Throws InputError at the entry's "file:line:col".
 * @example checkLabels(labels, history) // returns nothing, or throws
 */
export function checkLabels(labels: readonly RegressionLabel[], history: History): void {
  const runs = new Set(history.runs.map((r) => r.id));
  for (const label of labels) {
    if (!runs.has(label.run)) {
      throw new InputError(`no run "${label.run}" in the history`, {
        where: label.where,
        fix: 'use a run id as the history stores it ("run id-attempt", e.g. "1234-1")',
      });
    }
    if (label.metric !== undefined && !history.columns.has(label.metric)) {
      throw new InputError(`no metric "${label.metric}" in the history`, {
        where: label.where,
        fix: 'use the metric name exactly as the report shows it',
      });
    }
  }
}
