/**
 * Seasonal-adjustment engine. One entry point for the analyse stage:
 *
 *   values ──► checks (≥ 2 full years; constant → nothing to remove)
 *          ──► fill gaps for estimation (straight lines, then fitted trend × seasonal)
 *          ──► model choice (additive / multiplicative on logs / auto rule)
 *          ──► decomposition (STL, classical, or Fourier + LOESS for weekly)
 *          ⟲  calendar effects: regress the irregular on working days, Easter, holidays; remove; decompose again
 *          ──► adjusted = original − seasonal − significant calendar (÷ for multiplicative); NaN where missing
 *          ──► outliers (robust sigma of the irregular) and diagnostics (shares, residual seasonality, revisions)
 */
import {adjust, type AdjustContext, type AdjustOutcome} from './adjust.js';

export type {Adjustment, AdjustmentDiagnostics, CalendarEffect, CalendarRegressor, Outlier} from './types.js';
export type {AdjustContext, AdjustOutcome};

/**
 * Seasonally adjust one series (values aligned with periods `ctx.start`, `ctx.start + 1`, …; NaN and infinities
 * are treated as missing). Returns `{ok: false, reason}` with a plain sentence when the data cannot be adjusted
 * (fewer than two full years observed, or no values); never throws.
 *
 * Components: additive original = trend + seasonal + irregular (+ calendar effect when `calendar` is non-null);
 * multiplicative (STL on logs, back-transformed with exp) original = trend × seasonal × irregular (× calendar),
 * exact up to rounding. Classical decomposition leaves trend and irregular NaN for ⌊period/2⌋ points at each end,
 * as R does; `adjusted` is defined there all the same (original − seasonal, or ÷). Missing periods are filled
 * for estimation and flagged in `filled`; their `adjusted` and `irregular` stay NaN. A constant series is
 * returned with a neutral seasonal (0 or 1) and adjusted = original. Turning off the automatic parts (fixed
 * model, calendar `off`, outliers off) gives exactly R's `stats::stl` / `stats::decompose` numbers.
 */
export function adjustSeries(values: Float64Array, ctx: AdjustContext): AdjustOutcome {
  try {
    return adjust(values, ctx);
  } catch (error) {
    return {ok: false, reason: {code: 'notAdjustable', values: {error: (error as Error).message}}};
  }
}
