import type {EtsParams, EtsSpec} from './etsModel.js';

/** The likelihood criterion of etsFilter.ts and its gradient, for one series and one model (see below). */
export type EtsLikelihoodGradient = (
  params: EtsParams,
  states: Float64Array,
  gradParams: Float64Array,
  gradStates: Float64Array,
) => number;

const TOL = 1e-10;
const HUGE = 1e10;

/**
 * The ETS likelihood criterion L = n·log(Σ eₜ²) + 2·Σ log|ŷₜ| (the second term for multiplicative errors only),
 * exactly as etsRecurse computes it, with its gradient by reverse-mode differentiation (the adjoint of the
 * recursion): one forward pass keeps the states, one-step forecasts and seasonal states of every step, one
 * backward pass carries ∂L/∂(state) from the last step to the first, so the whole gradient costs about two
 * evaluations of L however many parameters there are. The function returned writes ∂L/∂(α, β, γ, φ) into
 * `gradParams` (zero for a parameter the model does not use) and ∂L/∂(full initial state [l, b?, s₀ … s_{m−1}])
 * into `gradStates`, and returns L.
 *
 * The recursion (etsFilter.ts): q = l + φb; ŷ = q, q + s or q·s (s the seasonal state m steps back);
 * l' = q + α(p − q) with p = y, y − s or y/s; b' = φb + (β/α)(l' − l − φb); s' = s + γ(y − q − s) or s + γ(y/q − s).
 * The guards against division by near-zero states (1e10 in place of the quotient) are constants here.
 *
 * Why: a quasi-Newton search needs the gradient; finite differences would cost one evaluation per parameter.
 * Reference: Hyndman et al. (2008), Forecasting with Exponential Smoothing, ch. 5 (the likelihood); A. Griewank
 * and A. Walther (2008), Evaluating Derivatives, 2nd ed., ch. 3 (reverse mode).
 *
 * Complexity: O(n + m) time per call, O(n + m) scratch memory kept by the closure. NaN policy: rejects NaN
 * (NaN in y gives a NaN criterion).
 */
export function etsLikelihoodGradient(y: Float64Array, spec: EtsSpec): EtsLikelihoodGradient {
  const n = y.length;
  const hasTrend = spec.trend !== 'N';
  const season = spec.season;
  const m = season === 'N' ? 1 : spec.period;
  const multError = spec.error === 'M';
  const first = hasTrend ? 2 : 1;
  const L = new Float64Array(n);
  const B = new Float64Array(n);
  const F = new Float64Array(n);
  const E = new Float64Array(n);
  // S[k]: the seasonal state made at step k − m (k ≥ m); S[0 … m−1] the initial ones, oldest first.
  const S = new Float64Array(n + m);
  const gS = new Float64Array(n + m);
  return (params, states, gradParams, gradStates) => {
    const alpha = params.alpha;
    const beta = hasTrend ? params.beta : 0;
    const gamma = season === 'N' ? 0 : params.gamma;
    const phi = hasTrend && spec.damped ? params.phi : 1;
    const ratio = beta / alpha;
    let l = states[0];
    let b = hasTrend ? states[1] : 0;
    if (season !== 'N') for (let j = 0; j < m; j++) S[m - 1 - j] = states[first + j];
    let sse = 0;
    let logSum = 0;
    for (let t = 0; t < n; t++) {
      L[t] = l;
      B[t] = b;
      const phib = phi * b;
      const q = l + phib;
      const yt = y[t];
      let f: number;
      let lNew: number;
      if (season === 'N') {
        f = q;
        lNew = q + alpha * (yt - q);
      } else {
        const old = S[t];
        let target: number;
        if (season === 'A') {
          f = q + old;
          lNew = q + alpha * (yt - old - q);
          target = yt - q;
        } else {
          f = q * old;
          lNew = q + alpha * ((Math.abs(old) < TOL ? HUGE : yt / old) - q);
          target = Math.abs(q) < TOL ? HUGE : yt / q;
        }
        S[t + m] = old + gamma * (target - old);
      }
      const e = multError ? (yt - f) / f : yt - f;
      F[t] = f;
      E[t] = e;
      if (hasTrend) b = phib + ratio * (lNew - l - phib);
      l = lNew;
      sse += e * e;
      if (multError) logSum += Math.log(Math.abs(f));
    }
    let lik = n * Math.log(sse);
    if (multError) lik += 2 * logSum;
    // Backward pass: gl, gb are ∂L/∂(level, trend) after step t; gS[k] collects ∂L/∂S[k].
    gS.fill(0);
    let gl = 0;
    let gb = 0;
    let gAlpha = 0;
    let gRatio = 0;
    let gGamma = 0;
    let gPhi = 0;
    const scale = (2 * n) / sse;
    for (let t = n - 1; t >= 0; t--) {
      const yt = y[t];
      const f = F[t];
      const lt = L[t];
      const bt = B[t];
      const phib = phi * bt;
      const q = lt + phib;
      // ∂L/∂ŷ through the error and the log term.
      const ge = scale * E[t];
      const gf = multError ? -ge * (yt / (f * f)) + 2 / f : -ge;
      let gq = 0;
      let gPhib = 0;
      let glIn = 0;
      let gLevelNew = gl;
      if (hasTrend) {
        gPhib += gb * (1 - ratio);
        gLevelNew += gb * ratio;
        glIn -= gb * ratio;
      }
      if (season === 'N') {
        gq += gLevelNew * (1 - alpha) + gf;
        gAlpha += gLevelNew * (yt - q);
        if (hasTrend) gRatio += gb * (q + alpha * (yt - q) - lt - phib);
      } else {
        const old = S[t];
        const gs = gS[t + m];
        let gOld = 0;
        let lNew: number;
        if (season === 'A') {
          lNew = q + alpha * (yt - old - q);
          gq += gLevelNew * (1 - alpha) - gs * gamma + gf;
          gOld += -gLevelNew * alpha + gs * (1 - gamma) + gf;
          gAlpha += gLevelNew * (yt - old - q);
          gGamma += gs * (yt - q - old);
        } else {
          const smallOld = Math.abs(old) < TOL;
          const smallQ = Math.abs(q) < TOL;
          const p = smallOld ? HUGE : yt / old;
          const target = smallQ ? HUGE : yt / q;
          lNew = q + alpha * (p - q);
          gq += gLevelNew * (1 - alpha) + gf * old;
          if (!smallQ) gq -= gs * gamma * (yt / (q * q));
          gOld += gs * (1 - gamma) + gf * q;
          if (!smallOld) gOld -= gLevelNew * alpha * (yt / (old * old));
          gAlpha += gLevelNew * (p - q);
          gGamma += gs * (target - old);
        }
        gS[t] += gOld;
        if (hasTrend) gRatio += gb * (lNew - lt - phib);
      }
      glIn += gq;
      gPhib += gq;
      gl = glIn;
      gb = gPhib * phi;
      gPhi += gPhib * bt;
    }
    gradParams[0] = gAlpha - (gRatio * beta) / (alpha * alpha);
    gradParams[1] = hasTrend ? gRatio / alpha : 0;
    gradParams[2] = gGamma;
    gradParams[3] = hasTrend && spec.damped ? gPhi : 0;
    gradStates[0] = gl;
    if (hasTrend) gradStates[1] = gb;
    if (season !== 'N') for (let j = 0; j < m; j++) gradStates[first + j] = gS[m - 1 - j];
    return lik;
  };
}
