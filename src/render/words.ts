import type {Formatter} from './format.js';

/**
 * Fixed wording of the report (headings, labels, cautions), in one place so the voice stays consistent and
 * a later translation has one file to touch. Sentences are our own.
 */
export const SECTION = {
  summary: 'At a glance',
  headline: 'What stands out',
  table: 'Every series',
  history: 'Since the last pack',
  revisions: 'Revised figures',
  tracking: 'How earlier forecasts fared',
  methods: 'Methods and cautions',
  cautions: 'Reading these figures',
  dataNotes: 'Data notes',
} as const;

export const SEVERITY: Record<'info' | 'watch' | 'alert', string> = {info: 'Note', watch: 'Watch', alert: 'Alert'};

export const CAUTIONS: string[] = [
  'Seasonally adjusted figures, trend-cycle estimates and forecasts are statistical estimates made from the data available today. They are revised as new data arrive, most of all for the latest few periods.',
  'Forecast ranges show where, on the model’s own assumptions, the outcome would fall 80 or 95 times in a hundred. They are not guarantees: a change in the business or its market that the history does not contain will not be in the ranges either.',
  'Short series, series with gaps or breaks, and series with recent unusual values give less reliable adjustments and forecasts; the data notes list where this applies.',
  'The long-run trend behind the cycle figures is least certain at the end of the sample (a known property of the Hodrick-Prescott and band-pass filters), so the current phase and the most recent turning points may change once more data arrive.',
  'These are statistical projections, not financial advice. Decisions rest with qualified people who know the business and can weigh what the figures cannot show.',
];

export const DECOMPOSITION_METHOD: Record<string, string> = {
  stl: 'STL (seasonal-trend decomposition by LOESS)',
  classical: 'Classical decomposition by moving averages',
};

export const CYCLE_METHOD: Record<string, string> = {
  hp: 'Hodrick-Prescott filter',
  bandpass: 'Christiano-Fitzgerald band-pass filter',
};

export const MEASURE: Record<string, string> = {
  original: 'Original value',
  adjusted: 'Seasonally adjusted value',
  'trend-direction': 'Trend direction',
  'cycle-phase': 'Cycle phase',
};

export const REVISION_KIND: Record<string, string> = {data: 'Data changed', estimate: 'Re-estimated'};

export const OUTLIER_WORD: Record<string, string> = {
  additive: 'one-off',
  'level-shift': 'level shift',
  temporary: 'temporary change',
};

/** `p = 0.031`, `p < 0.001`. */
export function pValue(f: Formatter, p: number): string {
  if (!Number.isFinite(p)) return 'p not available';
  return p < 0.001 ? `p < ${f.number(0.001, 3)}` : `p = ${f.number(p, 3)}`;
}

/** `1 unusual value`, `2 unusual values`. */
export function plural(count: number, one: string, many: string): string {
  return `${count} ${count === 1 ? one : many}`;
}
