import {execFileSync} from 'node:child_process';
import {existsSync, mkdtempSync, readFileSync, readdirSync, rmSync} from 'node:fs';
import {tmpdir} from 'node:os';
import {join} from 'node:path';
import {afterAll, beforeAll, describe, expect, it} from 'vitest';
import {build} from '../../src/run.js';
import {collectingLogger} from '../../src/log.js';

// End to end: the demo pack (sample-config/) through the whole pipeline into a temporary out/ folder,
// then the PDF read back with poppler's pdftotext/pdfinfo, as a user (or a client) would read it.
const out = mkdtempSync(join(tmpdir(), 'ebbflow-e2e-'));
let folder = '';
let pdfText = '';
let results: any;

beforeAll(async () => {
  const log = collectingLogger();
  const summary = await build({packFile: 'sample-config/monthly-pack.yaml', outDir: out, force: false, jobs: 1}, log);
  folder = summary.folder;
  expect(summary.pdfSkipped).toBeNull();
  pdfText = execFileSync('pdftotext', ['-layout', join(folder, 'report.pdf'), '-'], {encoding: 'utf8'});
  results = JSON.parse(readFileSync(join(folder, 'results.json'), 'utf8'));
}, 300_000);

afterAll(() => rmSync(out, {recursive: true, force: true}));

describe('demo pack, end to end', () => {
  it('writes the period folder with HTML, PDF, JSON, exports and manifest', () => {
    expect(folder).toMatch(/2026-10$/);
    for (const f of ['report.html', 'report.pdf', 'results.json', 'manifest.json']) expect(existsSync(join(folder, f))).toBe(true);
    expect(readdirSync(join(folder, 'exports')).length).toBeGreaterThan(0);
  });

  it('results.json follows the contract field names', () => {
    expect(results.schema).toBe('ebbflow/results/v2');
    expect(results.pack).toMatchObject({period: '2026-10', frequency: 12});
    expect(results.series.length).toBeGreaterThanOrEqual(8);
    const s = results.series[0];
    for (const key of ['id', 'periods', 'original', 'decomposition', 'outliers', 'cycle', 'changes', 'forecast', 'callouts'])
      expect(s).toHaveProperty(key);
    for (const key of ['method', 'model', 'trend', 'seasonal', 'irregular', 'adjusted']) expect(s.decomposition).toHaveProperty(key);
    for (const key of ['method', 'periods', 'mean', 'lower', 'upper', 'backtest']) expect(s.forecast).toHaveProperty(key);
    expect(s.forecast.lower).toHaveProperty('80');
    expect(s.forecast.upper).toHaveProperty('95');
    for (const key of ['method', 'trend', 'gap', 'phase', 'turningPoints']) expect(s.cycle).toHaveProperty(key);
    expect(s.periods.length).toBe(s.original.length);
  });

  it('the PDF has the title, callout sentences from results.json, and several pages', () => {
    const title = results.pack.title as string;
    expect(pdfText).toContain(title);
    const pages = Number(execFileSync('pdfinfo', [join(folder, 'report.pdf')], {encoding: 'utf8'}).match(/Pages:\s+(\d+)/)![1]);
    expect(pages).toBeGreaterThan(1);
    const flat = pdfText.replace(/\s+/g, ' ');
    const callout = results.series[0].callouts[0].text as string;
    // The first words of the callout survive line wrapping in the PDF text.
    expect(flat).toContain(callout.split(' ').slice(0, 5).join(' '));
  });

  it('bookmarks list the groups with their series, as the pack arranges them (read by poppler)', () => {
    const pdf = join(folder, 'report.pdf');
    const xml = execFileSync('pdftohtml', ['-xml', '-i', '-q', '-stdout', pdf], {encoding: 'utf8'});
    const outline = xml.slice(xml.indexOf('<outline>'));
    // sample-config/monthly-pack.yaml: group "Sales by channel" has net-sales as its total, shop and web sales as
    // its parts; a group's total comes before its parts.
    expect(outline).toMatch(
      /<item page="\d+">Sales by channel<\/item>\s*<outline>\s*<item page="\d+">Net sales<\/item>\s*<item page="\d+">Shop sales<\/item>/,
    );
    for (const title of ['At a glance', 'Web store', 'Costs and stock', 'Methods and cautions', 'Data notes']) {
      expect(outline).toContain(`>${title}</item>`);
    }
  });

  it('shows no stray NaN, undefined or [object Object] anywhere in the PDF or HTML', () => {
    const html = readFileSync(join(folder, 'report.html'), 'utf8');
    for (const bad of ['NaN', 'undefined', '[object Object]', 'Infinity']) {
      expect(pdfText).not.toContain(bad);
      expect(html.replace(/<svg[\s\S]*?<\/svg>/g, '')).not.toContain(bad);
    }
    expect(html).not.toMatch(/<script/i);
  });

  it('lists the averaged ETS models with their Akaike weights in the methods appendix', () => {
    const models = results.series[0].forecast.options.ets.models as {model: string; weight: number}[];
    expect(models.reduce((a, m) => a + m.weight, 0)).toBeCloseTo(1, 12);
    const html = readFileSync(join(folder, 'report.html'), 'utf8');
    if (models.length > 1) {
      const line = models.map((m) => `${m.model} ${Math.round(m.weight * 100)}%`).join(', ');
      expect(html).toContain(line);
    }
  });
});
