import type {SeriesAnalysis} from '../analyse/index.js';
import type {RatioParts} from '../derive/formulas/index.js';
import {ratioOfSums} from '../derive/formulas/index.js';
import {fiscalYearOf} from '../time/fiscal.js';
import type {Frequency} from '../time/period.js';
import {align} from './align.js';
import {calendarParts, spanSum, variance, type Variance} from './versusTarget.js';

/** A series or target on the calendar: values from `start` (targets include their values past the review period). */
export interface OnCalendar {
  start: number;
  values: ArrayLike<number>;
  kind: 'flow' | 'stock' | 'ratio';
  ratio: RatioParts | null;
}

/**
 * Actual against target for the review period and for the fiscal year to date.
 *
 * Year to date: flows are summed, stocks averaged, and ratios taken as the ratio of the summed numerator and
 * denominator (a target that is itself a ratio formula likewise; any other target of a ratio is averaged).
 * The calendar part is the actual minus the actual on an average calendar (see versusTarget.ts), summed like the
 * actual; ratios and stocks carry no calendar effect (the seasonal engine estimates none for them).
 * NaN policy: NaN in → NaN out (a missing target period gives NaN figures).
 */
export function seriesVersusTarget(
  actual: OnCalendar & {analysis: SeriesAnalysis},
  target: OnCalendar,
  {frequency, fiscalYearStart, better}: {frequency: Frequency; fiscalYearStart: number; better: 'higher' | 'lower'},
): {period: Variance; yearToDate: Variance} {
  const a = actual.analysis;
  const end = a.end;
  const fy = fiscalYearOf(frequency, end, fiscalYearStart);
  const span = end - fy.first + 1;
  const x = align(actual, fy.first, span);
  const t = align(target, fy.first, span);
  const adj = a.adjustment;
  const calendar = align(
    {
      start: a.start,
      values: calendarParts(Float64Array.from(a.original), adj?.calendar?.effect ?? null, adj?.model ?? 'additive'),
    },
    fy.first,
    span,
  );
  const last = span - 1;
  const period = variance(x[last], t[last], calendar[last], better);
  const aggregate = (s: OnCalendar, values: Float64Array): number => {
    if (s.kind === 'ratio' && s.ratio !== null) {
      const from = fy.first - s.start;
      return ratioOfSums(s.ratio.numerator, s.ratio.denominator, from, from + last);
    }
    const sum = spanSum(values, 0, last);
    return s.kind === 'flow' ? sum : sum / span;
  };
  const calendarYtd = actual.kind === 'flow' ? spanSum(calendar, 0, last) : 0;
  return {period, yearToDate: variance(aggregate(actual, x), aggregate(target, t), calendarYtd, better)};
}

/**
 * Fiscal year-to-date change of a ratio, in percent: the ratio of sums over the fiscal year so far against the
 * same span a year earlier. Why: a ratio is never summed or averaged over periods.
 * NaN policy: NaN when either span has a missing value or a zero denominator.
 */
export function ratioYearToDate(
  ratio: RatioParts,
  {start, end, frequency, fiscalYearStart}: {start: number; end: number; frequency: Frequency; fiscalYearStart: number},
  yearAgo: (index: number) => number,
): number {
  const fy = fiscalYearOf(frequency, end, fiscalYearStart);
  const span = end - fy.first;
  const now = ratioOfSums(ratio.numerator, ratio.denominator, fy.first - start, end - start);
  const before = yearAgo(fy.first) - start;
  const then = ratioOfSums(ratio.numerator, ratio.denominator, before, before + span);
  return then > 0 && Number.isFinite(now) ? (now / then - 1) * 100 : NaN;
}
