import {maseScale, type ForecastResult, type SeriesAnalysis} from '../analyse/index.js';
import {periodsPerYear, type Frequency} from '../time/period.js';
import type {Hierarchy} from './hierarchies.js';
import * as msg from './messages.js';
import {reconcileForecasts} from './reconcile/reconcileForecasts.js';
import {shrinkCovariance} from './reconcile/shrinkCovariance.js';
import type {ReconciledBacktest} from './types.js';

/** The reconciled forecasts of one hierarchy, by series id, with the method used and the back-test comparison. */
export interface ReconciledHierarchy {
  forecasts: Map<string, ForecastResult>;
  method: 'mint' | 'ols' | 'bottom-up';
  backtest: ReconciledBacktest | null;
  notes: string[];
}

/**
 * Make the forecasts of a hierarchy add up (see reconcileForecasts.ts): MinT with the shrunk covariance of the
 * in-sample one-step errors over the periods every series has one, OLS when that estimate is unusable (fewer than
 * two common periods, a series without fitted values or with errors all zero), bottom-up or none as asked.
 * The published intervals move with the mean: each bound shifts by the change in the mean, keeping the base
 * model's widths (the reconciled forecasts' own error distribution is not estimated).
 * The back-test scores base and reconciled forecasts on the origins and steps every series has, reconciling
 * each origin's base forecasts with the same W (estimated on the whole sample, so slightly informed by later data).
 *
 * Returns null with a note when a series has no forecast or the forecasts cannot be reconciled.
 */
export function reconcileHierarchy(
  hierarchy: Hierarchy,
  analyses: ReadonlyMap<string, SeriesAnalysis>,
  frequency: Frequency,
): {result: ReconciledHierarchy | null; notes: string[]} {
  if (hierarchy.method === 'none') return {result: null, notes: []};
  const members = hierarchy.series.map((id) => analyses.get(id)!);
  const missing = members.find((a) => a.forecast === null);
  if (missing) return {result: null, notes: [msg.notReconciled(hierarchy.id, `${missing.id} has no forecast`)]};
  const forecasts = members.map((a) => a.forecast!);
  const n = members.length;
  const h = Math.min(...forecasts.map((f) => f.mean.length));
  const notes: string[] = [];
  let method: 'mint' | 'ols' | 'bottom-up' = hierarchy.method;
  let w: Float64Array | undefined;
  if (method === 'mint') {
    const estimate = errorCovariance(members);
    if (typeof estimate === 'string') {
      notes.push(msg.mintFallback(hierarchy.id, estimate));
      method = 'ols';
    } else w = estimate;
  }
  const options = {n, constraints: hierarchy.constraints, method, w};
  const base = Float64Array.from({length: n * h}, (_, k) => forecasts[Math.floor(k / h)].mean[k % h]);
  const reconciled = reconcileForecasts(base, {...options, h});
  if (reconciled === null)
    return {result: null, notes: [...notes, msg.notReconciled(hierarchy.id, 'the forecasts are not finite')]};
  const out = new Map<string, ForecastResult>();
  members.forEach((a, i) => {
    const f = a.forecast!;
    const mean = Array.from({length: h}, (_, j) => reconciled[i * h + j]);
    const shift = (bounds: Record<string, number[]>) =>
      Object.fromEntries(Object.entries(bounds).map(([level, b]) => [level, mean.map((m, j) => b[j] + m - f.mean[j])]));
    out.set(a.id, {...f, mean, lower: shift(f.lower), upper: shift(f.upper)});
  });
  return {result: {forecasts: out, method, backtest: backtestReconciled(members, options, frequency), notes}, notes};
}

/** The shrunk one-step error covariance on the periods every series has an error, or why it is unusable. */
function errorCovariance(members: SeriesAnalysis[]): Float64Array | string {
  const without = members.find((a) => a.forecast!.residuals.length === 0);
  if (without) return `${without.id} has no in-sample one-step forecasts`;
  const from = Math.max(...members.map((a) => a.start));
  const to = Math.min(...members.map((a) => a.end));
  const errors = members.map((a) =>
    Float64Array.from({length: Math.max(0, to - from + 1)}, (_, t) => a.forecast!.residuals[from + t - a.start]),
  );
  const shrunk = shrinkCovariance(errors);
  return shrunk === null ? 'fewer than two common periods, or a series without errors' : shrunk.covariance;
}

/** Mean absolute scaled error of base and reconciled back-test forecasts on the origins all series share. */
function backtestReconciled(
  members: SeriesAnalysis[],
  options: Omit<Parameters<typeof reconcileForecasts>[1], 'h'>,
  frequency: Frequency,
): ReconciledBacktest | null {
  const paths = members.map(
    (a) => new Map((a.forecast!.backtest?.paths ?? []).map((p) => [a.start + p.offset, p.mean])),
  );
  const origins = [...paths[0].keys()].filter((o) => paths.every((p) => p.has(o))).sort((x, y) => x - y);
  if (origins.length === 0) return null;
  const period = periodsPerYear[frequency];
  const n = members.length;
  const sums = members.map(() => ({base: 0, reconciled: 0, count: 0}));
  let horizon = 0;
  for (const origin of origins) {
    const steps = Math.min(...paths.map((p) => p.get(origin)!.length));
    const base = Float64Array.from({length: n * steps}, (_, k) => paths[Math.floor(k / steps)].get(origin)![k % steps]);
    const reconciled = reconcileForecasts(base, {...options, h: steps});
    if (reconciled === null) return null;
    horizon = Math.max(horizon, steps);
    members.forEach((a, i) => {
      const scale = maseScale(Float64Array.from(a.original.slice(0, origin - a.start)), period);
      for (let j = 0; j < steps; j++) {
        const y = a.original[origin - a.start + j];
        if (!Number.isFinite(y) || !(scale > 0)) continue;
        sums[i].base += Math.abs(y - base[i * steps + j]) / scale;
        sums[i].reconciled += Math.abs(y - reconciled[i * steps + j]) / scale;
        sums[i].count++;
      }
    });
  }
  const series: ReconciledBacktest['series'] = {};
  members.forEach((a, i) => {
    series[a.id] = {base: sums[i].base / sums[i].count, reconciled: sums[i].reconciled / sums[i].count};
  });
  const mean = (key: 'base' | 'reconciled') => members.reduce((s, a) => s + series[a.id][key], 0) / n;
  return {
    method: options.method as ReconciledBacktest['method'],
    origins: origins.length,
    horizon,
    series,
    base: mean('base'),
    reconciled: mean('reconciled'),
  };
}
