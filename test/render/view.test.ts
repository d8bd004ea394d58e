import {describe, expect, test} from 'vitest';
import {pageGeometry} from '../../src/render/view/index.js';
import {ramp, themeFor} from '../../src/render/theme.js';

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
