export {archive, refuseExisting, type ArchiveArgs} from './archive.js';
export {writeIndex} from './writeIndex.js';
export {recoverPackDir} from './recover.js';
