import {readFile} from 'node:fs/promises';
import path from 'node:path';
import {LineCounter, parseDocument} from 'yaml';
import {crossCheck} from './crossCheck.js';
import {defaultConfig} from './defaults.js';
import {schemaProblems} from './issues.js';
import {locate} from './locate.js';
import type {PlanOverrides} from './load.js';
import {allowedRoots} from './fileAccess.js';
import {normalize} from './normalize.js';
import type {Plan} from './plan.js';
import {packSchema} from './schema.js';
import {yamlValue} from './yamlValue.js';

/** Lists whose broken entries are dropped whole rather than key by key. */
const LISTS = new Set(['sources', 'series', 'groups']);
const ROUNDS = 8;

/**
 * A best-effort plan from a pack that has problems, so `ebbflow check` can go on to read the data and report
 * every problem in one run. Each round drops what the schema and cross-checks reject (an unknown or invalid key;
 * a whole source, series or group entry with any problem, which in turn drops the series that named it) until
 * the rest validates. Returns null when nothing usable is left (e.g. a YAML syntax error or no valid frequency).
 * Never used to build: `loadPlan` is the only way to a plan that writes output. `allowDirs` widens the
 * file-access rule as for `loadPlan`; files outside are dropped like any other rejected entry.
 */
export async function salvagePlan(
  packFile: string,
  overrides: Pick<PlanOverrides, 'allowDirs'> = {},
): Promise<Plan | null> {
  const absFile = path.resolve(packFile);
  let text: string;
  try {
    text = await readFile(absFile, 'utf8');
  } catch {
    return null;
  }
  const lineCounter = new LineCounter();
  const doc = parseDocument(text, {lineCounter, uniqueKeys: true});
  if (doc.errors.length > 0) return null;
  const converted = yamlValue(doc, lineCounter);
  if (!converted.ok) return null;
  const raw = converted.value;
  if (!isRecord(raw)) return null;
  const packDir = path.dirname(absFile);
  for (let round = 0; round < ROUNDS; round++) {
    const parsed = packSchema.safeParse(raw);
    const problems = [...(parsed.success ? [] : schemaProblems(parsed.error.issues, packSchema)), ...(await crossCheck(raw, packDir, overrides.allowDirs))];
    if (parsed.success && problems.length === 0) {
      return normalize(parsed.data, {
        packFile: absFile,
        period: null,
        outDir: path.resolve(defaultConfig.pack.outDir),
        formats: undefined,
        lineOf: (p) => locate(doc, lineCounter, p).line,
        readFolders: await allowedRoots(packDir, overrides.allowDirs),
      });
    }
    const before = JSON.stringify(raw);
    for (const p of problems) prune(raw, p.path);
    for (const key of LISTS) if (Array.isArray(raw[key])) raw[key] = (raw[key] as unknown[]).filter((x) => x !== DROPPED);
    if (JSON.stringify(raw) === before) return null;
  }
  return null;
}

const DROPPED = Symbol('dropped');

/** Remove the part of the document a problem points at: a list entry whole, otherwise the key itself. */
function prune(raw: Record<string, unknown>, at: readonly PropertyKey[]): void {
  if (at.length >= 2 && LISTS.has(String(at[0])) && typeof at[1] === 'number') {
    const list = raw[String(at[0])];
    if (Array.isArray(list) && at[1] < list.length) list[at[1]] = DROPPED;
    return;
  }
  if (at.length < 2) return;
  let node: unknown = raw;
  for (const key of at.slice(0, -1)) {
    if (!isRecord(node) && !Array.isArray(node)) return;
    node = (node as Record<PropertyKey, unknown>)[key as string];
  }
  if (isRecord(node)) delete node[String(at[at.length - 1])];
}

function isRecord(x: unknown): x is Record<string, unknown> {
  return typeof x === 'object' && x !== null && !Array.isArray(x);
}
