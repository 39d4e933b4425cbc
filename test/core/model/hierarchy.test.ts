import { describe, expect, it } from 'vitest';
import { squareTerm } from '../../../src/core/model/term.ts';
import { hierarchicalClosure, isHierarchical, reduceHierarchical, subterms } from '../../../src/core/model/hierarchy.ts';

const A = 1, B = 2, C = 4, AB = 3, AC = 5, BC = 6, ABC = 7;

// Peixoto (1990), The American Statistician 44, 26-30: a well-formulated model keeps every lower-order term.
describe('model hierarchy', () => {
  it('subterms of ABC', () => {
    expect(subterms(ABC).sort((a, b) => a - b)).toEqual([A, B, AB, C, AC, BC].sort((a, b) => a - b));
    expect(subterms(A)).toEqual([]);
  });
  it('recognizes hierarchical models', () => {
    expect(isHierarchical([A, B, AB])).toBe(true);
    expect(isHierarchical([A, AB])).toBe(false);
    expect(isHierarchical([])).toBe(true);
  });
  it('closure adds the missing lower-order terms', () => {
    expect(hierarchicalClosure([AC])).toEqual([A, C, AC]);
  });
  it('reduction drops a term only when no kept term contains it', () => {
    expect(reduceHierarchical([A, B, C, AB], (t) => t === A || t === C)).toEqual([A, B, AB]);
    expect(reduceHierarchical([A, B, C, AB, ABC], (t) => t === ABC || t === C)).toEqual([A, B, AB]);
    expect(reduceHierarchical([A], () => true)).toEqual([]);
  });
});

// Peixoto (1990): a well-formulated polynomial keeps every lower power, so a square keeps its main effect.
describe('model hierarchy with squares', () => {
  const A2 = squareTerm(0);
  const B2 = squareTerm(1);
  it('a square contains its main effect only', () => {
    expect(subterms(A2)).toEqual([A]);
    expect(isHierarchical([A, A2])).toBe(true);
    expect(isHierarchical([A2])).toBe(false);
    expect(isHierarchical([A, B, AB, A2, B2])).toBe(true);
  });
  it('closure and reduction keep a squared factor\'s main effect, in model order', () => {
    expect(hierarchicalClosure([AC, B2])).toEqual([A, B, C, AC, B2]);
    expect(reduceHierarchical([A, B, AB, A2, B2], (t) => t === A || t === AB || t === B2)).toEqual([A, B, A2]);
    expect(reduceHierarchical([A, A2], () => true)).toEqual([]);
  });
});
