import {describe, expect, it} from 'vitest';
import {mkdir, readFile} from 'node:fs/promises';
import {join} from 'node:path';
import {archive} from '../../src/archive/archive.js';
import {writeIndex} from '../../src/archive/writeIndex.js';
import {renderIndex} from '../../src/archive/indexPage.js';
import {toResults} from '../../src/render/results.js';
import {report} from './fixtures/report.js';
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
      await archive({report: rep, html, pdf: null, exports: [], outDir: out, force: false, packYaml: '', warnings: []});
    }
    await mkdir(join(out, 'harbourline-monthly', '2026-08'));
    const html = await readFile(join(out, 'harbourline-monthly', 'index.html'), 'utf8');
    expect(html).not.toContain('<img');
    expect(html).not.toMatch(/<script/i);
    expect(html).toContain('&lt;img src=x onerror=alert(1)&gt;');
    expect(html).toContain('<h1>Pack &quot;&lt;img src=x onerror=alert(1)&gt;&quot; &amp; co</h1>');
    expect(html).not.toContain('Budget');
    const order = ['Nov 2026', 'Oct 2026', 'Sep 2026'].map((h) => html.indexOf(`<h2>${h} `));
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
    expect(again.indexOf('Sep 2026')).toBeLessThan(again.indexOf('>2026-08<'));
    expect(again).not.toContain('drafts');
  });

  it('shows the review-period value with its unit and the year-on-year change in the pack locale', () => {
    const r = toResults(report(2026, 10, [{id: 'net-sales', label: 'Net sales'}], {locale: 'de-DE'}));
    // Latest value of the fixture: 100 + 0.5·47 + 10·sin(2π·(2026·12 + 9)/12) = 123.5 + 10·sin(1.5π) = 113.5
    // → "114" (whole numbers from 100 up); year-on-year 6.1 → "+6,1%" in German.
    const html = renderIndex('harbourline-monthly', [{folder: '2026-10', results: r, files: ['results.json']}]);
    expect(html).toContain('<tr><th scope="row">Net sales</th><td>114 EUR k</td><td>+6,1%</td></tr>');
    expect(html).toContain('<html lang="de-DE">');
  });

  it('is the same bytes for the same archive', () => {
    const r = toResults(report(2026, 10, [{id: 'net-sales'}]));
    const entries = [{folder: '2026-10', results: r, files: ['report.html', 'results.json']}];
    expect(renderIndex('p', entries)).toBe(renderIndex('p', entries));
  });
});
