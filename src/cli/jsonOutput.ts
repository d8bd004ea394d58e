import {createHash} from 'node:crypto';
import {readFile} from 'node:fs/promises';
import {join} from 'node:path';
import type {Problem} from '../errors.js';
import type {BuildSummary} from '../run.js';

/** One file of a built period folder, as `build --json` lists it. */
export interface WrittenFile {
  /** Path relative to the period folder, `/`-separated. */
  path: string;
  bytes: number;
  sha256: string;
}

/** One built period, as `build --json` lists it. */
export interface BuiltPeriod {
  pack: string;
  period: string;
  /** The period folder, an absolute path. */
  folder: string;
  /** Every file in the folder, sorted by path: the manifest's outputs and manifest.json itself. */
  files: WrittenFile[];
  /** Formats asked for but not written, with the reason (a PDF without a browser). */
  skipped: {format: string; reason: string}[];
}

/** What `ebbflow build --json` prints on stdout: one JSON document, whatever the exit code. */
export interface BuildOutput {
  built: BuiltPeriod[];
  warnings: string[];
  /** Bad input (exit 2), each with its place; empty otherwise. */
  problems: Problem[];
  /** Present when the run failed while working (exit 1): its message. */
  error?: string;
}

/** What `ebbflow check --json` prints on stdout. */
export interface CheckOutput {
  problems: Problem[];
  error?: string;
}

/**
 * The files of a built period with their sizes and SHA-256, read from its manifest (which lists every other file)
 * plus the manifest itself, hashed here.
 */
export async function builtPeriod(summary: BuildSummary): Promise<BuiltPeriod> {
  const manifestText = await readFile(join(summary.folder, 'manifest.json'));
  const manifest = JSON.parse(manifestText.toString('utf8')) as {outputs: WrittenFile[]};
  const self = {
    path: 'manifest.json',
    bytes: manifestText.length,
    sha256: createHash('sha256').update(manifestText).digest('hex'),
  };
  const files = [...manifest.outputs.map(({path, bytes, sha256}) => ({path, bytes, sha256})), self];
  files.sort((a, b) => (a.path < b.path ? -1 : a.path > b.path ? 1 : 0));
  const skipped = summary.pdfSkipped ? [{format: 'pdf', reason: summary.pdfSkipped}] : [];
  return {pack: summary.packId, period: summary.period, folder: summary.folder, files, skipped};
}

/** A document as printed: two-space indented JSON and a newline. */
export function jsonText(value: BuildOutput | CheckOutput): string {
  return `${JSON.stringify(value, null, 2)}\n`;
}
