import { describe, expect, it } from 'vitest';
import { hierarchicalClosure, isHierarchical, reduceHierarchical, subterms } from '../../../src/core/model/hierarchy.ts';

const A = 1, B = 2, C = 4, AB = 3, AC = 5, BC = 6, ABC = 7;

// Peixoto (1990), The American Statistician 44, 26-30: a well-formulated model keeps every lower-order term.
describe('model hierarchy', () => {
  it('subterms of ABC', () => {
    expect(subterms(ABC).sort((a, b) => a - b)).toEqual([A, B, AB, C, AC, BC].sort((a, b) => a - b));
    expect(subterms(A)).toEqual([]);
  });
  it('recognises hierarchical models', () => {
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
