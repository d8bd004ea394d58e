/**
 * ETS model specification in the state-space taxonomy of Hyndman, Koehler, Snyder & Grose (2002):
 * error A/M, trend N/A (optionally damped), seasonal N/A/M. Multiplicative trends are not offered: their
 * forecasts explode too easily for management reporting, and the reference implementation leaves them out of
 * automatic selection by default.
 *
 * Reference: R. J. Hyndman, A. B. Koehler, R. D. Snyder and S. Grose (2002), A state space framework for
 * automatic forecasting using exponential smoothing methods, International Journal of Forecasting 18, 439–454;
 * R. J. Hyndman, A. B. Koehler, J. K. Ord and R. D. Snyder (2008), Forecasting with Exponential Smoothing.
 */
export interface EtsSpec {
  error: 'A' | 'M';
  trend: 'N' | 'A';
  damped: boolean;
  season: 'N' | 'A' | 'M';
  /** Seasonal period m (1 when season is N). */
  period: number;
}

/** Smoothing parameters; beta, gamma, phi are ignored when the model has no trend, season or damping. */
export interface EtsParams {
  alpha: number;
  beta: number;
  gamma: number;
  phi: number;
}

/** `ETS(M,Ad,M)` notation. */
export function etsName(spec: EtsSpec): string {
  return `ETS(${spec.error},${spec.trend}${spec.damped ? 'd' : ''},${spec.season})`;
}

/** Number of initial states: level, trend when present, m − 1 free seasonal states (the last is implied). */
export function freeStateCount(spec: EtsSpec): number {
  return 1 + (spec.trend === 'N' ? 0 : 1) + (spec.season === 'N' ? 0 : spec.period - 1);
}

/**
 * The full initial state vector [l, b?, s₀ … s_{m−1}] from the free states: the last seasonal state makes the
 * seasonal states sum to 0 (additive) or m (multiplicative), as in the reference implementation.
 */
export function completeStates(spec: EtsSpec, free: ArrayLike<number>): Float64Array {
  const k = free.length;
  if (spec.season === 'N') return Float64Array.from(free);
  const out = new Float64Array(k + 1);
  let sum = 0;
  const first = spec.trend === 'N' ? 1 : 2;
  for (let i = 0; i < k; i++) {
    out[i] = free[i];
    if (i >= first) sum += free[i];
  }
  out[k] = (spec.season === 'M' ? spec.period : 0) - sum;
  return out;
}
