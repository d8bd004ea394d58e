import {describe, expect, test} from 'vitest';
import {contributionsChart} from '../../src/render/charts/contributions.js';
import type {ChartContext} from '../../src/render/charts/common.js';
import {specToSvg} from '../../src/render/svg.js';
import {themeFor} from '../../src/render/theme.js';
import {monthIndex} from '../../src/time/period.js';

const theme = themeFor('#1d6f64', 'Liberation Sans');
const ctx: ChartContext = {frequency: 'monthly', theme, width: 300, height: 100, unit: null, seasonNames: []};
const input = {
  start: monthIndex(2026, 9),
  history: [
    {total: 2.5, parts: {north: 3, web: -0.5}},
    {total: NaN, parts: {north: 1, web: NaN}},
  ],
  parts: [
    {id: 'north', label: 'North'},
    {id: 'web', label: 'Web'},
  ],
  totalLabel: 'Total',
  axisTitle: 'points of the change on a year earlier',
  description: 'Contributions to the change of net sales',
};
const layers = (spec: object) => (spec as {layer: {data: {values: unknown[]}}[]}).layer;

describe('contributionsChart', () => {
  test('one bar per part and period, the total as a tick, missing values left out', () => {
    const spec = contributionsChart(input, ctx);
    const [bars, ticks] = layers(spec);
    expect(bars.data.values).toEqual([
      {t: Date.UTC(2026, 8, 1), v: 3, part: 'North', order: 0},
      {t: Date.UTC(2026, 8, 1), v: -0.5, part: 'Web', order: 1},
      {t: Date.UTC(2026, 9, 1), v: 1, part: 'North', order: 0},
    ]);
    expect(ticks.data.values).toEqual([{t: Date.UTC(2026, 8, 1), v: 2.5, what: 'Total'}]);
  });
  test('draws to SVG with the legend in the given words', async () => {
    const svg = await specToSvg(contributionsChart(input, ctx), {
      locale: 'en-GB',
      font: 'Liberation Sans',
      idPrefix: 'c1',
      title: 'Contributions',
      description: input.description,
    });
    expect(svg).toContain('North');
    expect(svg).toContain('<svg');
  });
});
