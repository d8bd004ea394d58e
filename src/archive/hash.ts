import {createHash} from 'node:crypto';

/**
 * SHA-256 of a file's bytes (strings are hashed as UTF-8), as 64 lowercase hex digits.
 *
 * Why: the manifest records input and output hashes so a reader can tell whether an archived
 * report was built from the same data, and whether its files were changed afterwards.
 * Reference: FIPS 180-4 (node:crypto). Complexity: O(bytes).
 */
export function sha256(content: string | Uint8Array): string {
  return createHash('sha256').update(content).digest('hex');
}

/** Size in bytes of what {@link sha256} hashes. */
export function byteLength(content: string | Uint8Array): number {
  return typeof content === 'string' ? Buffer.byteLength(content, 'utf8') : content.byteLength;
}
