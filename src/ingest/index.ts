export {ingest} from './ingest.js';
export type {Readings} from './ingest.js';
export type {DataNote, Dataset, InputFile, Series} from './types.js';
