/** Formatters by time zone, each giving the civil fields of an instant in that zone. */
const formatters = new Map<string, Intl.DateTimeFormat>();
/** Offsets (minutes) by zone and quarter-hour of UTC time: zone rules change offsets only at such boundaries. */
const offsets = new Map<string, Map<number, number>>();
const QUARTER_HOUR = 15 * 60_000;

/** Whether `Intl` knows a time zone name such as `Europe/Berlin` or `UTC`. */
export function isTimeZone(name: string): boolean {
  try {
    new Intl.DateTimeFormat('en-GB', {timeZone: name});
    return true;
  } catch {
    return false;
  }
}

/**
 * Offset of a time zone from UTC, in minutes, at a UTC instant (epoch ms): local time = UTC + offset.
 *
 * Why: a timestamp written with an offset (`2026-10-31T23:30:00-05:00`) names an instant; the day it
 * belongs to depends on the source's time zone, which `Intl.DateTimeFormat` knows from the IANA database
 * shipped with Node. No `Date` getter in local time is used, so `TZ` of the process has no effect.
 *
 * Complexity: one `formatToParts` per zone and UTC quarter-hour, cached.
 */
export function zoneOffset(timeZone: string, utcMs: number): number {
  if (timeZone === 'UTC') return 0;
  let byZone = offsets.get(timeZone);
  if (byZone === undefined) offsets.set(timeZone, (byZone = new Map()));
  const slot = Math.floor(utcMs / QUARTER_HOUR);
  let offset = byZone.get(slot);
  if (offset !== undefined) return offset;
  let f = formatters.get(timeZone);
  if (f === undefined) {
    f = new Intl.DateTimeFormat('en-GB', {
      timeZone,
      hourCycle: 'h23',
      year: 'numeric',
      month: 'numeric',
      day: 'numeric',
      hour: 'numeric',
      minute: 'numeric',
    });
    formatters.set(timeZone, f);
  }
  const at = slot * QUARTER_HOUR;
  const part = (parts: Intl.DateTimeFormatPart[], type: string) => Number(parts.find((p) => p.type === type)!.value);
  const parts = f.formatToParts(new Date(at));
  const local = Date.UTC(
    part(parts, 'year'),
    part(parts, 'month') - 1,
    part(parts, 'day'),
    part(parts, 'hour'),
    part(parts, 'minute'),
  );
  offset = Math.round((local - at) / 60_000);
  byZone.set(slot, offset);
  return offset;
}
