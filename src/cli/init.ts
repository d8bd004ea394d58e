import {cp, mkdir, readdir, stat} from 'node:fs/promises';
import path from 'node:path';
import {loadPlan} from '../config/index.js';
import {InputError} from '../errors.js';

/** The starter pack that `ebbflow init` copies, inside the package's sample folder. */
export const STARTER_PACK = 'monthly-pack.yaml';

/**
 * Copy the starter pack and every file it names (sources, logo, templates folder) from `sampleDir`
 * into `dir`, keeping their relative layout so the pack's paths still work. The pack is validated
 * first, so a broken sample never reaches the user.
 *
 * @returns the absolute path of the copied pack file
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
  const named = [samplePack, ...plan.sources.map((s) => s.file), plan.branding.logo, plan.branding.templates];
  const files = [...new Set(named.filter((f): f is string => f !== null))].map((f) => path.relative(sampleDir, f));
  const outside = files.find((f) => f.startsWith('..') || path.isAbsolute(f));
  if (outside !== undefined) throw new Error(`the starter pack names a file outside its folder: ${outside}`);
  await mkdir(target, {recursive: true});
  for (const f of files) await cp(path.join(sampleDir, f), path.join(target, f), {recursive: true, errorOnExist: true});
  return {packFile: path.join(target, STARTER_PACK), files};
}
