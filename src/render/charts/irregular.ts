import type {TopLevelSpec} from 'vega-lite';
import type {Outlier} from '../../analyse/decompose/types.js';
import {epoch, finite, frame, round, timeX, type ChartContext, utcTime, when, zeroRule} from './common.js';
import {hasFinite, type SeriesChart} from './seriesChart.js';

/** Irregular component with the flagged points. */
export interface IrregularInput {
  start: number;
  irregular: number[];
  model: 'additive' | 'multiplicative';
  outliers: Outlier[];
  /** Locale labels of flagged periods, keyed by index into the series. */
  labels: Record<number, string>;
  description: string;
}

/**
 * The irregular as thin stems from zero (percent for multiplicative factors, the unit for additive ones),
 * with flagged points drawn as larger shapes (one shape per kind) in the contrast colour and labelled with
 * their period. O(n).
 */
export function irregularChart(input: IrregularInput, ctx: ChartContext): TopLevelSpec {
  const {theme, frequency, words: w} = ctx;
  const OUTLIER_KINDS: Record<Outlier['kind'], string> = {
    additive: w.t('legend.additive'),
    'level-shift': w.t('legend.level-shift'),
    temporary: w.t('legend.temporary'),
  };
  const scale = (v: number | null) => (v === null ? null : round(input.model === 'multiplicative' ? (v - 1) * 100 : v));
  const values = input.irregular.map((value, i) => ({t: epoch(frequency, input.start + i), v: scale(finite(value))}));
  const flagged = input.outliers
    .filter((o) => o.index >= 0 && o.index < input.irregular.length && finite(input.irregular[o.index]) !== null)
    .map((o) => ({
      t: epoch(frequency, input.start + o.index),
      v: scale(finite(input.irregular[o.index])),
      k: OUTLIER_KINDS[o.kind],
      label: input.labels[o.index] ?? '',
      above: (input.irregular[o.index] ?? 0) >= (input.model === 'multiplicative' ? 1 : 0),
    }));
  const shapes: Record<string, string> = {[OUTLIER_KINDS.additive]: 'circle', [OUTLIER_KINDS['level-shift']]: 'square', [OUTLIER_KINDS.temporary]: 'triangle-up'};
  const kinds = Object.values(OUTLIER_KINDS).filter((k) => flagged.some((r) => r.k === k));
  return {
    ...frame(input.description, ctx.width, ctx.height, theme),
    layer: [
      {
        data: {values},
        mark: {type: 'rule', color: theme.neutral, strokeWidth: 1},
        encoding: {
          x: timeX(frequency, input.irregular.length),
          // Padding leaves room for the period labels of flagged points at the top and bottom.
          y: {
            field: 'v',
            type: 'quantitative',
            scale: {padding: 14},
            title: input.model === 'multiplicative' ? w.t('axis.irregular') : ctx.unit,
          },
          y2: {datum: 0},
        },
      },
      zeroRule(theme),
      ...when(flagged.length > 0, {
        data: {values: flagged},
        layer: [
          {
            mark: {type: 'point', filled: true, size: 70, opacity: 1, color: theme.contrast, stroke: 'white', strokeWidth: 0.8},
            encoding: {
              x: utcTime(),
              y: {field: 'v', type: 'quantitative'},
              shape: {
                field: 'k',
                type: 'nominal',
                scale: {domain: kinds, range: kinds.map((k) => shapes[k])},
                legend: {symbolFillColor: theme.contrast, symbolStrokeColor: theme.contrast, symbolOpacity: 1},
              },
            },
          },
          ...[true, false].flatMap((above) =>
            when(flagged.some((r) => r.above === above), {
              transform: [{filter: {field: 'above', equal: above}}],
              mark: {type: 'text', fontSize: 9, color: theme.ink, dy: above ? -10 : 12},
              encoding: {x: utcTime(), y: {field: 'v', type: 'quantitative'}, text: {field: 'label'}},
            }),
          ),
        ],
      }),
    ],
  };
}

/** Registry entry: the irregular of an adjusted series with its flagged values, beside the cycle chart. */
export const irregularEntry: SeriesChart = {
  name: 'irregular',
  row: 3,
  shows: ({analysis: a}) => a.adjustment !== null && hasFinite(a.adjustment.irregular),
  build({series: s, analysis: a, words: w}, ctx) {
    const adj = a.adjustment!;
    const labels: Record<number, string> = {};
    for (const o of adj.outliers) labels[o.index] = w.period(a.frequency, a.start + o.index);
    const flagged = adj.outliers.map((o) => w.t('describe.flagged', {period: labels[o.index], kind: w.t(`outlier.${o.kind}`)}));
    const description = w.t('describe.irregular', {name: s.label, n: flagged.length, list: flagged.join(', ')});
    return {
      caption: w.t(adj.outliers.length > 0 ? 'chart.irregularFlagged' : 'chart.irregular'),
      spec: irregularChart({start: a.start, irregular: adj.irregular, model: adj.model, outliers: adj.outliers, labels, description}, ctx),
      note: null,
    };
  },
};
