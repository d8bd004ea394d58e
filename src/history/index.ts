export {loadHistory, buildHistory} from './history.js';
export {REVISION_WINDOW} from './revisions.js';
