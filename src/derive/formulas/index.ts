export {parseFormula} from './parseFormula.js';
export {FormulaSyntaxError, type Formula} from './types.js';
export {references} from './references.js';
export {evaluateFormula} from './evaluateFormula.js';
export {isDivision, ratioParts} from './ratioParts.js';
export {ratioOfSums} from './ratioOfSums.js';
export {planFormulas, type FormulaEntry, type FormulaPlan, type LineProblem} from './formulaPlan.js';
export {deriveSeries, type DerivedEntry, type RatioParts} from './deriveSeries.js';
export {checkFormulas, deriveFormulas, type CheckedFormulas} from './deriveFormulas.js';
