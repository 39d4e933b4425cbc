import { describe, expect, it } from 'vitest';
import fc from 'fast-check';
import { decodeText, decodeUtf8Strict, windows1252Char } from '../../src/io/decode-text.ts';
import { InputError } from '../../src/core/errors.ts';

// References: Node's Buffer (UTF-8, UTF-16LE encoders) and its WHATWG TextDecoder.
const utf8 = (s: string) => new Uint8Array(Buffer.from(s, 'utf8'));
const utf16le = (s: string) => new Uint8Array(Buffer.concat([Buffer.from([0xff, 0xfe]), Buffer.from(s, 'utf16le')]));
const utf16be = (s: string) => {
  const le = Buffer.from(s, 'utf16le');
  const be = Buffer.alloc(le.length);
  for (let i = 0; i < le.length; i += 2) (be[i] = le[i + 1]), (be[i + 1] = le[i]);
  return new Uint8Array(Buffer.concat([Buffer.from([0xfe, 0xff]), be]));
};

describe('decodeText', () => {
  const sample = 'Temperatur (°C),Glanz\r\n160,"82,5"\r\n温度,😀\n';
  it('reads UTF-8 with and without a byte-order mark, and UTF-16 by its mark (Unicode Standard, section 23.8)', () => {
    expect(decodeText(utf8(sample))).toEqual({ text: sample, encoding: 'UTF-8' });
    expect(decodeText(new Uint8Array([0xef, 0xbb, 0xbf, ...utf8(sample)]))).toEqual({ text: sample, encoding: 'UTF-8' });
    expect(decodeText(utf16le(sample))).toEqual({ text: sample, encoding: 'UTF-16LE' });
    expect(decodeText(utf16be(sample))).toEqual({ text: sample, encoding: 'UTF-16BE' });
  });
  it('property: the loop refuses exactly what the WHATWG decoder refuses, for any bytes', () => {
    fc.assert(
      // Uniform bytes, and bytes from the edges of table 3-7's ranges, where well-formed sequences are common.
      fc.property(fc.oneof(fc.uint8Array({ maxLength: 12 }), fc.array(fc.constantFrom(0x41, 0x7f, 0x80, 0x8f, 0x90, 0x9f, 0xa0, 0xbf, 0xc0, 0xc2, 0xdf, 0xe0, 0xe1, 0xed, 0xef, 0xf0, 0xf4, 0xf5), { maxLength: 12 }).map((a) => new Uint8Array(a))), (b) => {
        let ref = true;
        try {
          new TextDecoder('utf-8', { fatal: true, ignoreBOM: true }).decode(b);
        } catch {
          ref = false;
        }
        let ours = true;
        try {
          decodeUtf8Strict(b, 0, 'f');
        } catch {
          ours = false;
        }
        expect(ours).toBe(ref);
      }),
      { numRuns: 5000 },
    );
  });
  it('property: agrees with Node for any well-formed text, in all three forms', () => {
    fc.assert(
      fc.property(fc.string({ unit: 'grapheme' }), (s) => {
        const expected = new TextDecoder('utf-8').decode(utf8(s));
        expect(decodeText(utf8(s)).text).toBe(expected);
        expect(decodeUtf8Strict(utf8(s), 0, 'f')).toBe(expected); // the loop used without a platform decoder
        expect(decodeText(utf16le(s)).text).toBe(s);
        expect(decodeText(utf16be(s)).text).toBe(s);
      }),
    );
  });
  it('refuses a Windows-1252 file, naming the line, the byte and its letter there', () => {
    // "Temp (°C)" on line 2 as Windows-1252: ° is 0xB0 (WHATWG index-windows-1252).
    const bytes = new Uint8Array([...utf8('Run,Notes\n1,Temp ('), 0xb0, ...utf8('C)\n')]);
    expect(() => decodeText(bytes, 'The file "x.csv"')).toThrow(InputError);
    expect(() => decodeText(bytes, 'The file "x.csv"')).toThrow(
      /^The file "x.csv" is not UTF-8: line 2 has byte 0xB0 \("°" in Windows-1252\), so it was probably saved as Windows-1252 or Latin-1.*save it as UTF-8/,
    );
  });
  it('refuses ill-formed UTF-8 as table 3-7 of the Unicode Standard defines it', () => {
    const bad = [
      [0xc0, 0x80], // overlong NUL
      [0xe0, 0x80, 0x80], // overlong
      [0xed, 0xa0, 0x80], // a surrogate
      [0xf4, 0x90, 0x80, 0x80], // above U+10FFFF
      [0xf5, 0x80, 0x80, 0x80],
      [0x41, 0xe2, 0x82], // cut short
      [0x80],
    ];
    for (const b of bad) {
      expect(() => decodeText(new Uint8Array(b))).toThrow(/is not UTF-8/);
      expect(() => decodeUtf8Strict(new Uint8Array(b), 0, 'f')).toThrow(/is not UTF-8/);
      expect(() => new TextDecoder('utf-8', { fatal: true }).decode(new Uint8Array(b))).toThrow(); // the reference agrees
    }
  });
  it('refuses NUL bytes without a mark, UTF-32, and UTF-16 cut in half', () => {
    expect(() => decodeText(new Uint8Array([0x41, 0, 0x42, 0]))).toThrow(/holds NUL bytes \(the first at line 1\), so it is UTF-16 saved without a byte-order mark/);
    expect(() => decodeText(new Uint8Array([0xff, 0xfe, 0, 0, 0x41, 0, 0, 0]))).toThrow(/UTF-32/);
    expect(() => decodeText(new Uint8Array([0xff, 0xfe, 0x41]))).toThrow(/ends in half a character/);
    expect(() => decodeText(new Uint8Array([0xff, 0xfe, 0x00, 0xd8]))).toThrow(/half of a surrogate pair/);
  });
  it('degenerate input: no bytes, or only a mark, is the empty text', () => {
    expect(decodeText(new Uint8Array([]))).toEqual({ text: '', encoding: 'UTF-8' });
    expect(decodeText(new Uint8Array([0xfe, 0xff]))).toEqual({ text: '', encoding: 'UTF-16BE' });
  });
});

describe('windows1252Char', () => {
  it('gives the letters of the WHATWG Encoding Standard index-windows-1252', () => {
    // Node's TextDecoder here reads 'windows-1252' as ISO-8859-1 (small ICU), so the table is the reference:
    // 0x80 U+20AC, 0x8A U+0160, 0x93 U+201C, 0x99 U+2122, 0x9F U+0178, 0xA0 U+00A0, 0xB0 U+00B0, 0xE9 U+00E9, 0xFF U+00FF.
    const table: [number, string][] = [[0x80, '\u20ac'], [0x8a, '\u0160'], [0x93, '\u201c'], [0x99, '\u2122'], [0x9f, '\u0178'], [0xa0, '\u00a0'], [0xb0, '\u00b0'], [0xe9, '\u00e9'], [0xff, '\u00ff']];
    for (const [b, c] of table) expect(windows1252Char(b)).toBe(c);
    // The five bytes Microsoft leaves undefined are the C1 code points of the same number in the WHATWG index.
    for (const b of [0x81, 0x8d, 0x8f, 0x90, 0x9d]) expect(windows1252Char(b)).toBe(String.fromCharCode(b));
    expect(new Set(Array.from({ length: 128 }, (_, i) => windows1252Char(0x80 + i))).size).toBe(128);
  });
});
