import {createHash, randomBytes} from 'node:crypto';
import {mkdir, open, rename, rm} from 'node:fs/promises';
import {join} from 'node:path';
import type {Report} from '../render/types.js';
import {digestJson, resultsJsonChunks, type PeriodDigest} from '../results/index.js';
import {REVISION_WINDOW} from '../history/index.js';
import {InputError} from '../errors.js';
import type {Logger} from '../log.js';
import {headlinesJson} from './headlines.js';
import {buildManifest} from './manifest.js';
import {lockPackDir} from './lock.js';
import {recoverPackDir} from './recover.js';
import {writeIndex} from './writeIndex.js';
import {exists} from './exists.js';
import {syncFolder, writeFileDurable} from './durable.js';
import {badExportName, folderExists} from './messages.js';

export interface ArchiveArgs {
  report: Report;
  /** report.html, or null when not wanted. */
  html: string | null;
  /** report.pdf, or null when not wanted or no browser was found. */
  pdf: Uint8Array | null;
  /** Files for `exports/` (CSV, XLSX); plain file names. */
  exports: {name: string; content: string | Uint8Array}[];
  /** Folder holding `<pack-id>/<period>/`. */
  outDir: string;
  /** Replace an existing period folder instead of refusing. */
  force: boolean;
  /** The fully-defaulted plan as the run used it (a JSON-ready value), copied into the manifest. */
  plan: unknown;
  /** Warnings of the run, copied into the manifest. */
  warnings: string[];
  /** What later periods compare with this one (revisions, forecast tracking), kept as `digest.json`. */
  digest: PeriodDigest;
  /** Told when the run waits for another run's lock on the pack folder. Default: none. */
  log?: Logger;
  /**
   * Called after each step with its name (`temp-written`, `old-moved`, `new-in-place`, `done`), and
   * awaited. Default: none. Used by the crash-safety tests to stop the process between steps.
   */
  onStep?: (step: string) => void | Promise<void>;
}

/**
 * Write one period's folder `<outDir>/<pack-id>/<period>/` (report.html, report.pdf, results.json,
 * headlines.json, digest.json, exports/, manifest.json), then regenerate the pack's index.html.
 *
 * Crash safety: everything is written into a hidden sibling `.<period>.tmp-<token>` and renamed into
 * place in one step, so the period folder is always either absent, the previous complete folder, or
 * the new complete folder. With `force` the old folder is first renamed to `.<period>.old-<token>` and
 * deleted only after the new one is in place; a run that dies in between is repaired by the next
 * run (see {@link recoverPackDir}). Without `force` an existing folder is a refusal ({@link InputError})
 * and nothing is written. The token is random per run, so a leftover never has the name a later run
 * wants, even when every run has the same process id (process 1 in a container).
 *
 * All of it, from recovery to the index, happens under the pack folder's lock ({@link lockPackDir}), so
 * two runs never interleave their renames and recovery never mistakes a live run's folder for a leftover.
 *
 * Files are flushed to the disk before the rename, so this holds after a power cut as well.
 *
 * Determinism: no clock values are written anywhere; the same report gives the same bytes.
 * Returns the period folder and the absolute paths of the files written in it.
 */
export async function archive(args: ArchiveArgs): Promise<{folder: string; outputs: string[]}> {
  const {report, force} = args;
  const step = args.onStep ?? (() => undefined);
  const label = report.periodLabel;
  const packDir = join(args.outDir, report.plan.id);
  const folder = join(packDir, label);
  for (const e of args.exports) {
    if (!/^[^/\\]+$/.test(e.name) || e.name === '.' || e.name === '..') throw new Error(badExportName(e.name));
  }

  const files: {path: string; content: string | Uint8Array}[] = [];
  if (args.html !== null) files.push({path: 'report.html', content: args.html});
  if (args.pdf !== null) files.push({path: 'report.pdf', content: args.pdf});
  const reportFiles = files.length;
  files.push({path: 'headlines.json', content: headlinesJson(report)});
  files.push({path: 'digest.json', content: digestJson(args.digest, REVISION_WINDOW)});
  for (const e of [...args.exports].sort((a, b) => (a.name < b.name ? -1 : a.name > b.name ? 1 : 0))) {
    files.push({path: `exports/${e.name}`, content: e.content});
  }

  await mkdir(packDir, {recursive: true});
  const lock = await lockPackDir(packDir, args.log);
  const token = randomBytes(8).toString('hex');
  const tmp = join(packDir, `.${label}.tmp-${token}`);
  const old = join(packDir, `.${label}.old-${token}`);
  try {
    await recoverPackDir(packDir);
    await refuseExisting(args.outDir, report.plan.id, label, force);
    await mkdir(tmp);
    if (args.exports.length > 0) await mkdir(join(tmp, 'exports'));
    // results.json is streamed series by series (it can exceed the longest string V8 holds); its size and hash
    // are taken while writing and placed among the manifest's outputs in the same path order.
    const results = await writeChunksDurable(join(tmp, 'results.json'), resultsJsonChunks(report));
    const manifest = buildManifest({report, plan: args.plan, outputs: files, warnings: args.warnings});
    manifest.outputs.push({path: 'results.json', ...results});
    manifest.outputs.sort((a, b) => (a.path < b.path ? -1 : a.path > b.path ? 1 : 0));
    files.push({path: 'manifest.json', content: `${JSON.stringify(manifest, null, 2)}\n`});
    for (const f of files) await writeFileDurable(join(tmp, f.path), f.content);
    if (args.exports.length > 0) await syncFolder(join(tmp, 'exports'));
    await syncFolder(tmp);
    await step('temp-written');
    lock.assertHeld();
    if (await exists(folder)) {
      await rename(folder, old);
      await step('old-moved');
      try {
        await rename(tmp, folder);
      } catch (e) {
        await rename(old, folder);
        throw e;
      }
      await step('new-in-place');
      await rm(old, {recursive: true, force: true});
    } else {
      await rename(tmp, folder);
    }
    await syncFolder(packDir);
    await writeIndex(args.outDir, report.plan.id);
  } finally {
    await rm(tmp, {recursive: true, force: true});
    await lock.release();
  }
  await step('done');
  // Listed in the order report files, results.json, headlines, digest, exports, manifest.
  const paths = files.map((f) => f.path);
  paths.splice(reportFiles, 0, 'results.json');
  return {folder, outputs: paths.map((p) => join(folder, p))};
}

/** Bytes gathered per write: few system calls without holding the whole file. */
const WRITE_BLOCK = 1 << 20;

/**
 * Write a file from text pieces (UTF-8) and flush it to the disk, as `writeFileDurable` does for one string,
 * returning its size in bytes and SHA-256 (hex) for the manifest. Each piece is encoded straight into one reused
 * block, written out once it holds a megabyte: for the 450 MB results.json of 10,000 series that took a third of
 * the time of joining the pieces of each block into a string and encoding that. Memory: the block (grown to fit
 * the largest piece) plus one piece.
 */
async function writeChunksDurable(path: string, chunks: Iterable<string>): Promise<{bytes: number; sha256: string}> {
  const hash = createHash('sha256');
  let bytes = 0;
  let block = Buffer.allocUnsafe(4 * WRITE_BLOCK);
  let used = 0;
  const handle = await open(path, 'w');
  try {
    const flush = async () => {
      const filled = block.subarray(0, used);
      hash.update(filled);
      bytes += used;
      await handle.write(filled);
      used = 0;
    };
    for (const chunk of chunks) {
      // UTF-8 takes at most 3 bytes per UTF-16 code unit.
      const most = 3 * chunk.length;
      if (used + most > block.length) {
        await flush();
        if (most > block.length) block = Buffer.allocUnsafe(most);
      }
      used += block.write(chunk, used, 'utf8');
      if (used >= WRITE_BLOCK) await flush();
    }
    await flush();
    await handle.sync();
  } finally {
    await handle.close();
  }
  return {bytes, sha256: hash.digest('hex')};
}

/**
 * Refuse early when the period is already archived and `force` is off, so a refusal costs no analysis or PDF.
 * `archive` checks again at the last moment.
 */
export async function refuseExisting(outDir: string, packId: string, period: string, force: boolean): Promise<void> {
  const folder = join(outDir, packId, period);
  if (!force && (await exists(folder))) {
    throw new InputError([{file: folder, line: null, column: null, message: folderExists()}]);
  }
}
