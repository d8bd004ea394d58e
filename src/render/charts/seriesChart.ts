import type {TopLevelSpec} from 'vega-lite';
import type {SeriesPlan} from '../../config/plan.js';
import type {SeriesAnalysis} from '../../analyse/types.js';
import type {Words} from '../../words/index.js';
import type {ChartContext} from './common.js';

/** Contributions of a group's parts to the change of its total, for the chart under the total (combine's figures). */
export interface GroupChartData {
  /** Period index of `history[0]`. */
  start: number;
  /** One entry per period: the total's change on a year earlier (percent) and each part's contribution (points). */
  history: {total: number; parts: Record<string, number>}[];
  /** Parts in the group's order, with their labels. */
  parts: {id: string; label: string}[];
  latest: {period: string; total: number};
}

/**
 * What a series chart is drawn from: the series, its analysis, the pack's words and, for a group's total, its
 * parts' contributions (null for other series, and for charts drawn ahead of the work across series).
 */
export interface SeriesChartInput {
  series: SeriesPlan;
  analysis: SeriesAnalysis;
  words: Words;
  group: GroupChartData | null;
}

/** A chart ready to draw: its caption, vega-lite spec and an optional reading note printed under it. */
export interface DrawnChart {
  caption: string;
  spec: TopLevelSpec;
  note: string | null;
}

/**
 * One chart of a series section, as an entry of the chart registry (`registry.ts`). The view asks each entry
 * whether the series has something to show and lays the charts out by `row`: one chart in a row takes the full
 * width, two share it. Callouts point at a chart by its `name` (see `narrate/chartAnchor.ts`).
 */
export interface SeriesChart {
  /** The anchor suffix: the chart's id is `chart-<series>-<name>`. */
  name: string;
  /** Charts with the same row number share a line of the page. */
  row: number;
  /** True when the series has something to draw in this chart. */
  shows(input: SeriesChartInput): boolean;
  /** The chart at the size `ctx` gives. */
  build(input: SeriesChartInput, ctx: ChartContext): DrawnChart;
}

/** True when at least one value is finite (a chart of no value would draw an empty extent). */
export function hasFinite(values: ArrayLike<number>): boolean {
  for (let i = 0; i < values.length; i++) if (Number.isFinite(values[i])) return true;
  return false;
}
