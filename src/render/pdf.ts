import {accessSync, constants} from 'node:fs';
import puppeteer, {type Browser} from 'puppeteer-core';
import {escapeXml} from './svg.js';
import {addOutline, type OutlineEntry} from './pdfOutline.js';
import {parsePeriod} from '../time/period.js';
import {wordsFor} from '../words/index.js';

/**
 * HTML → PDF with headless Chromium through puppeteer-core, safe and byte-reproducible.
 *
 * Safety: JavaScript is disabled in the page and every request other than the report itself (served from
 * memory, see DOCUMENT_URL), `data:` and `about:` is aborted, so the report cannot reach the network or the file
 * system even if a template tried. Reproducibility: a new
 * page per PDF (tagged PDFs embed DOM node ids, which change when a page is reused), and `/CreationDate` and
 * `/ModDate` are rewritten in place to the given date with a same-length replacement, so xref offsets stay
 * valid and rebuilds are byte-identical; for the same reason the DOM node numbers that name the tagged structure
 * elements are replaced by their rank (see stableNodeIds).
 */
export interface PdfOptions {
  title: string;
  /** Canonical period label, e.g. `2026-10` (shown in the running header, formatted for `locale`). */
  periodLabel: string;
  paper: 'A4' | 'Letter';
  orientation: 'portrait' | 'landscape';
  font: string;
  footer: string | null;
  /** PDF CreationDate/ModDate, e.g. the day after the review period ends, as 'YYYYMMDD' */
  date: string;
  /** BCP 47 locale for the period in the running header. Default: `en-GB`. */
  locale?: string;
  /** Bookmarks, pointing at element ids the page links to. Default: none. */
  outline?: readonly OutlineEntry[];
  /** Tag the document structure for screen readers (about a third more printing time). Default: false. */
  tagged?: boolean;
}

/**
 * The address the report is served at inside the browser: answered from memory by the request handler, never
 * looked up (`.invalid` is reserved and cannot resolve, RFC 2606). Navigating to it lets Chromium parse the page
 * as a stream, about twice as fast for a large report as writing it into a blank page.
 */
const DOCUMENT_URL = 'https://report.invalid/';

export interface PdfBrowser {
  pdf(html: string, opts: PdfOptions): Promise<Uint8Array>;
  close(): Promise<void>;
}

const CANDIDATES = ['/usr/bin/chromium', '/usr/bin/chromium-browser', '/usr/bin/google-chrome'];

export const LAUNCH_ARGS = [
  '--no-sandbox',
  '--disable-gpu',
  '--disable-dev-shm-usage',
  '--font-render-hinting=none',
  '--disable-background-networking',
  '--no-first-run',
  '--disable-component-update',
  '--disable-sync',
  // Chromium 156 builds its address-bar popup (a web page of its own) at start-up even without a window: about
  // 2 s of processor time in the first seconds, taken from the analysis that runs meanwhile. Nothing prints it.
  '--disable-features=WebUIOmniboxPopup,WebUIOmniboxAimPopup,WebUIOmniboxFullPopup',
];

/** The browser to use: the given path, else EBBFLOW_CHROMIUM, CHROME_PATH, then the usual install paths. */
export function findBrowser(executable: string | null, env: NodeJS.ProcessEnv = process.env): string | null {
  const runnable = (path: string) => {
    try {
      accessSync(path, constants.X_OK);
      return true;
    } catch {
      return false;
    }
  };
  if (executable) return runnable(executable) ? executable : null;
  const listed = [env.EBBFLOW_CHROMIUM, env.CHROME_PATH].filter((p): p is string => !!p);
  return [...listed, ...CANDIDATES].find(runnable) ?? null;
}

/** Launch Chromium, or explain in one sentence why the PDF will be skipped. */
export async function openBrowser(executable: string | null): Promise<PdfBrowser | {missing: string}> {
  const path = findBrowser(executable);
  if (!path) {
    const named = executable ? `the browser named in the pack (${executable}) was not found or is not executable` : 'no Chromium or Chrome was found';
    return {
      missing: `PDF skipped: ${named}; install one with \`apt-get install chromium\`, or set EBBFLOW_CHROMIUM or the pack's browser key to its path.`,
    };
  }
  const browser = await puppeteer.launch({executablePath: path, headless: true, args: LAUNCH_ARGS});
  return {pdf: (html, opts) => printPdf(browser, html, opts), close: () => browser.close()};
}

/** The URLs a page asked for and was refused, for tests and diagnostics. */
export interface PrintRecord {
  blocked: string[];
}

export async function printPdf(browser: Browser, html: string, opts: PdfOptions, record?: PrintRecord): Promise<Uint8Array> {
  const page = await browser.newPage();
  try {
    await page.setJavaScriptEnabled(false);
    await page.setRequestInterception(true);
    let served = false;
    page.on('request', (request) => {
      const url = request.url();
      if (url === DOCUMENT_URL && !served && request.isNavigationRequest()) {
        served = true;
        void request.respond({status: 200, contentType: 'text/html; charset=utf-8', body: html});
      } else if (url.startsWith('data:') || url.startsWith('about:')) void request.continue();
      else {
        record?.blocked.push(url);
        void request.abort('blockedbyclient');
      }
    });
    await page.goto(DOCUMENT_URL, {waitUntil: 'load', timeout: 120_000});
    const bytes = await page.pdf({
      format: opts.paper,
      landscape: opts.orientation === 'landscape',
      printBackground: true,
      preferCSSPageSize: true,
      displayHeaderFooter: true,
      headerTemplate: header(opts),
      footerTemplate: footer(opts),
      margin: {top: '18mm', bottom: '16mm', left: '16mm', right: '16mm'},
      tagged: opts.tagged ?? false,
      timeout: 300_000,
    });
    const dated = fixDates(bytes, opts.date);
    return addOutline(opts.tagged ? stableNodeIds(dated) : dated, opts.outline ?? []);
  } finally {
    await page.close();
  }
}

function family(font: string): string {
  return escapeXml(font.replace(/[^A-Za-z0-9 _-]/g, ''));
}

function header(opts: PdfOptions): string {
  return (
    `<div style="font-family:'${family(opts.font)}',sans-serif;font-size:7.5px;color:#5b6168;width:100%;margin:0 16mm;display:flex;justify-content:space-between;">` +
    `<span>${escapeXml(opts.title)}</span><span>${escapeXml(periodWords(opts.periodLabel, opts.locale ?? 'en-GB'))}</span></div>`
  );
}

/** `Page 2 of 9` in the pack's language, with Chromium's page-number placeholders in place of the numbers. */
function pageOf(locale: string): string {
  const text = escapeXml(wordsFor(locale).t('label.page', {page: '\u0001', pages: '\u0002'}));
  return text.replace('\u0001', '<span class="pageNumber"></span>').replace('\u0002', '<span class="totalPages"></span>');
}

function footer(opts: PdfOptions): string {
  return (
    `<div style="font-family:'${family(opts.font)}',sans-serif;font-size:7.5px;color:#5b6168;width:100%;margin:0 16mm;display:flex;justify-content:space-between;">` +
    `<span>${escapeXml(opts.footer ?? '')}</span>` +
    `<span>${pageOf(opts.locale ?? 'en-GB')}</span></div>`
  );
}

/** A canonical period label in words for the running header: `2026-10` → `October 2026` (words module). */
export function periodWords(label: string, locale: string): string {
  const w = wordsFor(locale);
  for (const frequency of ['monthly', 'quarterly', 'weekly'] as const) {
    const index = parsePeriod(frequency, label);
    if (index !== undefined) return w.periodLong(frequency, index);
  }
  return label;
}

/**
 * Replace the clock time in `/CreationDate (D:…)` and `/ModDate (D:…)` with `date` at midnight UTC, keeping
 * the byte length, so xref offsets stay valid. Dates that are not 'YYYYMMDD' are rejected.
 */
export function fixDates(pdf: Uint8Array, date: string): Uint8Array {
  if (!/^\d{8}$/.test(date)) throw new RangeError(`invalid pdf date: ${date}`);
  const buffer = Buffer.from(pdf);
  const text = buffer.toString('latin1');
  const fixed = text.replace(/\/(CreationDate|ModDate) \(D:(\d{14})([^)]*)\)/g, (whole, key: string, stamp: string, zone: string) => {
    const replacement = `/${key} (D:${date}000000${"+00'00'".padEnd(zone.length, ' ').slice(0, zone.length)})`;
    return replacement.length === whole.length ? replacement : whole;
  });
  return new Uint8Array(Buffer.from(fixed, 'latin1'));
}

/**
 * Tagged PDFs name structure elements after DOM nodes, `/ID (node00000069)`, numbered by a counter of the
 * browser process that does not start at the same value on every run. Each number is replaced by its rank
 * among the numbers in the file, written with the same number of digits: the order (which the ID name tree
 * relies on) and every byte length stay the same, and the same document gives the same bytes.
 */
export function stableNodeIds(pdf: Uint8Array): Uint8Array {
  const text = Buffer.from(pdf).toString('latin1');
  const pattern = /\(node(\d+)\)/g;
  const numbers = [...new Set(Array.from(text.matchAll(pattern), (m) => m[1]))];
  if (numbers.length === 0) return pdf;
  numbers.sort((a, b) => (a.length - b.length) || (a < b ? -1 : a > b ? 1 : 0));
  const rank = new Map(numbers.map((n, i) => [n, String(i + 1)]));
  const fixed = text.replace(pattern, (whole, n: string) => {
    const r = rank.get(n)!;
    return r.length <= n.length ? `(node${r.padStart(n.length, '0')})` : whole;
  });
  return new Uint8Array(Buffer.from(fixed, 'latin1'));
}
