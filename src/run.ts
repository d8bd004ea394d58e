import {loadPlan, portablePlan, salvagePlan} from './config/index.js';
import type {OutputFormat, Plan} from './config/plan.js';
import {ingest} from './ingest/index.js';
import type {Dataset} from './ingest/types.js';
import {analyseAll} from './analyse/index.js';
import {narrate} from './narrate/index.js';
import type {PdfBrowser} from './render/index.js';
import {exportTables} from './render/exports.js';
import {toResults} from './render/results.js';
import {archive, loadHistory, refuseExisting} from './archive/index.js';
import type {Report} from './render/types.js';
import type {SeriesAnalysis} from './analyse/types.js';
import type {History} from './archive/types.js';
import {formatPeriod, periodStartDay, civilFromDays} from './time/period.js';
import {toolVersion} from './version.js';
import {InputError, formatProblem, type Problem} from './errors.js';
import type {Logger} from './log.js';

export interface BuildRequest {
  packFile: string;
  /** Single period label; ranges are expanded by the CLI. */
  period?: string;
  outDir?: string;
  formats?: OutputFormat[];
  force: boolean;
  /** Worker threads for the analyse stage. */
  jobs: number;
  /** Folders outside the pack's own that its files may come from (`--allow-dir`). */
  allowDirs?: string[];
  /** A browser already open (batch builds reuse one); otherwise one is opened and closed here. */
  browser?: PdfBrowser | {missing: string} | null;
}

export interface BuildSummary {
  packId: string;
  period: string;
  folder: string;
  outputs: string[];
  /** Why the PDF was not written, or null. Not logged here: the caller says it once for a batch. */
  pdfSkipped: string | null;
}

/**
 * One pack, one period:
 *
 *   pack.yaml ─► loadPlan ─► ingest ─► analyse ─► narrate ─► render ─► archive ─► out/<pack>/<period>/
 */
export async function build(request: BuildRequest, log: Logger): Promise<BuildSummary> {
  log.stage?.('config');
  const loaded = await loadPlan(request.packFile, {
    period: request.period,
    outDir: request.outDir,
    formats: request.formats,
    allowDirs: request.allowDirs,
  });
  log.stage?.('ingest');
  const data = await ingest(loaded);
  // The plan as used: `fromSource` entries expanded into the series ingest found.
  const plan: Plan = {...loaded, series: data.plans};
  const periodLabel = formatPeriod(plan.frequency, data.period);
  await refuseExisting(plan.outDir, plan.id, periodLabel, request.force);
  log.info(`${plan.id} ${periodLabel}: ${data.series.length} series read`);
  const wantPdf = plan.formats.includes('pdf');
  // A browser of our own starts now, while the series are analysed, and is closed whatever happens next.
  // Settled at once into a value or an error, so a failed launch cannot go unhandled while the analysis runs.
  const launch = async () => (await import('./render/pdf.js')).openBrowser(plan.browser);
  const ownBrowser = wantPdf && !request.browser ? settle(launch()) : null;
  let html: string | null;
  let report: Report;
  let pdf: Uint8Array | null = null;
  let pdfSkipped: string | null = null;
  try {
    // Charts of each series are drawn as soon as its analysis arrives, while the pool works on the others.
    const wantCharts = plan.formats.includes('html') || wantPdf;
    const drawn = new Map<string, string>();
    let drawing: Promise<void> = Promise.resolve();
    const drawAhead = (index: number, analysis: SeriesAnalysis) => {
      drawing = drawing
        .then(async () => (await import('./render/html.js')).drawSeriesCharts(plan, plan.series[index], analysis, drawn))
        // A chart that fails here is drawn again by renderHtml, which reports the failure in its place.
        .catch(() => undefined);
    };
    const onResult = wantCharts ? drawAhead : undefined;
    log.stage?.('analyse');
    const analyses = await analyseAll(plan, data, {jobs: request.jobs, log, onResult, drawing: wantCharts});
    await drawing;
    log.stage?.('history');
    const draft = () => toResults(assemble(plan, data, analyses, null));
    const {revisionPct} = plan.thresholds;
    const history = await loadHistory(plan.outDir, plan.id, periodLabel, plan.frequency, draft, revisionPct);
    report = assemble(plan, data, analyses, history);
    // The chart and browser libraries load only for packs that draw (about a second of start-up).
    const draw = async () => (await import('./render/html.js')).renderHtml(report, drawn);
    log.stage?.('render');
    html = plan.formats.includes('html') || wantPdf ? await draw() : null;
    if (wantPdf && html) {
      const browser = request.browser ?? unwrap((await ownBrowser)!);
      if ('missing' in browser) pdfSkipped = browser.missing;
      else {
        log.stage?.('pdf');
        const outline = (await import('./render/view.js')).reportOutline(report);
        pdf = await browser.pdf(html, {...pdfOptions(plan, data.period, periodLabel), outline});
      }
    }
  } finally {
    const launched = await ownBrowser;
    if (launched && 'value' in launched && !('missing' in launched.value)) await launched.value.close();
  }
  log.stage?.('exports');
  const exports: {name: string; content: string | Uint8Array}[] = [];
  if (plan.formats.includes('csv') || plan.formats.includes('xlsx')) {
    const tables = exportTables(report);
    if (plan.formats.includes('csv')) exports.push(...tables.csv);
    if (plan.formats.includes('xlsx')) exports.push({name: 'tables.xlsx', content: await tables.xlsx()});
  }

  log.stage?.('archive');
  const written = await archive({
    report,
    html: plan.formats.includes('html') ? html : null,
    pdf,
    exports,
    outDir: plan.outDir,
    force: request.force,
    plan: portablePlan(plan),
    warnings: report.series.map((s) => s.analysis).flatMap((a) =>
      [a.notAdjustedReason ?? [], a.notes, a.forecast?.notes ?? []].flat().map((note) => `${a.id}: ${note}`),
    ),
    log,
  });
  log.info(`${plan.id} ${periodLabel}: written to ${written.folder}`);
  return {packId: plan.id, period: periodLabel, folder: written.folder, outputs: written.outputs, pdfSkipped};
}

/**
 * Validate config and data, build nothing. Throws one InputError listing every problem: when the pack itself has
 * problems, the data is still read through a salvaged plan (see `salvagePlan`) so CSV problems show in the same run.
 */
export async function check(packFile: string, log: Logger, allowDirs: string[] = []): Promise<void> {
  let plan: Plan | null;
  const problems: Problem[] = [];
  try {
    plan = await loadPlan(packFile, {allowDirs});
  } catch (e) {
    if (!(e instanceof InputError)) throw e;
    problems.push(...e.problems);
    plan = await salvagePlan(packFile, {allowDirs});
  }
  let data: Dataset | null = null;
  if (plan) {
    try {
      data = await ingest(plan);
    } catch (e) {
      if (!(e instanceof InputError)) throw e;
      const seen = new Set(problems.map(formatProblem));
      problems.push(...e.problems.filter((p) => !seen.has(formatProblem(p))));
    }
  }
  if (problems.length > 0) throw new InputError(problems);
  if (plan && data) {
    log.info(`${packFile}: ${data.series.length} series, review period ${formatPeriod(plan.frequency, data.period)}, no problems`);
  }
}

type Settled<T> = {value: T} | {error: unknown};

function settle<T>(promise: Promise<T>): Promise<Settled<T>> {
  return promise.then(
    (value) => ({value}),
    (error: unknown) => ({error}),
  );
}

function unwrap<T>(settled: Settled<T>): T {
  if ('error' in settled) throw settled.error;
  return settled.value;
}

function assemble(plan: Plan, data: Dataset, analyses: SeriesAnalysis[], history: History | null): Report {
  const narration = narrate({
    plan,
    period: data.period,
    series: plan.series.map((s, i) => ({plan: s, analysis: analyses[i]})),
    history,
  });
  return {
    plan,
    period: data.period,
    periodLabel: formatPeriod(plan.frequency, data.period),
    toolVersion,
    series: plan.series.map((s, i) => ({plan: s, analysis: analyses[i], callouts: narration.bySeries.get(s.id) ?? []})),
    callouts: narration.pack,
    inputs: data.inputs,
    notes: data.notes,
    history,
  };
}

/** PDF dates come from the review period (the day after it ends), never from the clock. */
function pdfOptions(plan: Plan, period: number, periodLabel: string) {
  const {year, month, day} = civilFromDays(periodStartDay(plan.frequency, period + 1));
  return {
    title: plan.title,
    periodLabel,
    paper: plan.branding.paper,
    orientation: plan.branding.orientation,
    font: plan.branding.font,
    footer: plan.branding.footer,
    locale: plan.locale,
    tagged: plan.branding.taggedPdf,
    date: `${year}${String(month).padStart(2, '0')}${String(day).padStart(2, '0')}`,
  };
}

export {InputError};
