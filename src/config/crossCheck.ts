import {stat} from 'node:fs/promises';
import path from 'node:path';
import {parsePeriod, type Frequency} from '../time/period.js';
import {
  allowedRoots,
  browserProblem,
  logoContentProblem,
  outsideMessage,
  resolveInside,
  templateProblems,
} from './fileAccess.js';
import type {PathProblem} from './issues.js';
import {structureCheck} from './structureCheck.js';
import {hint} from './suggest.js';
import {list, record, text} from './yamlShapes.js';

/** How a review period is written for each frequency, for messages. */
export const periodExample: Record<Frequency, string> = {monthly: '2026-10', quarterly: '2026-Q3', weekly: '2026-W41'};

async function kindOf(file: string): Promise<'file' | 'folder' | 'missing'> {
  try {
    const s = await stat(file);
    return s.isDirectory() ? 'folder' : 'file';
  } catch {
    return 'missing';
  }
}

/**
 * The checks that relate one part of the pack to another or to the disk: unique ids, references
 * between sources, series and groups, layout-dependent keys, the period label against the frequency,
 * and the files the pack names. Works on the raw parsed YAML and skips anything of the wrong type
 * (the schema reports those), so every problem in the file is found in one pass.
 *
 * Targets and group members that name no series are not reported when the pack has `fromSource`
 * entries: those ids are known only once ingest has read the source's keys.
 *
 * Files the pack names follow the file-access rule of ./fileAccess.ts: `sources[].file`, `branding.logo` and
 * `branding.templates` (and every file in it) must, with symbolic links resolved, lie inside the pack file's
 * folder or one of `allowDirs` (absolute folders the operator allows, `--allow-dir`); a path outside is a
 * problem at the key's line and is never opened. `pack.browser` must name an executable Chromium-family
 * browser. The logo's first bytes must match its extension, and template files must parse and print escaped.
 */
export async function crossCheck(
  raw: unknown,
  packDir: string,
  allowDirs: readonly string[] = [],
): Promise<PathProblem[]> {
  const out: PathProblem[] = [];
  const add = (at: PropertyKey[], message: string) => out.push({path: at, message});
  const root = record(raw);
  const roots = await allowedRoots(packDir, allowDirs);
  /** Whether a pack path lies inside the allowed folders (symlinks resolved); reports it when not. */
  const contained = async (at: PropertyKey[], key: string, written: string): Promise<boolean> => {
    const r = await resolveInside(path.resolve(packDir, written), roots);
    if (!r.inside) add(at, outsideMessage(key, r.real));
    return r.inside;
  };

  const sourceIndex = new Map<string, number>();
  const layouts = new Map<string, unknown>();
  const sources = list(root.sources);
  for (const [i, s] of sources.map((x, i) => [i, record(x)] as const)) {
    const id = text(s.id);
    if (id !== undefined) {
      const j = sourceIndex.get(id);
      if (j !== undefined) add(['sources', i, 'id'], `sources[${i}].id ${id} is already used by sources[${j}]`);
      else sourceIndex.set(id, i);
      layouts.set(id, s.layout);
    }
    const needs = s.layout === 'long' ? ['keyColumn', 'valueColumn'] : s.layout === 'across' ? ['keyColumn'] : [];
    for (const key of needs) {
      if (s[key] === undefined || s[key] === null)
        add(['sources', i, 'layout'], `sources[${i}] has layout ${String(s.layout)}, which needs ${key}`);
    }
    for (const key of ['keyColumn', 'valueColumn'].filter((k) => !needs.includes(k))) {
      if (s[key] !== undefined && s[key] !== null) {
        const where = key === 'keyColumn' ? 'layout long or across' : 'layout long';
        add(['sources', i, key], `sources[${i}].${key} only applies to ${where}`);
      }
    }
    if (s.layout === 'across' && s.dateColumn !== undefined && s.dateColumn !== null) {
      const message = `sources[${i}].dateColumn does not apply to layout across: its periods are the header's cells`;
      add(['sources', i, 'dateColumn'], message);
    }
    for (const [at, message] of sourceKindProblems(s, i)) add(['sources', i, at], message);
    const file = text(s.file);
    if (file !== undefined && (await contained(['sources', i, 'file'], `sources[${i}].file`, file))) {
      const abs = path.resolve(packDir, file);
      const k = await kindOf(abs);
      if (k === 'missing') add(['sources', i, 'file'], `sources[${i}].file not found: ${file} (looked for ${abs})`);
      if (k === 'folder') add(['sources', i, 'file'], `sources[${i}].file is a folder, not a file: ${file}`);
    }
  }
  const sourceIds = [...sourceIndex.keys()];

  const seriesIndex = new Map<string, number>();
  const series = list(root.series).map(record);
  const hasFromSource = series.some((s) => 'fromSource' in s);
  series.forEach((s, i) => {
    if ('fromSource' in s) {
      const src = text(s.fromSource);
      if (src === undefined) return;
      if (!sourceIndex.has(src))
        add(['series', i, 'fromSource'], `series[${i}].fromSource names no source: ${src}${hint(src, sourceIds)}`);
      else if (layouts.get(src) !== 'long' && layouts.get(src) !== 'across')
        add(
          ['series', i, 'fromSource'],
          `series[${i}].fromSource needs a source with layout long or across; ${src} is wide`,
        );
      return;
    }
    const id = text(s.id);
    if (id !== undefined) {
      const j = seriesIndex.get(id);
      if (j !== undefined) add(['series', i, 'id'], `series[${i}].id ${id} is already used by series[${j}]`);
      else seriesIndex.set(id, i);
    }
    const src = text(s.source);
    if (src !== undefined && !sourceIndex.has(src))
      add(['series', i, 'source'], `series[${i}].source names no source: ${src}${hint(src, sourceIds)}`);
  });
  const seriesIds = [...seriesIndex.keys()];
  const unknownSeries = (id: string) => !seriesIndex.has(id) && !hasFromSource;

  series.forEach((s, i) => {
    const target = text(s.target);
    if (target === undefined) return;
    if (target === s.id) add(['series', i, 'target'], `series[${i}].target cannot be the series itself`);
    else if (unknownSeries(target))
      add(['series', i, 'target'], `series[${i}].target names no series: ${target}${hint(target, seriesIds)}`);
  });

  const groupIndex = new Map<string, number>();
  list(root.groups)
    .map(record)
    .forEach((g, i) => {
      const id = text(g.id);
      if (id !== undefined) {
        const j = groupIndex.get(id);
        if (j !== undefined) add(['groups', i, 'id'], `groups[${i}].id ${id} is already used by groups[${j}]`);
        else groupIndex.set(id, i);
      }
      list(g.series).forEach((m, k) => {
        const member = text(m);
        if (member !== undefined && unknownSeries(member))
          add(
            ['groups', i, 'series', k],
            `groups[${i}].series[${k}] names no series: ${member}${hint(member, seriesIds)}`,
          );
      });
    });

  out.push(...structureCheck(raw, hasFromSource ? null : new Set(seriesIndex.keys())));

  const pack = record(root.pack);
  const frequency = pack.frequency;
  const period = text(pack.period);
  if (period !== undefined && (frequency === 'monthly' || frequency === 'quarterly' || frequency === 'weekly')) {
    if (parsePeriod(frequency, period) === undefined)
      add(
        ['pack', 'period'],
        `pack.period ${period} is not a ${frequency} period; write it like ${periodExample[frequency]}`,
      );
  }

  const browser = text(pack.browser);
  if (browser !== undefined) {
    const problem = await browserProblem(browser, packDir);
    if (problem !== null) add(['pack', 'browser'], problem);
  }

  const branding = record(root.branding);
  const logo = text(branding.logo);
  if (logo !== undefined && (await contained(['branding', 'logo'], 'branding.logo', logo))) {
    const abs = path.resolve(packDir, logo);
    if ((await kindOf(abs)) !== 'file')
      add(['branding', 'logo'], `branding.logo not found: ${logo} (looked for ${abs})`);
    else {
      const problem = await logoContentProblem(abs, logo);
      if (problem !== null) add(['branding', 'logo'], problem);
    }
  }
  const templates = text(branding.templates);
  if (templates !== undefined && (await contained(['branding', 'templates'], 'branding.templates', templates))) {
    const abs = path.resolve(packDir, templates);
    if ((await kindOf(abs)) !== 'folder')
      add(['branding', 'templates'], `branding.templates folder not found: ${templates} (looked for ${abs})`);
    else
      for (const t of await templateProblems(abs, roots))
        out.push({path: ['branding', 'templates'], message: t.message, at: {file: t.file, line: t.line}});
  }
  return out;
}

/**
 * How a source says where its rows come from: a `file` (CSV, or a workbook ending in `.xlsx`) or a `query` with
 * its `engine`; `connection` belongs to PostgreSQL and `sheet` to workbooks. Returns [key, message] pairs.
 */
function sourceKindProblems(s: Record<string, unknown>, i: number): [string, string][] {
  const out: [string, string][] = [];
  const has = (key: string) => s[key] !== undefined && s[key] !== null;
  const at = `sources[${i}]`;
  if (has('file') && has('query')) out.push(['query', `${at} has both file and query; keep one of them`]);
  if (!has('file') && !has('query'))
    out.push(['id', `${at} needs file (a CSV or .xlsx file) or query (with engine: duckdb or postgres)`]);
  if (has('query') && !has('engine')) out.push(['query', `${at}.query needs engine: duckdb or engine: postgres`]);
  if (has('engine') && !has('query')) out.push(['engine', `${at}.engine only applies to a query source; add query`]);
  if (s.engine === 'postgres' && !has('connection'))
    out.push(['engine', `${at} has engine postgres, which needs connection: {env: NAME} (an environment variable)`]);
  if (has('connection') && s.engine !== 'postgres')
    out.push(['connection', `${at}.connection only applies to engine postgres`]);
  const file = text(s.file);
  if (has('sheet') && !(file !== undefined && /\.xlsx$/i.test(file)))
    out.push(['sheet', `${at}.sheet only applies to a file ending in .xlsx`]);
  if (has('timeoutSeconds') && !has('query')) out.push(['timeoutSeconds', `${at}.timeoutSeconds only applies to a query source`]);
  return out;
}
