import type {MessageKey} from './catalog/en.js';
import type {Words} from './words.js';

/**
 * A forecast method's name for prose and compact tables: a combination is named by its members' families
 * (`a combination of ETS, Theta and ARIMA`); any other name is kept as the method gives it (ETS(M,Ad,M),
 * Theta, ARIMA(1,1,2) with drift: published names). The full name, with each member's settings, stays in
 * results.json, the manifest and the workbook's methods sheet. `compact` leaves out "a combination of" (tables).
 */
export function shortMethod(w: Words, method: string, compact = false): string {
  const inner = /^Combination \((.*)\)$/.exec(method)?.[1];
  if (inner === undefined) return methodName(w, method);
  const members: string[] = [];
  let depth = 0;
  let start = 0;
  for (let i = 0; i <= inner.length; i++) {
    const c = inner[i];
    if (c === '(') depth++;
    else if (c === ')') depth--;
    else if ((c === ',' && depth === 0) || i === inner.length) {
      members.push(inner.slice(start, i).trim());
      start = i + 1;
    }
  }
  const family = (m: string) =>
    m.startsWith('Damped') ? w.t('callout.dampedTrend') : (/^(ETS|Theta|ARIMA)\b/.exec(m)?.[1] ?? methodName(w, m));
  const families = [...new Set(members.map(family))];
  const list = w.list(families, families.length);
  return compact ? list : w.t('callout.combination', {families: list});
}

/**
 * One method's name without the analysis' English qualifiers: `Theta on STL-adjusted data` → `Theta`,
 * `ARIMA(1,1,2) with drift` → `ARIMA(1,1,2)`, `ETS (4 models, Akaike-weighted)` → `ETS`; the benchmarks and the
 * constant forecast in words (`Seasonal naive` → `saisonal naiv`). Published names (ETS(M,Ad,M), Naive2) stay.
 */
export function methodName(w: Words, method: string): string {
  const named: Record<string, MessageKey> = {
    'Seasonal naive': 'benchmark.seasonalNaive',
    Naive: 'benchmark.naive',
    Constant: 'benchmark.constant',
    Damped: 'callout.dampedTrend',
  };
  if (named[method]) return w.t(named[method]);
  return method
    .replace(/ on STL-adjusted data$/, '')
    .replace(/ with (drift|mean)$/, '')
    .replace(/^ETS \(\d+ models, Akaike-weighted\)$/, 'ETS');
}
