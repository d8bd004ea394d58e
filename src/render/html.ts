import {existsSync, readdirSync, readFileSync, statSync} from 'node:fs';
import {join} from 'node:path';
import Handlebars from 'handlebars';
import {imageMatches, imageTypeOf} from '../config/image.js';
import {packageRoot} from '../version.js';
import type {Report} from './types.js';
import type {SeriesAnalysis} from '../analyse/types.js';
import type {Plan, SeriesPlan} from '../config/plan.js';
import {wordsFor} from '../words/index.js';
import {buildView, pageGeometry, seriesFigureSlots, type FigureSlot} from './view/index.js';
import {specToSvg} from './svg.js';
import {themeFor, type Theme} from './theme.js';

/**
 * Report → one self-contained HTML file: charts drawn to inline SVG, CSS inlined, logo as a data: URI,
 * no script and no network reference. Templates are handlebars files under `templates/`; a pack may name a
 * folder (`branding.templates`) whose files replace ours by relative path (`report.hbs`, `styles.css`,
 * `partials/<name>.hbs`) or add partials.
 *
 * Escaping: templates print with `{{…}}` only, so every string from the pack or the data is HTML-escaped;
 * the only unescaped inserts are our own SVG and CSS, passed as `SafeString`. Templates compile in strict
 * mode with known helpers only, so a misspelt field fails the build instead of printing nothing.
 */
export async function renderHtml(report: Report, drawn: ReadonlyMap<string, string> = new Map()): Promise<string> {
  const files = templateFiles(report.plan.branding.templates);
  const env = Handlebars.create();
  for (const [name, source] of files.partials) env.registerPartial(name, source);
  const view = buildView(report, inlineLogo(report.plan.branding.logo));
  const slots: FigureSlot[] = [...view.series.flatMap((s) => s.rows.flat()), ...(view.history?.chart ? [view.history.chart] : [])];
  const font = report.plan.branding.font;
  for (const slot of slots) {
    const {title, spec} = slot.chart;
    const description = typeof spec.description === 'string' ? spec.description : title;
    const svg = drawn.get(chartKey(slot, view.locale, font)) ?? (await drawSlot(slot, view.locale, font));
    slot.svg = new Handlebars.SafeString(svg);
    slot.alt = `${title}. ${description}`;
  }
  const theme = themeFor(report.plan.branding.accent, report.plan.branding.font);
  const css = pageCss(report, theme) + files.css;
  const template = env.compile(files.report, {strict: true, knownHelpersOnly: true});
  // `</` cannot end the style element early: CSS never needs it, so it is neutralised.
  // Sparklines are our own SVG, built from numbers only.
  const summary = view.summary.map((row) => ({...row, spark: new Handlebars.SafeString(row.spark)}));
  return template({...view, summary, css: new Handlebars.SafeString(css.replace(/<\//g, '<\\/'))});
}

/**
 * Draw the charts of one series ahead of the report into `into` (keyed by {@link chartKey}), for `renderHtml` to
 * pick up: the build calls this as each series' analysis arrives, so drawing overlaps the analysis of the others.
 */
export async function drawSeriesCharts(
  plan: Plan,
  series: SeriesPlan,
  analysis: SeriesAnalysis,
  into: Map<string, string>,
): Promise<void> {
  if (series.hidden) return;
  const lang = wordsFor(plan.locale).locale;
  for (const slot of seriesFigureSlots(plan, series, analysis)) {
    into.set(chartKey(slot, lang, plan.branding.font), await drawSlot(slot, lang, plan.branding.font));
    // Drawing settles in promise callbacks only; a turn of the event loop between charts lets the analysis
    // threads' finished results in, so that they get their next series without waiting for the drawing.
    await new Promise((resolve) => setImmediate(resolve));
  }
}

/** Everything a chart's drawing depends on, so a chart drawn ahead is used only for the very same chart. */
function chartKey(slot: FigureSlot, lang: string, font: string): string {
  return JSON.stringify([slot.chart.id, slot.chart.title, lang, font, slot.chart.spec]);
}

function drawSlot(slot: FigureSlot, lang: string, font: string): Promise<string> {
  const {title, spec} = slot.chart;
  return specToSvg(spec, {
    locale: lang,
    font,
    idPrefix: slot.chart.id,
    title,
    description: typeof spec.description === 'string' ? spec.description : title,
    // In the page the chart is one image named by its wrapper; the drawing itself is hidden from assistive
    // technology, which also keeps the tagged PDF from describing every tick and line (about 15% of its time).
    hidden: true,
  });
}

interface TemplateFiles {
  report: string;
  css: string;
  partials: Map<string, string>;
}

/** Built-in templates, with any file of the same relative path in `overrideDir` taking its place. */
export function templateFiles(overrideDir: string | null): TemplateFiles {
  const builtIn = join(packageRoot(), 'templates');
  const read = (rel: string) => {
    const custom = overrideDir ? join(overrideDir, rel) : null;
    return readFileSync(custom && existsSync(custom) ? custom : join(builtIn, rel), 'utf8');
  };
  const partials = new Map<string, string>();
  for (const dir of [join(builtIn, 'partials'), ...(overrideDir ? [join(overrideDir, 'partials')] : [])]) {
    if (!existsSync(dir) || !statSync(dir).isDirectory()) continue;
    for (const file of readdirSync(dir).sort()) {
      if (file.endsWith('.hbs')) partials.set(file.slice(0, -4), readFileSync(join(dir, file), 'utf8'));
    }
  }
  return {report: read('report.hbs'), css: read('styles.css'), partials};
}

/** `@page` size and the colour variables, generated from the plan (values are validated colours and sizes). */
function pageCss(report: Report, theme: Theme): string {
  const {paper, orientation} = report.plan.branding;
  const family = theme.font.replace(/[^A-Za-z0-9 _-]/g, '');
  const [w, h] = paper === 'A4' ? [210, 297] : [215.9, 279.4];
  // Page height less the 18 + 16 mm print margins and a little slack, so the cover never spills over.
  const coverMm = Math.floor((orientation === 'portrait' ? h : w) - 34 - 5);
  return (
    `@page { size: ${paper} ${orientation}; }\n` +
    `.cover { height: ${coverMm}mm; }\n` +
    `:root { --accent: ${theme.accent}; --deep: ${theme.deep}; --tint: ${theme.tint}; --wash: ${theme.wash}; ` +
    `--contrast: ${theme.contrast}; --contrast-tint: ${theme.contrastTint}; --ink: ${theme.ink}; --muted: ${theme.muted}; ` +
    `--rule: ${theme.rule}; --font: '${family}'; --content-width: ${pageGeometry(paper, orientation).width}px; }\n`
  );
}

/**
 * The logo as a base64 data: URI for an `<img>` element. An SVG logo is only ever shown through `<img>`,
 * where browsers run no script and load nothing external; the content check (shared with the config
 * cross-check, which reports it as a pack problem) is repeated here in case the file changed since.
 */
export function inlineLogo(path: string | null): string | null {
  if (!path) return null;
  const type = imageTypeOf(path);
  if (!type) throw new Error(`unsupported logo type: ${path}`);
  const bytes = readFileSync(path);
  if (!imageMatches(type, bytes)) throw new Error(`logo content does not match its extension: ${path}`);
  return `data:${type};base64,${bytes.toString('base64')}`;
}
