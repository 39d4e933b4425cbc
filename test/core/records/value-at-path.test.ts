import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { firstDifference } from '../../../src/core/records/first-difference.ts';
import { valueAtPath } from '../../../src/core/records/value-at-path.ts';

// The reference for the path format is firstDifference (src/core/records/first-difference.ts):
// the value it points at must differ between the two records (property test, fast-check).
describe('valueAtPath', () => {
  it('reads members, list places and quoted member names', () => {
    const r = { readings: [[70.4, 69.5], []], factors: [{ name: 'Oven' }], 'a b': { 'x"y': 1 } };
    expect(valueAtPath(r, 'readings[0][1]')).toEqual({ found: true, value: 69.5 });
    expect(valueAtPath(r, 'factors[0].name')).toEqual({ found: true, value: 'Oven' });
    expect(valueAtPath(r, '["a b"]["x\\"y"]')).toEqual({ found: true, value: 1 });
    expect(valueAtPath(r, '')).toEqual({ found: true, value: r });
  });

  it('a path that names nothing or does not parse is not found (degenerate input)', () => {
    const r = { readings: [[1]], n: null };
    expect(valueAtPath(r, 'readings[1]')).toEqual({ found: false });
    expect(valueAtPath(r, 'readings.x')).toEqual({ found: false });
    expect(valueAtPath(r, 'n.x')).toEqual({ found: false });
    expect(valueAtPath(r, 'readings[')).toEqual({ found: false });
    expect(valueAtPath(r, 'readings[-1]')).toEqual({ found: false });
    expect(valueAtPath(r, '1abc')).toEqual({ found: false });
    expect(valueAtPath(r, 'toString')).toEqual({ found: false });
    expect(valueAtPath(r, 'n')).toEqual({ found: true, value: null });
  });

  it('at the path firstDifference gives, the two records hold different values', () => {
    const json = fc.letrec((tie) => ({
      value: fc.oneof({ depthSize: 'small' }, fc.integer(), fc.string(), fc.boolean(), fc.constant(null), fc.array(tie('value'), { maxLength: 3 }), fc.dictionary(fc.string({ maxLength: 4 }), tie('value'), { maxKeys: 3 })),
    })).value;
    fc.assert(
      fc.property(json, json, (a, b) => {
        const path = firstDifference(a, b);
        if (path === null) return;
        const x = valueAtPath(a, path);
        const y = valueAtPath(b, path);
        // One side may lack the member or place (a longer list, a member on one side only).
        if (x.found && y.found) expect(JSON.stringify(x.value)).not.toBe(JSON.stringify(y.value));
        else expect(x.found && y.found).toBe(false);
      }),
      { numRuns: 500 },
    );
  });
});
