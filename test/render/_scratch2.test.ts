import {test} from 'vitest';
import {writeFileSync} from 'node:fs';
import {renderHtml, openBrowser} from '../../src/render/index.js';
import {makeReport} from './fixtures.js';
test('scratch2', async () => {
  const report = makeReport({count: 2, locale: 'de-DE', frequency: 'quarterly'});
  report.plan.branding.orientation = 'landscape';
  report.plan.branding.logo = '/tmp/logo.svg';
  report.plan.branding.accent = '#7a3b8f';
  const html = await renderHtml(report);
  const b = await openBrowser(null);
  if ('missing' in b) throw new Error(b.missing);
  const pdf = await b.pdf(html, {title: report.plan.title, periodLabel: '2026-Q3', paper: 'A4', orientation: 'landscape', font: 'Liberation Sans', footer: 'x', date: '20261001', locale: 'de-DE'});
  writeFileSync('/tmp/r2.pdf', pdf);
  await b.close();
});
