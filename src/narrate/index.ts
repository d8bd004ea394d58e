export {narrate, type NarrateInput} from './narrate.js';
export type {Callout} from './types.js';
