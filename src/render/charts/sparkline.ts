import {escapeXml} from '../svg.js';

/**
 * A small inline trend line for a table row, written directly as SVG (no axes, so vega would add nothing
 * but time). Missing values break the line; the last point gets a dot. Coordinates are rounded to 0.1 px,
 * so output is byte-stable. O(n).
 */
export function sparkline(values: number[], options: {width?: number; height?: number; colour: string; label: string}): string {
  const {width = 84, height = 18, colour, label} = options;
  const pad = 2;
  const finite = values.filter(Number.isFinite);
  const lo = finite.length > 0 ? Math.min(...finite) : 0;
  const hi = finite.length > 0 ? Math.max(...finite) : 1;
  const span = hi - lo || 1;
  const x = (i: number) => (values.length > 1 ? pad + (i * (width - 2 * pad)) / (values.length - 1) : width / 2);
  const y = (v: number) => height - pad - ((v - lo) / span) * (height - 2 * pad);
  const r = (n: number) => Math.round(n * 10) / 10;
  let d = '';
  let pen = false;
  values.forEach((v, i) => {
    if (!Number.isFinite(v)) return void (pen = false);
    d += `${pen ? 'L' : 'M'}${r(x(i))},${r(y(v))}`;
    pen = true;
  });
  const lastIndex = values.map(Number.isFinite).lastIndexOf(true);
  const dot = lastIndex >= 0 ? `<circle cx="${r(x(lastIndex))}" cy="${r(y(values[lastIndex]))}" r="1.8" fill="${colour}"/>` : '';
  return (
    `<svg class="spark" xmlns="http://www.w3.org/2000/svg" viewBox="0 0 ${width} ${height}" width="${width}" height="${height}" role="img" aria-label="${escapeXml(label)}">` +
    (d ? `<path d="${d}" fill="none" stroke="${colour}" stroke-width="1.2" stroke-linejoin="round"/>` : '') +
    dot +
    '</svg>'
  );
}
