import {extname} from 'node:path';

/**
 * Logo image types by file extension, and the check that a file's first bytes match its extension. Shared by
 * the config cross-check (so `check` rejects a mislabelled logo) and the HTML renderer (which inlines it).
 */

/** MIME type for each logo extension the report accepts. */
export const IMAGE_TYPES: Readonly<Record<string, string>> = {
  '.png': 'image/png',
  '.jpg': 'image/jpeg',
  '.jpeg': 'image/jpeg',
  '.svg': 'image/svg+xml',
};

/** MIME type for a logo file name, or undefined for an extension we do not accept. */
export function imageTypeOf(file: string): string | undefined {
  return IMAGE_TYPES[extname(file).toLowerCase()];
}

const PNG_SIGNATURE = Buffer.from([0x89, 0x50, 0x4e, 0x47, 0x0d, 0x0a, 0x1a, 0x0a]);

/**
 * Whether `bytes` (the file's start; 4096 bytes suffice) look like `type`: PNG by its 8-byte signature, JPEG by
 * the SOI marker FF D8, SVG by an `<svg` element start in the first 4096 bytes. O(4096).
 */
export function imageMatches(type: string, bytes: Buffer): boolean {
  if (type === 'image/png') return bytes.subarray(0, 8).equals(PNG_SIGNATURE);
  if (type === 'image/jpeg') return bytes[0] === 0xff && bytes[1] === 0xd8;
  if (type === 'image/svg+xml') return /<svg[\s>]/i.test(bytes.subarray(0, 4096).toString('utf8'));
  return false;
}
