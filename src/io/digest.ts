/**
 * The digest the backup checksum uses: Web Crypto's SHA-256 where the page or program has it,
 * the small pure implementation (src/core/records/sha256.ts) otherwise. Both give the same bytes.
 */
import { sha256 } from '../core/records/sha256.ts';

/** A SHA-256 digest function: bytes in, 32 bytes out. */
export type Digest = (bytes: Uint8Array) => Promise<Uint8Array>;

// The one part of Web Crypto used here; src/io's lib (ES2022) has no DOM types.
declare const crypto: { subtle?: { digest(algorithm: 'SHA-256', data: Uint8Array): Promise<ArrayBuffer> } } | undefined;

/** The small implementation as a Digest. */
export const portableDigest: Digest = async (bytes) => sha256(bytes);

/** Web Crypto's SHA-256 where the page or program has it, the small implementation otherwise. */
export const defaultDigest: Digest = async (bytes) => {
  const subtle = typeof crypto !== 'undefined' ? crypto?.subtle : undefined;
  if (subtle && typeof subtle.digest === 'function') return new Uint8Array(await subtle.digest('SHA-256', bytes));
  return sha256(bytes);
};
