import {describe, expect, test, beforeAll} from 'vitest';
import {mkdtempSync, mkdirSync, readFileSync, readdirSync, writeFileSync} from 'node:fs';
import {tmpdir} from 'node:os';
import {join} from 'node:path';
import Handlebars from 'handlebars';
import {renderHtml} from '../../src/render/index.js';
import {buildView} from '../../src/render/view/index.js';
import {drawSeriesCharts, inlineLogo} from '../../src/render/html.js';
import {makeReport} from './fixtures.js';
import type {Report} from '../../src/render/types.js';

const XSS = '<img src=x onerror=alert(1)>';
const FORMULA = '=HYPERLINK("x")';

function hostile(): Report {
  const report = makeReport({count: 3, firstLabel: XSS, shortSecond: true});
  report.series[1].plan.label = FORMULA;
  report.series[0].callouts[0].text = `Rose <script>alert(1)</script> & "quoted"`;
  report.plan.title = 'Title </style><script>x</script>';
  report.notes.push({file: '/packs/harbourline/data/trading.csv', line: 3, series: XSS, note: {code: 'outOfOrder', values: {line: '3'}}});
  return report;
}

describe('renderHtml', () => {
  test('a locale without words of its own keeps its numbers, speaks English and says so once', async () => {
    const report = makeReport({count: 1, locale: 'nl-NL'});
    const html = await renderHtml(report);
    expect(html).toContain('<html lang="en">');
    expect(html.split('its words are not yet available in the language of the locale nl-NL').length).toBe(2);
    expect(html).toContain('At a glance');
    expect(html).toMatch(/oktober 2026/);
  });

  test('charts drawn ahead, series by series, give the same page as charts drawn by renderHtml itself', async () => {
    const report = makeReport({count: 2});
    const drawn = new Map<string, string>();
    for (const s of report.series) await drawSeriesCharts(report.plan, s.plan, s.analysis, drawn);
    expect(drawn.size).toBeGreaterThan(6);
    expect(await renderHtml(report, drawn)).toBe(await renderHtml(report));
    // And they are the ones used: marked stand-ins all appear in the page.
    const marked = new Map([...drawn.keys()].map((k, i) => [k, `<svg data-mark="${i}"></svg>`]));
    const page = await renderHtml(report, marked);
    for (let i = 0; i < marked.size; i++) expect(page).toContain(`data-mark="${i}"`);
  });

  let html = '';
  beforeAll(async () => {
    html = await renderHtml(hostile());
  });

  test('labels from the pack and the CSV are escaped', () => {
    expect(html).not.toContain('<img src=x');
    expect(html).toContain('&lt;img src&#x3D;x onerror&#x3D;alert(1)&gt;');
    expect(html).toContain('&#x3D;HYPERLINK(&quot;x&quot;)');
    expect(html).not.toContain('</style><script>');
  });

  test('no script and no external reference', () => {
    expect(html).not.toMatch(/<script/i);
    expect(html).not.toMatch(/\s(src|href)="(https?:|file:|\/\/)/i);
  });

  test('every chart is a figure with a caption and one named image, its drawing hidden from assistive technology', () => {
    const figures = html.match(/<figure class="fig fig-(full|half)" id="chart-[^"]+">/g) ?? [];
    expect(figures.length).toBeGreaterThan(6);
    expect(html.match(/<figcaption>/g)?.length).toBe(figures.length);
    expect(html.match(/<div class="fig-chart" role="img" aria-label="[^"]+\. [^"]+"><svg aria-hidden="true" /g)?.length).toBe(figures.length);
    expect(html).not.toMatch(/<svg [^>]*aria-labelledby/);
  });

  test('callouts link to their chart when it exists', () => {
    expect(html).toContain('href="#chart-series-1-overview"');
    expect(html).toContain('id="chart-series-1-overview"');
    // The short series has no irregular chart: its callout links to the section instead.
    expect(html).not.toContain('href="#chart-series-2-irregular"');
    expect(html).toContain('href="#series-series-2"');
  });

  test('a series without adjustment, forecast or cycle gets a note, not empty charts', () => {
    const section = html.slice(html.indexOf('id="series-series-2"'), html.indexOf('id="series-series-3"'));
    expect(section).toContain('Not seasonally adjusted: this needs at least two full years of data (25 months), and the series has 14 observed months.');
    expect(section).toContain('No forecast was made for this series.');
    expect(section).not.toContain('id="chart-series-2-irregular"');
    expect(section).not.toContain('id="chart-series-2-forecast"');
    expect(section).not.toContain('id="chart-series-2-seasonal"');
    expect(section).toContain('id="chart-series-2-overview"');
    expect(html).not.toMatch(/NaN|undefined|\[object Object\]/);
  });

  test('same bytes on a second render', async () => {
    expect(await renderHtml(hostile())).toBe(html);
  });
});

describe('buildView', () => {
  test('groups first, then ungrouped series; hidden series get no section', () => {
    const report = makeReport({count: 4});
    report.plan.groups = [{id: 'g', title: 'Group', series: ['series-3', 'series-1']}];
    report.series[1].plan.hidden = true;
    const view = buildView(report, null);
    expect(view.series.map((s) => [s.id, s.kicker])).toEqual([
      ['series-3', 'Group'],
      ['series-1', 'Group'],
      ['series-4', null],
    ]);
    expect(view.summary.map((r) => r.label)).toEqual(['Net sales', 'Headcount', 'Web visits']);
  });

  test('each chart is drawn at the width of its slot', () => {
    for (const report of [makeReport({count: 2, shortSecond: true}), makeReport({count: 1, frequency: 'quarterly'})]) {
      const slots = buildView(report, null).series.flatMap((s) => s.rows.flat());
      for (const slot of slots) {
        const width = (slot.chart.spec as {width: number}).width;
        expect([slot.chart.id, width]).toEqual([slot.chart.id, slot.chart.size === 'full' ? 672 : 327]);
      }
    }
  });

  test('numbers and periods follow the locale', () => {
    const view = buildView(makeReport({count: 1, locale: 'de-DE'}), null);
    expect(view.cover.period).toBe('Oktober 2026');
    expect(view.series[0].forecast?.rows[0].period).toBe('Nov. 2026');
    expect(view.summary[0].yoy).toMatch(/^[+-]\d+,\d\s%$/);
  });

  test('input paths are shown relative to the pack file, a workbook with the sheet read, in the pack\'s language', () => {
    const view = buildView(makeReport({count: 1}), null);
    expect(view.inputs[0].path).toBe('data/trading.csv');
    const sheets = (locale: string) => {
      const report = makeReport({count: 1, locale});
      const book = {file: '/packs/harbourline/data/budget.xlsx', sha256: 'cd'.repeat(32), bytes: 100, rows: 2};
      report.inputs = [{...book, sheet: 'Budget'}, {...book, sheet: 'Cost plan'}];
      return buildView(report, null).inputs.map((i) => i.path);
    };
    expect(sheets('en-GB')).toEqual(['data/budget.xlsx, sheet Budget', 'data/budget.xlsx, sheet Cost plan']);
    expect(sheets('de-DE')[1]).toBe('data/budget.xlsx, Blatt Cost plan');
  });

  test('history tables and chart when history is present', () => {
    const view = buildView(makeReport({count: 2, history: true}), null);
    expect(view.history?.revisions[0]).toMatchObject({series: 'Net sales', measure: 'Original value', change: '+1.2%', large: true});
    expect(view.history?.chart?.chart.id).toBe('chart-tracking');
    expect(buildView(makeReport({count: 1}), null).history).toBeNull();
  });
});

describe('templates', () => {
  test('built-in templates never use triple-stash', () => {
    const dir = join(import.meta.dirname, '../../templates');
    const files = ['report.hbs', ...readdirSync(join(dir, 'partials')).map((f) => `partials/${f}`)];
    for (const file of files) {
      const ast = Handlebars.parse(readFileSync(join(dir, file), 'utf8'));
      const unescaped: string[] = [];
      const visit = (node: unknown): void => {
        if (!node || typeof node !== 'object') return;
        const n = node as {type?: string; escaped?: boolean};
        if (n.type === 'MustacheStatement' && n.escaped === false) unescaped.push(file);
        for (const value of Object.values(node)) {
          if (Array.isArray(value)) value.forEach(visit);
          else if (value && typeof value === 'object') visit(value);
        }
      };
      visit(ast);
      expect(unescaped).toEqual([]);
    }
  });

  test('a pack template folder overrides a partial and the CSS by name', async () => {
    const dir = mkdtempSync(join(tmpdir(), 'ebbflow-tpl-'));
    mkdirSync(join(dir, 'partials'));
    writeFileSync(join(dir, 'partials', 'cover.hbs'), '<section class="my-cover">{{cover.title}}</section>');
    writeFileSync(join(dir, 'styles.css'), '.my-cover { color: red; }');
    const report = makeReport({count: 1});
    report.plan.branding.templates = dir;
    const html = await renderHtml(report);
    expect(html).toContain('<section class="my-cover">Harbourline Trading monthly review</section>');
    expect(html).toContain('.my-cover { color: red; }');
    expect(html).not.toContain('class="cover"');
  });
});

describe('inlineLogo', () => {
  test('an SVG logo becomes a data: URI for an img element; a mislabelled file is refused', () => {
    const dir = mkdtempSync(join(tmpdir(), 'ebbflow-logo-'));
    writeFileSync(join(dir, 'logo.svg'), '<svg xmlns="http://www.w3.org/2000/svg"><script>alert(1)</script></svg>');
    writeFileSync(join(dir, 'fake.png'), 'not a png');
    const uri = inlineLogo(join(dir, 'logo.svg'))!;
    expect(uri.startsWith('data:image/svg+xml;base64,')).toBe(true);
    expect(() => inlineLogo(join(dir, 'fake.png'))).toThrow(/does not match/);
  });
});

describe('poor data', () => {
  test('a series with no values gets a note and no charts; the report still renders', async () => {
    const report = makeReport({count: 2});
    const a = report.series[1].analysis;
    a.original = a.original.map(() => NaN);
    a.changes = {...a.changes, yearOnYear: NaN, yearOnYearSeries: a.original.map(() => NaN)};
    a.adjustment = null;
    a.cycle = {...a.cycle!, gap: a.original.map(() => NaN)};
    a.forecast = {...a.forecast!, mean: a.forecast!.mean.map(() => NaN)};
    const html = await renderHtml(report);
    const section = html.slice(html.indexOf('id="series-series-2"'), html.indexOf('id="methods"'));
    expect(section).toContain('The series has no values to chart.');
    expect(section).not.toContain('<figure');
  });
});

describe('other frequencies', () => {
  test.each(['quarterly', 'weekly'] as const)('%s report renders every chart without warnings', async (frequency) => {
    const html = await renderHtml(makeReport({count: 1, frequency, history: true}));
    expect(html).toContain('id="chart-series-1-seasonal"');
    expect(html).toContain('id="chart-series-1-forecast"');
    expect(html).not.toMatch(/NaN|undefined/);
  });
});
