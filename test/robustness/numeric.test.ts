import {fileURLToPath} from 'node:url';
import fc from 'fast-check';
import {describe, expect, test} from 'vitest';
import {analyseSeries, type SeriesAnalysis} from '../../src/analyse/index.js';
import {loadPlan} from '../../src/config/index.js';
import type {AnalysisOptions, Plan, SeriesPlan} from '../../src/config/plan.js';
import {narrate} from '../../src/narrate/index.js';
import {monthIndex} from '../../src/time/period.js';

/**
 * Degenerate series through the analysis and the callouts: constant, huge (1e300) and tiny (1e-300) magnitudes,
 * NaN and Infinity inside, one to three periods, all missing. `analyseSeries` must return a result (saying in its
 * notes what it could not do) and never throw; no callout sentence may show NaN, Infinity or undefined.
 */

const controlPack = fileURLToPath(new URL('../fixtures/bad/control/pack.yaml', import.meta.url));
const plan: Plan = await loadPlan(controlPack);
const salesPlan: SeriesPlan = plan.series[0];
const END = monthIndex(2025, 12);

/** The control pack's automatic options (STL, model auto, forecast auto) and a classical/Theta variant. */
const optionSets: Record<string, AnalysisOptions> = {
  automatic: salesPlan.analysis,
  'classical-theta': {
    ...salesPlan.analysis,
    decomposition: {...salesPlan.analysis.decomposition, method: 'classical', model: 'multiplicative'},
    forecast: {...salesPlan.analysis.forecast, method: 'theta'},
    cycle: {method: 'bandpass', lambda: null},
  },
};

function seasonal(n: number, scale: number): number[] {
  return Array.from({length: n}, (_, i) => scale * (1 + 0.2 * Math.sin((2 * Math.PI * i) / 12) + 0.01 * i));
}

const shapes: Record<string, number[]> = {
  'constant 100': Array(48).fill(100),
  'constant 0': Array(48).fill(0),
  'huge 1e300': seasonal(48, 1e300),
  'huge 1e307 (sums overflow)': seasonal(48, 1e307),
  'tiny 1e-300': seasonal(48, 1e-300),
  'denormal 5e-324': Array(48).fill(5e-324),
  'NaN inside': seasonal(48, 100).map((v, i) => (i % 7 === 3 ? NaN : v)),
  'Infinity inside': seasonal(48, 100).map((v, i) => (i === 20 ? Infinity : i === 30 ? -Infinity : v)),
  'one period': [100],
  'two periods': [100, 110],
  'three periods': [100, 110, 90],
  'three NaN then one value': [NaN, NaN, NaN, 5],
  'all NaN': Array(24).fill(NaN),
  'negative with zeros': seasonal(48, 100).map((v, i) => (i % 4 === 0 ? 0 : -v)),
  'one spike of 1e300': seasonal(48, 100).map((v, i) => (i === 40 ? 1e300 : v)),
};

function inputFor(values: number[], options: AnalysisOptions) {
  return {
    id: 'sales',
    frequency: plan.frequency,
    start: END - values.length + 1,
    values: Float64Array.from(values),
    kind: salesPlan.kind,
    fiscalYearStart: plan.fiscalYearStart,
    target: null,
    options,
    residualSigma: plan.thresholds.residualSigma,
  };
}

/** Analyse, then narrate as a one-series pack; both must return. */
function analyseAndNarrate(values: number[], options: AnalysisOptions): {analysis: SeriesAnalysis; texts: string[]} {
  const analysis = analyseSeries(inputFor(values, options));
  const {pack, bySeries} = narrate({
    plan: {...plan, series: [{...salesPlan, target: null}]},
    period: END,
    series: [{plan: {...salesPlan, target: null}, analysis}],
    history: null,
  });
  const texts = [...pack, ...(bySeries.get('sales') ?? [])].map((c) => c.text);
  return {analysis, texts};
}

const BAD_TEXT = /NaN|Infinity|∞|undefined|null/;

describe.each(Object.entries(optionSets))('%s options', (_, options) => {
  test.each(Object.entries(shapes))('%s: a result with notes, no NaN in callouts', (name, values) => {
    const {analysis, texts} = analyseAndNarrate(values, options);
    expect(analysis.id).toBe('sales');
    expect(analysis.end).toBe(END);
    expect(analysis.original).toHaveLength(values.length);
    const finite = values.filter(Number.isFinite);
    const unusual = finite.length < values.length || values.length < 24 || new Set(finite).size === 1;
    // Missing, non-finite, short or flat input is explained: in the notes or as the reason for not adjusting.
    if (unusual) expect([...analysis.notes, analysis.notAdjustedReason ?? ''].join(' '), name).not.toBe('');
    for (const t of texts) expect(t, name).not.toMatch(BAD_TEXT);
  });
});

test('random short and odd series: analyseSeries returns and callouts stay free of NaN', () => {
  const cell = fc.oneof(
    {weight: 8, arbitrary: fc.double({min: -1e6, max: 1e6, noNaN: true})},
    {weight: 1, arbitrary: fc.constantFrom(NaN, Infinity, -Infinity, 0, 1e300, -1e300, 1e-300)},
  );
  fc.assert(
    fc.property(fc.array(cell, {minLength: 1, maxLength: 40}), (values) => {
      const {analysis, texts} = analyseAndNarrate(values, optionSets['classical-theta']);
      expect(analysis.original).toHaveLength(values.length);
      for (const t of texts) expect(t).not.toMatch(BAD_TEXT);
    }),
    {numRuns: 60, seed: 31},
  );
});
