/** File-system helpers shared by the archive tests. */
import {createHash} from 'node:crypto';
import {mkdtemp, readdir, readFile, rm, stat} from 'node:fs/promises';
import {tmpdir} from 'node:os';
import {join} from 'node:path';
import {spawnSync} from 'node:child_process';
import {onTestFinished} from 'vitest';

/** A fresh temporary folder, deleted when the current test finishes. */
export async function tempDir(): Promise<string> {
  const dir = await mkdtemp(join(tmpdir(), 'ebbflow-archive-'));
  onTestFinished(() => rm(dir, {recursive: true, force: true}));
  return dir;
}

/** Every file under `dir`, as `/`-separated relative paths, sorted. */
export async function listFiles(dir: string, prefix = ''): Promise<string[]> {
  const out: string[] = [];
  for (const e of await readdir(dir, {withFileTypes: true})) {
    if (e.isDirectory()) out.push(...(await listFiles(join(dir, e.name), `${prefix}${e.name}/`)));
    else out.push(`${prefix}${e.name}`);
  }
  return out.sort();
}

/** Contents of every file under `dir`, keyed by relative path. */
export async function snapshot(dir: string): Promise<Record<string, string>> {
  const out: Record<string, string> = {};
  for (const f of await listFiles(dir)) out[f] = (await readFile(join(dir, f))).toString('base64');
  return out;
}

/**
 * State of a period folder: `absent`, or the version (`old`/`new`) of a complete folder. Throws when
 * the folder is incomplete or mixes versions: every file listed in manifest.json must exist with its
 * hash, no other file may exist, and all files must carry the same version marker.
 */
export async function folderState(folder: string): Promise<'absent' | 'old' | 'new'> {
  try {
    await stat(folder);
  } catch {
    return 'absent';
  }
  const manifest = JSON.parse(await readFile(join(folder, 'manifest.json'), 'utf8'));
  const listed = manifest.outputs.map((o: {path: string}) => o.path);
  const present = (await listFiles(folder)).filter((f) => f !== 'manifest.json');
  if (JSON.stringify(present) !== JSON.stringify(listed)) throw new Error(`files ${present} ≠ manifest ${listed}`);
  for (const o of manifest.outputs as {path: string; sha256: string}[]) {
    const hash = createHash('sha256').update(await readFile(join(folder, o.path))).digest('hex');
    if (hash !== o.sha256) throw new Error(`${o.path}: hash differs from manifest`);
  }
  const html = await readFile(join(folder, 'report.html'), 'utf8');
  const results = JSON.parse(await readFile(join(folder, 'results.json'), 'utf8'));
  const versions = new Set([
    manifest.plan.version,
    /version (old|new)/.exec(html)?.[1],
    results.series[0].decomposition.trend[0] === 100 ? 'old' : 'new',
    (await readFile(join(folder, 'exports/tables.csv'), 'utf8')).trim().split(',')[1],
  ]);
  if (versions.size !== 1) throw new Error(`mixed versions: ${[...versions]}`);
  return [...versions][0];
}

/** The id of a process that has exited (and been reaped), for leftover-folder names. */
export function deadPid(): number {
  return spawnSync(process.execPath, ['-e', '0']).pid!;
}
