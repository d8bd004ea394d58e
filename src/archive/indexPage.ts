import {frequencyOf} from '../results/index.js';
import {parsePeriod, periodLabel} from '../time/period.js';
import {escapeHtml} from './escapeHtml.js';
import type {Headlines} from './headlines.js';
import {unreadableResults} from './messages.js';

/** At most this many series are listed per period; a line says how many more the report has. */
const MAX_ROWS = 50;

/** One archived period as the index page shows it. */
export interface IndexEntry {
  /** Folder name, the canonical period label (`2026-10`). */
  folder: string;
  /** Its headline figures, or null when missing or unreadable. */
  results: Headlines | null;
  /** Files present in the folder (top level), to decide which links to show. */
  files: string[];
}

/** Report files linked from each period, in this order, with their link text. */
const LINKS: [file: string, text: string][] = [
  ['report.html', 'Report'],
  ['report.pdf', 'PDF'],
  ['results.json', 'Results (JSON)'],
  ['manifest.json', 'Manifest'],
];

const STYLE = `body{font-family:"Liberation Sans",Arial,sans-serif;margin:2rem auto;max-width:60rem;padding:0 1rem}
body{color:#1f2a2e}
h1{font-size:1.6rem;margin-bottom:.2rem}h2{font-size:1.15rem;margin:1.6rem 0 .3rem;border-bottom:1px solid #c9d3d6}
.muted{color:#5b6a70;font-weight:normal;font-size:.9rem}.links a{margin-right:1rem}
table{border-collapse:collapse;width:100%;margin-top:.4rem}th,td{padding:.25rem .5rem;border-bottom:1px solid #e4eaec}
th{text-align:left;font-weight:600}td,th.num{text-align:right}td{font-variant-numeric:tabular-nums}`;

/**
 * The archive's index.html: every archived period of one pack, newest first, with links to its files
 * and headline figures (each visible series' value in the review period and its year-on-year change, for the
 * first 50 visible series). Self-contained (inline CSS, no script, no external resource); every text from
 * a pack or a folder name is escaped; no clock values, so the same archive gives the same bytes.
 *
 * Complexity: O(periods × series).
 */
export function renderIndex(packId: string, entries: IndexEntry[]): string {
  const sorted = [...entries].sort((a, b) => (a.folder < b.folder ? 1 : a.folder > b.folder ? -1 : 0));
  const newest = sorted.find((e) => e.results !== null)?.results ?? null;
  const title = newest?.pack.title ?? packId;
  const lang = newest?.pack.locale ?? 'en';
  const sections = sorted.map((e) => section(e)).join('\n');
  const count = `${sorted.length} period${sorted.length === 1 ? '' : 's'}`;
  return `<!DOCTYPE html>
<html lang="${escapeHtml(lang)}">
<head>
<meta charset="utf-8">
<meta name="viewport" content="width=device-width, initial-scale=1">
<title>${escapeHtml(title)}: archived packs</title>
<style>${STYLE}</style>
</head>
<body>
<h1>${escapeHtml(title)}</h1>
<p class="muted">Archived packs of <code>${escapeHtml(packId)}</code>, newest first: ${count}.</p>
${sections}
</body>
</html>
`;
}

function section(entry: IndexEntry): string {
  const r = entry.results;
  const index = r === null ? undefined : parsePeriod(frequencyOf(r.pack.frequency), entry.folder);
  const heading = r !== null && index !== undefined ? periodLabel(frequencyOf(r.pack.frequency), index) : entry.folder;
  const href = encodeURIComponent(entry.folder);
  const links = LINKS.filter(([file]) => entry.files.includes(file))
    .map(([file, text]) => `<a href="${escapeHtml(`${href}/${file}`)}">${text}</a>`)
    .join('');
  const body = r === null ? `<p class="muted">${escapeHtml(unreadableResults())}</p>` : table(r);
  return `<section id="period-${escapeHtml(entry.folder)}">
<h2>${escapeHtml(heading)} <span class="muted">${escapeHtml(entry.folder)}</span></h2>
<p class="links">${links}</p>
${body}
</section>`;
}

function table(r: Headlines): string {
  const locale = safeLocale(r.pack.locale);
  const visible = r.series.filter((s) => !s.hidden);
  const rows = visible
    .slice(0, MAX_ROWS)
    .map((s) => {
      const unit = s.unit === null ? '' : ` ${s.unit}`;
      const cells = [value(s.latest, locale) + (s.latest === null ? '' : unit), percent(s.yearOnYear, locale)];
      const tds = cells.map((c) => `<td>${escapeHtml(c)}</td>`).join('');
      return `<tr><th scope="row">${escapeHtml(s.label)}</th>${tds}</tr>`;
    })
    .join('\n');
  return `<table>
<thead><tr><th>Series</th><th class="num">Latest</th><th class="num">Year on year</th></tr></thead>
<tbody>
${rows}
</tbody>
</table>${more(visible.length - MAX_ROWS, locale)}`;
}

function more(count: number, locale: string): string {
  if (count <= 0) return '';
  const n = new Intl.NumberFormat(locale).format(count);
  return `\n<p class="muted">and ${n} more series.</p>`;
}

/** Whole numbers from 100 up, else up to two decimals; a dash when missing. */
function value(x: number | null, locale: string): string {
  if (x === null) return '–';
  return new Intl.NumberFormat(locale, {maximumFractionDigits: Math.abs(x) >= 100 ? 0 : 2}).format(x);
}

function percent(x: number | null, locale: string): string {
  if (x === null) return '–';
  const options = {minimumFractionDigits: 1, maximumFractionDigits: 1, signDisplay: 'exceptZero'} as const;
  return `${new Intl.NumberFormat(locale, options).format(x)}%`;
}

/** The pack's locale when Intl knows it, else `en-GB` (an archive written elsewhere may name any tag). */
function safeLocale(locale: string): string {
  try {
    return Intl.NumberFormat.supportedLocalesOf([locale]).length > 0 ? locale : 'en-GB';
  } catch {
    return 'en-GB';
  }
}
