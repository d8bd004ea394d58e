import type {TopLevelSpec} from 'vega-lite';
import {ramp} from '../theme.js';
import {epoch, finite, round, timeX, frame, type ChartContext} from './common.js';
import {periodsPerYear} from '../../time/period.js';
import type {SeriesChart} from './seriesChart.js';

/** Contributions of a group's parts to its total's change, per period (see combine/contributions.ts). */
export interface ContributionsInput {
  start: number;
  /** One entry per period from `start`: the total's change (percent) and each part's contribution (points). */
  history: {total: number; parts: Record<string, number>}[];
  /** Parts in the group's order, with the labels shown in the legend. */
  parts: {id: string; label: string}[];
  /** Legend entry of the total's change, and the value-axis title, in the report's language. */
  totalLabel: string;
  axisTitle: string;
  /** Most recent periods shown. Default: all given. */
  periods?: number;
  description: string;
}

/**
 * Stacked bars of each part's contribution (percentage points; positive ones stacked up from zero, negative ones
 * down) with the total's change as a dark tick on each period, so the bars visibly add up to the tick. Parts get
 * shades of the accent from light to deep, in the group's order; a zero rule anchors the bars. O(n · parts).
 */
export function contributionsChart(input: ContributionsInput, ctx: ChartContext): TopLevelSpec {
  const {theme, frequency} = ctx;
  const count = Math.min(input.periods ?? input.history.length, input.history.length);
  const first = input.history.length - count;
  const shown = input.history.slice(first);
  const labels = input.parts.map((p) => p.label);
  const bars = shown.flatMap((h, i) =>
    input.parts.flatMap((p, k) => {
      const v = round(finite(h.parts[p.id]));
      return v === null ? [] : [{t: epoch(frequency, input.start + first + i), v, part: p.label, order: k}];
    }),
  );
  const totals = shown.flatMap((h, i) => {
    const v = round(finite(h.total));
    return v === null ? [] : [{t: epoch(frequency, input.start + first + i), v, what: input.totalLabel}];
  });
  const bar = round(Math.min(16, Math.max(1, ((ctx.width - 50) / Math.max(1, count)) * 0.72)))!;
  const x = timeX(frequency, count);
  const xBars = {...x, scale: {...x.scale, padding: bar}};
  return {
    ...frame(input.description, ctx.width, ctx.height, theme),
    layer: [
      {
        data: {values: bars},
        mark: {type: 'bar', width: bar},
        encoding: {
          x: xBars,
          y: {field: 'v', type: 'quantitative', title: input.axisTitle, axis: {format: ',~r'}, stack: 'zero'},
          color: {
            field: 'part',
            type: 'nominal',
            title: null,
            scale: {domain: labels, range: ramp(theme, labels.length)},
            sort: labels,
          },
          order: {field: 'order', type: 'quantitative'},
        },
      },
      {
        data: {values: totals},
        mark: {type: 'tick', color: theme.ink, thickness: 2, size: bar + 4},
        encoding: {x: xBars, y: {field: 'v', type: 'quantitative'}},
      },
      {
        data: {values: [{}]},
        mark: {type: 'rule', color: theme.ink, strokeWidth: 0.8},
        encoding: {y: {datum: 0, type: 'quantitative'}},
      },
    ],
  };
}

/** Registry entry: under a group's total, its parts' contributions to its change on a year earlier (three years). */
export const contributionsEntry: SeriesChart = {
  name: 'contributions',
  row: 1.5,
  shows: ({group}) => group !== null && group.history.length > 0,
  build({series, words: w, group}, ctx) {
    const g = group!;
    const caption = w.t('chart.contributions');
    const description = w.t('chart.contributionsDescription', {name: series.label, total: w.percent(g.latest.total), period: g.latest.period});
    const spec = contributionsChart(
      {
        start: g.start,
        history: g.history,
        parts: g.parts,
        totalLabel: w.t('chart.contributionsTotal', {name: series.label}),
        axisTitle: w.t('chart.contributionsAxis'),
        periods: 3 * periodsPerYear[ctx.frequency],
        description,
      },
      ctx,
    );
    return {caption, spec, note: w.t('chart.contributionsNote')};
  },
};
