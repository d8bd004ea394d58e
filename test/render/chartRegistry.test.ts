import {readdirSync, readFileSync} from 'node:fs';
import {join} from 'node:path';
import {describe, expect, test} from 'vitest';
import {seriesCharts} from '../../src/render/charts/registry.js';
import {seriesFigureRows} from '../../src/render/view/figures.js';
import {makeReport} from './fixtures.js';

describe('chart registry', () => {
  test('every chart a callout points at is registered, and names are unique', () => {
    const names = seriesCharts.map((c) => c.name);
    expect(new Set(names).size).toBe(names.length);
    const dir = join(import.meta.dirname, '../../src/narrate/callouts');
    const used = new Set<string>();
    for (const file of readdirSync(dir)) {
      for (const m of readFileSync(join(dir, file), 'utf8').matchAll(/chartAnchor\([^,]+, '([a-z-]+)'\)/g)) used.add(m[1]);
    }
    expect(used.size).toBeGreaterThan(3);
    expect([...used].filter((n) => !names.includes(n))).toEqual([]);
  });

  test('lays the charts out by row: one chart is full width, two share a row', () => {
    const report = makeReport({count: 2, shortSecond: true});
    const full = seriesFigureRows(report.plan, report.series[0].plan, report.series[0].analysis);
    expect(full.map((row) => row.map((slot) => `${slot.chart.id.replace('chart-series-1-', '')}:${slot.chart.size}`))).toEqual([
      ['overview:full'],
      ['seasonal:half', 'yoy:half'],
      ['irregular:half', 'cycle:half'],
      ['forecast:full'],
    ]);
    const short = seriesFigureRows(report.plan, report.series[1].plan, report.series[1].analysis);
    expect(short.flat().map((slot) => slot.chart.id)).toEqual(['chart-series-2-overview', 'chart-series-2-yoy']);
    expect(short[1][0].chart.size).toBe('full');
  });
});
