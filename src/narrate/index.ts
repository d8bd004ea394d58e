export {narrate, type NarrateInput, type Narration} from './narrate.js';
export type {Callout} from './types.js';
