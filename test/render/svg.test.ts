import {describe, expect, test} from 'vitest';
import {specToSvg} from '../../src/render/svg.js';
import {overviewChart} from '../../src/render/charts/overview.js';
import {themeFor} from '../../src/render/theme.js';
import {wordsFor} from '../../src/words/index.js';
import {vegaLocale} from '../../src/render/locale.js';
import {measureText} from '../../src/render/textMetrics.js';
import {monthIndex} from '../../src/time/period.js';
import type {ChartContext} from '../../src/render/charts/common.js';
import type {TopLevelSpec} from 'vega-lite';
import {buildView} from '../../src/render/view/index.js';
import {makeReport} from './fixtures.js';

const theme = themeFor('#1d6f64', 'Liberation Sans');
const ctx: ChartContext = {frequency: 'monthly', theme, width: 320, height: 120, unit: null, seasonNames: [], words: wordsFor('en-GB')};
// Three months starting January 2024, so the axis shows month names.
const spec = overviewChart({start: monthIndex(2024, 1), original: [5, 7, 6], adjusted: null, trend: null, description: 'd'}, ctx);
const options = {locale: 'en-GB', font: 'Liberation Sans', idPrefix: 'chart-x', title: 'Title <b>', description: 'Desc & more'};

describe('specToSvg', () => {
  test('same bytes twice', async () => {
    const a = await specToSvg(spec, options);
    const b = await specToSvg(spec, options);
    expect(a).toBe(b);
  });

  test('a chart does not depend on the charts drawn before it (Views are reused per structure)', async () => {
    // Every chart of a 6-series report, drawn first to last and then last to first: each chart then follows a
    // different chart of its structure, and the first of each structure is drawn by a new View the first time.
    const view = buildView(makeReport({count: 6}), null);
    const slots = view.series.flatMap((s) => s.rows.flat());
    const draw = (slot: (typeof slots)[number]) =>
      specToSvg(slot.chart.spec, {...options, idPrefix: slot.chart.id, title: slot.chart.title, description: 'd'});
    const forward: string[] = [];
    for (const slot of slots) forward.push(await draw(slot));
    const backward: string[] = [];
    for (const slot of [...slots].reverse()) backward.unshift(await draw(slot));
    for (let i = 0; i < slots.length; i++) expect(backward[i], slots[i].chart.id).toBe(forward[i]);
  });

  test('January data is labelled Jan in any time zone', async () => {
    const before = process.env.TZ;
    const utc = await specToSvg(spec, options);
    try {
      // Node re-reads TZ when it changes; a zone west of UTC would turn local-time January 1st into December 31st.
      process.env.TZ = 'America/New_York';
      const west = await specToSvg(spec, options);
      expect(new Date(Date.UTC(2024, 0, 1)).getDate()).toBe(31);
      expect(west).toBe(utc);
    } finally {
      process.env.TZ = before;
    }
    expect(utc).toContain('>Jan 2024<');
    expect(utc).not.toContain('Dec 2023');
  });

  test('locale changes month names and number marks (de-DE)', async () => {
    const big = overviewChart({start: monthIndex(2024, 3), original: [15000, 16500, 17250], adjusted: null, trend: null, description: 'd'}, ctx);
    const svg = await specToSvg(big, {...options, locale: 'de-DE'});
    expect(svg).toContain('Mär 2024');
    expect(svg).toContain('16.000');
  });

  test('the overview legend names all three lines', async () => {
    const three = overviewChart({start: monthIndex(2024, 1), original: [5, 7], adjusted: [6, 6], trend: [6, 6.1], description: 'd'}, ctx);
    const svg = await specToSvg(three, options);
    for (const name of ['Original', 'Seasonally adjusted', 'Trend-cycle']) expect(svg).toContain(`>${name}<`);
  });

  test('title, description and ids are embedded and escaped', async () => {
    const svg = await specToSvg(spec, options);
    expect(svg).toMatch(/^<svg [^>]*role="img" aria-labelledby="chart-x-title chart-x-desc"/);
    expect(svg).toContain('<title id="chart-x-title">Title &lt;b&gt;</title>');
    expect(svg).toContain('<desc id="chart-x-desc">Desc &amp; more</desc>');
    // One image to assistive technology and the PDF tags: no roles, classes or pointer events inside it.
    expect(svg.match(/ role="/g)).toHaveLength(1);
    expect(svg).not.toMatch(/ (class|pointer-events|aria-roledescription)="/);
    const hidden = await specToSvg(spec, {...options, hidden: true});
    expect(hidden).toMatch(/^<svg aria-hidden="true" /);
    expect(hidden).not.toContain(' role="');
  });

  test('external data is refused', async () => {
    const external = {...spec, data: {url: '/etc/hostname', format: {type: 'csv'}}} as TopLevelSpec;
    await expect(specToSvg(external, options)).rejects.toThrow(/chart chart-x/);
  });

  test('vega-lite warnings fail the chart', async () => {
    const bad = {...spec, encoding: {x: {field: 't', type: 'temporal', timeUnit: 'notAUnit'}}} as unknown as TopLevelSpec;
    await expect(specToSvg(bad, options)).rejects.toThrow(/chart chart-x/);
  });
});

describe('text metrics', () => {
  test('Liberation Sans advance widths (11 px "Jan 2024" measured 45.3 px in Chromium, ECOSYSTEM.md §1)', () => {
    expect(measureText('Liberation Sans', false, 11, 'Jan 2024')).toBeCloseTo(45.3, 1);
    expect(measureText('Liberation Sans', true, 11, 'Jan 2024')).toBeGreaterThan(measureText('Liberation Sans', false, 11, 'Jan 2024'));
  });

  test('a font whose substitution tables opentype.js cannot apply is measured glyph by glyph', () => {
    // DejaVu Sans (fonts-dejavu-core) has a contextual-substitution format opentype.js 2.0 does not support.
    const w = measureText('DejaVu Sans', false, 10, '−0.5');
    expect(w).toBeGreaterThan(10);
    expect(w).toBeLessThan(40);
  });
});

describe('vegaLocale', () => {
  test('marks and month names from Intl', () => {
    expect(vegaLocale('de-DE').number).toMatchObject({decimal: ',', thousands: '.'});
    expect(vegaLocale('en-US').number).toMatchObject({decimal: '.', thousands: ','});
    expect(vegaLocale('fr-FR').number.decimal).toBe(',');
    expect(vegaLocale('fr-FR').time.months[0]).toBe('janvier');
    expect(vegaLocale('en-GB').time.shortMonths[0]).toBe('Jan');
    expect(vegaLocale('xx-invalid-@@').time.months[0]).toBe('January');
  });
});
