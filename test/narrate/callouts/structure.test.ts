import {describe, expect, it} from 'vitest';
import type {GroupResult, SeriesCombination} from '../../../src/combine/index.js';
import {driversRule, mainDrivers} from '../../../src/narrate/callouts/drivers.js';
import {versusTargetRule} from '../../../src/narrate/callouts/versusTarget.js';
import {variance} from '../../../src/combine/versusTarget.js';
import {makeAnalysis, makePlan, makeSeriesPlan, runRule} from '../fixtures.js';

const group = (parts: Record<string, number>, total: number): GroupResult => ({
  id: 'regions',
  title: 'Sales by region',
  total: 'net-sales',
  parts: Object.keys(parts),
  adjustTotal: 'direct',
  reconcile: 'mint',
  partsGap: null,
  contributions: {
    yearOnYear: {period: '2026-10', total, parts},
    periodOnPeriodAdjusted: {period: '2026-10', total: 0, parts},
    history: [],
  },
  indirect: null,
});

describe('drivers', () => {
  const plan = makePlan({
    series: [
      makeSeriesPlan(),
      makeSeriesPlan({id: 'north', label: 'the North'}),
      makeSeriesPlan({id: 'web', label: 'Web'}),
      makeSeriesPlan({id: 'south', label: 'the South'}),
    ],
  });
  it('names the main driver and the largest contribution against the change', () => {
    const drafts = runRule(driversRule, makeAnalysis([1, 2, 3]), {
      plan,
      groups: [group({north: 3.1, web: -0.8, south: 0.4}, 2.7)],
    });
    expect(drafts.map((d) => d.text)).toEqual([
      'Net sales rose 2.7% on a year earlier in October 2026, driven by the North, +3.1 pp; Web subtracted 0.8%.',
    ]);
    expect(drafts[0].chart).toBe('chart-net-sales-contributions');
  });
  it('reads a fall the other way round, and says nothing without a driver', () => {
    expect(mainDrivers(-2, {a: -1.5, b: 0.3, c: -1.5})).toEqual({
      driver: {id: 'a', points: -1.5},
      against: {id: 'b', points: 0.3},
    });
    expect(mainDrivers(0.01, {a: 0.01, b: 0})).toBeNull();
    expect(runRule(driversRule, makeAnalysis([1, 2, 3]), {plan, groups: [group({north: NaN}, NaN)]})).toEqual([]);
  });
});

describe('versus target', () => {
  const combination = (
    period: ReturnType<typeof variance>,
    yearToDate: ReturnType<typeof variance>,
  ): SeriesCombination => ({
    better: 'lower',
    versusTarget: {period, yearToDate},
    baseMean: null,
    reconciliation: null,
  });
  it('calls out variances beyond thresholds.targetPct with the favourable side and the calendar part', () => {
    const drafts = runRule(versusTargetRule, makeAnalysis([1, 2, 3]), {
      series: {label: 'Payroll costs', better: 'lower', target: 'payroll-budget'},
      combination: combination(variance(512, 497, 4, 'lower'), variance(3000, 3010, 0, 'lower')),
    });
    expect(drafts.map((d) => [d.severity, d.text])).toEqual([
      [
        'watch',
        'Payroll costs came to 512 EUR k in October 2026, 3.0% above the target of 497 EUR k (unfavourable). The calendar (working days and Easter) accounts for +4.00 EUR k of it.',
      ],
    ]);
  });
  it('is an alert from 2.5 times the threshold and info when favourable', () => {
    const drafts = runRule(versusTargetRule, makeAnalysis([1, 2, 3]), {
      plan: {thresholds: {residualSigma: 3, revisionPct: 1, targetPct: 2}},
      combination: combination(variance(90, 100, 0, 'higher'), variance(110, 100, 0, 'higher')),
    });
    expect(drafts.map((d) => [d.key, d.severity])).toEqual([
      ['period', 'alert'],
      ['year-to-date', 'info'],
    ]);
    expect(drafts[1].text).toBe(
      'Net sales came to 110 EUR k over the fiscal year to date, 10.0% above the target of 100 EUR k (favourable).',
    );
  });
});
