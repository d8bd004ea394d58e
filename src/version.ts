import {readFileSync, existsSync} from 'node:fs';
import {dirname, join} from 'node:path';
import {fileURLToPath} from 'node:url';

/** Root folder of the installed ebbflow package (works from src/ under vitest and from dist/src/ when built). */
export function packageRoot(): string {
  let dir = dirname(fileURLToPath(import.meta.url));
  for (;;) {
    const candidate = join(dir, 'package.json');
    if (existsSync(candidate) && JSON.parse(readFileSync(candidate, 'utf8')).name === 'ebbflow') return dir;
    const parent = dirname(dir);
    if (parent === dir) throw new Error('ebbflow package.json not found');
    dir = parent;
  }
}

/** The package version, e.g. `0.1.0`. */
export const toolVersion: string = JSON.parse(readFileSync(join(packageRoot(), 'package.json'), 'utf8')).version;
