import {execFile} from 'node:child_process';
import {fileURLToPath} from 'node:url';
import {promisify} from 'node:util';
import {beforeAll, describe, expect, test} from 'vitest';
import {loadPlan} from '../../src/config/index.js';
import type {AnalysisOptions} from '../../src/config/plan.js';
import {monthIndex} from '../../src/time/period.js';

/**
 * Degenerate series through the analysis and the callouts: constant, huge (1e300, 1e307) and tiny (1e-300)
 * magnitudes, NaN and Infinity inside, one to three periods, all missing. `analyseSeries` must return a result
 * (saying in its notes what it could not do), never throw and never hang; no callout sentence may show NaN,
 * Infinity or undefined.
 *
 * Each case runs in a child process (analyseChild.mjs) with a time limit, because an analysis that never returns
 * would otherwise stall the whole test file: vitest cannot interrupt synchronous code.
 */

const run = promisify(execFile);
const controlPack = fileURLToPath(new URL('../fixtures/bad/control/pack.yaml', import.meta.url));
const child = fileURLToPath(new URL('./analyseChild.mjs', import.meta.url));
const tsHooks = fileURLToPath(new URL('../archive/fixtures/ts-register.mjs', import.meta.url));
const END = monthIndex(2025, 12);
/** Generous: the slowest healthy case (48 months, STL + automatic forecast) takes about 6 s. */
const LIMIT_MS = 60_000;

const plan = await loadPlan(controlPack);
const automatic = plan.series[0].analysis;
const optionSets: Record<string, AnalysisOptions> = {
  automatic,
  'classical-theta': {
    ...automatic,
    decomposition: {
      ...automatic.decomposition,
      method: 'classical',
      model: 'multiplicative',
      seasonalWindow: 'periodic',
    },
    forecast: {...automatic.forecast, method: 'theta'},
    cycle: {method: 'bandpass', lambda: null},
  },
};

function seasonal(n: number, scale: number): number[] {
  return Array.from({length: n}, (_, i) => scale * (1 + 0.2 * Math.sin((2 * Math.PI * i) / 12) + 0.01 * i));
}

const shapes: Record<string, number[]> = {
  'constant 100': Array(48).fill(100),
  'constant 0': Array(48).fill(0),
  'huge 1e300': seasonal(48, 1e300),
  'huge 1e307 (sums overflow)': seasonal(48, 1e307),
  'tiny 1e-300': seasonal(48, 1e-300),
  'denormal 5e-324': Array(48).fill(5e-324),
  'NaN inside': seasonal(48, 100).map((v, i) => (i % 7 === 3 ? NaN : v)),
  'Infinity inside': seasonal(48, 100).map((v, i) => (i === 20 ? Infinity : i === 30 ? -Infinity : v)),
  'one period': [100],
  'two periods': [100, 110],
  'three periods': [100, 110, 90],
  'three NaN then one value': [NaN, NaN, NaN, 5],
  'all NaN': Array(24).fill(NaN),
  'negative with zeros': seasonal(48, 100).map((v, i) => (i % 4 === 0 ? 0 : -v)),
  'one spike of 1e300': seasonal(48, 100).map((v, i) => (i === 40 ? 1e300 : v)),
};

interface Outcome {
  length?: number;
  notes?: string[];
  notAdjustedReason?: string | null;
  texts?: string[];
  error?: string;
  at?: string;
  hung?: boolean;
}

async function analyseInChild(values: number[], options: AnalysisOptions): Promise<Outcome> {
  const arg = JSON.stringify({pack: controlPack, end: END, values: values.map(String), options});
  try {
    const {stdout} = await run(process.execPath, ['--import', tsHooks, child, arg], {
      timeout: LIMIT_MS,
      killSignal: 'SIGKILL',
      env: {...process.env, TZ: 'UTC'},
      maxBuffer: 16 * 1024 * 1024,
    });
    return JSON.parse(stdout) as Outcome;
  } catch (e) {
    const failed = e as {killed?: boolean; stderr?: string};
    return failed.killed ? {hung: true} : {error: `child failed: ${failed.stderr ?? String(e)}`};
  }
}

const cases = Object.entries(optionSets).flatMap(([set, options]) =>
  Object.entries(shapes).map(([shape, values]) => ({key: `${set} / ${shape}`, set, shape, values, options})),
);
const outcomes = new Map<string, Outcome>();

beforeAll(async () => {
  // Eight children at a time.
  const queue = [...cases];
  await Promise.all(
    Array.from({length: 8}, async () => {
      for (let c = queue.shift(); c; c = queue.shift()) outcomes.set(c.key, await analyseInChild(c.values, c.options));
    }),
  );
}, 10 * LIMIT_MS);

const BAD_TEXT = /NaN|Infinity|∞|undefined|null/;

describe.each(Object.keys(optionSets))('%s options', (set) => {
  test.each(cases.filter((c) => c.set === set).map((c) => [c.shape, c] as const))(
    '%s: returns a result with notes; callouts free of NaN',
    (_, c) => {
      const o = outcomes.get(c.key) ?? {};
      expect(o.hung, `${c.key}: analyseSeries did not return within ${LIMIT_MS / 1000} s`).not.toBe(true);
      expect(o.error, `${c.key}: threw ${o.error} ${o.at ?? ''}`).toBeUndefined();
      expect(o.length).toBe(c.values.length);
      const finite = c.values.filter(Number.isFinite);
      const unusual = finite.length < c.values.length || c.values.length < 24 || new Set(finite).size === 1;
      // Missing, non-finite, short or flat input is explained: in the notes or as the reason for not adjusting.
      if (unusual) expect([...(o.notes ?? []), o.notAdjustedReason ?? ''].join(' '), c.key).not.toBe('');
      for (const t of o.texts ?? []) expect(t, c.key).not.toMatch(BAD_TEXT);
    },
  );
});
