export {analyseCycle} from './analyseCycle.js';
export {phaseLabels, onTrendLabel} from './labels.js';
export type {CycleResult, Stationarity, TurningPoint} from './types.js';
