/**
 * Every note text of the combine stage, one function each (notes for the data-notes page and the manifest).
 */

export const partsGap = (
  group: string,
  total: string,
  period: string,
  gap: number,
  percent: number,
  periods: number,
): string =>
  `group ${group}: the parts do not add up to ${total} in ${periods} ${periods === 1 ? 'period' : 'periods'}; the largest gap is ${formatNumber(gap)} (${formatNumber(percent)}%) in ${period}`;

export const mintFallback = (group: string, reason: string): string =>
  `group ${group}: the one-step error covariance is unusable (${reason}); forecasts reconciled by OLS instead of MinT`;

export const notReconciled = (group: string, reason: string): string =>
  `group ${group}: forecasts not reconciled (${reason})`;

function formatNumber(x: number): string {
  return Number(x.toPrecision(4)).toString();
}
