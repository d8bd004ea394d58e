import type {AnalysisOptions} from '../../src/config/plan.js';
import type {SeriesAnalysis} from '../../src/analyse/types.js';
import type {TurningPoint} from '../../src/analyse/cycle/types.js';
import type {Callout} from '../../src/narrate/types.js';
import type {History} from '../../src/results/index.js';
import type {Report, ReportSeries} from '../../src/render/types.js';
import {monthIndex, periodsPerYear, quarterIndex, type Frequency} from '../../src/time/period.js';
import {mulberry32} from '../../src/analyse/numeric/mulberry32.js';
import {analysisOptions, defaultBranding, planFixture, seriesPlanFixture} from '../fixtures/plans.js';
import {source} from '../ingest/plan.js';

/**
 * Synthetic reports for render tests and the render benchmark. Values are a seeded trend + sine season +
 * noise; the decomposition-like arrays are built from the same parts, so charts look like real output.
 * They are drawing inputs only, not checks of any method.
 */

export const options: AnalysisOptions = analysisOptions();

export interface FixtureOptions {
  frequency?: Frequency;
  /** Number of series. Default: 3. */
  count?: number;
  /** Observations per series. Default: 8 years. */
  length?: number;
  /** Label of series 0. */
  firstLabel?: string;
  history?: boolean;
  locale?: string;
  /** Make series 1 too short to adjust (no adjustment, forecast or cycle). */
  shortSecond?: boolean;
}

export function seriesAnalysis(id: string, frequency: Frequency, end: number, length: number, seed: number): SeriesAnalysis {
  const rand = mulberry32(seed);
  const p = periodsPerYear[frequency];
  const start = end - length + 1;
  const level = 800 + seed * 137;
  const trend: number[] = [];
  const seasonal: number[] = [];
  const irregular: number[] = [];
  const original: number[] = [];
  for (let i = 0; i < length; i++) {
    const tr = level * (1 + 0.004 * i) + 40 * Math.sin((2 * Math.PI * i) / (p * 3.5));
    const s = 1 + (0.1 + 0.0006 * i) * Math.sin((2 * Math.PI * (start + i)) / p) + 0.04 * Math.cos((4 * Math.PI * (start + i)) / p);
    const e = 1 + (rand() - 0.5) * 0.04 + (i === Math.floor(length * 0.6) ? 0.11 : 0);
    trend.push(tr);
    seasonal.push(s);
    irregular.push(e);
    original.push(tr * s * e);
  }
  original[Math.floor(length * 0.3)] = NaN;
  const adjusted = original.map((v, i) => v / seasonal[i]);
  const yearOnYearSeries = original.map((v, i) => (i >= p ? (v / original[i - p] - 1) * 100 : NaN));
  const gap = trend.map((t, i) => ((t - level * (1 + 0.004 * i)) / (level * (1 + 0.004 * i))) * 100);
  const h = 12;
  const last = trend[length - 1] * 1.004;
  const mean = Array.from({length: h}, (_, k) => last * (1 + 0.004 * k) * seasonal[length - p + (k % p)]);
  const spread = (z: number) => mean.map((m, k) => m * 0.025 * z * Math.sqrt(k + 1));
  const s80 = spread(1.2816);
  const s95 = spread(1.96);
  return {
    id,
    frequency,
    start,
    end,
    original,
    adjustment: {
      method: 'stl',
      model: 'multiplicative',
      modelReason: 'The seasonal swing grows with the level of the series.',
      trend,
      seasonal,
      irregular,
      adjusted,
      calendar: {
        effect: original.map(() => 1),
        regressors: [
          {
            name: 'working-days',
            coefficient: 0.011,
            standardError: 0.003,
            tStatistic: 3.7,
            pValue: 0.0003,
            significant: true,
            description: 'Each extra working day adds about 1.1% to the month.',
          },
        ],
      },
      outliers: [{index: Math.floor(length * 0.6), kind: 'additive', score: 4.3}],
      filled: original.map((v) => !Number.isFinite(v)),
      diagnostics: {
        varianceShares: {trend: 0.62, seasonal: 0.33, irregular: 0.05},
        residualSeasonality: {test: 'QS', statistic: 0.8, pValue: 0.67, detected: false},
        seasonalStability: 0.004,
        revision: {meanAbsPp: 0.21, periodsTested: 24},
      },
      options: {seasonalWindow: 13, trendWindow: 23, robust: true},
    },
    notAdjustedReason: null,
    changes: {
      yearOnYear: yearOnYearSeries[length - 1],
      periodOnPeriodAdjusted: (adjusted[length - 1] / adjusted[length - 2] - 1) * 100,
      periodOnPeriodAnnualised: ((adjusted[length - 1] / adjusted[length - 2]) ** p - 1) * 100,
      trend: (trend[length - 1] / trend[length - 2] - 1) * 100,
      trendAnnualised: ((trend[length - 1] / trend[length - 2]) ** p - 1) * 100,
      yearToDate: 3.2,
      yearOnYearSeries,
      trendDirection: 'rising',
    },
    cycle: {
      method: 'hp',
      trend: trend.map((t, i) => level * (1 + 0.004 * i) + 0 * t),
      gap,
      phase: 'rising-above',
      phaseLabel: 'above trend, rising',
      direction: 'rising',
      turningPoints: [
        {index: Math.round(p * 0.875), type: 'peak', provisional: false},
        {index: Math.round(p * 2.625), type: 'trough', provisional: false},
        {index: Math.round(p * 4.375), type: 'peak', provisional: false},
        {index: Math.round(p * 6.125), type: 'trough', provisional: true},
      ].filter((t) => t.index < length) as TurningPoint[],
      periodsSinceTurn: 7,
      amplitudeRatio: 0.9,
      stationarity: {
        test: 'ADF',
        level: {statistic: -1.9, pValue: 0.33, stationary: false},
        differences: {statistic: -6.2, pValue: 0.01, stationary: true},
        variance: {test: 'Breusch-Pagan', statistic: 2.1, pValue: 0.15, constant: true},
      },
      options: {lambda: 129600},
    },
    forecast: {
      method: 'ETS(M,Ad,M)',
      startOffset: length,
      mean,
      levels: [80, 95],
      lower: {'80': mean.map((m, k) => m - s80[k]), '95': mean.map((m, k) => m - s95[k])},
      upper: {'80': mean.map((m, k) => m + s80[k]), '95': mean.map((m, k) => m + s95[k])},
      backtest: {
        origins: 6,
        horizon: h,
        mase: 0.74,
        smape: 3.9,
        benchmarks: [
          {method: 'Seasonal naive', mase: 1, smape: 5.6},
          {method: 'Theta', mase: 0.81, smape: 4.2},
        ],
        points: Array.from({length: 6}, (_, k) => ({offset: length - 6 + k, forecast: original[length - 6 + k] * (1 + (rand() - 0.5) * 0.05)})),
        paths: [],
      },
      options: {alpha: 0.31, beta: 0.02, gamma: 0.1, phi: 0.97},
      notes: [],
      residuals: [],
    },
    outturn: {
      fiscalYear: 'FY2026',
      actualToDate: 9500,
      periodsActual: 10,
      forecastRemaining: 2100,
      periodsRemaining: 2,
      total: 11600,
      level: 80,
      lower: 11350,
      upper: 11850,
      target: 11400,
      gapPct: 1.75,
    },
    notes: ['One value was missing (Apr 2021) and was filled for estimation.'],
    options,
  };
}

function shortAnalysis(id: string, frequency: Frequency, end: number, seed: number): SeriesAnalysis {
  const full = seriesAnalysis(id, frequency, end, 14, seed);
  return {
    ...full,
    adjustment: null,
    notAdjustedReason: 'The series has 14 observations; seasonal adjustment needs at least three full years.',
    cycle: null,
    forecast: null,
    outturn: null,
    changes: {...full.changes, periodOnPeriodAdjusted: NaN, periodOnPeriodAnnualised: NaN, trend: NaN, trendAnnualised: NaN, trendDirection: 'flat'},
    notes: ['Short series: 14 observations.'],
  };
}

export function makeReport(opts: FixtureOptions = {}): Report {
  const frequency = opts.frequency ?? 'monthly';
  const p = periodsPerYear[frequency];
  const count = opts.count ?? 3;
  const length = opts.length ?? 8 * p;
  const end = frequency === 'monthly' ? monthIndex(2026, 10) : frequency === 'quarterly' ? quarterIndex(2026, 3) : 2960;
  const labels = ['Net sales', 'Orders received', 'Headcount', 'Web visits', 'Returns'];
  const series: ReportSeries[] = Array.from({length: count}, (_, k) => {
    const id = `series-${k + 1}`;
    const plan = seriesPlanFixture({
      id,
      label: k === 0 && opts.firstLabel !== undefined ? opts.firstLabel : `${labels[k % labels.length]}${k >= labels.length ? ` ${k + 1}` : ''}`,
      unit: k % 2 === 0 ? 'EUR k' : 'orders',
      column: k === 0 && opts.firstLabel !== undefined ? opts.firstLabel : `col_${k + 1}`,
      analysis: {...options, forecast: {...options.forecast, horizon: 12}},
      line: 10 + k * 4,
    });
    const analysis = opts.shortSecond && k === 1 ? shortAnalysis(id, frequency, end, k + 1) : seriesAnalysis(id, frequency, end, length, k + 1);
    const callouts: Callout[] = [
      {
        id: `${id}/yoy`,
        seriesId: id,
        rule: 'latest-change',
        severity: k === 0 ? 'alert' : 'info',
        rank: 100 - k,
        text: `${plan.label} rose 4.2% on a year earlier, the fastest growth in two years.`,
        figures: {yoy: 4.2},
        chart: `chart-${id}-overview`,
      },
      {
        id: `${id}/residual`,
        seriesId: id,
        rule: 'large-residual',
        severity: 'watch',
        rank: 50 - k,
        text: 'One unusually high month was flagged and kept out of the seasonal estimate.',
        figures: {score: 4.3},
        chart: `chart-${id}-irregular`,
      },
    ];
    return {plan, analysis, callouts, combination: null};
  });
  const plan = planFixture({
    id: 'monthly-pack',
    title: 'Harbourline Trading monthly review',
    subtitle: 'Sales, orders and staffing',
    organisation: 'Harbourline Trading Ltd',
    preparedBy: 'Finance analytics team',
    confidentiality: 'Confidential: prepared for the board',
    frequency,
    period: end,
    formats: ['html', 'pdf'],
    locale: opts.locale ?? 'en-GB',
    branding: {...defaultBranding, footer: 'Harbourline Trading · internal'},
    sources: [source('trading', '/packs/harbourline/data/trading.csv', {line: 5})],
    series: series.map((s) => s.plan),
    groups:
      count >= 3
        ? [{id: 'sales', title: 'Sales and orders', series: ['series-1', 'series-2'], total: null, adjustTotal: 'direct', reconcile: 'mint', line: 1}]
        : [],
  });
  const history: History | null = opts.history
    ? {
        previousPeriod: '2026-09',
        revisions: [
          {seriesId: 'series-1', period: '2026-09', kind: 'data', measure: 'original', previous: 1000, current: 1012, revisionPct: 1.2, large: true},
          {seriesId: 'series-1', period: '2026-08', kind: 'estimate', measure: 'adjusted', previous: 990, current: 993, revisionPct: 0.3, large: false},
          {seriesId: 'series-2', period: '2026-09', kind: 'estimate', measure: 'trend-direction', previous: 'flat', current: 'rising', revisionPct: null, large: false},
        ],
        tracking: [1, 2, 3, 4].flatMap((k) => [
          {
            seriesId: 'series-1',
            publishedIn: `2026-0${5 + k - 1}`,
            period: `2026-0${5 + k}`,
            horizon: 1,
            forecast: 1000 + k * 10,
            actual: 1000 + k * 12,
            error: k * 2,
            inside: {'80': k !== 3, '95': true},
          },
        ]),
        trackingSummary: [{seriesId: 'series-1', count: 4, mase: 0.62, coverage: {'80': 0.75, '95': 1}}],
      }
    : null;
  return {
    plan,
    period: end,
    periodLabel: frequency === 'monthly' ? '2026-10' : frequency === 'quarterly' ? '2026-Q3' : '2026-W41',
    toolVersion: '0.1.0',
    series,
    callouts: series.flatMap((s) => s.callouts).sort((a, b) => b.rank - a.rank).slice(0, 5),
    inputs: [{file: '/packs/harbourline/data/trading.csv', sha256: 'ab'.repeat(32), bytes: 12345, rows: 96}],
    notes: [{file: '/packs/harbourline/data/trading.csv', line: 42, message: 'Blank value for col_1 in Apr 2021.'}],
    history,
    groups: [],
  };
}
