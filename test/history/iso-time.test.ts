import { describe, expect, it } from 'vitest';
import { normalizeIsoTime, parseIsoTime } from '../../src/history/iso-time.js';

describe('parseIsoTime', () => {
  it('reads the RFC 3339 section 5.8 examples', () => {
    // RFC 3339 5.8: "1985-04-12T23:20:50.52Z" is 20 min 50.52 s after 23:00 UTC on 12 April 1985.
    expect(parseIsoTime('1985-04-12T23:20:50.52Z')).toBe(Date.UTC(1985, 3, 12, 23, 20, 50, 520));
    // RFC 3339 5.8: "1996-12-19T16:39:57-08:00" equals 1996-12-20T00:39:57Z.
    expect(parseIsoTime('1996-12-19T16:39:57-08:00')).toBe(Date.UTC(1996, 11, 20, 0, 39, 57));
    // RFC 3339 5.8: "1937-01-01T12:00:27.87+00:20" equals 1937-01-01T11:40:27.87Z.
    expect(parseIsoTime('1937-01-01T12:00:27.87+00:20')).toBe(Date.UTC(1937, 0, 1, 11, 40, 27, 870));
  });

  it('agrees with ECMA-262 Date.parse on strings in its own date-time format', () => {
    for (const s of ['2026-03-01T10:00:00.000Z', '2026-03-01T10:00Z', '2024-02-29T23:59:59.999+05:30', '2026-03-01']) {
      expect(parseIsoTime(s)).toBe(Date.parse(s));
    }
  });

  it('reads the canonical stored form (toISOString) as ECMA-262 Date.parse does, and refuses its impossible dates', () => {
    for (let ms = 0; ms < 1000; ms += 37) {
      const text = new Date(Date.UTC(2026, 2, 1, 10, 0, 59, ms)).toISOString();
      expect(parseIsoTime(text)).toBe(Date.parse(text));
    }
    // Gregorian rules (from memory): February 2023 has 28 days, April 30; neither rolls over into the next month.
    expect(parseIsoTime('2023-02-29T10:00:00.000Z')).toBeUndefined();
    expect(parseIsoTime('2026-04-31T10:00:00.000Z')).toBeUndefined();
    expect(parseIsoTime('2026-03-01T24:00:00.000Z')).toBeUndefined();
  });

  it('takes a time without offset as UTC, whatever the machine zone (ISO 8601 leaves it local; Bellgate chooses UTC)', () => {
    expect(parseIsoTime('2026-03-01T10:00:00')).toBe(Date.UTC(2026, 2, 1, 10));
    expect(parseIsoTime('2026-03-01 10:00')).toBe(Date.UTC(2026, 2, 1, 10));
  });

  it('refuses impossible dates by the Gregorian rules and non-ISO text', () => {
    expect(parseIsoTime('2024-02-29')).toBe(Date.UTC(2024, 1, 29)); // 2024 is a leap year
    expect(parseIsoTime('2023-02-29')).toBeUndefined(); // 2023 is not
    expect(parseIsoTime('1900-02-29')).toBeUndefined(); // century not divisible by 400
    expect(parseIsoTime('2000-02-29')).toBe(Date.UTC(2000, 1, 29)); // divisible by 400
    for (const bad of [
      '2026-13-01',
      '2026-04-31',
      '2026-03-01T24:00:00Z',
      '2026-03-01T10:61Z',
      'March 1, 2026',
      '1772355600',
      '',
      '2026-03-01T10:00:00+25:00',
    ]) {
      expect(parseIsoTime(bad)).toBeUndefined();
    }
  });

  it('normalizes to UTC with milliseconds', () => {
    expect(normalizeIsoTime('1996-12-19T16:39:57-08:00')).toBe('1996-12-20T00:39:57.000Z');
    expect(normalizeIsoTime('nope')).toBeUndefined();
  });
});
