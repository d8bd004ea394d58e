/** Units per 1 of a value: sums are kept as whole numbers of millionths. */
export const UNITS_PER_ONE = 1_000_000;

/**
 * A value as a whole number of millionths, or NaN when it is not one exactly: `roundHalfAway(v · 10^6)` when that
 * is at most 2^53 − 1 in magnitude and divides back to `v` (a decimal of at most six places below about 9·10^9, as
 * money and counts are), else NaN. Halves round away from zero, as C's `round`, which DuckDB's `round` uses, so
 * the engine's `round(v * 1000000)` with the same checks gives the same units (ingest/duckdbSummary.ts).
 *
 * Why: a period's sum of such values is a sum of integers, exact in any order, in JavaScript or in a database
 * engine adding in parallel; a sum pushed down into DuckDB then matches the row-by-row reading to the last bit.
 *
 * NaN policy: NaN and ±Infinity give NaN. Complexity: O(1).
 *
 * @example microUnits(12.5) // => 12500000;  microUnits(1 / 3) // => NaN
 */
export function microUnits(v: number): number {
  const x = v * UNITS_PER_ONE;
  const u = x < 0 ? -Math.round(-x) : Math.round(x);
  return Math.abs(u) <= Number.MAX_SAFE_INTEGER && u / UNITS_PER_ONE === v ? u : NaN;
}
