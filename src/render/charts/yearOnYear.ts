import type {TopLevelSpec} from 'vega-lite';
import {periodsPerYear} from '../../time/period.js';
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
  const {theme, frequency} = ctx;
  const count = input.periods ?? 3 * periodsPerYear[frequency];
  const first = Math.max(0, input.yearOnYear.length - count);
  const values = input.yearOnYear.slice(first).flatMap((value, i) => {
    const v = round(finite(value));
    return v === null ? [] : [{t: epoch(frequency, input.start + first + i), v, s: v < 0 ? 'Fall' : 'Rise'}];
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
          y: {field: 'v', type: 'quantitative', title: '% on a year earlier', axis: {format: ',~r'}},
          fill: {field: 's', type: 'nominal', scale: {domain: ['Rise', 'Fall'], range: [theme.accent, theme.contrastTint]}},
          stroke: {field: 's', type: 'nominal', scale: {domain: ['Rise', 'Fall'], range: [theme.accent, theme.contrast]}},
        },
      },
      {mark: {type: 'rule', color: theme.ink, strokeWidth: 0.8}, encoding: {y: {datum: 0, type: 'quantitative'}}},
    ],
  };
}
