import path from 'node:path';
import type {Frequency} from '../time/period.js';
import {defaultConfig, defaultHorizon, defaultStlSeasonalWindow, type AnalysisDefaults} from './defaults.js';
import {mergeDefined} from './merge.js';
import type {AnalysisOptions, FromSourcePlan, OutputFormat, Plan, SeriesPlan, SourcePlan} from './plan.js';
import type {AnalysisConfig, PackConfig} from './schema.js';
import {slugify} from './slug.js';

/** What `normalize` needs besides the validated pack. */
export interface NormalizeContext {
  /** Absolute path of the pack file. */
  packFile: string;
  /** Review period index, already parsed (null = last period with data). */
  period: number | null;
  /** Absolute output folder, already chosen (CLI, pack or default). */
  outDir: string;
  /** Formats from the command line, or undefined to use the pack's. */
  formats: OutputFormat[] | undefined;
  /** 1-based pack-file line of a data path. */
  lineOf: (p: PropertyKey[]) => number;
  /** Folders the pack may read (its own and `--allow-dir`), symlinks resolved: what a DuckDB query may open. */
  readFolders: string[];
}

/** Keep only the analysis blocks of a series entry. */
function analysisPart(entry: AnalysisConfig): AnalysisConfig {
  const {decomposition, calendar, outliers, forecast, cycle} = entry;
  return {decomposition, calendar, outliers, forecast, cycle};
}

/** Fill the defaults that depend on the frequency or on the chosen method. */
export function resolveAnalysis(merged: AnalysisDefaults, frequency: Frequency): AnalysisOptions {
  const d = merged.decomposition;
  const seasonalWindow = d.seasonalWindow ?? (d.method === 'classical' ? 'periodic' : defaultStlSeasonalWindow);
  return {
    decomposition: {...d, seasonalWindow},
    calendar: {...merged.calendar, holidays: [...merged.calendar.holidays]},
    outliers: {...merged.outliers},
    forecast: {
      ...merged.forecast,
      horizon: merged.forecast.horizon ?? defaultHorizon[frequency],
      levels: [...merged.forecast.levels],
    },
    cycle: {...merged.cycle},
  };
}

/** Resolve a path written in the pack relative to the pack file's folder; null stays null. */
function fromPack(packDir: string, p: string | null | undefined): string | null {
  return p === undefined || p === null ? null : path.resolve(packDir, p);
}

/** The source keys for data as exported (header row, dates, workbooks, queries), defaulted. */
function exportedAs(s: PackConfig['sources'][number], readFolders: string[]) {
  const reader: SourcePlan['reader'] = s.query ? (s.engine ?? 'duckdb') : /\.xlsx$/i.test(s.file ?? '') ? 'xlsx' : 'csv';
  return {
    reader,
    headerRow: s.headerRow ?? defaultConfig.source.headerRow,
    dateFormat: s.dateFormat ?? null,
    timeZone: s.timeZone ?? defaultConfig.source.timeZone,
    emptyMeans: s.emptyMeans ?? defaultConfig.source.emptyMeans,
    sheet: s.sheet ?? null,
    query: s.query ?? null,
    connectionEnv: s.connection?.env ?? null,
    timeoutSeconds: s.timeoutSeconds ?? defaultConfig.source.timeoutSeconds,
    readFolders: reader === 'duckdb' ? [...readFolders] : [],
  };
}

/**
 * Validated pack → fully-defaulted `Plan`: defaults merged (defaultConfig → `defaults:` → each series),
 * frequency-dependent defaults filled, paths made absolute. Pure apart from `path.resolve`.
 */
export function normalize(cfg: PackConfig, ctx: NormalizeContext): Plan {
  const packDir = path.dirname(ctx.packFile);
  const {pack} = cfg;
  const frequency = pack.frequency;
  const packDefaults = mergeDefined(defaultConfig.analysis, cfg.defaults);
  const analysisFor = (entry: AnalysisConfig) =>
    resolveAnalysis(mergeDefined(packDefaults, analysisPart(entry)), frequency);

  const sources: SourcePlan[] = cfg.sources.map((s, i) => ({
    id: s.id,
    file: path.resolve(packDir, s.file ?? path.basename(ctx.packFile)),
    layout: s.layout ?? defaultConfig.source.layout,
    dateColumn: s.dateColumn ?? defaultConfig.source.dateColumn,
    keyColumn: s.keyColumn ?? null,
    valueColumn: s.valueColumn ?? null,
    delimiter: s.delimiter ?? defaultConfig.source.delimiter,
    decimal: s.decimal ?? defaultConfig.source.decimal,
    encoding: s.encoding ?? defaultConfig.source.encoding,
    line: ctx.lineOf(['sources', i]),
    ...exportedAs(s, ctx.readFolders),
  }));

  const series: SeriesPlan[] = [];
  const fromSource: FromSourcePlan[] = [];
  cfg.series.forEach((entry, i) => {
    const common = {
      unit: entry.unit ?? defaultConfig.series.unit,
      kind: entry.kind ?? defaultConfig.series.kind,
      better: ('better' in entry ? entry.better : null) ?? defaultConfig.series.better,
      formula: null,
      hidden: entry.hidden ?? defaultConfig.series.hidden,
      aggregate: ('aggregate' in entry ? entry.aggregate : null) ?? null,
      analysis: analysisFor(entry),
      line: ctx.lineOf(['series', i]),
    };
    if ('fromSource' in entry) {
      fromSource.push({
        source: entry.fromSource,
        template: {...common, source: entry.fromSource, target: null},
        position: series.length,
        line: common.line,
      });
    } else if ('formula' in entry) {
      series.push({
        ...common,
        id: entry.id,
        label: entry.label ?? entry.id,
        source: '',
        column: '',
        formula: {text: entry.formula, line: ctx.lineOf(['series', i, 'formula']), kindGiven: entry.kind != null},
        target: entry.target ?? defaultConfig.series.target,
      });
    } else {
      series.push({
        ...common,
        id: entry.id,
        label: entry.label ?? entry.id,
        source: entry.source,
        column: entry.column ?? entry.id,
        target: entry.target ?? defaultConfig.series.target,
      });
    }
  });

  const b = cfg.branding ?? {};
  const browser = pack.browser ?? null;
  return {
    packFile: ctx.packFile,
    id: pack.id ?? slugify(path.basename(ctx.packFile).replace(/\.ya?ml$/i, '')),
    title: pack.title,
    subtitle: pack.subtitle ?? null,
    organisation: pack.organisation ?? null,
    preparedBy: pack.preparedBy ?? null,
    confidentiality: pack.confidentiality ?? null,
    frequency,
    period: ctx.period,
    formats: [...(ctx.formats ?? pack.formats ?? defaultConfig.pack.formats)],
    locale: pack.locale ?? defaultConfig.pack.locale,
    fiscalYearStart: pack.fiscalYearStart ?? defaultConfig.pack.fiscalYearStart,
    branding: {
      logo: fromPack(packDir, b.logo),
      accent: b.accent ?? defaultConfig.branding.accent,
      font: b.font ?? defaultConfig.branding.font,
      paper: b.paper ?? defaultConfig.branding.paper,
      orientation: b.orientation ?? defaultConfig.branding.orientation,
      footer: b.footer ?? defaultConfig.branding.footer,
      templates: fromPack(packDir, b.templates),
      taggedPdf: b.taggedPdf ?? defaultConfig.branding.taggedPdf,
    },
    thresholds: mergeDefined(defaultConfig.thresholds, cfg.thresholds),
    outDir: ctx.outDir,
    // A bare command name (`chromium`) is looked up on PATH later; anything with a slash is a path.
    browser: browser !== null && /[\\/]/.test(browser) ? path.resolve(packDir, browser) : browser,
    sources,
    series,
    groups: (cfg.groups ?? []).map((g, i) => ({
      id: g.id,
      title: g.title,
      series: [...g.series],
      total: g.total ?? null,
      adjustTotal: g.adjustTotal ?? defaultConfig.group.adjustTotal,
      reconcile: g.reconcile ?? defaultConfig.group.reconcile,
      line: ctx.lineOf(['groups', i]),
    })),
    fromSource,
  };
}
