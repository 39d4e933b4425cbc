import { describe, expect, it } from 'vitest';
import { buildDesign } from '../../../src/core/design/build-design.ts';
import { catalogFraction } from '../../../src/core/design/catalog.ts';
import { readTypedGenerators } from '../../../src/core/design/typed-generators.ts';
import { InputError } from '../../../src/core/errors.ts';
import { numericFactors } from './helpers.ts';

const specs = (k: number) => numericFactors(k).map((f) => ({ kind: 'numeric' as const, name: f.name, low: -1, high: 1 }));

describe('readTypedGenerators: generators as typed in one box', () => {
  it('reads spaces and lower case; E = ABCD gives the resolution V half fraction of five factors (Montgomery, 8th ed., section 8.2, from memory)', () => {
    const g = readTypedGenerators(' e = abcd ', numericFactors(5), '1/2', 1);
    expect(g).toEqual(['E=ABCD']);
    const d = buildDesign({ factors: specs(5), generators: g!, seed: 1 });
    expect(d.resolution).toBe(5);
    expect(d.definingRelation).toEqual(['ABCDE']);
    // The same generator as the catalog's for this fraction (Montgomery, 8th ed., Table 8.14, from memory).
    expect(catalogFraction(5, 1).generators).toEqual(['E=ABCD']);
  });

  it('reads two separated by a comma or a semicolon, with a sign: the 2^(6-2) with E = ABC, F = BCD is resolution IV, I = ABCE = BCDF = ADEF (Montgomery, 8th ed., Example 8.4, from memory)', () => {
    const g = readTypedGenerators('E = ABC; F = BCD', numericFactors(6), '1/4', 2);
    expect(g).toEqual(['E=ABC', 'F=BCD']);
    const d = buildDesign({ factors: specs(6), generators: g!, seed: 1 });
    expect(d.resolution).toBe(4);
    expect([...d.definingRelation].sort()).toEqual(['ABCE', 'ADEF', 'BCDF']);
    expect(readTypedGenerators('E=ABC, F=-BCD', numericFactors(6), '1/4', 2)).toEqual(['E=ABC', 'F=-BCD']);
  });

  it('a blank box is null: the catalog generators apply (degenerate input)', () => {
    expect(readTypedGenerators('  , ; ', numericFactors(5), '1/2', 1)).toBeNull();
  });

  it('bad input: a wrong shape, a letter that is no factor, two letters on the left, the wrong count, each in plain words', () => {
    const f5 = numericFactors(5);
    expect(() => readTypedGenerators('E ABCD', f5, '1/2', 1)).toThrow(new InputError('"E ABCD" is not a generator. Write the factor it makes, an equals sign and the product of other factors\' letters, such as E = ABCD.'));
    expect(() => readTypedGenerators('E = ABXD', f5, '1/2', 1)).toThrow(/"X" is not the letter of a factor above\. Use the letters A, B, C, D, E/);
    expect(() => readTypedGenerators('DE = ABC', f5, '1/2', 1)).toThrow(/the left side must be one factor letter/);
    expect(() => readTypedGenerators('E = ABCD, D = ABC', f5, '1/2', 1)).toThrow(new InputError('The 1/2 fraction takes 1 generator; 2 were typed. Type 1, separated by commas, or choose another fraction.'));
  });

  it("bad input: the core's rules of a set of generators, said with what to do", () => {
    // E = ABCE holds E in its own product; E = AB and F = -AB give one column twice.
    expect(() => readTypedGenerators('E = ABCE', numericFactors(5), '1/2', 1)).toThrow(/^These generators cannot be used: .*E cannot appear in its own product\. Change them, or clear the box/);
    expect(() => readTypedGenerators('E = AB, F = -AB', numericFactors(6), '1/4', 2)).toThrow(/dependent/);
  });
});
