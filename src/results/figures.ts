/** A figure as results files keep it: NaN and ±Infinity become null, everything else stays at full precision. */
export function num(x: number): number | null {
  return Number.isFinite(x) ? x : null;
}

export function nums(xs: ArrayLike<number>): (number | null)[] {
  return Array.from(xs, num);
}

/** Bands keyed by level, in ascending numeric order of the level. */
export function bands(b: Record<string, number[]>): Record<string, (number | null)[]> {
  const out: Record<string, (number | null)[]> = {};
  for (const key of Object.keys(b).sort((x, y) => Number(x) - Number(y) || (x < y ? -1 : 1))) out[key] = nums(b[key]);
  return out;
}
