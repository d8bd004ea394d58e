import type {Frequency} from '../time/period.js';
import {isoWeekOf, periodStartDay} from '../time/period.js';

/**
 * Number, percent and period formatting for callout sentences, following the pack's locale through `Intl`.
 *
 * Formatters are built once per locale and cached (building an `Intl.NumberFormat` costs far more than using
 * one). Non-finite numbers print as an en dash, so a missing figure never reads `NaN`.
 *
 * Conventions: values get magnitude-based decimals (≥ 100 → 0, ≥ 10 → 1, else 2) unless the unit is `%`
 * (1 decimal); percentage changes carry a sign (`+3.2%`); changes of rates are in percentage points
 * (`+0.4 pp`); months read `October 2026` in the locale, quarters `Q3 2026`, weeks `week 41 of 2026`.
 */
export interface NarrateFormat {
  locale: string;
  /** Plain number with magnitude-based decimals, or `digits` decimals. */
  number(value: number, digits?: number): string;
  /** Value with its unit: `2,025 EUR k`, `5.2%`, `69,782 visits`. */
  value(value: number, unit: string | null): string;
  /** A range with one unit and the same decimals at both ends: `2,000 to 2,200 EUR k`, `4.8 to 5.8%`. */
  range(low: number, high: number, unit: string | null): string;
  /** Signed value with its unit: `+340 EUR k`, `-12 visits` (percent units as points: `+0.4 pp`). */
  signed(value: number, unit: string | null): string;
  /** Signed percentage of a value already in percent: `+3.2%`, `−0.4%`. */
  percent(value: number, digits?: number): string;
  /** Unsigned percentage of a value already in percent: `3.2%`. */
  size(value: number, digits?: number): string;
  /** Signed change in percentage points: `+0.4 pp`. */
  points(value: number, digits?: number): string;
  /** `October 2026`, `Q3 2026`, `week 41 of 2026`. */
  period(frequency: Frequency, index: number): string;
  /** Day and month of a date: `31 March`. */
  dayMonth(year: number, month: number, day: number): string;
}

const DASH = '–';
const cache = new Map<string, NarrateFormat>();

/** The cached formatter for a BCP 47 locale tag (invalid tags fall back to `en-GB`). */
export function narrateFormat(tag: string): NarrateFormat {
  const hit = cache.get(tag);
  if (hit) return hit;
  const locale = supported(tag);
  const numberFormats = new Map<string, Intl.NumberFormat>();
  const nf = (key: string, options: Intl.NumberFormatOptions) => {
    let f = numberFormats.get(key);
    if (!f) numberFormats.set(key, (f = new Intl.NumberFormat(locale, options)));
    return f;
  };
  const fixed = (d: number) => ({minimumFractionDigits: d, maximumFractionDigits: d});
  const month = new Intl.DateTimeFormat(locale, {month: 'long', year: 'numeric', timeZone: 'UTC'});
  const day = new Intl.DateTimeFormat(locale, {month: 'long', day: 'numeric', timeZone: 'UTC'});
  const finite = (value: number, text: () => string) => (Number.isFinite(value) ? text() : DASH);
  const f: NarrateFormat = {
    locale,
    number: (value, digits) =>
      finite(value, () => {
        const d = digits ?? (Math.abs(value) >= 100 ? 0 : Math.abs(value) >= 10 ? 1 : 2);
        return nf(`n${d}`, fixed(d)).format(value);
      }),
    value: (value, unit) =>
      finite(value, () => {
        if (unit === '%') return nf('p1', {style: 'percent', ...fixed(1)}).format(value / 100);
        const text = f.number(value);
        return unit ? `${text} ${unit}` : text;
      }),
    range(low, high, unit) {
      if (!Number.isFinite(low) || !Number.isFinite(high)) return DASH;
      if (unit === '%') return `${f.number(low, 1)} to ${f.value(high, unit)}`;
      const top = Math.max(Math.abs(low), Math.abs(high));
      const d = top >= 100 ? 0 : top >= 10 ? 1 : 2;
      return `${f.number(low, d)} to ${f.number(high, d)}${unit ? ` ${unit}` : ''}`;
    },
    signed: (value, unit) =>
      finite(value, () => {
        if (unit === '%') return f.points(value);
        const d = Math.abs(value) >= 100 ? 0 : Math.abs(value) >= 10 ? 1 : 2;
        const text = nf(`sn${d}`, {signDisplay: 'exceptZero', ...fixed(d)}).format(value);
        return unit ? `${text} ${unit}` : text;
      }),
    percent: (value, digits = 1) =>
      finite(value, () =>
        nf(`s${digits}`, {style: 'percent', signDisplay: 'exceptZero', ...fixed(digits)}).format(value / 100),
      ),
    size: (value, digits = 1) =>
      finite(value, () => nf(`u${digits}`, {style: 'percent', ...fixed(digits)}).format(Math.abs(value) / 100)),
    points: (value, digits = 1) =>
      finite(value, () => `${nf(`pp${digits}`, {signDisplay: 'exceptZero', ...fixed(digits)}).format(value)} pp`),
    period(frequency, index) {
      if (frequency === 'monthly') return month.format(periodStartDay(frequency, index) * 86_400_000);
      if (frequency === 'quarterly') return `Q${(((index % 4) + 4) % 4) + 1} ${Math.floor(index / 4)}`;
      const {year, week} = isoWeekOf(index);
      return `week ${week} of ${year}`;
    },
    dayMonth: (year, m, d) => day.format(Date.UTC(year, m - 1, d)),
  };
  cache.set(tag, f);
  return f;
}

function supported(tag: string): string {
  try {
    return Intl.NumberFormat.supportedLocalesOf([tag]).length > 0 ? tag : 'en-GB';
  } catch {
    return 'en-GB';
  }
}
