;; LOESS, the STL inner pass and STL's robustness weights as WebAssembly: the hot loops of the seasonal adjustment.
;;
;; Why: STL spends nearly all its time in tricube-weighted sums over short windows. Compiled WebAssembly, summing
;; two points at a time in SIMD lanes, runs them about twice as fast as the same arithmetic in JavaScript. Every
;; routine follows the published Fortran of STL (Cleveland, Cleveland, McRae & Terpenning 1990, Journal of Official
;; Statistics 6:3-73; routines est, ess, ma, ss, onestp, rwts and psort); the LOESS sums are rearranged into one
;; pass, so results agree with R's stats::stl to rounding (within 4e-10 relative on the reference cases).
;;
;; Memory: every array is f64. Positions in comments are 1-based as in the paper; y[j] in a comment is the value at
;; byte address y + (j - 1) * 8. Bytes 0 to HEAP_BASE hold kernel tables owned by this module; the caller places
;; its arrays from HEAP_BASE on (exported as heapBase) and names a wide-table area with setWideArea.
;; NaN policy: inputs are finite by contract (the callers check); a fit whose weights are all zero is NaN inside,
;; and its caller falls back to the data value, as the paper does.
;; Build: npm run build:wasm (compiles this file and writes loessKernelBinary.ts).
(module
  (memory (export "memory") 33)

  ;; Tricube tables for bandwidths 0 to 512, two-sided so that a window reads its weights in one direction: the
  ;; table of h starts at f64 slot h^2 and holds distances -h to h. 513^2 = 263,169 slots end at byte 2,105,352;
  ;; one flag byte per bandwidth follows, then the partial sort's four stacks of 17 i32 (indl, indu, il, iu).
  (global $FLAGS i32 (i32.const 2105352))
  (global $MAX_KEPT i32 (i32.const 512))
  (global $STACKS i32 (i32.const 2105872))
  (global (export "heapBase") i32 (i32.const 2106144))

  ;; Wider bandwidths (periodic seasonal windows) use one table in the caller's area, rebuilt when h changes:
  ;; distances -capacity to capacity around the slot at $wide.
  (global $wide (mut i32) (i32.const 0))
  (global $wideH (mut i32) (i32.const -1))
  (global $wideFilled (mut i32) (i32.const -1))

  ;; Name the area for wide tables: 2 * capacity + 1 slots from $address, capacity >= the longest distance.
  (func (export "setWideArea") (param $address i32) (param $capacity i32)
    (global.set $wide (i32.add (local.get $address) (i32.shl (local.get $capacity) (i32.const 3))))
    (global.set $wideH (i32.const -1))
    (global.set $wideFilled (i32.const -1)))

  ;; Tricube weight (1 - (r/h)^3)^3 with the paper's cut-offs: 1 for r <= 0.001 h and 0 for r > 0.999 h.
  (func $tricube (param $r f64) (param $h f64) (result f64)
    (local $q f64) (local $c f64)
    (if (f64.gt (local.get $r) (f64.mul (f64.const 0.999) (local.get $h))) (then (return (f64.const 0))))
    (if (f64.le (local.get $r) (f64.mul (f64.const 0.001) (local.get $h))) (then (return (f64.const 1))))
    (local.set $q (f64.div (local.get $r) (local.get $h)))
    (local.set $c (f64.sub (f64.const 1) (f64.mul (f64.mul (local.get $q) (local.get $q)) (local.get $q))))
    (f64.mul (f64.mul (local.get $c) (local.get $c)) (local.get $c)))

  ;; Write tricube weights of bandwidth $h for distances -$top to $top around the slot at byte address $centre.
  (func $fillTable (param $centre i32) (param $h i32) (param $top i32)
    (local $r i32) (local $w f64) (local $at i32)
    (block $done (loop $next
      (br_if $done (i32.gt_s (local.get $r) (local.get $top)))
      (local.set $w (call $tricube (f64.convert_i32_s (local.get $r)) (f64.convert_i32_s (local.get $h))))
      (local.set $at (i32.shl (local.get $r) (i32.const 3)))
      (f64.store (i32.add (local.get $centre) (local.get $at)) (local.get $w))
      (f64.store (i32.sub (local.get $centre) (local.get $at)) (local.get $w))
      (local.set $r (i32.add (local.get $r) (i32.const 1)))
      (br $next))))

  ;; Byte address of the weight at distance 0 for bandwidth $h, with distances up to $need filled in.
  (func $kernel (param $h i32) (param $need i32) (result i32)
    (local $table i32)
    (if (i32.le_s (local.get $h) (global.get $MAX_KEPT))
      (then
        (local.set $table (i32.shl
          (i32.add (i32.mul (local.get $h) (local.get $h)) (local.get $h))
          (i32.const 3)))
        (if (i32.eqz (i32.load8_u (i32.add (global.get $FLAGS) (local.get $h))))
          (then
            (call $fillTable (local.get $table) (local.get $h) (local.get $h))
            (i32.store8 (i32.add (global.get $FLAGS) (local.get $h)) (i32.const 1))))
        (return (local.get $table))))
    (if (i32.or (i32.ne (local.get $h) (global.get $wideH)) (i32.gt_s (local.get $need) (global.get $wideFilled)))
      (then
        (call $fillTable (global.get $wide) (local.get $h) (local.get $need))
        (global.set $wideH (local.get $h))
        (global.set $wideFilled (local.get $need))))
    (global.get $wide))

  ;; Local fit at whole-number position $x (may lie outside 1..n) from points $left..$right of y (routine est).
  ;; $span is the nominal window; $rw the robustness weights (an array of ones for a plain fit, with $plain = 1).
  ;; One pass sums w, w u, w u^2, w y and w u y with u = j - x, two points at a time (SIMD lanes for even and odd
  ;; steps, added at the end); a local constant, a fit without width, and a plain fit at the centre of a symmetric
  ;; window need only w and w y. Returns NaN when every weight is zero.
  (func $loessAt
    (param $y i32) (param $n i32) (param $span i32) (param $degree i32) (param $x i32)
    (param $left i32) (param $right i32) (param $rw i32) (param $plain i32) (result f64)
    (local $h i32) (local $end i32) (local $pk i32) (local $py i32) (local $pr i32) (local $last i32)
    (local $w f64) (local $wu f64) (local $wy f64) (local $u f64)
    (local $sw f64) (local $swu f64) (local $swuu f64) (local $swy f64) (local $swuy f64)
    (local $level f64) (local $meanU f64) (local $c f64)
    (local $vw v128) (local $vwu v128) (local $vwy v128) (local $vu v128)
    (local $aw v128) (local $awu v128) (local $awuu v128) (local $awy v128) (local $awuy v128)
    (local.set $h (i32.sub (local.get $x) (local.get $left)))
    (if (i32.gt_s (i32.sub (local.get $right) (local.get $x)) (local.get $h))
      (then (local.set $h (i32.sub (local.get $right) (local.get $x)))))
    (local.set $end (local.get $h))
    (if (i32.gt_s (local.get $span) (local.get $n))
      (then (local.set $h (i32.add (local.get $h)
        (i32.div_s (i32.sub (local.get $span) (local.get $n)) (i32.const 2))))))
    ;; Pointers to the weight of distance left - x, to y[left] and to rw[left]; $last points at y[right].
    (local.set $pk (i32.add (call $kernel (local.get $h) (local.get $end))
      (i32.shl (i32.sub (local.get $left) (local.get $x)) (i32.const 3))))
    (local.set $py (i32.add (local.get $y) (i32.shl (i32.sub (local.get $left) (i32.const 1)) (i32.const 3))))
    (local.set $pr (i32.add (local.get $rw) (i32.shl (i32.sub (local.get $left) (i32.const 1)) (i32.const 3))))
    (local.set $last (i32.add (local.get $y) (i32.shl (i32.sub (local.get $right) (i32.const 1)) (i32.const 3))))
    (if (i32.or (i32.or (i32.eqz (local.get $degree)) (i32.eqz (local.get $h)))
                (i32.and (local.get $plain)
                  (i32.eq (i32.sub (local.get $x) (local.get $left)) (i32.sub (local.get $right) (local.get $x)))))
      (then
        (block $done (loop $next
          (br_if $done (i32.ge_u (local.get $py) (local.get $last)))
          (local.set $vw (f64x2.mul (v128.load (local.get $pk)) (v128.load (local.get $pr))))
          (local.set $aw (f64x2.add (local.get $aw) (local.get $vw)))
          (local.set $awy (f64x2.add (local.get $awy) (f64x2.mul (local.get $vw) (v128.load (local.get $py)))))
          (local.set $pk (i32.add (local.get $pk) (i32.const 16)))
          (local.set $py (i32.add (local.get $py) (i32.const 16)))
          (local.set $pr (i32.add (local.get $pr) (i32.const 16)))
          (br $next)))
        (local.set $sw (f64.add (f64x2.extract_lane 0 (local.get $aw)) (f64x2.extract_lane 1 (local.get $aw))))
        (local.set $swy (f64.add (f64x2.extract_lane 0 (local.get $awy)) (f64x2.extract_lane 1 (local.get $awy))))
        (if (i32.eq (local.get $py) (local.get $last))
          (then
            (local.set $w (f64.mul (f64.load (local.get $pk)) (f64.load (local.get $pr))))
            (local.set $sw (f64.add (local.get $sw) (local.get $w)))
            (local.set $swy (f64.add (local.get $swy) (f64.mul (local.get $w) (f64.load (local.get $py)))))))
        (if (f64.gt (local.get $sw) (f64.const 0))
          (then (return (f64.div (local.get $swy) (local.get $sw)))))
        (return (f64.const nan))))
    ;; Local line: five sums, then the closed form of the weighted least-squares line at u = 0.
    (local.set $u (f64.convert_i32_s (i32.sub (local.get $left) (local.get $x))))
    (local.set $vu (f64x2.replace_lane 1 (f64x2.splat (local.get $u)) (f64.add (local.get $u) (f64.const 1))))
    (block $done (loop $next
      (br_if $done (i32.ge_u (local.get $py) (local.get $last)))
      (local.set $vw (f64x2.mul (v128.load (local.get $pk)) (v128.load (local.get $pr))))
      (local.set $vwu (f64x2.mul (local.get $vw) (local.get $vu)))
      (local.set $vwy (f64x2.mul (local.get $vw) (v128.load (local.get $py))))
      (local.set $aw (f64x2.add (local.get $aw) (local.get $vw)))
      (local.set $awu (f64x2.add (local.get $awu) (local.get $vwu)))
      (local.set $awuu (f64x2.add (local.get $awuu) (f64x2.mul (local.get $vwu) (local.get $vu))))
      (local.set $awy (f64x2.add (local.get $awy) (local.get $vwy)))
      (local.set $awuy (f64x2.add (local.get $awuy) (f64x2.mul (local.get $vwy) (local.get $vu))))
      (local.set $vu (f64x2.add (local.get $vu) (v128.const f64x2 2 2)))
      (local.set $pk (i32.add (local.get $pk) (i32.const 16)))
      (local.set $py (i32.add (local.get $py) (i32.const 16)))
      (local.set $pr (i32.add (local.get $pr) (i32.const 16)))
      (br $next)))
    (local.set $sw (f64.add (f64x2.extract_lane 0 (local.get $aw)) (f64x2.extract_lane 1 (local.get $aw))))
    (local.set $swu (f64.add (f64x2.extract_lane 0 (local.get $awu)) (f64x2.extract_lane 1 (local.get $awu))))
    (local.set $swuu (f64.add (f64x2.extract_lane 0 (local.get $awuu)) (f64x2.extract_lane 1 (local.get $awuu))))
    (local.set $swy (f64.add (f64x2.extract_lane 0 (local.get $awy)) (f64x2.extract_lane 1 (local.get $awy))))
    (local.set $swuy (f64.add (f64x2.extract_lane 0 (local.get $awuy)) (f64x2.extract_lane 1 (local.get $awuy))))
    (if (i32.eq (local.get $py) (local.get $last))
      (then
        (local.set $u (f64x2.extract_lane 0 (local.get $vu)))
        (local.set $w (f64.mul (f64.load (local.get $pk)) (f64.load (local.get $pr))))
        (local.set $wu (f64.mul (local.get $w) (local.get $u)))
        (local.set $wy (f64.mul (local.get $w) (f64.load (local.get $py))))
        (local.set $sw (f64.add (local.get $sw) (local.get $w)))
        (local.set $swu (f64.add (local.get $swu) (local.get $wu)))
        (local.set $swuu (f64.add (local.get $swuu) (f64.mul (local.get $wu) (local.get $u))))
        (local.set $swy (f64.add (local.get $swy) (local.get $wy)))
        (local.set $swuy (f64.add (local.get $swuy) (f64.mul (local.get $wy) (local.get $u))))))
    (if (i32.eqz (f64.gt (local.get $sw) (f64.const 0))) (then (return (f64.const nan))))
    (local.set $level (f64.div (local.get $swy) (local.get $sw)))
    (local.set $meanU (f64.div (local.get $swu) (local.get $sw)))
    (local.set $c (f64.sub (f64.div (local.get $swuu) (local.get $sw)) (f64.mul (local.get $meanU) (local.get $meanU))))
    ;; A window too narrow for a slope (spread below 0.001 of the range) keeps the weighted mean.
    (if (i32.eqz (f64.gt (f64.sqrt (local.get $c))
                         (f64.mul (f64.const 0.001) (f64.convert_i32_s (i32.sub (local.get $n) (i32.const 1))))))
      (then (return (local.get $level))))
    (f64.sub (local.get $level)
      (f64.mul (f64.div (local.get $meanU) (local.get $c))
        (f64.sub (f64.div (local.get $swuy) (local.get $sw)) (f64.mul (local.get $meanU) (local.get $level))))))

  ;; out[i] = the fit at i, or y[i] where the fit is undefined.
  (func $fitInto (param $y i32) (param $n i32) (param $span i32) (param $degree i32) (param $i i32)
    (param $left i32) (param $right i32) (param $rw i32) (param $plain i32) (param $out i32)
    (local $v f64) (local $at i32)
    (local.set $at (i32.shl (i32.sub (local.get $i) (i32.const 1)) (i32.const 3)))
    (local.set $v (call $loessAt (local.get $y) (local.get $n) (local.get $span) (local.get $degree) (local.get $i)
      (local.get $left) (local.get $right) (local.get $rw) (local.get $plain)))
    (if (f64.ne (local.get $v) (local.get $v))
      (then (local.set $v (f64.load (i32.add (local.get $y) (local.get $at))))))
    (f64.store (i32.add (local.get $out) (local.get $at)) (local.get $v)))

  ;; Straight line from out[from] to out[to], written over the points between them.
  (func $joinInto (param $out i32) (param $from i32) (param $to i32)
    (local $base f64) (local $delta f64) (local $j i32)
    (local.set $base (f64.load (i32.add (local.get $out) (i32.shl (i32.sub (local.get $from) (i32.const 1)) (i32.const 3)))))
    (local.set $delta (f64.div
      (f64.sub (f64.load (i32.add (local.get $out) (i32.shl (i32.sub (local.get $to) (i32.const 1)) (i32.const 3))))
               (local.get $base))
      (f64.convert_i32_s (i32.sub (local.get $to) (local.get $from)))))
    (local.set $j (i32.add (local.get $from) (i32.const 1)))
    (block $done (loop $next
      (br_if $done (i32.ge_s (local.get $j) (local.get $to)))
      (f64.store (i32.add (local.get $out) (i32.shl (i32.sub (local.get $j) (i32.const 1)) (i32.const 3)))
        (f64.add (local.get $base)
          (f64.mul (local.get $delta) (f64.convert_i32_s (i32.sub (local.get $j) (local.get $from))))))
      (local.set $j (i32.add (local.get $j) (i32.const 1)))
      (br $next))))

  ;; Smooth y[1..n] into out[1..n] (routine ess): fits at every jump-th point, joined by straight lines; the last
  ;; point is always fitted.
  (func $loessInto (export "loessInto")
    (param $y i32) (param $n i32) (param $span i32) (param $degree i32) (param $jump i32)
    (param $rw i32) (param $plain i32) (param $out i32)
    (local $step i32) (local $half i32) (local $left i32) (local $right i32) (local $i i32) (local $k i32)
    (if (i32.lt_s (local.get $n) (i32.const 2))
      (then (f64.store (local.get $out) (f64.load (local.get $y))) (return)))
    (local.set $step (local.get $jump))
    (if (i32.gt_s (local.get $step) (i32.sub (local.get $n) (i32.const 1)))
      (then (local.set $step (i32.sub (local.get $n) (i32.const 1)))))
    (local.set $half (i32.shr_s (i32.add (local.get $span) (i32.const 1)) (i32.const 1)))
    (local.set $left (i32.const 1))
    (local.set $right (local.get $n))
    (local.set $i (i32.const 1))
    (if (i32.ge_s (local.get $span) (local.get $n))
      (then
        (block $done (loop $next
          (br_if $done (i32.gt_s (local.get $i) (local.get $n)))
          (call $fitInto (local.get $y) (local.get $n) (local.get $span) (local.get $degree) (local.get $i)
            (local.get $left) (local.get $right) (local.get $rw) (local.get $plain) (local.get $out))
          (local.set $i (i32.add (local.get $i) (local.get $step)))
          (br $next))))
      (else
        (if (i32.eq (local.get $step) (i32.const 1))
          (then
            ;; Every point: the window slides one place once x passes the middle of the first window.
            (local.set $right (local.get $span))
            (block $done (loop $next
              (br_if $done (i32.gt_s (local.get $i) (local.get $n)))
              (if (i32.and (i32.gt_s (local.get $i) (local.get $half)) (i32.ne (local.get $right) (local.get $n)))
                (then
                  (local.set $left (i32.add (local.get $left) (i32.const 1)))
                  (local.set $right (i32.add (local.get $right) (i32.const 1)))))
              (call $fitInto (local.get $y) (local.get $n) (local.get $span) (local.get $degree) (local.get $i)
                (local.get $left) (local.get $right) (local.get $rw) (local.get $plain) (local.get $out))
              (local.set $i (i32.add (local.get $i) (i32.const 1)))
              (br $next)))
            (return))
          (else
            (block $done (loop $next
              (br_if $done (i32.gt_s (local.get $i) (local.get $n)))
              (if (i32.lt_s (local.get $i) (local.get $half))
                (then
                  (local.set $left (i32.const 1))
                  (local.set $right (local.get $span)))
                (else
                  (if (i32.ge_s (local.get $i) (i32.add (i32.sub (local.get $n) (local.get $half)) (i32.const 1)))
                    (then
                      (local.set $left (i32.add (i32.sub (local.get $n) (local.get $span)) (i32.const 1)))
                      (local.set $right (local.get $n)))
                    (else
                      (local.set $left (i32.add (i32.sub (local.get $i) (local.get $half)) (i32.const 1)))
                      (local.set $right (i32.sub (i32.add (local.get $span) (local.get $i)) (local.get $half)))))))
              (call $fitInto (local.get $y) (local.get $n) (local.get $span) (local.get $degree) (local.get $i)
                (local.get $left) (local.get $right) (local.get $rw) (local.get $plain) (local.get $out))
              (local.set $i (i32.add (local.get $i) (local.get $step)))
              (br $next)))))))
    (if (i32.eq (local.get $step) (i32.const 1)) (then (return)))
    (local.set $i (i32.const 1))
    (block $done (loop $next
      (br_if $done (i32.gt_s (local.get $i) (i32.sub (local.get $n) (local.get $step))))
      (call $joinInto (local.get $out) (local.get $i) (i32.add (local.get $i) (local.get $step)))
      (local.set $i (i32.add (local.get $i) (local.get $step)))
      (br $next)))
    (local.set $k (i32.add (i32.mul (i32.div_s (i32.sub (local.get $n) (i32.const 1)) (local.get $step))
      (local.get $step)) (i32.const 1)))
    (if (i32.ne (local.get $k) (local.get $n))
      (then
        ;; The paper's code fits the last point with the window of the last fitted point.
        (call $fitInto (local.get $y) (local.get $n) (local.get $span) (local.get $degree) (local.get $n)
          (local.get $left) (local.get $right) (local.get $rw) (local.get $plain) (local.get $out))
        (if (i32.ne (local.get $k) (i32.sub (local.get $n) (i32.const 1)))
          (then (call $joinInto (local.get $out) (local.get $k) (local.get $n)))))))

  ;; Moving average of length $len over x[1..n] into out[1..n - len + 1] (routine ma): a running sum.
  (func $movingAverage (param $x i32) (param $n i32) (param $len i32) (param $out i32)
    (local $sum f64) (local $flen f64) (local $i i32) (local $count i32)
    (local.set $flen (f64.convert_i32_s (local.get $len)))
    (local.set $count (i32.add (i32.sub (local.get $n) (local.get $len)) (i32.const 1)))
    (block $done (loop $next
      (br_if $done (i32.ge_s (local.get $i) (local.get $len)))
      (local.set $sum (f64.add (local.get $sum) (f64.load (i32.add (local.get $x) (i32.shl (local.get $i) (i32.const 3))))))
      (local.set $i (i32.add (local.get $i) (i32.const 1)))
      (br $next)))
    (f64.store (local.get $out) (f64.div (local.get $sum) (local.get $flen)))
    (local.set $i (i32.const 1))
    (block $done (loop $next
      (br_if $done (i32.ge_s (local.get $i) (local.get $count)))
      (local.set $sum (f64.add (local.get $sum)
        (f64.sub
          (f64.load (i32.add (local.get $x) (i32.shl (i32.sub (i32.add (local.get $i) (local.get $len)) (i32.const 1)) (i32.const 3))))
          (f64.load (i32.add (local.get $x) (i32.shl (i32.sub (local.get $i) (i32.const 1)) (i32.const 3)))))))
      (f64.store (i32.add (local.get $out) (i32.shl (local.get $i) (i32.const 3)))
        (f64.div (local.get $sum) (local.get $flen)))
      (local.set $i (i32.add (local.get $i) (i32.const 1)))
      (br $next))))

  ;; Copy every np-th value of src from index $first (0-based) into dst[0..k-1].
  (func $gather (param $src i32) (param $first i32) (param $np i32) (param $k i32) (param $dst i32)
    (local $i i32) (local $ps i32) (local $stride i32)
    (local.set $ps (i32.add (local.get $src) (i32.shl (local.get $first) (i32.const 3))))
    (local.set $stride (i32.shl (local.get $np) (i32.const 3)))
    (block $done (loop $next
      (br_if $done (i32.ge_s (local.get $i) (local.get $k)))
      (f64.store (i32.add (local.get $dst) (i32.shl (local.get $i) (i32.const 3))) (f64.load (local.get $ps)))
      (local.set $ps (i32.add (local.get $ps) (local.get $stride)))
      (local.set $i (i32.add (local.get $i) (i32.const 1)))
      (br $next))))

  ;; Smooth each cycle-subseries of x[1..n], extended by one point at both ends, into cycle[1..n + 2 np] (routine ss).
  ;; $sub, $fit and $subW are work areas of at least n / np + 2 slots; $subW is unused for a plain fit.
  (func $cycleSubseries (param $x i32) (param $n i32) (param $np i32) (param $ns i32) (param $degree i32)
    (param $jump i32) (param $rw i32) (param $plain i32) (param $cycle i32)
    (param $sub i32) (param $fit i32) (param $subW i32)
    (local $j i32) (local $k i32) (local $i i32) (local $weights i32) (local $v f64) (local $left i32) (local $right i32)
    (block $done (loop $next
      (br_if $done (i32.ge_s (local.get $j) (local.get $np)))
      (local.set $k (i32.add (i32.div_s (i32.sub (i32.sub (local.get $n) (local.get $j)) (i32.const 1)) (local.get $np))
        (i32.const 1)))
      (call $gather (local.get $x) (local.get $j) (local.get $np) (local.get $k) (local.get $sub))
      (local.set $weights (local.get $rw))
      (if (i32.eqz (local.get $plain))
        (then
          (call $gather (local.get $rw) (local.get $j) (local.get $np) (local.get $k) (local.get $subW))
          (local.set $weights (local.get $subW))))
      (call $loessInto (local.get $sub) (local.get $k) (local.get $ns) (local.get $degree) (local.get $jump)
        (local.get $weights) (local.get $plain) (i32.add (local.get $fit) (i32.const 8)))
      ;; One cycle before the first point, from the first ns points.
      (local.set $right (local.get $k))
      (if (i32.lt_s (local.get $ns) (local.get $k)) (then (local.set $right (local.get $ns))))
      (local.set $v (call $loessAt (local.get $sub) (local.get $k) (local.get $ns) (local.get $degree) (i32.const 0)
        (i32.const 1) (local.get $right) (local.get $weights) (local.get $plain)))
      (if (f64.ne (local.get $v) (local.get $v)) (then (local.set $v (f64.load offset=8 (local.get $fit)))))
      (f64.store (local.get $fit) (local.get $v))
      ;; One cycle after the last point, from the last ns points.
      (local.set $left (i32.add (i32.sub (local.get $k) (local.get $ns)) (i32.const 1)))
      (if (i32.lt_s (local.get $left) (i32.const 1)) (then (local.set $left (i32.const 1))))
      (local.set $v (call $loessAt (local.get $sub) (local.get $k) (local.get $ns) (local.get $degree)
        (i32.add (local.get $k) (i32.const 1)) (local.get $left) (local.get $k) (local.get $weights) (local.get $plain)))
      (if (f64.ne (local.get $v) (local.get $v))
        (then (local.set $v (f64.load (i32.add (local.get $fit) (i32.shl (local.get $k) (i32.const 3)))))))
      (f64.store (i32.add (local.get $fit) (i32.shl (i32.add (local.get $k) (i32.const 1)) (i32.const 3))) (local.get $v))
      ;; Scatter the k + 2 fits back to every np-th place of cycle.
      (local.set $i (i32.const 0))
      (block $copied (loop $copy
        (br_if $copied (i32.ge_s (local.get $i) (i32.add (local.get $k) (i32.const 2))))
        (f64.store
          (i32.add (local.get $cycle)
            (i32.shl (i32.add (i32.mul (local.get $i) (local.get $np)) (local.get $j)) (i32.const 3)))
          (f64.load (i32.add (local.get $fit) (i32.shl (local.get $i) (i32.const 3)))))
        (local.set $i (i32.add (local.get $i) (i32.const 1)))
        (br $copy)))
      (local.set $j (i32.add (local.get $j) (i32.const 1)))
      (br $next))))

  ;; out[i] = a[i] - b[i] for i = 0..n-1 (a and b may start at different places).
  (func $difference (param $a i32) (param $b i32) (param $n i32) (param $out i32)
    (local $i i32) (local $at i32)
    (block $done (loop $next
      (br_if $done (i32.ge_s (local.get $i) (local.get $n)))
      (local.set $at (i32.shl (local.get $i) (i32.const 3)))
      (f64.store (i32.add (local.get $out) (local.get $at))
        (f64.sub (f64.load (i32.add (local.get $a) (local.get $at))) (f64.load (i32.add (local.get $b) (local.get $at)))))
      (local.set $i (i32.add (local.get $i) (i32.const 1)))
      (br $next))))

  ;; Partial quicksort of STL's published code (routine psort, after R. C. Singleton, ACM Algorithm 347, 1969),
  ;; ported step by step: rearranges a[1..n] so that the positions ind[1..ni] (1-based, ascending, i32) are meant to
  ;; hold the order statistics of those ranks. In some inputs it leaves another value at a requested position
  ;; (seen on R's UKgas and log(AirPassengers)); reproducing R's stats::stl needs this routine, not a true median.
  ;; The published code's labels are states of one dispatch loop: 0 = 161, 1 = 166, 2 = 173, 3 = 10, 4 = 181,
  ;; 5 = 183, 6 = 174.
  (func $partialSort (export "partialSort") (param $a i32) (param $n i32) (param $ind i32) (param $ni i32)
    (local $state i32) (local $i i32) (local $j i32) (local $m i32) (local $k i32) (local $l i32)
    (local $jl i32) (local $ju i32) (local $p i32) (local $ij i32) (local $t f64) (local $tt f64)
    (if (i32.or (i32.lt_s (local.get $n) (i32.const 2)) (i32.eqz (local.get $ni))) (then (return)))
    (memory.fill (global.get $STACKS) (i32.const 0) (i32.const 272))
    (local.set $jl (i32.const 1))
    (local.set $ju (local.get $ni))
    (i32.store (i32.add (global.get $STACKS) (i32.add (i32.const 0) (i32.shl (i32.const 1) (i32.const 2)))) (i32.const 1))
    (i32.store (i32.add (global.get $STACKS) (i32.add (i32.const 68) (i32.shl (i32.const 1) (i32.const 2)))) (local.get $ni))
    (local.set $i (i32.const 1))
    (local.set $j (local.get $n))
    (local.set $m (i32.const 1))
    (loop $dispatch
      (block $s174 (block $s183 (block $s181 (block $s10 (block $s173 (block $s166 (block $s161
        (br_table $s161 $s166 $s173 $s10 $s181 $s183 $s174 (local.get $state)))
        ;; 161
        (local.set $state (select (i32.const 3) (i32.const 1) (i32.lt_s (local.get $i) (local.get $j))))
        (br $dispatch))
        ;; 166: pop a segment
        (local.set $m (i32.sub (local.get $m) (i32.const 1)))
        (if (i32.eqz (local.get $m)) (then (return)))
        (local.set $i (i32.load (i32.add (global.get $STACKS) (i32.add (i32.const 136) (i32.shl (local.get $m) (i32.const 2))))))
        (local.set $j (i32.load (i32.add (global.get $STACKS) (i32.add (i32.const 204) (i32.shl (local.get $m) (i32.const 2))))))
        (local.set $jl (i32.load (i32.add (global.get $STACKS) (i32.add (i32.const 0) (i32.shl (local.get $m) (i32.const 2))))))
        (local.set $ju (i32.load (i32.add (global.get $STACKS) (i32.add (i32.const 68) (i32.shl (local.get $m) (i32.const 2))))))
        (local.set $state (select (i32.const 2) (i32.const 1) (i32.le_s (local.get $jl) (local.get $ju))))
        (br $dispatch))
        ;; 173
        (local.set $state (select (i32.const 3) (i32.const 6) (i32.gt_s (i32.sub (local.get $j) (local.get $i)) (i32.const 10))))
        (br $dispatch))
        ;; 10: median of three as the pivot t
        (local.set $k (local.get $i))
        (local.set $ij (i32.shr_s (i32.add (local.get $i) (local.get $j)) (i32.const 1)))
        (local.set $t (f64.load (i32.add (local.get $a) (i32.shl (i32.sub (local.get $ij) (i32.const 1)) (i32.const 3)))))
        (if (f64.gt (f64.load (i32.add (local.get $a) (i32.shl (i32.sub (local.get $i) (i32.const 1)) (i32.const 3)))) (local.get $t))
          (then (f64.store (i32.add (local.get $a) (i32.shl (i32.sub (local.get $ij) (i32.const 1)) (i32.const 3))) (f64.load (i32.add (local.get $a) (i32.shl (i32.sub (local.get $i) (i32.const 1)) (i32.const 3))))) (f64.store (i32.add (local.get $a) (i32.shl (i32.sub (local.get $i) (i32.const 1)) (i32.const 3))) (local.get $t)) (local.set $t (f64.load (i32.add (local.get $a) (i32.shl (i32.sub (local.get $ij) (i32.const 1)) (i32.const 3)))))))
        (local.set $l (local.get $j))
        (if (f64.lt (f64.load (i32.add (local.get $a) (i32.shl (i32.sub (local.get $j) (i32.const 1)) (i32.const 3)))) (local.get $t))
          (then
            (f64.store (i32.add (local.get $a) (i32.shl (i32.sub (local.get $ij) (i32.const 1)) (i32.const 3))) (f64.load (i32.add (local.get $a) (i32.shl (i32.sub (local.get $j) (i32.const 1)) (i32.const 3))))) (f64.store (i32.add (local.get $a) (i32.shl (i32.sub (local.get $j) (i32.const 1)) (i32.const 3))) (local.get $t)) (local.set $t (f64.load (i32.add (local.get $a) (i32.shl (i32.sub (local.get $ij) (i32.const 1)) (i32.const 3)))))
            (if (f64.gt (f64.load (i32.add (local.get $a) (i32.shl (i32.sub (local.get $i) (i32.const 1)) (i32.const 3)))) (local.get $t))
              (then (f64.store (i32.add (local.get $a) (i32.shl (i32.sub (local.get $ij) (i32.const 1)) (i32.const 3))) (f64.load (i32.add (local.get $a) (i32.shl (i32.sub (local.get $i) (i32.const 1)) (i32.const 3))))) (f64.store (i32.add (local.get $a) (i32.shl (i32.sub (local.get $i) (i32.const 1)) (i32.const 3))) (local.get $t)) (local.set $t (f64.load (i32.add (local.get $a) (i32.shl (i32.sub (local.get $ij) (i32.const 1)) (i32.const 3)))))))))
        (local.set $state (i32.const 4))
        (br $dispatch))
        ;; 181: scan from both ends until the scans cross
        (block $crossed (loop $scan
          (local.set $l (i32.sub (local.get $l) (i32.const 1)))
          (if (f64.le (f64.load (i32.add (local.get $a) (i32.shl (i32.sub (local.get $l) (i32.const 1)) (i32.const 3)))) (local.get $t))
            (then
              (local.set $tt (f64.load (i32.add (local.get $a) (i32.shl (i32.sub (local.get $l) (i32.const 1)) (i32.const 3)))))
              (loop $up
                (local.set $k (i32.add (local.get $k) (i32.const 1)))
                (br_if $up (i32.eqz (f64.ge (f64.load (i32.add (local.get $a) (i32.shl (i32.sub (local.get $k) (i32.const 1)) (i32.const 3)))) (local.get $t)))))
              (br_if $crossed (i32.gt_s (local.get $k) (local.get $l)))
              (f64.store (i32.add (local.get $a) (i32.shl (i32.sub (local.get $l) (i32.const 1)) (i32.const 3))) (f64.load (i32.add (local.get $a) (i32.shl (i32.sub (local.get $k) (i32.const 1)) (i32.const 3)))))
              (f64.store (i32.add (local.get $a) (i32.shl (i32.sub (local.get $k) (i32.const 1)) (i32.const 3))) (local.get $tt))))
          (br $scan)))
        (local.set $state (i32.const 5))
        (br $dispatch))
        ;; 183: push the larger part, keep the ranks that fall in the smaller
        (i32.store (i32.add (global.get $STACKS) (i32.add (i32.const 0) (i32.shl (local.get $m) (i32.const 2)))) (local.get $jl))
        (i32.store (i32.add (global.get $STACKS) (i32.add (i32.const 68) (i32.shl (local.get $m) (i32.const 2)))) (local.get $ju))
        (local.set $p (local.get $m))
        (local.set $m (i32.add (local.get $m) (i32.const 1)))
        (local.set $state (i32.const 2))
        (if (i32.le_s (i32.sub (local.get $l) (local.get $i)) (i32.sub (local.get $j) (local.get $k)))
          (then
            (i32.store (i32.add (global.get $STACKS) (i32.add (i32.const 136) (i32.shl (local.get $p) (i32.const 2)))) (local.get $k))
            (i32.store (i32.add (global.get $STACKS) (i32.add (i32.const 204) (i32.shl (local.get $p) (i32.const 2)))) (local.get $j))
            (local.set $j (local.get $l))
            (block $found (loop $drop
              (if (i32.gt_s (local.get $jl) (local.get $ju)) (then (local.set $state (i32.const 1)) (br $found)))
              (br_if $found (i32.le_s (i32.load (i32.add (local.get $ind) (i32.shl (i32.sub (local.get $ju) (i32.const 1)) (i32.const 2)))) (local.get $j)))
              (local.set $ju (i32.sub (local.get $ju) (i32.const 1)))
              (br $drop)))
            (if (i32.eq (local.get $state) (i32.const 2))
              (then (i32.store (i32.add (global.get $STACKS) (i32.add (i32.const 0) (i32.shl (local.get $p) (i32.const 2)))) (i32.add (local.get $ju) (i32.const 1))))))
          (else
            (i32.store (i32.add (global.get $STACKS) (i32.add (i32.const 136) (i32.shl (local.get $p) (i32.const 2)))) (local.get $i))
            (i32.store (i32.add (global.get $STACKS) (i32.add (i32.const 204) (i32.shl (local.get $p) (i32.const 2)))) (local.get $l))
            (local.set $i (local.get $k))
            (block $found (loop $drop
              (if (i32.gt_s (local.get $jl) (local.get $ju)) (then (local.set $state (i32.const 1)) (br $found)))
              (br_if $found (i32.ge_s (i32.load (i32.add (local.get $ind) (i32.shl (i32.sub (local.get $jl) (i32.const 1)) (i32.const 2)))) (local.get $i)))
              (local.set $jl (i32.add (local.get $jl) (i32.const 1)))
              (br $drop)))
            (if (i32.eq (local.get $state) (i32.const 2))
              (then (i32.store (i32.add (global.get $STACKS) (i32.add (i32.const 68) (i32.shl (local.get $p) (i32.const 2)))) (i32.sub (local.get $jl) (i32.const 1)))))))
        (br $dispatch))
      ;; 174: short segment; insertion sort unless it starts the array (then back to 161)
      (if (i32.eq (local.get $i) (i32.const 1))
        (then (local.set $state (i32.const 0)) (br $dispatch)))
      (local.set $i (i32.sub (local.get $i) (i32.const 1)))
      (block $sorted (loop $insert
        (local.set $i (i32.add (local.get $i) (i32.const 1)))
        (br_if $sorted (i32.eq (local.get $i) (local.get $j)))
        (local.set $t (f64.load (i32.add (local.get $a) (i32.shl (i32.sub (i32.add (local.get $i) (i32.const 1)) (i32.const 1)) (i32.const 3)))))
        (if (f64.gt (f64.load (i32.add (local.get $a) (i32.shl (i32.sub (local.get $i) (i32.const 1)) (i32.const 3)))) (local.get $t))
          (then
            (local.set $k (local.get $i))
            (loop $shift
              (f64.store (i32.add (local.get $a) (i32.shl (i32.sub (i32.add (local.get $k) (i32.const 1)) (i32.const 1)) (i32.const 3))) (f64.load (i32.add (local.get $a) (i32.shl (i32.sub (local.get $k) (i32.const 1)) (i32.const 3)))))
              (local.set $k (i32.sub (local.get $k) (i32.const 1)))
              (br_if $shift (i32.eqz (f64.ge (local.get $t) (f64.load (i32.add (local.get $a) (i32.shl (i32.sub (local.get $k) (i32.const 1)) (i32.const 3))))))))
            (f64.store (i32.add (local.get $a) (i32.shl (i32.sub (i32.add (local.get $k) (i32.const 1)) (i32.const 1)) (i32.const 3))) (local.get $t))))
        (br $insert)))
      (local.set $state (i32.const 1))
      (br $dispatch)))

  ;; Bisquare robustness weights (paper section 2.3) into out[1..n] from the residuals y - (trend + seasonal):
  ;; h = 6 * median |residual|, weight (1 - (r/h)^2)^2, 1 below 0.001 h and 0 above 0.999 h. The median is the
  ;; paper's: mean of the values the partial sort leaves at ranks floor(n/2) + 1 and n - floor(n/2). $scratch holds
  ;; n slots and then the two ranks.
  (func (export "robustnessWeights") (param $y i32) (param $trend i32) (param $seasonal i32) (param $n i32)
    (param $out i32) (param $scratch i32)
    (local $i i32) (local $at i32) (local $r f64) (local $q f64) (local $mid1 i32) (local $mid2 i32) (local $ranks i32)
    (local $cmad f64) (local $c9 f64) (local $c1 f64)
    (block $done (loop $next
      (br_if $done (i32.ge_s (local.get $i) (local.get $n)))
      (local.set $at (i32.shl (local.get $i) (i32.const 3)))
      (f64.store (i32.add (local.get $scratch) (local.get $at))
        (f64.abs (f64.sub (f64.load (i32.add (local.get $y) (local.get $at)))
          (f64.add (f64.load (i32.add (local.get $trend) (local.get $at))) (f64.load (i32.add (local.get $seasonal) (local.get $at)))))))
      (local.set $i (i32.add (local.get $i) (i32.const 1)))
      (br $next)))
    (local.set $mid1 (i32.add (i32.shr_s (local.get $n) (i32.const 1)) (i32.const 1)))
    (local.set $mid2 (i32.add (i32.sub (local.get $n) (local.get $mid1)) (i32.const 1)))
    (local.set $ranks (i32.add (local.get $scratch) (i32.shl (local.get $n) (i32.const 3))))
    (i32.store (local.get $ranks) (local.get $mid1))
    (i32.store offset=4 (local.get $ranks) (local.get $mid2))
    (call $partialSort (local.get $scratch) (local.get $n) (local.get $ranks) (i32.const 2))
    (local.set $cmad (f64.mul (f64.const 3)
      (f64.add (f64.load (i32.add (local.get $scratch) (i32.shl (i32.sub (local.get $mid1) (i32.const 1)) (i32.const 3))))
               (f64.load (i32.add (local.get $scratch) (i32.shl (i32.sub (local.get $mid2) (i32.const 1)) (i32.const 3)))))))
    (local.set $c9 (f64.mul (f64.const 0.999) (local.get $cmad)))
    (local.set $c1 (f64.mul (f64.const 0.001) (local.get $cmad)))
    (local.set $i (i32.const 0))
    (block $done (loop $next
      (br_if $done (i32.ge_s (local.get $i) (local.get $n)))
      (local.set $at (i32.shl (local.get $i) (i32.const 3)))
      (local.set $r (f64.abs (f64.sub (f64.load (i32.add (local.get $y) (local.get $at)))
        (f64.add (f64.load (i32.add (local.get $trend) (local.get $at))) (f64.load (i32.add (local.get $seasonal) (local.get $at)))))))
      (if (f64.le (local.get $r) (local.get $c1))
        (then (f64.store (i32.add (local.get $out) (local.get $at)) (f64.const 1)))
        (else
          (if (f64.le (local.get $r) (local.get $c9))
            (then
              (local.set $q (f64.div (local.get $r) (local.get $cmad)))
              (local.set $q (f64.sub (f64.const 1) (f64.mul (local.get $q) (local.get $q))))
              (f64.store (i32.add (local.get $out) (local.get $at)) (f64.mul (local.get $q) (local.get $q))))
            (else (f64.store (i32.add (local.get $out) (local.get $at)) (f64.const 0))))))
      (local.set $i (i32.add (local.get $i) (i32.const 1)))
      (br $next))))

    ;; One inner pass of STL (routine onestp, paper section 2.2) on y[1..n], updating seasonal and trend in place.
  ;; $rw holds the robustness weights, or is $ones (n + 2 np ones) with $plain = 1; the low-pass fit is always plain.
  ;; $work holds four areas of m = n + 2 np slots (detrended, cycle, low-pass, scratch) and then three of
  ;; p = floor(n / np) + 3 slots for one subseries, its fits and its weights.
  (func (export "innerPass")
    (param $y i32) (param $n i32) (param $np i32)
    (param $ns i32) (param $nt i32) (param $nl i32)
    (param $sDegree i32) (param $tDegree i32) (param $lDegree i32)
    (param $sJump i32) (param $tJump i32) (param $lJump i32)
    (param $rw i32) (param $plain i32) (param $ones i32) (param $seasonal i32) (param $trend i32) (param $work i32)
    (local $area i32) (local $detrended i32) (local $cycle i32) (local $lowpass i32) (local $scratch i32)
    (local $subs i32) (local $part i32)
    (local.set $area (i32.shl (i32.add (local.get $n) (i32.shl (local.get $np) (i32.const 1))) (i32.const 3)))
    (local.set $detrended (local.get $work))
    (local.set $cycle (i32.add (local.get $detrended) (local.get $area)))
    (local.set $lowpass (i32.add (local.get $cycle) (local.get $area)))
    (local.set $scratch (i32.add (local.get $lowpass) (local.get $area)))
    (local.set $subs (i32.add (local.get $scratch) (local.get $area)))
    (local.set $part (i32.shl (i32.add (i32.div_s (local.get $n) (local.get $np)) (i32.const 3)) (i32.const 3)))
    (call $difference (local.get $y) (local.get $trend) (local.get $n) (local.get $detrended))
    (call $cycleSubseries (local.get $detrended) (local.get $n) (local.get $np) (local.get $ns) (local.get $sDegree)
      (local.get $sJump) (local.get $rw) (local.get $plain) (local.get $cycle)
      (local.get $subs) (i32.add (local.get $subs) (local.get $part))
      (i32.add (local.get $subs) (i32.shl (local.get $part) (i32.const 1))))
    ;; Low-pass: moving averages of np, np and 3 over the n + 2 np smoothed subseries values, then LOESS.
    (call $movingAverage (local.get $cycle) (i32.add (local.get $n) (i32.shl (local.get $np) (i32.const 1)))
      (local.get $np) (local.get $lowpass))
    (call $movingAverage (local.get $lowpass) (i32.add (i32.add (local.get $n) (local.get $np)) (i32.const 1))
      (local.get $np) (local.get $scratch))
    (call $movingAverage (local.get $scratch) (i32.add (local.get $n) (i32.const 2)) (i32.const 3) (local.get $lowpass))
    (call $loessInto (local.get $lowpass) (local.get $n) (local.get $nl) (local.get $lDegree) (local.get $lJump)
      (local.get $ones) (i32.const 1) (local.get $detrended))
    (call $difference (i32.add (local.get $cycle) (i32.shl (local.get $np) (i32.const 3))) (local.get $detrended)
      (local.get $n) (local.get $seasonal))
    (call $difference (local.get $y) (local.get $seasonal) (local.get $n) (local.get $detrended))
    (call $loessInto (local.get $detrended) (local.get $n) (local.get $nt) (local.get $tDegree) (local.get $tJump)
      (local.get $rw) (local.get $plain) (local.get $trend)))
)
