import {test} from 'vitest';
import {writeFileSync} from 'node:fs';
import {renderHtml, openBrowser} from '../../src/render/index.js';
import {makeReport} from './fixtures.js';
test('scratch2', async () => {
  const report = makeReport({count: 3, history: true, shortSecond: true});
  report.plan.branding.logo = '/tmp/logo.svg';
  const html = await renderHtml(report);
  writeFileSync('/tmp/r3.html', html);
  const b = await openBrowser(null);
  if ('missing' in b) throw new Error(b.missing);
  const pdf = await b.pdf(html, {title: report.plan.title, periodLabel: '2026-10', paper: 'A4', orientation: 'portrait', font: 'Liberation Sans', footer: 'Harbourline Trading · internal', date: '20261101'});
  writeFileSync('/tmp/r3.pdf', pdf);
  await b.close();
});
