import {bryBoschan} from '../../src/analyse/cycle/bryBoschan.js';
import {christianoFitzgerald} from '../../src/analyse/cycle/christianoFitzgerald.js';
import {hodrickPrescott} from '../../src/analyse/cycle/hodrickPrescott.js';
import {analyseCycle} from '../../src/analyse/cycle/index.js';
import {mulberry32} from '../../src/analyse/numeric/mulberry32.js';

/**
 * Cycle engine benchmark: HP trend, Christiano-Fitzgerald cycle and Bry-Boschan turning points for 10 000 monthly
 * series of 120 points (a seeded random walk plus a 40-month wave), then the full `analyseCycle` (which adds the
 * gap, stationarity tests and the one-sided trend) on the same series. Prints wall-clock totals and per-series means.
 */
export async function run(): Promise<void> {
  const count = 10_000;
  const length = 120;
  const random = mulberry32(20261202);
  const series = Array.from({length: count}, () => {
    let level = 100;
    return Float64Array.from({length}, (_, t) => {
      level += random() - 0.5;
      return level + 3 * Math.sin((2 * Math.PI * t) / 40);
    });
  });
  const time = (label: string, work: (x: Float64Array) => unknown): void => {
    const start = process.hrtime.bigint();
    let sink = 0;
    for (const x of series) sink += Number(Boolean(work(x)));
    const ms = Number(process.hrtime.bigint() - start) / 1e6;
    const perSeries = ((ms * 1000) / count).toFixed(1);
    console.log(`${label.padEnd(34)} ${ms.toFixed(0).padStart(7)} ms total  ${perSeries} µs/series (${sink} done)`);
  };
  console.log(`cycle: ${count} monthly series × ${length} points`);
  time('hodrickPrescott λ=129600', (x) => hodrickPrescott(x, {lambda: 129600}));
  time('christianoFitzgerald 18–96', (x) => christianoFitzgerald(x, {low: 18, high: 96}));
  time('bryBoschan', (x) => bryBoschan(x));
  time('HP + CF + Bry-Boschan', (x) => {
    hodrickPrescott(x, {lambda: 129600});
    christianoFitzgerald(x, {low: 18, high: 96});
    return bryBoschan(x);
  });
  time('analyseCycle (hp, all indicators)', (x) =>
    analyseCycle(x, {frequency: 'monthly', options: {method: 'hp', lambda: null}}),
  );
}
