import type {CalloutRecord} from '../results/index.js';

/** A ranked plain-language statement with the numbers behind it (the shape results.json keeps). */
export type Callout = CalloutRecord;
