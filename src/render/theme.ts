/**
 * The report's colour scheme, derived from one accent colour.
 *
 * Every role differs from its neighbours in lightness, stroke width or dash as well as hue, so the charts
 * still read when printed in greyscale. The scheme is ours: a deep shade of the accent for the trend-cycle,
 * the accent itself for seasonally adjusted figures, a neutral grey for original data, tints of the accent
 * for interval bands, and a warning hue (brick red, or deep blue beside a red accent) for flagged points and falls.
 *
 * Pure; O(1).
 */
export interface Theme {
  font: string;
  accent: string;
  /** Accent mixed 45% toward black: trend lines, headings. */
  deep: string;
  /** Accent mixed 78% toward white: inner (80%) bands, table stripes. */
  tint: string;
  /** Accent mixed 90% toward white: outer (95%) bands, panels. */
  wash: string;
  /** Brick red (deep blue when the accent is red or orange) at a readable lightness: outliers, falls, alerts. */
  contrast: string;
  /** Contrast mixed 70% toward white. */
  contrastTint: string;
  /** Original data and neutral marks. */
  neutral: string;
  ink: string;
  muted: string;
  rule: string;
}

const HEX = /^#([0-9a-f]{6})$/i;

/** Build the scheme from `#rrggbb`; an unreadable value falls back to a slate blue. */
export function themeFor(accent: string, font: string): Theme {
  const base = HEX.test(accent) ? accent.toLowerCase() : '#2f5d8a';
  const rgb = toRgb(base);
  const [h, s] = toHsl(rgb);
  // A brick red for flags and falls; a deep blue instead when the accent is itself red or orange.
  const reddish = s > 0.25 && (h < 40 || h > 330);
  const contrast = fromHsl(reddish ? 215 : 5, Math.min(0.75, Math.max(0.5, s)), 0.42);
  return {
    font,
    accent: base,
    deep: toHex(mix(rgb, [0, 0, 0], 0.45)),
    tint: toHex(mix(rgb, [255, 255, 255], 0.78)),
    wash: toHex(mix(rgb, [255, 255, 255], 0.9)),
    contrast: toHex(contrast),
    contrastTint: toHex(mix(contrast, [255, 255, 255], 0.7)),
    neutral: '#8a8f96',
    ink: '#1f2328',
    muted: '#5b6168',
    rule: '#d5d8dc',
  };
}

/** `count` shades from light to the deep accent, for one line per year (oldest lightest). */
export function ramp(theme: Theme, count: number): string[] {
  const light = mix(toRgb(theme.accent), [255, 255, 255], 0.7);
  const dark = toRgb(theme.deep);
  if (count <= 1) return [theme.deep];
  return Array.from({length: count}, (_, i) => toHex(mix(light, dark, i / (count - 1))));
}

type Rgb = [number, number, number];

function toRgb(hex: string): Rgb {
  const n = parseInt(hex.slice(1), 16);
  return [(n >> 16) & 255, (n >> 8) & 255, n & 255];
}

function toHex(rgb: Rgb): string {
  return '#' + rgb.map((c) => Math.round(Math.min(255, Math.max(0, c))).toString(16).padStart(2, '0')).join('');
}

function mix(a: Rgb, b: Rgb, t: number): Rgb {
  return [a[0] + (b[0] - a[0]) * t, a[1] + (b[1] - a[1]) * t, a[2] + (b[2] - a[2]) * t];
}

function toHsl([r, g, b]: Rgb): [number, number, number] {
  const [rr, gg, bb] = [r / 255, g / 255, b / 255];
  const max = Math.max(rr, gg, bb);
  const min = Math.min(rr, gg, bb);
  const l = (max + min) / 2;
  if (max === min) return [0, 0, l];
  const d = max - min;
  const s = l > 0.5 ? d / (2 - max - min) : d / (max + min);
  const h = max === rr ? (gg - bb) / d + (gg < bb ? 6 : 0) : max === gg ? (bb - rr) / d + 2 : (rr - gg) / d + 4;
  return [h * 60, s, l];
}

function fromHsl(h: number, s: number, l: number): Rgb {
  const c = (1 - Math.abs(2 * l - 1)) * s;
  const x = c * (1 - Math.abs(((h / 60) % 2) - 1));
  const m = l - c / 2;
  const [r, g, b] = h < 60 ? [c, x, 0] : h < 120 ? [x, c, 0] : h < 180 ? [0, c, x] : h < 240 ? [0, x, c] : h < 300 ? [x, 0, c] : [c, 0, x];
  return [(r + m) * 255, (g + m) * 255, (b + m) * 255];
}
