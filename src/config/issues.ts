import {z} from 'zod';
import {hint} from './suggest.js';

/** A problem found in the parsed pack, addressed by its path in the YAML document. */
export interface PathProblem {
  path: PropertyKey[];
  message: string;
  /** Set when the problem is in another file than the pack (e.g. a template); `path` then says what named it. */
  at?: {file: string; line: number | null};
}

/** `series[1].kind` for `['series', 1, 'kind']`. */
export function formatPath(path: readonly PropertyKey[]): string {
  return path.map((p, i) => (typeof p === 'number' ? `[${p}]` : i === 0 ? String(p) : `.${String(p)}`)).join('');
}

const typeNames: Record<string, string> = {
  string: 'text',
  number: 'a number',
  int: 'a whole number',
  boolean: 'true or false',
  array: 'a list',
  object: 'a mapping of keys',
};

function showValue(v: unknown): string {
  return typeof v === 'string' && /^[\w.-]+$/.test(v) ? v : JSON.stringify(v);
}

/**
 * Message tail for a zod issue that has no message of its own in the schema, e.g. `must be one of flow, stock`.
 * Passed to `safeParse` as the per-parse error map; messages set in the schema take precedence.
 */
export const issueMessage: z.core.$ZodErrorMap = (issue) => {
  switch (issue.code) {
    case 'invalid_type':
      if (issue.input === undefined || issue.input === null) return 'is required';
      return `must be ${typeNames[issue.expected] ?? issue.expected}`;
    case 'invalid_value':
      return issue.values.length === 1
        ? `must be ${showValue(issue.values[0])}`
        : `must be one of ${issue.values.map(showValue).join(', ')}`;
    case 'too_small':
      if (issue.origin === 'array') return `must list at least ${issue.minimum} item${issue.minimum === 1 ? '' : 's'}`;
      if (issue.origin === 'string') return 'must not be empty';
      return issue.inclusive ? `must be ≥ ${issue.minimum}` : `must be > ${issue.minimum}`;
    case 'too_big':
      return issue.inclusive ? `must be ≤ ${issue.maximum}` : `must be < ${issue.maximum}`;
    default:
      return 'is not valid';
  }
};

/** Strip optional/nullable wrappers. */
function unwrap(schema: z.ZodType | undefined): z.ZodType | undefined {
  let s = schema;
  while (s instanceof z.ZodOptional || s instanceof z.ZodNullable) s = s.unwrap() as z.ZodType;
  return s;
}

/** The schemas that may apply at a data path (objects by key, arrays by index, every option of a union). */
function schemasAt(schema: z.ZodType, path: readonly PropertyKey[]): z.ZodType[] {
  let current = [schema];
  for (const seg of path) {
    const next: z.ZodType[] = [];
    for (const s of current.flatMap(options)) {
      if (s instanceof z.ZodObject && typeof seg === 'string' && seg in s.shape) next.push(s.shape[seg] as z.ZodType);
      else if (s instanceof z.ZodArray && typeof seg === 'number') next.push(s.element as z.ZodType);
    }
    current = next;
  }
  return current.flatMap(options);
}

/** A schema without optional/nullable wrappers, split into its options if it is a union. */
function options(schema: z.ZodType): z.ZodType[] {
  const s = unwrap(schema) as z.ZodType;
  return s instanceof z.ZodUnion ? (s.options as z.ZodType[]).flatMap(options) : [s];
}

/**
 * Keys allowed for a mapping at `path` that rejected the keys `unknown`: those of the object schema,
 * among the ones lacking every rejected key, that shares most keys with the input.
 */
function allowedKeys(schema: z.ZodType, path: readonly PropertyKey[], input: unknown, unknown: string[]): string[] {
  const given = isPlainObject(input) ? Object.keys(input) : [];
  let best: string[] = [];
  let bestShared = -1;
  for (const s of schemasAt(schema, path)) {
    if (!(s instanceof z.ZodObject)) continue;
    const keys = Object.keys(s.shape);
    if (unknown.some((k) => keys.includes(k))) continue;
    const shared = given.filter((k) => keys.includes(k)).length;
    if (shared > bestShared) [best, bestShared] = [keys, shared];
  }
  return best;
}

function isPlainObject(x: unknown): x is Record<string, unknown> {
  return typeof x === 'object' && x !== null && !Array.isArray(x);
}

/**
 * Turn zod issues into one problem per fault, each with its full path.
 *
 * - Unknown keys give one problem per key, addressed to the key itself, with a "did you mean" hint
 *   from the keys allowed at that level.
 * - A mapping that matches no option of a union of mappings (a series entry is either a series or a
 *   `fromSource` entry) is explained by the branch it came closest to (fewest issues; the first on a tie).
 */
export function schemaProblems(issues: readonly z.core.$ZodIssue[], schema: z.ZodType): PathProblem[] {
  const out: PathProblem[] = [];
  const expand = (issue: z.core.$ZodIssue, base: PropertyKey[], root: z.ZodType): void => {
    const path = [...base, ...issue.path];
    if (issue.code === 'invalid_union' && isPlainObject(issue.input) && issue.errors.length > 0) {
      let pick = 0;
      issue.errors.forEach((e, i) => {
        if (e.length < issue.errors[pick].length) pick = i;
      });
      const branch = schemasAt(root, issue.path)[pick] ?? root;
      for (const e of issue.errors[pick]) expand(e, path, branch);
      return;
    }
    if (issue.code === 'unrecognized_keys') {
      const allowed = allowedKeys(root, issue.path, issue.input, issue.keys);
      for (const key of issue.keys) {
        const where = path.length === 0 ? 'the pack file' : formatPath(path);
        out.push({path: [...path, key], message: `${where} has an unknown key ${key}${hint(key, allowed)}`});
      }
      return;
    }
    const subject = path.length === 0 ? 'the pack file' : formatPath(path);
    out.push({path, message: `${subject} ${issue.message}`});
  };
  for (const issue of issues) expand(issue, [], schema);
  return out;
}
