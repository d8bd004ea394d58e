import type {TopLevelSpec} from 'vega-lite';
import type {ForecastResult} from '../../analyse/forecast/types.js';
import {hasFinite, type SeriesChart} from './seriesChart.js';
import {shortMethod} from '../../words/index.js';
import {periodsPerYear} from '../../time/period.js';
import {when, VALUE_FORMAT, epoch, finite, round, timeX, utcTime, type ChartContext, frame} from './common.js';

/** Recent actuals, the forecast with its bands, and the back-test's one-step-ahead forecasts. */
export interface ForecastInput {
  start: number;
  original: number[];
  forecast: ForecastResult;
  /** Actual periods shown before the forecast. Default: three years (two for weekly). */
  recent?: number;
  description: string;
}

/**
 * Forecast chart: the widest and narrowest interval as stacked shaded bands (outer band lighter), the
 * central forecast as a dashed accent line joined to the last actual, recent actuals as a solid dark line,
 * and the back-test's one-step forecasts as open circles. Band levels follow `forecast.levels` (at most the
 * outer and inner one are drawn). O(n + h).
 */
export function forecastChart(input: ForecastInput, ctx: ChartContext): TopLevelSpec {
  const {theme, frequency, words: w} = ctx;
  const FORECAST_KEYS = [w.t('legend.actual'), w.t('legend.forecast'), w.t('legend.backtest')];
  const f = input.forecast;
  const n = input.original.length;
  const recent = input.recent ?? (frequency === 'weekly' ? 2 : 3) * periodsPerYear[frequency];
  const first = Math.max(0, n - recent);
  const t = (offset: number) => epoch(frequency, input.start + offset);
  const levels = [...f.levels].sort((a, b) => b - a);
  const shown = levels.length > 1 ? [levels[0], levels[levels.length - 1]] : levels;
  const bandNames = shown.map((l) => w.t('label.levelRange', {level: String(l)}));
  const bands = shown.flatMap((level, k) =>
    f.mean.map((_, h) => ({
      t: t(f.startOffset + h),
      b: bandNames[k],
      lo: round(finite(f.lower[String(level)]?.[h])),
      hi: round(finite(f.upper[String(level)]?.[h])),
    })),
  );
  const actual = input.original.slice(first).map((v, i) => ({t: t(first + i), s: FORECAST_KEYS[0], v: round(finite(v))}));
  const lastActual = [...actual].reverse().find((r) => r.v !== null);
  const mean = [
    ...(lastActual && f.startOffset === n ? [{t: lastActual.t, s: FORECAST_KEYS[1], v: lastActual.v}] : []),
    ...f.mean.map((v, h) => ({t: t(f.startOffset + h), s: FORECAST_KEYS[1], v: round(finite(v))})),
  ];
  const backtest = (f.backtest?.points ?? [])
    .filter((p) => p.offset >= first)
    .map((p) => ({t: t(p.offset), s: FORECAST_KEYS[2], v: round(finite(p.forecast))}));
  const keys = [...FORECAST_KEYS.slice(0, 2), ...(backtest.length > 0 ? [FORECAST_KEYS[2]] : [])];
  const bandColours = [theme.wash, theme.tint].slice(-bandNames.length);
  const x = timeX(frequency, n - first + f.mean.length);
  return {
    ...frame(input.description, ctx.width, ctx.height, theme),
    layer: [
      // Outer band first so the inner band is drawn on top of it.
      ...bandNames.map((name) => ({
        data: {values: bands.filter((b) => b.b === name)},
        mark: {type: 'area' as const},
        encoding: {
          x,
          y: {
            field: 'lo',
            type: 'quantitative' as const,
            scale: {zero: false},
            title: ctx.unit,
            axis: {format: VALUE_FORMAT},
          },
          y2: {field: 'hi'},
          fill: {field: 'b', type: 'nominal' as const, scale: {domain: bandNames, range: bandColours}},
        },
      })),
      {
        data: {values: actual},
        mark: {type: 'line', strokeWidth: 1.4},
        encoding: {
          x: utcTime(),
          y: {field: 'v', type: 'quantitative'},
          color: {field: 's', type: 'nominal', scale: {domain: keys, range: [theme.ink, theme.accent, theme.contrast].slice(0, keys.length)}},
        },
      },
      {
        data: {values: mean},
        mark: {type: 'line', strokeWidth: 2, strokeDash: [5, 3]},
        encoding: {x: utcTime(), y: {field: 'v', type: 'quantitative'}, color: {field: 's', type: 'nominal'}},
      },
      ...when(backtest.length > 0, {
        data: {values: backtest},
        mark: {type: 'point', shape: 'circle', filled: false, size: 26, strokeWidth: 1.2, opacity: 1},
        encoding: {x: utcTime(), y: {field: 'v', type: 'quantitative'}, color: {field: 's', type: 'nominal'}},
      }),
    ],
  };
}

/** Registry entry: the forecast with its ranges, when the forecast has a finite value. */
export const forecastEntry: SeriesChart = {
  name: 'forecast',
  row: 4,
  shows: ({analysis: a}) => a.forecast !== null && hasFinite(a.forecast.mean),
  build({series: s, analysis: a, words: w}, ctx) {
    const fc = a.forecast!;
    const levels = [...fc.levels].sort((x, y) => x - y);
    const description = w.t('describe.forecast', {
      name: s.label,
      n: String(fc.mean.length),
      method: shortMethod(w, fc.method),
      first: w.number(fc.mean[0]),
      period: w.period(a.frequency, a.start + fc.startOffset),
    });
    return {
      caption: w.t('chart.forecast', {levels: w.list(levels.map((l) => w.share(l, 0)))}),
      spec: forecastChart({start: a.start, original: a.original, forecast: fc, description}, ctx),
      note: null,
    };
  },
};
