import {loadPlan, portablePlan, salvagePlan} from './config/index.js';
import type {OutputFormat, Plan} from './config/plan.js';
import {ingest} from './ingest/index.js';
import {derive} from './derive/index.js';
import type {Dataset} from './ingest/types.js';
import {checkFormulas, deriveFormulas} from './derive/formulas/index.js';
import {analyseAll, analysisThreads} from './analyse/index.js';
import {combine, type Combined} from './combine/index.js';
import type {SeriesAnalysis} from './analyse/types.js';
import {digestOf, type History} from './results/index.js';
import {loadHistory} from './history/index.js';
import {narrate} from './narrate/index.js';
// The render modules are imported one by one: these three are light, and load the chart, browser and workbook
// libraries only for packs that ask for HTML, PDF or XLSX (a JSON-only build starts about a second sooner).
import {render} from './render/render.js';
import {pdfSession, type PdfSession} from './render/pdfSession.js';
import {chartPrefetch} from './render/chartPrefetch.js';
import type {Report} from './render/types.js';
import {archive, refuseExisting} from './archive/index.js';
import {formatPeriod} from './time/period.js';
import {wordNote, wordsFor} from './words/index.js';
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
  /** Threads at once for the analysis (the main thread counts as one while it draws charts). */
  jobs: number;
  /** Folders outside the pack's own that its files may come from (`--allow-dir`). */
  allowDirs?: string[];
  /** The browsers of a batch (see {@link pdfSession}); without one, the build opens and closes its own. */
  pdf?: PdfSession;
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
 * One pack, one period, stage by stage:
 *
 *   pack.yaml ─► config ─► ingest ─► derive ─► analyse ─► combine ─► history ─► narrate ─► render ─► archive
 *             ─► out/<pack>/<period>/
 *
 * Two things overlap the analysis: the browser starts (when a PDF is wanted) and each series' charts are drawn on
 * the main thread as soon as its analysis arrives (when HTML or PDF is wanted).
 */
export async function build(request: BuildRequest, log: Logger): Promise<BuildSummary> {
  const {packFile, period, outDir, formats, allowDirs} = request;
  log.stage?.('config');
  const loaded = await loadPlan(packFile, {period, outDir, formats, allowDirs});
  const {data, ratios, count} = await readData(loaded, log);
  const plan: Plan = {...loaded, series: data.plans}; // `fromSource` entries expanded, formula kinds resolved
  const periodLabel = formatPeriod(plan.frequency, data.period);
  await refuseExisting(plan.outDir, plan.id, periodLabel, request.force);
  log.info(`${plan.id} ${periodLabel}: ${count} series read`);
  const session = request.pdf ?? pdfSession();
  try {
    if (plan.formats.includes('pdf')) session.warm(plan.browser);
    const charts = plan.formats.includes('html') || plan.formats.includes('pdf') ? chartPrefetch(plan) : null;
    const threads = analysisThreads(request.jobs, charts !== null);
    log.stage?.('analyse');
    const separate = await analyseAll(plan, data, {threads, log, onResult: charts?.add});
    log.stage?.('combine');
    const combined = combine(plan, data, separate, ratios);
    const analyses = combined.analyses;
    log.stage?.('history');
    const digest = digestOf(plan, periodLabel, analyses);
    const {revisionPct} = plan.thresholds;
    const history = await loadHistory(plan.outDir, plan.id, periodLabel, plan.frequency, digest, revisionPct);
    log.stage?.('narrate');
    const report = narrated(plan, data, combined, history);
    log.stage?.('render');
    const rendered = await render(report, {charts: (await charts?.drawn()) ?? new Map(), session});
    log.stage?.('archive');
    const written = await archive({
      report,
      html: rendered.html,
      pdf: rendered.pdf,
      exports: rendered.exports,
      digest,
      outDir: plan.outDir,
      force: request.force,
      plan: portablePlan(plan),
      warnings: runWarnings(plan, analyses),
      log,
    });
    log.info(`${plan.id} ${periodLabel}: written to ${written.folder}`);
    const {folder, outputs} = written;
    return {packId: plan.id, period: periodLabel, folder, outputs, pdfSkipped: rendered.pdfSkipped};
  } finally {
    if (!request.pdf) await session.close();
  }
}

/**
 * Ingest and derive: the series and ratios of the pack and how many series the sources gave. In a function of its
 * own so that ingest's period stores (150 MB for 10,000 series) are garbage once the series are made, not held by
 * the build's frame to the end.
 */
async function readData(loaded: Plan, log: Logger) {
  log.stage?.('ingest');
  const rows = await ingest(loaded);
  log.stage?.('derive');
  const read = derive(loaded, rows);
  return {...deriveFormulas(loaded, read), count: read.series.length};
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
      data = derive(plan, await ingest(plan));
      const formulas = checkFormulas(plan, data.plans);
      if (!formulas.ok) throw new InputError(formulas.problems);
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

/** The narrate stage: callouts for the pack and each series, gathered with everything render needs. */
function narrated(plan: Plan, data: Dataset, combined: Combined, history: History | null): Report {
  const analyses = combined.analyses;
  const narration = narrate({
    plan,
    period: data.period,
    series: plan.series.map((s, i) => ({plan: s, analysis: analyses[i]})),
    history,
    combined,
  });
  return {
    plan,
    period: data.period,
    periodLabel: formatPeriod(plan.frequency, data.period),
    toolVersion,
    series: plan.series.map((s, i) => ({
      plan: s,
      analysis: analyses[i],
      callouts: narration.bySeries.get(s.id) ?? [],
      commentary: narration.paragraphs.get(s.id) ?? '',
      combination: combined.series.get(s.id) ?? null,
    })),
    callouts: narration.pack,
    commentary: narration.opening,
    inputs: data.inputs,
    notes: [...data.notes, ...combined.notes],
    history,
    groups: combined.groups,
  };
}

/** What the manifest lists as the run's warnings: each series' notes in the pack's language, prefixed with its id. */
function runWarnings(plan: Plan, analyses: SeriesAnalysis[]): string[] {
  const words = wordsFor(plan.locale);
  return analyses.flatMap((a) =>
    [a.notAdjustedReason ?? [], a.notes, a.forecast?.notes ?? []].flat().map((note) => `${a.id}: ${wordNote(words, note)}`),
  );
}

export {InputError};
