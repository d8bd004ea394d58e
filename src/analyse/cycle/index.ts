export {analyseCycle} from './analyseCycle.js';
export {phaseLabels} from './labels.js';
export type {CycleResult, Stationarity, TurningPoint} from './types.js';
