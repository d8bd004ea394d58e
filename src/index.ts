/**
 * ebbflow as a library: the same pipeline the command line runs, and the pure analysis entry point.
 *
 *   pack.yaml ─► loadPlan ─► ingest ─► derive ─► analyseSeries ─► narrate ─► render ─► archive
 */
export {build, check, type BuildRequest, type BuildSummary} from './run.js';
export {loadPlan, type Plan, type SeriesPlan, type AnalysisOptions} from './config/index.js';
export {ingest, type Readings} from './ingest/index.js';
export {derive} from './derive/index.js';
export {analyseSeries, type SeriesAnalysis, type SeriesInput} from './analyse/index.js';
export {InputError, type Problem} from './errors.js';
export {consoleLogger, collectingLogger, type Logger} from './log.js';
export {toolVersion} from './version.js';
