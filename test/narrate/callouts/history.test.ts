import {describe, expect, it} from 'vitest';
import type {History, RevisionRow, TrackingRow} from '../../../src/results/index.js';
import {revisionsRule} from '../../../src/narrate/callouts/revisions.js';
import {forecastTrackingRule} from '../../../src/narrate/callouts/forecastTracking.js';
import {forecastCheckRule} from '../../../src/narrate/callouts/forecastCheck.js';
import {makeAnalysis, runRule} from '../fixtures.js';

const revision = (over: Partial<RevisionRow>): RevisionRow => ({
  seriesId: 'net-sales',
  period: '2026-09',
  kind: 'estimate',
  measure: 'adjusted',
  previous: 1950,
  current: 1950,
  revisionPct: 0,
  large: true,
  ...over,
});

const tracked = (over: Partial<TrackingRow>): TrackingRow => ({
  seriesId: 'net-sales',
  publishedIn: '2026-09',
  period: '2026-10',
  horizon: 1,
  forecast: 2010,
  actual: 2025,
  error: 15,
  inside: {'80': true, '95': true},
  ...over,
});

const history: History = {
  previousPeriod: '2026-09',
  revisions: [
    revision({current: 1985.1, revisionPct: 1.8}),
    revision({period: '2026-08', kind: 'data', measure: 'original', previous: 2000, current: 1930, revisionPct: -3.5}),
    revision({period: '2026-07', current: 1951, revisionPct: 0.05, large: false}),
    revision({measure: 'cycle-phase', previous: 'rising-above', current: 'falling-above', revisionPct: null}),
    revision({seriesId: 'footfall', kind: 'data', measure: 'original', previous: 1, current: 2, revisionPct: 100}),
  ],
  tracking: [tracked({publishedIn: '2026-08', horizon: 2, forecast: 1990, error: 35}), tracked({})],
  trackingSummary: [{seriesId: 'net-sales', count: 8, mase: 0.84, coverage: {'80': 0.75, '95': 1}}],
};

const analysis = makeAnalysis(new Array<number>(24).fill(2000));

describe('revision rule', () => {
  it('reports the large revisions of this series only', () => {
    const drafts = runRule(revisionsRule, analysis, {history});
    expect(drafts.map((d) => [d.severity, d.text])).toEqual([
      ['watch', 'The seasonally adjusted figure of Net sales for September 2026 was revised up by 1.8% since the September 2026 pack, from 1,950 to 1,985 EUR k.'],
      ['alert', 'The reported value of Net sales for August 2026 was revised down by 3.5% since the September 2026 pack, from 2,000 to 1,930 EUR k.'],
      ['watch', 'Since the September 2026 pack, the cycle phase of Net sales for September 2026 changed from above trend and rising to above trend but falling.'],
    ]);
  });

  it('is silent without history', () => {
    expect(runRule(revisionsRule, analysis)).toEqual([]);
  });
});

describe('forecast-tracking and forecast-check rules', () => {
  it('summarise the record of published forecasts', () => {
    const [d] = runRule(forecastTrackingRule, analysis, {history});
    expect(d.text).toBe(
      'Forecasts of Net sales from earlier packs: 8 forecasts checked against actuals so far, 6 inside their 80% range (75%); running MASE 0.84.',
    );
    expect(d.severity).toBe('info');
    const poor = {...history, trackingSummary: [{seriesId: 'net-sales', count: 1, mase: 1.4, coverage: {'80': 0}}]};
    const [one] = runRule(forecastTrackingRule, analysis, {history: poor});
    expect(one.text).toBe(
      'Forecasts of Net sales from earlier packs: 1 forecast checked against actuals so far, 0 inside their 80% range (0%); running MASE 1.40.',
    );
    expect(one.severity).toBe('info'); // too few to judge
  });

  it('checks the shortest-horizon forecast for the review period', () => {
    const [d] = runRule(forecastCheckRule, analysis, {history});
    expect(d.text).toBe(
      'The September 2026 pack forecast 2,010 EUR k of Net sales for October 2026; the actual came in at 2,025 EUR k (+0.7%), inside the 80% range.',
    );
    expect(d.figures.horizon).toBe(1);
  });
});
