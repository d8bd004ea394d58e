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
 * Seasonally adjust one series (values aligned with periods `ctx.start`, `ctx.start + 1`, …; NaN = missing).
 * Returns `{ok: false, reason}` with a plain sentence when the data cannot be adjusted; never throws for data.
 */
export function adjustSeries(values: Float64Array, ctx: AdjustContext): AdjustOutcome {
  try {
    return adjust(values, ctx);
  } catch (error) {
    return {ok: false, reason: `Not seasonally adjusted: ${(error as Error).message}.`};
  }
}
