import {analyseSeries} from './analyse.js';
import type {SeriesAnalysis, SeriesInput} from './types.js';

/**
 * Worker-thread entry for the analysis pool (`pool.ts`): exactly `analyseSeries`, so a pooled run gives the same
 * results as an in-process one.
 *
 * The result goes back by structured clone rather than by transferring buffers: a `SeriesAnalysis` holds plain
 * number arrays (about 27 kB of JSON for 120 monthly points), whose clone costs about 0.14 ms against 400 ms or so
 * of analysis with automatic forecasting (measured on the scale benchmark's series).
 */
export default function analyseInWorker(input: SeriesInput): SeriesAnalysis {
  return analyseSeries(input);
}
