import {test} from 'vitest';
import {specToSvg} from '../../src/render/svg.js';
import {seasonalChart} from '../../src/render/charts/seasonal.js';
import {themeFor} from '../../src/render/theme.js';
import {makeReport} from './fixtures.js';
test('scratch2', async () => {
  const r = makeReport();
  const a = r.series[0].analysis;
  const spec = seasonalChart({start: a.start, seasonal: a.adjustment!.seasonal, model: 'multiplicative', description: 'x'}, {frequency: 'monthly', theme: themeFor('#1d6f64', 'Liberation Sans'), width: 327, height: 180, unit: null, seasonNames: ['Jan','Feb','Mar','Apr','May','Jun','Jul','Aug','Sep','Oct','Nov','Dec']});
  const svg = await specToSvg(spec, {locale: 'en-GB', font: 'Liberation Sans', idPrefix: 'x', title: 't', description: 'd'});
  console.log(svg.includes('role-legend'), JSON.stringify(spec.config?.legend));
});
