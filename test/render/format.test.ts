import {describe, expect, test} from 'vitest';
import {formatter} from '../../src/render/format.js';
import {pageGeometry} from '../../src/render/view.js';
import {ramp, themeFor} from '../../src/render/theme.js';
import {monthIndex, quarterIndex} from '../../src/time/period.js';

describe('formatter', () => {
  test('en-GB numbers, signed percentages and missing values', () => {
    const f = formatter('en-GB');
    expect(f.number(12345.678)).toBe('12,346');
    expect(f.number(12.345)).toBe('12.3');
    expect(f.number(1.2345)).toBe('1.23');
    expect(f.percent(4.25)).toBe('+4.3%');
    expect(f.percent(-1)).toBe('-1.0%');
    expect(f.percent(0)).toBe('0.0%');
    expect(f.number(NaN)).toBe('–');
    expect(f.percent(null)).toBe('–');
  });

  test('de-DE and fr-FR marks and month names', () => {
    expect(formatter('de-DE').number(12345.6, 1)).toBe('12.345,6');
    expect(formatter('de-DE').periodLong('monthly', monthIndex(2026, 10))).toBe('Oktober 2026');
    expect(formatter('fr-FR').periodLong('monthly', monthIndex(2026, 3))).toBe('mars 2026');
    expect(formatter('en-US').period('quarterly', quarterIndex(2026, 3))).toBe('Q3 2026');
    expect(formatter('en-GB').period('weekly', 2960)).toMatch(/^W\d+ \d{4}$/);
  });

  test('an unknown locale falls back to en-GB', () => {
    expect(formatter('zz-@@').locale).toBe('en-GB');
  });
});

describe('pageGeometry', () => {
  test('content width in CSS px for 16 mm side margins', () => {
    expect(pageGeometry('A4', 'portrait').width).toBe(672);
    expect(pageGeometry('A4', 'landscape').width).toBe(1001);
    expect(pageGeometry('Letter', 'portrait').width).toBe(695);
  });
});

describe('theme', () => {
  test('derived colours are hex, ramp runs light to deep; a bad accent falls back', () => {
    const t = themeFor('#1D6F64', 'Liberation Sans');
    for (const c of [t.accent, t.deep, t.tint, t.wash, t.contrast, t.contrastTint]) expect(c).toMatch(/^#[0-9a-f]{6}$/);
    expect(t.accent).toBe('#1d6f64');
    expect(ramp(t, 3)[2]).toBe(t.deep);
    expect(themeFor('red; }', 'x').accent).toBe('#2f5d8a');
  });
});
