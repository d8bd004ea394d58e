/** Reading a parsed but not yet validated pack: each returns a neutral value when the shape is not what is asked. */

/** `x` as an object, or an empty object. */
export function record(x: unknown): Record<string, unknown> {
  return typeof x === 'object' && x !== null && !Array.isArray(x) ? (x as Record<string, unknown>) : {};
}

/** `x` as an array, or an empty array. */
export function list(x: unknown): unknown[] {
  return Array.isArray(x) ? x : [];
}

/** `x` as a non-empty string, or undefined. */
export function text(x: unknown): string | undefined {
  return typeof x === 'string' && x !== '' ? x : undefined;
}
