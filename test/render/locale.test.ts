import {describe, expect, test} from 'vitest';
import {grouping, vegaLocale} from '../../src/render/locale.js';
import {specToSvg} from '../../src/render/svg.js';
import {overviewChart} from '../../src/render/charts/overview.js';
import {themeFor} from '../../src/render/theme.js';
import {wordsFor} from '../../src/words/index.js';
import {monthIndex} from '../../src/time/period.js';

// Grouping sizes as CLDR (Node's ICU) defines them: en-IN groups the first three digits, then pairs.
describe('chart axes follow the locale’s digit grouping', () => {
  test('grouping from Intl', () => {
    expect(grouping('en-GB')).toEqual([3]);
    expect(grouping('de-DE')).toEqual([3]);
    expect(grouping('en-IN')).toEqual([3, 2]);
    expect(vegaLocale('en-IN').number.grouping).toEqual([3, 2]);
  });

  test('an en-IN axis prints lakhs as 12,00,000', async () => {
    const w = wordsFor('en-IN');
    const ctx = {frequency: 'monthly' as const, theme: themeFor('#1d6f64', 'Liberation Sans'), width: 320, height: 120, unit: null, seasonNames: [], words: w};
    const original = Array.from({length: 24}, (_, i) => 1_000_000 + 20_000 * i);
    const spec = overviewChart({start: monthIndex(2024, 1), original, adjusted: null, trend: null, description: 'd'}, ctx);
    const svg = await specToSvg(spec, {locale: 'en-IN', font: 'Liberation Sans', idPrefix: 'x', title: 't', description: 'd'});
    expect(svg).toMatch(/>1[0-4],[0-9]0,000</);
  });
});
