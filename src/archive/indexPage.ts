import {readFileSync} from 'node:fs';
import {join} from 'node:path';
import {frequencyOf} from '../results/index.js';
import {parsePeriod, periodLabel} from '../time/period.js';
import {packageRoot} from '../version.js';
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

/** The index page's view model: plain JSON, every text already formatted. */
interface IndexView {
  lang: string;
  title: string;
  packId: string;
  count: string;
  periods: {
    folder: string;
    heading: string;
    links: {href: string; text: string}[];
    /** Null when the period's figures could not be read (`unreadable` is shown instead). */
    rows: {label: string; latest: string; yearOnYear: string}[] | null;
    more: string | null;
    unreadable: string;
  }[];
}

let compiled: HandlebarsTemplateDelegate<IndexView> | null = null;

/**
 * The archive's index.html: every archived period of one pack, newest first, with links to its files
 * and headline figures (each visible series' value in the review period and its year-on-year change, for the
 * first 50 visible series). Drawn from `templates/index.hbs` by handlebars, as the report is (its own
 * environment, strict, no helpers), so every text from a pack or a folder name is escaped. Self-contained (inline
 * CSS, no script, no external resource); no clock values, so the same archive gives the same bytes.
 * Handlebars loads on first use, so commands that write no index (`check`) do not pay for it.
 *
 * Complexity: O(periods × series).
 */
export async function renderIndex(packId: string, entries: IndexEntry[]): Promise<string> {
  if (compiled === null) {
    const {default: Handlebars} = await import('handlebars');
    const source = readFileSync(join(packageRoot(), 'templates', 'index.hbs'), 'utf8');
    compiled = Handlebars.create().compile<IndexView>(source, {strict: true, knownHelpersOnly: true});
  }
  return compiled(indexView(packId, entries));
}

function indexView(packId: string, entries: IndexEntry[]): IndexView {
  const sorted = [...entries].sort((a, b) => (a.folder < b.folder ? 1 : a.folder > b.folder ? -1 : 0));
  const newest = sorted.find((e) => e.results !== null)?.results ?? null;
  return {
    lang: newest?.pack.locale ?? 'en',
    title: newest?.pack.title ?? packId,
    packId,
    count: `${sorted.length} period${sorted.length === 1 ? '' : 's'}`,
    periods: sorted.map(periodView),
  };
}

function periodView(entry: IndexEntry): IndexView['periods'][number] {
  const r = entry.results;
  const index = r === null ? undefined : parsePeriod(frequencyOf(r.pack.frequency), entry.folder);
  const heading = r !== null && index !== undefined ? periodLabel(frequencyOf(r.pack.frequency), index) : entry.folder;
  const href = encodeURIComponent(entry.folder);
  const links = LINKS.filter(([file]) => entry.files.includes(file)).map(([file, text]) => ({
    href: `${href}/${file}`,
    text,
  }));
  const base = {folder: entry.folder, heading, links, unreadable: unreadableResults()};
  if (r === null) return {...base, rows: null, more: null};
  const locale = safeLocale(r.pack.locale);
  const visible = r.series.filter((s) => !s.hidden);
  const rows = visible.slice(0, MAX_ROWS).map((s) => ({
    label: s.label,
    latest: value(s.latest, locale) + (s.latest === null || s.unit === null ? '' : ` ${s.unit}`),
    yearOnYear: percent(s.yearOnYear, locale),
  }));
  return {...base, rows, more: more(visible.length - MAX_ROWS, locale)};
}

function more(count: number, locale: string): string | null {
  if (count <= 0) return null;
  return `and ${new Intl.NumberFormat(locale).format(count)} more series.`;
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
