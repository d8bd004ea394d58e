import {afterAll, beforeAll, describe, expect, test} from 'vitest';
import {execFileSync, spawnSync} from 'node:child_process';
import {mkdtempSync, readFileSync, writeFileSync} from 'node:fs';
import {tmpdir} from 'node:os';
import {join} from 'node:path';
import puppeteer, {type Browser} from 'puppeteer-core';
import {renderHtml} from '../../src/render/index.js';
import {LAUNCH_ARGS, findBrowser, fixDates, openBrowser, periodWords, printPdf, stableNodeIds, type PdfOptions, type PrintRecord} from '../../src/render/pdf.js';
import {reportOutline} from '../../src/render/view/index.js';
import {makeReport} from './fixtures.js';

const chromium = findBrowser(null);
const dir = mkdtempSync(join(tmpdir(), 'ebbflow-pdf-'));
const opts: PdfOptions = {
  title: 'Harbourline Trading monthly review',
  periodLabel: '2026-10',
  paper: 'A4',
  orientation: 'portrait',
  font: 'Liberation Sans',
  footer: 'Harbourline Trading · internal',
  date: '20261101',
};
const run = (cmd: string, args: string[]) => execFileSync(cmd, args, {encoding: 'utf8'});

describe('findBrowser and openBrowser', () => {
  test('environment variables come before the usual paths; a missing browser is one sentence', async () => {
    expect(findBrowser(null, {EBBFLOW_CHROMIUM: '/nonexistent', CHROME_PATH: '/bin/sh'})).toBe('/bin/sh');
    expect(findBrowser('/nonexistent/chrome')).toBeNull();
    const missing = await openBrowser('/nonexistent/chrome');
    expect(missing).toEqual({missing: expect.stringMatching(/^PDF skipped: .*apt-get install chromium.*EBBFLOW_CHROMIUM.*\.$/)});
  });
});

describe('fixDates and periodWords', () => {
  test('dates are replaced in place, keeping the length', () => {
    const raw = new TextEncoder().encode("<< /CreationDate (D:20261202011500+00'00') /ModDate (D:20261202011500+00'00') >>");
    const fixed = new TextDecoder().decode(fixDates(raw, '20261101'));
    expect(fixed).toBe("<< /CreationDate (D:20261101000000+00'00') /ModDate (D:20261101000000+00'00') >>");
    expect(() => fixDates(raw, '2026-11-01')).toThrow(/invalid pdf date/);
  });

  test('structure-element node numbers become their rank, keeping order and length', () => {
    const raw = new TextEncoder().encode('/ID (node00000071) /ID (node00000069) /Names [(node00000069) 9 0 R (node00000071) 7 0 R]');
    const fixed = new TextDecoder().decode(stableNodeIds(raw));
    expect(fixed).toBe('/ID (node00000002) /ID (node00000001) /Names [(node00000001) 9 0 R (node00000002) 7 0 R]');
    expect(fixed.length).toBe(raw.length);
    // Another run numbering the same nodes from elsewhere gives the same bytes.
    const shifted = new TextEncoder().encode('/ID (node00000075) /ID (node00000073) /Names [(node00000073) 9 0 R (node00000075) 7 0 R]');
    expect(new TextDecoder().decode(stableNodeIds(shifted))).toBe(fixed);
  });

  test('period labels in words', () => {
    expect(periodWords('2026-10', 'en-GB')).toBe('October 2026');
    expect(periodWords('2026-10', 'fr-FR')).toBe('octobre 2026');
    expect(periodWords('2026-Q3', 'en-GB')).toBe('Q3 2026');
  });
});

describe.skipIf(chromium === null)('PDF with Chromium', () => {
  let browser: Browser;
  let file = '';
  let pdf: Uint8Array;
  beforeAll(async () => {
    browser = await puppeteer.launch({executablePath: chromium!, headless: true, args: LAUNCH_ARGS});
    const report = makeReport({count: 2});
    pdf = await printPdf(browser, await renderHtml(report), {...opts, outline: reportOutline(report)});
    file = join(dir, 'report.pdf');
    writeFileSync(file, pdf);
  });
  afterAll(async () => {
    await browser?.close();
  });

  test('title, callout, running header and page numbers are in the text', () => {
    const text = run('pdftotext', ['-layout', file, '-']).replace(/\s+/g, ' ');
    expect(text).toContain('Harbourline Trading monthly review');
    expect(text).toContain('Net sales rose 4.2% on a year earlier, the fastest growth in two years.');
    expect(text).toContain('October 2026');
    expect(text).toMatch(/Page 2 of \d+/);
  });

  test('several A4 pages, fixed dates and embedded fonts', () => {
    const info = run('pdfinfo', [file]);
    expect(Number(info.match(/Pages:\s+(\d+)/)![1])).toBeGreaterThan(1);
    expect(info).toMatch(/Page size:\s+594\.96 x 841\.92 pts \(A4\)/);
    expect(info).toMatch(/CreationDate:\s+Sun Nov\s+1 00:00:00 2026/);
    const fonts = run('pdffonts', [file]).split('\n').slice(2).filter(Boolean);
    expect(fonts.length).toBeGreaterThan(0);
    for (const line of fonts) expect(line).toMatch(/\syes\s+yes\s+yes\s/);
    expect(fonts.join('\n')).toContain('LiberationSans');
  });

  test('bookmarks lead to the summary, each series, the methods and the data notes (as poppler reads them)', () => {
    const check = spawnSync('pdfinfo', [file], {encoding: 'utf8'});
    expect(check.stderr).toBe('');
    expect(check.stdout).toMatch(/Tagged:\s+no/);
    const xml = run('pdftohtml', ['-xml', '-i', '-q', '-stdout', file]);
    const items = Array.from(xml.matchAll(/<item page="(\d+)">([^<]*)<\/item>/g), (m) => ({
      page: Number(m[1]),
      title: m[2],
    }));
    const titles = items.map((i) => i.title);
    const series = ['Net sales', 'Orders received'];
    expect(titles).toEqual(['At a glance', ...series, 'Methods and cautions', 'Data notes']);
    // Each bookmark's page holds its heading.
    for (const {page, title} of items) {
      const text = run('pdftotext', ['-f', String(page), '-l', String(page), file, '-']);
      expect(text.toLowerCase()).toContain(title.toLowerCase());
    }
    const pages = items.map((i) => i.page);
    expect(pages).toEqual([...pages].sort((a, b) => a - b));
  });

  test('a rebuild gives the same bytes', async () => {
    const report = makeReport({count: 2});
    const again = await printPdf(browser, await renderHtml(report), {...opts, outline: reportOutline(report)});
    expect(Buffer.from(again).equals(Buffer.from(pdf))).toBe(true);
  });

  test('tagged on request, with the same bookmarks and the same bytes on a rebuild', async () => {
    const report = makeReport({count: 2});
    const html = await renderHtml(report);
    const tagged = {...opts, outline: reportOutline(report), tagged: true};
    const first = await printPdf(browser, html, tagged);
    const taggedFile = join(dir, 'tagged.pdf');
    writeFileSync(taggedFile, first);
    expect(run('pdfinfo', [taggedFile])).toMatch(/Tagged:\s+yes/);
    const xml = run('pdftohtml', ['-xml', '-i', '-q', '-stdout', taggedFile]);
    expect(xml.match(/<item page="\d+">/g)).toHaveLength(5);
    expect(Buffer.from(await printPdf(browser, html, tagged)).equals(Buffer.from(first))).toBe(true);
  });

  test('network and file requests are blocked and listed', async () => {
    const record: PrintRecord = {blocked: []};
    const html =
      '<!DOCTYPE html><html><body><p>probe</p><img src="http://127.0.0.1:9/x.png"><img src="file:///etc/hostname">' +
      '<iframe src="file:///etc/hostname"></iframe><script>document.body.innerHTML = "script ran"</script></body></html>';
    const bytes = await printPdf(browser, html, opts, record);
    writeFileSync(join(dir, 'probe.pdf'), bytes);
    expect(record.blocked).toContain('http://127.0.0.1:9/x.png');
    // Chromium refuses file: URLs from an about:blank document before interception sees them; either way
    // the file's content must not reach the PDF.
    const text = run('pdftotext', [join(dir, 'probe.pdf'), '-']);
    expect(text).toContain('probe');
    expect(text).not.toContain('script ran');
    expect(text).not.toContain(readFileSync('/etc/hostname', 'utf8').trim());
  });
});
