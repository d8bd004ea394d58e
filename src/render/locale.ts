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

/** The locale tag we will actually use: `tag` when Intl supports it, else `en-GB`. */
export function resolveLocale(tag: string): string {
  try {
    return Intl.NumberFormat.supportedLocalesOf([tag]).length > 0 ? tag : 'en-GB';
  } catch {
    return 'en-GB';
  }
}

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
      grouping: [3],
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
