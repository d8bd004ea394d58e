import {describe, expect, it} from 'vitest';
import {parseResults, resultsJson, toResults, RESULTS_SCHEMA} from '../../src/results/index.js';
import {InputError} from '../../src/errors.js';
import {report} from '../archive/fixtures/report.js';

const sample = () =>
  report(2026, 10, [
    {id: 'net-sales', label: 'Net sales', missing: [3]},
    {id: 'budget', hidden: true},
  ]);

describe('toResults', () => {
  it('uses the field names of the ebbflow/results/v2 contract (ARCHITECTURE.md)', () => {
    const r = toResults(sample());
    expect(Object.keys(r)).toEqual(['schema', 'pack', 'series', 'groups', 'callouts', 'notes', 'history']);
    expect(r.schema).toBe('ebbflow/results/v2');
    expect(r.groups).toEqual([]);
    expect(r.series[0]).toMatchObject({better: 'higher', versusTarget: null});
    expect(r.series[0].forecast).toMatchObject({baseMean: null, reconciliation: null});
    expect(r.pack).toMatchObject({title: 'Harbourline Goods: monthly review', period: '2026-10', frequency: 12});
    expect(r.pack.id).toBe('harbourline-monthly');
    expect(r.pack.locale).toBe('en-GB');
    const s = r.series[0];
    expect(Object.keys(s)).toEqual(
      expect.arrayContaining(['id', 'label', 'unit', 'periods', 'original', 'decomposition', 'outliers', 'cycle']),
    );
    expect(Object.keys(s)).toEqual(
      expect.arrayContaining(['changes', 'forecast', 'outturn', 'callouts', 'notes', 'options']),
    );
    expect(Object.keys(s.decomposition!)).toEqual(
      expect.arrayContaining(['method', 'model', 'trend', 'seasonal', 'irregular', 'adjusted', 'calendar']),
    );
    expect(s.decomposition).toMatchObject({method: 'stl', model: 'additive'});
    expect(s.decomposition!.diagnostics.varianceShares).toEqual({trend: 0.6, seasonal: 0.4, irregular: 0});
    expect(s.outliers).toEqual([{period: '2026-06', kind: 'additive', score: 4.25}]);
    expect(Object.keys(s.cycle!)).toEqual(expect.arrayContaining(['method', 'trend', 'gap', 'phase', 'turningPoints']));
    expect(s.cycle!.turningPoints).toEqual([{period: '2025-03', type: 'trough', provisional: false}]);
    expect(Object.keys(s.changes)).toEqual(
      expect.arrayContaining(['yearOnYear', 'periodOnPeriodAdjusted', 'annualised', 'yearToDate', 'trend']),
    );
    expect(s.changes).toMatchObject({trendAnnualised: 4.9, trendDirection: 'rising', annualised: 4.9});
    const f = s.forecast!;
    expect(f.method).toBe('ETS(A,A,A)');
    expect(Object.keys(f.lower)).toEqual(['80', '95']);
    expect(Object.keys(f.upper)).toEqual(['80', '95']);
    expect(f.backtest).toMatchObject({mase: 0.8, smape: 3.1, origins: 6});
    expect(s.callouts[0]).toMatchObject({severity: 'info', text: 'Net sales rose 6.1% on a year earlier.'});
  });

  it('writes periods as canonical labels: 48 months ending 2026-10 start at 2022-11, forecasts at 2026-11', () => {
    const s = toResults(sample()).series[0];
    expect(s.periods[0]).toBe('2022-11');
    expect(s.periods.at(-1)).toBe('2026-10');
    expect(s.forecast!.periods[0]).toBe('2026-11');
    expect(s.forecast!.periods.at(-1)).toBe('2027-10');
    expect(s.forecast!.backtest!.points).toEqual([{period: '2026-10', forecast: expect.any(Number)}]);
  });

  it('writes NaN and ±Infinity as null and keeps every other figure at full precision', () => {
    const rep = sample();
    rep.series[0].analysis.changes.yearOnYear = Infinity;
    rep.series[0].analysis.changes.trend = -Infinity;
    rep.series[0].analysis.original[5] = 0.1 + 0.2;
    const r = toResults(rep);
    const s = r.series[0];
    expect(s.original[3]).toBeNull();
    expect(s.decomposition!.adjusted[3]).toBeNull();
    expect(s.changes.yearOnYear).toBeNull();
    expect(s.changes.trend).toBeNull();
    expect(s.changes.yearOnYearSeries.slice(0, 12)).toEqual(new Array(12).fill(null));
    const text = resultsJson(rep);
    expect(text).not.toMatch(/NaN|Infinity/);
    expect(text).toContain('0.30000000000000004');
    expect(JSON.parse(text).series[0].original[5]).toBe(0.1 + 0.2);
  });

  it('gives the same bytes for the same report, whatever the key order of free-form records', () => {
    const a = sample();
    const b = sample();
    const fc = b.series[0].analysis.forecast!;
    fc.lower = {'80': fc.lower['80'], '95': fc.lower['95']};
    fc.options = {alpha: 0.3, damped: false};
    b.series[0].analysis.adjustment!.options = {trendWindow: 23, robust: false, period: 12, seasonalWindow: 13};
    expect(resultsJson(a)).toBe(resultsJson(b));
    expect(resultsJson(a)).toBe(resultsJson(a));
  });

  it('writes 2-space indented JSON with a trailing newline and data-note paths relative to the pack', () => {
    const text = resultsJson(sample());
    expect(text.startsWith(`{\n  "schema": "${RESULTS_SCHEMA}",\n  "pack": {\n    "id"`)).toBe(true);
    expect(text.endsWith('}\n')).toBe(true);
    expect(toResults(sample()).notes).toEqual([
      {file: 'data/trading.csv', line: 7, message: 'blank cell read as missing'},
    ]);
  });
});

describe('toResults history', () => {
  it('writes the comparison with earlier packs in its declared key order', () => {
    const rep = sample();
    rep.history = {
      previousPeriod: '2026-09',
      revisions: [
        {
          seriesId: 'net-sales',
          period: '2026-08',
          kind: 'data',
          measure: 'original',
          previous: 10,
          current: 11,
          revisionPct: 10,
          large: true,
        },
      ],
      tracking: [
        {
          seriesId: 'net-sales',
          publishedIn: '2026-09',
          period: '2026-10',
          horizon: 1,
          forecast: 12,
          actual: 11,
          error: -1,
          inside: {'95': true, '80': false},
        },
      ],
      trackingSummary: [{seriesId: 'net-sales', count: 1, mase: NaN, coverage: {'80': 0, '95': 1}}],
    };
    const r = toResults(rep);
    expect(Object.keys(r.history!.revisions[0])).toEqual([
      'seriesId',
      'period',
      'kind',
      'measure',
      'previous',
      'current',
      'revisionPct',
      'large',
    ]);
    expect(r.history!.trackingSummary[0].mase).toBeNull();
    expect(Object.keys(r.history!.tracking[0].inside)).toEqual(['80', '95']);
    expect(parseResults(resultsJson(rep)).history).toEqual(r.history);
  });
});

describe('parseResults', () => {
  it('reads back what resultsJson wrote', () => {
    const rep = sample();
    expect(parseResults(resultsJson(rep))).toEqual(JSON.parse(resultsJson(rep)));
  });

  it('names the file and the field when an archived pack is unreadable', () => {
    const bad = JSON.parse(resultsJson(sample()));
    bad.series[0].original = 'oops';
    expect(() => parseResults(JSON.stringify(bad), 'out/p/2026-09/results.json')).toThrow(
      /^out\/p\/2026-09\/results\.json: unreadable results file: series\[0\]\.original: /,
    );
    expect(() => parseResults('{"schema": "ebbflow/results/v9"}', 'x.json')).toThrow(
      /x\.json: unreadable results file: schema is "ebbflow\/results\/v9", expected "ebbflow\/results\/v2"/,
    );
    expect(() => parseResults('{not json', 'y.json')).toThrow(InputError);
    expect(() => parseResults('{not json', 'y.json')).toThrow(/^y\.json: unreadable results file: /);
  });
});

describe('results v1', () => {
  it('reads a v1 file as v2 with nothing reconciled, no groups and no target variances', () => {
    const v2 = JSON.parse(resultsJson(sample()));
    delete v2.groups;
    for (const s of v2.series) {
      delete s.better;
      delete s.versusTarget;
      if (s.forecast) {
        delete s.forecast.baseMean;
        delete s.forecast.reconciliation;
      }
    }
    const read = parseResults(JSON.stringify({...v2, schema: 'ebbflow/results/v1'}));
    expect(read.schema).toBe(RESULTS_SCHEMA);
    expect(read.groups).toEqual([]);
    expect(read.series[0]).toMatchObject({better: 'higher', versusTarget: null});
    expect(read.series[0].forecast).toMatchObject({baseMean: null, reconciliation: null});
  });
});
