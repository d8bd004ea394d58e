import {describe, expect, it} from 'vitest';
import type {CycleResult, ForecastResult, Outturn, SeriesAnalysis} from '../../src/analyse/types.js';
import type {SeriesPlan} from '../../src/config/plan.js';
import {seriesParagraph} from '../../src/narrate/commentary/seriesParagraph.js';
import {packParagraph} from '../../src/narrate/commentary/packParagraph.js';
import type {Callout} from '../../src/narrate/types.js';
import type {GroupResult} from '../../src/combine/index.js';
import {wordsFor} from '../../src/words/index.js';
import {makeAdjustment, makeAnalysis, makeChanges, makeSeriesPlan, OCT_2026} from './fixtures.js';

/**
 * Exact sentences of the commentary rules in English, German and French. The inputs are hand-built so that each
 * rule's branch is seen: rises and falls, singular and plural, a target or none, no forecast, a short series.
 */
const N = 48;

function cycle(gap: number, over: Partial<CycleResult> = {}): CycleResult {
  return {
    method: 'hp',
    trend: new Array<number>(N).fill(100),
    gap: [...new Array<number>(N - 1).fill(0.5), gap],
    phase: gap >= 0 ? 'rising-above' : 'falling-below',
    phaseLabel: '',
    direction: 'rising',
    turningPoints: [],
    periodsSinceTurn: null,
    amplitudeRatio: null,
    stationarity: null,
    options: {},
    ...over,
  };
}

function forecast(over: Partial<ForecastResult> = {}): ForecastResult {
  return {
    method: 'ETS(M,Ad,M)',
    startOffset: N,
    mean: [2140, 2150],
    levels: [80, 95],
    lower: {'80': [2055, 2050], '95': [2000, 1990]},
    upper: {'80': [2225, 2250], '95': [2280, 2300]},
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
    forecastRemaining: 12642,
    periodsRemaining: 5,
    total: 26642,
    level: 80,
    lower: 26230,
    upper: 27052,
    target: 26705,
    gapPct: -0.24,
    ...over,
  } as Outturn;
}

/** Net sales rising: +8.5% on a year earlier, +1.5% adjusted, trend rising 0.8% a month; two recent outliers. */
function rising(over: Partial<SeriesAnalysis> = {}): SeriesAnalysis {
  const original = new Array<number>(N).fill(1900);
  original[N - 1] = 2025;
  const adjusted = original.map((_, i) => 1800 + i);
  return makeAnalysis(original, {
    adjustment: makeAdjustment(N, {
      adjusted,
      outliers: [
        {index: N - 3, kind: 'additive', score: 3.6},
        {index: N - 10, kind: 'level-shift', score: 4.1},
      ],
    }),
    changes: makeChanges({yearOnYear: 8.5, periodOnPeriodAdjusted: 1.5, trend: 0.8, trendDirection: 'rising'}),
    cycle: cycle(4.5),
    forecast: forecast(),
    outturn: outturn(),
    ...over,
  });
}

function paragraph(analysis: SeriesAnalysis, locale = 'en-GB', plan: Partial<SeriesPlan> = {}, callouts: Callout[] = []): string {
  return seriesParagraph({series: makeSeriesPlan(plan), analysis, callouts, words: wordsFor(locale)});
}

describe('series paragraph', () => {
  it('joins the headline, the underlying move, the cycle, the outlook against target and the unusual values (en)', () => {
    expect(paragraph(rising())).toBe(
      'Net sales came to 2,025 EUR k in October 2026, +8.5% on a year earlier. ' +
        'Seasonally adjusted, the series rose 1.5% on the previous month, and the trend-cycle is rising at 0.8% a month. ' +
        'Its cycle is above trend and rising, +4.5% from the long-run trend. ' +
        'On current forecasts the fiscal year 2026/27 will close at 26,642 EUR k, in line with the target of 26,705 EUR k. ' +
        '2 values stand out: August 2026 (one-off) and January 2026 (level shift).',
    );
  });

  it('says the same in German and French', () => {
    expect(paragraph(rising(), 'de-DE')).toBe(
      'Net sales für Oktober 2026: 2.025 EUR k, +8,5\u00a0% gegenüber Vorjahr. ' +
        'Saisonbereinigt stieg die Reihe um 1,5\u00a0% gegenüber dem Vormonat, und die Trend-Konjunktur-Komponente steigt um 0,8\u00a0% je Monat. ' +
        'Zyklusphase: über dem Trend und steigend, Abstand zum langfristigen Trend +4,5\u00a0%. ' +
        'Nach aktueller Prognose schließt das Geschäftsjahr 2026/27 mit 26.642 EUR k, im Rahmen des Planwerts von 26.705 EUR k. ' +
        '2 Werte fallen auf: August 2026 (einmaliger Ausreißer) und Januar 2026 (Niveauverschiebung).',
    );
    expect(paragraph(rising(), 'fr-FR')).toBe(
      'Net sales pour octobre 2026 : 2\u202f025 EUR k, +8,5\u00a0% en glissement annuel. ' +
        'En données CVS, la série a progressé de 1,5\u00a0% sur le mois précédent, et la tendance-cycle est en hausse, de 0,8\u00a0% par mois. ' +
        'Son cycle est au-dessus de la tendance et en hausse, à +4,5\u00a0% de la tendance de long terme. ' +
        'Selon les prévisions actuelles, l’exercice 2026/27 se clôturera à 26\u202f642 EUR k, conforme à l’objectif de 26\u202f705 EUR k. ' +
        '2 valeurs ressortent : août 2026 (valeur atypique ponctuelle) et janvier 2026 (rupture de niveau).',
    );
  });

  it('says "but" when the adjusted move goes against the trend, uses the singular, and falls short of a target', () => {
    const a = rising({
      changes: makeChanges({yearOnYear: -2.1, periodOnPeriodAdjusted: -0.6, trend: 0.3, trendDirection: 'rising'}),
      outturn: outturn({gapPct: -3.2}),
    });
    a.adjustment!.outliers = [{index: N - 1, kind: 'temporary', score: -3.1}];
    expect(paragraph(a)).toBe(
      'Net sales came to 2,025 EUR k in October 2026, -2.1% on a year earlier. ' +
        'Seasonally adjusted, the series fell 0.6% on the previous month, but the trend-cycle is rising at 0.3% a month. ' +
        'Its cycle is above trend and rising, +4.5% from the long-run trend. ' +
        'On current forecasts the fiscal year 2026/27 will close at 26,642 EUR k, 3.2% below the target of 26,705 EUR k. ' +
        'One value stands out: October 2026 (temporary change).',
    );
    expect(paragraph(a, 'de-DE')).toContain('Saisonbereinigt fiel die Reihe um 0,6\u00a0% gegenüber dem Vormonat, doch die Trend-Konjunktur-Komponente steigt um 0,3\u00a0% je Monat');
    expect(paragraph(a, 'de-DE')).toContain('Ein Wert fällt auf: Oktober 2026 (vorübergehende Änderung).');
    expect(paragraph(a, 'fr-FR')).toContain('Une valeur ressort : octobre 2026 (changement temporaire).');
  });

  it('gives the next forecast when there is no target, and falls with a falling trend', () => {
    const a = rising({
      changes: makeChanges({yearOnYear: -4, periodOnPeriodAdjusted: -1.2, trend: -0.4, trendDirection: 'falling'}),
      outturn: outturn({target: null, gapPct: null}),
      cycle: cycle(-1.2),
    });
    a.adjustment!.outliers = [];
    expect(paragraph(a)).toBe(
      'Net sales came to 2,025 EUR k in October 2026, -4.0% on a year earlier. ' +
        'Seasonally adjusted, the series fell 1.2% on the previous month, and the trend-cycle is falling at 0.4% a month. ' +
        'Its cycle is below trend and falling, -1.2% from the long-run trend. ' +
        'The forecast for November 2026 is 2,140 EUR k (80% range 2,055 to 2,225 EUR k).',
    );
    expect(paragraph(a, 'de-DE')).toContain('Die Prognose für November 2026 lautet 2.140 EUR k (80-%-Intervall 2.055 bis 2.225 EUR k).');
    expect(paragraph(a, 'fr-FR')).toContain('La prévision pour novembre 2026 est de 2\u202f140 EUR k (intervalle à 80 % : 2\u202f055 à 2\u202f225 EUR k).');
  });

  it('says so when no forecast was made, and warns of a short series without adjustment', () => {
    const original = new Array<number>(20).fill(50);
    const a = makeAnalysis(original, {changes: makeChanges({yearOnYear: 0})}, OCT_2026);
    expect(paragraph(a, 'en-GB', {unit: null})).toBe(
      'Net sales came to 50.0 in October 2026, 0.0% on a year earlier. ' +
        'With 20 months, the series is short, so every estimate here is provisional. ' +
        'The series was not seasonally adjusted. ' +
        'No forecast was made for the series.',
    );
    expect(paragraph(a, 'de-DE', {unit: null})).toBe(
      'Net sales für Oktober 2026: 50,0, 0,0\u00a0% gegenüber Vorjahr. ' +
        'Die Reihe umfasst nur 20 Monate; jede Schätzung hier ist vorläufig. ' +
        'Die Reihe wurde nicht saisonbereinigt. ' +
        'Für die Reihe wurde keine Prognose erstellt.',
    );
    expect(paragraph(a, 'fr-FR', {unit: null})).toBe(
      'Net sales pour octobre 2026 : 50,0, 0,0\u00a0% en glissement annuel. ' +
        'Avec 20 mois, la série est courte ; toutes les estimations sont donc provisoires. ' +
        'La série n’a pas été corrigée des variations saisonnières. ' +
        'Aucune prévision n’a été établie pour la série.',
    );
  });

  it('tells a fiscal year that closes with the review period as closed, in each language', () => {
    const closed = rising({outturn: outturn({actualToDate: 26642, periodsActual: 12, forecastRemaining: 0, periodsRemaining: 0})});
    const last = (locale: string) => paragraph(closed, locale).split(/(?<=\.) /).at(-2);
    expect(last('en-GB')).toBe('The fiscal year 2026/27 closed at 26,642 EUR k, in line with the target of 26,705 EUR k.');
    expect(last('de-DE')).toBe('Das Geschäftsjahr 2026/27 schloss mit 26.642 EUR k, im Rahmen des Planwerts von 26.705 EUR k.');
    expect(last('fr-FR')).toBe('L’exercice 2026/27 s’est clôturé à 26\u202f642 EUR k, conforme à l’objectif de 26\u202f705 EUR k.');
  });

  it('names the series once and keeps to five sentences', () => {
    const text = paragraph(rising());
    expect(text.split('Net sales')).toHaveLength(2);
    expect(text.match(/\. /g)?.length).toBe(4);
  });
});

describe('pack paragraph', () => {
  const series = [
    {plan: makeSeriesPlan(), analysis: rising()},
    {
      plan: makeSeriesPlan({id: 'footfall', label: 'Shop footfall', unit: 'visits'}),
      analysis: rising({
        id: 'footfall',
        changes: makeChanges({yearOnYear: -1.5, trendDirection: 'falling'}),
        outturn: null,
        forecast: forecast({mean: [1000]}),
      }),
    },
  ];
  const alert: Callout = {
    id: 'footfall/large-residual/2026-08',
    seriesId: 'footfall',
    rule: 'large-residual',
    severity: 'alert',
    rank: 90,
    text: '',
    figures: {},
    chart: null,
  };

  it('sums up the period, the trends, the targets, the alerts and the outlook (en)', () => {
    expect(packParagraph({series, callouts: [alert], period: OCT_2026, words: wordsFor('en-GB')})).toBe(
      'In October 2026, 1 of the 2 series stood above their level a year earlier; Net sales grew most (+8.5%) and Shop footfall least (-1.5%). ' +
        'The trend-cycle is rising in 1 series, falling in 1 and flat in none. ' +
        'On current forecasts, Net sales will close FY2026/27 in line with its target. ' +
        'One figure calls for attention: Shop footfall (unusual value). ' +
        'For November 2026, the forecasts point to a rise in 1 series and a fall in 1.',
    );
  });

  it('tells closed fiscal years without "on current forecasts"', () => {
    const closed = outturn({actualToDate: 26642, periodsActual: 12, forecastRemaining: 0, periodsRemaining: 0});
    const year = [{plan: makeSeriesPlan(), analysis: rising({outturn: closed})}, series[1]];
    const sentence = (locale: string) =>
      packParagraph({series: year, callouts: [alert], period: OCT_2026, words: wordsFor(locale)}).split(/(?<=\.) /)[2];
    expect(sentence('en-GB')).toBe('Net sales closed FY2026/27 in line with its target.');
    expect(sentence('de-DE')).toBe('Net sales schloss das Geschäftsjahr 2026/27 im Rahmen des Planwerts ab.');
    expect(sentence('fr-FR')).toBe('Net sales a clôturé l’exercice 2026/27 conforme à son objectif.');
  });

  it('names the part that drove a group’s total, in each language', () => {
    const regions: GroupResult = {
      id: 'regions',
      title: 'Regions',
      total: 'net-sales',
      parts: ['footfall'],
      adjustTotal: 'direct',
      reconcile: 'mint',
      partsGap: null,
      contributions: {
        yearOnYear: {period: '2026-10', total: 8.5, parts: {footfall: 6.2}},
        periodOnPeriodAdjusted: {period: '2026-10', total: 0, parts: {footfall: 0}},
        history: [],
      },
      indirect: null,
    };
    const sentence = (locale: string) =>
      packParagraph({series, callouts: [alert], period: OCT_2026, words: wordsFor(locale), groups: [regions]}).split(/(?<=\.) /)[1];
    expect(sentence('en-GB')).toBe('Net sales rose 8.5% on a year earlier, driven most by Shop footfall (+6.2 pp).');
    expect(sentence('de-DE')).toBe('Net sales: Anstieg um 8,5\u00a0% gegenüber Vorjahr, vor allem getragen von Shop footfall (+6,2 Pp.).');
    expect(sentence('fr-FR')).toBe('Net sales : hausse de 8,5\u00a0% en glissement annuel, portée surtout par Shop footfall (+6,2 pt).');
  });

  it('says the same in German and French, and that nothing calls for an alert', () => {
    expect(packParagraph({series, callouts: [], period: OCT_2026, words: wordsFor('de-DE')})).toBe(
      'Für Oktober 2026 lag 1 von 2 Reihen über dem Vorjahr; am stärksten wuchs Net sales (+8,5\u00a0%), am schwächsten Shop footfall (-1,5\u00a0%). ' +
        'Die Trend-Konjunktur-Komponente steigt in 1 Reihe, fällt in 1 und verläuft seitwärts in keiner. ' +
        'Nach aktueller Prognose schließt Net sales das Geschäftsjahr 2026/27 im Rahmen des Planwerts. ' +
        'In dieser Periode gibt kein Wert Anlass zu einer Warnung. ' +
        'Für November 2026 zeigen die Prognosen einen Anstieg in 1 Reihe und einen Rückgang in 1.',
    );
    const french = packParagraph({series, callouts: [alert], period: OCT_2026, words: wordsFor('fr-FR')});
    expect(french).toContain('Un chiffre appelle l’attention : Shop footfall (valeur atypique).');
    // The fiscal year in each language's words, not the English abbreviation.
    expect(french).toContain('Net sales clôturera l’exercice 2026/27 conforme à son objectif');
    expect(french).not.toContain('FY');
  });
});
