import {FLAT_TREND_PERCENT, FLAT_TREND_POINTS, trendSign} from '../../analyse/trendSign.js';
import {periodsPerYear} from '../../time/period.js';
import {chartId, type Rule} from '../context.js';
import {robustZ} from '../robustZ.js';
import * as say from '../wording.js';


/**
 * Direction of the trend-cycle and whether it has just turned, set against the latest adjusted move:
 *
 * - turn (watch): the trend's per-period change switched sign within the last quarter of a year
 *   (3 months, 1 quarter, 13 weeks; at least 2 periods) after moving the other way for at least as long;
 * - blip (info): the latest adjusted change goes against a trend that keeps its direction;
 * - otherwise (info): the trend's direction and its latest per-period change.
 */
export const trendRule: Rule = {
  name: 'trend',
  run({analysis: a, series: s, fmt, isRate}) {
    const trend = a.adjustment?.trend ?? a.cycle?.trend;
    if (!trend) return [];
    const last = a.end - a.start;
    const step = (x: ArrayLike<number>, i: number) => (isRate ? x[i] - x[i - 1] : (x[i] / x[i - 1] - 1) * 100);
    const flat = isRate ? FLAT_TREND_POINTS : FLAT_TREND_PERCENT;
    const steps: number[] = [NaN];
    for (let i = 1; i <= last; i++) steps.push(step(trend, i));
    const trendChange = steps[last];
    if (!Number.isFinite(trendChange)) return [];
    const sign = (x: number) => trendSign(x, flat);
    const per = say.periodName(a.frequency);
    const chart = chartId(s.id, 'overview');
    const z = robustZ(steps.slice(1, last), trendChange);
    const base = {figures: {trendChange}, chart, periodsAgo: 0};

    const recent = Math.max(2, Math.round(periodsPerYear[a.frequency] / 4));
    const current = sign(trendChange);
    let j = last;
    while (j > 0 && sign(steps[j]) === current) j--;
    const since = last - j;
    let k = j;
    while (k > 0 && sign(steps[k]) === -current) k--;
    const before = j - k;
    if (current !== 0 && since <= recent && before >= recent) {
      return [
        {
          ...base,
          key: null,
          severity: 'watch',
          text: say.trendTurn({
            label: s.label,
            up: current > 0,
            turnedIn: fmt.period(a.frequency, a.start + j + 1),
            before: say.periods(a.frequency, before),
          }),
          figures: {trendChange, periodsSinceTurn: since, periodsBefore: before},
          magnitude: Math.min(10, before / recent),
          periodsAgo: since - 1,
        },
      ];
    }

    const sa = a.adjustment?.adjusted;
    const change = sa && last >= 1 ? step(sa, last) : NaN;
    if (current !== 0 && sign(change) === -current) {
      return [
        {
          ...base,
          key: null,
          severity: 'info',
          text: say.trendBlip({
            fmt,
            label: s.label,
            period: fmt.period(a.frequency, a.end),
            change,
            trendChange,
            isRate,
            per,
          }),
          figures: {trendChange, change},
          magnitude: 1,
        },
      ];
    }
    const annualised = isRate ? null : a.changes.trendAnnualised;
    return [
      {
        ...base,
        key: null,
        severity: 'info',
        text: say.trendSteady({
          fmt,
          label: s.label,
          direction: current > 0 ? 'rising' : current < 0 ? 'falling' : 'flat',
          change: trendChange,
          isRate,
          per,
          annualised,
        }),
        figures: {trendChange, ...(annualised !== null && Number.isFinite(annualised) ? {annualised} : {})},
        magnitude: Number.isFinite(z) ? Math.min(Math.abs(z), 2) : 0,
      },
    ];
  },
};
