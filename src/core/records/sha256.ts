/**
 * SHA-256 (FIPS 180-4, "Secure Hash Standard", section 6.2), a small pure implementation: the
 * backup checksum where a page or program has no Web Crypto (a page served over plain http has
 * no crypto.subtle), and the derived revision ids the store makes. Cost: one pass over the
 * bytes, 64 rounds per 64-byte block (the Sha256 class below takes the bytes in pieces). Throws
 * nothing.
 * Example: toHex(sha256(utf8Encode('abc'))) ->
 *   'ba7816bf8f01cfea414140de5dae2223b00361a396177a9cb410ff61f20015ad' (FIPS 180-4 example).
 */
import { Utf8Chunks, utf8Length } from './utf8.ts';

// FIPS 180-4 section 4.2.2: the first 32 bits of the fractional parts of the cube roots of the
// first 64 primes.
const K = new Uint32Array([
  0x428a2f98, 0x71374491, 0xb5c0fbcf, 0xe9b5dba5, 0x3956c25b, 0x59f111f1, 0x923f82a4, 0xab1c5ed5,
  0xd807aa98, 0x12835b01, 0x243185be, 0x550c7dc3, 0x72be5d74, 0x80deb1fe, 0x9bdc06a7, 0xc19bf174,
  0xe49b69c1, 0xefbe4786, 0x0fc19dc6, 0x240ca1cc, 0x2de92c6f, 0x4a7484aa, 0x5cb0a9dc, 0x76f988da,
  0x983e5152, 0xa831c66d, 0xb00327c8, 0xbf597fc7, 0xc6e00bf3, 0xd5a79147, 0x06ca6351, 0x14292967,
  0x27b70a85, 0x2e1b2138, 0x4d2c6dfc, 0x53380d13, 0x650a7354, 0x766a0abb, 0x81c2c92e, 0x92722c85,
  0xa2bfe8a1, 0xa81a664b, 0xc24b8b70, 0xc76c51a3, 0xd192e819, 0xd6990624, 0xf40e3585, 0x106aa070,
  0x19a4c116, 0x1e376c08, 0x2748774c, 0x34b0bcb5, 0x391c0cb3, 0x4ed8aa4a, 0x5b9cca4f, 0x682e6ff3,
  0x748f82ee, 0x78a5636f, 0x84c87814, 0x8cc70208, 0x90befffa, 0xa4506ceb, 0xbef9a3f7, 0xc67178f2,
]);

/**
 * SHA-256 over bytes given in pieces (FIPS 180-4 section 6.2, the message processed block by
 * block as it comes), so a large message never has to sit in memory whole. Cost: 64 rounds per
 * 64-byte block; nothing allocated per block. Throws nothing.
 * Example: new Sha256().update(utf8Encode('ab')).update(utf8Encode('c')).digest() equals sha256(utf8Encode('abc')).
 */
export class Sha256 {
  // Initial hash value (section 5.3.3).
  private readonly H = new Uint32Array([0x6a09e667, 0xbb67ae85, 0x3c6ef372, 0xa54ff53a, 0x510e527f, 0x9b05688c, 0x1f83d9ab, 0x5be0cd19]);
  private readonly W = new Uint32Array(64);
  /** A block not yet full. */
  private readonly partial = new Uint8Array(64);
  private partialLength = 0;
  private length = 0;
  private done = false;

  /** Adds bytes to the message (the bytes are read during the call, not kept). */
  update(bytes: Uint8Array): this {
    if (this.done) throw new RangeError('Sha256: update after digest');
    this.length += bytes.length;
    let i = 0;
    const n = bytes.length;
    if (this.partialLength > 0) {
      while (i < n && this.partialLength < 64) this.partial[this.partialLength++] = bytes[i++];
      if (this.partialLength < 64) return this;
      this.block(this.partial, 0);
      this.partialLength = 0;
    }
    for (; i + 64 <= n; i += 64) this.block(bytes, i);
    while (i < n) this.partial[this.partialLength++] = bytes[i++];
    return this;
  }

  /** The 32 bytes of the digest; the hasher takes no more bytes after this. */
  digest(): Uint8Array {
    if (this.done) throw new RangeError('Sha256: digest taken twice');
    // Padding (section 5.1.1): a 1 bit, zeros, then the message length in bits as 64 bits.
    const bytes = this.length;
    const tail = new Uint8Array(((this.partialLength + 9 + 63) >> 6) << 6);
    tail.set(this.partial.subarray(0, this.partialLength));
    tail[this.partialLength] = 0x80;
    const view = new DataView(tail.buffer);
    view.setUint32(tail.length - 8, Math.floor(bytes / 0x20000000)); // bits / 2^32
    view.setUint32(tail.length - 4, (bytes * 8) >>> 0);
    for (let off = 0; off < tail.length; off += 64) this.block(tail, off);
    this.done = true;
    const out = new Uint8Array(32);
    const outView = new DataView(out.buffer);
    for (let i = 0; i < 8; i++) outView.setUint32(i * 4, this.H[i]);
    return out;
  }

  private block(b: Uint8Array, off: number): void {
    const W = this.W;
    const H = this.H;
    for (let t = 0; t < 16; t++) {
      const o = off + t * 4;
      W[t] = ((b[o] << 24) | (b[o + 1] << 16) | (b[o + 2] << 8) | b[o + 3]) >>> 0;
    }
    for (let t = 16; t < 64; t++) {
      const w15 = W[t - 15];
      const w2 = W[t - 2];
      const s0 = rotr(w15, 7) ^ rotr(w15, 18) ^ (w15 >>> 3);
      const s1 = rotr(w2, 17) ^ rotr(w2, 19) ^ (w2 >>> 10);
      W[t] = (W[t - 16] + s0 + W[t - 7] + s1) >>> 0;
    }
    let a = H[0], b2 = H[1], c = H[2], d = H[3], e = H[4], f = H[5], g = H[6], h = H[7];
    for (let t = 0; t < 64; t++) {
      const S1 = rotr(e, 6) ^ rotr(e, 11) ^ rotr(e, 25);
      const ch = (e & f) ^ (~e & g);
      const T1 = (h + S1 + ch + K[t] + W[t]) >>> 0;
      const S0 = rotr(a, 2) ^ rotr(a, 13) ^ rotr(a, 22);
      const maj = (a & b2) ^ (a & c) ^ (b2 & c);
      const T2 = (S0 + maj) >>> 0;
      h = g;
      g = f;
      f = e;
      e = (d + T1) >>> 0;
      d = c;
      c = b2;
      b2 = a;
      a = (T1 + T2) >>> 0;
    }
    H[0] = (H[0] + a) >>> 0;
    H[1] = (H[1] + b2) >>> 0;
    H[2] = (H[2] + c) >>> 0;
    H[3] = (H[3] + d) >>> 0;
    H[4] = (H[4] + e) >>> 0;
    H[5] = (H[5] + f) >>> 0;
    H[6] = (H[6] + g) >>> 0;
    H[7] = (H[7] + h) >>> 0;
  }
}

const rotr = (x: number, n: number) => (x >>> n) | (x << (32 - n));

/** SHA-256 of the bytes, as 32 bytes. */
export function sha256(message: Uint8Array): Uint8Array {
  return new Sha256().update(message).digest();
}

/** Lower-case hexadecimal of the bytes. */
export function toHex(bytes: Uint8Array): string {
  let s = '';
  for (const b of bytes) s += b.toString(16).padStart(2, '0');
  return s;
}

/** UTF-8 bytes of a string (RFC 3629) in one typed array of the exact length; a lone surrogate
 * becomes U+FFFD, as TextEncoder does. */
export function utf8Encode(text: string): Uint8Array {
  const out = new Uint8Array(utf8Length(text));
  let at = 0;
  const chunks = new Utf8Chunks((bytes) => {
    out.set(bytes, at);
    at += bytes.length;
  }, Math.min(1 << 16, Math.max(16, out.length + 4)));
  chunks.write(text);
  chunks.end();
  return out;
}
