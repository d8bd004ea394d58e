import {describe, expect, it} from 'vitest';
import {compactSvg} from '../../src/render/svgCompact.js';

const wrap = (inner: string) =>
  `<svg viewBox="0 0 10 10"><defs><clipPath id="c"><path d="M0,0h5v5h-5Z"/></clipPath></defs>` +
  `<g fill="none" transform="translate(1,1)">${inner}</g></svg>`;

describe('compactSvg', () => {
  it('drops paths that paint nothing, keeps painted ones and everything inside defs', () => {
    const out = compactSvg(
      wrap('<g><path d="M0,0h0v0h0Z"/><path d="" display="none"/><path d="M0,0h4v4h-4Z" opacity="1"/></g>'),
    );
    expect(out).toBe(wrap(''));
    const painted = wrap('<path d="M0,0h4v4h-4Z" fill="#123456"/><path d="M0,0L1,1" stroke="#000"/>');
    expect(compactSvg(painted)).toBe(painted);
    expect(out).toContain('<clipPath id="c"><path d="M0,0h5v5h-5Z"/></clipPath>');
  });

  it('merges a run of lines with the same stroke into one path of segments', () => {
    const lines =
      '<line transform="translate(0,5)" x2="9" y2="0" stroke="#eee" stroke-width="1" opacity="1"/>' +
      '<line transform="translate(0,2.5)" x2="9" y2="0" stroke="#eee" stroke-width="1" opacity="1"/>';
    expect(compactSvg(wrap(lines))).toBe(wrap('<path d="M0,5l9,0M0,2.5l9,0" stroke="#eee" stroke-width="1"/>'));
    const mixed =
      '<line transform="translate(0,5)" x2="9" y2="0" stroke="#eee"/>' +
      '<line transform="translate(0,2)" x2="9" y2="0" stroke="#000"/>';
    expect(compactSvg(wrap(mixed))).toBe(wrap(mixed));
  });

  it('unwraps groups without attributes and keeps those with a transform', () => {
    const inner = '<g><g transform="translate(2,0)"><g><text fill="#000">a</text></g></g></g>';
    expect(compactSvg(wrap(inner))).toBe(wrap('<g transform="translate(2,0)"><text fill="#000">a</text></g>'));
  });

  it('leaves an SVG alone when a group other than the root sets a fill', () => {
    const svg = wrap('<g fill="red"><path d="M0,0h4v4h-4Z"/></g>');
    expect(compactSvg(svg)).toBe(svg);
    const noRootFill = '<svg><g><path d="M0,0h4v4h-4Z"/></g></svg>';
    expect(compactSvg(noRootFill)).toBe(noRootFill);
  });
});
