import type {TopLevelSpec} from 'vega-lite';
import type {SeriesPlan} from '../../config/plan.js';
import type {SeriesAnalysis} from '../../analyse/types.js';
import type {Words} from '../../words/index.js';
import type {ChartContext} from './common.js';

/** What a series chart is drawn from: the series, its analysis and the pack's words. */
export interface SeriesChartInput {
  series: SeriesPlan;
  analysis: SeriesAnalysis;
  words: Words;
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
