import {mkdtemp, readdir, readFile, rm, writeFile} from 'node:fs/promises';
import {tmpdir} from 'node:os';
import path from 'node:path';
import ExcelJS from 'exceljs';
import {afterAll, beforeAll, describe, expect, test} from 'vitest';
import {runCli} from '../robustness/run.js';

/**
 * A full build of a pack whose labels, units, organisation, title, footer and CSV keys carry markup, template
 * syntax, script URLs and spreadsheet formulas. The HTML report and the archive index must show them as text
 * (escaped), and the CSV and XLSX exports must not let a spreadsheet run them as formulas (a leading `'`).
 */

const IMG = '<img src=x onerror=alert(1)>';
const SCRIPT = '"><script>alert(1)</script>';
const MUSTACHE = '{{constructor}}';
const JS_URL = 'javascript:alert(1)';
const FORMULA = '=HYPERLINK("http://x","y")';

const yamlText = (s: string) => JSON.stringify(s);

const PACK = `pack:
  id: hostile
  title: ${yamlText(`Review ${IMG}`)}
  subtitle: ${yamlText(SCRIPT)}
  organisation: ${yamlText(`${MUSTACHE} ${JS_URL}`)}
  preparedBy: ${yamlText(FORMULA)}
  confidentiality: ${yamlText(IMG)}
  frequency: monthly
  period: "2025-12"
  formats: [html, json, csv, xlsx]
branding:
  footer: ${yamlText(SCRIPT)}
sources:
  - id: wide
    file: wide.csv
  - id: long
    file: long.csv
    layout: long
    dateColumn: date
    keyColumn: key
    valueColumn: value
series:
  - id: sales
    label: ${yamlText(`${IMG} ${SCRIPT}`)}
    unit: ${yamlText(FORMULA)}
    source: wide
    column: sales
  - id: costs
    label: ${yamlText(FORMULA)}
    unit: ${yamlText(JS_URL)}
    source: wide
    column: costs
  - fromSource: long
groups:
  - id: all
    title: ${yamlText(`${MUSTACHE} ${IMG}`)}
    series: [sales, costs]
defaults:
  decomposition: {method: classical, model: multiplicative, seasonalWindow: periodic}
  calendar: {workingDays: "off", easter: "off"}
  forecast: {method: seasonal-naive, horizon: 6, backtestOrigins: 2}
`;

const months = Array.from(
  {length: 36},
  (_, i) => `${2023 + Math.floor(i / 12)}-${String((i % 12) + 1).padStart(2, '0')}`,
);
const level = (i: number, base: number) => (base * (1 + 0.15 * Math.sin((2 * Math.PI * i) / 12)) + i).toFixed(1);
const csvField = (s: string) => `"${s.replace(/"/g, '""')}"`;
const LONG_KEYS = [FORMULA, IMG, `${MUSTACHE}${SCRIPT}`];

let dir = '';
let out = '';
let folder = '';
let stderr = '';

async function filesUnder(root: string): Promise<string[]> {
  const entries = await readdir(root, {recursive: true, withFileTypes: true});
  return entries.filter((e) => e.isFile()).map((e) => path.join(e.parentPath, e.name));
}

beforeAll(async () => {
  dir = await mkdtemp(path.join(tmpdir(), 'ebbflow-hostile-'));
  out = path.join(dir, 'out');
  await writeFile(path.join(dir, 'pack.yaml'), PACK);
  await writeFile(
    path.join(dir, 'wide.csv'),
    ['date,sales,costs', ...months.map((m, i) => `${m},${level(i, 200)},${level(i, 80)}`)].join('\n') + '\n',
  );
  const longRows = months.flatMap((m, i) => LONG_KEYS.map((k, j) => `${m},${csvField(k)},${level(i, 50 + 10 * j)}`));
  await writeFile(path.join(dir, 'long.csv'), ['date,key,value', ...longRows].join('\n') + '\n');
  const run = await runCli(['build', path.join(dir, 'pack.yaml'), '--out', out, '--jobs', '1']);
  stderr = run.stderr;
  expect(run.code, run.stderr).toBe(0);
  folder = run.stdout.trim();
}, 120_000);

afterAll(async () => {
  await rm(dir, {recursive: true, force: true});
});

/** Markup that would run or load something if it reached the page unescaped. */
const RAW_MARKUP = [/<img src=x/i, /<script/i, /href\s*=\s*["']?javascript:/i, /src\s*=\s*["']?javascript:/i];

describe('HTML', () => {
  test('report.html shows every hostile string as text', async () => {
    const html = await readFile(path.join(folder, 'report.html'), 'utf8');
    for (const re of RAW_MARKUP) expect(html).not.toMatch(re);
    // Escaped, and present: the strings were printed, not dropped.
    expect(html).toContain('&lt;img src=x onerror=alert(1)&gt;');
    expect(html).toMatch(/&lt;script&gt;alert\(1\)&lt;\/script&gt;|&lt;script&gt;alert\(1\)&lt;&#x2F;script&gt;/);
    // Handlebars prints `{{constructor}}` from data literally; it is never evaluated as a template.
    expect(html).toContain('{{constructor}}');
    expect(html).not.toMatch(/function Object\(\)|\[native code\]/);
  });

  test('the archive index page shows them as text too', async () => {
    const index = (await filesUnder(out)).find((f) => path.basename(f) === 'index.html');
    expect(index, 'index.html in the out folder').toBeDefined();
    const html = await readFile(index!, 'utf8');
    for (const re of RAW_MARKUP) expect(html).not.toMatch(re);
    expect(html).toContain('Review &lt;img src&#x3D;x');
  });

  test('no build output of any kind carries raw markup from the pack (SVG charts included)', async () => {
    for (const file of (await filesUnder(folder)).filter((f) => /\.(html|svg)$/.test(f))) {
      const text = await readFile(file, 'utf8');
      for (const re of RAW_MARKUP) expect(text, file).not.toMatch(re);
    }
    expect(stderr).not.toMatch(/TypeError|^\s+at /m);
  });
});

describe('spreadsheet exports', () => {
  /** A cell a spreadsheet would read as a formula: `=`, `+`, `-` or `@` first (numbers excluded). */
  const formulaLike = (s: string) => /^[=+\-@\t\r]/.test(s) && !/^[-+]?\d/.test(s);

  test('CSV: every cell with a hostile string starts with a quote mark, none is formula-like', async () => {
    const csvs = (await filesUnder(folder)).filter((f) => f.endsWith('.csv'));
    expect(csvs.length).toBeGreaterThan(0);
    let seen = 0;
    for (const file of csvs) {
      const text = await readFile(file, 'utf8');
      // Simple field split that respects double quotes (the exports quote fields containing delimiters).
      const fields = [...text.matchAll(/"((?:[^"]|"")*)"|([^,\r\n]+)/g)].map((m) => (m[1] ?? m[2]).replace(/""/g, '"'));
      for (const f of fields) {
        expect(formulaLike(f), `${path.basename(file)}: ${f}`).toBe(false);
        if (f.startsWith("'=HYPERLINK")) seen++;
      }
    }
    expect(seen, 'a cell holding the formula text, neutralised with a leading quote mark').toBeGreaterThan(0);
  });

  test('XLSX: no formula cells, and hostile text cells start with a quote mark', async () => {
    const workbook = new ExcelJS.Workbook();
    await workbook.xlsx.readFile(path.join(folder, 'exports', 'tables.xlsx'));
    let seen = 0;
    workbook.eachSheet((sheet) => {
      sheet.eachRow((row) => {
        row.eachCell((cell) => {
          expect(cell.type, `${sheet.name}!${cell.address}`).not.toBe(ExcelJS.ValueType.Formula);
          expect(cell.formula, `${sheet.name}!${cell.address}`).toBeFalsy();
          if (typeof cell.value === 'string') {
            expect(formulaLike(cell.value), `${sheet.name}!${cell.address}: ${cell.value}`).toBe(false);
            if (cell.value.startsWith("'=HYPERLINK")) seen++;
          }
        });
      });
    });
    expect(seen, 'a cell holding the formula text, neutralised with a leading quote mark').toBeGreaterThan(0);
  });
});
