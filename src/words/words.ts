import {IntlMessageFormat} from 'intl-messageformat';
import {isoWeekOf, periodStartDay, type Frequency} from '../time/period.js';
import {catalogs} from './catalog/index.js';
import type {MessageKey} from './catalog/en.js';
import {languageOf, type Language} from './language.js';

/** Values a message takes: preformatted strings, and numbers for `plural` (strings or numbers for `select`). */
export type MessageValues = Record<string, string | number>;

/**
 * The words and numbers of one report: every message in the pack's language and every number, percentage and
 * period in the pack's locale, through one formatter with one rounding rule. Built once per locale tag and cached
 * (building an `Intl.NumberFormat` costs far more than using one).
 *
 * The rounding rule, for values shown without fixed decimals: |v| ≥ 1 000 → 0 decimals, ≥ 10 → 1, else 2
 * (a sentence and a table print 250.4 alike). Percentages have 1 decimal, percentage points 1 (2 below 0.095 pp,
 * so a small move never reads 0.0). Non-finite numbers print as an en dash, so a missing figure never reads `NaN`.
 *
 * Periods: months by `Intl` (`Oct 2026` in tables, `October 2026` in sentences), quarters and weeks by the
 * catalogue (`Q3 2026`, `W41 2026` in English; `Q3 2026`, `KW 41/2026` in German; `T3 2026`, `S41 2026` in French),
 * the same form in tables and sentences.
 */
export interface Words {
  language: Language;
  /** The locale numbers and dates follow (the pack's, resolved by `Intl`). */
  locale: string;
  /** The message `key` with its `values`; throws when a value is missing. */
  t(key: MessageKey, values?: MessageValues): string;
  /** Plain number with the one rounding rule, or `digits` decimals. */
  number(value: number | null | undefined, digits?: number): string;
  /** Value with its unit: `2,025 EUR k`, `5.2%` (unit `%`), `69,782`. */
  value(value: number | null | undefined, unit: string | null): string;
  /** Range with the same decimals at both ends and one unit: `2,000 to 2,200 EUR k`. */
  range(low: number, high: number, unit: string | null): string;
  /** Signed value with its unit (percent units as points): `+340 EUR k`, `+0.4 pp`. */
  signed(value: number, unit: string | null): string;
  /** Signed percentage of a value already in percent: `+3.2%`. */
  percent(value: number | null | undefined, digits?: number): string;
  /** Unsigned percentage of a value already in percent: `3.2%`. */
  share(value: number | null | undefined, digits?: number): string;
  /** Signed change in percentage points: `+0.4 pp`. */
  points(value: number, digits?: number): string;
  /** A change as a signed percentage, or in percentage points for rates. */
  change(value: number, isRate: boolean): string;
  /** An unsigned change as a percentage, or in percentage points for rates. */
  magnitude(value: number, isRate: boolean): string;
  /** `p = 0.031`, `p < 0.001`. */
  pValue(p: number): string;
  /** Short period label for tables and axes: `Oct 2026`, `Q3 2026`, `W41 2026`. */
  period(frequency: Frequency, index: number): string;
  /** Period label for sentences and headings: `October 2026`, `Q3 2026`, `W41 2026`. */
  periodLong(frequency: Frequency, index: number): string;
  /** Season name for a position in the year: `Jan`, `Q1`, `W1`. */
  season(frequency: Frequency, position: number): string;
  /** Day and month of a date: `31 March`. */
  dayMonth(year: number, month: number, day: number): string;
  /** `a`, `a and b`, `a, b and c`; more than `max` items end in `n more`. */
  list(items: string[], max?: number): string;
  /** `1 month`, `5 months`, `2 quarters`. */
  periods(frequency: Frequency, n: number): string;
}

const DASH = '–';
const cache = new Map<string, Words>();

/** The words of a pack's locale tag (cached). */
export function wordsFor(tag: string): Words {
  const hit = cache.get(tag);
  if (hit) return hit;
  const language = languageOf(tag);
  const {locale} = language;
  const catalog = catalogs[language.code];
  const compiled = new Map<MessageKey, IntlMessageFormat>();
  const numberFormats = new Map<string, Intl.NumberFormat>();
  const nf = (key: string, options: Intl.NumberFormatOptions) => {
    let f = numberFormats.get(key);
    if (!f) numberFormats.set(key, (f = new Intl.NumberFormat(locale, options)));
    return f;
  };
  const fixed = (d: number) => ({minimumFractionDigits: d, maximumFractionDigits: d});
  const decimals = (v: number) => (Math.abs(v) >= 1000 ? 0 : Math.abs(v) >= 10 ? 1 : 2);
  const finite = (v: number | null | undefined): v is number => v != null && Number.isFinite(v);
  const monthShort = new Intl.DateTimeFormat(locale, {month: 'short', year: 'numeric', timeZone: 'UTC'});
  const monthLong = new Intl.DateTimeFormat(locale, {month: 'long', year: 'numeric', timeZone: 'UTC'});
  const monthOnly = new Intl.DateTimeFormat(locale, {month: 'short', timeZone: 'UTC'});
  const day = new Intl.DateTimeFormat(locale, {month: 'long', day: 'numeric', timeZone: 'UTC'});
  const listFormat = new Intl.ListFormat(language.fallback ? 'en-GB' : locale, {type: 'conjunction'});
  const ms = (frequency: Frequency, index: number) => periodStartDay(frequency, index) * 86_400_000;
  const quarterOrWeek = (frequency: Frequency, index: number, long: boolean) => {
    if (frequency === 'quarterly') {
      const values = {quarter: (((index % 4) + 4) % 4) + 1, year: String(Math.floor(index / 4))};
      return w.t(long ? 'period.quarterLong' : 'period.quarter', values);
    }
    const {year, week} = isoWeekOf(index);
    return w.t('period.week', {week: String(week), year: String(year)});
  };
  const w: Words = {
    language,
    locale,
    t(key, values = {}) {
      let message = compiled.get(key);
      if (!message) {
        const source = catalog[key];
        if (source === undefined) throw new Error(`no message ${key} in ${language.code}`);
        compiled.set(key, (message = new IntlMessageFormat(source, language.fallback ? 'en-GB' : locale)));
      }
      return String(message.format(values));
    },
    number: (value, digits) => (finite(value) ? nf(`n${digits ?? decimals(value)}`, fixed(digits ?? decimals(value))).format(value) : DASH),
    value(value, unit) {
      if (!finite(value)) return DASH;
      if (unit === '%') return nf('p1', {style: 'percent', ...fixed(1)}).format(value / 100);
      return unit ? w.t('unit.withUnit', {value: w.number(value), unit}) : w.number(value);
    },
    range(low, high, unit) {
      if (!Number.isFinite(low) || !Number.isFinite(high)) return DASH;
      if (unit === '%') return w.t('unit.range', {low: w.number(low, 1), high: w.value(high, unit)});
      const d = decimals(Math.max(Math.abs(low), Math.abs(high)));
      const text = w.t('unit.range', {low: w.number(low, d), high: w.number(high, d)});
      return unit ? w.t('unit.withUnit', {value: text, unit}) : text;
    },
    signed(value, unit) {
      if (!Number.isFinite(value)) return DASH;
      if (unit === '%') return w.points(value);
      const d = decimals(value);
      const text = nf(`sn${d}`, {signDisplay: 'exceptZero', ...fixed(d)}).format(value);
      return unit ? w.t('unit.withUnit', {value: text, unit}) : text;
    },
    percent: (value, digits = 1) =>
      finite(value) ? nf(`s${digits}`, {style: 'percent', signDisplay: 'exceptZero', ...fixed(digits)}).format(value / 100) : DASH,
    share: (value, digits = 1) =>
      finite(value) ? nf(`u${digits}`, {style: 'percent', ...fixed(digits)}).format(Math.abs(value) / 100) : DASH,
    points: (value, digits) => {
      if (!Number.isFinite(value)) return DASH;
      const d = digits ?? (Math.abs(value) < 0.095 ? 2 : 1);
      return w.t('unit.points', {value: nf(`pp${d}`, {signDisplay: 'exceptZero', ...fixed(d)}).format(value)});
    },
    change: (value, isRate) => (isRate ? w.points(value) : w.percent(value)),
    magnitude: (value, isRate) =>
      isRate ? w.points(Math.abs(value)).replace(/^\+/, '') : w.share(value),
    pValue: (p) =>
      !Number.isFinite(p) ? DASH : p < 0.001 ? w.t('p.below', {value: w.number(0.001, 3)}) : w.t('p.equal', {value: w.number(p, 3)}),
    period: (frequency, index) =>
      frequency === 'monthly' ? monthShort.format(ms(frequency, index)) : quarterOrWeek(frequency, index, false),
    periodLong: (frequency, index) =>
      frequency === 'monthly' ? monthLong.format(ms(frequency, index)) : quarterOrWeek(frequency, index, true),
    season(frequency, position) {
      if (frequency === 'monthly') return monthOnly.format(Date.UTC(2024, position, 1));
      if (frequency === 'quarterly') return w.t('season.quarter', {quarter: position + 1});
      return w.t('season.week', {week: String(position + 1)});
    },
    dayMonth: (year, m, d) => day.format(Date.UTC(year, m - 1, d)),
    list(items, max = 4) {
      const shown = items.length > max ? [...items.slice(0, max - 1), w.t('count.more', {n: w.number(items.length - (max - 1), 0)})] : items;
      return listFormat.format(shown);
    },
    periods: (frequency, n) => w.t('count.periods', {frequency, n}),
  };
  cache.set(tag, w);
  return w;
}
