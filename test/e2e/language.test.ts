import {execFileSync} from 'node:child_process';
import {mkdtempSync, readFileSync, rmSync} from 'node:fs';
import {tmpdir} from 'node:os';
import {join} from 'node:path';
import {afterAll, beforeAll, describe, expect, it} from 'vitest';
import {build} from '../../src/run.js';
import {collectingLogger} from '../../src/log.js';

// The quarterly demo in English (sample-config/quarterly-pack.yaml) and in German (quarterly-pack-de.yaml: the same
// data, German texts of its own and `locale: de-DE`), built end to end and read back with poppler's pdftotext.
const out = mkdtempSync(join(tmpdir(), 'ebbflow-language-'));
const text: Record<'en' | 'de', string> = {en: '', de: ''};
const html: Record<'en' | 'de', string> = {en: '', de: ''};
const pages: Record<'en' | 'de', number> = {en: 0, de: 0};

beforeAll(async () => {
  for (const [language, file] of [
    ['en', 'sample-config/quarterly-pack.yaml'],
    ['de', 'sample-config/quarterly-pack-de.yaml'],
  ] as const) {
    const summary = await build({packFile: file, outDir: out, force: false, jobs: 1}, collectingLogger());
    expect(summary.pdfSkipped).toBeNull();
    const pdf = join(summary.folder, 'report.pdf');
    text[language] = execFileSync('pdftotext', [pdf, '-'], {encoding: 'utf8'}).replace(/\s+/g, ' ');
    html[language] = readFileSync(join(summary.folder, 'report.html'), 'utf8');
    pages[language] = Number(execFileSync('pdfinfo', [pdf], {encoding: 'utf8'}).match(/Pages:\s+(\d+)/)![1]);
  }
}, 300_000);

afterAll(() => rmSync(out, {recursive: true, force: true}));

/**
 * Words and phrases of the English quarterly report (headings, labels, terms, sentence parts, chart legends,
 * footer). Each must be in the English PDF and none in the German one. Left out: published names and titles of
 * sources (STL, MASE, Journal of Official Statistics), which both reports cite alike.
 */
const ENGLISH = [
  'At a glance', 'What stands out', 'Every series', 'On a year earlier', 'Adjusted vs previous', 'Outlook', 'Flags',
  'Last 3 years', 'see chart', 'Seasonally adjusted', 'Trend-cycle', 'above trend', 'below trend', 'unusual value',
  'robust sigmas', 'one-off', 'Seasonal pattern by year', 'Change on a year earlier', 'Deviation from long-run trend',
  'Forecast with', '% range', 'Back-test', 'Methods and cautions', 'How the figures were made', 'Series by series',
  'Reading these figures', 'Data notes', 'Input file', 'Page 2 of', 'the series', 'the trend-cycle', 'a combination of',
  'damped trend', 'Cautions', 'Forecast model', 'Seasonal window', 'Calendar effects', 'statistical estimates',
  'not financial advice', 'Built with ebbflow', 'raised no data notes', 'came to', 'rising', 'falling',
  'the previous quarter', 'Treat the forecast', 'Trough', 'Hollow markers', 'point to a rise', 'Prepared by',
];

describe('the report in the pack’s language', () => {
  it('the English report holds every listed phrase, the German report none of them', () => {
    const en = text.en.toLowerCase();
    const de = text.de.toLowerCase();
    expect(ENGLISH.filter((p) => !en.includes(p.toLowerCase()))).toEqual([]);
    expect(ENGLISH.filter((p) => de.includes(p.toLowerCase()))).toEqual([]);
  });

  it('the German report speaks German terms of the trade', () => {
    for (const term of ['Auf einen Blick', 'saisonbereinigt', 'Trend-Konjunktur-Komponente', 'gegenüber Vorjahr', 'Seite 2 von']) {
      expect(text.de.toLowerCase()).toContain(term.toLowerCase());
    }
    expect(html.de).toContain('<html lang="de-DE">');
  });

  it('prints no `key = value` settings in either report', () => {
    for (const language of ['en', 'de'] as const) {
      expect(text[language]).not.toMatch(/\b[A-Za-z][A-Za-z0-9]* = \S/);
      expect(html[language].replace(/<svg[\s\S]*?<\/svg>/g, '').replace(/<style>[\s\S]*?<\/style>/, '')).not.toMatch(/\b[a-z][A-Za-z0-9]* = \S/);
    }
  });

  it('fits in fewer pages than the 28 of the report before the commentary and the compact appendix', () => {
    expect(pages.en).toBeLessThan(28);
    expect(pages.de).toBeLessThan(28);
  });
});
