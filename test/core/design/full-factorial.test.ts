import { describe, expect, it } from 'vitest';
import { fullFactorial } from '../../../src/core/design/full-factorial.ts';
import { InputError } from '../../../src/core/errors.ts';

describe('fullFactorial', () => {
  it('lists the 2^3 in standard order (1), a, b, ab, c, ac, bc, abc (Montgomery, 8th ed., section 6.3)', () => {
    const names = fullFactorial(3).map((r) => r.map((x, j) => (x > 0 ? 'abc'[j] : '')).join('') || '(1)');
    expect(names).toEqual(['(1)', 'a', 'b', 'ab', 'c', 'ac', 'bc', 'abc']);
  });
  it('reaches 2^10 = 1024 runs and refuses 2^11 with the reason', () => {
    expect(fullFactorial(10).length).toBe(1024);
    expect(() => fullFactorial(11)).toThrow(/2048 runs, over the limit of 1024/);
  });
  it('handles one factor and refuses none (degenerate input)', () => {
    expect(fullFactorial(1)).toEqual([[-1], [1]]);
    expect(() => fullFactorial(0)).toThrow(InputError);
  });
});
