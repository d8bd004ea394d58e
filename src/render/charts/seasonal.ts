import type {TopLevelSpec} from 'vega-lite';
import {periodsPerYear, seasonOf, yearOf} from '../../time/period.js';
import {hasFinite, type SeriesChart} from './seriesChart.js';
import type {Theme} from '../theme.js';
import {ramp} from '../theme.js';
import {SCHEMA, baseConfig, finite, round, type ChartContext} from './common.js';

/** Seasonal component (factors or differences) aligned with the series. */
export interface SeasonalInput {
  start: number;
  seasonal: number[];
  model: 'additive' | 'multiplicative';
  /** Most recent years drawn. Default: 6. */
  years?: number;
  description: string;
}

/**
 * Seasonal pattern across years: one line per calendar year over the months (or quarters) of the year,
 * older years in lighter tints, the latest year in the deep accent and drawn thicker. Multiplicative factors
 * are shown as percent above or below normal ((factor − 1) × 100), additive effects in the series' unit.
 * O(n).
 */
export function seasonalChart(input: SeasonalInput, ctx: ChartContext): TopLevelSpec {
  const {frequency} = ctx;
  const rows = input.seasonal.map((value, i) => {
    const index = input.start + i;
    const v = finite(value);
    return {
      year: String(yearOf(frequency, index)),
      season: ctx.seasonNames[seasonOf(frequency, index)] ?? String(seasonOf(frequency, index) + 1),
      v: round(v === null ? null : input.model === 'multiplicative' ? (v - 1) * 100 : v),
    };
  });
  const allYears = [...new Set(rows.map((r) => r.year))];
  const years = allYears.slice(-(input.years ?? 6));
  const values = rows.filter((r) => years.includes(r.year));
  const widths = years.map((_, i) => (i === years.length - 1 ? 2.6 : 1.2));
  return {
    $schema: SCHEMA,
    description: input.description,
    width: ctx.width,
    height: ctx.height,
    autosize: {type: 'fit', contains: 'padding'},
    config: {...baseConfig(ctx.theme), legend: {...baseConfig(ctx.theme).legend, ...legendRight(ctx.theme)}},
    data: {values},
    mark: {
      type: 'line',
      point: periodsPerYear[frequency] <= 12 ? {size: 14, filled: true} : false,
      // A one-entry ordinal width scale gives NaN widths, so a single year takes its width from the mark.
      ...(years.length === 1 ? {strokeWidth: widths[0]} : {}),
    },
    encoding: {
      x: {field: 'season', type: 'ordinal', sort: ctx.seasonNames, title: null, axis: {labelAngle: 0, labelFontSize: 8.5, grid: false}},
      y: {
        field: 'v',
        type: 'quantitative',
        title: input.model === 'multiplicative' ? ctx.words.t('axis.vsNormal') : ctx.unit,
        axis: {format: ',~r'},
      },
      color: {field: 'year', type: 'ordinal', scale: {domain: years, range: ramp(ctx.theme, years.length)}},
      ...(years.length > 1 ? {strokeWidth: {field: 'year', type: 'ordinal', scale: {domain: years, range: widths}}} : {}),
    },
  };
}

function legendRight(theme: Theme) {
  return {orient: 'right' as const, direction: 'vertical' as const, labelColor: theme.ink, offset: 8};
}

/** Registry entry: the seasonal pattern of an adjusted series, beside the year-on-year chart. */
export const seasonalEntry: SeriesChart = {
  name: 'seasonal',
  row: 2,
  shows: ({analysis: a}) => a.adjustment !== null && hasFinite(a.adjustment.seasonal),
  build({series: s, analysis: a, words: w}, ctx) {
    const adj = a.adjustment!;
    const description = w.t('describe.seasonal', {name: s.label, frequency: a.frequency});
    return {
      caption: w.t(adj.model === 'multiplicative' ? 'chart.seasonalPercent' : 'chart.seasonal'),
      spec: seasonalChart({start: a.start, seasonal: adj.seasonal, model: adj.model, description}, ctx),
      note: null,
    };
  },
};
