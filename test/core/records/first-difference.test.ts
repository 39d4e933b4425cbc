import { describe, expect, it } from 'vitest';
import fc from 'fast-check';
import { canonicalJson } from '../../../src/core/records/canonical-json.ts';
import { firstDifference } from '../../../src/core/records/first-difference.ts';

describe('firstDifference', () => {
  it('names the first differing field in canonical order', () => {
    expect(firstDifference({ a: 1, b: [1, 2] }, { a: 1, b: [1, 3] })).toBe('b[1]');
    expect(firstDifference({ readings: [[70, 71], []], notes: 'x' }, { readings: [[70, 72], []], notes: 'y' })).toBe('notes');
    expect(firstDifference({ design: { runs: [{ coded: [1, -1] }] } }, { design: { runs: [{ coded: [1, 1] }] } })).toBe('design.runs[0].coded[1]');
    expect(firstDifference({ 'odd key': 1 }, { 'odd key': 2 })).toBe('["odd key"]');
  });
  it('a member or place on one side only is a difference there, after earlier places', () => {
    expect(firstDifference({ a: 1 }, { a: 1, b: 2 })).toBe('b');
    expect(firstDifference([1, 2], [1, 2, 3])).toBe('[2]');
    expect(firstDifference([1, 2], [9, 2, 3])).toBe('[0]');
    expect(firstDifference({ a: 1, b: undefined }, { a: 1 })).toBeNull(); // undefined members are left out, as JSON does
  });
  it('is null exactly when the canonical texts are equal', () => {
    fc.assert(
      fc.property(fc.jsonValue({ maxDepth: 3 }), fc.jsonValue({ maxDepth: 3 }), (a, b) => {
        expect(firstDifference(a, b) === null).toBe(canonicalJson(a) === canonicalJson(b));
        expect(firstDifference(a, a)).toBeNull();
      }),
      { numRuns: 1000 },
    );
  });
  it('values of different types differ as a whole (degenerate input)', () => {
    expect(firstDifference(1, '1')).toBe('');
    expect(firstDifference(null, {})).toBe('');
  });
});
