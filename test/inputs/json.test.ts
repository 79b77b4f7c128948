import { describe, expect, it } from 'vitest';
import { readJsonMetrics } from '../../src/inputs/json.js';
import { readJsonLines } from '../../src/inputs/jsonl.js';
import { inputErrorOf } from './helpers.js';

// Positions below are counted by hand from the literal texts (1-based line and column).
describe('readJsonMetrics', () => {
  it('names file:line:col of malformed JSON', () => {
    // The stray comma is line 3 col 1 ('}' follows a trailing comma: JSON forbids it, RFC 8259 §4).
    const error = inputErrorOf(() => readJsonMetrics('{\n  "a": 1,\n}', 'm.json'));
    expect(error.message).toMatch(/malformed JSON/);
    expect(error.where).toBe('m.json:3:1');
  });

  it('finds line:col even where the JSON engine gives no position (a NaN written by a JSON encoder)', () => {
    // "NaN" is not JSON (RFC 8259 §6); the N is line 3 col 8, counted by hand.
    const error = inputErrorOf(() => readJsonMetrics('{\n  "a": 1,\n  "b": NaN\n}', 'm.json'));
    expect(error.where).toBe('m.json:3:8');
    const single = inputErrorOf(() => readJsonMetrics("{'a': 1}", 'm.json'));
    expect(single.where).toBe('m.json:1:2');
  });

  it('names the line of a value that is a string, not a number', () => {
    const error = inputErrorOf(() => readJsonMetrics('{\n  "a": 1,\n  "b": "12"\n}', 'm.json'));
    expect(error.message).toBe('value of "b" is the string "12", not a number');
    expect(error.where).toMatch(/^m\.json:3:8 /);
  });

  it('refuses numbers that overflow to infinity', () => {
    const error = inputErrorOf(() => readJsonMetrics('{"metrics": [{"name": "a", "value": 1e999}]}', 'm.json'));
    expect(error.message).toMatch(/Infinity/);
    expect(error.where).toMatch(/^m\.json:1:14 \(metrics\[0\]\)$/);
  });

  it('refuses an empty name', () => {
    const error = inputErrorOf(() => readJsonMetrics('{"metrics": [{"name": " ", "value": 1}]}', 'm.json'));
    expect(error.message).toBe('metric name is empty');
  });

  it('refuses a name twice in the list form, naming both entries', () => {
    const text = '{"metrics": [\n{"name": "a", "value": 1},\n{"name": "a", "value": 2}\n]}';
    const error = inputErrorOf(() => readJsonMetrics(text, 'm.json'));
    expect(error.message).toBe('metric "a" appears twice (metrics[0] and metrics[1])');
    expect(error.where).toMatch(/^m\.json:3:1 /);
  });

  it('refuses a key twice in the flat form instead of losing a value', () => {
    const error = inputErrorOf(() => readJsonMetrics('{"a": 1, "b": 2, "a": 3}', 'm.json'));
    expect(error.message).toMatch(/"a" appears twice/);
  });

  it('refuses entries without value or samples, or with both', () => {
    expect(inputErrorOf(() => readJsonMetrics('{"metrics": [{"name": "a"}]}', 'm.json')).message).toMatch(
      /neither "value" nor "samples"/,
    );
    expect(
      inputErrorOf(() => readJsonMetrics('{"metrics": [{"name": "a", "value": 1, "samples": [1]}]}', 'm.json')).message,
    ).toMatch(/both "value" and "samples"/);
    expect(
      inputErrorOf(() => readJsonMetrics('{"metrics": [{"name": "a", "samples": []}]}', 'm.json')).message,
    ).toMatch(/non-empty array/);
    expect(inputErrorOf(() => readJsonMetrics('{"metrics": [{"value": 1}]}', 'm.json')).message).toMatch(/no "name"/);
  });

  it('refuses documents that are not objects, and non-numbers of every JSON type', () => {
    expect(inputErrorOf(() => readJsonMetrics('[1, 2]', 'm.json')).message).toMatch(
      /must hold a JSON object, found an array/,
    );
    for (const bad of ['null', 'true', '{}', '[[1]]', '"1"']) {
      expect(inputErrorOf(() => readJsonMetrics(`{"a": ${bad}}`, 'm.json')).message).toMatch(/not a number/);
    }
  });

  it('keeps __proto__ and constructor as ordinary metric names', () => {
    const result = readJsonMetrics('{"__proto__": 1, "constructor": 2, "toString": 3}', 'm.json');
    expect(result.readings.map((r) => [r.name, r.value])).toEqual([
      ['__proto__', 1],
      ['constructor', 2],
      ['toString', 3],
    ]);
    expect(({} as Record<string, unknown>).polluted).toBeUndefined();
  });
});

describe('readJsonLines', () => {
  it('names file:line of a bad line', () => {
    const text = '{"name": "a", "value": 1}\n\n{"name": "b", "value": "x"}\n';
    const error = inputErrorOf(() => readJsonLines(text, 'm.jsonl'));
    expect(error.where).toBe('m.jsonl:3');
    expect(error.message).toMatch(/the string "x", not a number/);
  });

  it('names file:line:col of malformed JSON on a later line', () => {
    // Line 2: the stray x after "value": 1 is at col 26 (counted by hand).
    const error = inputErrorOf(() =>
      readJsonLines('{"name": "a", "value": 1}\n{"name": "b", "value": 1 x}', 'm.jsonl'),
    );
    expect(error.where).toBe('m.jsonl:2:26');
  });

  it('reads CRLF line endings', () => {
    const result = readJsonLines('{"name": "a", "value": 1}\r\n{"name": "a", "value": 2}\r\n', 'm.jsonl');
    expect(result.readings.map((r) => r.value)).toEqual([1, 2]);
  });
});
