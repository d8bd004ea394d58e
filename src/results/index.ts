export {RESULTS_SCHEMA, resultsSchema, frequencyOf, type Results, type SeriesResults} from './schema.js';
export {toResults, resultsJson, resultsJsonChunks, type ResultsInput, type CalloutRecord} from './write.js';
export {parseResults} from './read.js';
export {digestOf, digestJson, DIGEST_SCHEMA, type PeriodDigest, type DigestSeries} from './digest.js';
export {earlierDigests} from './earlierPeriods.js';
export {periodFolders} from './periodFolders.js';
export type {History, RevisionRow, TrackingRow, TrackingSummary} from './historyTypes.js';
