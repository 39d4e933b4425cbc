import { describe, expect, it } from 'vitest';
import fc from 'fast-check';
import { jsonNestingOffset } from '../../../src/io/backup/json-nesting.ts';

/** Deepest nesting of a parsed value, counted without recursion (the reference for the scan). */
function depthOf(v: unknown): number {
  let max = 0;
  const todo: [unknown, number][] = [[v, 0]];
  while (todo.length > 0) {
    const [x, d] = todo.pop()!;
    if (x !== null && typeof x === 'object') {
      max = Math.max(max, d + 1);
      for (const y of Object.values(x)) todo.push([y, d + 1]);
    }
  }
  return max;
}

describe('jsonNestingOffset', () => {
  it('finds the bracket that opens one level too many', () => {
    expect(jsonNestingOffset('[[[1]]]', 2)).toBe(2);
    expect(jsonNestingOffset('[[[1]]]', 3)).toBe(-1);
    expect(jsonNestingOffset('{"a": {"b": [1]}}', 2)).toBe(12);
  });
  it('ignores brackets inside strings, escaped quotes included', () => {
    expect(jsonNestingOffset('["[[[", "\\"[[[", {"{{": 1}]', 2)).toBe(-1);
    expect(jsonNestingOffset('["\\\\", [[1]]]', 2)).toBe(8);
  });
  it('agrees with the depth of the parsed value on any JSON text', () => {
    fc.assert(
      fc.property(fc.json({ maxDepth: 6 }), fc.integer({ min: 0, max: 7 }), (text, max) => {
        expect(jsonNestingOffset(text, max) === -1).toBe(depthOf(JSON.parse(text)) <= max);
      }),
      { numRuns: 1000 },
    );
  });
  it('scans 1,000,000 open brackets without recursion; an empty or unterminated text is no problem (degenerate)', () => {
    expect(jsonNestingOffset('['.repeat(1_000_000), 64)).toBe(64);
    expect(jsonNestingOffset('', 0)).toBe(-1);
    expect(jsonNestingOffset('"[[[', 0)).toBe(-1);
  });
});
