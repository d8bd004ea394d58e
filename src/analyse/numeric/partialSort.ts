/**
 * Partial quicksort of STL's published code (routine `psort`, after R. C. Singleton, ACM Algorithm 347, 1969),
 * ported step by step: rearranges `a` so that the positions `ind` (1-based, ascending) are meant to hold the
 * order statistics of those ranks, sorting only the segments that contain them.
 *
 * Why a literal port rather than a textbook selection: STL's robustness weights take their median from this
 * routine, and in some inputs it leaves a value other than the exact order statistic at a requested position
 * (observed on R's `UKgas` and `log(AirPassengers)` with 15 robustness passes). Reproducing R's `stats::stl`
 * therefore needs the same routine, not a correct median. Use {@link ./median.js} for a true median.
 *
 * Complexity: O(n) expected, O(n²) worst case. Works in place on `a`. NaN policy: rejects NaN by contract
 * (comparisons with NaN are false, so the result is unspecified).
 */
/** Stacks of the partial sort: sixteen levels suffice for any array length (its documented bound). */
const indl = new Int32Array(17);
const indu = new Int32Array(17);
const il = new Int32Array(17);
const iu = new Int32Array(17);

export function partialSortInPlace(a: Float64Array, ind: readonly number[]): void {
  const n = a.length;
  const ni = ind.length;
  if (n < 2 || ni === 0) return;
  // Positions are 1-based as in the paper (a[p − 1] holds its a(p)); labels are those of the published code.
  indl.fill(0);
  indu.fill(0);
  il.fill(0);
  iu.fill(0);
  let jl = 1;
  let ju = ni;
  indl[1] = 1;
  indu[1] = ni;
  let i = 1;
  let j = n;
  let m = 1;
  let k = 0;
  let l = 0;
  let t = 0;
  let label = 161;
  for (;;) {
    switch (label) {
      case 161:
        label = i < j ? 10 : 166;
        break;
      case 166:
        m -= 1;
        if (m === 0) return;
        i = il[m];
        j = iu[m];
        jl = indl[m];
        ju = indu[m];
        label = jl <= ju ? 173 : 166;
        break;
      case 173:
        label = j - i > 10 ? 10 : 174;
        break;
      case 10: {
        k = i;
        const ij = (i + j) >> 1;
        t = a[ij - 1];
        if (a[i - 1] > t) {
          a[ij - 1] = a[i - 1];
          a[i - 1] = t;
          t = a[ij - 1];
        }
        l = j;
        if (a[j - 1] < t) {
          a[ij - 1] = a[j - 1];
          a[j - 1] = t;
          t = a[ij - 1];
          if (a[i - 1] > t) {
            a[ij - 1] = a[i - 1];
            a[i - 1] = t;
            t = a[ij - 1];
          }
        }
        label = 181;
        break;
      }
      case 181:
        // The published code returns to label 181 until the scans cross; the loop stays here instead of
        // dispatching once per element.
        for (;;) {
          l -= 1;
          if (a[l - 1] <= t) {
            const tt = a[l - 1];
            do k += 1;
            while (!(a[k - 1] >= t));
            if (k > l) break;
            a[l - 1] = a[k - 1];
            a[k - 1] = tt;
          }
        }
        label = 183;
        break;
      case 183: {
        indl[m] = jl;
        indu[m] = ju;
        const p = m;
        m += 1;
        label = 173;
        if (l - i <= j - k) {
          il[p] = k;
          iu[p] = j;
          j = l;
          for (;;) {
            if (jl > ju) {
              label = 166;
              break;
            }
            if (ind[ju - 1] > j) ju -= 1;
            else break;
          }
          if (label === 173) indl[p] = ju + 1;
        } else {
          il[p] = i;
          iu[p] = l;
          i = k;
          for (;;) {
            if (jl > ju) {
              label = 166;
              break;
            }
            if (ind[jl - 1] < i) jl += 1;
            else break;
          }
          if (label === 173) indu[p] = jl - 1;
        }
        break;
      }
      case 174:
        if (i !== 1) {
          i -= 1;
          for (;;) {
            i += 1;
            if (i === j) break;
            t = a[i + 1 - 1];
            if (a[i - 1] > t) {
              k = i;
              do {
                a[k + 1 - 1] = a[k - 1];
                k -= 1;
              } while (!(t >= a[k - 1]));
              a[k + 1 - 1] = t;
            }
          }
          label = 166;
        } else label = 161;
        break;
    }
  }
}
