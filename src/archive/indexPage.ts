import {readFileSync} from 'node:fs';
import {join} from 'node:path';
import {frequencyOf} from '../results/index.js';
import {parsePeriod} from '../time/period.js';
import {packageRoot} from '../version.js';
import {wordsFor, type MessageKey, type Words} from '../words/index.js';
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

/** The index page's view model: plain JSON, every text already worded and formatted. */
interface IndexView {
  lang: string;
  title: string;
  pageTitle: string;
  intro: string;
  headers: {series: string; latest: string; yearOnYear: string};
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
 * first 50 visible series), worded and formatted in the newest pack's language and locale. Drawn from
 * `templates/index.hbs` by handlebars, as the report is (its own environment, strict, no helpers), so every text
 * from a pack or a folder name is escaped. Self-contained (inline CSS, no script, no external resource); no clock
 * values, so the same archive gives the same bytes. Handlebars loads on first use, so commands that write no index
 * (`check`) do not pay for it.
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
  const title = newest?.pack.title ?? packId;
  const w = wordsFor(newest?.pack.locale ?? 'en-GB');
  return {
    lang: w.locale,
    title,
    pageTitle: w.t('index.title', {title}),
    intro: w.t('index.intro', {pack: packId, count: sorted.length}),
    headers: {series: w.t('label.series'), latest: w.t('label.latest'), yearOnYear: w.t('index.yoy')},
    periods: sorted.map((e) => periodView(e, w)),
  };
}

function periodView(entry: IndexEntry, w: Words): IndexView['periods'][number] {
  const r = entry.results;
  const index = r === null ? undefined : parsePeriod(frequencyOf(r.pack.frequency), entry.folder);
  const heading = r !== null && index !== undefined ? w.periodLong(frequencyOf(r.pack.frequency), index) : entry.folder;
  const href = encodeURIComponent(entry.folder);
  const links = LINKS.filter(([file]) => entry.files.includes(file)).map(([file, text]) => ({
    href: `${href}/${file}`,
    text: w.t(text),
  }));
  const base = {folder: entry.folder, heading, links, unreadable: unreadableResults()};
  if (r === null) return {...base, rows: null, more: null};
  const visible = r.series.filter((s) => !s.hidden);
  const rows = visible.slice(0, MAX_ROWS).map((s) => ({
    label: s.label,
    latest: s.latest === null ? '–' : w.value(s.latest, s.unit),
    yearOnYear: s.yearOnYear === null ? '–' : w.percent(s.yearOnYear),
  }));
  const more = visible.length - MAX_ROWS;
  return {...base, rows, more: more > 0 ? w.t('index.more', {n: w.number(more, 0)}) : null};
}
