import { describe, expect, it } from 'vitest';
import fc from 'fast-check';
import { createHash } from 'node:crypto';
import { canonicalJson } from '../../../src/core/records/canonical-json.ts';
import { canonicalSha256 } from '../../../src/core/records/canonical-sha256.ts';
import { InputError } from '../../../src/core/errors.ts';

describe('canonicalSha256', () => {
  it('is Node\'s SHA-256 of the canonical text\'s UTF-8 bytes, with their length', () => {
    fc.assert(
      fc.property(fc.jsonValue(), (v) => {
        const text = canonicalJson(v);
        const d = canonicalSha256(v);
        expect(d.hex).toBe(createHash('sha256').update(text, 'utf8').digest('hex'));
        expect(d.bytes).toBe(Buffer.byteLength(text, 'utf8'));
      }),
      { numRuns: 300 },
    );
  });
  it('hashes a text larger than its 64 KiB buffer as Node does', () => {
    const v = { notes: 'é°'.repeat(100_000), list: Array.from({ length: 5000 }, (_, i) => i / 7) };
    expect(canonicalSha256(v).hex).toBe(createHash('sha256').update(canonicalJson(v), 'utf8').digest('hex'));
  });
  it('of an empty payload: the checksum the backup test computes with Node', () => {
    // The text '{"revisions":[],"studies":[]}' is 29 bytes.
    const d = canonicalSha256({ studies: [], revisions: [] });
    expect(d.bytes).toBe(29);
    expect(d.hex).toBe(createHash('sha256').update('{"revisions":[],"studies":[]}').digest('hex'));
  });
  it('refuses what canonical JSON refuses (degenerate input)', () => {
    expect(() => canonicalSha256({ a: Number.NaN })).toThrow(InputError);
  });
});
