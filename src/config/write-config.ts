import { isMap, isScalar, isSeq, parseDocument, type Document, type Node, type YAMLMap, type YAMLSeq } from 'yaml';
import { InputError } from '../errors/input-error.js';
import { literalGlob } from './escape-glob.js';
import { compileGlobs } from './glob-matcher.js';
import { parseConfig } from './load.js';
import { settingsFor } from './rules.js';
import type { Config, Family, Transform } from './types.js';

/** One metric's settings to write into its own rule, with the reason written beside it. */
export interface RuleEdit {
  metric: string;
  cutoff?: number;
  transform?: 'log';
  reason: string;
}

/** The `defaults` keys `--write` may set. */
export interface DefaultsEdit {
  cutoff?: number;
  transform?: Transform;
  sharedMove?: boolean;
  changePoints?: boolean;
}

/** What `--write` puts into a config: defaults keys, top-level keys and per-metric rules. */
export interface ConfigEdit {
  defaults?: DefaultsEdit;
  family?: Family;
  /** The per-run budget as a share (0.01 is written `1%`). */
  budget?: number;
  rules?: readonly RuleEdit[];
}

/** A replacement of text[start, end) by `text`. */
interface Splice {
  start: number;
  end: number;
  text: string;
}

type Scalar = number | string | boolean;

/**
 * Writes settings into a config's text, keeping the user's comments, key order and formatting
 * byte for byte wherever it can: the YAML is parsed with yaml's Document API only to find node
 * positions, and the edits are spliced into the original text —
 * - a `defaults` key or a top-level key (family, budget): its value replaced in place (a comment
 *   beside it stays), or a line inserted at the top of a block `defaults:` (a top-level key: at
 *   the end), or a new `defaults:` section at the end;
 * - a per-metric rule: the metric's own literal rule edited in place when it already sets that key
 *   and no later rule also matches the metric, else a new rule (with a comment saying why)
 *   appended to the end of `metrics:` (a later rule wins).
 * Flow-style sections (`defaults: {cutoff: 0.01}`) are edited through the Document instead
 * (comments and order kept, spacing normalised).
 * Refuses (InputError with file:line:col) a text that is not a valid config, and checks that the
 * result reads back (src/config/load.ts) to the settings asked for. An empty text gives a new config.
 * @example applyConfigEdit('defaults:\n  cutoff: 0.01 # strict\n', 'b.yml', { defaults: { cutoff: 0.001 } }) // 'defaults:\n  cutoff: 0.001 # strict\n'
 */
export function applyConfigEdit(text: string, source: string, edit: ConfigEdit): string {
  parseConfig(text, source);
  const rules = (edit.rules ?? []).filter((r) => literalGlob(r.metric) !== undefined);
  const defaults = defaultsPairs(edit.defaults ?? {});
  const top: [string, Scalar][] = [];
  if (edit.family !== undefined) top.push(['family', edit.family]);
  if (edit.budget !== undefined) top.push(['budget', `${Number((100 * edit.budget).toPrecision(6))}%`]);
  const out = spliceEdit(text, defaults, top, rules) ?? documentEdit(text, defaults, top, rules);
  const config = parseConfig(out, source);
  if (!readsBack(config, edit, rules)) {
    throw new InputError('could not write the settings so that they read back as asked; the config was not changed', {
      where: source,
      fix: 'edit the config by hand with the settings printed above',
    });
  }
  return out;
}

function defaultsPairs(d: DefaultsEdit): [string, Scalar][] {
  const pairs: [string, Scalar | undefined][] = [
    ['cutoff', d.cutoff],
    ['transform', d.transform],
    ['shared-move', d.sharedMove],
    ['change-points', d.changePoints],
  ];
  return pairs.filter((p): p is [string, Scalar] => p[1] !== undefined);
}

function readsBack(config: Config, edit: ConfigEdit, rules: readonly RuleEdit[]): boolean {
  const d = edit.defaults ?? {};
  const got = config.defaults;
  if (d.cutoff !== undefined && got.cutoff !== d.cutoff) return false;
  if (d.transform !== undefined && got.transform !== d.transform) return false;
  if (d.sharedMove !== undefined && got.sharedMove !== d.sharedMove) return false;
  if (d.changePoints !== undefined && got.changePoints !== d.changePoints) return false;
  if (edit.family !== undefined && config.family !== edit.family) return false;
  if (edit.budget !== undefined && Math.abs(config.budget - edit.budget) > 1e-12 * edit.budget) return false;
  return rules.every((rule) => {
    const s = settingsFor(config, rule.metric);
    return (
      (rule.cutoff === undefined || s.cutoff === rule.cutoff) &&
      (rule.transform === undefined || s.transform === rule.transform)
    );
  });
}

/** The splice strategy; undefined when the layout needs the Document fallback. */
function spliceEdit(
  text: string,
  defaultsKeys: readonly [string, Scalar][],
  topKeys: readonly [string, Scalar][],
  rules: readonly RuleEdit[],
): string | undefined {
  const doc = parseDocument(text);
  const root = doc.contents;
  if (root !== null && !(isMap(root) && !root.flow)) return undefined;
  const splices: Splice[] = [];
  const tail: string[] = [];
  const defaults = root?.get('defaults', true) as Node | undefined;
  if (defaultsKeys.length > 0) {
    if (defaults === undefined || (isScalar(defaults) && defaults.value === null && !text.includes('{')))
      tail.push(`defaults:\n${defaultsKeys.map(([k, v]) => `  ${k}: ${v}\n`).join('')}`);
    else if (!isMap(defaults) || defaults.flow || defaults.items.length === 0) return undefined;
    else {
      const first = defaults.items[0]!.key as Node;
      const lineStart = text.lastIndexOf('\n', first.range![0] - 1) + 1;
      const indent = ' '.repeat(first.range![0] - lineStart);
      const inserted: string[] = [];
      for (const [key, v] of defaultsKeys) {
        const value = defaults.get(key, true);
        if (isScalar(value) && value.range)
          splices.push({ start: value.range[0], end: value.range[1], text: String(v) });
        else if (value !== undefined) return undefined;
        else inserted.push(`${indent}${key}: ${v}\n`);
      }
      if (inserted.length > 0) splices.push({ start: lineStart, end: lineStart, text: inserted.join('') });
    }
  }
  for (const [key, v] of topKeys) {
    const value = root?.get(key, true);
    if (isScalar(value) && value.range) splices.push({ start: value.range[0], end: value.range[1], text: String(v) });
    else if (value !== undefined) return undefined;
    else tail.push(`${key}: ${v}\n`);
  }
  const metrics = root?.get('metrics', true) as Node | undefined;
  const appended: RuleEdit[] = [];
  for (const rule of rules) {
    const edited = metrics !== undefined && isSeq(metrics) ? editInPlace(metrics, rule) : undefined;
    if (edited === undefined) appended.push(rule);
    else splices.push(...edited);
  }
  if (appended.length > 0) {
    if (metrics === undefined) tail.push(`metrics:\n${appended.map((r) => ruleText(r, '  ')).join('')}`);
    else if (!isSeq(metrics) || metrics.flow || metrics.items.length === 0) return undefined;
    else {
      const firstItem = metrics.items[0] as Node;
      const dashLine = text.lastIndexOf('\n', firstItem.range![0] - 1) + 1;
      const indent = /^ */.exec(text.slice(dashLine))![0];
      const end = metrics.range![1];
      const at = end > 0 && text[end - 1] === '\n' ? end : lineEnd(text, end);
      splices.push({
        start: at,
        end: at,
        text:
          (at === text.length && !text.endsWith('\n') ? '\n' : '') + appended.map((r) => ruleText(r, indent)).join(''),
      });
    }
  }
  let out = text;
  for (const s of splices.sort((a, b) => b.start - a.start)) out = out.slice(0, s.start) + s.text + out.slice(s.end);
  if (tail.length > 0) out += (out === '' || out.endsWith('\n') ? '' : '\n') + tail.join('');
  return out;
}

/** Offset just past the end of the line holding `offset` (or the text's end). */
function lineEnd(text: string, offset: number): number {
  const nl = text.indexOf('\n', offset);
  return nl < 0 ? text.length : nl + 1;
}

/** Value splices for a rule already written for this metric alone, when it is the last to match it and sets every key. */
function editInPlace(metrics: YAMLSeq, rule: RuleEdit): Splice[] | undefined {
  const own = ownRuleIndex(metrics, rule);
  if (own < 0) return undefined;
  const map = metrics.items[own] as YAMLMap;
  const splices: Splice[] = [];
  for (const [key, value] of [
    ['cutoff', rule.cutoff],
    ['transform', rule.transform],
  ] as const) {
    if (value === undefined) continue;
    const node = map.get(key, true);
    if (!isScalar(node) || !node.range) return undefined;
    splices.push({ start: node.range[0], end: node.range[1], text: String(value) });
  }
  return splices;
}

/** Index of the metric's own literal rule when no later rule matches it, else -1. */
function ownRuleIndex(metrics: YAMLSeq, rule: RuleEdit): number {
  const glob = literalGlob(rule.metric)!;
  const globsOf = (item: unknown): string[] => {
    if (!isMap(item)) return [];
    const m = (item.toJSON() as { match?: unknown }).match;
    return typeof m === 'string' ? [m] : Array.isArray(m) ? m.filter((x): x is string => typeof x === 'string') : [];
  };
  let own = -1;
  metrics.items.forEach((item, i) => {
    const globs = globsOf(item);
    if (globs.length === 1 && globs[0] === glob && (item as YAMLMap).get('ignore') !== true) own = i;
  });
  if (own < 0) return -1;
  const later = metrics.items.slice(own + 1).some((item) => {
    const globs = globsOf(item);
    return globs.length > 0 && compileGlobs(globs)(rule.metric);
  });
  return later ? -1 : own;
}

/** A new rule as block YAML at the given dash indent, with a comment saying why. */
function ruleText(rule: RuleEdit, indent: string): string {
  const lines = [
    `${indent}# suggested by bellgate tune: ${oneLine(rule.reason)}`,
    `${indent}- match: ${JSON.stringify(literalGlob(rule.metric))}`,
  ];
  if (rule.cutoff !== undefined) lines.push(`${indent}  cutoff: ${rule.cutoff}`);
  if (rule.transform !== undefined) lines.push(`${indent}  transform: ${rule.transform}`);
  return `${lines.join('\n')}\n`;
}

function oneLine(s: string): string {
  return s.replace(/[\u0000-\u001f\u007f\u2028\u2029]+/g, ' ');
}

/** The Document fallback for flow-style or empty sections: nodes edited, comments and order kept. */
function documentEdit(
  text: string,
  defaultsKeys: readonly [string, Scalar][],
  topKeys: readonly [string, Scalar][],
  rules: readonly RuleEdit[],
): string {
  const doc = parseDocument(text);
  if (doc.contents === null || (isScalar(doc.contents) && doc.contents.value === null))
    doc.contents = doc.createNode({}) as unknown as typeof doc.contents;
  for (const [key, v] of defaultsKeys) setScalar(doc, ['defaults', key], v);
  for (const [key, v] of topKeys) setScalar(doc, [key], v);
  for (const rule of rules) {
    let seq = doc.get('metrics', true);
    if (!isSeq(seq)) {
      seq = doc.createNode([]);
      doc.set('metrics', seq);
    }
    const metrics = seq as YAMLSeq;
    const own = ownRuleIndex(metrics, rule);
    if (own >= 0) {
      const map = metrics.items[own] as YAMLMap;
      if (rule.cutoff !== undefined) setScalar(map, ['cutoff'], rule.cutoff);
      if (rule.transform !== undefined) setScalar(map, ['transform'], rule.transform);
      continue;
    }
    const node = doc.createNode({
      match: literalGlob(rule.metric)!,
      ...(rule.cutoff === undefined ? {} : { cutoff: rule.cutoff }),
      ...(rule.transform === undefined ? {} : { transform: rule.transform }),
    });
    node.commentBefore = ` suggested by bellgate tune: ${oneLine(rule.reason)}`;
    metrics.items.push(node);
  }
  return doc.toString({ flowCollectionPadding: false });
}

/** Sets a scalar, editing an existing scalar node in place so its comments stay. */
function setScalar(target: Document | YAMLMap, path: string[], value: Scalar): void {
  const node = target.getIn(path, true);
  if (isScalar(node)) node.value = value;
  else target.setIn(path, value);
}
