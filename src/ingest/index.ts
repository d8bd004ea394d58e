export {ingest} from './ingest.js';
export type {DataNote, Dataset, InputFile, Series} from './types.js';
