import { describe, expect, it } from 'vitest';
import fc from 'fast-check';
import { MAX_NESTING, canonicalJson } from '../../../src/core/records/canonical-json.ts';
import { InputError } from '../../../src/core/errors.ts';

describe('canonicalJson', () => {
  // RFC 8785 (JSON Canonicalization Scheme), section 3.2.2, the example input and its output.
  it('writes the RFC 8785 example as the RFC does', () => {
    const input = String.raw`{
      "numbers": [333333333.33333329, 1E30, 4.50, 2e-3, 0.000000000000000000000000001],
      "string": "\u20ac$\u000F\u000aA'\u0042\u0022\u005c\\\"\/",
      "literals": [null, true, false]
    }`;
    const expected = String.raw`{"literals":[null,true,false],"numbers":[333333333.3333333,1e+30,4.5,0.002,1e-27],"string":"€$\u000f\nA'B\"\\\\\"/"}`;
    expect(canonicalJson(JSON.parse(input))).toBe(expected);
  });
  // RFC 8785, section 3.2.3: members are sorted by their names as UTF-16 code units.
  it('sorts member names by UTF-16 code units, as RFC 8785 section 3.2.3 requires', () => {
    const obj = { '\u20ac': 'Euro Sign', '\r': 'Carriage Return', '\ufb33': 'Hebrew Letter Dalet With Dagesh', '1': 'One', '\ud83d\ude00': 'Emoji: Grinning Face', '\u0080': 'Control', '\u00f6': 'Latin Small Letter O With Diaeresis' };
    const order = Object.keys(JSON.parse(canonicalJson(obj)) as object);
    // JSON.parse keeps insertion order for string keys except integer-like ones, so read the text instead.
    const text = canonicalJson(obj);
    const names = [...text.matchAll(/"([^"]*)":"/g)].map((m) => JSON.parse(`"${m[1]}"`));
    expect(names.map((n: string) => n.codePointAt(0)!.toString(16))).toEqual(['d', '31', '80', 'f6', '20ac', '1f600', 'fb33']);
    expect(order).toContain('1');
  });
  it('is the same for the same value whatever the member order, and reads back to the same value', () => {
    fc.assert(
      fc.property(fc.jsonValue(), (v) => {
        const text = canonicalJson(v);
        expect(canonicalJson(JSON.parse(text))).toBe(text);
        expect(JSON.parse(text)).toEqual(JSON.parse(JSON.stringify(v)));
      }),
    );
  });
  it('refuses a number JSON cannot hold', () => {
    expect(() => canonicalJson({ a: Number.POSITIVE_INFINITY })).toThrow(/no place for the number Infinity/);
  });
});

describe('canonicalJson nesting', () => {
  /** A list nested `depth` deep around 1, built without recursion. */
  function nested(depth: number): unknown {
    let v: unknown = 1;
    for (let i = 0; i < depth; i++) v = [v];
    return v;
  }
  it('writes 64 levels and refuses 65, naming where, with no recursion (MAX_NESTING)', () => {
    expect(canonicalJson(nested(MAX_NESTING))).toBe('['.repeat(64) + '1' + ']'.repeat(64));
    expect(() => canonicalJson(nested(MAX_NESTING + 1))).toThrow(/^\$(\[0\]){64}: lists and objects nested deeper than 64 levels/);
  });
  it('refuses 100,000 levels with an InputError, not a stack overflow', () => {
    let err: unknown;
    try {
      canonicalJson(nested(100_000));
    } catch (e) {
      err = e;
    }
    expect(err).toBeInstanceOf(InputError);
  });
  it('refuses a value that contains itself (a cycle) as too deep, rather than looping', () => {
    const a: Record<string, unknown> = { name: 'loop' };
    a.self = a;
    expect(() => canonicalJson(a)).toThrow(/^\$(\.self){64}: lists and objects nested deeper than 64/);
  });
  it('names object members and list places in the path of a refused number', () => {
    expect(() => canonicalJson({ payload: { 'odd key': [0, Number.NEGATIVE_INFINITY] } })).toThrow(/^\$\.payload\["odd key"\]\[1\]: JSON has no place for the number -Infinity/);
  });
});
