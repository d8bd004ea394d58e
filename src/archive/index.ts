export {archive, refuseExisting, type ArchiveArgs} from './archive.js';
export {loadHistory, buildHistory} from './history.js';
export {writeIndex} from './writeIndex.js';
export {recoverPackDir} from './recover.js';
export type {History, RevisionRow, TrackingRow, TrackingSummary} from './types.js';
