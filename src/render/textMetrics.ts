import {execFileSync} from 'node:child_process';
import {readFileSync} from 'node:fs';
import opentype from 'opentype.js';

/**
 * Text widths for vega's layout, measured from the TrueType file of the report font with opentype.js.
 *
 * Why: without node-canvas vega estimates 0.8 × characters × size, which is 1.5–1.7× too wide for
 * Liberation Sans and makes legends and axes pad out; opentype.js advance widths match Chromium's. The
 * font file is found with `fc-match` (regular and bold faces), read once per family and cached; widths are
 * cached per (face, size, text). Deterministic: the same font file gives the same widths.
 */
interface Face {
  getAdvanceWidth(text: string, size: number): number;
  charToGlyph(c: string): {advanceWidth?: number};
  unitsPerEm: number;
}

const faces = new Map<string, Face>();
const widths = new Map<string, number>();

/** What to do when fontconfig is missing (an environment problem: exit 1, the fix in the message). */
export const noFontconfig = (family: string) =>
  `charts need fontconfig's fc-match to find the report font "${family}", and it is not installed; ` +
  'install it with `apt-get install fontconfig fonts-liberation2` (or leave html and pdf out of --formats)';

/**
 * Absolute path of the font file fontconfig picks for a family and weight.
 *
 * @throws Error naming the fix when `fc-match` is not on the PATH, or when it finds no file
 */
export function fontFile(family: string, bold: boolean): string {
  const pattern = `${family.replace(/[:\\-]/g, '\\$&')}${bold ? ':bold' : ''}`;
  let path: string;
  try {
    path = execFileSync('fc-match', ['-f', '%{file}', pattern], {
      encoding: 'utf8',
      stdio: ['ignore', 'pipe', 'ignore'],
    });
  } catch (e) {
    if ((e as NodeJS.ErrnoException).code === 'ENOENT') throw new Error(noFontconfig(family));
    throw e;
  }
  if (!path.trim()) throw new Error(`font not found: ${family}; install it, or name an installed one in branding.font`);
  return path.trim();
}

function face(family: string, bold: boolean): Face {
  const key = `${family}|${bold}`;
  let f = faces.get(key);
  if (!f) {
    const bytes = readFileSync(fontFile(family, bold));
    f = opentype.parse(bytes.buffer.slice(bytes.byteOffset, bytes.byteOffset + bytes.byteLength)) as Face;
    faces.set(key, f);
  }
  return f;
}

/** Width in px of `text` at `size` px in the family's regular or bold face. */
export function measureText(family: string, bold: boolean, size: number, text: string): number {
  const key = `${family}|${bold}|${size}|${text}`;
  let w = widths.get(key);
  if (w === undefined) {
    w = text ? advance(face(family, bold), text, size) : 0;
    widths.set(key, w);
  }
  return w;
}

/**
 * Shaped width; when opentype.js cannot apply one of the font's substitution tables (some fonts use lookup
 * types it does not support), the plain sum of the characters' advance widths, without kerning.
 */
function advance(f: Face, text: string, size: number): number {
  try {
    return f.getAdvanceWidth(text, size);
  } catch {
    let units = 0;
    for (const c of text) units += f.charToGlyph(c).advanceWidth ?? 0;
    return (units * size) / f.unitsPerEm;
  }
}

/** A vega text item, as much of it as the measurement reads. */
export interface TextItem {
  font?: string;
  fontSize?: number;
  fontWeight?: string | number;
}

/** Function with vega's `textMetrics.width(item, text)` signature, bound to a default family. */
export function vegaWidth(defaultFamily: string): (item: TextItem, text: unknown) => number {
  return (item, text) => {
    const s = text == null ? '' : String(text).trim();
    const size = item.fontSize != null ? +item.fontSize || 0 : 11;
    const weight = item.fontWeight;
    const bold = weight === 'bold' || weight === 'bolder' || (typeof weight === 'number' && weight >= 600);
    const family = (item.font ?? defaultFamily).split(',')[0].replace(/["']/g, '').trim() || defaultFamily;
    return size <= 0 ? 0 : measureText(family, bold, size, s);
  };
}
