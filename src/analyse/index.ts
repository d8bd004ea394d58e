import type {Plan} from '../config/plan.js';
import type {Dataset} from '../ingest/types.js';
import type {Logger} from '../log.js';
import {analyseSeries} from './analyse.js';
import {runPool, type ResultListener} from './pool.js';
import type {SeriesAnalysis, SeriesInput} from './types.js';

export {analyseSeries};
export {residualSeasonality} from './decompose/diagnostics.js';
export {fiscalOutturn} from './forecast/index.js';
export {maseScale} from './forecast/accuracy.js';
export type {AdjustmentDiagnostics} from './decompose/index.js';
export type {SeriesAnalysis, SeriesInput};
export type {ForecastResult} from './types.js';

/**
 * Analyse every series of a pack, in pack order. With `jobs` > 1 (and compiled code) the series are spread over a
 * worker-thread pool (see {@link analysisThreads}); results are identical either way because `analyseSeries` is
 * pure. `onResult` hears of each series as soon as its analysis is done.
 */
export async function analyseAll(
  plan: Plan,
  data: Dataset,
  {threads, log, onResult}: {threads: number; log: Logger; onResult?: ResultListener},
): Promise<SeriesAnalysis[]> {
  const byId = new Map(data.series.map((s) => [s.id, s]));
  const inputs: SeriesInput[] = plan.series.map((sp) => {
    const series = byId.get(sp.id);
    if (!series) throw new Error(`series ${sp.id} missing after ingest`);
    const target = sp.target ? byId.get(sp.target) : undefined;
    return {
      id: sp.id,
      frequency: plan.frequency,
      start: series.start,
      values: series.values,
      // A ratio is analysed as a level: never summed over periods, no working-day effect.
      kind: sp.kind === 'ratio' ? 'stock' : sp.kind,
      fiscalYearStart: plan.fiscalYearStart,
      target: target ? {start: target.start, values: concat(target.values, target.ahead)} : null,
      options: sp.analysis,
      residualSigma: plan.thresholds.residualSigma,
    };
  });
  return runPool(inputs, {threads, log, onResult});
}

/**
 * Analysis threads for `jobs` threads of work in all: none (in-process) for one job; one fewer than the jobs when
 * the main thread has work of its own meanwhile (drawing charts), so the threads busy at once stay at `jobs`. On 2 cores a 50-series
 * report built about 0.5–1 s sooner with one analysis thread beside the drawing than with two (`npm run bench`,
 * render): a third busy thread only shares the cores, and each thread also starts, compiles and collects garbage.
 */
export function analysisThreads(jobs: number, mainThreadBusy: boolean): number {
  if (jobs <= 1) return 0;
  return mainThreadBusy ? jobs - 1 : jobs;
}

function concat(a: Float64Array, b: Float64Array): Float64Array {
  const out = new Float64Array(a.length + b.length);
  out.set(a);
  out.set(b, a.length);
  return out;
}
