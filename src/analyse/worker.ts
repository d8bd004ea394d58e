import {analyseSeries} from './analyse.js';
import type {SeriesAnalysis, SeriesInput} from './types.js';

/** Worker-thread entry for the analysis pool. */
export default function analyseInWorker(input: SeriesInput): SeriesAnalysis {
  return analyseSeries(input);
}
