/**
 * Easter Sunday of a Gregorian year, by the anonymous Gregorian computus (the "Meeus/Jones/Butcher" algorithm).
 *
 * Why: the Easter callout says in which month this year's Easter trade fell.
 * Reference: J. Meeus, Astronomical Algorithms, 2nd ed., 1998, ch. 8. Complexity: O(1). No NaN handling:
 * `year` must be an integer ≥ 1583.
 *
 * @example easterSunday(2024) // => {month: 3, day: 31}
 */
export function easterSunday(year: number): {month: number; day: number} {
  const a = year % 19;
  const b = Math.floor(year / 100);
  const c = year % 100;
  const d = Math.floor(b / 4);
  const e = b % 4;
  const f = Math.floor((b + 8) / 25);
  const g = Math.floor((b - f + 1) / 3);
  const h = (19 * a + b - d - g + 15) % 30;
  const i = Math.floor(c / 4);
  const k = c % 4;
  const l = (32 + 2 * e + 2 * i - h - k) % 7;
  const m = Math.floor((a + 11 * h + 22 * l) / 451);
  const n = h + l - 7 * m + 114;
  return {month: Math.floor(n / 31), day: (n % 31) + 1};
}
