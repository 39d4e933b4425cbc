/**
 * The canonical JSON of a value (canonical-json.ts) as UTF-8 bytes in one typed array, for a
 * digest that needs the message whole (Web Crypto's). Method: RFC 8785, RFC 3629.
 */
import { writeCanonicalJson } from './canonical-json.ts';
import { Utf8Chunks } from './utf8.ts';

/**
 * The canonical JSON of a value as UTF-8 bytes in one typed array (for a digest that needs the
 * message whole, such as Web Crypto's): encoded in 64 KiB pieces, then copied once into an array
 * of the exact length, so memory stays about twice the bytes. Throws as canonicalJson does.
 * Example: canonicalJsonBytes([1]) -> Uint8Array [0x5b, 0x31, 0x5d].
 */
export function canonicalJsonBytes(value: unknown): Uint8Array {
  const parts: Uint8Array[] = [];
  const chunks = new Utf8Chunks((b) => parts.push(b.slice()));
  writeCanonicalJson(value, (p) => chunks.write(p));
  const out = new Uint8Array(chunks.end());
  let at = 0;
  for (let i = 0; i < parts.length; i++) {
    out.set(parts[i], at);
    at += parts[i].length;
    parts[i] = EMPTY; // let each piece go as soon as it is copied
  }
  return out;
}

const EMPTY = new Uint8Array(0);
