import { describe, expect, it } from 'vitest';
import { catalogFraction } from '../../../src/core/design/catalog.ts';
import { definingRelation, resolution } from '../../../src/core/design/defining-relation.ts';
import { foldPoints, foldRelation, separatedPairs } from '../../../src/core/design/foldover.ts';
import { fractionalFactorial } from '../../../src/core/design/fractional.ts';
import { generatorWord, parseGenerators } from '../../../src/core/design/generators.ts';
import { formatWord } from '../../../src/core/design/word.ts';
import { InputError } from '../../../src/core/errors.ts';
import { mask, numericFactors } from './helpers.ts';

const L = 'ABCDEFGHJKLMNOP'.split('');
const relationOf = (k: number, gens: string[]) => definingRelation(parseGenerators(gens, numericFactors(k)).map(generatorWord));

describe('foldRelation', () => {
  it('the mirror image of a resolution III fraction gives resolution IV (Box, Hunter and Hunter, 2nd ed., section 6.8: the 2^(7-4) folds to a 2^(7-3)_IV)', () => {
    const rel = relationOf(7, [...catalogFraction(7, 4).generators]);
    const { kept, dropped } = foldRelation(rel, 'all', 7);
    expect(resolution(kept)).toBe(4);
    expect(kept.length).toBe(7);
    expect(dropped.every((w) => formatWord(w, L).replace('-', '').length % 2 === 1)).toBe(true);
  });
  it('switching one factor drops every word containing it (Montgomery, 8th ed., section 8.6)', () => {
    const rel = relationOf(7, [...catalogFraction(7, 4).generators]);
    const { kept } = foldRelation(rel, 3, 7);
    expect(kept.every((w) => (w.mask & mask('D')) === 0)).toBe(true);
    expect(kept.length).toBe(7);
  });
  it('refuses a full factorial, a fold that changes nothing, and an unknown factor (degenerate input)', () => {
    expect(() => foldRelation([], 'all', 3)).toThrow(/no aliases to break/);
    expect(() => foldRelation(relationOf(4, ['D=ABC']), 'all', 4)).toThrow(/even length/);
    expect(() => foldRelation(relationOf(4, ['D=ABC']), 9, 4)).toThrow(InputError);
  });
});

describe('foldPoints', () => {
  it('switches signs and numbers the new points after the first fraction', () => {
    const pts = fractionalFactorial(3, parseGenerators(['C=AB'], numericFactors(3)));
    const all = foldPoints(pts, 'all');
    expect(all.map((p) => p.standardOrder)).toEqual([5, 6, 7, 8]);
    expect(all[0].coded).toEqual(pts[0].coded.map((x) => -x));
    expect(foldPoints(pts, 0)[1].coded).toEqual([-1, -1, -1]);
  });
  it('refuses no points (degenerate input)', () => {
    expect(() => foldPoints([], 'all')).toThrow(InputError);
  });
});

describe('separatedPairs', () => {
  it('2^(3-1) with I = ABC folded: each main effect is freed of its two-factor alias', () => {
    const rel = relationOf(3, ['C=AB']);
    const pairs = separatedPairs(rel, foldRelation(rel, 'all', 3).kept, 3).map(([u, v]) => `${formatWord(u, L)}/${formatWord(v, L)}`);
    expect(pairs).toEqual(['A/BC', 'B/AC', 'C/AB']);
  });
  it('is empty when nothing changes, and refuses no factors', () => {
    expect(separatedPairs([], [], 3)).toEqual([]);
    expect(() => separatedPairs([], [], 0)).toThrow(InputError);
  });
});
