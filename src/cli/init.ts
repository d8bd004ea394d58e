import {cp, mkdir, readdir, readFile, stat, writeFile} from 'node:fs/promises';
import path from 'node:path';
import {loadPlan, packJsonSchema, PACK_SCHEMA_FILE} from '../config/index.js';
import {InputError} from '../errors.js';

/** The starter pack that `ebbflow init` copies, inside the package's sample folder. */
export const STARTER_PACK = 'monthly-pack.yaml';

/**
 * Copy the starter pack and every file it names (sources, files its queries read, logo, templates folder) from `sampleDir`
 * into `dir`, keeping their relative layout so the pack's paths still work, and write the pack file's JSON Schema
 * beside it (`pack.schema.json`, which the pack's first line names for editors). The pack is validated
 * first, so a broken sample never reaches the user.
 *
 * @returns the absolute path of the copied pack file and the files written, relative to `dir`
 * @throws InputError if `dir` exists and is not an empty folder (nothing is written then)
 */
export async function initPack(dir: string, sampleDir: string): Promise<{packFile: string; files: string[]}> {
  const target = path.resolve(dir);
  const existing = await stat(target).catch(() => null);
  if (existing && (!existing.isDirectory() || (await readdir(target)).length > 0)) {
    const what = existing.isDirectory() ? 'exists and is not empty' : 'exists and is not a folder';
    throw new InputError([{file: dir, line: null, column: null, message: `${what}; choose a new or empty folder`}]);
  }
  const samplePack = path.join(sampleDir, STARTER_PACK);
  const plan = await loadPlan(samplePack);
  const firstLine = (await readFile(samplePack, 'utf8')).split('\n', 1)[0];
  if (firstLine !== `# yaml-language-server: $schema=${PACK_SCHEMA_FILE}`) {
    throw new Error(`the starter pack's first line does not name ${PACK_SCHEMA_FILE}`);
  }
  // Files a query reads (DuckDB's read_parquet('data/x.parquet')) are named inside its text.
  const queries = plan.sources.flatMap((s) => (s.query === null ? [] : [s.query]));
  const queried = (await readdir(sampleDir, {recursive: true, withFileTypes: true}))
    .filter((e) => e.isFile())
    .map((e) => path.relative(sampleDir, path.join(e.parentPath, e.name)).split(path.sep).join('/'))
    .filter((f) => queries.some((q) => q.includes(f)))
    .map((f) => path.join(sampleDir, f));
  const named = [
    samplePack,
    ...plan.sources.map((s) => s.file),
    ...queried,
    plan.branding.logo,
    plan.branding.templates,
  ];
  const files = [...new Set(named.filter((f): f is string => f !== null))].map((f) => path.relative(sampleDir, f));
  const outside = files.find((f) => f.startsWith('..') || path.isAbsolute(f));
  if (outside !== undefined) throw new Error(`the starter pack names a file outside its folder: ${outside}`);
  await mkdir(target, {recursive: true});
  for (const f of files) await cp(path.join(sampleDir, f), path.join(target, f), {recursive: true, errorOnExist: true});
  await writeFile(path.join(target, PACK_SCHEMA_FILE), packJsonSchema(), {flag: 'wx'});
  return {packFile: path.join(target, STARTER_PACK), files: [...files, PACK_SCHEMA_FILE]};
}
