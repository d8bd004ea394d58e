import type {TopLevelSpec} from 'vega-lite';
import {epoch, frame, round, timeX, type ChartContext, zeroRule} from './common.js';

/** Published forecasts set against the actuals that arrived since. */
export interface TrackingPoint {
  /** Period index of the forecast period. */
  period: number;
  series: string;
  /** (actual − forecast) / |actual| × 100. */
  errorPct: number;
  /** Actual inside the inner published band. */
  inside: boolean;
}

export interface TrackingInput {
  points: TrackingPoint[];
  /** Level of the inner band, e.g. 80. */
  level: number;
  description: string;
}

/** Spans up to this many periods get one axis label per period. */
const FEW_PERIODS = 6;

/**
 * Forecast tracking: error of each published forecast in percent of the actual, by period, filled when the
 * actual fell inside the published inner band and hollow when outside. O(n).
 */
export function trackingChart(input: TrackingInput, ctx: ChartContext): TopLevelSpec {
  const {theme, frequency, words: w} = ctx;
  const inside = w.t('legend.insideRange', {level: String(input.level)});
  const outside = w.t('legend.outsideRange', {level: String(input.level)});
  const values = input.points
    .filter((p) => Number.isFinite(p.errorPct))
    .map((p) => ({t: epoch(frequency, p.period), v: round(p.errorPct), s: p.series, k: p.inside ? inside : outside}));
  const periods = input.points.map((p) => p.period);
  const span = periods.length > 0 ? Math.max(...periods) - Math.min(...periods) + 1 : 1;
  const x = timeX(frequency, Math.max(span, 3));
  // Over a few periods the regular ticks can all fall outside the padded domain, so each period is labelled.
  const few = span <= FEW_PERIODS ? {values: [...new Set(values.map((r) => r.t))].sort((a, b) => a - b)} : {};
  return {
    ...frame(input.description, ctx.width, ctx.height, theme),
    layer: [
      zeroRule(theme),
      {
        data: {values},
        mark: {type: 'point', size: 50, strokeWidth: 1.4, color: theme.accent},
        encoding: {
          // Padding keeps points at the first and last period from being cut by the plot edge.
          x: {...x, scale: {...x.scale, padding: 12}, axis: {...x.axis, ...few}},
          y: {field: 'v', type: 'quantitative', title: w.t('axis.tracking'), axis: {format: ',~r'}},
          fill: {field: 'k', type: 'nominal', scale: {domain: [inside, outside], range: [theme.accent, 'white']}},
          shape: {field: 'k', type: 'nominal', scale: {domain: [inside, outside], range: ['circle', 'diamond']}},
        },
      },
    ],
  };
}
