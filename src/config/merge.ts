/**
 * Deep merge for configuration: plain objects merge key by key; any other value (including arrays)
 * replaces the base value; `undefined` and `null` in the override mean "not set" and keep the base.
 * Neither argument is changed.
 *
 * @example mergeDefined({a: 1, b: {c: 2, d: 3}}, {b: {c: 5, d: null}}) // => {a: 1, b: {c: 5, d: 3}}
 */
export function mergeDefined<T>(base: T, override: unknown): T {
  if (!isPlainObject(base) || !isPlainObject(override)) {
    return override === undefined || override === null ? base : (override as T);
  }
  const out: Record<string, unknown> = {...base};
  for (const [key, value] of Object.entries(override)) out[key] = mergeDefined(out[key], value);
  return out as T;
}

function isPlainObject(x: unknown): x is Record<string, unknown> {
  return typeof x === 'object' && x !== null && !Array.isArray(x);
}
