import type {SeriesChart} from './seriesChart.js';
import {overviewEntry} from './overview.js';
import {contributionsEntry} from './contributions.js';
import {seasonalEntry} from './seasonal.js';
import {yearOnYearEntry} from './yearOnYear.js';
import {irregularEntry} from './irregular.js';
import {cycleEntry} from './cycle.js';
import {forecastEntry} from './forecast.js';

/**
 * Every chart of a series section, in page order. Adding a chart: one file with its spec builder and its entry
 * (see `seriesChart.ts`), and one line here; callouts point at it by the entry's `name`.
 */
export const seriesCharts: readonly SeriesChart[] = [
  overviewEntry,
  contributionsEntry,
  seasonalEntry,
  yearOnYearEntry,
  irregularEntry,
  cycleEntry,
  forecastEntry,
];
