import type {TopLevelSpec} from 'vega-lite';
import {periodsPerYear} from '../../time/period.js';
import {hasFinite, type SeriesChart} from './seriesChart.js';
import {epoch, finite, round, timeX, type ChartContext, frame} from './common.js';

/** Year-on-year percent change aligned with the series (NaN for the first year). */
export interface YearOnYearInput {
  start: number;
  yearOnYear: number[];
  /** Most recent periods shown. Default: three years. */
  periods?: number;
  description: string;
}

/**
 * Bars of the change on a year earlier for recent periods: rises in the accent, falls in a pale tint of the
 * contrast hue with a dark outline, so sign reads without colour. A zero rule anchors the bars. O(n).
 */
export function yearOnYearChart(input: YearOnYearInput, ctx: ChartContext): TopLevelSpec {
  const {theme, frequency, words: w} = ctx;
  const rise = w.t('legend.rise');
  const fall = w.t('legend.fall');
  const count = input.periods ?? 3 * periodsPerYear[frequency];
  const first = Math.max(0, input.yearOnYear.length - count);
  const values = input.yearOnYear.slice(first).flatMap((value, i) => {
    const v = round(finite(value));
    return v === null ? [] : [{t: epoch(frequency, input.start + first + i), v, s: v < 0 ? fall : rise}];
  });
  // Bars on a continuous UTC axis: width from the plot width (axis labels take ~50 px), 1 to 16 px.
  const bar = round(Math.min(16, Math.max(1, ((ctx.width - 50) / Math.max(1, values.length)) * 0.72)))!;
  const x = timeX(frequency, input.yearOnYear.length - first);
  return {
    ...frame(input.description, ctx.width, ctx.height, theme),
    data: {values},
    layer: [
      {
        mark: {type: 'bar', strokeWidth: 0.8, width: bar},
        encoding: {
          x: {...x, scale: {...x.scale, padding: bar}},
          y: {field: 'v', type: 'quantitative', title: w.t('axis.yoy'), axis: {format: ',~r'}},
          fill: {field: 's', type: 'nominal', scale: {domain: [rise, fall], range: [theme.accent, theme.contrastTint]}},
          stroke: {field: 's', type: 'nominal', scale: {domain: [rise, fall], range: [theme.accent, theme.contrast]}},
        },
      },
      {mark: {type: 'rule', color: theme.ink, strokeWidth: 0.8}, encoding: {y: {datum: 0, type: 'quantitative'}}},
    ],
  };
}

/** Registry entry: changes on a year earlier, once there is at least one. */
export const yearOnYearEntry: SeriesChart = {
  name: 'yoy',
  row: 2,
  shows: ({analysis: a}) => hasFinite(a.changes.yearOnYearSeries),
  build({series: s, analysis: a, words: w}, ctx) {
    const description = w.t('describe.yoy', {name: s.label, latest: w.percent(a.changes.yearOnYear)});
    return {
      caption: w.t('chart.yoy'),
      spec: yearOnYearChart({start: a.start, yearOnYear: a.changes.yearOnYearSeries, description}, ctx),
      note: null,
    };
  },
};
