export interface PageGeometry {
  /** Content width in CSS px (96 per inch). */
  width: number;
}

/** Content width of the page in CSS px, for the paper, orientation and the margins in styles.css (16 mm). */
export function pageGeometry(paper: 'A4' | 'Letter', orientation: 'portrait' | 'landscape'): PageGeometry {
  const [w, h] = paper === 'A4' ? [210, 297] : [215.9, 279.4];
  const across = orientation === 'portrait' ? w : h;
  return {width: Math.floor(((across - 32) * 96) / 25.4)};
}
