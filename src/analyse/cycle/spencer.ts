/**
 * Spencer's 15-term moving average, weights (−3, −6, −5, 3, 21, 46, 67, 74, 67, 46, 21, 3, −5, −6, −3)/320.
 *
 * Why: the second smoothing stage of Bry-Boschan; it passes cubics unchanged, so it follows turns more closely
 * than a 12-month average. The seven points at each end are NaN.
 *
 * Reference: J. Spencer (1904), On the graduation of the rates of sickness and mortality, Journal of the
 * Institute of Actuaries 38:334–343; G. Bry and C. Boschan (1971), NBER Technical Paper 20, ch. 2.
 *
 * Complexity: O(n). NaN policy: NaN in → NaN out for every window that holds it. Returns a new array.
 *
 * @example spencer(new Float64Array(15).fill(2))[7] // => 2
 */
const WEIGHTS = [-3, -6, -5, 3, 21, 46, 67, 74, 67, 46, 21, 3, -5, -6, -3];

export function spencer(values: Float64Array): Float64Array {
  const n = values.length;
  const out = new Float64Array(n).fill(NaN);
  for (let t = 7; t < n - 7; t++) {
    let s = 0;
    for (let j = 0; j < 15; j++) s += WEIGHTS[j] * values[t - 7 + j];
    out[t] = s / 320;
  }
  return out;
}
