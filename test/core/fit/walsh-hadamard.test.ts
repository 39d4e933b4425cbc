import { describe, expect, it } from 'vitest';
import fc from 'fast-check';
import { walshHadamard } from '../../../src/core/fit/walsh-hadamard.ts';

/** The defining sum out[t] = sum_c (-1)^popcount(t & c) in[c], computed directly (O(4^k)). */
function direct(a: readonly number[]): number[] {
  const pop = (v: number) => v.toString(2).split('').filter((b) => b === '1').length;
  return a.map((_, t) => a.reduce((s, v, c) => s + (pop(t & c) % 2 ? -v : v), 0));
}

describe('walshHadamard (Yates 1937; Fino and Algazi 1976)', () => {
  it("the module's example: [1, 2, 3, 4] -> [10, -2, -4, 0]", () => {
    const a = Float64Array.from([1, 2, 3, 4]);
    walshHadamard(a);
    expect([...a]).toEqual([10, -2, -4, 0]);
  });

  it("Yates' contrasts of the 2^2 yield example (Montgomery 8th ed., section 6.2): A 50, B -30, AB 10 from the totals 80, 100, 60, 90", () => {
    // Cell totals (n = 3) in standard order (1), a, b, ab are 80, 100, 60, 90 (printed). The transform
    // indexes cells by the LOW bits, so (1) is cell 3 (both low), a is cell 2, b is cell 1, ab is cell 0.
    const a = Float64Array.from([90, 60, 100, 80]);
    walshHadamard(a);
    expect(a[0]).toBe(330); // grand total
    expect(a[1]).toBe(50); // contrast of A (term bit 0)
    expect(a[2]).toBe(-30); // contrast of B
    expect(a[3]).toBe(10); // contrast of AB
  });

  it('equals the defining sum and is its own inverse up to 2^k (property, fast-check)', () => {
    fc.assert(
      fc.property(fc.integer({ min: 0, max: 5 }).chain((k) => fc.array(fc.integer({ min: -1000, max: 1000 }), { minLength: 1 << k, maxLength: 1 << k })), (values) => {
        const a = Float64Array.from(values);
        walshHadamard(a);
        expect([...a]).toEqual(direct(values));
        walshHadamard(a);
        expect([...a]).toEqual(values.map((v) => v * values.length));
      }),
    );
  });

  it('degenerate input: length 1 and length 0 are left as they are', () => {
    const one = Float64Array.from([7]);
    walshHadamard(one);
    expect([...one]).toEqual([7]);
    const none = new Float64Array(0);
    walshHadamard(none);
    expect(none.length).toBe(0);
  });
});
