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
export function partialSortInPlace(a: Float64Array, ind: readonly number[]): void {
  const n = a.length;
  const ni = ind.length;
  if (n < 2 || ni === 0) return;
  // 1-based views of the paper's variables; the label numbers are those of the published code.
  const at = (p: number): number => a[p - 1];
  const set = (p: number, v: number): void => {
    a[p - 1] = v;
  };
  const indl = new Int32Array(17);
  const indu = new Int32Array(17);
  const il = new Int32Array(17);
  const iu = new Int32Array(17);
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
        t = at(ij);
        if (at(i) > t) {
          set(ij, at(i));
          set(i, t);
          t = at(ij);
        }
        l = j;
        if (at(j) < t) {
          set(ij, at(j));
          set(j, t);
          t = at(ij);
          if (at(i) > t) {
            set(ij, at(i));
            set(i, t);
            t = at(ij);
          }
        }
        label = 181;
        break;
      }
      case 181:
        l -= 1;
        if (at(l) <= t) {
          const tt = at(l);
          do k += 1;
          while (!(at(k) >= t));
          if (k > l) {
            label = 183;
            break;
          }
          set(l, at(k));
          set(k, tt);
        }
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
            t = at(i + 1);
            if (at(i) > t) {
              k = i;
              do {
                set(k + 1, at(k));
                k -= 1;
              } while (!(t >= at(k)));
              set(k + 1, t);
            }
          }
          label = 166;
        } else label = 161;
        break;
    }
  }
}
