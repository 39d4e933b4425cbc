import { describe, expect, it } from 'vitest';
import { definingRelation, resolution, romanResolution, wordLengthPattern } from '../../../src/core/design/defining-relation.ts';
import { formatWord } from '../../../src/core/design/word.ts';
import { InputError } from '../../../src/core/errors.ts';
import { mask } from './helpers.ts';

const L = 'ABCDEFGHJKLMNOP'.split('');
const w = (s: string) => ({ mask: mask(s.replace('-', '')), sign: (s.startsWith('-') ? -1 : 1) as 1 | -1 });

describe('definingRelation', () => {
  it('2^(6-2) with E=ABC, F=BCD: I = ABCE = BCDF = ADEF (Montgomery, 8th ed., section 8.3)', () => {
    expect(definingRelation([w('ABCE'), w('BCDF')]).map((x) => formatWord(x, L))).toEqual(['ABCE', 'ADEF', 'BCDF']);
  });
  it('carries signs: E=ABC, F=-BCD gives I = ABCE = -BCDF = -ADEF', () => {
    expect(definingRelation([w('ABCE'), w('-BCDF')]).map((x) => formatWord(x, L))).toEqual(['ABCE', '-ADEF', '-BCDF']);
  });
  it('is empty for a full factorial and refuses dependent words', () => {
    expect(definingRelation([])).toEqual([]);
    expect(() => definingRelation([w('ABCE'), w('ABCE')])).toThrow(/dependent/);
  });
});

describe('wordLengthPattern and resolution', () => {
  it('the 2^(7-4) is the [7,4] Hamming code: 7 words of length 3, 7 of length 4, 1 of length 7 (MacWilliams and Sloane 1977, ch. 1)', () => {
    const r = definingRelation([w('ABD'), w('ACE'), w('BCF'), w('ABCG')]);
    expect(wordLengthPattern(r)).toEqual({ 3: 7, 4: 7, 7: 1 });
    expect(resolution(r)).toBe(3);
  });
  it('the 2^(5-1) with I = ABCDE has resolution V (Box, Hunter and Hunter, 2nd ed., section 6.3)', () => {
    expect(resolution([w('ABCDE')])).toBe(5);
  });
  it('a full factorial has no words and no resolution (degenerate input)', () => {
    expect(wordLengthPattern([])).toEqual({});
    expect(resolution([])).toBeNull();
  });
});

describe('romanResolution', () => {
  it('writes resolutions as the trade does', () => {
    expect([3, 4, 5, 6, 7, 8].map(romanResolution)).toEqual(['III', 'IV', 'V', 'VI', 'VII', 'VIII']);
  });
  it('refuses what is not a resolution', () => {
    expect(() => romanResolution(0)).toThrow(InputError);
    expect(() => romanResolution(2.5)).toThrow(InputError);
  });
});
