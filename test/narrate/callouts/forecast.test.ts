import {describe, expect, it} from 'vitest';
import type {ForecastResult, Outturn} from '../../../src/analyse/types.js';
import {forecastOutlookRule} from '../../../src/narrate/callouts/forecastOutlook.js';
import {outturnRule} from '../../../src/narrate/callouts/outturn.js';
import {forecastAccuracyRule} from '../../../src/narrate/callouts/forecastAccuracy.js';
import {makeAnalysis, runRule} from '../fixtures.js';

function forecast(over: Partial<ForecastResult> = {}): ForecastResult {
  const h = 12;
  const mean = Array.from({length: h}, (_, i) => 2100 + 20 * i);
  return {
    method: 'ETS(M,Ad,M)',
    startOffset: 24,
    mean,
    levels: [80, 95],
    lower: {'80': mean.map((m, i) => m - 100 - 15 * i), '95': mean.map((m) => m - 300)},
    upper: {'80': mean.map((m, i) => m + 100 + 15 * i), '95': mean.map((m) => m + 300)},
    backtest: null,
    options: {},
    notes: [],
    ...over,
  };
}

function outturn(over: Partial<Outturn> = {}): Outturn {
  return {
    fiscalYear: 'FY2026/27',
    actualToDate: 14000,
    periodsActual: 7,
    forecastRemaining: 10100,
    periodsRemaining: 5,
    total: 24100,
    level: 80,
    lower: 23400,
    upper: 24800,
    target: 24670,
    gapPct: (24100 / 24670 - 1) * 100,
    ...over,
  };
}

const history = new Array<number>(24).fill(2000);

describe('forecast-outlook rule', () => {
  it('gives the next period and the end of the horizon with the 80% range', () => {
    const [d] = runRule(forecastOutlookRule, makeAnalysis(history, {forecast: forecast()}));
    expect(d.text).toBe(
      'The forecast for Net sales is 2,100 EUR k for November 2026 (80% range 2,000 to 2,200 EUR k) and 2,320 EUR k for October 2027, 12 months ahead (80% range 2,055 to 2,585 EUR k); model: ETS(M,Ad,M).',
    );
    expect(d.figures).toMatchObject({level: 80, next: 2100, horizon: 12, last: 2320});
    expect(d.chart).toBe('chart-net-sales-forecast');
  });

  it('handles a one-period horizon and quotes the first level when 80% is absent', () => {
    const f = forecast({mean: [2100], levels: [95], lower: {'95': [1800]}, upper: {'95': [2400]}});
    const [d] = runRule(forecastOutlookRule, makeAnalysis(history, {forecast: f}));
    expect(d.text).toBe(
      'The forecast for Net sales is 2,100 EUR k for November 2026 (95% range 1,800 to 2,400 EUR k); model: ETS(M,Ad,M).',
    );
  });
});

describe('outturn rule', () => {
  it('sets the fiscal-year outturn against the target', () => {
    const [d] = runRule(outturnRule, makeAnalysis(history, {outturn: outturn()}));
    expect(d.text).toBe(
      'On current forecasts, Net sales will total 24,100 EUR k in FY2026/27 (80% range 23,400 to 24,800 EUR k), from 7 months of actuals and 5 months of forecast: 2.3% below the target of 24,670 EUR k.',
    );
    expect(d.severity).toBe('watch'); // −2.31% ≤ −2%
    expect(d.figures.gapPct).toBeCloseTo(-2.3105, 4);
  });

  it('gives a stock its year-end level', () => {
    const [d] = runRule(outturnRule, makeAnalysis(history, {outturn: outturn({total: 3731.6, lower: 3600, upper: 3850, target: null, gapPct: null})}), {
      series: {label: 'Inventory', kind: 'stock'},
    });
    expect(d.text).toBe('On current forecasts, Inventory will end FY2026/27 at 3,732 EUR k (80% range 3,600 to 3,850 EUR k).');
  });

  it('a fiscal year that closes with the review period: its closing figure against the target, in each language', () => {
    const closed = outturn({actualToDate: 24100, periodsActual: 12, forecastRemaining: 0, periodsRemaining: 0, lower: 24100, upper: 24100});
    const text = (locale: string) =>
      runRule(outturnRule, makeAnalysis(history, {outturn: closed}), {plan: {locale}})[0].text;
    expect(text('en-GB')).toBe('Net sales closed FY2026/27 at 24,100 EUR k: 2.3% below the target of 24,670 EUR k.');
    expect(text('de-DE')).toBe('Net sales schloss das Geschäftsjahr 2026/27 mit 24.100 EUR k ab, 2,3\u00a0% unter dem Planwert von 24.670 EUR k.');
    expect(text('fr-FR')).toBe('Net sales a clôturé l’exercice 2026/27 à 24\u202f100 EUR k, 2,3\u00a0% au-dessous de l’objectif de 24\u202f670 EUR k.');
  });

  it('names the fiscal year in German and French words', () => {
    const text = (locale: string, kind: 'flow' | 'stock') =>
      runRule(outturnRule, makeAnalysis(history, {outturn: outturn()}), {plan: {locale}, series: {label: 'Umsatz', kind}})[0].text;
    expect(text('de-DE', 'flow')).toMatch(/^Nach aktueller Prognose: Umsatz im Geschäftsjahr 2026\/27 insgesamt 24\.100 EUR k /);
    expect(text('de-DE', 'stock')).toMatch(/^Nach aktueller Prognose: Umsatz zum Ende des Geschäftsjahres 2026\/27 bei 24\.100 EUR k /);
    expect(text('fr-FR', 'flow')).toMatch(/^Selon les prévisions actuelles, Umsatz sur l’exercice 2026\/27 : 24\u202f100 EUR k au total /);
    expect(text('fr-FR', 'stock')).toMatch(/^Selon les prévisions actuelles, Umsatz à la fin de l’exercice 2026\/27 : 24\u202f100 EUR k /);
  });

  it('grades the gap: alert from −5%, info above target, watch when the target is above the whole range', () => {
    const sev = (o: Partial<Outturn>) => runRule(outturnRule, makeAnalysis(history, {outturn: outturn(o)}))[0].severity;
    expect(sev({gapPct: -5.2})).toBe('alert');
    expect(sev({gapPct: 3})).toBe('info');
    expect(sev({gapPct: -1.5, target: 24900})).toBe('watch');
  });

  it('uses singular periods and says "in line with" for a gap under 0.5%', () => {
    const [d] = runRule(outturnRule, makeAnalysis(history, {outturn: outturn({periodsActual: 11, periodsRemaining: 1, gapPct: 0.2})}));
    expect(d.text).toBe(
      'On current forecasts, Net sales will total 24,100 EUR k in FY2026/27 (80% range 23,400 to 24,800 EUR k), from 11 months of actuals and 1 month of forecast: in line with the target of 24,670 EUR k.',
    );
  });
});

describe('forecast-accuracy rule', () => {
  const backtest = (mase: number, origins = 6) => ({origins, horizon: 12, mase, smape: 9.1, benchmarks: [], points: []});
  it('warns when the forecast lost to the seasonal naive benchmark (MASE > 1)', () => {
    const [d] = runRule(forecastAccuracyRule, makeAnalysis(history, {forecast: forecast({backtest: backtest(1.24)})}));
    expect(d.text).toBe(
      'Treat the forecast for Net sales with care: in back-tests from 6 forecast origins it was less accurate than repeating the same period of the previous year (MASE 1.24; below 1 would beat that benchmark).',
    );
    expect(d.severity).toBe('watch');
    const [one] = runRule(forecastAccuracyRule, makeAnalysis(history, {forecast: forecast({backtest: backtest(1.6, 1)})}));
    expect(one.text).toContain('from 1 forecast origin it');
    expect(one.severity).toBe('alert');
  });

  it('is silent when the forecast beat the benchmark', () => {
    expect(runRule(forecastAccuracyRule, makeAnalysis(history, {forecast: forecast({backtest: backtest(0.8)})}))).toEqual([]);
  });
});
