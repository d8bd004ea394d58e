import type {Aggregate} from '../config/plan.js';
import type {PeriodSummary} from '../ingest/periodStore.js';

/**
 * The value of one period from the summary of its rows, combined by `method`:
 * `sum`, `mean` (sum / values), `min`, `max`, `first` and `last` (the value at the earliest and latest instant;
 * ties keep file order), `count` (rows, with or without a value).
 *
 * Why: a till export has one row per sale, a data warehouse one per day; the pack analyses one value per month,
 * quarter or week. Flows add up over a period, stocks are read at its end (see {@link defaultAggregate}).
 *
 * NaN policy: missing cells are skipped (`sum` of a period whose rows are all blank is NaN, never 0); a period
 * without rows is NaN, except for `sum` and `count` when `zeroWhenEmpty` (the source's `emptyMeans: zero`).
 *
 * Reference: the same as R's `aggregate(x, by, FUN)` with `sum`, `mean`, `min`, `max`, `length`, `head(x, 1)`,
 * `tail(x, 1)` and pandas' `resample(...).sum()`, `.mean()`, `.first()`, `.last()` (test/derive checks both).
 */
export function periodValue(s: PeriodSummary, method: Aggregate, zeroWhenEmpty = false): number {
  if (s.rows === 0) return zeroWhenEmpty && (method === 'sum' || method === 'count') ? 0 : NaN;
  switch (method) {
    case 'sum':
      return s.sum;
    case 'mean':
      return s.values > 0 ? s.sum / s.values : NaN;
    case 'min':
      return s.min;
    case 'max':
      return s.max;
    case 'first':
      return s.first;
    case 'last':
      return s.last;
    case 'count':
      return s.rows;
  }
}

/**
 * `sum` for flows (sales add up over a period), `last` for stocks (a level is read at the period's end), `mean` for
 * ratios read from a source (a rate has no sum; without its parts, the mean of the period's rates).
 */
export function defaultAggregate(kind: 'flow' | 'stock' | 'ratio'): Aggregate {
  return kind === 'flow' ? 'sum' : kind === 'stock' ? 'last' : 'mean';
}
