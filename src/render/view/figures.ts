import type {Plan, SeriesPlan} from '../../config/plan.js';
import type {SeriesAnalysis} from '../../analyse/types.js';
import {periodsPerYear} from '../../time/period.js';
import {wordsFor, type Words} from '../../words/index.js';
import {chartAnchor} from '../../narrate/chartAnchor.js';
import {seriesCharts} from '../charts/registry.js';
import type {GroupChartData} from '../charts/seriesChart.js';
import type {ChartContext} from '../charts/common.js';
import {themeFor} from '../theme.js';
import {pageGeometry} from './geometry.js';
import type {FigureSlot} from './types.js';

/**
 * The chart rows of one series section, from the chart registry: each registered chart the series has something
 * for, grouped by the entry's row; a row of one chart is full width (210 px high), a row of two shares the width
 * (180 px high). Built from the plan and the analysis (and, for a group's total, its parts' contributions), so
 * charts can be drawn ahead while other series are still being analysed.
 */
export function seriesFigureRows(
  plan: Plan,
  series: SeriesPlan,
  analysis: SeriesAnalysis,
  w: Words = wordsFor(plan.locale),
  group: GroupChartData | null = null,
): FigureSlot[][] {
  const theme = themeFor(plan.branding.accent, plan.branding.font);
  const geometry = pageGeometry(plan.branding.paper, plan.branding.orientation);
  const frequency = analysis.frequency;
  const seasonNames = Array.from({length: periodsPerYear[frequency]}, (_, k) => w.season(frequency, k));
  const half = Math.floor((geometry.width - 18) / 2);
  const ctx = (size: 'full' | 'half'): ChartContext => ({
    frequency,
    theme,
    width: size === 'full' ? geometry.width : half,
    height: size === 'full' ? 210 : 180,
    unit: series.unit,
    seasonNames,
    words: w,
  });
  const input = {series, analysis, words: w, group};
  const shown = seriesCharts.filter((c) => c.shows(input));
  const rows = [...new Set(shown.map((c) => c.row))];
  return rows.map((row) => {
    const inRow = shown.filter((c) => c.row === row);
    const size = inRow.length > 1 ? 'half' : 'full';
    return inRow.map((c) => {
      const {caption, spec, note} = c.build(input, ctx(size));
      const chart = {id: chartAnchor(series.id, c.name), caption, title: w.t('chart.titleOf', {name: series.label, caption}), spec, size, note} as const;
      return {chart: {...chart}, svg: null};
    });
  });
}

/** The chart slots of one series, in page order (for drawing ahead). */
export function seriesFigureSlots(plan: Plan, series: SeriesPlan, analysis: SeriesAnalysis): FigureSlot[] {
  return seriesFigureRows(plan, series, analysis).flat();
}
