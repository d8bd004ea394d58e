import {fileURLToPath} from 'node:url';
import {Piscina} from 'piscina';
import type {Logger} from '../log.js';
import {analyseSeries} from './analyse.js';
import type {SeriesAnalysis, SeriesInput} from './types.js';

const workerFile = new URL('./worker.js', import.meta.url);
/** Worker threads need compiled JavaScript; under the TypeScript test runner everything runs in-process. */
const compiled = import.meta.url.endsWith('.js');

/**
 * Run `analyseSeries` over the inputs, in order, on `jobs` worker threads (in-process when jobs is 1, when there
 * are few series, or when running from TypeScript sources). Progress goes to the logger every 10% on long runs.
 */
export async function runPool(inputs: SeriesInput[], {jobs, log}: {jobs: number; log: Logger}): Promise<SeriesAnalysis[]> {
  const progress = progressReporter(inputs.length, log);
  if (jobs <= 1 || inputs.length < 8 || !compiled) {
    return inputs.map((input) => {
      const result = analyseSeries(input);
      progress();
      return result;
    });
  }
  const pool = new Piscina({filename: fileURLToPath(workerFile), minThreads: jobs, maxThreads: jobs});
  try {
    return await Promise.all(
      inputs.map(async (input) => {
        const result = (await pool.run(input)) as SeriesAnalysis;
        progress();
        return result;
      }),
    );
  } finally {
    await pool.destroy();
  }
}

function progressReporter(total: number, log: Logger): () => void {
  let done = 0;
  const step = Math.max(1, Math.ceil(total / 10));
  return () => {
    done++;
    if (total >= 100 && (done % step === 0 || done === total)) log.info(`analysed ${done}/${total} series`);
  };
}
