import {it} from 'vitest';
import {loadPlan} from '../../src/config/index.js';
import {ingest} from '../../src/ingest/index.js';
import {analyseAll} from '../../src/analyse/index.js';
import {collectingLogger} from '../../src/log.js';
import {narrate} from '../../src/narrate/index.js';
it('peek', async () => {
  for (const f of ['monthly-pack.yaml']) {
    try {
      const plan = await loadPlan(`sample-config/${f}`);
      const data = await ingest(plan);
      
      const plans = (data as any).plans ?? plan.series; const full = {...plan, series: plans}; const analyses2 = await analyseAll(full, data, {jobs: 1, log: collectingLogger()}); const series = plans.map((p: any, i: number) => ({plan: p, analysis: analyses2[i]}));
      const r = narrate({plan, period: data.period, series, history: null});
      console.log(f + '\nPACK\n' + r.pack.map((c) => `${c.rank} ${c.severity} ${c.id} | ${c.text}`).join('\n'));
      for (const [id, cs] of r.bySeries) console.log(`== ${id}\n` + cs.map((c) => `${c.rank} ${c.severity} ${c.rule} | ${c.text}`).join('\n'));
    } catch (e) {
      console.log(f, 'ERR', (e as Error).stack?.slice(0, 2000));
    }
  }
}, 120000);
