import {dirname, isAbsolute, relative, sep} from 'node:path';
import type {Report} from '../render/types.js';
import type {Frequency} from '../time/period.js';
import {RESULTS_SCHEMA} from '../results/index.js';
import {byteLength, sha256} from './hash.js';

export const MANIFEST_SCHEMA = 'ebbflow/manifest/v1';

/** manifest.json of a period folder: what ran, on which inputs, and what it wrote. No clock values. */
export interface Manifest {
  schema: typeof MANIFEST_SCHEMA;
  tool: {name: 'ebbflow'; version: string};
  resultsSchema: typeof RESULTS_SCHEMA;
  pack: {id: string; title: string; period: string; frequency: Frequency};
  /** The fully-defaulted plan exactly as the run used it. */
  plan: unknown;
  /**
   * Every input file; paths relative to the pack file's folder, `/`-separated; sorted by path. A query source is
   * `<id> (<engine> query)` with its engine and query text; its hash is of the rows it returned (ingest/queryRows.ts),
   * or, with `hashed: "period summaries"`, of the summaries by key and period the engine made (ingest/duckdbSummary.ts).
   */
  inputs: {
    file: string;
    bytes: number;
    sha256: string;
    rows: number;
    engine?: string;
    query?: string;
    hashed?: 'period summaries';
  }[];
  /** Every file written beside the manifest (paths relative to the period folder), sorted by path. */
  outputs: {path: string; bytes: number; sha256: string}[];
  warnings: string[];
}

/**
 * The manifest of one archived period. Pure: everything comes from the arguments, so the same
 * inputs give the same manifest (no run date, host or clock value is recorded).
 * `plan` is the fully-defaulted plan as the run used it, a JSON-ready value (taken as is: parsing it back from
 * text cost hundreds of megabytes for packs of thousands of series).
 */
export function buildManifest(args: {
  report: Report;
  plan: unknown;
  outputs: {path: string; content: string | Uint8Array}[];
  warnings: string[];
}): Manifest {
  const {report} = args;
  const base = dirname(report.plan.packFile);
  return {
    schema: MANIFEST_SCHEMA,
    tool: {name: 'ebbflow', version: report.toolVersion},
    resultsSchema: RESULTS_SCHEMA,
    pack: {id: report.plan.id, title: report.plan.title, period: report.periodLabel, frequency: report.plan.frequency},
    plan: args.plan,
    inputs: report.inputs
      .map((f) => ({
        file: portable(base, f.file),
        bytes: f.bytes,
        sha256: f.sha256,
        rows: f.rows,
        ...(f.sheet === undefined ? {} : {sheet: f.sheet}),
        ...(f.query ? {engine: f.query.engine, query: f.query.text} : {}),
        ...(f.query?.summarised ? {hashed: 'period summaries' as const} : {}),
      }))
      .sort((a, b) => compare(a.file, b.file)),
    outputs: args.outputs
      .map((o) => ({path: o.path, bytes: byteLength(o.content), sha256: sha256(o.content)}))
      .sort((a, b) => compare(a.path, b.path)),
    warnings: [...args.warnings],
  };
}

function portable(base: string, file: string): string {
  return isAbsolute(file) ? relative(base, file).split(sep).join('/') : file;
}

function compare(a: string, b: string): number {
  return a < b ? -1 : a > b ? 1 : 0;
}
