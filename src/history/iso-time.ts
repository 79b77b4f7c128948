/**
 * Reads an ISO-8601 date or date-time ("2026-03-01", "2026-03-01T10:00:00.5+02:00",
 * "2026-03-01 10:00Z") as milliseconds since 1970 UTC. A time without an offset is taken as UTC,
 * so the answer never depends on the machine's time zone. Returns undefined for anything else,
 * including impossible dates such as 2026-02-30 (Date.parse would roll those over silently).
 *
 * @example parseIsoTime('2026-03-01T10:00:00+01:00') // 1772355600000 (09:00 UTC)
 */
export function parseIsoTime(text: string): number | undefined {
  // The canonical form Bellgate stores ("2026-03-01T10:00:00.000Z", toISOString): Date.parse reads
  // it exactly, and the round trip proves the text was that form (an impossible date such as
  // 2026-02-30 does not come back the same, and goes on to the checks below). A history holds one
  // per run, so this is the common case.
  if (text.length === 24 && text.charCodeAt(23) === 0x5a) {
    const ms = Date.parse(text);
    if (!Number.isNaN(ms) && new Date(ms).toISOString() === text) return ms;
  }
  const m =
    /^(\d{4})-(\d{2})-(\d{2})(?:[T ](\d{2}):(\d{2})(?::(\d{2})(\.\d{1,9})?)?)?\s*(Z|[+-]\d{2}(?::?\d{2})?)?$/i.exec(
      text.trim(),
    );
  if (!m) return undefined;
  const [, y, mo, d, h = '00', mi = '00', s = '00', frac = '', zone = 'Z'] = m;
  const day = Date.UTC(Number(y), Number(mo) - 1, Number(d));
  const check = new Date(day);
  if (
    check.getUTCFullYear() !== Number(y) ||
    check.getUTCMonth() !== Number(mo) - 1 ||
    check.getUTCDate() !== Number(d)
  )
    return undefined;
  if (Number(h) > 23 || Number(mi) > 59 || Number(s) > 59) return undefined;
  let offset = 0;
  if (zone.toUpperCase() !== 'Z') {
    const z = /^([+-])(\d{2}):?(\d{2})?$/.exec(zone);
    if (!z || Number(z[2]) > 23 || Number(z[3] ?? 0) > 59) return undefined;
    offset = (z[1] === '-' ? -1 : 1) * (Number(z[2]) * 60 + Number(z[3] ?? 0)) * 60_000;
  }
  const ms = Math.floor(Number(`0${frac}`) * 1000);
  return day + ((Number(h) * 60 + Number(mi)) * 60 + Number(s)) * 1000 + ms - offset;
}

/**
 * The canonical form Bellgate stores: ISO-8601 in UTC with milliseconds, or undefined.
 *
 * @example normalizeIsoTime('2026-03-01 10:00') // '2026-03-01T10:00:00.000Z'
 */
export function normalizeIsoTime(text: string): string | undefined {
  const ms = parseIsoTime(text);
  return ms === undefined || !Number.isFinite(ms) || Math.abs(ms) > 8.64e15 ? undefined : new Date(ms).toISOString();
}

/**
 * Whether an ISO-8601 text gives a time of day without a zone ("2026-03-01T10:00:00"): another
 * instant on every machine, so imports refuse it rather than guess. A date alone (midnight UTC)
 * or a time with Z or an offset is fine.
 * @example lacksZone('2026-03-01 10:00') // true
 */
export function lacksZone(text: string): boolean {
  return /^\s*\d{4}-\d{2}-\d{2}[T ]\d{2}:\d{2}(?::\d{2}(?:\.\d{1,9})?)?\s*$/i.test(text);
}
