import {readFile} from 'node:fs/promises';
import path from 'node:path';
import {LineCounter, parseDocument} from 'yaml';
import {InputError, type Problem} from '../errors.js';
import {parsePeriod} from '../time/period.js';
import {crossCheck, periodExample} from './crossCheck.js';
import {allowedRoots} from './fileAccess.js';
import {defaultConfig} from './defaults.js';
import {schemaProblems} from './issues.js';
import {issueMessage} from './issues.js';
import {locate} from './locate.js';
import {normalize} from './normalize.js';
import {yamlValue} from './yamlValue.js';
import type {OutputFormat, Plan} from './plan.js';
import {packSchema} from './schema.js';

/** Values from the command line that win over the pack file. */
export interface PlanOverrides {
  /** One review period label, e.g. `2026-10` (ranges are expanded by the CLI). */
  period?: string;
  /** Output folder, relative to the current directory. */
  outDir?: string;
  formats?: OutputFormat[];
  /**
   * Absolute folders, besides the pack file's own, from which the pack may name files (`--allow-dir DIR`,
   * repeatable). See the file-access rule in ./fileAccess.ts.
   */
  allowDirs?: string[];
}

/** Where command-line problems are reported, in place of a file name. */
const COMMAND_LINE = 'command line';

/**
 * Read, validate and normalise a pack file into a fully-defaulted `Plan`.
 *
 * Pipeline: YAML (with positions) → schema (zod) → cross-checks (references, files under the file-access
 * rule of ./fileAccess.ts, widened only by `overrides.allowDirs`) → defaults and paths. Every problem found is collected and thrown together as one `InputError`, each with the
 * pack file, line and column; nothing is returned unless the pack is entirely valid.
 *
 * @throws InputError for a missing or unreadable pack file, YAML syntax, schema or reference problems.
 */
export async function loadPlan(packFile: string, overrides: PlanOverrides = {}): Promise<Plan> {
  const absFile = path.resolve(packFile);
  let source: string;
  try {
    source = await readFile(absFile, 'utf8');
  } catch (e) {
    const reason = (e as NodeJS.ErrnoException).code === 'ENOENT' ? 'pack file not found' : 'cannot read the pack file';
    throw new InputError([{file: packFile, line: null, column: null, message: `${reason} (${absFile})`}]);
  }

  const lineCounter = new LineCounter();
  const doc = parseDocument(source, {lineCounter, prettyErrors: false, uniqueKeys: true});
  if (doc.errors.length > 0) {
    throw new InputError(
      doc.errors.map((e) => {
        const {line, col} = lineCounter.linePos(e.pos[0]);
        return {file: packFile, line, column: col, message: `YAML syntax: ${e.message}`};
      }),
    );
  }
  const converted = yamlValue(doc, lineCounter);
  if (!converted.ok) {
    const {line, column, message} = converted;
    throw new InputError([{file: packFile, line, column, message}]);
  }
  const raw = converted.value;
  if (raw === null || raw === undefined) {
    throw new InputError([{file: packFile, line: 1, column: 1, message: 'the pack file is empty'}]);
  }

  const at = (p: readonly PropertyKey[], message: string): Problem => {
    const {line, column} = locate(doc, lineCounter, p);
    return {file: packFile, line, column, message};
  };
  const parsed = packSchema.safeParse(raw, {reportInput: true, error: issueMessage});
  const pathProblems = [
    ...(parsed.success ? [] : schemaProblems(parsed.error.issues, packSchema)),
    ...(await crossCheck(raw, path.dirname(absFile), overrides.allowDirs)),
  ];
  const problems = pathProblems.map((p) =>
    p.at === undefined ? at(p.path, p.message) : {file: p.at.file, line: p.at.line, column: null, message: p.message},
  );

  let period: number | null = null;
  const label = overrides.period;
  if (parsed.success) {
    const frequency = parsed.data.pack.frequency;
    const written = label ?? parsed.data.pack.period ?? null;
    if (written !== null) {
      const index = parsePeriod(frequency, written);
      if (index !== undefined) period = index;
      else if (label !== undefined)
        problems.push({
          file: COMMAND_LINE,
          line: null,
          column: null,
          message: `--period ${label} is not a ${frequency} period; write it like ${periodExample[frequency]}`,
        });
    }
  }

  if (problems.length > 0 || !parsed.success) {
    problems.sort((a, b) => (a.line ?? 0) - (b.line ?? 0) || (a.column ?? 0) - (b.column ?? 0));
    throw new InputError(dedupe(problems));
  }

  const cfg = parsed.data;
  const packDir = path.dirname(absFile);
  const outDir =
    overrides.outDir !== undefined
      ? path.resolve(overrides.outDir)
      : cfg.pack.outDir
        ? path.resolve(packDir, cfg.pack.outDir)
        : path.resolve(defaultConfig.pack.outDir);
  return normalize(cfg, {
    packFile: absFile,
    period,
    outDir,
    formats: overrides.formats,
    lineOf: (p) => locate(doc, lineCounter, p).line,
    readFolders: await allowedRoots(packDir, overrides.allowDirs),
  });
}

/** Drop repeated problems (same place, same message), keeping the first. */
function dedupe(problems: Problem[]): Problem[] {
  const seen = new Set<string>();
  return problems.filter((p) => {
    const key = `${p.file}:${p.line}:${p.column}:${p.message}`;
    if (seen.has(key)) return false;
    seen.add(key);
    return true;
  });
}
