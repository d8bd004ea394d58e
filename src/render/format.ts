import type {Frequency} from '../time/period.js';
import {isoWeekOf, periodStartDay} from '../time/period.js';
import {resolveLocale} from './locale.js';

/**
 * Number and period formatting for the report text and tables, following the pack's locale through
 * `Intl` with cached formatters (a new formatter per cell is ~7× slower). Non-finite numbers print as an
 * en dash so a missing figure never shows as `NaN`.
 */
export interface Formatter {
  locale: string;
  /** Value with magnitude-based decimals: ≥ 1 000 → 0, ≥ 10 → 1, else 2. */
  number(value: number | null | undefined, digits?: number): string;
  /** Signed percentage of a value already in percent, e.g. `+4.2%`. */
  percent(value: number | null | undefined, digits?: number): string;
  /** Unsigned percentage of a value already in percent, e.g. `91%`. */
  share(value: number | null | undefined, digits?: number): string;
  /** Short period label: `Oct 2026`, `Q3 2026`, `W41 2026`. */
  period(frequency: Frequency, index: number): string;
  /** Long period label: `October 2026`, `Q3 2026`, `week 41, 2026`. */
  periodLong(frequency: Frequency, index: number): string;
  /** Season name for a position in the year: month (`Jan`), quarter (`Q1`) or week (`W1`). */
  season(frequency: Frequency, position: number): string;
}

const DASH = '–';
const cache = new Map<string, Formatter>();

export function formatter(tag: string): Formatter {
  const locale = resolveLocale(tag);
  const hit = cache.get(locale);
  if (hit) return hit;
  const numberFormats = new Map<string, Intl.NumberFormat>();
  const nf = (key: string, options: Intl.NumberFormatOptions) => {
    let f = numberFormats.get(key);
    if (!f) numberFormats.set(key, (f = new Intl.NumberFormat(locale, options)));
    return f;
  };
  const fixed = (digits: number) => ({minimumFractionDigits: digits, maximumFractionDigits: digits});
  const monthShort = new Intl.DateTimeFormat(locale, {month: 'short', year: 'numeric', timeZone: 'UTC'});
  const monthLong = new Intl.DateTimeFormat(locale, {month: 'long', year: 'numeric', timeZone: 'UTC'});
  const monthOnly = new Intl.DateTimeFormat(locale, {month: 'short', timeZone: 'UTC'});
  const ms = (frequency: Frequency, index: number) => periodStartDay(frequency, index) * 86_400_000;
  const f: Formatter = {
    locale,
    number(value, digits) {
      if (value == null || !Number.isFinite(value)) return DASH;
      const d = digits ?? (Math.abs(value) >= 1000 ? 0 : Math.abs(value) >= 10 ? 1 : 2);
      return nf(`n${d}`, fixed(d)).format(value);
    },
    percent(value, digits = 1) {
      if (value == null || !Number.isFinite(value)) return DASH;
      return nf(`p${digits}`, {style: 'percent', signDisplay: 'exceptZero', ...fixed(digits)}).format(value / 100);
    },
    share(value, digits = 0) {
      if (value == null || !Number.isFinite(value)) return DASH;
      return nf(`s${digits}`, {style: 'percent', ...fixed(digits)}).format(value / 100);
    },
    period(frequency, index) {
      if (frequency === 'monthly') return monthShort.format(ms(frequency, index));
      if (frequency === 'quarterly') return `Q${(((index % 4) + 4) % 4) + 1} ${Math.floor(index / 4)}`;
      const {year, week} = isoWeekOf(index);
      return `W${week} ${year}`;
    },
    periodLong(frequency, index) {
      if (frequency === 'monthly') return monthLong.format(ms(frequency, index));
      if (frequency === 'quarterly') return `Q${(((index % 4) + 4) % 4) + 1} ${Math.floor(index / 4)}`;
      const {year, week} = isoWeekOf(index);
      return `W${week} ${year}`;
    },
    season(frequency, position) {
      if (frequency === 'monthly') return monthOnly.format(Date.UTC(2024, position, 1));
      if (frequency === 'quarterly') return `Q${position + 1}`;
      return `W${position + 1}`;
    },
  };
  cache.set(locale, f);
  return f;
}
