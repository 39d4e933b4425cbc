import { describe, expect, it } from 'vitest';
import { compareWords, formatWord, multiplyWords, parseLetterWord, parseWord, wordLength } from '../../../src/core/design/word.ts';
import { InputError } from '../../../src/core/errors.ts';
import { defineFactors } from '../../../src/core/factor/factor.ts';
import { mask, numericFactors } from './helpers.ts';

const L = ['A', 'B', 'C', 'D', 'E', 'F'];

describe('multiplyWords', () => {
  it('multiplies as the trade does: a squared factor is I (Montgomery, 8th ed., section 8.2: ABCD x AB = CD)', () => {
    expect(multiplyWords({ mask: mask('ABCD'), sign: 1 }, { mask: mask('AB'), sign: -1 })).toEqual({ mask: mask('CD'), sign: -1 });
    expect(multiplyWords({ mask: mask('AB'), sign: -1 }, { mask: mask('AB'), sign: -1 })).toEqual({ mask: 0, sign: 1 });
  });
  it('has I as identity (degenerate input)', () => {
    expect(multiplyWords({ mask: 0, sign: 1 }, { mask: 5, sign: 1 })).toEqual({ mask: 5, sign: 1 });
  });
});

describe('wordLength and compareWords', () => {
  it('counts letters and orders shorter words first', () => {
    expect(wordLength(mask('ABDE'))).toBe(4);
    expect(wordLength(0)).toBe(0);
    const sorted = [mask('ABC'), mask('BD'), mask('AB')].sort(compareWords);
    expect(sorted).toEqual([mask('AB'), mask('BD'), mask('ABC')]);
  });
});

describe('formatWord', () => {
  it('writes signed words in letters', () => {
    expect(formatWord({ mask: mask('ABCF'), sign: -1 }, L)).toBe('-ABCF');
    expect(formatWord(mask('CE'), L)).toBe('CE');
  });
  it('writes the identity as I and refuses a factor it has no letter for', () => {
    expect(formatWord(0, L)).toBe('I');
    expect(() => formatWord(1 << 9, L)).toThrow(InputError);
  });
  it('skips I among the letters of ten factors', () => {
    expect(formatWord(mask('HJ'), numericFactors(10).map((f) => f.letter))).toBe('HJ');
  });
});

describe('parseWord', () => {
  const factors = defineFactors([
    { kind: 'numeric', name: 'Temperature', low: 1, high: 2 },
    { kind: 'numeric', name: 'Speed', low: 1, high: 2 },
    { kind: 'categorical', name: 'Powder', levels: ['matte', 'gloss'] },
  ]);
  it('reads letters, signs and names joined by ":"', () => {
    expect(parseWord('-ABC', factors)).toEqual({ mask: 7, sign: -1 });
    expect(parseWord('Temperature:powder', factors)).toEqual({ mask: 5, sign: 1 });
    expect(parseWord('Speed', factors)).toEqual({ mask: 2, sign: 1 });
    expect(parseWord('ab', factors)).toEqual({ mask: 3, sign: 1 });
  });
  it('refuses empty, unknown and repeated factors with clear messages', () => {
    expect(() => parseWord('', factors)).toThrow(/got nothing/);
    expect(() => parseWord('ABX', factors)).toThrow(/unknown factor "X"/);
    expect(() => parseWord('AAB', factors)).toThrow(/appears twice/);
    expect(() => parseWord('Temperature::Speed', factors)).toThrow(/empty factor name/);
  });
});

describe('parseLetterWord', () => {
  it('reads the words this module writes, and I', () => {
    expect(parseLetterWord('-BD', L)).toEqual({ mask: mask('BD'), sign: -1 });
    expect(parseLetterWord('I', L)).toEqual({ mask: 0, sign: 1 });
  });
  it('refuses empty, unknown and repeated letters', () => {
    expect(() => parseLetterWord('-', L)).toThrow(InputError);
    expect(() => parseLetterWord('AZ', L)).toThrow(/unknown letter/);
    expect(() => parseLetterWord('AA', L)).toThrow(/twice/);
  });
});
