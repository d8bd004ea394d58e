import {describe, expect, test} from 'vitest';
import {overviewChart} from '../../src/render/charts/overview.js';
import {seasonalChart} from '../../src/render/charts/seasonal.js';
import {yearOnYearChart} from '../../src/render/charts/yearOnYear.js';
import {irregularChart} from '../../src/render/charts/irregular.js';
import {forecastChart} from '../../src/render/charts/forecast.js';
import {cycleChart} from '../../src/render/charts/cycle.js';
import {trackingChart} from '../../src/render/charts/tracking.js';
import {sparkline} from '../../src/render/charts/sparkline.js';
import {baseConfig, epoch, type ChartContext} from '../../src/render/charts/common.js';
import {themeFor} from '../../src/render/theme.js';
import {wordsFor} from '../../src/words/index.js';
import {monthIndex, quarterIndex} from '../../src/time/period.js';
import type {ForecastResult} from '../../src/analyse/forecast/types.js';

const theme = themeFor('#1d6f64', 'Liberation Sans');
const months = ['Jan', 'Feb', 'Mar', 'Apr', 'May', 'Jun', 'Jul', 'Aug', 'Sep', 'Oct', 'Nov', 'Dec'];
const ctx: ChartContext = {frequency: 'monthly', theme, width: 300, height: 100, unit: 'EUR k', seasonNames: months, words: wordsFor('en-GB')};
const jan2024 = monthIndex(2024, 1);
const t = (i: number) => Date.UTC(2024, i, 1);
const layers = (spec: object) => (spec as {layer: {data?: {values: unknown[]}}[]}).layer;

describe('epoch', () => {
  test('periods map to UTC midnight of their first day', () => {
    expect(epoch('monthly', jan2024)).toBe(Date.UTC(2024, 0, 1));
    expect(epoch('quarterly', quarterIndex(2024, 3))).toBe(Date.UTC(2024, 6, 1));
  });
});

describe('overviewChart', () => {
  test('whole spec for three periods, NaN as a break', () => {
    const spec = overviewChart(
      {start: jan2024, original: [10, NaN, 12], adjusted: [11, NaN, 11.5], trend: [10.5, 11, 11.25], description: 'd'},
      ctx,
    );
    expect(spec).toEqual({
      $schema: 'https://vega.github.io/schema/vega-lite/v6.json',
      description: 'd',
      width: 300,
      height: 100,
      autosize: {type: 'fit', contains: 'padding'},
      config: baseConfig(theme),
      data: {
        values: [
          {t: t(0), s: 'Original', v: 10},
          {t: t(1), s: 'Original', v: null},
          {t: t(2), s: 'Original', v: 12},
          {t: t(0), s: 'Seasonally adjusted', v: 11},
          {t: t(1), s: 'Seasonally adjusted', v: null},
          {t: t(2), s: 'Seasonally adjusted', v: 11.5},
          {t: t(0), s: 'Trend-cycle', v: 10.5},
          {t: t(1), s: 'Trend-cycle', v: 11},
          {t: t(2), s: 'Trend-cycle', v: 11.25},
        ],
      },
      mark: {type: 'line', interpolate: 'linear'},
      encoding: {
        x: {
          field: 't',
          type: 'temporal',
          scale: {type: 'utc'},
          title: null,
          axis: {format: '%b %Y', tickCount: {interval: 'month', step: 2}, grid: false},
        },
        y: {field: 'v', type: 'quantitative', scale: {zero: false}, title: 'EUR k', axis: {format: ',~r'}},
        color: {
          field: 's',
          type: 'nominal',
          scale: {domain: ['Original', 'Seasonally adjusted', 'Trend-cycle'], range: [theme.neutral, theme.accent, theme.deep]},
        },
        strokeWidth: {
          field: 's',
          type: 'ordinal',
          sort: ['Original', 'Seasonally adjusted', 'Trend-cycle'],
          scale: {domain: ['Original', 'Seasonally adjusted', 'Trend-cycle'], range: [1.1, 1.6, 2.6]},
        },
        order: {field: 's', sort: 'ascending'},
      },
    });
  });

  test('without an adjustment only the original is drawn', () => {
    const spec = overviewChart({start: jan2024, original: [1, 2], adjusted: null, trend: null, description: 'd'}, ctx);
    expect((spec as {data: {values: unknown[]}}).data.values).toEqual([
      {t: t(0), s: 'Original', v: 1},
      {t: t(1), s: 'Original', v: 2},
    ]);
  });
});

describe('seasonalChart', () => {
  test('multiplicative factors become percent vs normal, one line per year', () => {
    const spec = seasonalChart(
      {start: monthIndex(2023, 11), seasonal: [1.1, 0.9, 1.05], model: 'multiplicative', description: 'd'},
      ctx,
    ) as {data: {values: unknown[]}; encoding: {color: unknown; x: unknown}};
    expect(spec.data.values).toEqual([
      {year: '2023', season: 'Nov', v: 10},
      {year: '2023', season: 'Dec', v: -10},
      {year: '2024', season: 'Jan', v: 5},
    ]);
    expect(spec.encoding.color).toEqual({
      field: 'year',
      type: 'ordinal',
      scale: {domain: ['2023', '2024'], range: ['#bbd4d1', theme.deep]},
    });
    expect(spec.encoding.x).toEqual({
      field: 'season',
      type: 'ordinal',
      sort: months,
      title: null,
      axis: {labelAngle: 0, labelFontSize: 8.5, grid: false},
    });
  });

  test('keeps only the most recent years', () => {
    const spec = seasonalChart({start: jan2024, seasonal: Array(36).fill(0), model: 'additive', years: 2, description: 'd'}, ctx) as {
      data: {values: {year: string}[]};
    };
    expect([...new Set(spec.data.values.map((r) => r.year))]).toEqual(['2025', '2026']);
  });
});

describe('yearOnYearChart', () => {
  test('drops NaN, marks falls, keeps the last periods', () => {
    const spec = yearOnYearChart({start: jan2024, yearOnYear: [NaN, 2, -1.5, 3], periods: 3, description: 'd'}, ctx);
    expect((spec as {data: {values: unknown[]}}).data.values).toEqual([
      {t: t(1), v: 2, s: 'Rise'},
      {t: t(2), v: -1.5, s: 'Fall'},
      {t: t(3), v: 3, s: 'Rise'},
    ]);
  });
});

describe('irregularChart', () => {
  test('flagged points carry kind, label and label side', () => {
    const spec = irregularChart(
      {
        start: jan2024,
        irregular: [1.01, 0.8, 1],
        model: 'multiplicative',
        outliers: [{index: 1, kind: 'level-shift', score: -4}],
        labels: {1: 'Feb 2024'},
        description: 'd',
      },
      ctx,
    );
    const [stems, , flagged] = layers(spec);
    expect(stems.data!.values).toEqual([
      {t: t(0), v: 1},
      {t: t(1), v: -20},
      {t: t(2), v: 0},
    ]);
    expect(flagged.data!.values).toEqual([{t: t(1), v: -20, k: 'Level shift', label: 'Feb 2024', above: false}]);
  });

  test('no flagged layer when nothing is flagged', () => {
    const spec = irregularChart({start: jan2024, irregular: [1, 2], model: 'additive', outliers: [], labels: {}, description: 'd'}, ctx);
    expect(layers(spec)).toHaveLength(2);
  });
});

describe('forecastChart', () => {
  const forecast: ForecastResult = {
    method: 'ETS(A,N,N)',
    startOffset: 3,
    mean: [5, 6],
    levels: [80, 95],
    lower: {'80': [4, 4.5], '95': [3, 3.5]},
    upper: {'80': [6, 7.5], '95': [7, 8.5]},
    backtest: {origins: 1, horizon: 1, mase: 1, smape: 1, benchmarks: [], points: [{offset: 0, forecast: 1.5}, {offset: 2, forecast: 4}]},
    options: {},
    notes: [],
  };

  test('bands outer first, forecast joined to the last actual, back-test points within the window', () => {
    const spec = forecastChart({start: jan2024, original: [1, 2, 3], forecast, recent: 2, description: 'd'}, ctx);
    const [outer, inner, actual, mean, backtest] = layers(spec);
    expect(outer.data!.values).toEqual([
      {t: t(3), b: '95% range', lo: 3, hi: 7},
      {t: t(4), b: '95% range', lo: 3.5, hi: 8.5},
    ]);
    expect(inner.data!.values).toEqual([
      {t: t(3), b: '80% range', lo: 4, hi: 6},
      {t: t(4), b: '80% range', lo: 4.5, hi: 7.5},
    ]);
    expect(actual.data!.values).toEqual([
      {t: t(1), s: 'Actual', v: 2},
      {t: t(2), s: 'Actual', v: 3},
    ]);
    expect(mean.data!.values).toEqual([
      {t: t(2), s: 'Forecast', v: 3},
      {t: t(3), s: 'Forecast', v: 5},
      {t: t(4), s: 'Forecast', v: 6},
    ]);
    expect(backtest.data!.values).toEqual([{t: t(2), s: 'Back-test (one step ahead)', v: 4}]);
  });
});

describe('cycleChart', () => {
  test('turning points by type and provisional flag; latest point marked', () => {
    const spec = cycleChart(
      {
        start: jan2024,
        gap: [1, 2, -1, NaN],
        turningPoints: [
          {index: 1, type: 'peak', provisional: false},
          {index: 2, type: 'trough', provisional: true},
        ],
        description: 'd',
      },
      ctx,
    );
    const all = layers(spec);
    expect(all[3].data!.values).toEqual([
      {t: t(1), v: 2, k: 'Peak'},
      {t: t(2), v: -1, k: 'Provisional trough'},
    ]);
    expect(all[4].data!.values).toEqual([{t: t(2), v: -1}]);
  });
});

describe('trackingChart', () => {
  test('errors in percent, filled inside the inner band', () => {
    const spec = trackingChart(
      {points: [{period: jan2024, series: 'A', errorPct: 2.5, inside: true}], level: 80, description: 'd'},
      ctx,
    );
    expect(layers(spec)[1].data!.values).toEqual([{t: t(0), v: 2.5, s: 'A', k: 'Inside 80% range'}]);
  });

  test('a single checked period still gets its axis label', () => {
    const spec = trackingChart(
      {points: [{period: jan2024, series: 'A', errorPct: 2.5, inside: true}, {period: jan2024, series: 'B', errorPct: -1, inside: false}], level: 80, description: 'd'},
      ctx,
    );
    const x = (layers(spec)[1] as unknown as {encoding: {x: {axis: {values: number[]}; scale: object}}}).encoding.x;
    expect(x.axis.values).toEqual([t(0)]);
    expect(x.scale).toEqual({type: 'utc', padding: 12});
  });
});

describe('sparkline', () => {
  test('scales into the box, breaks at NaN, dots the last value', () => {
    const svg = sparkline([0, 1, NaN, 2], {width: 10, height: 6, colour: '#000000', label: 'a<b'});
    expect(svg).toBe(
      '<svg class="spark" xmlns="http://www.w3.org/2000/svg" viewBox="0 0 10 6" width="10" height="6" role="img" aria-label="a&lt;b">' +
        '<path d="M2,4L4,3M8,2" fill="none" stroke="#000000" stroke-width="1.2" stroke-linejoin="round"/>' +
        '<circle cx="8" cy="2" r="1.8" fill="#000000"/></svg>',
    );
  });
});
