import {describe, expect, it} from 'vitest';
import {byteLength, sha256} from '../../src/archive/hash.js';

describe('sha256', () => {
  it('matches the FIPS 180-2 appendix B.1 example ("abc") and the empty-message digest', () => {
    // FIPS 180-2, Appendix B.1 (one-block message "abc"); both also confirmed with coreutils sha256sum.
    expect(sha256('abc')).toBe('ba7816bf8f01cfea414140de5dae2223b00361a396177a9cb410ff61f20015ad');
    expect(sha256(new Uint8Array(0))).toBe('e3b0c44298fc1c149afbf4c8996fb92427ae41e4649b934ca495991b7852b855');
  });

  it('hashes strings as UTF-8 bytes', () => {
    // `printf 'é' | sha256sum` (two bytes, C3 A9).
    expect(sha256('é')).toBe('4a99557e4033c3539de2eb65472017cad5f9557f7a0625a09f1c3f6e2ba69c4c');
    expect(sha256(Uint8Array.of(0xc3, 0xa9))).toBe(sha256('é'));
    expect(byteLength('é')).toBe(2);
    expect(byteLength(Uint8Array.of(1, 2, 3))).toBe(3);
  });
});
