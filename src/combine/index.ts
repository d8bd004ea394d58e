export {combine, type Combined} from './combine.js';
export type {ContributionsAt, GroupResult, ReconciledBacktest, SeriesCombination, Variance} from './types.js';
