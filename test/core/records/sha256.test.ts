import { describe, expect, it } from 'vitest';
import fc from 'fast-check';
import { createHash } from 'node:crypto';
import { Sha256, sha256, toHex, utf8Encode } from '../../../src/core/records/sha256.ts';

const hex = (s: string) => toHex(sha256(utf8Encode(s)));

describe('sha256', () => {
  // FIPS 180-4 / NIST "Cryptographic Standards and Guidelines: Examples with Intermediate
  // Values", SHA-256: the one-block message "abc" and the two-block 448-bit message.
  it('matches the NIST example for "abc"', () => {
    expect(hex('abc')).toBe('ba7816bf8f01cfea414140de5dae2223b00361a396177a9cb410ff61f20015ad');
  });
  it('matches the NIST example for the 448-bit message', () => {
    expect(hex('abcdbcdecdefdefgefghfghighijhijkijkljklmklmnlmnomnopnopq')).toBe('248d6a61d20638b8e5c026930c3e6039a33ce45964ff2167f6ecedd419db06c1');
  });
  // FIPS 180-2, Appendix B.3: one million repetitions of "a".
  it('matches the FIPS 180-2 example for a million "a"', () => {
    expect(toHex(sha256(new Uint8Array(1_000_000).fill(0x61)))).toBe('cdc76e5c9914fb9281a1c7e284d73e67f1809a48a497200e046d39ccc7112cd0');
  });
  // NIST CAVP SHA-256 ShortMsg test vectors, Len = 0 (the empty message).
  it('matches the NIST vector for the empty message', () => {
    expect(hex('')).toBe('e3b0c44298fc1c149afbf4c8996fb92427ae41e4649b934ca495991b7852b855');
  });
  it('agrees with Node\'s OpenSSL SHA-256 on random messages, across block boundaries', () => {
    fc.assert(
      fc.property(fc.uint8Array({ maxLength: 300 }), (bytes) => {
        expect(toHex(sha256(bytes))).toBe(createHash('sha256').update(bytes).digest('hex'));
      }),
      { numRuns: 500 },
    );
  });
});

describe('utf8Encode', () => {
  // RFC 3629, section 7 (examples).
  it('matches the RFC 3629 examples', () => {
    expect([...utf8Encode('A\u2262\u0391.')]).toEqual([0x41, 0xe2, 0x89, 0xa2, 0xce, 0x91, 0x2e]);
    expect([...utf8Encode('\ud55c\uad6d\uc5b4')]).toEqual([0xed, 0x95, 0x9c, 0xea, 0xb5, 0xad, 0xec, 0x96, 0xb4]);
    expect([...utf8Encode('\u65e5\u672c\u8a9e')]).toEqual([0xe6, 0x97, 0xa5, 0xe6, 0x9c, 0xac, 0xe8, 0xaa, 0x9e]);
    expect([...utf8Encode('\ufeff\u{233b4}')]).toEqual([0xef, 0xbb, 0xbf, 0xf0, 0xa3, 0x8e, 0xb4]);
  });
  it('agrees with Node\'s encoder on any string, lone surrogates included', () => {
    fc.assert(
      fc.property(fc.string({ unit: 'binary' }), fc.string({ unit: fc.integer({ min: 0xd800, max: 0xdfff }).map((c) => String.fromCharCode(c)) }), (s, lone) => {
        const t = s + lone;
        expect([...utf8Encode(t)]).toEqual([...Buffer.from(t, 'utf8')]);
      }),
      { numRuns: 500 },
    );
  });
});

describe('Sha256 (bytes in pieces)', () => {
  it('agrees with Node\'s OpenSSL SHA-256 however the message is cut', () => {
    fc.assert(
      fc.property(fc.uint8Array({ maxLength: 400 }), fc.array(fc.nat(), { maxLength: 8 }), (bytes, cuts) => {
        const at = [...new Set(cuts.map((c) => c % (bytes.length + 1)))].sort((a, b) => a - b);
        const h = new Sha256();
        let from = 0;
        for (const c of [...at, bytes.length]) {
          h.update(bytes.subarray(from, c));
          from = c;
        }
        expect(toHex(h.digest())).toBe(createHash('sha256').update(bytes).digest('hex'));
      }),
      { numRuns: 500 },
    );
  });
  // FIPS 180-2, Appendix B.3: one million "a", here fed 997 bytes at a time (a prime, so the
  // pieces straddle every block boundary).
  it('matches the FIPS 180-2 million-"a" example fed in 997-byte pieces', () => {
    const piece = new Uint8Array(997).fill(0x61);
    const h = new Sha256();
    let left = 1_000_000;
    while (left > 0) {
      const n = Math.min(left, piece.length);
      h.update(piece.subarray(0, n));
      left -= n;
    }
    expect(toHex(h.digest())).toBe('cdc76e5c9914fb9281a1c7e284d73e67f1809a48a497200e046d39ccc7112cd0');
  });
  it('refuses more bytes, or a second digest, after the digest (degenerate use)', () => {
    const h = new Sha256();
    // NIST CAVP ShortMsg, Len = 0.
    expect(toHex(h.digest())).toBe('e3b0c44298fc1c149afbf4c8996fb92427ae41e4649b934ca495991b7852b855');
    expect(() => h.update(new Uint8Array(1))).toThrow(RangeError);
    expect(() => h.digest()).toThrow(RangeError);
  });
});
