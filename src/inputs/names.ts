import { InputError } from '../errors/input-error.js';

/** Longest metric name accepted, in characters (code points). */
export const MAX_NAME_LENGTH = 512;

// C0 controls, DEL and C1 controls: they break terminals, log lines and markdown tables.
const CONTROL = /[\u0000-\u001f\u007f-\u009f]/u;
// Bidirectional embeddings/overrides and isolates: they make a name read differently from what it is
// ("Trojan Source", CVE-2021-42574), so a report could show a reviewer the wrong metric.
const BIDI = /[\u202a-\u202e\u2066-\u2069]/u;

/**
 * Checks one metric name and returns it unchanged. The rule, the same for every format:
 * - not empty (and not only whitespace);
 * - at most 512 characters (code points);
 * - no control characters (U+0000-001F, U+007F-009F);
 * - no bidirectional override or isolate characters (U+202A-202E, U+2066-2069).
 * Any other text is a valid name, `__proto__` and `constructor` included: names only ever key Maps.
 * @throws InputError naming the place and the offending character.
 * @example checkMetricName('route/match-static', 'bench.json:3') // 'route/match-static'
 */
export function checkMetricName(name: string, where?: string): string {
  if (name.trim() === '') {
    throw new InputError('metric name is empty', { where, fix: 'give every metric a non-empty name' });
  }
  const length = countCodePoints(name);
  if (length > MAX_NAME_LENGTH) {
    throw new InputError(
      `metric name is ${length} characters long, more than the ${MAX_NAME_LENGTH} allowed ("${name.slice(0, 40)}...")`,
      { where, fix: `shorten the name to at most ${MAX_NAME_LENGTH} characters` },
    );
  }
  const bad = CONTROL.exec(name) ?? BIDI.exec(name);
  if (bad) {
    const code = bad[0].codePointAt(0)!.toString(16).toUpperCase().padStart(4, '0');
    const kind = CONTROL.test(bad[0]) ? 'a control character' : 'a bidirectional override character';
    throw new InputError(`metric name ${JSON.stringify(name)} contains ${kind} (U+${code})`, {
      where,
      fix: 'remove control and bidirectional formatting characters from metric names',
    });
  }
  return name;
}

function countCodePoints(text: string): number {
  let count = 0;
  for (let i = 0; i < text.length; i++) {
    const c = text.charCodeAt(i);
    // A high surrogate followed by a low one is one character.
    if (c >= 0xd800 && c <= 0xdbff && i + 1 < text.length) {
      const d = text.charCodeAt(i + 1);
      if (d >= 0xdc00 && d <= 0xdfff) i++;
    }
    count++;
  }
  return count;
}

/** Longest unit accepted, in UTF-16 units. */
export const MAX_UNIT_LENGTH = 64;

/**
 * Checks a unit string with the same character rule as names (no control or bidirectional
 * formatting characters) and a length of at most 64: units are printed beside every value.
 * @throws InputError naming the place.
 * @example checkUnit('ns/op', 'b.txt:3') // 'ns/op'
 */
export function checkUnit(unit: string, where?: string): string {
  if (unit.length > MAX_UNIT_LENGTH || CONTROL.test(unit) || BIDI.test(unit)) {
    throw new InputError(
      `unit ${JSON.stringify(unit.slice(0, 80))} is longer than ${MAX_UNIT_LENGTH} characters or contains control or bidirectional formatting characters`,
      {
        where,
        fix: 'write the unit as short plain text such as ms, B or ns/op',
      },
    );
  }
  return unit;
}
