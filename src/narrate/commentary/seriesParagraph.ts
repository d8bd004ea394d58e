import type {SeriesPlan} from '../../config/plan.js';
import type {SeriesAnalysis} from '../../analyse/types.js';
import {fiscalYears} from '../../time/fiscal.js';
import {periodsPerYear, yearAgo} from '../../time/period.js';
import {phaseWords, type Words} from '../../words/index.js';
import type {Callout} from '../types.js';
import {quotedLevel} from '../callouts/forecastOutlook.js';

/** A gap to target within this many percent reads "in line with" it (as in the outturn callout). */
const IN_LINE_PCT = 0.5;
/** At most this many sentences in a paragraph. */
const MAX_SENTENCES = 5;

export interface ParagraphInput {
  series: SeriesPlan;
  analysis: SeriesAnalysis;
  /** The series' ranked callouts (they tell which moves were unusual and whether the trend has just turned). */
  callouts: Callout[];
  words: Words;
}

/**
 * The opening paragraph of a series section: three to five sentences, by fixed rules, in this order —
 *
 * 1. the headline: the latest value and its change on a year earlier (noting when that change is unusual);
 * 2. for a short series (under three years), that every estimate is provisional;
 * 3. the underlying movement: the seasonally adjusted change on the previous period joined to the trend-cycle's
 *    direction and pace — "and" when they agree, "but" when they disagree, "while" when either is flat;
 *    a series that was not adjusted says so instead;
 * 4. the cycle: its phase and gap to the long-run trend, and a turning point dated within the last year;
 * 5. the outlook: the fiscal-year outturn against the target when there is one, else the next forecast with its
 *    range, else that no forecast was made;
 * 6. what is unusual: flagged values of the last two years, else a back-test that did worse than last year's figures.
 *
 * The series' name appears once, in the first sentence; later sentences say "the series" or "its". Sentences past
 * the fifth are left out (the callouts and charts still carry them). Pure and deterministic.
 */
export function seriesParagraph({series: s, analysis: a, callouts, words: w}: ParagraphInput): string {
  const isRate = s.unit === '%';
  const last = a.end - a.start;
  const ppy = periodsPerYear[a.frequency];
  const sentences: string[] = [headline()];
  const observed = a.original.filter(Number.isFinite).length;
  if (a.original.length < 3 * ppy) sentences.push(w.t('para.short', {observed: w.periods(a.frequency, observed)}));
  sentences.push(underlying());
  const cycle = cycleSentence();
  if (cycle) sentences.push(cycle);
  sentences.push(outlook());
  const unusual = unusualSentence();
  if (unusual) sentences.push(unusual);
  return sentences.slice(0, MAX_SENTENCES).join(' ');

  function headline(): string {
    const value = a.original[last];
    if (!Number.isFinite(value)) {
      return w.t('para.sentence', {text: w.t('para.headlineMissing', {label: s.label, period: w.periodLong(a.frequency, a.end)})});
    }
    const before = a.original[last - (a.end - yearAgo(a.frequency, a.end))];
    const change = isRate ? value - before : a.changes.yearOnYear;
    const text = w.t('para.headline', {
      label: s.label,
      stock: s.kind === 'stock' || isRate ? 'yes' : 'no',
      value: w.value(value, s.unit),
      period: w.periodLong(a.frequency, a.end),
      change: Number.isFinite(change) ? w.change(change, isRate) : 'none',
    });
    const unusualYoy = callouts.some((c) => c.rule === 'year-on-year' && c.severity !== 'info');
    return w.t('para.sentence', {text: unusualYoy ? `${text}${w.t('para.unusualYoy')}` : text});
  }

  function underlying(): string {
    const adj = a.adjustment;
    const direction = a.changes.trendDirection;
    if (!adj) {
      const trendKnown = a.cycle !== null && Number.isFinite(a.changes.trend);
      return `${w.t('para.notAdjustedPlain')}${trendKnown ? ` ${w.t('para.trendOnly', {direction})}` : ''}`;
    }
    const sa = adj.adjusted;
    const change = isRate ? sa[last] - sa[last - 1] : a.changes.periodOnPeriodAdjusted;
    const move = !Number.isFinite(change) || Math.abs(change) < 0.05 ? 'steady' : change > 0 ? 'up' : 'down';
    const first = w.t('para.adjusted', {
      move,
      size: Number.isFinite(change) ? w.magnitude(change, isRate) : '',
      previous: w.t('previous.period', {frequency: a.frequency}),
    });
    const turn = callouts.find((c) => c.rule === 'trend' && c.figures.periodsSinceTurn !== undefined);
    const trendUp = direction === 'rising';
    const second = turn
      ? w.t('para.trendTurned', {
          up: turn.figures.trendChange > 0 ? 'yes' : 'no',
          period: w.periodLong(a.frequency, a.end - turn.figures.periodsSinceTurn + 1),
        })
      : w.t('para.trend', {
          direction,
          rate: direction === 'flat' || !Number.isFinite(a.changes.trend) ? 'none' : w.share(a.changes.trend),
          per: w.t('per.period', {frequency: a.frequency}),
        });
    const agree = move === 'steady' || direction === 'flat' ? 'while' : (move === 'up') === trendUp ? 'and' : 'but';
    return w.t(`para.join.${agree}`, {first, second});
  }

  function cycleSentence(): string | null {
    const c = a.cycle;
    const gap = c?.gap[last];
    if (!c || gap === undefined || !Number.isFinite(gap)) return null;
    const first = w.t('para.cycle', {phase: phaseWords(w, c), gap: w.percent(gap)});
    const turn = [...c.turningPoints].reverse().find((tp) => tp.index <= last && last - tp.index < ppy);
    if (!turn) return w.t('para.sentence', {text: first});
    const second = w.t('para.turn', {
      provisional: turn.provisional ? 'yes' : 'no',
      type: w.t(`turn.${turn.type}`),
      period: w.periodLong(a.frequency, a.start + turn.index),
    });
    return w.t('para.join.and', {first, second});
  }

  function outlook(): string {
    const o = a.outturn;
    if (o && o.target !== null && o.gapPct !== null && Number.isFinite(o.gapPct) && Number.isFinite(o.total)) {
      const where = Math.abs(o.gapPct) < IN_LINE_PCT ? 'inline' : o.gapPct > 0 ? 'above' : 'below';
      // A fiscal year that ends with the review period has closed: its outturn is all actual.
      return w.t(o.periodsRemaining === 0 ? 'para.outturnClosed' : 'para.outturnTarget', {
        years: fiscalYears(o.fiscalYear),
        total: w.value(o.total, s.unit),
        where,
        gap: w.share(o.gapPct),
        target: w.value(o.target, s.unit),
      });
    }
    const f = a.forecast;
    const level = f ? quotedLevel(f) : null;
    if (!f || level === null || f.mean.length === 0 || !Number.isFinite(f.mean[0])) return w.t('para.noForecast');
    const key = String(level);
    return w.t('para.forecast', {
      period: w.periodLong(a.frequency, a.start + f.startOffset),
      mean: w.value(f.mean[0], s.unit),
      level: key,
      range: w.range(f.lower[key]?.[0] ?? NaN, f.upper[key]?.[0] ?? NaN, s.unit),
    });
  }

  function unusualSentence(): string | null {
    const recent = (a.adjustment?.outliers ?? []).filter((o) => o.index <= last && last - o.index < 2 * ppy);
    if (recent.length > 0) {
      const items = [...recent]
        .sort((x, y) => y.index - x.index)
        .map((o) => w.t('para.unusualItem', {period: w.periodLong(a.frequency, a.start + o.index), kind: w.t(`outlier.${o.kind}`)}));
      return w.t('para.unusual', {n: recent.length, list: w.list(items, 3)});
    }
    const b = a.forecast?.backtest;
    return b && Number.isFinite(b.mase) && b.mase > 1 ? w.t('para.backtest', {mase: w.number(b.mase, 2)}) : null;
  }
}
