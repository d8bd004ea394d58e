import fc from 'fast-check';
import {describe, expect, it} from 'vitest';
import {bryBoschan} from '../../../src/analyse/cycle/bryBoschan.js';
import {hardingPagan} from '../../../src/analyse/cycle/hardingPagan.js';
import {datingRule, turningPoints} from '../../../src/analyse/cycle/turningPoints.js';
import type {Turn} from '../../../src/analyse/cycle/turningPointRules.js';
import {alternate, enforceDurations, localExtremes} from '../../../src/analyse/cycle/turningPointRules.js';
import {reference, type ReferenceSeries} from './reference.js';

const quarter = (label: string): number => (Number(label.slice(0, 4)) - 1959) * 4 + Number(label.slice(5)) - 1;
const label = (i: number): string => `${1959 + Math.floor(i / 4)}Q${(i % 4) + 1}`;

/** Checks that a dating obeys the rule's own constraints. */
function obeys(
  turns: Turn[],
  n: number,
  {minPhase, minCycle, censor}: {minPhase: number; minCycle: number; censor: number},
): void {
  for (let i = 0; i < turns.length; i++) {
    expect(turns[i].index).toBeGreaterThanOrEqual(censor);
    expect(turns[i].index).toBeLessThanOrEqual(n - 1 - censor);
    if (i > 0) {
      expect(turns[i].type).not.toBe(turns[i - 1].type);
      expect(turns[i].index - turns[i - 1].index).toBeGreaterThanOrEqual(minPhase);
    }
    if (i > 1) expect(turns[i].index - turns[i - 2].index).toBeGreaterThanOrEqual(minCycle);
  }
}

describe('hardingPagan on US real GDP (classical cycle)', () => {
  // Reference dates: NBER Business Cycle Dating Committee, "US Business Cycle Expansions and Contractions",
  // quarterly peaks and troughs 1959–2009. These dates are recalled from memory of the NBER table.
  // Data: log real GDP 1959Q1–2009Q3, FRED via statsmodels.datasets.macrodata (values in hp.json).
  //
  // The rule is applied to the LEVEL of log GDP, not to its HP gap: NBER dates classical recessions (absolute
  // declines in activity), which are turns in the level; the gap turns at every slowdown (growth cycles) and would
  // add many turns NBER does not date.
  const gdp = reference<{cases: {series: ReferenceSeries}[]}>('hp.json').cases[1].series;
  const peaks = ['1960Q2', '1969Q4', '1973Q4', '1980Q1', '1981Q3', '1990Q3', '2001Q1', '2007Q4'];
  const troughs = ['1961Q1', '1970Q4', '1975Q1', '1980Q3', '1982Q4', '1991Q1', '2001Q4', '2009Q2'];
  const x = Float64Array.from(gdp.values);
  const {turns} = turningPoints(x, 'quarterly');

  const distances = [...peaks.map((p) => [p, 'peak'] as const), ...troughs.map((t) => [t, 'trough'] as const)].map(
    ([date, type]) => {
      const nearest = turns
        .filter((t) => t.type === type)
        .reduce((best, t) => Math.min(best, Math.abs(t.index - quarter(date))), Infinity);
      return {date, type, distance: nearest};
    },
  );

  it('dates 12 of the 16 NBER turns within two quarters', () => {
    expect(distances.filter((d) => d.distance <= 2).length).toBe(12);
  });

  it('misses exactly the turns the data cannot show', () => {
    // 1970Q4 trough: in this data vintage log GDP is equal in 1970Q1 and 1970Q4 (4256.6 both); ties go to the earlier
    //   quarter, so the trough is dated 1970Q1, three quarters early.
    // 1982Q4 trough: the level is lowest in 1982Q1 (5857.3 vs 5871.0 in 1982Q4); NBER also weighs monthly
    //   employment and income, which bottomed later.
    // 2001Q1 peak / 2001Q4 trough: GDP fell in 2001Q1 and 2001Q3, one quarter each, never two in a row, so no
    //   peak is the highest value within ±2 quarters; the 2001 recession is invisible in this vintage's GDP level.
    const missed = distances.filter((d) => d.distance > 2).map((d) => `${d.type} ${d.date}`);
    expect(missed).toEqual(['peak 2001Q1', 'trough 1970Q4', 'trough 1982Q4', 'trough 2001Q4']);
  });

  it('finds no turn that NBER does not date, and marks the 2009Q2 trough provisional', () => {
    expect(turns.map((t) => `${t.type} ${label(t.index)}`)).toEqual([
      'peak 1960Q1',
      'trough 1960Q4',
      'peak 1969Q3',
      'trough 1970Q1',
      'peak 1973Q4',
      'trough 1975Q1',
      'peak 1980Q1',
      'trough 1980Q3',
      'peak 1981Q3',
      'trough 1982Q1',
      'peak 1990Q2',
      'trough 1991Q1',
      'peak 2008Q2',
      'trough 2009Q2',
    ]);
    expect(turns.filter((t) => t.provisional).map((t) => label(t.index))).toEqual(['2009Q2']);
  });
});

describe('dating rules (properties)', () => {
  const series = fc.array(fc.double({min: -100, max: 100, noNaN: true}), {minLength: 0, maxLength: 200}).map((xs) =>
    Float64Array.from(xs),
  );

  it('Harding-Pagan alternates and respects phase ≥ 2, cycle ≥ 5 and the ends', () => {
    fc.assert(fc.property(series, (x) => obeys(hardingPagan(x), x.length, {minPhase: 2, minCycle: 5, censor: 1})));
  });

  it('Bry-Boschan alternates and respects phase ≥ 6, cycle ≥ 15 and six months at each end', () => {
    fc.assert(fc.property(series, (x) => obeys(bryBoschan(x), x.length, {minPhase: 6, minCycle: 15, censor: 6})));
  });

  it('Bry-Boschan dates the crests and troughs of a 40-month sine wave', () => {
    // sin(2πt/40) peaks at t = 10 + 40k and bottoms at t = 30 + 40k.
    const x = Float64Array.from({length: 200}, (_, t) => 100 + 5 * Math.sin((2 * Math.PI * t) / 40));
    const turns = bryBoschan(x);
    expect(turns.map((t) => t.index)).toEqual([10, 30, 50, 70, 90, 110, 130, 150, 170, 190]);
    expect(turns[0].type).toBe('peak');
  });

  it('Bry-Boschan finds nothing in short, constant or monotone series', () => {
    expect(bryBoschan(Float64Array.of(1, 2, 1))).toEqual([]);
    expect(bryBoschan(new Float64Array(60).fill(3))).toEqual([]);
    expect(bryBoschan(Float64Array.from({length: 60}, (_, t) => t))).toEqual([]);
    expect(() => bryBoschan(Float64Array.of(1, NaN, 2))).toThrow(/rejects NaN/);
  });

  it('keeps the more extreme of two peaks in a row and removes short phases', () => {
    const x = Float64Array.of(0, 5, 0, 9, 8, 9.5, 0);
    expect(alternate([{index: 1, type: 'peak'}, {index: 3, type: 'peak'}], x)).toEqual([{index: 3, type: 'peak'}]);
    expect(localExtremes(x, 1).map((t) => t.index)).toEqual([1, 2, 3, 4, 5]);
    // Phases 3→4 (swing 1) then 1→2 (at the start, so only the outer turn goes) are shorter than 2 periods.
    const kept = enforceDurations(localExtremes(x, 1), x, {minPhase: 2, minCycle: 1});
    expect(kept.map((t) => `${t.type}${t.index}`)).toEqual(['trough2', 'peak5']);
  });

  it('scales the monthly rule to weeks by 52/12', () => {
    expect(datingRule('weekly')).toEqual({
      name: 'bry-boschan',
      options: {longSpan: 52, window: 22, shortSpan: 13, finalRadius: 17, minPhase: 26, minCycle: 65, censor: 26},
      provisionalSpan: 44,
    });
  });
});
