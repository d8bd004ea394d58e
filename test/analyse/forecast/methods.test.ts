import {readFileSync} from 'node:fs';
import {describe, expect, it} from 'vitest';
import {runMethod} from '../../../src/analyse/forecast/methods.js';

// Real data: R's AirPassengers from test/reference/ets.json (written by test/reference/ets.R).
const ref = JSON.parse(readFileSync(new URL('../../reference/ets.json', import.meta.url), 'utf8'));
const air = Float64Array.from(ref.auto.find((c: {name: string}) => c.name === 'AirPassengers').values);

describe('runMethod', () => {
  it('ets-theta-arima weighs its members 45/45/10 and hands back the ARIMA order for refits', () => {
    const run = runMethod('ets-theta-arima', air, {period: 12, h: 6, levels: [80]});
    const {order} = run.details.arima as {order: number[]};
    expect(run.details.weights).toEqual([0.45, 0.45, 0.1]);
    expect([run.arimaOrder!.p, run.arimaOrder!.d, run.arimaOrder!.q]).toEqual(order);
    expect(run.forecast.runningTotals).toBeDefined();
  });

  it('a given ARIMA order is refitted instead of searched', () => {
    const order = {p: 0, d: 1 as const, q: 0, constant: true};
    const run = runMethod('arima', air.subarray(0, 120), {period: 12, h: 6, levels: [80], arimaOrder: order});
    expect(run.details.order).toEqual([0, 1, 0]);
    expect(run.forecast.method).toBe('ARIMA(0,1,0) with drift on STL-adjusted data');
  });
});
