import {expect, test} from 'vitest';
import {fontFile, measureText} from '../../src/render/textMetrics.js';

test('the report font is found through fontconfig and measured', () => {
  expect(fontFile('Liberation Sans', false)).toMatch(/\.ttf$/i);
  // 45.3 px for "Jan 2024" at 11 px, as Chromium lays it out (ECOSYSTEM.md §1, measured there).
  expect(measureText('Liberation Sans', false, 11, 'Jan 2024')).toBeCloseTo(45.3, 0);
});

test('without fontconfig, charts fail with an environment problem that names the fix', () => {
  const path = process.env.PATH;
  process.env.PATH = '/nonexistent';
  try {
    expect(() => fontFile('Liberation Sans', true)).toThrow(
      /fc-match .*not installed; install it with `apt-get install fontconfig fonts-liberation2`/,
    );
  } finally {
    process.env.PATH = path;
  }
});
