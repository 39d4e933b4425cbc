import { describe, expect, it } from 'vitest';
import {
  aliasChain,
  aliasChains,
  aliasLabel,
  confoundedGroups,
  defaultAliasOrder,
  definingWordsOf,
  designAliasChains,
  formatChain,
} from '../../../src/core/design/alias-structure.ts';
import { definingRelation } from '../../../src/core/design/defining-relation.ts';
import { InputError } from '../../../src/core/errors.ts';
import { mask, numericFactors } from './helpers.ts';

const L = 'ABCDEFGHJKLMNOP'.split('');
const w = (s: string) => ({ mask: mask(s.replace('-', '')), sign: (s.startsWith('-') ? -1 : 1) as 1 | -1 });
const text = (chain: { mask: number; sign: 1 | -1 }[]) => formatChain(chain, L);

describe('aliasChain', () => {
  it('2^(3-1) with I = ABC: A = BC (Montgomery, 8th ed., section 8.2)', () => {
    expect(text(aliasChain(mask('A'), [w('ABC')]))).toBe('A = BC');
  });
  it('the alternate fraction I = -ABC: A = -BC (Montgomery, 8th ed., section 8.2)', () => {
    expect(text(aliasChain(mask('A'), [w('-ABC')]))).toBe('A = -BC');
  });
  it('restricts to an order: 2^(7-3) with E=ABC, F=BCD, G=ACD, A up to three factors is A = BCE = DEF = CDG = BFG (Montgomery, 8th ed., section 8.3, from memory)', () => {
    const rel = definingRelation([w('ABCE'), w('BCDF'), w('ACDG')]);
    expect(text(aliasChain(mask('A'), rel, 3))).toBe('A = BCE = BFG = CDG = DEF');
    expect(aliasChain(mask('A'), rel).length).toBe(8);
  });
  it('refuses degenerate terms and orders', () => {
    expect(() => aliasChain(0, [])).toThrow(InputError);
    expect(() => aliasChain(1, [], 0)).toThrow(InputError);
    expect(aliasChain(1, [])).toEqual([{ mask: 1, sign: 1 }]);
  });
});

describe('aliasChains and aliasLabel', () => {
  it('labels the combination an estimate measures (2^(4-1), I = ABCD: A + BCD, AB + CD)', () => {
    const rel = [w('ABCD')];
    const chains = aliasChains(rel, [mask('A'), mask('AB')]);
    expect(chains.map((c) => aliasLabel(c.chain, L))).toEqual(['A + BCD', 'AB + CD']);
    expect(aliasLabel(aliasChain(mask('A'), [w('-ABCF')]), L)).toBe('A - BCF');
  });
  it('gives an empty list for no terms, and refuses an empty label', () => {
    expect(aliasChains([w('ABC')], [])).toEqual([]);
    expect(() => aliasLabel([], L)).toThrow(InputError);
  });
});

describe('confoundedGroups', () => {
  it('groups model terms the design cannot separate (2^(4-1), I = ABCD: AB with CD)', () => {
    const groups = confoundedGroups([w('ABCD')], [mask('A'), mask('B'), mask('AB'), mask('CD')]);
    expect(groups.map((g) => aliasLabel(g, L))).toEqual(['A', 'B', 'AB + CD']);
  });
  it('keeps relative signs (I = -ABCD: AB - CD)', () => {
    expect(confoundedGroups([w('-ABCD')], [mask('CD'), mask('AB')]).map((g) => aliasLabel(g, L))).toEqual(['AB - CD']);
  });
  it('returns nothing for no terms and refuses a bad term', () => {
    expect(confoundedGroups([w('ABC')], [])).toEqual([]);
    expect(() => confoundedGroups([], [-1])).toThrow(InputError);
  });
});

describe('designAliasChains', () => {
  it('2^(4-1), I = ABCD: A = BCD, ..., AB = CD, AC = BD, AD = BC (Box, Hunter and Hunter, 2nd ed., section 6.2)', () => {
    const chains = designAliasChains([w('ABCD')], 4).map(text);
    expect(chains).toEqual(['A = BCD', 'B = ACD', 'C = ABD', 'D = ABC', 'AB = CD', 'AC = BD', 'AD = BC']);
  });
  it('writes the shortest word first with sign + (I = -ABC: A = -BC, B = -AC, C = -AB)', () => {
    expect(designAliasChains([w('-ABC')], 3).map(text)).toEqual(['A = -BC', 'B = -AC', 'C = -AB']);
  });
  it('lists each effect alone for a full factorial (degenerate input) and refuses no factors', () => {
    expect(designAliasChains([], 2).map(text)).toEqual(['A', 'B', 'AB']);
    expect(() => designAliasChains([], 0)).toThrow(InputError);
  });
});

describe('defaultAliasOrder', () => {
  it('shows at least three-factor effects, and every main effect alias', () => {
    expect(defaultAliasOrder(4, 7)).toBe(3);
    expect(defaultAliasOrder(6, 6)).toBe(5);
    expect(defaultAliasOrder(null, 5)).toBe(5);
    expect(() => defaultAliasOrder(3, 0)).toThrow(InputError);
  });
});

describe('definingWordsOf', () => {
  it('reads a design\'s signed words back', () => {
    expect(definingWordsOf({ factors: numericFactors(6), definingRelation: ['ABCE', '-BCDF'] })).toEqual([w('ABCE'), w('-BCDF')]);
    expect(definingWordsOf({ factors: numericFactors(2), definingRelation: [] })).toEqual([]);
    expect(() => definingWordsOf({ factors: numericFactors(2), definingRelation: ['ABZ'] })).toThrow(InputError);
  });
});
