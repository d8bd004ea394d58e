import {resolveLocale} from '../words/index.js';

/**
 * d3 number and time format definitions for vega, built from `Intl` for a BCP 47 locale, so chart axes
 * use the same decimal mark, grouping and month names as the report's tables.
 *
 * Supported: any locale Node's ICU knows (tested: en-GB, en-US, de-DE, fr-FR); an unknown tag falls
 * back to en-GB. Results are cached per locale. Pure apart from the cache.
 */
export interface NumberLocale {
  decimal: string;
  thousands: string;
  grouping: number[];
  currency: [string, string];
  minus: string;
}

export interface TimeLocale {
  dateTime: string;
  date: string;
  time: string;
  periods: [string, string];
  days: string[];
  shortDays: string[];
  months: string[];
  shortMonths: string[];
}

export interface VegaLocale {
  number: NumberLocale;
  time: TimeLocale;
}

const cache = new Map<string, VegaLocale>();

/** Number and time definitions for vega's View `locale` option. */
export function vegaLocale(tag: string): VegaLocale {
  const locale = resolveLocale(tag);
  const hit = cache.get(locale);
  if (hit) return hit;
  const parts = new Intl.NumberFormat(locale).formatToParts(-12345.6);
  const part = (type: string, fallback: string) => parts.find((p) => p.type === type)?.value ?? fallback;
  const month = (style: 'long' | 'short') => {
    const f = new Intl.DateTimeFormat(locale, {month: style, timeZone: 'UTC'});
    return Array.from({length: 12}, (_, m) => f.format(Date.UTC(2024, m, 1)));
  };
  // 2024-01-01 was a Monday; d3 lists days from Sunday.
  const day = (style: 'long' | 'short') => {
    const f = new Intl.DateTimeFormat(locale, {weekday: style, timeZone: 'UTC'});
    return Array.from({length: 7}, (_, d) => f.format(Date.UTC(2023, 11, 31 + d)));
  };
  const result: VegaLocale = {
    number: {
      decimal: part('decimal', '.'),
      thousands: part('group', ','),
      grouping: grouping(locale),
      currency: ['', ''],
      minus: part('minusSign', '-'),
    },
    time: {
      dateTime: '%x, %X',
      date: '%d/%m/%Y',
      time: '%H:%M:%S',
      periods: ['AM', 'PM'],
      days: day('long'),
      shortDays: day('short'),
      months: month('long'),
      shortMonths: month('short'),
    },
  };
  cache.set(locale, result);
  return result;
}

/**
 * d3's digit grouping for a locale, read from how `Intl` groups 1234567890: the sizes of the groups from the
 * right, the last repeating (`[3]` for en-GB and de-DE; `[3, 2]` for en-IN's 1,23,45,67,890).
 */
export function grouping(locale: string): number[] {
  const parts = new Intl.NumberFormat(locale, {useGrouping: true}).formatToParts(1234567890);
  const sizes = parts.filter((p) => p.type === 'integer').map((p) => p.value.length).reverse();
  if (sizes.length < 2) return [3];
  const groups = sizes.slice(0, -1);
  return groups.length > 1 && groups[1] !== groups[0] ? [groups[0], groups[1]] : [groups[0]];
}
