import { describe, expect, it } from 'vitest';
import { InputError } from '../../../src/core/errors.ts';
import { fullQuadraticTerms } from '../../../src/core/design/second-order-terms.ts';
import { isInteraction, mainEffect, squareTerm } from '../../../src/core/model/term.ts';

describe('fullQuadraticTerms: main effects, two-factor interactions and squares', () => {
  it("the module's example: two factors give A, B, AB, A^2, B^2 in model order", () => {
    const a = mainEffect(0);
    const b = mainEffect(1);
    expect(fullQuadraticTerms(2)).toEqual([a, b, a | b, squareTerm(0), squareTerm(1)]);
  });

  it('has (k + 1)(k + 2) / 2 - 1 terms, k(k - 1) / 2 of them interactions', () => {
    // Montgomery, Design and Analysis of Experiments, 8th ed., section 11.1 (Eq. 11.2, from memory):
    // the second-order model has (k + 1)(k + 2) / 2 parameters with the intercept.
    for (const k of [1, 3, 5, 10]) {
      const t = fullQuadraticTerms(k);
      expect(t).toHaveLength(((k + 1) * (k + 2)) / 2 - 1);
      expect(new Set(t).size).toBe(t.length);
      expect(t.filter(isInteraction)).toHaveLength((k * (k - 1)) / 2);
    }
  });

  it('degenerate input: k outside 1 to 25 or not whole is refused, naming it', () => {
    for (const k of [0, 26, 2.5, Number.NaN]) expect(() => fullQuadraticTerms(k)).toThrow(InputError);
    expect(() => fullQuadraticTerms(0)).toThrow('from 1 to 25, got 0');
  });
});
