import type {TopLevelSpec} from 'vega-lite';
import type {TurningPoint} from '../../analyse/cycle/types.js';
import {epoch, finite, frame, round, timeX, type ChartContext, utcTime, when, zeroRule} from './common.js';
import {hasFinite, type SeriesChart} from './seriesChart.js';
import {phaseWords} from '../../words/index.js';

/** Deviation from long-run trend (percent) with dated turning points and the current phase. */
export interface CycleInput {
  start: number;
  gap: number[];
  turningPoints: TurningPoint[];
  description: string;
}

const TURN_SHAPES = ['triangle-down', 'triangle-up', 'triangle-down', 'triangle-up'];

/**
 * Cycle chart: the gap to the long-run trend as a shaded area around zero with its outline, peaks as
 * downward triangles and troughs as upward triangles (hollow when provisional), and the latest point
 * marked (the caption names the current phase). O(n).
 */
export function cycleChart(input: CycleInput, ctx: ChartContext): TopLevelSpec {
  const {theme, frequency, words: w} = ctx;
  const TURN_KEYS = [w.t('legend.peak'), w.t('legend.trough'), w.t('legend.provisionalPeak'), w.t('legend.provisionalTrough')];
  const t = (i: number) => epoch(frequency, input.start + i);
  const values = input.gap.map((g, i) => ({t: t(i), v: round(finite(g))}));
  const turns = input.turningPoints
    .filter((p) => p.index >= 0 && p.index < input.gap.length && finite(input.gap[p.index]) !== null)
    .map((p) => ({
      t: t(p.index),
      v: round(finite(input.gap[p.index])),
      k: TURN_KEYS[(p.type === 'peak' ? 0 : 1) + (p.provisional ? 2 : 0)],
    }));
  const lastIndex = values.map((r) => r.v !== null).lastIndexOf(true);
  const last = lastIndex >= 0 ? [values[lastIndex]] : [];
  const present = TURN_KEYS.map((k, i) => [k, i] as const).filter(([k]) => turns.some((r) => r.k === k));
  const turnLegend = {
    symbolOpacity: 1,
    encode: {symbols: {update: {stroke: {value: theme.contrast}, strokeWidth: {value: 1.3}}}},
  };
  return {
    ...frame(input.description, ctx.width, ctx.height, theme),
    layer: [
      {
        data: {values},
        mark: {type: 'area', color: theme.tint, opacity: 0.9},
        encoding: {
          x: timeX(frequency, input.gap.length),
          y: {field: 'v', type: 'quantitative', title: w.t('axis.cycle'), axis: {format: ',~r'}},
          y2: {datum: 0},
        },
      },
      {data: {values}, mark: {type: 'line', color: theme.deep, strokeWidth: 1.6}, encoding: {x: utcTime(), y: {field: 'v', type: 'quantitative'}}},
      zeroRule(theme),
      ...when(turns.length > 0, {
        data: {values: turns},
        mark: {type: 'point', size: 60, strokeWidth: 1.3, opacity: 1, color: theme.contrast},
        encoding: {
          x: utcTime(),
          y: {field: 'v', type: 'quantitative'},
          shape: {
            field: 'k',
            type: 'nominal',
            scale: {domain: present.map(([k]) => k), range: present.map(([, i]) => TURN_SHAPES[i])},
            legend: turnLegend,
          },
          fill: {
            field: 'k',
            type: 'nominal',
            scale: {domain: present.map(([k]) => k), range: present.map(([, i]) => (i < 2 ? theme.contrast : 'white'))},
            legend: turnLegend,
          },
        },
      }),
      ...when(last.length > 0, {
        data: {values: last},
        mark: {type: 'point', filled: true, size: 45, color: theme.deep},
        encoding: {x: utcTime(), y: {field: 'v', type: 'quantitative'}},
      }),
    ],
  };
}

/** Registry entry: the gap to the long-run trend with its turning points. */
export const cycleEntry: SeriesChart = {
  name: 'cycle',
  row: 3,
  shows: ({analysis: a}) => a.cycle !== null && hasFinite(a.cycle.gap),
  build({series: s, analysis: a, words: w}, ctx) {
    const cy = a.cycle!;
    const phase = phaseWords(w, cy);
    const description = w.t('describe.cycle', {name: s.label, n: cy.turningPoints.length, phase});
    const provisional = cy.turningPoints.some((p) => p.provisional) ? ` ${w.t('chart.provisionalNote')}` : '';
    return {
      caption: w.t('chart.cycle'),
      spec: cycleChart({start: a.start, gap: cy.gap, turningPoints: cy.turningPoints, description}, ctx),
      note: `${w.t('chart.cycleNote', {phase})}${provisional}`,
    };
  },
};
