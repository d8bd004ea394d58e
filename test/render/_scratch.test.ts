import {test} from 'vitest';
import {writeFileSync} from 'node:fs';
import {renderHtml, openBrowser} from '../../src/render/index.js';
import {makeReport} from './fixtures.js';
test('scratch', async () => {
  const report = makeReport({history: true, shortSecond: true, count: 4});
  let t = Date.now();
  const html = await renderHtml(report);
  console.log('html ms', Date.now() - t, html.length);
  writeFileSync('/tmp/r.html', html);
  const b = await openBrowser(null);
  if ('missing' in b) throw new Error(b.missing);
  t = Date.now();
  const pdf = await b.pdf(html, {title: report.plan.title, periodLabel: '2026-10', paper: 'A4', orientation: 'portrait', font: 'Liberation Sans', footer: 'Harbourline Trading · internal', date: '20261101'});
  console.log('pdf ms', Date.now() - t);
  writeFileSync('/tmp/r.pdf', pdf);
  await b.close();
});
