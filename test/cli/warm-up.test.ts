import { describe, expect, it } from 'vitest';
import { warmUp, warmUpPlan } from '../../src/cli/warm-up.js';

// The plans follow the flags as `bellgate check --help` documents them (src/cli/options.ts): a
// wrong plan would only cost start-up time, so these pin that nothing loads for help or the
// other commands and that the guesses read the flags they mean.
const none = () => false;

describe('warmUpPlan', () => {
  it('check with a named config and a JSON metric file: all three parts', () => {
    expect(
      warmUpPlan(['check', '--metrics', 'out/bench.json', '--history', 'h.json', '--config', 'b.yml'], none),
    ).toEqual(['check', 'config', 'json']);
  });

  it('record without --config: the config reader only when a default config is present', () => {
    expect(warmUpPlan(['record', '--metrics', 'a.JSON', '--history', 'h.json'], none)).toEqual(['record', 'json']);
    expect(warmUpPlan(['record', '--metrics', 'a.json', '--history', 'h.json'], () => true)).toEqual([
      'record',
      'config',
      'json',
    ]);
    expect(warmUpPlan(['check', '--config=b.yml', '--metrics', 'a.csv'], none)).toEqual(['check', 'config']);
  });

  it('the history file (also .json) is not taken for a metric file', () => {
    expect(warmUpPlan(['check', '--metrics', 'results.txt', '--history', 'h.json'], none)).toEqual(['check']);
    expect(warmUpPlan(['check', '--metrics', 'a.txt', 'b.json', '--series', 'x'], none)).toEqual(['check', 'json']);
  });

  it('another --input-format: no JSON reader', () => {
    expect(warmUpPlan(['check', '--metrics', 'a.json', '--input-format', 'jsonl'], none)).toEqual(['check']);
    expect(warmUpPlan(['check', '--metrics', 'a.json', '--input-format', 'json'], none)).toEqual(['check', 'json']);
  });

  it('help, other commands, no command: nothing', () => {
    expect(warmUpPlan(['check', '--help'], () => true)).toEqual([]);
    expect(warmUpPlan(['record', '-h'], () => true)).toEqual([]);
    expect(warmUpPlan(['explain', 'x', '--history', 'h.json', '--config', 'b.yml'], () => true)).toEqual([]);
    expect(warmUpPlan([], () => true)).toEqual([]);
    expect(warmUpPlan(['--version'], () => true)).toEqual([]);
  });

  it('warmUp itself never throws, whatever the arguments or folder', () => {
    expect(() => warmUp(['check', '--metrics', 'a.json', '--config'], '/no/such/folder')).not.toThrow();
    expect(() => warmUp(['bogus'], '/')).not.toThrow();
  });
});
