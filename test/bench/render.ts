import {performance} from 'node:perf_hooks';
import {makeReport} from '../render/fixtures.js';
import {buildView} from '../../src/render/view.js';
import {specToSvg} from '../../src/render/svg.js';
import {openBrowser, renderHtml} from '../../src/render/index.js';

/**
 * Render benchmark: a 50-series monthly fixture report (eight years each, with history) to HTML and PDF.
 * Prints milliseconds per chart (by chart kind), for the whole HTML, and per PDF page.
 * Run after `npm run build`: `TZ=UTC node -e "import('./dist/test/bench/render.js').then((m) => m.run())"`.
 */
export async function run(): Promise<void> {
  const report = makeReport({count: 50, history: true});
  const view = buildView(report, null);
  const slots = view.series.flatMap((s) => s.rows.flat());
  const byKind = new Map<string, number[]>();
  for (const slot of slots) {
    const start = performance.now();
    await specToSvg(slot.chart.spec, {locale: view.lang, font: 'Liberation Sans', idPrefix: slot.chart.id, title: 't', description: 'd'});
    const kind = slot.chart.id.slice(slot.chart.id.lastIndexOf('-') + 1);
    byKind.set(kind, [...(byKind.get(kind) ?? []), performance.now() - start]);
  }
  const all = [...byKind.values()].flat();
  console.log(`charts: ${all.length}, mean ${mean(all).toFixed(1)} ms per chart (first ${all[0].toFixed(0)} ms)`);
  for (const [kind, times] of byKind) console.log(`  ${kind.padEnd(10)} ${mean(times).toFixed(1)} ms (n=${times.length})`);

  let start = performance.now();
  const html = await renderHtml(report);
  const htmlMs = performance.now() - start;
  console.log(`html: ${htmlMs.toFixed(0)} ms, ${(html.length / 1024).toFixed(0)} KiB`);

  start = performance.now();
  const browser = await openBrowser(null);
  if ('missing' in browser) {
    console.log(browser.missing);
    return;
  }
  console.log(`browser launch: ${(performance.now() - start).toFixed(0)} ms`);
  try {
    start = performance.now();
    const pdf = await browser.pdf(html, {
      title: report.plan.title,
      periodLabel: report.periodLabel,
      paper: 'A4',
      orientation: 'portrait',
      font: 'Liberation Sans',
      footer: report.plan.branding.footer,
      date: '20261101',
    });
    const ms = performance.now() - start;
    const pages = (Buffer.from(pdf).toString('latin1').match(/\/Type\s*\/Page\b/g) ?? []).length;
    console.log(`pdf: ${ms.toFixed(0)} ms, ${pages} pages, ${(ms / Math.max(1, pages)).toFixed(0)} ms per page, ${(pdf.length / 1024).toFixed(0)} KiB`);
  } finally {
    await browser.close();
  }
}

function mean(values: number[]): number {
  return values.reduce((a, b) => a + b, 0) / Math.max(1, values.length);
}
