import { describe, expect, it } from 'vitest';
import fc from 'fast-check';
import { Utf8Chunks, utf8Length } from '../../../src/core/records/utf8.ts';

// Any UTF-16 text, lone surrogates included (which TextEncoder writes as U+FFFD).
const anyText = fc.array(fc.integer({ min: 0, max: 0xffff }), { maxLength: 200 }).map((units) => String.fromCharCode(...units));
const reference = (s: string) => new TextEncoder().encode(s); // the WHATWG Encoding Standard's encoder, as Node ships it

describe('utf8Length', () => {
  // RFC 3629 section 7: "A<NOT IDENTICAL TO><ALPHA>." is 7 bytes; U+10000 and above take 4.
  it('counts the RFC 3629 example and a pair outside the basic plane', () => {
    expect(utf8Length('A\u2262\u0391.')).toBe(7);
    expect(utf8Length('\ud83d\ude00')).toBe(4);
    expect(utf8Length('')).toBe(0);
  });
  it('agrees with TextEncoder on any text, lone surrogates included', () => {
    fc.assert(fc.property(anyText, (s) => {
        expect(utf8Length(s)).toBe(reference(s).length);
      }), { numRuns: 500 });
  });
});

describe('Utf8Chunks', () => {
  it('gives the bytes TextEncoder gives, whatever the buffer size and however the text is cut into writes', () => {
    fc.assert(
      fc.property(fc.array(anyText, { maxLength: 6 }), fc.integer({ min: 16, max: 64 }), (texts, size) => {
        const seen: number[] = [];
        const c = new Utf8Chunks((b) => {
          expect(b.length).toBeLessThanOrEqual(size);
          seen.push(...b);
        }, size);
        for (const t of texts) c.write(t);
        const total = c.end();
        // Each write is encoded on its own (a lone surrogate at a write's end is U+FFFD).
        const expected = texts.flatMap((t) => [...reference(t)]);
        expect(seen).toEqual(expected);
        expect(total).toBe(expected.length);
      }),
      { numRuns: 500 },
    );
  });
  it('hands on nothing for no text, and refuses a buffer too small for one character (degenerate)', () => {
    let calls = 0;
    const c = new Utf8Chunks(() => calls++);
    expect(c.end()).toBe(0);
    expect(calls).toBe(0);
    expect(() => new Utf8Chunks(() => undefined, 3)).toThrow(/at least 16 bytes, got 3/);
  });
});
