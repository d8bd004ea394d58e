import {test} from 'vitest';
import {renderHtml} from '../../src/render/index.js';
import {makeReport} from './fixtures.js';
test('s', async () => {
  const html = await renderHtml(makeReport({count: 3, shortSecond: true}));
  for (const m of html.matchAll(/NaN|undefined|\[object Object\]/g)) console.log(html.slice(m.index! - 150, m.index! + 50));
});
