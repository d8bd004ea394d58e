import {mkdtempSync, readFileSync, rmSync, writeFileSync} from 'node:fs';
import {tmpdir} from 'node:os';
import {join} from 'node:path';
import {afterAll, describe, expect, it} from 'vitest';
import {build} from '../../src/run.js';
import {collectingLogger} from '../../src/log.js';
import {formatPeriod, monthIndex, quarterIndex, type Frequency} from '../../src/time/period.js';

// A user (or an outside check) can switch every automatic step off and get exactly R's stats::stl through the
// ordinary `build`: results.json must carry R's numbers. Expected values: test/reference/stl.json, written by
// test/reference/stl.R (R's stl on R's built-in datasets co2, USAccDeaths, UKgas, AirPassengers).
interface StlCase {
  name: string;
  data: number[];
  seasonal: number[];
  trend: number[];
  remainder: number[];
  win: {s: number; t: number; l: number};
  outer: number;
}
const cases: StlCase[] = JSON.parse(readFileSync('test/reference/stl.json', 'utf8')).cases;
const dir = mkdtempSync(join(tmpdir(), 'ebbflow-refpack-'));
afterAll(() => rmSync(dir, {recursive: true, force: true}));

/** Dataset start as R's ts objects have it (R documentation of each dataset). */
const runs: {name: string; frequency: Frequency; start: number; model: 'additive' | 'multiplicative'; robust: boolean}[] = [
  {name: 'co2-s35', frequency: 'monthly', start: monthIndex(1959, 1), model: 'additive', robust: false},
  {name: 'USAccDeaths-s7-robust', frequency: 'monthly', start: monthIndex(1973, 1), model: 'additive', robust: true},
  {name: 'UKgas-s11-robust', frequency: 'quarterly', start: quarterIndex(1960, 1), model: 'additive', robust: true},
  {name: 'logAirPassengers-s13-robust', frequency: 'monthly', start: monthIndex(1949, 1), model: 'multiplicative', robust: true},
];

function maxRelError(actual: number[], expected: number[]): number {
  let worst = 0;
  for (let i = 0; i < expected.length; i++) {
    worst = Math.max(worst, Math.abs(actual[i] - expected[i]) / Math.max(1, Math.abs(expected[i])));
  }
  return worst;
}

describe('a pack with every automatic step off reproduces R stats::stl in results.json', () => {
  for (const run of runs) {
    it(run.name, async () => {
      const c = cases.find((x) => x.name === run.name)!;
      const values = run.model === 'multiplicative' ? c.data.map(Math.exp) : c.data;
      const csv = ['period,value', ...values.map((v, i) => `${formatPeriod(run.frequency, run.start + i)},${v}`)].join('\n');
      writeFileSync(join(dir, `${run.name}.csv`), csv + '\n');
      const pack = join(dir, `${run.name}.yaml`);
      writeFileSync(
        pack,
        [
          'pack:',
          `  title: Reference ${run.name}`,
          `  frequency: ${run.frequency}`,
          '  formats: [json]',
          'sources:',
          `  - {id: data, file: ${run.name}.csv, dateColumn: period}`,
          'series:',
          '  - id: x',
          '    source: data',
          '    column: value',
          `    decomposition: {method: stl, model: ${run.model}, seasonalWindow: ${c.win.s}, robust: ${run.robust}}`,
          '    calendar: {workingDays: "off", easter: "off"}',
          '    outliers: {enabled: false}',
          '',
        ].join('\n'),
      );
      const summary = await build({packFile: pack, outDir: join(dir, 'out'), force: true, jobs: 1}, collectingLogger());
      const results = JSON.parse(readFileSync(join(summary.folder, 'results.json'), 'utf8'));
      const d = results.series[0].decomposition;
      expect(d.method).toBe('stl');
      expect(d.model).toBe(run.model);
      const back = run.model === 'multiplicative' ? (xs: number[]) => xs.map(Math.log) : (xs: number[]) => xs;
      expect(maxRelError(back(d.trend), c.trend)).toBeLessThan(1e-8);
      expect(maxRelError(back(d.seasonal), c.seasonal)).toBeLessThan(1e-8);
      expect(maxRelError(back(d.irregular), c.remainder)).toBeLessThan(1e-8);
    });
  }
});
