import {describe, expect, it} from 'vitest';
import fc from 'fast-check';
import {escapeHtml} from '../../src/archive/escapeHtml.js';

const unescape = (s: string) =>
  s.replace(/&(amp|lt|gt|quot|#39);/g, (_, e: string) => ({amp: '&', lt: '<', gt: '>', quot: '"', '#39': "'"})[e]!);

describe('escapeHtml', () => {
  it('escapes the five HTML-special characters', () => {
    expect(escapeHtml(`<img src=x onerror="alert('1')">&`)).toBe(
      '&lt;img src=x onerror=&quot;alert(&#39;1&#39;)&quot;&gt;&amp;',
    );
  });

  it('never leaves a markup character and can be undone (property)', () => {
    fc.assert(
      fc.property(fc.string({unit: fc.constantFrom('<', '>', '&', '"', "'", ';', '#', 'a', 'é', '😀')}), (s) => {
        const e = escapeHtml(s);
        expect(e).not.toMatch(/[<>"']/);
        expect(unescape(e)).toBe(s);
      }),
    );
  });
});
