import {readdir, readFile} from 'node:fs/promises';
import path from 'node:path';
import {fileURLToPath} from 'node:url';
import {describe, expect, test} from 'vitest';

/**
 * Source-level rules: no code is built from strings at run time, and templates print everything escaped. The
 * only unescaped inserts are the fields that carry our own generated SVG and CSS, wrapped in `SafeString` in
 * src/render/html.ts; the allow-list below names them, so a new one has to be added here on purpose.
 */

const root = fileURLToPath(new URL('../../', import.meta.url));

async function filesUnder(dir: string, ext: RegExp): Promise<string[]> {
  const entries = await readdir(path.join(root, dir), {recursive: true, withFileTypes: true});
  return entries.filter((e) => e.isFile() && ext.test(e.name)).map((e) => path.join(e.parentPath, e.name));
}

/** Fields printed unescaped, with what they hold. */
const SAFE_STRING_ALLOW_LIST = new Map([
  ['svg', 'chart SVG drawn by vega from our own spec (strings in it are escaped by svg.ts)'],
  ['spark', 'summary sparkline SVG built from numbers only'],
  ['css', 'built-in or pack CSS with "</" neutralised'],
]);

describe('src/', () => {
  test('never evaluates strings as code', async () => {
    for (const file of await filesUnder('src', /\.ts$/)) {
      const text = await readFile(file, 'utf8');
      const rel = path.relative(root, file);
      expect(text, rel).not.toMatch(/\beval\s*\(/);
      expect(text, rel).not.toMatch(/new\s+Function\s*\(/);
      expect(text, rel).not.toMatch(/\bFunction\s*\(\s*['"`]/);
      expect(text, rel).not.toMatch(/vm\.(runIn|compileFunction|Script)/);
      expect(text, rel).not.toMatch(/noEscape\s*:\s*true/);
    }
  });

  test('SafeString wraps only the allow-listed fields', async () => {
    const wrapped = new Set<string>();
    for (const file of await filesUnder('src', /\.ts$/)) {
      const text = await readFile(file, 'utf8');
      for (const m of text.matchAll(/(\w+)\s*[:=]\s*new\s+Handlebars\.SafeString\(/g)) wrapped.add(m[1]);
      const all = [...text.matchAll(/SafeString\(/g)].length;
      const named = [...text.matchAll(/(\w+)\s*[:=]\s*new\s+Handlebars\.SafeString\(/g)].length;
      expect(all, `${path.relative(root, file)}: every SafeString is assigned to a named field`).toBe(named);
    }
    expect([...wrapped].sort()).toEqual([...SAFE_STRING_ALLOW_LIST.keys()].sort());
  });
});

describe('templates/', () => {
  test('print with {{…}} only: no triple-stash and no {{& …}}', async () => {
    const files = await filesUnder('templates', /\.(hbs|html)$/);
    expect(files.length).toBeGreaterThan(0);
    for (const file of files) {
      const text = await readFile(file, 'utf8');
      expect(text, path.relative(root, file)).not.toContain('{{{');
      expect(text, path.relative(root, file)).not.toMatch(/\{\{~?\s*&/);
    }
  });

  test('the allow-listed fields are the ones printed where raw markup is expected', async () => {
    const files = await filesUnder('templates', /\.hbs$/);
    const text = (await Promise.all(files.map((f) => readFile(f, 'utf8')))).join('\n');
    for (const field of SAFE_STRING_ALLOW_LIST.keys()) expect(text).toMatch(new RegExp(`\\{\\{[^}]*\\b${field}\\b`));
  });

  test('no template loads anything: no script, no external URL, no event handler attribute', async () => {
    for (const file of await filesUnder('templates', /\.(hbs|css)$/)) {
      const text = await readFile(file, 'utf8');
      const rel = path.relative(root, file);
      expect(text, rel).not.toMatch(/<script/i);
      expect(text, rel).not.toMatch(/(?:src|href)\s*=\s*["']?(?:https?:|\/\/|file:)/i);
      expect(text, rel).not.toMatch(/url\(\s*["']?(?:https?:|\/\/|file:)/i);
      expect(text, rel).not.toMatch(/\son[a-z]+\s*=/i);
    }
  });
});
