import { describe, expect, it } from 'vitest';
import { generatorWord, maxGenerators, parseGenerators } from '../../../src/core/design/generators.ts';
import { InputError } from '../../../src/core/errors.ts';
import { defineFactors } from '../../../src/core/factor/factor.ts';
import { mask, numericFactors } from './helpers.ts';

describe('maxGenerators', () => {
  it('allows up to the saturated fraction (Box, Hunter and Hunter, 2nd ed., section 6.4: 7 factors in 8 runs, 15 in 16)', () => {
    expect(maxGenerators(7)).toBe(4);
    expect(maxGenerators(15)).toBe(11);
    expect(maxGenerators(3)).toBe(1);
  });
  it('allows none for two factors or fewer (degenerate input)', () => {
    expect(maxGenerators(2)).toBe(0);
    expect(maxGenerators(1)).toBe(0);
  });
});

describe('parseGenerators', () => {
  const f6 = numericFactors(6);
  it('reads letters and sign-reversed products (Montgomery, 8th ed., section 8.3: E=ABC, F=-BCD)', () => {
    const g = parseGenerators(['E=ABC', 'F=-BCD'], f6);
    expect(g.map((x) => x.text)).toEqual(['E=ABC', 'F=-BCD']);
    expect(generatorWord(g[0])).toEqual({ mask: mask('ABCE'), sign: 1 });
    expect(generatorWord(g[1])).toEqual({ mask: mask('BCDF'), sign: -1 });
  });
  it('reads factor names joined by ":"', () => {
    const factors = defineFactors([
      { kind: 'numeric', name: 'Temperature', low: 1, high: 2 },
      { kind: 'numeric', name: 'Speed', low: 1, high: 2 },
      { kind: 'numeric', name: 'Gloss', low: 1, high: 2 },
    ]);
    expect(parseGenerators(['Gloss=Temperature:Speed'], factors)[0].text).toBe('C=AB');
  });
  it('refuses no generators (degenerate input)', () => {
    expect(() => parseGenerators([], f6)).toThrow(/at least one is needed/);
    expect(() => parseGenerators([' '], f6)).toThrow(InputError);
  });
  it('refuses more generators than the run count allows', () => {
    expect(() => parseGenerators(['C=AB', 'D=AB', 'E=A', 'F=B', 'G=A'], numericFactors(7))).toThrow(
      /5 generators for 7 factors leave 2 basic factors \(4 runs\), which can carry at most 3 factors; 7 factors take at most 4 generators/,
    );
  });
  it('refuses dependent generators, also sign-reversed', () => {
    expect(() => parseGenerators(['E=ABC', 'F=ABC'], f6)).toThrow(/"E=ABC" and "F=ABC" are dependent: they give E and F the same column/);
    expect(() => parseGenerators(['E=ABC', 'F=-ABC'], f6)).toThrow(/same column \(sign-reversed\)/);
  });
  it('refuses unknown letters, copies, repeats and generated factors on the right', () => {
    expect(() => parseGenerators(['E=ABX'], f6)).toThrow(/unknown factor "X"/);
    expect(() => parseGenerators(['E=A'], f6)).toThrow(/makes E a copy of A/);
    expect(() => parseGenerators(['E=ABC', 'E=ABD'], f6)).toThrow(/E is generated twice/);
    expect(() => parseGenerators(['E=ABE'], f6)).toThrow(/cannot appear in its own product/);
    expect(() => parseGenerators(['E=ABC', 'F=ABE'], f6)).toThrow(/E is itself generated/);
    expect(() => parseGenerators(['E'], f6)).toThrow(/expected FACTOR=PRODUCT/);
    expect(() => parseGenerators(['AB=CD'], f6)).toThrow(/left side must be one factor/);
  });
});
