/** Tiny hand-made results objects for the history tests (only the fields history reads are meaningful). */
import type {ResultsV1, SeriesResults} from '../../src/render/results.js';
import type {ResultsLike} from '../../src/archive/revisions.js';

export interface Hand {
  id?: string;
  periods: string[];
  original: (number | null)[];
  adjusted?: (number | null)[];
  trendDirection?: 'rising' | 'falling' | 'flat';
  phase?: NonNullable<SeriesResults['cycle']>['phase'];
  forecast?: {
    periods: string[];
    mean: (number | null)[];
    lower: Record<string, number[]>;
    upper: Record<string, number[]>;
  };
}

export function hand(period: string, frequency: 12 | 4 | 52, series: Hand[]): ResultsLike {
  const pack: ResultsV1['pack'] = {
    id: 'harbourline-quarterly',
    title: 'Harbourline Goods: quarterly review',
    subtitle: null,
    organisation: null,
    period,
    frequency,
    locale: 'en-GB',
    fiscalYearStart: 1,
  };
  return {pack, series: series.map(one)};
}

function one(h: Hand): SeriesResults {
  const n = h.periods.length;
  const blank = () => new Array<number | null>(n).fill(null);
  return {
    id: h.id ?? 'orders',
    label: 'Orders',
    unit: null,
    kind: 'flow',
    hidden: false,
    target: null,
    periods: h.periods,
    original: h.original,
    decomposition: {
      method: 'classical',
      model: 'additive',
      modelReason: '',
      trend: blank(),
      seasonal: blank(),
      irregular: blank(),
      adjusted: h.adjusted ?? blank(),
      calendar: null,
      filled: new Array<boolean>(n).fill(false),
      diagnostics: {
        varianceShares: {trend: null, seasonal: null, irregular: null},
        residualSeasonality: {test: '', statistic: null, pValue: null, detected: false},
        seasonalStability: null,
        revision: null,
      },
      options: {},
    },
    notAdjustedReason: null,
    outliers: [],
    cycle:
      h.phase === undefined
        ? null
        : {
            method: 'hp',
            trend: blank(),
            gap: blank(),
            phase: h.phase,
            phaseLabel: '',
            direction: 'flat',
            turningPoints: [],
            periodsSinceTurn: null,
            amplitudeRatio: null,
            stationarity: null,
            options: {},
          },
    changes: {
      yearOnYear: null,
      periodOnPeriodAdjusted: null,
      annualised: null,
      yearToDate: null,
      trend: null,
      trendAnnualised: null,
      trendDirection: h.trendDirection ?? 'flat',
      yearOnYearSeries: blank(),
    },
    forecast:
      h.forecast === undefined
        ? null
        : {method: 'test', levels: [80, 95], backtest: null, notes: [], options: {}, ...h.forecast},
    outturn: null,
    callouts: [],
    notes: [],
    options: {},
  };
}

/** Quarter labels from `2024-Q1`, `count` of them. */
export function quarters(count: number, fromYear = 2024): string[] {
  return Array.from({length: count}, (_, i) => `${fromYear + Math.floor(i / 4)}-Q${(i % 4) + 1}`);
}
