import type {TopLevelSpec} from 'vega-lite';
import {VALUE_FORMAT, epoch, finite, round, timeX, type ChartContext, frame} from './common.js';
import {hasFinite, type SeriesChart} from './seriesChart.js';

/** Original values with, when available, the seasonally adjusted series and the trend-cycle. */
export interface OverviewInput {
  start: number;
  original: number[];
  adjusted: number[] | null;
  trend: number[] | null;
  description: string;
}

/**
 * Line chart of the level of a series: original in light neutral (thin), seasonally adjusted in the accent
 * (medium) and trend-cycle in the deep accent (thick), so the three read apart in greyscale by width and
 * lightness. Missing values break the lines. O(n).
 */
export function overviewChart(input: OverviewInput, ctx: ChartContext): TopLevelSpec {
  const {theme, words: w} = ctx;
  const OVERVIEW_SERIES = [w.t('term.original'), w.t('term.adjusted'), w.t('term.trendCycle')];
  const layers: [string, number[] | null][] = [
    [OVERVIEW_SERIES[0], input.original],
    [OVERVIEW_SERIES[1], input.adjusted],
    [OVERVIEW_SERIES[2], input.trend],
  ];
  const present = layers.filter(([, values]) => values !== null) as [string, number[]][];
  const values = present.flatMap(([s, v]) =>
    v.map((value, i) => ({t: epoch(ctx.frequency, input.start + i), s, v: round(finite(value))})),
  );
  const styles: Record<string, [string, number]> = {
    [OVERVIEW_SERIES[0]]: [theme.neutral, 1.1],
    [OVERVIEW_SERIES[1]]: [theme.accent, 1.6],
    [OVERVIEW_SERIES[2]]: [theme.deep, 2.6],
  };
  const domain = present.map(([s]) => s);
  return {
    ...frame(input.description, ctx.width, ctx.height, theme),
    data: {values},
    // A one-entry ordinal width scale gives NaN widths, so a single line takes its width from the mark.
    mark: {type: 'line', interpolate: 'linear', ...(domain.length === 1 ? {strokeWidth: styles[domain[0]][1]} : {})},
    encoding: {
      x: timeX(ctx.frequency, input.original.length),
      y: {field: 'v', type: 'quantitative', scale: {zero: false}, title: ctx.unit, axis: {format: VALUE_FORMAT}},
      color: {field: 's', type: 'nominal', scale: {domain, range: domain.map((s) => styles[s][0])}},
      ...(domain.length > 1
        ? // Same field and no legend override: vega-lite merges it into the colour legend (a null legend hides both).
          {strokeWidth: {field: 's', type: 'ordinal', sort: domain, scale: {domain, range: domain.map((s) => styles[s][1])}}}
        : {}),
      order: {field: 's', sort: 'ascending'},
    },
  };
}

/** Registry entry: the first row of every series with a value to draw. */
export const overviewEntry: SeriesChart = {
  name: 'overview',
  row: 1,
  shows: ({analysis: a}) => hasFinite(a.original),
  build({series: s, analysis: a, words: w}, ctx) {
    const adj = a.adjustment;
    const description = w.t('describe.overview', {
      name: s.unit ? `${s.label} (${s.unit})` : s.label,
      from: w.period(a.frequency, a.start),
      to: w.period(a.frequency, a.end),
      adjusted: adj ? 'yes' : 'no',
      latest: w.number(a.original[a.original.length - 1]),
      period: w.period(a.frequency, a.end),
    });
    return {
      caption: w.t(adj ? 'chart.overview' : 'chart.overviewOriginal'),
      spec: overviewChart(
        {start: a.start, original: a.original, adjusted: adj?.adjusted ?? null, trend: adj?.trend ?? null, description},
        ctx,
      ),
      note: null,
    };
  },
};
