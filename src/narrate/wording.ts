import type {Frequency} from '../time/period.js';
import type {NarrateFormat} from './format.js';

/**
 * Every callout sentence, one function per message (the only place wording lives).
 *
 * Rules compute the numbers; these functions only put them into words. Sentences avoid verbs that must agree
 * with the series label (a label may be singular or plural: "Net sales", "Shop footfall"), so the label is
 * used with past-tense verbs or as an object. Numbers, percentages and periods come pre-formatted by
 * {@link NarrateFormat} in the pack's locale.
 */

/** `1 month`, `3 months`, `1 value`, `2 values`. */
export function count(n: number, singular: string, plural = `${singular}s`): string {
  return `${n} ${n === 1 ? singular : plural}`;
}

/** `month`, `quarter` or `week`: the name of one period. */
export function periodName(frequency: Frequency): string {
  return frequency === 'monthly' ? 'month' : frequency === 'quarterly' ? 'quarter' : 'week';
}

/** `1 month`, `5 months`, `2 quarters`. */
export function periods(frequency: Frequency, n: number): string {
  return count(n, periodName(frequency));
}

/** `a`, `a and b`, `a, b and c`, `a, b, c and 2 more`. */
export function list(items: string[], max = 4): string {
  const shown = items.length > max ? [...items.slice(0, max - 1), `${items.length - (max - 1)} more`] : items;
  return shown.length <= 1 ? (shown[0] ?? '') : `${shown.slice(0, -1).join(', ')} and ${shown[shown.length - 1]}`;
}

/** A signed change as percent, or percentage points for rates (2 decimals below 0.1 pp, so it never reads 0.0). */
export function change(fmt: NarrateFormat, value: number, isRate: boolean): string {
  return isRate ? fmt.points(value, Math.abs(value) < 0.095 ? 2 : 1) : fmt.percent(value);
}

/** An unsigned change as percent, or percentage points for rates. */
function magnitude(fmt: NarrateFormat, value: number, isRate: boolean): string {
  return isRate ? fmt.points(Math.abs(value)).replace(/^\+/, '') : fmt.size(value);
}

/** The sentence added to a change that is unusually large for the series (watch or alert). */
function unusual(flag: boolean): string {
  return flag ? ' That is an unusually large move for this series.' : '';
}

/** ` (+15.4% annualised)`, or nothing when there is no annualised rate. */
function annualised(fmt: NarrateFormat, value: number | null): string {
  return value !== null && Number.isFinite(value) ? ` (${fmt.percent(value)} annualised)` : '';
}

export function yearOnYear(a: {
  label: string;
  stock: boolean;
  value: string;
  period: string;
  change: string;
  yearAgo: string;
  unusual: boolean;
}): string {
  const verb = a.stock ? 'stood at' : 'came to';
  return `${a.label} ${verb} ${a.value} in ${a.period}, ${a.change} on ${a.yearAgo}.${unusual(a.unusual)}`;
}

export function adjustedChange(a: {
  fmt: NarrateFormat;
  label: string;
  change: number;
  isRate: boolean;
  period: string;
  previous: string;
  annualised: number | null;
  unusual: boolean;
}): string {
  const {fmt} = a;
  const move =
    Math.abs(a.change) < 0.05
      ? 'held steady'
      : `${a.change > 0 ? 'rose' : 'fell'} ${magnitude(fmt, a.change, a.isRate)}`;
  const annual = annualised(fmt, a.annualised);
  return `Seasonally adjusted, ${a.label} ${move} in ${a.period} from ${a.previous}${annual}.${unusual(a.unusual)}`;
}

export function trendSteady(a: {
  fmt: NarrateFormat;
  label: string;
  direction: 'rising' | 'falling' | 'flat';
  change: number;
  isRate: boolean;
  per: string;
  annualised: number | null;
}): string {
  const rate = `${change(a.fmt, a.change, a.isRate)} a ${a.per}`;
  const annual = annualised(a.fmt, a.annualised);
  return `The trend of ${a.label} is ${a.direction}, ${rate}${annual}.`;
}

export function trendTurn(a: {label: string; up: boolean; turnedIn: string; before: string}): string {
  const before = a.up ? 'falling' : 'rising';
  return `The trend of ${a.label} turned ${a.up ? 'up' : 'down'} in ${a.turnedIn} after ${before} for ${a.before}.`;
}

export function trendBlip(a: {
  fmt: NarrateFormat;
  label: string;
  period: string;
  change: number;
  trendChange: number;
  isRate: boolean;
  per: string;
}): string {
  const move = a.change > 0 ? 'rise' : 'fall';
  const trend = a.trendChange > 0 ? 'rising' : 'falling';
  return (
    `The ${move} in ${a.label} in ${a.period} (${change(a.fmt, a.change, a.isRate)}, seasonally adjusted) goes against ` +
    `a ${trend} trend (${change(a.fmt, a.trendChange, a.isRate)} a ${a.per}): more likely a blip than a turn.`
  );
}

export function cyclePhase(a: {label: string; phase: string; gap: string}): string {
  return `For ${a.label}, the cycle is ${a.phase}: the gap to the long-run trend is ${a.gap}.`;
}

export function cyclePhaseChange(a: {label: string; from: string; to: string; period: string; gap: string}): string {
  return `For ${a.label}, the cycle moved from ${a.from} to ${a.to} in ${a.period}; the gap to the long-run trend is ${a.gap}.`;
}

export function turningPoint(a: {
  label: string;
  type: 'peak' | 'trough';
  period: string;
  ago: string;
  provisional: boolean;
}): string {
  return a.provisional
    ? `The cycle of ${a.label} may have passed a ${a.type} in ${a.period}, ${a.ago} ago (provisional: later data can still move or remove it).`
    : `The cycle of ${a.label} passed a ${a.type} in ${a.period}, ${a.ago} ago.`;
}

export function largeResidual(a: {
  label: string;
  period: string;
  kind: 'additive' | 'level-shift' | 'temporary';
  up: boolean;
  sigmas: string;
  size: string | null;
}): string {
  const dir = a.up ? 'above' : 'below';
  if (a.kind === 'level-shift') {
    return `${a.label} shifted ${a.up ? 'up' : 'down'} to a new level in ${a.period} (${a.sigmas} robust sigmas).`;
  }
  const what = a.kind === 'temporary' ? 'a temporary change' : 'a one-off';
  const size = a.size ? ` of about ${a.size}` : '';
  return `${a.period} stands out for ${a.label}: ${a.sigmas} robust sigmas ${dir} what trend and season explain, ${what}${size}.`;
}

export function workingDays(a: {label: string; period: string; up: boolean; size: string}): string {
  return `Calendar effects (trading days and holidays) ${a.up ? 'raised' : 'lowered'} ${a.label} in ${a.period} by about ${a.size} compared with an average period.`;
}

export function easter(a: {
  label: string;
  year: number;
  date: string;
  earlier: boolean;
  first: {period: string; change: string};
  second: {period: string; change: string};
}): string {
  return (
    `Easter ${a.year} fell on ${a.date}, ${a.earlier ? 'earlier' : 'later'} than on average: against an average year ` +
    `that moved ${a.label} by about ${a.first.change} in ${a.first.period} and ${a.second.change} in ${a.second.period}.`
  );
}

export function forecastOutlook(a: {
  label: string;
  level: number;
  next: {period: string; mean: string; range: string};
  last: {period: string; mean: string; range: string; ahead: string} | null;
  method: string;
}): string {
  const n = a.next;
  const head = `The forecast for ${a.label} is ${n.mean} for ${n.period} (${a.level}% range ${n.range})`;
  const tail = a.last
    ? ` and ${a.last.mean} for ${a.last.period}, ${a.last.ahead} ahead (${a.level}% range ${a.last.range})`
    : '';
  return `${head}${tail}; model: ${shortMethod(a.method)}.`;
}

/**
 * A forecast method's name for prose: a combination is named by its members' families (`a combination of ETS,
 * Theta and ARIMA`); the full name, with each member's settings, stays in the methods appendix.
 */
export function shortMethod(method: string): string {
  const inner = /^Combination \((.*)\)$/.exec(method)?.[1];
  if (inner === undefined) return method;
  const members: string[] = [];
  let depth = 0;
  let start = 0;
  for (let i = 0; i <= inner.length; i++) {
    const c = inner[i];
    if (c === '(') depth++;
    else if (c === ')') depth--;
    else if ((c === ',' && depth === 0) || i === inner.length) {
      members.push(inner.slice(start, i).trim());
      start = i + 1;
    }
  }
  const family = (m: string) => (m.startsWith('Damped') ? 'damped trend' : (/^(ETS|Theta|ARIMA)\b/.exec(m)?.[1] ?? m));
  const families = [...new Set(members.map(family))];
  return `a combination of ${list(families, families.length)}`;
}

export function outturn(a: {
  label: string;
  stock: boolean;
  fiscalYear: string;
  total: string;
  level: number;
  range: string;
  actual: string;
  forecast: string;
  target: {value: string; gap: number; gapText: string} | null;
}): string {
  const range = `(${a.level}% range ${a.range})`;
  const base = a.stock
    ? `On current forecasts, ${a.label} will end ${a.fiscalYear} at ${a.total} ${range}`
    : `On current forecasts, ${a.label} will total ${a.total} in ${a.fiscalYear} ${range}, from ${a.actual} of actuals and ${a.forecast} of forecast`;
  if (!a.target) return `${base}.`;
  const t = a.target;
  const where = Math.abs(t.gap) < 0.5 ? 'in line with' : `${t.gapText} ${t.gap > 0 ? 'above' : 'below'}`;
  return `${base}: ${where} the target of ${t.value}.`;
}

export function backtestWarning(a: {label: string; origins: string; mase: string}): string {
  return (
    `Treat the forecast for ${a.label} with care: in back-tests from ${a.origins} it was less accurate than ` +
    `repeating the same period of the previous year (MASE ${a.mase}; below 1 would beat that benchmark).`
  );
}

export function gaps(a: {label: string; count: number; periods: string; filled: number}): string {
  const head = `${count(a.count, 'value')} of ${a.label} ${a.count === 1 ? 'is' : 'are'} missing (${a.periods})`;
  if (a.filled === 0) return `${head}.`;
  const what = a.filled === a.count ? (a.count === 1 ? 'it' : 'them') : count(a.filled, 'value');
  return `${head}; the analysis filled ${what} in for estimation only.`;
}

export function latestMissing(a: {label: string; period: string}): string {
  return `There is no value of ${a.label} for ${a.period}, the review period.`;
}

export function notAdjusted(a: {label: string; reason: string}): string {
  return `No seasonal adjustment for ${a.label}: ${sentence(a.reason)}`;
}

export function seriesNote(a: {label: string; note: string}): string {
  return `Note on ${a.label}: ${sentence(a.note)}`;
}

export function revisionNumeric(a: {
  label: string;
  measure: 'original' | 'adjusted';
  period: string;
  since: string;
  up: boolean;
  size: string;
  from: string;
  to: string;
}): string {
  const what = a.measure === 'original' ? 'reported value' : 'seasonally adjusted figure';
  return `The ${what} of ${a.label} for ${a.period} was revised ${a.up ? 'up' : 'down'} by ${a.size} since the ${a.since} pack, from ${a.from} to ${a.to}.`;
}

export function revisionWords(a: {
  label: string;
  measure: 'trend-direction' | 'cycle-phase';
  period: string;
  since: string;
  from: string;
  to: string;
}): string {
  const what = a.measure === 'trend-direction' ? 'trend direction' : 'cycle phase';
  return `Since the ${a.since} pack, the ${what} of ${a.label} for ${a.period} changed from ${a.from} to ${a.to}.`;
}

export function trackingRecord(a: {
  label: string;
  checked: string;
  inside: number;
  level: number;
  share: string;
  mase: string | null;
}): string {
  const mase = a.mase ? `; running MASE ${a.mase}` : '';
  return `Forecasts of ${a.label} from earlier packs: ${a.checked} against actuals so far, ${a.inside} inside their ${a.level}% range (${a.share})${mase}.`;
}

export function forecastCheck(a: {
  label: string;
  period: string;
  publishedIn: string;
  forecast: string;
  actual: string;
  error: string;
  inside: boolean;
  level: number;
}): string {
  return (
    `The ${a.publishedIn} pack forecast ${a.forecast} of ${a.label} for ${a.period}; the actual came in at ${a.actual} ` +
    `(${a.error}), ${a.inside ? 'inside' : 'outside'} the ${a.level}% range.`
  );
}

/** Phase names of our own for the four cycle phases. */
export function phaseWords(phase: 'rising-above' | 'falling-above' | 'falling-below' | 'rising-below'): string {
  return {
    'rising-above': 'above trend and rising',
    'falling-above': 'above trend but falling',
    'falling-below': 'below trend and falling',
    'rising-below': 'below trend but rising',
  }[phase];
}

/** A note from the analysis as a sentence: trimmed, ending with a full stop. */
function sentence(text: string): string {
  const t = text.trim();
  return /[.!?]$/.test(t) ? t : `${t}.`;
}

/** "Net sales rose 4.2% on a year earlier in October 2026, driven by Shop sales, +3.1 points; Web subtracted 0.8." */
export function drivers(a: {
  label: string;
  /** Unsigned size of the total's year-on-year change, and its direction. */
  change: string;
  rose: boolean;
  period: string;
  driver: {label: string; points: string};
  against: {label: string; points: string; subtracted: boolean} | null;
}): string {
  const other = a.against
    ? `; ${a.against.label} ${a.against.subtracted ? 'subtracted' : 'added'} ${a.against.points}`
    : '';
  return `${a.label} ${a.rose ? 'rose' : 'fell'} ${a.change} on a year earlier in ${a.period}, driven by ${a.driver.label}, ${a.driver.points}${other}.`;
}

/** "Payroll costs came to 512 EUR k in October 2026, 3.1% above the target of 497 EUR k (unfavourable)." */
export function versusTarget(a: {
  label: string;
  /** The period's name, or null for the fiscal year to date. */
  span: string | null;
  actual: string;
  target: string;
  percent: string;
  above: boolean;
  favourable: boolean;
  calendar: string | null;
}): string {
  const when = a.span === null ? 'over the fiscal year to date' : `in ${a.span}`;
  const side = `${a.percent} ${a.above ? 'above' : 'below'} the target of ${a.target}`;
  const calendar =
    a.calendar === null ? '' : ` The calendar (working days and Easter) accounts for ${a.calendar} of it.`;
  return `${a.label} came to ${a.actual} ${when}, ${side} (${a.favourable ? 'favourable' : 'unfavourable'}).${calendar}`;
}
