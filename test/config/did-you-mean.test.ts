import { describe, expect, it } from 'vitest';
import { didYouMean, editDistance } from '../../src/config/did-you-mean.js';

describe('editDistance', () => {
  it('matches textbook Levenshtein distances', () => {
    // The standard examples (Wikipedia, "Levenshtein distance"; from memory): kitten/sitting 3,
    // flaw/lawn 2, and the distance to an empty string is the length.
    expect(editDistance('kitten', 'sitting')).toBe(3);
    expect(editDistance('sitting', 'kitten')).toBe(3);
    expect(editDistance('flaw', 'lawn')).toBe(2);
    expect(editDistance('', 'abc')).toBe(3);
    expect(editDistance('abc', '')).toBe(3);
    expect(editDistance('same', 'same')).toBe(0);
    // Jurafsky & Martin, "Speech and Language Processing", 2.5 (from memory): intention/execution
    // is 5 with unit substitution cost.
    expect(editDistance('intention', 'execution')).toBe(5);
  });
});

describe('didYouMean', () => {
  const keys = [
    'cutoff',
    'worse',
    'tolerance',
    'resolution',
    'window',
    'min-runs',
    'transform',
    'shared-move',
    'aggregate',
    'change-points',
  ];
  it('finds near misses', () => {
    expect(didYouMean('cuttoff', keys)).toBe('cutoff');
    expect(didYouMean('minruns', keys)).toBe('min-runs');
    expect(didYouMean('min_runs', keys)).toBe('min-runs');
    expect(didYouMean('minRuns', keys)).toBe('min-runs');
    expect(didYouMean('tolerence', keys)).toBe('tolerance');
    expect(didYouMean('windows', keys)).toBe('window');
    expect(didYouMean('changepoint', keys)).toBe('change-points');
    expect(didYouMean('Worse', keys)).toBe('worse');
  });

  it('stays quiet when nothing is close', () => {
    expect(didYouMean('threshold', keys)).toBeUndefined();
    expect(didYouMean('x', keys)).toBeUndefined();
    expect(didYouMean('a'.repeat(10_000), keys)).toBeUndefined();
  });
});
