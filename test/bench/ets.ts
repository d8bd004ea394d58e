/**
 * Automatic ETS speed: time `selectEts` (up to 15 maximum-likelihood fits) on the R datasets of
 * test/reference/ets.json, and one `forecastSeries` call with a six-origin back-test (the pack's per-series cost).
 * Part of `npm run bench`; exports `run()` and does nothing on import.
 */
import {readFileSync} from 'node:fs';
import {dirname, resolve} from 'node:path';
import {fileURLToPath} from 'node:url';
import {selectEts} from '../../src/analyse/forecast/etsSelect.js';
import {forecastSeries} from '../../src/analyse/forecast/forecastSeries.js';

export async function run(): Promise<void> {
  const root = resolve(dirname(fileURLToPath(import.meta.url)), '../../..');
  const ref = JSON.parse(readFileSync(resolve(root, 'test/reference/ets.json'), 'utf8')) as {
    auto: {name: string; frequency: number; values: number[]}[];
  };
  // Warm up the JIT on one series so the first timing is not compile time.
  selectEts(Float64Array.from(ref.auto[0].values), {period: ref.auto[0].frequency});
  console.log('| series | n | m | selected | ms |');
  console.log('|---|---:|---:|---|---:|');
  let total = 0;
  for (const c of ref.auto) {
    const t0 = performance.now();
    const sel = selectEts(Float64Array.from(c.values), {period: c.frequency});
    const ms = performance.now() - t0;
    total += ms;
    console.log(`| ${c.name} | ${c.values.length} | ${c.frequency} | ${sel?.best.method ?? '—'} | ${ms.toFixed(1)} |`);
  }
  console.log(`mean ${(total / ref.auto.length).toFixed(1)} ms per series for automatic ETS`);
  const air = ref.auto.find((c) => c.name === 'AirPassengers')!;
  const t0 = performance.now();
  forecastSeries(Float64Array.from(air.values), {
    frequency: 'monthly',
    options: {method: 'auto', horizon: 12, levels: [80, 95], backtestOrigins: 6},
  });
  console.log(`forecastSeries(AirPassengers, auto, 6 back-test origins): ${(performance.now() - t0).toFixed(0)} ms`);
}
