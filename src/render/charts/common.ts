import type {Config} from 'vega-lite/types_unstable/config.js';
import type {LayerSpec} from 'vega-lite/types_unstable/spec/layer.js';
import type {UnitSpec} from 'vega-lite/types_unstable/spec/unit.js';
import type {Field} from 'vega-lite/types_unstable/channeldef.js';
import type {Frequency} from '../../time/period.js';
import {periodStartDay, periodsPerYear} from '../../time/period.js';
import type {Theme} from '../theme.js';
import type {Words} from '../../words/index.js';

/**
 * Shared pieces of every chart spec: sizes, the theme's axis and legend styles, UTC time axes and the
 * conversion of period indexes to epoch milliseconds at UTC midnight (so a date can never shift by the
 * reader's time zone). Pure.
 */
export interface ChartContext {
  frequency: Frequency;
  theme: Theme;
  /** Drawing width in px (the SVG scales to the page column). */
  width: number;
  height: number;
  /** Unit shown in value-axis titles, or null. */
  unit: string | null;
  /** Season names for the seasonal-pattern axis (Jan…Dec, Q1…Q4). */
  seasonNames: string[];
  /** Legend and axis words in the pack's language. */
  words: Words;
}

export const SCHEMA = 'https://vega.github.io/schema/vega-lite/v6.json';

/** Epoch ms of a period's first day at UTC midnight. */
export function epoch(frequency: Frequency, index: number): number {
  return periodStartDay(frequency, index) * 86_400_000;
}

/** `null` for NaN/±Infinity so vega breaks the line instead of drawing to zero. */
export function finite(value: number | undefined): number | null {
  return value !== undefined && Number.isFinite(value) ? value : null;
}

/** Round to 6 significant digits: enough for drawing, and keeps specs and SVGs compact and stable. */
export function round(value: number | null): number | null {
  return value === null ? null : Number(value.toPrecision(6));
}

/** A thin ink rule at zero, the reference line of the charts of changes and deviations. */
export function zeroRule(theme: Theme) {
  return {
    data: {values: [{}]},
    mark: {type: 'rule' as const, color: theme.ink, strokeWidth: 0.8},
    encoding: {y: {datum: 0}},
  };
}

/** The top of every chart spec: schema, the accessible description, size fitted with its padding, our config. */
export function frame(description: string, width: number, height: number, theme: Theme) {
  return {
    $schema: SCHEMA,
    description,
    width,
    height,
    autosize: {type: 'fit' as const, contains: 'padding' as const},
    config: baseConfig(theme),
  };
}

export function baseConfig(theme: Theme): Config {
  return {
    // The chart as a whole is one image with a title and description (svg.ts), not a set of labelled marks.
    aria: false,
    font: theme.font,
    background: 'white',
    view: {stroke: null},
    axis: {
      labelFontSize: 10,
      titleFontSize: 10,
      titleFontWeight: 'normal',
      labelColor: theme.muted,
      titleColor: theme.muted,
      domainColor: theme.rule,
      tickColor: theme.rule,
      gridColor: '#eceef0',
      labelOverlap: true,
    },
    legend: {
      orient: 'top',
      direction: 'horizontal',
      title: null,
      labelFontSize: 10,
      labelColor: theme.ink,
      symbolSize: 120,
      padding: 0,
      offset: 6,
    },
  };
}

/**
 * The time field `t` on a UTC scale. Every layer that encodes `t` uses it (not only the one carrying the
 * axis): vega-lite formats a layer's tooltips and aria labels in local time unless that layer's own scale
 * is UTC, which would shift dates by the reader's time zone.
 */
export function utcTime() {
  return {field: 't', type: 'temporal' as const, scale: {type: 'utc' as const}};
}

/**
 * A UTC time x-axis whose ticks suit the span: yearly ticks for long spans, quarters or months for short
 * ones, labelled with locale month names (`%b %Y`) or years.
 */
export function timeX(frequency: Frequency, periods: number, title: string | null = null) {
  const years = periods / periodsPerYear[frequency];
  const axis =
    years > 4
      ? {format: '%Y', tickCount: {interval: 'year' as const, step: Math.max(1, Math.ceil(years / 10))}}
      : years > 1.5
        ? {format: '%b %Y', tickCount: {interval: 'month' as const, step: 6}}
        : {format: '%b %Y', tickCount: {interval: 'month' as const, step: frequency === 'quarterly' ? 3 : 2}};
  return {...utcTime(), title, axis: {...axis, grid: false}};
}

export const VALUE_FORMAT = ',~r';

/** One layer of a layered chart. */
export type Layer = LayerSpec<Field> | UnitSpec<Field>;

/** `[layer]` when `condition` holds, else `[]`: layers without rows are left out, as vega warns on empty extents. */
export function when(condition: boolean, layer: Layer): Layer[] {
  return condition ? [layer] : [];
}
