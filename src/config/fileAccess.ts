import {constants} from 'node:fs';
import {access, open, readdir, readFile, realpath, stat} from 'node:fs/promises';
import path from 'node:path';
import Handlebars from 'handlebars';
import {imageTypeOf, imageMatches} from './image.js';

/**
 * File-access rule for packs. Every file or folder a pack names — `sources[].file`, `branding.logo`,
 * `branding.templates` and every file inside that folder — must, after symbolic links are resolved
 * (`fs.realpath`), lie inside the pack file's own folder or below it, unless the operator allows more folders
 * with `PlanOverrides.allowDirs` (`--allow-dir DIR` on the command line). A path outside is a config problem and
 * the file is never opened. `pack.browser` must be a Chromium-family executable by file name; the
 * `EBBFLOW_CHROMIUM` environment variable is the operator's and is not restricted.
 */

/** Folders a pack may read from: its own folder and the operator's `allowDirs`, each with symlinks resolved. */
export async function allowedRoots(packDir: string, allowDirs: readonly string[] = []): Promise<string[]> {
  const roots: string[] = [];
  for (const dir of [packDir, ...allowDirs]) {
    const abs = path.resolve(dir);
    roots.push(await realpath(abs).catch(() => abs));
  }
  return roots;
}

function within(file: string, root: string): boolean {
  const rel = path.relative(root, file);
  return rel === '' || (rel !== '..' && !rel.startsWith(`..${path.sep}`) && !path.isAbsolute(rel));
}

/** Where a named path really is, and whether the pack may read it. */
export interface Resolved {
  /** Target with symlinks resolved; the lexical path when nothing exists there. */
  real: string;
  exists: boolean;
  inside: boolean;
}

/**
 * Resolve `abs` through symbolic links and test it against `roots`. A path that does not exist is tested as
 * written, so a pack cannot probe for files outside its folder by the wording of the "not found" problem.
 */
export async function resolveInside(abs: string, roots: readonly string[]): Promise<Resolved> {
  let real = abs;
  let exists = true;
  try {
    real = await realpath(abs);
  } catch {
    exists = false;
  }
  return {real, exists, inside: roots.some((r) => within(real, r))};
}

/** The problem text for a path outside the allowed folders. */
export function outsideMessage(key: string, real: string): string {
  return (
    `${key} is outside the pack's folder (${real}); ` +
    'move the file next to the pack or allow its folder with --allow-dir'
  );
}

/** The first 4096 bytes of a file: enough to recognise a PNG, JPEG or SVG. */
async function head(file: string): Promise<Buffer> {
  const handle = await open(file, 'r');
  try {
    const buf = Buffer.alloc(4096);
    const {bytesRead} = await handle.read(buf, 0, buf.length, 0);
    return buf.subarray(0, bytesRead);
  } finally {
    await handle.close();
  }
}

/** Null when the logo's first bytes match its extension, else the problem text. Reads at most 4096 bytes. */
export async function logoContentProblem(file: string, written: string): Promise<string | null> {
  const type = imageTypeOf(file);
  if (type === undefined) return 'branding.logo must be a .png, .jpg or .svg file';
  if (imageMatches(type, await head(file))) return null;
  const name = type === 'image/png' ? 'a PNG' : type === 'image/jpeg' ? 'a JPEG' : 'an SVG';
  return `branding.logo ${written} is not ${name} image (its content does not match the file name)`;
}

const BROWSER_NAME = /^(chromium|chromium-browser|chrome|google-chrome(-stable)?|msedge|microsoft-edge)$/;

async function executable(file: string): Promise<boolean> {
  try {
    await access(file, constants.X_OK);
    return (await stat(file)).isFile();
  } catch {
    return false;
  }
}

/**
 * Null when `pack.browser` names a Chromium-family browser that exists and is executable, else the problem
 * text. A name with a slash is a path from the pack folder; a bare name is looked up on PATH.
 */
export async function browserProblem(browser: string, packDir: string): Promise<string | null> {
  const base = path.basename(browser).replace(/\.exe$/i, '');
  if (!BROWSER_NAME.test(base))
    return (
      `pack.browser ${browser} does not look like a Chromium browser; ` +
      'set EBBFLOW_CHROMIUM in the environment instead'
    );
  const candidates = /[\\/]/.test(browser)
    ? [path.resolve(packDir, browser)]
    : (process.env.PATH ?? '')
        .split(path.delimiter)
        .filter((d) => d !== '')
        .map((d) => path.join(d, browser));
  for (const c of candidates) if (await executable(c)) return null;
  return (
    `pack.browser ${browser} is not an executable file; ` +
    'install it or set the EBBFLOW_CHROMIUM environment variable'
  );
}

/** A problem in one file of a pack's template folder. */
export interface TemplateProblem {
  file: string;
  line: number | null;
  message: string;
}

/** Every `{{{…}}}` or `{{& …}}`: inserts that skip HTML escaping. */
const UNESCAPED = /\{\{~?\s*(\{|&)/g;

function lineAt(text: string, index: number): number {
  let line = 1;
  for (let i = 0; i < index; i++) if (text.charCodeAt(i) === 10) line++;
  return line;
}

/** Handlebars parse error → line and a one-line message. */
function parseFailure(e: unknown): {line: number | null; message: string} {
  const err = e as {message?: unknown; lineNumber?: unknown};
  const text = typeof err.message === 'string' ? err.message : String(e);
  const fromText = /line (\d+)/.exec(text);
  const line = typeof err.lineNumber === 'number' ? err.lineNumber : fromText ? Number(fromText[1]) : null;
  const lines = text.split('\n').filter((l) => l.trim() !== '');
  const last = lines.length > 1 ? lines[lines.length - 1] : text;
  return {line, message: last.trim()};
}

/**
 * Check a pack's template folder without rendering: every file in it must lie inside `roots` (symlinks
 * resolved), and every `*.hbs` file must parse with `Handlebars.parse` and print with `{{…}}` only.
 * Only files inside `roots` are read. Linear in the folder's size.
 */
export async function templateProblems(folder: string, roots: readonly string[]): Promise<TemplateProblem[]> {
  const out: TemplateProblem[] = [];
  const entries = await readdir(folder, {recursive: true, withFileTypes: true});
  const files = entries
    .filter((e) => e.isFile() || e.isSymbolicLink())
    .map((e) => path.join(e.parentPath, e.name))
    .sort();
  for (const file of files) {
    const r = await resolveInside(file, roots);
    if (!r.inside) {
      out.push({file, line: null, message: outsideMessage('a file in branding.templates', r.real)});
      continue;
    }
    if (!file.endsWith('.hbs') || !r.exists || !(await stat(r.real)).isFile()) continue;
    const source = await readFile(r.real, 'utf8');
    for (const m of source.matchAll(UNESCAPED)) {
      out.push({
        file,
        line: lineAt(source, m.index),
        message: `template prints without escaping (${m[0]}); pack templates must use {{…}} only`,
      });
    }
    try {
      Handlebars.parse(source);
    } catch (e) {
      const f = parseFailure(e);
      out.push({file, line: f.line, message: `template syntax: ${f.message}`});
    }
  }
  return out;
}
