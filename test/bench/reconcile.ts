import {readFileSync} from 'node:fs';
import path from 'node:path';
import {fileURLToPath} from 'node:url';
import {analyseAll} from '../../src/analyse/index.js';
import {combine} from '../../src/combine/index.js';
import {loadPlan} from '../../src/config/index.js';
import type {GroupPlan, Plan} from '../../src/config/plan.js';
import {deriveFormulas} from '../../src/derive/formulas/index.js';
import {ingest} from '../../src/ingest/index.js';
import {derive} from '../../src/derive/index.js';
import type {Dataset} from '../../src/ingest/types.js';
import {collectingLogger} from '../../src/log.js';
import {monthIndex} from '../../src/time/period.js';
import {analysisOptions} from '../fixtures/plans.js';
import {plan as makePlan, series as seriesPlan} from '../ingest/plan.js';

/**
 * Back-test accuracy of reconciled against base forecasts (`node dist/test/bench/run.js reconcile`): the demo's
 * hierarchies (monthly: net sales = shop sales + web sales, shop sales = three regions; quarterly: four regions
 * and their total) and one public hierarchy, R's ldeaths = mdeaths + fdeaths (test/reference/hierarchy.json),
 * with each method the pack may ask for. Prints the mean MASE over each hierarchy's series, base and reconciled,
 * on the rolling origins every series shares. `EBBFLOW_BENCH_ORIGINS` sets the origins for the public hierarchy
 * (default 12).
 */
export async function run(): Promise<void> {
  const root = path.resolve(path.dirname(fileURLToPath(import.meta.url)), '../../..');
  for (const pack of ['monthly-pack.yaml', 'quarterly-pack.yaml']) {
    for (const method of ['mint', 'ols', 'bottom-up'] as const) {
      const loaded = await loadPlan(path.join(root, 'sample-config', pack), {formats: ['json']});
      const plan = {...loaded, groups: loaded.groups.map((g) => ({...g, reconcile: method}))};
      const read = derive(plan, await ingest(plan));
      await report(`${pack} ${method}`, {...plan, series: read.plans}, read);
    }
  }
  const ref = JSON.parse(readFileSync(path.join(root, 'test/reference/hierarchy.json'), 'utf8'));
  const origins = Number(process.env.EBBFLOW_BENCH_ORIGINS ?? 12);
  const options = analysisOptions({forecast: {horizon: 12, backtestOrigins: origins}});
  const start = monthIndex(1974, 1);
  const ids = ['ldeaths', 'mdeaths', 'fdeaths'];
  for (const method of ['mint', 'ols', 'bottom-up'] as const) {
    const plans = ids.map((id) => seriesPlan(id, 'deaths', {analysis: options}));
    const group: GroupPlan = {
      id: 'sex',
      title: 'By sex',
      series: ['mdeaths', 'fdeaths'],
      total: 'ldeaths',
      adjustTotal: 'direct',
      reconcile: method,
      line: 1,
    };
    const plan = makePlan('monthly', [], plans, {groups: [group]});
    const series = ids.map((id) => ({
      id,
      frequency: 'monthly' as const,
      start,
      values: Float64Array.from(ref[id] as number[]),
      ahead: new Float64Array(0),
      sourceId: 'deaths',
      file: 'R datasets',
      notes: [],
    }));
    await report(`ldeaths ${method}`, plan, {period: start + 71, series, inputs: [], notes: [], plans});
  }
}

async function report(name: string, plan: Plan, read: Dataset): Promise<void> {
  const {data, ratios} = deriveFormulas(plan, read);
  const full = {...plan, series: data.plans};
  const analyses = await analyseAll(full, data, {threads: 0, log: collectingLogger()});
  const combined = combine(full, data, analyses, ratios);
  for (const g of combined.groups) {
    const b = g.backtest;
    if (b === null) {
      console.log(`${name} ${g.id}: no back-test`);
      continue;
    }
    const rows = Object.entries(b.series).map(([id, s]) => `${id} ${s.base.toFixed(3)}→${s.reconciled.toFixed(3)}`);
    console.log(
      `${name} ${g.id}: ${b.method}, ${b.origins} origins, h ≤ ${b.horizon}: mean MASE base ${b.base.toFixed(3)}, reconciled ${b.reconciled.toFixed(3)} (${rows.join(', ')})`,
    );
  }
}
