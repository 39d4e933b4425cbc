import { describe, expect, it } from 'vitest';
import { createHash } from 'node:crypto';
import { defaultDigest, portableDigest } from '../../src/io/digest.ts';
import { toHex, utf8Encode } from '../../src/core/records/sha256.ts';

describe('digest', () => {
  it('Web Crypto (where present) and the small implementation give the same digest', async () => {
    const m = utf8Encode('Trialbook backup payload');
    expect(toHex(await defaultDigest(m))).toBe(toHex(await portableDigest(m)));
    // Reference: Node's OpenSSL SHA-256 of the same bytes.
    expect(toHex(await portableDigest(m))).toBe(createHash('sha256').update('Trialbook backup payload').digest('hex'));
  });
  it('digests the empty message as the NIST CAVP ShortMsg vector (Len = 0) says', async () => {
    // NIST CAVP SHA-256 ShortMsg test vectors, Len = 0.
    expect(toHex(await defaultDigest(new Uint8Array(0)))).toBe('e3b0c44298fc1c149afbf4c8996fb92427ae41e4649b934ca495991b7852b855');
  });
});
