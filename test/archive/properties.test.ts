/** Invariants of results.json and the history functions, checked on random inputs (fast-check). */
import {describe, expect, it} from 'vitest';
import fc from 'fast-check';
import {parseResults, resultsJson} from '../../src/results/index.js';
import {revisions} from '../../src/history/revisions.js';
import {summariseTracking, trackForecasts} from '../../src/history/tracking.js';
import {report} from './fixtures/report.js';
import {hand, quarters} from '../history/digests.js';

const value = fc.oneof(
  fc.double(),
  fc.constantFrom(NaN, Infinity, -Infinity, -0, Number.MIN_VALUE, Number.MAX_VALUE),
);

describe('results.json properties', () => {
  it('every figure reads back exactly, or as null when not finite', () => {
    fc.assert(
      fc.property(fc.array(value, {minLength: 48, maxLength: 48}), (xs) => {
        const rep = report(2026, 10, [{id: 'x'}]);
        rep.series[0].analysis.original = xs;
        const back = parseResults(resultsJson(rep)).series[0].original;
        xs.forEach((x, i) => expect(back[i]).toBe(Number.isFinite(x) ? (x === 0 ? 0 : x) : null));
      }),
      {numRuns: 40},
    );
  });
});

const series = fc.array(fc.option(fc.integer({min: -1000, max: 1000}), {nil: null}), {minLength: 20, maxLength: 20});

describe('history properties', () => {
  it('an unchanged pack has no revisions; one changed value gives one data row, if within the window', () => {
    fc.assert(
      fc.property(series, fc.nat(19), fc.integer({min: 1, max: 50}), (orig, at, delta) => {
        const periods = quarters(20);
        const a = hand('2028-Q4', 4, [{periods, original: orig}]);
        expect(revisions(a, a, 1)).toEqual([]);
        const changed = [...orig];
        changed[at] = (orig[at] ?? 0) + delta;
        const rows = revisions(a, hand('2028-Q4', 4, [{periods, original: changed}]), 1);
        expect(rows.map((r) => [r.period, r.kind])).toEqual(at >= 8 ? [[periods[at], 'data']] : []);
      }),
    );
  });

  it('tracking: one row per forecast with a known actual, coverage within 0…1, MASE ≥ 0', () => {
    fc.assert(
      fc.property(series, fc.array(fc.integer({min: -1000, max: 1000}), {minLength: 8, maxLength: 8}), (orig, mean) => {
        const periods = quarters(20);
        const current = hand('2028-Q4', 4, [{periods, original: orig}]);
        const fcPeriods = periods.slice(12);
        const earlier = hand('2026-Q4', 4, [
          {
            periods: periods.slice(0, 12),
            original: orig.slice(0, 12),
            forecast: {
              periods: fcPeriods,
              mean,
              lower: {'80': mean.map((m) => m - 10)},
              upper: {'80': mean.map((m) => m + 10)},
            },
          },
        ]);
        const rows = trackForecasts([earlier], current);
        expect(rows).toHaveLength(orig.slice(12).filter((v) => v !== null).length);
        rows.forEach((r) => expect(r.inside['80']).toBe(Math.abs(r.error) <= 10));
        for (const s of summariseTracking(rows, current)) {
          expect(s.coverage['80']).toBeGreaterThanOrEqual(0);
          expect(s.coverage['80']).toBeLessThanOrEqual(1);
          if (s.mase !== null) expect(s.mase).toBeGreaterThanOrEqual(0);
        }
      }),
    );
  });
});
