import {frequencyOf} from '../results/index.js';
import {parsePeriod} from '../time/period.js';
import {wordsFor, type MessageKey, type Words} from '../words/index.js';
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

/** Report files linked from each period, in this order, with the message of their link text. */
const LINKS: [file: string, text: MessageKey][] = [
  ['report.html', 'index.report'],
  ['report.pdf', 'index.pdf'],
  ['results.json', 'index.results'],
  ['manifest.json', 'index.manifest'],
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
 * first 50 visible series), worded and formatted in the newest pack's language and locale. Self-contained (inline CSS, no script, no external resource); every text from
 * a pack or a folder name is escaped; no clock values, so the same archive gives the same bytes.
 *
 * Complexity: O(periods × series).
 */
export function renderIndex(packId: string, entries: IndexEntry[]): string {
  const sorted = [...entries].sort((a, b) => (a.folder < b.folder ? 1 : a.folder > b.folder ? -1 : 0));
  const newest = sorted.find((e) => e.results !== null)?.results ?? null;
  const title = newest?.pack.title ?? packId;
  const w = wordsFor(newest?.pack.locale ?? 'en-GB');
  const lang = w.locale;
  const sections = sorted.map((e) => section(e, w)).join('\n');
  return `<!DOCTYPE html>
<html lang="${escapeHtml(lang)}">
<head>
<meta charset="utf-8">
<meta name="viewport" content="width=device-width, initial-scale=1">
<title>${escapeHtml(w.t('index.title', {title}))}</title>
<style>${STYLE}</style>
</head>
<body>
<h1>${escapeHtml(title)}</h1>
<p class="muted">${escapeHtml(w.t('index.intro', {pack: packId, count: sorted.length}))}</p>
${sections}
</body>
</html>
`;
}

function section(entry: IndexEntry, w: Words): string {
  const r = entry.results;
  const index = r === null ? undefined : parsePeriod(frequencyOf(r.pack.frequency), entry.folder);
  const heading = r !== null && index !== undefined ? w.periodLong(frequencyOf(r.pack.frequency), index) : entry.folder;
  const href = encodeURIComponent(entry.folder);
  const links = LINKS.filter(([file]) => entry.files.includes(file))
    .map(([file, text]) => `<a href="${escapeHtml(`${href}/${file}`)}">${escapeHtml(w.t(text))}</a>`)
    .join('');
  const body = r === null ? `<p class="muted">${escapeHtml(unreadableResults())}</p>` : table(r, w);
  return `<section id="period-${escapeHtml(entry.folder)}">
<h2>${escapeHtml(heading)} <span class="muted">${escapeHtml(entry.folder)}</span></h2>
<p class="links">${links}</p>
${body}
</section>`;
}

function table(r: Headlines, w: Words): string {
  const visible = r.series.filter((s) => !s.hidden);
  const rows = visible
    .slice(0, MAX_ROWS)
    .map((s) => {
      const cells = [s.latest === null ? '–' : w.value(s.latest, s.unit), s.yearOnYear === null ? '–' : w.percent(s.yearOnYear)];
      const tds = cells.map((c) => `<td>${escapeHtml(c)}</td>`).join('');
      return `<tr><th scope="row">${escapeHtml(s.label)}</th>${tds}</tr>`;
    })
    .join('\n');
  const head = [w.t('label.series'), w.t('label.latest'), w.t('index.yoy')].map(escapeHtml);
  const more = visible.length - MAX_ROWS;
  return `<table>
<thead><tr><th>${head[0]}</th><th class="num">${head[1]}</th><th class="num">${head[2]}</th></tr></thead>
<tbody>
${rows}
</tbody>
</table>${more > 0 ? `\n<p class="muted">${escapeHtml(w.t('index.more', {n: w.number(more, 0)}))}</p>` : ''}`;
}
