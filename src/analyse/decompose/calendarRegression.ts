import {leastSquares} from '../numeric/leastSquares.js';
import {studentTTwoSided} from '../numeric/studentT.js';
import type {CalendarRegressor} from './types.js';

/** A named calendar regressor aligned with the series. */
export interface RegressorColumn {
  name: 'working-days' | 'easter' | 'holidays';
  values: Float64Array;
}

/** Significance level for keeping a calendar effect. */
export const CALENDAR_ALPHA = 0.05;

/**
 * Estimate calendar effects: OLS of the irregular (on the model scale — logs for multiplicative models) on an
 * intercept and the regressors, using only the rows where `irregular` is finite. For each regressor: coefficient,
 * standard error, t, two-sided p-value from Student's t with n − k degrees of freedom, and significance at 5%.
 * Returns null when there are too few rows or the design is singular (e.g. a regressor constant over the sample).
 *
 * Complexity: O(n · k²). NaN policy: skips rows with NaN.
 */
export function regressCalendar(
  irregular: Float64Array,
  regressors: readonly RegressorColumn[],
  multiplicative: boolean,
): CalendarRegressor[] | null {
  const rows: number[] = [];
  for (let i = 0; i < irregular.length; i++) if (Number.isFinite(irregular[i])) rows.push(i);
  const k = regressors.length + 1;
  if (rows.length < k + 5) return null;
  const y = Float64Array.from(rows, (i) => irregular[i]);
  const columns = [
    new Float64Array(rows.length).fill(1),
    ...regressors.map((r) => Float64Array.from(rows, (i) => r.values[i])),
  ];
  let fit;
  try {
    fit = leastSquares(y, columns);
  } catch {
    return null;
  }
  const df = rows.length - k;
  return regressors.map((r, j) => {
    const coefficient = fit.coefficients[j + 1];
    const standardError = fit.standardErrors[j + 1];
    const tStatistic = coefficient / standardError;
    const pValue = studentTTwoSided(tStatistic, df);
    const significant = pValue < CALENDAR_ALPHA;
    return {
      name: r.name,
      coefficient,
      standardError,
      tStatistic,
      pValue,
      significant,
      description: describe(r.name, coefficient, multiplicative, significant),
    };
  });
}

/** One plain sentence per effect. Coefficients on the log scale are shown as percentages: 100·(e^b − 1). */
function describe(name: RegressorColumn['name'], b: number, multiplicative: boolean, significant: boolean): string {
  const size = multiplicative ? `${Math.abs(100 * Math.expm1(b)).toFixed(1)}%` : formatNumber(Math.abs(b));
  const up = b >= 0;
  const tail = significant ? '' : ' This is not significant at the 5% level, so it is not removed.';
  if (name === 'working-days') {
    return `Each extra working day ${up ? 'raises' : 'lowers'} the series by about ${size}.${tail}`;
  }
  if (name === 'holidays') {
    return `Each holiday on a weekday ${up ? 'raises' : 'lowers'} the series by about ${size}.${tail}`;
  }
  return (
    `When the eight days before Easter fall in March rather than April, the first of those periods is about ` +
    `${size} ${up ? 'higher' : 'lower'} and the second about as much ${up ? 'lower' : 'higher'}.${tail}`
  );
}

function formatNumber(x: number): string {
  return x >= 100 ? x.toFixed(0) : x >= 1 ? x.toFixed(1) : x.toPrecision(2);
}
