import {readFileSync} from 'node:fs';
import {describe, expect, it} from 'vitest';
import {wordDataNote, wordsFor} from '../../src/words/index.js';
import {analyseSeries} from '../../src/analyse/index.js';
import {combine} from '../../src/combine/index.js';
import type {GroupPlan, SeriesPlan} from '../../src/config/plan.js';
import type {Dataset, Series} from '../../src/ingest/types.js';
import {monthIndex} from '../../src/time/period.js';
import {analysisOptions} from '../fixtures/plans.js';
import {plan as makePlan, series as seriesPlan} from '../ingest/plan.js';

// R's datasets ldeaths = mdeaths + fdeaths, monthly 1974-01 … 1979-12 (test/reference/hierarchy.json).
const ref = JSON.parse(readFileSync(new URL('../reference/hierarchy.json', import.meta.url), 'utf8'));
const start = monthIndex(1974, 1);
const options = analysisOptions({forecast: {method: 'ets', horizon: 6, backtestOrigins: 4}});

function build(
  group: Partial<GroupPlan>,
  more: {target?: number[]; better?: 'higher' | 'lower'; fdeaths?: number[]} = {},
) {
  const ids = ['ldeaths', 'mdeaths', 'fdeaths'];
  const values: Record<string, number[]> = {
    ldeaths: ref.ldeaths,
    mdeaths: ref.mdeaths,
    fdeaths: more.fdeaths ?? ref.fdeaths,
  };
  const plans: SeriesPlan[] = ids.map((id) =>
    seriesPlan(id, 'deaths', {
      analysis: options,
      ...(id === 'ldeaths' && more.target ? {target: 'plan', better: more.better ?? 'higher'} : {}),
    }),
  );
  const series: Series[] = ids.map((id) => ({
    id,
    frequency: 'monthly',
    start,
    values: Float64Array.from(values[id]),
    ahead: new Float64Array(0),
    sourceId: 'deaths',
    file: '/data/deaths.csv',
    notes: [],
  }));
  if (more.target) {
    plans.push(seriesPlan('plan', 'deaths', {hidden: true, analysis: options}));
    series.push({...series[0], id: 'plan', values: Float64Array.from(more.target)});
  }
  const g: GroupPlan = {
    id: 'sex',
    title: 'By sex',
    series: ['mdeaths', 'fdeaths'],
    total: 'ldeaths',
    adjustTotal: 'direct',
    reconcile: 'mint',
    line: 30,
    ...group,
  };
  const plan = makePlan('monthly', [], plans, {groups: [g], fiscalYearStart: 1});
  const data: Dataset = {period: start + 71, series, inputs: [], notes: [], plans};
  const analyses = plans.map((p, i) =>
    analyseSeries({
      id: p.id,
      frequency: 'monthly',
      start,
      values: series[i].values,
      kind: 'flow',
      fiscalYearStart: 1,
      target: null,
      options,
      residualSigma: 3,
    }),
  );
  return {plan, data, analyses, combined: combine(plan, data, analyses, new Map())};
}

describe('combine on ldeaths = mdeaths + fdeaths', () => {
  const {analyses, combined} = build({});
  it('publishes reconciled forecasts that add up at every horizon, keeping the base mean beside them', () => {
    const [l, m, f] = combined.analyses.map((a) => a.forecast!.mean);
    for (let j = 0; j < 6; j++) expect(Math.abs(l[j] - m[j] - f[j])).toBeLessThan(1e-9 * l[j]);
    expect(combined.series.get('ldeaths')!.baseMean).toEqual(analyses[0].forecast!.mean);
    expect(combined.series.get('ldeaths')!.reconciliation).toEqual({method: 'mint', group: 'sex'});
    const base = analyses[0].forecast!;
    const rec = combined.analyses[0].forecast!;
    expect(rec.upper['95'][0] - rec.lower['95'][0]).toBeCloseTo(base.upper['95'][0] - base.lower['95'][0], 9);
  });
  it('finds no gap, and contributions that add up to the total change', () => {
    const g = combined.groups[0];
    expect(g.partsGap).toBeNull();
    const yoy = g.contributions.yearOnYear;
    expect(yoy.period).toBe('1979-12');
    expect(yoy.total).toBeCloseTo(ref.yoy.total[71], 10);
    expect(yoy.parts.mdeaths).toBeCloseTo(ref.yoy.male[71], 10);
    expect(Math.abs(yoy.parts.mdeaths + yoy.parts.fdeaths - yoy.total)).toBeLessThan(1e-10);
    const pop = g.contributions.periodOnPeriodAdjusted;
    expect(Math.abs(pop.parts.mdeaths + pop.parts.fdeaths - pop.total)).toBeLessThan(1e-10);
    expect(g.contributions.history).toHaveLength(60);
    expect(g.indirect!.residualSeasonality.test).toMatch(/F-test/);
    expect(g.indirect!.largestDifference.percent).toBeGreaterThan(0);
  });
  it('scores base and reconciled forecasts on the same back-test origins', () => {
    const b = combined.groups[0].backtest!;
    expect(b.origins).toBe(4);
    expect(Object.keys(b.series)).toEqual(['ldeaths', 'mdeaths', 'fdeaths']);
    expect(b.base).toBeGreaterThan(0);
    expect(b.reconciled).toBeGreaterThan(0);
  });
  it('replaces the adjusted total with the sum of adjusted parts for adjustTotal: indirect', () => {
    const {combined: c} = build({adjustTotal: 'indirect', reconcile: 'none'});
    const [l, m, f] = c.analyses.map((a) => a.adjustment!.adjusted);
    for (let t = 0; t < 72; t++) expect(l[t]).toBeCloseTo(m[t] + f[t], 9);
    expect(c.series.get('ldeaths')!.reconciliation).toBeNull();
  });
  it('writes a data note with the largest gap when the parts do not add up', () => {
    expect(combined.notes).toEqual([]);
    const fdeaths = [...ref.fdeaths];
    fdeaths[30] -= 40;
    fdeaths[31] -= 4;
    const {combined: c} = build({reconcile: 'none'}, {fdeaths});
    expect(c.groups[0].partsGap).toEqual({
      period: '1976-07',
      gap: 40,
      percent: (100 * 40) / ref.ldeaths[30],
      periods: 2,
    });
    expect(c.notes.map((n) => `${n.line}: ${wordDataNote(wordsFor('en-GB'), n)}`)).toEqual([
      `30: group sex: the parts do not add up to ldeaths in 2 periods; the largest gap is 40.0 (${((100 * 40) / ref.ldeaths[30]).toFixed(2)}%) in July 1976`,
    ]);
  });
  it('compares actual with target for the period and the fiscal year to date, with the favourable side', () => {
    const target = ref.ldeaths.map((v: number) => v * 1.01);
    const higher = build({}, {target}).combined.series.get('ldeaths')!.versusTarget!;
    expect(higher.period.actual).toBe(ref.ldeaths[71]);
    expect(higher.period.percent).toBeCloseTo(100 * (1 / 1.01 - 1), 10);
    expect(higher.period.favourable).toBe(false);
    const ytd = ref.ldeaths.slice(60).reduce((a: number, b: number) => a + b, 0);
    expect(higher.yearToDate.actual).toBeCloseTo(ytd, 9);
    expect(higher.yearToDate.target).toBeCloseTo(ytd * 1.01, 9);
    const lower = build({}, {target, better: 'lower'}).combined.series.get('ldeaths')!.versusTarget!;
    expect(lower.period.favourable).toBe(true);
  });
});
