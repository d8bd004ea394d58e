import {readFileSync} from 'node:fs';
import {it} from 'vitest';
import {selectEts} from '/work/main/src/analyse/forecast/etsSelect.js';
import {forecastEts} from '/work/main/src/analyse/forecast/etsForecast.js';
const ref = JSON.parse(readFileSync('/work/main/test/reference/ets.json', 'utf8'));
it('explore', () => {
  for (const c of ref.auto) {
    const t0 = performance.now();
    const sel = selectEts(Float64Array.from(c.values), {period: c.frequency})!;
    const dt = performance.now() - t0;
    const fc = forecastEts(sel.best, {h: c.h});
    let em = 0, el = 0;
    fc.mean.forEach((v, i) => (em = Math.max(em, Math.abs(v - c.mean[i]) / Math.abs(c.mean[i]))));
    fc.lower.get(95)!.forEach((v, i) => (el = Math.max(el, Math.abs(v - c.lower95[i]) / Math.abs(c.lower95[i]))));
    console.log(c.name, 'R', c.method, 'ours', sel.best.method, 'aicc', c.aicc.toFixed(4), sel.best.aicc.toFixed(4), 'mean err', em.toExponential(2), 'lo95 err', el.toExponential(2), dt.toFixed(0) + 'ms');
  }
});
