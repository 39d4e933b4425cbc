import { describe, expect, it } from 'vitest';
import { definingRelation } from '../../../src/core/design/defining-relation.ts';
import { fractionFields } from '../../../src/core/design/fraction-fields.ts';
import { generatorWord, parseGenerators } from '../../../src/core/design/generators.ts';
import { defineFactors } from '../../../src/core/factor/factor.ts';

const factors = (k: number) => defineFactors(Array.from({ length: k }, (_, i) => ({ kind: 'numeric' as const, name: `X${i + 1}`, low: 0, high: 1 })));
const letters = (k: number) => 'ABCDEFGH'.slice(0, k).split('');

function fieldsOf(k: number, gens: string[]) {
  const g = gens.length === 0 ? [] : parseGenerators(gens, factors(k));
  return fractionFields(g, definingRelation(g.map(generatorWord)), letters(k));
}

describe('fractionFields', () => {
  it('a 2^(6-2) with E = ABC, F = BCD: I = ABCE = BCDF = ADEF, resolution IV (Montgomery, Design and Analysis of Experiments, 8th ed., section 8.3, from memory)', () => {
    const f = fieldsOf(6, ['E=ABC', 'F=BCD']);
    expect(f.generators).toEqual(['E=ABC', 'F=BCD']);
    expect([...f.definingRelation].sort()).toEqual(['ABCE', 'ADEF', 'BCDF']);
    expect(f.resolution).toBe(4);
    expect(f.wordLengths).toEqual({ 4: 3 });
  });
  it('a 2^(5-1) with E = ABCD: one word of length 5, resolution V (Montgomery, 8th ed., section 8.2, from memory)', () => {
    expect(fieldsOf(5, ['E=ABCD'])).toEqual({ generators: ['E=ABCD'], definingRelation: ['ABCDE'], resolution: 5, wordLengths: { 5: 1 } });
  });
  it('a sign-reversed generator keeps its sign in the words', () => {
    expect(fieldsOf(4, ['D=-ABC']).definingRelation).toEqual(['-ABCD']);
  });
  it('a full factorial (degenerate: no generators) has empty fields and no resolution', () => {
    expect(fieldsOf(3, [])).toEqual({ generators: [], definingRelation: [], resolution: null, wordLengths: {} });
  });
});
