import {mkdtempSync, rmSync, writeFileSync} from 'node:fs';
import {availableParallelism, tmpdir} from 'node:os';
import {join} from 'node:path';
import {performance} from 'node:perf_hooks';
import {main} from '../../src/cli/main.js';
import {mulberry32} from '../../src/analyse/numeric/mulberry32.js';
import {makeReport} from '../render/fixtures.js';
import {buildView} from '../../src/render/view/index.js';
import {specToSvg} from '../../src/render/svg.js';
import {openBrowser, renderHtml} from '../../src/render/index.js';

/**
 * Render benchmark: a 50-series monthly fixture report (eight years each, with history) to HTML and PDF.
 * Prints milliseconds per chart (by chart kind), for the whole HTML, and per PDF page; then the whole build of a
 * 50-series pack (eight years of monthly data each) through the command line: read, analyse, narrate, HTML, PDF
 * and archive, with --jobs at the core count.
 * Run after `npm run build`: `TZ=UTC node -e "import('./dist/test/bench/render.js').then((m) => m.run())"`.
 */
export async function run(): Promise<void> {
  const report = makeReport({count: 50, history: true});
  const view = buildView(report, null);
  const slots = view.series.flatMap((s) => s.rows.flat());
  const byKind = new Map<string, number[]>();
  for (const slot of slots) {
    const start = performance.now();
    await specToSvg(slot.chart.spec, {locale: view.locale, font: 'Liberation Sans', idPrefix: slot.chart.id, title: 't', description: 'd'});
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
  await wholePack();
}

/** `ebbflow build` of a generated 50-series monthly pack to HTML and PDF, timed from the command line call. */
async function wholePack(): Promise<void> {
  const dir = mkdtempSync(join(tmpdir(), 'ebbflow-render-'));
  try {
    const rng = mulberry32(42);
    let csv = 'month,series,value\n';
    for (let s = 0; s < 50; s++) {
      const level = 100 + 900 * rng();
      const growth = (rng() - 0.3) * 0.01;
      const amp = 0.05 + 0.2 * rng();
      for (let t = 0; t < 96; t++) {
        const season = 1 + amp * Math.sin((2 * Math.PI * (t % 12)) / 12);
        const v = level * (1 + growth) ** t * season * (1 + 0.03 * (rng() - 0.5));
        csv += `${2018 + Math.floor(t / 12)}-${String((t % 12) + 1).padStart(2, '0')},Line ${s + 1},${v.toFixed(2)}\n`;
      }
    }
    writeFileSync(join(dir, 'data.csv'), csv);
    writeFileSync(
      join(dir, 'pack.yaml'),
      'pack: {title: Fifty lines, frequency: monthly, formats: [html, pdf]}\n' +
        'sources: [{id: d, file: data.csv, layout: long, dateColumn: month, keyColumn: series, valueColumn: value}]\n' +
        'series: [{fromSource: d}]\n',
    );
    const jobs = String(availableParallelism());
    const quiet = {write: () => undefined};
    const start = performance.now();
    const code = await main(['build', join(dir, 'pack.yaml'), '--out', join(dir, 'out'), '--jobs', jobs], {
      stdout: quiet,
      stderr: quiet,
    });
    const seconds = (performance.now() - start) / 1000;
    const failed = code === 0 ? '' : ` (exit ${code})`;
    console.log(`whole pack, 50 series to HTML + PDF (--jobs ${jobs}): ${seconds.toFixed(1)} s${failed}`);
  } finally {
    rmSync(dir, {recursive: true, force: true});
  }
}

function mean(values: number[]): number {
  return values.reduce((a, b) => a + b, 0) / Math.max(1, values.length);
}
