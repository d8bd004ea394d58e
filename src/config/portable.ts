import path from 'node:path';
import type {Plan} from './plan.js';

/**
 * The plan as recorded in the manifest: every path relative to the pack file's folder (the pack file by its name),
 * so the same pack and inputs give the same manifest bytes wherever they are built, and no local folder names leak
 * into an archive that is sent on.
 */
export function portablePlan(plan: Plan): Plan {
  const dir = path.dirname(plan.packFile);
  const rel = (p: string): string => path.relative(dir, p).split(path.sep).join('/') || '.';
  const relOrNull = (p: string | null): string | null => (p === null ? null : rel(p));
  return {
    ...plan,
    packFile: path.basename(plan.packFile),
    outDir: rel(plan.outDir),
    browser: plan.browser === null || !path.isAbsolute(plan.browser) ? plan.browser : rel(plan.browser),
    branding: {...plan.branding, logo: relOrNull(plan.branding.logo), templates: relOrNull(plan.branding.templates)},
    sources: plan.sources.map((s) => ({...s, file: rel(s.file), readFolders: s.readFolders.map(rel)})),
  };
}
