import { describe, expect, it } from 'vitest';
import { InputError } from '../../../src/core/errors.ts';
import { factorLetters, MAX_FACTORS } from '../../../src/core/factor/letters.ts';

// Factor letters skip I, kept for the identity column of the defining relation
// (Montgomery, Design and Analysis of Experiments, 8th ed., section 8.2; from memory).
describe('factorLetters', () => {
  it('letters ten factors A to K without I, and the whole alphabet less I is 25 letters', () => {
    expect(factorLetters(10)).toEqual(['A', 'B', 'C', 'D', 'E', 'F', 'G', 'H', 'J', 'K']);
    expect(MAX_FACTORS).toBe(25); // 26 letters of the Latin alphabet less I
    expect(factorLetters(MAX_FACTORS)).not.toContain('I');
    expect(new Set(factorLetters(MAX_FACTORS)).size).toBe(MAX_FACTORS);
    expect(factorLetters(MAX_FACTORS).at(-1)).toBe('Z');
  });
  it('degenerate input: no factors gives no letters; too many, negative or fractional counts are refused', () => {
    expect(factorLetters(0)).toEqual([]);
    expect(() => factorLetters(26)).toThrow(new InputError('A study can have 1 to 25 factors, got 26'));
    expect(() => factorLetters(-1)).toThrow(InputError);
    expect(() => factorLetters(2.5)).toThrow(InputError);
  });
});
