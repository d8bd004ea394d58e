import {describe, expect, test} from 'vitest';
import {renderHtml} from '../../src/render/index.js';
import {buildView} from '../../src/render/view.js';
import type {Report} from '../../src/render/types.js';
import type {RevisionRow, TrackingRow} from '../../src/results/index.js';
import {makeReport} from './fixtures.js';

const month = (k: number) => `2026-${String(k).padStart(2, '0')}`;

function small(seriesId: string, k: number): RevisionRow {
  return {seriesId, period: month(k), kind: 'estimate', measure: 'adjusted', previous: 100, current: 100.4, revisionPct: 0.4, large: false};
}

function tracked(seriesId: string, period: string, horizon: number): TrackingRow {
  const [y, m] = period.split('-').map(Number);
  const published = new Date(Date.UTC(y, m - 1 - horizon, 1)).toISOString().slice(0, 7);
  return {seriesId, publishedIn: published, period, horizon, forecast: 1000, actual: 1010, error: 10, inside: {'80': true, '95': true}};
}

/**
 * Three series, the third hidden; the review period is 2026-10 and the revision threshold 1% (fixtures.ts).
 * Every hidden-series row carries a marker value so a leak shows up in the HTML.
 */
function backfilled(smallCount: number): Report {
  const report = makeReport({count: 3, history: true});
  report.series[2].plan.hidden = true;
  const hidden = report.series[2].plan.id;
  report.history = {
    previousPeriod: '2026-09',
    revisions: [
      {seriesId: 'series-1', period: '2026-09', kind: 'data', measure: 'original', previous: 1000, current: 1012, revisionPct: 1.2, large: true},
      ...Array.from({length: smallCount}, (_, k) => small('series-1', 1 + (k % 9))),
      {seriesId: 'series-2', period: '2026-10', kind: 'estimate', measure: 'trend-direction', previous: 'flat', current: 'rising', revisionPct: null, large: true},
      {seriesId: 'series-2', period: '2026-10', kind: 'estimate', measure: 'cycle-phase', previous: 'rising-above', current: 'falling-above', revisionPct: null, large: true},
      {seriesId: hidden, period: '2026-09', kind: 'data', measure: 'original', previous: 777_001, current: 999_001, revisionPct: 28.6, large: true},
      small(hidden, 3),
    ],
    tracking: [
      tracked('series-1', '2026-10', 1),
      tracked('series-1', '2026-10', 2),
      tracked('series-1', '2026-10', 3),
      tracked('series-1', '2026-10', 4),
      tracked('series-1', '2026-09', 1),
      tracked('series-2', '2026-10', 1),
      {...tracked(hidden, '2026-10', 1), forecast: 888_001},
    ],
    trackingSummary: [
      {seriesId: 'series-1', count: 5, mase: 0.5, coverage: {'80': 1, '95': 1}},
      {seriesId: 'series-2', count: 1, mase: 0.7, coverage: {'80': 1, '95': 1}},
      {seriesId: hidden, count: 1, mase: 9.99, coverage: {'80': 1, '95': 1}},
    ],
  };
  return report;
}

describe('history view', () => {
  test('hidden series are left out of revisions, tracking, summary and chart', () => {
    const report = backfilled(3);
    const hiddenLabel = report.series[2].plan.label;
    const h = buildView(report, null).history!;
    for (const rows of [h.revisions, h.tracking, h.summary]) expect(rows.map((r) => r.series)).not.toContain(hiddenLabel);
    expect(h.summary.map((r) => r.series)).toEqual([report.series[0].plan.label, report.series[1].plan.label]);
    const points = (h.chart!.chart.spec as {layer: {data: {values: {s: string}[]}}[]}).layer[1].data.values;
    // Six tracked forecasts of the visible series, all of them (not only those for the review period).
    expect(points).toHaveLength(6);
    expect(points.map((p) => p.s)).not.toContain(hiddenLabel);
  });

  test('cycle-phase codes are shown in plain words, trend directions as they are', () => {
    const h = buildView(backfilled(0), null).history!;
    expect(h.revisions.find((r) => r.measure === 'Cycle phase')).toMatchObject({previous: 'above trend and rising', current: 'above trend, easing'});
    expect(h.revisions.find((r) => r.measure === 'Trend direction')).toMatchObject({previous: 'flat', current: 'rising'});
  });

  test('revisions table keeps large rows and trend/cycle calls; one sentence counts the rest', () => {
    const h = buildView(backfilled(120), null).history!;
    expect(h.revisions.map((r) => r.measure)).toEqual(['Original value', 'Trend direction', 'Cycle phase']);
    expect(h.revisionsNote).toBe('120 smaller revisions (each under 1%) are not listed; all of them are in exports/revisions.csv.');
    expect(buildView(backfilled(1), null).history!.revisionsNote).toBe(
      '1 smaller revision (under 1%) is not listed; it is in exports/revisions.csv.',
    );
    expect(buildView(backfilled(0), null).history!.revisionsNote).toBeNull();
  });

  test('threshold with decimals is printed as given', () => {
    const report = backfilled(2);
    report.plan.thresholds.revisionPct = 0.5;
    expect(buildView(report, null).history!.revisionsNote).toContain('(each under 0.5%)');
  });

  test('tracking table lists forecasts for the review period up to three steps ahead', () => {
    const h = buildView(backfilled(0), null).history!;
    expect(h.tracking.map((r) => [r.series, r.publishedIn, r.horizon])).toEqual([
      ['Net sales', 'Sept 2026', '1'],
      ['Net sales', 'Aug 2026', '2'],
      ['Net sales', 'Jul 2026', '3'],
      [h.summary[1].series, 'Sept 2026', '1'],
    ]);
    expect(h.trackingNote).toBe('All 6 checked forecasts are in exports/tracking.csv.');
  });
});

describe('history section in the HTML', () => {
  test('sentences printed, hidden markers absent', async () => {
    const html = await renderHtml(backfilled(120));
    const section = html.slice(html.indexOf('<section class="history"'), html.indexOf('</section>', html.indexOf('<section class="history"')));
    expect(section).toContain('120 smaller revisions (each under 1%) are not listed; all of them are in exports/revisions.csv.');
    expect(section).toContain('All 6 checked forecasts are in exports/tracking.csv.');
    expect(section).toContain('above trend, easing');
    expect(section).not.toContain('falling-above');
    expect(section).not.toMatch(/777,001|999,001|888,001|9\.99/);
    expect(section).not.toContain('No earlier forecast can be checked yet.');
  });

  test('no history rows at all: both plain sentences', async () => {
    const report = backfilled(0);
    report.history = {previousPeriod: '2026-09', revisions: [], tracking: [], trackingSummary: []};
    const html = await renderHtml(report);
    expect(html).toContain('No published figure changed.');
    expect(html).toContain('No earlier forecast can be checked yet.');
  });
});
