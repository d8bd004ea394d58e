import {readFileSync} from 'node:fs';
import {describe, expect, it} from 'vitest';
import {fitMethod, runMethod} from '../../../src/analyse/forecast/methods.js';

// Real data: R's AirPassengers from test/reference/ets.json (written by test/reference/ets.R).
const ref = JSON.parse(readFileSync(new URL('../../reference/ets.json', import.meta.url), 'utf8'));
const air = Float64Array.from(ref.auto.find((c: {name: string}) => c.name === 'AirPassengers').values);

describe('fitMethod', () => {
  it('ets-theta-arima weighs its members 45/45/10 and gives running totals', () => {
    const run = runMethod('ets-theta-arima', air, {period: 12, h: 6, levels: [80]});
    expect(run.details.weights).toEqual([0.45, 0.45, 0.1]);
    expect(run.forecast.runningTotals).toBeDefined();
  });

  it('a refit keeps the ARIMA order chosen on the full series instead of searching again', () => {
    const fit = fitMethod('ets-theta-arima', air, {period: 12});
    const {order} = fit.forecast({h: 6, levels: [80]}).details.arima as {order: number[]};
    const refit = fit.refit(air.subarray(0, 120), {warm: false}).forecast({h: 6, levels: [80]});
    expect((refit.details.arima as {order: number[]}).order).toEqual(order);
    const alone = fitMethod('arima', air, {period: 12});
    const again = alone.refit(air.subarray(0, 120), {warm: false}).forecast({h: 6, levels: [80]});
    expect(again.details.order).toEqual(order);
    expect(again.forecast.method).toMatch(/^ARIMA\(.*\) .*on STL-adjusted data$/);
  });

  it('a refit keeps the ETS models kept on the full series; a warm refit starts from the estimates', () => {
    const fit = fitMethod('ets', air, {period: 12});
    const models = (fit.forecast({h: 6, levels: [80]}).details.models as {model: string}[]).map((m) => m.model);
    const cold = fit.refit(air.subarray(0, 132), {warm: false});
    const warm = cold.refit(air.subarray(0, 133), {warm: true});
    for (const f of [cold, warm]) {
      const kept = (f.forecast({h: 6, levels: [80]}).details.models as {model: string}[]).map((m) => m.model);
      expect(kept).toEqual(models);
    }
  });
});
