import { describe, expect, it } from 'vitest';
import fc from 'fast-check';
import { canonicalJson } from '../../../src/core/records/canonical-json.ts';
import { canonicalJsonBytes } from '../../../src/core/records/canonical-json-bytes.ts';

describe('canonicalJsonBytes', () => {
  it('are TextEncoder\'s bytes of the canonical text', () => {
    fc.assert(
      fc.property(fc.jsonValue(), (v) => {
        expect(canonicalJsonBytes(v)).toEqual(new TextEncoder().encode(canonicalJson(v)));
      }),
      { numRuns: 300 },
    );
  });
  it('join pieces across many 64 KiB buffers', () => {
    const v = ['\u20ac'.repeat(70_000), 'x'.repeat(70_000)];
    expect(Buffer.from(canonicalJsonBytes(v)).toString('utf8')).toBe(canonicalJson(v));
  });
  it('of null: the four bytes of "null" (degenerate input)', () => {
    expect([...canonicalJsonBytes(null)]).toEqual([0x6e, 0x75, 0x6c, 0x6c]);
  });
});
