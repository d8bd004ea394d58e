/** The small part of opentype.js 2.0 (which ships no typings) that render/textMetrics.ts uses. */
declare module 'opentype.js' {
  interface Font {
    getAdvanceWidth(text: string, fontSize: number, options?: {kerning?: boolean}): number;
    charToGlyph(c: string): {advanceWidth?: number};
    unitsPerEm: number;
  }
  const opentype: {parse(buffer: ArrayBuffer): Font};
  export default opentype;
}
