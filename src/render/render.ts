import type {Report} from './types.js';
import type {PdfSession} from './pdfSession.js';
import {exportTables} from './exports.js';
import {civilFromDays, periodStartDay} from '../time/period.js';

/** The rendered outputs of one report: each null when the pack did not ask for it. */
export interface Rendered {
  html: string | null;
  pdf: Uint8Array | null;
  /** Why the PDF was not written although asked for (no browser), or null. */
  pdfSkipped: string | null;
  /** Files for `exports/` (CSV, XLSX). */
  exports: {name: string; content: string | Uint8Array}[];
}

/**
 * The report as the pack's formats ask for it: HTML (with the charts drawn ahead in `charts`), the PDF printed from
 * that HTML through `session`, and the CSV and XLSX exports. The chart, browser and workbook libraries load only
 * for packs that ask for their formats.
 */
export async function render(
  report: Report,
  {charts, session}: {charts: ReadonlyMap<string, string>; session: PdfSession},
): Promise<Rendered> {
  const {plan} = report;
  const wantPdf = plan.formats.includes('pdf');
  const html =
    plan.formats.includes('html') || wantPdf ? await (await import('./html.js')).renderHtml(report, charts) : null;
  let pdf: Uint8Array | null = null;
  let pdfSkipped: string | null = null;
  if (wantPdf && html !== null) {
    const outline = (await import('./view.js')).reportOutline(report);
    const printed = await session.print(plan.browser, html, {...pdfOptions(report), outline});
    if ('pdf' in printed) pdf = printed.pdf;
    else pdfSkipped = printed.skipped;
  }
  const exports: Rendered['exports'] = [];
  if (plan.formats.includes('csv') || plan.formats.includes('xlsx')) {
    const tables = exportTables(report);
    if (plan.formats.includes('csv')) exports.push(...tables.csv);
    if (plan.formats.includes('xlsx')) exports.push({name: 'tables.xlsx', content: await tables.xlsx()});
  }
  return {html: plan.formats.includes('html') ? html : null, pdf, pdfSkipped, exports};
}

/** PDF metadata; its dates come from the review period (the day after it ends), never from the clock. */
function pdfOptions(report: Report) {
  const {plan} = report;
  const {year, month, day} = civilFromDays(periodStartDay(plan.frequency, report.period + 1));
  return {
    title: plan.title,
    periodLabel: report.periodLabel,
    paper: plan.branding.paper,
    orientation: plan.branding.orientation,
    font: plan.branding.font,
    footer: plan.branding.footer,
    locale: plan.locale,
    tagged: plan.branding.taggedPdf,
    date: `${year}${String(month).padStart(2, '0')}${String(day).padStart(2, '0')}`,
  };
}
