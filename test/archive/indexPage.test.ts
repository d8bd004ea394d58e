import {describe, expect, it} from 'vitest';
import {mkdir, readFile, rm, writeFile} from 'node:fs/promises';
import {join} from 'node:path';
import {archive} from '../../src/archive/archive.js';
import {writeIndex} from '../../src/archive/writeIndex.js';
import {renderIndex} from '../../src/archive/indexPage.js';
import {headlinesFromResults, headlinesJson, headlinesOf} from '../../src/archive/headlines.js';
import {resultsJson} from '../../src/results/index.js';
import {digestOfReport, report} from './fixtures/report.js';
import {tempDir} from './helpers.js';

const evil = '<img src=x onerror=alert(1)>';

describe('index.html', () => {
  it('lists every archived period newest first, with links and headline figures, escaped', async () => {
    const out = await tempDir();
    for (const month of [9, 11, 10]) {
      const rep = report(2026, month, [{id: 'net-sales', label: evil}, {id: 'budget', label: 'Budget', hidden: true}], {
        title: `Pack "${evil}" & co`,
      });
      const html = '<p>r</p>';
      await archive({report: rep, digest: digestOfReport(rep), html, pdf: null, exports: [], outDir: out, force: false, plan: null, warnings: []});
    }
    await mkdir(join(out, 'harbourline-monthly', '2026-08'));
    const html = await readFile(join(out, 'harbourline-monthly', 'index.html'), 'utf8');
    expect(html).not.toContain('<img');
    expect(html).not.toMatch(/<script/i);
    // Escaped by handlebars, as in the report (`=` too).
    expect(html).toContain('&lt;img src&#x3D;x onerror&#x3D;alert(1)&gt;');
    expect(html).toContain('<h1>Pack &quot;&lt;img src&#x3D;x onerror&#x3D;alert(1)&gt;&quot; &amp; co</h1>');
    expect(html).not.toContain('Budget');
    const order = ['November 2026', 'October 2026', 'September 2026'].map((h) => html.indexOf(`<h2>${h} `));
    expect(order.every((i, k) => i > 0 && (k === 0 || i > order[k - 1]))).toBe(true);
    expect(html).toContain('<a href="2026-11/report.html">Report</a>');
    expect(html).toContain('<a href="2026-11/results.json">Results (JSON)</a>');
    expect(html).not.toContain('2026-11/report.pdf');
    // 2026-08 was created after the last archive call, so it appears only once the index is rebuilt.
    expect(html).not.toContain('2026-08');
    await mkdir(join(out, 'harbourline-monthly', 'drafts'));
    await writeIndex(out, 'harbourline-monthly');
    const again = await readFile(join(out, 'harbourline-monthly', 'index.html'), 'utf8');
    expect(again).toContain('results.json missing or unreadable');
    expect(again.indexOf('September 2026')).toBeLessThan(again.indexOf('>2026-08<'));
    expect(again).not.toContain('drafts');
  });

  it('shows the review-period value with its unit and the year-on-year change in the pack locale', async () => {
    const r = headlinesOf(report(2026, 10, [{id: 'net-sales', label: 'Net sales'}], {locale: 'de-DE'}));
    // Latest value of the fixture: 100 + 0.5·47 + 10·sin(2π·(2026·12 + 9)/12) = 123.5 + 10·sin(1.5π) = 113.5
    // → "113,5" (the one rounding rule: one decimal from 10 up to 1 000); year-on-year 6.1 → "+6,1 %" in German.
    const html = await renderIndex('harbourline-monthly', [{folder: '2026-10', results: r, files: ['results.json']}]);
    expect(html).toContain('<tr><th scope="row">Net sales</th><td>113,5 EUR k</td><td>+6,1\u00a0%</td></tr>');
    expect(html).toContain('<html lang="de-DE">');
  });

  it('is the same bytes for the same archive', async () => {
    const r = headlinesOf(report(2026, 10, [{id: 'net-sales'}]));
    const entries = [{folder: '2026-10', results: r, files: ['report.html', 'results.json']}];
    expect(await renderIndex('p', entries)).toBe(await renderIndex('p', entries));
  });

  it('reads headlines.json, not results.json, and gives the same figures as results.json would', async () => {
    const out = await tempDir();
    const rep = report(2026, 10, [{id: 'net-sales', label: 'Net sales'}]);
    await archive({report: rep, digest: digestOfReport(rep), html: null, pdf: null, exports: [], outDir: out, force: false, plan: null, warnings: []});
    const dir = join(out, 'harbourline-monthly', '2026-10');
    expect(await readFile(join(dir, 'headlines.json'), 'utf8')).toBe(headlinesJson(rep));
    expect(headlinesFromResults(resultsJson(rep))).toEqual(headlinesOf(rep));
    const before = await readFile(join(out, 'harbourline-monthly', 'index.html'), 'utf8');
    // A broken results.json does not matter to the index while headlines.json is there.
    await writeFile(join(dir, 'results.json'), 'not json');
    await writeIndex(out, 'harbourline-monthly');
    expect(await readFile(join(out, 'harbourline-monthly', 'index.html'), 'utf8')).toBe(before);
    expect(before).toContain('<th scope="row">Net sales</th>');
  });

  it('falls back to results.json for a folder archived before headlines.json existed', async () => {
    const out = await tempDir();
    const rep = report(2026, 10, [{id: 'net-sales', label: 'Net sales'}]);
    await archive({report: rep, digest: digestOfReport(rep), html: null, pdf: null, exports: [], outDir: out, force: false, plan: null, warnings: []});
    const before = await readFile(join(out, 'harbourline-monthly', 'index.html'), 'utf8');
    await rm(join(out, 'harbourline-monthly', '2026-10', 'headlines.json'));
    await writeIndex(out, 'harbourline-monthly');
    expect(await readFile(join(out, 'harbourline-monthly', 'index.html'), 'utf8')).toBe(before);
  });

  it('lists at most 50 visible series per period and says how many more there are', async () => {
    const specs = Array.from({length: 1234}, (_, i) => ({id: `s${i}`, label: `Series ${i}`}));
    const html = await renderIndex('p', [{folder: '2026-10', results: headlinesOf(report(2026, 10, specs)), files: []}]);
    expect(html.match(/<tr><th scope="row">/g)).toHaveLength(50);
    expect(html).toContain('Series 49<');
    expect(html).not.toContain('Series 50<');
    expect(html).toContain('<p class="muted">and 1,184 more series.</p>');
  });
});
