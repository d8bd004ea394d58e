import type {SeriesPlan} from '../../config/plan.js';
import type {SeriesAnalysis} from '../../analyse/types.js';
import {fiscalYears} from '../../time/fiscal.js';
import type {MessageKey, Words} from '../../words/index.js';
import type {GroupResult} from '../../combine/index.js';
import type {Callout} from '../types.js';
import {mainDrivers} from '../callouts/drivers.js';

/** A gap to target within this many percent reads "in line with" it (as in the outturn callout). */
const IN_LINE_PCT = 0.5;
/** At most this many sentences. */
const MAX_SENTENCES = 6;
/** Alerts named in the surprises sentence. */
const NAMED_ALERTS = 2;

export interface PackParagraphInput {
  /** The visible series in pack order. */
  series: {plan: SeriesPlan; analysis: SeriesAnalysis}[];
  /** The pack's ranked callouts (headline list). */
  callouts: Callout[];
  /** Review period index. */
  period: number;
  words: Words;
  /** Groups with a total, whose contributions name the main drivers (combine stage); empty without them. */
  groups?: readonly GroupResult[];
}

/**
 * The opening paragraph of the summary page, four to six sentences on the review period as a whole, by fixed
 * rules: how many series stand above their level a year earlier and which grew most and least; for each group
 * with a total, the part that drove it most (its contribution in points); how many
 * trend-cycles rise, fall or stay flat; each series with a target against it at the fiscal year's end; the alerts
 * among the ranked callouts (the largest surprises), or that there are none; and how many next-period forecasts
 * point up or down. Pure and deterministic; ties go to the series first in the pack.
 */
export function packParagraph({series, callouts, period, words: w, groups = []}: PackParagraphInput): string {
  if (series.length === 0) return '';
  const frequency = series[0].analysis.frequency;
  const sentences: string[] = [];

  const withYoy = series.filter((s) => Number.isFinite(s.analysis.changes.yearOnYear));
  if (withYoy.length > 0) {
    const up = withYoy.filter((s) => s.analysis.changes.yearOnYear > 0).length;
    const ranked = [...withYoy].sort((x, y) => y.analysis.changes.yearOnYear - x.analysis.changes.yearOnYear);
    const best = ranked[0];
    const worst = ranked[ranked.length - 1];
    sentences.push(
      w.t('open.yoy', {
        period: w.periodLong(frequency, period),
        up,
        n: withYoy.length,
        best: withYoy.length > 1 ? best.plan.label : 'none',
        bestChange: w.percent(best.analysis.changes.yearOnYear),
        worst: worst.plan.label,
        worstChange: w.percent(worst.analysis.changes.yearOnYear),
      }),
    );
  }

  const labelOf = new Map(series.map((s) => [s.plan.id, s.plan.label]));
  for (const g of groups) {
    const {total, parts} = g.contributions.yearOnYear;
    const found = Number.isFinite(total) ? mainDrivers(total, parts) : null;
    if (found === null || !labelOf.has(g.total)) continue;
    sentences.push(
      w.t('open.drivers', {
        label: labelOf.get(g.total)!,
        rose: total >= 0 ? 'yes' : 'no',
        change: w.share(Math.abs(total)),
        driver: labelOf.get(found.driver.id) ?? found.driver.id,
        points: w.points(found.driver.points),
      }),
    );
  }

  const trended = series.filter((s) => s.analysis.adjustment !== null || s.analysis.cycle !== null);
  if (trended.length > 0) {
    const count = (d: string) => trended.filter((s) => s.analysis.changes.trendDirection === d).length;
    sentences.push(w.t('open.trend', {rising: count('rising'), falling: count('falling'), flat: count('flat')}));
  }

  // Fiscal years that close with the review period are told as closed, without "on current forecasts".
  let open = false;
  const targets = series.flatMap(({plan: s, analysis: a}) => {
    const o = a.outturn;
    if (!o || o.target === null || o.gapPct === null || !Number.isFinite(o.gapPct)) return [];
    const where = Math.abs(o.gapPct) < IN_LINE_PCT ? 'inline' : o.gapPct > 0 ? 'above' : 'below';
    const closed = o.periodsRemaining === 0;
    open ||= !closed;
    const values = {label: s.label, years: fiscalYears(o.fiscalYear), where, gap: w.share(o.gapPct)};
    return [w.t(closed ? 'open.targetItemClosed' : 'open.targetItem', values)];
  });
  if (targets.length > 0) {
    const list = w.list(targets);
    sentences.push(open ? w.t('open.target', {list}) : w.t('para.sentence', {text: list}));
  }

  const labels = new Map(series.map((s) => [s.plan.id, s.plan.label]));
  const alerts = callouts.filter((c) => c.severity === 'alert' && c.seriesId !== null && labels.has(c.seriesId));
  if (alerts.length > 0) {
    const items = alerts
      .slice(0, NAMED_ALERTS)
      .map((c) => w.t('open.surpriseItem', {label: labels.get(c.seriesId!)!, what: w.t(`rule.${c.rule}` as MessageKey)}));
    sentences.push(w.t('open.surprises', {n: alerts.length, list: w.list(items)}));
  } else {
    sentences.push(w.t('open.calm'));
  }

  const forecasts = series.filter(({analysis: a}) => {
    const latest = a.original[a.end - a.start];
    return a.forecast !== null && a.forecast.mean.length > 0 && Number.isFinite(a.forecast.mean[0]) && Number.isFinite(latest);
  });
  if (forecasts.length > 0) {
    const next = (a: SeriesAnalysis) => a.forecast!.mean[0] - a.original[a.end - a.start];
    sentences.push(
      w.t('open.outlook', {
        period: w.periodLong(frequency, period + 1),
        rising: forecasts.filter((s) => next(s.analysis) > 0).length,
        falling: forecasts.filter((s) => next(s.analysis) < 0).length,
      }),
    );
  }
  return sentences.slice(0, MAX_SENTENCES).join(' ');
}
