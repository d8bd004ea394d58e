import {fileURLToPath} from 'node:url';
import {Piscina} from 'piscina';
import type {Logger} from '../log.js';
import {analyseSeries} from './analyse.js';
import {packNumberArrays} from './packNumberArrays.js';
import type {SeriesAnalysis, SeriesInput} from './types.js';

// CommonJS entry that imports worker.js (see workerEntry.cts for why).
const workerFile = new URL('./workerEntry.cjs', import.meta.url);
/** Worker threads need compiled JavaScript; under the TypeScript test runner everything runs in-process. */
const compiled = import.meta.url.endsWith('.js');

/** Below this many series the pool is not started: starting threads costs more than it saves. */
const POOL_MIN_SERIES = 8;
/** Below this many series no progress is reported. */
const PROGRESS_MIN_SERIES = 100;

/**
 * A logger that can also draw progress itself (the command line's bar on a terminal). When a logger has no
 * `progress`, the pool writes a plain line through `info` every 10% instead (`analysed 1000/10000 series`).
 */
export interface ProgressLogger extends Logger {
  /** Called after each series with the count done so far; `done === total` comes last. */
  progress?(done: number, total: number): void;
}

/** Told of each result as it arrives (in completion order), with the input's index; must not throw. */
export type ResultListener = (index: number, result: SeriesAnalysis) => void;

/**
 * Run `analyseSeries` over the inputs on `threads` worker threads and give the results in input order. In-process
 * when threads is 0, when there are fewer than 8 series, or when running from TypeScript sources. Results are the
 * same either way: `analyseSeries` is pure and the worker returns exactly its result.
 *
 * `onResult` hears of each result as soon as it is ready, so later stages can start on it while the pool works.
 *
 * An error while analysing a series is rethrown naming the series (`series s12: …`, the first in input order),
 * whichever path ran it; the pool finishes its other tasks and is shut down before the error leaves.
 */
export async function runPool(
  inputs: SeriesInput[],
  {threads, log, onResult}: {threads: number; log: ProgressLogger; onResult?: ResultListener},
): Promise<SeriesAnalysis[]> {
  const progress = progressReporter(inputs.length, log);
  if (threads < 1 || inputs.length < POOL_MIN_SERIES || !compiled) {
    return inputs.map((input, index) => {
      let result: SeriesAnalysis;
      try {
        result = analyseSeries(input);
      } catch (e) {
        throw seriesError(input.id, e);
      }
      progress();
      onResult?.(index, result);
      return result;
    });
  }
  const pool = new Piscina({filename: fileURLToPath(workerFile), minThreads: threads, maxThreads: threads});
  try {
    // Every task is let finish before the pool is shut down, even after a failure: shutting down with tasks in
    // flight makes the pool throw an uncatchable "unexpected message" when their results arrive. Failures are
    // rare (analyseSeries guards its engines), so the extra wait costs nothing in practice.
    const settled = await Promise.allSettled(
      inputs.map(async (input, index) => {
        // Results cross from the thread with boxed numbers; repacked, they take about a third of the memory.
        const result = packNumberArrays((await pool.run(input)) as SeriesAnalysis);
        progress();
        onResult?.(index, result);
        return result;
      }),
    );
    return settled.map((r, i) => {
      if (r.status === 'rejected') throw seriesError(inputs[i].id, r.reason);
      return r.value;
    });
  } finally {
    await pool.destroy();
  }
}

/** The first line of a failure inside the analysis, with the series it happened on; the original as `cause`. */
function seriesError(id: string, error: unknown): Error {
  const message = error instanceof Error ? error.message : String(error);
  return new Error(`series ${id}: analysis failed: ${message}`, {cause: error});
}

function progressReporter(total: number, log: ProgressLogger): () => void {
  let done = 0;
  const step = Math.max(1, Math.ceil(total / 10));
  if (total < PROGRESS_MIN_SERIES) return () => undefined;
  if (log.progress) {
    const draw = log.progress.bind(log);
    return () => draw(++done, total);
  }
  return () => {
    done++;
    if (done % step === 0 || done === total) log.info(`analysed ${done}/${total} series`);
  };
}
