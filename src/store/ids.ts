/**
 * Random record ids: crypto.randomUUID where the page has it (secure contexts only), otherwise
 * a version 4 UUID (RFC 9562, section 5.4) built from crypto.getRandomValues, which every page has.
 * Example: newId() -> '3f1c2a9e-7b4d-4e21-9c0a-5d6e7f801234'.
 */

/** A random version 4 UUID from 16 random bytes. */
export function uuidFromBytes(bytes: Uint8Array): string {
  const b = Uint8Array.from(bytes.subarray(0, 16));
  b[6] = (b[6] & 0x0f) | 0x40; // version 4
  b[8] = (b[8] & 0x3f) | 0x80; // variant 10
  const h = Array.from(b, (x) => x.toString(16).padStart(2, '0')).join('');
  return `${h.slice(0, 8)}-${h.slice(8, 12)}-${h.slice(12, 16)}-${h.slice(16, 20)}-${h.slice(20)}`;
}

/** A new random id for a record. */
export function newId(): string {
  const c = globalThis.crypto;
  if (typeof c?.randomUUID === 'function') return c.randomUUID();
  return uuidFromBytes(c.getRandomValues(new Uint8Array(16)));
}
