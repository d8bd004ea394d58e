import {describe, expect, test} from 'vitest';
import type {TopLevelSpec} from 'vega-lite';
import {specToSvg} from '../../src/render/svg.js';
import {overviewChart} from '../../src/render/charts/overview.js';
import {yearOnYearChart} from '../../src/render/charts/yearOnYear.js';
import {irregularChart} from '../../src/render/charts/irregular.js';
import {forecastChart} from '../../src/render/charts/forecast.js';
import {cycleChart} from '../../src/render/charts/cycle.js';
import {trackingChart} from '../../src/render/charts/tracking.js';
import {themeFor} from '../../src/render/theme.js';
import {wordsFor} from '../../src/words/index.js';
import {monthIndex} from '../../src/time/period.js';
import type {ChartContext} from '../../src/render/charts/common.js';
import type {ForecastResult} from '../../src/analyse/forecast/types.js';

const theme = themeFor('#1d6f64', 'Liberation Sans');
const ctx: ChartContext = {frequency: 'monthly', theme, width: 320, height: 120, unit: null, seasonNames: [], words: wordsFor('en-GB')};
// Every series starts in September 2019: UTC midnight of 1 September is still 31 August in New York.
const start = monthIndex(2019, 9);
const ramp = (n: number, f: (i: number) => number) => Array.from({length: n}, (_, i) => f(i));

const forecast: ForecastResult = {
  method: 'ETS(A,N,N)',
  startOffset: 12,
  mean: [13, 14, 15],
  levels: [80, 95],
  lower: {'80': [12, 12.5, 13], '95': [11, 11.5, 12]},
  upper: {'80': [14, 15.5, 17], '95': [15, 16.5, 18]},
  backtest: {origins: 2, horizon: 1, mase: 1, smape: 1, benchmarks: [], points: [{offset: 0, forecast: 1.5}, {offset: 10, forecast: 10}]},
  options: {},
  notes: [],
};

const charts: [string, TopLevelSpec][] = [
  ['overview', overviewChart({start, original: ramp(12, (i) => 10 + i), adjusted: ramp(12, (i) => 10.5 + i), trend: null, description: 'd'}, ctx)],
  ['yoy', yearOnYearChart({start, yearOnYear: ramp(12, (i) => i - 5), description: 'd'}, ctx)],
  [
    'irregular',
    irregularChart(
      {
        start,
        irregular: ramp(12, (i) => (i === 0 ? 1.2 : i === 5 ? 0.8 : 1 + 0.01 * (i % 3))),
        model: 'multiplicative',
        outliers: [
          {index: 0, kind: 'additive', score: 5},
          {index: 5, kind: 'level-shift', score: -4},
        ],
        labels: {0: 'Sept 2019', 5: 'Feb 2020'},
        description: 'd',
      },
      ctx,
    ),
  ],
  ['forecast', forecastChart({start, original: ramp(12, (i) => 1 + i), forecast, description: 'd'}, ctx)],
  [
    'cycle',
    cycleChart(
      {
        start,
        gap: ramp(12, (i) => Math.sin(i / 2)),
        turningPoints: [
          {index: 0, type: 'trough', provisional: false},
          {index: 3, type: 'peak', provisional: false},
          {index: 9, type: 'trough', provisional: true},
        ],
        description: 'd',
      },
      ctx,
    ),
  ],
  [
    'tracking',
    trackingChart(
      {
        points: [
          {period: start, series: 'A', errorPct: 2.5, inside: true},
          {period: start + 1, series: 'A', errorPct: -6, inside: false},
        ],
        level: 80,
        description: 'd',
      },
      ctx,
    ),
  ],
];

async function svgIn(zone: string, spec: TopLevelSpec, id: string): Promise<string> {
  const before = process.env.TZ;
  try {
    // Node re-reads TZ when it is assigned, so the zone applies to this render only.
    process.env.TZ = zone;
    return await specToSvg(spec, {locale: 'en-GB', font: 'Liberation Sans', idPrefix: id, title: 't', description: 'd'});
  } finally {
    if (before === undefined) delete process.env.TZ;
    else process.env.TZ = before;
  }
}

describe('charts do not depend on the time zone', () => {
  test('the zone switch takes effect in this process', () => {
    const before = process.env.TZ;
    try {
      process.env.TZ = 'America/New_York';
      expect(new Date(Date.UTC(2019, 8, 1)).getDate()).toBe(31);
    } finally {
      if (before === undefined) delete process.env.TZ;
      else process.env.TZ = before;
    }
  });

  test.each(charts)('%s: same bytes in America/New_York and UTC, dated 1 September', async (name, spec) => {
    const west = await svgIn('America/New_York', spec, name);
    const utc = await svgIn('UTC', spec, name);
    expect(west).toBe(utc);
    expect(utc).toMatch(/Sept (01, )?2019/);
    // Axis descriptions may start in August: that is the padded scale domain, the same in every zone.
    expect(utc).not.toMatch(/Aug 31, 2019|t: Aug 2019/);
  });
});
