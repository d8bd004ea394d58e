import {readFileSync} from 'node:fs';

/** Reads a fixture written by test/reference/hp.cf.adf.py (statsmodels/scipy; versions inside the JSON). */
export function reference<T>(name: string): T {
  return JSON.parse(readFileSync(new URL(`../../reference/${name}`, import.meta.url), 'utf8')) as T;
}

export interface ReferenceSeries {
  name: string;
  source: string;
  values: number[];
}

/** Largest |a − b| / max(|b|, floor) over the pairs. */
export function maxRelativeError(a: ArrayLike<number>, b: ArrayLike<number>, floor = 1e-300): number {
  let worst = 0;
  for (let i = 0; i < b.length; i++) worst = Math.max(worst, Math.abs(a[i] - b[i]) / Math.max(Math.abs(b[i]), floor));
  return worst;
}

export function maxAbsoluteError(a: ArrayLike<number>, b: ArrayLike<number>): number {
  let worst = 0;
  for (let i = 0; i < b.length; i++) worst = Math.max(worst, Math.abs(a[i] - b[i]));
  return worst;
}
