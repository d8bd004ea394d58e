/**
 * The UTF-16 byte order a file's first bytes declare (`FF FE` little-endian, `FE FF` big-endian), or null. A
 * spreadsheet's "Unicode text" export is UTF-16 with such a mark; the mark settles the encoding, whatever the source's
 * `encoding` says, since no UTF-8 or Windows-1252 CSV starts with those bytes before its header.
 *
 * Reference: The Unicode Standard, §23.8 (byte order mark). Complexity: O(1).
 */
export function utf16Order(bytes: Uint8Array): 'utf16le' | 'utf16be' | null {
  if (bytes.length < 2) return null;
  if (bytes[0] === 0xff && bytes[1] === 0xfe) return 'utf16le';
  if (bytes[0] === 0xfe && bytes[1] === 0xff) return 'utf16be';
  return null;
}
