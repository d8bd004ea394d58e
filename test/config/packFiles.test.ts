import {mkdir, mkdtemp, readFile, rm, writeFile} from 'node:fs/promises';
import {tmpdir} from 'node:os';
import path from 'node:path';
import {LineCounter, parseDocument} from 'yaml';
import {afterAll, beforeAll, describe, expect, test} from 'vitest';
import {allowedRoots, resolveInside, templateProblems} from '../../src/config/fileAccess.js';
import {imageMatches} from '../../src/config/image.js';
import {yamlValue} from '../../src/config/yamlValue.js';

let root = '';
beforeAll(async () => {
  root = await mkdtemp(path.join(tmpdir(), 'ebbflow-packfiles-'));
});
afterAll(async () => {
  await rm(root, {recursive: true, force: true});
});

describe('resolveInside', () => {
  test('a sibling folder whose name starts with the pack folder name is outside', async () => {
    await mkdir(path.join(root, 'pack'), {recursive: true});
    await mkdir(path.join(root, 'pack-other'), {recursive: true});
    await writeFile(path.join(root, 'pack-other', 'a.csv'), 'x\n');
    const roots = await allowedRoots(path.join(root, 'pack'));
    expect((await resolveInside(path.join(root, 'pack-other', 'a.csv'), roots)).inside).toBe(false);
    expect((await resolveInside(path.join(root, 'pack', 'b.csv'), roots)).inside).toBe(true);
    expect((await resolveInside(path.join(root, 'pack', '..', 'pack-other', 'a.csv'), roots)).inside).toBe(false);
  });
});

describe('templateProblems', () => {
  test('syntax errors at the template line; {{{ and {{& are refused; good templates pass', async () => {
    const dir = path.join(root, 'tpl');
    await mkdir(path.join(dir, 'partials'), {recursive: true});
    await writeFile(path.join(dir, 'report.hbs'), '<h1>{{title}}</h1>\n<p>\n{{#if x}}\n{{/each}}\n');
    await writeFile(path.join(dir, 'partials', 'raw.hbs'), 'ok {{name}}\n{{{html}}}\n{{~&other}}\n');
    await writeFile(path.join(dir, 'partials', 'good.hbs'), '{{#each rows}}<td>{{this}}</td>{{/each}}\n');
    await writeFile(path.join(dir, 'styles.css'), 'h1 { color: red; }\n');
    const problems = await templateProblems(dir, await allowedRoots(root));
    expect(problems.map((p) => [path.relative(dir, p.file), p.line, p.message.replace(/\(.*\)/, '(…)')])).toEqual([
      ['partials/raw.hbs', 2, 'template prints without escaping (…); pack templates must use {{…}} only'],
      ['partials/raw.hbs', 3, 'template prints without escaping (…); pack templates must use {{…}} only'],
      ['report.hbs', 3, "template syntax: if doesn't match each - 3:3"],
    ]);
  });
});

describe('imageMatches', () => {
  test('PNG signature, JPEG SOI marker, SVG element', () => {
    expect(imageMatches('image/png', Buffer.from([0x89, 0x50, 0x4e, 0x47, 0x0d, 0x0a, 0x1a, 0x0a, 0]))).toBe(true);
    expect(imageMatches('image/png', Buffer.from('<svg>'))).toBe(false);
    expect(imageMatches('image/jpeg', Buffer.from([0xff, 0xd8, 0xff]))).toBe(true);
    expect(imageMatches('image/svg+xml', Buffer.from('<?xml version="1.0"?>\n<svg xmlns="x">'))).toBe(true);
    expect(imageMatches('image/svg+xml', Buffer.from('not an image'))).toBe(false);
  });
});

describe('yamlValue', () => {
  const convert = (text: string) => {
    const lineCounter = new LineCounter();
    return yamlValue(parseDocument(text, {lineCounter}), lineCounter);
  };
  test('plain documents convert', () => {
    expect(convert('a: &x 1\nb: *x\n')).toEqual({ok: true, value: {a: 1, b: 1}});
  });
  test('an alias with no anchor is a problem at the alias', () => {
    expect(convert('a: 1\nb:\n  c: *nope\n')).toEqual({
      ok: false,
      line: 3,
      column: 6,
      message: 'YAML alias *nope names no anchor (&nope) defined before it',
    });
  });
  test('an alias bomb is a problem, not a hang or a throw', async () => {
    const text = await readFile(new URL('../fixtures/bad/yaml-alias-bomb/pack.yaml', import.meta.url), 'utf8');
    const r = convert(text);
    expect(r.ok).toBe(false);
    if (!r.ok) expect(r.message).toMatch(/YAML aliases .* too many values/);
  });
});
