import { describe, expect, it } from 'vitest';
import { reviewSince } from '../../src/gate/since/review-since.js';
import { renderSinceJson } from '../../src/report/since-json.js';
import { renderSinceMarkdown } from '../../src/report/since-markdown.js';
import { renderSinceText } from '../../src/report/since-text.js';
import { generateHistory } from '../gate/since/generate.js';

const hostile = '<img src=x onerror=alert(1)>|@team](javascript:x)\u001b[31m';
const history = generateHistory({
  before: 40,
  after: 40,
  seed: 6,
  metrics: { [hostile]: { steps: [{ offset: 20, factor: 1.1 }] }, quiet: {} },
  runInfo: { 20: { marks: [{ reason: 'accepted', pr: 77 }] } },
});
const report = reviewSince(history, { run: 'run-40' });

describe('release review renderers', () => {
  it('markdown escapes metric names and links the accepting pull request', () => {
    const md = renderSinceMarkdown(report);
    expect(md).not.toContain('<img');
    expect(md).not.toContain('](javascript');
    expect(md).toContain('@\u200Bteam');
    expect(md).toContain('accepted in #77');
    expect(md).toContain('<details><summary>1 other metric</summary>');
  });

  it('text strips terminal escapes and folds quiet metrics', () => {
    const text = renderSinceText(report);
    expect(text).not.toContain('\u001b');
    expect(text).toContain('1 other metric without a change, step or creep');
    expect(renderSinceText(report, { all: true })).toContain('quiet:');
  });

  it('json keeps every field, names as values, and a sentence per metric', () => {
    const doc = JSON.parse(renderSinceJson(report)) as {
      metrics: { name: string; steps: { mark: { pr: number } | undefined }[]; summary: string; then: { n: number } }[];
    };
    expect(doc.metrics[0]!.name).toBe(hostile);
    expect(doc.metrics[0]!.steps[0]!.mark?.pr).toBe(77);
    expect(doc.metrics[0]!.summary).toMatch(/^level \+\d+\.\d+% \(95% CI/);
    expect(doc.metrics[1]!.then.n).toBe(10);
  });
});
