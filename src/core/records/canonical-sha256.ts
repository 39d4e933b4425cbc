/**
 * The SHA-256 of a value's canonical JSON (the backup checksum), taken as the text is written:
 * the canonical writer's pieces are encoded as UTF-8 into one 64 KiB buffer that is hashed each
 * time it fills, so neither the text nor its bytes ever sit in memory whole.
 * Method: RFC 8785 canonical JSON (canonical-json.ts), UTF-8 (RFC 3629), SHA-256 (FIPS 180-4).
 * Cost: one pass over the value; memory: 64 KiB plus the writer's stack.
 * Throws InputError as canonicalJson does (a non-finite number, nesting deeper than MAX_NESTING).
 * Example: canonicalSha256({ revisions: [], studies: [] }).bytes -> 29 (the text '{"revisions":[],"studies":[]}').
 */
import { writeCanonicalJson } from './canonical-json.ts';
import { Sha256, toHex } from './sha256.ts';
import { Utf8Chunks } from './utf8.ts';

export interface CanonicalDigest {
  /** SHA-256 of the canonical JSON's UTF-8 bytes, as 64 lower-case hexadecimal digits. */
  readonly hex: string;
  /** Length of those bytes. */
  readonly bytes: number;
}

/** SHA-256 of the canonical JSON of a value, and its length in bytes. */
export function canonicalSha256(value: unknown): CanonicalDigest {
  const hash = new Sha256();
  const chunks = new Utf8Chunks((b) => hash.update(b));
  writeCanonicalJson(value, (p) => chunks.write(p));
  const bytes = chunks.end();
  return { hex: toHex(hash.digest()), bytes };
}
